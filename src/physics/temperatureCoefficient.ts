/**
 * Temperature coefficient of resistivity, TCR = (1/ρ)·dρ/dT = d ln ρ / dT.
 *
 * ρ(T) comes from a neutrality solve (η to 1e-15) and the mobility models, so
 * an analytic derivative would need implicit differentiation of the solver
 * and of every model behind it. Instead d ln ρ/dT is taken numerically, by
 * Richardson extrapolation of central differences with steps proportional to
 * T, far above the solver's noise:
 *
 *   D(h) = (g(T + h) − g(T − h)) / 2h,   R = (4·D(h/2) − D(h)) / 3,   g = ln ρ,
 *
 * |R − g'| ≤ h⁴·max|g⁽⁵⁾|/480 + 3δ/h, δ the absolute error of g. With
 * h = T/100: for g = a·ln T (power-law mobility) the truncation term is
 * a·1e-8/(20·T), 5e-10 of |g'|; for g = θ/T (activation) it is 2.5e-9 of |g'|;
 * the intrinsic onset varies on a scale of about T/15, giving about 1e-6 of
 * |g'|. With δ ≤ 1e-14 the noise term is ≤ 3e-12/T per K. Within h of the
 * ends of the allowed temperature range the central stencil does not fit, so a
 * one-sided five-point stencil of the same order is used (step h/2, error
 * ≤ (h/2)⁴·max|g⁽⁵⁾|/5 + 22δ/h, 1.5e-8 of |g'| for g = θ/T); it differs
 * from the central value by that small truncation error, so sweeps stay
 * smooth across the switch.
 * (Numerical differentiation: common practice, no source.)
 */
import type { Sample } from './sample';
import { PhysicsDomainError } from './errors';
import { ASTM_F723_CODE, resistivity, resolveResistivityModel } from './transport';

/** Step of the outer central difference as a fraction of T (see the error bound above). */
export const TCR_RELATIVE_STEP = 0.01;

/** Temperatures a stencil may touch, K. */
export interface TemperatureBounds {
  readonly min: number;
  readonly max: number;
}

/**
 * Derivative of a smooth function of temperature: Richardson-extrapolated
 * central differences, or a five-point one-sided stencil within one step of
 * the bounds. No point outside [bounds.min, bounds.max] is evaluated.
 *
 * @param g - the function, evaluated only inside bounds
 * @param temperature - T, K, inside bounds
 * @param bounds - temperatures g may be evaluated at, K
 * @param relativeStep - h/T of the outer central difference
 * @returns dg/dT at T
 * @throws PhysicsDomainError if T is outside bounds or the bounds are narrower than the stencil
 * @example temperatureDerivative((t) => Math.log(t), 300, { min: 20, max: 1000 }) // ≈ 0.0033333 (1/300)
 */
export function temperatureDerivative(
  g: (temperature: number) => number,
  temperature: number,
  bounds: TemperatureBounds,
  relativeStep = TCR_RELATIVE_STEP,
): number {
  if (!(temperature >= bounds.min && temperature <= bounds.max)) {
    throw new PhysicsDomainError(`temperature ${temperature} K is outside ${bounds.min}–${bounds.max} K`);
  }
  const h = relativeStep * temperature;
  if (temperature - h >= bounds.min && temperature + h <= bounds.max) {
    const central = (step: number): number => (g(temperature + step) - g(temperature - step)) / (2 * step);
    return (4 * central(h / 2) - central(h)) / 3;
  }
  // One-sided toward the interior: f'(x) ≈ (−25f0 + 48f1 − 36f2 + 16f3 − 3f4)/(12s), error O(s⁴).
  const direction = temperature - h < bounds.min ? 1 : -1;
  const s = (direction * h) / 2;
  if (temperature + 4 * s < bounds.min || temperature + 4 * s > bounds.max) {
    throw new PhysicsDomainError(
      `the temperature range ${bounds.min}–${bounds.max} K is too narrow for a derivative at ${temperature} K ` +
        `(the stencil needs ${Math.abs(4 * s)} K on one side)`,
    );
  }
  const f = (k: number): number => g(temperature + k * s);
  return (-25 * f(0) + 48 * f(1) - 36 * f(2) + 16 * f(3) - 3 * f(4)) / (12 * s);
}

/**
 * Temperature coefficient of resistivity (1/ρ)·dρ/dT at the sample's
 * temperature, from the resistivity model (see the module comment for the
 * method and its error bound).
 *
 * @param sample - the sample; sample.temperature is where the TCR is wanted
 * @param model - resistivity model code (default: the material's default mobility model); not 'astm-f723'
 * @param bounds - temperatures ρ may be evaluated at (default: the material's temperature domain);
 *   the catalog passes its own 20–1000 K
 * @returns TCR in 1/K (multiply by 1e6 for ppm/K)
 * @throws PhysicsDomainError for 'astm-f723' (no temperature dependence) or where ρ is not defined
 * @example resistivityTemperatureCoefficient(phosphorus1e15At300K) // ≈ +7.3e-3 /K
 */
export function resistivityTemperatureCoefficient(sample: Sample, model?: string, bounds?: TemperatureBounds): number {
  const code = resolveResistivityModel(model, sample.material);
  if (code === ASTM_F723_CODE) {
    throw new PhysicsDomainError(
      `'astm-f723' is a conversion at 290–305 K with no temperature dependence, so it has no temperature coefficient; ` +
        `use a mobility-based resistivity model`,
    );
  }
  const domain = sample.material.temperatureDomain;
  const range: TemperatureBounds = {
    min: Math.max(domain.min, bounds?.min ?? domain.min),
    max: Math.min(domain.max, bounds?.max ?? domain.max),
  };
  const logResistivity = (temperature: number): number => Math.log(resistivity({ ...sample, temperature }, code));
  return temperatureDerivative(logResistivity, sample.temperature, range);
}
