/**
 * Complete Fermi–Dirac integrals of order j = 1/2 and j = −1/2, normalised
 * (the form of J. S. Blakemore, Solid-State Electron. 25, 1067 (1982), from memory):
 *
 *   F_j(η) = (1/Γ(j+1)) ∫₀^∞ x^j / (1 + exp(x − η)) dx,
 *
 * so that F_j(η) → e^η for η → −∞ and dF_j/dη = F_(j−1) (dF½/dη = F−½).
 *
 * Three methods, each with an error bound, switched where both are far below
 * the double-precision rounding level (so the switch shows no jump):
 *
 * 1. η ≤ −2: the alternating series F_j(η) = Σ_{k≥1} (−1)^{k+1} e^{kη}/k^{j+1}
 *    (expand 1/(1+e^{x−η}) in powers of e^{η−x}; common practice, no source).
 *    Its terms decrease strictly (η < 0, j + 1 > 0), so by Leibniz's rule the
 *    remainder is below the first omitted term; the loop stops when that term
 *    is below 2⁻⁵⁶ of the first. At most 21 terms at η = −2; one term (the
 *    Boltzmann value, exactly) below about η = −38.
 *
 * 2. −2 < η < 35: the trapezoidal rule on the whole line after x = t²,
 *      Γ(1/2)·F−½(η) = ∫ 1/(1 + e^{t²−η}) dt,  Γ(3/2)·F½(η) = ∫ t²/(1 + e^{t²−η}) dt
 *    (t over the real line). The integrands are analytic in the strip
 *    |Im t| < d, d = Im √(η + iπ), their nearest poles (t² = η ± iπ). For such
 *    integrands the trapezoidal error with step h is bounded by
 *    2M/(e^{2πa/h} − 1) on any narrower strip |Im t| ≤ a, M the integral of
 *    |f| along its edges (L. N. Trefethen & J. A. C. Weideman, "The
 *    exponentially convergent trapezoidal rule", SIAM Review 56, 385 (2014),
 *    Thm 5.1, from memory). We take a = d/2, where |1 + e^{t²−η}| stays of
 *    order 1 so M is a few times the integral itself, and h = 2πa/40: error
 *    ≈ e^{−40} ≈ 4e-18 relative. The sum stops at t² = η + 42, beyond which
 *    the integrand is below e^{−42}·t². 52 nodes at η = −2, 450 at η = 35.
 *    Since that costs up to 450 exponentials per call, the rule is not
 *    evaluated at every η: on each unit interval [m, m + 1] it is sampled once,
 *    on first use, at 19 Chebyshev points and replaced by the interpolating
 *    polynomial of degree 18 (chebyshev.ts). F_j(η) = −Li_{j+1}(−e^η) is
 *    analytic except on the cuts η = s ± iπ(2k+1), s ≥ 0, at least π from the
 *    real axis, so the Bernstein ellipse of a unit interval with ρ = 10 stays
 *    clear of them; there |F_j| is at most about e^{2.5} times its size on the
 *    interval, and the interpolation error is below 4M·ρ^{−18}/(ρ − 1) ≈ 5e-17
 *    relative (Trefethen 2013, Thm 8.2, from memory). Tests compare the table
 *    with the rule itself at 2,000 points.
 *
 * 3. η ≥ 35: the Sommerfeld expansion
 *      F_j(η) = η^{j+1}/Γ(j+2) · Σ_{k≥0} 2·t_{2k}·Γ(j+2)/Γ(j+2−2k)·η^{−2k} + cos(πj)·F_j(−η),
 *    t₀ = 1/2, t_{2k} = (1 − 2^{1−2k})·ζ(2k) (Dirichlet's eta at 2k) (J. McDougall &
 *    E. C. Stoner, Phil. Trans. R. Soc. A 237, 67 (1938); R. B. Dingle, Appl. Sci.
 *    Res. B 6, 225 (1957), from memory). cos(πj) = 0 for j = ±1/2, so only the
 *    (asymptotic) sum remains; truncated at its smallest term its error is of
 *    order e^{−η}: below 1e-17 relative at η = 35 (checked against mpmath, see
 *    tests/physics/reference/data/fermiDirac/generate.py). 18 terms at η = 35,
 *    3 at η = 1e4.
 *
 * Guaranteed range: relative error ≤ 1e-13 for η from −708 (below, e^η is
 * subnormal and loses digits) to 1e200; tested against mpmath from −700 to 1e4.
 * ±Infinity give 0 and Infinity; NaN gives NaN.
 */

import { chebyshevInterpolant, evaluateChebyshev, type ChebyshevSeries } from '../chebyshev';

