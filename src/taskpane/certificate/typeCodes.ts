/**
 * How a certificate's type column becomes the dopant argument of the DRIFT
 * functions. A lone P or N on a certificate could be a conductivity type
 * (p-type, n-type) or an element (phosphorus, nitrogen), and the DRIFT
 * functions refuse it for that reason. The pane's switch says which the
 * column means, and a live formula in a helper column writes the unambiguous
 * word: on (the default), P → "acceptor" and N → "donor"; off, P →
 * "phosphorus" and N → "nitrogen" (in any case: "p" and "P" are the same
 * entry). Every other entry (B, As, Sb, Boron, n-type, p-type…) is passed on
 * for the functions' own dopant look-up. The generic dopants use the
 * parameters of B (acceptor) and P (donor) in silicon (see
 * src/physics/dopants.ts), so mobility is that of those elements.
 */
import { readDopant, resolveMaterial, typedDopantCodes } from '../../catalog/physicsFacade';

/** What a lone letter of the type column becomes, by the switch. */
const LONE_LETTERS = {
  conductivity: { P: 'acceptor', N: 'donor' },
  element: { P: 'phosphorus', N: 'nitrogen' },
} as const;

/**
 * Formula text (without '=') that turns a type cell into a dopant code.
 *
 * Comparison with "=" is case-insensitive in Excel and in the engine, so "p"
 * and "P" become the same word.
 *
 * @param cell - A1 reference of the type cell, e.g. 'C2'
 * @param typeMeansConductivity - true: lone P/N mean p-type/n-type; false: phosphorus/nitrogen
 * @example dopantCodeFormula('C2', true) // 'IF(TRIM(C2)="P","acceptor",IF(TRIM(C2)="N","donor",TRIM(C2)))'
 */
export function dopantCodeFormula(cell: string, typeMeansConductivity: boolean): string {
  const trimmed = `TRIM(${cell})`;
  const words = LONE_LETTERS[typeMeansConductivity ? 'conductivity' : 'element'];
  return `IF(${trimmed}="P","${words.P}",IF(${trimmed}="N","${words.N}",${trimmed}))`;
}

/**
 * What dopantCodeFormula gives for a value, computed here to warn before writing.
 *
 * @example dopantCodeFor(' n ', true) // 'donor'
 */
export function dopantCodeFor(value: unknown, typeMeansConductivity: boolean): string {
  const text = String(value ?? '').trim();
  const words = LONE_LETTERS[typeMeansConductivity ? 'conductivity' : 'element'];
  const letter = text.toUpperCase();
  return letter === 'P' || letter === 'N' ? words[letter] : text;
}

/**
 * Whether the functions' dopant look-up takes a code in a material.
 *
 * @param code - dopant code as dopantCodeFor gives it
 * @param materialCode - e.g. 'Si'
 * @returns the dopant's name ('boron', 'generic acceptor'…) or null when unknown or ambiguous
 * @example knownDopant('acceptor', 'Si') // 'generic acceptor'
 */
export function knownDopant(code: string, materialCode: string): string | null {
  try {
    return readDopant(resolveMaterial(materialCode), code).name;
  } catch {
    // Unknown codes are reported to the user by the caller, with the row.
    return null;
  }
}

/**
 * The dopant codes a material accepts, for messages.
 *
 * @param materialCode - e.g. 'Si'
 * @returns e.g. 'B, Al, Ga, In, phosphorus, As, Sb, donor, acceptor'; empty for an unknown material
 */
export function dopantCodeList(materialCode: string): string {
  try {
    return typedDopantCodes(resolveMaterial(materialCode)).join(', ');
  } catch {
    // An unknown material is refused elsewhere with its own message.
    return '';
  }
}
