/**
 * Formula text as .xlsx files store it, turned into the text the engine reads.
 *
 * Excel saves newer built-ins with a compatibility prefix (`_xlfn.SEQUENCE`,
 * `_xlfn._xlws.SORT`, `_xlpm.` for LET/LAMBDA names) and an add-in's custom
 * functions as `_xldudf_NAMESPACE_NAME`, e.g. `_xldudf_DRIFT_RESISTIVITY` for
 * DRIFT.RESISTIVITY (observed in workbooks Excel wrote; common practice, no
 * specification). The engine knows the plain names. Text inside string
 * literals and quoted sheet names is left alone.
 */

/** Storage prefixes of built-ins, removed for the engine. */
const BUILTIN_PREFIX = /_xlfn\.|_xlws\.|_xlpm\./gi;
/** An add-in function of the DRIFT namespace as Excel stores it. */
const DRIFT_ADDIN_NAME = /_xldudf_DRIFT_([A-Z0-9]+)(?=\s*\()/gi;

/**
 * A number literal with an upper-case exponent (1E16, 2.5E-3, 1E+16), as Excel
 * writes and users type them; HyperFormula reads only the lower-case form.
 * The look-behind keeps names and references such as R1E1 or LOG10E2 intact.
 */
const UPPER_CASE_EXPONENT = /(?<![A-Za-z_.\d])(\d+(?:\.\d*)?|\.\d+)E([+-]?\d)/g;

function translateCode(code: string): string {
  return code
    .replace(BUILTIN_PREFIX, '')
    .replace(DRIFT_ADDIN_NAME, (_match, name: string) => `DRIFT.${name.toUpperCase()}`)
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

/** A DRIFT call as the engine reads it. */
const DRIFT_ENGINE_NAME = /\bDRIFT\.([A-Z0-9]+)(?=\s*\()/gi;

/**
 * Engine formula text (with or without `=`) as a file stores it (without `=`):
 * DRIFT calls take the add-in form Excel itself writes, so Excel binds them to
 * the add-in when it opens the file. The inverse of engineFormula for DRIFT
 * calls; quoted text is left alone.
 *
 * @example storedFormula('=DRIFT.SHEETRES(A2,"DRIFT.X(")') // '_xldudf_DRIFT_SHEETRES(A2,"DRIFT.X(")'
 */
export function storedFormula(engineText: string): string {
  const body = engineText.startsWith('=') ? engineText.slice(1) : engineText;
  return segments(body)
    .map((part) => (part.quoted ? part.text : part.text.replace(DRIFT_ENGINE_NAME, (_m, name: string) => `_xldudf_DRIFT_${name.toUpperCase()}`)))
    .join('');
}
