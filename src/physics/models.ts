/**
 * Registry of every model code the core knows, with what it computes, its
 * citation and validity range: the table behind DRIFT.MODELS() and the help
 * pages. Band-structure, ni, statistics and ionization entries come from
 * bands/modelInfo.ts, the mobility models' rows from their entries in
 * mobility/registry.ts; the resistivity-only conversions are described here
 * from the citation constants beside their tables.
 */
import { PhysicsDomainError } from './errors';
import { BAND_MODELS } from './bands/modelInfo';
import { F723_SOURCE, F723_VALIDITY, f723RangeText } from './astmF723';
import { LAYER_MODELS } from './layers/modelInfo';
import { locationOf, type ModelInfo } from './modelInfo';
import { MEASUREMENT_MODELS } from './measurement/modelInfo';
import { HIGH_FIELD_MODELS } from './highField/modelInfo';
import { MATERIAL_MODELS } from './materials/modelInfo';
import { MOBILITY_MODEL_REGISTRY, mobilityModelsOf, type MobilityModel } from './mobility/registry';
import { SILICON } from './materials/silicon';

export type { ModelInfo };

/** A mobility model's DRIFT.MODELS row: its registry entry's description and where it lives. */
function mobilityModelInfo(model: MobilityModel): ModelInfo {
  return {
    code: model.code,
    quantity: model.quantity,
    name: model.name,
    citation: model.citation,
    validity: model.validity,
    notes: model.notes,
    ...locationOf(model),
  };
}

const RESISTIVITY_ONLY_MODELS: readonly ModelInfo[] = [
  {
    code: 'f723-anchored',
    quantity: 'resistivity ↔ dopant density',
    name: 'Physics resistivity (silicon default mobility model) anchored to ASTM F723 at 23 °C',
    citation: `${F723_SOURCE.citation}; physics as for ${mobilityModelsOf(SILICON.code)[0].code}`,
    validity:
      'Silicon, any dopant, temperature and counter-doping the physics model covers; equals F723 (B, P) at 296.15 K without ' +
      "counter-doping over F723's ranges; elsewhere F723's density dependence times the physics model's " +
      'temperature and compensation dependence',
    notes:
      'ρ = ρ_phys · k(N), k = ρ_F723(N)/ρ_phys(N, 296.15 K, uncompensated), k of the dopant density only: B and P anchored, ' +
      `other dopants (As included, whose F723 range is only ${f723RangeText(F723_VALIDITY.As.density)} ` +
      `cm⁻³) k = 1. RESISTIVITY uses F723's ρ-from-N equation, ` +
      "DOPING its N-from-ρ equation, so each direction is the standard's own and they disagree by its stated self-consistency " +
      "(3 % B, 4.5 % P). Outside F723's ranges ln k levels off smoothly (continuous value and slope). Not a mobility model.",
    equation: 'src/physics/f723Anchored.ts',
    parameterTable: 'src/physics/astmF723.ts',
    tests: ['tests/physics/f723Anchored.test.ts'],
  },
  {
    code: 'astm-f723',
    quantity: 'resistivity ↔ dopant density',
    name: 'ASTM F723 conversion (Thurber et al. 1981 equations)',
    citation: F723_SOURCE.citation,
    validity: F723_SOURCE.validity,
    notes: 'Closed-form conversion for resistivity and doping only; not a mobility model.',
    equation: 'src/physics/astmF723.ts',
    parameterTable: 'src/physics/astmF723.ts',
    tests: ['tests/physics/reference/astm-f723.reference.test.ts', 'tests/physics/astmF723.test.ts'],
  },
];

/** Transport models: silicon's mobility models, the resistivity-only ones, then the other materials' mobility fits. */
const TRANSPORT_MODELS: readonly ModelInfo[] = [
  ...MOBILITY_MODEL_REGISTRY.filter((model) => model.materials.includes(SILICON.code)).map(mobilityModelInfo),
  ...RESISTIVITY_ONLY_MODELS,
  ...MOBILITY_MODEL_REGISTRY.filter((model) => !model.materials.includes(SILICON.code)).map(mobilityModelInfo),
];

/** Every model code: ni, band gap, densities of states, statistics, ionization, mobility, ASTM F723. */
export const MODEL_REGISTRY: readonly ModelInfo[] = [
  ...BAND_MODELS,
  ...MATERIAL_MODELS,
  ...TRANSPORT_MODELS,
  ...HIGH_FIELD_MODELS,
  ...LAYER_MODELS,
  ...MEASUREMENT_MODELS,
];

/**
 * Looks a model up by code, case-insensitively.
 *
 * @param code - e.g. 'Masetti'
 * @returns its registry entry
 * @throws PhysicsDomainError listing every code
 * @example modelInfo('astm-f723').quantity // → 'resistivity ↔ dopant density'
 */
export function modelInfo(code: string): ModelInfo {
  const wanted = String(code).trim().toLowerCase();
  const found = MODEL_REGISTRY.find((entry) => entry.code.toLowerCase() === wanted);
  if (found === undefined) {
    throw new PhysicsDomainError(`unknown model '${code}'. Allowed: ${MODEL_REGISTRY.map((entry) => entry.code).join(', ')}.`);
  }
  return found;
}
