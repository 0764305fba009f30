/**
 * Converts the arguments Excel passes to a custom function (parameters of
 * type `any`, dimensionality `matrix`) into the catalog's ArgumentInput.
 *
 * What Excel passes (Office custom functions documentation):
 * - an optional argument left out arrives as `null`;
 * - a range or array arrives as a two-dimensional array, row-major; a single
 *   value in a matrix parameter arrives as a 1×1 array;
 * - with `allowErrorForDataTypeAny: true`, an error in the range arrives as an
 *   error value instead of Excel short-circuiting the whole call. The
 *   documentation does not spell out that value's shape, so both documented
 *   error shapes are read: CustomFunctions.Error (`code: "#DIV/0!"`) and the
 *   data-types ErrorCellValue (`type: "Error"`, `basicValue: "#DIV/0!"`);
 * - every call also gets an invocation object as its last argument, which is
 *   not a formula argument and is dropped here.
 * How blank cells arrive is not documented either, and Office.js issue
 * reports show both behaviours: null or empty text, and on some Excel desktop
 * builds the number 0. Null and empty text are read as blank everywhere; 0 is
 * read as blank only in arguments where 0 can never be valid (the catalog
 * marks them `zeroIsBlank`: temperatures, text codes, readings that must be
 * > 0), so that a referenced empty cell takes the default there. Where 0 means
 * something (counter_doping), it stays 0.
 */
import type { FunctionSpec } from '../catalog/types';
import { failure, type ArgumentInput, type CellFailure, type CellInput, type Grid } from '../catalog/values';
import { codeFromExcelErrorText } from './errors';

type Plain = string | number | boolean;

function isPlain(value: unknown): value is Plain {
  return typeof value === 'string' || typeof value === 'number' || typeof value === 'boolean';
}

/** The cell text of an Excel error value, or undefined if the value is not one. */
export function excelErrorText(value: unknown): string | undefined {
  if (typeof value !== 'object' || value === null) return undefined;
  const record = value as Record<string, unknown>;
  if (typeof record.code === 'string' && record.code.startsWith('#')) return record.code;
  if (record.type === 'Error' && typeof record.basicValue === 'string') return record.basicValue;
  return undefined;
}

/** An upstream Excel error as a catalog failure that names the argument it arrived in. */
function inputFailure(errorText: string, parameterName: string): CellFailure {
  const code = codeFromExcelErrorText(errorText);
  const where = `${parameterName} holds ${errorText} from its input`;
  // Codes outside the catalog's table (#SPILL!, #CALC!, #BUSY!, …) become #VALUE! naming the original.
  return code === undefined ? failure('#VALUE!', `${where}; fix that cell first`) : failure(code, `${where}; fix that cell first`);
}

/**
 * Converts one element of an Excel argument.
 *
 * @param raw - the element as Excel passed it
 * @param parameterName - the catalog argument name, for messages
 * @returns a number, text or boolean as it is; null for a blank; a CellFailure for an error or an unreadable value
 */
export function toCellInput(raw: unknown, parameterName: string, zeroIsBlank = false): CellInput {
  if (raw === null || raw === undefined) return null;
  if (raw === 0 && zeroIsBlank) return null;
  if (typeof raw === 'string') return raw === '' ? null : raw;
  if (typeof raw === 'number' || typeof raw === 'boolean') return raw;
  const errorText = excelErrorText(raw);
  if (errorText !== undefined) return inputFailure(errorText, parameterName);
  // Rich values (formatted numbers, entities) carry their plain value as basicValue.
  if (typeof raw === 'object' && !Array.isArray(raw) && 'basicValue' in raw) {
    const basic = (raw as Record<string, unknown>).basicValue;
    if (basic === null || basic === undefined) return null;
    if (isPlain(basic)) return toCellInput(basic, parameterName, zeroIsBlank);
  }
  return failure('#VALUE!', `${parameterName} holds a value Driftcell cannot read (${describeKind(raw)}); give a number or text`);
}

function describeKind(raw: unknown): string {
  if (Array.isArray(raw)) return 'a nested array';
  if (typeof raw === 'object' && raw !== null) {
    const type = (raw as Record<string, unknown>).type;
    if (typeof type === 'string') return `${/^[aeiou]/i.test(type) ? 'an' : 'a'} ${type} value`;
    return 'an object';
  }
  return typeof raw;
}

/**
 * Converts one Excel argument (scalar, 2-D array or omitted).
 *
 * @param raw - the argument as Excel passed it
 * @param parameterName - the catalog argument name, for messages
 * @param zeroIsBlank - read 0 as a blank cell (the parameter's `zeroIsBlank`)
 * @returns undefined when omitted, otherwise a single CellInput or a grid of them
 * @example toArgumentInput([[1e16], [""]], 'doping') // [[1e16], [null]]
 */
export function toArgumentInput(raw: unknown, parameterName: string, zeroIsBlank = false): ArgumentInput {
  if (raw === null || raw === undefined) return undefined;
  if (!Array.isArray(raw)) return toCellInput(raw, parameterName, zeroIsBlank);
  if (raw.length === 0) return undefined;
  // A one-dimensional array (not produced by Excel for matrix parameters) is read as one row.
  const rows: unknown[][] = raw.every(Array.isArray) ? (raw as unknown[][]) : [raw];
  if (rows[0].length === 0) return undefined;
  const grid: Grid<CellInput> = rows.map((row) => row.map((element) => toCellInput(element, parameterName, zeroIsBlank)));
  return grid;
}

/**
 * Converts a whole call's arguments for one catalog function.
 *
 * @param spec - the catalog function
 * @param rawArgs - the arguments as Excel passed them, the invocation object last
 * @returns one ArgumentInput per declared parameter
 */
export function toArgumentInputs(spec: FunctionSpec, rawArgs: readonly unknown[]): ArgumentInput[] {
  return spec.parameters.map((parameter, index) => toArgumentInput(rawArgs[index], parameter.name, parameter.zeroIsBlank === true));
}
