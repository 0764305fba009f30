import { sheetResistance } from '../../physics';
import { length, resistivity } from '../common';
import { elementwise } from '../types';
import { prose } from '../../text/prose';

export const SHEETRES = elementwise({
  name: 'SHEETRES',
  summary: 'Sheet resistance Rs = ρ/t of a uniform layer, in Ω/sq.',
  help: prose`Returns the sheet resistance of a layer of uniform resistivity ρ and thickness t. For a
    non-uniform (diffused or implanted) layer the sheet resistance is not ρ/t of any single resistivity; use a
    layer integration instead.`,
  result: { unit: 'Ω/sq', description: 'Sheet resistance Rs' },
  parameters: [resistivity, length('thickness_um', 'Layer thickness')] as const,
  examples: [
    { formula: '=DRIFT.SHEETRES(1,10)', note: '1 Ω·cm over 10 µm: 1000 Ω/sq' },
    { formula: '=DRIFT.SHEETRES(DRIFT.RESISTIVITY(1e17,"phosphorus"),5)', note: 'a 5 µm epitaxial layer' },
  ],
  models: [],
  compute: (rho, thicknessUm) => sheetResistance(rho, thicknessUm),
});
