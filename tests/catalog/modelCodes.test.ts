/**
 * DRIFT.MODELCODES and the catalog's row kind: one row of the model codes
 * that apply to a quantity for a material (and dopant), default first.
 *
 * The lists are checked against the functions that take them, not against
 * the module's own source lists: every listed code computes in the function
 * it is meant for, every code that function accepts for that material and
 * dopant is listed, and the first is what a blank model argument gives.
 */
import {
  CATALOG,
  evaluate,
  findFunction,
  isFailure,
  qualifiedName,
  type ArgumentInput,
  type CellOutput,
  type FunctionSpec,
} from '../../src/catalog';
import { MODEL_QUANTITIES, applicableModelCodes, functionsTaking, modelQuantityOf, type ModelQuantity } from '../../src/catalog/modelCodes';
import { InputError } from '../../src/catalog/values';
import { rowFunction } from '../../src/catalog/types';
import { requiredNumber } from '../../src/catalog/parameters';

const MODELCODES = findFunction('MODELCODES')!;

function spec(name: string): FunctionSpec {
  const found = findFunction(name);
  if (found === undefined) throw new Error(`no catalog entry ${name}`);
  return found;
}

/** The single value of a 1×1 grid, failing the test otherwise. */
function single(grid: CellOutput[][]): CellOutput {
  expect(grid).toHaveLength(1);
  expect(grid[0]).toHaveLength(1);
  return grid[0][0];
}

function row(args: ArgumentInput[]): CellOutput[] {
  const grid = evaluate(MODELCODES, args);
  expect(grid).toHaveLength(1);
  for (const cell of grid[0]) if (isFailure(cell)) throw new Error(`${cell.code} ${cell.message}`);
  return grid[0];
}

function failureOf(args: ArgumentInput[]): { code: string; message: string } {
  const cell = single(evaluate(MODELCODES, args));
  if (!isFailure(cell)) throw new Error(`expected an error, got ${JSON.stringify(cell)}`);
  return { code: cell.code, message: cell.message };
}

describe('the catalog entry', () => {
  it('is a row entry with quantity, material and dopant, the last two optional', () => {
    expect(MODELCODES.kind).toBe('row');
    expect(MODELCODES.parameters.map((p) => [p.name, p.optional])).toEqual([
      ['quantity', false],
      ['material', true],
      ['dopant', true],
    ]);
  });

  it('names in its help the functions that take each quantity, and they are exactly the catalog’s', () => {
    for (const quantity of MODEL_QUANTITIES) {
      const taking = CATALOG.filter((entry) => modelQuantityOf(entry) === quantity).map((entry) => entry.name);
      expect([quantity, [...functionsTaking(quantity)].sort()]).toEqual([quantity, [...taking].sort()]);
      for (const name of taking) expect(MODELCODES.help).toContain(name);
    }
  });

  it('has a quantity for every catalog function with a model argument', () => {
    const withModel = CATALOG.filter((entry) => entry.parameters.some((p) => p.name === 'model'));
    expect(withModel.length).toBeGreaterThan(5);
    for (const entry of withModel) expect([entry.name, modelQuantityOf(entry)]).toEqual([entry.name, expect.any(String)]);
    expect(modelQuantityOf(spec('SHEETRES'))).toBeUndefined();
    expect(modelQuantityOf(MODELCODES)).toBeUndefined();
  });
});

