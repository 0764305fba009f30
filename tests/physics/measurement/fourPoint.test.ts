/**
 * Four-point-probe geometry: limits, an independent evaluation of the
 * thickness series, and input checks. The thin-layer and semi-infinite forms
 * are from Valdes, Proc. IRE 42, 420 (1954) and Smits, Bell Syst. Tech. J. 37,
 * 711 (1958); the Fourier (K0) form of the image series used as a check is
 * derived here by Poisson summation of the same images (derivation, no source).
 */
import {
  THIN_LAYER_FACTOR,
  circularSliceFactor,
  fourPointResistivity,
  fourPointSheetResistance,
  thicknessFactor,
  valdesDivisor,
} from '../../../src/physics/measurement/fourPoint';
import { PhysicsDomainError } from '../../../src/physics/errors';

/** K0(x) = ∫₀^∞ exp(−x·cosh u) du, trapezoid rule (converges geometrically for this integrand). */
function besselK0(x: number): number {
  const step = 1 / 64;
  let sum = 0.5 * Math.exp(-x);
  for (let u = step; u < 30; u += step) {
    const term = Math.exp(-x * Math.cosh(u));
    sum += term;
    if (term < 1e-300) break;
  }
  return sum * step;
}

/** Smits' F(t/s) from the Fourier form: 1/F = 1 + (2/ln 2)·Σ [K0(mπ s/t) − K0(2mπ s/t)]. */
function thicknessFactorFromBessel(ratio: number): number {
  let sum = 0;
  for (let m = 1; m <= 400; m++) sum += besselK0((m * Math.PI) / ratio) - besselK0((2 * m * Math.PI) / ratio);
  return 1 / (1 + (2 / Math.LN2) * sum);
}

describe('thickness correction (exact image series)', () => {
  it.each([0.15, 0.3, 0.5, 0.8, 1, 1.5, 2, 3])('agrees with the independent Bessel form at t/s = %s', (ratio) => {
    expect(thicknessFactor(ratio)).toBeCloseTo(thicknessFactorFromBessel(ratio), 9);
  });

  it('is continuous where the thin limit takes over (t/s = 0.1)', () => {
    // The true deviation from 1 is of order K0(10π) ≈ 5e-15; the summed series is good to about 1e-12.
    expect(thicknessFactor(0.1 * (1 + 1e-12))).toBeCloseTo(1, 11);
    expect(valdesDivisor(0.0999999) / valdesDivisor(0.1000001)).toBeCloseTo(1.000002, 9);
  });

  it('tends to the semi-infinite value (G → 1) for thick samples', () => {
    expect(valdesDivisor(100)).toBeCloseTo(1, 5);
    expect(valdesDivisor(100)).toBeGreaterThan(1);
    const thick = fourPointResistivity(1e-3, 1e-3, { spacingUm: 1000, thicknessUm: 1e6 });
    expect(thick / fourPointResistivity(1e-3, 1e-3, { spacingUm: 1000 })).toBeCloseTo(1, 6);
  });

  it('decreases monotonically in t/s', () => {
    let previous = Infinity;
    for (let ratio = 0.05; ratio < 20; ratio *= 1.1) {
      const g = valdesDivisor(ratio);
      expect(g).toBeLessThan(previous);
      previous = g;
    }
  });
});

describe('fourPointResistivity', () => {
  it('gives 2π·s·V/I for a semi-infinite sample (Valdes 1954)', () => {
    expect(fourPointResistivity(0.5, 2e-3, { spacingUm: 1000 })).toBeCloseTo(2 * Math.PI * 0.1 * 250, 10);
  });

  it('gives (π/ln 2)·t·V/I for a thin layer (Smits 1958)', () => {
    expect(fourPointResistivity(1, 1, { spacingUm: 1000, thicknessUm: 10 })).toBeCloseTo(THIN_LAYER_FACTOR * 10e-4, 12);
  });

  it('accepts reversed polarity (both signs negative)', () => {
    expect(fourPointResistivity(-0.5, -2e-3, { spacingUm: 1000 })).toBeCloseTo(fourPointResistivity(0.5, 2e-3, { spacingUm: 1000 }), 12);
  });

  it('multiplies the disc and thickness factors (Smits 1958 practice)', () => {
    const geometry = { spacingUm: 1000, thicknessUm: 800, diameterUm: 8000 };
    const expected = 1 * 800e-4 * circularSliceFactor(8) * thicknessFactor(0.8);
    expect(fourPointResistivity(1, 1, geometry)).toBeCloseTo(expected, 12);
  });

  it('refuses bad readings and geometry with the reason', () => {
    expect(() => fourPointResistivity(1, 0, { spacingUm: 1000 })).toThrow(/current 0 A.*other than 0/);
    expect(() => fourPointResistivity(-1, 1, { spacingUm: 1000 })).toThrow(/same sign/);
    expect(() => fourPointResistivity(0, 1, { spacingUm: 1000 })).toThrow(PhysicsDomainError);
    expect(() => fourPointResistivity(1, 1, { spacingUm: 1000, diameterUm: 5e4 })).toThrow(/needs the slice thickness/);
    expect(() => fourPointResistivity(1, 1, { spacingUm: 1000, thicknessUm: 100, diameterUm: 2500 })).toThrow(/at least 3 probe spacings/);
    expect(() => fourPointResistivity(1, 1, { spacingUm: -1 })).toThrow(/spacing -1/);
  });
});

describe('circular slice (Smits 1958 closed form)', () => {
  it('tends to π/ln 2 for a large slice and is π/(2 ln 2) at d/s = 3', () => {
    expect(circularSliceFactor(1e6)).toBeCloseTo(THIN_LAYER_FACTOR, 9);
    expect(circularSliceFactor(3)).toBeCloseTo(Math.PI / (2 * Math.LN2), 12);
  });

  it('matches the image construction evaluated point by point', () => {
    // Sources ±I at x = ∓1.5 s, images at R²/x with the same sign, potential −ln r per unit.
    const u = 7;
    const r2 = (u / 2) ** 2;
    const charges: [number, number][] = [
      [-1.5, 1],
      [1.5, -1],
      [-r2 / 1.5, 1],
      [r2 / 1.5, -1],
    ];
    const potential = (x: number) => charges.reduce((sum, [at, q]) => sum - q * Math.log(Math.abs(x - at)), 0);
    // V/I per Rs = (φ(−s/2) − φ(s/2))/(2π)
    const voltagePerSheet = (potential(-0.5) - potential(0.5)) / (2 * Math.PI);
    expect(circularSliceFactor(u)).toBeCloseTo(1 / voltagePerSheet, 12);
  });
});

describe('fourPointSheetResistance', () => {
  it('is 4.532·V/I without a diameter; the spacing alone changes nothing', () => {
    expect(fourPointSheetResistance(1, 1e-3)).toBeCloseTo(4532.36, 1);
    expect(fourPointSheetResistance(1, 1e-3, 1000)).toBe(fourPointSheetResistance(1, 1e-3));
  });

  it('needs the spacing with a diameter', () => {
    expect(() => fourPointSheetResistance(1, 1, undefined, 5e4)).toThrow(/give spacing_um together with diameter_um/);
    expect(fourPointSheetResistance(1, 1, 1000, 10000)).toBeCloseTo(circularSliceFactor(10), 12);
  });
});
