/**
 * Low-field mobility fits of the hosts other than silicon, in one
 * temperature-scaled Caughey–Thomas form (D. M. Caughey, R. E. Thomas,
 * Proc. IEEE 55, 2192 (1967)) whose coefficients are power laws of
 * Tn = T / 300 K:
 *
 *   μ(N, T) = μmin·Tn^a + (μmax·Tn^b − μmin·Tn^a) / (1 + (N / (Nref·Tn^c))^(α·Tn^d))
 *
 * Each published fit is this form with its own coefficients: Sotoodeh et al.
 * (2000) for GaAs (a = 0, b = −θ1, c = θ2, d = 0), Roschke & Schwierz (2001)
 * for 4H-SiC electrons, Hilsum (1974) for Ge (μmin = 0, α = 1/2). The data
 * live in one file per material; this module holds the form, the list and the
 * look-ups.
 *
 * Codes (decision): each fit is selected by a code named after its source
 * ('hilsum', 'sotoodeh', 'roschke-schwierz'), not by the form's name:
 * 'caughey-thomas' already names Caughey & Thomas's own silicon parameters,
 * and a code should say whose numbers are used.
 *
 * What the fits describe: unlike the silicon fits (made against resistivity
 * and the total dopant density, as if fully ionized; see
 * fullIonizationCorrection.ts), these were fitted to measured free-carrier
 * (Hall or drift) mobilities against doping. Their value is already the
 * mobility of the free carriers, so transport uses it unchanged: multiplying
 * by N/n(300 K) would count incomplete ionization twice, which in 4H-SiC
 * (Al 0.2 eV, about 15 % ionized at 300 K at 1e17 cm⁻³ and 5 % at 1e18)
 * would inflate hole mobilities up to twenty-fold.
 */
import type { Carrier } from '../sample';
import type { Provenance } from '../materials/types';
import { GERMANIUM_HILSUM_FIT } from './germaniumHilsum';
import { GALLIUM_ARSENIDE_SOTOODEH_FIT } from './galliumArsenideSotoodeh';
import { SILICON_CARBIDE_4H_ROSCHKE_SCHWIERZ_FIT } from './siliconCarbide4HRoschkeSchwierz';

/** A coefficient value·(T / 300 K)^exponent. */
export interface ScaledCoefficient {
  /** Value at 300 K, in the coefficient's unit. */
  readonly value: number;
  /** Exponent of T / 300 K (0: temperature-independent). */
  readonly exponent: number;
}

/** Coefficients of the temperature-scaled Caughey–Thomas form for one carrier. */
export interface ScaledCaugheyThomasParameters {
  /** μmin·Tn^a, cm²/(V·s). */
  readonly minimum: ScaledCoefficient;
  /** μmax·Tn^b, cm²/(V·s): the lattice-limited mobility. */
  readonly maximum: ScaledCoefficient;
  /** Nref·Tn^c, cm⁻³. */
  readonly referenceDensity: ScaledCoefficient;
  /** α·Tn^d, dimensionless. */
  readonly alpha: ScaledCoefficient;
}

/** One material's mobility fit, both carriers, with its provenance. */
export interface MaterialMobilityFit extends Provenance {
  /** Model code as users type it (lower-case author names). */
  readonly code: string;
  readonly name: string;
  /** Code of the host material the parameters belong to. */
  readonly materialCode: string;
  readonly parameters: Readonly<Record<Carrier, ScaledCaugheyThomasParameters>>;
  /** How the core uses the fit beyond the source (extrapolation, assumptions). */
  readonly notes: string;
}

/** Reference temperature of the reduced temperature Tn, K. */
export const MATERIAL_FIT_REFERENCE_TEMPERATURE = 300;

/** Every non-silicon mobility fit. */
export const MATERIAL_MOBILITY_FITS: readonly MaterialMobilityFit[] = [
  GERMANIUM_HILSUM_FIT,
  GALLIUM_ARSENIDE_SOTOODEH_FIT,
  SILICON_CARBIDE_4H_ROSCHKE_SCHWIERZ_FIT,
];

/** Codes of the non-silicon mobility fits. */
export const MATERIAL_MOBILITY_FIT_CODES: readonly string[] = MATERIAL_MOBILITY_FITS.map((fit) => fit.code);

/**
 * The fit with this (canonical, lower-case) code, if it is a material fit.
 *
 * @param code - e.g. 'sotoodeh'
 * @returns the fit, or undefined for other codes
 * @example materialMobilityFit('sotoodeh')?.materialCode // → 'GaAs'
 */
export function materialMobilityFit(code: string): MaterialMobilityFit | undefined {
  return MATERIAL_MOBILITY_FITS.find((fit) => fit.code === code);
}

/**
 * The fits offered for a material, in display order (the first is its default).
 *
 * @param materialCode - e.g. 'GaAs'
 * @returns the fits whose parameters belong to that material (none for Si)
 * @example mobilityFitsFor('4H-SiC')[0].code // → 'roschke-schwierz'
 */
export function mobilityFitsFor(materialCode: string): readonly MaterialMobilityFit[] {
  return MATERIAL_MOBILITY_FITS.filter((fit) => fit.materialCode === materialCode);
}

function scaled(coefficient: ScaledCoefficient, reducedTemperature: number): number {
  return coefficient.exponent === 0 ? coefficient.value : coefficient.value * Math.pow(reducedTemperature, coefficient.exponent);
}

/**
 * Mobility from a material fit: the temperature-scaled Caughey–Thomas form.
 *
 * @param fit - a MATERIAL_MOBILITY_FITS entry
 * @param carrier - 'electron' or 'hole'
 * @param totalDensity - total impurity density N ≥ 0, cm⁻³
 * @param temperature - T > 0, K
 * @returns μ in cm²/(V·s)
 * @example materialFitMobility(materialMobilityFit('sotoodeh')!, 'electron', 0, 300) // ≈ 9400
 */
export function materialFitMobility(fit: MaterialMobilityFit, carrier: Carrier, totalDensity: number, temperature: number): number {
  const p = fit.parameters[carrier];
  const tn = temperature / MATERIAL_FIT_REFERENCE_TEMPERATURE;
  const minimum = scaled(p.minimum, tn);
  const maximum = scaled(p.maximum, tn);
  const referenceDensity = scaled(p.referenceDensity, tn);
  const alpha = scaled(p.alpha, tn);
  return minimum + (maximum - minimum) / (1 + Math.pow(totalDensity / referenceDensity, alpha));
}
