import { saturationVelocity, type Carrier } from '../../physics';
import { material, temperature } from '../common';
import { codeParameter } from '../parameters';
import { elementwise, type ParameterSpec } from '../types';
import { InputError } from '../values';
import { SATURATION_VELOCITY_MODELS } from '../citedModels';

/** Carrier types only: without a dopant, 'majority' and 'minority' name nothing. */
const CARRIER_TYPES: readonly Carrier[] = ['electron', 'hole'];

const carrierTypeCodes = codeParameter<Carrier>({
  name: 'carrier',
  description: 'Which carrier: electron or hole; blank means electron. (There is no dopant, so majority and minority are not accepted.)',
  choices: () => CARRIER_TYPES,
  defaultCode: 'electron',
  resolve: (code) => code as Carrier,
});

const carrierType: ParameterSpec<Carrier> = {
  ...carrierTypeCodes,
  parse(value) {
    if (typeof value === 'string' && ['majority', 'minority'].includes(value.trim().toLowerCase())) {
      throw new InputError(
        `carrier "${value}" needs a dopant to mean something, and DRIFT.VSAT takes none; allowed: ${CARRIER_TYPES.join(', ')}`,
      );
    }
    return carrierTypeCodes.parse(value);
  },
};

export const VSAT = elementwise({
  name: 'VSAT',
  summary: 'Saturation drift velocity of electrons or holes, in cm/s.',
  help: `Returns the saturation velocity v_sat of the velocity–field relation DRIFT.VELOCITY uses, for the lattice temperature and material.

Si: v_sat = 1.53e9·T^−0.87 cm/s (electrons), 1.62e8·T^−0.52 cm/s (holes) after Canali et al. (1975): 1.07e7 and 8.37e6 cm/s at 300 K. Measured up to 430 K; evaluated 77–1000 K, extrapolated above 430 K; refused below 77 K, where the power law grows without bound while measured velocities level off. Ge and GaAs: Quay et al. (2000), v_sat = v_sat,300/((1 − A) + A·T/300 K), 20–1000 K (fitted roughly 77–500 K). For GaAs electrons this is the high-field value beyond the transferred-electron velocity peak, not the peak. 4H-SiC: electrons 2.2e7 cm/s (Khan & Cooper 2000), at 300 K only; no hole value is tabulated, so holes give an error.`,
  result: { unit: 'cm/s', description: 'Saturation velocity' },
  parameters: [temperature, carrierType, material] as const,
  examples: [
    { formula: '=DRIFT.VSAT()', note: 'electrons in Si at 300 K' },
    { formula: '=DRIFT.VSAT(400,"hole")', note: 'holes in Si at 400 K' },
    { formula: '=DRIFT.VSAT(A2:A10,"electron","Ge")', note: 'a temperature column for Ge' },
  ],
  models: SATURATION_VELOCITY_MODELS,
  compute: (temperatureK, carrierValue, materialValue) =>
    saturationVelocity(materialValue.code, carrierValue, temperatureK),
});
