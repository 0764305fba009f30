/**
 * The error function family for the diffusion profiles: erf, erfc, the scaled
 * erfcx(x) = exp(x²)·erfc(x), ln erfc(x), and the inverse erfcinv.
 *
 * erf/erfc/erfcx use W. J. Cody's near-minimax rational approximations
 * (W. J. Cody, "Rational Chebyshev approximations for the error function",
 * Math. Comp. 23, 631–637 (1969); coefficients as distributed in Cody's
 * SPECFUN package, routine CALERF, revised 1990). Cody states at least 18
 * significant digits for the rational forms themselves; in double precision the
 * result is good to a few units in the last place. Three intervals of |x|:
 * [0, 0.46875] erf directly, (0.46875, 4] erfc directly, (4, ∞) erfcx as an
 * asymptotic rational in 1/x². The exp(−x²) factor is formed as
 * exp(−x₀²)·exp(−(x−x₀)(x+x₀)) with x₀ = x rounded down to 1/16, Cody's way of
 * keeping the large exponent exact.
 *
 * erfcinv solves ln erfc(x) = ln y with the bracketed root finder of solve.ts
 * (always terminates; tolerance at machine precision), so erfc(erfcinv(y)) = y
 * to about 1e-14 relative for y in [1e-300, 2 − 1e-15].
 */
import { PhysicsDomainError } from '../errors';
import { findRoot } from '../solve';

/* eslint-disable no-loss-of-precision -- coefficients as their source prints them, more digits than a double
   holds; the nearest double is what runs, and cutting digits by hand could round differently */
/** Cody (1969) coefficients, |x| ≤ 0.46875: erf(x) = x·P(x²)/Q(x²). */
const SMALL_ARGUMENT = {
  upper: 0.46875,
  numerator: [3.1611237438705656, 113.864154151050156, 377.485237685302021, 3209.37758913846947, 0.185777706184603153],
  denominator: [23.6012909523441209, 244.024637934444173, 1282.61652607737228, 2844.23683343917062],
} as const;

/** Cody (1969) coefficients, 0.46875 < |x| ≤ 4: erfcx(x) = P(x)/Q(x). */
const MIDDLE_ARGUMENT = {
  upper: 4,
  numerator: [
    0.564188496988670089, 8.88314979438837594, 66.1191906371416295, 298.635138197400131, 881.95222124176909, 1712.04761263407058,
    2051.07837782607147, 1230.33935479799725, 2.15311535474403846e-8,
  ],
  denominator: [
    15.7449261107098347, 117.693950891312499, 537.181101862009858, 1621.38957456669019, 3290.79923573345963, 4362.61909014324716,
    3439.36767414372164, 1230.33935480374942,
  ],
} as const;

/** Cody (1969) coefficients, |x| > 4: erfcx(x) = [1/√π − z·P(z)/Q(z)]/x with z = 1/x². */
const LARGE_ARGUMENT = {
  numerator: [
    0.305326634961232344, 0.360344899949804439, 0.125781726111229246, 0.0160837851487422766, 6.58749161529837803e-4, 0.0163153871373020978,
  ],
  denominator: [2.56852019228982242, 1.87295284992346047, 0.527905102951428412, 0.0605183413124413191, 0.00233520497626869185],
} as const;

const ONE_OVER_SQRT_PI = 0.56418958354775628695;
/* eslint-enable no-loss-of-precision */
/** Grid of the exact part of x² in exp(−x²) (Cody's splitting). */
const EXPONENT_SPLIT = 16;
/** Smallest y erfcinv accepts: ln y must stay finite and erfc(x) representable. */
const SMALLEST_ERFCINV_ARGUMENT = 1e-300;

/** erf(x) for |x| ≤ 0.46875 (Cody's first interval). */
function erfSmall(x: number): number {
  const [a0, a1, a2, a3, a4] = SMALL_ARGUMENT.numerator;
  const [b0, b1, b2, b3] = SMALL_ARGUMENT.denominator;
  const z = x * x;
  const numerator = (((a4 * z + a0) * z + a1) * z + a2) * z + a3;
  const denominator = (((z + b0) * z + b1) * z + b2) * z + b3;
  return (x * numerator) / denominator;
}

