/**
 * The whole space engineers sweep: 50–700 K, 1e12–1e21 cm⁻³, every material
 * and every mobility model, through the catalog as users call it.
 *
 * Continuity: a kink (a jump in slope where one model or regime hands over to
 * another) is found by refinement. On a coarse log grid the largest change of
 * slope between neighbouring intervals is located; the grid is then made ten
 * times finer around it. A smooth curve's slope change shrinks about tenfold,
 * a kink's does not. Monotonicity only where physics demands it (common
 * practice, no source): ni rises with T; the majority-carrier density of a
 * doped sample never falls as T rises (ionization and intrinsic generation
 * both add carriers); at 300 K and above, where the dopants are (nearly)
 * ionized, ρ falls as the doping rises once the sample is extrinsic
 * (N ≥ 10·ni). Below that it need not: near intrinsic, a little boron trades
 * fast electrons for slow holes and raises ρ, and any dopant lowers the
 * mobility before it adds carriers (the maximum of ρ lies slightly p-type).
 */
import { MATERIALS, mobilityModelCodes } from '../../src/physics';
import { value } from '../catalog/support/call';

const TEMPERATURES = [50, 77, 150, 300, 500, 700];
const LOG_DENSITY = { from: 12, to: 21 };

/** One donor and one acceptor per material by element name (a lone P or N is refused in cells): the first of each kind in its table (not the generic ones). */
function namedDopants(materialCode: string): string[] {
  const material = MATERIALS.find((m) => m.code === materialCode)!;
  const named = material.dopants.filter((d) => d.symbol !== material.genericDopants.donor && d.symbol !== material.genericDopants.acceptor);
  return ['donor', 'acceptor'].map((kind) => named.find((d) => d.kind === kind)!.name);
}

function logGrid(from: number, to: number, steps: number): number[] {
  return Array.from({ length: steps + 1 }, (_, i) => from + ((to - from) * i) / steps);
}

/** Slopes of ln f against x on a grid, and where the slope changes most. */
function largestSlopeChange(f: (x: number) => number, xs: number[]): { at: number; change: number } {
  const ys = xs.map((x) => Math.log(f(x)));
  let best = { at: xs[1], change: 0 };
  for (let i = 1; i + 1 < xs.length; i++) {
    const left = (ys[i] - ys[i - 1]) / (xs[i] - xs[i - 1]);
    const right = (ys[i + 1] - ys[i]) / (xs[i + 1] - xs[i]);
    const change = Math.abs(right - left);
    if (change > best.change) best = { at: xs[i], change };
  }
  return best;
}

/**
 * Fails for a kink: the largest slope change on a coarse grid must shrink
 * when the grid around it is made ten times finer (unless it is already tiny).
 */
function expectNoKink(f: (x: number) => number, from: number, to: number, coarseSteps: number, what: string): void {
  const coarse = largestSlopeChange(f, logGrid(from, to, coarseSteps));
  const h = (to - from) / coarseSteps;
  const fineFrom = Math.max(from, coarse.at - h);
  const fineTo = Math.min(to, coarse.at + h);
  const fine = largestSlopeChange(f, logGrid(fineFrom, fineTo, Math.round(((fineTo - fineFrom) / h) * 10)));
  if (coarse.change < 1e-3) return;
  if (fine.change > 0.5 * coarse.change) {
    throw new Error(
      `${what}: slope change ${coarse.change.toExponential(2)} near ${coarse.at.toFixed(3)} does not shrink on refinement (${fine.change.toExponential(2)})`,
    );
  }
}

const CASES = MATERIALS.flatMap((material) =>
  namedDopants(material.code).flatMap((dopant) =>
    mobilityModelCodes(material)
      .filter((model) => model !== 'astm-f723')
      .map((model) => ({ material: material.code, dopant, model })),
  ),
);

describe('resistivity over 1e12–1e21 cm⁻³ and 50–700 K, every material and mobility model', () => {
  it.each(CASES)(
    '$material:$dopant with $model: finite, positive, no kinks in doping at any temperature',
    ({ material, dopant, model }) => {
      for (const temperature of TEMPERATURES) {
        const rho = (logN: number) => value('RESISTIVITY', 10 ** logN, dopant, temperature, model, material);
        expectNoKink(rho, LOG_DENSITY.from, LOG_DENSITY.to, 36, `${material}:${dopant} ${model} at ${temperature} K`);
      }
    },
  );

  it.each(CASES)('$material:$dopant with $model: no kinks in temperature from 50 to 700 K', ({ material, dopant, model }) => {
    for (const logN of [12, 15, 17, 18, 19, 20, 21]) {
      const rho = (logT: number) => value('RESISTIVITY', 10 ** logN, dopant, Math.exp(logT), model, material);
      expectNoKink(rho, Math.log(50), Math.log(700), 30, `${material}:${dopant} ${model} at 1e${logN} cm⁻³`);
    }
  });

  it.each(CASES)(
    '$material:$dopant with $model: ρ falls as doping rises at 300, 500 and 700 K wherever N ≥ 10·ni',
    ({ material, dopant, model }) => {
      for (const temperature of [300, 500, 700]) {
        const extrinsic = Math.log10(10 * value('INTRINSIC', temperature, material));
        let previous = Infinity;
        for (const logN of logGrid(LOG_DENSITY.from, LOG_DENSITY.to, 36).filter((x) => x >= extrinsic)) {
          const rho = value('RESISTIVITY', 10 ** logN, dopant, temperature, model, material);
          expect(rho).toBeLessThan(previous);
          previous = rho;
        }
      }
    },
  );
});

describe('carrier densities over the same space', () => {
  const materials = MATERIALS.map((m) => m.code);

  it.each(materials)('%s: ni rises strictly with temperature from 50 to 700 K', (material) => {
    let previous = 0;
    for (let temperature = 50; temperature <= 700; temperature += 10) {
      const ni = value('INTRINSIC', temperature, material);
      expect(ni).toBeGreaterThan(previous);
      previous = ni;
    }
  });

  it.each(materials.flatMap((material) => namedDopants(material).map((dopant) => ({ material, dopant }))))(
    '$material:$dopant: the majority density never falls as temperature rises, and has no kinks',
    ({ material, dopant }) => {
      for (const logN of [12, 14, 16, 17, 18, 19, 20, 21]) {
        let previous = 0;
        for (let temperature = 50; temperature <= 700; temperature += 10) {
          const majority = value('MAJORITY', 10 ** logN, dopant, temperature, material);
          expect(majority).toBeGreaterThanOrEqual(previous * (1 - 1e-12));
          previous = majority;
        }
        const density = (logT: number) => value('MAJORITY', 10 ** logN, dopant, Math.exp(logT), material);
        expectNoKink(density, Math.log(50), Math.log(700), 30, `${material}:${dopant} majority at 1e${logN} cm⁻³`);
      }
    },
  );
});
