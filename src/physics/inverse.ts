/**
 * Dopant density from resistivity: the inverse of transport.resistivity,
 * solved on the very same forward model so that round trips close to ~1e-12.
 *
 * Unknown: u = ln(N − N_counter), the natural log of the net doping of the
 * named dopant's type (the named dopant must outweigh its counter-doping, as
 * its name promises).
 *
 * ρ(N) is not always monotone, so a target can have several solutions:
 * - lightly p-type silicon exceeds the intrinsic resistivity (holes are slower
 *   than electrons), so near N ≈ ni two densities give the same ρ;
 * - at low temperature (e.g. 77 K) freeze-out makes moderately doped samples
 *   more resistive than lighter ones until the Mott transition, so ρ falls,
 *   rises and falls again with N: up to three densities give one ρ.
 * No solution is chosen silently: every solution is found, and more than one
 * is an error listing them, unless a density window (min/max) leaves exactly
 * one. The method works for any forward model ρ(N):
 *
 * 1. ln ρ is sampled over the whole allowed range on a coarse grid in u,
 *    COARSE_STEP_DECADES apart. Around every turning point of the samples and
 *    every extremum of their slope (where a fold forms, or could hide between
 *    coarse points) and at the ends, the grid is refined to GRID_STEP_DECADES.
 *    The scan depends on the conditions only, not on the target, and is
 *    cached: a column of targets under the same conditions scans once.
 * 2. The sampled curve is cut into monotone segments at its turning points
 *    (a reversal counts only beyond FLAT_LOG_RESISTIVITY, so round-off in a
 *    flat, intrinsic stretch makes none); each turning point is refined by a
 *    golden-section search between its grid neighbours.
 * 3. A monotone segment whose end values straddle the target holds exactly
 *    one solution; the grid interval holding it goes to the bracketed root
 *    finder on ln ρ(u) − ln ρ_target.
 *
 * Why the grid is fine enough. A fold (a maximum and a minimum of ρ) is an
 * extremum of the slope d ln ρ/d ln N that crosses zero. The coarse slopes are
 * averages of the slope over 0.25 decade; they show an extremum next to the
 * true one wherever the slope has no second extremum within about half a
 * decade, which holds for the models here: ionization (Altermatt et al. 2006)
 * and the mobility fits (Masetti, Arora, Caughey–Thomas, Klaassen, the other
 * materials' fits) are sums of sigmoids in (N/N_ref)^k with k ≤ 2.4, each
 * turning over ≳ 0.4 decade. There the grid is refined to
 * 0.05 decade, and a fold then escapes only if no two grid points lie
 * between its maximum and minimum, i.e. if they are under 0.1 decade apart.
 * Near a fold ln ρ is locally cubic in ln N, so the resistivity range with
 * three solutions shrinks as the cube of the separation: for the freeze-out
 * fold of every silicon dopant the height is ≈ 0.25·s³ in ln ρ for a
 * separation of s decades (measured on the forward model between 60 K and
 * the temperature where the fold appears, ~110–135 K; tested in
 * tests/physics/inverseAmbiguity.test.ts), so a missed fold spans under
 * 0.1 decade of N and under 2.5e-4 (0.025 %) of ρ: far below the ~1 % a
 * resistivity is measured to, in a stretch where ρ cannot tell those
 * densities apart anyway. Cost: about 160–270 forward evaluations for a new
 * set of conditions (89 coarse points, the refinements, 30 per turning point).
 *
 * For 'astm-f723' the standard's own (monotone) reverse equation is used; for
 * 'f723-anchored' the forward model scanned is the one anchored to that
 * reverse equation (transport.anchoredResistivity(…, 'reverse')).
 */
import type { Sample } from './sample';
import type { Dopant, Material } from './materials/types';
import { memoize } from './memo';
import { findRoot } from './solve';
import { PhysicsDomainError } from './errors';
import { anchoredResistivity, resistivity, resolveResistivityModel, ASTM_F723_CODE, F723_ANCHORED_CODE } from './transport';
import { f723Density, f723SpeciesFor } from './astmF723';

/**
 * Range of net doping searched, cm⁻³: from 1 cm⁻³ (below that every sample is
 * intrinsic to any precision that matters) to 1e22 cm⁻³ total density, the
 * range the equilibrium solver is guaranteed for (docs/physics.md, "Solvers
 * and their guarantees").
 */
