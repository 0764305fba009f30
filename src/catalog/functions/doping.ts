import { dopingForResistivity, resolveDopant } from '../../physics';
import { counterDoping, dopant, material, resistivity, resistivityModel, temperature } from '../common';
import { elementwise } from '../types';
import { RESISTIVITY_MODELS } from '../citedModels';

export const DOPING = elementwise({
  name: 'DOPING',
  summary: 'Dopant density that gives a resistivity (the inverse of DRIFT.RESISTIVITY), in cm⁻³.',
  help: `Finds the density of the given dopant for which DRIFT.RESISTIVITY, with the same temperature, model, material and counter-doping, equals the given resistivity. It solves the same forward model with a bracketed root finder, so the two functions are exact inverses (to about 1e-9 relative). A resistivity that no density of this dopant can reach (for example above the intrinsic value, or above what the counter-doping allows) gives an error stating the reachable range.`,
  result: { unit: 'cm⁻³', description: 'Dopant density' },
  parameters: [resistivity, dopant, temperature, resistivityModel, material, counterDoping] as const,
  examples: [
    { formula: '=DRIFT.DOPING(10,"B")', note: 'boron density of a 10 Ω·cm p-type wafer' },
    { formula: '=DRIFT.DOPING(B2:C2,"phosphorus")', note: 'a certificate’s ρ window to a doping window' },
  ],
  models: RESISTIVITY_MODELS,
  compute: (target, dopantCode, temperatureK, model, materialValue, counter) =>
    dopingForResistivity(
      target,
      { material: materialValue, temperature: temperatureK, dopant: resolveDopant(materialValue, dopantCode), counterDensity: counter },
      model,
    ).density,
});
