/**
 * Parameter builders shared by catalog entries. Each returns a ParameterSpec
 * whose `parse` validates one element once, at the boundary, and throws an
 * InputError whose message names the argument, the value and what is allowed.
 */
import type { ParameterSpec } from './types';
import { InputError, type CellInput } from './values';

type Plain = Exclude<CellInput, { kind: 'failure' }>;

/** Shows a value as the user typed it, for messages. */
export function describeValue(value: Plain): string {
  if (value === null) return 'blank';
  if (typeof value === 'string') return `"${value}"`;
  if (typeof value === 'boolean') return value ? 'TRUE' : 'FALSE';
  return String(value);
}

/**
 * Numbers typed as text: decimal notation with an optional exponent, as a
 * spreadsheet reads them. JavaScript's Number() alone would also accept
 * 0x10, 0b11 and 0o17, which no spreadsheet reads as numbers.
 */
const DECIMAL_TEXT = /^[+-]?(\d+\.?\d*|\.\d+)(e[+-]?\d+)?$/i;

/**
 * Reads text as a number the way a spreadsheet does: decimal notation with an
 * optional exponent, surrounding spaces ignored. The one reader of typed
 * numbers for the catalog and the task pane.
 *
 * @param text - what was typed
 * @returns the number, or null for anything else (blank, hex/binary/octal, '1,5', '1e400', 'Infinity')
 * @example parseDecimalText(' 2.5E+16 ') // 2.5e16
 * @example parseDecimalText('0x10') // null
 */
export function parseDecimalText(text: string): number | null {
  const trimmed = text.trim();
  if (!DECIMAL_TEXT.test(trimmed)) return null;
  const parsed = Number(trimmed);
  return Number.isFinite(parsed) ? parsed : null;
}

/** Reads a number from a cell element: numbers as they are, numeric text trimmed; blanks give null. */
function readNumber(name: string, value: Plain): number | null {
  if (value === null || (typeof value === 'string' && value.trim() === '')) return null;
  if (typeof value === 'number') {
    if (!Number.isFinite(value)) throw new InputError(`${name} must be a finite number; got ${value}`);
    return value;
  }
  if (typeof value === 'string') {
    const parsed = parseDecimalText(value);
    if (parsed !== null) return parsed;
  }
  throw new InputError(`${name} must be a number; got ${describeValue(value)}`);
}

export interface NumberRule {
  /** Lowest allowed value. */
  readonly min?: number;
  /** Whether `min` itself is excluded (e.g. > 0). */
  readonly minExclusive?: boolean;
  readonly max?: number;
  /** Unit shown in range messages; null for dimensionless values. */
  readonly unit?: string | null;
}

function rangeText(rule: NumberRule): string {
  const unit = rule.unit ? ` ${rule.unit}` : '';
  const parts: string[] = [];
  if (rule.min !== undefined) parts.push(`${rule.minExclusive ? '>' : '≥'} ${rule.min}${unit}`);
  if (rule.max !== undefined) parts.push(`≤ ${rule.max}${unit}`);
  return parts.join(' and ');
}

/** Whether a rule excludes 0, so that a 0 from Excel can only have been an empty cell. */
export function excludesZero(rule: NumberRule): boolean {
  return rule.min !== undefined && (rule.min > 0 || (rule.min === 0 && rule.minExclusive === true));
}

function checkRange(name: string, value: number, rule: NumberRule): number {
  const belowMin = rule.min !== undefined && (rule.minExclusive ? value <= rule.min : value < rule.min);
  const aboveMax = rule.max !== undefined && value > rule.max;
  if (belowMin || aboveMax) {
    throw new InputError(`${name} must be ${rangeText(rule)}; got ${value}`);
  }
  return value;
}

interface NumberOptions extends NumberRule {
  readonly name: string;
  readonly unit: string | null;
  readonly description: string;
}

/** A required number. */
export function requiredNumber(options: NumberOptions): ParameterSpec<number> {
  const { name, unit, description } = options;
  return {
    name,
    type: 'number',
    unit,
    description,
    optional: false,
    zeroIsBlank: excludesZero(options),
    parse(value) {
      const n = readNumber(name, value);
      if (n === null) throw new InputError(`${name} is required (${description.replace(/\.$/, '')})`);
      return checkRange(name, n, options);
    },
  };
}

