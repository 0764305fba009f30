/**
 * Carrier statistics (free carriers in the bands) and occupancy of localised
 * dopant levels, kept apart from the solver so that Fermi–Dirac statistics can
 * later replace Boltzmann without touching the equilibrium or ionization code.
 *
 * Conventions: η = (Ef − Ei)/kT. For a band, the reduced carrier Fermi level
 * is ηc = (Ef − Ec)/kT for electrons and ηv = (Ev − Ef)/kT for holes
 * (both negative when non-degenerate).
 */

import type { BandEdges } from './bandEdges';

/** Free-carrier statistics: densities from the Fermi level. */
export interface CarrierStatistics {
  readonly code: string;
  readonly name: string;
  /** Electron density n in cm⁻³ at reduced Fermi level η = (Ef − Ei)/kT. */
  electronDensity(edges: BandEdges, eta: number): number;
  /** Hole density p in cm⁻³ at reduced Fermi level η = (Ef − Ei)/kT. */
  holeDensity(edges: BandEdges, eta: number): number;
}

/**
 * Boltzmann (non-degenerate) statistics: n = Nc·exp(ηc) = ni·exp(η) and
 * p = Nv·exp(ηv) = ni·exp(−η) (common practice, no source). Written with ln ni so
 * that n·p = ni² for the selected ni model to rounding, and neither
 * overflows nor underflows where the result is representable.
 */
export const BOLTZMANN_STATISTICS: CarrierStatistics = {
  code: 'boltzmann',
  name: 'Boltzmann (non-degenerate) statistics',
  electronDensity(edges: BandEdges, eta: number): number {
    return Math.exp(edges.logIntrinsicDensity + eta);
  },
  holeDensity(edges: BandEdges, eta: number): number {
    return Math.exp(edges.logIntrinsicDensity - eta);
  },
};

/** The statistics the solver uses now. */
export const DEFAULT_CARRIER_STATISTICS: CarrierStatistics = BOLTZMANN_STATISTICS;

/** Occupancy of a localised level by its carrier; both parts exact near 0 and 1. */
export interface LevelOccupancy {
  /** Probability that the level holds its carrier (dopant neutral). */
  readonly occupied: number;
  /** 1 − occupied, computed without cancellation (dopant ionised). */
  readonly empty: number;
}

/**
 * Occupancy of a dopant level with ground-state degeneracy g:
 * f = 1 / (1 + g⁻¹·exp(x)), x = (E_level − Ef)/kT in the carrier's own energy
 * sense (for acceptors, hole energies: x = (Ef − Ea)/kT). Common practice, no
 * source (e.g. Sze & Ng 2007, ch. 1, from memory).
 *
 * @param levelAboveFermi x, dimensionless (any real number, ±Infinity allowed)
 * @param degeneracy g > 0 (2 for donors, 4 for acceptors)
 * @returns occupied and empty probabilities, each accurate even when tiny
 * @example levelOccupancy(0, 2).occupied // 2/3
 */
export function levelOccupancy(levelAboveFermi: number, degeneracy: number): LevelOccupancy {
  const x = levelAboveFermi - Math.log(degeneracy);
  // Logistic split evaluated on the side where exp cannot overflow.
  if (x > 0) {
    const e = Math.exp(-x);
    return { occupied: e / (1 + e), empty: 1 / (1 + e) };
  }
  const e = Math.exp(x);
  return { occupied: 1 / (1 + e), empty: e / (1 + e) };
}
