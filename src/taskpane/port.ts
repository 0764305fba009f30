/**
 * The one way the pane's tools reach a workbook. Tools build plans (cells,
 * charts, formats) from catalog data and hand them to a port; they never call
 * Office.js or the engine themselves. Two adapters implement it: Excel
 * (Office.js, `excelPort.ts`) and the headless engine (`enginePort.ts`), so
 * browser tests evaluate exactly the formulas a tool writes.
 *
 * Coordinates are zero-based (row 0, column 0 is A1). A cell input that is a
 * string starting with '=' is a formula; any other string is text.
 */
import { areaName } from '../engine/a1';

/** A rectangle of cells on one sheet. */
export interface CellBlock {
  readonly sheet: string;
  /** Top row, 0-based. */
  readonly row: number;
  /** Left column, 0-based. */
  readonly column: number;
  readonly rowCount: number;
  readonly columnCount: number;
}

/** What a tool writes into one cell: a formula ('=…'), text, a number, a boolean, or null (leave empty). */
export type CellInput = string | number | boolean | null;

/** What a cell shows: its value, an error such as '#VALUE!', or null when empty. */
export type CellShown = string | number | boolean | null | { readonly error: string };

/** The contents of a block as read back. */
export interface BlockContents {
  /** Displayed values, rows × columns. */
  readonly values: readonly (readonly CellShown[])[];
  /** Formula text ('=…') or null for constants and empty cells, rows × columns. */
  readonly formulas: readonly (readonly (string | null)[])[];
}

/** One plotted series of an XY chart: x and y are single-column or single-row blocks of equal length. */
export interface ChartSeries {
  readonly name: string;
  readonly x: CellBlock;
  readonly y: CellBlock;
  /** Drawn with a heavier line (the default model among compared ones); absent means a normal line. */
  readonly emphasised?: boolean;
}

/** A native XY (scatter with lines) chart. */
export interface ChartPlan {
  readonly sheet: string;
  readonly title: string;
  readonly series: readonly ChartSeries[];
  readonly xTitle: string;
  readonly yTitle: string;
  readonly xLogarithmic: boolean;
  readonly yLogarithmic: boolean;
  /** Where the chart's top-left corner sits (a cell). */
  readonly anchor: CellBlock;
}

/** Highlight the cells of a block whose shown text equals `text`. */
export interface HighlightPlan {
  readonly block: CellBlock;
  readonly text: string;
  /** CSS-style colours, '#rrggbb'. */
  readonly fill: string;
  readonly fontColor: string;
}

/** Cell styling the tools need: bold header cells and number formats. */
export interface StylePlan {
  readonly block: CellBlock;
  readonly bold?: boolean;
  /** Excel number format, e.g. '0.000E+00'. */
  readonly numberFormat?: string;
}

/** The workbook as the pane's tools see it. */
export interface WorkbookPort {
  /** The selected block on the active sheet (a single cell when one cell is selected). */
  selection(): Promise<CellBlock>;
  /** Values and formulas of a block. */
  read(block: CellBlock): Promise<BlockContents>;
  /** Writes rows × columns of inputs starting at the block's top-left cell; the block's size must match. */
  write(block: CellBlock, cells: readonly (readonly CellInput[])[]): Promise<void>;
  /** Applies bold / number formats. */
  style(plan: StylePlan): Promise<void>;
  /** Adds a native XY chart. */
  addChart(plan: ChartPlan): Promise<void>;
  /** Adds a conditional format that highlights cells showing `text`. */
  addHighlight(plan: HighlightPlan): Promise<void>;
}

/** A1 names of cells and areas from 0-based coordinates, shared with the workbook recalculation. */
export { areaName, cellName, columnName } from '../engine/a1';

/** A1-style address of a block without the sheet, e.g. 'B2:D9' or 'B2'. */
export function blockAddress(block: CellBlock): string {
  return areaName(block.row, block.column, block.row + block.rowCount - 1, block.column + block.columnCount - 1);
}

/** A1 address with the sheet, as messages show it: "Sheet1!B2:D9". */
export function sheetAddress(block: CellBlock): string {
  return `${block.sheet}!${blockAddress(block)}`;
}
