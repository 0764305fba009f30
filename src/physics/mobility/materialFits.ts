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
 * live in one file per material (their shape in fitTypes.ts); this module holds
 * the form and the list, and registry.ts makes each fit a model entry.
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
import type { MaterialMobilityFit, ScaledCoefficient } from './fitTypes';
import { GERMANIUM_HILSUM_FIT } from './germaniumHilsum';
import { GALLIUM_ARSENIDE_SOTOODEH_FIT } from './galliumArsenideSotoodeh';
import { SILICON_CARBIDE_4H_ROSCHKE_SCHWIERZ_FIT } from './siliconCarbide4HRoschkeSchwierz';

export type { MaterialMobilityFit, ScaledCaugheyThomasParameters, ScaledCoefficient } from './fitTypes';

/** Reference temperature of the reduced temperature Tn, K. */
export const MATERIAL_FIT_REFERENCE_TEMPERATURE = 300;

/** Every non-silicon mobility fit, in registry order (registry.ts makes each a model entry). */
export const MATERIAL_MOBILITY_FITS: readonly MaterialMobilityFit[] = [
  GERMANIUM_HILSUM_FIT,
  GALLIUM_ARSENIDE_SOTOODEH_FIT,
  SILICON_CARBIDE_4H_ROSCHKE_SCHWIERZ_FIT,
];

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
 * @example materialFitMobility(MATERIAL_MOBILITY_FITS.find((fit) => fit.code === 'sotoodeh')!, 'electron', 0, 300) // ≈ 9400
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
