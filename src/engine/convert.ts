/**
 * Conversion between HyperFormula's interpreter values and the catalog's
 * cell values, both ways. Upstream errors keep their identity: an error that
 * reaches a DRIFT function as an argument leaves it as the very same
 * HyperFormula error (type, message and origin), not a re-made one.
 */
import { CellError, EmptyValue, SimpleRangeValue } from 'hyperformula';
import type { InternalScalarValue, InterpreterValue } from 'hyperformula/typings/interpreter/InterpreterValue';
import { failure, isFailure, type ArgumentInput, type CellFailure, type CellInput, type CellOutput, type Grid } from '../catalog/values';
import { codeForErrorType, errorTypeForCode, messageForType } from './errorTypes';

/** The HyperFormula error each catalog failure was made from, for failures that came in as arguments. */
const upstreamErrors = new WeakMap<CellFailure, CellError>();

/** A HyperFormula number carrying a display type (date, currency, percent …): its `val` is the plain number. */
interface TypedNumber {
  readonly val: number;
}

function isTypedNumber(value: unknown): value is TypedNumber {
  return typeof value === 'object' && value !== null && typeof (value as TypedNumber).val === 'number';
}

/**
 * One interpreter scalar as a catalog input element.
 *
 * @param value - a number (plain or typed), text, boolean, EmptyValue or CellError
 * @returns the catalog's form: blanks become null, errors become failures
 * @example toCellInput(EmptyValue) // null
 */
export function toCellInput(value: InternalScalarValue): CellInput {
  if (value === EmptyValue) return null;
  if (value instanceof CellError) {
    const upstream = failure(codeForErrorType(value.type), value.message ?? '');
    upstreamErrors.set(upstream, value);
    return upstream;
  }
  if (typeof value === 'number' || typeof value === 'string' || typeof value === 'boolean') return value;
  if (isTypedNumber(value)) return value.val;
  return failure('#VALUE!', `unsupported value in an argument: ${String(value)}`);
}

/**
 * One evaluated argument as the catalog receives it: a range or inline array
 * as a grid, anything else as a single element.
 *
 * @param value - what HyperFormula evaluated the argument's expression to
 * @example toArgumentInput(SimpleRangeValue.onlyValues([[1, 2]])) // [[1, 2]]
 */
export function toArgumentInput(value: InterpreterValue): ArgumentInput {
  if (value instanceof SimpleRangeValue) return value.data.map((row) => row.map(toCellInput));
  return toCellInput(value as InternalScalarValue);
}

/**
 * One catalog output element as an interpreter scalar. A failure becomes a
 * CellError whose type follows the code and whose message is the catalog's;
 * a failure that came in as an argument becomes its original error again.
 *
 * @param value - a number, text or failure from the catalog
 * @example toInterpreterScalar(failure('#NUM!', 'no root')) // CellError(NUM, 'no root')
 */
export function toInterpreterScalar(value: CellOutput): number | string | CellError {
  if (!isFailure(value)) return value;
  return upstreamErrors.get(value) ?? new CellError(errorTypeForCode(value.code), messageForType(value.code, value.message));
}

/**
 * A catalog result grid as an interpreter value: 1×1 as a scalar, larger as
 * an array that spills.
 *
 * @param grid - the result of the catalog's evaluate()
 */
export function toInterpreterValue(grid: Grid<CellOutput>): InterpreterValue {
  if (grid.length === 1 && grid[0].length === 1) return toInterpreterScalar(grid[0][0]);
  return SimpleRangeValue.onlyValues(grid.map((row) => row.map(toInterpreterScalar)));
}
