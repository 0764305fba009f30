import { acceptors, donors, genericEquilibrium, material, temperature } from '../common';
import { elementwise } from '../types';
import { EQUILIBRIUM_MODELS } from '../citedModels';
import { prose } from '../../text/prose';

export const FERMILEVEL = elementwise({
  name: 'FERMILEVEL',
  summary: 'Equilibrium Fermi level relative to the intrinsic level, Ef − Ei, in eV.',
  help: prose`Solves charge neutrality with incomplete ionization and returns the Fermi level measured from
    the intrinsic level Ei: positive in n-type material, negative in p-type, zero when intrinsic. With
    Boltzmann statistics Ef − Ei = kT·ln(n/ni).`,
  result: { unit: 'eV', description: 'Ef − Ei' },
  parameters: [donors, acceptors, temperature, material] as const,
  examples: [
    { formula: '=DRIFT.FERMILEVEL(1e16,0)', note: 'n-type 1e16 cm⁻³ at 300 K, about +0.35 eV' },
    { formula: '=DRIFT.FERMILEVEL(0,1e16,B1:H1)', note: 'p-type across a row of temperatures' },
  ],
  models: EQUILIBRIUM_MODELS,
  compute: (donorDensity, acceptorDensity, temperatureK, materialValue) =>
    genericEquilibrium(materialValue, temperatureK, donorDensity, acceptorDensity).fermiLevel,
});
