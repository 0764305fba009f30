/**
 * Inserts a planned sweep through the port at the selected cell: refuses
 * when any cell of the table (spill included) is not empty, naming the block
 * and the first cells in the way; otherwise writes the cells, styles them and
 * adds the chart. Writing and the emptiness check are the shared sheet-plan
 * machinery (../sheetPlan.ts); only the refusal's wording is the sweep's own.
 */
import { sheetAddress, type WorkbookPort } from '../port';
import { applySheetPlan, PaneRefusal, type RefusalText } from '../sheetPlan';
import { planSweep, type SweepLayoutInput, type SweepPlan } from './plan';

/** Thrown when the table would overwrite something; the message says where. The pane's one refusal class. */
export { PaneRefusal as SweepRefusal };

/** How many occupied cells the refusal names before "and N more". */
const NAMED_CELLS = 3;

/** The sweep's refusal: the whole table's block and size, and the first occupied cells. */
const tableNotEmpty: RefusalText = (footprint, occupied) => {
  const more = occupied.length > NAMED_CELLS ? ` and ${occupied.length - NAMED_CELLS} more` : '';
  const named = occupied.slice(0, NAMED_CELLS).join(', ') + more;
  return (
    `Nothing written: the table would fill ${sheetAddress(footprint)} (${footprint.rowCount} rows × ` +
    `${footprint.columnCount} columns), but ${named} ${occupied.length === 1 ? 'is' : 'are'} not empty. ` +
    `Select a cell with enough empty space below and to the right.`
  );
};

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
 * @throws PaneRefusal (also exported as SweepRefusal) when a cell of the table is not empty
 */
export async function insertSweep(port: WorkbookPort, input: SweepLayoutInput): Promise<SweepInsertion> {
  const selected = await port.selection();
  const plan = planSweep(input, { ...selected, rowCount: 1, columnCount: 1 });
  await applySheetPlan(port, plan, { blocks: [plan.footprint], refusal: tableNotEmpty });
  try {
    await port.addChart(plan.chart);
    return { plan, chartError: null };
  } catch (error) {
    return { plan, chartError: error instanceof Error ? error.message : String(error) };
  }
}
