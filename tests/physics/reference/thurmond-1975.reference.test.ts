/**
 * C. D. Thurmond, "The standard thermodynamic functions for the formation of
 * electrons and holes in Ge, Si, GaAs, and GaP", J. Electrochem. Soc. 122,
 * 1133 (1975): Si gap Eg(T) = 1.170 − 4.73e-4·T²/(T + 636) eV (from memory).
 */
import { bandgap } from '../../../src/physics/bands';
import { SILICON } from '../../../src/physics/materials';

function publishedFit(T: number): number {
  return 1.17 - (4.73e-4 * T * T) / (T + 636);
}

describe('Thurmond (1975)', () => {
  it.each([1, 77, 200, 300, 500, 1000])('band gap follows the published Varshni fit at %i K (from memory)', (T) => {
    expect(bandgap(SILICON, T)).toBeCloseTo(publishedFit(T), 12);
  });

  it('Eg → 1.170 eV at low temperature (from memory)', () => {
    expect(bandgap(SILICON, 1)).toBeCloseTo(1.17, 5);
  });

  it('Eg(77 K) ≈ 1.166 eV and Eg(300 K) ≈ 1.124 eV, the usual Si values (from memory)', () => {
    expect(Math.abs(bandgap(SILICON, 77) - 1.166)).toBeLessThan(0.001);
    expect(Math.abs(bandgap(SILICON, 300) - 1.1245)).toBeLessThan(0.001);
  });
});