export const NET_DENSITY_SEARCH = { min: 1, maxTotal: 1e22 } as const;

/** Spacing of the coarse scan over the whole range, decades of net density. */
export const COARSE_STEP_DECADES = 0.25;

/** Spacing of the scan where it is refined (why it suffices: module comment), decades of net density. */
export const GRID_STEP_DECADES = 0.05;

/**
 * Smallest fall after a rise (or rise after a fall) of ln ρ between grid
 * points that counts as a turning point: 1e-9, far above the forward model's
 * ~1e-12 relative round-off in flat, intrinsic stretches and far below any
 * resistivity difference that can be measured.
 */
export const FLAT_LOG_RESISTIVITY = 1e-9;

/**
 * Root tolerance on u = ln(N_net): 1e-13 is a relative 1e-13 on N_net, far
 * below the 1e-9 round-trip requirement and above the forward model's
 * ~1e-12 relative noise only where ρ is nearly flat.
 */
export const LOG_DENSITY_TOLERANCE = 1e-13;

/**
 * Golden-section iterations refining a turning point between its grid
 * neighbours (0.1 decade = 0.23 in ln N): the bracket shrinks to
 * 0.23·0.618^30 ≈ 1.2e-7 in ln N, so the extreme ρ is found to ~1e-14
 * relative (the error is quadratic in the position), below the root tolerance.
 */
const PEAK_SEARCH_ITERATIONS = 30;

/** Result of the inverse: the density and the root-finder iterations used. */
export interface DopingSolution {
  /** Density of the named dopant, cm⁻³. */
  readonly density: number;
  /** Root-finder iterations (0 for 'astm-f723', which is closed-form). */
  readonly iterations: number;
}

/**
 * Optional window on the density of the named dopant, cm⁻³ (ends included):
 * it picks one solution where several densities give the same resistivity.
 */
export interface DensityWindow {
  /** Lowest density accepted, cm⁻³ (undefined: no lower bound). */
  readonly min?: number;
  /** Highest density accepted, cm⁻³ (undefined: no upper bound). */
  readonly max?: number;
}

/** How error messages name the window's ends (a front end passes its argument names). */
export interface DensityWindowNames {
  readonly min: string;
  readonly max: string;
}

const DEFAULT_WINDOW_NAMES: DensityWindowNames = { min: 'window.min', max: 'window.max' };

/**
 * Several densities give the resistivity and the window (if any) leaves more
 * than one. `solutions` holds them, ascending, in cm⁻³.
 */
export class AmbiguousDopingError extends PhysicsDomainError {
  constructor(
    message: string,
    readonly solutions: readonly number[],
  ) {
    super(message);
  }
}

function formatNumber(value: number): string {
  return value.toPrecision(4);
}

/** A density as 7.62e14, with the given significant digits. */
function formatDensity(value: number, digits: number): string {
  return value.toExponential(digits - 1).replace('e+', 'e');
}

/** Densities to 3 significant digits, with more only where needed to tell two apart. */
function formatDensities(values: readonly number[]): string {
  let digits = 3;
  let texts = values.map((v) => formatDensity(v, digits));
  while (digits < 17 && new Set(texts).size < texts.length) {
    digits++;
    texts = values.map((v) => formatDensity(v, digits));
  }
  return texts.length <= 1 ? texts.join('') : `${texts.slice(0, -1).join(', ')} and ${texts[texts.length - 1]}`;
}

/** A turning point of ln ρ(u): its refined position and value. */
interface TurningPoint {
  readonly u: number;
  readonly logResistivity: number;
}

/** The scan of ln ρ over the grid under one set of conditions; independent of the target. */
interface Scan {
  readonly grid: Float64Array;
  readonly logResistivity: Float64Array;
  readonly turningPoints: readonly TurningPoint[];
}

/** Maximum of g on [a, b] by golden-section search, for a unimodal g. */
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
 * Grid indices of the turning points of a sampled curve: a running extreme
 * becomes a turning point once the curve has moved back from it by more than
 * `flat`. Indices lie strictly inside the grid.
 */
