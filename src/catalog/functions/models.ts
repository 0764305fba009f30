import { MODEL_REGISTRY } from '../../physics';
import { tableFunction } from '../types';
import type { CellOutput, Grid } from '../values';
import { prose } from '../../text/prose';

/** Column headings of the spilled model table. */
export const MODEL_TABLE_HEADINGS = ['code', 'quantity', 'model', 'citation', 'validity'] as const;

export const MODELS = tableFunction({
  name: 'MODELS',
  summary: 'Table of every model code with its citation and validity range.',
  help: prose`Spills a table with one row per model code that any DRIFT function accepts or uses by default:
    the code to type, the quantity it gives, the model's name, its published source and the range over which
    the source validates it. Results outside a model's range are extrapolations.`,
  result: { unit: null, description: 'A table: code, quantity, model, citation, validity' },
  examples: [{ formula: '=DRIFT.MODELS()', note: 'spills the whole model table' }],
  models: [],
  table: (): Grid<CellOutput> => [
    [...MODEL_TABLE_HEADINGS],
    ...MODEL_REGISTRY.map((m) => [m.code, m.quantity, m.name, m.citation, m.validity]),
  ],
});