/** Orders implemented: 1/2 (carrier densities) and −1/2 (its derivative, Einstein relation). */
export type FermiDiracOrder = 0.5 | -0.5;

/**
 * Below this η the second series term, e^η/2^{j+1} ≤ e^{−39} ≈ 1.2e-17, is under
 * SERIES_TOLERANCE (1.39e-17) for both orders: the series is its first term
 * and the ratio F_j/e^η is exactly 1 (the loop would stop there anyway; this
 * only skips the exponential).
 */
const BOLTZMANN_LIMIT = -39;
/** Upper end of the series region (method 1); the registry citation quotes it. */
export const SERIES_LIMIT = -2;
/** Lower end of the Sommerfeld region (method 3); the registry citation quotes it. */
export const SOMMERFELD_LIMIT = 35;
/** Relative size of the first omitted term at which a series stops (2⁻⁵⁶). */
const SERIES_TOLERANCE = 2 ** -56;
/** Terms the series needs at most at η = SERIES_LIMIT with SERIES_TOLERANCE (21), with room. */
const MAX_SERIES_TERMS = 24;
/** 2πa/h of the trapezoidal rule (method 2): the error is ≈ e^{−this}. */
const TRAPEZOID_EXPONENT = 40;
/** The trapezoidal sum stops where t² − η reaches this (integrand < e^{−this}·t²). */
const TRAPEZOID_CUTOFF = 42;
/** Sommerfeld terms available; 18 are needed at η = SOMMERFELD_LIMIT. */
const MAX_SOMMERFELD_TERMS = 24;

/**
 * Dirichlet's eta function at even arguments, η(2k) = (1 − 2^{1−2k})·ζ(2k),
 * k = 0 … MAX_SOMMERFELD_TERMS − 1 (η(0) = 1/2). Closed forms for k ≤ 4
 * (ζ(2) = π²/6, ζ(4) = π⁴/90, ζ(6) = π⁶/945, ζ(8) = π⁸/9450; common practice,
 * no source); for k ≥ 5 the alternating sum Σ (−1)^{n+1} n^{−2k}, whose 64
 * terms leave an error below 65^{−10} ≈ 7e-19.
 */
function dirichletEtaAtEvenArguments(): readonly number[] {
  const pi2 = Math.PI * Math.PI;
  const values = [0.5, pi2 / 12, (7 * pi2 * pi2) / 720, (31 * pi2 ** 3) / 30240, (127 * pi2 ** 4) / 1209600];
  for (let k = values.length; k < MAX_SOMMERFELD_TERMS; k++) {
    let sum = 0;
    for (let n = 64; n >= 1; n--) sum += (n % 2 === 1 ? 1 : -1) * Math.pow(n, -2 * k); // smallest first
    values.push(sum);
  }
  return values;
}

/** Constants of one order, computed once. */
interface OrderConstants {
  /** 1/k^{j+1}, index k − 1 (series). */
  readonly seriesWeights: readonly number[];
  /** 2·t_{2k}·Γ(j+2)/Γ(j+2−2k), index k (Sommerfeld). */
  readonly sommerfeldCoefficients: readonly number[];
  /** 1/Γ(j+2). */
  readonly inverseGammaNext: number;
}

const SQRT_PI = Math.sqrt(Math.PI);
/** Γ(3/2) = √π/2 and Γ(5/2) = 3√π/4. */
const GAMMA_THREE_HALVES = SQRT_PI / 2;
/** Γ(5/2); F½(η) → η^{3/2}/Γ(5/2) for η → ∞ (the leading Sommerfeld term). */
export const GAMMA_FIVE_HALVES = (3 * SQRT_PI) / 4;

/** η(2k), k = 0 … MAX_SOMMERFELD_TERMS − 1, shared by both orders. */
const DIRICHLET_ETA_EVEN = dirichletEtaAtEvenArguments();

function orderConstants(order: FermiDiracOrder): OrderConstants {
  const eta = DIRICHLET_ETA_EVEN;
  const seriesWeights: number[] = [];
  for (let k = 1; k <= MAX_SERIES_TERMS; k++) seriesWeights.push(Math.pow(k, -(order + 1)));
  const sommerfeldCoefficients: number[] = [];
  let ratio = 1; // Γ(j+2)/Γ(j+2−2k) = (j+1)·j·…·(j+2−2k)
  for (let k = 0; k < MAX_SOMMERFELD_TERMS; k++) {
    if (k > 0) ratio *= (order + 3 - 2 * k) * (order + 2 - 2 * k);
    sommerfeldCoefficients.push(2 * eta[k] * ratio);
  }
  const gammaNext = order === 0.5 ? GAMMA_FIVE_HALVES : GAMMA_THREE_HALVES;
  return { seriesWeights, sommerfeldCoefficients, inverseGammaNext: 1 / gammaNext };
}

