import { resistivity } from '../../physics';
import { counterDoping, dopant, doping, material, resistivityModel, sampleOf, temperature } from '../common';
import { elementwise } from '../types';
import { RESISTIVITY_MODELS } from '../citedModels';

export const RESISTIVITY = elementwise({
  name: 'RESISTIVITY',
  summary: 'Resistivity ρ = 1/σ of a doped sample, in Ω·cm.',
  help: `Returns ρ = 1/[q(n·μn + p·μp)] for the given dopant density, temperature and mobility model. At 300 K the default reproduces Masetti's published fit; it agrees with the ASTM F723 conversion for boron and phosphorus within about 4 % from 1e13 to 1e17 cm⁻³, and within about 11 % from 1e17 to 1e20 cm⁻³, where the two published relations themselves differ (largest near 1e18 cm⁻³ for boron and 1e20 cm⁻³ for phosphorus). Where a specification is written against F723, use model astm-f723. A doping column against a temperature row spills the whole table: =DRIFT.RESISTIVITY(A2:A40,"B",B1:H1). With model astm-f723 it returns the standard's conversion directly (B and P, room temperature, no counter-doping).

For Ge, GaAs and 4H-SiC (material argument) a blank model means the material's own mobility fit (hilsum, sotoodeh, roschke-schwierz); astm-f723 and silicon's mobility models are refused there. In 4H-SiC the deep acceptors (Al about 0.2 eV) are only partly ionized at 300 K, which the resistivity shows.`,
  result: { unit: 'Ω·cm', description: 'Resistivity ρ' },
  parameters: [doping, dopant, temperature, resistivityModel, material, counterDoping] as const,
  examples: [
    { formula: '=DRIFT.RESISTIVITY(1e15,"B")', note: 'about 13 Ω·cm' },
    { formula: '=DRIFT.RESISTIVITY(1e15,"B",,"astm-f723")', note: 'the ASTM F723 value for comparison' },
    { formula: '=DRIFT.RESISTIVITY(A2:A40,"B",B1:H1)', note: 'doping down, temperature across: a full table' },
    { formula: '=DRIFT.RESISTIVITY(1e18,"Al",,,"4H-SiC")', note: 'Al-doped 4H-SiC: about 1.3 Ω·cm, most of the deep acceptors neutral' },
  ],
  models: RESISTIVITY_MODELS,
  compute: (density, dopantCode, temperatureK, model, materialValue, counter) =>
    resistivity(sampleOf(materialValue, temperatureK, dopantCode, density, counter), model),
});
