import { ARORA_TABLE, aroraMobility, aroraTemperatureRatio } from '../../../src/physics/mobility/arora';

// Shape of the Arora et al. (1982) expressions as implemented; values against
// the paper are in reference/arora-1982.reference.test.ts.
describe('aroraMobility', () => {
  it.each(['electron', 'hole'] as const)('decreases with density and with temperature (%s)', (carrier) => {
    for (const t of [77, 250, 300, 400, 500, 600]) {
      let previous = Infinity;
      for (let e = 10; e <= 21; e += 0.25) {
        const mu = aroraMobility(carrier, 10 ** e, t);
        expect(Number.isFinite(mu) && mu > 0).toBe(true);
        expect(mu).toBeLessThan(previous);
        previous = mu;
      }
    }
    for (const n of [1e14, 1e17, 1e19]) {
      expect(aroraMobility(carrier, n, 400)).toBeLessThan(aroraMobility(carrier, n, 300));
    }
  });

  it.each(['electron', 'hole'] as const)('tends to μmin + μ0·T^b at zero density and to μmin at high density (%s)', (carrier) => {
    const p = ARORA_TABLE[carrier];
    const lattice = p.minimum.value + p.amplitude.value * 300 ** p.amplitude.exponent;
    expect(aroraMobility(carrier, 0, 300)).toBeCloseTo(lattice, 9);
    expect(aroraMobility(carrier, 1e24, 300)).toBeCloseTo(p.minimum.value, 0);
  });
});

describe('aroraTemperatureRatio', () => {
  it('is exactly 1 at 300 K and the ratio of Arora mobilities elsewhere', () => {
    expect(aroraTemperatureRatio('electron', 1e16, 300)).toBe(1);
    const ratio = aroraTemperatureRatio('hole', 1e17, 450);
    expect(ratio).toBeCloseTo(aroraMobility('hole', 1e17, 450) / aroraMobility('hole', 1e17, 300), 14);
  });
});
