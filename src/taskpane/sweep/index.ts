/**
 * The Sweep builder tool: a quantity over a doping and/or temperature axis,
 * previewed live, inserted as labelled axis cells, one spilled DRIFT formula
 * and a native XY chart.
 */
import type { PaneTool } from '../tool';
import { mountSweepBuilder } from './view';

export const SWEEP_TOOL: PaneTool = {
  id: 'sweep',
  label: 'Sweep builder',
  mount: mountSweepBuilder,
};
