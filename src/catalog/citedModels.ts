/**
 * The model codes each family of catalog functions cites on its help page,
 * derived from the physics tables so that a model added to a material is
 * cited where it is used (tests/catalog/functions.test.ts checks that every
 * code a `model` argument accepts is cited). Where a function has a `model`
 * argument its default comes first, as the help page says.
 */
import {
  BANDGAP_NARROWING_MODEL_CODES,
  CAUGHEY_THOMAS_FIELD_CODE,
  FERMI_DIRAC_STATISTICS,
  HIGH_FIELD_TABLES,
  IONIZATION_MODEL_CODE,
  MATERIALS,
  SILICON,
  intrinsicModelCodes,
  ionizationModelCode,
  mobilityModelCodes,
  resistivityModelCodes,
  type Material,
} from '../physics';

/** Every code of codesOf over all materials, each once, in material order. */
export function allCodes(codesOf: (host: Material) => readonly string[]): readonly string[] {
  return unique(MATERIALS.flatMap((host) => codesOf(host)));
}

/**
 * "Si: a, b; Ge: c" — codes per material, for descriptions and README; with
 * only the first (default) code of each when `firstOnly`.
 */
export function perMaterial(codesOf: (host: Material) => readonly string[], firstOnly = false): string {
  return MATERIALS.map((host) => {
    const codes = codesOf(host);
    return `${host.code}: ${(firstOnly ? codes.slice(0, 1) : codes).join(', ')}`;
  }).join('; ');
}

/**
 * The default code of every material but silicon, for help texts that
 * describe silicon's models and then the other hosts'.
 *
 * @param codesOf - a material's codes, default first
 * @param form - 'for': "hilsum for Ge, sotoodeh for GaAs, …"; 'list': "hilsum, sotoodeh, …"
 */
export function otherMaterialDefaults(codesOf: (host: Material) => readonly string[], form: 'for' | 'list'): string {
  return MATERIALS.filter((host) => host !== SILICON)
    .map((host) => (form === 'for' ? `${codesOf(host)[0]} for ${host.code}` : codesOf(host)[0]))
    .join(', ');
}

function unique(codes: readonly string[]): string[] {
  return [...new Set(codes)];
}

/** Band gap of every material (DRIFT.BANDGAP). */
export const BANDGAP_MODELS = MATERIALS.map((host) => host.bandgap.code);

/** Effective densities of states of every material (DRIFT.CONDUCTIONDOS, DRIFT.VALENCEDOS). */
export const DENSITY_OF_STATES_MODELS = MATERIALS.map((host) => host.densityOfStates.code);

/** ni models (silicon's choices first), then what the other materials' ni is built from (DRIFT.INTRINSIC). */
export const INTRINSIC_MODELS = unique([
  ...allCodes(intrinsicModelCodes),
  ...MATERIALS.filter((host) => host !== SILICON).flatMap((host) => [host.bandgap.code, host.densityOfStates.code]),
]);

/** Dopant ionization of every material. */
export const IONIZATION_MODELS = MATERIALS.map((host) => (host === SILICON ? IONIZATION_MODEL_CODE : ionizationModelCode(host)));

/** What every equilibrium result rests on: ionization, carrier statistics, silicon's default ni. */
export const EQUILIBRIUM_MODELS = unique([
  IONIZATION_MODEL_CODE,
  FERMI_DIRAC_STATISTICS.code,
  intrinsicModelCodes(SILICON)[0],
  ...IONIZATION_MODELS,
]);

/** Mobility models of every material, silicon's default first (DRIFT.MOBILITY). */
export const MOBILITY_MODELS = allCodes(mobilityModelCodes);

/** Resistivity models of every material, silicon's default first (DRIFT.RESISTIVITY and its relatives). */
export const RESISTIVITY_MODELS = allCodes(resistivityModelCodes);

/** Each material's default mobility model: what functions without a `model` argument use. */
export const DEFAULT_MOBILITY_MODELS = unique(MATERIALS.map((host) => mobilityModelCodes(host)[0]));

/** Sources of the tabulated saturation velocities (DRIFT.VSAT). */
export const SATURATION_VELOCITY_MODELS = unique(
  HIGH_FIELD_TABLES.flatMap((table) => [table.electron, table.hole]).flatMap((entry) =>
    'modelCode' in entry ? [entry.modelCode, ...(entry.fieldExponentModelCode ? [entry.fieldExponentModelCode] : [])] : [],
  ),
);

/** The velocity–field law with its tables and the low-field mobility it starts from (DRIFT.VELOCITY, DRIFT.CURRENTDENSITY). */
export const HIGH_FIELD_MODELS = unique([CAUGHEY_THOMAS_FIELD_CODE, ...SATURATION_VELOCITY_MODELS, ...DEFAULT_MOBILITY_MODELS]);

/** Bandgap-narrowing models, then the ni they multiply (DRIFT.NIEFF). */
export const BANDGAP_NARROWING_MODELS = unique([...BANDGAP_NARROWING_MODEL_CODES, intrinsicModelCodes(SILICON)[0]]);
