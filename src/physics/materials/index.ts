/**
 * Host materials and their parameter tables: Si, Ge, GaAs and 4H-SiC.
 */

import { PhysicsDomainError } from '../errors';
import { GALLIUM_ARSENIDE } from './galliumArsenide';
import { GERMANIUM } from './germanium';
import { SILICON } from './silicon';
import { SILICON_CARBIDE_4H } from './siliconCarbide4H';
import type { Material } from './types';

export type {
  DensityOfStatesModel,
  Dopant,
  DopantKind,
  IntrinsicDensityFit,
  IonizationParameters,
  Material,
  PowerLawDensity,
  Provenance,
  TemperatureDomain,
  VarshniBandgap,
} from './types';
export { SILICON } from './silicon';
export { GERMANIUM } from './germanium';
export { GALLIUM_ARSENIDE } from './galliumArsenide';
export { SILICON_CARBIDE_4H } from './siliconCarbide4H';
export { checkTemperature } from './temperature';
export { effectiveBohrRadius, mottDensity, mottScaledIonization, HYDROGENIC_CONSTANTS } from './ionizationScaling';

/** Every host material, in the order users see them; the first is the default. */
export const MATERIALS: readonly Material[] = [SILICON, GERMANIUM, GALLIUM_ARSENIDE, SILICON_CARBIDE_4H];

/** Codes of the supported materials, as users type them. */
export const MATERIAL_CODES: readonly string[] = MATERIALS.map((material) => material.code);

/**
 * Looks a material up by code, case-insensitively.
 *
 * @param code material code, e.g. 'Si' or 'si'
 * @returns the material with its parameter tables
 * @throws PhysicsDomainError listing the allowed codes if the code is unknown
 * @example resolveMaterial('si').name // → 'silicon'
 */
export function resolveMaterial(code: string): Material {
  const wanted = String(code).trim().toLowerCase();
  const found = MATERIALS.find((material) => material.code.toLowerCase() === wanted);
  if (!found) {
    throw new PhysicsDomainError(`unknown material '${code}': allowed materials are ${MATERIAL_CODES.join(', ')}`);
  }
  return found;
}
