import { TYPICAL_CONTACT_HEAD_SQUARES, resistorLength } from '../../physics';
import { length } from '../common';
import { requiredNumber } from '../parameters';
import { elementwise } from '../types';
import { endSquares, sheetRes } from './resistorParameters';
import { prose } from '../../text/prose';

export const RESISTORLENGTH = elementwise({
  name: 'RESISTORLENGTH',
  summary: 'Body length of a layer resistor that gives a target resistance, L = W·(R/Rs − end squares), in µm.',
  help: prose`Returns the length of a straight resistor body of width W in a layer of sheet resistance Rs so
    that the whole resistor, ends included, has the target value: L = W·(R/Rs − Ne). Ne counts the squares the
    ends add; a contact head is commonly counted as about ${TYPICAL_CONTACT_HEAD_SQUARES} squares (common
    practice, no source), so a resistor with a head at each end has Ne ≈ ${2 * TYPICAL_CONTACT_HEAD_SQUARES}.
    Blank means 0: the body alone.

    A target that the ends alone already reach (R ≤ Rs·Ne) is an error. DRIFT.RESISTORTEMP with the same Rs, W
    and end squares and the returned length gives the target back at the reference temperature.

    Cautions: the end correction depends on the contact and head geometry of your process; lateral diffusion
    and etch bias make the electrical width differ from the drawn one, and the sheet resistance of a layer
    varies across the wafer. Use your process's measured values.`,
  result: { unit: 'µm', description: 'Body length L' },
  parameters: [
    requiredNumber({ name: 'target_ohm', unit: 'Ω', description: 'Wanted resistance, in Ω, > 0.', min: 0, minExclusive: true }),
    sheetRes,
    length('width_um', 'Resistor width W'),
    endSquares,
  ] as const,
  examples: [
    { formula: '=DRIFT.RESISTORLENGTH(10000,100,5)', note: '10 kΩ in a 100 Ω/sq layer, 5 µm wide: 500 µm' },
    { formula: '=DRIFT.RESISTORLENGTH(10000,100,5,1.3)', note: 'the same with two contact heads' },
  ],
  models: [],
  compute: (target, rs, widthUm, ends) => resistorLength(target, rs, widthUm, ends),
});
