/**
 * Van der Pauw sheet resistance (L. J. van der Pauw, Philips Res. Rep. 13, 1
 * (1958)): for a uniform layer of any shape without holes, contacts small and
 * on its edge, the two four-terminal resistances Ra, Rb satisfy
 *
 *   exp(−π·Ra/Rs) + exp(−π·Rb/Rs) = 1.
 *
 * Solved exactly: with Rsmall = min(Ra, Rb), r = max/min ≥ 1 and the unknown
 * x = π·Rsmall/Rs, the equation reads e^(−r·x) = 1 − e^(−x), or
 *
 *   h(x) = r·x + ln(1 − e^(−x)) = 0,
 *
 * with 1 − e^(−x) computed as −expm1(−x), so nothing cancels when the ratio is
 * large and x small. h rises monotonically in x. Jensen's inequality brackets
 * the root: Rs ≤ π·(Ra + Rb)/(2 ln 2) (equality for Ra = Rb) and Rs ≥ π·Rsmall/ln 2,
 * i.e. x ∈ [2 ln 2/(1 + r), ln 2], where h changes sign.
 */
import { PhysicsDomainError } from '../errors';
import { findRoot } from '../solve';

/**
 * Largest Ra/Rb (or Rb/Ra) accepted. Well-placed contacts on a uniform layer
 * give ratios near 1; beyond 1e3 the measurement is already doubtful, and
 * beyond this limit the readings cannot come from one uniform layer (and the
 * ratio may no longer be a finite number).
 */
export const MAX_RESISTANCE_RATIO = 1e12;

/** Relative widening of the bracket ends (see vanDerPauwSheetResistance). */
const BRACKET_WIDENING = 1e-9;

function checkResistance(name: string, value: number): void {
  if (!(value > 0) || !Number.isFinite(value)) {
    throw new PhysicsDomainError(`${name} ${value} Ω is not allowed: it must be a finite number greater than 0`);
  }
}

/**
 * Sheet resistance from the two van der Pauw resistances.
 *
 * @param resistanceA - Ra = V43/I12 (or any pair of adjacent-contact configurations), Ω, > 0
 * @param resistanceB - Rb = V14/I23, Ω, > 0
 * @returns Rs in Ω/sq; π·R/ln 2 when Ra = Rb = R
 * @example vanDerPauwSheetResistance(10, 10) // ≈ 45.32 Ω/sq
 */
export function vanDerPauwSheetResistance(resistanceA: number, resistanceB: number): number {
  checkResistance('r_a', resistanceA);
  checkResistance('r_b', resistanceB);
  const small = Math.min(resistanceA, resistanceB);
  const ratio = Math.max(resistanceA, resistanceB) / small;
  if (!(ratio <= MAX_RESISTANCE_RATIO)) {
    throw new PhysicsDomainError(
      `r_a/r_b = ${resistanceA}/${resistanceB} is too far from 1 for a van der Pauw measurement: the larger ` +
        `may be at most ${MAX_RESISTANCE_RATIO} times the smaller; check the contacts and readings`,
    );
  }
  if (ratio === 1) return (Math.PI * small) / Math.LN2;
  const h = (x: number) => ratio * x + Math.log(-Math.expm1(-x));
  // The Jensen bounds, widened by 1e-9 relative: for ratios within ~1e-10 of 1
  // the two ends nearly coincide and rounding could give h the same sign at both.
  const { root } = findRoot(h, ((2 * Math.LN2) / (1 + ratio)) * (1 - BRACKET_WIDENING), Math.LN2 * (1 + BRACKET_WIDENING), {
    xTolerance: 0,
  });
  return (Math.PI * small) / root;
}
