/**
 * How a sample becomes the densities of Klaassen's model (equations.ts):
 * N_D, N_A, n and p.
 *
 * - Dopants. N_D and N_A are the named dopant's and its counter-doping's
 *   total densities. Klaassen's parameters are species-independent apart from
 *   donor vs acceptor clustering; every donor (acceptor) uses the donor
 *   (acceptor) row. (Masetti's As row is lower: at 1e19–1e20 cm⁻³ klaassen's
 *   As-doped resistivity is 6–17 % below masetti's.)
 * - Carriers. Klaassen assumed full ionization when fitting (dopant
 *   densities, n = N_D in n-type at 300 K). n and p are the equilibrium
 *   densities at the sample's temperature, with the net-majority carrier's
 *   density multiplied by fullIonizationCorrection (≈ N_net/n_eq(300 K)) —
 *   the same factor freeCarrierMobility applies to that carrier's mobility
 *   (why: docs/physics.md, "Ionization and the fitted mobilities"). At 300 K
 *   the majority density is then N_net exactly as in Klaassen's fit, so
 *   σ = q·n·μ_drift = q·N_net·μ_Klaassen(N) reproduces the fitted resistivity
 *   as for the other silicon fits (DRIFT.MOBILITY returns μ_Klaassen itself);
 *   away from 300 K freeze-out (fewer screening carriers) and intrinsic
 *   carriers (electron–hole scattering) still enter.
 */
import type { Carrier, Sample } from '../../sample';
import { sampleDopants } from '../../sample';
import { solveEquilibrium } from '../../equilibrium';
import { fullIonizationCorrection, netMajorityCarrier } from '../fullIonizationCorrection';
import { klaassenMobility, type KlaassenDensities } from './equations';

/**
 * The densities Klaassen's model takes for a sample: N_D and N_A from the
 * named dopant and its counter-doping, n and p from the equilibrium at the
 * sample's temperature, the net-majority carrier's density multiplied by
 * fullIonizationCorrection (see the module comment: Klaassen fitted with full
 * ionization; this keeps ρ at 300 K on his fit).
 *
 * @param sample - the sample
 * @returns N_D, N_A, n, p in cm⁻³
 * @example klaassenSampleDensities(phosphorus1e18At300K) // → { donors: 1e18, acceptors: 0, electrons: ≈ 1e18, holes: ≈ 1e2 }
 */
export function klaassenSampleDensities(sample: Sample): KlaassenDensities {
  const equilibrium = solveEquilibrium(sample.material, sample.temperature, sampleDopants(sample));
  const majority = netMajorityCarrier(sample);
  const factor = majority === undefined ? 1 : fullIonizationCorrection(sample);
  const named = sample.dopant.kind === 'donor';
  return {
    donors: named ? sample.density : sample.counterDensity,
    acceptors: named ? sample.counterDensity : sample.density,
    electrons: equilibrium.electrons * (majority === 'electron' ? factor : 1),
    holes: equilibrium.holes * (majority === 'hole' ? factor : 1),
  };
}

/**
 * Klaassen's mobility for a carrier in a sample, as published (n = N_net for
 * the majority carrier at 300 K, see klaassenSampleDensities); freeCarrierMobility
 * then treats it like the other silicon fits.
 *
 * @param carrier - 'electron' or 'hole'
 * @param sample - a silicon sample
 * @returns μ in cm²/(V·s)
 * @example klaassenSampleMobility('electron', boron1e19At300K) // ≈ 211 (minority electrons)
 */
export function klaassenSampleMobility(carrier: Carrier, sample: Sample): number {
  return klaassenMobility(carrier, klaassenSampleDensities(sample), sample.temperature);
}
