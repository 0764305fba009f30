import { chebyshevInterpolant, evaluateChebyshev } from '../../src/physics/chebyshev';

describe('Chebyshev interpolation (Trefethen, ATAP 2013, ch. 3–8; from memory)', () => {
  it('reproduces a polynomial of degree ≤ N to rounding', () => {
    const cubic = (x: number) => 2 * x ** 3 - 3 * x ** 2 + 0.5 * x - 7;
    const series = chebyshevInterpolant(cubic, -3, 5, 3);
    for (const x of [-3, -1.7, 0, 2.2, 5]) expect(evaluateChebyshev(series, x)).toBeCloseTo(cubic(x), 12);
    // Degree 3 through 4 points: the coefficients above c₃ are absent, and c₃ carries the cubic.
    expect(series.coefficients).toHaveLength(4);
  });

  it('evaluates T₂(t) = 2t² − 1 from the coefficient vector [0, 0, 1] (definition; common practice, no source)', () => {
    for (const t of [-1, -0.3, 0, 0.5, 1])
      expect(evaluateChebyshev({ lower: -1, upper: 1, coefficients: [0, 0, 1] }, t)).toBeCloseTo(2 * t * t - 1, 15);
  });

  it('converges geometrically for an entire function: exp on [0, 1] to a few ulps (2e-15 relative) with degree 16', () => {
    const series = chebyshevInterpolant(Math.exp, 0, 1, 16);
    for (let i = 0; i <= 1000; i++) {
      const x = i / 1000;
      expect(Math.abs(evaluateChebyshev(series, x) / Math.exp(x) - 1)).toBeLessThan(2e-15);
    }
  });

  it('samples f only strictly inside the interval, at degree + 1 points', () => {
    const seen: number[] = [];
    chebyshevInterpolant((x) => (seen.push(x), x), 2, 3, 6);
    expect(seen).toHaveLength(7);
    for (const x of seen) {
      expect(x).toBeGreaterThan(2);
      expect(x).toBeLessThan(3);
    }
  });

  it('refuses an empty interval and a degree that is not a whole number ≥ 0', () => {
    expect(() => chebyshevInterpolant(Math.exp, 1, 1, 4)).toThrow(/interval \[1, 1\] is empty/);
    expect(() => chebyshevInterpolant(Math.exp, 0, 1, -1)).toThrow(/degree -1 must be a whole number ≥ 0/);
    expect(() => chebyshevInterpolant(Math.exp, 0, 1, 2.5)).toThrow(/degree 2.5/);
  });
});
