/**
 * Mathematics shared with a general-purpose library, checked against mpmath 1.3
 * (50 significant digits, 20 written) instead of values recalled from tables:
 * erfc (mpmath.erfc), its inverse (mpmath.findroot on erfc) and van der Pauw's
 * equation exp(−π·Ra/Rs) + exp(−π·Rb/Rs) = 1 (mpmath.findroot). Committed in
 * data/mpmath/mpmathOracles.json by data/mpmath/generate.py (CI only reads the
 * JSON). Not a publication: an independent arbitrary-precision computation.
 */
import reference from './data/mpmath/mpmathOracles.json';
import { erfc, erfcinv } from '../../../src/physics/layers/specialFunctions';
import { vanDerPauwSheetResistance } from '../../../src/physics/measurement/vanDerPauw';

describe('mpmath oracles (mpmath 1.3, 50 digits)', () => {
  it('records its generator, mpmath version and precision', () => {
    expect(reference.mpmath).toBe('1.3.0');
    expect(reference.precisionDigits).toBeGreaterThanOrEqual(30);
    expect(reference.erfc.length + reference.erfcinv.length + reference.vanDerPauw.length).toBeGreaterThanOrEqual(50);
  });

  // specialFunctions.ts promises erfc "to a few ulp, also deep in the tail": 1e-13 relative is ~450 ulp,
  // the bound the module's own tests use.
  it.each(reference.erfc.map((p) => [p.x, p.value]))('erfc(%p) = %s to 1e-13 relative', (x, value) => {
    expect(Math.abs(erfc(Number(x)) / Number(value) - 1)).toBeLessThan(1e-13);
  });

  // The module promises erfc(erfcinv(y)) = y to about 1e-14 relative. An error δ in x changes erfc by
  // |erfc'(x)|·δ = (2/√π)·e^(−x²)·δ, so δ ≤ 1e-14·y·(√π/2)·e^(x²), plus the rounding of x itself
  // (2.2e-16·|x|). (For y ≤ 1 that is ≤ 0.89e-14; near y = 2 the bound grows as erfc' vanishes.)
  it.each(reference.erfcinv.map((p) => [p.y, p.value]))('erfcinv(%s) = %s within the module’s stated accuracy', (y, value) => {
    const expected = Number(value);
    const bound = 1e-14 * Number(y) * (Math.sqrt(Math.PI) / 2) * Math.exp(expected * expected) + 2.2e-16 * Math.abs(expected);
    expect(Math.abs(erfcinv(Number(y)) - expected)).toBeLessThanOrEqual(bound);
  });

  // vanDerPauw.ts solves the equation "exactly" by a bracketed root in double precision: 1e-12 relative
  // allows a root tolerance of ~4500 ulp, far looser than exact but independent of our output.
  it.each(reference.vanDerPauw.map((p) => [p.ra, p.rb, p.sheetResistance]))(
    'Ra = %p Ω, Rb = %p Ω: Rs = %s Ω/sq to 1e-12 relative',
    (ra, rb, rs) => {
      expect(Math.abs(vanDerPauwSheetResistance(Number(ra), Number(rb)) / Number(rs) - 1)).toBeLessThan(1e-12);
    },
  );
});
