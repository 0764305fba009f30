/**
 * The shape of a catalog entry. One FunctionSpec per spreadsheet function is
 * the single source of truth from which Excel metadata, the engine plugin,
 * help pages and the README table are generated.
 */
import type { CellInput, CellOutput, Grid } from './values';

export type ParameterType = 'number' | 'text';

export interface ParameterSpec<T = unknown> {
  /** Argument name as the user sees it, e.g. `temperature_K`. */
  readonly name: string;
  readonly type: ParameterType;
  /** Unit in display form (cm⁻³, Ω·cm, K), or null for codes and fractions. */
  readonly unit: string | null;
  /** One sentence, at most 120 characters (Excel's tooltip cuts longer ones), shown in the tooltip and the help page. */
  readonly description: string;
  /** More about the argument, for the help page only (full code lists, rules). */
  readonly details?: string;
  readonly optional: boolean;
  /** Display form of the default, for help and metadata (e.g. `300`, `Si`). */
  readonly defaultText?: string;
  /** Allowed codes, for text parameters that take a code. Matched in any case. */
  readonly choices?: () => readonly string[];
  /** Other accepted spellings of those codes (e.g. 'electrons'), matched in any case. */
  readonly aliases?: readonly string[];
  /**
   * Turns one element into the value the implementation receives. `null`
   * means blank. Throws InputError with a message naming the argument, the
   * value and what is allowed.
   */
  readonly parse: (value: Exclude<CellInput, { kind: 'failure' }>) => T;
  /**
   * Present only on a reducing argument, one that is consumed whole (a range
   * reduced to one value) instead of broadcast: the catalog hands it every
   * element of the argument, row by row, and the implementation receives what
   * it returns. A reducing argument takes no part in the result's shape; an
   * error element in it (or an InputError it throws) fails the whole result.
   * `parse` still reads a value given on its own, as `reduce([value])` does.
   */
  readonly reduce?: (elements: readonly Exclude<CellInput, { kind: 'failure' }>[]) => T;
  /**
   * True where 0 can never be a valid value (temperatures, codes, readings
   * that must be > 0). Some Excel builds pass an empty cell as 0 rather than
   * as blank, so the Excel front end reads a 0 in such an argument as blank.
   */
  readonly zeroIsBlank?: boolean;
}

export type ParsedArguments<P extends readonly ParameterSpec[]> = {
  [K in keyof P]: P[K] extends ParameterSpec<infer T> ? T : never;
};

export interface Example {
  /** A formula exactly as typed in a cell. */
  readonly formula: string;
  /** What it shows, in words. */
  readonly note: string;
}

interface SpecCommon {
  /** Name without the namespace, upper case, e.g. `RESISTIVITY`. */
  readonly name: string;
  /** One line for Excel's function list. */
  readonly summary: string;
  /** Help page body: paragraphs separated by blank lines. */
  readonly help: string;
  readonly result: { readonly unit: string | null; readonly description: string };
  readonly examples: readonly Example[];
  /** Model codes whose citations belong on this function's help page. */
  readonly models: readonly string[];
}

/** A function evaluated element by element over broadcast arguments. */
// eslint-disable-next-line @typescript-eslint/no-explicit-any -- erased argument types for the catalog list
export type AnyParameters = readonly ParameterSpec<any>[];

export interface ElementwiseSpec<P extends readonly ParameterSpec[] = AnyParameters> extends SpecCommon {
  readonly kind: 'elementwise';
  readonly parameters: P;
  readonly compute: (...args: ParsedArguments<P>) => number;
}

/** A function that returns a whole table (no broadcasting), e.g. MODELS. */
export interface TableSpec extends SpecCommon {
  readonly kind: 'table';
  readonly parameters: readonly [];
  readonly table: () => Grid<CellOutput>;
}

/**
 * A function whose every call gives a fixed-length row of numbers (e.g. a
 * [low, high] window). Arguments are single values or columns: a column gives
 * one result row per element, laid out as `columns`, so the result is
 * (tallest argument) × columns.length. An argument with more than one column
 * is refused with one error, because its values would have nowhere to go.
 */
export interface TupleSpec<P extends readonly ParameterSpec[] = AnyParameters> extends SpecCommon {
  readonly kind: 'tuple';
  readonly parameters: P;
  /** What each result column holds, in order; its length is the width of every result row. */
  readonly columns: readonly string[];
  /** Returns exactly columns.length numbers. */
  readonly compute: (...args: ParsedArguments<P>) => readonly number[];
}

/**
 * A function whose every call gives one row whose length depends on the
 * values of its arguments, not on their shapes (DRIFT.MODELCODES: the codes
 * that apply to a quantity and material). Every argument is a single value:
 * a multi-cell argument is refused with one error, because rows of different
 * lengths cannot be stacked into one result. No argument reduces.
 */
export interface RowSpec<P extends readonly ParameterSpec[] = AnyParameters> extends SpecCommon {
  readonly kind: 'row';
  readonly parameters: P;
  /** The row, at least one value long; an InputError or PhysicsDomainError it throws becomes the call's one error. */
  readonly compute: (...args: ParsedArguments<P>) => readonly (string | number)[];
}

export type FunctionSpec = ElementwiseSpec<AnyParameters> | TableSpec | TupleSpec<AnyParameters> | RowSpec<AnyParameters>;

/** Declares an elementwise function with its argument types inferred. */
export function elementwise<const P extends readonly ParameterSpec[]>(spec: Omit<ElementwiseSpec<P>, 'kind'>): ElementwiseSpec<P> {
  return { kind: 'elementwise', ...spec };
}

export function tableFunction(spec: Omit<TableSpec, 'kind' | 'parameters'>): TableSpec {
  return { kind: 'table', parameters: [], ...spec };
}

/** Declares a function that returns a fixed-length row per call, argument types inferred. */
export function tupleFunction<const P extends readonly ParameterSpec[]>(spec: Omit<TupleSpec<P>, 'kind'>): TupleSpec<P> {
  return { kind: 'tuple', ...spec };
}

/** Declares a function whose row's length follows its arguments' values, argument types inferred. */
export function rowFunction<const P extends readonly ParameterSpec[]>(spec: Omit<RowSpec<P>, 'kind'>): RowSpec<P> {
  return { kind: 'row', ...spec };
}
