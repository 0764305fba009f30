import { ARORA_FITTED_TEMPERATURES, SILICON, TCR_RELATIVE_STEP, resistivityTemperatureCoefficient, type Sample } from '../../physics';
import { TEMPERATURE_RANGE_K, dopant, doping, material, resistivityModel, sampleOf, temperature } from '../common';
import { elementwise } from '../types';
import { RESISTIVITY_MODELS } from '../citedModels';
import { prose } from '../../text/prose';

/** ppm per unit. */
const PPM = 1e6;

/** The outer difference step as a percentage of T, for the help text. */
const STEP_PERCENT = TCR_RELATIVE_STEP * 100;

/** TCR of uncompensated Si at 300 K with the default model, ppm/K, rounded for the help text. */
function ppm(dopantCode: string, density: number): string {
  const sample: Sample = sampleOf(SILICON, 300, dopantCode, density, 0);
  const value = PPM * resistivityTemperatureCoefficient(sample, undefined, TEMPERATURE_RANGE_K);
  const rounded = Number(value.toPrecision(2));
  return rounded > 0 ? `+${rounded}` : `−${Math.abs(rounded)}`;
}

export const TCR = elementwise({
  name: 'TCR',
  summary: 'Temperature coefficient of resistivity (1/ρ)·dρ/dT, in ppm/K.',
  help: prose`Returns (1/ρ)·dρ/dT of the resistivity DRIFT.RESISTIVITY gives (same carrier densities,
    ionization and mobility model), in ppm/K.

    The derivative is numerical but accurate: Richardson-extrapolated central differences of ln ρ with steps
    of ${STEP_PERCENT} % and ${STEP_PERCENT / 2} % of T, far above the solver's rounding, so the truncation
    error is below about 1e-6 of the result and sweeps over temperature are smooth. Within ${STEP_PERCENT} %
    of the ends of the temperature range (${TEMPERATURE_RANGE_K.min} and ${TEMPERATURE_RANGE_K.max} K) a
    one-sided stencil of the same order is used, so no temperature outside the range is evaluated.

    Sign in Si at 300 K with the default model: positive when lightly doped (lattice scattering lowers the
    mobility as T rises): ${ppm('P', 1e15)} ppm/K at 1e15 cm⁻³ P, ${ppm('B', 1e16)} at 1e16 and
    ${ppm('B', 1e17)} at 1e17 cm⁻³ B; slightly negative in a band near 1e18 cm⁻³, where the ionized share of
    the dopants still grows with T (${ppm('B', 1e18)} at 1e18 and ${ppm('B', 2e18)} at 2e18 cm⁻³ B,
    ${ppm('P', 1e18)} at 1e18 cm⁻³ P); positive again in degenerate material (${ppm('B', 1e19)} at 1e19 and
    ${ppm('B', 1e20)} at 1e20 cm⁻³ B). It turns negative in freeze-out and in the intrinsic regime (ni grows),
    e.g. at 1e14–1e15 cm⁻³ below about 60–80 K and above about 430–500 K.

    Evidence for the sign: the positive TCR of heavily doped Si resistors below the intrinsic temperature (Kim
    et al. 1999) and the shape of ρ(T) in 1e18–1e20 cm⁻³ Si — a maximum at low temperature, strongest at the
    lowest doping and fading out as doping rises, with dρ/dT > 0 below it (Chapman et al. 1963) — are
    reproduced (read in those papers' abstracts), and at 1e16 cm⁻³ P the ratios ρ(0 °C)/ρ(25 °C) and ρ(100
    °C)/ρ(25 °C) agree with a textbook's chart-read mobilities within their reading accuracy of about 8 %
    (checks in tests/physics/reference). No published ρ(T) table near 1e18 cm⁻³ (such as Li and Thurber's NBS
    measurements) could be checked, so the small negative values near 1e18 cm⁻³ are unverified against data:
    treat the sign there as uncertain, and the magnitude everywhere as an estimate. The validity is that of
    the resistivity model (see DRIFT.MODELS; e.g. Arora's temperature dependence is fitted over
    ${ARORA_FITTED_TEMPERATURES.min}–${ARORA_FITTED_TEMPERATURES.max} K and extrapolated outside). 'astm-f723'
    is a 290–305 K conversion without temperature dependence and is refused.`,
  result: { unit: 'ppm/K', description: 'Temperature coefficient of resistivity' },
  parameters: [doping, dopant, temperature, resistivityModel, material] as const,
  examples: [
    { formula: '=DRIFT.TCR(1e15,"phosphorus")', note: 'lightly doped n-type Si at 300 K (positive)' },
    { formula: '=DRIFT.TCR(1e15,"B",A2:A40)', note: 'a temperature sweep' },
    { formula: '=DRIFT.TCR(1e18,"As",300,"arora")', note: 'with the Arora model' },
  ],
  models: RESISTIVITY_MODELS,
  compute: (density, dopantCode, temperatureK, model, materialValue) =>
    PPM * resistivityTemperatureCoefficient(sampleOf(materialValue, temperatureK, dopantCode, density, 0), model, TEMPERATURE_RANGE_K),
});
