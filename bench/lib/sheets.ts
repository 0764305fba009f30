/** Worksheet builders shared by the engine benchmarks. */
import { columnLetters } from '../../src/engine/xlsx';

/** A1 address of a 0-based row and column. */
export function a1(row: number, column: number): string {
  return `${columnLetters(column + 1)}${row + 1}`;
}

/** n doping values spread evenly in log between 1e14 and 1e19 cm⁻³ (invented inputs). */
export function dopingAt(i: number, n: number): number {
  return Math.pow(10, 14 + (5 * i) / n);
}

/**
 * A number as formula text, in the shortest exact form (8.5e16 rather than
 * 85000000000000000). Lower-case e: HyperFormula 3.5 rejects 8.5E16 and
 * 8.5E+16 as invalid formulas.
 */
export function formulaNumber(value: number): string {
  const text = String(value);
  const exponential = value.toExponential().replace('e+', 'e');
  return Number(exponential) === value && exponential.length < text.length ? exponential : text;
}
