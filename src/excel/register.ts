/**
 * Binds catalog functions to Excel's custom-functions runtime: each Excel call
 * converts its arguments, runs the catalog's evaluate() (which owns
 * broadcasting and validation) and maps the result grid back, failures as
 * CustomFunctions.Error values in place.
 *
 * The runtime is passed in rather than read from a global so that this module
 * loads and is testable anywhere; src/excel/functions.ts hands it the real one.
 */
import { NAMESPACE, evaluate } from '../catalog/broadcast';
import type { FunctionSpec } from '../catalog/types';
import { failure, isFailure, type CellFailure, type CellOutput, type Grid } from '../catalog/values';
import { toArgumentInputs } from './arguments';
import { toExcelErrorSpec, type ExcelErrorCodeName } from './errors';

/** The part of the CustomFunctions namespace Driftcell uses. */
export interface CustomFunctionsRuntime {
  associate(id: string, functionObject: (...args: unknown[]) => unknown): void;
  /** CustomFunctions.Error; `never` lets the runtime's own ErrorCode-typed constructor fit. */
  readonly Error: new (code: never, message?: string) => object;
  /** CustomFunctions.ErrorCode; its member values equal the cells' error texts. */
  readonly ErrorCode?: Partial<Record<ExcelErrorCodeName, string>>;
}

/** One element of a returned matrix: a number, text (DRIFT.MODELS), or a runtime Error instance. */
export type ExcelResultElement = number | string | object;

/**
 * Makes a CustomFunctions.Error for a catalog failure.
 *
 * @param runtime - the custom-functions runtime
 * @param cellFailure - the catalog failure
 * @returns an instance of runtime.Error with the mapped code (and message where Excel shows one)
 */
export function toExcelError(runtime: CustomFunctionsRuntime, cellFailure: CellFailure): object {
  const spec = toExcelErrorSpec(cellFailure);
  // ErrorCode's values are the cell texts; the literal is the fallback where the enum is absent.
  const code = (runtime.ErrorCode?.[spec.excelName] ?? spec.cellText) as never;
  return spec.message === undefined ? new runtime.Error(code) : new runtime.Error(code, spec.message);
}

/** Maps a catalog result grid to the matrix Excel receives. */
export function toExcelMatrix(runtime: CustomFunctionsRuntime, grid: Grid<CellOutput>): ExcelResultElement[][] {
  return grid.map((row) => row.map((value) => (isFailure(value) ? toExcelError(runtime, value) : value)));
}

/**
 * The function Excel calls for one catalog entry.
 *
 * @param runtime - the custom-functions runtime
 * @param spec - the catalog function
 * @returns a function taking Excel's arguments (invocation object last) and returning a matrix
 */
export function makeExcelFunction(runtime: CustomFunctionsRuntime, spec: FunctionSpec): (...args: unknown[]) => ExcelResultElement[][] {
  return (...rawArgs: unknown[]) => {
    let grid: Grid<CellOutput>;
    try {
      grid = evaluate(spec, toArgumentInputs(spec, rawArgs));
    } catch (e) {
      // evaluate() already turns element errors into failures; this guards table functions and bugs.
      const detail = e instanceof Error ? e.message : String(e);
      grid = [[failure('#VALUE!', `internal error in ${NAMESPACE}.${spec.name}: ${detail}`)]];
    }
    return toExcelMatrix(runtime, grid);
  };
}

/**
 * Associates every catalog function with its metadata id (the function name).
 *
 * @param runtime - the custom-functions runtime
 * @param catalog - the functions to bind
 * @returns the ids bound, in catalog order
 */
export function registerCatalog(runtime: CustomFunctionsRuntime, catalog: readonly FunctionSpec[]): string[] {
  return catalog.map((spec) => {
    // The metadata id is the function name (see metadata.ts); tests hold the two together.
    const id = spec.name;
    runtime.associate(id, makeExcelFunction(runtime, spec));
    return id;
  });
}
