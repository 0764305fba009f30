/**
 * Every MODEL_REGISTRY entry says where the model lives: the file of its
 * equation, the file of its fitted values and the test files that check it
 * (ModelLocation, src/physics/modelInfo.ts). This file checks that those
 * paths exist, point where they should, and that each named test really
 * reaches the model: it mentions the model's code or a constant or function
 * exported by the equation or parameter-table file.
 */
import { existsSync, readFileSync } from 'fs';
import { join } from 'path';
import { MODEL_REGISTRY } from '../../src/physics/models';
import { CATALOG, evaluate, findFunction } from '../../src/catalog';
import { renderHelpSite } from '../../src/catalog/docs/helpPage';
import { renderModelTable } from '../../src/catalog/docs/readme';

const ROOT = join(__dirname, '..', '..');
const REFERENCE_FOLDER = 'tests/physics/reference/';

function read(file: string): string {
  return readFileSync(join(ROOT, file), 'utf8');
}

/** Names of the values (constants, functions, classes) a source file exports itself. */
function exportedValues(file: string): string[] {
  return [...read(file).matchAll(/^export\s+(?:const|let|function|class)\s+([A-Za-z_$][\w$]*)/gm)].map((match) => match[1]);
}

function escaped(text: string): string {
  return text.replace(/[.*+?^${}()|[\]\\]/g, '\\$&');
}

/**
 * The first author of a model's source as its name begins, e.g. 'Canali' of
 * 'Canali et al. (1975) β at 300 K …'; undefined for a name without a
 * dated source ('Gaussian N(x) = …').
 */
function sourceAuthor(name: string): string | undefined {
  return /^([A-Z][a-z]+)\b[^(]*\(\d{4}\)/.exec(name)?.[1];
}

/**
 * Whether a test file names the model: its code as a string literal, or a
 * value of one of its files as a word; a reference test, which checks the
 * model through the function users call, may instead name the model's source.
 */
function reaches(testFile: string, testText: string, code: string, exported: readonly string[], author?: string): boolean {
  if (new RegExp(`['"\`]${escaped(code)}['"\`]`, 'i').test(testText)) return true;
  if (exported.some((name) => new RegExp(`(?<![\\w$])${escaped(name)}(?![\\w$])`).test(testText))) return true;
  return testFile.startsWith(REFERENCE_FOLDER) && author !== undefined && new RegExp(`\\b${author}\\b`).test(testText);
}

const ENTRIES = MODEL_REGISTRY.map((entry) => [entry.code, entry] as const);

describe('every MODEL_REGISTRY entry names where it lives', () => {
  it.each(ENTRIES)('%s: its equation and parameter table are files under src/physics', (_code, entry) => {
    for (const file of [entry.equation, entry.parameterTable]) {
      expect([file, /^src\/physics\/[\w/.-]+\.ts$/.test(file), existsSync(join(ROOT, file))]).toEqual([file, true, true]);
    }
  });

  it.each(ENTRIES)('%s: names at least one test file, each of which exists, reference checks first', (_code, entry) => {
    expect(entry.tests.length).toBeGreaterThan(0);
    expect(new Set(entry.tests).size).toBe(entry.tests.length);
    for (const file of entry.tests) {
      expect([file, /^tests\/[\w/.-]+\.test\.ts$/.test(file), existsSync(join(ROOT, file))]).toEqual([file, true, true]);
    }
    // The checks against the published source come before the other tests.
    const isReference = entry.tests.map((file) => file.startsWith(REFERENCE_FOLDER));
    expect(isReference).toEqual([...isReference].sort((a, b) => Number(b) - Number(a)));
  });

  it.each(ENTRIES)('%s: each test file mentions its code or a value its equation or parameter file exports', (code, entry) => {
    const exported = [...new Set([...exportedValues(entry.equation), ...exportedValues(entry.parameterTable)])];
    const author = sourceAuthor(entry.name);
    for (const file of entry.tests) expect([file, reaches(file, read(file), code, exported, author)]).toEqual([file, true]);
  });
});

describe('the check itself', () => {
  it('finds the exports of a file and does not take a longer name for a shorter one', () => {
    expect(exportedValues('src/physics/bands/bandgapNarrowing.ts')).toEqual(
      expect.arrayContaining(['KLAASSEN_BGN', 'SLOTBOOM_1976_BGN', 'apparentBandgapNarrowing']),
    );
    const unit = 'tests/physics/bands/bandgapNarrowing.test.ts';
    expect(reaches(unit, 'apparentBandgapNarrowingX(1)', 'klaassen-bgn', ['apparentBandgapNarrowing'])).toBe(false);
    expect(reaches(unit, "model('KLAASSEN-BGN')", 'klaassen-bgn', [])).toBe(true);
    expect(reaches(unit, 'klaassen-bgn without quotes', 'klaassen-bgn', [])).toBe(false);
  });

  it('accepts the source’s first author only in a reference test, and only for a dated source', () => {
    expect(sourceAuthor('Canali et al. (1975) β at 300 K: 1.109 (e), 1.213 (h), held constant')).toBe('Canali');
    expect(sourceAuthor('Gaussian N(x) = Ns·exp(−(x/L)²), limited-source drive-in (default)')).toBeUndefined();
    const text = "describe('Canali et al. (1975) silicon field exponent', …)";
    expect(reaches(`${REFERENCE_FOLDER}canali-1975.reference.test.ts`, text, 'canali-1975', [], 'Canali')).toBe(true);
    expect(reaches('tests/physics/highField/other.test.ts', text, 'canali-1975', [], 'Canali')).toBe(false);
  });
});

describe('codes', () => {
  it('are unique case-insensitively across every kind', () => {
    const codes = MODEL_REGISTRY.map((entry) => entry.code.toLowerCase());
    const repeated = codes.filter((code, index) => codes.indexOf(code) !== index);
    expect(repeated).toEqual([]);
  });
});

describe('what spreadsheet users see', () => {
  // The locations are for readers of the code: DRIFT.MODELS, the help pages and README show none of them.
  const files = [...new Set(MODEL_REGISTRY.flatMap((entry) => [entry.equation, entry.parameterTable, ...entry.tests]))];
  const shown = (text: string) => files.some((file) => text.includes(file));

  it('DRIFT.MODELS keeps its five columns and names no file', () => {
    const table = evaluate(findFunction('MODELS')!, []);
    for (const row of table) {
      expect(row).toHaveLength(5);
      for (const cell of row) expect(shown(String(cell))).toBe(false);
    }
  });

  it('the help pages and README’s model table name no file', () => {
    for (const [file, html] of renderHelpSite(CATALOG)) expect([file, shown(html)]).toEqual([file, false]);
    expect(shown(renderModelTable())).toBe(false);
  });
});
