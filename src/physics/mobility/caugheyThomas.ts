/**
 * Caughey and Thomas, "Carrier mobilities in silicon empirically related to
 * doping and field", Proc. IEEE 55, 2192 (1967): the low-field part,
 *
 *   μ(N) = μmin + (μmax − μmin) / (1 + (N/Nref)^α)
 *
 * fitted to silicon at 300 K, roughly 1e14…1e20 cm⁻³.
 */
import type { Carrier } from '../sample';

/** Citation and validity of the Caughey–Thomas fit, for the model registry. */
export const CAUGHEY_THOMAS_SOURCE = {
  citation: 'D. M. Caughey, R. E. Thomas, Proc. IEEE 55, 2192 (1967), silicon (parameter values from memory)',
  validity: '300 K fit, about 1e14–1e20 cm⁻³',
} as const;

/** Caughey–Thomas parameters for one carrier type. */
export interface CaugheyThomasParameters {
  readonly minimum: number; // μmin, cm²/(V·s)
  readonly maximum: number; // μmax, cm²/(V·s)
  readonly referenceDensity: number; // Nref, cm⁻³
  readonly alpha: number; // α
}

/**
 * Caughey & Thomas (1967) silicon parameters at 300 K. All values from memory
 * (not cross-checked). Validity: 300 K, ~1e14…1e20 cm⁻³.
 */
export const CAUGHEY_THOMAS_TABLE: Readonly<Record<Carrier, CaugheyThomasParameters>> = {
  electron: { minimum: 65, maximum: 1330, referenceDensity: 8.5e16, alpha: 0.72 },
  hole: { minimum: 47.7, maximum: 495, referenceDensity: 6.3e16, alpha: 0.76 },
};

/** Temperature of the Caughey–Thomas silicon fit, K. */
export const CAUGHEY_THOMAS_REFERENCE_TEMPERATURE = 300;

/**
 * Caughey–Thomas (1967) low-field mobility at 300 K.
 *
 * @param carrier - 'electron' or 'hole'
 * @param totalDensity - total impurity density N ≥ 0, cm⁻³
 * @returns μ in cm²/(V·s)
 * @example caugheyThomasMobility('hole', 1e17) // ≈ 232
 */
export function caugheyThomasMobility(carrier: Carrier, totalDensity: number): number {
  const p = CAUGHEY_THOMAS_TABLE[carrier];
  return p.minimum + (p.maximum - p.minimum) / (1 + Math.pow(totalDensity / p.referenceDensity, p.alpha));
}
