import { BOLTZMANN, ELECTRON_MASS, ELEMENTARY_CHARGE, PLANCK, thermalVoltage } from '../../src/physics/constants';
import { PhysicsDomainError } from '../../src/physics/errors';

describe('constants', () => {
  it('holds the exact SI 2019 values of q, k, h (BIPM SI Brochure, 9th ed., 2019)', () => {
    expect(ELEMENTARY_CHARGE).toBe(1.602176634e-19);
    expect(BOLTZMANN).toBe(1.380649e-23);
    expect(PLANCK).toBe(6.62607015e-34);
  });

  it('holds the CODATA 2018 electron mass (measured, not exact)', () => {
    expect(ELECTRON_MASS).toBe(9.1093837015e-31);
  });

  it('derives kT/q: 25.852 mV at 300 K (common practice, no source)', () => {
    // Layout kept: the trailing 0 is the seventh decimal toBeCloseTo(…, 7) checks; Prettier would drop it.
    // prettier-ignore
    expect(thermalVoltage(300)).toBeCloseTo(0.0258520, 7);
    expect(thermalVoltage(600)).toBeCloseTo(2 * thermalVoltage(300), 15);
  });

  it('rejects non-positive or non-finite temperatures with a clear message', () => {
    expect(() => thermalVoltage(0)).toThrow(PhysicsDomainError);
    expect(() => thermalVoltage(-5)).toThrow(/greater than 0 K/);
    expect(() => thermalVoltage(Number.NaN)).toThrow(PhysicsDomainError);
    expect(() => thermalVoltage(Infinity)).toThrow(PhysicsDomainError);
  });
});
