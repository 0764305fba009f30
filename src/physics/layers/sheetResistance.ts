/**
 * Sheet resistance of diffused and implanted layers by integrating the local
 * conductivity from the surface to the junction(s): Irvin's method (J. C.
 * Irvin, Bell Syst. Tech. J. 41, 387 (1962)), with today's equilibrium and
 * mobility models in place of his bulk resistivity curve.
 *
 *   G□ = ∫ σ(x) dx over the layer,  Rs = 1/G□,
 *   σ(x) = q·[n(x)·μn(x) + p(x)·μp(x)]
 *
 * where n, p, μn, μp are those of a uniform sample with the named dopant at
 * N(x) and the generic opposite-type dopant at the background density
 * (transport.ts: incomplete ionization, compensation, default mobility model).
 * Only the part where the layer overcompensates the background conducts: the
 * junction isolates it from the substrate (and, for a buried implant, from the
 * background-type skin above it). Assumptions: each depth is treated as bulk
 * material (no depletion at the junction, no carrier spill-over between
 * depths), equilibrium at zero bias; implants are as-implanted, fully
 * electrically activated, with no lattice damage.
 */
import type { Dopant } from '../dopants';
import { PhysicsDomainError } from '../errors';
import { CM_PER_UM } from '../geometry';
import { SILICON, type Material } from '../materials';
import type { Sample } from '../sample';
import { conductivity } from '../transport';
import { integrate, type QuadratureResult } from './integrate';
import { characteristicLength, diffusedDensity, implantDensity, implantPeakDensity, implantSpan, type ProfileCode } from './profiles';

/**
 * Accuracy settings of the layer integrals. The target (1e-6 relative) leaves
 * a wide margin below the promised 0.1 %; the piece budget bounds the work.
 * Chosen for this project (no source); the tests check the result against a
 * second, independent quadrature.
 */
export const LAYER_INTEGRATION = {
  relativeTolerance: 1e-6,
  maxPieces: 60,
  /** Accuracy promised to users, relative. */
  promisedRelativeAccuracy: 1e-3,
} as const;

/** Electrical conditions shared by every layer: what it is doped with and where it sits. */
export interface LayerConditions {
  /** The layer's dopant (its type sets the layer's type). */
  readonly dopant: Dopant;
  /** Uniform background of the opposite type, cm⁻³, > 0. */
  readonly background: number;
  /** Temperature, K. */
  readonly temperature: number;
  /** Host material; silicon when omitted. */
  readonly material?: Material;
}

/** A diffused layer given by its surface concentration and junction depth. */
export interface DiffusedLayer extends LayerConditions {
  readonly profile: ProfileCode;
  /** Surface concentration Ns, cm⁻³, > background. */
  readonly surfaceConcentration: number;
  /** Metallurgical junction depth xj, µm, > 0. */
  readonly junctionDepthUm: number;
}

/** An as-implanted Gaussian layer. */
export interface ImplantedLayer extends LayerConditions {
  /** Dose Φ, cm⁻², > 0. */
  readonly dose: number;
  /** Projected range Rp, µm, ≥ 0. */
  readonly rangeUm: number;
  /** Straggle ΔRp, µm, > 0. */
  readonly straggleUm: number;
}

/** A layer's sheet conductance with the quadrature's bookkeeping. */
export interface LayerConductance {
  /** Sheet conductance G□ = ∫σ dx, S (per square). */
  readonly sheetConductance: number;
  /** Estimated relative error of G□. */
  readonly relativeError: number;
  /** Conductivity evaluations used. */
  readonly evaluations: number;
  /** Depth span that conducts, µm. */
  readonly topUm: number;
  readonly bottomUm: number;
}

/** σ(x) in S/cm of the local sample: the layer's dopant at `density` over the background. */
function localConductivity(conditions: LayerConditions, density: number): number {
  const sample: Sample = {
    material: conditions.material ?? SILICON,
    temperature: conditions.temperature,
    dopant: conditions.dopant,
    density,
    counterDensity: conditions.background,
  };
  return conductivity(sample);
}

