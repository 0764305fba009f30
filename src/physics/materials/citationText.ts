/**
 * The parameter values that band-gap, density-of-states and ni citations
 * quote, written from the tables themselves (parameterText) so that a
 * citation cannot disagree with the numbers the core computes with.
 */
import { exponentText, parameterText as t } from '../parameterText';
import type { DensityOfStatesModel, IntrinsicDensityFit, VarshniBandgap } from './types';

/**
 * Varshni constants as citations list them.
 *
 * @param gap - Eg0, α, β of a Varshni fit
 * @param gapDigits - significant digits of Eg0 as the source quotes it (1.170); omitted: shortest
 * @returns e.g. 'Eg0 = 1.170 eV, α = 4.73e-4 eV/K, β = 636 K'
 * @example varshniText({ gapAtZero: 3.265, alpha: 6.5e-4, beta: 1300 }) // → 'Eg0 = 3.265 eV, α = 6.5e-4 eV/K, β = 1300 K'
 */
export function varshniText(gap: Pick<VarshniBandgap, 'gapAtZero' | 'alpha' | 'beta'>, gapDigits?: number): string {
  return `Eg0 = ${t(gap.gapAtZero, gapDigits)} eV, α = ${t(gap.alpha)} eV/K, β = ${t(gap.beta)} K`;
}

/**
 * The value of one band's density of states at its reference temperature.
 *
 * @param band - a band of a DensityOfStatesModel
 * @param digits - significant digits as the source quotes it (3.10e19); omitted: shortest
 * @returns e.g. '2.86e19'
 */
export function densityOfStatesText(band: DensityOfStatesModel['conductionBand'], digits?: number): string {
  return t(band.valueAtReference, digits);
}

/**
 * The prefactor of a band's power law in absolute temperature, N(300 K)/300^x,
 * as sources quoting N = A·T^x give A.
 *
 * @param band - a band of a DensityOfStatesModel
 * @param digits - significant digits as the source quotes A
 * @returns e.g. '3.25e15·T^3/2'
 */
export function absolutePowerLawText(band: DensityOfStatesModel['conductionBand'], digits: number): string {
  const prefactor = band.valueAtReference / Math.pow(band.referenceTemperature, band.exponent);
  return `${t(prefactor, digits)}·T^${exponentText(band.exponent)}`;
}

/**
 * An ni fit's equation with its constants.
 *
 * @param fit - prefactor, reference temperature, exponent and activation temperature
 * @returns e.g. 'ni = 5.29e19·(T/300)^2.54·exp(−6726/T) cm⁻³'
 */
export function intrinsicFitText(
  fit: Pick<IntrinsicDensityFit, 'prefactor' | 'referenceTemperature' | 'exponent' | 'activationTemperature'>,
): string {
  return (
    `ni = ` +
    `${t(fit.prefactor)}·(T/${t(fit.referenceTemperature)})^${exponentText(fit.exponent)}·exp(−${t(fit.activationTemperature)}/T) ` +
    `cm⁻³`
  );
}
