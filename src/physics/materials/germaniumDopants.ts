/**
 * Dopants in germanium: isolated ionization energies, degeneracy and the
 * incomplete-ionization parameters.
 *
 * Sources
 * - Isolated ionization energies: S. M. Sze and K. K. Ng, Physics of
 *   Semiconductor Devices, 3rd ed., Wiley 2007, ch. 1, figure of measured
 *   ionization energies of impurities in Ge (values from memory): the
 *   shallow group-V donors and group-III acceptors all lie 10–13 meV from
 *   their band.
 * - Density dependence (Mott transition): no published fit of the Altermatt
 *   form exists for Ge; the parameters are scaled from Si with the hydrogenic
 *   Mott density (assumption, see ionizationScaling.ts). For Ge:P this puts the
 *   transition near 3e17 cm⁻³, of the order of the Mott densities reported for
 *   Ge:As and Ge:Sb (1e17–4e17 cm⁻³, from memory).
 * - Degeneracy g = 2 for donors, 4 for acceptors: common practice, no source.
 */

import { GERMANIUM_HILSUM_FIT } from '../mobility/germaniumHilsum';
import { mottScaledDopant, type MottScaledHost } from './ionizationScaling';
import type { Dopant, DopantKind } from './types';

/** Static relative permittivity of Ge (Sze & Ng 2007, Appendix; from memory). */
export const GERMANIUM_RELATIVE_PERMITTIVITY = 16.0;

const SZE_NG_2007_GE =
  'S. M. Sze, K. K. Ng, Physics of Semiconductor Devices, 3rd ed., Wiley 2007, ch. 1, ionization energies in Ge (from memory)';

const SPECIES_NOTE = `the germanium mobility fit (${GERMANIUM_HILSUM_FIT.code}) does not depend on the dopant species`;

const HOST: MottScaledHost = { relativePermittivity: GERMANIUM_RELATIVE_PERMITTIVITY, mobilitySpeciesNote: SPECIES_NOTE };

/** One dopant of this host from its symbol, name, kind and ΔE0 (eV). */
function germaniumDopant(symbol: string, name: string, kind: DopantKind, energy: number, energySource = SZE_NG_2007_GE): Dopant {
  return mottScaledDopant(HOST, symbol, name, kind, energy, energySource);
}

/** Isolated ionization energies in Ge, eV (Sze & Ng 2007, from memory). */
const ENERGY = { B: 0.0104, Ga: 0.0108, In: 0.0112, P: 0.012, As: 0.0127, Sb: 0.0096 } as const;

/** Dopants in the order users see them: acceptors, donors, then the generic donor and acceptor. */
export const GERMANIUM_DOPANTS: readonly Dopant[] = [
  germaniumDopant('B', 'boron', 'acceptor', ENERGY.B),
  germaniumDopant('Ga', 'gallium', 'acceptor', ENERGY.Ga),
  germaniumDopant('In', 'indium', 'acceptor', ENERGY.In),
  germaniumDopant('P', 'phosphorus', 'donor', ENERGY.P),
  germaniumDopant('As', 'arsenic', 'donor', ENERGY.As),
  germaniumDopant('Sb', 'antimony', 'donor', ENERGY.Sb),
  germaniumDopant('donor', 'generic donor', 'donor', ENERGY.P, `taken as phosphorus (assumption); ${SZE_NG_2007_GE}`),
  germaniumDopant('acceptor', 'generic acceptor', 'acceptor', ENERGY.B, `taken as boron (assumption); ${SZE_NG_2007_GE}`),
];
