/**
 * Numbers typed as text are read in decimal notation only. Found by the
 * property tests: Number('0x10') is 16 in JavaScript, so "0x10" was read as
 * a doping of 16 where a spreadsheet sees text and the user meant something else.
 */
import { findFunction } from '../../src/catalog';
import { evaluate } from '../../src/catalog/broadcast';
import type { FunctionSpec } from '../../src/catalog/types';
import { isFailure } from '../../src/catalog/values';

const SHEETRES = findFunction('SHEETRES') as FunctionSpec;

describe('numeric text', () => {
  it.each(['0x10', '0X1F', '0b11', '0o17', '1_000', 'Infinity', '-Infinity', '1e400', '1.2.3', '+-1', 'e5'])(
    'rejects %p with a message naming the argument and the value',
    (text) => {
      const [[cell]] = evaluate(SHEETRES, [text, 10]);
      expect(isFailure(cell)).toBe(true);
      expect(isFailure(cell) && cell.message).toBe(`resistivity must be a number; got "${text}"`);
    },
  );

  it.each([
    [' 2 ', 2],
    ['2.', 2],
    ['.5', 0.5],
    ['+3', 3],
    ['1E1', 10],
    ['1e-1', 0.1],
  ])('reads %p as %p', (text, value) => {
    // Rs = ρ/t with t = 10 µm = 1e-3 cm (common practice, no source).
    const [[cell]] = evaluate(SHEETRES, [text, 10]);
    expect(cell).toBeCloseTo(value * 1000, 9);
  });
});
