/**
 * Reads a formula that is one function call, such as the catalog examples
 * `=DRIFT.INTRINSIC(300,,"sproul-green")` or `=DRIFT.MINORITY(1e15,"B",{300,400,500})`,
 * into its arguments: literals (number, text, TRUE/FALSE), array constants,
 * arguments left out, and anything else (a reference, a nested call) kept as
 * its text. No worksheet is needed; the task pane's function reference and
 * the tests that replay catalog examples both read examples with it.
 *
 * No dependency beyond the catalog's own number reading and namespace.
 */
import { NAMESPACE } from './naming';
import { parseDecimalText } from './parameters';
import type { ArgumentInput, CellInput, Grid } from './values';

/** A literal argument value. */
export type LiteralValue = string | number | boolean;

/** One argument of a call as written. */
export type CallArgument =
  | { readonly kind: 'blank' }
  | { readonly kind: 'value'; readonly value: LiteralValue }
  /** An array constant `{1,2;3,4}`: rows split at ';', values at ','. */
  | { readonly kind: 'array'; readonly rows: readonly (readonly LiteralValue[])[] }
  /** A reference, a name, a nested call or an array with any of those: its trimmed text. */
  | { readonly kind: 'other'; readonly text: string };

/** A call: the function name as written (e.g. 'DRIFT.DOPING') and its arguments. */
export interface CallParts {
  readonly name: string;
  readonly arguments: readonly CallArgument[];
}

/**
 * Splits text at a separator outside quotes, parentheses and braces.
 * Returns null when the brackets or quotes do not balance.
 */
function splitTopLevel(text: string, separator: string): string[] | null {
  const parts: string[] = [];
  let depth = 0;
  let inString = false;
  let start = 0;
  for (let i = 0; i < text.length; i++) {
    const ch = text[i];
    if (inString) {
      if (ch === '"') {
        if (text[i + 1] === '"') i++;
        else inString = false;
      }
      continue;
    }
    if (ch === '"') inString = true;
    else if (ch === '{' || ch === '(') depth++;
    else if (ch === '}' || ch === ')') depth--;
    else if (ch === separator && depth === 0) {
      parts.push(text.slice(start, i));
      start = i + 1;
    }
    if (depth < 0) return null;
  }
  if (inString || depth !== 0) return null;
  parts.push(text.slice(start));
  return parts;
}

/** A literal's value, or undefined for anything else. */
function literal(text: string): LiteralValue | undefined {
  const t = text.trim();
  if (/^"([^"]|"")*"$/.test(t)) return t.slice(1, -1).replace(/""/g, '"');
  const number = parseDecimalText(t);
  if (number !== null) return number;
  if (/^true$/i.test(t)) return true;
  if (/^false$/i.test(t)) return false;
  return undefined;
}

/** The rows of an array constant's inner text, or null when one element is not a literal. */
function arrayRows(inner: string): LiteralValue[][] | null {
  const rows = splitTopLevel(inner, ';');
  if (rows === null) return null;
  const grid: LiteralValue[][] = [];
  for (const row of rows) {
    const cells = splitTopLevel(row, ',');
    if (cells === null) return null;
    const values = cells.map(literal);
    if (values.some((value) => value === undefined)) return null;
    grid.push(values as LiteralValue[]);
  }
  return grid;
}

function callArgument(text: string): CallArgument {
  const t = text.trim();
  if (t === '') return { kind: 'blank' };
  const value = literal(t);
  if (value !== undefined) return { kind: 'value', value };
  if (t.startsWith('{') && t.endsWith('}')) {
    const rows = arrayRows(t.slice(1, -1));
    if (rows !== null) return { kind: 'array', rows };
  }
  return { kind: 'other', text: t };
}

/**
 * Reads a formula that is exactly one call.
 *
 * @param formula - e.g. '=DRIFT.DOPING(10,"B")'
 * @returns the name as written and one entry per written argument, or null when the formula is not one call
 *   (e.g. '=DRIFT.DOPING(1)+DRIFT.DOPING(2)', '=DRIFT.DOPING(10,"B")*2') or its brackets or quotes do not balance
 * @example
 * const call = readCall('=DRIFT.DOPING(10,,{1,2})');
 * call?.arguments // [{ kind: 'value', value: 10 }, { kind: 'blank' }, { kind: 'array', rows: [[1, 2]] }]
 */
export function readCall(formula: string): CallParts | null {
  const match = /^=([A-Za-z_][\w.]*)\((.*)\)$/.exec(formula.trim());
  if (match === null) return null;
  const [, name, inner] = match;
  const parts = splitTopLevel(inner, ',');
  if (parts === null) return null;
  if (inner.trim() === '') return { name, arguments: [] };
  return { name, arguments: parts.map(callArgument) };
}

/** A DRIFT call whose arguments are all literals. */
export interface LiteralCall {
  /** The catalog name, without the namespace: 'INTRINSIC' for `=DRIFT.INTRINSIC(…)`. */
  readonly name: string;
  /** Arguments in catalog form: a value, a grid, or undefined when left out. */
  readonly args: ArgumentInput[];
}

/**
 * Reads a literal-only DRIFT call. Formulas with cell references or nested
 * calls give null: they need a worksheet.
 *
 * @param formula - e.g. '=DRIFT.INTRINSIC(300,,"sproul-green")'
 * @returns name and arguments in catalog form, or null
 * @example parseLiteralCall('=DRIFT.MINORITY(1e15,"B",{300,400})') // { name: 'MINORITY', args: [1e15, 'B', [[300, 400]]] }
 */
export function parseLiteralCall(formula: string): LiteralCall | null {
  const call = readCall(formula);
  const prefix = `${NAMESPACE}.`;
  if (call === null || !call.name.startsWith(prefix)) return null;
  const name = call.name.slice(prefix.length);
  if (!/^[A-Z]+$/.test(name)) return null;
  const args: ArgumentInput[] = [];
  for (const argument of call.arguments) {
    if (argument.kind === 'other') return null;
    if (argument.kind === 'blank') args.push(undefined);
    else if (argument.kind === 'value') args.push(argument.value);
    else args.push(argument.rows.map((row) => [...row]) as Grid<CellInput>);
  }
  return { name, args };
}
