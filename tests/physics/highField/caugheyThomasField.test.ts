/**
 * The Caughey–Thomas velocity–field relation, D. M. Caughey, R. E. Thomas,
 * Proc. IEEE 55, 2192 (1967): v = μ0E/(1 + (μ0|E|/v_sat)^β)^(1/β). The
 * limits and symmetry checked here follow from the formula itself.
 */
import { caugheyThomasVelocity } from '../../../src/physics/highField/caugheyThomasField';
import { PhysicsDomainError } from '../../../src/physics/errors';

const MU = 1400; // cm²/(V·s), a test value
const VSAT = 1e7; // cm/s, a test value

describe('caugheyThomasVelocity (Caughey & Thomas 1967 form)', () => {
  it('equals μ0·E exactly once (μ0E/v_sat)^β is below double precision', () => {
    for (const field of [1e-15, -3e-16, 2.5e-18]) {
      expect(caugheyThomasVelocity(field, MU, VSAT, 1.1)).toBe(MU * field);
    }
    expect(caugheyThomasVelocity(0, MU, VSAT, 2)).toBe(0);
  });

  it('falls short of μ0·E by (μ0E/v_sat)^β/β to first order at low field', () => {
    for (const beta of [1, 1.109, 2]) {
      const field = 10;
      const x = (MU * field) / VSAT;
      const shortfall = 1 - caugheyThomasVelocity(field, MU, VSAT, beta) / (MU * field);
      expect(shortfall / (Math.pow(x, beta) / beta)).toBeCloseTo(1, 2);
    }
  });

  it('is v_sat/2^(1/β) where μ0E = v_sat, and tends to v_sat at high field', () => {
    for (const beta of [1, 2, 3]) {
      expect(caugheyThomasVelocity(VSAT / MU, MU, VSAT, beta) / (VSAT / Math.pow(2, 1 / beta))).toBeCloseTo(1, 12);
      expect(caugheyThomasVelocity(1e9, MU, VSAT, beta) / VSAT).toBeCloseTo(1, 4);
    }
  });

  it('is odd in E and strictly increasing in |E|, with no overflow at extreme fields', () => {
    let previous = 0;
    for (let log = -3; log <= 300; log += 0.5) {
      const field = 10 ** log;
      const v = caugheyThomasVelocity(field, MU, VSAT, 2);
      expect(caugheyThomasVelocity(-field, MU, VSAT, 2)).toBe(-v);
      expect(Number.isFinite(v)).toBe(true);
      expect(v).toBeGreaterThanOrEqual(previous);
      expect(v).toBeLessThanOrEqual(VSAT);
      expect(v).toBeLessThanOrEqual(MU * field);
      previous = v;
    }
    expect(caugheyThomasVelocity(1e300, MU, VSAT, 2)).toBe(VSAT);
  });

  it('refuses non-positive or non-finite parameters and fields, naming the parameter', () => {
    expect(() => caugheyThomasVelocity(1, 0, VSAT, 2)).toThrow(/low-field mobility/);
    expect(() => caugheyThomasVelocity(1, MU, -1, 2)).toThrow(/saturation velocity/);
    expect(() => caugheyThomasVelocity(1, MU, VSAT, Number.NaN)).toThrow(/field exponent/);
    expect(() => caugheyThomasVelocity(Infinity, MU, VSAT, 2)).toThrow(PhysicsDomainError);
  });
});
