/**
 * Collinear, equally spaced four-point probe: current I through the outer
 * probes, voltage V across the inner ones, probe spacing s.
 *
 * - Semi-infinite bulk: ρ = 2π·s·V/I (Valdes 1954).
 * - Thin layer on an insulator (t ≪ s): Rs = (π/ln 2)·V/I, ρ = Rs·t.
 * - Finite thickness t, non-conducting bottom face: the exact image series.
 *   Both faces are insulating, so every probe has images of the same sign at
 *   depths ±2nt (n = 1, 2, …) and
 *     ρ = 2π·s·(V/I) / G(t/s),
 *     G(t/s) = 1 + 4·Σₙ [ 1/√(1 + (2n·t/s)²) − 1/√(4 + (2n·t/s)²) ],
 *   Valdes' divisor G7(w/s). Smits' thin-slice factor is F(t/s) = (2 ln 2)/((t/s)·G),
 *   with ρ = (π/ln 2)·t·(V/I)·F.
 * - Finite diameter d of a thin circular slice, probes along a diameter at its
 *   centre (Smits 1958): an insulating circular edge mirrors each probe at
 *   R²/x with the same sign (R = d/2), which gives the closed form
 *     Rs = C(d/s)·V/I,  C(d/s) = π / (ln 2 + ln(((d/s)² + 3)/((d/s)² − 3))),
 *   defined while the outer probes are inside the slice (d/s > 3).
 */
import { PhysicsDomainError } from '../errors';
import { CM_PER_UM } from '../geometry';

/** Thin-layer factor π/ln 2 ≈ 4.532 of an infinite sheet (Smits 1958; exact for the image method). */
export const THIN_LAYER_FACTOR = Math.PI / Math.LN2;

/**
 * Below this t/s the thickness factor F equals 1 to double precision: its
 * deviation is of order K0(π·s/t) (Fourier form of the same series), and
 * K0(10π) ≈ 5e-15.
 */
const THIN_LIMIT_RATIO = 0.1;

/**
 * The image series is summed term by term until 2n·t/s reaches this value;
 * the rest is the midpoint-rule integral plus its first Euler–Maclaurin
 * correction, whose error falls as (2n·t/s)⁻⁵ (relative error < 1e-12 here).
 */
const DIRECT_TERMS_UNTIL = 400;

/** Smallest d/s at which the outer probes are still on a circular slice. */
export const MINIMUM_DIAMETER_RATIO = 3;

/** One image term 1/√(1 + (a·x)²) − 1/√(4 + (a·x)²), a = 2t/s, x = n. */
function imageTerm(a: number, x: number): number {
  const ax = a * x;
  return 1 / Math.sqrt(1 + ax * ax) - 1 / Math.sqrt(4 + ax * ax);
}

/** d/dx of imageTerm. */
function imageTermSlope(a: number, x: number): number {
  const ax = a * x;
  return -a * ax * (1 / (1 + ax * ax) ** 1.5 - 1 / (4 + ax * ax) ** 1.5);
}

/** ∫ₓ^∞ imageTerm dx = (ln 2 − asinh(a·X) + asinh(a·X/2)) / a. */
function imageTail(a: number, from: number): number {
  return (Math.LN2 - Math.asinh(a * from) + Math.asinh((a * from) / 2)) / a;
}

function checkRatio(name: string, ratio: number): void {
  if (!(ratio > 0) || !Number.isFinite(ratio)) {
    throw new PhysicsDomainError(`${name} ${ratio} is not allowed: it must be a finite number greater than 0`);
  }
}

/**
 * Valdes' divisor G7(t/s) for a slice of thickness t on a non-conducting
 * bottom, from the exact image series: ρ = 2π·s·(V/I) / G.
 *
 * @param thicknessOverSpacing - t/s, > 0
 * @returns G (→ 1 for thick samples, → 2 ln 2·s/t for thin ones)
 * @example valdesDivisor(1) // ≈ 1.504 (Valdes 1954 table, from memory)
 */
export function valdesDivisor(thicknessOverSpacing: number): number {
  checkRatio('thickness/spacing', thicknessOverSpacing);
  if (thicknessOverSpacing < THIN_LIMIT_RATIO) return (2 * Math.LN2) / thicknessOverSpacing;
  const a = 2 * thicknessOverSpacing;
  const terms = Math.ceil(DIRECT_TERMS_UNTIL / a);
  let sum = 0;
  // Smallest terms first, for rounding.
  for (let n = terms; n >= 1; n--) sum += imageTerm(a, n);
  const from = terms + 0.5;
  sum += imageTail(a, from) - imageTermSlope(a, from) / 24;
  return 1 + 4 * sum;
}

/**
 * Smits' thickness factor F(t/s) ≤ 1 of a thin slice: ρ = (π/ln 2)·t·(V/I)·F.
 *
 * @param thicknessOverSpacing - t/s, > 0
 * @returns F, 1 for t/s → 0
 * @example thicknessFactor(1) // ≈ 0.9215 (Smits 1958 tabulates 0.9214, from memory)
 */
export function thicknessFactor(thicknessOverSpacing: number): number {
  checkRatio('thickness/spacing', thicknessOverSpacing);
  if (thicknessOverSpacing < THIN_LIMIT_RATIO) return 1;
  return (2 * Math.LN2) / (thicknessOverSpacing * valdesDivisor(thicknessOverSpacing));
}

