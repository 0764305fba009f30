/**
 * Benchmark 1: cost of each catalog function in Node, per element of a
 * broadcast call (one evaluate() over a column) and per single-value call,
 * against the same work without the catalog layer:
 * - closed-form functions against their formula typed as a raw Float64Array
 *   loop, with the parameters read from the material tables (target ≤ 3×);
 * - solver-based functions against a loop calling their physics directly
 *   (the entry's `compute` with pre-parsed arguments), reported without a target.
 */
import { CATALOG } from '../src/catalog';
import { evaluate } from '../src/catalog/broadcast';
import type { ElementwiseSpec, FunctionSpec } from '../src/catalog/types';
import type { ArgumentInput, CellInput } from '../src/catalog/values';
import { CM_PER_UM, SILICON } from '../src/physics';
import { consume, sideBySide } from './lib/timing';
import { ratio, show, target, type Section, type TableRow, type Target } from './lib/results';

/** Highest overhead accepted for closed-form functions (issue 6). */
export const CLOSED_FORM_MAX_RATIO = 3;

interface CallCase {
  /** Catalog name without the namespace. */
  readonly name: string;
  /** Index of the argument that varies along the column. */
  readonly varying: number;
  /** Value of the varying argument at position f ∈ [0, 1) of the column. */
  readonly value: (f: number) => number;
  /** The other arguments (the varying slot is ignored). */
  readonly fixed: readonly CellInput[];
  /** The closed form as a raw loop, for closed-form functions. */
  readonly closedForm?: (x: Float64Array, out: Float64Array) => void;
}

const temperatures = (f: number) => 250 + 150 * f;
const densities = (f: number) => Math.pow(10, 14 + 5 * f);
const resistivities = (f: number) => 0.01 * Math.pow(10, 4 * f);

const { gapAtZero, alpha, beta } = SILICON.bandgap;
const conduction = SILICON.densityOfStates.conductionBand;
const valence = SILICON.densityOfStates.valenceBand;
const niFit = SILICON.intrinsicFits[0];

/** The cases: every elementwise catalog function, with representative inputs. */
const CASES: readonly CallCase[] = [
  {
    name: 'BANDGAP',
    varying: 0,
    value: temperatures,
    fixed: [null],
    closedForm: (t, out) => {
      for (let i = 0; i < t.length; i++) out[i] = gapAtZero - (alpha * t[i] * t[i]) / (t[i] + beta);
    },
  },
  {
    name: 'CONDUCTIONDOS',
    varying: 0,
    value: temperatures,
    fixed: [null],
    closedForm: (t, out) => {
      for (let i = 0; i < t.length; i++)
        out[i] = conduction.valueAtReference * Math.pow(t[i] / conduction.referenceTemperature, conduction.exponent);
    },
  },
  {
    name: 'VALENCEDOS',
    varying: 0,
    value: temperatures,
    fixed: [null],
    closedForm: (t, out) => {
      for (let i = 0; i < t.length; i++)
        out[i] = valence.valueAtReference * Math.pow(t[i] / valence.referenceTemperature, valence.exponent);
    },
  },
  {
    name: 'INTRINSIC',
    varying: 0,
    value: temperatures,
    fixed: [null],
    closedForm: (t, out) => {
      for (let i = 0; i < t.length; i++)
        out[i] =
          niFit.prefactor * Math.pow(t[i] / niFit.referenceTemperature, niFit.exponent) * Math.exp(-niFit.activationTemperature / t[i]);
    },
  },
  {
    name: 'SHEETRES',
    varying: 0,
    value: resistivities,
    fixed: [null, 10],
    closedForm: (rho, out) => {
      for (let i = 0; i < rho.length; i++) out[i] = rho[i] / (10 * CM_PER_UM);
    },
  },
  {
    name: 'RESISTOR',
    varying: 0,
    value: resistivities,
    fixed: [null, 450, 15, 2.5],
    closedForm: (rho, out) => {
      for (let i = 0; i < rho.length; i++) out[i] = (rho[i] * 450) / (15 * 2.5 * CM_PER_UM);
    },
  },
  { name: 'ELECTRONS', varying: 0, value: densities, fixed: [null, 1e15] },
  { name: 'HOLES', varying: 0, value: densities, fixed: [null, 1e15] },
  { name: 'MAJORITY', varying: 0, value: densities, fixed: [null, 'phosphorus'] },
  { name: 'MINORITY', varying: 0, value: densities, fixed: [null, 'phosphorus'] },
  { name: 'IONIZED', varying: 0, value: densities, fixed: [null, 'phosphorus'] },
  { name: 'FERMILEVEL', varying: 0, value: densities, fixed: [null, 1e15] },
  { name: 'MOBILITY', varying: 0, value: densities, fixed: [null, 'phosphorus'] },
  { name: 'DIFFUSIVITY', varying: 0, value: densities, fixed: [null, 'phosphorus'] },
  { name: 'CONDUCTIVITY', varying: 0, value: densities, fixed: [null, 'phosphorus'] },
  { name: 'RESISTIVITY', varying: 0, value: densities, fixed: [null, 'phosphorus'] },
  { name: 'DOPING', varying: 0, value: resistivities, fixed: [null, 'phosphorus'] },
  { name: 'CURRENTDENSITY', varying: 1, value: densities, fixed: [100, null, 'phosphorus'] },
];

function specNamed(name: string): FunctionSpec {
  const spec = CATALOG.find((s) => s.name === name);
  if (spec === undefined) throw new Error(`bench case ${name} is not in the catalog`);
  return spec;
}

/** The varying values of a column of n elements. */
function columnValues(c: CallCase, n: number): Float64Array {
  const x = new Float64Array(n);
  for (let i = 0; i < n; i++) x[i] = c.value(i / n);
  return x;
}

