import { material } from '../common';
import { MODEL_QUANTITY_LIST, anyDopant, modelCodesFor, modelQuantity } from '../modelCodes';
import { rowFunction } from '../types';

export const MODELCODES = rowFunction({
  name: 'MODELCODES',
  summary: 'The model codes that apply to a quantity for a material and dopant, default first, spilled as one row.',
  help: `Returns, as one row, the codes of the models that apply to a quantity for a material (blank: Si) and a dopant (blank: any dopant): the material's default first, then the others in the order the help pages cite them, each once. The row is a code list for spilling a function that takes a model argument across every applicable model without typing a code: =DRIFT.RESISTIVITY(A2:A40,"B",300,DRIFT.MODELCODES("resistivity","Si","B")) gives one column per model beside a column of dopings, and =DRIFT.MODELCODES("resistivity","Si","B") in the row above heads the columns. DRIFT.RESISTIVITYSPREAD and DRIFT.DOPINGSPREAD give the lowest and highest over the same resistivity models, when only the range is wanted.

Quantities: ${MODEL_QUANTITY_LIST}. The dopant matters where a model covers some dopants only: astm-f723 covers B, P and As (As from 1e19 cm⁻³), so it is listed for those, and not for other dopants (Ga, Sb, donor …) or other materials. The mobility row starts with the material's default fit (masetti in Si), while a blank mobility model chooses per carrier (klaassen for Si minority carriers). A listed model can still refuse a particular sample (astm-f723 outside 290–305 K or with counter-doping, and DRIFT.RESISTIVITYAT refuses it altogether): that element shows the model's error, and the other models still compute.

Each argument is one value; a range is refused, because rows for several materials or dopants would differ in length: call it once per material. In the headless engine (the driftcell command line, recalc) the length of a result is fixed from the formula text before any cell is read, so there the arguments must be typed in the formula (text in quotes, or left out); a cell reference or a computed argument gives an error saying so. Excel spills a row of any length.`,
  result: { unit: null, description: 'Model codes, the default first' },
  parameters: [modelQuantity, material, anyDopant] as const,
  examples: [
    { formula: '=DRIFT.MODELCODES("resistivity","Si","B")', note: 'f723-anchored, masetti, arora, caughey-thomas, klaassen, astm-f723' },
    { formula: '=DRIFT.MODELCODES("resistivity",,"Ga")', note: 'the same without astm-f723, which does not cover gallium' },
    { formula: '=DRIFT.RESISTIVITY(1e15,"B",296.15,DRIFT.MODELCODES("resistivity","Si","B"))', note: '1e15 cm⁻³ boron at 23 °C under every silicon model, one value per model' },
    { formula: '=DRIFT.RESISTIVITY(A2:A40,"B",300,DRIFT.MODELCODES("resistivity","Si","B"))', note: 'a column of dopings: one column per model' },
    { formula: '=DRIFT.MOBILITY(1e17,"phosphorus",300,"electron",DRIFT.MODELCODES("mobility"))', note: 'electron mobility under every silicon mobility model' },
    { formula: '=DRIFT.MODELCODES("intrinsic","Ge")', note: 'dos: germanium’s only ni model' },
  ],
  models: [],
  compute: (quantity, host, dopantText) => modelCodesFor(quantity, host, dopantText),
});
