/**
 * Shapes of the per-material parameter tables. Every table carries its
 * citation and the range over which its source validated it, so the model
 * registry and help pages can show them next to the numbers.
 */
import type { ModelLocation } from '../modelInfo';

/** Where a parameter set comes from and where it was validated. */
export interface Provenance {
  /** Full citation; "from memory" where the value was recalled, not read. */
  readonly citation: string;
  /** Range the source validated (temperature, density); text for people. */
  readonly validity: string;
}

/**
 * Varshni-form band gap Eg(T) = Eg0 − α·T²/(T + β) (Y. P. Varshni,
 * Physica 34, 149 (1967)).
 */
export interface VarshniBandgap extends Provenance, ModelLocation {
  readonly code: string;
  readonly name: string;
  /** Gap at 0 K, eV. */
  readonly gapAtZero: number;
  /** α, eV/K. */
  readonly alpha: number;
  /** β, K. */
  readonly beta: number;
}

/** Effective density of states N(T) = N300·(T/300 K)^exponent, cm⁻³. */
export interface PowerLawDensity {
  /** Value at the reference temperature, cm⁻³. */
  readonly valueAtReference: number;
  /** Reference temperature, K. */
  readonly referenceTemperature: number;
  /** Temperature exponent (3/2 for constant effective masses). */
  readonly exponent: number;
}

/** Effective densities of states of both band edges, from one source. */
export interface DensityOfStatesModel extends Provenance, ModelLocation {
  readonly code: string;
  readonly name: string;
  readonly conductionBand: PowerLawDensity;
  readonly valenceBand: PowerLawDensity;
}

/**
 * Intrinsic density fit ni(T) = A·(T/Tref)^m·exp(−Θ/T), the form used by
 * Misiakos & Tsamakis (1993) and Sproul & Green (1991).
 */
export interface IntrinsicDensityFit extends Provenance, ModelLocation {
  readonly code: string;
  readonly name: string;
  /** A, cm⁻³. */
  readonly prefactor: number;
  /** Tref, K. */
  readonly referenceTemperature: number;
  /** m, dimensionless. */
  readonly exponent: number;
  /** Θ, K (Θ·k is half the linearly extrapolated 0 K gap). */
  readonly activationTemperature: number;
  /** Why the fit is used where it is, and what it does outside its range. */
  readonly notes?: string;
}

export type DopantKind = 'donor' | 'acceptor';

/**
 * Parameters of the Altermatt et al. (2006) incomplete-ionization model for one
 * dopant species:
 *   ΔE(N) = ΔE0 / (1 + (N/Nref)^c)   (level moves toward the band: screening)
 *   b(N)  = 1 / (1 + (N/Nb)^d)       (fraction of states still localised)
 * A fraction 1 − b of the dopants sits in the band tail and is always ionised.
 */
export interface IonizationParameters extends Provenance {
  /** ΔE0, eV: ionization energy of an isolated dopant used by the model. */
  readonly isolatedEnergy: number;
  /** Nref, cm⁻³. */
  readonly referenceDensity: number;
  /** c, dimensionless. */
  readonly screeningExponent: number;
  /** Nb, cm⁻³. */
  readonly localizationDensity: number;
  /** d, dimensionless. */
  readonly localizationExponent: number;
}

/** One dopant species in one host material. */
export interface Dopant {
  /** 'P', 'B', ... or 'donor'/'acceptor' for the generic ones; unique case-insensitively within a material. */
  readonly symbol: string;
  /** Element name or "generic donor"/"generic acceptor". */
  readonly name: string;
  readonly kind: DopantKind;
  /** Isolated-dopant ionization energy, eV (see ionizationEnergyCitation). */
  readonly ionizationEnergy: number;
  readonly ionizationEnergyCitation: string;
  /** Ground-state degeneracy factor: 2 for donors, 4 for acceptors (common practice). */
  readonly degeneracy: number;
  /**
   * Which row of Masetti's dopant-specific silicon fit applies: 'As' | 'P' | 'B'.
   * Silicon only; absent in hosts whose mobility fits do not depend on the species.
   */
  readonly mobilitySpecies?: 'As' | 'P' | 'B';
  /** Why this mobility species was chosen, or why none applies. */
  readonly mobilitySpeciesNote: string;
  /** Incomplete-ionization model parameters. */
  readonly ionization: IonizationParameters;
}

/** Temperatures the material's models may be evaluated at, K. */
export interface TemperatureDomain {
  readonly min: number;
  readonly max: number;
  /** Why these limits. */
  readonly reason: string;
}

/** A host material with all its parameter tables. */
export interface Material {
  /** Code as users type it, e.g. 'Si'. */
  readonly code: string;
  readonly name: string;
  readonly temperatureDomain: TemperatureDomain;
  /** Atomic density, cm⁻³: the total dopant density may not exceed it. */
  readonly atomicDensity: number;
  /** Static relative permittivity εr (scales hydrogenic dopant orbits, see ionizationScaling.ts). */
  readonly relativePermittivity: number;
  /** Where atomicDensity, relativePermittivity and the temperature limits come from. */
  readonly hostPropertiesCitation: string;
  readonly bandgap: VarshniBandgap;
  readonly densityOfStates: DensityOfStatesModel;
  /** Published ni(T) fits, selectable by code. */
  readonly intrinsicFits: readonly IntrinsicDensityFit[];
  /** Dopants in the order users see them. */
  readonly dopants: readonly Dopant[];
  /** The file holding `dopants` (repository path), for the model registry's locations. */
  readonly dopantTable: string;
  /** Symbols of the generic donor and acceptor ('donor', 'acceptor'). */
  readonly genericDopants: { readonly donor: string; readonly acceptor: string };
}
