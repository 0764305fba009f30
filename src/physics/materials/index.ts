/**
 * Host materials and their parameter tables. Only silicon for now.
 */

import { PhysicsDomainError } from '../errors';
import { SILICON } from './silicon';
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
export { checkTemperature } from './temperature';

const MATERIALS: readonly Material[] = [SILICON];

/** Codes of the supported materials, as users type them. */
export const MATERIAL_CODES: readonly string[] = MATERIALS.map((material) => material.code);

/**
 * Looks a material up by code, case-insensitively.
 *
 * @param code material code, e.g. 'Si' or 'si'
 * @returns the material with its parameter tables
 * @throws PhysicsDomainError listing the allowed codes if the code is unknown
 * @example resolveMaterial('si').name // 'silicon'
 */
export function resolveMaterial(code: string): Material {
  const wanted = String(code).trim().toLowerCase();
  const found = MATERIALS.find((material) => material.code.toLowerCase() === wanted);
  if (!found) {
    throw new PhysicsDomainError(
      `unknown material '${code}': allowed materials are ${MATERIAL_CODES.join(', ')}`,
    );
  }
  return found;
}
