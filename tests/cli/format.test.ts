/**
 * Terminal formats of results: numbers as the shortest text that reads back
 * as the same double, spills as tab-separated rows, errors as code and message.
 */
import { formatElement, formatError, formatNumber, formatRecord, formatResult } from '../../src/cli/format';
import type { ResultError } from '../../src/engine/engine';

const error = (code: string, message: string): ResultError => ({ kind: 'error', code, message });

describe('formatElement', () => {
  it('prints numbers so that they read back exactly', () => {
    for (const x of [0.1 + 0.2, 1 / 3, 13.5375249701421, 1e-300, 9.65e9, 2 ** 53 + 2, -4.5e21]) {
      expect(Number(formatElement(x))).toBe(x);
      expect(formatElement(x)).toBe(String(x));
    }
  });

  it('prints booleans, blanks, text and error codes', () => {
    expect(formatElement(true)).toBe('TRUE');
    expect(formatElement(false)).toBe('FALSE');
    expect(formatElement(null)).toBe('');
    expect(formatElement('code\tname')).toBe('code name');
    expect(formatElement(error('#N/A', 'x'))).toBe('#N/A');
  });
});

describe('formatError', () => {
  it('puts the message after the code, on one line', () => {
    expect(formatError(error('#VALUE!', 'doping must be > 0\n  got -1'))).toBe('#VALUE! doping must be > 0 got -1');
    expect(formatError(error('#DIV/0!', ''))).toBe('#DIV/0!');
  });
});

describe('formatResult', () => {
  it('marks a single error as all errors', () => {
    expect(formatResult(error('#NUM!', 'no root'))).toEqual({ lines: ['#NUM! no root'], notes: [], elementErrors: [], allErrors: true });
  });

  it('tabulates a spill and notes the messages of its error elements', () => {
    const result = formatResult([
      [1, error('#VALUE!', 'bad')],
      [null, 'x'],
    ]);
    expect(result).toMatchObject({ lines: ['1\t#VALUE!', '\tx'], notes: ['row 1, column 2: #VALUE! bad'], allErrors: false });
    expect(result.elementErrors).toEqual([{ row: 1, column: 2, error: error('#VALUE!', 'bad') }]);
  });

  it('marks a spill of nothing but errors as all errors', () => {
    expect(formatResult([[error('#N/A', 'a'), error('#N/A', 'b')]]).allErrors).toBe(true);
  });
});

describe('formatNumber with significant digits', () => {
  it('is toPrecision: exponent form when the exponent is ≥ digits or < −6, trailing zeros kept', () => {
    // Expected strings: ECMA-262 Number.prototype.toPrecision, worked by hand.
    expect(formatNumber(28599999999999922000)).toBe('28599999999999922000');
    expect(formatNumber(28599999999999922000, { digits: 3 })).toBe('2.86e+19');
    expect(formatNumber(13.5, { digits: 5 })).toBe('13.500');
    expect(formatNumber(13.5, { digits: 2 })).toBe('14');
    expect(formatNumber(1000, { digits: 3 })).toBe('1.00e+3');
    expect(formatNumber(-0.000123456, { digits: 2 })).toBe('-0.00012');
    expect(formatNumber(1.23e-7, { digits: 2 })).toBe('1.2e-7');
    expect(formatNumber(0.1 + 0.2, { digits: 17 })).toBe('0.30000000000000004');
    expect(formatElement(9.65e9, { digits: 2 })).toBe('9.7e+9');
  });
});

describe('formatRecord (one line per formula)', () => {
  it('writes a spill as an Excel array constant and single values as constants', () => {
    expect(
      formatRecord([
        [1, 2],
        [3, 4],
      ]).lines,
    ).toEqual(['{1,2;3,4}']);
    expect(formatRecord([[1, 'a"b', true, null, error('#N/A', 'x')]]).lines).toEqual(['{1,"a""b",TRUE,,#N/A}']);
    expect(formatRecord('{1,2}').lines).toEqual(['"{1,2}"']);
    expect(formatRecord(13.5).lines).toEqual(['13.5']);
    expect(formatRecord(null).lines).toEqual(['']);
    expect(formatRecord(error('#VALUE!', 'bad\nthing'))).toMatchObject({ lines: ['#VALUE! bad thing'], allErrors: true });
    expect(formatRecord([[0.5, 2e21]], { digits: 2 }).lines).toEqual(['{0.50,2.0e+21}']);
  });
});

describe('escaping text for the terminal', () => {
  it('escapes control and bidirectional formatting characters in text and messages', () => {
    expect(formatElement('a\u202eb\u0007c\u001b[31m')).toBe('a\\u{202e}b\\u{7}c\\u{1b}[31m');
    expect(formatError(error('#VALUE!', 'x\u2066y\u0085'))).toBe('#VALUE! x\\u{2066}y\\u{85}');
  });
});
