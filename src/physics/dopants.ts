/**
 * Dopant look-up. The tables themselves live with the material
 * (materials/siliconDopants.ts) so every parameter sits next to its citation.
 *
 * Every code is case-insensitive and means one thing: element symbols ('B',
 * 'as'), element names ('boron'), and for the generic dopants the words
 * 'donor' / 'acceptor' (also 'n-type' / 'p-type', 'generic donor'…). No two
 * codes of a material differ by case alone (tests/physics/dopants.test.ts).
 *
 * Typed text is read with readDopant, which in addition refuses a lone 'P'
 * or 'N' in any case: engineers write P and N both for phosphorus / nitrogen
 * and for p-type / n-type (certificates do), and the two readings differ by
 * about 3× in resistivity, so neither is chosen silently. resolveDopant is the
 * look-up for code, where 'P' is the element symbol.
 */

import { PhysicsDomainError } from './errors';
import type { Dopant, DopantKind, Material } from './materials/types';

export type { Dopant, DopantKind } from './materials/types';

/**
 * Dopant codes a material accepts, in display order.
 *
 * @param material host material
 * @returns e.g. ['B', 'Al', 'Ga', 'In', 'P', 'As', 'Sb', 'donor', 'acceptor'] for silicon
 * @example dopantCodes(SILICON).length // → 9
 */
export function dopantCodes(material: Material): readonly string[] {
  return material.dopants.map((dopant) => dopant.symbol);
}

/**
 * The codes to type for a material's dopants, in display order: the symbol,
 * or the element name where a lone letter is refused (phosphorus, nitrogen).
 *
 * @param material host material
 * @returns e.g. ['B', 'Al', 'Ga', 'In', 'phosphorus', 'As', 'Sb', 'donor', 'acceptor'] for silicon
 * @example typedDopantCodes(SILICON).includes('P') // → false
 */
export function typedDopantCodes(material: Material): readonly string[] {
  return material.dopants.map((dopant) => (dopantCodeProblem(dopant.symbol) ? dopant.name : dopant.symbol));
}

/** Other spellings of the generic dopants, lower case. */
const GENERIC_ALIASES: Readonly<Record<string, DopantKind>> = {
  'n-type': 'donor',
  'p-type': 'acceptor',
  'n type': 'donor',
  'p type': 'acceptor',
  ntype: 'donor',
  ptype: 'acceptor',
};

/** Other spellings of element names, lower case. */
const NAME_ALIASES: Readonly<Record<string, string>> = { aluminum: 'aluminium' };

/** The two readings of each one-letter code that is refused in typed text. */
const AMBIGUOUS_LETTERS: Readonly<Record<string, { readonly element: string; readonly kind: DopantKind; readonly type: string }>> = {
  p: { element: 'phosphorus', kind: 'acceptor', type: 'p-type' },
  n: { element: 'nitrogen', kind: 'donor', type: 'n-type' },
};

/**
 * Why typed dopant text cannot be taken as it stands, or null if it can.
 *
 * @param code dopant text as typed
 * @returns a message naming both readings and what to type, for 'P', 'p', 'N', 'n'
 * @example dopantCodeProblem('p') // → 'dopant "p" could mean phosphorus or a generic acceptor (p-type); type "phosphorus" or "acceptor"'
 */
export function dopantCodeProblem(code: string): string | null {
  const text = String(code).trim();
  const letter = AMBIGUOUS_LETTERS[text.toLowerCase()];
  if (!letter) return null;
  return (
    `dopant "${text}" could mean ${letter.element} or a generic ${letter.kind} (${letter.type}); ` +
    `type "${letter.element}" or "${letter.kind}"`
  );
}

/**
 * Looks a dopant up by code, case-insensitively.
 *
 * @param material host material
 * @param code symbol ('P', 'b', 'As'), element name ('boron'), or generic
 *   'donor'/'acceptor' (also 'n-type'/'p-type', 'generic donor')
 * @returns the dopant with its parameter tables
 * @throws PhysicsDomainError listing the allowed codes if unknown
 * @example resolveDopant(SILICON, 'as').name // → 'arsenic'
 */
export function resolveDopant(material: Material, code: string): Dopant {
  const lower = String(code).trim().toLowerCase();
  const generic = GENERIC_ALIASES[lower];
  const wanted = generic ? material.genericDopants[generic].toLowerCase() : (NAME_ALIASES[lower] ?? lower);
  const found = material.dopants.find((dopant) => dopant.symbol.toLowerCase() === wanted || dopant.name.toLowerCase() === wanted);
  if (!found) {
    throw new PhysicsDomainError(
      `unknown dopant '${code}' for ${material.name}: allowed dopants are ${typedDopantCodes(material).join(', ')} ` +
        `(symbols or element names, any case; 'n-type'/'p-type' also name the generic donor/acceptor)`,
    );
  }
  return found;
}

/**
 * Reads a dopant from typed text (cells, the command line, the pane): as
 * resolveDopant, but a lone 'P' or 'N' is refused with both readings.
 *
 * @param material host material
 * @param code dopant text as typed
 * @returns the dopant
 * @throws PhysicsDomainError for an ambiguous or unknown code
 * @example readDopant(SILICON, 'Phosphorus').symbol // → 'P'
 */
export function readDopant(material: Material, code: string): Dopant {
  const problem = dopantCodeProblem(code);
  if (problem) throw new PhysicsDomainError(problem);
  return resolveDopant(material, code);
}

/**
 * The generic donor or acceptor of a material.
 *
 * @param material host material
 * @param kind 'donor' or 'acceptor'
 * @returns the generic dopant (silicon: parameters of P or B)
 * @throws PhysicsDomainError if kind is neither
 * @example genericDopant(SILICON, 'acceptor').symbol // → 'acceptor'
 */
export function genericDopant(material: Material, kind: DopantKind): Dopant {
  if (kind !== 'donor' && kind !== 'acceptor') {
    throw new PhysicsDomainError(`unknown dopant kind '${String(kind)}': allowed kinds are donor, acceptor`);
  }
  return resolveDopant(material, material.genericDopants[kind]);
}