/** Arguments of one broadcast call: the column in the varying slot. */
function columnArguments(c: CallCase, spec: FunctionSpec, x: Float64Array): ArgumentInput[] {
  const column: CellInput[][] = Array.from(x, (v) => [v]);
  return spec.parameters.map((_, k) => (k === c.varying ? column : (c.fixed[k] ?? null)));
}

/** The physics without the catalog: compute() over the column with the other arguments parsed once. */
function directPhysics(c: CallCase, spec: ElementwiseSpec): (x: Float64Array, out: Float64Array) => void {
  const parsed = spec.parameters.map((p, k) =>
    k === c.varying ? 0 : p.parse((c.fixed[k] ?? null) as Exclude<CellInput, { kind: 'failure' }>),
  );
  const compute = spec.compute as (...a: unknown[]) => number;
  return (x, out) => {
    const args = parsed.slice();
    for (let i = 0; i < x.length; i++) {
      args[c.varying] = x[i];
      out[i] = compute(...args);
    }
  };
}

/** Elements per column, rounds: closed forms are cheap, solver-based ones are not. */
function sizeFor(c: CallCase): { elements: number; rounds: number } {
  if (c.closedForm) return { elements: 20000, rounds: 9 };
  if (c.name === 'DOPING') return { elements: 100, rounds: 7 };
  return { elements: 1000, rounds: 9 };
}

export interface CatalogCallResult {
  readonly name: string;
  readonly kind: 'closed-form' | 'solver' | 'table';
  readonly elements: number;
  readonly broadcast_ns_per_element: number;
  readonly single_call_ns: number;
  readonly baseline: string;
  readonly baseline_ns_per_element?: number;
  readonly element_overhead_ratio?: number;
  readonly single_call_overhead_ratio?: number;
}

/** Runs benchmark 1. */
export function runCatalogCalls(): Section {
  const results: CatalogCallResult[] = [];
  const targets: Target[] = [];
  const rows: TableRow[] = [];
  for (const c of CASES) {
    const spec = specNamed(c.name);
    if (spec.kind !== 'elementwise') throw new Error(`${c.name} is not elementwise`);
    const { elements, rounds } = sizeFor(c);
    const x = columnValues(c, elements);
    const out = new Float64Array(elements);
    const args = columnArguments(c, spec, x);
    const scalarArgs = spec.parameters.map((_, k) => (k === c.varying ? 0 : (c.fixed[k] ?? null))) as ArgumentInput[];
    const baseline = c.closedForm ?? directPhysics(c, spec);
    const [broadcastMs, singleMs, baselineMs] = sideBySide(
      [
        () => consume(evaluate(spec, args).length),
        () => {
          for (let i = 0; i < elements; i++) {
            scalarArgs[c.varying] = x[i];
            consume(evaluate(spec, scalarArgs).length);
          }
        },
        () => {
          baseline(x, out);
          consume(out[elements - 1]);
        },
      ],
      rounds,
    );
    const perElement = (ms: number) => (ms * 1e6) / elements;
    const result: CatalogCallResult = {
      name: c.name,
      kind: c.closedForm ? 'closed-form' : 'solver',
      elements,
      broadcast_ns_per_element: Number(perElement(broadcastMs).toPrecision(4)),
      single_call_ns: Number(perElement(singleMs).toPrecision(4)),
      baseline: c.closedForm ? 'closed form as a raw Float64Array loop' : 'physics compute() called directly in a loop',
      baseline_ns_per_element: Number(perElement(baselineMs).toPrecision(4)),
      element_overhead_ratio: ratio(broadcastMs, baselineMs),
      single_call_overhead_ratio: ratio(singleMs, baselineMs),
    };
    results.push(result);
    let t: Target | undefined;
    if (c.closedForm) {
      t = target(`${c.name}.element_overhead_ratio`, result.element_overhead_ratio as number, CLOSED_FORM_MAX_RATIO, '≤ 3× the raw loop');
      targets.push(t);
    }
    rows.push({
      benchmark: `1. DRIFT.${c.name}, per element of a ${elements}-row column (single call: ${show(result.single_call_ns, 'ns')})`,
      ours: show(result.broadcast_ns_per_element, 'ns'),
      other: `${show(result.baseline_ns_per_element as number, 'ns')} ${c.closedForm ? 'raw loop' : 'physics direct'}`,
      ratio: `${result.element_overhead_ratio}`,
      target: t ? '≤ 3' : '—',
      met: t ? (t.met ? 'yes' : 'no') : '—',
    });
  }
  // The table function has no elementwise baseline: its cost per call only.
  const models = specNamed('MODELS');
  const calls = 2000;
  const [modelsMs] = sideBySide(
    [
      () => {
        for (let i = 0; i < calls; i++) consume(evaluate(models, []).length);
      },
    ],
    5,
  );
  results.push({
    name: 'MODELS',
    kind: 'table',
    elements: 1,
    broadcast_ns_per_element: 0,
    single_call_ns: Number(((modelsMs * 1e6) / calls).toPrecision(4)),
    baseline: 'none',
  });
  rows.push({
    benchmark: '1. DRIFT.MODELS(), per call (whole table)',
    ours: show((modelsMs * 1e6) / calls, 'ns'),
    other: '—',
    ratio: '—',
    target: '—',
    met: '—',
  });
  return {
    title: 'Catalog functions in Node',
    description:
      'ns per element of one evaluate() over a column (and per single-value call), against the closed form as a raw Float64Array loop ' +
      '(closed-form functions) or the physics compute() called directly (solver-based functions). Ratios are broadcast ÷ baseline.',
    figures: { unit: 'ns', functions: results },
    targets,
    rows,
  };
}