function turningIndices(values: ArrayLike<number>, flat: number): number[] {
  const turns: number[] = [];
  let direction = 0;
  let low = 0;
  let high = 0;
  let extreme = 0;
  for (let i = 1; i < values.length; i++) {
    const v = values[i];
    if (direction === 0) {
      if (v > values[high]) high = i;
      if (v < values[low]) low = i;
      if (values[high] - values[low] > flat) {
        direction = high > low ? 1 : -1;
        extreme = high > low ? high : low;
      }
    } else if (direction > 0) {
      if (v >= values[extreme]) extreme = i;
      else if (values[extreme] - v > flat) {
        turns.push(extreme);
        direction = -1;
        extreme = i;
      }
    } else if (v <= values[extreme]) extreme = i;
    else if (v - values[extreme] > flat) {
      turns.push(extreme);
      direction = 1;
      extreme = i;
    }
  }
  return turns;
}

function scanConditions(logResistivityAt: (u: number) => number, lo: number, hi: number): Scan {
  // 1. Coarse grid over the whole range.
  const coarseSteps = Math.max(2, Math.ceil((hi - lo) / (COARSE_STEP_DECADES * Math.LN10)));
  const coarseGrid = new Float64Array(coarseSteps + 1);
  const coarseValues = new Float64Array(coarseSteps + 1);
  for (let i = 0; i <= coarseSteps; i++) {
    coarseGrid[i] = i === coarseSteps ? hi : lo + ((hi - lo) * i) / coarseSteps;
    coarseValues[i] = logResistivityAt(coarseGrid[i]);
  }
  // 2. Coarse intervals to refine: around every turning point of ln ρ and
  //    every extremum of its slope (where a fold can form or hide), and the ends.
  const differences = new Float64Array(coarseSteps);
  for (let j = 0; j < coarseSteps; j++) differences[j] = coarseValues[j + 1] - coarseValues[j];
  const refine = new Uint8Array(coarseSteps);
  const mark = (j: number): void => {
    for (let k = Math.max(0, j - 1); k <= Math.min(coarseSteps - 1, j + 1); k++) refine[k] = 1;
  };
  for (const k of turningIndices(coarseValues, FLAT_LOG_RESISTIVITY)) {
    mark(k - 1);
    mark(k);
  }
  for (const j of turningIndices(differences, FLAT_LOG_RESISTIVITY)) mark(j);
  mark(0);
  mark(coarseSteps - 1);
  // 3. The grid: coarse points, with GRID_STEP_DECADES points inside the refined intervals.
  const parts = Math.max(1, Math.round(COARSE_STEP_DECADES / GRID_STEP_DECADES));
  const grid: number[] = [];
  const values: number[] = [];
  for (let j = 0; j < coarseSteps; j++) {
    grid.push(coarseGrid[j]);
    values.push(coarseValues[j]);
    if (refine[j] === 0) continue;
    for (let m = 1; m < parts; m++) {
      const u = coarseGrid[j] + ((coarseGrid[j + 1] - coarseGrid[j]) * m) / parts;
      grid.push(u);
      values.push(logResistivityAt(u));
    }
  }
  grid.push(coarseGrid[coarseSteps]);
  values.push(coarseValues[coarseSteps]);
  // 4. Turning points on that grid, each refined between its neighbours.
  const turningPoints = turningIndices(values, FLAT_LOG_RESISTIVITY).map((k): TurningPoint => {
    const sign = values[k] > values[k - 1] ? 1 : -1; // a maximum (+1) or a minimum (−1)
    const refined = locateMaximum((u) => sign * logResistivityAt(u), grid[k - 1], grid[k + 1]);
    // The grid point itself may be the better extreme (round-off on a flat top).
    return refined.value > sign * values[k]
      ? { u: refined.u, logResistivity: sign * refined.value }
      : { u: grid[k], logResistivity: values[k] };
  });
  return { grid: Float64Array.from(grid), logResistivity: Float64Array.from(values), turningPoints };
}

/**
 * Every density of sample.dopant that gives the target resistivity, with the
 * counter-doping held fixed, ascending. Empty when the target is out of reach
 * (dopingForResistivity reports the reachable range).
 *
 * @param target - resistivity, Ω·cm (finite, > 0)
 * @param sample - material, temperature, dopant and counterDensity (density is the unknown)
 * @param model - resistivity model code (default: the material's default)
 * @returns the solutions, ascending in density (cm⁻³)
 * @throws PhysicsDomainError for a bad target, model or counter-doping
 * @example dopingSolutions(resistivity(phosphorus1e17At77K), phosphorusAt77K).length // → 3
 */
