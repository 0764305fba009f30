/**
 * The correction that keeps the mobility fits honest next to incomplete
 * ionization (why it is needed and what it guarantees: docs/physics.md,
 * "Ionization and the fitted mobilities").
 *
 * Masetti, Arora and Caughey–Thomas fitted conductivity mobility against the
 * *total* dopant density at room temperature, i.e. they computed μ from
 * σ = q·N·μ assuming every dopant is ionized. Our equilibrium solver ionizes
 * dopants incompletely, so σ = q·n·μ_fit would count the un-ionized fraction
 * twice (once in n, once inside μ_fit). The majority carrier's mobility per
 * free carrier (freeCarrierMobility, DRIFT.FREEMOBILITY, and what conductivity
 * uses) is therefore
 *
 *   μ = μ_fit(N, T) · N_net / n_eq(300 K)
 *
 * with n_eq the equilibrium majority density at the fits' reference
 * temperature, from the same solver. At 300 K σ then equals q·N_net·μ_fit (so
 * ρ agrees with ASTM F723 and Irvin as well as the fits do); at other
 * temperatures freeze-out enters through n(T)/n(300 K). Minority carriers keep
 * μ_fit unchanged. DRIFT.MOBILITY returns μ_fit itself (the model as published).
 *
 * Implemented form. With m and m' the 300 K majority and minority densities
 * and s = max(0, (m − m')/(m + m')) the extrinsic fraction,
 *
 *   factor = 1 − s² + s · N_net/(m + m')
 *
 * For an extrinsic reference (m ≫ m', every doping the fits describe) s → 1
 * and factor → N_net/m, the formula above; the difference is of order
 * m'/m = ni²/N² (below 1e-6 for N ≥ 1e13 cm⁻³). When the 300 K reference is
 * intrinsic (N_net ≲ ni, including near-exact compensation) s → 0 and the
 * factor goes smoothly to 1: free carriers are then ~ni, the fits'
 * full-ionization assumption has nothing to correct, and the literal N_net/n
 * would give nonsense (N_net/ni ≪ 1 for light doping; a singular or negative
 * ratio near exact compensation, where the neutral dopants of the two species
 * can outweigh N_net). The factor is continuous, positive and bounded for
 * every sample.
 *
 * Scope: the silicon fits only. The Ge, GaAs and 4H-SiC fits (materialFits.ts)
 * were made against measured free-carrier mobilities, so transport uses them
 * without this factor; the factor itself is defined, and computed by the same
 * 300 K solve, for every material.
 */
import type { Carrier, Sample } from '../sample';
import { sampleDopants, suppliedCarrier, otherCarrier } from '../sample';
import { solveEquilibrium } from '../equilibrium';
import type { Dopant, Material } from '../materials/types';
import { memoize } from '../memo';

/** Temperature at which the mobility fits were made and the correction is referenced, K. */
export const FIT_REFERENCE_TEMPERATURE = 300;

/**
 * Which carrier type the net doping supplies: the named dopant's carrier when
 * density > counterDensity, the other type when counter-doping outweighs it,
 * undefined when exactly compensated (and for an undoped sample).
 *
 * @param sample - the sample
 * @returns 'electron', 'hole' or undefined
 * @example netMajorityCarrier(phosphorus1e16CounterDoped2e16At300K) // → 'hole'
 */
export function netMajorityCarrier(sample: Sample): Carrier | undefined {
  if (sample.density > sample.counterDensity) return suppliedCarrier(sample.dopant);
  if (sample.counterDensity > sample.density) return otherCarrier(suppliedCarrier(sample.dopant));
  return undefined;
}

/**
 * The factor (≈ N_net / n_eq at 300 K) that turns the fitted mobility into the
 * majority-carrier drift mobility; see the module comment for the exact form.
 *
 * @param sample - the sample (its temperature is not used: the factor is taken at 300 K)
 * @returns dimensionless factor: ≈ 1/(ionized fraction at 300 K) for extrinsic samples
 *   (≥ 1, up to about 1.3 near 1e18 cm⁻³), → 1 for samples intrinsic at 300 K, exactly 1
 *   for undoped or exactly compensated samples
 * @example fullIonizationCorrection(phosphorus1e18At300K) // ≈ 1.24
 */
export function fullIonizationCorrection(sample: Sample): number {
  const majority = netMajorityCarrier(sample);
  if (majority === undefined) return 1;
  return correctionFor(sample.material, sample.dopant, sample.density, sample.counterDensity, majority);
}

/**
 * The factor by the inputs it depends on. It does not depend on the sample's
 * temperature but costs a neutrality solve at 300 K, and a doping ×
 * temperature grid or a column of repeated dopings asks for the same factor
 * many times, so it is remembered (memo.ts, the core's one memo policy).
 */
const correctionFor = memoize(
  4096,
  (material: Material, dopant: Dopant, density: number, counterDensity: number, majority: Carrier): number =>
    computeCorrection({ material, dopant, density, counterDensity, temperature: FIT_REFERENCE_TEMPERATURE }, majority),
);

/** The factor itself, from a 300 K neutrality solve (see the module comment). */
function computeCorrection(sample: Sample, majority: Carrier): number {
  const netDoping = Math.abs(sample.density - sample.counterDensity);
  const reference = solveEquilibrium(
    sample.material,
    FIT_REFERENCE_TEMPERATURE,
    sampleDopants({ ...sample, temperature: FIT_REFERENCE_TEMPERATURE }),
  );
  const [majorityDensity, minorityDensity] =
    majority === 'electron' ? [reference.electrons, reference.holes] : [reference.holes, reference.electrons];
  const carriers = majorityDensity + minorityDensity;
  const extrinsic = Math.max(0, (majorityDensity - minorityDensity) / carriers);
  return 1 - extrinsic * extrinsic + (extrinsic * netDoping) / carriers;
}
