/**
 * Property-based checks over every function in CATALOG (iterated, so
 * functions added later are covered without changes here), with arguments
 * generated from each parameter's metadata (see support/arbitraries.ts).
 *
 * For any arguments, evaluate():
 * - returns (never throws) a non-empty rectangular grid;
 * - holds only finite numbers, text (table and row functions only) and failures;
 * - gives every failure it makes itself a known code and a non-empty message
 *   that names the argument or the function, and never an "internal error";
 *   an upstream error passes through as the very same value;
 * - gives an error to every element fed by an element its parameter's
 *   contract rejects (blank required argument, upstream error, boolean,
 *   non-numeric text, code not in choices());
 * - for a row function (one row whose length its values decide): gives one
 *   row, or one error for the whole call when an argument is bad or holds
 *   more than one cell, that error naming the argument;
 * - terminates (bounded number of runs; jest's timeout is generous, not a timed assertion).
 */
import fc from 'fast-check';
import './support/seed';
import { CATALOG, qualifiedName } from '../../src/catalog';
import { evaluate } from '../../src/catalog/broadcast';
import type { FunctionSpec, ParameterSpec } from '../../src/catalog/types';
import { isFailure, type ArgumentInput, type CellFailure, type CellInput, type CellOutput, type Grid } from '../../src/catalog/values';
import { BIG_GRID, argumentsFor, elementFor, plainlyBad, scalarArgumentsFor } from './support/arbitraries';

const KNOWN_CODES = new Set(['#VALUE!', '#NUM!', '#N/A', '#DIV/0!', '#REF!', '#NAME?', '#NULL!']);
/** Runs per function and property: enough to reach the edges, small enough for CI on 2 cores. */
const RUNS = Number(process.env.DRIFTCELL_PROPERTY_RUNS ?? 150);
const PER_TEST_TIMEOUT_MS = 120_000;

function parametersOf(spec: FunctionSpec): readonly ParameterSpec[] {
  return spec.parameters as readonly ParameterSpec[];
}

/** Every upstream failure object among the arguments (they may pass through unchanged). */
function inputFailures(args: readonly ArgumentInput[]): Set<CellFailure> {
  const found = new Set<CellFailure>();
  const visit = (v: unknown) => {
    if (isFailure(v)) found.add(v);
    else if (Array.isArray(v)) v.forEach(visit);
  };
  args.forEach(visit);
  return found;
}

/** A problem with one output element, or null when it is well-formed. */
function elementProblem(spec: FunctionSpec, value: CellOutput, upstream: Set<CellFailure>): string | null {
  if (typeof value === 'number') return Number.isFinite(value) ? null : `non-finite number ${value}`;
  if (typeof value === 'string')
    return spec.kind === 'table' || spec.kind === 'row' ? null : `text "${value}" from a function that is neither a table nor a row`;
  if (!isFailure(value)) return `neither number, text nor failure: ${JSON.stringify(value)}`;
  if (!KNOWN_CODES.has(value.code)) return `unknown error code ${String(value.code)}`;
  if (upstream.has(value)) return null;
  if (typeof value.message !== 'string' || value.message.trim() === '') return `${value.code} without a message`;
  if (/internal error/i.test(value.message)) return `internal error leaked: ${value.message}`;
  // A routine's own name in front ("findRoot: …") is a message meant for developers, not for the cell.
  if (/^[a-z]+[A-Z]?[A-Za-z]*: /.test(value.message)) return `message from inside the code reached the cell: ${value.message}`;
  // The argument by its name (temperature_K) or in words (its first word: "current 0 A is not allowed").
  const names = [qualifiedName(spec), ...parametersOf(spec).flatMap((p) => [p.name, p.name.split('_')[0]])];
  const lower = value.message.toLowerCase();
  if (!names.some((name) => lower.includes(name.toLowerCase())))
    return `message names neither the function nor an argument: ${value.message}`;
  return null;
}