/** erfcx(y) = exp(y²)·erfc(y) for y > 0.46875 (Cody's second and third intervals). */
function erfcxLarge(y: number): number {
  if (y <= MIDDLE_ARGUMENT.upper) {
    const c = MIDDLE_ARGUMENT.numerator;
    const d = MIDDLE_ARGUMENT.denominator;
    let numerator = c[8] * y;
    let denominator = y;
    for (let i = 0; i < 7; i++) {
      numerator = (numerator + c[i]) * y;
      denominator = (denominator + d[i]) * y;
    }
    return (numerator + c[7]) / (denominator + d[7]);
  }
  const p = LARGE_ARGUMENT.numerator;
  const q = LARGE_ARGUMENT.denominator;
  const z = 1 / (y * y);
  let numerator = p[5] * z;
  let denominator = z;
  for (let i = 0; i < 4; i++) {
    numerator = (numerator + p[i]) * z;
    denominator = (denominator + q[i]) * z;
  }
  const correction = (z * (numerator + p[4])) / (denominator + q[4]);
  return (ONE_OVER_SQRT_PI - correction) / y;
}

/** exp(−y²) formed without losing the exponent's low bits (Cody's splitting). */
function gaussianFactor(y: number): number {
  const exactPart = Math.trunc(y * EXPONENT_SPLIT) / EXPONENT_SPLIT;
  const remainder = (y - exactPart) * (y + exactPart);
  return Math.exp(-exactPart * exactPart) * Math.exp(-remainder);
}

/**
 * Complementary error function erfc(x) = 1 − erf(x).
 *
 * @param x - any real number
 * @returns erfc(x), in [0, 2]; accurate to a few ulp, also deep in the tail (erfc(10) ≈ 2.088e-45)
 * @example erfc(1) // ≈ 0.157299207050285
 */
export function erfc(x: number): number {
  if (Number.isNaN(x)) return NaN;
  const y = Math.abs(x);
  if (y <= SMALL_ARGUMENT.upper) return 1 - erfSmall(x);
  // exp(−y²) underflows to 0 beyond y ≈ 27, which is erfc's true value in doubles.
  const upperTail = erfcxLarge(y) * gaussianFactor(y);
  return x < 0 ? 2 - upperTail : upperTail;
}

/**
 * Error function erf(x).
 *
 * @param x - any real number
 * @returns erf(x), in [−1, 1]
 * @example erf(0.5) // → 0.5204998778130465
 */
export function erf(x: number): number {
  if (Number.isNaN(x)) return NaN;
  const y = Math.abs(x);
  if (y <= SMALL_ARGUMENT.upper) return erfSmall(x);
  const value = 1 - erfcxLarge(y) * gaussianFactor(y);
  return x < 0 ? -value : value;
}

/**
 * Natural logarithm of erfc(x) for x ≥ 0, finite far beyond where erfc(x)
 * itself underflows (ln erfc(x) = ln erfcx(x) − x²).
 *
 * @param x - x ≥ 0
 * @returns ln erfc(x)
 * @example logErfc(30) // ≈ −903.974
 */
export function logErfc(x: number): number {
  if (!(x >= 0)) throw new PhysicsDomainError(`logErfc needs x ≥ 0; got ${x}`);
  if (x <= SMALL_ARGUMENT.upper) return Math.log1p(-erfSmall(x));
  return Math.log(erfcxLarge(x)) - x * x;
}

/**
 * Inverse complementary error function: the x with erfc(x) = y.
 *
 * @param y - 1e-300 ≤ y < 2 (values in (0, 1] give x ≥ 0)
 * @returns x; erfc(x) reproduces y to about 1e-14 relative
 * @throws PhysicsDomainError outside [1e-300, 2)
 * @example erfcinv(0.15729920705028513) // ≈ 1
 */
export function erfcinv(y: number): number {
  if (!(y >= SMALLEST_ERFCINV_ARGUMENT && y < 2)) {
    throw new PhysicsDomainError(`erfcinv needs ${SMALLEST_ERFCINV_ARGUMENT} ≤ y < 2; got ${y}`);
  }
  if (y === 1) return 0;
  if (y > 1) return -erfcinv(2 - y);
  const target = Math.log(y);
  // Bracket: erfc(0) = 1 ≥ y, and ln erfc(x) < −x² gives a root below sqrt(−ln y) + 1.
  const upper = Math.sqrt(-target) + 1;
  return findRoot((x) => logErfc(x) - target, 0, upper, { xTolerance: 0 }).root;
}
