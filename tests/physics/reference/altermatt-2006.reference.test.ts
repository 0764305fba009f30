/**
 * Incomplete ionization with the Mott transition:
 * P. P. Altermatt, A. Schenk, G. Heiser, J. Appl. Phys. 100, 113714 (2006) (Si:P) and
 * P. P. Altermatt, A. Schenk, B. Schmithüsen, G. Heiser, J. Appl. Phys. 100, 113715 (2006) (Si:As, Si:B).
 * Parameters and the behaviour checked here are from memory: at 300 K the
 * dopants are almost fully ionised at low and at very high density, with up to
 * roughly a quarter non-ionised near 1e18–5e18 cm⁻³ (just below the Mott
 * transition); at low temperature moderate doping freezes out while doping
 * above the Mott transition stays ionised.
 */
import { resolveDopant } from '../../../src/physics/dopants';
import { solveEquilibrium } from '../../../src/physics/equilibrium';
import { SILICON } from '../../../src/physics/materials';

function fraction(symbol: string, density: number, temperature: number): number {
  const dopant = resolveDopant(SILICON, symbol);
  const eq = solveEquilibrium(SILICON, temperature, [{ dopant, density }]);
  return (dopant.kind === 'donor' ? eq.ionizedDonors : eq.ionizedAcceptors) / density;
}

describe('Altermatt et al. (2006) incomplete ionization', () => {
  it.each(['P', 'As', 'B'])('%s: nearly fully ionised at 300 K at low density (≥ 99% at 1e16) (from memory)', (symbol) => {
    expect(fraction(symbol, 1e15, 300)).toBeGreaterThan(0.998);
    expect(fraction(symbol, 1e16, 300)).toBeGreaterThan(0.99);
  });

  it.each(['P', 'As', 'B'])('%s: minimum ionised fraction at 300 K of 0.65–0.85 between 1e18 and 5e18 cm⁻³ (from memory)', (symbol) => {
    let minimum = 1;
    let where = 0;
    for (let log = 16; log <= 21; log += 0.05) {
      const value = fraction(symbol, 10 ** log, 300);
      if (value < minimum) {
        minimum = value;
        where = 10 ** log;
      }
    }
    expect(minimum).toBeGreaterThan(0.65);
    expect(minimum).toBeLessThan(0.85);
    expect(where).toBeGreaterThan(1e18);
    expect(where).toBeLessThan(5e18);
  });

  it.each(['P', 'As', 'B'])('%s: heavy doping is (almost) fully ionised at 300 K through b(N) (from memory)', (symbol) => {
    expect(fraction(symbol, 1e19, 300)).toBeGreaterThan(0.8);
    expect(fraction(symbol, 1e20, 300)).toBeGreaterThan(0.99);
  });

  it('As, the deeper donor, is less ionised than P at the same density (from memory)', () => {
    for (const density of [1e16, 1e17, 1e18, 1e19]) {
      expect(fraction('As', density, 300)).toBeLessThan(fraction('P', density, 300));
    }
  });

  it('P 1e16 at 77 K freezes out partly: 20–60% ionised (from memory)', () => {
    const value = fraction('P', 1e16, 77);
    expect(value).toBeGreaterThan(0.2);
    expect(value).toBeLessThan(0.6);
  });

  it('at 77 K ionization falls with density up to ~1e18 and recovers above the Mott transition (from memory)', () => {
    expect(fraction('P', 1e18, 77)).toBeLessThan(fraction('P', 1e16, 77));
    expect(fraction('P', 1e19, 77)).toBeGreaterThan(fraction('P', 1e18, 77));
    expect(fraction('P', 1e20, 77)).toBeGreaterThan(0.99);
  });

  it('freeze-out deepens steadily as temperature falls (P 1e15, 300 K → 20 K) (from memory)', () => {
    let previous = Infinity;
    for (let T = 300; T >= 20; T -= 10) {
      const value = fraction('P', 1e15, T);
      expect(value).toBeLessThan(previous);
      previous = value;
    }
    expect(previous).toBeLessThan(1e-2);
  });
});