/** Calls evaluate and checks the grid's form and every element; returns the grid. */
function checkedEvaluate(spec: FunctionSpec, args: readonly ArgumentInput[]): Grid<CellOutput> {
  let grid: Grid<CellOutput>;
  try {
    grid = evaluate(spec, args);
  } catch (e) {
    throw new Error(`${qualifiedName(spec)} threw out of evaluate(): ${e instanceof Error ? e.stack : String(e)}`);
  }
  if (!Array.isArray(grid) || grid.length === 0 || !Array.isArray(grid[0]) || grid[0].length === 0) {
    throw new Error(`${qualifiedName(spec)} returned an empty or malformed grid`);
  }
  const width = grid[0].length;
  const upstream = inputFailures(args);
  grid.forEach((row, r) => {
    if (row.length !== width) throw new Error(`${qualifiedName(spec)}: row ${r + 1} has ${row.length} values, row 1 has ${width}`);
    row.forEach((value, c) => {
      const problem = elementProblem(spec, value, upstream);
      if (problem !== null) throw new Error(`${qualifiedName(spec)} at row ${r + 1}, column ${c + 1}: ${problem}`);
    });
  });
  return grid;
}

function asGrid(arg: ArgumentInput): CellInput[][] {
  if (arg === undefined) return [[null]];
  if (Array.isArray(arg)) return arg.length === 0 || arg[0].length === 0 ? [[null]] : arg;
  return [[arg]];
}

/**
 * For functions that broadcast element by element (their result has the
 * broadcast shape): every output element fed by a plainly bad input element
 * is an error.
 */
function checkBadElementsGetErrors(spec: FunctionSpec, args: readonly ArgumentInput[], grid: Grid<CellOutput>): void {
  const params = parametersOf(spec);
  if (spec.kind !== 'elementwise' || args.length > params.length) return;
  // Reducing arguments (consumed whole) take no part in the shape and follow their own reading rules.
  const broadcast = params.map((p, i) => ({ param: p, grid: asGrid(args[i]) })).filter(({ param }) => param.reduce === undefined);
  if (broadcast.length === 0) return;
  const grids = broadcast.map((b) => b.grid);
  const rows = Math.max(...grids.map((g) => g.length));
  const columns = Math.max(...grids.map((g) => g[0].length));
  // A function whose result is not the broadcast shape (a reducing or row-returning one) is checked by the scalar property only.
  if (grid.length !== rows || grid[0].length !== columns) return;
  for (let r = 0; r < rows; r++) {
    for (let c = 0; c < columns; c++) {
      const bad = grids.some((g, i) => {
        const gr = g.length === 1 ? 0 : r;
        const gc = g[0].length === 1 ? 0 : c;
        return gr < g.length && gc < g[0].length && plainlyBad(broadcast[i].param, g[gr][gc]);
      });
      if (bad && !isFailure(grid[r][c])) {
        throw new Error(
          `${qualifiedName(spec)} at row ${r + 1}, column ${c + 1}: a bad input element gave ${JSON.stringify(grid[r][c])} instead of an error`,
        );
      }
    }
  }
}

/**
 * For row functions: one row, or one error for the whole call where the
 * first argument that is bad or holds several cells says so.
 */
function checkRowShape(spec: FunctionSpec, args: readonly ArgumentInput[], grid: Grid<CellOutput>): void {
  const params = parametersOf(spec);
  if (spec.kind !== 'row' || args.length > params.length) return;
  const fail = (why: string) => new Error(`${qualifiedName(spec)}(${JSON.stringify(args)}): ${why}, got ${JSON.stringify(grid)}`);
  if (grid.length !== 1) throw fail('a row function gave more than one row');
  for (let i = 0; i < params.length; i++) {
    const argument = asGrid(args[i]);
    const several = argument.length > 1 || argument[0].length > 1;
    if (!several && !plainlyBad(params[i], argument[0][0])) continue;
    if (grid[0].length !== 1 || !isFailure(grid[0][0]))
      throw fail(`argument ${params[i].name} is ${several ? 'several cells' : 'bad'} but the call gave no single error`);
    const failed = grid[0][0];
    if (several && !inputFailures([args[i]]).has(failed) && !failed.message.includes(`${params[i].name} must be a single value`))
      throw fail(`the error does not name ${params[i].name}`);
    return;
  }
}

