/**
 * The high-field tables of every material, keyed by material code, and the
 * look-up that refuses, with a message naming what exists, anything missing.
 */
import { PhysicsDomainError } from '../errors';
import type { Carrier } from '../sample';
import { QUAY_GALLIUM_ARSENIDE, QUAY_GERMANIUM, QUAY_SILICON } from './quay';
import { KHAN_COOPER_SILICON_CARBIDE } from './siliconCarbide';
import type { CarrierHighFieldTable, MaterialHighFieldTables, MissingHighFieldTable } from './types';

/** One entry per material code, in the order messages list them. */
export const HIGH_FIELD_TABLES: readonly MaterialHighFieldTables[] = [
  QUAY_SILICON,
  QUAY_GERMANIUM,
  QUAY_GALLIUM_ARSENIDE,
  KHAN_COOPER_SILICON_CARBIDE,
];

/** Material codes with high-field tables. */
export const HIGH_FIELD_MATERIAL_CODES: readonly string[] = HIGH_FIELD_TABLES.map((entry) => entry.material);

function isMissing(entry: CarrierHighFieldTable | MissingHighFieldTable): entry is MissingHighFieldTable {
  return 'missing' in entry;
}

/**
 * Both carriers' tables of a material, by code (case-insensitive).
 *
 * @param materialCode - e.g. 'Si', 'gaas'
 * @returns the material's tables
 * @throws PhysicsDomainError naming the materials that have tables
 * @example materialHighFieldTables('GaAs').limitations // → 'GaAs electrons show negative differential mobility …'
 */
export function materialHighFieldTables(materialCode: string): MaterialHighFieldTables {
  const wanted = String(materialCode).trim().toLowerCase();
  const found = HIGH_FIELD_TABLES.find((entry) => entry.material.toLowerCase() === wanted);
  if (found === undefined) {
    throw new PhysicsDomainError(
      `no saturation velocity is tabulated for material '${materialCode}'; available: ${HIGH_FIELD_MATERIAL_CODES.join(', ')}`,
    );
  }
  return found;
}

/**
 * The table of one carrier in one material.
 *
 * @param materialCode - 'Si', 'Ge', 'GaAs' or '4H-SiC' (case-insensitive)
 * @param carrier - 'electron' or 'hole'
 * @returns the carrier's table
 * @throws PhysicsDomainError for an unknown material or a carrier without published data (4H-SiC holes)
 * @example carrierHighFieldTable('Si', 'hole').modelCode // → 'quay-2000'
 */
export function carrierHighFieldTable(materialCode: string, carrier: Carrier): CarrierHighFieldTable {
  const entry = materialHighFieldTables(materialCode)[carrier];
  if (isMissing(entry)) throw new PhysicsDomainError(entry.missing);
  return entry;
}

/**
 * Why a carrier in a material has no saturation velocity at any temperature,
 * or undefined if it has one.
 *
 * @param materialCode - 'Si', 'Ge', 'GaAs' or '4H-SiC' (case-insensitive)
 * @param carrier - 'electron' or 'hole'
 * @returns the reason, or undefined
 * @example missingSaturationVelocity('4H-SiC', 'hole') // → 'no published hole saturation velocity for 4H-SiC in this release: …'
 */
export function missingSaturationVelocity(materialCode: string, carrier: Carrier): string | undefined {
  const entry = materialHighFieldTables(materialCode)[carrier];
  return isMissing(entry) ? entry.missing : undefined;
}
