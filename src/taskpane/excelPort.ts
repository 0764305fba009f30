/**
 * The Excel adapter of the pane's WorkbookPort: every call is one
 * `Excel.run` batch through Office.js. Charts need ExcelApi 1.7 (series
 * ranges and logarithmic axes); conditional formats need ExcelApi 1.6.
 *
 * The adapter takes the Excel namespace as a parameter so tests can hand it
 * office-addin-mock's OfficeMockObject instead of the real Office.js.
 */
import type { BlockContents, CellBlock, CellInput, CellShown, ChartPlan, HighlightPlan, StylePlan, WorkbookPort } from './port';
import { blockAddress } from './port';

/** The part of Office.js's `Excel` namespace the adapter uses. */
export interface ExcelHost {
  run<T>(batch: (context: Excel.RequestContext) => Promise<T>): Promise<T>;
}

/** Excel's number formats and chart enums as the adapter writes them (the string forms Office.js accepts). */
const CHART_TYPE_XY_LINES = 'XYScatterLines';
const SERIES_BY_COLUMNS = 'Columns';
const SCALE_LOG = 'Logarithmic';
const SCALE_LINEAR = 'Linear';
/**
 * Line weight of an emphasised series, in points (ChartLineFormat.weight, ExcelApi 1.7): clearly heavier than the
 * 2.25 pt Excel gives a scatter line by default (common practice, no source); other series keep Excel's own weight.
 */
export const EMPHASISED_LINE_POINTS = 4;

/** One cell as Office.js reports it: value plus its type ('Error', 'Empty', …). */
function shown(value: unknown, type: string | undefined): CellShown {
  if (type === 'Error') return { error: String(value) };
  if (type === 'Empty' || value === '' || value === null || value === undefined) return null;
  if (typeof value === 'number' || typeof value === 'boolean' || typeof value === 'string') return value;
  return String(value);
}

/** What one input becomes in Office.js's `formulas` array: null means empty, written as ''. */
function formulaInput(cell: CellInput): string | number | boolean {
  return cell === null ? '' : cell;
}

function checkShape(block: CellBlock, cells: readonly (readonly CellInput[])[]): void {
  const rowsOk = cells.length === block.rowCount;
  const columnsOk = cells.every((row) => row.length === block.columnCount);
  if (!rowsOk || !columnsOk) {
    throw new RangeError(
      `write to ${blockAddress(block)} needs ${block.rowCount}×${block.columnCount} ` +
        `cells, got ${cells.length}×${cells[0]?.length ?? 0}`,
    );
  }
}

function rangeOf(context: Excel.RequestContext, block: CellBlock): Excel.Range {
  return context.workbook.worksheets.getItem(block.sheet).getRange(blockAddress(block));
}

/** Asks Office whether a requirement set is available (Office.context.requirements.isSetSupported). */
export type RequirementCheck = (set: string, version: string) => boolean;

/** The host's own check, or "assume yes" where Office does not offer one. */
function officeRequirements(): RequirementCheck {
  const office = (globalThis as { Office?: { context?: { requirements?: { isSetSupported?: RequirementCheck } } } }).Office;
  const requirements = office?.context?.requirements;
  return typeof requirements?.isSetSupported === 'function' ? (set, version) => requirements.isSetSupported!(set, version) : () => true;
}

/** Charts with explicit series ranges and log axes (ChartSeriesCollection.add, ChartAxis.scaleType). */
const CHART_REQUIREMENT = ['ExcelApi', '1.7'] as const;
/** Conditional formats (Range.conditionalFormats). */
const HIGHLIGHT_REQUIREMENT = ['ExcelApi', '1.6'] as const;

function requireSet(supports: RequirementCheck, [set, version]: readonly [string, string], what: string): void {
  if (!supports(set, version))
    throw new Error(`${what} needs ${set} ${version} (Excel 2019, Excel 2021 or ` + `Microsoft 365); this Excel does not offer it`);
}

/**
 * Builds the Excel port.
 *
 * @param excel - the Office.js `Excel` namespace (default: the global one)
 * @param supports - requirement-set check (default: Office.context.requirements.isSetSupported)
 * @returns a WorkbookPort whose calls go to the open workbook
 * @example const port = createExcelPort(); await port.selection()
 */
