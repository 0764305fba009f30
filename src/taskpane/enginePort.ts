/**
 * The headless-engine adapter of the pane's WorkbookPort: a HyperFormula
 * workbook (createEngine, every DRIFT function registered) that evaluates
 * exactly the formulas a tool writes. The engine has no charts, styles or
 * conditional formats, so those plans are recorded for tests to inspect.
 * The selection is whatever the test or harness sets.
 *
 * Used by the browser harness and unit tests only; it pulls HyperFormula in,
 * so the production task pane never imports it.
 */
import { DetailedCellError, type HyperFormula } from 'hyperformula';
import { createEngine } from '../engine/engine';
import { engineFormula } from '../engine/formulaText';
import type { BlockContents, CellBlock, CellInput, CellShown, ChartPlan, HighlightPlan, StylePlan, WorkbookPort } from './port';
import { blockAddress } from './port';

/** The engine port plus what tests and the harness need beyond the WorkbookPort. */
export interface EnginePort extends WorkbookPort {
  /** The HyperFormula instance (for reading cells directly). */
  readonly engine: HyperFormula;
  /** Sets the block selection() reports. */
  select(block: CellBlock): void;
  /** Chart plans received, in order. */
  readonly charts: readonly ChartPlan[];
  /** Highlight plans received, in order. */
  readonly highlights: readonly HighlightPlan[];
  /** Style plans received, in order. */
  readonly styles: readonly StylePlan[];
}

/**
 * Builds an engine-backed port.
 *
 * @param sheets - sheet name → rows of cell contents (numbers, text, `=formulas`); default one empty 'Sheet1'
 * @returns the port, with the selection at A1 of the first sheet
 * @example
 * const port = createEnginePort({ Sheet1: [[1e15]] });
 * await port.write({ sheet: 'Sheet1', row: 0, column: 1, rowCount: 1, columnCount: 1 }, [['=DRIFT.RESISTIVITY(A1,"B")']]);
 */
export function createEnginePort(sheets?: Record<string, (string | number | boolean | null)[][]>): EnginePort {
  const engine = createEngine(sheets ?? { Sheet1: [] });
  const charts: ChartPlan[] = [];
  const highlights: HighlightPlan[] = [];
  const styles: StylePlan[] = [];
  // Formula text as written, by 'sheet:row:col': the engine re-renders formulas it reads (1E+15 → 1000000000000000),
  // while Excel shows them as entered, so read() reports what the tool wrote.
  const written = new Map<string, string>();
  let selected: CellBlock = { sheet: engine.getSheetName(0) ?? 'Sheet1', row: 0, column: 0, rowCount: 1, columnCount: 1 };

  function sheetId(name: string, create: boolean): number {
    const id = engine.getSheetId(name);
    if (id !== undefined) return id;
    if (!create) throw new RangeError(`the workbook has no sheet named '${name}'`);
    engine.addSheet(name);
    return engine.getSheetId(name) as number;
  }

  function shown(value: unknown): CellShown {
    if (value instanceof DetailedCellError) return { error: value.value };
    if (value === undefined || value === null) return null;
    return value as CellShown;
  }

  function content(cell: CellInput): string | number | boolean | null {
    // Formulas as typed in Excel (1E16, DRIFT.NAME) become the text the engine reads.
    return typeof cell === 'string' && cell.startsWith('=') ? engineFormula(cell) : cell;
  }

  return {
    engine,
    charts,
    highlights,
    styles,
    select(block) {
      sheetId(block.sheet, true);
      selected = block;
    },
    async selection() {
      return selected;
    },
    async read(block): Promise<BlockContents> {
      const sheet = sheetId(block.sheet, false);
      const values: CellShown[][] = [];
      const formulas: (string | null)[][] = [];
      for (let r = 0; r < block.rowCount; r++) {
        const valueRow: CellShown[] = [];
        const formulaRow: (string | null)[] = [];
        for (let c = 0; c < block.columnCount; c++) {
          const address = { sheet, row: block.row + r, col: block.column + c };
          valueRow.push(shown(engine.getCellValue(address)));
          const formula = engine.getCellFormula(address);
          formulaRow.push(formula === undefined ? null : (written.get(`${sheet}:${address.row}:${address.col}`) ?? formula));
        }
        values.push(valueRow);
        formulas.push(formulaRow);
      }
      return { values, formulas };
    },
    async write(block, cells) {
      if (cells.length !== block.rowCount || cells.some((row) => row.length !== block.columnCount)) {
        throw new RangeError(
          `write to ${blockAddress(block)} needs ${block.rowCount}×${block.columnCount} ` +
            `cells, got ${cells.length}×${cells[0]?.length ?? 0}`,
        );
      }
      const sheet = sheetId(block.sheet, true);
      cells.forEach((row, r) =>
        row.forEach((cell, c) => {
          const key = `${sheet}:${block.row + r}:${block.column + c}`;
          if (typeof cell === 'string' && cell.startsWith('=')) written.set(key, cell);
          else written.delete(key);
        }),
      );
      engine.setCellContents(
        { sheet, row: block.row, col: block.column },
        cells.map((row) => row.map(content)),
      );
    },
    async style(plan) {
      sheetId(plan.block.sheet, false);
      styles.push(plan);
    },
    async addChart(plan) {
      if (plan.series.length === 0) throw new RangeError('a chart needs at least one series');
      sheetId(plan.sheet, false);
      charts.push(plan);
    },
    async addHighlight(plan) {
      sheetId(plan.block.sheet, false);
      highlights.push(plan);
    },
  };
}
