/**
 * Field dependence of the drift velocity after D. M. Caughey, R. E. Thomas,
 * "Carrier mobilities in silicon empirically related to doping and field",
 * Proc. IEEE 55, 2192 (1967):
 *
 *   v(E) = μ0·E / (1 + (μ0·|E| / v_sat)^β)^(1/β)
 *
 * μ0 is the low-field mobility, v_sat the saturation velocity, β the field
 * exponent. v → μ0·E as E → 0 and → v_sat·sign(E) as |E| → ∞; the curve is
 * monotone, so it cannot show a velocity peak (negative differential mobility).
 */
import { PhysicsDomainError } from '../errors';
import { parameterText as t } from '../parameterText';

/** Caughey & Thomas (1967) silicon field exponents at 300 K (from memory), used where a material has no fitted β. */
export const CAUGHEY_THOMAS_FIELD_EXPONENTS = { electron: 2, hole: 1 } as const;

/** Citation of the velocity–field form, for the model registry; the exponents written from the table above. */
export const CAUGHEY_THOMAS_FIELD_SOURCE = {
  citation:
    'D. M. Caughey, R. E. Thomas, Proc. IEEE 55, 2192 (1967): v = μ0E/(1 + (μ0E/v_sat)^β)^(1/β); ' +
    `β = ${t(CAUGHEY_THOMAS_FIELD_EXPONENTS.electron)} for electrons, ` +
    `${t(CAUGHEY_THOMAS_FIELD_EXPONENTS.hole)} for holes in Si at 300 K (from memory)`,
  validity: 'fitted to silicon at 300 K; used with material- and temperature-dependent μ0, v_sat and β from the tables of each material',
} as const;

/**
 * Caughey–Thomas drift velocity for a given low-field mobility.
 *
 * Written so that no intermediate overflows: for x = μ0|E|/v_sat ≤ 1 it is
 * μ0·|E|·(1 + x^β)^(−1/β), which is exactly μ0·|E| once x^β is below double
 * precision; above, v_sat·(1 + x^−β)^(−1/β).
 *
 * @param field - E, V/cm (sign gives the direction)
 * @param lowFieldMobility - μ0 > 0, cm²/(V·s)
 * @param saturationVelocity - v_sat > 0, cm/s
 * @param fieldExponent - β > 0
 * @returns v in cm/s, with the sign of E
 * @throws PhysicsDomainError for non-positive or non-finite μ0, v_sat, β or a non-finite field
 * @example caugheyThomasVelocity(1e4, 1400, 1.07e7, 1.109) // ≈ 6.5e6 cm/s
 */
export function caugheyThomasVelocity(field: number, lowFieldMobility: number, saturationVelocity: number, fieldExponent: number): number {
  for (const [name, value] of [
    ['low-field mobility', lowFieldMobility],
    ['saturation velocity', saturationVelocity],
    ['field exponent β', fieldExponent],
  ] as const) {
    if (!(value > 0) || !Number.isFinite(value)) {
      throw new PhysicsDomainError(`the ${name} must be a finite number > 0 for the Caughey–Thomas velocity; got ${value}`);
    }
  }
  if (!Number.isFinite(field)) throw new PhysicsDomainError(`the field must be a finite number in V/cm; got ${field}`);
  if (field === 0) return 0;
  const ohmicVelocity = lowFieldMobility * Math.abs(field);
  const x = ohmicVelocity / saturationVelocity;
  const speed =
    x <= 1
      ? ohmicVelocity * Math.exp(-Math.log1p(Math.pow(x, fieldExponent)) / fieldExponent)
      : saturationVelocity * Math.exp(-Math.log1p(Math.pow(x, -fieldExponent)) / fieldExponent);
  return Math.sign(field) * speed;
}
