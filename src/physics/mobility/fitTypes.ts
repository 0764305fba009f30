/**
 * The data shape of the temperature-scaled Caughey–Thomas fits of the hosts
 * other than silicon (the equation in materialFits.ts, one data file per
 * material). Types only, importing nothing but the provenance type, so that
 * the data files, the equation, the registry and the dopant tables (which
 * name their material's fit) use them without an import circle.
 */
import type { Provenance } from '../materials/types';

/** A coefficient value·(T / 300 K)^exponent. */
export interface ScaledCoefficient {
  /** Value at 300 K, in the coefficient's unit. */
  readonly value: number;
  /** Exponent of T / 300 K (0: temperature-independent). */
  readonly exponent: number;
}

/** Coefficients of the temperature-scaled Caughey–Thomas form for one carrier. */
export interface ScaledCaugheyThomasParameters {
  /** μmin·Tn^a, cm²/(V·s). */
  readonly minimum: ScaledCoefficient;
  /** μmax·Tn^b, cm²/(V·s): the lattice-limited mobility. */
  readonly maximum: ScaledCoefficient;
  /** Nref·Tn^c, cm⁻³. */
  readonly referenceDensity: ScaledCoefficient;
  /** α·Tn^d, dimensionless. */
  readonly alpha: ScaledCoefficient;
}

/**
 * Parameters of both carriers. The keys are the Carrier values of sample.ts,
 * written out so that this file need not import it (sample.ts imports the
 * materials, whose dopant tables import the fits).
 */
export type FitParameters = Readonly<Record<'electron' | 'hole', ScaledCaugheyThomasParameters>>;

/** One material's mobility fit, both carriers, with its provenance. */
export interface MaterialMobilityFit extends Provenance {
  /** Model code as users type it (lower-case author names). */
  readonly code: string;
  readonly name: string;
  /** Code of the host material the parameters belong to. */
  readonly materialCode: string;
  readonly parameters: FitParameters;
  /** How the core uses the fit beyond the source (extrapolation, assumptions). */
  readonly notes: string;
  /** The file holding this parameter table (repository path); the equation is in materialFits.ts. */
  readonly parameterTable: string;
  /** Test files that check the fit, reference checks first (repository paths). */
  readonly tests: readonly string[];
}
