import { acceptors, donors, genericEquilibrium, material, temperature } from '../common';
import { elementwise } from '../types';
import { EQUILIBRIUM_MODELS } from '../citedModels';
import { prose } from '../../text/prose';

export const HOLES = elementwise({
  name: 'HOLES',
  summary: 'Equilibrium hole density p from donor and acceptor densities, in cm⁻³.',
  help: prose`Solves charge neutrality p + Nd⁺ = n + Na⁻ for the Fermi level, with incomplete ionization of
    both dopant types, and returns the hole density p. Donors and acceptors are treated as the material's
    generic n- and p-type dopants (ionization energies of P and B in Si and Ge, Si and Zn in GaAs, N and Al in
    4H-SiC).`,
  result: { unit: 'cm⁻³', description: 'Hole density p' },
  parameters: [donors, acceptors, temperature, material] as const,
  examples: [
    { formula: '=DRIFT.HOLES(0,5e15)', note: 'p-type 5e15 cm⁻³ at 300 K' },
    { formula: '=DRIFT.HOLES(1e16,0)', note: 'minority holes in n-type 1e16 cm⁻³: ni²/n' },
  ],
  models: EQUILIBRIUM_MODELS,
  compute: (donorDensity, acceptorDensity, temperatureK, materialValue) =>
    genericEquilibrium(materialValue, temperatureK, donorDensity, acceptorDensity).holes,
});
