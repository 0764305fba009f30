/**
 * 'f723-anchored': silicon's default resistivity model. The physics model
 * (q(n·μn + p·μp) with incomplete ionization and silicon's default mobility
 * model) multiplied by a factor k that depends on the named dopant's density
 * only, chosen so that at 23 °C (296.15 K) in uncompensated B- or P-doped
 * silicon the result is the ASTM F723 conversion itself:
 *
 *   ρ(sample) = ρ_phys(sample) · k(N),  k(N) = ρ_F723(N) / ρ_phys(N, 296.15 K, uncompensated).
 *
 * Why this and not F723 alone: F723 is a 23 °C relation for uncompensated
 * material; the physics model carries temperature and compensation. Because k
 * does not depend on temperature or counter-doping, ρ(T) and the effect of
 * compensation are exactly the physics model's (the TCR is the physics
 * model's), and nothing switches at a range edge. Why a name of its own: away
 * from 296.15 K or with counter-doping it is not F723 (a name is a promise).
 *
 * Two directions. F723 gives one equation for ρ from N and another for N from
 * ρ, and they disagree by up to 2.8 % (B) / 6.9 % (P) in N (see astmF723.ts).
 * Each direction is anchored to its own equation: RESISTIVITY uses k from the
 * forward equation, DOPING inverts ρ_phys · k_rev with k_rev from the reverse
 * equation (ρ_F723rev(N) = the ρ whose F723 density is N). So each function
 * returns what the standard's equation for its direction gives, at 23 °C, and
 * RESISTIVITY(DOPING(ρ)) differs from ρ by the standard's own inconsistency.
 *
 * Outside the standard's range (B: 1e12–1e21 cm⁻³ forward; P: 1e12–5e20;
 * reverse: the images of 1e-4–1e4 Ω·cm (B), 2e-4–4e3 Ω·cm (P)) the F723
 * equations are not used (P's deteriorate rapidly above 5e20, §1.2); ln k is
 * continued from the edge with its slope s there and levels off:
 * ln k(u) = ln k(u_e) + s·w·tanh((u − u_e)/w), u = ln N, w half a decade. ln k
 * and its slope are continuous, so sweeps have no jump or kink. Other dopants
 * (including As, whose F723 equation covers only 1e19–6e20 cm⁻³), other
 * materials: k = 1, the physics model unchanged.
 */
import type { Sample } from './sample';
import { F723_VALIDITY, rawDensity, rawResistivity, type F723Species } from './astmF723';
import { findRoot } from './solve';
import { SILICON } from './materials';
import type { Dopant, Material } from './materials/types';
import { memoize } from './memo';

/** Code of the anchored model. */
export const F723_ANCHORED_CODE = 'f723-anchored';

/** F723's temperature, 23 °C, K. */
export const F723_ANCHOR_TEMPERATURE = 296.15;

/** Width of the continuation outside the standard's range, in ln N (half a decade). */
const CONTINUATION_WIDTH = 0.5 * Math.LN10;

/** Step for the edge slope, in ln N (well inside the range; the slope changes little over it). */
const SLOPE_STEP = 1e-3;

/** Which F723 equation a factor reproduces: ρ from N ('forward') or N from ρ ('reverse'). */
export type AnchorDirection = 'forward' | 'reverse';

/** Resistivity of a sample under the physics model, Ω·cm. */
export type PhysicsResistivity = (sample: Sample) => number;

function anchoredSpecies(sample: Sample): F723Species | undefined {
  if (sample.material.code !== SILICON.code) return undefined;
  const symbol = sample.dopant.symbol;
  return symbol === 'B' || symbol === 'P' ? symbol : undefined;
}

/** ln N range where the direction's equation is used. */
function anchorRange(species: F723Species, direction: AnchorDirection): { lo: number; hi: number } {
  if (direction === 'forward') {
    const { min, max } = F723_VALIDITY[species].density;
    return { lo: Math.log(min), hi: Math.log(max) };
  }
  const { min, max } = F723_VALIDITY[species].resistivity;
  return { lo: Math.log(rawDensity(species, max)), hi: Math.log(rawDensity(species, min)) };
}

/** ρ that F723's reverse equation maps to N (N inside the reverse range), Ω·cm. */
function reverseResistivity(species: F723Species, density: number): number {
  const { min, max } = F723_VALIDITY[species].resistivity;
  const target = Math.log(density);
  const g = (lnRho: number): number => Math.log(rawDensity(species, Math.exp(lnRho))) - target;
  // Slack so that the range ends themselves bracket.
  const { root } = findRoot(g, Math.log(min) - 1e-6, Math.log(max) + 1e-6, { xTolerance: 1e-13 });
  return Math.exp(root);
}

/** ln k at u = ln N inside the range. */
function logFactorInside(
  material: Material,
  dopant: Dopant,
  species: F723Species,
  direction: AnchorDirection,
  u: number,
  physics: PhysicsResistivity,
): number {
  const density = Math.exp(u);
  const reference = direction === 'forward' ? rawResistivity(species, density) : reverseResistivity(species, density);
  const physical = physics({ material, dopant, density, temperature: F723_ANCHOR_TEMPERATURE, counterDensity: 0 });
  return Math.log(reference) - Math.log(physical);
}

/**
 * Value and inward slope of ln k at a range edge, by material, dopant, species,
 * direction, side and physics function (memo.ts, the core's one memo policy):
 * two physics evaluations that every sample beyond that edge shares.
 */
const edge = memoize(
  64,
  (
    material: Material,
    dopant: Dopant,
    species: F723Species,
    direction: AnchorDirection,
    side: 'lo' | 'hi',
    physics: PhysicsResistivity,
  ): { value: number; slope: number } => {
    const u = anchorRange(species, direction)[side];
    const inward = side === 'lo' ? SLOPE_STEP : -SLOPE_STEP;
    const value = logFactorInside(material, dopant, species, direction, u, physics);
    const slope = (logFactorInside(material, dopant, species, direction, u + inward, physics) - value) / inward;
    return { value, slope };
  },
);

/**
 * The anchoring factor k for a sample: 1 outside silicon or for dopants
 * other than B and P; otherwise ρ_F723/ρ_phys at the sample's dopant density
 * and 296.15 K without counter-doping, continued smoothly outside the range.
 *
 * @param sample - the sample (only material, dopant and density matter)
 * @param direction - 'forward' for ρ from N (RESISTIVITY), 'reverse' for N from ρ (DOPING)
 * @param physics - the physics resistivity (silicon's default mobility model)
 * @returns k, dimensionless
 * @example
 * // F723 is about 11 % above the physics at 1e18 cm⁻³ boron:
 * anchorFactor(boron1e18At300K, 'forward', (sample) => resistivity(sample, 'masetti')) // ≈ 1.1
 */
export function anchorFactor(sample: Sample, direction: AnchorDirection, physics: PhysicsResistivity): number {
  const species = anchoredSpecies(sample);
  if (species === undefined || !(sample.density > 0)) return 1;
  const u = Math.log(sample.density);
  const range = anchorRange(species, direction);
  if (u >= range.lo && u <= range.hi) return Math.exp(logFactorInside(sample.material, sample.dopant, species, direction, u, physics));
  const side = u < range.lo ? 'lo' : 'hi';
  const { value, slope } = edge(sample.material, sample.dopant, species, direction, side, physics);
  const offset = u - range[side];
  return Math.exp(value + slope * CONTINUATION_WIDTH * Math.tanh(offset / CONTINUATION_WIDTH));
}
