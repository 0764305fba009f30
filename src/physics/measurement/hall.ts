/**
 * Single-carrier Hall analysis (common practice, no source): for one dominant
 * carrier type of density n and charge ±q, the Hall coefficient is
 * R_H = ±r_H/(q·n), negative for electrons and positive for holes, where r_H is
 * the Hall scattering factor (⟨τ²⟩/⟨τ⟩²; about 1.1–1.2 for lattice scattering
 * in silicon, from memory, and 1 in the high-field limit). Hence
 *
 *   n = r_H/(q·R_H)  (signed: < 0 electrons, > 0 holes),
 *   μ_H = |R_H|/ρ (Hall mobility),  μ = μ_H/r_H (drift mobility).
 *
 * Mixed conduction (electrons and holes both contributing) is outside this
 * model: R_H then depends on both densities and mobilities.
 */
import { ELEMENTARY_CHARGE } from '../constants';
import { PhysicsDomainError } from '../errors';

function checkHallCoefficient(value: number): void {
  if (!Number.isFinite(value) || value === 0) {
    throw new PhysicsDomainError(
      `hall coefficient ${value} cm³/C is not allowed: it must be a finite ` + `number other than 0 (its sign gives the carrier type)`,
    );
  }
}

function checkHallFactor(value: number): void {
  if (!(value > 0) || !Number.isFinite(value)) {
    throw new PhysicsDomainError(`hall factor ${value} is not allowed: it must be a finite number greater than 0`);
  }
}

/**
 * Carrier density from the Hall coefficient, signed by carrier type.
 *
 * @param hallCoefficient - R_H in cm³/C (negative for n-type)
 * @param hallFactor - Hall scattering factor r_H, > 0 (1 if unknown)
 * @returns r_H/(q·R_H) in cm⁻³: negative = electrons (n-type), positive = holes (p-type)
 * @example hallDensity(-624.15) // ≈ −1e16 cm⁻³: n-type
 */
export function hallDensity(hallCoefficient: number, hallFactor = 1): number {
  checkHallCoefficient(hallCoefficient);
  checkHallFactor(hallFactor);
  return representable(
    hallFactor / (ELEMENTARY_CHARGE * hallCoefficient),
    Math.log10(hallFactor) - Math.log10(ELEMENTARY_CHARGE) - Math.log10(Math.abs(hallCoefficient)),
    Math.sign(hallCoefficient),
    'carrier density',
    'cm⁻³',
  );
}

/**
 * A quotient of finite nonzero inputs is never truly 0 or infinite. When the
 * double is (an intermediate product overflowed or the result is out of the
 * double range), the magnitude is taken from logarithms instead: a value
 * inside the range is returned from them, one outside is an error stating it.
 *
 * @param value - the quotient as computed
 * @param log10Magnitude - log10 of its true absolute value
 * @param sign - its true sign (±1)
 */
function representable(value: number, log10Magnitude: number, sign: number, what: string, unit: string): number {
  if (value !== 0 && Number.isFinite(value)) return value;
  const fromLogs = sign * 10 ** log10Magnitude;
  if (fromLogs !== 0 && Number.isFinite(fromLogs)) return fromLogs;
  const magnitude = `about 1e${Math.round(log10Magnitude)} ${unit}`;
  const limit = fromLogs === 0 ? 'smaller than 5e-324, the smallest number above 0' : 'larger than 1.8e308, the largest number';
  throw new PhysicsDomainError(
    `the ${what} for these arguments is ${magnitude}, ${limit} a spreadsheet can ` +
      `hold; check the units of the Hall coefficient (cm³/C) and the other arguments`,
  );
}

/**
 * Drift mobility from the Hall coefficient and resistivity, μ = |R_H|/(ρ·r_H).
 *
 * @param hallCoefficient - R_H in cm³/C, either sign
 * @param resistivity - ρ in Ω·cm, > 0
 * @param hallFactor - r_H, > 0; 1 gives the Hall mobility |R_H|/ρ itself
 * @returns mobility in cm²/(V·s)
 * @example hallMobility(-624.15, 0.5) // ≈ 1248 cm²/(V·s)
 */
export function hallMobility(hallCoefficient: number, resistivity: number, hallFactor = 1): number {
  checkHallCoefficient(hallCoefficient);
  checkHallFactor(hallFactor);
  if (!(resistivity > 0) || !Number.isFinite(resistivity)) {
    throw new PhysicsDomainError(`resistivity ${resistivity} Ω·cm is not allowed: it must be a finite number greater than 0`);
  }
  return representable(
    Math.abs(hallCoefficient) / (resistivity * hallFactor),
    Math.log10(Math.abs(hallCoefficient)) - Math.log10(resistivity) - Math.log10(hallFactor),
    1,
    'mobility',
    'cm²/(V·s)',
  );
}
