/**
 * Thermal-equilibrium carrier densities from charge neutrality,
 *
 *   p + Σ Nd⁺ = n + Σ Na⁻,
 *
 * with Fermi–Dirac free carriers by default (bands/statistics.ts; Boltzmann on
 * request), dopant ionization after Altermatt et al. (2006) (ionization.ts),
 * donors and acceptors together. Freeze-out, compensation, degeneracy and
 * intrinsic conduction all come out of this one equation; there are no
 * special cases.
 *
 * Unknown: η = (Ef − Ei)/kT. F(η) = p − n + ΣNd⁺ − ΣNa⁻ decreases strictly
 * with η (n and Na⁻ grow, p and Nd⁺ shrink), so the root is unique.
 * To keep F accurate to rounding in every regime, each dopant's charge is
 * written from whichever fraction is small: a mostly ionised species adds
 * ±(N − N·neutral), the exact N going into a separate sum, so heavy
 * compensation (Nd = Na = 1e22) cancels exactly; a mostly neutral one adds
 * ±N·ionised directly, so deep freeze-out keeps its tiny ionised density.
 *
 * Bracket. Write nB(η) = ni·e^η and pB(η) = ni·e^{−η} for the Boltzmann
 * densities. At ηB = asinh(ΣNd/2ni), nB(ηB) − pB(ηB) = ΣNd. Any statistics
 * the solver accepts (CarrierStatistics contract) has p ≤ pB and
 * n ≥ Nc·L(ηc), L(x) = max(e^x/(1 + e^x), (4/(3√π))·x^{3/2} for x > 0). So
 * an upper end ηU ≥ ηB with Nc·L(ηU − Ec/kT) ≥ nB(ηB), i.e. L(xU) ≥ e^{xB}
 * (xB = ηB − (Ec − Ei)/kT), gives
 *   F(ηU) ≤ pB(ηU) − n(ηU) + ΣNd ≤ pB(ηB) − nB(ηB) + ΣNd = 0.
 * L(x) ≥ e^{xB} holds for x ≥ xB − ln(1 − e^{xB}) (first form, when xB < 0)
 * and for x ≥ ((3√π/4)·e^{xB})^{2/3} (second form); we take the smaller. For
 * non-degenerate doping (xB ≪ 0) this is ηB + e^{xB}, the Boltzmann bracket;
 * for degenerate doping it grows like the true root, ∝ (ΣNd/Nc)^{2/3}. The
 * lower end follows the same way with holes, acceptors and the valence band.
 * F ≥ 0 at the lower end and ≤ 0 at the upper one for any densities and
 * temperature; the ends are widened by a small margin so rounding cannot flip
 * those signs. findRoot (Brent with forced bisection) then terminates within
 * about 4·log2(width/tolerance) steps.
 */

import { thermalVoltage } from './constants';
import { PhysicsDomainError } from './errors';
import { bandEdges, type BandEdges } from './bands/bandEdges';
import { DEFAULT_CARRIER_STATISTICS, type CarrierStatistics } from './bands/statistics';
import { GAMMA_FIVE_HALVES } from './bands/fermiDirac';
import type { Dopant, Material } from './materials/types';
import { checkTemperature } from './materials/temperature';
import { ionizationState, prepareIonization, preparedIonizationState, type IonizationState, type PreparedIonization } from './ionization';
import { findRoot } from './solve';
import { memoize } from './memo';

/** One dopant species and its total (chemical) density. */
export interface DopantDensity {
  readonly dopant: Dopant;
  /** cm⁻³, ≥ 0 */
  readonly density: number;
}

export interface Equilibrium {
  /** n, cm⁻³ */
  readonly electrons: number;
  /** p, cm⁻³ */
  readonly holes: number;
  /** Σ Nd⁺, cm⁻³ */
  readonly ionizedDonors: number;
  /** Σ Na⁻, cm⁻³ */
  readonly ionizedAcceptors: number;
  /** Ef − Ei, eV (Ei of the selected ni model) */
  readonly fermiLevel: number;
  /** Root-finder iterations used */
  readonly iterations: number;
}

/** Margin added to each bracket end, in units of kT (see module note). */
const BRACKET_MARGIN = 1e-6;
/** Absolute tolerance on η; with the solver's 2ε|η| term, n and p are exact to ~1e-13. */
const ETA_TOLERANCE = 1e-15;

/** 3√π/4 = Γ(5/2), the inverse of the leading Sommerfeld coefficient 4/(3√π) of F½ (module note). */
const INVERSE_SOMMERFELD_COEFFICIENT = GAMMA_FIVE_HALVES;

