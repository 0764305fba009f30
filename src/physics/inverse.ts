/**
 * Dopant density from resistivity: the inverse of transport.resistivity,
 * solved on the very same forward model so that round trips close to ~1e-12.
 *
 * Unknown: u = ln(N − N_counter), the natural log of the net doping of the
 * named dopant's type (the named dopant must outweigh its counter-doping, as
 * its name promises). The forward model is sampled on a grid in u
 * (NET_DENSITY_SEARCH, GRID_STEP_DECADES) and a grid interval that straddles
 * the target is handed to the bracketed root finder on ln ρ(u) − ln ρ_target.
 *
 * ρ(N) is not always monotone, so a target can have several solutions:
 * - lightly p-type silicon exceeds the intrinsic resistivity (holes are slower
 *   than electrons), so near N ≈ ni two densities give the same ρ;
 * - at low temperature (e.g. 77 K) freeze-out makes moderately doped samples
 *   more resistive than lighter ones until the Mott transition, so ρ falls,
 *   rises and falls again with N.
 * The rule: the lowest density on a branch where ρ falls as doping rises. That
 * is the ordinary extrinsic answer in both cases (not the near-intrinsic
 * density, whose ρ barely depends on N, and not the degenerate density above
 * the Mott transition). At 300 K, ρ(N) is monotone over 1e12–1e22 cm⁻³ and the
 * rule is moot. Targets outside the reachable range are reported with it.
 * For 'astm-f723' the standard's own reverse equation is used; for
 * 'f723-anchored' the forward model searched is the one anchored to that
 * reverse equation (transport.anchoredResistivity(…, 'reverse')).
 */
import type { Sample } from './sample';
import { findRoot } from './solve';
import { PhysicsDomainError } from './errors';
import { anchoredResistivity, resistivity, resolveResistivityModel, ASTM_F723_CODE, F723_ANCHORED_CODE } from './transport';
import { f723Density, f723SpeciesFor } from './astmF723';

/**
 * Range of net doping searched, cm⁻³: from 1 cm⁻³ (below that every sample is
 * intrinsic to any precision that matters) to the equilibrium solver's
 * guaranteed 1e22 cm⁻³ total density (physics contract).
 */
export const NET_DENSITY_SEARCH = { min: 1, maxTotal: 1e22 } as const;

/** Grid spacing of the bracketing scan, decades of net density. */
export const GRID_STEP_DECADES = 0.5;

/**
 * Root tolerance on u = ln(N_net): 1e-13 is a relative 1e-13 on N_net, far
 * below the 1e-9 round-trip requirement and above the forward model's
 * ~1e-12 relative noise only where ρ is nearly flat.
 */
export const LOG_DENSITY_TOLERANCE = 1e-13;

/** Golden-section iterations used to locate the resistivity maximum between grid points (bracket shrinks 0.618^60 ≈ 3e-13). */
const PEAK_SEARCH_ITERATIONS = 60;

/** Result of the inverse: the density and the root-finder iterations used. */
export interface DopingSolution {
  /** Density of the named dopant, cm⁻³. */
  readonly density: number;
  /** Root-finder iterations (0 for 'astm-f723', which is closed-form). */
  readonly iterations: number;
}

function formatNumber(value: number): string {
  return value.toPrecision(4);
}

/** Maximum of g on [a, b] by golden-section search, for a unimodal g. */
/**
 * ln ρ at the scan's grid points, by conditions (material, dopant,
 * temperature, counter-doping, model); NaN where not yet computed. The grid
 * depends on the counter-doping only, so the values are reused exactly by
 * every target under the same conditions. Cleared when full.
 */
const SCAN_CACHE_SIZE = 64;
const scanCaches = new WeakMap<object, WeakMap<object, Map<string, Float64Array>>>();

function scanCache(sample: Omit<Sample, 'density'>, code: string, steps: number): Float64Array {
  let byDopant = scanCaches.get(sample.material);
  if (byDopant === undefined) {
    byDopant = new WeakMap();
    scanCaches.set(sample.material, byDopant);
  }
  let byConditions = byDopant.get(sample.dopant);
  if (byConditions === undefined) {
    byConditions = new Map();
    byDopant.set(sample.dopant, byConditions);
  }
  const key = `${sample.temperature}|${sample.counterDensity}|${code}`;
  let values = byConditions.get(key);
  if (values === undefined || values.length !== steps + 1) {
    if (byConditions.size >= SCAN_CACHE_SIZE) byConditions.clear();
    values = new Float64Array(steps + 1).fill(NaN);
    byConditions.set(key, values);
  }
  return values;
}

function locateMaximum(g: (u: number) => number, a: number, b: number): { u: number; value: number } {
  const ratio = (Math.sqrt(5) - 1) / 2;
  let left = a;
  let right = b;
  let x1 = right - ratio * (right - left);
  let x2 = left + ratio * (right - left);
  let g1 = g(x1);
  let g2 = g(x2);
  for (let i = 0; i < PEAK_SEARCH_ITERATIONS; i++) {
    if (g1 < g2) {
      left = x1;
      x1 = x2;
      g1 = g2;
      x2 = left + ratio * (right - left);
      g2 = g(x2);
    } else {
      right = x2;
      x2 = x1;
      g2 = g1;
      x1 = right - ratio * (right - left);
      g1 = g(x1);
    }
  }
  return g1 >= g2 ? { u: x1, value: g1 } : { u: x2, value: g2 };
}

