/**
 * What a tool wants to put into the workbook, as plain data, and the one
 * function that carries it out through the port. Keeping the plan separate
 * from the port makes every tool's layout testable without a workbook, and
 * puts the "never write over the user's cells" rule in one place: every tool
 * (certificate check, function reference, sweep) writes through
 * `applySheetPlan`.
 */
import { cellName, sheetAddress, type CellBlock, type CellInput, type HighlightPlan, type StylePlan, type WorkbookPort } from './port';

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

/**
 * Every cell of a block that holds anything (value or formula), row by row, as 'C4'.
 *
 * @param port - workbook
 * @param block - block to inspect
 * @returns the filled cells' names; empty when the whole block is empty
 */
export async function filledCells(port: WorkbookPort, block: CellBlock): Promise<string[]> {
  const contents = await port.read(block);
  const filled: string[] = [];
  for (let r = 0; r < block.rowCount; r += 1) {
    for (let c = 0; c < block.columnCount; c += 1) {
      const value = contents.values[r]?.[c] ?? null;
      const formula = contents.formulas[r]?.[c] ?? null;
      if (formula !== null || (value !== null && value !== '')) filled.push(cellName(block.row + r, block.column + c));
    }
  }
  return filled;
}

/**
 * The first cell of a block that holds anything (value or formula), as 'C4', or null when all are empty.
 *
 * @param port - workbook
 * @param block - block to inspect
 */
export async function firstFilledCell(port: WorkbookPort, block: CellBlock): Promise<string | null> {
  return (await filledCells(port, block))[0] ?? null;
}

/** Words a refusal from the block that must be empty and its filled cells (at least one, row by row). */
export type RefusalText = (block: CellBlock, filled: readonly string[]) => string;

/** The usual refusal: names the block and its first filled cell. */
export const blockNotEmpty: RefusalText = (block, filled) =>
  `Nothing was written: ${sheetAddress(block)} must be empty, but ${filled[0]} holds something. ` +
  'Clear that block or choose another place, then try again.';

/** Which blocks must be empty and how a refusal is worded; by default every written block, then `alsoEmpty`. */
export interface EmptyCheck {
  /** Blocks that must be empty, instead of the written blocks and `alsoEmpty`. */
  readonly blocks?: readonly CellBlock[];
  readonly refusal?: RefusalText;
}

/**
 * Checks that every target block is empty, then writes, styles and highlights.
 * Nothing is written when any target cell holds something.
 *
 * @param port - workbook
 * @param plan - what to write
 * @param check - the blocks to check and the refusal's wording, when a tool words it its own way
 * @throws PaneRefusal naming the block and the filled cells when a target is not empty
 * @example await applySheetPlan(port, { writes: [{ block, cells: [['=1+1']] }], styles: [], highlights: [] })
 */
export async function applySheetPlan(port: WorkbookPort, plan: SheetPlan, check: EmptyCheck = {}): Promise<void> {
  for (const write of plan.writes) {
    if (write.cells.length !== write.block.rowCount || write.cells.some((row) => row.length !== write.block.columnCount)) {
      // A plan whose cells do not match its block is a fault in the tool, not the user's doing.
      throw new Error(`plan for ${sheetAddress(write.block)} has cells of the wrong size`);
    }
  }
  const targets = check.blocks ?? [...plan.writes.map((write) => write.block), ...(plan.alsoEmpty ?? [])];
  for (const block of targets) {
    const filled = await filledCells(port, block);
    if (filled.length > 0) throw new PaneRefusal((check.refusal ?? blockNotEmpty)(block, filled));
  }
  for (const write of plan.writes) await port.write(write.block, write.cells);
  for (const style of plan.styles) await port.style(style);
  for (const highlight of plan.highlights) await port.addHighlight(highlight);
}
