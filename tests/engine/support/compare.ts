/**
 * Puts engine values and catalog values in one comparable form: numbers and
 * text as they are, errors as { code, message }.
 */
import { DetailedCellError, type CellValue } from 'hyperformula';
import { isFailure, type CellOutput, type Grid } from '../../../src/catalog/values';

export type Comparable = number | string | boolean | null | { code: string; message: string };

export function fromEngine(value: CellValue): Comparable {
  if (value instanceof DetailedCellError) return { code: value.value, message: value.message };
  return value;
}

export function fromCatalog(value: CellOutput): Comparable {
  return isFailure(value) ? { code: value.code, message: value.message } : value;
}

export function engineGrid(values: CellValue[][]): Comparable[][] {
  return values.map((row) => row.map(fromEngine));
}

export function catalogGrid(grid: Grid<CellOutput>): Comparable[][] {
  return grid.map((row) => row.map(fromCatalog));
}
