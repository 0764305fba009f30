/**
 * Dopants in 4H silicon carbide: ionization energies, degeneracy and the
 * incomplete-ionization parameters.
 *
 * Sources (all from memory)
 * - Yu. Goldberg, M. E. Levinshtein, S. L. Rumyantsev, "Silicon carbide (SiC)",
 *   in M. E. Levinshtein, S. L. Rumyantsev, M. S. Shur (eds.), Properties of
 *   Advanced Semiconductor Materials, Wiley 2001 (cited below as Levinshtein
 *   et al. 2001).
 * - Nitrogen: W. Götz et al., J. Appl. Phys. 73, 3332 (1993).
 * - Phosphorus: M. A. Capano et al., J. Appl. Phys. 87, 8773 (2000).
 *
 * Effective single levels (decision). 4H-SiC has one hexagonal (h) and one
 * cubic (k) lattice site in equal numbers, and donors on them have different
 * levels: N about 0.05–0.06 eV (h) and 0.09–0.125 eV (k), P about 0.05 (h)
 * and 0.09 eV (k), depending on the method. Our solver takes one level per
 * species, so N and P get one effective level near the middle of the two
 * (N 0.08 eV, P 0.07 eV). With equal site populations this reproduces the
 * ionized fraction at 300 K of two levels (N: 0.055 and 0.105 eV; P: 0.052 and
 * 0.092 eV) within 5 % up to 1e17 and 7 % at 1e18 cm⁻³ (our check of the two-level
 * neutrality equation, repeated in the tests; not a published fit);
 * at low temperature the shallow h-site controls freeze-out and a single level
 * freezes out somewhat too early. Al (about 0.19–0.23 eV) and B (the shallow
 * boron level, about 0.28–0.35 eV; the deeper D centre is ignored) are deep
 * acceptors that stay largely un-ionized at 300 K.
 *
 * Density dependence (Mott transition): scaled from Si with the hydrogenic Mott
 * density (assumption, see ionizationScaling.ts). For the deep acceptors the
 * hydrogenic orbit (about 3.7 Å for Al) is no larger than the lattice
 * constant, so their transition density (about 3e20 cm⁻³ for Al, 1e21 cm⁻³
 * for B) is only an order of magnitude.
 * Degeneracy g = 2 for donors, 4 for acceptors: common practice, no source.
 */

import { SILICON_CARBIDE_4H_ROSCHKE_SCHWIERZ_FIT } from '../mobility/siliconCarbide4HRoschkeSchwierz';
import { mottScaledDopant, type MottScaledHost } from './ionizationScaling';
import type { Dopant, DopantKind } from './types';

/**
 * Static relative permittivity of 4H-SiC: 9.7 perpendicular to the c axis
 * (about 10.0 parallel to it; Levinshtein et al. 2001, from memory). The
 * perpendicular value is used, as for wafers cut normal to c.
 */
export const SILICON_CARBIDE_4H_RELATIVE_PERMITTIVITY = 9.7;

/** The SiC chapter of Levinshtein et al. (2001), cited by the 4H-SiC dopant, band-gap and density-of-states tables. */
export const LEVINSHTEIN_2001 =
  'Yu. Goldberg, M. E. Levinshtein, S. L. Rumyantsev, "Silicon carbide (SiC)", in M. E. Levinshtein, ' +
  'S. L. Rumyantsev, M. S. Shur (eds.), Properties of Advanced Semiconductor Materials, Wiley 2001';

/** As cited for ionization energies. */
const LEVINSHTEIN_2001_LEVELS = `${LEVINSHTEIN_2001} (from memory)`;

/**
 * Ionization-energy citations. The site levels and ranges in them are quotes
 * of the sources, not values the core computes with; the level it uses is the
 * dopant table's (the registry notes print it from there).
 */
const SOURCES = {
  N:
    `effective level between the h-site (≈0.05–0.06 eV) and k-site (≈0.09–0.125 eV) donor levels (decision); ` +
    `W. Götz et al., J. Appl. Phys. 73, 3332 (1993); ${LEVINSHTEIN_2001_LEVELS}`,
  P:
    `effective level between the h-site (≈0.05 eV) and k-site (≈0.09 eV) donor levels (decision); ` +
    `M. A. Capano et al., J. Appl. Phys. 87, 8773 (2000) (from memory)`,
  Al: `Al acceptor ≈0.19–0.23 eV; ${LEVINSHTEIN_2001_LEVELS}`,
  B: `shallow boron acceptor ≈0.28–0.35 eV (deep D centre ignored); ${LEVINSHTEIN_2001_LEVELS}`,
} as const;

const SPECIES_NOTE = `the 4H-SiC mobility fit (${SILICON_CARBIDE_4H_ROSCHKE_SCHWIERZ_FIT.code}) does not depend on the dopant species`;

const HOST: MottScaledHost = { relativePermittivity: SILICON_CARBIDE_4H_RELATIVE_PERMITTIVITY, mobilitySpeciesNote: SPECIES_NOTE };

/** One dopant of this host from its symbol, name, kind and ΔE0 (eV). */
function siliconCarbideDopant(symbol: string, name: string, kind: DopantKind, energy: number, energySource: string): Dopant {
  return mottScaledDopant(HOST, symbol, name, kind, energy, energySource);
}

/** Ionization energies in 4H-SiC, eV (see the module note). */
const ENERGY = { N: 0.08, P: 0.07, Al: 0.2, B: 0.3 } as const;

/**
 * Dopants in the order users see them: acceptors, donors, then the generic donor and acceptor
 * (the donor as nitrogen, the acceptor as aluminium: the usual dopants,
 * assumption). A lone 'N' or 'P' typed in a cell is refused as ambiguous
 * (element or conductivity type, see dopants.ts); 'nitrogen' and
 * 'phosphorus' say which.
 */
export const SILICON_CARBIDE_4H_DOPANTS: readonly Dopant[] = [
  siliconCarbideDopant('Al', 'aluminium', 'acceptor', ENERGY.Al, SOURCES.Al),
  siliconCarbideDopant('B', 'boron', 'acceptor', ENERGY.B, SOURCES.B),
  siliconCarbideDopant('N', 'nitrogen', 'donor', ENERGY.N, SOURCES.N),
  siliconCarbideDopant('P', 'phosphorus', 'donor', ENERGY.P, SOURCES.P),
  siliconCarbideDopant('donor', 'generic donor', 'donor', ENERGY.N, `taken as nitrogen (assumption); ${SOURCES.N}`),
  siliconCarbideDopant('acceptor', 'generic acceptor', 'acceptor', ENERGY.Al, `taken as aluminium (assumption); ${SOURCES.Al}`),
];
