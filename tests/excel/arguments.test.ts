/** Excel argument shapes to the catalog's ArgumentInput. */
import { findFunction } from '../../src/catalog';
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
    expect(toArgumentInput([[1e15, 1e16], ['', null]], 'doping')).toEqual([[1e15, 1e16], [null, null]]);
    expect(toArgumentInput([['P'], [true]], 'dopant')).toEqual([['P'], [true]]);
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
    const inputs = toArgumentInputs(mobility, [[[1e16]], [['P']], null, null, null, null, null, { address: 'Sheet1!A1' }]);
    expect(inputs).toHaveLength(mobility.parameters.length);
    expect(inputs).toEqual([[[1e16]], [['P']], undefined, undefined, undefined, undefined, undefined]);
  });

  it('fills arguments Excel did not pass at all as absent', () => {
    expect(toArgumentInputs(mobility, [[[1e16]], [['P']]])).toEqual([[[1e16]], [['P']], undefined, undefined, undefined, undefined, undefined]);
  });
});
