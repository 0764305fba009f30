/**
 * Drift velocity of a carrier type in a uniform field: the Caughey–Thomas
 * form with the low-field mobility μ0 the named model publishes (the one
 * DRIFT.MOBILITY returns, a blank model choosing per carrier as there) and
 * the material's tabulated v_sat(T) and β(T). The current density
 * (currentDensity.ts) uses the free-carrier mobility instead, so that it
 * tends to σ·E. Combining a doping-dependent μ0 with v_sat and β
 * measured in pure material is common practice, no source.
 */
import type { Carrier, Sample } from '../sample';
import { mobility } from '../mobility';
import { caugheyThomasVelocity } from './caugheyThomasField';
import { highFieldParameters } from './saturationVelocity';

/**
 * Drift velocity v(E) = μ0·E / (1 + (μ0·|E|/v_sat)^β)^(1/β).
 *
 * @param field - E, V/cm (sign gives the direction)
 * @param carrier - 'electron' or 'hole'
 * @param sample - the sample (material, temperature, dopants)
 * @param model - mobility model code for μ0; '' or undefined is the carrier's default (mobility/index.ts defaultMobilityModelFor)
 * @returns v in cm/s, with the sign of E (carriers' charge sign not applied)
 * @throws PhysicsDomainError where the material has no saturation velocity for the carrier or temperature
 * @example driftVelocity(1e4, 'electron', phosphorus1e16At300K) // ≈ 5.8e6 cm/s
 */
export function driftVelocity(field: number, carrier: Carrier, sample: Sample, model = ''): number {
  return velocityAtMobility(field, carrier, sample, mobility(model, carrier, sample));
}

/**
 * The same law for a low-field mobility the caller already has (the current
 * density computes both carriers' μ0 at once).
 *
 * @param field - E, V/cm
 * @param carrier - 'electron' or 'hole'
 * @param sample - gives the material and temperature of v_sat and β
 * @param lowFieldMobility - μ0, cm²/(V·s)
 * @returns v in cm/s, with the sign of E
 * @throws PhysicsDomainError where the material has no saturation velocity for the carrier or temperature
 * @example velocityAtMobility(1e4, 'electron', phosphorus1e16At300K, 1180) // ≈ 5.8e6 cm/s
 */
export function velocityAtMobility(field: number, carrier: Carrier, sample: Sample, lowFieldMobility: number): number {
  const { saturationVelocity, fieldExponent } = highFieldParameters(sample.material.code, carrier, sample.temperature);
  return caugheyThomasVelocity(field, lowFieldMobility, saturationVelocity, fieldExponent);
}
