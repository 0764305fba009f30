/**
 * Elementwise evaluation with Excel's broadcasting rules, shared by every host.
 *
 * Each argument is a grid (a single value is 1×1). The result has as many rows
 * as the tallest argument and as many columns as the widest; an argument with
 * one row (or column) is repeated along that axis, so a column against a row
 * gives the full grid. Where an argument is neither 1 nor the full size, the
 * elements it cannot supply are #N/A, as Excel's own array arithmetic does.
 *
 * Three extensions: a reducing argument (ParameterSpec.reduce) is consumed whole
 * and takes no part in the shape; a tuple function (TupleSpec) gives one row
 * of fixed width per element of its single-value or column arguments; a row
 * function (RowSpec) gives one row whose length its single-value arguments'
 * values decide, and refuses a multi-cell argument.
 */
import type { ElementwiseSpec, FunctionSpec, ParameterSpec, RowSpec, TupleSpec } from './types';
import { InputError, failure, isFailure, type ArgumentInput, type CellFailure, type CellInput, type CellOutput, type Grid } from './values';
import { PhysicsDomainError } from '../physics';
import { qualifiedName } from './naming';

export { NAMESPACE } from './naming';

/** Normalises any argument form into a non-empty grid. */
export function toGrid(input: ArgumentInput): Grid<CellInput> {
  if (input === undefined) return [[null]];
  if (Array.isArray(input)) {
    if (input.length === 0 || input[0].length === 0) return [[null]];
    return input;
  }
  return [[input]];
}

/** Calls a catalog function on raw host arguments and returns its result grid. */
export function evaluate(spec: FunctionSpec, args: readonly ArgumentInput[]): Grid<CellOutput> {
  const qualified = qualifiedName(spec);
  if (args.length > spec.parameters.length && args.slice(spec.parameters.length).some((a) => a !== undefined)) {
    return [[failure('#VALUE!', `${qualified} takes at most ${spec.parameters.length} arguments; got ${args.length}`)]];
  }
  if (spec.kind === 'table') return spec.table();
  if (spec.kind === 'tuple') return evaluateTuple(spec, args, qualified);
  if (spec.kind === 'row') return evaluateRow(spec, args, qualified);
  return evaluateElementwise(spec, args, qualified);
}

/**
 * The arguments of one call, broadcast: reducing arguments are reduced once,
 * the others are read element by element. Parsed values are cached per
 * argument grid cell, so a broadcast row or column is parsed once, not once
 * per output element.
 */
class BroadcastArguments {
  readonly rows: number;
  readonly cols: number;
  private readonly grids: Grid<CellInput>[];
  /** Per argument, flat (row-major over its grid): parsed value or failure of each element. */
  private readonly parsedCache: unknown[][];
  /** Per argument, flat: 1 where parsedCache holds the element's parse. */
  private readonly parsedState: Uint8Array[];
  /** Per argument: the reduced value (or its failure) for reducing arguments, undefined for broadcast ones. */
  private readonly reduced: { readonly value: unknown }[];
  private readonly values: unknown[];

  constructor(
    private readonly parameters: readonly ParameterSpec[],
    args: readonly ArgumentInput[],
  ) {
    this.grids = parameters.map((_, i) => toGrid(args[i]));
    this.reduced = parameters.map((param, i) =>
      param.reduce
        ? {
            value: reduceArgument(param, this.grids[i]),
          }
        : undefined,
    ) as { value: unknown }[];
    const shaping = this.grids.filter((_, i) => !parameters[i].reduce);
    this.rows = Math.max(1, ...shaping.map((g) => g.length));
    this.cols = Math.max(1, ...shaping.map((g) => g[0].length));
    // One flat cache per argument, not one per row: a 100,000-row column costs
    // two allocations instead of 200,000 (they dominated closed-form functions).
    this.parsedCache = this.grids.map((g) => new Array<unknown>(g.length * g[0].length));
    this.parsedState = this.grids.map((g) => new Uint8Array(g.length * g[0].length));
    this.values = new Array<unknown>(this.grids.length);
  }

  /** Shape of argument i, rows × columns. */
  shapeOf(i: number): { readonly rows: number; readonly cols: number } {
    return { rows: this.grids[i].length, cols: this.grids[i][0].length };
  }

