import { evaluate, toGrid, unwrapSingle } from '../../src/catalog/broadcast';
import { optionalNumber, requiredNumber, codeParameter } from '../../src/catalog/parameters';
import { elementwise, tableFunction } from '../../src/catalog/types';
import { failure, isFailure, InputError, type CellOutput } from '../../src/catalog/values';
import { PhysicsDomainError } from '../../src/physics/errors';

// A test-only function: a·b + c, with c optional (default 1) and a mode code.
const product = elementwise({
  name: 'TESTPRODUCT',
  summary: 'a·b + c',
  help: '',
  result: { unit: null, description: '' },
  examples: [],
  models: [],
  parameters: [
    requiredNumber({ name: 'a', unit: null, description: 'First factor.', min: 0, minExclusive: true }),
    requiredNumber({ name: 'b', unit: null, description: 'Second factor.' }),
    optionalNumber({ name: 'c', unit: null, description: 'Offset.', defaultValue: 1 }),
    codeParameter<string>({
      name: 'mode',
      description: 'Mode.',
      choices: () => ['plain', 'Fail', 'throw'],
      defaultCode: 'plain',
      resolve: (c) => c,
    }),
  ] as const,
  compute: (a, b, c, mode) => {
    if (mode === 'Fail') throw new PhysicsDomainError('mode Fail always fails');
    if (mode === 'throw') throw new TypeError('boom');
    return a * b + c;
  },
});

const values = (grid: CellOutput[][]) => grid.map((row) => row.map((v) => (isFailure(v) ? v.code : v)));

describe('toGrid', () => {
  it('wraps scalars and absent arguments as 1×1', () => {
    expect(toGrid(3)).toEqual([[3]]);
    expect(toGrid(undefined)).toEqual([[null]]);
    expect(toGrid([])).toEqual([[null]]);
    expect(toGrid([[1, 2]])).toEqual([[1, 2]]);
  });
});

describe('evaluate: broadcasting as Excel does', () => {
  it('computes a single value with defaults for omitted optional arguments', () => {
    expect(evaluate(product, [2, 3])).toEqual([[7]]);
    expect(evaluate(product, [2, 3, null, null])).toEqual([[7]]);
    expect(evaluate(product, [2, 3, 10, 'PLAIN'])).toEqual([[16]]);
  });

  it('runs same-shaped arrays elementwise', () => {
    expect(
      evaluate(product, [
        [[1], [2]],
        [[10], [20]],
      ]),
    ).toEqual([[11], [41]]);
  });

  it('gives the full grid for a column against a row', () => {
    const grid = evaluate(product, [[[1], [2], [3]], [[10, 100]], 0]);
    expect(grid).toEqual([
      [10, 100],
      [20, 200],
      [30, 300],
    ]);
  });

  it('marks elements a smaller array cannot supply as #N/A with a message', () => {
    const grid = evaluate(product, [[[1], [2], [3]], [[1], [2]], 0]);
    expect(values(grid)).toEqual([[1], [4], ['#N/A']]);
    const lost = grid[2][0];
    expect(isFailure(lost) && lost.message).toMatch(/b has 2×1 values/);
  });

  it('puts an error in the bad element only, naming argument, value and the rule', () => {
    const grid = evaluate(product, [[[1, -1, 'x']], 2]);
    expect(values(grid)).toEqual([[3, '#VALUE!', '#VALUE!']]);
    expect((grid[0][1] as { message: string }).message).toBe('a must be > 0; got -1');
    expect((grid[0][2] as { message: string }).message).toBe('a must be a number; got "x"');
  });

  it('accepts numeric text and rejects booleans', () => {
    expect(evaluate(product, [' 2 ', '3'])).toEqual([[7]]);
    const grid = evaluate(product, [true, 3]);
    expect((grid[0][0] as { message: string }).message).toBe('a must be a number; got TRUE');
  });

  it('says a required argument is missing', () => {
    const grid = evaluate(product, [2]);
    expect((grid[0][0] as { message: string }).message).toMatch(/^b is required/);
  });

  it('lists the allowed codes for an unknown code, case-insensitively matching known ones', () => {
    expect(evaluate(product, [1, 1, 0, 'fail'])[0][0]).toMatchObject({ code: '#VALUE!', message: 'mode Fail always fails' });
    const grid = evaluate(product, [1, 1, 0, 'loud']);
    expect((grid[0][0] as { message: string }).message).toBe('mode "loud" is not known; allowed: plain, Fail, throw');
  });

  it('propagates upstream errors element by element', () => {
    const upstream = failure('#DIV/0!', 'from A1');
    expect(evaluate(product, [[[upstream, 1]], 1])).toEqual([[upstream, 2]]);
  });

  it('never lets an exception escape, and never returns a non-finite number', () => {
    const internal = evaluate(product, [1, 1, 0, 'throw'])[0][0];
    expect(internal).toMatchObject({ code: '#VALUE!' });
    expect((internal as { message: string }).message).toMatch(/internal error in DRIFT.TESTPRODUCT: boom/);
    const overflow = evaluate(product, [1e300, 1e300])[0][0];
    expect(overflow).toMatchObject({ code: '#NUM!' });
  });

  it('refuses extra arguments', () => {
    expect(evaluate(product, [1, 1, 1, 'plain', 5])[0][0]).toMatchObject({ code: '#VALUE!' });
  });

  it('maps InputError codes through', () => {
    const custom = elementwise({
      ...product,
      name: 'TESTNUM',
      parameters: [requiredNumber({ name: 'x', unit: null, description: 'x.' })] as const,
      compute: () => {
        throw new InputError('no solution', '#NUM!');
      },
    });
    expect(evaluate(custom, [1])[0][0]).toEqual(failure('#NUM!', 'no solution'));
  });
});

describe('table functions and unwrapSingle', () => {
  const table = tableFunction({
    name: 'TESTTABLE',
    summary: '',
    help: '',
    result: { unit: null, description: '' },
    examples: [],
    models: [],
    table: () => [['h'], [1]],
  });
  it('returns the table as is', () => {
    expect(evaluate(table, [])).toEqual([['h'], [1]]);
  });
  it('unwraps only 1×1 grids', () => {
    expect(unwrapSingle([[5]])).toBe(5);
    expect(unwrapSingle([[5, 6]])).toEqual([[5, 6]]);
  });
});
