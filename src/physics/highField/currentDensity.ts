/**
 * Drift current density in a uniform field with velocity saturation,
 *
 *   J = q·(n·v_n(E) + p·v_p(E)),
 *
 * with n, p from the equilibrium solve and v_n, v_p the Caughey–Thomas drift
 * velocities of driftVelocity.ts (same μ0 as DRIFT.MOBILITY, computed once for both carriers), so J → σ·E as
 * E → 0. Both carriers drift so that their current follows E.
 */
import type { Carrier, Sample } from '../sample';
import { sampleDopants } from '../sample';
import { solveEquilibrium } from '../equilibrium';
import { ELEMENTARY_CHARGE } from '../constants';
import { PhysicsDomainError } from '../errors';
import { driftMobilities } from '../mobility';
import { velocityAtMobility } from './driftVelocity';
import { missingSaturationVelocity } from './tables';

/**
 * Saturated-drift current density J = q(n·v_n + p·v_p).
 *
 * A carrier without any published saturation velocity (4H-SiC holes) is left
 * out only where even its ohmic current p·μp·|E|, an upper bound of its
 * saturated current, is below double-precision resolution of the other
 * carrier's: then leaving it out cannot change J. Otherwise the missing data
 * is reported.
 *
 * @param field - E, V/cm (sign gives the direction)
 * @param sample - the sample
 * @param model - mobility model code for μ0; '' or undefined is the material's default
 * @returns J in A/cm²
 * @throws PhysicsDomainError where a saturation velocity needed for the result is not tabulated
 * @example saturatedCurrentDensity(1e4, phosphorus1e16At300K) // ≈ 9.6e3 A/cm² (σE would be ≈ 1.9e4)
 */
export function saturatedCurrentDensity(field: number, sample: Sample, model = ''): number {
  if (!Number.isFinite(field)) throw new PhysicsDomainError(`the field must be a finite number in V/cm; got ${field}`);
  const equilibrium = solveEquilibrium(sample.material, sample.temperature, sampleDopants(sample));
  const mobilities = driftMobilities(model, sample);
  const density: Record<Carrier, number> = { electron: equilibrium.electrons, hole: equilibrium.holes };
  const code = sample.material.code;

  const flux = (carrier: Carrier): number => {
    try {
      return density[carrier] * velocityAtMobility(field, carrier, sample, mobilities[carrier]);
    } catch (error) {
      if (!(error instanceof PhysicsDomainError)) throw error;
      throw new PhysicsDomainError(`${error.message}; use the ohmic form J = σE instead`);
    }
  };

  const fluxes: Partial<Record<Carrier, number>> = {};
  const fluxOf = (carrier: Carrier): number => (fluxes[carrier] ??= flux(carrier));
  let total = 0;
  for (const carrier of ['electron', 'hole'] as const) {
    const missing = missingSaturationVelocity(code, carrier);
    if (missing === undefined) {
      total += fluxOf(carrier);
      continue;
    }
    const ohmicBound = density[carrier] * mobilities[carrier] * Math.abs(field);
    const other = fluxOf(carrier === 'electron' ? 'hole' : 'electron');
    if (!(ohmicBound <= Number.EPSILON * Math.abs(other))) {
      throw new PhysicsDomainError(
        `${missing}; the ${carrier}s of this ${code} sample (${density[carrier]} cm⁻³) carry too large a share of the ` +
          `current to be left out; use the ohmic form J = σE instead`,
      );
    }
  }
  return ELEMENTARY_CHARGE * total;
}
