/**
 * Terminal formats of results: numbers as the shortest text that reads back
 * as the same double, spills as tab-separated rows, errors as code and message.
 */
import { formatElement, formatError, formatResult } from '../../src/cli/format';
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
    expect(formatResult(error('#NUM!', 'no root'))).toEqual({ lines: ['#NUM! no root'], notes: [], allErrors: true });
  });

  it('tabulates a spill and notes the messages of its error elements', () => {
    const result = formatResult([
      [1, error('#VALUE!', 'bad')],
      [null, 'x'],
    ]);
    expect(result).toEqual({ lines: ['1\t#VALUE!', '\tx'], notes: ['row 1, column 2: #VALUE! bad'], allErrors: false });
  });

  it('marks a spill of nothing but errors as all errors', () => {
    expect(formatResult([[error('#N/A', 'a'), error('#N/A', 'b')]]).allErrors).toBe(true);
  });
});
