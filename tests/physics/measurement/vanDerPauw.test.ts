/**
 * Van der Pauw's equation, L. J. van der Pauw, Philips Res. Rep. 13, 1 (1958):
 * exp(−πRa/Rs) + exp(−πRb/Rs) = 1. Checked against a Newton iteration on Rs
 * written here (a different method from the bracketed solve in the product).
 */
import { vanDerPauwSheetResistance, MAX_RESISTANCE_RATIO } from '../../../src/physics/measurement/vanDerPauw';

/** Newton on g(Rs) = e^(−πRa/Rs) + e^(−πRb/Rs) − 1, started at the symmetric value (g is concave in 1/Rs... started above the root). */
function newtonSheetResistance(ra: number, rb: number): number {
  let rs = (Math.PI * (ra + rb)) / (2 * Math.LN2);
  for (let i = 0; i < 200; i++) {
    const ea = Math.exp((-Math.PI * ra) / rs);
    const eb = Math.exp((-Math.PI * rb) / rs);
    const g = ea + eb - 1;
    const slope = ((Math.PI * ra) / (rs * rs)) * ea + ((Math.PI * rb) / (rs * rs)) * eb;
    const next = rs - g / slope;
    if (Math.abs(next - rs) <= 1e-15 * rs) return next;
    rs = next > 0 ? next : rs / 2;
  }
  return rs;
}

describe('vanDerPauwSheetResistance', () => {
  it('gives π·R/ln 2 for Ra = Rb (van der Pauw 1958)', () => {
    expect(vanDerPauwSheetResistance(10, 10)).toBeCloseTo((Math.PI * 10) / Math.LN2, 12);
  });

  const ratios = [1e-3, 1e-2, 0.1, 0.5, 0.9, 1.1, 2, 10, 100, 1e3];
  it.each(ratios)('satisfies the equation and agrees with Newton for Ra/Rb = %s', (ratio) => {
    const rb = 7.3;
    const ra = rb * ratio;
    const rs = vanDerPauwSheetResistance(ra, rb);
    expect(Math.exp((-Math.PI * ra) / rs) + Math.exp((-Math.PI * rb) / rs)).toBeCloseTo(1, 14);
    expect(rs / newtonSheetResistance(ra, rb)).toBeCloseTo(1, 12);
  });

  it('is symmetric in its arguments and scales with them', () => {
    expect(vanDerPauwSheetResistance(3, 17)).toBe(vanDerPauwSheetResistance(17, 3));
    expect(vanDerPauwSheetResistance(3e6, 17e6) / vanDerPauwSheetResistance(3, 17)).toBeCloseTo(1e6, 6);
  });

  it('stays well defined for extreme ratios (1e-8, 1e8)', () => {
    for (const ratio of [1e-8, 1e8]) {
      const rs = vanDerPauwSheetResistance(ratio, 1);
      expect(Number.isFinite(rs) && rs > 0).toBe(true);
      // large-ratio behaviour: e^(−πRbig/Rs) ≈ πRsmall/Rs, so Rs lies between the bounds used for bracketing
      const small = Math.min(ratio, 1);
      expect(rs).toBeGreaterThanOrEqual((Math.PI * small) / Math.LN2);
      expect(rs).toBeLessThanOrEqual((Math.PI * (ratio + 1)) / (2 * Math.LN2));
    }
  });

  it('refuses non-positive resistances', () => {
    expect(() => vanDerPauwSheetResistance(0, 1)).toThrow(/r_a 0 Ω.*greater than 0/);
    expect(() => vanDerPauwSheetResistance(1, -2)).toThrow(/r_b -2 Ω/);
  });
});

describe('extreme ratios', () => {
  it('refuses readings whose ratio exceeds MAX_RESISTANCE_RATIO with a message that says why (property tests found 1 vs 5e-324)', () => {
    expect(() => vanDerPauwSheetResistance(1, 5e-324)).toThrow(/too far from 1.*at most 1000000000000 times/);
    expect(Number.isFinite(vanDerPauwSheetResistance(1, 1 / MAX_RESISTANCE_RATIO))).toBe(true);
  });
});

describe('ratios a hair from 1', () => {
  it('solves them without a bracketing failure (property tests found 1.7976931348623157e308 vs 1.7976931348220664e308)', () => {
    // Same ratio, 1 + 2.24e-11, at an ordinary magnitude (at 1.8e308 Rs itself overflows, which the catalog reports as #NUM!).
    const rs = vanDerPauwSheetResistance(1, 1 + 2.24e-11);
    expect(rs / (Math.PI / Math.LN2)).toBeCloseTo(1, 9);
    expect(() => vanDerPauwSheetResistance(1.7976931348623157e308, 1.7976931348220664e308)).not.toThrow();
    expect(vanDerPauwSheetResistance(10, 10 * (1 + 1e-12)) / ((Math.PI * 10) / Math.LN2)).toBeCloseTo(1, 10);
  });
});
