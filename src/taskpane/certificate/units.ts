/**
 * Units a certificate's headers may state, with the factor to the unit the
 * DRIFT functions take (Ω·cm for resistivity, µm for lengths), and how a unit
 * is read from a header such as "Thickness (mm)" or "Rho min [mOhm·cm]".
 */

/** A unit a column can be given in. */
export interface ColumnUnit {
  readonly code: string;
  /** As the pane shows it. */
  readonly label: string;
  /** Multiply a value in this unit by factor to get the functions' unit. */
  readonly factor: number;
  /** Where the factor comes from. */
  readonly source: string;
  /**
   * Header spellings, compared in lower case after folding (see foldUnitText). Empty for
   * resistivity units, which are read by pattern because mΩ (milli) and MΩ (mega) differ only in case.
   */
  readonly spellings: readonly string[];
}

/** Thickness units; the DRIFT functions take µm. */
export const THICKNESS_UNITS: readonly ColumnUnit[] = [
  {
    code: 'um',
    label: 'µm',
    factor: 1,
    source: 'the functions’ own unit',
    spellings: ['um', 'micron', 'microns', 'micrometre', 'micrometer', 'micrometres', 'micrometers'],
  },
  {
    code: 'mm',
    label: 'mm',
    factor: 1000,
    source: 'SI prefixes: 1 mm = 1000 µm',
    spellings: ['mm', 'millimetre', 'millimeter', 'millimetres', 'millimeters'],
  },
  {
    code: 'mil',
    label: 'mil (0.001 inch)',
    factor: 25.4,
    source: 'the inch is 25.4 mm exactly (international yard and pound agreement, 1959), so 1 mil = 0.001 in = 25.4 µm',
    spellings: ['mil', 'mils', 'thou'],
  },
];

/** Resistivity units; the DRIFT functions take Ω·cm. */
export const RESISTIVITY_UNITS: readonly ColumnUnit[] = [
  { code: 'ohm-cm', label: 'Ω·cm', factor: 1, source: 'the functions’ own unit', spellings: [] },
  { code: 'mohm-cm', label: 'mΩ·cm', factor: 1e-3, source: 'SI prefixes: 1 mΩ·cm = 0.001 Ω·cm', spellings: [] },
];

/**
 * Folds unit text to plain ASCII words: 'µm'/'μm' → 'um', 'Ω' → 'ohm', separators → spaces.
 * Case is kept (mΩ and MΩ differ); callers compare case-sensitively only where it matters.
 *
 * @example foldUnitText('mΩ·cm') // 'mohm cm'
 */
export function foldUnitText(text: string): string {
  return text
    .replace(/[\u00B5\u03BC]/g, 'u')
    .replace(/[\u2126\u03A9]/g, 'ohm')
    .replace(/[·•⋅*\-_/.,;:()[\]{}]+/g, ' ')
    .replace(/\s+/g, ' ')
    .trim();
}

/** What a header says about its unit. */
export type UnitReading =
  | { readonly kind: 'unit'; readonly unit: ColumnUnit }
  | { readonly kind: 'none' }
  | { readonly kind: 'unsupported'; readonly text: string };

/** The bracketed part of a header, "(mm)" or "[Ω·cm]", if any. */
function bracketed(header: string): string | null {
  const match = /[([]\s*([^()[\]]+?)\s*[)\]]/.exec(header);
  return match ? match[1] : null;
}

function findUnit(text: string, units: readonly ColumnUnit[]): ColumnUnit | undefined {
  const words = ` ${foldUnitText(text).toLowerCase()} `;
  return units.find((unit) => unit.spellings.some((spelling) => words.includes(` ${spelling} `)));
}

/**
 * Reads a thickness unit from a header.
 *
 * @param header - e.g. 'Thickness (mm)', 'THK um', 'Thk [mil]'
 * @returns the unit, 'none' when the header names none, 'unsupported' with the text when it names another
 * @example readThicknessUnit('Thickness (mm)') // { kind: 'unit', unit: mm }
 */
export function readThicknessUnit(header: string): UnitReading {
  const unit = findUnit(header, THICKNESS_UNITS);
  if (unit) return { kind: 'unit', unit };
  const inBrackets = bracketed(header);
  return inBrackets === null ? { kind: 'none' } : { kind: 'unsupported', text: inBrackets };
}

/**
 * Reads a resistivity unit from a header.
 *
 * @param header - e.g. 'Rho min (ohm-cm)', 'ρ centre [mΩ·cm]'
 * @returns the unit, 'none' when the header names none, 'unsupported' with the text when it names another (kΩ·cm, Ω·m…)
 * @example readResistivityUnit('Res (mOhm-cm)') // { kind: 'unit', unit: mΩ·cm }
 */
export function readResistivityUnit(header: string): UnitReading {
  const folded = foldUnitText(header);
  // Lower-case m only: MΩ is megaohm.
  const mohm = /(^|\s)(m ?|[mM]illi)[oO][hH][mM][sS]? ?[cC][mM]\b/.test(folded);
  const plain = /\bohms? ?cm\b/i.test(folded);
  if (mohm) return { kind: 'unit', unit: RESISTIVITY_UNITS[1] };
  if (plain && !/\b[kKM] ?ohm/.test(folded)) return { kind: 'unit', unit: RESISTIVITY_UNITS[0] };
  const inBrackets = bracketed(header);
  if (inBrackets !== null) return { kind: 'unsupported', text: inBrackets };
  if (/ohm/i.test(folded)) return { kind: 'unsupported', text: header.trim() };
  return { kind: 'none' };
}

/**
 * A unit by code.
 *
 * @throws Error listing the codes when unknown
 */
export function unitByCode(units: readonly ColumnUnit[], code: string): ColumnUnit {
  const found = units.find((unit) => unit.code === code);
  if (!found) throw new Error(`unknown unit '${code}': allowed are ${units.map((unit) => unit.code).join(', ')}`);
  return found;
}

/** Kelvin at 0 °C (the definition of the Celsius scale: common practice, no source). */
export const CELSIUS_ZERO_K = 273.15;

/** Temperature units the 'measured at' field offers; the user picks one, the number never decides. */
export const TEMPERATURE_UNITS: readonly { readonly code: 'C' | 'K'; readonly label: string }[] = [
  { code: 'C', label: '°C' },
  { code: 'K', label: 'K' },
];

/**
 * A typed temperature in kelvin.
 *
 * @param value - the number typed
 * @param unit - 'C' (°C) or 'K'
 * @returns the temperature in K
 * @example kelvinOf(25, 'C') // 298.15
 */
export function kelvinOf(value: number, unit: 'C' | 'K'): number {
  // Rounded to 1e-9 K so 25 °C is written as 298.15, not 298.15000000000003.
  return unit === 'K' ? value : Math.round((value + CELSIUS_ZERO_K) * 1e9) / 1e9;
}
