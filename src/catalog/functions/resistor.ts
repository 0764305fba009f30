import { resistorValue } from '../../physics';
import { length, resistivity } from '../common';
import { elementwise } from '../types';
import { prose } from '../../text/prose';

export const RESISTOR = elementwise({
  name: 'RESISTOR',
  summary: 'Resistance R = ρL/(W·t) of a uniform rectangular bar, in Ω.',
  help: prose`Returns the resistance of a uniform bar with current along its length: R = ρ·L/(W·t) = Rs·(L/W).
    Contact and end effects are not included.`,
  result: { unit: 'Ω', description: 'Resistance R' },
  parameters: [
    resistivity,
    length('length_um', 'Bar length along the current'),
    length('width_um', 'Bar width'),
    length('thickness_um', 'Bar thickness'),
  ] as const,
  examples: [
    { formula: '=DRIFT.RESISTOR(1,100,10,10)', note: 'ten squares of a 1000 Ω/sq layer: 10 kΩ' },
    { formula: '=DRIFT.RESISTOR(DRIFT.RESISTIVITY(5e16,"B",A2:A12),200,20,2)', note: 'a bar’s value over a temperature column' },
  ],
  models: [],
  compute: (rho, lengthUm, widthUm, thicknessUm) => resistorValue(rho, lengthUm, widthUm, thicknessUm),
});
