/**
 * Inserts a planned sweep through the port at the selected cell: refuses
 * when any cell of the table (spill included) is not empty, naming the block
 * and the first cells in the way; otherwise writes the cells, styles them and
 * adds the chart.
 */
import type { WorkbookPort } from '../port';
import { blockAddress, cellName } from '../port';
import { planSweep, type SweepLayoutInput, type SweepPlan } from './plan';

/** Thrown when the table would overwrite something; the message says where. */
export class SweepRefusal extends Error {
  constructor(message: string) {
    super(message);
    this.name = 'SweepRefusal';
  }
}

/** How many occupied cells the refusal names before "and N more". */
const NAMED_CELLS = 3;

/** What was inserted; `chartError` says why the chart is missing when the workbook refused it. */
export interface SweepInsertion {
  readonly plan: SweepPlan;
  readonly chartError: string | null;
}

/**
 * Plans and writes the sweep at the selection's top-left cell. The table is
 * written first; a chart the workbook cannot make (e.g. an older Excel) is
 * reported, not fatal, since the table stands on its own.
 *
 * @param port - the workbook
 * @param input - the resolved sweep
 * @returns the plan that was written and any chart failure
 * @throws SweepRefusal when a cell of the table is not empty
 */
export async function insertSweep(port: WorkbookPort, input: SweepLayoutInput): Promise<SweepInsertion> {
  const selected = await port.selection();
  const plan = planSweep(input, { ...selected, rowCount: 1, columnCount: 1 });
  const existing = await port.read(plan.footprint);
  const occupied: string[] = [];
  existing.values.forEach((row, r) =>
    row.forEach((value, c) => {
      if (value !== null || existing.formulas[r]?.[c] !== null) occupied.push(cellName(plan.footprint.row + r, plan.footprint.column + c));
    }),
  );
  if (occupied.length > 0) {
    const named = occupied.slice(0, NAMED_CELLS).join(', ') + (occupied.length > NAMED_CELLS ? ` and ${occupied.length - NAMED_CELLS} more` : '');
    throw new SweepRefusal(
      `Nothing written: the table would fill ${plan.footprint.sheet}!${blockAddress(plan.footprint)} (${plan.footprint.rowCount} rows × ${plan.footprint.columnCount} columns), but ${named} ${occupied.length === 1 ? 'is' : 'are'} not empty. Select a cell with enough empty space below and to the right.`,
    );
  }
  for (const write of plan.writes) await port.write(write.block, write.cells);
  for (const style of plan.styles) await port.style(style);
  try {
    await port.addChart(plan.chart);
    return { plan, chartError: null };
  } catch (error) {
    return { plan, chartError: error instanceof Error ? error.message : String(error) };
  }
}
