/**
 * What a tool wants to put into the workbook, as plain data, and the one
 * function that carries it out through the port. Keeping the plan separate
 * from the port makes every tool's layout testable without a workbook, and
 * puts the "never write over the user's cells" rule in one place.
 */
import { blockAddress, type CellBlock, type CellInput, type HighlightPlan, type StylePlan, type WorkbookPort } from '../port';

/** One rectangle of cell inputs. */
export interface BlockWrite {
  readonly block: CellBlock;
  /** rows × columns, the block's size. */
  readonly cells: readonly (readonly CellInput[])[];
}

/** Everything a tool writes, in order. */
export interface SheetPlan {
  readonly writes: readonly BlockWrite[];
  readonly styles: readonly StylePlan[];
  readonly highlights: readonly HighlightPlan[];
  /**
   * Blocks that must be empty before anything is written, beyond the written
   * blocks themselves (e.g. the cells a formula will spill into).
   */
  readonly alsoEmpty?: readonly CellBlock[];
}

/** The user's workbook would be changed in a way they did not ask for; the message says where and why. */
export class PaneRefusal extends Error {
  constructor(message: string) {
    super(message);
    this.name = 'PaneRefusal';
  }
}

/** A1 address with the sheet, as messages show it: "Sheet1!B2:D9". */
export function sheetAddress(block: CellBlock): string {
  return `${block.sheet}!${blockAddress(block)}`;
}

/**
 * The first cell of a block that holds anything (value or formula), as 'C4', or null when all are empty.
 *
 * @param port - workbook
 * @param block - block to inspect
 */
export async function firstFilledCell(port: WorkbookPort, block: CellBlock): Promise<string | null> {
  const contents = await port.read(block);
  for (let r = 0; r < block.rowCount; r += 1) {
    for (let c = 0; c < block.columnCount; c += 1) {
      const value = contents.values[r]?.[c] ?? null;
      const formula = contents.formulas[r]?.[c] ?? null;
      const filled = formula !== null || (value !== null && value !== '');
      if (filled) return blockAddress({ ...block, row: block.row + r, column: block.column + c, rowCount: 1, columnCount: 1 });
    }
  }
  return null;
}

/**
 * Checks that every target block is empty, then writes, styles and highlights.
 * Nothing is written when any target cell holds something.
 *
 * @param port - workbook
 * @param plan - what to write
 * @throws PaneRefusal naming the block and its first filled cell when a target is not empty
 * @example await applySheetPlan(port, { writes: [{ block, cells: [['=1+1']] }], styles: [], highlights: [] })
 */
export async function applySheetPlan(port: WorkbookPort, plan: SheetPlan): Promise<void> {
  for (const write of plan.writes) {
    if (write.cells.length !== write.block.rowCount || write.cells.some((row) => row.length !== write.block.columnCount)) {
      // A plan whose cells do not match its block is a fault in the tool, not the user's doing.
      throw new Error(`plan for ${sheetAddress(write.block)} has cells of the wrong size`);
    }
  }
  const targets = [...plan.writes.map((write) => write.block), ...(plan.alsoEmpty ?? [])];
  for (const block of targets) {
    const filled = await firstFilledCell(port, block);
    if (filled !== null) {
      throw new PaneRefusal(
        `Nothing was written: ${sheetAddress(block)} must be empty, but ${filled} holds something. ` +
          'Clear that block or choose another place, then try again.',
      );
    }
  }
  for (const write of plan.writes) await port.write(write.block, write.cells);
  for (const style of plan.styles) await port.style(style);
  for (const highlight of plan.highlights) await port.addHighlight(highlight);
}
