/**
 * Dopants in silicon: isolated ionization energies, degeneracy, which mobility
 * fit applies, and the parameters of the incomplete-ionization model.
 *
 * Sources
 * - Isolated ionization energies: S. M. Sze and K. K. Ng, Physics of
 *   Semiconductor Devices, 3rd ed., Wiley 2007, ch. 1, Fig. 12 (measured
 *   ionization energies of impurities in Si). All values from memory.
 * - Incomplete ionization, P: P. P. Altermatt, A. Schenk, G. Heiser,
 *   J. Appl. Phys. 100, 113714 (2006) (part I, Si:P).
 *   As and B: P. P. Altermatt, A. Schenk, B. Schmithüsen, G. Heiser,
 *   J. Appl. Phys. 100, 113715 (2006) (part II, Si:As and Si:B, simplified
 *   model for device simulation). Parameter values and the exact author lists
 *   are from memory, not read from the papers.
 * - Degeneracy g = 2 for donors, 4 for acceptors: common practice, no source
 *   (the values Altermatt et al. use with their model, from memory).
 *
 * Dopants the papers did not fit (Sb, Al, Ga, In) are documented assumptions:
 * they use their own isolated ionization energy (Sze & Ng) as ΔE0 with the
 * density dependence (Nref, c, Nb, d) of the fitted species of the same kind
 * (P for Sb, B for Al, Ga, In). This keeps them fully ionised at high density
 * (Mott transition) and lets them freeze out at low temperature, but the
 * densities where that happens are not fitted for these elements.
 */

import type { Dopant, IonizationParameters } from './types';

const SZE_NG_2007 = 'S. M. Sze, K. K. Ng, Physics of Semiconductor Devices, 3rd ed., Wiley 2007, ch. 1, Fig. 12 (from memory)';

const ALTERMATT_VALIDITY =
  'fitted to Hall and resistivity data on single-species samples, about 1e14–1e20 cm⁻³, ' +
  'low temperature to 300 K (from memory); evaluated here at any density and temperature';

/** Si:P, Altermatt et al. part I (values from memory). */
const PHOSPHORUS_IONIZATION: IonizationParameters = {
  isolatedEnergy: 0.0455,
  referenceDensity: 2.2e18,
  screeningExponent: 2,
  localizationDensity: 6.0e18,
  localizationExponent: 2.3,
  citation: 'P. P. Altermatt, A. Schenk, G. Heiser, J. Appl. Phys. 100, 113714 (2006), Si:P (parameter values from memory)',
  validity: ALTERMATT_VALIDITY,
};

/** Si:As, Altermatt et al. part II (values from memory). */
const ARSENIC_IONIZATION: IonizationParameters = {
  isolatedEnergy: 0.0537,
  referenceDensity: 3.0e18,
  screeningExponent: 2,
  localizationDensity: 8.5e18,
  localizationExponent: 2.3,
  citation:
    'P. P. Altermatt, A. Schenk, B. Schmithüsen, G. Heiser, J. Appl. Phys. 100, 113715 (2006), Si:As (parameter values from memory)',
  validity: ALTERMATT_VALIDITY,
};

/** Si:B, Altermatt et al. part II (values from memory). */
const BORON_IONIZATION: IonizationParameters = {
  isolatedEnergy: 0.04439,
  referenceDensity: 1.7e18,
  screeningExponent: 1.4,
  localizationDensity: 6.0e18,
  localizationExponent: 2.4,
  citation: 'P. P. Altermatt, A. Schenk, B. Schmithüsen, G. Heiser, J. Appl. Phys. 100, 113715 (2006), Si:B (parameter values from memory)',
  validity: ALTERMATT_VALIDITY,
};

/** An unfitted species: own ΔE0, density dependence borrowed from a fitted one. */
function borrowedIonization(isolatedEnergy: number, shape: IonizationParameters, shapeSpecies: string): IonizationParameters {
  return {
    ...shape,
    isolatedEnergy,
    citation:
      `assumption: ΔE0 from Sze & Ng 2007 (from memory); density dependence Nref, c, Nb, d borrowed from ` +
      `Altermatt et al. 2006 for ${shapeSpecies}`,
    validity: `not fitted for this species; ${shapeSpecies} parameters used as the closest fitted dopant of the same kind`,
  };
}

const DONOR_DEGENERACY = 2;
const ACCEPTOR_DEGENERACY = 4;

