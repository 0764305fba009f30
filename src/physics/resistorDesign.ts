/**
 * Layout of resistors in a layer of known sheet resistance (common practice,
 * no source). A resistor of width W and body length L has R = Rs·(L/W + Ne),
 * where Ne counts the squares that the ends add (contact heads, bends): a
 * value of about 0.65 squares per contact head is a common rule of thumb
 * (common practice, no source). Temperature dependence uses the quadratic TCR
 * form R(T) = R(T0)·(1 + α·(T − T0) + β·(T − T0)²) (common practice, no source).
 */
import { PhysicsDomainError } from './errors';

/** Squares one contact head typically adds (common practice, no source); for help text, never a default. */
export const TYPICAL_CONTACT_HEAD_SQUARES = 0.65;

/** Parts per million. */
const PER_PPM = 1e-6;

function checkPositive(name: string, value: number, unit: string): void {
  if (!(value > 0) || !Number.isFinite(value)) {
    throw new PhysicsDomainError(`${name} ${value} ${unit} is not allowed: it must be a finite number greater than 0`);
  }
}

function checkEndSquares(value: number): void {
  if (!(value >= 0) || !Number.isFinite(value)) {
    throw new PhysicsDomainError(`end_squares ${value} is not allowed: it must be a finite number ≥ 0`);
  }
}

/**
 * Body length that gives a target resistance: L = W·(R/Rs − Ne).
 *
 * @param targetOhm - wanted resistance R, Ω
 * @param sheetResistance - Rs, Ω/sq
 * @param widthUm - W, µm
 * @param endSquares - Ne, squares added by both ends together, ≥ 0
 * @returns L in µm
 * @throws PhysicsDomainError if the ends alone already reach the target
 * @example resistorLength(10000, 100, 5, 1.3) // ≈ 493.5 µm
 */
export function resistorLength(targetOhm: number, sheetResistance: number, widthUm: number, endSquares = 0): number {
  checkPositive('target', targetOhm, 'Ω');
  checkPositive('sheet_res', sheetResistance, 'Ω/sq');
  checkPositive('width', widthUm, 'µm');
  checkEndSquares(endSquares);
  const squares = targetOhm / sheetResistance;
  if (!(squares > endSquares)) {
    throw new PhysicsDomainError(
      `target ${targetOhm} Ω is ${squares} squares of ${sheetResistance} Ω/sq, not more than the ${endSquares} squares the ends add ` +
        `(${sheetResistance * endSquares} Ω): the target must exceed Rs·end_squares`,
    );
  }
  return widthUm * (squares - endSquares);
}

/** Temperature coefficients of a layer's resistance. */
export interface TemperatureCoefficients {
  /** α, ppm/K. */
  readonly linearPpmPerK: number;
  /** β, ppm/K². */
  readonly quadraticPpmPerK2: number;
  /** T0, K: where the sheet resistance was given. */
  readonly referenceTemperature: number;
}

/**
 * Resistor value at temperature T: R = Rs·(L/W + Ne)·(1 + α·ΔT + β·ΔT²), ΔT = T − T0.
 *
 * @param sheetResistance - Rs at T0, Ω/sq
 * @param lengthUm - body length L, µm
 * @param widthUm - width W, µm
 * @param temperature - T, K
 * @param coefficients - α (ppm/K), β (ppm/K²), T0 (K)
 * @param endSquares - Ne, ≥ 0
 * @returns R(T) in Ω
 * @throws PhysicsDomainError if the TCR polynomial is not positive at T
 * @example resistorAtTemperature(100, 500, 5, 400, { linearPpmPerK: 1000, quadraticPpmPerK2: 0, referenceTemperature: 300 }) // ≈ 11000 Ω
 */
export function resistorAtTemperature(
  sheetResistance: number,
  lengthUm: number,
  widthUm: number,
  temperature: number,
  coefficients: TemperatureCoefficients,
  endSquares = 0,
): number {
  checkPositive('sheet_res', sheetResistance, 'Ω/sq');
  checkPositive('length', lengthUm, 'µm');
  checkPositive('width', widthUm, 'µm');
  checkPositive('temperature', temperature, 'K');
  checkPositive('reference temperature', coefficients.referenceTemperature, 'K');
  checkEndSquares(endSquares);
  const delta = temperature - coefficients.referenceTemperature;
  const factor = 1 + coefficients.linearPpmPerK * PER_PPM * delta + coefficients.quadraticPpmPerK2 * PER_PPM * delta * delta;
  if (!(factor > 0)) {
    throw new PhysicsDomainError(
      `the TCR polynomial 1 + α·ΔT + β·ΔT² is ${factor} at ${temperature} K (ΔT = ${delta} K): it must be > ` +
        `0; the coefficients do not describe the layer this far from the reference temperature`,
    );
  }
  return sheetResistance * (lengthUm / widthUm + endSquares) * factor;
}
