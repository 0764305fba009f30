/**
 * The registry entry every mobility model has (registry.ts). Types only, so
 * that the equations and the registry can import it without importing one
 * another; the data shape of the non-silicon fits is in fitTypes.ts.
 */
import type { Carrier, Sample } from '../sample';
import type { Provenance } from '../materials/types';
import type { ModelLocation } from '../modelInfo';

export type { FitParameters, MaterialMobilityFit, ScaledCaugheyThomasParameters, ScaledCoefficient } from './fitTypes';

/**
 * What a fit's published value is a mobility of, which decides its
 * free-carrier (drift) mobility:
 * - 'dopant-density': fitted as μ = σ/(qN) with every dopant counted as
 *   ionized (the silicon fits); the net-majority carrier's free-carrier
 *   mobility is the published value times fullIonizationCorrection;
 * - 'free-carriers': fitted to measured free-carrier (Hall or drift)
 *   mobilities (Ge, GaAs, 4H-SiC); the published value is already the
 *   free-carrier mobility and is used unchanged.
 */
export type MobilityFitBasis = 'dopant-density' | 'free-carriers';

/**
 * One mobility model: everything about it in one place. Every code list,
 * default, dispatch, DRIFT.MODELS row, help-page citation and README row of
 * a mobility model is derived from these entries (registry.ts).
 */
export interface MobilityModel<Parameters = unknown> extends Provenance, ModelLocation {
  /** Code as users type it (lower-case author names; look-up is case-insensitive). */
  readonly code: string;
  /** What it computes, as DRIFT.MODELS and README's model table show it. */
  readonly quantity: string;
  /** Descriptive name (DRIFT.MODELS, README's model table). */
  readonly name: string;
  /**
   * Codes of the host materials the parameters belong to. A material's
   * models are the entries listing it, in registry order; the first is its default.
   */
  readonly materials: readonly string[];
  /** The model a blank code chooses for its materials' minority carriers (see defaultMobilityModelFor). */
  readonly minorityCarrierDefault?: true;
  /** What the published value is a mobility of (decides the free-carrier mobility). */
  readonly fittedTo: MobilityFitBasis;
  /** The fitted parameters as typed data; the citation and validity of this entry are theirs. */
  readonly parameters: Parameters;
  /** How the core uses the model beyond the source (temperature extension, assumptions): DRIFT.MODELS notes. */
  readonly notes: string;
  /** Source file holding the equation, written with the paper's symbols (repository path). */
  readonly equation: string;
  /** Source file holding the parameter table (repository path). */
  readonly parameterTable: string;
  /** Test files that check the model, the reference check against the source first (repository paths). */
  readonly tests: readonly string[];
  /**
   * The published mobility of a carrier in a sample, cm²/(V·s): the fit at
   * the sample's total impurity density and temperature (Klaassen: donors,
   * acceptors and free carriers separately). Not yet checked to be positive.
   */
  readonly compute: (carrier: Carrier, sample: Sample) => number;
}
