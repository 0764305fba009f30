/**
 * Conductivity, resistivity and drift current density of a uniform sample.
 *
 * For the mobility models σ = q(n·μn + p·μp) with n, p from solveEquilibrium
 * (incomplete ionization, compensation, intrinsic carriers: no special cases)
 * and μn, μp the drift mobilities of mobility/index.ts. For 'astm-f723' the
 * standard's own B/P conversion is used (uncompensated, 290–305 K).
 */
import type { Sample } from './sample';
import { sampleDopants } from './sample';
import { solveEquilibrium } from './equilibrium';
import { ELEMENTARY_CHARGE } from './constants';
import { PhysicsDomainError } from './errors';
import { MOBILITY_MODEL_CODES, DEFAULT_MOBILITY_MODEL, driftMobilities } from './mobility';
import { f723Resistivity, f723SpeciesFor } from './astmF723';

/** Code of the ASTM F723 conversion in the resistivity model list. */
export const ASTM_F723_CODE = 'astm-f723';

/** Resistivity model codes: the mobility models, then 'astm-f723'. The first is the default. */
export const RESISTIVITY_MODEL_CODES: readonly string[] = [...MOBILITY_MODEL_CODES, ASTM_F723_CODE];

/**
 * Parses a resistivity model code, case-insensitively.
 *
 * @param code - e.g. 'ASTM-F723'; undefined or '' selects the default ('masetti')
 * @returns the normalized code
 * @throws PhysicsDomainError listing the allowed codes
 * @example resolveResistivityModel('ASTM-F723') // 'astm-f723'
 */
export function resolveResistivityModel(code?: string): string {
  if (code === undefined || code.trim() === '') return DEFAULT_MOBILITY_MODEL;
  const normalized = code.trim().toLowerCase();
  if (RESISTIVITY_MODEL_CODES.includes(normalized)) return normalized;
  throw new PhysicsDomainError(`unknown resistivity model '${code}'. Allowed: ${RESISTIVITY_MODEL_CODES.join(', ')}.`);
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

/**
 * Electrical conductivity σ = q(n·μn + p·μp).
 *
 * @param sample - the sample
 * @param model - resistivity model code (default 'masetti'; 'astm-f723' for B/P, uncompensated, 290–305 K)
 * @returns σ in S/cm
 * @throws PhysicsDomainError for an unknown model or a sample the model does not cover
 * @example conductivity(boron1e16At300K) // ≈ 0.68 S/cm
 */
export function conductivity(sample: Sample, model?: string): number {
  const code = resolveResistivityModel(model);
  if (code === ASTM_F723_CODE) {
    const species = f723SpeciesFor(sample.dopant.symbol, sample.counterDensity, sample.temperature);
    return checkedConductivity(1 / f723Resistivity(species, sample.density), sample);
  }
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
 * @param model - resistivity model code (default 'masetti')
 * @returns ρ in Ω·cm
 * @example resistivity(phosphorus1e16At300K) // ≈ 0.527 Ω·cm
 */
export function resistivity(sample: Sample, model?: string): number {
  const code = resolveResistivityModel(model);
  if (code === ASTM_F723_CODE) {
    // The standard gives ρ directly; returning it unchanged avoids a 1/(1/ρ) round-off.
    const species = f723SpeciesFor(sample.dopant.symbol, sample.counterDensity, sample.temperature);
    return f723Resistivity(species, sample.density);
  }
  return 1 / conductivity(sample, code);
}

/**
 * Drift current density J = σ·E in a uniform field (Ohm's law; no velocity
 * saturation).
 *
 * @param field - electric field E, V/cm (sign gives the direction)
 * @param sample - the sample
 * @param model - resistivity model code (default 'masetti')
 * @returns J in A/cm²
 * @example currentDensity(100, phosphorus1e16At300K) // ≈ 190 A/cm²
 */
export function currentDensity(field: number, sample: Sample, model?: string): number {
  return conductivity(sample, model) * field;
}
