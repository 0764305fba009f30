/**
 * Carrier statistics (free carriers in the bands) and occupancy of localised
 * dopant levels, kept apart from the solver: Fermi–Dirac statistics (the
 * solver's default) and Boltzmann share one interface, and the equilibrium
 * and ionization code do not depend on which is used.
 *
 * Conventions: η = (Ef − Ei)/kT. For a band, the reduced carrier Fermi level
 * is ηc = (Ef − Ec)/kT for electrons and ηv = (Ev − Ef)/kT for holes
 * (both negative when non-degenerate).
 */

import type { BandEdges } from './bandEdges';
import { fermiDiracHalf, fermiDiracOverBoltzmann } from './fermiDirac';

/**
 * Free-carrier statistics: densities from the Fermi level.
 *
 * Contract the equilibrium solver's bracket relies on (equilibrium.ts): with
 * x the carrier's reduced Fermi level (ηc or ηv) and N its band's effective
 * density of states, the density is increasing in x and lies between
 * N·max(e^x/(1 + e^x), (4/(3√π))·x^{3/2} for x > 0) and N·e^x (the Boltzmann value).
 * Both statistics here satisfy it (proofs beside FERMI_DIRAC_STATISTICS).
 */
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

/**
 * A band's carrier density N·F½(x) at reduced Fermi level x = η − edge, in the
 * form that keeps the Boltzmann limit exact: for x ≤ 0 it is
 * exp(ln ni ± η)·(F½(x)/e^x), the Boltzmann density written as
 * BOLTZMANN_STATISTICS writes it times a ratio that is exactly 1 for x ≲ −38,
 * so non-degenerate results are those of Boltzmann statistics to rounding;
 * for x > 0 (degenerate) it is N·F½(x), which cannot overflow where e^x would.
 */
function fermiDiracDensity(logBoltzmannDensity: number, logBandDensity: number, x: number): number {
  if (x <= 0) return Math.exp(logBoltzmannDensity) * fermiDiracOverBoltzmann(0.5, x);
  return Math.exp(logBandDensity) * fermiDiracHalf(x);
}

/**
 * Fermi–Dirac statistics for parabolic bands: n = Nc·F½(ηc), p = Nv·F½(ηv),
 * F½ the normalised complete Fermi–Dirac integral (fermiDirac.ts; e.g.
 * S. M. Sze & K. K. Ng, Physics of Semiconductor Devices, 3rd ed., Wiley 2007,
 * ch. 1, from memory). Reduces to Boltzmann for η ≪ 0; lower than Boltzmann
 * by the factor F½(x)/e^x < 1 otherwise (≈ 1 − e^x/2^{3/2} for x ≪ 0, 0.77 at
 * x = 0), so n·p = ni²·(F½(ηc)/e^{ηc})·(F½(ηv)/e^{ηv}) ≤ ni².
 *
 * Bracket contract (CarrierStatistics): 1/(1 + e^{t−x}) ≤ e^{x−t} gives
 * F½(x) ≤ e^x; 1 + e^{t−x} ≤ e^{t−x}(1 + e^x) for t ≥ 0 gives F½(x) ≥ e^x/(1 + e^x);
 * and F½(x) ≥ (4/(3√π))·x^{3/2} for x > 0 because the Fermi function minus
 * the step θ(x − t) is odd about t = x while √t is increasing (the Sommerfeld
 * correction is positive).
 */
export const FERMI_DIRAC_STATISTICS: CarrierStatistics = {
  code: 'fermi-dirac',
  name: 'Fermi–Dirac statistics, n = Nc·F½(ηc), p = Nv·F½(ηv) (default)',
  electronDensity(edges: BandEdges, eta: number): number {
    return fermiDiracDensity(edges.logIntrinsicDensity + eta, edges.logConductionDensity, eta - edges.conductionEdge);
  },
  holeDensity(edges: BandEdges, eta: number): number {
    return fermiDiracDensity(edges.logIntrinsicDensity - eta, edges.logValenceDensity, -eta - edges.valenceEdge);
  },
};

/** The statistics the solver uses: Fermi–Dirac. */
export const DEFAULT_CARRIER_STATISTICS: CarrierStatistics = FERMI_DIRAC_STATISTICS;

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
 * @example levelOccupancy(0, 2).occupied // ≈ 0.6667 (2/3)
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
