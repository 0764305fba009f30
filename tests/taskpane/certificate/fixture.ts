/**
 * A wafer certificate table for tests. Everything in it is invented: the
 * supplier "Kestrel Substrates" is fictional, and so are its lots, wafers and
 * readings. Shared by the unit tests and the browser test.
 */
import type { CellInput } from '../../../src/taskpane/port';

export const FICTIONAL_SUPPLIER = 'Kestrel Substrates (fictional)';

export const CERTIFICATE_HEADERS = [
  'Lot',
  'Wafer',
  'Type',
  'Rho min (ohm-cm)',
  'Rho max (ohm-cm)',
  'Rho centre',
  'Rho edge 1',
  'Rho edge 2',
  'Rho edge 3',
  'Thickness (um)',
] as const;

/** One invented wafer row, in the order of CERTIFICATE_HEADERS (ρ in Ω·cm, thickness in µm). */
export type WaferRow = readonly [
  lot: string,
  wafer: string,
  type: string,
  rhoMin: number,
  rhoMax: number,
  centre: number,
  edge1: number,
  edge2: number,
  edge3: number,
  thickness: number,
];

/** Invented wafer rows, typed (tests destructure them); CERTIFICATE_ROWS is the same rows as sheet cells. */
export const WAFER_ROWS: readonly WaferRow[] = [
  ['KS-2301', 'W01', 'P', 8, 12, 10.1, 10.4, 10.6, 10.3, 525],
  ['KS-2301', 'W02', 'P', 8, 12, 9.8, 10.9, 11.2, 10.8, 525],
  ['KS-2302', 'W01', 'N', 1, 3, 2.1, 2.2, 2.0, 2.3, 525],
  ['KS-2303', 'W07', 'Boron', 9, 11, 12.5, 12.9, 13.1, 12.7, 675],
];

/** The wafer rows as cell inputs for a sheet. */
export const CERTIFICATE_ROWS: readonly (readonly CellInput[])[] = WAFER_ROWS;

/** The whole table, header row first. */
export const CERTIFICATE_TABLE: readonly (readonly CellInput[])[] = [CERTIFICATE_HEADERS, ...CERTIFICATE_ROWS];

/** Headers of the columns the check adds for this table with every column mapped (the tool's own wording). */
export const CHECK_HEADERS: readonly string[] = [
  'Dopant code (P/N read as p-/n-type)',
  'Doping at ρmax (cm⁻³)',
  'Doping at ρmin (cm⁻³)',
  'Certified doping inside needed window',
  'Readings inside ρ window',
  'Rs at nominal thickness, mean reading (Ω/sq)',
  'Radial variation (%)',
  'Pass/fail',
];

/**
 * The dopant code the check should read a certificate's type as, with "P/N are conductivity
 * types" on (the tests' default): P the generic acceptor, N the generic donor, anything else as written.
 */
export function expectedDopantOfType(type: unknown): string {
  return type === 'P' ? 'acceptor' : type === 'N' ? 'donor' : String(type);
}
