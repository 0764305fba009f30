/**
 * What the certificate check works on: the selected table and the user's
 * choices in the pane. Shared by the planner (plan.ts), its checks
 * (validate.ts) and the pane (view.ts).
 */
import type { BlockContents, CellBlock } from '../port';
import type { ColumnRole } from './roles';

/** Units the 'measured at' temperature may be typed in; the user chooses one (never guessed from the number). */
export type TemperatureUnit = 'C' | 'K';

/** Temperature the readings were taken at, as typed, with its chosen unit. */
export interface MeasuredAt {
  readonly value: number;
  readonly unit: TemperatureUnit;
}

/** Which containment the window check asks for. */
export type WindowRule = 'certified-inside-needed' | 'needed-inside-certified';

/** The selected table: header row first, then one row per wafer. */
export interface CertificateTable {
  readonly block: CellBlock;
  readonly contents: BlockContents;
}

/** Everything the user chose in the pane. */
export interface CertificateSettings {
  /** One role per column of the table. */
  readonly mapping: readonly ColumnRole[];
  /** Needed doping window, cm⁻³. */
  readonly neededMin: number;
  readonly neededMax: number;
  /**
   * 'certified-inside-needed' (default): every doping the certificate allows lies in the needed window,
   * i.e. the wafer is sure to meet the design. 'needed-inside-certified': the certificate's range covers the needed window.
   */
  readonly windowRule: WindowRule;
  /** True: a lone P / N in the type column means p-type / n-type (see typeCodes.ts). */
  readonly typeMeansConductivity: boolean;
  /** Dopant code used when no column has the type role. */
  readonly dopant: string;
  /** Code from RESISTIVITY_UNITS (every resistivity column is in this unit), or '' when not chosen (refused). */
  readonly resistivityUnit: string;
  /** Code from THICKNESS_UNITS, or null when not chosen (refused if a thickness column is mapped). */
  readonly thicknessUnit: string | null;
  /** Temperature the doping is computed at, K. */
  readonly temperatureK: number;
  /** DRIFT.DOPING model code; '' for the material's default model (no parameter cell, argument omitted). */
  readonly model: string;
  /** Material code; '' for the function's default material (no parameter cell, argument omitted). */
  readonly material: string;
  /**
   * Temperature the readings (centre, edge, other sites) were measured at, or null when they are taken
   * at the certificate's temperature. When given, every reading is corrected to temperatureK with
   * DRIFT.RESISTIVITYAT before the checks.
   */
  readonly measuredAt?: MeasuredAt | null;
  /**
   * True: beside the doping window, DRIFT.DOPINGSPREAD at ρmax and at ρmin (lowest and highest doping over
   * every resistivity model of the material, and highest/lowest − 1), at the certificate's temperature.
   * Shown only: pass/fail does not use it. Absent or false: no such columns (the check as before).
   */
  readonly modelSpread?: boolean;
  /** Largest allowed |radial variation| in %, or null for no limit. */
  readonly radialLimitPercent: number | null;
}
