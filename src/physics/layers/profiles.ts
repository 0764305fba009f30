/**
 * Ideal dopant depth profiles of diffused and implanted layers, and their
 * metallurgical junctions (where the profile equals a uniform background of
 * the opposite type).
 *
 * Diffused layers, N(x) = Ns·f(x/L) with x from the surface:
 * - 'gaussian': f(u) = exp(−u²), the limited-source (drive-in) solution of
 *   Fick's second law, L = 2·sqrt(D·t); the default, because most diffused
 *   resistors, bases and wells end with a drive-in from a fixed dose.
 * - 'erfc': f(u) = erfc(u), the constant-surface-concentration
 *   (predeposition) solution, L = 2·sqrt(D·t).
 * Both are the profiles J. C. Irvin tabulated sheet conductance for (Bell
 * Syst. Tech. J. 41, 387 (1962)); the solutions of Fick's law are common
 * practice, no source.
 *
 * Implanted layers: the as-implanted Gaussian of range Rp and straggle ΔRp
 * (first two moments of the LSS range theory: J. Lindhard, M. Scharff,
 * H. E. Schiøtt, Mat. Fys. Medd. Dan. Vid. Selsk. 33, no. 14 (1963)),
 * N(x) = Φ/(sqrt(2π)·ΔRp)·exp(−(x − Rp)²/(2ΔRp²)), truncated at the surface:
 * the part of the Gaussian that would lie above x = 0 is lost (not reflected
 * into the silicon), so the retained dose is below Φ when Rp is not several
 * ΔRp deep (common practice, no source).
 *
 * Lengths here are in whatever unit the caller uses consistently (the layer
 * functions use µm).
 */
import { PhysicsDomainError } from '../errors';
import { erfc, erfcinv } from './specialFunctions';

/** Diffusion profile codes; the first is the default. */
export const PROFILE_CODES = ['gaussian', 'erfc'] as const;

/** A diffusion profile code. */
export type ProfileCode = (typeof PROFILE_CODES)[number];

/** The default diffusion profile. */
export const DEFAULT_PROFILE: ProfileCode = PROFILE_CODES[0];

/** The shape f(u) of each profile and the inverse u(f) = f⁻¹, for 0 < f ≤ 1. */
const PROFILE_SHAPES: Record<ProfileCode, { shape: (u: number) => number; inverse: (ratio: number) => number }> = {
  gaussian: { shape: (u) => Math.exp(-u * u), inverse: (ratio) => Math.sqrt(-Math.log(ratio)) },
  erfc: { shape: erfc, inverse: erfcinv },
};

/**
 * Parses a profile code, case-insensitively.
 *
 * @param code - 'gaussian' or 'erfc'; undefined or '' selects 'gaussian'
 * @returns the code
 * @throws PhysicsDomainError listing the allowed codes
 * @example resolveProfile('ERFC') // → 'erfc'
 */
export function resolveProfile(code?: string): ProfileCode {
  if (code === undefined || code.trim() === '') return DEFAULT_PROFILE;
  const normalized = code.trim().toLowerCase();
  const found = PROFILE_CODES.find((p) => p === normalized);
  if (found === undefined) {
    throw new PhysicsDomainError(`unknown profile '${code}'. Allowed: ${PROFILE_CODES.join(', ')}.`);
  }
  return found;
}

/** A diffused layer: surface concentration, characteristic length, profile. */
export interface DiffusedProfile {
  readonly profile: ProfileCode;
  /** Surface concentration Ns, cm⁻³. */
  readonly surfaceConcentration: number;
  /** Characteristic length L (2·sqrt(Dt)), length unit of the caller. */
  readonly characteristicLength: number;
}

/**
 * Dopant density of a diffused layer at depth x.
 *
 * @param layer - profile, Ns (cm⁻³) and L
 * @param depth - x ≥ 0, same unit as L
 * @returns N(x) = Ns·f(x/L), cm⁻³
 * @example diffusedDensity({ profile: 'gaussian', surfaceConcentration: 1e19, characteristicLength: 1 }, 1) // ≈ 3.679e18 (1e19/e)
 */
export function diffusedDensity(layer: DiffusedProfile, depth: number): number {
  return layer.surfaceConcentration * PROFILE_SHAPES[layer.profile].shape(depth / layer.characteristicLength);
}

function checkSurfaceAndBackground(surfaceConcentration: number, background: number): void {
  if (!(background > 0) || !Number.isFinite(background)) {
    throw new PhysicsDomainError(`background must be a finite density > 0 cm⁻³ (it defines the junction); got ${background}`);
  }
  if (!(surfaceConcentration > background) || !Number.isFinite(surfaceConcentration)) {
    throw new PhysicsDomainError(
      `surface concentration ${surfaceConcentration.toPrecision(4)} cm⁻³ must exceed the background ` +
        `${background.toPrecision(4)} cm⁻³: otherwise the layer never overcompensates it and there is no ` +
        `junction`,
    );
  }
}

function checkLength(name: string, value: number): void {
  if (!(value > 0) || !Number.isFinite(value)) {
    throw new PhysicsDomainError(`${name} must be a finite length > 0; got ${value}`);
  }
}

