/**
 * Parameters that many catalog entries share, defined once so that names,
 * units, defaults and allowed ranges cannot drift apart between functions.
 */
import {
  SILICON,
  MATERIAL_CODES,
  dopantCodeProblem,
  typedDopantCodes,
  intrinsicModelCodes,
  mobilityModelCodes,
  defaultMobilityModel,
  SILICON_MINORITY_MOBILITY_MODEL,
  resistivityModelCodes,
  carrierFor,
  genericDopant,
  sampleDopants,
  solveEquilibrium,
  resolveDopant,
  resolveMaterial,
  CARRIER_ROLES,
  type CarrierRole,
  type DopantDensity,
  type Equilibrium,
  type Material,
  type Sample,
} from '../physics';
import { allCodes, perMaterial } from './citedModels';
import { codeParameter, optionalNumber, requiredCode, requiredNumber } from './parameters';
import type { ParameterSpec } from './types';
import { prose } from '../text/prose';

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

/** A uniform electric field; the results it drives (velocity, current density) take its sign. */
export const field = requiredNumber({
  name: 'field_V_per_cm',
  unit: 'V/cm',
  description: 'Electric field in V/cm; its sign sets the direction of the result.',
});

export const material = codeParameter<Material>({
  name: 'material',
  description: `Semiconductor: ${MATERIAL_CODES.join(', ')}; blank means Si.`,
  choices: () => MATERIAL_CODES,
  defaultCode: 'Si',
  resolve: resolveMaterial,
});

/**
 * Every dopant code any material accepts as typed, each once, in material
 * order; the material decides which apply. A lone P or N is not among them:
 * it is refused as ambiguous, and "phosphorus" / "nitrogen" are listed instead.
 */
export function allDopantCodes(): readonly string[] {
  return allCodes(typedDopantCodes);
}

/** A material's typed dopant codes without its generic donor and acceptor. */
function namedDopantCodes(host: Material): readonly string[] {
  return typedDopantCodes(host).filter((code) => code !== host.genericDopants.donor && code !== host.genericDopants.acceptor);
}

export const dopant = requiredCode({
  name: 'dopant',
  description: 'Dopant: symbol or name (B, As, phosphorus…), or donor / acceptor; any case. List on the help page.',
  details:
    `By material: ${perMaterial(namedDopantCodes)}; "donor" / "acceptor" (or "n-type" / "p-type") for a generic donor / acceptor. ` +
    'Symbols and element names are accepted in any case. A lone P or N is refused, because it could mean the element ' +
    '(phosphorus, nitrogen) or the conductivity type (p-type, n-type): type "phosphorus" or "acceptor", "nitrogen" or "donor".',
  choices: allDopantCodes,
  problem: dopantCodeProblem,
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

/** Other spellings of the carriers: plurals, and n / p / e / h as engineers abbreviate them. */
export const CARRIER_ALIASES: Readonly<Record<string, string>> = {
  electrons: 'electron',
  holes: 'hole',
  n: 'electron',
  e: 'electron',
  p: 'hole',
  h: 'hole',
};

/** Help-page note on the carrier spellings. */
export const CARRIER_SPELLINGS = 'Any case; electrons / holes, n / p and e / h are accepted for electron / hole.';

export const carrier: ParameterSpec<CarrierRole> = {
  ...codeParameter<CarrierRole>({
    name: 'carrier',
    description: 'Which carrier: majority (the type the dopant supplies), minority, electron (n) or hole (p); blank: majority.',
    choices: () => CARRIER_ROLES,
    defaultCode: 'majority',
    resolve: (code) => code as CarrierRole,
    aliases: CARRIER_ALIASES,
  }),
  details:
    `${CARRIER_SPELLINGS} majority and minority name the dopant’s own carrier type and the other one. With ` +
    `a blank model the mobility model ` +
    'follows the carrier’s role in the sample by net doping (counter_doping included): in Si the minority carrier gets ' +
    `${SILICON_MINORITY_MOBILITY_MODEL} (minority-carrier physics), the majority carrier ${defaultMobilityModel(SILICON)}; ` +
    'other materials use their own fit for both.',
};

/** Display form of the default of a model argument whose blank means the material's own default. */
export const MATERIAL_DEFAULT_TEXT = 'the material’s default';

/**
 * A model argument: any code of any material parses here; a blank is passed
 * on as '' so the core takes the material's default, and the core refuses a
 * code the material has no parameters for, naming what it supports.
 */
function materialModelParameter(
  what: string,
  codesOf: (host: Material) => readonly string[],
  blank?: { readonly description: string; readonly defaultText: string; readonly details: string },
): ParameterSpec<string> {
  const codes = allCodes(codesOf);
  return {
    ...codeParameter<string>({
      name: 'model',
      description:
        blank?.description ??
        `${what}, e.g. ${codesOf(SILICON)[0]}; blank means the material’s ` + `default. Codes by material on the help page.`,
      choices: () => codes,
      defaultCode: '',
      resolve: (code) => code,
    }),
    defaultText: blank?.defaultText ?? MATERIAL_DEFAULT_TEXT,
    details: `${blank === undefined ? '' : `${blank.details} `}Codes by material, default first: ${perMaterial(codesOf)}.`,
  };
}

/** Display form of the default of a mobility model argument (chosen per carrier, see mobilityModel). */
export const MOBILITY_DEFAULT_TEXT = `${SILICON_MINORITY_MOBILITY_MODEL} for Si minority carriers, else the material’s default`;

/** A mobility model argument: a blank chooses per carrier (physics defaultMobilityModelFor). */
export const mobilityModel = materialModelParameter('Mobility model', mobilityModelCodes, {
  description: prose`Mobility model, e.g. ${defaultMobilityModel(SILICON)}; blank:
    ${SILICON_MINORITY_MOBILITY_MODEL} for Si minority carriers, else the material’s default (see help).`,
  defaultText: MOBILITY_DEFAULT_TEXT,
  details:
    `Blank: a carrier that is the sample’s minority carrier by net doping (counter_doping included) gets ` +
    `${SILICON_MINORITY_MOBILITY_MODEL} in Si, the one silicon model with minority-carrier physics; the majority carrier, ` +
    `and both carriers of an exactly compensated sample, get the material’s default (${defaultMobilityModel(SILICON)} in Si). ` +
    'Ge, GaAs and 4H-SiC have one fit each, used for both carriers.',
});

export const resistivityModel = materialModelParameter('Model', resistivityModelCodes);

export const intrinsicModel = materialModelParameter('Intrinsic-density model', intrinsicModelCodes);

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
export function genericEquilibrium(
  materialValue: Material,
  temperatureValue: number,
  donorDensity: number,
  acceptorDensity: number,
): Equilibrium {
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
