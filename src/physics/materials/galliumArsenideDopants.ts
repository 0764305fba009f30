/**
 * Dopants in gallium arsenide: isolated ionization energies, degeneracy and
 * the incomplete-ionization parameters.
 *
 * Sources
 * - Isolated ionization energies: S. M. Sze and K. K. Ng, Physics of
 *   Semiconductor Devices, 3rd ed., Wiley 2007, ch. 1, figure of measured
 *   ionization energies of impurities in GaAs (values from memory). The
 *   donors are hydrogenic, about 6 meV below Ec; the figure rounds them, and
 *   5.8 meV is kept for Si as it gives it (from memory).
 * - Density dependence (Mott transition): scaled from Si with the hydrogenic
 *   Mott density (assumption, see ionizationScaling.ts). For the donors this
 *   gives about 2e16 cm⁻³, in line with the Mott density commonly quoted for
 *   n-type GaAs (about 1e16–2e16 cm⁻³, from memory): above it they are all
 *   ionized at any temperature.
 * - Degeneracy g = 2 for donors, 4 for acceptors: common practice, no source.
 *
 * Site assumptions: Si is amphoteric in GaAs. It is listed as a donor (Si on
 * Ga sites), as in melt-grown and most epitaxial n-type GaAs; Si on As sites
 * (an acceptor about 35 meV above Ev, from memory) is not offered. C is an
 * acceptor (C on As sites), as in carbon-doped epitaxial layers.
 */

import { GALLIUM_ARSENIDE_SOTOODEH_FIT } from '../mobility/galliumArsenideSotoodeh';
import { mottScaledDopant, type MottScaledHost } from './ionizationScaling';
import type { Dopant, DopantKind } from './types';

/** Static relative permittivity of GaAs (Sze & Ng 2007, Appendix; from memory). */
export const GALLIUM_ARSENIDE_RELATIVE_PERMITTIVITY = 12.9;

const SZE_NG_2007_GAAS =
  'S. M. Sze, K. K. Ng, Physics of Semiconductor Devices, 3rd ed., Wiley 2007, ch. 1, ionization energies in GaAs (from memory)';

const SPECIES_NOTE = `the GaAs mobility fit (${GALLIUM_ARSENIDE_SOTOODEH_FIT.code}) does not depend on the dopant species`;

const HOST: MottScaledHost = { relativePermittivity: GALLIUM_ARSENIDE_RELATIVE_PERMITTIVITY, mobilitySpeciesNote: SPECIES_NOTE };

/** One dopant of this host from its symbol, name, kind and ΔE0 (eV). */
function galliumArsenideDopant(symbol: string, name: string, kind: DopantKind, energy: number, energySource = SZE_NG_2007_GAAS): Dopant {
  return mottScaledDopant(HOST, symbol, name, kind, energy, energySource);
}

/** Isolated ionization energies in GaAs, eV (Sze & Ng 2007, from memory). */
const ENERGY = {
  Si: 0.0058,
  Te: 0.006,
  Se: 0.006,
  Sn: 0.006,
  Zn: 0.031,
  Be: 0.028,
  C: 0.026,
  Mg: 0.028,
} as const;

/**
 * Dopants in the order users see them: acceptors, donors, then the generic donor and acceptor.
 * The generic donor is taken as Si, the usual n-type dopant; the acceptor as Zn, the usual
 * p-type dopant of melt-grown GaAs (assumptions).
 */
export const GALLIUM_ARSENIDE_DOPANTS: readonly Dopant[] = [
  galliumArsenideDopant('Zn', 'zinc', 'acceptor', ENERGY.Zn),
  galliumArsenideDopant('Be', 'beryllium', 'acceptor', ENERGY.Be),
  galliumArsenideDopant('C', 'carbon', 'acceptor', ENERGY.C),
  galliumArsenideDopant('Mg', 'magnesium', 'acceptor', ENERGY.Mg),
  galliumArsenideDopant('Si', 'silicon', 'donor', ENERGY.Si),
  galliumArsenideDopant('Te', 'tellurium', 'donor', ENERGY.Te),
  galliumArsenideDopant('Se', 'selenium', 'donor', ENERGY.Se),
  galliumArsenideDopant('Sn', 'tin', 'donor', ENERGY.Sn),
  galliumArsenideDopant('donor', 'generic donor', 'donor', ENERGY.Si, `taken as silicon (assumption); ${SZE_NG_2007_GAAS}`),
  galliumArsenideDopant('acceptor', 'generic acceptor', 'acceptor', ENERGY.Zn, `taken as zinc (assumption); ${SZE_NG_2007_GAAS}`),
];
