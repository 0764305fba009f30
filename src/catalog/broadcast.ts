/**
 * Elementwise evaluation with Excel's broadcasting rules, shared by every host.
 *
 * Each argument is a grid (a single value is 1×1). The result has as many rows
 * as the tallest argument and as many columns as the widest; an argument with
 * one row (or column) is repeated along that axis, so a column against a row
 * gives the full grid. Where an argument is neither 1 nor the full size, the
 * elements it cannot supply are #N/A, as Excel's own array arithmetic does.
 */
import type { ElementwiseSpec, FunctionSpec, ParameterSpec } from './types';
import { InputError, failure, isFailure, type ArgumentInput, type CellFailure, type CellInput, type CellOutput, type Grid } from './values';
import { PhysicsDomainError } from '../physics/errors';
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
  return evaluateElementwise(spec, args, qualified);
}

function evaluateElementwise(spec: ElementwiseSpec, args: readonly ArgumentInput[], qualified: string): Grid<CellOutput> {
  const grids = spec.parameters.map((_, i) => toGrid(args[i]));
  const rows = Math.max(...grids.map((g) => g.length));
  const cols = Math.max(...grids.map((g) => g[0].length));
  const out: Grid<CellOutput> = [];
  // Parsed values are cached per argument grid cell: a broadcast row or column
  // is parsed once, not once per output element.
  const parsedCache = grids.map((g) => g.map((row) => new Array<unknown>(row.length)));
  const parsedState = grids.map((g) => g.map((row) => new Uint8Array(row.length)));
  const values = new Array<unknown>(grids.length);
  for (let r = 0; r < rows; r++) {
    const outRow: CellOutput[] = new Array(cols);
    for (let c = 0; c < cols; c++) {
      let error: CellFailure | undefined;
      for (let i = 0; i < grids.length && !error; i++) {
        const g = grids[i];
        const gr = g.length === 1 ? 0 : r;
        const gc = g[0].length === 1 ? 0 : c;
        if (gr >= g.length || gc >= (g[gr]?.length ?? 0)) {
          error = failure('#N/A', `${spec.parameters[i].name} has ${g.length}×${g[0].length} values and cannot fill a ${rows}×${cols} result at row ${r + 1}, column ${c + 1}`);
          break;
        }
        if (parsedState[i][gr][gc] === 0) {
          const parsed = parseElement(spec.parameters[i], g[gr][gc]);
          parsedCache[i][gr][gc] = parsed;
          parsedState[i][gr][gc] = 1;
        }
        const value = parsedCache[i][gr][gc];
        if (isFailure(value)) error = value;
        else values[i] = value;
      }
      outRow[c] = error ?? computeElement(spec, values, qualified);
    }
    out.push(outRow);
  }
  return out;
}

function parseElement(param: ParameterSpec, raw: CellInput): unknown {
  if (isFailure(raw)) return raw;
  try {
    return param.parse(raw);
  } catch (e) {
    return toFailure(e);
  }
}

function computeElement(spec: ElementwiseSpec, values: readonly unknown[], qualified: string): CellOutput {
  try {
    const result = (spec.compute as (...a: unknown[]) => number)(...values);
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