  /** The parsed arguments of result element (r, c), or the first failure among them. */
  at(r: number, c: number): readonly unknown[] | CellFailure {
    for (let i = 0; i < this.grids.length; i++) {
      const reduced = this.reduced[i];
      if (reduced !== undefined) {
        if (isFailure(reduced.value)) return reduced.value;
        this.values[i] = reduced.value;
        continue;
      }
      const g = this.grids[i];
      const gr = g.length === 1 ? 0 : r;
      const gc = g[0].length === 1 ? 0 : c;
      if (gr >= g.length || gc >= (g[gr]?.length ?? 0)) {
        return failure(
          '#N/A',
          `${this.parameters[i].name} has ${g.length}×${g[0].length} values and cannot ` +
            `fill a ${this.rows}×${this.cols} result at row ${r + 1}, column ${c + 1}`,
        );
      }
      const k = gr * g[0].length + gc;
      if (this.parsedState[i][k] === 0) {
        this.parsedCache[i][k] = parseElement(this.parameters[i], g[gr][gc]);
        this.parsedState[i][k] = 1;
      }
      const value = this.parsedCache[i][k];
      if (isFailure(value)) return value;
      this.values[i] = value;
    }
    return this.values;
  }
}

/** A reducing argument's value from its whole grid, or the failure that stops it. */
function reduceArgument(param: ParameterSpec, grid: Grid<CellInput>): unknown {
  const elements: Exclude<CellInput, CellFailure>[] = [];
  for (const row of grid) {
    for (const element of row) {
      if (isFailure(element)) return element;
      elements.push(element);
    }
  }
  try {
    return param.reduce!(elements);
  } catch (e) {
    return toFailure(e);
  }
}

/**
 * The parsed arguments when every argument is a single value (or a 1×1 grid)
 * and none reduces: the usual one-cell call, which needs none of the
 * broadcasting bookkeeping. Gives the first failure among them as the general
 * path would, or undefined when the general path is needed.
 */
function singleElementArguments(parameters: readonly ParameterSpec[], args: readonly ArgumentInput[]): unknown[] | CellFailure | undefined {
  const values = new Array<unknown>(parameters.length);
  for (let i = 0; i < parameters.length; i++) {
    const input = args[i];
    let raw: CellInput;
    if (Array.isArray(input)) {
      if (input.length === 0 || input[0].length === 0) raw = null;
      else if (input.length === 1 && input[0].length === 1) raw = input[0][0];
      else return undefined;
    } else {
      raw = input === undefined ? null : input;
    }
    if (parameters[i].reduce) return undefined;
    values[i] = raw;
  }
  for (let i = 0; i < parameters.length; i++) {
    const value = parseElement(parameters[i], values[i] as CellInput);
    if (isFailure(value)) return value;
    values[i] = value;
  }
  return values;
}

function evaluateElementwise(spec: ElementwiseSpec, args: readonly ArgumentInput[], qualified: string): Grid<CellOutput> {
  const single = singleElementArguments(spec.parameters, args);
  if (single !== undefined) return [[isFailure(single) ? single : computeElement(spec, single, qualified)]];
  const broadcast = new BroadcastArguments(spec.parameters, args);
  const out: Grid<CellOutput> = [];
  for (let r = 0; r < broadcast.rows; r++) {
    const outRow: CellOutput[] = new Array(broadcast.cols);
    for (let c = 0; c < broadcast.cols; c++) {
      const values = broadcast.at(r, c);
      outRow[c] = isFailure(values) ? values : computeElement(spec, values, qualified);
    }
    out.push(outRow);
  }
  return out;
}

function evaluateTuple(spec: TupleSpec, args: readonly ArgumentInput[], qualified: string): Grid<CellOutput> {
  const width = spec.columns.length;
  const broadcast = new BroadcastArguments(spec.parameters, args);
  const wide = spec.parameters.findIndex((param, i) => !param.reduce && broadcast.shapeOf(i).cols > 1);
  if (wide >= 0) {
    const { rows, cols } = broadcast.shapeOf(wide);
    return [
      [
        failure(
          '#VALUE!',
          `${qualified} gives a row of ${width} values (${spec.columns.join(', ')}) ` +
            `per call, so ${spec.parameters[wide].name} must be a single value or a column; got ${rows}×${cols} ` +
            `values`,
        ),
      ],
    ];
  }
  const out: Grid<CellOutput> = [];
  for (let r = 0; r < broadcast.rows; r++) {
    const values = broadcast.at(r, 0);
    const row = isFailure(values) ? values : computeTuple(spec, values, qualified);
    out.push(isFailure(row) ? new Array<CellOutput>(width).fill(row) : row);
  }
  return out;
}

