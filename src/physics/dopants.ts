/**
 * Dopant look-up. The tables themselves live with the material
 * (materials/siliconDopants.ts) so every parameter sits next to its citation.
 *
 * Codes are case-insensitive, with one necessary exception: 'P' (phosphorus)
 * and 'p' (generic acceptor) differ only in case. An exact-case match is tried
 * first, so 'P' is phosphorus and 'p' the generic acceptor; other spellings
 * ('b', 'AS', 'N') fall back to a case-insensitive match. The unambiguous
 * aliases 'n-type'/'p-type' and the element names ('phosphorus') are accepted too.
 */

import { PhysicsDomainError } from './errors';
import type { Dopant, DopantKind, Material } from './materials/types';

export type { Dopant, DopantKind } from './materials/types';

/**
 * Dopant codes a material accepts, in display order.
 *
 * @param material host material
 * @returns e.g. ['B', 'Al', 'Ga', 'In', 'P', 'As', 'Sb', 'n', 'p'] for silicon
 * @example dopantCodes(SILICON).length // 9
 */
export function dopantCodes(material: Material): readonly string[] {
  return material.dopants.map((dopant) => dopant.symbol);
}

function genericAlias(material: Material, lowerCode: string): string | undefined {
  const aliases: Record<string, string> = {
    'n-type': material.genericDopants.donor,
    'p-type': material.genericDopants.acceptor,
    ntype: material.genericDopants.donor,
    ptype: material.genericDopants.acceptor,
  };
  return aliases[lowerCode];
}

/**
 * Looks a dopant up by code.
 *
 * @param material host material
 * @param code symbol ('P', 'b', 'As'), generic 'n'/'p', alias 'n-type'/'p-type',
 *   or element name ('boron'); see the module note on 'P' versus 'p'
 * @returns the dopant with its parameter tables
 * @throws PhysicsDomainError listing the allowed codes if unknown
 * @example resolveDopant(SILICON, 'as').name // 'arsenic'
 */
export function resolveDopant(material: Material, code: string): Dopant {
  const text = String(code).trim();
  const exact = material.dopants.find((dopant) => dopant.symbol === text);
  if (exact) return exact;
  const lower = text.toLowerCase();
  const alias = genericAlias(material, lower);
  const found = alias
    ? material.dopants.find((dopant) => dopant.symbol === alias)
    : material.dopants.find((dopant) => dopant.symbol.toLowerCase() === lower || dopant.name.toLowerCase() === lower);
  if (!found) {
    throw new PhysicsDomainError(
      `unknown dopant '${code}' for ${material.name}: allowed dopants are ${dopantCodes(material).join(', ')} ` +
        `('n'/'p' or 'n-type'/'p-type' for a generic donor/acceptor)`,
    );
  }
  return found;
}

/**
 * The generic donor ('n') or acceptor ('p') of a material.
 *
 * @param material host material
 * @param kind 'donor' or 'acceptor'
 * @returns the generic dopant (silicon: parameters of P or B)
 * @throws PhysicsDomainError if kind is neither
 * @example genericDopant(SILICON, 'acceptor').symbol // 'p'
 */
export function genericDopant(material: Material, kind: DopantKind): Dopant {
  if (kind !== 'donor' && kind !== 'acceptor') {
    throw new PhysicsDomainError(`unknown dopant kind '${String(kind)}': allowed kinds are donor, acceptor`);
  }
  return resolveDopant(material, material.genericDopants[kind]);
}
