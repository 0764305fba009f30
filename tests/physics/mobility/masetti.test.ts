import { MASETTI_TABLE, masettiMobility } from '../../../src/physics/mobility/masetti';

// Shape of the Masetti et al. (1983) formula as implemented; values against
// the paper are in reference/masetti-1983.reference.test.ts.
describe('masettiMobility', () => {
  const rows = Object.entries(MASETTI_TABLE);

  it.each(rows)('tends to μmax at vanishing density (%s)', (_species, row) => {
    const p = row.parameters;
    // With Pc > 0 (boron) the μmin1 term vanishes as N → 0; otherwise μmin1 − μmin2 remains (0 in Table I).
    const limit = p.maximum - p.minimum2 + (p.lowDensityCutoff > 0 ? 0 : p.minimum1);
    expect(masettiMobility(p, 0)).toBeCloseTo(limit, 10);
    expect(masettiMobility(p, 1e8)).toBeCloseTo(limit, 2);
  });

  it.each(rows)('is finite, positive and decreasing from 1e10 to 1e21 cm⁻³ (%s)', (_species, row) => {
    let previous = Infinity;
    for (let e = 10; e <= 21; e += 0.1) {
      const mu = masettiMobility(row.parameters, 10 ** e);
      expect(Number.isFinite(mu) && mu > 0).toBe(true);
      expect(mu).toBeLessThan(previous);
      previous = mu;
    }
  });

  it('assigns electrons to As and P and holes to B', () => {
    expect(MASETTI_TABLE.As.carrier).toBe('electron');
    expect(MASETTI_TABLE.P.carrier).toBe('electron');
    expect(MASETTI_TABLE.B.carrier).toBe('hole');
  });
});
