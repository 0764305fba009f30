/**
 * `driftcell calc`: evaluates formulas and prints their results. One formula
 * prints as it always did (a spill as tab-separated rows); several formulas
 * (arguments, a file, or stdin) print one record per formula, one line each,
 * in the order given (format.ts, formatRecord).
 */
import { readFileSync } from 'node:fs';
import { evaluateFormula, isResultError, type ResultError } from '../engine/engine';
import { CliFailure, EXIT_OK, EXIT_RESULT_ERROR, type Output } from './failure';
import { formatRecord, formatResult, MAX_DIGITS, MIN_DIGITS, type FormattedResult, type NumberStyle } from './format';
import { errorHint } from './hints';
import { escapeForTerminal } from './terminalText';

export interface CalcOptions {
  /** A file of formulas, one a line; `-` is stdin. */
  readonly file?: string;
  /** Significant digits as typed after --digits (validated here). */
  readonly digits?: string;
  /** One record per formula even for a single formula. */
  readonly batch?: boolean;
}

/** A formula to evaluate and how stderr names it in a batch. */
interface Formula {
  readonly text: string;
  readonly label: string;
}

/**
 * Parses the `--digits` value.
 *
 * @throws CliFailure unless it is a whole number from 1 to 17
 */
export function parseDigits(text: string | undefined): number | undefined {
  if (text === undefined) return undefined;
  const digits = Number(text);
  if (!/^\s*\d+\s*$/.test(text) || digits < MIN_DIGITS || digits > MAX_DIGITS) {
    throw new CliFailure(`--digits must be a whole number from ${MIN_DIGITS} to ${MAX_DIGITS}; got ${escapeForTerminal(text)}`);
  }
  return digits;
}

/**
 * The formulas of a file's text: one a line; blank lines and lines whose first
 * non-blank character is `#` (comments) are skipped. A formula that begins
 * with `#` (an error constant) is written with its `=`: `=#N/A`.
 *
 * @param name - how stderr names the source, e.g. the file name or "stdin"
 */
export function formulasOfText(text: string, name: string): Formula[] {
  const formulas: Formula[] = [];
  text.split(/\r?\n/).forEach((line, i) => {
    const trimmed = line.trim();
    if (trimmed === '' || trimmed.startsWith('#')) return;
    formulas.push({ text: trimmed, label: `${name} line ${i + 1}` });
  });
  return formulas;
}

function readFormulas(file: string, readStdin: () => string): Formula[] {
  if (file === '-') return formulasOfText(readStdin(), 'stdin');
  let text: string;
  try {
    text = readFileSync(file, 'utf8');
  } catch (e) {
    const code = (e as NodeJS.ErrnoException).code;
    throw new CliFailure(
      code === 'ENOENT'
        ? `${file}: no such file`
        : code === 'EISDIR'
          ? `${file} is a folder, not a file of formulas`
          : `${file}: cannot be read (${code ?? 'error'})`,
    );
  }
  return formulasOfText(text, file);
}

/** The stderr lines for one formula: messages of errors inside a spill, then hints. */
function stderrLines(formatted: FormattedResult, result: ReturnType<typeof evaluateFormula>, formula: string): string[] {
  const lines = [...formatted.notes];
  const errors: ResultError[] = Array.isArray(result) ? formatted.elementErrors.map((e) => e.error) : isResultError(result) ? [result] : [];
  const hints = new Set<string>();
  for (const error of errors) {
    const hint = errorHint(error, formula);
    if (hint !== undefined) hints.add(hint);
  }
  hints.forEach((hint) => lines.push(`hint: ${escapeForTerminal(hint)}`));
  return lines;
}

const readProcessStdin = () => readFileSync(0, 'utf8');

/**
 * Evaluates formulas and prints their results.
 *
 * @param formulas - the formula arguments (with or without `=`); a lone `-` reads the formulas from stdin
 * @param options - `file`, `digits`, `batch` (see CalcOptions)
 * @param readStdin - reads all of stdin (tests pass their own)
 * @returns 0 when no formula's whole result is an error, 1 when at least one is; CliFailure (2) when it cannot run
 * @example runCalc(['DRIFT.SHEETRES(1,10)', 'DRIFT.SHEETRES(2,10)'], {}, output) // prints 1000 and 500, returns 0
 */
export function runCalc(
  formulas: readonly string[],
  options: CalcOptions,
  output: Output,
  readStdin: () => string = readProcessStdin,
): number {
  const style: NumberStyle = { digits: parseDigits(options.digits) };
  const fromStdin = formulas.length === 1 && formulas[0] === '-';
  if (options.file !== undefined && formulas.length > 0) {
    throw new CliFailure('give the formulas either as arguments or with --file, not both');
  }
  let list: Formula[];
  if (options.file !== undefined || fromStdin) {
    list = readFormulas(options.file ?? '-', readStdin);
    if (list.length === 0)
      throw new CliFailure(
        `${options.file === undefined || options.file === '-' ? 'stdin' : options.file} ` +
          `holds no formulas (blank lines and # comment lines are skipped)`,
      );
  } else {
    if (formulas.length === 0) throw new CliFailure('give a formula, several formulas, --file <file>, or - to read formulas from stdin');
    list = formulas.map((text, i) => ({ text, label: `formula ${i + 1}` }));
  }
  const batch = options.batch === true || options.file !== undefined || fromStdin || list.length > 1;
  let anyError = false;
  for (const formula of list) {
    const result = evaluateFormula(formula.text);
    const formatted = batch ? formatRecord(result, style) : formatResult(result, style);
    formatted.lines.forEach(output.out);
    const notes = stderrLines(formatted, result, formula.text);
    notes.forEach((note) => output.err(batch ? `${formula.label}: ${note}` : note));
    anyError ||= formatted.allErrors;
  }
  return anyError ? EXIT_RESULT_ERROR : EXIT_OK;
}
