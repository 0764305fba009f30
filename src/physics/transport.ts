/**
 * Conductivity, resistivity and drift current density of a uniform sample.
 *
 * For the mobility models σ = q(n·μn + p·μp) with n, p from solveEquilibrium
 * (incomplete ionization, compensation, intrinsic carriers: no special cases)
 * and μn, μp the drift mobilities of mobility/index.ts. For 'astm-f723' the
 * standard's own B/P/As conversion is used (uncompensated, 290–305 K).
 * Silicon's default, 'f723-anchored', is the physics of silicon's default
 * mobility model times a density-only factor that makes it F723 at 23 °C in
 * uncompensated B/P silicon (f723Anchored.ts).
 */
import type { Sample } from './sample';
import { sampleDopants } from './sample';
import { solveEquilibrium } from './equilibrium';
import { ELEMENTARY_CHARGE } from './constants';
import { PhysicsDomainError } from './errors';
import {
  ALL_MOBILITY_MODEL_CODES,
  MOBILITY_MODEL_CODES,
  defaultMobilityModel,
  driftMobilities,
  materialsWithMobilityModel,
  mobilityModelCodes,
} from './mobility';
import { f723Resistivity, f723SpeciesFor } from './astmF723';
import { F723_ANCHORED_CODE, anchorFactor, type AnchorDirection } from './f723Anchored';
import { saturatedCurrentDensity } from './highField/currentDensity';
import { SILICON, type Material } from './materials';

/** Code of the ASTM F723 conversion in the resistivity model list. */
export const ASTM_F723_CODE = 'astm-f723';

export { F723_ANCHORED_CODE };

/** Silicon's resistivity model codes: 'f723-anchored' (the default), its mobility models, then 'astm-f723'. */
export const RESISTIVITY_MODEL_CODES: readonly string[] = [F723_ANCHORED_CODE, ...MOBILITY_MODEL_CODES, ASTM_F723_CODE];

/** Every resistivity model code of every material: silicon's, then the other materials' mobility fits. */
export const ALL_RESISTIVITY_MODEL_CODES: readonly string[] = [
  ...RESISTIVITY_MODEL_CODES,
  ...ALL_MOBILITY_MODEL_CODES.filter((code) => !RESISTIVITY_MODEL_CODES.includes(code)),
];

/**
 * Resistivity model codes with parameters for a material; the first is its default.
 * ASTM F723 is a silicon standard, so only silicon lists it and the model anchored to it.
 *
 * @param material - host material
 * @returns e.g. ['f723-anchored', 'masetti', 'arora', 'caughey-thomas', 'klaassen', 'astm-f723'] for silicon, ['hilsum'] for germanium
 * @example resistivityModelCodes(GERMANIUM) // → ['hilsum']
 */
export function resistivityModelCodes(material: Material): readonly string[] {
  const codes = mobilityModelCodes(material);
  return material.code === SILICON.code ? [F723_ANCHORED_CODE, ...codes, ASTM_F723_CODE] : codes;
}

/**
 * Parses a resistivity model code, case-insensitively, for a material.
 *
 * @param code - e.g. 'ASTM-F723'; undefined or '' selects the material's default (silicon: 'f723-anchored')
 * @param material - host material (default silicon)
 * @returns the normalized code
 * @throws PhysicsDomainError listing the codes the material supports, for an
 *   unknown code or one without parameters for the material
 * @example resolveResistivityModel('ASTM-F723') // → 'astm-f723'
 */
export function resolveResistivityModel(code?: string, material: Material = SILICON): string {
  if (code === undefined || code.trim() === '') return resistivityModelCodes(material)[0];
  const normalized = code.trim().toLowerCase();
  const allowed = resistivityModelCodes(material);
  if (allowed.includes(normalized)) return normalized;
  if (ALL_RESISTIVITY_MODEL_CODES.includes(normalized)) {
    const owners =
      normalized === ASTM_F723_CODE || normalized === F723_ANCHORED_CODE ? SILICON.name : materialsWithMobilityModel(normalized);
    throw new PhysicsDomainError(
      `resistivity model '${normalized}' has parameters for ${owners} only; ${material.name} supports: ${allowed.join(', ')}.`,
    );
  }
  throw new PhysicsDomainError(`unknown resistivity model '${code}'. Allowed: ${allowed.join(', ')}.`);
}

/** Guards a conductivity: it must be finite and positive. */
function checkedConductivity(value: number, sample: Sample): number {
  if (!(value > 0) || !Number.isFinite(value)) {
    throw new PhysicsDomainError(
      `conductivity is not representable for ${sample.dopant.symbol} at ${sample.density} cm⁻³ and ` +
        `${sample.temperature} K (got ${value} S/cm): carriers are frozen out beyond double precision; use a higher temperature.`,
    );
  }
  return value;
}

/** ρ of silicon's physics model (its default mobility model), the base of 'f723-anchored'. */
const physicsResistivity = (sample: Sample): number => 1 / conductivity(sample, defaultMobilityModel(sample.material));

