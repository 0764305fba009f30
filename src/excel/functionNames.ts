/**
 * Office's naming rules for custom functions, enforced when functions.json
 * is generated so that a name Excel would refuse can never be built.
 *
 * The rules, as Microsoft's "Custom functions naming and localization"
 * article states them (read in its stored copy):
 * - id and name both start with a letter and are at least three characters;
 * - id: only A–Z, 0–9, underscore and period;
 * - name: Unicode letters, underscore and period;
 * - avoid names that match a cell reference (A1 to XFD1048576, R1C1 to
 *   R1048576C16384) or an Excel 4.0 macro function (such as RUN, ECHO).
 * Upper case (the article's advice) follows from the A–Z rule for ids; ids must never change once
 * published, which is a project rule, not Office's.
 */

/** Largest column (XFD) and row of an Excel worksheet. */
const MAX_COLUMN = 16384;
const MAX_ROW = 1048576;

/**
 * Excel 4.0 macro (XLM) function names. The article links Microsoft's macro
 * reference for the full list, which is not in our reference text; these are
 * the ones that read like words a physics catalog might use (from memory).
 */
// Layout kept: an alphabetical word list packed a row at a time; Prettier would give every name a line of its own.
// prettier-ignore
export const EXCEL4_MACRO_NAMES: ReadonlySet<string> = new Set([
  'ABSREF', 'ACTIVE.CELL', 'ADD.BAR', 'ADD.COMMAND', 'ADD.MENU', 'ADD.TOOLBAR', 'APP.TITLE', 'ARGUMENT', 'BREAK', 'CALLER',
  'CANCEL.KEY', 'CUSTOM.REPEAT', 'CUSTOM.UNDO', 'DEREF', 'DIRECTORY', 'DOCUMENTS', 'ECHO', 'ELSE', 'ELSE.IF', 'END.IF',
  'ENABLE.TOOL', 'ERROR', 'EVALUATE', 'EXEC', 'EXECUTE', 'FILES', 'FOR', 'FOR.CELL', 'FORMULA', 'FORMULA.CONVERT',
  'GET.CELL', 'GET.DOCUMENT', 'GET.FORMULA', 'GET.NAME', 'GET.WORKBOOK', 'GET.WORKSPACE', 'GOTO', 'HALT', 'HELP', 'IF',
  'INITIATE', 'INPUT', 'LAST.ERROR', 'LINKS', 'MOVIE.COMMAND', 'NAMES', 'NEXT', 'OPEN', 'PAUSE', 'POKE', 'REFTEXT',
  'REGISTER', 'RELREF', 'REQUEST', 'RESTART', 'RESULT', 'RESUME', 'RETURN', 'RUN', 'SAVE', 'SELECTION', 'SET.NAME',
  'SET.VALUE', 'STEP', 'TERMINATE', 'TEXTREF', 'UNREGISTER', 'VOLATILE', 'WAIT', 'WHILE', 'WINDOWS', 'WORKBOOK.NAME',
]);

function columnNumber(letters: string): number {
  return [...letters].reduce((n, ch) => n * 26 + (ch.charCodeAt(0) - 64), 0);
}

/** Whether text reads as a cell reference in A1 or R1C1 style. */
export function looksLikeCellReference(text: string): boolean {
  const upper = text.toUpperCase();
  const a1 = /^([A-Z]{1,3})([1-9][0-9]{0,6})$/.exec(upper);
  if (a1 !== null && columnNumber(a1[1]) <= MAX_COLUMN && Number(a1[2]) <= MAX_ROW) return true;
  const r1c1 = /^R([1-9][0-9]{0,6})C([1-9][0-9]{0,4})$/.exec(upper);
  return r1c1 !== null && Number(r1c1[1]) <= MAX_ROW && Number(r1c1[2]) <= MAX_COLUMN;
}

/**
 * Why Excel would refuse a custom function id (= our name), or null if it is fine.
 *
 * @param id - the catalog name, which is both id and name in functions.json
 * @example whyInvalidFunctionId('NI') // 'is shorter than three characters'
 */
export function whyInvalidFunctionId(id: string): string | null {
  if (id.length < 3) return 'is shorter than three characters';
  if (!/^[A-Z]/.test(id)) return 'does not start with a letter A–Z';
  if (!/^[A-Z0-9_.]+$/.test(id)) return 'uses characters other than A–Z, 0–9, underscore and period';
  // The name (same text) may not use digits.
  if (/[0-9]/.test(id)) return 'uses a digit, which a display name may not';
  if ([id, ...id.split('.')].some(looksLikeCellReference)) return 'reads as a cell reference';
  if (EXCEL4_MACRO_NAMES.has(id)) return 'is an Excel 4.0 macro function name';
  return null;
}
