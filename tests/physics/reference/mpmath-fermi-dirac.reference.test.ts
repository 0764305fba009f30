/**
 * Reference values of the normalised complete Fermi–Dirac integrals F½ and
 * F−½ from mpmath 1.3 (F_j(η) = −Li_{j+1}(−e^η), its general polylogarithm,
 * 50 significant digits, 20 written), committed in data/fermiDirac/fermiDirac.json
 * by data/fermiDirac/generate.py. Not a publication: an independent
 * arbitrary-precision computation by a different method (the polylogarithm).
 */
import reference from './data/fermiDirac/fermiDirac.json';
import { fermiDiracHalf, fermiDiracIntegral, fermiDiracMinusHalf } from '../../../src/physics/bands/fermiDirac';

interface ReferencePoint {
  readonly eta: number;
  readonly half: string;
  readonly minusHalf: string;
}

const points = reference.points as readonly ReferencePoint[];
/** The accuracy the module guarantees (fermiDirac.ts); observed errors are about 2e-15. */
const RELATIVE_TOLERANCE = 1e-13;

describe('F½ and F−½ against mpmath polylog (mpmath 1.3, 50 digits)', () => {
  it('records its generator, mpmath version and precision, and covers −50 … 200 densely, both orders', () => {
    expect(reference.mpmath).toBe('1.3.0');
    expect(reference.precisionDigits).toBeGreaterThanOrEqual(30);
    expect(points.length).toBeGreaterThanOrEqual(60);
    const etas = points.map((point) => point.eta);
    expect(Math.min(...etas)).toBeLessThanOrEqual(-50);
    expect(Math.max(...etas)).toBeGreaterThanOrEqual(200);
    expect(etas.filter((eta) => Math.abs(eta) <= 2).length).toBeGreaterThanOrEqual(15);
  });

  it.each(points.map((point) => [point.eta, point]))('η = %p: both orders to 1e-13 relative', (_eta, point) => {
    const half = Number(point.half);
    const minusHalf = Number(point.minusHalf);
    expect(Math.abs(fermiDiracHalf(point.eta) / half - 1)).toBeLessThanOrEqual(RELATIVE_TOLERANCE);
    expect(Math.abs(fermiDiracMinusHalf(point.eta) / minusHalf - 1)).toBeLessThanOrEqual(RELATIVE_TOLERANCE);
    expect(fermiDiracIntegral(0.5, point.eta)).toBe(fermiDiracHalf(point.eta));
  });
});
