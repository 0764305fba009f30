/**
 * Shapes of the saturation-velocity and field-exponent tables of the
 * high-field drift model (see caugheyThomasField.ts). Every entry carries its
 * citation, the range its source covers, and the temperatures at which the
 * core evaluates it (the source's range, or a stated extrapolation of its own
 * law); outside those it refuses rather than invent a value.
 */

/** Where a number comes from and over what its source validated it. */
export interface VelocitySource {
  /** Full citation; "from memory" where the value was recalled, not read. */
  readonly citation: string;
  /** What the source measured or fitted (temperatures, fields), for people. */
  readonly validity: string;
}

/** Temperatures at which a table is evaluated, K, and why these limits. */
export interface EvaluationRange {
  readonly min: number;
  readonly max: number;
  readonly reason: string;
}

/**
 * Saturation velocity v_sat(T), cm/s, in one of the published forms:
 * - 'quay' (Quay et al. 2000): v_sat = v300 / ((1 − A) + A·(T/T_ref));
 * - 'single-temperature': one measured value, only at that temperature.
 */
export type SaturationVelocityLaw =
  | {
      readonly form: 'quay';
      /** v_sat at T_ref, cm/s. */
      readonly valueAtReference: number;
      /** T_ref, K. */
      readonly referenceTemperature: number;
      /** A, dimensionless (0 ≤ A < 1 keeps v_sat finite and positive). */
      readonly temperatureCoefficient: number;
    }
  | { readonly form: 'single-temperature'; readonly value: number; readonly temperature: number };

/** Caughey–Thomas field exponent β, held independent of temperature (see each table's source). */
export type FieldExponentLaw = { readonly form: 'constant'; readonly value: number };

/** High-field parameters of one carrier type in one material. */
export interface CarrierHighFieldTable {
  /** Registry code of the saturation-velocity source (DRIFT.MODELS). */
  readonly modelCode: string;
  readonly saturationVelocity: SaturationVelocityLaw;
  readonly saturationSource: VelocitySource;
  readonly fieldExponent: FieldExponentLaw;
  readonly fieldExponentSource: VelocitySource;
  /** Registry code of the field-exponent source where it has its own entry (Si: Canali et al.). */
  readonly fieldExponentModelCode?: string;
  readonly evaluationRange: EvaluationRange;
}

/** A carrier for which no published saturation velocity is tabulated: why not. */
export interface MissingHighFieldTable {
  readonly missing: string;
}

/** Both carriers of one material. */
export interface MaterialHighFieldTables {
  /** Material code exactly as MATERIALS spells it ('Si', 'Ge', 'GaAs', '4H-SiC'). */
  readonly material: string;
  readonly electron: CarrierHighFieldTable | MissingHighFieldTable;
  readonly hole: CarrierHighFieldTable | MissingHighFieldTable;
  /** What the monotone velocity–field curve misses in this material, if anything. */
  readonly limitations?: string;
}
