/**
 * No code means something different by case alone (issue 13 §3). For every
 * catalog function, every text argument and every spelling it accepts (its
 * codes, its aliases, and for the dopant every element name, the generic
 * aliases and the lone letters P/N), the call in upper, lower and mixed case
 * gives the same result, or the same refusal. Functions and codes added later
 * are covered without changes here. Expected behaviour is the rule itself
 * (common practice, no source): a spreadsheet's users expect text to be
 * case-insensitive.
 */
import { CATALOG } from '../../src/catalog';
import { evaluate } from '../../src/catalog/broadcast';
import { parseLiteralCall } from '../../src/catalog/literalCall';
import { spellingTable } from '../../src/catalog/parameters';
import type { FunctionSpec, ParameterSpec } from '../../src/catalog/types';
import type { ArgumentInput, CellOutput, Grid } from '../../src/catalog/values';
import { MATERIALS } from '../../src/physics';

function parametersOf(spec: FunctionSpec): readonly ParameterSpec[] {
  return spec.parameters as readonly ParameterSpec[];
}

/** Spellings of a text argument worth trying: its codes and aliases, and for dopants every name and the lone letters. */
function spellingsOf(parameter: ParameterSpec): string[] {
  const own = [...(parameter.choices?.() ?? []), ...(parameter.aliases ?? [])];
  if (parameter.name !== 'dopant') return own;
  const names = MATERIALS.flatMap((host) => host.dopants.map((dopant) => dopant.name));
  return [...new Set([...own, ...names, 'P', 'N', 'n-type', 'p-type', 'aluminum', 'Xx'])];
}

/** Alternating case, starting with upper (first = 0) or lower (first = 1). */
function mixed(text: string, first: 0 | 1): string {
  return [...text].map((ch, i) => (i % 2 === first ? ch.toUpperCase() : ch.toLowerCase())).join('');
}

/** The variants compared: as listed, upper, lower, and alternating both ways. */
function variants(code: string): string[] {
  return [...new Set([code, code.toUpperCase(), code.toLowerCase(), mixed(code, 0), mixed(code, 1)])];
}

/** A result with the echoed spelling in messages replaced, so refusals compare equal across case. */
function normalised(grid: Grid<CellOutput>, spelling: string): unknown {
  const escaped = spelling.replace(/[.*+?^${}()|[\]\\]/g, '\\$&');
  return grid.map((row) =>
    row.map((cell) =>
      typeof cell === 'object' && cell !== null && 'kind' in cell
        ? { ...cell, message: cell.message.replace(new RegExp(escaped, 'gi'), '<code>') }
        : cell,
    ),
  );
}

/** One literal example per function (the first), as the base call. */
function baseCall(spec: FunctionSpec): ArgumentInput[] | null {
  for (const example of spec.examples) {
    const call = parseLiteralCall(example.formula);
    if (call !== null && call.name === spec.name) return call.args;
  }
  return null;
}

const cases: [string, string, number, ArgumentInput[]][] = [];
for (const spec of CATALOG) {
  const base = baseCall(spec);
  if (base === null) continue;
  parametersOf(spec).forEach((parameter, index) => {
    if (parameter.type !== 'text' || parameter.choices === undefined) return;
    cases.push([spec.name, parameter.name, index, base]);
  });
}

describe('every text argument reads the same in any case', () => {
  it('covers every text argument of the catalog that has a literal example', () => {
    const covered = new Set(cases.map(([name, parameter]) => `${name}.${parameter}`));
    for (const spec of CATALOG) {
      for (const parameter of parametersOf(spec)) {
        if (parameter.type === 'text' && parameter.choices && baseCall(spec) !== null)
          expect(covered).toContain(`${spec.name}.${parameter.name}`);
      }
    }
    expect(covered).toContain('RESISTIVITY.dopant');
    expect(covered).toContain('MOBILITY.carrier');
  });

  it.each(cases)('%s: %s', (name, _parameter, index, base) => {
    const spec = CATALOG.find((entry) => entry.name === name)!;
    const parameter = parametersOf(spec)[index];
    let computed = 0;
    for (const code of spellingsOf(parameter)) {
      if (code === '') continue;
      const results = variants(code).map((spelling) => {
        const args = [...base];
        while (args.length <= index) args.push(undefined);
        args[index] = spelling;
        return normalised(evaluate(spec, args), spelling);
      });
      for (const result of results.slice(1)) expect([code, result]).toEqual([code, results[0]]);
      // A spelling table with two codes equal in any case throws, which evaluate() reports as an internal error.
      expect(JSON.stringify(results[0])).not.toMatch(/internal error/);
      // Text results count too: DRIFT.MODELCODES answers with codes, not numbers.
      if ((results[0] as unknown[][]).flat().some((cell) => typeof cell === 'number' || typeof cell === 'string')) computed += 1;
    }
    // Some spellings must give results, or the comparison would only be between refusals.
    expect(computed).toBeGreaterThan(0);
  });
});

describe('codes that could be read two ways', () => {
  const call = (dopant: string) =>
    evaluate(
      CATALOG.find((entry) => entry.name === 'RESISTIVITY')!,
      [1e15, dopant],
    );

  it('refuse a lone P or N in any case, naming both readings and what to type', () => {
    for (const letter of ['P', 'p']) {
      expect(call(letter)).toEqual([
        [
          {
            kind: 'failure',
            code: '#VALUE!',
            message: `dopant "${letter}" could mean phosphorus or a generic acceptor (p-type); type "phosphorus" or "acceptor"`,
          },
        ],
      ]);
    }
    for (const letter of ['N', 'n']) {
      expect(call(letter)[0][0]).toMatchObject({
        message: expect.stringContaining('could mean nitrogen or a generic donor (n-type); type "nitrogen" or "donor"'),
      });
    }
  });

  it('give the element and the generic dopant under their own words (the issue’s {"P","p"} now spelt out)', () => {
    const [[phosphorus, acceptor]] = evaluate(
      CATALOG.find((entry) => entry.name === 'RESISTIVITY')!,
      [1e15, [['phosphorus', 'acceptor']]],
    ) as number[][];
    // Orders of magnitude only: 1e15 cm⁻³ n-type Si is about 4–5 Ω·cm, p-type about 13–14 Ω·cm (common practice, no source).
    expect(phosphorus).toBeGreaterThan(4);
    expect(phosphorus).toBeLessThan(5);
    expect(acceptor).toBeGreaterThan(13);
    expect(acceptor).toBeLessThan(14);
  });
});

describe('spelling tables', () => {
  it('refuse two spellings that are the same in any case', () => {
    expect(() => spellingTable('dopant', ['P', 'p'])).toThrow('dopant: "p" would mean both P and p');
    expect(() => spellingTable('carrier', ['electron', 'hole'], { N: 'electron', n: 'hole' })).toThrow(
      /"n" would mean both electron and hole/,
    );
    expect(spellingTable('carrier', ['electron'], { Electrons: 'electron' }).get('electrons')).toBe('electron');
  });
});
