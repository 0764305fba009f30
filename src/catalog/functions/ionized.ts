import { ionizedFraction, resolveDopant, solveEquilibrium } from '../../physics';
import { dopant, doping, material, temperature } from '../common';
import { elementwise } from '../types';
import { IONIZATION_MODELS } from '../citedModels';
import { prose } from '../../text/prose';

export const IONIZED = elementwise({
  name: 'IONIZED',
  summary: 'Fraction of the dopant that is ionized in equilibrium, 0 to 1.',
  help: prose`Solves charge neutrality for a sample doped only with the given dopant and returns the ionized
    fraction Nd⁺/Nd (donors) or Na⁻/Na (acceptors). Shallow dopants are almost fully ionized at room
    temperature; they freeze out at low temperature, and deep ones such as In stay partly neutral even at 300
    K. Above the Mott transition (heavy doping) the model makes them fully ionized again.`,
  result: { unit: null, description: 'Ionized fraction, 0–1' },
  parameters: [doping, dopant, temperature, material] as const,
  examples: [
    { formula: '=DRIFT.IONIZED(1e16,"phosphorus",77)', note: 'phosphorus at 77 K' },
    { formula: '=DRIFT.IONIZED(1e16,"In")', note: 'indium is deep: well below 1 at 300 K' },
  ],
  models: IONIZATION_MODELS,
  compute: (density, dopantCode, temperatureK, materialValue) => {
    const species = resolveDopant(materialValue, dopantCode);
    const state = solveEquilibrium(materialValue, temperatureK, [{ dopant: species, density }]);
    return ionizedFraction(materialValue, temperatureK, species, density, state.fermiLevel);
  },
});
