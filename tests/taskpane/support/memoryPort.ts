/**
 * An in-memory WorkbookPort for unit tests: a grid of cell inputs per sheet, a
 * settable selection, and records of every style, chart and highlight. It does
 * not calculate: a formula cell reads back with its formula and a null value.
 * For values, `engineValues` loads the grid into the real engine
 * (src/engine/engine.ts), which evaluates DRIFT formulas as the add-in does.
 */
import { createEngine, toResultElement, type ResultElement } from '../../../src/engine/engine';
import type {
  BlockContents,
  CellBlock,
  CellInput,
  CellShown,
  ChartPlan,
  HighlightPlan,
  StylePlan,
  WorkbookPort,
} from '../../../src/taskpane/port';

export class MemoryPort implements WorkbookPort {
  /** sheet → row → column → input. */
  readonly sheets = new Map<string, (CellInput | undefined)[][]>();
  readonly styles: StylePlan[] = [];
  readonly charts: ChartPlan[] = [];
  readonly highlights: HighlightPlan[] = [];
  /** Every write, in order. */
  readonly writes: { block: CellBlock; cells: readonly (readonly CellInput[])[] }[] = [];
  current: CellBlock;

  constructor(sheet = 'Sheet1') {
    this.sheets.set(sheet, []);
    this.current = { sheet, row: 0, column: 0, rowCount: 1, columnCount: 1 };
  }

  /** Puts rows of inputs at a 0-based top-left cell (test set-up; not recorded as a write). */
  put(row: number, column: number, rows: readonly (readonly CellInput[])[], sheet = this.current.sheet): void {
    rows.forEach((cells, r) => cells.forEach((cell, c) => this.set(sheet, row + r, column + c, cell)));
  }

  /** Selects a block. */
  select(row: number, column: number, rowCount = 1, columnCount = 1, sheet = this.current.sheet): void {
    this.current = { sheet, row, column, rowCount, columnCount };
  }

  /** The input at a cell, undefined when empty. */
  input(row: number, column: number, sheet = this.current.sheet): CellInput | undefined {
    return this.sheets.get(sheet)?.[row]?.[column];
  }

  async selection(): Promise<CellBlock> {
    return this.current;
  }

  async read(block: CellBlock): Promise<BlockContents> {
    const values: CellShown[][] = [];
    const formulas: (string | null)[][] = [];
    for (let r = 0; r < block.rowCount; r += 1) {
      values.push([]);
      formulas.push([]);
      for (let c = 0; c < block.columnCount; c += 1) {
        const cell = this.input(block.row + r, block.column + c, block.sheet) ?? null;
        const isFormula = typeof cell === 'string' && cell.startsWith('=');
        values[r].push(isFormula ? null : cell);
        formulas[r].push(isFormula ? cell : null);
      }
    }
    return { values, formulas };
  }

  async write(block: CellBlock, cells: readonly (readonly CellInput[])[]): Promise<void> {
    if (cells.length !== block.rowCount || cells.some((row) => row.length !== block.columnCount)) {
      throw new Error(`write to a ${block.rowCount}×${block.columnCount} block with cells of another size`);
    }
    this.writes.push({ block, cells });
    cells.forEach((row, r) => row.forEach((cell, c) => this.set(block.sheet, block.row + r, block.column + c, cell)));
  }

  async style(plan: StylePlan): Promise<void> {
    this.styles.push(plan);
  }

  async addChart(plan: ChartPlan): Promise<void> {
    this.charts.push(plan);
  }

  async addHighlight(plan: HighlightPlan): Promise<void> {
    this.highlights.push(plan);
  }

  /** Every sheet's values as the engine calculates them, sheet → rows × columns. */
  engineValues(): Map<string, ResultElement[][]> {
    const names = [...this.sheets.keys()];
    const engine = createEngine(
      Object.fromEntries(
        names.map((name) => [name, (this.sheets.get(name) ?? []).map((row) => Array.from(row ?? [], (cell) => cell ?? null))]),
      ),
    );
    const result = new Map<string, ResultElement[][]>();
    names.forEach((name) => {
      const id = engine.getSheetId(name)!;
      result.set(
        name,
        engine.getSheetValues(id).map((row) => row.map((value) => toResultElement(value))),
      );
    });
    engine.destroy();
    return result;
  }

  private set(sheet: string, row: number, column: number, cell: CellInput): void {
    if (!this.sheets.has(sheet)) this.sheets.set(sheet, []);
    const grid = this.sheets.get(sheet)!;
    while (grid.length <= row) grid.push([]);
    const cells = grid[row] ?? (grid[row] = []);
    cells[column] = cell === null ? undefined : cell;
  }
}

/** One engine value of a sheet, 0-based, null beyond the used area. */
export function valueAt(values: Map<string, ResultElement[][]>, row: number, column: number, sheet = 'Sheet1'): ResultElement {
  return values.get(sheet)?.[row]?.[column] ?? null;
}
