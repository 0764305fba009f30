/**
 * How the catalog's cell errors map onto Excel's custom-function errors, in
 * one table, both ways.
 *
 * Facts this table encodes (Office custom functions reference:
 * CustomFunctions.ErrorCode in @types/custom-functions-runtime and the
 * "Handle and return errors from your custom function" article):
 * - Only #VALUE! and #N/A carry a custom message, shown in the cell's error
 *   indicator menu; for #DIV/0!, #NUM!, #NULL!, #NAME? and #REF! "a custom
 *   error message can't be used".
 * - #NAME? and #REF! are supported as custom function *input* errors but not
 *   as *output* errors, so a failure with one of those codes leaves Driftcell
 *   as #VALUE! with the original code named in its message.
 */
import type { CellFailure, ErrorCode } from '../catalog/values';

/** Member names of CustomFunctions.ErrorCode. */
export type ExcelErrorCodeName =
  'invalidValue' | 'notAvailable' | 'divisionByZero' | 'invalidNumber' | 'nullReference' | 'invalidName' | 'invalidReference';

export interface ExcelErrorRule {
  /** The catalog's code. */
  readonly code: ErrorCode;
  /** The CustomFunctions.ErrorCode member that shows this code. */
  readonly excelName: ExcelErrorCodeName;
  /** Whether Excel shows a custom message with this code. */
  readonly showsMessage: boolean;
  /** Whether a custom function may return this code (false: input only). */
  readonly allowedAsOutput: boolean;
}

export const EXCEL_ERROR_TABLE: readonly ExcelErrorRule[] = [
  { code: '#VALUE!', excelName: 'invalidValue', showsMessage: true, allowedAsOutput: true },
  { code: '#N/A', excelName: 'notAvailable', showsMessage: true, allowedAsOutput: true },
  { code: '#DIV/0!', excelName: 'divisionByZero', showsMessage: false, allowedAsOutput: true },
  { code: '#NUM!', excelName: 'invalidNumber', showsMessage: false, allowedAsOutput: true },
  { code: '#NULL!', excelName: 'nullReference', showsMessage: false, allowedAsOutput: true },
  { code: '#NAME?', excelName: 'invalidName', showsMessage: false, allowedAsOutput: false },
  { code: '#REF!', excelName: 'invalidReference', showsMessage: false, allowedAsOutput: false },
];

const RULE_BY_CODE = new Map(EXCEL_ERROR_TABLE.map((rule) => [rule.code, rule]));
const VALUE_RULE = RULE_BY_CODE.get('#VALUE!') as ExcelErrorRule;

/** What to construct a CustomFunctions.Error from: the enum member, its cell text, and the message if Excel shows one. */
export interface ExcelErrorSpec {
  readonly excelName: ExcelErrorCodeName;
  /** The text Excel shows in the cell, equal to the enum member's value (e.g. `#VALUE!`). */
  readonly cellText: ErrorCode;
  readonly message?: string;
}

/**
 * Chooses the Excel error that shows a catalog failure.
 *
 * @param failure - a catalog cell failure
 * @returns the enum member to use and the message to attach (only for codes that show one)
 * @example toExcelErrorSpec(failure('#REF!', 'x')) // { excelName: 'invalidValue', cellText: '#VALUE!', message: '#REF!: x' }
 */
export function toExcelErrorSpec(failure: CellFailure): ExcelErrorSpec {
  const rule = RULE_BY_CODE.get(failure.code);
  if (rule === undefined || !rule.allowedAsOutput) {
    // Excel cannot return this code from a custom function: keep the message visible instead.
    return { excelName: VALUE_RULE.excelName, cellText: VALUE_RULE.code, message: `${failure.code}: ${failure.message}` };
  }
  return rule.showsMessage
    ? { excelName: rule.excelName, cellText: rule.code, message: failure.message }
    : { excelName: rule.excelName, cellText: rule.code };
}

/**
 * Reads an Excel error's cell text (as an input error carries it) as a catalog code.
 *
 * @param text - e.g. `#DIV/0!`
 * @returns the catalog code, or undefined for texts outside the table (#SPILL!, #CALC!, #BUSY!, …)
 */
export function codeFromExcelErrorText(text: string): ErrorCode | undefined {
  const upper = text.trim().toUpperCase();
  return EXCEL_ERROR_TABLE.find((rule) => rule.code === upper)?.code;
}
