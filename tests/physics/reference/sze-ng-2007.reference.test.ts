/**
 * S. M. Sze, K. K. Ng, Physics of Semiconductor Devices, 3rd ed., Wiley 2007:
 * appendix table of Si properties at 300 K (Eg = 1.12 eV, Nc = 2.8e19 cm⁻³,
 * Nv = 2.65e19 cm⁻³, ni = 9.65e9 cm⁻³) and ch. 1, Fig. 12 (ionization
 * energies). All values from memory.
 */
import { bandgap, conductionBandDensity, intrinsicDensity, valenceBandDensity } from '../../../src/physics/bands';
import { thermalVoltage } from '../../../src/physics/constants';
import { resolveDopant } from '../../../src/physics/dopants';
import { solveEquilibrium } from '../../../src/physics/equilibrium';
import { SILICON } from '../../../src/physics/materials';

describe('Sze & Ng (2007), Si at 300 K', () => {
  it('Eg ≈ 1.12 eV (from memory)', () => {
    expect(Math.abs(bandgap(SILICON, 300) - 1.12)).toBeLessThan(0.01);
  });

  it('Nc ≈ 2.8e19 cm⁻³ within 5% (from memory; code uses Green 1990, 2.86e19)', () => {
    expect(Math.abs(conductionBandDensity(SILICON, 300) / 2.8e19 - 1)).toBeLessThan(0.05);
  });

  it('Nv ≈ 2.65e19 cm⁻³ within 20% (from memory; Green 1990’s 3.10e19 is 17% higher)', () => {
    expect(Math.abs(valenceBandDensity(SILICON, 300) / 2.65e19 - 1)).toBeLessThan(0.2);
  });

  it('ni = 9.65e9 cm⁻³ within 1% (from memory)', () => {
    expect(Math.abs(intrinsicDensity(SILICON, 300) / 9.65e9 - 1)).toBeLessThan(0.01);
  });

  it('Ef − Ei = kT·ln(N/ni) for a fully ionised shallow dopant, 1e15 P: ≈ 0.298 eV (common practice, no source)', () => {
    const eq = solveEquilibrium(SILICON, 300, [{ dopant: resolveDopant(SILICON, 'P'), density: 1e15 }]);
    const expected = thermalVoltage(300) * Math.log(1e15 / intrinsicDensity(SILICON, 300));
    expect(Math.abs(eq.fermiLevel - expected)).toBeLessThan(0.001);
  });

  it('lists the isolated ionization energies of ch. 1 Fig. 12 in the dopant table (from memory)', () => {
    const expected: Record<string, number> = { P: 0.045, As: 0.054, Sb: 0.039, B: 0.045, Al: 0.067, Ga: 0.072, In: 0.16 };
    for (const [symbol, energy] of Object.entries(expected)) {
      expect(resolveDopant(SILICON, symbol).ionizationEnergy).toBeCloseTo(energy, 4);
    }
  });
});
