/**
 * Binds catalog functions to Excel's custom-functions runtime: each Excel call
 * converts its arguments, runs the catalog's evaluate() (which owns
 * broadcasting and validation) and maps the result grid back, failures as
 * CustomFunctions.Error values in place.
 *
 * Binding and errors come from the runtime at different times. Office.js
 * defines `CustomFunctions.associate` as soon as office.js has run, which is
 * before functions.js runs; `CustomFunctions.Error` and `ErrorCode` arrive
 * later, with the custom-functions runtime script Office.js loads for the host
 * (custom-functions-runtime.js, or the host's excel-*.js file). So binding
 * needs only `associate`, and the error constructor is looked up when a
 * function runs, by which time the runtime that calls it has defined it.
 *
 * The runtime is passed in rather than read from a global so that this module
 * loads and is testable anywhere; src/excel/functions.ts hands it the real one.
 */
import { NAMESPACE, evaluate } from '../catalog/broadcast';
import type { FunctionSpec } from '../catalog/types';
import { failure, isFailure, type CellFailure, type CellOutput, type Grid } from '../catalog/values';
import { toArgumentInputs } from './arguments';
import { toExcelErrorSpec, type ExcelErrorCodeName } from './errors';

/** What binding needs: the part of CustomFunctions that office.js itself defines. */
export interface CustomFunctionsBinder {
  associate(id: string, functionObject: (...args: unknown[]) => unknown): void;
}

/** What returning an error needs: the part the custom-functions runtime script defines. */
export interface CustomFunctionsErrors {
  /** CustomFunctions.Error; `never` lets the runtime's own ErrorCode-typed constructor fit. */
  readonly Error: new (code: never, message?: string) => object;
  /** CustomFunctions.ErrorCode; its member values equal the cells' error texts. */
  readonly ErrorCode?: Partial<Record<ExcelErrorCodeName, string>>;
}

/** Finds the error constructor at call time; undefined if the runtime has not defined it. */
export type ErrorsLookup = () => CustomFunctionsErrors | undefined;

/** One element of a returned matrix: a number, text (DRIFT.MODELS), or a runtime Error instance. */
export type ExcelResultElement = number | string | object;

/**
 * Makes a CustomFunctions.Error for a catalog failure.
 *
 * @param errors - the runtime's Error constructor and ErrorCode enum
 * @param cellFailure - the catalog failure
 * @returns an instance of errors.Error with the mapped code (and message where Excel shows one)
 */
export function toExcelError(errors: CustomFunctionsErrors, cellFailure: CellFailure): object {
  const spec = toExcelErrorSpec(cellFailure);
  // ErrorCode's values are the cell texts; the literal is the fallback where the enum is absent.
  const code = (errors.ErrorCode?.[spec.excelName] ?? spec.cellText) as never;
  return spec.message === undefined ? new errors.Error(code) : new errors.Error(code, spec.message);
}

/**
 * Maps a catalog result grid to the matrix Excel receives.
 *
 * @throws Error when the grid holds a failure and the runtime has no Error
 *   constructor: the runtime turns a thrown error into #VALUE! for the whole
 *   cell, which is the honest result when no per-element error can be built.
 */
export function toExcelMatrix(lookup: ErrorsLookup, grid: Grid<CellOutput>): ExcelResultElement[][] {
  let errors: CustomFunctionsErrors | undefined;
  return grid.map((row) =>
    row.map((value) => {
      if (!isFailure(value)) return value;
      errors ??= lookup();
      if (errors === undefined) throw new Error(`${value.code} ${value.message} (CustomFunctions.Error is not available)`);
      return toExcelError(errors, value);
    }),
  );
}

/**
 * The function Excel calls for one catalog entry.
 *
 * @param lookup - finds the runtime's Error constructor when a result needs one
 * @param spec - the catalog function
 * @returns a function taking Excel's arguments (invocation object last) and returning a matrix
 */
export function makeExcelFunction(lookup: ErrorsLookup, spec: FunctionSpec): (...args: unknown[]) => ExcelResultElement[][] {
  return (...rawArgs: unknown[]) => {
    let grid: Grid<CellOutput>;
    try {
      grid = evaluate(spec, toArgumentInputs(spec, rawArgs));
    } catch (e) {
      // evaluate() already turns element errors into failures; this guards table functions and bugs.
      const detail = e instanceof Error ? e.message : String(e);
      grid = [[failure('#VALUE!', `internal error in ${NAMESPACE}.${spec.name}: ${detail}`)]];
    }
    return toExcelMatrix(lookup, grid);
  };
}

/**
 * Associates every catalog function with its metadata id (the function name).
 * Needs nothing but `associate`.
 *
 * @param binder - CustomFunctions as office.js defines it
 * @param catalog - the functions to bind
 * @param lookup - finds CustomFunctions.Error when a function runs
 * @returns the ids bound, in catalog order
 */
export function registerCatalog(binder: CustomFunctionsBinder, catalog: readonly FunctionSpec[], lookup: ErrorsLookup): string[] {
  return catalog.map((spec) => {
    // The metadata id is the function name (see metadata.ts); tests hold the two together.
    const id = spec.name;
    binder.associate(id, makeExcelFunction(lookup, spec));
    return id;
  });
}
