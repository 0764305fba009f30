/**
 * Incomplete-ionization parameters for dopants in hosts other than silicon,
 * where no fit of the Altermatt et al. (2006) model exists. The model's form
 * (ionization.ts) is kept; its two densities are moved to the new host by
 * hydrogenic scaling with the Mott density.
 *
 * Published basis
 * - Mott criterion for the insulator–metal transition of a doped
 *   semiconductor, N_M^(1/3)·a_B ≈ 0.26 (N. F. Mott, Rev. Mod. Phys. 40, 677
 *   (1968); the constant 0.26 ± 0.05 across many hosts: P. P. Edwards,
 *   M. J. Sienko, Phys. Rev. B 17, 2575 (1978); both from memory).
 * - Hydrogenic (effective-mass) impurity: binding energy ΔE0 = Ry·(m* / m0)/εr²
 *   and orbit a_B = a0·εr·(m0/m*), Ry = 13.606 eV, a0 = 0.5292 Å (common
 *   practice, no source). Eliminating m* between the two gives
 *   a_B = a0·Ry/(εr·ΔE0). We use this form with the dopant's *measured* ΔE0,
 *   so that a level deepened by its central cell gets the smaller orbit it
 *   has; for a level that is hydrogenic (GaAs donors, about 5.8 meV against
 *   the 5.5 meV of m* = 0.067, εr = 12.9) both forms agree within 10 %.
 * - The density dependence of the level itself: Pearson & Bardeen,
 *   Phys. Rev. 75, 865 (1949), observed ΔE(N) = ΔE0 − α·N^(1/3) in Si, a
 *   lowering that reaches zero near the Mott density (from memory). The
 *   Altermatt form ΔE0/(1 + (N/Nref)^c) describes the same lowering but stays
 *   positive and smooth, without the kink a linear law has where it hits zero.
 *
 * Assumption (not from a source): Altermatt's silicon densities Nref and Nb
 * scale with the host's Mott density, and the exponents c, d carry over
 * unchanged. The template is Si:P for donors and Si:B for acceptors:
 *
 *   Nref = Nref(Si) · N_M / N_M(Si),  Nb = Nb(Si) · N_M / N_M(Si),
 *   N_M / N_M(Si) = (εr·ΔE0 / (εr,Si·ΔE0,Si))³.
 *
 * The ratio does not depend on the constant 0.26, and the hydrogenic estimate's
 * own error (it gives N_M ≈ 7e18 cm⁻³ for Si:P, where about 3.7e18 cm⁻³ is
 * measured; from memory) cancels as far as it is alike in both hosts. The
 * result keeps what the physics demands: freeze-out at low temperature (ΔE0
 * is the measured isolated level), a level that approaches the band as N
 * grows, and full ionization above the Mott density (b → 0), continuous in N
 * and T because every term is smooth. The densities where the transition
 * happens are estimates within about a factor of 2, not fits.
 */

import { SILICON } from './silicon';
import type { Dopant, DopantKind, IonizationParameters } from './types';

/** Constants of the hydrogenic estimate, with their sources. */
export const HYDROGENIC_CONSTANTS = {
  /** Rydberg energy Ry, eV (common practice, no source). */
  rydbergEnergy: 13.606,
  /** Bohr radius a0, cm (0.5292 Å; common practice, no source). */
  bohrRadius: 0.5292e-8,
  /** Mott constant N_M^(1/3)·a_B (Edwards & Sienko, Phys. Rev. B 17, 2575 (1978), from memory). */
  mottConstant: 0.26,
} as const;

/**
 * Effective Bohr radius of a dopant from its binding energy,
 * a_B = a0·Ry/(εr·ΔE0) (hydrogenic model, see the module note).
 *
 * @param isolatedEnergy ΔE0, eV (> 0)
 * @param relativePermittivity εr of the host
 * @returns a_B in cm
 * @example effectiveBohrRadius(0.0058, 12.9) // ≈ 9.6e-7 cm (96 Å, a GaAs donor)
 */
export function effectiveBohrRadius(isolatedEnergy: number, relativePermittivity: number): number {
  const { rydbergEnergy, bohrRadius } = HYDROGENIC_CONSTANTS;
  return (bohrRadius * rydbergEnergy) / (relativePermittivity * isolatedEnergy);
}

/**
 * Mott density N_M = (0.26/a_B)³ of a dopant (Mott criterion, see the module note).
 *
 * @param isolatedEnergy ΔE0, eV (> 0)
 * @param relativePermittivity εr of the host
 * @returns N_M in cm⁻³
 * @example mottDensity(0.0058, 12.9) // ≈ 2e16 cm⁻³ (GaAs donors)
 */
export function mottDensity(isolatedEnergy: number, relativePermittivity: number): number {
  return Math.pow(HYDROGENIC_CONSTANTS.mottConstant / effectiveBohrRadius(isolatedEnergy, relativePermittivity), 3);
}