describe('the rows', () => {
  it('lists silicon’s resistivity models for boron, the default f723-anchored first and astm-f723 last', () => {
    // Silicon's default resistivity model is f723-anchored (DEVELOPERS.md); astm-f723 is ASTM F723 itself, for B, P and As.
    expect(row(['resistivity', 'Si', 'B'])).toEqual(['f723-anchored', 'masetti', 'arora', 'caughey-thomas', 'klaassen', 'astm-f723']);
  });

  it('lists astm-f723 only for B, P and As in silicon (ASTM F723 covers those three dopants)', () => {
    for (const dopant of ['B', 'boron', 'phosphorus', 'As', 'arsenic'])
      expect([dopant, row(['resistivity', 'Si', dopant]).includes('astm-f723')]).toEqual([dopant, true]);
    for (const dopant of ['Ga', 'Al', 'In', 'Sb', 'donor', 'acceptor', 'n-type', 'p-type']) {
      const codes = row(['resistivity', 'Si', dopant]);
      expect([dopant, codes.includes('astm-f723')]).toEqual([dopant, false]);
      expect(codes[0]).toBe('f723-anchored');
      expect(codes.length).toBe(5);
    }
    // A blank dopant is any dopant: every code some dopant allows.
    expect(row(['resistivity'])).toContain('astm-f723');
    expect(row(['resistivity', null, null])).toEqual(row(['resistivity', 'Si', 'B']));
  });

  it('gives the one published fit of Ge, GaAs and 4H-SiC for resistivity and mobility, and dos for ni', () => {
    const expected: Record<string, string> = { Ge: 'hilsum', GaAs: 'sotoodeh', '4H-SiC': 'roschke-schwierz' };
    for (const [host, fit] of Object.entries(expected)) {
      expect([host, row(['resistivity', host])]).toEqual([host, [fit]]);
      expect([host, row(['mobility', host])]).toEqual([host, [fit]]);
      expect([host, row(['intrinsic', host])]).toEqual([host, ['dos']]);
    }
    // The dopant of another host narrows nothing there, since astm-f723 is silicon's alone.
    expect(row(['resistivity', 'Ge', 'B'])).toEqual(['hilsum']);
    expect(row(['resistivity', 'GaAs', 'Zn'])).toEqual(['sotoodeh']);
    expect(row(['resistivity', '4H-SiC', 'nitrogen'])).toEqual(['roschke-schwierz']);
  });

  it('lists silicon’s mobility, ni and bandgap-narrowing models', () => {
    expect(row(['mobility'])).toEqual(['masetti', 'arora', 'caughey-thomas', 'klaassen']);
    expect(row(['intrinsic'])).toEqual(['misiakos', 'sproul-green', 'dos']);
    expect(row(['bandgap-narrowing'])).toEqual(['klaassen-bgn', 'slotboom-1976']);
  });

  it('reads every argument in any case, and gives the codes in their one spelling', () => {
    expect(row(['RESISTIVITY', 'si', 'b'])).toEqual(row(['resistivity', 'Si', 'B']));
    expect(row(['Bandgap-Narrowing', 'SI'])).toEqual(row(['bandgap-narrowing']));
    expect(row(['mobility', '4h-sic', 'AL'])).toEqual(['roschke-schwierz']);
  });
});

/** One call of a function that takes a quantity's codes, under one model ('' = blank). */
const PROBES: Record<ModelQuantity, { name: string; args: (model: string, host: string, dopant: string) => ArgumentInput[] }> = {
  // 1e19 cm⁻³ at 296.15 K, uncompensated: inside ASTM F723's ranges for B, P and As (arsenic from 1e19).
  resistivity: { name: 'RESISTIVITY', args: (model, host, dopant) => [1e19, dopant, 296.15, model, host] },
  mobility: { name: 'MOBILITY', args: (model, host, dopant) => [1e16, dopant, 300, null, model, host] },
  intrinsic: { name: 'INTRINSIC', args: (model, host) => [300, host, model] },
  'bandgap-narrowing': { name: 'NIEFF', args: (model, host, dopant) => [1e19, dopant, 300, model, host] },
};

const DOPANTS: Record<string, string[]> = {
  Si: ['B', 'phosphorus', 'As', 'Sb', 'Ga', 'donor'],
  Ge: ['Ga', 'Sb'],
  GaAs: ['Zn', 'Si'],
  '4H-SiC': ['Al', 'nitrogen'],
};

describe('each list is what the functions themselves accept', () => {
  for (const quantity of MODEL_QUANTITIES) {
    const probe = PROBES[quantity];
    const entry = spec(probe.name);
    const choices = entry.parameters.find((p) => p.name === 'model')!.choices!();
    for (const [host, dopants] of Object.entries(DOPANTS)) {
      for (const dopant of dopants) {
        it(`${quantity} in ${host} with ${dopant}: every listed code computes, every other code is refused, the first is the blank model’s`, () => {
          let listed: readonly string[];
          try {
            listed = applicableModelCodes(quantity, host, dopant);
          } catch (error) {
            // Only bandgap narrowing has no model outside silicon; the function refuses the material too.
            expect(quantity).toBe('bandgap-narrowing');
            expect((error as Error).message).toMatch(/silicon \(Si\) only/);
            expect(isFailure(single(evaluate(entry, probe.args('', host, dopant))))).toBe(true);
            return;
          }
          for (const code of choices) {
            const value = single(evaluate(entry, probe.args(code, host, dopant)));
            expect([code, typeof value === 'number']).toEqual([code, listed.includes(code)]);
          }
          // A blank model is the default, which the list puts first (mobility: the majority carrier's, as the probe's carrier is blank → majority).
          const blank = single(evaluate(entry, probe.args('', host, dopant)));
          const first = single(evaluate(entry, probe.args(listed[0], host, dopant)));
          expect(blank).toBe(first);
        });
      }
    }
  }
});

