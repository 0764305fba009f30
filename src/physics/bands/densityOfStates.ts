/**
 * Effective densities of states of the conduction and valence band edges.
 */

import type { Material, PowerLawDensity } from '../materials/types';
import { checkTemperature } from '../materials/temperature';

function logPowerLaw(law: PowerLawDensity, temperature: number): number {
  return Math.log(law.valueAtReference) + law.exponent * Math.log(temperature / law.referenceTemperature);
}

/**
 * ln Nc, for callers that work in logarithms to avoid under- and overflow.
 * @param material host material
 * @param temperature K, inside the material's temperature domain
 * @returns natural log of Nc in cm⁻³
 * @example Math.exp(logConductionBandDensity(SILICON, 300)) // ≈ 2.86e19
 */
export function logConductionBandDensity(material: Material, temperature: number): number {
  checkTemperature(material, temperature);
  return logPowerLaw(material.densityOfStates.conductionBand, temperature);
}

/**
 * ln Nv, for callers that work in logarithms.
 * @param material host material
 * @param temperature K, inside the material's temperature domain
 * @returns natural log of Nv in cm⁻³
 * @example Math.exp(logValenceBandDensity(SILICON, 300)) // ≈ 3.10e19
 */
export function logValenceBandDensity(material: Material, temperature: number): number {
  checkTemperature(material, temperature);
  return logPowerLaw(material.densityOfStates.valenceBand, temperature);
}

/**
 * Effective density of states of the conduction band, Nc(T)
 * (silicon: Green, J. Appl. Phys. 67, 2944 (1990)).
 *
 * @param material host material
 * @param temperature K, inside the material's temperature domain
 * @returns Nc in cm⁻³
 * @throws PhysicsDomainError for a temperature outside the domain
 * @example conductionBandDensity(SILICON, 300) // ≈ 2.86e19
 */
export function conductionBandDensity(material: Material, temperature: number): number {
  return Math.exp(logConductionBandDensity(material, temperature));
}

/**
 * Effective density of states of the valence band, Nv(T)
 * (silicon: Green, J. Appl. Phys. 67, 2944 (1990)).
 *
 * @param material host material
 * @param temperature K, inside the material's temperature domain
 * @returns Nv in cm⁻³
 * @throws PhysicsDomainError for a temperature outside the domain
 * @example valenceBandDensity(SILICON, 300) // ≈ 3.10e19
 */
export function valenceBandDensity(material: Material, temperature: number): number {
  return Math.exp(logValenceBandDensity(material, temperature));
}
