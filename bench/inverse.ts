/**
 * Benchmark 4: the inverse DRIFT.DOPING and the neutrality-solving
 * DRIFT.MAJORITY against the forward DRIFT.RESISTIVITY, each one evaluate()
 * over the same column of samples (the DOPING targets are the forward
 * resistivities, so all three describe the same material). Target ≤ 10×.
 * Solver iterations come from the physics calls themselves: findRoot's
 * iterations in dopingForResistivity and solveEquilibrium.
 */
import { CATALOG } from '../src/catalog';
import { evaluate } from '../src/catalog/broadcast';
import type { FunctionSpec } from '../src/catalog/types';
import { SILICON, dopingForResistivity, resolveDopant, resistivity, solveEquilibrium } from '../src/physics';
import { scanEvaluations as scanEvaluationsFor } from '../src/physics/inverse';
import { dopingAt } from './lib/sheets';
import { consume, sideBySide } from './lib/timing';
import { figure, ratio, show, target, type Section, type TableRow } from './lib/results';

export const SOLVER_MAX_RATIO = 10;

function spec(name: string): FunctionSpec {
  const found = CATALOG.find((s) => s.name === name);
  if (found === undefined) throw new Error(`${name} missing from the catalog`);
  return found;
}

function stats(values: readonly number[]): { max: number; mean: number } {
  return { max: Math.max(...values), mean: Number((values.reduce((a, b) => a + b, 0) / values.length).toFixed(2)) };
}

/** Runs benchmark 4. */
export function runInverse(elements = 100): Section {
  const phosphorus = resolveDopant(SILICON, 'phosphorus');
  const densities = Array.from({ length: elements }, (_, i) => dopingAt(i, elements));
  const rhos = densities.map((n) =>
    resistivity({ material: SILICON, temperature: 300, dopant: phosphorus, density: n, counterDensity: 0 }),
  );
  const densityColumn = densities.map((n) => [n]);
  const rhoColumn = rhos.map((r) => [r]);
  // Cold: every element under conditions never seen before (its own temperature,
  // a few µK apart, new each round), so the inverse's bracketing scan is not reused.
  let coldCall = 0;
  const coldTemperatures = () => {
    coldCall++;
    return densities.map((_, i) => [300 + (coldCall * elements + i) * 1e-6]);
  };
  const [forwardMs, inverseMs, majorityMs, coldForwardMs, coldInverseMs] = sideBySide(
    [
      () => consume(evaluate(spec('RESISTIVITY'), [densityColumn, 'phosphorus']).length),
      () => consume(evaluate(spec('DOPING'), [rhoColumn, 'phosphorus']).length),
      () => consume(evaluate(spec('MAJORITY'), [densityColumn, 'phosphorus']).length),
      () => consume(evaluate(spec('RESISTIVITY'), [densityColumn, 'phosphorus', coldTemperatures()]).length),
      () => consume(evaluate(spec('DOPING'), [rhoColumn, 'phosphorus', coldTemperatures()]).length),
    ],
    9,
  );
  // Iterations and round trip, from the physics the catalog calls.
  const dopingIterations: number[] = [];
  const scanEvaluations: number[] = [];
  const majorityIterations: number[] = [];
  let worstRoundTrip = 0;
  rhos.forEach((rho, i) => {
    const solution = dopingForResistivity(rho, { material: SILICON, temperature: 300, dopant: phosphorus, counterDensity: 0 });
    dopingIterations.push(solution.iterations);
    scanEvaluations.push(scanEvaluationsFor({ material: SILICON, temperature: 300, dopant: phosphorus, counterDensity: 0 }));
    worstRoundTrip = Math.max(worstRoundTrip, Math.abs(solution.density / densities[i] - 1));
    majorityIterations.push(solveEquilibrium(SILICON, 300, [{ dopant: phosphorus, density: densities[i] }]).iterations);
  });
  const perElement = (ms: number) => (ms * 1e6) / elements;
  const dopingRatio = ratio(inverseMs, forwardMs);
  const majorityRatio = ratio(majorityMs, forwardMs);
  const coldRatio = ratio(coldInverseMs, coldForwardMs);
  const tCold = target('doping_cold_vs_resistivity_ratio', coldRatio, SOLVER_MAX_RATIO, '≤ 10× the forward');
  const tDoping = target('doping_vs_resistivity_ratio', dopingRatio, SOLVER_MAX_RATIO, '≤ 10× the forward');
  const tMajority = target('majority_vs_resistivity_ratio', majorityRatio, SOLVER_MAX_RATIO, '≤ 10× the forward');
  const doping = stats(dopingIterations);
  const scan = stats(scanEvaluations);
  const majority = stats(majorityIterations);
  const rows: TableRow[] = [
    {
      benchmark: `4. DRIFT.DOPING column, one dopant and temperature (inverse; Brent iterations max ${doping.max}, mean ${doping.mean}, scan of max ${scan.max}, mean ${scan.mean} forward evaluations made once for the column) vs DRIFT.RESISTIVITY`,
      ours: show(perElement(inverseMs), 'ns'),
      other: show(perElement(forwardMs), 'ns'),
      ratio: `${dopingRatio}`,
      target: '≤ 10',
      met: tDoping.met ? 'yes' : 'no',
    },
    {
      benchmark: `4. DRIFT.DOPING cold: every element under new conditions, so each one scans (same column, per-element temperatures)`,
      ours: show(perElement(coldInverseMs), 'ns'),
      other: show(perElement(coldForwardMs), 'ns'),
      ratio: `${coldRatio}`,
      target: '≤ 10',
      met: tCold.met ? 'yes' : 'no',
    },
    {
      benchmark: `4. DRIFT.MAJORITY (neutrality solve; iterations max ${majority.max}, mean ${majority.mean}) vs DRIFT.RESISTIVITY`,
      ours: show(perElement(majorityMs), 'ns'),
      other: show(perElement(forwardMs), 'ns'),
      ratio: `${majorityRatio}`,
      target: '≤ 10',
      met: tMajority.met ? 'yes' : 'no',
    },
  ];
  return {
    title: 'Solvers against the forward model',
    description: `${elements} P-doped samples, 1e14–1e19 cm⁻³ at 300 K, ns per element of one evaluate() over a column.`,
    figures: {
      elements,
      resistivity_ns_per_element: figure(perElement(forwardMs), 'ns'),
      doping_ns_per_element: figure(perElement(inverseMs), 'ns'),
      majority_ns_per_element: figure(perElement(majorityMs), 'ns'),
      doping_vs_resistivity_ratio: dopingRatio,
      doping_cold_ns_per_element: figure(perElement(coldInverseMs), 'ns'),
      resistivity_cold_ns_per_element: figure(perElement(coldForwardMs), 'ns'),
      doping_cold_vs_resistivity_ratio: coldRatio,
      majority_vs_resistivity_ratio: majorityRatio,
      doping_root_iterations: { ...doping, unit: 'iterations' },
      doping_scan_evaluations: { ...scan, unit: 'forward evaluations of the bracketing scan, before the root finder' },
      majority_root_iterations: { ...majority, unit: 'iterations' },
      doping_round_trip_worst: figure(worstRoundTrip, 'relative'),
    },
    targets: [tDoping, tCold, tMajority],
    rows,
  };
}
