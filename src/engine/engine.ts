/**
 * The headless engine: a HyperFormula instance configured like Excel's
 * dynamic-array calculation, with every DRIFT function registered, and a
 * helper that evaluates one formula on its own (for `driftcell calc`).
 */
import { DetailedCellError, HyperFormula } from 'hyperformula';
import type { CellValue, ConfigParams, SerializedNamedExpression, Sheets, SimpleCellAddress } from 'hyperformula';
import type { ArraySizePredictor as ArraySizePredictorClass } from 'hyperformula/typings/ArraySize';
import { cellName, columnName } from './a1';
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
 * Most cells one formula's result may fill. HyperFormula fixes a result's
 * size when it reads the formula and then reserves every cell of it, so
 * SEQUENCE(1048576,4) or a whole column times a whole row (17 billion cells)
 * would exhaust memory before any value is computed.
 */
export const MAX_RESULT_CELLS = 1_000_000;

/** A formula whose result would fill more than {@link MAX_RESULT_CELLS} cells; thrown while the engine reads it. */
export class ResultTooLarge extends Error {
  constructor(
    readonly address: SimpleCellAddress,
    readonly rows: number,
    readonly columns: number,
  ) {
    super(
      `the formula in ${cellName(address.row, address.col)} gives ${extent(rows)}×${extent(columns)} values, ` +
        `more than the ${MAX_RESULT_CELLS.toLocaleString('en-US')} cells one result may fill`,
    );
    this.name = 'ResultTooLarge';
  }
}

function extent(n: number): string {
  return Number.isFinite(n) ? n.toLocaleString('en-US') : 'unbounded';
}

let resultSizeLimited = false;

/**
 * Wraps HyperFormula's result-size prediction (the one place every formula's
 * size is fixed, on reading a sheet and in calculateFormula) so that an
 * oversized result stops the read with ResultTooLarge instead of reserving it.
 */
function limitResultSizes(): void {
  if (resultSizeLimited) return;
  resultSizeLimited = true;
  // The class is not in HyperFormula's public index; its prototype is reached through an instance
  // (shared by every engine built afterwards). Typed, but internal: this is the one place relying on it.
  const probe = HyperFormula.buildEmpty({ licenseKey: ENGINE_CONFIG.licenseKey });
  const internals = probe as unknown as { _crudOperations: { operations: { arraySizePredictor: ArraySizePredictorClass } } };
  const ArraySizePredictor = internals._crudOperations.operations.arraySizePredictor.constructor as typeof ArraySizePredictorClass;
  probe.destroy();
  const predict = ArraySizePredictor.prototype.checkArraySize;
  ArraySizePredictor.prototype.checkArraySize = function checkedArraySize(
    this: ArraySizePredictorClass,
    ...args: Parameters<typeof predict>
  ) {
    const size = predict.apply(this, args);
    if (!size.isRef && size.width * size.height > MAX_RESULT_CELLS) throw new ResultTooLarge(args[1], size.height, size.width);
    return size;
  };
}

/**
 * The size HyperFormula's predictor gives a formula's result, from the
 * formula alone (ranges, array constants and literal sizes; not cell values),
 * without computing it. Throws ResultTooLarge past MAX_RESULT_CELLS (the
 * predictor is wrapped by limitResultSizes). calculateFormula does not predict
 * sizes itself, so `calc` asks this first instead of exhausting memory on
 * SEQUENCE(1048576,1)*SEQUENCE(1,16384).
 *
 * @param engine - an engine from createEngine
 * @param text - the formula, `=…`
 * @param sheetId - the sheet it is read on
 * @returns rows × columns, or undefined when the text is not a formula
 */
export function predictedResultSize(engine: HyperFormula, text: string, sheetId = 0): { rows: number; columns: number } | undefined {
  // Internal like limitResultSizes: extractTemporaryFormula is how calculateFormula itself parses.
  const internals = engine as unknown as {
    extractTemporaryFormula(
      formula: string,
      sheetId: number,
    ): { ast?: Parameters<ArraySizePredictorClass['checkArraySize']>[0]; address: SimpleCellAddress };
    _crudOperations: { operations: { arraySizePredictor: ArraySizePredictorClass } };
  };
  const { ast, address } = internals.extractTemporaryFormula(text, sheetId);
  if (ast === undefined) return undefined;
  const size = internals._crudOperations.operations.arraySizePredictor.checkArraySize(ast, address);
  return size.isRef ? undefined : { rows: size.height, columns: size.width };
}

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
  limitResultSizes();
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

