import { conductivity } from '../../physics';
import { counterDoping, dopant, doping, material, resistivityModel, sampleOf, temperature } from '../common';
import { elementwise } from '../types';
import { RESISTIVITY_MODELS } from '../citedModels';
import { prose } from '../../text/prose';

export const CONDUCTIVITY = elementwise({
  name: 'CONDUCTIVITY',
  summary: 'Conductivity σ = q(nμn + pμp) of a doped sample, in S/cm.',
  help: prose`Returns σ = q(n·μn + p·μp), with n and p from charge neutrality with incomplete ionization and μ
    from the selected mobility model (see DRIFT.MOBILITY for how the two are combined without
    double-counting). In silicon the default model, f723-anchored, is 1/ρ of DRIFT.RESISTIVITY's default: the
    physics scaled by a density-only factor so that at 296.15 K in uncompensated B or P silicon it equals ASTM
    F723 (see DRIFT.RESISTIVITY). Model masetti gives the physics alone; astm-f723 gives 1/ρ from the
    standard's conversion (B, P, As; room temperature, no counter-doping).`,
  result: { unit: 'S/cm', description: 'Conductivity σ' },
  parameters: [doping, dopant, temperature, resistivityModel, material, counterDoping] as const,
  examples: [
    { formula: '=DRIFT.CONDUCTIVITY(1e16,"phosphorus")', note: 'about 1.9 S/cm' },
    { formula: '=DRIFT.CONDUCTIVITY(1e16,"phosphorus",{250,300,350})', note: 'across a row of temperatures' },
  ],
  models: RESISTIVITY_MODELS,
  compute: (density, dopantCode, temperatureK, model, materialValue, counter) =>
    conductivity(sampleOf(materialValue, temperatureK, dopantCode, density, counter), model),
});