/**
 * Resistivity of 'f723-anchored' with the factor of one F723 direction:
 * 'forward' is what RESISTIVITY returns, 'reverse' what DOPING inverts
 * (f723Anchored.ts explains why the two differ by the standard's own inconsistency).
 *
 * @param sample - the sample
 * @param direction - 'forward' or 'reverse'
 * @returns ρ in Ω·cm
 */
export function anchoredResistivity(sample: Sample, direction: AnchorDirection): number {
  return physicsResistivity(sample) * anchorFactor(sample, direction, physicsResistivity);
}

/**
 * Electrical conductivity σ = q(n·μn + p·μp).
 *
 * @param sample - the sample
 * @param model - resistivity model code (silicon's default 'f723-anchored'; 'astm-f723' for B/P/As, uncompensated, 290–305 K)
 * @returns σ in S/cm
 * @throws PhysicsDomainError for an unknown model or a sample the model does not cover
 * @example conductivity(boron1e16At300K) // ≈ 0.68 S/cm
 */
export function conductivity(sample: Sample, model?: string): number {
  const code = resolveResistivityModel(model, sample.material);
  if (code === ASTM_F723_CODE) {
    const species = f723SpeciesFor(sample.dopant.symbol, sample.counterDensity, sample.temperature);
    return checkedConductivity(1 / f723Resistivity(species, sample.density), sample);
  }
  if (code === F723_ANCHORED_CODE) return checkedConductivity(1 / anchoredResistivity(sample, 'forward'), sample);
  const equilibrium = solveEquilibrium(sample.material, sample.temperature, sampleDopants(sample));
  const mobilities = driftMobilities(code, sample);
  return checkedConductivity(
    ELEMENTARY_CHARGE * (equilibrium.electrons * mobilities.electron + equilibrium.holes * mobilities.hole),
    sample,
  );
}

/**
 * Resistivity ρ = 1/σ.
 *
 * @param sample - the sample
 * @param model - resistivity model code (silicon's default 'f723-anchored')
 * @returns ρ in Ω·cm
 * @example resistivity(phosphorus1e16At300K) // ≈ 0.537 Ω·cm
 */
export function resistivity(sample: Sample, model?: string): number {
  const code = resolveResistivityModel(model, sample.material);
  if (code === ASTM_F723_CODE) {
    // The standard gives ρ directly; returning it unchanged avoids a 1/(1/ρ) round-off.
    const species = f723SpeciesFor(sample.dopant.symbol, sample.counterDensity, sample.temperature);
    return f723Resistivity(species, sample.density);
  }
  if (code === F723_ANCHORED_CODE) {
    const value = anchoredResistivity(sample, 'forward');
    checkedConductivity(1 / value, sample);
    return value;
  }
  return 1 / conductivity(sample, code);
}

/** How the drift current depends on the field: with velocity saturation (default) or Ohm's law. */
export const FIELD_DEPENDENCE_CODES = ['saturating', 'ohmic'] as const;

/** A field-dependence code. */
export type FieldDependence = (typeof FIELD_DEPENDENCE_CODES)[number];

/**
 * Drift current density in a uniform field.
 *
 * - 'saturating' (default): J = q(n·v_n(E) + p·v_p(E)) with Caughey–Thomas
 *   velocities (highField/currentDensity.ts); equal to σ·E as E → 0.
 * - 'ohmic': J = σ·E (Ohm's law; no velocity saturation), any resistivity
 *   model including 'astm-f723'.
 *
 * @param field - electric field E, V/cm (sign gives the direction)
 * @param sample - the sample
 * @param model - resistivity model code (blank: the material's default resistivity model); for
 *   'saturating' a mobility model or 'f723-anchored' (the physics model's free-carrier
 *   mobilities divided by its factor k), not 'astm-f723'
 * @param fieldDependence - 'saturating' (default) or 'ohmic'
 * @returns J in A/cm²
 * @example currentDensity(100, phosphorus1e16At300K) // ≈ 185.1 A/cm² (σE ≈ 186.3: saturation lowers it by 0.6 %)
 */
export function currentDensity(field: number, sample: Sample, model?: string, fieldDependence: FieldDependence = 'saturating'): number {
  if (fieldDependence === 'ohmic') return conductivity(sample, model) * field;
  const code = resolveResistivityModel(model, sample.material);
  if (code === F723_ANCHORED_CODE) {
    // σ_anchored = σ_phys / k: the free-carrier mobilities of the physics model divided by k,
    // so J → σ_anchored·E at low field and still saturates at q(n·v_sat,n + p·v_sat,p).
    const k = anchorFactor(sample, 'forward', physicsResistivity);
    return saturatedCurrentDensity(field, sample, defaultMobilityModel(sample.material), 1 / k);
  }
  if (code === ASTM_F723_CODE) {
    throw new PhysicsDomainError(
      `'astm-f723' converts resistivity and dopant density only and has no carrier mobilities, so it cannot give ` +
        `saturated drift velocities; use a mobility model or the ohmic form J = σE`,
    );
  }
  return saturatedCurrentDensity(field, sample, code);
}
