/**
 * Hints a spreadsheet user can act on, for the errors that most often come
 * from a slip in typing rather than from the physics: a code without quotes,
 * `;` between arguments, a misspelt DRIFT function, a temperature in °C.
 * Each hint says what to write instead.
 */
import { CATALOG } from '../catalog';
import { qualifiedName } from '../catalog/naming';
import type { ResultError } from '../engine/engine';

/** Edit distance (insertions, deletions, substitutions) between two names. */
function editDistance(a: string, b: string): number {
  let previous = Array.from({ length: b.length + 1 }, (_, j) => j);
  for (let i = 1; i <= a.length; i++) {
    const current = [i];
    for (let j = 1; j <= b.length; j++) {
      current[j] = Math.min(previous[j] + 1, current[j - 1] + 1, previous[j - 1] + (a[i - 1] === b[j - 1] ? 0 : 1));
    }
    previous = current;
  }
  return previous[b.length];
}

/**
 * The DRIFT functions nearest to a name (every one at the smallest distance, so
 * a tie is listed rather than decided), or none when nothing is close.
 *
 * @param name - as typed, with or without `DRIFT.`, any case
 * @example nearestFunctions('DRIFT.RESISTIVTY') // ['DRIFT.RESISTIVITY']
 */
export function nearestFunctions(name: string): string[] {
  const bare = name.toUpperCase().replace(/^(?:DRIFT\.|_XLDUDF_DRIFT_)/, '');
  const scored = CATALOG.map((spec) => ({ name: qualifiedName(spec), distance: editDistance(bare, spec.name) }));
  const best = Math.min(...scored.map((s) => s.distance));
  // More than a third of the name changed is no longer a slip of the hand.
  if (best > Math.max(2, Math.floor(bare.length / 3))) return [];
  return scored.filter((s) => s.distance === best).map((s) => s.name);
}

/** Whether `;` appears outside quoted text and outside an array constant `{…}`. */
export function hasSemicolonSeparator(formula: string): boolean {
  let inText = false;
  let braces = 0;
  for (const c of formula) {
    if (c === '"') inText = !inText;
    else if (inText) continue;
    else if (c === '{') braces++;
    else if (c === '}') braces = Math.max(0, braces - 1);
    else if (c === ';' && braces === 0) return true;
  }
  return false;
}

function functionHint(name: string): string | undefined {
  const exact = CATALOG.find((spec) => spec.name === name.toUpperCase());
  if (exact !== undefined) return `DRIFT functions are called with their prefix: write ${qualifiedName(exact)}(…)`;
  if (!/^(?:DRIFT\.|_xldudf_DRIFT_)/i.test(name)) return undefined;
  const nearest = nearestFunctions(name);
  if (nearest.length === 0) return `there is no DRIFT function ${name}; the functions are listed in the README (section "Functions")`;
  return `there is no DRIFT function ${name}; did you mean ${nearest.join(' or ')}?`;
}

function temperatureHint(message: string): string | undefined {
  const match = /^(\S*(?:temperature|_K\b)\S*) must be ≥ (\S+) K\b.*; got (\S+)$/i.exec(message.trim());
  if (match === null) return undefined;
  const [, , minimum, got] = match;
  const value = Number(got);
  if (!Number.isFinite(value) || !(value < Number(minimum))) return undefined;
  const kelvin = Math.round((value + 273.15) * 100) / 100;
  return `temperatures are in kelvin (K = °C + 273.15): ${got} °C is ${kelvin} K`;
}

function quoteHint(name: string): string {
  return `${name} is not a defined name; if it is a code (dopant, material, model …), write it as text in double quotes: "${name}"`;
}

/**
 * A hint for the reason recalc kept a formula cell unrecalculated, or undefined.
 *
 * @example reasonHint('the headless engine could not take the name B from the workbook') // the hint to write "B"
 */
export function reasonHint(reason: string): string | undefined {
  const name = /could not take the name (\S+) from the workbook/.exec(reason);
  return name === null ? undefined : quoteHint(name[1]);
}

/**
 * A hint for an error, or undefined when the message says enough.
 *
 * @param error - the error as the engine gives it
 * @param formula - the formula text, when known (for the `;` hint)
 * @example errorHint({ kind: 'error', code: '#NAME?', message: 'Named expression B not recognized.' })
 *   // 'B is not a defined name; if it is a code (dopant, material, model …), write it as text in double quotes: "B"'
 */
export function errorHint(error: ResultError, formula?: string): string | undefined {
  const name = /^Named expression (\S+) not recognized\.?$/.exec(error.message.trim());
  if (error.code === '#NAME?' && name !== null) {
    return quoteHint(name[1]);
  }
  const fn = /^Function name (\S+) not recognized\.?$/.exec(error.message.trim());
  if (error.code === '#NAME?' && fn !== null) return functionHint(fn[1]);
  if (error.code === '#ERROR!' && formula !== undefined && hasSemicolonSeparator(formula)) {
    return (
      'separate arguments with commas, as in DRIFT.RESISTIVITY(1e15,"B"); a semicolon separates rows ' +
      'only inside an array constant such as {1e15;1e16}'
    );
  }
  return temperatureHint(error.message);
}
