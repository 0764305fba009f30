import {
  bandgap,
  conductionBandDensity,
  INTRINSIC_MODEL_CODES,
  intrinsicDensity,
  logIntrinsicDensity,
  resolveIntrinsicModel,
  valenceBandDensity,
} from '../../../src/physics/bands';
import { thermalVoltage } from '../../../src/physics/constants';
import { PhysicsDomainError } from '../../../src/physics/errors';
import { SILICON } from '../../../src/physics/materials';

describe('intrinsicDensity', () => {
  it('offers misiakos (default), sproul-green and dos', () => {
    expect(INTRINSIC_MODEL_CODES).toEqual(['misiakos', 'sproul-green', 'dos']);
    expect(intrinsicDensity(SILICON, 300)).toBe(intrinsicDensity(SILICON, 300, 'misiakos'));
  });

  it('resolves model codes case-insensitively; blank means the default', () => {
    expect(resolveIntrinsicModel(SILICON, 'Sproul-Green')).toBe('sproul-green');
    expect(resolveIntrinsicModel(SILICON, ' DOS ')).toBe('dos');
    expect(resolveIntrinsicModel(SILICON, '')).toBe('misiakos');
    expect(resolveIntrinsicModel(SILICON)).toBe('misiakos');
  });

  it('rejects unknown models, listing the allowed codes', () => {
    expect(() => intrinsicDensity(SILICON, 300, 'sze')).toThrow(PhysicsDomainError);
    expect(() => intrinsicDensity(SILICON, 300, 'sze')).toThrow(/misiakos, sproul-green, dos/);
  });

  it("'dos' is sqrt(Nc·Nv)·exp(−Eg/2kT) of the material's own tables", () => {
    for (const T of [77, 300, 600]) {
      const expected =
        Math.sqrt(conductionBandDensity(SILICON, T) * valenceBandDensity(SILICON, T)) *
        Math.exp(-bandgap(SILICON, T) / (2 * thermalVoltage(T)));
      expect(intrinsicDensity(SILICON, T, 'dos') / expected).toBeCloseTo(1, 12);
    }
  });

  it.each(INTRINSIC_MODEL_CODES.map((code) => [code]))('%s grows strictly, without kinks, from 50 K to 700 K', (code) => {
    // d ln ni / d(1/T) is the (apparent) activation energy: it must vary smoothly.
    const step = 1; // K
    let previousLog = -Infinity;
    let previousSlope: number | undefined;
    for (let T = 50; T <= 700; T += step) {
      const log = logIntrinsicDensity(SILICON, T, code);
      expect(log).toBeGreaterThan(previousLog);
      const slope = (logIntrinsicDensity(SILICON, T + step, code) - log) / (1 / (T + step) - 1 / T);
      if (previousSlope !== undefined) {
        expect(Math.abs(slope / previousSlope - 1)).toBeLessThan(1e-2);
      }
      previousSlope = slope;
      previousLog = log;
    }
  });

  it('default stays within 10% of the independent dos model from 78 K to 1000 K (extrapolation check)', () => {
    for (const T of [78, 150, 300, 400, 500, 600, 700, 850, 1000]) {
      const ratio = intrinsicDensity(SILICON, T) / intrinsicDensity(SILICON, T, 'dos');
      expect(ratio).toBeGreaterThan(0.9);
      expect(ratio).toBeLessThan(1.1);
    }
  });

  it('works in logarithms where ni underflows (1 K) and never returns NaN', () => {
    const log = logIntrinsicDensity(SILICON, 1);
    expect(Number.isFinite(log)).toBe(true);
    expect(log).toBeLessThan(-6000);
    expect(intrinsicDensity(SILICON, 1)).toBe(0);
    expect(intrinsicDensity(SILICON, 20)).toBeGreaterThan(0);
  });
});