export function createExcelPort(
  excel: ExcelHost = (globalThis as unknown as { Excel: ExcelHost }).Excel,
  supports: RequirementCheck = officeRequirements(),
): WorkbookPort {
  return {
    selection: () =>
      excel.run(async (context) => {
        const range = context.workbook.getSelectedRange();
        range.load('rowIndex,columnIndex,rowCount,columnCount');
        range.worksheet.load('name');
        await context.sync();
        return {
          sheet: range.worksheet.name,
          row: range.rowIndex,
          column: range.columnIndex,
          rowCount: range.rowCount,
          columnCount: range.columnCount,
        };
      }),

    read: (block) =>
      excel.run(async (context): Promise<BlockContents> => {
        const range = rangeOf(context, block);
        range.load('values,formulas,valueTypes');
        await context.sync();
        const values = range.values.map((row, r) => row.map((value, c) => shown(value, range.valueTypes[r]?.[c])));
        const formulas = range.formulas.map((row) => row.map((f) => (typeof f === 'string' && f.startsWith('=') ? f : null)));
        return { values, formulas };
      }),

    write: (block, cells) =>
      excel.run(async (context) => {
        checkShape(block, cells);
        // Setting `formulas` on the anchor cell alone lets a dynamic-array formula spill.
        rangeOf(context, block).formulas = cells.map((row) => row.map(formulaInput));
        await context.sync();
      }),

    style: (plan: StylePlan) =>
      excel.run(async (context) => {
        const range = rangeOf(context, plan.block);
        if (plan.bold !== undefined) range.format.font.bold = plan.bold;
        if (plan.numberFormat !== undefined) {
          const format = plan.numberFormat;
          range.numberFormat = Array.from({ length: plan.block.rowCount }, () =>
            Array.from({ length: plan.block.columnCount }, () => format),
          );
        }
        await context.sync();
      }),

    addChart: (plan: ChartPlan) =>
      excel.run(async (context) => {
        if (plan.series.length === 0) throw new RangeError('a chart needs at least one series');
        requireSet(supports, CHART_REQUIREMENT, 'An XY chart with log axes');
        const sheet = context.workbook.worksheets.getItem(plan.sheet);
        const first = plan.series[0];
        // The chart starts from the first series' values; every series then gets explicit x and y ranges.
        const chart = sheet.charts.add(
          CHART_TYPE_XY_LINES as Excel.ChartType.xyscatterLines,
          sheet.getRange(blockAddress(first.y)),
          SERIES_BY_COLUMNS as Excel.ChartSeriesBy.columns,
        );
        chart.title.text = plan.title;
        plan.series.forEach((series, index) => {
          const target = index === 0 ? chart.series.getItemAt(0) : chart.series.add(series.name);
          target.name = series.name;
          target.setXAxisValues(sheet.getRange(blockAddress(series.x)));
          target.setValues(sheet.getRange(blockAddress(series.y)));
          if (series.emphasised === true) target.format.line.weight = EMPHASISED_LINE_POINTS;
        });
        const xAxis = chart.axes.categoryAxis;
        const yAxis = chart.axes.valueAxis;
        xAxis.scaleType = plan.xLogarithmic ? SCALE_LOG : SCALE_LINEAR;
        yAxis.scaleType = plan.yLogarithmic ? SCALE_LOG : SCALE_LINEAR;
        xAxis.title.text = plan.xTitle;
        yAxis.title.text = plan.yTitle;
        chart.setPosition(blockAddress(plan.anchor));
        await context.sync();
      }),

    addHighlight: (plan: HighlightPlan) =>
      excel.run(async (context) => {
        requireSet(supports, HIGHLIGHT_REQUIREMENT, 'Conditional highlighting');
        const format = rangeOf(context, plan.block).conditionalFormats.add('CellValue' as Excel.ConditionalFormatType.cellValue);
        // Equal to the text (a formula string literal; quotes doubled), not "contains": PASS must not match PASSED.
        format.cellValue.rule = { formula1: `="${plan.text.replace(/"/g, '""')}"`, operator: 'EqualTo' };
        format.cellValue.format.fill.color = plan.fill;
        format.cellValue.format.font.color = plan.fontColor;
        await context.sync();
      }),
  };
}
