/**
 * Cell values as every host (Excel, the headless engine, the CLI) hands them to
 * the catalog, and as the catalog hands results back. Host adapters translate
 * their own representations into these and back; nothing here knows a host.
 */

/** Error codes a cell can show. #VALUE! is used wherever a message must be visible. */
export type ErrorCode = '#VALUE!' | '#NUM!' | '#N/A' | '#DIV/0!' | '#REF!' | '#NAME?' | '#NULL!';

/** An error in one cell or one element of a spill, with a message for the user. */
export interface CellFailure {
  readonly kind: 'failure';
  readonly code: ErrorCode;
  readonly message: string;
}

/** One input element: a number, text, a boolean, a blank (null) or an upstream error. */
export type CellInput = number | string | boolean | null | CellFailure;

/** One output element. */
export type CellOutput = number | string | CellFailure;

/** A rectangular block of values, row-major: grid[row][column]. */
export type Grid<T> = T[][];

/** An argument as received: a single value, a range/array, or absent (undefined). */
export type ArgumentInput = CellInput | Grid<CellInput> | undefined;

export function failure(code: ErrorCode, message: string): CellFailure {
  return { kind: 'failure', code, message };
}

export function isFailure(value: unknown): value is CellFailure {
  return typeof value === 'object' && value !== null && (value as CellFailure).kind === 'failure';
}

/**
 * Thrown by implementations and argument parsers for bad input. The catalog
 * turns it into a #VALUE! (or the given code) in that element only.
 */
export class InputError extends Error {
  constructor(
    message: string,
    readonly code: ErrorCode = '#VALUE!',
  ) {
    super(message);
    this.name = 'InputError';
  }
}
