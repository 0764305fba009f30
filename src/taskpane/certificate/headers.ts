/**
 * Guesses what each column of a supplier's certificate table means from its
 * header text, by keywords of our own. The guess is only a starting point:
 * the pane shows one choice per column and the user corrects any of them.
 */
import type { ColumnRole } from './roles';
import { foldUnitText } from './units';

/** Keyword groups, compared with whole words of the folded header. */
const KEYWORDS = {
  resistivity: ['rho', 'res', 'resist', 'resistivity', 'resistance', 'ohm', 'ohms', 'ohmcm', 'mohm', 'specific'],
  minimum: ['min', 'minimum', 'lo', 'low', 'lower', 'from'],
  maximum: ['max', 'maximum', 'hi', 'high', 'upper', 'to'],
  centre: ['centre', 'center', 'ctr', 'cntr', 'middle', 'mid', 'cen'],
  edge: ['edge', 'periphery', 'rim', 'outer'],
  thickness: ['thk', 'thick', 'thickness', 'thickn'],
  type: ['type', 'dopant', 'conductivity', 'cond', 'pn', 'polarity', 'dop'],
  lot: ['lot', 'batch', 'ingot', 'crystal', 'boule', 'run'],
  wafer: ['wafer', 'wfr', 'slice', 'slot', 'id', 'no', 'number', 'serial', 'sn'],
  /** Words that mark a column as something the check does not use, even if it names resistance. */
  /** Words of a reading column whose header does not name resistivity (e.g. "Site 1"). */
  reading: ['meas', 'measured', 'reading', 'readings', 'site', 'point', 'pt'],
  excluded: ['sheet', 'rs', 'sq', 'tolerance', 'tol', 'ttv', 'bow', 'warp', 'flatness', 'orientation', 'diameter'],
} as const;

/**
 * Header text reduced to lower-case words: Greek ρ → 'rho', Ω → 'ohm', µ → 'u',
 * separators to spaces, and letters split from digits ('rho1' → 'rho 1').
 *
 * @example headerWords('ρ min (Ω·cm)') // ['rho', 'min', 'ohm', 'cm']
 */
export function headerWords(header: string): string[] {
  const folded = foldUnitText(header.replace(/[ρϱ]/g, ' rho ').replace(/#/g, ' no '))
    .toLowerCase()
    .replace(/([a-z])(\d)/g, '$1 $2')
    .replace(/(\d)([a-z])/g, '$1 $2');
  return folded.split(/[^a-z0-9]+/).filter((word) => word !== '');
}

/**
 * One-letter headers of reading columns, alone or with a site number and a
 * unit: "C", "E1", "E 2 (ohm-cm)", "R3".
 */
const SHORT_FORMS: Readonly<Record<string, ColumnRole>> = { c: 'rho-center', e: 'rho-edge', r: 'rho-reading' };
const UNIT_WORDS = new Set(['ohm', 'ohms', 'cm', 'ohmcm', 'mohm', 'm']);

function shortForm(words: readonly string[]): ColumnRole | null {
  const role = SHORT_FORMS[words[0]];
  if (role === undefined) return null;
  return words.slice(1).every((word) => /^\d+$/.test(word) || UNIT_WORDS.has(word)) ? role : null;
}

function hasAny(words: readonly string[], group: readonly string[]): boolean {
  return words.some((word) => group.includes(word));
}

/**
 * The role a header suggests on its own, without looking at other columns.
 *
 * @param header - header text as the supplier wrote it
 * @returns the suggested role; 'ignore' when nothing matches
 * @example roleFromHeader('Rho max (ohm-cm)') // 'rho-max'
 */
export function roleFromHeader(header: string): ColumnRole {
  const words = headerWords(header);
  if (words.length === 0) return 'ignore';
  const short = shortForm(words);
  if (short !== null) return short;
  if (hasAny(words, KEYWORDS.thickness)) return 'thickness';
  if (hasAny(words, KEYWORDS.excluded)) return 'ignore';
  const resistivity = hasAny(words, KEYWORDS.resistivity);
  const centre = hasAny(words, KEYWORDS.centre);
  const edge = hasAny(words, KEYWORDS.edge);
  if (resistivity || centre || edge) {
    if (hasAny(words, KEYWORDS.minimum)) return 'rho-min';
    if (hasAny(words, KEYWORDS.maximum)) return 'rho-max';
    if (centre) return 'rho-center';
    if (edge) return 'rho-edge';
    return resistivity ? 'rho-reading' : 'ignore';
  }
  if (hasAny(words, KEYWORDS.reading)) return 'rho-reading';
  if (hasAny(words, KEYWORDS.type)) return 'type';
  if (hasAny(words, KEYWORDS.lot)) return 'lot';
  if (hasAny(words, KEYWORDS.wafer)) return 'wafer';
  return 'ignore';
}

/** Words a type column of a certificate holds; used when no header says "type". */
const TYPE_VALUES = new Set([
  'p',
  'n',
  'p type',
  'n type',
  'ptype',
  'ntype',
  'donor',
  'acceptor',
  'boron',
  'phosphorus',
  'arsenic',
  'antimony',
  'b',
  'as',
  'sb',
]);

function looksLikeTypeColumn(values: readonly unknown[]): boolean {
  const texts = values.filter((value) => value !== null && value !== '');
  return (
    texts.length > 0 &&
    texts.every((value) => typeof value === 'string' && TYPE_VALUES.has(value.trim().toLowerCase().replace(/[-_]/g, ' ')))
  );
}

/**
 * Guesses the role of every column of a table.
 *
 * Single roles go to the first column that suggests them; a later column
 * suggesting the same role becomes a plain reading (for a second centre
 * column) or 'ignore'. A thickness header with min/max words gives way to one
 * without. When no header names the type, a column holding only type words
 * (P, N, n-type, Boron…) is taken as the type column.
 *
 * @param headers - header row, left to right
 * @param columns - each column's data values (same order), used only for the type fallback
 * @returns one role per column
 * @example guessMapping(['Lot', 'Wafer', 'Type', 'Rho min', 'Rho max']) // ['lot', 'wafer', 'type', 'rho-min', 'rho-max']
 */
export function guessMapping(headers: readonly string[], columns: readonly (readonly unknown[])[] = []): ColumnRole[] {
  const suggested = headers.map((header) => roleFromHeader(header));
  const thicknessColumns = suggested.flatMap((role, index) => (role === 'thickness' ? [index] : []));
  const plainThickness = thicknessColumns.find((index) => {
    const words = headerWords(headers[index]);
    return !hasAny(words, KEYWORDS.minimum) && !hasAny(words, KEYWORDS.maximum);
  });
  const chosenThickness = plainThickness ?? thicknessColumns[0];
  const taken = new Set<ColumnRole>();
  const mapping = suggested.map((role, index): ColumnRole => {
    if (role === 'thickness') return index === chosenThickness ? 'thickness' : 'ignore';
    if (role === 'ignore' || role === 'rho-edge' || role === 'rho-reading') return role;
    if (taken.has(role)) return role === 'rho-center' ? 'rho-reading' : 'ignore';
    taken.add(role);
    return role;
  });
  if (!mapping.includes('type')) {
    const typeColumn = mapping.findIndex((role, index) => role === 'ignore' && looksLikeTypeColumn(columns[index] ?? []));
    if (typeColumn >= 0) mapping[typeColumn] = 'type';
  }
  return mapping;
}
