/**
 * The sweep form the unit tests start from, and the helpers they share: a
 * resistivity sweep of B-doped Si over 1e14–1e16 cm⁻³ at 300 K.
 */
import type { CellBlock } from '../../../src/taskpane/port';
import type { SweepLayoutInput } from '../../../src/taskpane/sweep/plan';
import { availableQuantities } from '../../../src/taskpane/sweep/quantities';
import { resolveSweep, type SweepForm } from '../../../src/taskpane/sweep/settings';

export const quantities = availableQuantities();

export const BASE_FORM: SweepForm = {
  quantityId: 'RESISTIVITY',
  dopingSwept: true,
  dopingFrom: '1e14',
  dopingTo: '1e16',
  pointsPerDecade: '2',
  fixedDoping: '1e15',
  temperatureSwept: false,
  temperatureUnit: 'K',
  temperatureFrom: '250',
  temperatureTo: '350',
  temperatureStep: '50',
  fixedTemperature: '300',
  values: { 'inner:dopant': 'B' },
};

/** The layout input of `base` with `form`'s fields changed; a form the pane refuses fails the test with its problems. */
export function resolvedFrom(base: SweepForm, form: Partial<SweepForm>): SweepLayoutInput {
  const result = resolveSweep({ ...base, ...form }, quantities);
  if (!result.ok) throw new Error(result.problems.join(' '));
  return result.input;
}

/** A block on Sheet1 (0-based row and column). */
export const at = (row: number, column: number, rowCount = 1, columnCount = 1): CellBlock => ({
  sheet: 'Sheet1',
  row,
  column,
  rowCount,
  columnCount,
});
