/**
 * The two catalog extensions: tuple functions (a fixed-length row per call,
 * laid along the columns) and reducing arguments (a range consumed whole).
 * Exercised with test-only specs, then through the engine's size prediction.
 */
import { evaluate } from '../../src/catalog/broadcast';
import { numberList } from '../../src/catalog/measurementParameters';
import { requiredNumber } from '../../src/catalog/parameters';
import { elementwise, tupleFunction } from '../../src/catalog/types';
import { failure, isFailure, type CellOutput } from '../../src/catalog/values';
import { createEngine } from '../../src/engine/engine';

const codes = (grid: CellOutput[][]) => grid.map((row) => row.map((v) => (isFailure(v) ? v.code : v)));

// Test-only: [a − b, a + b].
const window = tupleFunction({
  name: 'TESTWINDOW',
  summary: '[a − b, a + b]',
  help: '',
  result: { unit: null, description: '' },
  examples: [],
  models: [],
  columns: ['low', 'high'],
  parameters: [
    requiredNumber({ name: 'a', unit: null, description: 'Centre.' }),
    requiredNumber({ name: 'b', unit: null, description: 'Half width.', min: 0 }),
  ] as const,
  compute: (a, b) => [a - b, a + b],
});

// Test-only: x · sum(list).
const scaledSum = elementwise({
  name: 'TESTSCALEDSUM',
  summary: 'x · sum(list)',
  help: '',
  result: { unit: null, description: '' },
  examples: [],
  models: [],
  parameters: [
    requiredNumber({ name: 'x', unit: null, description: 'Factor.' }),
    numberList({ name: 'list', unit: null, description: 'Numbers.', min: 0 }),
  ] as const,
  compute: (x, list) => x * list.reduce((s, v) => s + v, 0),
});

describe('tuple functions', () => {
  it('give one row of declared width for single values', () => {
    expect(evaluate(window, [10, 2])).toEqual([[8, 12]]);
  });

  it('give one row per element of column arguments, single values repeated', () => {
    expect(evaluate(window, [[[10], [20], [30]], 1])).toEqual([
      [9, 11],
      [19, 21],
      [29, 31],
    ]);
  });

  it('fill a failing row with its error and #N/A where a short column runs out', () => {
    const out = evaluate(window, [
      [[10], [20], [30]],
      [[1], [-1]],
    ]);
    expect(codes(out)).toEqual([
      [9, 11],
      ['#VALUE!', '#VALUE!'],
      ['#N/A', '#N/A'],
    ]);
    expect(evaluate(window, [failure('#DIV/0!', 'upstream'), 1])[0]).toEqual([
      failure('#DIV/0!', 'upstream'),
      failure('#DIV/0!', 'upstream'),
    ]);
  });

  it('refuse an argument wider than one column with one error that says why', () => {
    const out = evaluate(window, [[[10, 20]], 1]);
    expect(out).toHaveLength(1);
    expect(out[0]).toHaveLength(1);
    expect(out[0][0]).toMatchObject({
      code: '#VALUE!',
      message: expect.stringMatching(/row of 2 values \(low, high\).*a must be a single value or a column; got 1×2/),
    });
  });

  it('report a wrong-length implementation as an internal error', () => {
    const broken = tupleFunction({ ...window, name: 'TESTBROKEN', compute: () => [1] });
    expect(evaluate(broken, [1, 1])[0][0]).toMatchObject({
      code: '#VALUE!',
      message: expect.stringMatching(/internal error.*1 values returned where 2/),
    });
  });
});

describe('reducing arguments', () => {
  it('consume the whole range, skipping blanks, and take no part in the shape', () => {
    expect(
      evaluate(scaledSum, [
        2,
        [
          [1, 2],
          [3, null],
        ],
      ]),
    ).toEqual([[12]]);
    expect(evaluate(scaledSum, [[[1], [10]], [[1, 2, 3, 4]]])).toEqual([[10], [100]]);
    expect(evaluate(scaledSum, [2, 5])).toEqual([[10]]);
  });

  it('fail every element with an upstream error or a bad element of the range', () => {
    expect(codes(evaluate(scaledSum, [[[1], [2]], [[1, failure('#REF!', 'gone')]]]))).toEqual([['#REF!'], ['#REF!']]);
    const out = evaluate(scaledSum, [1, [[1, -3]]]);
    expect(out[0][0]).toMatchObject({ code: '#VALUE!', message: expect.stringMatching(/list must be ≥ 0; got -3/) });
    expect(evaluate(scaledSum, [1, [[null, '']]])[0][0]).toMatchObject({ message: expect.stringMatching(/list holds no values/) });
  });
});

describe('engine size prediction', () => {
  it('spills DRIFT.DOPINGRANGE as 1×2, and one row per window for columns', () => {
    const engine = createEngine({ S: [['=DRIFT.DOPINGRANGE(8,12,"B")'], [null], ['=DRIFT.DOPINGRANGE({1;2;4},{3;5;9},"phosphorus")']] });
    try {
      const first = engine.getRangeValues({ start: { sheet: 0, row: 0, col: 0 }, end: { sheet: 0, row: 0, col: 2 } })[0];
      expect(typeof first[0]).toBe('number');
      expect(typeof first[1]).toBe('number');
      expect(first[2]).toBeNull();
      expect(engine.getCellValue({ sheet: 0, row: 1, col: 0 })).toBeNull();
      const block = engine.getRangeValues({ start: { sheet: 0, row: 2, col: 0 }, end: { sheet: 0, row: 5, col: 2 } });
      expect(block.slice(0, 3).every((row) => typeof row[0] === 'number' && typeof row[1] === 'number' && row[2] === null)).toBe(true);
      expect(block[3]).toEqual([null, null, null]);
    } finally {
      engine.destroy();
    }
  });

  it('gives DRIFT.RADIALVARIATION one value for a whole edge range', () => {
    const engine = createEngine({ S: [[10, 10.5, 10.3, 10.4, 10.6], ['=DRIFT.RADIALVARIATION(A1,B1:E1)']] });
    try {
      expect(engine.getCellValue({ sheet: 0, row: 1, col: 0 })).toBeCloseTo(4.5, 12);
      expect(engine.getCellValue({ sheet: 0, row: 1, col: 1 })).toBeNull();
    } finally {
      engine.destroy();
    }
  });
});
