/**
 * Formula text as .xlsx files store it, turned into the text the engine reads.
 *
 * Excel saves newer built-ins with a compatibility prefix (`_xlfn.SEQUENCE`,
 * `_xlfn._xlws.SORT`, `_xlpm.` for LET/LAMBDA names) and an Office add-in's
 * JavaScript custom functions with the prefix `_xldudf`: "For Javascript Custom
 * Functions, we by default save out with a different prefix "_xldudf"" (a
 * Microsoft engineer in OfficeDev/Excel-Custom-Functions issue #108; the
 * `xldudf` substring in saved add-in cells is also the subject of
 * OfficeDev/office-js issue #6655). The full stored name joins prefix,
 * namespace and name with underscores, `_xldudf_DRIFT_RESISTIVITY` for
 * DRIFT.RESISTIVITY (observed in workbooks Excel wrote, e.g.
 * `_xldudf_optionsamurai_stock(…)` read back with openpyxl in a public test;
 * common practice, no specification). The engine knows the plain names.
 *
 * Read: every form (`DRIFT.NAME(`, `_xldudf_DRIFT_NAME(`, either in any case).
 * Written: only the form Excel writes, `_xldudf_DRIFT_NAME(` in upper case as
 * the add-in registers its names. Text inside string literals and quoted
 * sheet names is left alone.
 */

/** Storage prefixes of built-ins, removed for the engine. */
const BUILTIN_PREFIX = /_xlfn\.|_xlws\.|_xlpm\./gi;

/**
 * A DRIFT call in any form a file or a user may have: `DRIFT.NAME(` as typed, or
 * `_xldudf_DRIFT_NAME(` as Excel stores it, in any case. The look-behind keeps
 * longer names (MYDRIFT.X, A_xldudf_…) out.
 */
const DRIFT_ANY_FORM = /(?<![A-Za-z0-9_.])(?:DRIFT\.|_xldudf_DRIFT_)([A-Z0-9]+)(?=\s*\()/gi;

/**
 * A number literal with an upper-case exponent (1E16, 2.5E-3, 1E+16), as Excel
 * writes and users type them; HyperFormula reads only the lower-case form.
 * The look-behind keeps names and references such as R1E1 or LOG10E2 intact.
 */
const UPPER_CASE_EXPONENT = /(?<![A-Za-z_.\d])(\d+(?:\.\d*)?|\.\d+)E([+-]?\d)/g;

function translateCode(code: string): string {
  return code
    .replace(BUILTIN_PREFIX, '')
    .replace(DRIFT_ANY_FORM, (_match, name: string) => `DRIFT.${name.toUpperCase()}`)
    .replace(UPPER_CASE_EXPONENT, '$1e$2');
}

/** Splits formula text into code and quoted parts ("text" literals, 'sheet names'); quotes double to escape. */
function segments(formula: string): { text: string; quoted: boolean }[] {
  const parts: { text: string; quoted: boolean }[] = [];
  let start = 0;
  let i = 0;
  while (i < formula.length) {
    const quote = formula[i];
    if (quote !== '"' && quote !== "'") {
      i++;
      continue;
    }
    if (i > start) parts.push({ text: formula.slice(start, i), quoted: false });
    let end = i + 1;
    for (;;) {
      if (end >= formula.length) break;
      if (formula[end] === quote) {
        if (formula[end + 1] === quote) end += 2;
        else break;
      } else end++;
    }
    parts.push({ text: formula.slice(i, end + 1), quoted: true });
    i = end + 1;
    start = i;
  }
  if (start < formula.length) parts.push({ text: formula.slice(start), quoted: false });
  return parts;
}

/**
 * Formula text from a file (no leading `=`) as engine input (with `=`).
 *
 * @param stored - e.g. `_xlfn.SEQUENCE(3)` or `_xldudf_DRIFT_RESISTIVITY(A2,"B")`
 * @returns e.g. `=SEQUENCE(3)` or `=DRIFT.RESISTIVITY(A2,"B")`
 * @example engineFormula("_xlfn.STDEV.S('Lot _xlfn.'!A1:A9)") // "=STDEV.S('Lot _xlfn.'!A1:A9)"
 */
export function engineFormula(stored: string): string {
  const body = stored.startsWith('=') ? stored.slice(1) : stored;
  return `=${segments(body)
    .map((part) => (part.quoted ? part.text : translateCode(part.text)))
    .join('')}`;
}

/**
 * Formula text (as typed or as stored, with or without `=`) as a file stores it
 * (without `=`): every DRIFT call in the one form Excel itself writes for add-in
 * functions, `_xldudf_DRIFT_NAME`, so Excel binds it to the add-in when it opens
 * the file. Everything else, built-in prefixes included, is kept as it is;
 * quoted text is left alone.
 *
 * @example storedFormula('=drift.sheetres(A2,"DRIFT.X(")') // '_xldudf_DRIFT_SHEETRES(A2,"DRIFT.X(")'
 */
export function storedFormula(text: string): string {
  const body = text.startsWith('=') ? text.slice(1) : text;
  return segments(body)
    .map((part) =>
      part.quoted ? part.text : part.text.replace(DRIFT_ANY_FORM, (_m, name: string) => `_xldudf_DRIFT_${name.toUpperCase()}`),
    )
    .join('');
}

/**
 * Formula text from a file as a person reads and types it in Excel: with `=`,
 * DRIFT calls as `DRIFT.NAME`, built-ins without their storage prefixes.
 *
 * @example displayFormula('_xlfn.SUM(_xldudf_DRIFT_SHEETRES(A2,10))') // '=SUM(DRIFT.SHEETRES(A2,10))'
 */
export function displayFormula(stored: string): string {
  const body = stored.startsWith('=') ? stored.slice(1) : stored;
  return `=${segments(body)
    .map((part) =>
      part.quoted
        ? part.text
        : part.text.replace(BUILTIN_PREFIX, '').replace(DRIFT_ANY_FORM, (_m, name: string) => `DRIFT.${name.toUpperCase()}`),
    )
    .join('')}`;
}
