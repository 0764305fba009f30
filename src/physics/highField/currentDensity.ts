/**
 * Drift current density in a uniform field with velocity saturation,
 *
 *   J = q·(n·v_n(E) + p·v_p(E)),
 *
 * with n, p from the equilibrium solve and v_n, v_p the Caughey–Thomas law of
 * driftVelocity.ts evaluated at the free-carrier mobility μ0 of each carrier
 * (driftMobilities: the same model for both, as conductivity uses), so J → σ·E
 * as E → 0 and |J| → q(n·v_sat,n + p·v_sat,p) at high field. (DRIFT.VELOCITY
 * uses the published mobility; for the silicon fits' majority carriers the two
 * differ by the 300 K ionized-share factor.) Both carriers drift so that their
 * current follows E.
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
 * A carrier without a saturation velocity in this material (4H-SiC holes) or
 * at this temperature (Si holes below about 101 K) is left out only where
 * even its ohmic current p·μp·|E|, an upper bound of its saturated current,
 * is below double-precision resolution of the other carrier's: then leaving
 * it out cannot change J. Otherwise the missing data is reported.
 *
 * @param field - E, V/cm (sign gives the direction)
 * @param sample - the sample
 * @param model - mobility model code for μ0; '' or undefined is the material's default
 * @param mobilityScale - factor on both μ0 (f723-anchored's 1/k; 1 for a mobility model)
 * @returns J in A/cm²
 * @throws PhysicsDomainError where a saturation velocity needed for the result is not tabulated (material or temperature)
 * @example saturatedCurrentDensity(1e4, phosphorus1e16At300K) // ≈ 9.3e3 A/cm² (σE would be ≈ 1.9e4)
 */
export function saturatedCurrentDensity(field: number, sample: Sample, model = '', mobilityScale = 1): number {
  if (!Number.isFinite(field)) throw new PhysicsDomainError(`the field must be a finite number in V/cm; got ${field}`);
  const equilibrium = solveEquilibrium(sample.material, sample.temperature, sampleDopants(sample));
  const free = driftMobilities(model, sample);
  const mobilities = { electron: free.electron * mobilityScale, hole: free.hole * mobilityScale };
  const density: Record<Carrier, number> = { electron: equilibrium.electrons, hole: equilibrium.holes };
  const code = sample.material.code;

  /** n·v or p·v, or the reason the carrier has no saturation velocity here (no table, or not at this temperature). */
  const flux = (carrier: Carrier): number | { readonly unavailable: string } => {
    const missing = missingSaturationVelocity(code, carrier);
    if (missing !== undefined) return { unavailable: missing };
    try {
      return density[carrier] * velocityAtMobility(field, carrier, sample, mobilities[carrier]);
    } catch (error) {
      if (!(error instanceof PhysicsDomainError)) throw error;
      return { unavailable: error.message };
    }
  };

  const fluxes = { electron: flux('electron'), hole: flux('hole') };
  let total = 0;
  for (const carrier of ['electron', 'hole'] as const) {
    const own = fluxes[carrier];
    if (typeof own === 'number') {
      total += own;
      continue;
    }
    const other = fluxes[carrier === 'electron' ? 'hole' : 'electron'];
    const ohmicBound = density[carrier] * mobilities[carrier] * Math.abs(field);
    if (typeof other !== 'number') throw new PhysicsDomainError(`${own.unavailable}; use the ohmic form J = σE instead`);
    if (!(ohmicBound <= Number.EPSILON * Math.abs(other))) {
      throw new PhysicsDomainError(
        `${own.unavailable}; the ${carrier}s of this ${code} sample (${density[carrier]} cm⁻³) carry too large a share of the ` +
          `current to be left out; use the ohmic form J = σE instead`,
      );
    }
  }
  return ELEMENTARY_CHARGE * total;
}
