/**
 * The headless engine: a HyperFormula instance configured like Excel's
 * dynamic-array calculation, with every DRIFT function registered, and a
 * helper that evaluates one formula on its own (for `driftcell calc`).
 */
import { DetailedCellError, HyperFormula } from 'hyperformula';
import type { CellValue, ConfigParams, SerializedNamedExpression, Sheets } from 'hyperformula';
import { engineFormula } from './formulaText';
import { registerDriftFunctions } from './plugin';

/** Rows and columns of an Excel worksheet (Microsoft, "Excel specifications and limits"). */
export const EXCEL_MAX_ROWS = 1_048_576;
export const EXCEL_MAX_COLUMNS = 16_384;

/**
 * Engine settings. Each one is chosen to calculate as Excel does:
 * - useArrayArithmetic: ranges in arithmetic stay arrays and spill (=A2:A9*2), as in Excel 365;
 * - smartRounding off: results are exported exactly as computed, not rounded to 10 digits;
 * - evaluateNullToZero: a formula that refers to a blank cell shows 0;
 * - leapYear1900 with nullDate 1899-12-31: Excel's date serial numbers, 1900 leap-year quirk included;
 * - ignoreWhiteSpace 'any': non-breaking spaces between tokens are accepted, as Excel accepts them;
 * - maxRows/maxColumns: Excel's grid, 1 048 576 rows × 16 384 columns (HyperFormula's own default
 *   stops at 40 000 rows and throws for a longer sheet).
 */
export const ENGINE_CONFIG: Readonly<Partial<ConfigParams>> = {
  licenseKey: 'gpl-v3',
  useArrayArithmetic: true,
  smartRounding: false,
  evaluateNullToZero: true,
  leapYear1900: true,
  nullDate: { year: 1899, month: 12, day: 31 },
  ignoreWhiteSpace: 'any',
  maxRows: EXCEL_MAX_ROWS,
  maxColumns: EXCEL_MAX_COLUMNS,
};

/**
 * Excel reads TRUE and FALSE in formulas as boolean literals; HyperFormula only
 * knows the functions TRUE() and FALSE(). Two workbook names bridge the gap.
 */
const BOOLEAN_LITERALS: readonly SerializedNamedExpression[] = [
  { name: 'TRUE', expression: '=TRUE()' },
  { name: 'FALSE', expression: '=FALSE()' },
];

/**
 * Builds an engine over the given sheets.
 *
 * @param sheets - sheet name → rows of cell contents (numbers, text, booleans, `=formulas`); default one empty sheet
 * @param namedExpressions - workbook names, e.g. `{ name: 'rho', expression: '=Sheet1!$B$2' }`
 * @returns a calculated HyperFormula instance that knows every DRIFT function
 * @example createEngine({ Sheet1: [[1e15, '=DRIFT.RESISTIVITY(A1,"B")']] }).getCellValue({ sheet: 0, row: 0, col: 1 })
 */
export function createEngine(sheets?: Sheets, namedExpressions?: SerializedNamedExpression[]): HyperFormula {
  registerDriftFunctions();
  return HyperFormula.buildFromSheets(sheets ?? { Sheet1: [] }, { ...ENGINE_CONFIG }, [...BOOLEAN_LITERALS, ...(namedExpressions ?? [])]);
}

/** An error shown by a cell or by one element of a spill. */
export interface ResultError {
  readonly kind: 'error';
  /** As the cell shows it, e.g. `#VALUE!`. */
  readonly code: string;
  readonly message: string;
}

/** One value of a result: number, text, boolean, blank (null) or error. */
export type ResultElement = number | string | boolean | null | ResultError;

/** A single value, or the rows of a spilled result. */
export type FormulaResult = ResultElement | ResultElement[][];

/**
 * One engine cell value in the engine-independent form.
 *
 * @param value - what HyperFormula reports for a cell or array element
 */
export function toResultElement(value: CellValue): ResultElement {
  if (value instanceof DetailedCellError) return { kind: 'error', code: value.value, message: value.message ?? '' };
  return value ?? null;
}

/** Whether a result element is an error. */
export function isResultError(value: ResultElement): value is ResultError {
  return typeof value === 'object' && value !== null && value.kind === 'error';
}

/**
 * Evaluates one formula in an otherwise empty workbook, built-ins and DRIFT
 * functions alike.
 *
 * @param formula - with or without the leading `=`, e.g. `DRIFT.RESISTIVITY(1e15,"B")`
 * @returns the value, or the rows of the spilled result; a formula that cannot be read gives an #ERROR! element
 * @example evaluateFormula('=DRIFT.SHEETRES(1,10)') // 1000
 */
export function evaluateFormula(formula: string): FormulaResult {
  // Typed text goes through the same translation as formulas read from files (1E16, _xldudf_ names).
  const text = engineFormula(formula.trim());
  const engine = createEngine();
  try {
    if (text === '=' || !engine.validateFormula(text)) {
      return { kind: 'error', code: '#ERROR!', message: `not a valid formula: ${text}` };
    }
    const value = engine.calculateFormula(text, 0);
    return Array.isArray(value) ? value.map((row) => row.map(toResultElement)) : toResultElement(value);
  } finally {
    engine.destroy();
  }
}
