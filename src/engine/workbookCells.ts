/**
 * One .xlsx cell (as exceljs reads it) as engine input, and one engine value
 * as what an .xlsx cell stores.
 */
import ExcelJS from 'exceljs';
import { DetailedCellError } from 'hyperformula';
import type { CellValue, RawCellContent } from 'hyperformula';
import { fileErrorText } from './errorTypes';
import { engineFormula } from './formulaText';

/** Milliseconds per day, for date serial numbers. */
const MS_PER_DAY = 86_400_000;
/** Day 0 of Excel's 1900 date system as it counts from 1 March 1900 on (Excel's own 1900-leap-year quirk). */
const EXCEL_EPOCH_MS = Date.UTC(1899, 11, 30);

/** An exceljs formula value with the fields exceljs uses for shared and array formulas. */
export interface StoredFormula {
  readonly formula?: string;
  readonly sharedFormula?: string;
  readonly shareType?: 'shared' | 'array';
  readonly ref?: string;
}

/**
 * Serial number of a date as Excel's 1900 date system counts it.
 *
 * @param date - as exceljs reads it (UTC midnight for a date-only cell)
 * @example dateSerial(new Date(Date.UTC(2024, 0, 15))) // 45306
 */
export function dateSerial(date: Date): number {
  return (date.getTime() - EXCEL_EPOCH_MS) / MS_PER_DAY;
}

function plainText(value: unknown): string {
  if (typeof value === 'string') return value;
  if (typeof value === 'object' && value !== null && Array.isArray((value as ExcelJS.CellRichTextValue).richText)) {
    return (value as ExcelJS.CellRichTextValue).richText.map((run) => run.text).join('');
  }
  return String(value ?? '');
}

/**
 * What the engine receives for a cell read from a file: formulas as `=text`
 * in the engine's names, text marked so that it stays text (never parsed as a
 * number, date or formula), dates as serial numbers, errors as their literal.
 *
 * @param cell - an exceljs cell
 * @returns engine content, or null for blanks and the covered cells of a merge
 */
export function engineContent(cell: ExcelJS.Cell): RawCellContent {
  switch (cell.type) {
    case ExcelJS.ValueType.Formula:
      return engineFormula(cell.formula);
    case ExcelJS.ValueType.Number:
    case ExcelJS.ValueType.Boolean:
      return cell.value as number | boolean;
    case ExcelJS.ValueType.Date:
      return dateSerial(cell.value as Date);
    case ExcelJS.ValueType.String:
    case ExcelJS.ValueType.SharedString:
    case ExcelJS.ValueType.RichText:
      // A leading apostrophe makes the engine keep text as text.
      return `'${plainText(cell.value)}`;
    case ExcelJS.ValueType.Hyperlink:
      return `'${plainText((cell.value as ExcelJS.CellHyperlinkValue).text)}`;
    case ExcelJS.ValueType.Error:
      return (cell.value as ExcelJS.CellErrorValue).error;
    default:
      return null;
  }
}

/** A value as an .xlsx cell stores it. */
export type FileValue = number | string | boolean | null | ExcelJS.CellErrorValue;

/**
 * An engine value as stored in a file: errors as Excel error literals.
 *
 * @param value - a cell or array-element value from the engine
 * @example fileValue(42) // 42
 */
export function fileValue(value: CellValue): FileValue {
  if (value instanceof DetailedCellError) {
    return { error: fileErrorText(value.type) as ExcelJS.CellErrorValue['error'] };
  }
  return value ?? null;
}
