import { acceptors, donors, genericEquilibrium, material, temperature } from '../common';
import { elementwise } from '../types';
import { EQUILIBRIUM_MODELS } from '../citedModels';
import { prose } from '../../text/prose';

export const ELECTRONS = elementwise({
  name: 'ELECTRONS',
  summary: 'Equilibrium electron density n from donor and acceptor densities, in cm⁻³.',
  help: prose`Solves charge neutrality p + Nd⁺ = n + Na⁻ for the Fermi level, with incomplete ionization of
    both dopant types, and returns the electron density n. Donors and acceptors are treated as the material's
    generic n- and p-type dopants (ionization energies of P and B in Si and Ge, Si and Zn in GaAs, N and Al in
    4H-SiC). Freeze-out at low temperature and intrinsic conduction at high temperature come out of the same
    equations.`,
  result: { unit: 'cm⁻³', description: 'Electron density n' },
  parameters: [donors, acceptors, temperature, material] as const,
  examples: [
    { formula: '=DRIFT.ELECTRONS(1e16,0)', note: 'n-type 1e16 cm⁻³ at 300 K: nearly all donors ionized' },
    { formula: '=DRIFT.ELECTRONS(1e16,0,77)', note: 'the same at 77 K: partly frozen out' },
  ],
  models: EQUILIBRIUM_MODELS,
  compute: (donorDensity, acceptorDensity, temperatureK, materialValue) =>
    genericEquilibrium(materialValue, temperatureK, donorDensity, acceptorDensity).electrons,
});
