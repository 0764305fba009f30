/**
 * Band gap of the host material versus temperature.
 */

import type { Material } from '../materials/types';
import { checkTemperature } from '../materials/temperature';

/**
 * Band gap Eg(T) from the material's Varshni-form fit
 * (silicon: Thurmond, J. Electrochem. Soc. 122, 1133 (1975)).
 *
 * @param material host material (e.g. SILICON)
 * @param temperature K, inside the material's temperature domain
 * @returns Eg in eV
 * @throws PhysicsDomainError for a temperature outside the domain
 * @example bandgap(SILICON, 300) // ≈ 1.1245 eV
 */
export function bandgap(material: Material, temperature: number): number {
  checkTemperature(material, temperature);
  const { gapAtZero, alpha, beta } = material.bandgap;
  return gapAtZero - (alpha * temperature * temperature) / (temperature + beta);
}
