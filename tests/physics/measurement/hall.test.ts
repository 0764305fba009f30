/**
 * Single-carrier Hall relations (common practice, no source): R_H = −r_H/(q·n)
 * for electrons, +r_H/(q·p) for holes; μ_H = |R_H|/ρ, drift μ = μ_H/r_H.
 */
import { ELEMENTARY_CHARGE } from '../../../src/physics/constants';
import { hallDensity, hallMobility } from '../../../src/physics/measurement/hall';

describe('hallDensity', () => {
  it('is negative for electrons (R_H < 0) and positive for holes (R_H > 0)', () => {
    const rh = 1 / (ELEMENTARY_CHARGE * 1e16);
    expect(hallDensity(-rh)).toBeCloseTo(-1e16, -4);
    expect(hallDensity(rh)).toBeCloseTo(1e16, -4);
  });

  it('multiplies by the Hall factor', () => {
    expect(hallDensity(-100, 1.15) / hallDensity(-100)).toBeCloseTo(1.15, 14);
  });

  it('refuses R_H = 0 and non-positive factors', () => {
    expect(() => hallDensity(0)).toThrow(/other than 0/);
    expect(() => hallDensity(1, 0)).toThrow(/hall factor 0/);
  });
});

describe('hallMobility', () => {
  it('is |R_H|/ρ with factor 1 and divided by r_H otherwise', () => {
    expect(hallMobility(-624.15, 0.5)).toBeCloseTo(1248.3, 10);
    expect(hallMobility(624.15, 0.5)).toBe(hallMobility(-624.15, 0.5));
    expect(hallMobility(-624.15, 0.5, 1.2)).toBeCloseTo(1248.3 / 1.2, 10);
  });

  it('is consistent with ρ = 1/(q·n·μ) for one carrier', () => {
    const n = 3e15;
    const mu = 1300;
    const rho = 1 / (ELEMENTARY_CHARGE * n * mu);
    const rh = -1.1 / (ELEMENTARY_CHARGE * n);
    expect(-hallDensity(rh, 1.1) / n).toBeCloseTo(1, 12);
    expect(hallMobility(rh, rho, 1.1) / mu).toBeCloseTo(1, 12);
  });

  it('refuses non-positive resistivity', () => {
    expect(() => hallMobility(1, 0)).toThrow(/resistivity 0/);
  });
});
