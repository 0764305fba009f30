/**
 * Text forms of results for the terminal: numbers at full precision (the
 * shortest text that reads back as the same double) or to N significant
 * digits, spills as tab-separated rows (or, in a batch, one record per
 * formula), errors as code and message. Text from results is printed with
 * control and bidirectional characters escaped (terminalText.ts).
 */
import { isResultError, type FormulaResult, type ResultElement, type ResultError } from '../engine/engine';
import { escapeForTerminal } from './terminalText';

/** Significant digits `--digits` accepts: 17 digits identify every double. */
export const MIN_DIGITS = 1;
export const MAX_DIGITS = 17;

/** How numbers are written: full precision (default) or `digits` significant digits. */
export interface NumberStyle {
  readonly digits?: number;
}

/** One line, safe for a terminal: messages from the engine may contain line breaks. */
function oneLine(text: string): string {
  return escapeForTerminal(text.replace(/\s+/g, ' ').trim());
}

/**
 * A number as text. Full precision: the shortest text that reads back as the
 * same double (String). With `digits`: JavaScript's toPrecision(digits), whose
 * exponent form (`2.86e+19`) is used when the exponent is ≥ digits or < −6;
 * trailing zeros are kept, as they are significant.
 *
 * @example formatNumber(28599999999999922000) // '28599999999999922000'
 * @example formatNumber(28599999999999922000, { digits: 3 }) // '2.86e+19'
 * @example formatNumber(13.5, { digits: 5 }) // '13.500'
 */
export function formatNumber(value: number, style: NumberStyle = {}): string {
  return style.digits === undefined ? String(value) : value.toPrecision(style.digits);
}

/**
 * An error as `#CODE message` (or just the code when there is no message).
 *
 * @example formatError({ kind: 'error', code: '#VALUE!', message: 'doping must be > 0' }) // '#VALUE! doping must be > 0'
 */
export function formatError(error: ResultError): string {
  const message = oneLine(error.message);
  return message === '' ? escapeForTerminal(error.code) : `${escapeForTerminal(error.code)} ${message}`;
}

/**
 * One element as a table cell: numbers by formatNumber, booleans as
 * TRUE/FALSE, blanks empty, errors by their code only.
 */
export function formatElement(value: ResultElement, style: NumberStyle = {}): string {
  if (value === null) return '';
  if (typeof value === 'number') return formatNumber(value, style);
  if (typeof value === 'boolean') return value ? 'TRUE' : 'FALSE';
  if (typeof value === 'string') return oneLine(value);
  return escapeForTerminal(value.code);
}

/** An element in a batch record: as formatElement, but text in double quotes (`"` doubled), as a spreadsheet constant. */
function recordElement(value: ResultElement, style: NumberStyle): string {
  return typeof value === 'string' ? `"${oneLine(value).replace(/"/g, '""')}"` : formatElement(value, style);
}

/** An error inside a spill, at 1-based row and column. */
export interface ElementError {
  readonly row: number;
  readonly column: number;
  readonly error: ResultError;
}

/** What `calc` prints for one formula: stdout lines, the errors inside a spill, and whether it is all errors. */
export interface FormattedResult {
  readonly lines: string[];
  /** stderr lines: the messages of errors inside a spill. */
  readonly notes: string[];
  readonly elementErrors: ElementError[];
  readonly allErrors: boolean;
}

function collectErrors(result: FormulaResult): { errors: ElementError[]; allErrors: boolean } {
  if (!Array.isArray(result)) return { errors: [], allErrors: isResultError(result) };
  const errors: ElementError[] = [];
  let elements = 0;
  result.forEach((row, r) =>
    row.forEach((value, c) => {
      elements++;
      if (isResultError(value)) errors.push({ row: r + 1, column: c + 1, error: value });
    }),
  );
  return { errors, allErrors: elements > 0 && errors.length === elements };
}

/**
 * Formats a formula's result for `calc` with one formula: a value on one
 * line, a spill as tab-separated rows.
 *
 * @param result - a single value or the rows of a spill
 * @example formatResult(13.5).lines // ['13.5']
 */
export function formatResult(result: FormulaResult, style: NumberStyle = {}): FormattedResult {
  const { errors, allErrors } = collectErrors(result);
  const notes = errors.map((e) => `row ${e.row}, column ${e.column}: ${formatError(e.error)}`);
  if (!Array.isArray(result)) {
    const line = isResultError(result) ? formatError(result) : formatElement(result, style);
    return { lines: [line], notes, elementErrors: errors, allErrors };
  }
  const lines = result.map((row) => row.map((value) => formatElement(value, style)).join('\t'));
  return { lines, notes, elementErrors: errors, allErrors };
}

/**
 * Formats a formula's result as one batch record (one line):
 * - a single value as with one formula: number, text (in double quotes, `"` doubled),
 *   TRUE/FALSE, empty for a blank, or `#CODE message` for an error;
 * - a spill as an Excel array constant: `{1,2;3,4}` — columns separated by `,`,
 *   rows by `;`, text in double quotes, errors by their code (messages on stderr).
 *
 * @example formatRecord([[1, 2], [3, 4]]).lines // ['{1,2;3,4}']
 */
export function formatRecord(result: FormulaResult, style: NumberStyle = {}): FormattedResult {
  const { errors, allErrors } = collectErrors(result);
  const notes = errors.map((e) => `row ${e.row}, column ${e.column}: ${formatError(e.error)}`);
  if (!Array.isArray(result)) {
    const line = isResultError(result) ? formatError(result) : recordElement(result, style);
    return { lines: [line], notes, elementErrors: errors, allErrors };
  }
  const line = `{${result.map((row) => row.map((value) => recordElement(value, style)).join(',')).join(';')}}`;
  return { lines: [line], notes, elementErrors: errors, allErrors };
}
