/**
 * fast-check generators for catalog arguments, written from each parameter's
 * own metadata (type 'number' or 'text', choices(), optional), so that
 * functions added to CATALOG later get inputs without changes here.
 *
 * Elements mix plausible values (codes from choices(), numbers spread over
 * many decades) with adversarial ones: negative, zero, 1e-300, 1e300,
 * subnormals, NaN and ±Infinity as a host might pass them, numeric text,
 * booleans, blanks, junk text and upstream errors.
 */
import fc from 'fast-check';
import type { ParameterSpec } from '../../../src/catalog/types';
import { failure, isFailure, type ArgumentInput, type CellInput, type ErrorCode } from '../../../src/catalog/values';

/** Upper bounds of the grids the property tests build (a big grid is used sparingly). */
export const SMALL_GRID = { rows: 5, columns: 5 } as const;
export const BIG_GRID = { rows: 200, columns: 50 } as const;

const ERROR_CODES: readonly ErrorCode[] = ['#VALUE!', '#NUM!', '#N/A', '#DIV/0!', '#REF!', '#NAME?', '#NULL!'];

/** Numbers at the edges of what a double holds, and ordinary magnitudes of the trade. */
export const EDGE_NUMBERS: readonly number[] = [
  0,
  -0,
  -1,
  1,
  -1e300,
  1e300,
  1e-300,
  -1e-300,
  5e-324,
  Number.MAX_VALUE,
  -Number.MAX_VALUE,
  Number.MIN_VALUE,
  1e308,
  2 ** 53,
  1e-12,
  0.5,
  10,
  20,
  19.999,
  300,
  1000,
  1000.001,
  1687,
  1e10,
  1e13,
  1e15,
  1e16,
  1e18,
  1e20,
  1e21,
  1e22,
  1.0000001e22,
  1e23,
];
/** Values no cell holds but a careless host could pass. */
const NON_FINITE: readonly number[] = [Number.NaN, Number.POSITIVE_INFINITY, Number.NEGATIVE_INFINITY];

/** A number spread over many decades, either sign. */
const decadeNumber: fc.Arbitrary<number> = fc
  .tuple(fc.integer({ min: -320, max: 308 }), fc.double({ min: 1, max: 9.999, noNaN: true }), fc.boolean())
  .map(([exponent, mantissa, negative]) => (negative ? -1 : 1) * mantissa * 10 ** exponent);

const anyNumber: fc.Arbitrary<number> = fc.oneof(
  { weight: 3, arbitrary: fc.constantFrom(...EDGE_NUMBERS) },
  { weight: 3, arbitrary: decadeNumber },
  { weight: 2, arbitrary: fc.double() },
  { weight: 1, arbitrary: fc.constantFrom(...NON_FINITE) },
);

const upstreamError: fc.Arbitrary<CellInput> = fc
  .tuple(fc.constantFrom(...ERROR_CODES), fc.constantFrom('', 'from A1', 'upstream'))
  .map(([code, message]) => failure(code, message));

const junkText: fc.Arbitrary<string> = fc.oneof(
  fc.string({ maxLength: 12 }),
  fc.constantFrom('', ' ', 'abc', 'NaN', 'Infinity', '-Infinity', '1e400', '0x10', '1,5', '1e15 cm', 'TRUE', '#N/A', '=1+1', '"'),
);

/** Numeric text as users type it: spaces around, exponent notation. */
const numericText: fc.Arbitrary<string> = fc
  .tuple(anyNumber.filter(Number.isFinite), fc.constantFrom('', ' ', '\t'))
  .map(([n, pad]) => `${pad}${String(n)}${pad}`);

/** A code in a case the user might type, or a near miss. */
function codeText(choices: readonly string[]): fc.Arbitrary<string> {
  if (choices.length === 0) return junkText;
  return fc.tuple(fc.constantFrom(...choices), fc.constantFrom('same', 'upper', 'lower', 'padded', 'suffix')).map(([code, how]) => {
    switch (how) {
      case 'upper':
        return code.toUpperCase();
      case 'lower':
        return code.toLowerCase();
      case 'padded':
        return `  ${code} `;
      case 'suffix':
        return `${code}x`;
      default:
        return code;
    }
  });
}