/** Integrates σ over depth (µm) and converts µm·S/cm to S. */
function integrateConductivity(
  conditions: LayerConditions,
  density: (depthUm: number) => number,
  breakpointsUm: readonly number[],
): LayerConductance {
  const result: QuadratureResult = integrate((x) => localConductivity(conditions, density(x)), breakpointsUm, {
    relativeTolerance: LAYER_INTEGRATION.relativeTolerance,
    maxPieces: LAYER_INTEGRATION.maxPieces,
  });
  const relativeError = result.errorEstimate / Math.abs(result.value);
  if (!(relativeError <= LAYER_INTEGRATION.promisedRelativeAccuracy)) {
    throw new PhysicsDomainError(`the layer integral did not converge (estimated relative error ${relativeError})`);
  }
  return {
    sheetConductance: result.value * CM_PER_UM,
    relativeError,
    evaluations: result.evaluations,
    topUm: breakpointsUm[0],
    bottomUm: breakpointsUm[breakpointsUm.length - 1],
  };
}

/**
 * Deepest layer dimension accepted, µm: 1 cm, thicker than any wafer. Larger
 * ranges, straggles or depths describe no layer and would overflow the
 * profile's span.
 */
export const MAX_LAYER_DEPTH_UM = 1e4;

function checkDepth(name: string, valueUm: number): void {
  if (valueUm > MAX_LAYER_DEPTH_UM) {
    throw new PhysicsDomainError(`${name} must be ≤ ${MAX_LAYER_DEPTH_UM} µm (1 cm, thicker than any wafer); got ${valueUm}`);
  }
}

function checkDopantType(conditions: LayerConditions): void {
  if (conditions.dopant.kind !== 'donor' && conditions.dopant.kind !== 'acceptor') {
    throw new PhysicsDomainError(`dopant ${conditions.dopant.symbol} has no donor/acceptor type`);
  }
}

/**
 * Sheet conductance of a diffused layer (see sheetResistance for the model).
 *
 * @param layer - profile, Ns (cm⁻³), xj (µm), dopant, background (cm⁻³), temperature (K)
 * @returns G□ in S with the quadrature's error estimate
 * @throws PhysicsDomainError when Ns ≤ background, xj ≤ 0, or the core rejects a local sample
 * @example
 * const layer = { surfaceConcentration: 1e19, junctionDepthUm: 2, background: 1e15, dopant: boron, temperature: 300 };
 * diffusedLayerConductance({ profile: 'gaussian', ...layer }).sheetConductance // ≈ 7.74e-3 S
 */
export function diffusedLayerConductance(layer: DiffusedLayer): LayerConductance {
  checkDopantType(layer);
  checkDepth('junction depth', layer.junctionDepthUm);
  const lengthUm = characteristicLength(layer.profile, layer.surfaceConcentration, layer.junctionDepthUm, layer.background);
  const shape = { profile: layer.profile, surfaceConcentration: layer.surfaceConcentration, characteristicLength: lengthUm };
  // The profile peaks at the surface and falls monotonically to the junction: one piece to start.
  return integrateConductivity(layer, (x) => diffusedDensity(shape, x), [0, layer.junctionDepthUm]);
}

/**
 * Sheet resistance of a diffused layer, Rs = 1/∫σ(x)dx from the surface to
 * the metallurgical junction.
 *
 * @param layer - profile ('gaussian' | 'erfc'), Ns (cm⁻³), xj (µm), dopant, background NB (cm⁻³), temperature (K)
 * @returns Rs in Ω/sq
 * @throws PhysicsDomainError when Ns ≤ NB, xj ≤ 0, or a local sample is outside the core's range
 * @example
 * const layer = { surfaceConcentration: 1e19, junctionDepthUm: 2, background: 1e15, dopant: boron, temperature: 300 };
 * diffusedLayerSheetResistance({ profile: 'gaussian', ...layer }) // ≈ 129 Ω/sq
 */
