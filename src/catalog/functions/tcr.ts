import { resistivityTemperatureCoefficient } from '../../physics';
import { TCR_RELATIVE_STEP } from '../../physics/temperatureCoefficient';
import { TEMPERATURE_RANGE_K, dopant, doping, material, resistivityModel, sampleOf, temperature } from '../common';
import { elementwise } from '../types';
import { RESISTIVITY_MODELS } from '../citedModels';

/** ppm per unit. */
const PPM = 1e6;

/** The outer difference step as a percentage of T, for the help text. */
const STEP_PERCENT = TCR_RELATIVE_STEP * 100;

export const TCR = elementwise({
  name: 'TCR',
  summary: 'Temperature coefficient of resistivity (1/ρ)·dρ/dT, in ppm/K.',
  help: `Returns (1/ρ)·dρ/dT of the resistivity DRIFT.RESISTIVITY gives (same carrier densities, ionization and mobility model), in ppm/K.

The derivative is numerical but accurate: Richardson-extrapolated central differences of ln ρ with steps of ${STEP_PERCENT} % and ${STEP_PERCENT / 2} % of T, far above the solver's rounding, so the truncation error is below about 1e-6 of the result and sweeps over temperature are smooth. Within ${STEP_PERCENT} % of the ends of the temperature range (${TEMPERATURE_RANGE_K.min} and ${TEMPERATURE_RANGE_K.max} K) a one-sided stencil of the same order is used, so no temperature outside the range is evaluated.

Lightly doped Si near room temperature has a positive TCR (lattice scattering lowers the mobility as T rises): about +7000 ppm/K at 1e15 cm⁻³ and 300 K. It turns negative in freeze-out (more carriers are ionized as T rises) and in the intrinsic regime (ni grows), e.g. at 1e14–1e15 cm⁻³ below about 60–80 K and above about 430–500 K. The validity is that of the resistivity model (see DRIFT.MODELS; e.g. Arora's temperature dependence is fitted over 250–500 K and extrapolated outside). 'astm-f723' is a 290–305 K conversion without temperature dependence and is refused.`,
  result: { unit: 'ppm/K', description: 'Temperature coefficient of resistivity' },
  parameters: [doping, dopant, temperature, resistivityModel, material] as const,
  examples: [
    { formula: '=DRIFT.TCR(1e15,"P")', note: 'lightly doped n-type Si at 300 K (positive)' },
    { formula: '=DRIFT.TCR(1e15,"B",A2:A40)', note: 'a temperature sweep' },
    { formula: '=DRIFT.TCR(1e18,"As",300,"arora")', note: 'with the Arora model' },
  ],
  models: RESISTIVITY_MODELS,
  compute: (density, dopantCode, temperatureK, model, materialValue) =>
    PPM *
    resistivityTemperatureCoefficient(
      sampleOf(materialValue, temperatureK, dopantCode, density, 0),
      model,
      TEMPERATURE_RANGE_K,
    ),
});