export function dopingSolutions(target: number, sample: Omit<Sample, 'density'>, model?: string): readonly DopingSolution[] {
  return solve(target, sample, model).solutions;
}

/**
 * Turning points of ln ρ against the net doping, as the scan finds them:
 * where ρ(N) changes between rising and falling (maxima and minima).
 *
 * @param sample - material, temperature, dopant and counterDensity
 * @param model - resistivity model code (not 'astm-f723', which is monotone and not scanned)
 * @returns the turning points, ascending: net density (cm⁻³), resistivity (Ω·cm) and kind
 * @example resistivityTurningPoints(phosphorusAt77K).map((t) => t.kind) // → ['minimum', 'maximum']
 */
export function resistivityTurningPoints(
  sample: Omit<Sample, 'density'>,
  model?: string,
): readonly { netDensity: number; resistivity: number; kind: 'minimum' | 'maximum' }[] {
  const code = resolveResistivityModel(model, sample.material);
  if (code === ASTM_F723_CODE) return [];
  const { scan } = scanFor(sample, code);
  return scan.turningPoints.map((t, i) => {
    const before = i === 0 ? scan.logResistivity[0] : scan.turningPoints[i - 1].logResistivity;
    return { netDensity: Math.exp(t.u), resistivity: Math.exp(t.logResistivity), kind: t.logResistivity > before ? 'maximum' : 'minimum' };
  });
}

/**
 * Forward evaluations the scan makes for a new set of conditions (for the
 * benchmark): its grid points plus the golden-section refinements.
 *
 * @param sample - material, temperature, dopant and counterDensity
 * @param model - resistivity model code (not 'astm-f723', which is not scanned)
 * @returns forward evaluations, made once per conditions (cached)
 * @example scanEvaluations(phosphorusAt300K) // → 153
 */
export function scanEvaluations(sample: Omit<Sample, 'density'>, model?: string): number {
  const { scan } = scanFor(sample, resolveResistivityModel(model, sample.material));
  return scan.grid.length + scan.turningPoints.length * (PEAK_SEARCH_ITERATIONS + 2);
}

function scanFor(
  sample: Omit<Sample, 'density'>,
  code: string,
): { scan: Scan; maxNet: number; densityOf: (u: number) => number; logResistivityAt: (u: number) => number } {
  const { material, dopant, temperature, counterDensity } = sample;
  const conditions = scanConditionsOf(material, dopant, temperature, counterDensity, code);
  const scan = scanOf(material, dopant, temperature, counterDensity, code);
  return { scan, ...conditions };
}

/** The searched range and the forward model in u = ln(N − N_counter) under one set of conditions. */
function scanConditionsOf(
  material: Material,
  dopant: Dopant,
  temperature: number,
  counterDensity: number,
  code: string,
): { maxNet: number; densityOf: (u: number) => number; logResistivityAt: (u: number) => number } {
  const maxNet = NET_DENSITY_SEARCH.maxTotal - counterDensity;
  if (!(maxNet > NET_DENSITY_SEARCH.min)) {
    throw new PhysicsDomainError(
      `counter-doping ${counterDensity} cm⁻³ leaves no room for the dopant below ${NET_DENSITY_SEARCH.maxTotal} cm⁻³ total; ` +
        `use counter-doping below ${NET_DENSITY_SEARCH.maxTotal} cm⁻³.`,
    );
  }
  const densityOf = (u: number): number => counterDensity + Math.exp(u);
  // 'f723-anchored' inverts the form anchored to F723's reverse equation (f723Anchored.ts).
  const forward = (probe: Sample): number =>
    code === F723_ANCHORED_CODE ? anchoredResistivity(probe, 'reverse') : resistivity(probe, code);
  const logResistivityAt = (u: number): number =>
    Math.log(forward({ material, dopant, temperature, counterDensity, density: densityOf(u) }));
  return { maxNet, densityOf, logResistivityAt };
}

/**
 * Scans by conditions (material, dopant, temperature, counter-doping, model;
 * memo.ts, the core's one memo policy): a column of targets under the same
 * conditions scans once.
 */
