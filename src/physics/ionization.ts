/**
 * Incomplete ionization of dopants with the Mott transition, after
 * P. P. Altermatt, A. Schenk, G. Heiser, J. Appl. Phys. 100, 113714 (2006) and
 * P. P. Altermatt, A. Schenk, B. Schmithüsen, G. Heiser, J. Appl. Phys. 100,
 * 113715 (2006) (the simplified form for device simulation; from memory):
 *
 *   ΔE(N) = ΔE0 / (1 + (N/Nref)^c)     level approaches the band as N grows
 *   b(N)  = 1 / (1 + (N/Nb)^d)         fraction of dopant states still localised
 *   N⁺/N  = (1 − b) + b·(1 − f)        the rest (1 − b) is always ionised
 *
 * with f the occupancy of the level (statistics module). N is the density of
 * the dopant species itself (the papers fitted single-species samples; a
 * compensating species does not change ΔE or b: assumption).
 *
 * The occupancy needs the Fermi level relative to the edge of the band the
 * dopant gives its carrier to: ηc = (Ef − Ec)/kT for donors, ηv = (Ev − Ef)/kT
 * for acceptors. Then the level lies x = −η_band − ΔE/kT above the carrier
 * Fermi level.
 */

import { thermalVoltage } from './constants';
import { PhysicsDomainError } from './errors';
import type { Dopant } from './materials/types';
import { levelOccupancy } from './bands/statistics';

/** Code of the ionization model, for the model registry. */
export const IONIZATION_MODEL_CODE = 'altermatt-2006';

/** Refuses a dopant density that is not a finite number ≥ 0 (cm⁻³), naming the value. */
export function checkDopantDensity(density: number): void {
  if (!Number.isFinite(density) || density < 0) {
    throw new PhysicsDomainError(`dopant density ${density} cm⁻³ is not allowed: it must be a finite number >= 0`);
  }
}

/**
 * Ionization energy of a dopant at density N, ΔE(N) = ΔE0/(1 + (N/Nref)^c).
 *
 * @param dopant dopant with its Altermatt parameters
 * @param density density of that dopant, cm⁻³
 * @returns ΔE in eV (distance of the level from its band edge)
 * @example dopantIonizationEnergy(phosphorus, 1e15) // ≈ 0.0455 eV
 */
export function dopantIonizationEnergy(dopant: Dopant, density: number): number {
  checkDopantDensity(density);
  const p = dopant.ionization;
  return p.isolatedEnergy / (1 + Math.pow(density / p.referenceDensity, p.screeningExponent));
}

/** Localised fraction b and its complement 1 − b, both without cancellation. */
export interface LocalizedSplit {
  /** b(N): fraction of dopant states that can hold a carrier. */
  readonly localized: number;
  /** 1 − b(N): fraction merged with the band, always ionised. */
  readonly delocalized: number;
}

/**
 * Fraction of dopant states still localised at density N, b(N) = 1/(1 + (N/Nb)^d).
 *
 * @param dopant dopant with its Altermatt parameters
 * @param density density of that dopant, cm⁻³
 * @returns b and 1 − b
 * @example localizedFraction(phosphorus, 6e18).localized // → 0.5
 */
export function localizedFraction(dopant: Dopant, density: number): LocalizedSplit {
  checkDopantDensity(density);
  const p = dopant.ionization;
  const r = Math.pow(density / p.localizationDensity, p.localizationExponent);
  return { localized: 1 / (1 + r), delocalized: r / (1 + r) };
}

/** Ionised and neutral fractions of one dopant; they add up to 1. */
export interface IonizationState {
  readonly ionized: number;
  readonly neutral: number;
}

/**
 * Ionised fraction of a dopant for a given Fermi level.
 *
 * @param dopant the dopant species
 * @param density its density, cm⁻³
 * @param temperature K (finite, > 0)
 * @param bandFermiLevel reduced Fermi level of the dopant's carrier relative to
 *   its band edge: (Ef − Ec)/kT for donors, (Ev − Ef)/kT for acceptors
 * @returns ionised and neutral fractions (each accurate even when tiny)
 * @example ionizationState(phosphorus, 1e16, 300, -7.96).ionized // ≈ 0.996
 */
export function ionizationState(dopant: Dopant, density: number, temperature: number, bandFermiLevel: number): IonizationState {
  return preparedIonizationState(prepareIonization(dopant, density, temperature), bandFermiLevel);
}

/** The parts of ionizationState that do not depend on the Fermi level. */
export interface PreparedIonization {
  /** ΔE(N)/kT, the level's depth below its band edge in units of kT. */
  readonly levelDepth: number;
  readonly degeneracy: number;
  /** b(N) and 1 − b(N), as localizedFraction gives them. */
  readonly localized: number;
  readonly delocalized: number;
}

/**
 * Computes once what ionizationState needs besides the Fermi level, so that a
 * solver trying many Fermi levels does not repeat the density-dependent
 * powers at every step. preparedIonizationState(prepareIonization(d, N, T), η)
 * equals ionizationState(d, N, T, η) exactly (same operations, same order).
 *
 * @param dopant the dopant species
 * @param density its density, cm⁻³
 * @param temperature K (finite, > 0)
 * @returns level depth in kT, degeneracy, localised and delocalised fractions
 * @example preparedIonizationState(prepareIonization(phosphorus, 1e16, 300), -7.96).ionized // ≈ 0.996
 */
export function prepareIonization(dopant: Dopant, density: number, temperature: number): PreparedIonization {
  const kT = thermalVoltage(temperature);
  const levelDepth = dopantIonizationEnergy(dopant, density) / kT;
  const split = localizedFraction(dopant, density);
  return { levelDepth, degeneracy: dopant.degeneracy, localized: split.localized, delocalized: split.delocalized };
}

/**
 * Ionised and neutral fractions from prepared parts and a Fermi level.
 *
 * @param prepared from prepareIonization
 * @param bandFermiLevel as for ionizationState
 * @returns ionised and neutral fractions
 * @example preparedIonizationState(prepareIonization(phosphorus, 1e16, 300), -7.96).neutral // ≈ 0.004
 */
export function preparedIonizationState(prepared: PreparedIonization, bandFermiLevel: number): IonizationState {
  const occupancy = levelOccupancy(-bandFermiLevel - prepared.levelDepth, prepared.degeneracy);
  return {
    ionized: prepared.delocalized + prepared.localized * occupancy.empty,
    neutral: prepared.localized * occupancy.occupied,
  };
}
