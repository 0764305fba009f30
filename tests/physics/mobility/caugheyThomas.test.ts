import { CAUGHEY_THOMAS_TABLE, caugheyThomasMobility } from '../../../src/physics/mobility/caugheyThomas';

// Shape of the Caughey–Thomas (1967) form as implemented; values against the
// paper are in reference/caughey-thomas-1967.reference.test.ts.
describe('caugheyThomasMobility', () => {
  it.each(['electron', 'hole'] as const)('runs from μmax at N = 0 to μmin at high N, decreasing (%s)', (carrier) => {
    const p = CAUGHEY_THOMAS_TABLE[carrier];
    expect(caugheyThomasMobility(carrier, 0)).toBe(p.maximum);
    expect(caugheyThomasMobility(carrier, 1e26)).toBeCloseTo(p.minimum, 1);
    let previous = Infinity;
    for (let e = 10; e <= 22; e += 0.2) {
      const mu = caugheyThomasMobility(carrier, 10 ** e);
      expect(mu).toBeLessThan(previous);
      previous = mu;
    }
  });

  it('is half-way between μmin and μmax at N = Nref (definition of the form)', () => {
    const p = CAUGHEY_THOMAS_TABLE.electron;
    expect(caugheyThomasMobility('electron', p.referenceDensity)).toBeCloseTo((p.minimum + p.maximum) / 2, 9);
  });
});