/**
 * Metallurgical junction depth of a diffused layer: N(xj) = background.
 * Gaussian: xj = L·sqrt(ln(Ns/NB)); erfc: xj = L·erfcinv(NB/Ns).
 *
 * @param profile - 'gaussian' or 'erfc'
 * @param surfaceConcentration - Ns, cm⁻³, > background
 * @param characteristicLength - L > 0 (any length unit; xj comes back in it)
 * @param background - NB of the opposite type, cm⁻³, > 0
 * @returns xj, same unit as L
 * @throws PhysicsDomainError when Ns ≤ NB, NB ≤ 0 or L ≤ 0
 * @example junctionDepth('gaussian', 1e19, 1, 1e15) // ≈ 3.035
 */
export function junctionDepth(
  profile: ProfileCode,
  surfaceConcentration: number,
  characteristicLength: number,
  background: number,
): number {
  checkSurfaceAndBackground(surfaceConcentration, background);
  checkLength('characteristic length', characteristicLength);
  return characteristicLength * PROFILE_SHAPES[profile].inverse(background / surfaceConcentration);
}

/**
 * The characteristic length that places the junction at xj: the inverse of
 * junctionDepth. Gaussian: L = xj/sqrt(ln(Ns/NB)); erfc: L = xj/erfcinv(NB/Ns).
 *
 * @param profile - 'gaussian' or 'erfc'
 * @param surfaceConcentration - Ns, cm⁻³, > background
 * @param junction - xj > 0
 * @param background - NB, cm⁻³, > 0
 * @returns L, same unit as xj
 * @example characteristicLength('gaussian', 1e19, 3.035, 1e15) // ≈ 1
 */
export function characteristicLength(profile: ProfileCode, surfaceConcentration: number, junction: number, background: number): number {
  checkSurfaceAndBackground(surfaceConcentration, background);
  checkLength('junction depth', junction);
  return junction / PROFILE_SHAPES[profile].inverse(background / surfaceConcentration);
}

/** An as-implanted Gaussian: dose, projected range and straggle. */
export interface ImplantProfile {
  /** Implanted dose Φ, cm⁻². */
  readonly dose: number;
  /** Projected range Rp ≥ 0, length unit of the caller. */
  readonly range: number;
  /** Straggle ΔRp > 0, same unit. */
  readonly straggle: number;
}

/** √(2π). */
const SQRT_TWO_PI = Math.sqrt(2 * Math.PI);

/**
 * Peak density Φ/(√(2π)·ΔRp) of an implant, cm⁻³, with ΔRp given in cm.
 *
 * @param dose - Φ, cm⁻²
 * @param straggleCm - ΔRp, cm
 * @returns the peak density at x = Rp, cm⁻³
 * @example implantPeakDensity(1e14, 1e-5) // ≈ 3.99e18
 */
export function implantPeakDensity(dose: number, straggleCm: number): number {
  return dose / (SQRT_TWO_PI * straggleCm);
}

/**
 * Density of an implant at depth x, given its peak density.
 *
 * @param implant - Rp and ΔRp (caller's length unit)
 * @param peakDensity - Φ/(√(2π)ΔRp), cm⁻³
 * @param depth - x ≥ 0, same unit
 * @returns N(x), cm⁻³
 * @example implantDensity({ dose: 1e14, range: 0.1, straggle: 0.05 }, 8e18, 0.1) // → 8e18 (the peak, at the range)
 */
export function implantDensity(implant: ImplantProfile, peakDensity: number, depth: number): number {
  const u = (depth - implant.range) / implant.straggle;
  return peakDensity * Math.exp(-0.5 * u * u);
}

/** The conducting span of an implant above a background: where N(x) > NB, within x ≥ 0. */
export interface ImplantSpan {
  /** Upper edge: the surface (0) or a buried junction. */
  readonly top: number;
  /** Lower junction. */
  readonly bottom: number;
  /** Whether the layer is buried (a junction above it too, so two junctions). */
  readonly buried: boolean;
}

/**
 * Junctions of an implant in a background: x = Rp ± ΔRp·sqrt(2·ln(Npeak/NB)),
 * the upper one clipped at the surface.
 *
 * @param implant - Rp ≥ 0 and ΔRp > 0
 * @param peakDensity - Npeak, cm⁻³
 * @param background - NB, cm⁻³, > 0
 * @returns the conducting span
 * @throws PhysicsDomainError when the peak does not exceed the background
 * @example implantSpan({ dose: 1e14, range: 0.1, straggle: 0.05 }, 8e18, 1e15) // → { top: 0, bottom: ≈ 0.31, buried: false } (µm)
 */
export function implantSpan(implant: ImplantProfile, peakDensity: number, background: number): ImplantSpan {
  if (!(background > 0) || !Number.isFinite(background)) {
    throw new PhysicsDomainError(`background must be a finite density > 0 cm⁻³ (it defines the junction); got ${background}`);
  }
  if (!(peakDensity > background)) {
    throw new PhysicsDomainError(
      `the implant's peak density ${peakDensity.toExponential(3)} cm⁻³ does not exceed the background ` +
        `${background.toPrecision(4)} cm⁻³: no layer of the implanted type forms`,
    );
  }
  const halfWidth = implant.straggle * Math.sqrt(2 * Math.log(peakDensity / background));
  const upper = implant.range - halfWidth;
  return { top: Math.max(0, upper), bottom: implant.range + halfWidth, buried: upper > 0 };
}
