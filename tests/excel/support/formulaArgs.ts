/**
 * Reads a catalog example formula such as `=DRIFT.NI(300,,"sproul-green")` or
 * `=DRIFT.MINORITY(1e15,"B",{300,400,500})` into its arguments, when every
 * argument is a literal (number, text, TRUE/FALSE, array constant or left
 * out). Formulas with cell references or nested calls give null: they need a
 * worksheet, which these tests do not have.
 */
import type { ArgumentInput, CellInput, Grid } from '../../../src/catalog/values';

export interface LiteralCall {
  readonly name: string;
  /** Arguments in catalog form: a value, a grid, or undefined when left out. */
  readonly args: ArgumentInput[];
}

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

function scalar(text: string): CellInput | undefined {
  const t = text.trim();
  if (/^"([^"]|"")*"$/.test(t)) return t.slice(1, -1).replace(/""/g, '"');
  if (/^[+-]?(\d+\.?\d*|\.\d+)(e[+-]?\d+)?$/i.test(t)) return Number(t);
  if (/^true$/i.test(t)) return true;
  if (/^false$/i.test(t)) return false;
  return undefined; // a reference, a name or a nested call
}

function argument(text: string): ArgumentInput | null {
  const t = text.trim();
  if (t === '') return undefined;
  if (t.startsWith('{') && t.endsWith('}')) {
    const rows = splitTopLevel(t.slice(1, -1), ';');
    if (rows === null) return null;
    const grid: Grid<CellInput> = [];
    for (const row of rows) {
      const cells = splitTopLevel(row, ',');
      if (cells === null) return null;
      const values = cells.map(scalar);
      if (values.some((v) => v === undefined)) return null;
      grid.push(values as CellInput[]);
    }
    return grid;
  }
  const value = scalar(t);
  return value === undefined ? null : value;
}

/** Parses a literal-only DRIFT call, or returns null. */
export function parseLiteralCall(formula: string): LiteralCall | null {
  const m = /^=DRIFT\.([A-Z]+)\((.*)\)$/.exec(formula.trim());
  if (!m) return null;
  const [, name, inner] = m;
  if (inner.trim() === '') return { name, args: [] };
  const parts = splitTopLevel(inner, ',');
  if (parts === null) return null;
  const args: ArgumentInput[] = [];
  for (const part of parts) {
    const a = argument(part);
    if (a === null) return null;
    args.push(a);
  }
  return { name, args };
}

/**
 * The arguments as Excel passes them to a custom function whose parameters are
 * all `matrix`: each given value as a 2-D array, each left-out argument
 * (typed empty or not typed at all) as null, and an invocation object last.
 */
export function excelShapedArgs(call: LiteralCall, parameterCount: number): unknown[] {
  const shaped: unknown[] = [];
  for (let i = 0; i < parameterCount; i++) {
    const a = call.args[i];
    shaped.push(a === undefined ? null : Array.isArray(a) ? a : [[a]]);
  }
  shaped.push({ functionName: call.name });
  return shaped;
}
