import { optionalNumber, requiredNumber } from '../parameters';

/** Parameters shared by DRIFT.RESISTORLENGTH and DRIFT.RESISTORTEMP. */
export const sheetRes = requiredNumber({
  name: 'sheet_res',
  unit: 'Ω/sq',
  description: 'Sheet resistance of the layer, in Ω/sq, > 0.',
  min: 0,
  minExclusive: true,
});

export const endSquares = optionalNumber({
  name: 'end_squares',
  unit: 'sq',
  description: 'Squares added by both ends together (contact heads, bends), ≥ 0; blank means 0.',
  defaultValue: 0,
  min: 0,
});
