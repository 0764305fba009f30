import {
  fermiDiracByQuadrature,
  fermiDiracHalf,
  fermiDiracIntegral,
  fermiDiracMinusHalf,
  fermiDiracOverBoltzmann,
  type FermiDiracOrder,
} from '../../../src/physics/bands/fermiDirac';

const SQRT_PI = Math.sqrt(Math.PI);
const ORDERS: FermiDiracOrder[] = [0.5, -0.5];
/** The two points where the implementation switches method (fermiDirac.ts). */
const SWITCHES = [-2, 35];

describe('Fermi–Dirac integrals: limits', () => {
  it('tends to the Boltzmann value e^η for η → −∞, exactly below about −39 (series first term; common practice, no source)', () => {
    for (const order of ORDERS) {
      for (const eta of [-40, -100, -700]) expect(fermiDiracIntegral(order, eta)).toBe(Math.exp(eta));
      expect(fermiDiracOverBoltzmann(order, -45)).toBe(1);
      // Next series terms: F_j ≈ e^η·(1 − e^η/2^{j+1} + e^{2η}/3^{j+1}).
      const eta = -12;
      const z = Math.exp(eta);
      expect(fermiDiracOverBoltzmann(order, eta)).toBeCloseTo(1 - z / 2 ** (order + 1) + (z * z) / 3 ** (order + 1), 15);
    }
    expect(fermiDiracHalf(-Infinity)).toBe(0);
  });

  it('tends to the Sommerfeld forms (4/(3√π))·η^{3/2}·(1 + π²/(8η²)) and (2/√π)·η^{1/2}·(1 − π²/(24η²)) for large η (Sommerfeld expansion; Blakemore, Solid-State Electron. 25, 1067 (1982), from memory)', () => {
    for (const eta of [100, 1000, 1e4]) {
      const half = (4 / (3 * SQRT_PI)) * eta ** 1.5 * (1 + (Math.PI * Math.PI) / (8 * eta * eta));
      const minusHalf = (2 / SQRT_PI) * Math.sqrt(eta) * (1 - (Math.PI * Math.PI) / (24 * eta * eta));
      // The next terms are O(η^{-4}): about 1e-8 relative at η = 100.
      expect(fermiDiracHalf(eta) / half).toBeCloseTo(1, 7);
      expect(fermiDiracMinusHalf(eta) / minusHalf).toBeCloseTo(1, 7);
    }
    expect(fermiDiracHalf(Infinity)).toBe(Infinity);
  });

  it('has the exact values at η = 0: F_j(0) = (1 − 2^{−j})·ζ(j+1) (Dirichlet eta; ζ(3/2), ζ(1/2) to 16 digits, common practice, no source)', () => {
    const zetaThreeHalves = 2.612375348685488;
    const zetaHalf = -1.4603545088095868;
    expect(fermiDiracHalf(0)).toBeCloseTo((1 - 2 ** -0.5) * zetaThreeHalves, 14);
    expect(fermiDiracMinusHalf(0)).toBeCloseTo((1 - 2 ** 0.5) * zetaHalf, 14);
  });

  it('gives NaN for NaN and refuses orders it does not implement', () => {
    expect(fermiDiracHalf(Number.NaN)).toBeNaN();
    expect(() => fermiDiracIntegral(1.5 as FermiDiracOrder, 0)).toThrow(/order 1.5 is not implemented: allowed orders are 0.5 and -0.5/);
  });
});

describe('Fermi–Dirac integrals: smoothness and consistency', () => {
  it('satisfies dF½/dη = F−½ (central differences, step 1e-4, error O(h²) ≈ 1e-9; common practice, no source)', () => {
    const h = 1e-4;
    for (const eta of [-30, -5, -2.00005, -2, -1, 0, 0.5, 3, 10, 34.99995, 35, 50, 300]) {
      const derivative = (fermiDiracHalf(eta + h) - fermiDiracHalf(eta - h)) / (2 * h);
      expect(derivative / fermiDiracMinusHalf(eta)).toBeCloseTo(1, 7);
    }
  });

  it('increases strictly and stays between its proven bounds e^η/(1 + e^η) and e^η', () => {
    for (const order of ORDERS) {
      let previous = 0;
      for (let eta = -60; eta <= 80; eta += 0.037) {
        const value = fermiDiracIntegral(order, eta);
        expect(value).toBeGreaterThan(previous);
        expect(value).toBeLessThanOrEqual(Math.exp(eta) * (1 + 1e-15));
        expect(value).toBeGreaterThanOrEqual((Math.exp(eta) / (1 + Math.exp(eta))) * (1 - 1e-15));
        previous = value;
      }
    }
  });

  it('shows no jump where it switches method (η = −2 and 35): both sides agree to rounding', () => {
    for (const order of ORDERS) {
      for (const at of SWITCHES) {
        const below = fermiDiracIntegral(order, at - 1e-12);
        const above = fermiDiracIntegral(order, at + 1e-12);
        // The true change over 2e-12 in η is below 2e-12 relative (d ln F/dη ≤ 1).
        expect(Math.abs(above / below - 1)).toBeLessThan(1e-13 + 2e-12);
        expect(above).toBeGreaterThan(below);
      }
    }
  });

  it('F½ ≥ (4/(3√π))·η^{3/2} for η > 0 (the bound the solver bracket uses; equilibrium.ts)', () => {
    for (const eta of [0.01, 0.5, 1, 3, 10, 34.9, 35, 200, 1e4]) {
      expect(fermiDiracHalf(eta)).toBeGreaterThan((4 / (3 * SQRT_PI)) * eta ** 1.5);
    }
  });

  it('keeps F_j/e^η in (0, 1] and consistent with F_j for η ≤ 0', () => {
    for (const order of ORDERS) {
      for (const eta of [-38, -10, -2, -1.5, -0.3, 0]) {
        const ratio = fermiDiracOverBoltzmann(order, eta);
        expect(ratio).toBeLessThanOrEqual(1);
        expect(ratio).toBeGreaterThan(0);
        expect(ratio * Math.exp(eta)).toBeCloseTo(fermiDiracIntegral(order, eta), 15);
      }
    }
  });
});

describe('Fermi–Dirac integrals: the Chebyshev table of the trapezoidal rule (−2 < η < 35)', () => {
  it('agrees with the rule itself to 1e-14 relative at 2,000 points (interpolation bound ≈ 5e-17; the rest is rounding)', () => {
    for (const order of ORDERS) {
      for (let i = 1; i < 2000; i++) {
        const eta = -2 + (37 * i) / 2000;
        expect(Math.abs(fermiDiracIntegral(order, eta) / fermiDiracByQuadrature(order, eta) - 1)).toBeLessThan(1e-14);
      }
    }
  });

  it('shows no jump where one unit interval meets the next', () => {
    for (const order of ORDERS) {
      for (let m = -1; m <= 34; m++) {
        const below = fermiDiracIntegral(order, m - 1e-12);
        const above = fermiDiracIntegral(order, m + 1e-12);
        expect(Math.abs(above / below - 1)).toBeLessThan(1e-13 + 2e-12);
      }
    }
  });
});
