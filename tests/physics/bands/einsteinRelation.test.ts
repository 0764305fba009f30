import { einsteinDegeneracyFactor, einsteinDegeneracyRatio, fermiDiracHalf, fermiDiracMinusHalf } from '../../../src/physics/bands';
import { SILICON } from '../../../src/physics/materials';
import { solveEquilibrium } from '../../../src/physics/equilibrium';
import { resolveDopant } from '../../../src/physics/dopants';

describe('generalized Einstein relation factor F½(η)/F−½(η)', () => {
  it('is 1 in the Boltzmann limit and 1 + e^η/2^{3/2} just above it (series of F½ and F−½; common practice, no source)', () => {
    expect(einsteinDegeneracyRatio(-50)).toBe(1);
    const eta = -15;
    expect(einsteinDegeneracyRatio(eta) - 1).toBeCloseTo(Math.exp(eta) / 2 ** 1.5, 12);
  });

  it('grows like (2/3)·η for degenerate carriers (Sommerfeld leading terms; common practice, no source)', () => {
    expect(einsteinDegeneracyRatio(1e4) / ((2 / 3) * 1e4)).toBeCloseTo(1, 6);
    expect(einsteinDegeneracyRatio(3)).toBeCloseTo(fermiDiracHalf(3) / fermiDiracMinusHalf(3), 14);
  });

  it('increases with η and is continuous at η = 0, where its two forms meet', () => {
    let previous = 0;
    for (let eta = -40; eta <= 60; eta += 0.25) {
      const value = einsteinDegeneracyRatio(eta);
      expect(value).toBeGreaterThan(previous * (1 - 1e-15));
      expect(value).toBeGreaterThanOrEqual(1);
      previous = value;
    }
    expect(einsteinDegeneracyRatio(1e-12) / einsteinDegeneracyRatio(-1e-12)).toBeCloseTo(1, 11);
  });

  it('uses the carrier’s own band: electrons in n+ Si are degenerate, the minority holes are not', () => {
    const P = resolveDopant(SILICON, 'P');
    const eq = solveEquilibrium(SILICON, 300, [{ dopant: P, density: 1e20 }]);
    expect(einsteinDegeneracyFactor(SILICON, 300, 'electron', eq.fermiLevel)).toBeGreaterThan(1.5);
    expect(einsteinDegeneracyFactor(SILICON, 300, 'hole', eq.fermiLevel)).toBe(1);
  });
});