const HALF = orderConstants(0.5);
const MINUS_HALF = orderConstants(-0.5);

/**
 * Σ_{k≥1} (−1)^{k+1} e^{(k−1)η}/k^{j+1} = F_j(η)·e^{−η} for η ≤ SERIES_LIMIT
 * (method 1, divided by its first term so that it is exactly 1 in the Boltzmann limit).
 */
function seriesOverBoltzmann(constants: OrderConstants, eta: number): number {
  if (eta < BOLTZMANN_LIMIT) return 1;
  const z = Math.exp(eta);
  const weights = constants.seriesWeights;
  let sum = weights[0];
  let power = 1;
  let sign = 1;
  for (let k = 1; k < MAX_SERIES_TERMS; k++) {
    power *= z;
    const term = power * weights[k];
    if (term < SERIES_TOLERANCE) break; // first omitted term below 2⁻⁵⁶ of the first (weights[0] = 1)
    sign = -sign;
    sum += sign * term;
  }
  return sum;
}

/** Both integrals of method 2 from one set of nodes. */
interface TrapezoidSums {
  readonly half: number;
  readonly minusHalf: number;
}

/** Method 2: trapezoidal rule on the real t line for −2 < η < 35. */
function trapezoid(eta: number): TrapezoidSums {
  // d = Im √(η + iπ) = π / √(2(|η + iπ| + η)), written without cancellation for η > 0.
  const modulus = Math.hypot(eta, Math.PI);
  const poleDistance = Math.PI / Math.sqrt(2 * (modulus + eta));
  const step = (2 * Math.PI * (poleDistance / 2)) / TRAPEZOID_EXPONENT;
  const tMax = Math.sqrt(eta + TRAPEZOID_CUTOFF);
  const nodes = Math.ceil(tMax / step);
  let sum0 = 0.5 / (1 + Math.exp(-eta)); // half the t = 0 node of the even integrand (t² term is 0 there)
  let sum2 = 0;
  for (let k = nodes; k >= 1; k--) {
    // smallest terms first
    const t = k * step;
    const t2 = t * t;
    const occupancy = 1 / (1 + Math.exp(t2 - eta));
    sum0 += occupancy;
    sum2 += t2 * occupancy;
  }
  // ∫ over the whole line = 2·h·(f(0)/2 + Σ_{k≥1} f(kh)) for an even integrand.
  return {
    minusHalf: (2 * step * sum0) / SQRT_PI,
    half: (2 * step * sum2) / GAMMA_THREE_HALVES,
  };
}

/** Degree of the Chebyshev interpolants that tabulate method 2 on unit intervals (module note). */
export const FERMI_DIRAC_TABLE_DEGREE = 18;
/** Unit intervals [m, m + 1] tabulated: m = SERIES_LIMIT … SOMMERFELD_LIMIT − 1. */
const TABLE_INTERVALS = SOMMERFELD_LIMIT - SERIES_LIMIT;

/** Interpolants of both orders on one unit interval. */
interface IntervalTable {
  readonly half: ChebyshevSeries;
  readonly minusHalf: ChebyshevSeries;
}

/** Built on first use, one interval at a time (about 5,000 exponentials each). */
const intervalTables: (IntervalTable | undefined)[] = new Array<IntervalTable | undefined>(TABLE_INTERVALS).fill(undefined);

function intervalTable(index: number): IntervalTable {
  const existing = intervalTables[index];
  if (existing !== undefined) return existing;
  const lower = SERIES_LIMIT + index;
  // One quadrature per node serves both orders.
  const sums = new Map<number, TrapezoidSums>();
  const sumsAt = (eta: number): TrapezoidSums => {
    let found = sums.get(eta);
    if (found === undefined) {
      found = trapezoid(eta);
      sums.set(eta, found);
    }
    return found;
  };
  const table: IntervalTable = {
    half: chebyshevInterpolant((eta) => sumsAt(eta).half, lower, lower + 1, FERMI_DIRAC_TABLE_DEGREE),
    minusHalf: chebyshevInterpolant((eta) => sumsAt(eta).minusHalf, lower, lower + 1, FERMI_DIRAC_TABLE_DEGREE),
  };
  intervalTables[index] = table;
  return table;
}

/** Method 2 as evaluated: the tabulated trapezoidal rule, for SERIES_LIMIT < η < SOMMERFELD_LIMIT. */
function tabulated(order: FermiDiracOrder, eta: number): number {
  const index = Math.min(TABLE_INTERVALS - 1, Math.max(0, Math.floor(eta) - SERIES_LIMIT));
  const table = intervalTable(index);
  return evaluateChebyshev(order === 0.5 ? table.half : table.minusHalf, eta);
}

