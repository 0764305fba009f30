/**
 * The catalog-to-Excel error table: codes, which ones carry a message, and the
 * input-only codes. The Excel side of each pair is checked against the
 * CustomFunctions.ErrorCode enum as @types/custom-functions-runtime declares it.
 */
import { readFileSync } from 'fs';
import { failure, type ErrorCode } from '../../src/catalog/values';
import { EXCEL_ERROR_TABLE, codeFromExcelErrorText, toExcelErrorSpec } from '../../src/excel/errors';

/** CustomFunctions.ErrorCode members and values, read from the installed typings. */
function declaredErrorCodes(): Record<string, string> {
  const dts = readFileSync(require.resolve('@types/custom-functions-runtime/index.d.ts'), 'utf8');
  const body = /enum ErrorCode \{([\s\S]*?)\n\s*\}/.exec(dts)?.[1] ?? '';
  return Object.fromEntries([...body.matchAll(/(\w+)\s*=\s*"([^"]+)"/g)].map((m) => [m[1], m[2]]));
}

const ALL_CODES: ErrorCode[] = ['#VALUE!', '#NUM!', '#N/A', '#DIV/0!', '#REF!', '#NAME?', '#NULL!'];

describe('EXCEL_ERROR_TABLE', () => {
  it('covers every catalog code once', () => {
    expect(EXCEL_ERROR_TABLE.map((r) => r.code).sort()).toEqual([...ALL_CODES].sort());
  });

  it('pairs each code with the ErrorCode member whose value is that cell text', () => {
    const declared = declaredErrorCodes();
    expect(Object.keys(declared)).toHaveLength(7);
    for (const rule of EXCEL_ERROR_TABLE) expect(declared[rule.excelName]).toBe(rule.code);
  });
});

describe('toExcelErrorSpec', () => {
  it('keeps the message for #VALUE! and #N/A, the codes Excel shows a message with', () => {
    expect(toExcelErrorSpec(failure('#VALUE!', 'doping must be > 0; got -1'))).toEqual({
      excelName: 'invalidValue',
      cellText: '#VALUE!',
      message: 'doping must be > 0; got -1',
    });
    expect(toExcelErrorSpec(failure('#N/A', 'no value here'))).toEqual({
      excelName: 'notAvailable',
      cellText: '#N/A',
      message: 'no value here',
    });
  });

  it('drops the message for #NUM!, #DIV/0! and #NULL!, which cannot show one', () => {
    expect(toExcelErrorSpec(failure('#NUM!', 'no finite result'))).toEqual({ excelName: 'invalidNumber', cellText: '#NUM!' });
    expect(toExcelErrorSpec(failure('#DIV/0!', 'x'))).toEqual({ excelName: 'divisionByZero', cellText: '#DIV/0!' });
    expect(toExcelErrorSpec(failure('#NULL!', 'x'))).toEqual({ excelName: 'nullReference', cellText: '#NULL!' });
  });

  it('returns #REF! and #NAME? (input-only in Excel) as #VALUE! naming the original code', () => {
    expect(toExcelErrorSpec(failure('#REF!', 'temperature_K holds #REF! from its input'))).toEqual({
      excelName: 'invalidValue',
      cellText: '#VALUE!',
      message: '#REF!: temperature_K holds #REF! from its input',
    });
    expect(toExcelErrorSpec(failure('#NAME?', 'm')).message).toBe('#NAME?: m');
  });
});

describe('codeFromExcelErrorText', () => {
  it('reads the seven codes in any case and spacing', () => {
    for (const code of ALL_CODES) expect(codeFromExcelErrorText(code)).toBe(code);
    expect(codeFromExcelErrorText(' #n/a ')).toBe('#N/A');
  });

  it('gives undefined for Excel errors outside the table', () => {
    for (const text of ['#SPILL!', '#CALC!', '#BUSY!', '#GETTING_DATA', 'VALUE']) expect(codeFromExcelErrorText(text)).toBeUndefined();
  });
});
