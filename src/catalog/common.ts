/**
 * Parameters that many catalog entries share, defined once so that names,
 * units, defaults and allowed ranges cannot drift apart between functions.
 */
import {
  INTRINSIC_MODEL_CODES,
  MATERIAL_CODES,
  MOBILITY_MODEL_CODES,
  RESISTIVITY_MODEL_CODES,
  dopantCodes,
  carrierFor,
  genericDopant,
  sampleDopants,
  solveEquilibrium,
  resolveDopant,
  resolveMaterial,
  SILICON,
  CARRIER_ROLES,
  type CarrierRole,
  type DopantDensity,
  type Equilibrium,
  type Material,
  type Sample,
} from '../physics';
import { codeParameter, optionalNumber, requiredCode, requiredNumber } from './parameters';

/** Temperatures the core's solvers are built and tested for. */
export const TEMPERATURE_RANGE_K = { min: 20, max: 1000 } as const;
/** Highest dopant density accepted, cm⁻³ (silicon has 5e22 atoms/cm³). */
export const MAX_DENSITY = 1e22;

export const temperature = optionalNumber({
  name: 'temperature_K',
  unit: 'K',
  description: `Lattice temperature in kelvin, ${TEMPERATURE_RANGE_K.min}–${TEMPERATURE_RANGE_K.max} K; blank means 300 K.`,
  defaultValue: 300,
  min: TEMPERATURE_RANGE_K.min,
  max: TEMPERATURE_RANGE_K.max,
});

export const requiredTemperature = requiredNumber({
  name: 'temperature_K',
  unit: 'K',
  description: `Lattice temperature in kelvin, ${TEMPERATURE_RANGE_K.min}–${TEMPERATURE_RANGE_K.max} K.`,
  min: TEMPERATURE_RANGE_K.min,
  max: TEMPERATURE_RANGE_K.max,
});

export const material = codeParameter<Material>({
  name: 'material',
  description: `Semiconductor: ${MATERIAL_CODES.join(', ')}; blank means Si.`,
  choices: () => MATERIAL_CODES,
  defaultCode: 'Si',
  resolve: resolveMaterial,
});

/** Every dopant code any material accepts; the material decides which apply. */
function allDopantCodes(): readonly string[] {
  return dopantCodes(SILICON);
}

export const dopant = requiredCode({
  name: 'dopant',
  description:
    'Dopant element symbol (B, Al, Ga, In acceptors; P, As, Sb donors) or n / p for a generic donor / acceptor. Case-insensitive, except that P is phosphorus and p a generic acceptor.',
  choices: allDopantCodes,
});

export const doping = requiredNumber({
  name: 'doping',
  unit: 'cm⁻³',
  description: `Density of the dopant in cm⁻³, > 0 and ≤ ${MAX_DENSITY}.`,
  min: 0,
  minExclusive: true,
  max: MAX_DENSITY,
});

function densityArgument(name: string, what: string) {
  return requiredNumber({
    name,
    unit: 'cm⁻³',
    description: `${what} in cm⁻³, 0 to ${MAX_DENSITY}.`,
    min: 0,
    max: MAX_DENSITY,
  });
}

export const donors = densityArgument('donors', 'Donor density');
export const acceptors = densityArgument('acceptors', 'Acceptor density');

export const counterDoping = optionalNumber({
  name: 'counter_doping',
  unit: 'cm⁻³',
  description: `Density of the opposite dopant type (compensation) in cm⁻³, 0 to ${MAX_DENSITY}; blank means 0.`,
  defaultValue: 0,
  min: 0,
  max: MAX_DENSITY,
});

export const carrier = codeParameter<CarrierRole>({
  name: 'carrier',
  description: 'Which carrier: majority (the type the dopant supplies), minority, electron or hole; blank means majority.',
  choices: () => CARRIER_ROLES,
  defaultCode: 'majority',
  resolve: (code) => code as CarrierRole,
});

export const mobilityModel = codeParameter<string>({
  name: 'model',
  description: `Mobility model: ${MOBILITY_MODEL_CODES.join(', ')}; blank means ${MOBILITY_MODEL_CODES[0]}.`,
  choices: () => MOBILITY_MODEL_CODES,
  defaultCode: MOBILITY_MODEL_CODES[0],
  resolve: (code) => code,
});

export const resistivityModel = codeParameter<string>({
  name: 'model',
  description: `Model: ${RESISTIVITY_MODEL_CODES.join(', ')}; blank means ${RESISTIVITY_MODEL_CODES[0]}.`,
  choices: () => RESISTIVITY_MODEL_CODES,
  defaultCode: RESISTIVITY_MODEL_CODES[0],
  resolve: (code) => code,
});

export const intrinsicModel = codeParameter<string>({
  name: 'model',
  description: `Intrinsic-density model: ${INTRINSIC_MODEL_CODES.join(', ')}; blank means ${INTRINSIC_MODEL_CODES[0]}.`,
  choices: () => INTRINSIC_MODEL_CODES,
  defaultCode: INTRINSIC_MODEL_CODES[0],
  resolve: (code) => code,
});

export const resistivity = requiredNumber({
  name: 'resistivity',
  unit: 'Ω·cm',
  description: 'Resistivity in Ω·cm, > 0.',
  min: 0,
  minExclusive: true,
});

/** A positive length in µm. */
export function length(name: string, what: string) {
  return requiredNumber({ name, unit: 'µm', description: `${what} in µm, > 0.`, min: 0, minExclusive: true });
}

/** Builds the physics sample for a single-dopant entry with optional counter-doping. */
export function sampleOf(
  materialValue: Material,
  temperatureValue: number,
  dopantCode: string,
  density: number,
  counterDensity: number,
): Sample {
  return {
    material: materialValue,
    temperature: temperatureValue,
    dopant: resolveDopant(materialValue, dopantCode),
    density,
    counterDensity,
  };
}

/** Equilibrium of a sample with donors and acceptors as generic dopants (ELECTRONS, HOLES, FERMILEVEL). */
export function genericEquilibrium(materialValue: Material, temperatureValue: number, donorDensity: number, acceptorDensity: number): Equilibrium {
  const dopants: DopantDensity[] = [
    { dopant: genericDopant(materialValue, 'donor'), density: donorDensity },
    { dopant: genericDopant(materialValue, 'acceptor'), density: acceptorDensity },
  ];
  return solveEquilibrium(materialValue, temperatureValue, dopants);
}

/** Equilibrium density of a sample's majority or minority carriers (MAJORITY, MINORITY). */
export function sampleCarrierDensity(sample: Sample, role: 'majority' | 'minority'): number {
  const state = solveEquilibrium(sample.material, sample.temperature, sampleDopants(sample));
  return carrierFor(sample.dopant, role) === 'electron' ? state.electrons : state.holes;
}
