/**
 * Which cell blocks a spill: for each formula that shows #SPILL! because its
 * result has no room, the first filled cell (row by row) inside the range its
 * result needs, so the message can say which cell to clear.
 */
import type ExcelJS from 'exceljs';
import { cellName } from '../engine/a1';
import { createEngine, predictedResultSize } from '../engine/engine';
import { engineFormula } from '../engine/formulaText';
import type { CellProblem } from '../engine/xlsx';

/** `sheet!address` → the address of the first filled cell in the spill range. */
export type SpillBlockers = ReadonlyMap<string, string>;

/** The key of a cell in SpillBlockers. */
export function problemKey(sheet: string, address: string): string {
  return `${sheet}!${address}`;
}

function formulaText(cell: ExcelJS.Cell): string | undefined {
  const value = cell.value;
  if (typeof value === 'object' && value !== null && 'formula' in value && typeof value.formula === 'string') return value.formula;
  return typeof cell.formula === 'string' && cell.formula !== '' ? cell.formula : undefined;
}

/**
 * The size of a formula's result in rows × columns, as the engine predicts it
 * from the formula alone (sizes of ranges and array constants do not depend on
 * the cells' values), or undefined when it cannot be told. Nothing is computed.
 */
function resultSize(engine: ReturnType<typeof createEngine>, text: string, sheetId: number): { rows: number; columns: number } | undefined {
  try {
    return predictedResultSize(engine, engineFormula(text), sheetId);
  } catch {
    return undefined;
  }
}

/**
 * Finds the blocking cell of every "no space" #SPILL! problem.
 *
 * @param workbook - the recalculated workbook (blocking cells keep their content)
 * @param problems - the cells that show errors, from the recalculation summary
 */
export function findSpillBlockers(workbook: ExcelJS.Workbook, problems: readonly CellProblem[]): SpillBlockers {
  const blockers = new Map<string, string>();
  const spills = problems.filter((p) => p.code === '#SPILL!' && /no space/i.test(p.message));
  if (spills.length === 0) return blockers;
  const names = workbook.worksheets.map((sheet) => sheet.name);
  const engine = createEngine(Object.fromEntries(names.map((name) => [name, []])));
  try {
    for (const problem of spills) {
      const sheet = workbook.getWorksheet(problem.sheet);
      if (sheet === undefined) continue;
      const anchor = sheet.getCell(problem.address);
      const text = formulaText(anchor);
      if (text === undefined) continue;
      const size = resultSize(engine, text, names.indexOf(problem.sheet));
      if (size === undefined) continue;
      search: for (let r = 0; r < size.rows; r++) {
        for (let c = 0; c < size.columns; c++) {
          if (r === 0 && c === 0) continue;
          const cell = sheet.findCell(Number(anchor.row) + r, Number(anchor.col) + c);
          if (cell !== undefined && cell.value !== null && cell.value !== undefined) {
            blockers.set(problemKey(problem.sheet, problem.address), cellName(Number(anchor.row) + r - 1, Number(anchor.col) + c - 1));
            break search;
          }
        }
      }
    }
  } finally {
    engine.destroy();
  }
  return blockers;
}
