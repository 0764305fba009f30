import { valenceBandDensity } from '../../physics';
import { material, requiredTemperature } from '../common';
import { elementwise } from '../types';
import { DENSITY_OF_STATES_MODELS } from '../citedModels';
import { prose } from '../../text/prose';

export const VALENCEDOS = elementwise({
  name: 'VALENCEDOS',
  summary: 'Effective density of states in the valence band Nv, in cm⁻³.',
  help: prose`Returns the valence-band effective density of states Nv at the given temperature: the 300 K
    value of the published density-of-states model scaled with temperature as that model prescribes.`,
  result: { unit: 'cm⁻³', description: 'Valence-band effective density of states Nv' },
  parameters: [requiredTemperature, material] as const,
  examples: [{ formula: '=DRIFT.VALENCEDOS(300)', note: 'silicon at 300 K, about 3.1e19 cm⁻³' }],
  models: DENSITY_OF_STATES_MODELS,
  compute: (temperatureK, materialValue) => valenceBandDensity(materialValue, temperatureK),
});
