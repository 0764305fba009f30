/**
 * A. B. Sproul, M. A. Green, "Improved value for the silicon intrinsic carrier
 * concentration from 275 to 375 K", J. Appl. Phys. 70, 846 (1991).
 * Our fit ni = 9.38e19·(T/300)^2·exp(−6884/T) cm⁻³ was recalled; the same
 * numbers are in PVeducation's package (github pvedu/photovoltaic,
 * photovoltaic/si.py, ni_sproul), which attributes them to "Sproul94"
 * (doi 10.1063/1.357521), not to this 1991 paper. A public Python transcription
 * of the 1991 paper (T. Ried, 2022, class SproulGreen1991, "Ref.: Improved value
 * for the silicon intrinsic carrier concentration from 275 to 375K (1991), JAP
 * 70, 846", n_i = 9.15e25·(T/300)^2·exp(−6880/T) m⁻³; seen in the code search
 * without its repository name) gives 9.15e19 and 6880 K, i.e. 1.00e10 cm⁻³ at
 * 300 K, the paper's headline value (from memory), where our fit gives 1.015e10.
 * So the model named 'sproul-green' (1991) may carry another paper's fit: a
 * disagreement not yet settled against the paper, kept below as a failing
 * expectation (DEVELOPERS.md, Testing: KNOWN DISAGREEMENT).
 */
import { intrinsicDensity } from '../../../src/physics/bands';
import { SILICON } from '../../../src/physics/materials';

function publishedFit(T: number): number {
  return 9.38e19 * Math.pow(T / 300, 2) * Math.exp(-6884 / T);
}

describe('Sproul & Green (1991)', () => {
  it('ni(300 K) = 1.00e10 cm⁻³ within 2% (from memory)', () => {
    const ni = intrinsicDensity(SILICON, 300, 'sproul-green');
    expect(ni / 1e10).toBeGreaterThan(0.98);
    expect(ni / 1e10).toBeLessThan(1.02);
  });

  it.each([275, 300, 325, 350, 375])('follows the fit 9.38e19/6884 at %i K (recalled; as printed in pvedu ni_sproul)', (T) => {
    expect(intrinsicDensity(SILICON, T, 'sproul-green') / publishedFit(T)).toBeCloseTo(1, 12);
  });

  // Tolerance: the transcription prints 3 figures (9.15e19 ± 0.05 %) and 6880 ± 0.5 K (± 0.2 % at 275 K):
  // 0.3 % covers the rounding. Our model differs by 1.2–1.5 %.
  it.failing(
    'KNOWN DISAGREEMENT (expected to fail): follows the 1991 fit as transcribed (9.15e19, 6880 K) within its rounding, 275–375 K',
    () => {
      for (const T of [275, 300, 325, 350, 375]) {
        const transcribed = 9.15e19 * Math.pow(T / 300, 2) * Math.exp(-6880 / T);
        expect(Math.abs(intrinsicDensity(SILICON, T, 'sproul-green') / transcribed - 1)).toBeLessThan(3e-3);
      }
    },
  );

  it('lies a few percent above Misiakos & Tsamakis at 300 K, the difference Altermatt et al. (2003) ascribe to band-gap narrowing (from memory)', () => {
    const ratio = intrinsicDensity(SILICON, 300, 'sproul-green') / intrinsicDensity(SILICON, 300, 'misiakos');
    expect(ratio).toBeGreaterThan(1.02);
    expect(ratio).toBeLessThan(1.07);
  });
});