const OWN_FIT = 'Masetti et al. (1983) fitted this species';
const AS_PROXY_FOR_SB =
  'Masetti et al. (1983) fitted only As and P donors; Sb, like As, is a heavy group-V donor used for ' +
  'the same heavily doped layers, so the As fit is taken (assumption)';
const B_PROXY = 'Masetti et al. (1983) fitted only B among acceptors; its fit is used for every acceptor (assumption)';

/** Dopants in the order users see them: acceptors, donors, then the generic donor and acceptor. */
export const SILICON_DOPANTS: readonly Dopant[] = [
  {
    symbol: 'B',
    name: 'boron',
    kind: 'acceptor',
    ionizationEnergy: 0.045,
    ionizationEnergyCitation: SZE_NG_2007,
    degeneracy: ACCEPTOR_DEGENERACY,
    mobilitySpecies: 'B',
    mobilitySpeciesNote: OWN_FIT,
    ionization: BORON_IONIZATION,
  },
  {
    symbol: 'Al',
    name: 'aluminium',
    kind: 'acceptor',
    ionizationEnergy: 0.067,
    ionizationEnergyCitation: SZE_NG_2007,
    degeneracy: ACCEPTOR_DEGENERACY,
    mobilitySpecies: 'B',
    mobilitySpeciesNote: B_PROXY,
    ionization: borrowedIonization(0.067, BORON_IONIZATION, 'B'),
  },
  {
    symbol: 'Ga',
    name: 'gallium',
    kind: 'acceptor',
    ionizationEnergy: 0.072,
    ionizationEnergyCitation: SZE_NG_2007,
    degeneracy: ACCEPTOR_DEGENERACY,
    mobilitySpecies: 'B',
    mobilitySpeciesNote: B_PROXY,
    ionization: borrowedIonization(0.072, BORON_IONIZATION, 'B'),
  },
  {
    symbol: 'In',
    name: 'indium',
    kind: 'acceptor',
    ionizationEnergy: 0.16,
    ionizationEnergyCitation: SZE_NG_2007,
    degeneracy: ACCEPTOR_DEGENERACY,
    mobilitySpecies: 'B',
    mobilitySpeciesNote: B_PROXY,
    ionization: borrowedIonization(0.16, BORON_IONIZATION, 'B'),
  },
  {
    symbol: 'P',
    name: 'phosphorus',
    kind: 'donor',
    ionizationEnergy: 0.045,
    ionizationEnergyCitation: SZE_NG_2007,
    degeneracy: DONOR_DEGENERACY,
    mobilitySpecies: 'P',
    mobilitySpeciesNote: OWN_FIT,
    ionization: PHOSPHORUS_IONIZATION,
  },
  {
    symbol: 'As',
    name: 'arsenic',
    kind: 'donor',
    ionizationEnergy: 0.054,
    ionizationEnergyCitation: SZE_NG_2007,
    degeneracy: DONOR_DEGENERACY,
    mobilitySpecies: 'As',
    mobilitySpeciesNote: OWN_FIT,
    ionization: ARSENIC_IONIZATION,
  },
  {
    symbol: 'Sb',
    name: 'antimony',
    kind: 'donor',
    ionizationEnergy: 0.039,
    ionizationEnergyCitation: SZE_NG_2007,
    degeneracy: DONOR_DEGENERACY,
    mobilitySpecies: 'As',
    mobilitySpeciesNote: AS_PROXY_FOR_SB,
    ionization: borrowedIonization(0.039, PHOSPHORUS_IONIZATION, 'P'),
  },
  {
    symbol: 'donor',
    name: 'generic donor',
    kind: 'donor',
    ionizationEnergy: 0.045,
    ionizationEnergyCitation: `taken as phosphorus, the most common donor (assumption); ${SZE_NG_2007}`,
    degeneracy: DONOR_DEGENERACY,
    mobilitySpecies: 'P',
    mobilitySpeciesNote: 'generic donor treated as phosphorus, the most common donor (assumption)',
    ionization: PHOSPHORUS_IONIZATION,
  },
  {
    symbol: 'acceptor',
    name: 'generic acceptor',
    kind: 'acceptor',
    ionizationEnergy: 0.045,
    ionizationEnergyCitation: `taken as boron, the most common acceptor (assumption); ${SZE_NG_2007}`,
    degeneracy: ACCEPTOR_DEGENERACY,
    mobilitySpecies: 'B',
    mobilitySpeciesNote: 'generic acceptor treated as boron, the most common acceptor (assumption)',
    ionization: BORON_IONIZATION,
  },
];
