/**
 * Resistivity measured at one temperature, converted to another (by default
 * 23 °C = 296.15 K, where certificates and ASTM F723 state resistivity): the
 * reading is inverted to a dopant density at the measurement temperature and
 * the resistivity of that density is evaluated at the target temperature,
 *
 *   N* : ρ(N*, T_measured) = ρ_measured,   ρ_target = ρ(N*, T_target).
 *
 * To first order in ΔT this is ρ·(1 + TCR·ΔT), the usual four-point-probe
 * correction, but it stays right where the TCR itself changes with T.
 *
 * One forward model for both steps. Both steps use the same forward ρ(N, T),
 * so converting to the measurement temperature returns the reading (exactly:
 * equal temperatures short-circuit; otherwise the round trip closes to the
 * inverse's ~1e-9). Silicon's default 'f723-anchored' is anchored to F723's
 * ρ-from-N equation in one direction and to its N-from-ρ equation in the
 * other (f723Anchored.ts), which disagree by up to 3–4.5 %; inverting one and
 * evaluating the other would move a reading by that much even at ΔT = 0. So
 * for 'f723-anchored' (and a blank model) the conversion uses the physics
 * model it is built on (the material's default mobility model, Masetti in
 * silicon). Its anchor factor k(N) does not depend on temperature, so at a
 * given density the ratio ρ(T_target)/ρ(T_measured) is the anchored model's
 * own; only the density N* it is taken at is the physics' rather than F723's,
 * and the ratio varies slowly with N (the TCR changes by a few percent of
 * itself across the 3–4.5 % density difference), far below a reading's ~1 %.
 * Other models are used for both steps as named; 'astm-f723' has no
 * temperature dependence and is refused.
 */
import type { Sample } from './sample';
import { PhysicsDomainError } from './errors';
import { dopingForResistivity, type DensityWindow, type DensityWindowNames } from './inverse';
import { ASTM_F723_CODE, F723_ANCHORED_CODE, resistivity, resolveResistivityModel } from './transport';
import { F723_ANCHOR_TEMPERATURE } from './f723Anchored';
import { defaultMobilityModel } from './mobility';

/** The temperature certificates state resistivity at: 23 °C, K. */
export const CERTIFICATE_TEMPERATURE = F723_ANCHOR_TEMPERATURE;

/**
 * The forward model a temperature conversion uses for both of its steps
 * (module note): the physics model under 'f723-anchored', the model itself otherwise.
 *
 * @param model - resistivity model code (blank: the material's default)
 * @param sample - only its material is used
 * @returns the model code used for the inversion and the evaluation
 * @throws PhysicsDomainError for 'astm-f723' or an unknown model
 * @example conversionModel(undefined, boron1e16At300K) // → 'masetti'
 */
export function conversionModel(model: string | undefined, sample: Pick<Sample, 'material'>): string {
  const code = resolveResistivityModel(model, sample.material);
  if (code === ASTM_F723_CODE) {
    throw new PhysicsDomainError(
      `'astm-f723' is a conversion at 290–305 K with no temperature dependence, so it cannot move a resistivity to another temperature; ` +
        `use a mobility-based resistivity model (blank: ${defaultMobilityModel(sample.material)} with the ` +
        `default model's temperature dependence)`,
    );
  }
  return code === F723_ANCHORED_CODE ? defaultMobilityModel(sample.material) : code;
}

/**
 * Converts a resistivity measured at one temperature to another temperature,
 * for a sample of known dopant (and counter-doping).
 *
 * @param measured - resistivity read at measuredTemperature, Ω·cm (finite, > 0)
 * @param sample - material, dopant and counterDensity; sample.temperature is the measurement temperature, K
 * @param targetTemperature - temperature to convert to, K (default 296.15 K = 23 °C)
 * @param model - resistivity model code (blank/'f723-anchored': the physics model, see the module note; not 'astm-f723')
 * @param window - optional density window, cm⁻³, choosing one where several densities give the reading
 * @param names - how messages name the window's ends
 * @returns the resistivity at targetTemperature, Ω·cm
 * @throws AmbiguousDopingError when several densities give the reading at the measurement temperature
 *   (the message lists them; a window picks one); PhysicsDomainError for an unreachable reading or a bad model
 * @example
 * const measured = { material: SILICON, temperature: 298.15, dopant: boron, counterDensity: 0 };
 * resistivityAtTemperature(10.2, measured) // ≈ 10.06 Ω·cm at 23 °C
 */
export function resistivityAtTemperature(
  measured: number,
  sample: Omit<Sample, 'density'>,
  targetTemperature: number = CERTIFICATE_TEMPERATURE,
  model?: string,
  window: DensityWindow = {},
  names?: DensityWindowNames,
): number {
  const code = conversionModel(model, sample);
  const { density } = dopingForResistivity(measured, sample, code, window, names);
  // Same temperature: the reading itself, not the round trip's last digits.
  if (targetTemperature === sample.temperature) return measured;
  return resistivity({ ...sample, temperature: targetTemperature, density }, code);
}
