import { dopingForResistivity, resolveDopant } from '../../physics';
import { counterDoping, dopant, material, resistivity, resistivityModel, temperature } from '../common';
import { elementwise } from '../types';
import { RESISTIVITY_MODELS } from '../citedModels';

export const DOPING = elementwise({
  name: 'DOPING',
  summary: 'Dopant density that gives a resistivity (the inverse of DRIFT.RESISTIVITY), in cm⁻³.',
  help: `Finds the density of the given dopant for which the resistivity model, with the same temperature, model, material and counter-doping, gives the resistivity, with a bracketed root finder. For every model but silicon's default the two functions are exact inverses of DRIFT.RESISTIVITY (to about 1e-9 relative). The default, f723-anchored, follows the standard in each direction: ASTM F723 gives one equation for ρ from N and another for N from ρ, and this function is anchored to the second, so at 296.15 K (23 °C) without counter-doping it returns F723's own N-from-ρ value for B and P (what incoming inspection converts a certificate with). Then DRIFT.RESISTIVITY of the result differs from the resistivity by the standard's own inconsistency between its two equations (up to about 3 % for B and 4.5 % for P, as F723 states). Model masetti gives the exact inverse of the physics alone. A resistivity that no density of this dopant can reach (for example above the intrinsic value, or above what the counter-doping allows) gives an error stating the reachable range.`,
  result: { unit: 'cm⁻³', description: 'Dopant density' },
  parameters: [resistivity, dopant, temperature, resistivityModel, material, counterDoping] as const,
  examples: [
    { formula: '=DRIFT.DOPING(10,"B")', note: 'boron density of a 10 Ω·cm p-type wafer' },
    { formula: '=DRIFT.DOPING(B2:C2,"phosphorus")', note: 'a certificate’s ρ window to a doping window' },
    { formula: '=DRIFT.DOPING(10,"B",296.15)', note: 'at 23 °C: the ASTM F723 value' },
  ],
  models: RESISTIVITY_MODELS,
  compute: (target, dopantCode, temperatureK, model, materialValue, counter) =>
    dopingForResistivity(
      target,
      { material: materialValue, temperature: temperatureK, dopant: resolveDopant(materialValue, dopantCode), counterDensity: counter },
      model,
    ).density,
});
