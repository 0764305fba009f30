/**
 * Bracketed scalar root finding.
 *
 * Brent's method (R. P. Brent, "Algorithms for Minimization without
 * Derivatives", Prentice-Hall 1973, ch. 4, the "zeroin" algorithm): inverse
 * quadratic / secant steps inside a bracket that always contains a sign change,
 * falling back to bisection whenever interpolation misbehaves. On top of
 * Brent's own safeguard we force a bisection step whenever three consecutive
 * steps failed to halve the bracket, so the bracket width at least halves every
 * four iterations: convergence to the tolerance is guaranteed in at most about
 * 4·log2(width/tolerance) iterations for any function that has a sign change.
 */

import { PhysicsDomainError } from './errors';

export interface FindRootOptions {
  /**
   * Absolute tolerance on x. The solver always adds the machine-precision term
   * 2·ε·|x|, so 0 means "as accurate as doubles allow". Default: 4·ε times the
   * larger of |lo| and |hi| (machine precision at the scale of the bracket).
   */
  readonly xTolerance?: number;
  /** Safety cap on iterations (default 1000); never reached for a valid bracket. */
  readonly maxIterations?: number;
}

export interface RootResult {
  /** x with f(x) ≈ 0 (the bracket end with the smaller |f|). */
  readonly root: number;
  /** Iterations used (0 when an end of the bracket is already a root). */
  readonly iterations: number;
}

const EPSILON = Number.EPSILON;
/** Steps allowed without halving the bracket before a bisection is forced. */
const STEPS_BEFORE_FORCED_BISECTION = 3;
const DEFAULT_MAX_ITERATIONS = 1000;

function evaluate(f: (x: number) => number, x: number): number {
  const value = f(x);
  if (Number.isNaN(value)) {
    throw new PhysicsDomainError(`findRoot: the function returned NaN at x = ${x}; it must return a number`);
  }
  return value;
}

/**
 * Finds x in [lo, hi] with f(x) = 0, for f continuous with f(lo) and f(hi) of
 * opposite sign (or one of them zero).
 *
 * @param f function of one variable (any units)
 * @param lo one end of the bracket
 * @param hi the other end (the order of lo and hi does not matter)
 * @param opts xTolerance (absolute, same units as x) and maxIterations
 * @returns the root and the number of iterations used
 * @throws PhysicsDomainError if the ends are not finite, f(lo) and f(hi) have the
 *   same sign, f returns NaN, or (never for a valid bracket) the iteration cap is hit
 * @example findRoot((x) => x * x - 2, 0, 2).root // ≈ 1.414213562373095
 */
export function findRoot(f: (x: number) => number, lo: number, hi: number, opts: FindRootOptions = {}): RootResult {
  if (!Number.isFinite(lo) || !Number.isFinite(hi)) {
    throw new PhysicsDomainError(`findRoot: bracket [${lo}, ${hi}] must have finite ends`);
  }
  const xTolerance = opts.xTolerance ?? 4 * EPSILON * Math.max(Math.abs(lo), Math.abs(hi));
  const maxIterations = opts.maxIterations ?? DEFAULT_MAX_ITERATIONS;
  if (!(xTolerance >= 0) || !Number.isFinite(xTolerance)) {
    throw new PhysicsDomainError(`findRoot: xTolerance ${xTolerance} must be a finite number >= 0`);
  }
  if (!Number.isInteger(maxIterations) || maxIterations < 1) {
    throw new PhysicsDomainError(`findRoot: maxIterations ${maxIterations} must be an integer >= 1`);
  }

  let a = lo;
  let b = hi;
  let fa = evaluate(f, a);
  let fb = evaluate(f, b);
  if (fa === 0) return { root: a, iterations: 0 };
  if (fb === 0) return { root: b, iterations: 0 };
  if (Math.sign(fa) === Math.sign(fb)) {
    throw new PhysicsDomainError(`findRoot: [${lo}, ${hi}] does not bracket a root (f = ${fa} and ${fb} have the same sign)`);
  }

  // Brent's bookkeeping: b is the best estimate, c the contrapoint (f(b), f(c)
  // of opposite sign), a the previous b; d the last step, e the one before.
  let c = a;
  let fc = fa;
  let d = b - a;
  let e = d;
  let widthAtLastHalving = Math.abs(b - a);
  let stepsWithoutHalving = 0;

  for (let iteration = 1; iteration <= maxIterations; iteration++) {
    if (Math.sign(fb) === Math.sign(fc)) {
      c = a;
      fc = fa;
      d = b - a;
      e = d;
    }
    if (Math.abs(fc) < Math.abs(fb)) {
      a = b;
      b = c;
      c = a;
      fa = fb;
      fb = fc;
      fc = fa;
    }
    const tolerance = 2 * EPSILON * Math.abs(b) + 0.5 * xTolerance;
    const midpointStep = 0.5 * (c - b);
    if (Math.abs(midpointStep) <= tolerance || fb === 0) {
      return { root: b, iterations: iteration };
    }

    const width = Math.abs(c - b);
    if (width <= 0.5 * widthAtLastHalving) {
      widthAtLastHalving = width;
      stepsWithoutHalving = 0;
    } else {
      stepsWithoutHalving++;
    }
    const forceBisection = stepsWithoutHalving >= STEPS_BEFORE_FORCED_BISECTION;

    if (forceBisection || Math.abs(e) < tolerance || Math.abs(fa) <= Math.abs(fb)) {
      d = midpointStep;
      e = midpointStep;
    } else {
      const s = fb / fa;
      let p: number;
      let q: number;
      if (a === c) {
        // Secant step (only two distinct points known).
        p = 2 * midpointStep * s;
        q = 1 - s;
      } else {
        // Inverse quadratic interpolation through a, b, c.
        const qa = fa / fc;
        const r = fb / fc;
        p = s * (2 * midpointStep * qa * (qa - r) - (b - a) * (r - 1));
        q = (qa - 1) * (r - 1) * (s - 1);
      }
      if (p > 0) q = -q;
      else p = -p;
      // Accept the interpolation only if it lands well inside the bracket and
      // shrinks faster than the step before last; otherwise bisect.
      if (2 * p < Math.min(3 * midpointStep * q - Math.abs(tolerance * q), Math.abs(e * q))) {
        e = d;
        d = p / q;
      } else {
        d = midpointStep;
        e = midpointStep;
      }
    }
    a = b;
    fa = fb;
    b += Math.abs(d) > tolerance ? d : midpointStep > 0 ? tolerance : -tolerance;
    fb = evaluate(f, b);
  }
  throw new PhysicsDomainError(
    `findRoot: no convergence within ${maxIterations} iterations (bracket [${Math.min(b, c)}, ${Math.max(b, c)}])`,
  );
}
