import { conductionBandDensity, logConductionBandDensity, logValenceBandDensity, valenceBandDensity } from '../../../src/physics/bands';
import { SILICON } from '../../../src/physics/materials';
import { PhysicsDomainError } from '../../../src/physics/errors';

describe('densities of states', () => {
  it('gives Green’s (1990) values at the reference temperature', () => {
    expect(conductionBandDensity(SILICON, 300)).toBeCloseTo(2.86e19, -14);
    expect(valenceBandDensity(SILICON, 300)).toBeCloseTo(3.1e19, -14);
  });

  // Exponents typed from Green (1990), not read from the table under test (sources in
  // tests/physics/reference/green-1990.reference.test.ts).
  it('follows Green’s power laws (T/300)^1.58 and (T/300)^1.85', () => {
    expect(conductionBandDensity(SILICON, 600) / conductionBandDensity(SILICON, 300)).toBeCloseTo(Math.pow(2, 1.58), 12);
    expect(valenceBandDensity(SILICON, 150) / valenceBandDensity(SILICON, 300)).toBeCloseTo(Math.pow(0.5, 1.85), 12);
  });

  it('log forms agree with the densities', () => {
    expect(Math.exp(logConductionBandDensity(SILICON, 77))).toBeCloseTo(conductionBandDensity(SILICON, 77), -6);
    expect(Math.exp(logValenceBandDensity(SILICON, 77))).toBeCloseTo(valenceBandDensity(SILICON, 77), -6);
  });

  it('rejects temperatures outside the material domain', () => {
    expect(() => conductionBandDensity(SILICON, -1)).toThrow(PhysicsDomainError);
    expect(() => valenceBandDensity(SILICON, 1e4)).toThrow(PhysicsDomainError);
  });
});
