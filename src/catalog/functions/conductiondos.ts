import { conductionBandDensity } from '../../physics';
import { material, requiredTemperature } from '../common';
import { elementwise } from '../types';
import { DENSITY_OF_STATES_MODELS } from '../citedModels';
import { prose } from '../../text/prose';

export const CONDUCTIONDOS = elementwise({
  name: 'CONDUCTIONDOS',
  summary: 'Effective density of states in the conduction band Nc, in cm⁻³.',
  help: prose`Returns the conduction-band effective density of states Nc at the given temperature: the 300 K
    value of the published density-of-states model scaled with temperature as that model prescribes.`,
  result: { unit: 'cm⁻³', description: 'Conduction-band effective density of states Nc' },
  parameters: [requiredTemperature, material] as const,
  examples: [{ formula: '=DRIFT.CONDUCTIONDOS(300)', note: 'silicon at 300 K, about 2.9e19 cm⁻³' }],
  models: DENSITY_OF_STATES_MODELS,
  compute: (temperatureK, materialValue) => conductionBandDensity(materialValue, temperatureK),
});