/**
 * Smits' C(d/s) of a thin circular slice measured at its centre: Rs = C·V/I.
 *
 * @param diameterOverSpacing - d/s, ≥ 3 (outer probes on the slice)
 * @returns C, rising to π/ln 2 ≈ 4.532 for d/s → ∞
 * @throws PhysicsDomainError for d/s < 3
 * @example circularSliceFactor(10) // ≈ 4.171 (Smits 1958 table, from memory)
 */
export function circularSliceFactor(diameterOverSpacing: number): number {
  checkRatio('diameter/spacing', diameterOverSpacing);
  if (diameterOverSpacing < MINIMUM_DIAMETER_RATIO) {
    throw new PhysicsDomainError(
      `diameter/spacing ${diameterOverSpacing} is not allowed: the outer probes (at 1.5 spacings from the centre) ` +
        `must lie on the slice, so the diameter must be at least ${MINIMUM_DIAMETER_RATIO} probe spacings`,
    );
  }
  const u2 = diameterOverSpacing * diameterOverSpacing;
  // ln((u²+3)/(u²−3)) written with log1p: it is small for large slices.
  return Math.PI / (Math.LN2 + Math.log1p(6 / (u2 - 3)));
}

function checkReading(voltage: number, current: number): number {
  if (!Number.isFinite(voltage) || !Number.isFinite(current) || current === 0) {
    throw new PhysicsDomainError(`current ${current} A is not allowed: it must be a finite number other than 0`);
  }
  const ratio = voltage / current;
  if (!(ratio > 0)) {
    throw new PhysicsDomainError(
      `voltage ${voltage} V and current ${current} A give V/I = ${ratio} Ω; V/I must be > 0 (voltage and ` +
        `current of the same sign, voltage not 0)`,
    );
  }
  return ratio;
}

function checkLength(name: string, value: number): void {
  if (!(value > 0) || !Number.isFinite(value)) {
    throw new PhysicsDomainError(`${name} ${value} µm is not allowed: it must be a finite number greater than 0`);
  }
}

/** Geometry of a four-point-probe reading; lengths in µm. */
export interface ProbeGeometry {
  readonly spacingUm: number;
  /** Blank (undefined) means a semi-infinite sample. */
  readonly thicknessUm?: number;
  /** Blank means an unbounded slice; needs thicknessUm (the disc correction is a thin-slice result). */
  readonly diameterUm?: number;
}

/**
 * Resistivity from a collinear equal-spacing four-point probe.
 *
 * Semi-infinite (no thickness): ρ = 2π·s·V/I. With thickness: ρ = 2π·s·(V/I)/G(t/s),
 * the exact image series for a non-conducting bottom. With a diameter as well:
 * ρ = (V/I)·t·C(d/s)·F(t/s), Smits' product of the disc and thickness factors,
 * exact when either correction is 1 and otherwise an approximation that holds
 * best for thin slices (t/s ≲ 1).
 *
 * @param voltage - V across the inner probes, V
 * @param current - I through the outer probes, A (same sign as V)
 * @param geometry - spacing, optional thickness and diameter, µm
 * @returns ρ in Ω·cm
 * @example fourPointResistivity(1e-3, 1e-3, { spacingUm: 1000 }) // ≈ 0.628 Ω·cm (2π·0.1 cm·1 Ω)
 */
export function fourPointResistivity(voltage: number, current: number, geometry: ProbeGeometry): number {
  const resistance = checkReading(voltage, current);
  const { spacingUm, thicknessUm, diameterUm } = geometry;
  checkLength('spacing', spacingUm);
  const spacingCm = spacingUm * CM_PER_UM;
  if (thicknessUm === undefined) {
    if (diameterUm !== undefined) {
      throw new PhysicsDomainError(
        'a diameter correction needs the slice thickness: the circular-slice factor (Smits 1958) holds for ' +
          'thin slices, not for semi-infinite samples',
      );
    }
    return 2 * Math.PI * spacingCm * resistance;
  }
  checkLength('thickness', thicknessUm);
  const ratio = thicknessUm / spacingUm;
  if (diameterUm === undefined) return (2 * Math.PI * spacingCm * resistance) / valdesDivisor(ratio);
  checkLength('diameter', diameterUm);
  return resistance * thicknessUm * CM_PER_UM * circularSliceFactor(diameterUm / spacingUm) * thicknessFactor(ratio);
}

/**
 * Sheet resistance of a thin layer from a four-point probe: Rs = (π/ln 2)·V/I,
 * times C(d/s)/(π/ln 2) for a circular slice of diameter d.
 *
 * @param voltage - V, inner probes
 * @param current - I, outer probes, A
 * @param spacingUm - probe spacing s in µm (needed only with a diameter)
 * @param diameterUm - slice diameter in µm, or undefined for an unbounded layer
 * @returns Rs in Ω/sq
 * @example fourPointSheetResistance(1, 1e-3) // ≈ 4532 Ω/sq
 */
export function fourPointSheetResistance(voltage: number, current: number, spacingUm?: number, diameterUm?: number): number {
  const resistance = checkReading(voltage, current);
  if (diameterUm === undefined) {
    if (spacingUm !== undefined) checkLength('spacing', spacingUm);
    return THIN_LAYER_FACTOR * resistance;
  }
  if (spacingUm === undefined) {
    throw new PhysicsDomainError('a diameter correction needs the probe spacing: give spacing_um together with diameter_um');
  }
  checkLength('spacing', spacingUm);
  checkLength('diameter', diameterUm);
  return circularSliceFactor(diameterUm / spacingUm) * resistance;
}