export function diffusedLayerSheetResistance(layer: DiffusedLayer): number {
  return 1 / diffusedLayerConductance(layer).sheetConductance;
}

/**
 * Sheet conductance of an as-implanted Gaussian layer (see
 * implantedLayerSheetResistance).
 *
 * @param layer - dose (cm⁻²), Rp and ΔRp (µm), dopant, background (cm⁻³), temperature (K)
 * @returns G□ in S with the quadrature's error estimate and the conducting span
 * @throws PhysicsDomainError for a non-positive dose or straggle, a negative range, or a peak at or below the background
 * @example
 * const implant = { dose: 1e14, rangeUm: 0.1, straggleUm: 0.04, background: 1e15, dopant: boron, temperature: 300 };
 * implantedLayerConductance(implant).bottomUm // ≈ 0.272 µm
 */
export function implantedLayerConductance(layer: ImplantedLayer): LayerConductance {
  checkDopantType(layer);
  if (!(layer.dose > 0) || !Number.isFinite(layer.dose)) {
    throw new PhysicsDomainError(`dose must be a finite number > 0 cm⁻²; got ${layer.dose}`);
  }
  if (!(layer.rangeUm >= 0) || !Number.isFinite(layer.rangeUm)) {
    throw new PhysicsDomainError(`projected range must be a finite length ≥ 0 µm; got ${layer.rangeUm}`);
  }
  if (!(layer.straggleUm > 0) || !Number.isFinite(layer.straggleUm)) {
    throw new PhysicsDomainError(`straggle must be a finite length > 0 µm; got ${layer.straggleUm}`);
  }
  checkDepth('projected range', layer.rangeUm);
  checkDepth('straggle', layer.straggleUm);
  const implant = { dose: layer.dose, range: layer.rangeUm, straggle: layer.straggleUm };
  const peak = implantPeakDensity(layer.dose, layer.straggleUm * CM_PER_UM);
  // A peak above the lattice's own atom density (or beyond floating point) cannot be implanted.
  const host = layer.material ?? SILICON;
  if (!(peak <= host.atomicDensity)) {
    throw new PhysicsDomainError(
      `dose ${layer.dose} cm⁻² over straggle ${layer.straggleUm} µm gives a peak of ${peak.toExponential(3)} cm⁻³, ` +
        `above the atomic density of ${host.name}, ${host.atomicDensity.toExponential(3)} cm⁻³: lower the dose or widen the straggle`,
    );
  }
  const span = implantSpan(implant, peak, layer.background);
  // Split at the peak when it lies inside the conducting span: the integrand turns there.
  const breakpoints =
    layer.rangeUm > span.top && layer.rangeUm < span.bottom ? [span.top, layer.rangeUm, span.bottom] : [span.top, span.bottom];
  return integrateConductivity(layer, (x) => implantDensity(implant, peak, x), breakpoints);
}

/**
 * Sheet resistance of an as-implanted Gaussian layer (truncated at the
 * surface; fully activated; no damage), conducting where N(x) exceeds the
 * background: from the surface, or from the upper junction of a buried layer,
 * down to the lower junction.
 *
 * @param layer - dose Φ (cm⁻²), Rp ≥ 0 and ΔRp > 0 (µm), dopant, background NB (cm⁻³), temperature (K)
 * @returns Rs in Ω/sq
 * @throws PhysicsDomainError as implantedLayerConductance
 * @example
 * const implant = { dose: 1e14, rangeUm: 0.1, straggleUm: 0.04, background: 1e15, dopant: boron, temperature: 300 };
 * implantedLayerSheetResistance(implant) // ≈ 769 Ω/sq
 */
export function implantedLayerSheetResistance(layer: ImplantedLayer): number {
  return 1 / implantedLayerConductance(layer).sheetConductance;
}