/** A parsed reference as HyperFormula's parser reports it (dependencies of a temporary formula). */
interface ParsedDependency {
  readonly dependency?: { readonly row: number; readonly col: number; readonly sheet?: number };
  readonly start?: { readonly row?: number; readonly col?: number };
  readonly end?: { readonly row?: number; readonly col?: number };
  readonly name?: string;
}

function referenceText(dep: ParsedDependency): string | undefined {
  if (dep.dependency !== undefined)
    return `cell ` + `${cellName(dep.dependency.row, dep.dependency.col)}${dep.dependency.sheet ? ' of another sheet' : ''}`;
  const { start, end } = dep;
  if (start === undefined || end === undefined) return undefined;
  if (start.row !== undefined && start.col !== undefined && end.row !== undefined && end.col !== undefined) {
    return `range ${cellName(start.row, start.col)}:${cellName(end.row, end.col)}`;
  }
  if (start.col !== undefined && end.col !== undefined) return `columns ${columnName(start.col)}:${columnName(end.col)}`;
  if (start.row !== undefined && end.row !== undefined) return `rows ${start.row + 1}:${end.row + 1}`;
  return undefined;
}

/**
 * The cell, range, column and row references of a formula (not names, not
 * text in quotes, not function names), as HyperFormula's parser finds them.
 */
function cellReferences(engine: HyperFormula, text: string): string[] {
  // Internal like checkFormulaResultSize: the parser's dependency list is the one exact account of references.
  const internals = engine as unknown as {
    extractTemporaryFormula(formula: string, sheetId: number): { dependencies?: readonly ParsedDependency[] };
  };
  const found = (internals.extractTemporaryFormula(text, 0).dependencies ?? [])
    .map(referenceText)
    .filter((t): t is string => t !== undefined);
  return [...new Set(found)];
}

/**
 * Evaluates one formula in an otherwise empty workbook, built-ins and DRIFT
 * functions alike.
 *
 * @param formula - with or without the leading `=`, e.g. `DRIFT.RESISTIVITY(1e15,"B")`
 * @returns the value, or the rows of the spilled result; a formula that cannot be read gives an #ERROR! element,
 *   one that refers to cells or ranges (A1, $B$2:C3, A:A, Sheet1!A1) a #REF! element saying there is no workbook
 * @example evaluateFormula('=DRIFT.SHEETRES(1,10)') // 1000
 */
export function evaluateFormula(formula: string): FormulaResult {
  // Typed text goes through the same translation as formulas read from files (1E16, _xldudf_ names).
  const text = engineFormula(formula.trim());
  const engine = createEngine();
  try {
    let value: ReturnType<HyperFormula['calculateFormula']>;
    try {
      if (text === '=' || !engine.validateFormula(text)) {
        return { kind: 'error', code: '#ERROR!', message: `not a valid formula: ${text}` };
      }
      const references = cellReferences(engine, text);
      if (references.length > 0) {
        return {
          kind: 'error',
          code: '#REF!',
          message:
            `the formula refers to ${references.join(', ')}, but a formula evaluated on its own has no workbook and no cells ` +
            '(a reference would read as a blank cell, 0). Write the value in its place, or put the formula ' +
            'in a workbook and run driftcell recalc',
        };
      }
      predictedResultSize(engine, text);
      value = engine.calculateFormula(text, 0);
    } catch (e) {
      if (e instanceof ResultTooLarge)
        return {
          kind: 'error',
          code: '#VALUE!',
          message: e.message.replace(/^the formula in \S+ gives/, 'the formula gives'),
        };
      if (e instanceof RangeError)
        return {
          kind: 'error',
          code: '#VALUE!',
          message: 'the formula is too long or too deeply nested for the headless engine',
        };
      throw e;
    }
    return Array.isArray(value) ? value.map((row) => row.map(toResultElement)) : toResultElement(value);
  } finally {
    engine.destroy();
  }
}
