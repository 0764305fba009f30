/**
 * Guard for the temperatures a material's models may be evaluated at.
 */

import { PhysicsDomainError } from '../errors';
import type { Material } from './types';

/** Lowest temperature of every material's domain: below it the exponentials in ni and freeze-out leave the range of doubles. */
export const LOWEST_NUMERIC_TEMPERATURE = 1; // K

/**
 * Checks that a temperature lies in the material's temperature domain.
 *
 * @param material host material
 * @param temperature K
 * @returns the temperature, unchanged
 * @throws PhysicsDomainError naming the value and the allowed range
 * @example checkTemperature(SILICON, 300) // → 300
 */
export function checkTemperature(material: Material, temperature: number): number {
  const { min, max } = material.temperatureDomain;
  if (!Number.isFinite(temperature) || temperature < min || temperature > max) {
    throw new PhysicsDomainError(
      `temperature ${temperature} K is outside the range allowed for ${material.name}: ` +
        `${min}–${max} K (${material.temperatureDomain.reason})`,
    );
  }
  return temperature;
}
