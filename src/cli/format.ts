/**
 * Text forms of results for the terminal: numbers at full precision (the
 * shortest text that reads back as the same double), spills as
 * tab-separated rows, errors as code and message.
 */
import { isResultError, type FormulaResult, type ResultElement, type ResultError } from '../engine/engine';

/** One line: messages from the engine may contain line breaks. */
function oneLine(text: string): string {
  return text.replace(/\s+/g, ' ').trim();
}

/**
 * An error as `#CODE message` (or just the code when there is no message).
 *
 * @example formatError({ kind: 'error', code: '#VALUE!', message: 'doping must be > 0' }) // '#VALUE! doping must be > 0'
 */
export function formatError(error: ResultError): string {
  const message = oneLine(error.message);
  return message === '' ? error.code : `${error.code} ${message}`;
}

/**
 * One element as a table cell: numbers by String() (shortest round trip),
 * booleans as TRUE/FALSE, blanks empty, errors by their code only.
 */
export function formatElement(value: ResultElement): string {
  if (value === null) return '';
  if (typeof value === 'number') return String(value);
  if (typeof value === 'boolean') return value ? 'TRUE' : 'FALSE';
  if (typeof value === 'string') return oneLine(value);
  return value.code;
}

/** What `calc` prints: stdout lines, stderr lines (messages of errors inside a spill), and whether it is all errors. */
export interface FormattedResult {
  readonly lines: string[];
  readonly notes: string[];
  readonly allErrors: boolean;
}

/**
 * Formats a formula's result for `calc`.
 *
 * @param result - a single value or the rows of a spill
 * @example formatResult(13.5).lines // ['13.5']
 */
export function formatResult(result: FormulaResult): FormattedResult {
  if (!Array.isArray(result)) {
    if (isResultError(result)) return { lines: [formatError(result)], notes: [], allErrors: true };
    return { lines: [formatElement(result)], notes: [], allErrors: false };
  }
  const notes: string[] = [];
  let errors = 0;
  let elements = 0;
  const lines = result.map((row, r) =>
    row
      .map((value, c) => {
        elements++;
        if (isResultError(value)) {
          errors++;
          notes.push(`row ${r + 1}, column ${c + 1}: ${formatError(value)}`);
        }
        return formatElement(value);
      })
      .join('\t'),
  );
  return { lines, notes, allErrors: elements > 0 && errors === elements };
}
