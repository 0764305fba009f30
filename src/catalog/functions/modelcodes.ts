/**
 * DRIFT.MODELCODES: the model codes that apply to a quantity for a material
 * (and dopant), as one row, so that a function taking a model argument
 * spills across every applicable model without a code typed. The lists and
 * the dopant rule live in ../modelCodes.ts, shared with the task pane.
 */
import { material } from '../common';
import { MODEL_QUANTITY_LIST, anyDopant, applicableModelCodes, modelCodesFor, modelQuantity } from '../modelCodes';
import { rowFunction } from '../types';
import { prose } from '../../text/prose';

/** An example's note listing the codes it gives, from the same lists, so the help page cannot fall behind the physics. */
function listed(quantity: 'resistivity' | 'intrinsic', host?: string, dopantText?: string): string {
  return applicableModelCodes(quantity, host, dopantText).join(', ');
}

export const MODELCODES = rowFunction({
  name: 'MODELCODES',
  summary: 'One row of the model codes that apply to a quantity for a material and dopant, the default first.',
  help: prose`Returns one row of model codes: every model that applies to a quantity for a material (blank:
    Si) and a dopant (blank: any dopant of the material), the material's default first, then the others in the
    order the help pages cite them.

    Put it in the model argument of another function to compute under every model at once, with no code typed:
    =DRIFT.RESISTIVITY(A2:A40,"B",300,DRIFT.MODELCODES("resistivity","Si","B")) spills one column per model
    beside a column of dopings, and =DRIFT.MODELCODES("resistivity","Si","B") in the row above heads those
    columns. When only the lowest and highest values matter, DRIFT.RESISTIVITYSPREAD and DRIFT.DOPINGSPREAD
    give them over the same resistivity models.

    Quantities, any case: ${MODEL_QUANTITY_LIST}.

    The dopant matters where a model covers some dopants only: astm-f723 covers B, P and As in silicon (As
    from 1e19 cm⁻³), so the resistivity row lists it for those dopants and for a blank dopant, and not for Ga,
    Sb, donor, acceptor or another material. The mobility row starts with the material's default fit (masetti
    in Si); a blank mobility model in DRIFT.MOBILITY chooses per carrier instead (klaassen for a silicon
    minority carrier). A listed model can still refuse a particular sample (astm-f723 outside 290–305 K or
    with counter-doping; DRIFT.RESISTIVITYAT refuses astm-f723 altogether): that element shows the model's
    error, and the other models still compute.

    Each argument is one value; a range is refused, because rows for several materials or dopants would differ
    in length: call it once per material. In the headless engine (driftcell calc and recalc) the length of a
    result is fixed from the formula text before any cell is read, so there the arguments must be typed into
    the formula (text in quotes, or left out); a cell reference or a computed argument gives #VALUE! saying
    so. Excel also takes them from cells.`,
  result: { unit: null, description: 'Model codes, the default first' },
  parameters: [modelQuantity, material, anyDopant] as const,
  examples: [
    { formula: '=DRIFT.MODELCODES("resistivity","Si","B")', note: listed('resistivity', 'Si', 'B') },
    {
      formula: '=DRIFT.MODELCODES("resistivity",,"Ga")',
      note: prose`${listed('resistivity', 'Si', 'Ga')}: no
      astm-f723, which does not cover gallium`,
    },
    {
      formula: '=DRIFT.RESISTIVITY(1e15,"B",296.15,DRIFT.MODELCODES("resistivity","Si","B"))',
      note: '1e15 cm⁻³ boron at 23 °C under every silicon resistivity model, one value per model',
    },
    {
      formula: '=DRIFT.RESISTIVITY(A2:A40,"B",300,DRIFT.MODELCODES("resistivity","Si","B"))',
      note: 'a column of dopings: one column per model',
    },
    {
      formula: '=DRIFT.MOBILITY(1e17,"phosphorus",300,"electron",DRIFT.MODELCODES("mobility"))',
      note: 'electron mobility under every silicon mobility model',
    },
    { formula: '=DRIFT.MODELCODES("intrinsic","Ge")', note: `${listed('intrinsic', 'Ge')}: germanium’s only ni model` },
  ],
  models: [],
  compute: (quantity, host, dopantText) => modelCodesFor(quantity, host, dopantText),
});