/**
 * The smallest reduced band Fermi level x the module note proves sufficient
 * for L(x) ≥ e^{xB}: the smaller of xB − ln(1 − e^{xB}) (when xB < 0) and
 * ((3√π/4)·e^{xB})^{2/3}, never below xB.
 */
function sufficientBandFermiLevel(boltzmannLevel: number): number {
  const fromSommerfeld = Math.exp((2 / 3) * (Math.log(INVERSE_SOMMERFELD_COEFFICIENT) + boltzmannLevel));
  const fromLogistic = boltzmannLevel < 0 ? boltzmannLevel - Math.log1p(-Math.exp(boltzmannLevel)) : Infinity;
  return Math.max(boltzmannLevel, Math.min(fromLogistic, fromSommerfeld));
}

/**
 * asinh(N / (2·ni)) for N ≥ 0 from ln ni, without overflow when ni is tiny.
 */
function asinhHalfRatio(density: number, logNi: number): number {
  if (density === 0) return 0;
  const logRatio = Math.log(density) - Math.LN2 - logNi; // ln(N / 2ni)
  // asinh(x) = ln(2x) + 1/(4x²) − …; beyond x = e^20 the correction is < 1e-17.
  if (logRatio > 20) return logRatio + Math.LN2;
  return Math.asinh(Math.exp(logRatio));
}

/** Reduced Fermi level of the dopant's carrier relative to its band edge. */
function bandFermiLevel(dopant: Dopant, edges: BandEdges, eta: number): number {
  return dopant.kind === 'donor' ? eta - edges.conductionEdge : -eta - edges.valenceEdge;
}

function checkDopants(material: Material, dopants: readonly DopantDensity[]): void {
  let total = 0;
  for (const entry of dopants) {
    const { dopant, density } = entry;
    if (!dopant || (dopant.kind !== 'donor' && dopant.kind !== 'acceptor')) {
      throw new PhysicsDomainError('each dopant entry needs a dopant of kind donor or acceptor');
    }
    if (!Number.isFinite(density) || density < 0) {
      throw new PhysicsDomainError(`${dopant.name} density ${density} cm⁻³ is not allowed: it must be a finite number >= 0`);
    }
    total += density;
  }
  if (total > material.atomicDensity) {
    throw new PhysicsDomainError(
      `total dopant density ${total.toExponential(3)} cm⁻³ exceeds the atomic density of ${material.name}, ` +
        `${material.atomicDensity.toExponential(3)} cm⁻³`,
    );
  }
}

/**
 * Solves charge neutrality for the equilibrium Fermi level and carrier densities.
 *
 * @param material host material
 * @param temperature K, inside the material's temperature domain
 * @param dopants dopant species with total densities (cm⁻³); empty = intrinsic
 * @param intrinsicModel ni model code (default: the material's first); the band
 *   edges are placed so that n·p = ni² for it wherever carriers are non-degenerate
 * @param statistics free-carrier statistics (default Fermi–Dirac; BOLTZMANN_STATISTICS
 *   gives n·p = ni² exactly at any doping)
 * @returns n, p, ionised donors and acceptors (cm⁻³), Ef − Ei (eV), iterations
 * @throws PhysicsDomainError for bad densities, unknown model, temperature outside the domain
 * @example solveEquilibrium(SILICON, 300, [{ dopant: resolveDopant(SILICON, 'P'), density: 1e16 }]).electrons // ≈ 9.96e15
 */
export function solveEquilibrium(
  material: Material,
  temperature: number,
  dopants: readonly DopantDensity[],
  intrinsicModel?: string,
  statistics: CarrierStatistics = DEFAULT_CARRIER_STATISTICS,
): Equilibrium {
  const pairs: (Dopant | number)[] = [];
  for (const { dopant, density } of dopants) pairs.push(dopant, density);
  return { ...solution(material, temperature, intrinsicModel, statistics, ...pairs) };
}

/**
 * Solutions by problem: material, temperature, ni model, statistics, then
 * each dopant followed by its density (memo.ts, the core's one memo policy).
 * A conductivity at 300 K asks for the same solve twice in a row (the
 * carriers, then the mobility fits' full-ionization reference at 300 K), and
 * the carrier and ionization functions of a sheet ask again for the samples
 * of its other columns. Callers get a copy, so the remembered solution
 * cannot be changed.
 */
const solution = memoize(
  1024,
  (
    material: Material,
    temperature: number,
    intrinsicModel: string | undefined,
    statistics: CarrierStatistics,
    ...pairs: (Dopant | number)[]
  ): Equilibrium => {
    const dopants: DopantDensity[] = [];
    for (let i = 0; i < pairs.length; i += 2) dopants.push({ dopant: pairs[i] as Dopant, density: pairs[i + 1] as number });
    return solveNeutrality(material, temperature, dopants, intrinsicModel, statistics);
  },
);

