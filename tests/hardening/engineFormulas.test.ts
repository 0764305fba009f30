/**
 * Random formulas through the headless engine (HyperFormula with the DRIFT
 * plugin, evaluateFormula): calls of catalog functions, iterated from
 * CATALOG, with literal arguments written as a user would type them (numbers
 * at the edges, text codes, TRUE/FALSE, blanks, inline arrays of mismatched
 * shapes, errors such as 1/0 and NA(), nested DRIFT calls, too many
 * arguments). Nothing may throw out of the engine, every number is finite and
 * every error carries a message, except an upstream error the formula itself
 * contains: HyperFormula, like Excel, gives 1/0 and NA() no message, and DRIFT
 * functions pass upstream errors on unchanged.
 */
import fc from 'fast-check';
import './support/seed';
import { CATALOG, qualifiedName } from '../../src/catalog';
import type { FunctionSpec, ParameterSpec } from '../../src/catalog/types';
import { evaluateFormula, isResultError, type ResultElement } from '../../src/engine/engine';

const RUNS = Number(process.env.DRIFTCELL_ENGINE_RUNS ?? 300);

/** A number as formula text, including forms HyperFormula must refuse or overflow. */
const numberLiteral: fc.Arbitrary<string> = fc.oneof(
  fc.constantFrom(
    '0',
    '-1',
    '1e-300',
    '1e300',
    '-1e300',
    '1e308',
    '300',
    '1e15',
    '1e16',
    '1e22',
    '1e23',
    '20',
    '1000',
    '0.5',
    '(1e308*10)',
    '-0',
  ),
  fc.double({ noNaN: true, noDefaultInfinity: true }).map((n) => (n < 0 ? `(${String(n)})` : String(n))),
);

/** Text in formula syntax ("" doubles a quote). */
function textLiteral(text: string): string {
  return `"${text.replace(/"/g, '""')}"`;
}

function codeLiteral(param: ParameterSpec): fc.Arbitrary<string> {
  const choices = param.choices?.() ?? [];
  const codes = choices.length > 0 ? fc.constantFrom(...choices) : fc.constant('x');
  return fc.oneof(
    codes.map(textLiteral),
    codes.map((c) => textLiteral(c.toUpperCase())),
    fc.string({ maxLength: 6 }).map(textLiteral),
  );
}

/** Literals that are errors before any DRIFT function sees them, with the code each gives. */
const UPSTREAM_ERRORS: Readonly<Record<string, string>> = { '1/0': '#DIV/0!', 'NA()': '#N/A', ZZ99999: '#NAME?' };

const oddLiteral: fc.Arbitrary<string> = fc.constantFrom(
  'TRUE',
  'FALSE',
  '',
  '""',
  '" "',
  '1/0',
  'NA()',
  'SQRT(-1)',
  '"1e15"',
  '"abc"',
  'A1',
  'ZZ99999',
);

function scalarLiteral(param: ParameterSpec): fc.Arbitrary<string> {
  return param.type === 'number'
    ? fc.oneof({ weight: 6, arbitrary: numberLiteral }, { weight: 2, arbitrary: oddLiteral }, { weight: 1, arbitrary: codeLiteral(param) })
    : fc.oneof({ weight: 6, arbitrary: codeLiteral(param) }, { weight: 2, arbitrary: oddLiteral }, { weight: 1, arbitrary: numberLiteral });
}

/** An inline array {a,b;c,d} of scalar literals that are allowed inside arrays (no function calls). */
function arrayLiteral(param: ParameterSpec): fc.Arbitrary<string> {
  const inner = param.type === 'number' ? fc.constantFrom('1', '-1', '0', '1e15', '1e300', '300', '"x"', 'TRUE') : codeLiteral(param);
  return fc
    .tuple(fc.integer({ min: 1, max: 4 }), fc.integer({ min: 1, max: 4 }))
    .chain(([rows, columns]) => fc.array(fc.array(inner, { minLength: columns, maxLength: columns }), { minLength: rows, maxLength: rows }))
    .map((rows) => `{${rows.map((r) => r.join(',')).join(';')}}`);
}

function callOf(spec: FunctionSpec, depth: number): fc.Arbitrary<string> {
  const params = spec.parameters as readonly ParameterSpec[];
  const argument = (p: ParameterSpec): fc.Arbitrary<string> =>
    fc.oneof(
      { weight: 6, arbitrary: scalarLiteral(p) },
      { weight: 2, arbitrary: arrayLiteral(p) },
      {
        weight: depth > 0 ? 1 : 0,
        arbitrary: depth > 0 ? fc.constantFrom(...CATALOG).chain((inner) => callOf(inner, depth - 1)) : fc.constant('1'),
      },
    );
  const args = fc.tuple(...params.map(argument)).map((list) => [...list]);
  const trimmed = fc.tuple(args, fc.integer({ min: 0, max: params.length }), fc.boolean()).map(([list, keep, extra]) => {
    const kept = list.slice(0, Math.max(keep, params.filter((p) => !p.optional).length));
    return extra ? [...kept, '1'] : kept;
  });
  return trimmed.map((list) => `${qualifiedName(spec)}(${list.join(',')})`);
}

function problemsOf(formula: string, value: ResultElement | ResultElement[][]): string[] {
  const upstreamCodes = new Set(
    Object.entries(UPSTREAM_ERRORS)
      .filter(([literal]) => formula.includes(literal))
      .map(([, code]) => code),
  );
  const elements = Array.isArray(value) ? value.flat() : [value];
  const problems: string[] = [];
  for (const element of elements) {
    if (typeof element === 'number' && !Number.isFinite(element)) problems.push(`non-finite ${element}`);
    if (element !== null && typeof element === 'object') {
      if (!isResultError(element)) problems.push(`unknown element ${JSON.stringify(element)}`);
      else if (element.message.trim() === '' && !upstreamCodes.has(element.code)) problems.push(`${element.code} without a message`);
      else if (/internal error/i.test(element.message)) problems.push(`internal error: ${element.message}`);
    }
  }
  return problems;
}

describe('random DRIFT formulas through the engine', () => {
  it('never throw out of HyperFormula and give errors with messages', () => {
    const formula = fc
      .constantFrom(...CATALOG)
      .chain((spec) => callOf(spec, 1))
      .map((call) => `=${call}`);
    fc.assert(
      fc.property(formula, (text) => {
        let result: ReturnType<typeof evaluateFormula>;
        try {
          result = evaluateFormula(text);
        } catch (e) {
          throw new Error(`${text} threw: ${e instanceof Error ? e.message : String(e)}`);
        }
        const problems = problemsOf(text, result);
        if (problems.length > 0) throw new Error(`${text}: ${problems.join('; ')}`);
      }),
      { numRuns: RUNS },
    );
  }, 120_000);
});
