/**
 * What a column of a supplier's certificate table can mean to the check.
 * Single roles take at most one column; the reading roles take any number.
 */

export const COLUMN_ROLES = [
  'ignore',
  'lot',
  'wafer',
  'type',
  'rho-min',
  'rho-max',
  'rho-center',
  'rho-edge',
  'rho-reading',
  'thickness',
] as const;

export type ColumnRole = (typeof COLUMN_ROLES)[number];

/** Labels the pane shows for each role. */
export const ROLE_LABELS: Readonly<Record<ColumnRole, string>> = {
  ignore: 'not used',
  lot: 'Lot',
  wafer: 'Wafer',
  type: 'Type or dopant',
  'rho-min': 'ρ min',
  'rho-max': 'ρ max',
  'rho-center': 'ρ at centre',
  'rho-edge': 'ρ at edge',
  'rho-reading': 'ρ at other site',
  thickness: 'Thickness',
};

/** Roles that may be given to several columns. */
export const MULTI_COLUMN_ROLES: ReadonlySet<ColumnRole> = new Set<ColumnRole>(['ignore', 'rho-edge', 'rho-reading']);

/** Roles whose columns hold resistivity readings of the wafer. */
export const READING_ROLES: ReadonlySet<ColumnRole> = new Set<ColumnRole>(['rho-center', 'rho-edge', 'rho-reading']);

/** Roles whose columns hold a resistivity (certified bounds and readings). */
export const RESISTIVITY_ROLES: ReadonlySet<ColumnRole> = new Set<ColumnRole>([
  'rho-min',
  'rho-max',
  'rho-center',
  'rho-edge',
  'rho-reading',
]);

/**
 * Checks that single roles are given to at most one column.
 *
 * @param mapping - one role per column
 * @returns a message naming the role and columns, or null when the mapping is consistent
 * @example duplicateRole(['rho-min', 'rho-min'], ['Min', 'Low']) // "'ρ min' is given to 2 columns: Min, Low…"
 */
export function duplicateRole(mapping: readonly ColumnRole[], headers: readonly string[]): string | null {
  for (const role of COLUMN_ROLES) {
    if (MULTI_COLUMN_ROLES.has(role)) continue;
    const columns = mapping.flatMap((given, index) => (given === role ? [headers[index] || `column ${index + 1}`] : []));
    if (columns.length > 1) {
      return `'${ROLE_LABELS[role]}' is given to ${columns.length} columns (${columns.join(', ')}); give it to one column only.`;
    }
  }
  return null;
}
