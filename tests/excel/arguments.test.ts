/** Excel argument shapes to the catalog's ArgumentInput. */
import { CATALOG, evaluate, findFunction } from '../../src/catalog';
import type { FunctionSpec } from '../../src/catalog/types';
import { isFailure } from '../../src/catalog/values';
import { excelErrorText, toArgumentInput, toArgumentInputs, toCellInput } from '../../src/excel/arguments';

describe('toArgumentInput', () => {
  it('reads an omitted argument (null, or undefined) as absent', () => {
    expect(toArgumentInput(null, 'material')).toBeUndefined();
    expect(toArgumentInput(undefined, 'material')).toBeUndefined();
    expect(toArgumentInput([], 'material')).toBeUndefined();
    expect(toArgumentInput([[]], 'material')).toBeUndefined();
  });

  it('keeps a matrix as a grid, row-major, with blanks as null', () => {
    expect(
      toArgumentInput(
        [
          [1e15, 1e16],
          ['', null],
        ],
        'doping',
      ),
    ).toEqual([
      [1e15, 1e16],
      [null, null],
    ]);
    expect(toArgumentInput([['phosphorus'], [true]], 'dopant')).toEqual([['phosphorus'], [true]]);
  });

  it('passes a single value through, and reads a one-dimensional array as a row', () => {
    expect(toArgumentInput(300, 'temperature_K')).toBe(300);
    expect(toArgumentInput([250, 300], 'temperature_K')).toEqual([[250, 300]]);
  });

  it('turns an upstream error into a failure naming the argument, keeping the code', () => {
    const grid = toArgumentInput([[1], [{ code: '#DIV/0!' }]], 'temperature_K') as unknown[][];
    expect(grid[0][0]).toBe(1);
    const failed = grid[1][0];
    expect(isFailure(failed)).toBe(true);
    expect(failed).toMatchObject({ code: '#DIV/0!' });
    expect((failed as { message: string }).message).toContain('temperature_K holds #DIV/0!');
  });
});

describe('toCellInput', () => {
  it('reads both documented error shapes', () => {
    expect(excelErrorText({ code: '#N/A', message: 'x' })).toBe('#N/A');
    expect(excelErrorText({ type: 'Error', basicValue: '#NUM!', errorType: 'Num' })).toBe('#NUM!');
    expect(excelErrorText({ type: 'Double', basicValue: 3 })).toBeUndefined();
    expect(excelErrorText('#N/A')).toBeUndefined(); // text that looks like an error is text
  });

  it('maps errors outside the catalog table to #VALUE! naming the original', () => {
    const f = toCellInput({ type: 'Error', basicValue: '#SPILL!', errorType: 'Spill' }, 'doping');
    expect(f).toMatchObject({ kind: 'failure', code: '#VALUE!' });
    expect((f as { message: string }).message).toContain('doping holds #SPILL!');
  });

  it('reads rich values by their basicValue', () => {
    expect(toCellInput({ type: 'FormattedNumber', basicValue: 1e16, numberFormat: '0.00E+00' }, 'doping')).toBe(1e16);
    expect(toCellInput({ type: 'String', basicValue: 'B' }, 'dopant')).toBe('B');
  });

  it('fails clearly on a value it cannot read', () => {
    const f = toCellInput({ type: 'Entity', text: 'Wafer' }, 'doping');
    expect(f).toMatchObject({ kind: 'failure', code: '#VALUE!' });
    expect((f as { message: string }).message).toMatch(/doping holds a value Driftcell cannot read \(an Entity value\)/);
    expect(toCellInput([[1]], 'doping')).toMatchObject({ kind: 'failure', code: '#VALUE!' });
  });
});

describe('toArgumentInputs', () => {
  const mobility = findFunction('MOBILITY');
  if (mobility === undefined) throw new Error('catalog lacks MOBILITY');

  it('gives one input per declared parameter and drops the invocation object Excel appends', () => {
    const inputs = toArgumentInputs(mobility, [[[1e16]], [['phosphorus']], null, null, null, null, null, { address: 'Sheet1!A1' }]);
    expect(inputs).toHaveLength(mobility.parameters.length);
    expect(inputs).toEqual([[[1e16]], [['phosphorus']], undefined, undefined, undefined, undefined, undefined]);
  });

  it('fills arguments Excel did not pass at all as absent', () => {
    expect(toArgumentInputs(mobility, [[[1e16]], [['phosphorus']]])).toEqual([
      [[1e16]],
      [['phosphorus']],
      undefined,
      undefined,
      undefined,
      undefined,
      undefined,
    ]);
  });
});

describe('an empty cell that Excel passes as 0', () => {
  const spec = (name: string) => CATALOG.find((s) => s.name === name) as FunctionSpec;

  it('is blank where 0 can never be valid: temperature, codes, readings > 0', () => {
    const resistivity = spec('RESISTIVITY');
    const byName = new Map(resistivity.parameters.map((p) => [p.name, p.zeroIsBlank === true]));
    expect(byName.get('temperature_K')).toBe(true);
    expect(byName.get('dopant')).toBe(true);
    expect(byName.get('model')).toBe(true);
    expect(byName.get('material')).toBe(true);
    expect(byName.get('counter_doping')).toBe(false);
    // RESISTIVITY(1e15,"B",0) with the 0 from an empty temperature cell means 300 K.
    const inputs = toArgumentInputs(resistivity, [[[1e15]], [['B']], [[0]], [[0]], [[0]], null, {}]);
    expect(evaluate(resistivity, inputs)).toEqual(evaluate(resistivity, [1e15, 'B']));
    expect(
      spec('FOURPOINT')
        .parameters.filter((p) => p.zeroIsBlank)
        .map((p) => p.name),
    ).toEqual(expect.arrayContaining(['spacing_um']));
  });

  it('stays 0 where 0 means something (counter_doping)', () => {
    const resistivity = spec('RESISTIVITY');
    const index = resistivity.parameters.findIndex((p) => p.name === 'counter_doping');
    const raw: unknown[] = resistivity.parameters.map(() => null);
    raw[index] = [[0]];
    expect(toArgumentInputs(resistivity, raw)[index]).toEqual([[0]]);
  });
});