function computeTuple(spec: TupleSpec, values: readonly unknown[], qualified: string): CellOutput[] | CellFailure {
  try {
    const result = (spec.compute as (...a: unknown[]) => readonly number[])(...values);
    if (result.length !== spec.columns.length) {
      return failure(
        '#VALUE!',
        `internal error in ${qualified}: ${result.length} values returned where ` + `${spec.columns.length} were declared`,
      );
    }
    const bad = result.find((x) => !Number.isFinite(x));
    if (bad !== undefined) return failure('#NUM!', `${qualified} has no finite result for these inputs (got ${bad})`);
    return [...result];
  } catch (e) {
    return toFailure(e, qualified);
  }
}

/**
 * A row function: every argument one value (a multi-cell one is refused,
 * since rows of different lengths cannot be stacked), then the one row, or
 * one error for the whole call.
 */
function evaluateRow(spec: RowSpec, args: readonly ArgumentInput[], qualified: string): Grid<CellOutput> {
  const values = new Array<unknown>(spec.parameters.length);
  for (let i = 0; i < spec.parameters.length; i++) {
    const grid = toGrid(args[i]);
    if (grid.length > 1 || grid[0].length > 1) {
      return [
        [
          failure(
            '#VALUE!',
            `${qualified} gives one row whose length depends on its arguments, so ` +
              `${spec.parameters[i].name} must be a single value, not ${grid.length}×${grid[0].length} values; ` +
              `call it once per value instead`,
          ),
        ],
      ];
    }
    const value = parseElement(spec.parameters[i], grid[0][0]);
    if (isFailure(value)) return [[value]];
    values[i] = value;
  }
  try {
    const row = (spec.compute as (...a: unknown[]) => readonly (string | number)[])(...values);
    if (row.length === 0) return [[failure('#VALUE!', `internal error in ${qualified}: an empty row`)]];
    const bad = row.find((x) => typeof x === 'number' && !Number.isFinite(x));
    if (bad !== undefined) return [[failure('#NUM!', `${qualified} has no finite result for these inputs (got ${bad})`)]];
    return [[...row]];
  } catch (e) {
    return [[toFailure(e, qualified)]];
  }
}

function parseElement(param: ParameterSpec, raw: CellInput): unknown {
  if (isFailure(raw)) return raw;
  try {
    return param.parse(raw);
  } catch (e) {
    return toFailure(e);
  }
}

/** Calls compute without a spread for the usual arities: a spread call costs more per element than a closed form. */
function invoke(compute: (...a: unknown[]) => number, v: readonly unknown[]): number {
  switch (v.length) {
    case 1:
      return compute(v[0]);
    case 2:
      return compute(v[0], v[1]);
    case 3:
      return compute(v[0], v[1], v[2]);
    case 4:
      return compute(v[0], v[1], v[2], v[3]);
    case 5:
      return compute(v[0], v[1], v[2], v[3], v[4]);
    case 6:
      return compute(v[0], v[1], v[2], v[3], v[4], v[5]);
    case 7:
      return compute(v[0], v[1], v[2], v[3], v[4], v[5], v[6]);
    default:
      return compute(...v);
  }
}

function computeElement(spec: ElementwiseSpec, values: readonly unknown[], qualified: string): CellOutput {
  try {
    const result = invoke(spec.compute as (...a: unknown[]) => number, values);
    if (!Number.isFinite(result)) {
      return failure('#NUM!', `${qualified} has no finite result for these inputs (got ${result})`);
    }
    return result;
  } catch (e) {
    return toFailure(e, qualified);
  }
}

/** Maps an exception to a cell error; never rethrows. */
export function toFailure(e: unknown, qualified?: string): CellFailure {
  if (e instanceof InputError) return failure(e.code, e.message);
  if (e instanceof PhysicsDomainError) return failure('#VALUE!', e.message);
  const detail = e instanceof Error ? e.message : String(e);
  return failure('#VALUE!', `internal error${qualified ? ` in ${qualified}` : ''}: ${detail}`);
}

/** The single value of a 1×1 result, or the grid itself. */
export function unwrapSingle(grid: Grid<CellOutput>): CellOutput | Grid<CellOutput> {
  return grid.length === 1 && grid[0].length === 1 ? grid[0][0] : grid;
}