/**
 * Density of sample.dopant giving the target resistivity, with the
 * counter-doping held fixed. Where several densities give the same
 * resistivity, the lowest one on a branch where ρ falls with doping is
 * returned (see the module comment).
 *
 * @param target - resistivity, Ω·cm (finite, > 0)
 * @param sample - material, temperature, dopant and counterDensity (density is the unknown)
 * @param model - resistivity model code (silicon's default 'f723-anchored', anchored to F723's reverse equation; 'astm-f723' uses that equation itself)
 * @returns { density in cm⁻³, iterations }
 * @throws PhysicsDomainError when the target is out of the reachable range (the message gives the range)
 * @example dopingForResistivity(1, { material: SILICON, temperature: 300, dopant: boron, counterDensity: 0 }) // ≈ 1.5e16 cm⁻³
 */
export function dopingForResistivity(
  target: number,
  sample: Omit<Sample, 'density'>,
  model?: string,
): DopingSolution {
  if (!(target > 0) || !Number.isFinite(target)) {
    throw new PhysicsDomainError(`resistivity ${target} Ω·cm is not allowed: it must be a finite number greater than 0.`);
  }
  const code = resolveResistivityModel(model, sample.material);
  if (code === ASTM_F723_CODE) {
    const species = f723SpeciesFor(sample.dopant.symbol, sample.counterDensity, sample.temperature);
    return { density: f723Density(species, target), iterations: 0 };
  }

  // 'f723-anchored' inverts the form anchored to F723's reverse equation (f723Anchored.ts).
  const forward = (probe: Sample): number =>
    code === F723_ANCHORED_CODE ? anchoredResistivity(probe, 'reverse') : resistivity(probe, code);
  const counter = sample.counterDensity;
  const maxNet = NET_DENSITY_SEARCH.maxTotal - counter;
  if (!(maxNet > NET_DENSITY_SEARCH.min)) {
    throw new PhysicsDomainError(
      `counter-doping ${counter} cm⁻³ leaves no room for the dopant below ${NET_DENSITY_SEARCH.maxTotal} cm⁻³ total; ` +
        `use counter-doping below ${NET_DENSITY_SEARCH.maxTotal} cm⁻³.`,
    );
  }
  const densityOf = (u: number): number => counter + Math.exp(u);
  const logTarget = Math.log(target);
  // Positive where the sample is more resistive than the target.
  const excess = (u: number): number => Math.log(forward({ ...sample, density: densityOf(u) })) - logTarget;
  const solveBetween = (a: number, b: number): DopingSolution => {
    const { root, iterations } = findRoot(excess, a, b, { xTolerance: LOG_DENSITY_TOLERANCE });
    return { density: densityOf(root), iterations };
  };

  // Grid in u from ln(min) to ln(maxNet), ends included.
  const lo = Math.log(NET_DENSITY_SEARCH.min);
  const hi = Math.log(maxNet);
  const steps = Math.max(2, Math.ceil((hi - lo) / (GRID_STEP_DECADES * Math.LN10)));
  const grid: number[] = [];
  const values: number[] = [];
  // Lowest interval where ρ falls through the target. The scan runs upwards and
  // stops at the first such interval: the points above it cannot change the
  // answer, and each costs a full forward evaluation.
  // ln ρ at the grid points depends on the conditions only, not on the target:
  // a column of targets under the same conditions scans once.
  const scanned = scanCache(sample, code, steps);
  for (let i = 0; i <= steps; i++) {
    const u = i === steps ? hi : lo + ((hi - lo) * i) / steps;
    grid.push(u);
    let logResistivity = scanned[i];
    if (Number.isNaN(logResistivity)) {
      logResistivity = Math.log(forward({ ...sample, density: densityOf(u) }));
      scanned[i] = logResistivity;
    }
    // The same operations as excess(u), so the values are identical.
    values.push(logResistivity - logTarget);
    if (i > 0 && values[i - 1] >= 0 && values[i] < 0) {
      return values[i - 1] === 0 ? { density: densityOf(grid[i - 1]), iterations: 0 } : solveBetween(grid[i - 1], grid[i]);
    }
  }
  if (values[steps] === 0) return { density: densityOf(grid[steps]), iterations: 0 };

  // No falling crossing on the grid. If the sample is everywhere less
  // resistive than the target, the target may still lie just under a
  // resistivity maximum that falls between grid points.
  let peak = 0;
  for (let i = 1; i <= steps; i++) if (values[i] > values[peak]) peak = i;
  let highest = values[peak];
  if (highest < 0 && peak > 0 && peak < steps) {
    const refined = locateMaximum(excess, grid[peak - 1], grid[peak + 1]);
    if (refined.value >= 0) return solveBetween(refined.u, grid[peak + 1]);
    highest = Math.max(highest, refined.value);
  }

  const lowest = Math.min(...values);
  throw new PhysicsDomainError(
    `resistivity ${formatNumber(target)} Ω·cm cannot be reached with ${sample.dopant.symbol} in ${sample.material.code} ` +
      `at ${sample.temperature} K (counter-doping ${counter} cm⁻³, model ${code}): reachable range is about ` +
      `${formatNumber(Math.exp(lowest + logTarget))} to ${formatNumber(Math.exp(highest + logTarget))} Ω·cm, ` +
      `for net ${sample.dopant.symbol} doping from ${NET_DENSITY_SEARCH.min} to ${formatNumber(maxNet)} cm⁻³.`,
  );
}
