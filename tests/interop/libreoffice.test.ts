/**
 * A real second reader: LibreOffice Calc (Debian `libreoffice-calc-nogui`,
 * installed by .ci/run), converting what `recalc` and `demo` write to CSV,
 * one file per sheet, with its default settings and with recalculation on
 * load switched on. Asserted: the values form shows every number and text the
 * engine computed; the default (live) form shows single-cell results but
 * `#NAME?` for spilled and array DRIFT results, and `#NAME?` for every DRIFT
 * cell and its dependents when LibreOffice recalculates on load. These are the
 * README's statements about LibreOffice.
 *
 * Precision: with "save cell contents as shown" off, LibreOffice writes each
 * number in its general format with at least 14 significant digits (15 in
 * plain notation, 14 in E notation, observed: 1.1211323495057E+015), so a
 * printed value is within 5e-14 of the stored double, relatively; 1e-12
 * leaves room for the last digit and no more. Percent-formatted cells print
 * as e.g. -11.4483763036573% (value ×100, same digits).
 */
import { spawnSync } from 'node:child_process';
import { existsSync, mkdirSync, mkdtempSync, readdirSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { basename, join } from 'node:path';
import ExcelJS from 'exceljs';
import { runDemo } from '../../src/cli/demo';
import { SHEETS, SWEEP_LAYOUT } from '../../src/cli/demoWorkbook';
import { runRecalc } from '../../src/cli/recalc';
import { readWorkbookFile } from '../../src/engine/xlsx';

const SOFFICE = '/usr/bin/soffice';
/** LibreOffice's cold start takes 5–20 s on a shared machine; a conversion of one file well under a minute. */
jest.setTimeout(240_000);

/**
 * CSV export filter: comma, double quote, UTF-8 (76), from line 1, values not
 * as shown (full precision), and the 12th token -1: every sheet to its own
 * file `<name>-<sheet>.csv` (LibreOffice 7.2 and later).
 */
const CSV_FILTER = 'csv:Text - txt - csv (StarCalc):44,34,76,1,,0,false,true,false,false,false,-1';
/** Relative tolerance for numbers read back from LibreOffice's CSV (see the file's doc block). */
const RELATIVE = 1e-12;

let folder: string;
const profiles: { normal: string; recalcOnLoad: string } = { normal: '', recalcOnLoad: '' };
const quiet = { out: () => undefined, err: () => undefined };

beforeAll(() => {
  if (!existsSync(SOFFICE)) {
    throw new Error(
      `LibreOffice is missing (${SOFFICE}): install the Debian package libreoffice-calc-nogui (.ci/run does) to run these tests`,
    );
  }
  folder = mkdtempSync(join(tmpdir(), 'driftcell-libreoffice-'));
  // A profile of our own per run, so parallel runs and a user's LibreOffice never collide.
  profiles.normal = join(folder, 'profile-default');
  profiles.recalcOnLoad = join(folder, 'profile-recalc');
  // "Recalculation on file load" for Excel 2007+ files: 0 = always (Tools ▸ Options ▸ Calc ▸ Formula).
  mkdirSync(join(profiles.recalcOnLoad, 'user'), { recursive: true });
  writeFileSync(
    join(profiles.recalcOnLoad, 'user', 'registrymodifications.xcu'),
    '<?xml version="1.0" encoding="UTF-8"?>\n<oor:items xmlns:oor="http://openoffice.org/2001/registry" xmlns:xs="http://www.w3.org/2001/XMLSchema" xmlns:xsi="http://www.w3.org/2001/XMLSchema-instance">\n' +
      '<item oor:path="/org.openoffice.Office.Calc/Formula/Load"><prop oor:name="OOXMLRecalcMode" oor:op="fuse"><value>0</value></prop></item>\n</oor:items>\n',
  );
});
afterAll(() => {
  if (folder) rmSync(folder, { recursive: true, force: true });
});

/** Minimal RFC 4180 reader: quoted fields, doubled quotes, commas and newlines inside quotes. */
function parseCsv(text: string): string[][] {
  const rows: string[][] = [];
  let row: string[] = [];
  let field = '';
  let quoted = false;
  for (let i = 0; i < text.length; i++) {
    const ch = text[i];
    if (quoted) {
      if (ch === '"' && text[i + 1] === '"') {
        field += '"';
        i++;
      } else if (ch === '"') quoted = false;
      else field += ch;
    } else if (ch === '"') quoted = true;
    else if (ch === ',') {
      row.push(field);
      field = '';
    } else if (ch === '\n' || ch === '\r') {
      if (ch === '\r' && text[i + 1] === '\n') i++;
      row.push(field);
      rows.push(row);
      row = [];
      field = '';
    } else field += ch;
  }
  if (field !== '' || row.length > 0) {
    row.push(field);
    rows.push(row);
  }
  return rows;
}

/** Sheet name → CSV grid, as LibreOffice shows the workbook. */
type Shown = Map<string, string[][]>;

/** Converts a workbook with the real LibreOffice and reads back one CSV per sheet. */
function libreOffice(workbook: string, sheets: readonly string[], profile: string): Shown {
  const out = mkdtempSync(join(folder, 'csv-'));
  const result = spawnSync(
    SOFFICE,
    [`-env:UserInstallation=file://${profile}`, '--headless', '--convert-to', CSV_FILTER, '--outdir', out, workbook],
    {
      encoding: 'utf8',
      timeout: 200_000,
    },
  );
  if (result.status !== 0) throw new Error(`soffice failed (${result.status ?? result.signal}): ${result.stderr}`);
  const stem = basename(workbook).replace(/\.xlsx$/, '');
  const shown: Shown = new Map();
  for (const sheet of sheets) {
    const file = join(out, `${stem}-${sheet}.csv`);
    if (!existsSync(file)) throw new Error(`LibreOffice wrote no CSV for sheet "${sheet}" (it wrote: ${readdirSync(out).join(', ')})`);
    shown.set(sheet, parseCsv(readFileSync(file, 'utf8')));
  }
  return shown;
}

function shownAt(shown: Shown, sheet: string, row: number, column: number): string {
  return shown.get(sheet)?.[row - 1]?.[column - 1] ?? '';
}

/** A number as LibreOffice printed it, or NaN when it printed something else. */
function shownNumber(text: string): number {
  if (/%$/.test(text)) return Number(text.slice(0, -1)) / 100;
  return text.trim() === '' ? NaN : Number(text);
}

/** One cell as the engine left it in the recalculated (live) workbook. */
interface Expected {
  readonly sheet: string;
  readonly row: number;
  readonly column: number;
  readonly value: number | string;
  /** The cell holds a formula's result: its own (single or anchor), or a spill element. */
  readonly formula: 'none' | 'single' | 'array';
  readonly drift: boolean;
}

/**
 * What the engine computed, read from the live copy `recalc`/`demo` wrote
 * (numbers and text; the expected side, not the reader under test).
 */
async function engineCells(live: string): Promise<Expected[]> {
  const workbook = await readWorkbookFile(live);
  const cells: Expected[] = [];
  for (const sheet of workbook.worksheets) {
    const inArray = new Map<string, boolean>();
    sheet.eachRow((row) =>
      row.eachCell((cell) => {
        const v = cell.value as ExcelJS.CellFormulaValue & { shareType?: string; ref?: string };
        if (cell.type !== ExcelJS.ValueType.Formula || v.shareType !== 'array' || !v.ref) return;
        const drift = /_xldudf_DRIFT_/.test(v.formula);
        const [from, to = from] = v.ref.split(':').map((a) => sheet.getCell(a));
        for (let r = Number(from.row); r <= Number(to.row); r++)
          for (let c = Number(from.col); c <= Number(to.col); c++) inArray.set(`${r},${c}`, drift);
      }),
    );
    sheet.eachRow((row) =>
      row.eachCell((cell) => {
        const r = Number(cell.row);
        const c = Number(cell.col);
        const isFormula = cell.type === ExcelJS.ValueType.Formula;
        const raw = isFormula ? (cell.value as ExcelJS.CellFormulaValue).result : cell.value;
        const value =
          typeof raw === 'object' && raw !== null && 'richText' in raw
            ? (raw as ExcelJS.CellRichTextValue).richText.map((t) => t.text).join('')
            : raw;
        if (typeof value !== 'number' && typeof value !== 'string') return;
        const array = inArray.get(`${r},${c}`);
        const formula = array !== undefined ? 'array' : isFormula ? 'single' : 'none';
        const drift = array ?? (isFormula && /_xldudf_DRIFT_/.test(cell.formula));
        cells.push({ sheet: sheet.name, row: r, column: c, value, formula, drift });
      }),
    );
  }
  return cells;
}

function expectShownAs(shown: Shown, cell: Expected): void {
  const text = shownAt(shown, cell.sheet, cell.row, cell.column);
  const where = `${cell.sheet}!R${cell.row}C${cell.column}`;
  if (typeof cell.value === 'string') {
    expect({ where, text }).toEqual({ where, text: cell.value });
    return;
  }
  const number = shownNumber(text);
  const close = Math.abs(number - cell.value) <= RELATIVE * Math.abs(cell.value);
  expect({ where, text, close }).toEqual({ where, text, close: true });
}

/**
 * A workbook with single-cell, spilled and legacy-array DRIFT results, DRIFT calls in every form, and
 * dependents; and a sheet of DRIFT.MODELCODES rows (text spill, and a number spill with the codes as its argument).
 */
async function interopInput(path: string): Promise<void> {
  const workbook = new ExcelJS.Workbook();
  const lots = workbook.addWorksheet('Lots');
  [1e15, 1e16, 1e17].forEach((n, i) => (lots.getCell(i + 1, 1).value = n));
  lots.getCell('B1').value = 'B';
  const f = (formula: string) => ({ formula }) as ExcelJS.CellFormulaValue;
  lots.getCell('C1').value = f('DRIFT.RESISTIVITY(A1,$B$1)');
  lots.getCell('C2').value = f('_xldudf_DRIFT_RESISTIVITY(A2,$B$1)');
  lots.getCell('C3').value = f('drift.resistivity(A3,$B$1)');
  lots.getCell('E1').value = f('DRIFT.RESISTIVITY(A1:A3,$B$1,{250,300,350})');
  lots.getCell('I1').value = { formula: 'DRIFT.SHEETRES(C1:C3,10)', shareType: 'array', ref: 'I1:I3' } as ExcelJS.CellFormulaValue;
  lots.getCell('J1').value = f('SUM(E1:G3)');
  lots.getCell('K1').value = f('SUM(A1:A3)');
  const summary = workbook.addWorksheet('Summary');
  summary.getCell('A1').value = 'twice C1';
  summary.getCell('B1').value = f('Lots!C1*2');
  summary.getCell('B2').value = f('Lots!F2*2');
  // One column per applicable model: the code list as a text row, and a result row spilled by it.
  const models = workbook.addWorksheet('Models');
  models.getCell('A1').value = f('DRIFT.MODELCODES("resistivity","Si","B")');
  models.getCell('A2').value = f('DRIFT.RESISTIVITY(1e16,"B",300,DRIFT.MODELCODES("resistivity","Si","B"))');
  await workbook.xlsx.writeFile(path);
}

describe('LibreOffice Calc reading what recalc writes', () => {
  let live: string;
  let values: string;
  let expected: Expected[];
  beforeAll(async () => {
    const input = join(folder, 'interop.xlsx');
    await interopInput(input);
    live = join(folder, 'interop-live.xlsx');
    values = join(folder, 'interop-values.xlsx');
    expect(await runRecalc(input, { output: live, force: false }, quiet)).toBe(0);
    expect(await runRecalc(input, { output: values, force: false, values: true }, quiet)).toBe(0);
    expected = await engineCells(live);
  });

  it('shows every number and text of the values form, also when it recalculates on load', () => {
    for (const profile of [profiles.normal, profiles.recalcOnLoad]) {
      const shown = libreOffice(values, ['Lots', 'Summary', 'Models', 'Formulas'], profile);
      const arrays = expected.filter((c) => c.formula === 'array' && c.drift);
      expect(arrays.filter((c) => c.sheet === 'Lots').length).toBe(12);
      // Silicon, boron: f723-anchored, masetti, arora, caughey-thomas, klaassen, astm-f723 (DRIFT.MODELCODES' help).
      const modelCells = arrays.filter((c) => c.sheet === 'Models').map((c) => [c.row, c.column]);
      expect(modelCells.sort((a, b) => a[0] - b[0] || a[1] - b[1])).toEqual(
        [1, 2].flatMap((row) => [1, 2, 3, 4, 5, 6].map((column) => [row, column])),
      );
      expect(shownAt(shown, 'Models', 1, 1)).toBe('f723-anchored');
      for (const cell of expected) expectShownAs(shown, cell);
      // The formulas are there to read, DRIFT calls as typed in Excel.
      const listing = shown.get('Formulas') ?? [];
      expect(listing[2]).toEqual(['Sheet', 'Cell', 'Result fills', 'Formula']);
      expect(listing).toContainEqual(['Lots', 'E1', 'E1:G3', '=DRIFT.RESISTIVITY(A1:A3,$B$1,{250,300,350})']);
      expect(listing).toContainEqual(['Lots', 'I1', 'I1:I3', '=DRIFT.SHEETRES(C1:C3,10)']);
      expect(listing).toContainEqual(['Lots', 'C3', 'C3', '=DRIFT.RESISTIVITY(A3,$B$1)']);
      expect(listing).toContainEqual(['Summary', 'B2', 'B2', '=Lots!F2*2']);
      expect(listing).toContainEqual([
        'Models',
        'A2',
        'A2:F2',
        '=DRIFT.RESISTIVITY(1e16,"B",300,DRIFT.MODELCODES("resistivity","Si","B"))',
      ]);
    }
  });

  it('shows single-cell results of the live form, and #NAME? for spilled and array DRIFT results', () => {
    const shown = libreOffice(live, ['Lots', 'Summary', 'Models'], profiles.normal);
    for (const cell of expected) {
      if (cell.formula === 'array' && cell.drift)
        expect({ cell, text: shownAt(shown, cell.sheet, cell.row, cell.column) }).toEqual({ cell, text: '#NAME?' });
      else expectShownAs(shown, cell);
    }
  });

  it('shows #NAME? for every DRIFT result and its dependents in the live form when it recalculates on load', () => {
    const shown = libreOffice(live, ['Lots', 'Summary', 'Models'], profiles.recalcOnLoad);
    for (const cell of expected) {
      // Every formula of this workbook is a DRIFT call or depends on one, except K1.
      const fails = cell.formula !== 'none' && !(cell.sheet === 'Lots' && cell.row === 1 && cell.column === 11);
      if (fails) expect({ cell, text: shownAt(shown, cell.sheet, cell.row, cell.column) }).toEqual({ cell, text: '#NAME?' });
      else expectShownAs(shown, cell);
    }
  });
});

describe('LibreOffice Calc reading the demo workbook', () => {
  const sheets = [...Object.values(SHEETS)];
  let live: string;
  let values: string;
  let expected: Expected[];
  beforeAll(async () => {
    live = join(folder, 'demo-live.xlsx');
    values = join(folder, 'demo-values.xlsx');
    expect(await runDemo(live, quiet)).toBe(0);
    expect(await runDemo(values, quiet, { values: true })).toBe(0);
    expected = await engineCells(live);
  });

  it('shows every number and text of the values form, also when it recalculates on load', () => {
    for (const profile of [profiles.normal, profiles.recalcOnLoad]) {
      const shown = libreOffice(values, [...sheets, 'Formulas'], profile);
      // The About sheet's text says which form it is; everything else is as the engine left the live form.
      for (const cell of expected)
        if (!(cell.sheet === SHEETS.about && cell.formula === 'none' && typeof cell.value === 'string')) expectShownAs(shown, cell);
      expect(shown.get('Formulas')?.length).toBe(3 + 31);
    }
  });

  it('shows the single-cell DRIFT results of the live form; the sweep, table, windows and models as #NAME?', () => {
    const shown = libreOffice(live, sheets, profiles.normal);
    const arrays = expected.filter((c) => c.formula === 'array' && c.drift);
    // The sweep's R column (20), the table (11 × 6), the windows (8 × 2), and the models table.
    expect(arrays.filter((c) => c.sheet === SHEETS.sweep).length).toBe(20);
    expect(arrays.filter((c) => c.sheet === SHEETS.table).length).toBe(66);
    expect(arrays.filter((c) => c.sheet === SHEETS.wafers).length).toBe(16);
    expect(arrays.filter((c) => c.sheet === SHEETS.models).length).toBeGreaterThan(10);
    for (const cell of arrays) expect({ cell, text: shownAt(shown, cell.sheet, cell.row, cell.column) }).toEqual({ cell, text: '#NAME?' });
    // Single-cell DRIFT results (doping from measured ρ) keep their values.
    const singles = expected.filter((c) => c.formula === 'single' && c.drift);
    expect(singles.length).toBe(8);
    for (const cell of singles) expectShownAs(shown, cell);
    // Inputs and text are shown as written.
    for (const cell of expected.filter((c) => c.formula === 'none')) expectShownAs(shown, cell);
    // An array formula without DRIFT calls shows #NAME? when it uses a DRIFT result (the change
    // column uses the R column), and its values when it does not (T in K from T in °C).
    const sweep = expected.filter((c) => c.sheet === SHEETS.sweep && c.formula === 'array' && !c.drift);
    const uses = sweep.filter((c) => c.column === SWEEP_LAYOUT.resistanceColumn + 1);
    const free = sweep.filter((c) => c.column === SWEEP_LAYOUT.kelvinColumn);
    expect([uses.length, free.length]).toEqual([20, 20]);
    for (const cell of uses) expect({ cell, text: shownAt(shown, cell.sheet, cell.row, cell.column) }).toEqual({ cell, text: '#NAME?' });
    for (const cell of free) expectShownAs(shown, cell);
  });
});
