/**
 * L. J. van der Pauw, "A method of measuring specific resistivity and Hall
 * effect of discs of arbitrary shape", Philips Res. Rep. 13, 1 (1958).
 */
import { vanDerPauwSheetResistance } from '../../../src/physics/measurement/vanDerPauw';

/**
 * Van der Pauw's series for the correction f in Rs = π(Ra + Rb)/(2 ln 2)·f,
 * with x = (Ra − Rb)/(Ra + Rb):
 * f ≈ 1 − (ln 2/2)·x² − ((ln 2)²/4 − (ln 2)³/12)·x⁴ (from memory).
 */
function seriesCorrection(ra: number, rb: number): number {
  const x = (ra - rb) / (ra + rb);
  const ln2 = Math.LN2;
  return 1 - (ln2 / 2) * x ** 2 - (ln2 ** 2 / 4 - ln2 ** 3 / 12) * x ** 4;
}

describe('van der Pauw (1958)', () => {
  it('symmetric sample: Rs = π·R/ln 2 (van der Pauw 1958, eq. for Ra = Rb)', () => {
    expect(vanDerPauwSheetResistance(22.1, 22.1)).toBeCloseTo((Math.PI * 22.1) / Math.LN2, 12);
  });

  it.each([1.2, 1.5, 2])(
    'agrees with van der Pauw’s series correction f at Ra/Rb = %s (series from memory; truncation error of order x⁶)',
    (ratio) => {
      const rb = 10;
      const ra = rb * ratio;
      const f = vanDerPauwSheetResistance(ra, rb) / ((Math.PI * (ra + rb)) / (2 * Math.LN2));
      const x = (ratio - 1) / (ratio + 1);
      expect(Math.abs(f - seriesCorrection(ra, rb))).toBeLessThan(0.1 * x ** 6 + 1e-12);
    },
  );

  it('f for Ra/Rb = 10 is about 0.70 (van der Pauw 1958, graph of f; read from memory)', () => {
    const f = vanDerPauwSheetResistance(100, 10) / ((Math.PI * 110) / (2 * Math.LN2));
    expect(f).toBeGreaterThan(0.68);
    expect(f).toBeLessThan(0.72);
  });
});
