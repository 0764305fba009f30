/**
 * C. D. Thurmond, "The standard thermodynamic functions for the formation of
 * electrons and holes in Ge, Si, GaAs, and GaP", J. Electrochem. Soc. 122,
 * 1133 (1975): Si gap Eg(T) = 1.170 − 4.73e-4·T²/(T + 636) eV. Recalled, then
 * read: EG0 = 1.17, a = 4.730e-4, b = 636 in the MATLAB scripts accompanying
 * Pierret's textbook Semiconductor Device Fundamentals (github
 * oconnellamethyst/ee3161, Pierret/e_02_4a.m, "Band Gap vs. T"); α = 4.73e-4 eV/K
 * and β = 636 K also in Charon (github tcadsoftware/charon,
 * src/Charon_Material_Properties.cpp, "Band Gap alpha", "Band Gap beta").
 */
import { bandgap } from '../../../src/physics/bands';
import { SILICON } from '../../../src/physics/materials';

function publishedFit(T: number): number {
  return 1.17 - (4.73e-4 * T * T) / (T + 636);
}

describe('Thurmond (1975)', () => {
  it.each([1, 77, 200, 300, 500, 1000])('band gap follows the published Varshni fit at %i K (parameters as read)', (T) => {
    expect(bandgap(SILICON, T)).toBeCloseTo(publishedFit(T), 12);
  });

  it('Eg → 1.170 eV at low temperature (EG0 as read)', () => {
    expect(bandgap(SILICON, 1)).toBeCloseTo(1.17, 5);
  });

  it('Eg(77 K) ≈ 1.166 eV and Eg(300 K) ≈ 1.124 eV, the usual Si values (from memory)', () => {
    expect(Math.abs(bandgap(SILICON, 77) - 1.166)).toBeLessThan(0.001);
    expect(Math.abs(bandgap(SILICON, 300) - 1.1245)).toBeLessThan(0.001);
  });
});
