/**
 * L. B. Valdes, "Resistivity measurements on germanium for transistors",
 * Proc. IRE 42, 420 (1954): ρ = ρ0/G7(w/s), ρ0 = 2π·s·V/I, for a slice on a
 * non-conducting bottom. Divisor values are from memory of Valdes' table.
 */
import { fourPointResistivity, valdesDivisor } from '../../../src/physics/measurement/fourPoint';

describe('Valdes (1954) non-conducting-bottom divisor G7(w/s)', () => {
  // Layout kept: Prettier would print 2.780 as 2.78, dropping a digit of Valdes' table.
  // prettier-ignore
  it.each([
    [0.1, 13.863],
    [0.2, 6.931],
    [0.5, 2.780],
    [1, 1.504],
    [2, 1.094],
    [5, 1.007],
    [10, 1.0009],
  ])('w/s = %s: G7 = %s (from memory, ±0.1%)', (ratio, expected) => {
    expect(Math.abs(valdesDivisor(ratio) / expected - 1)).toBeLessThan(1e-3);
  });

  it('semi-infinite sample: ρ0 = 2π·s·V/I (Valdes 1954, eq. for a semi-infinite volume)', () => {
    // s = 1.59 mm, V/I = 1 Ω: ρ0 = 2π·0.159 cm ≈ 0.999 Ω·cm
    expect(fourPointResistivity(1, 1, { spacingUm: 1590 })).toBeCloseTo(2 * Math.PI * 0.159, 12);
  });
});