const scanOf = memoize(256, (material: Material, dopant: Dopant, temperature: number, counterDensity: number, code: string): Scan => {
  const { maxNet, logResistivityAt } = scanConditionsOf(material, dopant, temperature, counterDensity, code);
  return scanConditions(logResistivityAt, Math.log(NET_DENSITY_SEARCH.min), Math.log(maxNet));
});

interface Solved {
  readonly solutions: readonly DopingSolution[];
  readonly code: string;
  /** Reachable ln ρ range, for the out-of-reach message (undefined for 'astm-f723'). */
  readonly reach?: { readonly lowest: number; readonly highest: number; readonly maxNet: number };
}

function solve(target: number, sample: Omit<Sample, 'density'>, model?: string): Solved {
  if (!(target > 0) || !Number.isFinite(target)) {
    throw new PhysicsDomainError(`resistivity ${target} Ω·cm is not allowed: it must be a finite number greater than 0.`);
  }
  const code = resolveResistivityModel(model, sample.material);
  if (code === ASTM_F723_CODE) {
    const species = f723SpeciesFor(sample.dopant.symbol, sample.counterDensity, sample.temperature);
    return { solutions: [{ density: f723Density(species, target), iterations: 0 }], code };
  }

  const { scan, maxNet, densityOf, logResistivityAt } = scanFor(sample, code);

  const logTarget = Math.log(target);
  // Positive where the sample is more resistive than the target.
  const excess = (u: number): number => logResistivityAt(u) - logTarget;
  const { grid, logResistivity, turningPoints } = scan;
  const steps = grid.length - 1;

  // Monotone segments between the ends and the turning points; in each, the
  // points are its ends and the grid points strictly inside it.
  const breaks: TurningPoint[] = [
    { u: grid[0], logResistivity: logResistivity[0] },
    ...turningPoints,
    { u: grid[steps], logResistivity: logResistivity[steps] },
  ];
  const roots: { u: number; iterations: number }[] = [];
  let next = 1; // first grid index not yet placed in a segment
  for (let s = 0; s + 1 < breaks.length; s++) {
    const us = [breaks[s].u];
    const ls = [breaks[s].logResistivity];
    while (next < steps && grid[next] < breaks[s + 1].u) {
      if (grid[next] > breaks[s].u) {
        us.push(grid[next]);
        ls.push(logResistivity[next]);
      }
      next++;
    }
    us.push(breaks[s + 1].u);
    ls.push(breaks[s + 1].logResistivity);
    const first = ls[0] - logTarget;
    const last = ls[ls.length - 1] - logTarget;
    if (first * last > 0) continue; // the target is not between this segment's ends
    // The same operations as excess(u), so the values are identical.
    for (let i = 0; i + 1 < us.length; i++) {
      const a = ls[i] - logTarget;
      const b = ls[i + 1] - logTarget;
      if (a === 0) {
        roots.push({ u: us[i], iterations: 0 });
        break;
      }
      if (b === 0) {
        roots.push({ u: us[i + 1], iterations: 0 });
        break;
      }
      if (a * b < 0) {
        const { root, iterations } = findRoot(excess, us[i], us[i + 1], { xTolerance: LOG_DENSITY_TOLERANCE });
        roots.push({ u: root, iterations });
        break;
      }
    }
  }
  // A root exactly on a turning point belongs to both of its segments.
  const distinct = roots.filter((root, i) => i === 0 || root.u !== roots[i - 1].u);
  const all = [...logResistivity, ...turningPoints.map((t) => t.logResistivity)];
  return {
    solutions: distinct.map(({ u, iterations }) => ({ density: densityOf(u), iterations })),
    code,
    reach: { lowest: Math.min(...all), highest: Math.max(...all), maxNet },
  };
}

function conditionsText(sample: Omit<Sample, 'density'>, code: string): string {
  return `at ${sample.temperature} K (counter-doping ${sample.counterDensity} cm⁻³, model ${code})`;
}

function checkWindow(window: DensityWindow, names: DensityWindowNames): void {
  for (const [end, name] of [
    [window.min, names.min],
    [window.max, names.max],
  ] as const) {
    if (end !== undefined && !(end >= 0 && Number.isFinite(end))) {
      throw new PhysicsDomainError(`${name} ${end} cm⁻³ is not allowed: it must be a finite density ≥ 0.`);
    }
  }
  if (window.min !== undefined && window.max !== undefined && window.min > window.max) {
    throw new PhysicsDomainError(
      `${names.min} ${formatDensity(window.min, 3)} cm⁻³ is above ${names.max} ` +
        `${formatDensity(window.max, 3)} cm⁻³: give the low end first.`,
    );
  }
}