/** One element for a parameter: mostly plausible, often adversarial. */
export function elementFor(param: ParameterSpec): fc.Arbitrary<CellInput> {
  const shared: fc.WeightedArbitrary<CellInput>[] = [
    { weight: 1, arbitrary: fc.constant(null) },
    { weight: 1, arbitrary: fc.boolean() },
    { weight: 1, arbitrary: upstreamError },
    { weight: 1, arbitrary: junkText },
  ];
  if (param.type === 'number') {
    return fc.oneof({ weight: 8, arbitrary: anyNumber }, { weight: 2, arbitrary: numericText }, ...shared);
  }
  const choices = param.choices?.() ?? [];
  return fc.oneof({ weight: 8, arbitrary: codeText(choices) }, { weight: 1, arbitrary: anyNumber }, ...shared);
}

/** A grid of elements of a given size. */
function gridOf(element: fc.Arbitrary<CellInput>, rows: number, columns: number): fc.Arbitrary<CellInput[][]> {
  return fc.array(fc.array(element, { minLength: columns, maxLength: columns }), { minLength: rows, maxLength: rows });
}

/** An argument: omitted, a single value, or a small grid (a row, a column or a block). */
export function argumentFor(param: ParameterSpec): fc.Arbitrary<ArgumentInput> {
  const element = elementFor(param);
  const grid = fc
    .tuple(fc.integer({ min: 1, max: SMALL_GRID.rows }), fc.integer({ min: 1, max: SMALL_GRID.columns }))
    .chain(([rows, columns]) => gridOf(element, rows, columns));
  return fc.oneof(
    { weight: 1, arbitrary: fc.constant(undefined) },
    { weight: 4, arbitrary: element },
    { weight: 3, arbitrary: grid },
    { weight: 1, arbitrary: fc.constant([] as CellInput[][]) },
  );
}

/** Arguments for a whole parameter list, sometimes with one too many or too few. */
export function argumentsFor(parameters: readonly ParameterSpec[]): fc.Arbitrary<ArgumentInput[]> {
  const exact = fc.tuple(...parameters.map(argumentFor)).map((args) => [...args] as ArgumentInput[]);
  if (parameters.length === 0) return fc.oneof(fc.constant([] as ArgumentInput[]), fc.constant([1] as ArgumentInput[]));
  return fc.oneof(
    { weight: 8, arbitrary: exact },
    { weight: 1, arbitrary: exact.map((args) => args.slice(0, Math.max(0, args.length - 1))) },
    { weight: 1, arbitrary: fc.tuple(exact, elementFor(parameters[0])).map(([args, extra]) => [...args, extra]) },
  );
}

/** Single-element arguments only: one element per parameter (never a grid). */
export function scalarArgumentsFor(parameters: readonly ParameterSpec[]): fc.Arbitrary<CellInput[]> {
  return fc.tuple(...parameters.map(elementFor)).map((args) => [...args]);
}

/**
 * Whether an element is bad for a parameter by the parameter's own contract,
 * judged without calling its parser: an upstream error, a boolean, a
 * non-finite number, text that is not a number (number parameters), a code
 * not in choices() in any case (text parameters with choices), or a blank for
 * a required parameter.
 */
export function plainlyBad(param: ParameterSpec, value: CellInput): boolean {
  if (isFailure(value)) return true;
  if (typeof value === 'boolean') return true;
  const blank = value === null || (typeof value === 'string' && value.trim() === '');
  if (blank) return !param.optional;
  if (param.type === 'number') {
    if (typeof value === 'number') return !Number.isFinite(value);
    // Decimal notation only, as a spreadsheet reads numbers typed as text.
    return !/^[+-]?(\d+\.?\d*|\.\d+)(e[+-]?\d+)?$/i.test(value.trim()) || !Number.isFinite(Number(value.trim()));
  }
  if (typeof value === 'number') return true;
  const choices = param.choices?.();
  if (choices === undefined || choices.length === 0) return false;
  return !choices.some((c) => c.toLowerCase() === value.trim().toLowerCase());
}
