/**
 * Arora, Hauser and Roulston, "Electron and hole mobilities in silicon as a
 * function of concentration and temperature", IEEE Trans. Electron Devices
 * 29, 292 (1982). Conductivity mobility vs total impurity density and
 * temperature, fitted for 250–500 K up to ~1e20 cm⁻³ within ±13 % of the data
 * (abstract):
 *
 *   μ(N, T) = μmin·Tn^a + μ0·T^b / (1 + (N / (Nref·Tn^c))^(α·Tn^d)),  Tn = T/300 K
 *
 * Outside 250–500 K the power laws are extrapolated (used so that freeze-out
 * at 77 K and intrinsic conduction at 600 K can still be evaluated; the
 * registry states the fitted range).
 */
import type { Carrier } from '../sample';
import { memoize } from '../memo';

/** Temperatures over which Arora et al. fitted their expressions, K (abstract). */
export const ARORA_FITTED_TEMPERATURES = { min: 250, max: 500 } as const;

/** Citation and validity of the Arora fit, for the model registry. */
export const ARORA_SOURCE = {
  citation:
    'N. D. Arora, J. R. Hauser, D. J. Roulston, IEEE Trans. Electron Devices 29, 292 (1982) ' +
    "(parameter values from memory, checked against the transcription in Sandia's Charon simulator, " +
    'github tcadsoftware/charon, src/Charon_Material_Properties.cpp)',
  validity:
    `${ARORA_FITTED_TEMPERATURES.min}–${ARORA_FITTED_TEMPERATURES.max} K, up to about 1e20 cm⁻³, within ±13 % of the data (abstract); ` +
    'extrapolated outside',
} as const;

/** A coefficient scaled by a power of temperature: value · T^exponent. */
export interface PowerLaw {
  readonly value: number;
  readonly exponent: number;
}

/** Arora et al. (1982) coefficients for one carrier type. */
export interface AroraParameters {
  readonly minimum: PowerLaw; // μmin · Tn^a, cm²/(V·s)
  readonly amplitude: PowerLaw; // μ0 · T^b with T in K (absolute, as in the paper), cm²/(V·s)
  readonly referenceDensity: PowerLaw; // Nref · Tn^c, cm⁻³
  readonly alpha: PowerLaw; // α · Tn^d, dimensionless
}

/**
 * Arora et al. (1982), the fitted expressions for electrons and holes.
 * Values from memory (μmin,n = 88·Tn^−0.57 agrees with a third-party
 * quotation consulted; the rest not cross-checked). Validity 250–500 K,
 * N ≤ ~1e20 cm⁻³.
 */
export const ARORA_TABLE: Readonly<Record<Carrier, AroraParameters>> = {
  electron: {
    minimum: { value: 88, exponent: -0.57 },
    amplitude: { value: 7.4e8, exponent: -2.33 },
    referenceDensity: { value: 1.26e17, exponent: 2.4 },
    alpha: { value: 0.88, exponent: -0.146 },
  },
  hole: {
    minimum: { value: 54.3, exponent: -0.57 },
    amplitude: { value: 1.36e8, exponent: -2.23 },
    referenceDensity: { value: 2.35e17, exponent: 2.4 },
    alpha: { value: 0.88, exponent: -0.146 },
  },
};

/** Normalising temperature of Arora's reduced temperature Tn = T/300 K. */
export const ARORA_REFERENCE_TEMPERATURE = 300;

/**
 * Arora et al. (1982) mobility.
 *
 * @param carrier - 'electron' or 'hole'
 * @param totalDensity - total impurity density N ≥ 0, cm⁻³
 * @param temperature - T > 0, K (fitted 250–500 K, extrapolated outside)
 * @returns μ in cm²/(V·s)
 * @example aroraMobility('electron', 1e16, 300) // ≈ 1218
 */
export function aroraMobility(carrier: Carrier, totalDensity: number, temperature: number): number {
  const { minimum, amplitude, referenceDensity, alpha } = temperatureCoefficients(carrier, temperature);
  return minimum + amplitude / (1 + Math.pow(totalDensity / referenceDensity, alpha));
}

/** Arora's coefficients at one temperature (the four power laws of the table). */
interface AroraCoefficients {
  readonly minimum: number;
  readonly amplitude: number;
  readonly referenceDensity: number;
  readonly alpha: number;
}

/**
 * Coefficients by carrier and temperature. They depend on temperature only,
 * yet cost four powers, while a sheet or a doping × temperature grid uses few
 * distinct temperatures; remembering them (memo.ts, the core's one memo
 * policy) leaves each mobility one power.
 */
const temperatureCoefficients = memoize(2048, (carrier: Carrier, temperature: number): AroraCoefficients => {
  const p = ARORA_TABLE[carrier];
  const reduced = temperature / ARORA_REFERENCE_TEMPERATURE;
  return {
    minimum: p.minimum.value * Math.pow(reduced, p.minimum.exponent),
    amplitude: p.amplitude.value * Math.pow(temperature, p.amplitude.exponent),
    referenceDensity: p.referenceDensity.value * Math.pow(reduced, p.referenceDensity.exponent),
    alpha: p.alpha.value * Math.pow(reduced, p.alpha.exponent),
  };
});

/**
 * Arora's temperature ratio μ_Arora(N, T) / μ_Arora(N, 300 K): the factor by
 * which the 300 K fits (Masetti, Caughey–Thomas) are carried to other
 * temperatures (our choice; docs/physics.md, "Mobility models").
 *
 * @param carrier - 'electron' or 'hole'
 * @param totalDensity - N ≥ 0, cm⁻³
 * @param temperature - T > 0, K
 * @returns dimensionless ratio, 1 at 300 K
 * @example aroraTemperatureRatio('electron', 1e15, 400) // ≈ 0.54
 */
export function aroraTemperatureRatio(carrier: Carrier, totalDensity: number, temperature: number): number {
  if (temperature === ARORA_REFERENCE_TEMPERATURE) return 1;
  return aroraMobility(carrier, totalDensity, temperature) / aroraMobility(carrier, totalDensity, ARORA_REFERENCE_TEMPERATURE);
}
