/**
 * ASTM F723-99 (now SEMI MF723), conversion between resistivity and dopant
 * density for B- and P-doped silicon at 23 °C; equations of Thurber, Mattis,
 * Liu, Filliben, NBS Special Publication 400-64 (1981).
 *
 * The standard's tables were not at hand: its §1.2 self-consistency statement
 * was read in a public excerpt; the coefficients were checked against two public
 * transcriptions of F723-99 (named in src/physics/astmF723.ts); the spot values
 * below are from memory.
 */
import { F723_VALIDITY, f723Density, f723Resistivity, type F723Species } from '../../../src/physics/astmF723';
import { logSpaced } from '../transportSamples';

describe('ASTM F723-99 §1.2: self-consistency of the two conversions', () => {
  // §1.2 (read): "within 3 % for boron from 0.0001 to 10 000 Ω·cm and within
  // 4.5 % for phosphorus from 0.0002 to 4000 Ω·cm" — the standard's own stated
  // accuracy, so the tolerances are exactly those figures. B stays within 2.95 %.
  // P reaches 4.74 % at the 2e-4 Ω·cm end (4.5 % holds everywhere above
  // 3e-4 Ω·cm): either the standard rounds its figure or a coefficient as
  // transcribed is slightly off. Kept as a failing expectation (not loosened).
  const worstSelfConsistency = (species: F723Species, from: number, to: number): number => {
    let worst = 0;
    for (const rho of logSpaced(Math.log10(from), Math.log10(to), 50)) {
      worst = Math.max(worst, Math.abs(f723Resistivity(species, f723Density(species, rho)) / rho - 1));
    }
    return worst;
  };
  it('B: ρ → N → ρ within 3 % over 1e-4…1e4 Ω·cm', () => {
    expect(worstSelfConsistency('B', F723_VALIDITY.B.resistivity.min, F723_VALIDITY.B.resistivity.max)).toBeLessThan(0.03);
  });
  it('P: ρ → N → ρ within 4.5 % over 3e-4…4e3 Ω·cm', () => {
    expect(worstSelfConsistency('P', 3e-4, 4e3)).toBeLessThan(0.045);
  });
  it.failing('KNOWN DISAGREEMENT (expected to fail): P: ρ → N → ρ within 4.5 % down to 2e-4 Ω·cm, as §1.2 states (we reach 4.74 %)', () => {
    expect(worstSelfConsistency('P', F723_VALIDITY.P.resistivity.min, 4e3)).toBeLessThan(0.045);
  });
});

describe('ASTM F723 spot values (from memory)', () => {
  // Familiar conversion-chart anchors (from memory, ±5 %): 1 Ω·cm is about
  // 1.5e16 cm⁻³ boron or 4.9e15 cm⁻³ phosphorus; 10 Ω·cm about 1.3e15 B or
  // 4.4e14 P; 0.01 Ω·cm about 8.5e18 B or 4.5e18 P.
  it.each([
    ['B', 1, 1.5e16],
    ['P', 1, 4.9e15],
    ['B', 10, 1.3e15],
    ['P', 10, 4.4e14],
    ['B', 0.01, 8.5e18],
    ['P', 0.01, 4.5e18],
  ] as const)('%s at %s Ω·cm ≈ %s cm⁻³', (species, rho, density) => {
    expect(Math.abs(f723Density(species, rho) / density - 1)).toBeLessThan(0.05);
  });
});

// The default model's agreement with F723 is tested in tests/physics/f723Anchored.test.ts
// (within 1 % at 23 °C over the whole range, against an independent transcription of the
// equations); the former per-decade tolerances here were measured deviations rounded up,
// which a reference check must not be.