describe('refusals', () => {
  it('names what is allowed for an unknown quantity, material or dopant', () => {
    expect(failureOf(['conductance'])).toEqual({
      code: '#VALUE!',
      message: 'quantity "conductance" is not known; allowed: resistivity, mobility, intrinsic, bandgap-narrowing',
    });
    expect(failureOf([null]).message).toBe('quantity is required; allowed: resistivity, mobility, intrinsic, bandgap-narrowing');
    expect(failureOf(['resistivity', 'InP'])).toEqual({
      code: '#VALUE!',
      message: 'material "InP" is not known; allowed: Si, Ge, GaAs, 4H-SiC',
    });
    const dopant = failureOf(['resistivity', 'GaAs', 'B']);
    expect(dopant.code).toBe('#VALUE!');
    expect(dopant.message).toMatch(
      /^unknown dopant 'B' for gallium arsenide: allowed dopants are Zn, Be, C, Mg, Si, Te, Se, Sn, donor, acceptor/,
    );
  });

  it('refuses a lone P with both readings, as every dopant argument does', () => {
    for (const letter of ['P', 'p']) {
      expect(failureOf(['resistivity', 'Si', letter]).message).toBe(
        `dopant "${letter}" could mean phosphorus or a generic acceptor (p-type); type "phosphorus" or "acceptor"`,
      );
    }
  });

  it('says when a quantity has no model for the material', () => {
    expect(failureOf(['bandgap-narrowing', 'Ge'])).toEqual({
      code: '#VALUE!',
      message: 'material Ge: bandgap narrowing models have parameters for silicon (Si) only; germanium (Ge) is not supported',
    });
  });

  it('refuses a multi-cell argument with one error naming it, since rows of different lengths cannot stack', () => {
    expect(failureOf([[['resistivity', 'mobility']]])).toEqual({
      code: '#VALUE!',
      message:
        'DRIFT.MODELCODES gives one row whose length depends on its arguments, so quantity must be a single value, not 1×2 values; call it once per value instead',
    });
    expect(failureOf(['resistivity', [['Si'], ['Ge']]]).message).toMatch(/so material must be a single value, not 2×1 values/);
    expect(failureOf(['resistivity', 'Si', [['B', 'P']]]).message).toMatch(/so dopant must be a single value, not 1×2 values/);
    // A 1×1 range is one value.
    expect(row([[['resistivity']], [['Si']], [['B']]])).toEqual(row(['resistivity', 'Si', 'B']));
  });

  it('passes an upstream error through, and refuses too many arguments', () => {
    const upstream = { kind: 'failure' as const, code: '#N/A' as const, message: '' };
    expect(single(evaluate(MODELCODES, [upstream]))).toBe(upstream);
    expect(failureOf(['resistivity', 'Si', 'B', 'x']).message).toBe('DRIFT.MODELCODES takes at most 3 arguments; got 4');
  });

  it('applicableModelCodes throws the catalog’s InputError with the same messages', () => {
    expect(() => applicableModelCodes('conductance' as ModelQuantity)).toThrow(
      new InputError('quantity "conductance" is not known; allowed: resistivity, mobility, intrinsic, bandgap-narrowing'),
    );
    expect(() => applicableModelCodes('resistivity', 'InP')).toThrow(InputError);
    expect(() => applicableModelCodes('resistivity', 'Si', 'P')).toThrow(/could mean phosphorus/);
    expect(applicableModelCodes('resistivity', '', '')).toEqual(applicableModelCodes('resistivity'));
  });
});

describe('the row kind in broadcast', () => {
  // Test-only: the whole numbers 1…n.
  const count = rowFunction({
    name: 'TESTCOUNT',
    summary: '1…n',
    help: '',
    result: { unit: null, description: '' },
    examples: [],
    models: [],
    parameters: [requiredNumber({ name: 'n', unit: null, description: 'How many.', min: 0 })] as const,
    compute: (n) => Array.from({ length: Math.floor(n) }, (_, i) => i + 1),
  });
  const infinite = rowFunction({ ...count, name: 'TESTINFINITE', compute: () => [1, Infinity] });

  it('gives a row as long as the value says', () => {
    expect(evaluate(count, [3])).toEqual([[1, 2, 3]]);
    expect(evaluate(count, [[[1]]])).toEqual([[1]]);
  });

  it('turns an empty row and a non-finite number into one error each, with a message', () => {
    expect(single(evaluate(count, [0]))).toMatchObject({ code: '#VALUE!', message: 'internal error in DRIFT.TESTCOUNT: an empty row' });
    expect(single(evaluate(infinite, [1]))).toMatchObject({
      code: '#NUM!',
      message: 'DRIFT.TESTINFINITE has no finite result for these inputs (got Infinity)',
    });
  });

  it('reports a bad argument once, in the parameter’s own words', () => {
    const cell = single(evaluate(count, [-1]));
    expect(isFailure(cell) && cell.message).toMatch(/^n /);
    expect(qualifiedName(count)).toBe('DRIFT.TESTCOUNT');
  });
});
