/**
 * Doping window of a wafer certificate: the resistivity window [ρmin, ρmax]
 * mapped through the inverse of the transport model. Higher resistivity means
 * lighter doping, so the window comes out as [N(ρmax), N(ρmin)], low to high.
 */
import { PhysicsDomainError } from '../errors';
import { dopingForResistivity, type DensityWindow, type DensityWindowNames } from '../inverse';
import type { Sample } from '../sample';

/**
 * Dopant densities at the two ends of a resistivity window.
 *
 * @param resistivityMin - ρmin in Ω·cm, > 0
 * @param resistivityMax - ρmax in Ω·cm, ≥ ρmin
 * @param sample - material, temperature, dopant and counter-doping
 * @param model - resistivity model code (blank: the default)
 * @param window - optional density window, cm⁻³, picking one solution at each end where several densities give that ρ
 * @param names - how messages name the window's ends
 * @returns [N at ρmax, N at ρmin] in cm⁻³
 * @throws PhysicsDomainError (AmbiguousDopingError) as dopingForResistivity, for either end
 * @example dopingWindow(8, 12, boronAt300K) // ≈ [1.1e15, 1.7e15]
 */
export function dopingWindow(
  resistivityMin: number,
  resistivityMax: number,
  sample: Omit<Sample, 'density'>,
  model?: string,
  window?: DensityWindow,
  names?: DensityWindowNames,
): readonly [number, number] {
  if (resistivityMin > resistivityMax) {
    throw new PhysicsDomainError(
      `resistivity_min ${resistivityMin} Ω·cm is above resistivity_max ${resistivityMax} Ω·cm: give the window low end first`,
    );
  }
  return [
    dopingForResistivity(resistivityMax, sample, model, window, names).density,
    dopingForResistivity(resistivityMin, sample, model, window, names).density,
  ];
}
