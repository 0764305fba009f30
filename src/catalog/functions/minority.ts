import { counterDoping, dopant, doping, material, sampleCarrierDensity, sampleOf, temperature } from '../common';
import { elementwise } from '../types';
import { EQUILIBRIUM_MODELS } from '../citedModels';
import { prose } from '../../text/prose';

export const MINORITY = elementwise({
  name: 'MINORITY',
  summary: 'Density of the carriers opposite to the dopant’s type, in cm⁻³.',
  help: prose`Solves charge neutrality with incomplete ionization and returns the density of the carrier type
    opposite to the one the dopant supplies (holes for donors, electrons for acceptors). Carriers follow
    Fermi–Dirac statistics, so in equilibrium the result equals ni² divided by the majority density while the
    majority carriers are non-degenerate, and falls below that when they are degenerate (above about 1e19 cm⁻³
    at 300 K). DRIFT.MINORITY does not include bandgap narrowing: in heavily doped material the minority
    density is about DRIFT.NIEFF² divided by the majority density.`,
  result: { unit: 'cm⁻³', description: 'Minority-carrier density' },
  parameters: [doping, dopant, temperature, material, counterDoping] as const,
  examples: [
    { formula: '=DRIFT.MINORITY(1e15,"B")', note: 'electrons in 1e15 cm⁻³ boron-doped Si, about 9e4 cm⁻³' },
    { formula: '=DRIFT.MINORITY(1e15,"B",{300,400,500})', note: 'the rise with temperature along a row' },
  ],
  models: EQUILIBRIUM_MODELS,
  compute: (density, dopantCode, temperatureK, materialValue, counter) =>
    sampleCarrierDensity(sampleOf(materialValue, temperatureK, dopantCode, density, counter), 'minority'),
});
