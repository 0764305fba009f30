/**
 * Formulas the headless engine cannot evaluate although Excel can: functions
 * it lacks (INDIRECT, LET, LAMBDA, CELL, INFO, GETPIVOTDATA …), syntax it
 * cannot read (table references `Table1[col]`, external references
 * `[1]Sheet1!A1`), names it could not take from the workbook. recalc keeps
 * such a cell's formula and cached value instead of writing the engine's
 * #NAME? or #ERROR! over Excel's result.
 */
import { DetailedCellError, ErrorType } from 'hyperformula';
import type { CellValue, HyperFormula } from 'hyperformula';

const MISSING_FUNCTION = /^Function name (.+) not recognized\.$/;
const MISSING_NAME = /^Named expression (.+) not recognized\.$/;

/** The formula's text with string literals blanked, so names inside quotes are not found. */
function withoutStrings(formula: string): string {
  return formula.replace(/"(?:[^"]|"")*"/g, '""');
}

function escaped(name: string): string {
  return name.replace(/[.*+?^${}()|[\]\\]/g, '\\$&');
}

/**
 * Why the engine's value of a formula cell is the engine's own shortcoming
 * rather than the formula's result, or undefined when it is a real result.
 * Only the cell where the shortcoming arises is named: a cell that merely
 * receives the error from a precedent is not (it recalculates once the
 * precedent keeps its cached value).
 *
 * @param engine - the engine holding the workbook
 * @param value - the engine's value of the cell
 * @param formula - the cell's formula as the engine has it (`=…`)
 * @returns a reason for the user, e.g. "the headless engine has no INDIRECT"
 * @example
 * const error = nameError('Function name INDIRECT not recognized.');
 * unevaluableReason(engine, error, '=INDIRECT("A1")') // 'the headless engine has no INDIRECT'
 */
export function unevaluableReason(engine: HyperFormula, value: CellValue, formula: string): string | undefined {
  if (!(value instanceof DetailedCellError)) return undefined;
  const text = withoutStrings(formula);
  if (value.type === ErrorType.NAME) {
    const fn = MISSING_FUNCTION.exec(value.message);
    if (fn && new RegExp(`(^|[^A-Za-z0-9_.])${escaped(fn[1])}\\s*\\(`, 'i').test(text)) return `the headless engine has no ${fn[1]}`;
    const name = MISSING_NAME.exec(value.message);
    if (name && new RegExp(`(^|[^A-Za-z0-9_.])${escaped(name[1])}($|[^A-Za-z0-9_.(])`, 'i').test(text)) {
      return `the headless engine could not take the name ${name[1]} from the workbook`;
    }
    return undefined;
  }
  if (value.type === ErrorType.ERROR && value.message.startsWith('Parsing error') && !engine.validateFormula(formula)) {
    return 'the headless engine cannot read this formula (table or external references, LAMBDA calls and the like)';
  }
  return undefined;
}
