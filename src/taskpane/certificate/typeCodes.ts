/**
 * How a certificate's type column becomes the dopant argument of the DRIFT
 * functions. On a certificate "P" and "N" are conductivity types (p-type,
 * n-type), while the DRIFT functions read "P" as phosphorus, a donor. With
 * the pane's "type column gives conductivity type" switch on (the default),
 * a lone P or N is translated to the generic acceptor 'p' or donor 'n' by a
 * live formula in a helper column; every other entry (B, As, Sb, Boron,
 * Phosphorus, n-type, p-type…) is passed on for the functions' own dopant
 * look-up to decide. With the switch off, "P" is phosphorus and "N" whatever
 * the material's look-up makes of it (the generic donor in silicon, nitrogen
 * in 4H-SiC). The generic dopants use the parameters of B (p) and P (n)
 * in silicon (see src/physics/dopants.ts), so mobility is that of those
 * elements.
 */
import { dopantCodes, resolveDopant, resolveMaterial } from '../../physics';

/**
 * Formula text (without '=') that turns a type cell into a dopant code.
 *
 * Comparison with "=" is case-insensitive in Excel and in the engine, so "p"
 * and "P" both become 'p' when the switch is on.
 *
 * @param cell - A1 reference of the type cell, e.g. 'C2'
 * @param typeMeansConductivity - true: lone P/N mean p-type/n-type; false: passed on as written (P = phosphorus)
 * @example dopantCodeFormula('C2', true) // 'IF(TRIM(C2)="P","p",IF(TRIM(C2)="N","n",TRIM(C2)))'
 */
export function dopantCodeFormula(cell: string, typeMeansConductivity: boolean): string {
  const trimmed = `TRIM(${cell})`;
  return typeMeansConductivity ? `IF(${trimmed}="P","p",IF(${trimmed}="N","n",${trimmed}))` : trimmed;
}

/**
 * What dopantCodeFormula gives for a value, computed here to warn before writing.
 *
 * @example dopantCodeFor(' N ', true) // 'n'
 */
export function dopantCodeFor(value: unknown, typeMeansConductivity: boolean): string {
  const text = String(value ?? '').trim();
  if (typeMeansConductivity && text.toUpperCase() === 'P') return 'p';
  if (typeMeansConductivity && text.toUpperCase() === 'N') return 'n';
  return text;
}

/**
 * Whether the functions' dopant look-up knows a code in a material.
 *
 * @param code - dopant code as dopantCodeFor gives it
 * @param materialCode - e.g. 'Si'
 * @returns the dopant's name ('boron', 'generic acceptor'…) or null when unknown
 * @example knownDopant('p', 'Si') // the generic acceptor's name
 */
export function knownDopant(code: string, materialCode: string): string | null {
  try {
    return resolveDopant(resolveMaterial(materialCode), code).name;
  } catch {
    // Unknown codes are reported to the user by the caller, with the row.
    return null;
  }
}

/**
 * The dopant codes a material accepts, for messages.
 *
 * @param materialCode - e.g. 'Si'
 * @returns e.g. 'B, Al, Ga, In, P, As, Sb, n, p'; empty for an unknown material
 */
export function dopantCodeList(materialCode: string): string {
  try {
    return dopantCodes(resolveMaterial(materialCode)).join(', ');
  } catch {
    // An unknown material is refused elsewhere with its own message.
    return '';
  }
}
