import { intrinsicDensity } from '../../physics';
import { intrinsicModel, material, requiredTemperature } from '../common';
import { elementwise } from '../types';

export const NI = elementwise({
  name: 'NI',
  summary: 'Intrinsic carrier density ni, in cm⁻³.',
  help: `Returns the intrinsic carrier density ni at the given temperature from the selected published model. The default gives 9.65e9 cm⁻³ for silicon at 300 K. Every carrier-density function uses the same ni, so n·p = ni² holds throughout the catalog.`,
  result: { unit: 'cm⁻³', description: 'Intrinsic carrier density ni' },
  parameters: [requiredTemperature, material, intrinsicModel] as const,
  examples: [
    { formula: '=DRIFT.NI(300)', note: 'silicon at 300 K, 9.65e9 cm⁻³' },
    { formula: '=DRIFT.NI(300,,"sproul-green")', note: 'the same with the Sproul–Green fit' },
  ],
  models: ['misiakos', 'sproul-green', 'dos'],
  compute: (temperatureK, materialValue, model) => intrinsicDensity(materialValue, temperatureK, model),
});