/**
 * F_j(η) by method 2 itself (the trapezoidal rule, no table), for checking the
 * table; fermiDiracIntegral is the function to use.
 *
 * @param order j: 0.5 or -0.5
 * @param eta reduced Fermi level, −2 < η < 35 (the range where the module note bounds its error)
 * @returns F_j(η)
 * @example fermiDiracByQuadrature(0.5, 0) // ≈ 0.765147024625408
 */
export function fermiDiracByQuadrature(order: FermiDiracOrder, eta: number): number {
  constantsOf(order); // refuses an order other than ±1/2, as fermiDiracIntegral does
  const sums = trapezoid(eta);
  return order === 0.5 ? sums.half : sums.minusHalf;
}

/** Method 3: Sommerfeld expansion for η ≥ 35, stopped when a term is below 2⁻⁵⁶ of the sum. */
function sommerfeld(constants: OrderConstants, order: FermiDiracOrder, eta: number): number {
  const inverseSquare = 1 / (eta * eta);
  const coefficients = constants.sommerfeldCoefficients;
  let sum = coefficients[0];
  let power = 1;
  for (let k = 1; k < MAX_SOMMERFELD_TERMS; k++) {
    power *= inverseSquare;
    const term = coefficients[k] * power;
    sum += term;
    if (Math.abs(term) < SERIES_TOLERANCE * sum) break;
  }
  return Math.pow(eta, order + 1) * constants.inverseGammaNext * sum;
}

function constantsOf(order: FermiDiracOrder): OrderConstants {
  if (order === 0.5) return HALF;
  if (order === -0.5) return MINUS_HALF;
  throw new RangeError(`Fermi–Dirac order ${order} is not implemented: allowed orders are 0.5 and -0.5`);
}

/**
 * Normalised complete Fermi–Dirac integral F_j(η) for j = 1/2 or −1/2.
 *
 * @param order j: 0.5 or -0.5
 * @param eta reduced Fermi level η (dimensionless), any number
 * @returns F_j(η) > 0 (0 only where it underflows), relative error ≤ 1e-13
 * @throws RangeError for an order other than ±0.5
 * @example fermiDiracIntegral(0.5, 0) // ≈ 0.76514702462541
 */
export function fermiDiracIntegral(order: FermiDiracOrder, eta: number): number {
  const constants = constantsOf(order);
  if (Number.isNaN(eta)) return NaN;
  if (eta <= SERIES_LIMIT) return Math.exp(eta) * seriesOverBoltzmann(constants, eta);
  if (eta >= SOMMERFELD_LIMIT) return sommerfeld(constants, order, eta);
  return tabulated(order, eta);
}

/**
 * F_j(η)·e^{−η}, the Fermi–Dirac density over the Boltzmann one, computed
 * without forming e^η where that would lose the ratio: exactly 1 for
 * η ≲ −38 (the Boltzmann limit), less than 1 for every η (F_j(η) < e^η for j > −1).
 *
 * @param order j: 0.5 or -0.5
 * @param eta reduced Fermi level η; meant for η ≤ 0 (for large η the ratio underflows: use fermiDiracIntegral)
 * @returns F_j(η)/e^η in (0, 1]
 * @throws RangeError for an order other than ±0.5
 * @example fermiDiracOverBoltzmann(0.5, -40) // ≈ 1.0000000000
 */
export function fermiDiracOverBoltzmann(order: FermiDiracOrder, eta: number): number {
  const constants = constantsOf(order);
  if (Number.isNaN(eta)) return NaN;
  if (eta <= SERIES_LIMIT) return seriesOverBoltzmann(constants, eta);
  return fermiDiracIntegral(order, eta) * Math.exp(-eta);
}

/**
 * F½(η), the integral behind carrier densities n = Nc·F½(ηc).
 *
 * @param eta reduced Fermi level η = (Ef − Ec)/kT (electrons) or (Ev − Ef)/kT (holes)
 * @returns F½(η)
 * @example fermiDiracHalf(-10) // ≈ 4.5399e-5 (≈ e^{−10})
 */
export function fermiDiracHalf(eta: number): number {
  return fermiDiracIntegral(0.5, eta);
}

/**
 * F−½(η) = dF½/dη, for the generalized Einstein relation.
 *
 * @param eta reduced Fermi level η
 * @returns F−½(η)
 * @example fermiDiracMinusHalf(0) // ≈ 0.60489864342163
 */
export function fermiDiracMinusHalf(eta: number): number {
  return fermiDiracIntegral(-0.5, eta);
}
