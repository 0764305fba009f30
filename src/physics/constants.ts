/**
 * Physical constants used by the physics core, in SI units.
 *
 * q, k and h are exact by definition of the SI (2019 redefinition, BIPM SI
 * Brochure, 9th edition). The electron mass is a measured value (CODATA 2018
 * recommended value, relative standard uncertainty 3e-10): it is NOT exact.
 */

import { PhysicsDomainError } from './errors';

/** Elementary charge q in C (exact, SI 2019). */
export const ELEMENTARY_CHARGE = 1.602176634e-19;

/** Boltzmann constant k in J/K (exact, SI 2019). */
export const BOLTZMANN = 1.380649e-23;

/** Planck constant h in J·s (exact, SI 2019). */
export const PLANCK = 6.62607015e-34;

/** Electron rest mass m0 in kg (CODATA 2018; measured, not exact). */
export const ELECTRON_MASS = 9.1093837015e-31;

/**
 * Thermal voltage kT/q.
 *
 * @param temperature absolute temperature in K (finite, > 0)
 * @returns kT/q in V, numerically equal to kT in eV
 * @throws PhysicsDomainError if the temperature is not a finite positive number
 * @example thermalVoltage(300) // ≈ 0.0258520 V
 */
export function thermalVoltage(temperature: number): number {
  if (!Number.isFinite(temperature) || temperature <= 0) {
    throw new PhysicsDomainError(`temperature ${temperature} K is not allowed: it must be a finite number greater than 0 K`);
  }
  return (BOLTZMANN * temperature) / ELEMENTARY_CHARGE;
}
