import { counterDoping, dopant, doping, material, sampleCarrierDensity, sampleOf, temperature } from '../common';
import { elementwise } from '../types';
import { EQUILIBRIUM_MODELS } from '../citedModels';
import { prose } from '../../text/prose';

export const MAJORITY = elementwise({
  name: 'MAJORITY',
  summary: 'Density of the carriers the dopant supplies (electrons for donors, holes for acceptors), in cm⁻³.',
  help: prose`Solves charge neutrality with incomplete ionization for a sample doped with the given dopant
    (and, optionally, counter-doped with the opposite type) and returns the density of the carrier type that
    dopant supplies: electrons for donors (in silicon P, As, Sb and n), holes for acceptors (B, Al, Ga, In and
    p); the material's dopant table decides which codes are donors (in GaAs, Si is a donor and C an acceptor).
    If counter_doping exceeds doping the sample changes type and this carrier is then the minority one.`,
  result: { unit: 'cm⁻³', description: 'Majority-carrier density' },
  parameters: [doping, dopant, temperature, material, counterDoping] as const,
  examples: [
    { formula: '=DRIFT.MAJORITY(1e17,"phosphorus")', note: 'electrons in 1e17 cm⁻³ phosphorus-doped Si at 300 K' },
    { formula: '=DRIFT.MAJORITY(1e17,"B",77)', note: 'holes at 77 K: freeze-out lowers them' },
    { formula: '=DRIFT.MAJORITY(1e16,"phosphorus",300,,4e15)', note: 'compensated: about 6e15 cm⁻³' },
  ],
  models: EQUILIBRIUM_MODELS,
  compute: (density, dopantCode, temperatureK, materialValue, counter) =>
    sampleCarrierDensity(sampleOf(materialValue, temperatureK, dopantCode, density, counter), 'majority'),
});