describe.each(CATALOG.map((spec) => [qualifiedName(spec), spec] as const))('%s under random and adversarial arguments', (_name, spec) => {
  const params = parametersOf(spec);

  it(
    'never throws, never lets NaN or Infinity into a cell, and explains every error it makes',
    () => {
      fc.assert(
        fc.property(argumentsFor(params), (args) => {
          const grid = checkedEvaluate(spec, args);
          checkBadElementsGetErrors(spec, args, grid);
          checkRowShape(spec, args, grid);
        }),
        { numRuns: RUNS },
      );
    },
    PER_TEST_TIMEOUT_MS,
  );

  it(
    'gives an error wherever a single argument is bad by its parameter’s contract',
    () => {
      if (params.length === 0) return;
      const withOneBad = fc.tuple(scalarArgumentsFor(params), fc.integer({ min: 0, max: params.length - 1 })).chain(([args, i]) =>
        elementFor(params[i])
          .filter((v) => plainlyBad(params[i], v))
          .map((bad) => args.map((a, j) => (j === i ? bad : a))),
      );
      fc.assert(
        fc.property(withOneBad, (args) => {
          const grid = checkedEvaluate(spec, args);
          grid.flat().forEach((value) => {
            if (!isFailure(value))
              throw new Error(`${qualifiedName(spec)}(${JSON.stringify(args)}) gave ${JSON.stringify(value)} despite a bad argument`);
          });
        }),
        { numRuns: RUNS },
      );
    },
    PER_TEST_TIMEOUT_MS,
  );

  it(
    `takes a ${BIG_GRID.rows}×${BIG_GRID.columns} grid in any argument, and mismatched shapes, without throwing`,
    () => {
      if (params.length === 0) {
        checkedEvaluate(spec, [
          [
            [1, 2],
            [3, 4],
          ],
        ]);
        return;
      }
      // Few runs: each evaluates up to 10 000 elements (the solvers included).
      fc.assert(
        fc.property(
          fc.integer({ min: 0, max: params.length - 1 }),
          fc.array(elementFor(params[0]), { minLength: 1, maxLength: 8 }),
          fc.integer({ min: 2, max: 7 }),
          (bigAt, pool, otherRows) => {
            const args: ArgumentInput[] = params.map((p, i) => {
              if (i === bigAt) {
                const elements = p === params[0] ? pool : [null, 'x', 300, 1e16];
                return Array.from({ length: BIG_GRID.rows }, (_, r) =>
                  Array.from({ length: BIG_GRID.columns }, (_, c) => elements[(r * 7 + c) % elements.length]),
                );
              }
              // A column that neither matches nor is 1: elements beyond it must be #N/A with a message.
              return i === (bigAt + 1) % params.length ? Array.from({ length: otherRows }, () => [null]) : undefined;
            });
            const grid = checkedEvaluate(spec, args);
            checkBadElementsGetErrors(spec, args, grid);
            checkRowShape(spec, args, grid);
          },
        ),
        { numRuns: 3 },
      );
    },
    PER_TEST_TIMEOUT_MS,
  );
});

describe('every catalog function on the edges of the number line', () => {
  it('answers each edge value in each number argument, with the other arguments at plausible values', () => {
    // Deterministic sweep beside the random one: every edge in every position of every function.
    const edges: CellInput[] = [
      0,
      -0,
      -1,
      1e-300,
      -1e-300,
      5e-324,
      1e300,
      -1e300,
      Number.MAX_VALUE,
      Number.NaN,
      Infinity,
      -Infinity,
      ' 1e15 ',
      '1e400',
      true,
      false,
      null,
      '',
    ];
    for (const spec of CATALOG) {
      const params = parametersOf(spec);
      const plausible: CellInput[] = params.map((p) =>
        p.type === 'number' ? (p.optional ? null : 1e16) : p.optional ? null : (p.choices?.()[0] ?? 'x'),
      );
      params.forEach((p, i) => {
        for (const edge of edges) {
          const args = plausible.map((v, j) => (j === i ? edge : v));
          const grid = checkedEvaluate(spec, args);
          if (plainlyBad(p, edge)) {
            const where = { fn: spec.name, arg: p.name, edge };
            for (const v of grid.flat()) expect({ ...where, error: isFailure(v) }).toEqual({ ...where, error: true });
          }
        }
      });
    }
  });
});