function solveNeutrality(
  material: Material,
  temperature: number,
  dopants: readonly DopantDensity[],
  intrinsicModel: string | undefined,
  statistics: CarrierStatistics,
): Equilibrium {
  checkTemperature(material, temperature);
  checkDopants(material, dopants);
  const edges = bandEdges(material, temperature, intrinsicModel);

  let totalDonors = 0;
  let totalAcceptors = 0;
  for (const { dopant, density } of dopants) {
    if (dopant.kind === 'donor') totalDonors += density;
    else totalAcceptors += density;
  }
  const active = dopants.filter((entry) => entry.density > 0);
  // The density-dependent parts of each species' ionization, computed once per solve, not once per step.
  const prepared = new Map<DopantDensity, PreparedIonization>(
    active.map((entry) => [entry, prepareIonization(entry.dopant, entry.density, temperature)]),
  );

  const state = (entry: DopantDensity, eta: number): IonizationState =>
    preparedIonizationState(prepared.get(entry) as PreparedIonization, bandFermiLevel(entry.dopant, edges, eta));

  const charge = (eta: number): number => {
    let fullyIonized = 0; // ±N of mostly ionised species: exact, cancels exactly under compensation
    let remainder = 0; // small, accurately known parts
    for (const entry of active) {
      const sign = entry.dopant.kind === 'donor' ? 1 : -1;
      const { ionized, neutral } = state(entry, eta);
      if (ionized >= 0.5) {
        fullyIonized += sign * entry.density;
        remainder -= sign * entry.density * neutral;
      } else {
        remainder += sign * entry.density * ionized;
      }
    }
    const carriers = statistics.holeDensity(edges, eta) - statistics.electronDensity(edges, eta);
    return fullyIonized + carriers + remainder;
  };

  // Boltzmann ends, then widened for statistics below Boltzmann (module note).
  const boltzmannUpper = asinhHalfRatio(totalDonors, edges.logIntrinsicDensity);
  const boltzmannLower = -asinhHalfRatio(totalAcceptors, edges.logIntrinsicDensity);
  const upper = Math.max(boltzmannUpper, sufficientBandFermiLevel(boltzmannUpper - edges.conductionEdge) + edges.conductionEdge);
  const lower = Math.min(boltzmannLower, -(sufficientBandFermiLevel(-boltzmannLower - edges.valenceEdge) + edges.valenceEdge));
  const { root, iterations } = findRoot(
    charge,
    lower - BRACKET_MARGIN * (1 + Math.abs(lower)),
    upper + BRACKET_MARGIN * (1 + Math.abs(upper)),
    { xTolerance: ETA_TOLERANCE },
  );

  let ionizedDonors = 0;
  let ionizedAcceptors = 0;
  for (const entry of active) {
    const ionized = entry.density * state(entry, root).ionized;
    if (entry.dopant.kind === 'donor') ionizedDonors += ionized;
    else ionizedAcceptors += ionized;
  }
  return {
    electrons: statistics.electronDensity(edges, root),
    holes: statistics.holeDensity(edges, root),
    ionizedDonors,
    ionizedAcceptors,
    fermiLevel: root * thermalVoltage(temperature),
    iterations,
  };
}

/**
 * Fraction of one dopant ionised in equilibrium, given the Fermi level from
 * solveEquilibrium (the same expression the solver uses).
 *
 * @param material host material
 * @param temperature K, inside the material's temperature domain
 * @param dopant the dopant species
 * @param density its total density, cm⁻³ (sets ΔE(N) and b(N))
 * @param fermiLevel Ef − Ei in eV
 * @param intrinsicModel ni model code used for the Fermi level (default: the material's first)
 * @returns ionised fraction, 0–1
 * @example
 * const { fermiLevel } = solveEquilibrium(SILICON, 300, [{ dopant: phosphorus, density: 1e16 }]);
 * ionizedFraction(SILICON, 300, phosphorus, 1e16, fermiLevel) // ≈ 0.996
 */
export function ionizedFraction(
  material: Material,
  temperature: number,
  dopant: Dopant,
  density: number,
  fermiLevel: number,
  intrinsicModel?: string,
): number {
  checkTemperature(material, temperature);
  if (!Number.isFinite(fermiLevel)) {
    throw new PhysicsDomainError(`Fermi level ${fermiLevel} eV is not allowed: it must be a finite number`);
  }
  const edges = bandEdges(material, temperature, intrinsicModel);
  const eta = fermiLevel / thermalVoltage(temperature);
  return ionizationState(dopant, density, temperature, bandFermiLevel(dopant, edges, eta)).ionized;
}
