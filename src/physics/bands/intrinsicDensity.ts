/**
 * Intrinsic carrier density ni(T), selectable among published models.
 *
 * Models (silicon):
 * - 'misiakos' (default): Misiakos & Tsamakis, J. Appl. Phys. 74, 3293 (1993)
 * - 'sproul-green': Sproul & Green, J. Appl. Phys. 70, 846 (1991)
 * - 'dos': ni = sqrt(Nc·Nv)·exp(−Eg/2kT) from the material's band gap and
 *   densities of states (Thurmond 1975 gap, Green 1990 Nc, Nv)
 *
 * Everything is computed as ln ni first: at low temperature ni itself
 * underflows (below about 9 K in silicon) while ln ni stays exact, and the
 * equilibrium solver works with ln ni so that it never meets 0 or infinity.
 */

import { thermalVoltage } from '../constants';
import { PhysicsDomainError } from '../errors';
import { MATERIALS } from '../materials';
import { SILICON } from '../materials/silicon';
import type { IntrinsicDensityFit, Material } from '../materials/types';
import { checkTemperature } from '../materials/temperature';
import { bandgap } from './bandgap';
import { logConductionBandDensity, logValenceBandDensity } from './densityOfStates';

/** Code of the model built from the band gap and the densities of states. */
export const DOS_INTRINSIC_MODEL = 'dos';

/**
 * ni model codes a material offers: its published fits, then 'dos'.
 *
 * @param material host material
 * @returns lower-case codes; the first is the material's default
 * @example intrinsicModelCodes(SILICON) // → ['misiakos', 'sproul-green', 'dos']
 */
export function intrinsicModelCodes(material: Material): readonly string[] {
  return [...material.intrinsicFits.map((fit) => fit.code), DOS_INTRINSIC_MODEL];
}

/** ni model codes for silicon; the first ('misiakos') is the default. */
export const INTRINSIC_MODEL_CODES: readonly string[] = intrinsicModelCodes(SILICON);

/**
 * Normalises an ni model code: case-insensitive, undefined or blank means the
 * material's default.
 *
 * @param material host material
 * @param model code such as 'Misiakos', 'dos', or undefined
 * @returns the canonical lower-case code
 * @throws PhysicsDomainError listing the allowed codes if unknown
 * @example resolveIntrinsicModel(SILICON, 'SPROUL-GREEN') // → 'sproul-green'
 */
export function resolveIntrinsicModel(material: Material, model?: string): string {
  const codes = intrinsicModelCodes(material);
  if (model === undefined || String(model).trim() === '') return codes[0];
  const wanted = String(model).trim().toLowerCase();
  const found = codes.find((code) => code === wanted);
  if (!found) {
    const owners = MATERIALS.filter((other) => intrinsicModelCodes(other).includes(wanted)).map((other) => other.name);
    if (owners.length > 0) {
      throw new PhysicsDomainError(
        `intrinsic density model '${wanted}' has parameters for ${owners.join(', ')} only; ` +
          `${material.name} supports: ${codes.join(', ')}`,
      );
    }
    throw new PhysicsDomainError(`unknown intrinsic density model '${model}' for ${material.name}: allowed models are ${codes.join(', ')}`);
  }
  return found;
}

function logFit(fit: IntrinsicDensityFit, temperature: number): number {
  return (
    Math.log(fit.prefactor) + fit.exponent * Math.log(temperature / fit.referenceTemperature) - fit.activationTemperature / temperature
  );
}

/**
 * ln ni for the selected model.
 *
 * @param material host material
 * @param temperature K, inside the material's temperature domain
 * @param model ni model code (default: the material's first)
 * @returns natural log of ni in cm⁻³
 * @example logIntrinsicDensity(SILICON, 300) // ≈ 22.995 (ln 9.70e9)
 */
export function logIntrinsicDensity(material: Material, temperature: number, model?: string): number {
  checkTemperature(material, temperature);
  const code = resolveIntrinsicModel(material, model);
  if (code === DOS_INTRINSIC_MODEL) {
    const kT = thermalVoltage(temperature);
    const logEffectiveDensity = 0.5 * (logConductionBandDensity(material, temperature) + logValenceBandDensity(material, temperature));
    return logEffectiveDensity - bandgap(material, temperature) / (2 * kT);
  }
  const fit = material.intrinsicFits.find((candidate) => candidate.code === code) as IntrinsicDensityFit;
  return logFit(fit, temperature);
}

/**
 * Intrinsic carrier density ni(T).
 *
 * @param material host material (e.g. SILICON)
 * @param temperature K, inside the material's temperature domain
 * @param model 'misiakos' (default), 'sproul-green' or 'dos'; case-insensitive
 * @returns ni in cm⁻³ (0 only where it underflows a double, below about 9 K)
 * @throws PhysicsDomainError for an unknown model or a temperature outside the domain
 * @example intrinsicDensity(SILICON, 300) // ≈ 9.70e9 cm⁻³
 */
export function intrinsicDensity(material: Material, temperature: number, model?: string): number {
  return Math.exp(logIntrinsicDensity(material, temperature, model));
}