function windowText(window: DensityWindow, names: DensityWindowNames): string {
  const parts: string[] = [];
  if (window.min !== undefined) parts.push(`${names.min} ${formatDensity(window.min, 3)}`);
  if (window.max !== undefined) parts.push(`${names.max} ${formatDensity(window.max, 3)}`);
  return parts.join(' and ');
}

/**
 * Density of sample.dopant giving the target resistivity, with the
 * counter-doping held fixed. Where several densities give the same
 * resistivity (see the module comment) it refuses to choose: an
 * AmbiguousDopingError lists them, unless the window leaves exactly one.
 *
 * @param target - resistivity, Ω·cm (finite, > 0)
 * @param sample - material, temperature, dopant and counterDensity (density is the unknown)
 * @param model - resistivity model code (blank: the material's default, 'f723-anchored' in silicon, which inverts
 *   ASTM F723's N-from-ρ equation; 'astm-f723' uses the standard's reverse equation)
 * @param window - optional density window, cm⁻³ (ends included), to pick one of several solutions
 * @param names - how messages name the window's ends (default window.min, window.max)
 * @returns { density in cm⁻³, iterations }
 * @throws PhysicsDomainError when the target is out of the reachable range (the message gives the range) or
 *   no solution lies in the window (the message lists the solutions); AmbiguousDopingError when several do
 * @example dopingForResistivity(1, boronAt300K).density // ≈ 1.50e16 cm⁻³
 * @example
 * const target = resistivity(phosphorus1e17At77K, 'masetti');
 * dopingForResistivity(target, phosphorusAt77K, 'masetti', { min: 1e16, max: 3e17 }).density // ≈ 1.000e17 cm⁻³ (one of three)
 */
export function dopingForResistivity(
  target: number,
  sample: Omit<Sample, 'density'>,
  model?: string,
  window: DensityWindow = {},
  names: DensityWindowNames = DEFAULT_WINDOW_NAMES,
): DopingSolution {
  checkWindow(window, names);
  const { solutions, code, reach } = solve(target, sample, model);
  const symbol = sample.dopant.symbol;
  if (solutions.length === 0) {
    // Only the scanned models come here: the ASTM reverse equation always has its one solution.
    const { lowest, highest, maxNet } = reach!;
    throw new PhysicsDomainError(
      `resistivity ${formatNumber(target)} Ω·cm cannot be reached with ${symbol} in ${sample.material.code} ` +
        `${conditionsText(sample, code)}: reachable range is about ` +
        `${formatNumber(Math.exp(lowest))} to ${formatNumber(Math.exp(highest))} Ω·cm, ` +
        `for net ${symbol} doping from ${NET_DENSITY_SEARCH.min} to ${formatNumber(maxNet)} cm⁻³.`,
    );
  }
  const inWindow = solutions.filter(
    ({ density }) => (window.min === undefined || density >= window.min) && (window.max === undefined || density <= window.max),
  );
  if (inWindow.length === 1) return inWindow[0];
  const all = solutions.map((s) => s.density);
  const windowed = window.min !== undefined || window.max !== undefined;
  const what = `resistivity ${formatNumber(target)} Ω·cm in ${sample.material.code} ${conditionsText(sample, code)}`;
  if (inWindow.length === 0) {
    throw new PhysicsDomainError(
      `no density of ${symbol} with ${windowText(window, names)} cm⁻³ gives ${what}; ` +
        `the ${all.length === 1 ? 'density that does is' : 'densities that do are'} ${formatDensities(all)} cm⁻³. ` +
        `Move or widen ${names.min}/${names.max} (cm⁻³) to include one.`,
    );
  }
  const found = inWindow.map((s) => s.density);
  throw new AmbiguousDopingError(
    `${found.length} densities of ${symbol}${windowed ? ` with ${windowText(window, names)} cm⁻³` : ''} give ${what}: ` +
      `${formatDensities(found)} cm⁻³ (resistivity does not fall steadily with doping here). ` +
      `Give ${names.min} and/or ${names.max} (cm⁻³) so that only the one you mean lies between them.`,
    found,
  );
}
