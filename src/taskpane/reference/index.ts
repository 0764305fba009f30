/**
 * The Function reference tool: searchable list of the catalog with units,
 * model citations, validity ranges and examples; inserts a function at the
 * active cell with its arguments laid out in labelled cells.
 */
import type { PaneTool } from '../tool';
import { mountFunctionReference } from './view';

export const REFERENCE_TOOL: PaneTool = {
  id: 'reference',
  label: 'Function reference',
  mount: mountFunctionReference,
};
