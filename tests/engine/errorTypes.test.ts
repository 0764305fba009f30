/**
 * The error-code table: every catalog code maps to a HyperFormula error type
 * that shows it, and back; codes HyperFormula cannot show keep their name in
 * the message; files only get error literals Excel knows.
 */
import { ErrorType } from 'hyperformula';
import type { ErrorCode } from '../../src/catalog/values';
import { codeForErrorType, errorTypeForCode, fileErrorText, messageForType } from '../../src/engine/errorTypes';

const SHOWN: [ErrorCode, ErrorType][] = [
  ['#VALUE!', ErrorType.VALUE],
  ['#NUM!', ErrorType.NUM],
  ['#N/A', ErrorType.NA],
  ['#DIV/0!', ErrorType.DIV_BY_ZERO],
  ['#REF!', ErrorType.REF],
  ['#NAME?', ErrorType.NAME],
];

describe('catalog codes and HyperFormula error types', () => {
  it.each(SHOWN)('%s is shown as %s, keeps its message, and maps back', (code, type) => {
    expect(errorTypeForCode(code)).toBe(type);
    expect(codeForErrorType(type)).toBe(code);
    expect(messageForType(code, 'what went wrong')).toBe('what went wrong');
  });

  it('names #NULL! in the message, since HyperFormula has no such error', () => {
    expect(errorTypeForCode('#NULL!')).toBe(ErrorType.ERROR);
    expect(messageForType('#NULL!', 'the ranges do not meet')).toBe('#NULL!: the ranges do not meet');
  });

  it('hands errors the catalog has no code for to it as #VALUE!', () => {
    for (const type of [ErrorType.SPILL, ErrorType.CYCLE, ErrorType.ERROR, ErrorType.LIC]) expect(codeForErrorType(type)).toBe('#VALUE!');
  });
});

describe('error literals written to files', () => {
  // Error values a SpreadsheetML cell of type "e" holds as Excel writes them: #NULL!, #DIV/0!,
  // #VALUE!, #REF!, #NAME?, #NUM!, #N/A, and #SPILL! since Excel's dynamic arrays (from memory).
  const excelLiterals = new Set(['#NULL!', '#DIV/0!', '#VALUE!', '#REF!', '#NAME?', '#NUM!', '#N/A', '#SPILL!']);

  it('are Excel error values for every HyperFormula error type', () => {
    for (const type of Object.values(ErrorType)) expect(excelLiterals.has(fileErrorText(type))).toBe(true);
  });

  it('keep the codes Excel shares with HyperFormula', () => {
    expect(fileErrorText(ErrorType.DIV_BY_ZERO)).toBe('#DIV/0!');
    expect(fileErrorText(ErrorType.SPILL)).toBe('#SPILL!');
    expect(fileErrorText(ErrorType.CYCLE)).toBe('#VALUE!');
  });
});
