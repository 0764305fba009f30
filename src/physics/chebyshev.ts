/**
 * Chebyshev interpolation on an interval: the coefficients of the polynomial
 * of degree N through f at the N + 1 Chebyshev points of the first kind, and
 * its evaluation by Clenshaw's recurrence. Used to tabulate functions that
 * are costly to evaluate but analytic near the interval (the Fermi–Dirac
 * integrals between their series and asymptotic regions).
 *
 * For f analytic and bounded by M inside the Bernstein ellipse E_ρ of the
 * interval (foci at its ends, semi-axis sum ρ × half-width), the interpolant
 * differs from f by at most 4M·ρ^{−N}/(ρ − 1) on the interval
 * (L. N. Trefethen, Approximation Theory and Approximation Practice, SIAM
 * 2013, Thm 8.2, stated there for second-kind points; the first-kind bound
 * has the same form; from memory).
 */

/** A Chebyshev interpolant on [lower, upper]. */
export interface ChebyshevSeries {
  readonly lower: number;
  readonly upper: number;
  /** c₀ … c_N of p(x) = Σ c_j T_j(t), t = (2x − lower − upper)/(upper − lower); c₀ already halved. */
  readonly coefficients: readonly number[];
}

/**
 * Interpolates f at the Chebyshev points of the first kind on [lower, upper].
 *
 * @param f - the function, evaluated at degree + 1 points strictly inside the interval
 * @param lower - left end of the interval
 * @param upper - right end, > lower
 * @param degree - N ≥ 0
 * @returns the interpolant's coefficients
 * @throws RangeError for an empty interval or a negative or fractional degree
 * @example evaluateChebyshev(chebyshevInterpolant(Math.exp, 0, 1, 16), 0.5) // ≈ 1.648721270700128
 */
export function chebyshevInterpolant(f: (x: number) => number, lower: number, upper: number, degree: number): ChebyshevSeries {
  if (!(upper > lower)) throw new RangeError(`interval [${lower}, ${upper}] is empty`);
  if (!Number.isInteger(degree) || degree < 0) throw new RangeError(`degree ${degree} must be a whole number ≥ 0`);
  const points = degree + 1;
  const middle = (lower + upper) / 2;
  const halfWidth = (upper - lower) / 2;
  const values: number[] = [];
  for (let k = 0; k < points; k++) values.push(f(middle + halfWidth * Math.cos((Math.PI * (k + 0.5)) / points)));
  const coefficients: number[] = [];
  for (let j = 0; j < points; j++) {
    let sum = 0;
    for (let k = 0; k < points; k++) sum += values[k] * Math.cos((Math.PI * j * (k + 0.5)) / points);
    coefficients.push(((j === 0 ? 1 : 2) * sum) / points);
  }
  return { lower, upper, coefficients };
}

/**
 * Evaluates an interpolant by Clenshaw's recurrence (stable for |t| ≤ 1).
 *
 * @param series - from chebyshevInterpolant
 * @param x - a point of [series.lower, series.upper] (outside it the polynomial extrapolates)
 * @returns p(x)
 * @example evaluateChebyshev({ lower: -1, upper: 1, coefficients: [0, 0, 1] }, 0.5) // ≈ −0.500000 (T₂(0.5))
 */
export function evaluateChebyshev(series: ChebyshevSeries, x: number): number {
  const t = (2 * x - series.lower - series.upper) / (series.upper - series.lower);
  const c = series.coefficients;
  let next = 0;
  let nextButOne = 0;
  for (let j = c.length - 1; j >= 1; j--) {
    const current = 2 * t * next - nextButOne + c[j];
    nextButOne = next;
    next = current;
  }
  return t * next - nextButOne + c[0];
}
