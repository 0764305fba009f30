/**
 * How far the published resistivity models disagree for one sample: the
 * lowest and highest value over every resistivity model that covers it.
 *
 * This is the spread between published fits (Masetti, Arora, Caughey–Thomas,
 * Klaassen, the F723 conversion and the default anchored to it), not a
 * measurement uncertainty: where the fits were made against the same data
 * they agree closely, and they can all share a bias.
 *
 * Which models cover a sample: every resistivity model of its material
 * (resistivityModelCodes), except 'astm-f723' where the standard does not
 * apply (not silicon B/P/As, counter-doped, outside 290–305 K, or the value
 * outside its stated range). Any other model that refuses the sample (an
 * ambiguous inverse at low temperature, say) makes the spread an error with
 * that model's message: a spread over fewer models than it names would
 * mislead.
 */
import type { Sample } from './sample';
import { PhysicsDomainError } from './errors';
import { ASTM_F723_CODE, resistivity, resistivityModelCodes } from './transport';
import { dopingForResistivity, type DensityWindow, type DensityWindowNames } from './inverse';
import { F723_VALIDITY, f723SpeciesFor, type F723Species } from './astmF723';
import { SILICON } from './materials';

/** The lowest and highest value over the models, and which models gave them. */
export interface ModelSpread {
  readonly lowest: number;
  readonly highest: number;
  /** highest / lowest − 1. */
  readonly relativeSpread: number;
  readonly models: readonly string[];
}

/** The F723 species of a sample where the standard applies (its own rule, f723SpeciesFor), else undefined. */
function f723Species(sample: Omit<Sample, 'density'>): F723Species | undefined {
  if (sample.material.code !== SILICON.code) return undefined;
  try {
    return f723SpeciesFor(sample.dopant.symbol, sample.counterDensity, sample.temperature);
  } catch (error) {
    if (error instanceof PhysicsDomainError) return undefined;
    throw error;
  }
}

function spreadOf(values: readonly { model: string; value: number }[]): ModelSpread {
  if (values.length === 0) throw new PhysicsDomainError('no resistivity model covers this sample');
  const lowest = Math.min(...values.map((v) => v.value));
  const highest = Math.max(...values.map((v) => v.value));
  return { lowest, highest, relativeSpread: highest / lowest - 1, models: values.map((v) => v.model) };
}

function withModel<T>(model: string, run: () => T): T {
  try {
    return run();
  } catch (error) {
    if (error instanceof PhysicsDomainError) throw new PhysicsDomainError(`model ${model}: ${error.message}`);
    throw error;
  }
}

/**
 * Resistivity of a sample under every resistivity model that covers it.
 *
 * @param sample - the sample
 * @returns lowest and highest ρ in Ω·cm, their relative spread and the models used
 * @throws PhysicsDomainError naming the model when a covering model refuses the sample
 * @example resistivitySpread(boron1e16At300K).models // → ['f723-anchored', 'masetti', 'arora', 'caughey-thomas', 'klaassen', 'astm-f723']
 */
export function resistivitySpread(sample: Sample): ModelSpread {
  const species = f723Species(sample);
  const values: { model: string; value: number }[] = [];
  for (const model of resistivityModelCodes(sample.material)) {
    if (model === ASTM_F723_CODE) {
      const range = species === undefined ? undefined : F723_VALIDITY[species].density;
      if (range === undefined || !(sample.density >= range.min && sample.density <= range.max)) continue;
    }
    values.push({ model, value: withModel(model, () => resistivity(sample, model)) });
  }
  return spreadOf(values);
}

/**
 * Dopant density for a resistivity under every resistivity model that covers it.
 *
 * @param target - resistivity, Ω·cm
 * @param sample - material, temperature, dopant and counterDensity
 * @param window - optional density window, cm⁻³, applied to every model (as DRIFT.DOPING's doping_min/doping_max)
 * @param names - how messages name the window's ends
 * @returns lowest and highest density in cm⁻³, their relative spread and the models used
 * @throws PhysicsDomainError naming the model when a covering model refuses (e.g. several densities at 77 K)
 * @example dopingSpread(10, boronAt296K).lowest // ≈ 1.3e15
 */
export function dopingSpread(
  target: number,
  sample: Omit<Sample, 'density'>,
  window: DensityWindow = {},
  names?: DensityWindowNames,
): ModelSpread {
  const species = f723Species(sample);
  const values: { model: string; value: number }[] = [];
  for (const model of resistivityModelCodes(sample.material)) {
    if (model === ASTM_F723_CODE) {
      const range = species === undefined ? undefined : F723_VALIDITY[species].resistivity;
      if (range === undefined || !(target >= range.min && target <= range.max)) continue;
    }
    values.push({ model, value: withModel(model, () => dopingForResistivity(target, sample, model, window, names).density) });
  }
  return spreadOf(values);
}