/** An optional number with a default used for blank or omitted arguments. */
export function optionalNumber(options: NumberOptions & { readonly defaultValue: number }): ParameterSpec<number> {
  const { name, unit, description, defaultValue } = options;
  return {
    name,
    type: 'number',
    unit,
    description,
    optional: true,
    defaultText: String(defaultValue),
    zeroIsBlank: excludesZero(options),
    parse(value) {
      const n = readNumber(name, value);
      return n === null ? defaultValue : checkRange(name, n, options);
    },
  };
}

interface CodeOptions<T> {
  readonly name: string;
  readonly description: string;
  /** Allowed codes in display form. */
  readonly choices: () => readonly string[];
  /** Default code for blanks, or undefined if the argument is required. */
  readonly defaultCode?: string;
  /** Maps a canonical code to the value the implementation receives. */
  readonly resolve: (code: string) => T;
  /** Other spellings, e.g. { electrons: 'electron' }: alias → code in `choices`. */
  readonly aliases?: Readonly<Record<string, string>>;
}

/**
 * The canonical code for each spelling, lower case; throws if two spellings
 * are the same case-insensitively, so no code can differ from another by case
 * alone (the argument fails, as an internal error, rather than read a code
 * two ways; tests/catalog/codeCase.test.ts parses every code of every argument).
 */
export function spellingTable(name: string, codes: readonly string[], aliases: Readonly<Record<string, string>> = {}): Map<string, string> {
  const table = new Map<string, string>();
  const add = (spelling: string, code: string) => {
    const key = spelling.trim().toLowerCase();
    const taken = table.get(key);
    if (taken !== undefined && taken !== code) {
      throw new Error(`${name}: "${spelling}" would mean both ${taken} and ${code}`);
    }
    table.set(key, code);
  };
  for (const code of codes) add(code, code);
  for (const [alias, code] of Object.entries(aliases)) {
    if (!codes.includes(code)) throw new Error(`${name}: alias "${alias}" names unknown code ${code}`);
    add(alias, code);
  }
  return table;
}

/** A text code (case-insensitive, with optional aliases) from a fixed list. */
export function codeParameter<T>(options: CodeOptions<T>): ParameterSpec<T> {
  const { name, description, choices, defaultCode, resolve, aliases } = options;
  const optional = defaultCode !== undefined;
  let table: Map<string, string> | undefined;
  // Built on first use: choices may read tables that are still loading when the catalog module runs.
  const spellings = () => (table ??= spellingTable(name, choices(), aliases));
  return {
    name,
    type: 'text',
    unit: null,
    description,
    optional,
    defaultText: defaultCode,
    choices,
    aliases: aliases ? Object.keys(aliases) : undefined,
    zeroIsBlank: true,
    parse(value) {
      if (value === null || (typeof value === 'string' && value.trim() === '')) {
        if (optional) return resolve(defaultCode);
        throw new InputError(`${name} is required; allowed: ${choices().join(', ')}`);
      }
      if (typeof value !== 'string') {
        throw new InputError(`${name} must be a text code; got ${describeValue(value)}; allowed: ${choices().join(', ')}`);
      }
      const match = spellings().get(value.trim().toLowerCase());
      if (match === undefined) {
        const also = aliases ? `; also ${Object.keys(aliases).join(', ')}` : '';
        throw new InputError(`${name} "${value}" is not known; allowed: ${choices().join(', ')}${also}`);
      }
      return resolve(match);
    },
  };
}

/**
 * A required code whose meaning depends on another argument (a dopant is
 * known only per material), so the implementation resolves it. This parser
 * insists on non-blank text, refuses what `problem` names (a code that reads
 * two ways), and hands the rest on trimmed.
 */
export function requiredCode(options: {
  readonly name: string;
  readonly description: string;
  readonly details?: string;
  readonly choices: () => readonly string[];
  /** Why a text cannot be taken (the message), or null. */
  readonly problem?: (text: string) => string | null;
}): ParameterSpec<string> {
  const { name, description, details, choices, problem } = options;
  return {
    name,
    type: 'text',
    unit: null,
    description,
    details,
    optional: false,
    choices,
    zeroIsBlank: true,
    parse(value) {
      if (value === null || (typeof value === 'string' && value.trim() === '')) {
        throw new InputError(`${name} is required; allowed: ${choices().join(', ')}`);
      }
      if (typeof value !== 'string') {
        throw new InputError(`${name} must be a text code; got ${describeValue(value)}; allowed: ${choices().join(', ')}`);
      }
      const refusal = problem?.(value);
      if (refusal) throw new InputError(refusal);
      return value.trim();
    },
  };
}
