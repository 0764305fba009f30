import { conductionBandDensity } from '../../physics';
import { material, requiredTemperature } from '../common';
import { elementwise } from '../types';

export const NC = elementwise({
  name: 'NC',
  summary: 'Effective density of states in the conduction band Nc, in cm⁻³.',
  help: `Returns the conduction-band effective density of states Nc at the given temperature: the 300 K value of the published density-of-states model scaled with temperature as that model prescribes.`,
  result: { unit: 'cm⁻³', description: 'Conduction-band effective density of states Nc' },
  parameters: [requiredTemperature, material] as const,
  examples: [{ formula: '=DRIFT.NC(300)', note: 'silicon at 300 K, about 2.9e19 cm⁻³' }],
  models: ['green-1990', 'sze-ng-dos-ge', 'sze-ng-dos-gaas', 'levinshtein-dos-4h-sic'],
  compute: (temperatureK, materialValue) => conductionBandDensity(materialValue, temperatureK),
});
