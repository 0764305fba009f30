/**
 * The physics keeps small caches (the last neutrality solve, the 300 K
 * full-ionization factor, Arora's temperature coefficients, the inverse's
 * bracketing scan) purely for speed. These checks make sure a result never
 * depends on what was computed before: the same calls in opposite orders give
 * bit-identical results. No physics values are asserted here (the reference
 * tests do that); this is a property of the code, common practice, no source.
 */
import { SILICON, dopingForResistivity, mobility, resistivity, resolveDopant, solveEquilibrium } from '../../src/physics';

const boron = resolveDopant(SILICON, 'B');
const phosphorus = resolveDopant(SILICON, 'P');

type Call = () => string;

function calls(): Call[] {
  const list: Call[] = [];
  for (const dopant of [boron, phosphorus]) {
    for (const density of [3e14, 1e16, 2e18]) {
      for (const temperature of [77, 300, 420]) {
        const sample = { material: SILICON, temperature, dopant, density, counterDensity: 0 };
        list.push(() => JSON.stringify(solveEquilibrium(SILICON, temperature, [{ dopant, density }])));
        list.push(() => String(resistivity(sample)));
        list.push(() => String(mobility('arora', 'electron', sample)));
        list.push(() => String(mobility('caughey-thomas', 'hole', sample)));
      }
    }
    for (const rho of [0.01, 1, 30]) {
      list.push(() => JSON.stringify(dopingForResistivity(rho, { material: SILICON, temperature: 300, dopant, counterDensity: 0 })));
      // At 77 K some of these have several solutions: the refusal must be the same whatever came before.
      list.push(() => {
        try {
          return JSON.stringify(dopingForResistivity(rho, { material: SILICON, temperature: 77, dopant, counterDensity: 1e13 }));
        } catch (error) {
          return String(error);
        }
      });
    }
  }
  return list;
}

describe('physics caches', () => {
  it('give the same results whatever was computed before', () => {
    const list = calls();
    const forward = list.map((call) => call());
    const backward = [...list]
      .reverse()
      .map((call) => call())
      .reverse();
    const twice = list.map((call) => call());
    expect(backward).toEqual(forward);
    expect(twice).toEqual(forward);
  });

  it('hand out a fresh equilibrium object, so a caller changing one cannot change the next', () => {
    const first = solveEquilibrium(SILICON, 300, [{ dopant: phosphorus, density: 1e16 }]) as { electrons: number };
    const electrons = first.electrons;
    first.electrons = -1;
    const second = solveEquilibrium(SILICON, 300, [{ dopant: phosphorus, density: 1e16 }]);
    expect(second).not.toBe(first);
    expect(second.electrons).toBe(electrons);
  });
});
