import { carrierFor, diffusivity } from '../../physics';
import { carrier, counterDoping, dopant, doping, material, mobilityModel, sampleOf, temperature } from '../common';
import { elementwise } from '../types';

export const DIFFUSIVITY = elementwise({
  name: 'DIFFUSIVITY',
  summary: 'Carrier diffusion coefficient from the Einstein relation D = μ·kT/q, in cm²/s.',
  help: `Returns the diffusion coefficient of electrons or holes from the Einstein relation D = μ·kT/q, with μ exactly as DRIFT.MOBILITY returns it for the same arguments. The relation holds for non-degenerate carriers; at very heavy doping it overestimates D slightly.`,
  result: { unit: 'cm²/s', description: 'Diffusion coefficient' },
  parameters: [doping, dopant, temperature, carrier, mobilityModel, material, counterDoping] as const,
  examples: [
    { formula: '=DRIFT.DIFFUSIVITY(1e17,"B",300,"minority")', note: 'minority electrons in a p-type base' },
    { formula: '=DRIFT.DIFFUSIVITY(1e15,"P")', note: 'electrons in lightly doped n-type Si' },
  ],
  models: ['masetti', 'arora', 'caughey-thomas'],
  compute: (density, dopantCode, temperatureK, role, model, materialValue, counter) => {
    const sample = sampleOf(materialValue, temperatureK, dopantCode, density, counter);
    return diffusivity(model, carrierFor(sample.dopant, role), sample);
  },
});
