/**
 * Numbers of a parameter table as citation text, so that a citation quotes
 * the values the code computes with instead of a retyped copy: shortest
 * round-trip digits (or the significant digits the source quotes, e.g.
 * 1.170), exponent form for large and small magnitudes (6e16, 4.73e-4), and
 * the typographic minus sign (−2.4) of the other citation text.
 */

/** Magnitudes from here up are written with an exponent (1e5: 100000 is hard to read). */
const EXPONENT_FROM = 1e5;
/** Magnitudes below this are written with an exponent (4.73e-4, not 0.000473). */
const EXPONENT_BELOW = 1e-3;

/**
 * A parameter value for a citation or note.
 *
 * @param value - a finite number from a parameter table
 * @param significantDigits - digits as the source quotes them (keeps trailing
 *   zeros: 1.17 with 4 is '1.170', 6e16 with 2 is '6.0e16'); omitted: the
 *   shortest digits that give the value back
 * @returns e.g. '9400', '0.394', '1.48e17', '4.73e-4', '−2.15'
 * @throws Error for a value that is not finite or a digit count outside 1–21
 * @example parameterText(-1.66) // → '−1.66'
 * @example parameterText(3.1e19, 3) // → '3.10e19'
 */
export function parameterText(value: number, significantDigits?: number): string {
  if (!Number.isFinite(value)) throw new Error(`parameterText needs a finite number, got ${value}`);
  if (significantDigits !== undefined && !(Number.isInteger(significantDigits) && significantDigits >= 1 && significantDigits <= 21)) {
    throw new Error(`parameterText needs 1–21 significant digits, got ${significantDigits}`);
  }
  const magnitude = Math.abs(value);
  const exponential = magnitude !== 0 && (magnitude >= EXPONENT_FROM || magnitude < EXPONENT_BELOW);
  const digits = exponential ? exponentialText(magnitude, significantDigits) : plainText(magnitude, significantDigits);
  return value < 0 ? `−${digits}` : digits;
}

/** 6e16, 1.48e17, 4.73e-4 (no '+' in the exponent). */
function exponentialText(magnitude: number, significantDigits: number | undefined): string {
  const text = significantDigits === undefined ? magnitude.toExponential() : magnitude.toExponential(significantDigits - 1);
  return text.replace('e+', 'e');
}

/** 9400, 0.394; with significant digits, trailing zeros kept (1.170, 3.0). */
function plainText(magnitude: number, significantDigits: number | undefined): string {
  if (significantDigits === undefined) return String(magnitude);
  const leading = magnitude === 0 ? 0 : Math.floor(Math.log10(magnitude));
  return magnitude.toFixed(Math.max(0, significantDigits - 1 - leading));
}

/**
 * An exponent as sources write it: an odd multiple of 1/2 as a fraction
 * (T^3/2, N^1/2), any other value as parameterText writes it.
 *
 * @param value - a finite exponent from a parameter table
 * @returns e.g. '3/2', '1/2', '2.54', '−1.66'
 * @example exponentText(1.5) // → '3/2'
 */
export function exponentText(value: number): string {
  const halves = value * 2;
  if (Number.isInteger(halves) && halves % 2 !== 0) return `${halves < 0 ? '−' : ''}${Math.abs(halves)}/2`;
  return parameterText(value);
}
