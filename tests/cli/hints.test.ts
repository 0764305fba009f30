/**
 * Hints for errors a spreadsheet user makes in typing: each says what to
 * write instead (issue 13 §4).
 */
import { errorHint, hasSemicolonSeparator, nearestFunctions, reasonHint } from '../../src/cli/hints';
import { evaluateFormula, type ResultError } from '../../src/engine/engine';

const errorOf = (formula: string): ResultError => {
  const result = evaluateFormula(formula);
  if (Array.isArray(result) || result === null || typeof result !== 'object') throw new Error(`${formula} gave no single error`);
  return result;
};

describe('errorHint', () => {
  it('tells to quote a bare word where a code was meant', () => {
    expect(errorHint(errorOf('DRIFT.RESISTIVITY(1e15,B)'))).toBe(
      'B is not a defined name; if it is a code (dopant, material, model …), write it as text in double quotes: "B"',
    );
    expect(reasonHint('the headless engine could not take the name B from the workbook')).toMatch(
      /write it as text in double quotes: "B"$/,
    );
  });

  it('tells to separate arguments with commas, not semicolons', () => {
    const formula = 'DRIFT.RESISTIVITY(1e15;"B")';
    expect(errorHint(errorOf(formula), formula)).toMatch(/^separate arguments with commas, as in DRIFT\.RESISTIVITY\(1e15,"B"\)/);
    expect(hasSemicolonSeparator('DRIFT.RESISTIVITY({1e15;1e16},"B")')).toBe(false);
    expect(hasSemicolonSeparator('DRIFT.RESISTIVITY(1e15,"B;x")')).toBe(false);
    expect(hasSemicolonSeparator('SUM(1;2)')).toBe(true);
  });

  it('suggests the nearest DRIFT function for a misspelt one, all of them on a tie, none when nothing is near', () => {
    expect(errorHint(errorOf('DRIFT.RESISTIVTY(1e15,"B")'))).toBe(
      'there is no DRIFT function DRIFT.RESISTIVTY; did you mean DRIFT.RESISTIVITY?',
    );
    expect(nearestFunctions('drift.mobilty')).toEqual(['DRIFT.MOBILITY']);
    expect(nearestFunctions('DRIFT.QQQQQQQQQQQQ')).toEqual([]);
    expect(errorHint(errorOf('DRIFT.QQQQQQQQQQQQ(1)'))).toMatch(
      /^there is no DRIFT function DRIFT\.QQQQQQQQQQQQ; the functions are listed in the README/,
    );
    expect(errorHint(errorOf('RESISTIVITY(1e15,"B")'))).toBe('DRIFT functions are called with their prefix: write DRIFT.RESISTIVITY(…)');
    expect(errorHint(errorOf('NOSUCHBUILTIN(1)'))).toBeUndefined();
  });

  it('says temperatures are in kelvin when one is below the valid range', () => {
    // 273.15 K = 0 °C by definition of the Celsius scale (common practice, no source).
    expect(errorHint(errorOf('DRIFT.RESISTIVITY(1e15,"B",-40)'))).toBe('temperatures are in kelvin (K = °C + 273.15): -40 °C is 233.15 K');
    expect(errorHint(errorOf('DRIFT.INTRINSIC(0)'))).toBe('temperatures are in kelvin (K = °C + 273.15): 0 °C is 273.15 K');
    expect(errorHint(errorOf('DRIFT.INTRINSIC(5000)'))).toBeUndefined();
  });
});
