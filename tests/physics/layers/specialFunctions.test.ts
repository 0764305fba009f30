/**
 * erf, erfc, ln erfc and erfcinv against known values, two independent
 * expansions, and round trips.
 */
import { erf, erfc, erfcinv, logErfc } from '../../../src/physics/layers/specialFunctions';
import { PhysicsDomainError } from '../../../src/physics/errors';

/** Maclaurin series erf(x) = 2/√π·Σ (−1)ⁿ x^(2n+1)/(n!(2n+1)) (common practice, no source). */
function erfBySeries(x: number): number {
  let term = x;
  let sum = x;
  for (let n = 1; n < 200; n++) {
    term *= (-x * x) / n;
    sum += term / (2 * n + 1);
  }
  return (2 / Math.sqrt(Math.PI)) * sum;
}

/**
 * Laplace's continued fraction erfc(x) = e^(−x²)/√π · 1/(x + (1/2)/(x + 1/(x + (3/2)/(x + …))))
 * for x > 0, evaluated backwards (Abramowitz & Stegun 7.1.14, from memory).
 */
function erfcByContinuedFraction(x: number): number {
  let tail = x;
  for (let n = 400; n >= 1; n--) tail = x + n / 2 / tail;
  return Math.exp(-x * x) / Math.sqrt(Math.PI) / tail;
}

describe('erfc and erf', () => {
  // Values to 16 digits as tabulated for erf/erfc (Abramowitz & Stegun, Table 7.1, and standard
  // double-precision libraries), recalled; each agrees with mpmath 1.3's erfc to the digits given
  // (tests/physics/reference/mpmath-oracles.reference.test.ts checks erfc and erfcinv against mpmath).
  it.each([
    [0, 1],
    [0.5, 0.4795001221869535],
    [1, 0.15729920705028513],
    [2, 0.004677734981047266],
    [3, 2.209049699858544e-5],
    [5, 1.5374597944280349e-12],
    [10, 2.088487583762545e-45],
    [-1, 1.8427007929497148],
  ])('erfc(%s) = %s to 1e-13 relative (recalled; equal to mpmath)', (x, expected) => {
    expect(Math.abs(erfc(x) / expected - 1)).toBeLessThan(1e-13);
  });

  it('agrees with the Maclaurin series of erf to 1e-14 for |x| ≤ 2', () => {
    for (let x = -2; x <= 2; x += 0.0625) {
      expect(Math.abs(erf(x) - erfBySeries(x))).toBeLessThan(1e-14);
      expect(Math.abs(erfc(x) - (1 - erfBySeries(x)))).toBeLessThan(1e-14);
    }
  });

  it('agrees with the continued fraction to 1e-13 relative for 2 ≤ x ≤ 26 (deep tail)', () => {
    for (let x = 2; x <= 26; x += 0.37) {
      expect(Math.abs(erfc(x) / erfcByContinuedFraction(x) - 1)).toBeLessThan(1e-13);
    }
  });

  it('keeps erf(−x) = −erf(x), erfc(−x) = 2 − erfc(x), and underflows to 0 far out', () => {
    for (const x of [0.1, 0.47, 1.3, 3.9, 4.1, 7]) {
      expect(erf(-x)).toBe(-erf(x));
      expect(erfc(-x)).toBeCloseTo(2 - erfc(x), 15);
    }
    expect(erfc(30)).toBe(0);
    expect(Number.isNaN(erfc(NaN))).toBe(true);
  });

  it('gives ln erfc beyond the underflow of erfc itself', () => {
    for (const x of [0, 0.3, 1, 4, 12, 25]) expect(logErfc(x)).toBeCloseTo(Math.log(erfc(x)), 11);
    // ln erfc(x) → −x² − ln(x√π) − 1/(2x²) for large x (asymptotic series, common practice, no source).
    const x = 40;
    expect(logErfc(x)).toBeCloseTo(-x * x - Math.log(x * Math.sqrt(Math.PI)) - 1 / (2 * x * x), 6);
    expect(() => logErfc(-1)).toThrow(PhysicsDomainError);
  });
});

describe('erfcinv', () => {
  it('round-trips erfc(erfcinv(y)) = y to 1e-12 relative from 1e-300 to just below 2', () => {
    const ys: number[] = [];
    for (let e = -300; e <= 0; e += 1.7) ys.push(10 ** e);
    for (let y = 1.0; y < 2; y += 0.0373) ys.push(y);
    ys.push(1, 1.999999);
    for (const y of ys) expect(Math.abs(erfc(erfcinv(y)) / y - 1)).toBeLessThan(1e-12);
  });

  it('round-trips erfcinv(erfc(x)) = x to 1e-12 for −3 ≤ x ≤ 26', () => {
    for (let x = -3; x <= 26; x += 0.29) {
      expect(Math.abs(erfcinv(erfc(x)) - x)).toBeLessThan(1e-12 * Math.max(1, Math.abs(x)));
    }
  });

  it('gives erfcinv(1e-4) ≈ 2.7510639 (recalled; mpmath: 2.7510639057120607879)', () => {
    expect(erfcinv(1e-4)).toBeCloseTo(2.7510639, 6);
  });

  it('rejects arguments outside [1e-300, 2)', () => {
    for (const y of [0, -1, 2, 3, NaN, 1e-310]) expect(() => erfcinv(y)).toThrow(/erfcinv needs/);
  });
});
