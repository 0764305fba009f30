import { bandgap } from '../../../src/physics/bands';
import { SILICON } from '../../../src/physics/materials';
import { PhysicsDomainError } from '../../../src/physics/errors';

describe('bandgap', () => {
  it('evaluates the Varshni form Eg0 − αT²/(T+β) with the table parameters', () => {
    const { gapAtZero, alpha, beta } = SILICON.bandgap;
    for (const T of [1, 77, 300, 1000]) {
      expect(bandgap(SILICON, T)).toBeCloseTo(gapAtZero - (alpha * T * T) / (T + beta), 14);
    }
  });

  it('decreases monotonically and smoothly from 1 K to the melting point', () => {
    let previous = Infinity;
    for (let T = 1; T <= 1687; T += 1) {
      const eg = bandgap(SILICON, T);
      expect(eg).toBeLessThan(previous);
      expect(eg).toBeGreaterThan(0.5);
      previous = eg;
    }
  });

  it('rejects temperatures outside the material domain', () => {
    expect(() => bandgap(SILICON, 0)).toThrow(PhysicsDomainError);
    expect(() => bandgap(SILICON, 5000)).toThrow(/outside the range allowed for silicon/);
  });
});
