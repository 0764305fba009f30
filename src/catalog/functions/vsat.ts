import { canaliExponentAt300K, carrierHighFieldTable, saturationVelocity, type Carrier } from '../../physics';
import { CARRIER_ALIASES, CARRIER_SPELLINGS, material, temperature } from '../common';
import { codeParameter } from '../parameters';
import { elementwise, type ParameterSpec } from '../types';
import { InputError } from '../values';
import { SATURATION_VELOCITY_MODELS } from '../citedModels';
import { prose } from '../../text/prose';

/** Carrier types only: without a dopant, 'majority' and 'minority' name nothing. */
const CARRIER_TYPES: readonly Carrier[] = ['electron', 'hole'];

const carrierTypeCodes = codeParameter<Carrier>({
  name: 'carrier',
  description: 'Which carrier: electron or hole; blank means electron. (There is no dopant, so majority and minority are not accepted.)',
  choices: () => CARRIER_TYPES,
  defaultCode: 'electron',
  resolve: (code) => code as Carrier,
  aliases: CARRIER_ALIASES,
});

const carrierType: ParameterSpec<Carrier> = {
  ...carrierTypeCodes,
  details: CARRIER_SPELLINGS,
  parse(value) {
    if (typeof value === 'string' && ['majority', 'minority'].includes(value.trim().toLowerCase())) {
      throw new InputError(
        `carrier "${value}" needs a dopant to mean something, and DRIFT.VSAT takes none; allowed: ${CARRIER_TYPES.join(', ')}`,
      );
    }
    return carrierTypeCodes.parse(value);
  },
};

const SI_ELECTRON = carrierHighFieldTable('Si', 'electron');
const SI_HOLE = carrierHighFieldTable('Si', 'hole');

/** A silicon saturation velocity for the help text, computed from the table. */
function si(carrier: Carrier, temperatureK: number): string {
  return saturationVelocity('Si', carrier, temperatureK).toExponential(2).replace('e+', 'e');
}

/** Si hole v_sat at 300 K, for VELOCITY's help text. */
export const SILICON_HOLE_VSAT_300K_TEXT = si('hole', 300);

/** Canali's 300 K field exponents, for VELOCITY's help text. */
export const SILICON_FIELD_EXPONENTS_TEXT =
  `β = ${canaliExponentAt300K('electron').toFixed(3)} (electrons) ` + `and ${canaliExponentAt300K('hole').toFixed(3)} (holes)`;

/** The temperatures at which Si saturation velocities are given, for help texts. */
export const SILICON_HIGH_FIELD_RANGE_TEXT =
  `electrons ` +
  `${SI_ELECTRON.evaluationRange.min}–${SI_ELECTRON.evaluationRange.max} K, holes ` +
  `${SI_HOLE.evaluationRange.min}–${SI_HOLE.evaluationRange.max} K`;

export const VSAT = elementwise({
  name: 'VSAT',
  summary: 'Saturation drift velocity of electrons or holes, in cm/s.',
  help: prose`Returns the saturation velocity v_sat of the velocity–field relation DRIFT.VELOCITY uses, for
    the lattice temperature and material.

    Si: v_sat(T) = v_sat,300/((1 − A) + A·T/300 K) after Quay et al. (2000): ${si('electron', 300)} cm/s for
    electrons and ${si('hole', 300)} cm/s for holes at 300 K, ${si('electron', 77)} cm/s for electrons at 77 K
    (measured about 1.2–1.4e7). Fitted roughly 77–500 K and extrapolated to 1000 K. Electrons are accepted
    from ${SI_ELECTRON.evaluationRange.min} K; holes only from ${SI_HOLE.evaluationRange.min} K, because below
    that Quay's hole law would exceed the electron one while measured hole velocities in Si stay below
    electron ones. Electron ≥ hole at every temperature accepted. (Canali et al.'s 1975 v_m = 1.53e9·T^−0.87
    is a fit parameter, not the saturation velocity: it gives 3.5e7 cm/s at 77 K, so it is not used.) Ge and
    GaAs: Quay et al. (2000), 20–1000 K (fitted roughly 77–500 K). For GaAs electrons this is the high-field
    value beyond the transferred-electron velocity peak, not the peak. 4H-SiC: electrons 2.2e7 cm/s (Khan &
    Cooper 2000), at 300 K only; no hole value is tabulated, so holes give an error.`,
  result: { unit: 'cm/s', description: 'Saturation velocity' },
  parameters: [temperature, carrierType, material] as const,
  examples: [
    { formula: '=DRIFT.VSAT()', note: 'electrons in Si at 300 K' },
    { formula: '=DRIFT.VSAT(400,"hole")', note: 'holes in Si at 400 K' },
    { formula: '=DRIFT.VSAT(77)', note: 'electrons in Si at liquid-nitrogen temperature' },
    { formula: '=DRIFT.VSAT(A2:A10,"electron","Ge")', note: 'a temperature column for Ge' },
  ],
  models: SATURATION_VELOCITY_MODELS,
  compute: (temperatureK, carrierValue, materialValue) => saturationVelocity(materialValue.code, carrierValue, temperatureK),
});
