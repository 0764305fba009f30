/**
 * A1 names of cells and areas from 0-based rows and columns, as Excel writes
 * them: column letters A…Z, AA…, row numbers from 1. Dependency-free, so the
 * task pane (src/taskpane/port.ts) and the workbook recalculation
 * (src/engine/xlsx.ts) share it without either pulling in the other.
 */

/**
 * Column letters for a 0-based column index.
 *
 * @throws RangeError when the index is not an integer ≥ 0
 * @example columnName(0) // 'A'
 * @example columnName(26) // 'AA'
 */
export function columnName(column: number): string {
  if (!Number.isInteger(column) || column < 0) throw new RangeError(`column index ${column} must be an integer >= 0`);
  let name = '';
  for (let n = column + 1; n > 0; n = Math.floor((n - 1) / 26)) name = String.fromCharCode(65 + ((n - 1) % 26)) + name;
  return name;
}

/**
 * A1 name of one cell from 0-based row and column.
 *
 * @example cellName(0, 27) // 'AB1'
 */
export function cellName(row: number, column: number): string {
  return `${columnName(column)}${row + 1}`;
}

/**
 * A1 name of the area from one cell to another (0-based, inclusive): 'B2:D9', or 'B2' for a single cell.
 *
 * @example areaName(1, 1, 8, 3) // 'B2:D9'
 */
export function areaName(row: number, column: number, lastRow: number, lastColumn: number): string {
  const start = cellName(row, column);
  return row === lastRow && column === lastColumn ? start : `${start}:${cellName(lastRow, lastColumn)}`;
}