/** The silicon species whose Altermatt parameters are transferred, by kind. */
const TEMPLATE_SPECIES: Readonly<Record<DopantKind, string>> = { donor: 'P', acceptor: 'B' };

function template(kind: DopantKind): IonizationParameters {
  const symbol = TEMPLATE_SPECIES[kind];
  const dopant = SILICON.dopants.find((candidate) => candidate.symbol === symbol);
  if (!dopant) throw new Error(`silicon table has no ${symbol}`);
  return dopant.ionization;
}

/**
 * Altermatt-form ionization parameters for a dopant in another host, scaled
 * from Si:P (donors) or Si:B (acceptors) by the ratio of Mott densities.
 *
 * @param kind 'donor' or 'acceptor' (selects the silicon template)
 * @param isolatedEnergy ΔE0 of the dopant in its host, eV
 * @param relativePermittivity εr of the host
 * @param energySource citation of ΔE0, repeated in the parameters' citation
 * @returns parameters for ionization.ts, with a citation naming the assumption
 * @example mottScaledIonization('donor', 0.012, 16.0, 'Sze & Ng 2007').localizationDensity // ≈ 3e17 cm⁻³ (Ge:P)
 */
export function mottScaledIonization(
  kind: DopantKind,
  isolatedEnergy: number,
  relativePermittivity: number,
  energySource: string,
): IonizationParameters {
  const base = template(kind);
  const symbol = TEMPLATE_SPECIES[kind];
  const mott = mottDensity(isolatedEnergy, relativePermittivity);
  const ratio = mott / mottDensity(base.isolatedEnergy, SILICON.relativePermittivity);
  return {
    isolatedEnergy,
    referenceDensity: base.referenceDensity * ratio,
    screeningExponent: base.screeningExponent,
    localizationDensity: base.localizationDensity * ratio,
    localizationExponent: base.localizationExponent,
    citation:
      `ΔE0 = ${isolatedEnergy} eV: ${energySource}. Density dependence: assumption, the Altermatt et al. ` +
      `(2006) Si:${symbol} parameters (J. Appl. Phys. 100, ${kind === 'donor' ? '113714' : '113715'}; from memory) ` +
      `with Nref and Nb scaled by the hydrogenic Mott density (Mott criterion N_M^(1/3)·a_B = 0.26, ` +
      `Edwards & Sienko, Phys. Rev. B 17, 2575 (1978); a_B = a0·Ry/(εr·ΔE0); from memory): ` +
      `N_M ≈ ${mott.toExponential(1)} cm⁻³`,
    validity:
      'freeze-out from the measured isolated level; full ionization above the estimated Mott density, ' +
      'whose position is a hydrogenic estimate (within about a factor of 2), not a fit',
  };
}

/**
 * Degeneracy factors of donor and acceptor levels: 2 (spin) and 4 (spin and the two degenerate valence-band
 * maxima); common practice, no source.
 */
export const LEVEL_DEGENERACY: Readonly<Record<DopantKind, number>> = { donor: 2, acceptor: 4 };

/** What one host's Mott-scaled dopant table shares. */
export interface MottScaledHost {
  /** Static relative permittivity εr of the host. */
  readonly relativePermittivity: number;
  /** Why the host's mobility fit ignores the dopant species (shown in help). */
  readonly mobilitySpeciesNote: string;
}

/**
 * One dopant of a non-silicon host: its isolated level, the usual level
 * degeneracy, and Altermatt-form ionization parameters scaled by the Mott
 * density (mottScaledIonization).
 *
 * @param host permittivity and mobility note of the host
 * @param symbol element symbol as users type it (or 'donor' / 'acceptor')
 * @param name element name
 * @param kind 'donor' or 'acceptor'
 * @param isolatedEnergy ΔE0, eV
 * @param energySource citation of ΔE0
 * @returns the dopant's table row
 * @example
 * const host = { relativePermittivity: 16, mobilitySpeciesNote: '…' };
 * mottScaledDopant(host, 'P', 'phosphorus', 'donor', 0.012, 'Sze & Ng 2007').degeneracy // → 2
 */
export function mottScaledDopant(
  host: MottScaledHost,
  symbol: string,
  name: string,
  kind: DopantKind,
  isolatedEnergy: number,
  energySource: string,
): Dopant {
  return {
    symbol,
    name,
    kind,
    ionizationEnergy: isolatedEnergy,
    ionizationEnergyCitation: energySource,
    degeneracy: LEVEL_DEGENERACY[kind],
    mobilitySpeciesNote: host.mobilitySpeciesNote,
    ionization: mottScaledIonization(kind, isolatedEnergy, host.relativePermittivity, energySource),
  };
}
