/**
 * The `driftcell` command as a user runs it: a compiled main.js spawned with
 * node, in temporary folders. Covers output formats and exit statuses of
 * calc, recalc's refusals and round trip, and demo.
 */
import { existsSync, mkdtempSync, readFileSync, readdirSync, rmSync, statSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import ExcelJS from 'exceljs';
import { findFunction } from '../../src/catalog';
import { evaluate } from '../../src/catalog/broadcast';
import { isFailure, type ArgumentInput } from '../../src/catalog/values';
import { SHEETS, SWEEP_LAYOUT } from '../../src/cli/demoWorkbook';
import { openPackage, sheetCells } from '../engine/support/sheetXml';
import { buildCli, run, type BuiltCli } from './support/cli';

let cli: BuiltCli;
let folder: string;

beforeAll(() => {
  cli = buildCli();
});
afterAll(() => cli?.remove());
beforeEach(() => {
  folder = mkdtempSync(join(tmpdir(), 'driftcell-cli-'));
});
afterEach(() => rmSync(folder, { recursive: true, force: true }));

const driftcell = (...args: string[]) => run(cli, args, folder);

function direct(name: string, args: ArgumentInput[]) {
  const spec = findFunction(name);
  if (!spec) throw new Error(name);
  return evaluate(spec, args);
}

describe('calc', () => {
  it('prints a number at full precision (shortest text that reads back exactly) and exits 0', () => {
    const result = driftcell('calc', 'DRIFT.RESISTIVITY(1e15,"B")');
    const expected = direct('RESISTIVITY', [1e15, 'B'])[0][0] as number;
    expect(result.status).toBe(0);
    expect(result.stdout).toBe(`${String(expected)}\n`);
    expect(Number(result.stdout.trim())).toBe(expected);
    expect(result.stderr).toBe('');
  });

  it('accepts the leading = and spreadsheet built-ins', () => {
    const expected = direct('SHEETRES', [[[1, 2]], 10])[0] as number[];
    const result = driftcell('calc', '=SUM(DRIFT.SHEETRES({1,2},10))');
    expect(result.status).toBe(0);
    expect(result.stdout.trim()).toBe(String(expected[0] + expected[1]));
  });

  it('prints a spill as tab-separated rows', () => {
    const result = driftcell('calc', '=DRIFT.RESISTIVITY({1e15;1e16},"phosphorus",{250,300,350})');
    const expected = direct('RESISTIVITY', [[[1e15], [1e16]], 'phosphorus', [[250, 300, 350]]]);
    expect(result.status).toBe(0);
    expect(result.stdout).toBe(expected.map((row) => row.map(String).join('\t')).join('\n') + '\n');
  });

  it('prints an error as its code then its message and exits 1', () => {
    const result = driftcell('calc', 'DRIFT.RESISTIVITY(-1,"B")');
    const expected = direct('RESISTIVITY', [-1, 'B'])[0][0];
    if (!isFailure(expected)) throw new Error('expected a failure');
    expect(result.status).toBe(1);
    expect(result.stdout).toBe(`${expected.code} ${expected.message}\n`);
    expect(result.stdout).toMatch(/^#VALUE! doping must be > 0/);
  });

  it('exits 0 when only some elements of a spill are errors, with their messages on stderr', () => {
    const result = driftcell('calc', 'DRIFT.SHEETRES({1,-1},10)');
    const expected = direct('SHEETRES', [[[1, -1]], 10])[0];
    const bad = expected[1];
    if (!isFailure(bad)) throw new Error('expected a failure');
    expect(result.status).toBe(0);
    expect(result.stdout).toBe(`${String(expected[0])}\t${bad.code}\n`);
    expect(result.stderr).toBe(`row 1, column 2: ${bad.code} ${bad.message}\n`);
  });

  it('exits 1 when every element of a spill is an error', () => {
    const result = driftcell('calc', 'DRIFT.SHEETRES({-1,-2},10)');
    expect(result.status).toBe(1);
    expect(result.stdout).toBe('#VALUE!\t#VALUE!\n');
  });

  it('exits 1 for a formula it cannot read, and for an unknown function', () => {
    const unreadable = driftcell('calc', '=1+');
    expect(unreadable.status).toBe(1);
    expect(unreadable.stdout).toMatch(/^#ERROR! not a valid formula/);
    const unknown = driftcell('calc', 'DRIFT.NOSUCH(1)');
    expect(unknown.status).toBe(1);
    expect(unknown.stdout).toMatch(/^#NAME\? /);
  });

  it('takes a formula that starts with a minus sign after --', () => {
    const result = driftcell('calc', '--', '-DRIFT.SHEETRES(1,10)');
    expect(result.status).toBe(0);
    expect(result.stdout.trim()).toBe(String(-(direct('SHEETRES', [1, 10])[0][0] as number)));
  });

  it('exits 2 without a formula, with a one-line reason', () => {
    const result = driftcell('calc');
    expect(result.status).toBe(2);
    expect(result.stderr).toBe('driftcell: give a formula, several formulas, --file <file>, or - to read formulas from stdin\n');
  });

  it('reads formulas from stdin with -, one record per line, and exits 1 when one whole result is an error', () => {
    const result = run(cli, ['calc', '-'], folder, '# sheet resistance\nDRIFT.SHEETRES(1,10)\n\nDRIFT.SHEETRES(-1,10)\r\n=SEQUENCE(2,2)\n');
    const bad = direct('SHEETRES', [-1, 10])[0][0];
    if (!isFailure(bad)) throw new Error('expected a failure');
    expect(result.stdout).toBe(`${String(direct('SHEETRES', [1, 10])[0][0])}\n${bad.code} ${bad.message}\n{1,2;3,4}\n`);
    expect(result.status).toBe(1);
  });

  it('reads formulas from a file with --file and prints --digits significant digits', () => {
    writeFileSync(join(folder, 'formulas.txt'), '28599999999999922000\n13.5\n');
    const result = driftcell('calc', '--file', 'formulas.txt', '--digits', '3');
    expect(result).toEqual({ status: 0, stdout: '2.86e+19\n13.5\n', stderr: '' });
  });

  it('exits 2 for a missing file of formulas, a file without formulas, and a bad --digits', () => {
    expect(driftcell('calc', '--file', 'none.txt')).toEqual({ status: 2, stdout: '', stderr: 'driftcell: none.txt: no such file\n' });
    writeFileSync(join(folder, 'empty.txt'), '# nothing\n\n');
    expect(driftcell('calc', '--file', 'empty.txt').stderr).toBe(
      'driftcell: empty.txt holds no formulas (blank lines and # comment lines are skipped)\n',
    );
    expect(driftcell('calc', '--digits', '18', '1')).toEqual({
      status: 2,
      stdout: '',
      stderr: 'driftcell: --digits must be a whole number from 1 to 17; got 18\n',
    });
  });

  it('prints hints on stderr for a bare code and a temperature in °C', () => {
    const bare = driftcell('calc', 'DRIFT.RESISTIVITY(1e15,B)');
    expect(bare.status).toBe(1);
    expect(bare.stdout).toBe('#NAME? Named expression B not recognized.\n');
    expect(bare.stderr).toBe(
      'hint: B is not a defined name; if it is a code (dopant, material, model …), write it as text in double quotes: "B"\n',
    );
  });
});

describe('help and usage', () => {
  it('shows help with the exit statuses and exits 0', () => {
    const result = driftcell('--help');
    expect(result.status).toBe(0);
    for (const word of ['calc', 'recalc', 'demo', 'Exit status']) expect(result.stdout).toContain(word);
  });

  it('shows each command’s help', () => {
    for (const command of ['calc', 'recalc', 'demo']) {
      const result = driftcell(command, '--help');
      expect(result.status).toBe(0);
      expect(result.stdout).toContain(`Usage: driftcell ${command}`);
    }
  });

  it('prints the package version', () => {
    const version = (JSON.parse(readFileSync(join(__dirname, '..', '..', 'package.json'), 'utf8')) as { version: string }).version;
    expect(driftcell('--version').stdout.trim()).toBe(version);
  });

  it('exits 2 for an unknown command', () => {
    const result = driftcell('frobnicate');
    expect(result.status).toBe(2);
    expect(result.stderr).toMatch(/unknown command/);
  });
});

async function writeInput(name: string): Promise<string> {
  const workbook = new ExcelJS.Workbook();
  const sheet = workbook.addWorksheet('Data');
  sheet.getCell('A1').value = 1e15;
  sheet.getCell('A2').value = 1e16;
  sheet.getCell('B1').value = { formula: 'DRIFT.RESISTIVITY(A1:A2,"B")' } as ExcelJS.CellFormulaValue;
  sheet.getCell('C1').value = { formula: 'Data!B2*2' } as ExcelJS.CellFormulaValue;
  const path = join(folder, name);
  await workbook.xlsx.writeFile(path);
  return path;
}

/** Files in the work folder other than the named ones (leftover temporaries would show here). */
function otherFiles(...known: string[]): string[] {
  return readdirSync(folder).filter((f) => !known.includes(f));
}

describe('recalc', () => {
  it('writes the recalculated copy with spills as array formulas and leaves the input unchanged', async () => {
    const input = await writeInput('in.xlsx');
    const before = readFileSync(input);
    const result = driftcell('recalc', 'in.xlsx', '-o', 'out.xlsx');
    expect(result.status).toBe(0);
    expect(result.stdout).toMatch(/^wrote out\.xlsx: 1 sheet, 2 formulas, 1 spilled result\n$/);
    expect(readFileSync(input).equals(before)).toBe(true);
    expect(otherFiles('in.xlsx', 'out.xlsx')).toEqual([]);

    const cells = await sheetCells(await openPackage(readFileSync(join(folder, 'out.xlsx'))), 'Data');
    const expected = direct('RESISTIVITY', [[[1e15], [1e16]], 'B']);
    expect(cells.get('B1')?.formula?.attributes).toEqual({ t: 'array', ref: 'B1:B2' });
    expect(cells.get('B1')?.attributes.cm).toBe('1');
    expect(Number(cells.get('B1')?.value)).toBe(expected[0][0]);
    expect(Number(cells.get('B2')?.value)).toBe(expected[1][0]);
    expect(Number(cells.get('C1')?.value)).toBe((expected[1][0] as number) * 2);
  });

  it('writes the values form with --values: results as plain values, formulas listed on sheet "Formulas"', async () => {
    await writeInput('in.xlsx');
    const result = driftcell('recalc', 'in.xlsx', '-o', 'values.xlsx', '--values');
    expect(result.status).toBe(0);
    expect(result.stdout).toBe(
      'wrote values.xlsx (values form): 1 sheet, 2 formulas, 1 spilled result; every result is a plain value, the formulas are listed on sheet "Formulas"\n',
    );
    expect(otherFiles('in.xlsx', 'values.xlsx')).toEqual([]);
    const zip = await openPackage(readFileSync(join(folder, 'values.xlsx')));
    const cells = await sheetCells(zip, 'Data');
    const expected = direct('RESISTIVITY', [[[1e15], [1e16]], 'B']);
    for (const cell of cells.values()) expect(cell.formula).toBeUndefined();
    expect(Number(cells.get('B1')?.value)).toBe(expected[0][0]);
    expect(Number(cells.get('B2')?.value)).toBe(expected[1][0]);
    expect(Number(cells.get('C1')?.value)).toBe((expected[1][0] as number) * 2);
    const listing = await sheetCells(zip, 'Formulas');
    expect(['A4', 'B4', 'C4', 'D4'].map((a) => listing.get(a)?.value)).toEqual(['Data', 'B1', 'B1:B2', '=DRIFT.RESISTIVITY(A1:A2,"B")']);
    expect(['A5', 'B5', 'C5', 'D5'].map((a) => listing.get(a)?.value)).toEqual(['Data', 'C1', 'C1', '=Data!B2*2']);
  });

  it('lists cells that show errors on stderr and still exits 0', async () => {
    const workbook = new ExcelJS.Workbook();
    workbook.addWorksheet('Bad sheet').getCell('A1').value = { formula: 'DRIFT.SHEETRES(-1,10)' } as ExcelJS.CellFormulaValue;
    await workbook.xlsx.writeFile(join(folder, 'in.xlsx'));
    const result = driftcell('recalc', 'in.xlsx', '-o', 'out.xlsx');
    const expected = direct('SHEETRES', [-1, 10])[0][0];
    if (!isFailure(expected)) throw new Error('expected a failure');
    expect(result.status).toBe(0);
    expect(result.stderr).toBe(`1 cell shows errors:\n  'Bad sheet'!A1: ${expected.code} ${expected.message}\n`);
  });

  it('refuses to write over its input, however the path is spelled', async () => {
    await writeInput('in.xlsx');
    const before = readFileSync(join(folder, 'in.xlsx'));
    for (const output of ['in.xlsx', './in.xlsx', join(folder, 'in.xlsx'), `../${folder.split('/').pop()}/in.xlsx`]) {
      const result = driftcell('recalc', 'in.xlsx', '-o', output, '--force');
      expect(result.status).toBe(2);
      expect(result.stderr).toMatch(/^driftcell: refusing to write over the input/);
      expect(result.stderr.trim().split('\n')).toHaveLength(1);
    }
    expect(readFileSync(join(folder, 'in.xlsx')).equals(before)).toBe(true);
  });

  it('refuses an existing output unless --force, then replaces it', async () => {
    await writeInput('in.xlsx');
    writeFileSync(join(folder, 'out.xlsx'), 'earlier file');
    const refused = driftcell('recalc', 'in.xlsx', '-o', 'out.xlsx');
    expect(refused.status).toBe(2);
    expect(refused.stderr).toMatch(/out\.xlsx already exists; add --force/);
    expect(readFileSync(join(folder, 'out.xlsx'), 'utf8')).toBe('earlier file');

    const forced = driftcell('recalc', 'in.xlsx', '-o', 'out.xlsx', '--force');
    expect(forced.status).toBe(0);
    expect(statSync(join(folder, 'out.xlsx')).size).toBeGreaterThan('earlier file'.length);
    expect(otherFiles('in.xlsx', 'out.xlsx')).toEqual([]);
  });

  it('gives one line and exit 2 for a file that is not a workbook, a missing file, and no -o', () => {
    writeFileSync(join(folder, 'notes.xlsx'), 'these are notes, not a workbook');
    const cases = [
      { args: ['recalc', 'notes.xlsx', '-o', 'out.xlsx'], message: /^driftcell: notes\.xlsx: not an \.xlsx workbook/ },
      { args: ['recalc', 'missing.xlsx', '-o', 'out.xlsx'], message: /^driftcell: missing\.xlsx: no such file/ },
      { args: ['recalc', 'notes.xlsx'], message: /required option '-o, --output <file>'/ },
    ];
    for (const { args, message } of cases) {
      const result = driftcell(...args);
      expect(result.status).toBe(2);
      expect(result.stderr).toMatch(message);
      expect(result.stderr).not.toMatch(/\n\s+at /);
    }
    expect(existsSync(join(folder, 'out.xlsx'))).toBe(false);
    expect(otherFiles('notes.xlsx')).toEqual([]);
  });
});

describe('demo', () => {
  it('writes the demo workbook and prints the resistor sweep from its cached results', async () => {
    const result = driftcell('demo', '-o', 'demo.xlsx');
    expect(result.status).toBe(0);
    expect(result.stdout).toMatch(/Invented demo data/);
    const lines = result.stdout.split('\n');
    // The design inputs stand above the table (invented values of demoWorkbook.ts).
    const inputs = lines.findIndex((line) => line.startsWith('Inputs '));
    expect(lines.slice(inputs + 1, inputs + 6)).toEqual([
      '  Dopant of the diffusion: B',
      '  Effective doping (cm⁻³): 1e+20',
      '  Length (µm): 450',
      '  Width (µm): 15',
      '  Thickness = junction depth (µm): 0.3',
    ]);
    const header = lines.findIndex((line) => line.startsWith('T (°C)\t'));
    expect(header).toBeGreaterThanOrEqual(0);
    const rows = lines.slice(header + 1, header + 1 + SWEEP_LAYOUT.rows).map((line) => line.split('\t'));
    expect(rows.map((row) => Number(row[0]))).toEqual(Array.from({ length: 20 }, (_, i) => -40 + 10 * i));

    const workbook = new ExcelJS.Workbook();
    await workbook.xlsx.readFile(join(folder, 'demo.xlsx'));
    const sweep = workbook.getWorksheet(SHEETS.sweep) as ExcelJS.Worksheet;
    const anchor = sweep.getCell(SWEEP_LAYOUT.firstRow, SWEEP_LAYOUT.resistanceColumn).value as ExcelJS.CellFormulaValue & { ref?: string };
    // Stored in the add-in form Excel writes for custom functions (see formulaText.ts).
    expect(anchor.formula).toMatch(/^_xldudf_DRIFT_RESISTOR\(_xldudf_DRIFT_RESISTIVITY\(/);
    expect(anchor.ref).toBe(`C${SWEEP_LAYOUT.firstRow}:C${SWEEP_LAYOUT.firstRow + SWEEP_LAYOUT.rows - 1}`);
    // The printed R column is the file's cached sweep, rounded for reading.
    rows.forEach((row, i) => {
      const cell = sweep.getCell(SWEEP_LAYOUT.firstRow + i, SWEEP_LAYOUT.resistanceColumn);
      const value = i === 0 ? (cell.value as ExcelJS.CellFormulaValue).result : cell.value;
      expect(typeof value).toBe('number');
      expect(row[2]).toBe((value as number).toFixed(1));
    });

    // Every formula on every sheet has a cached result; the sheets say the data is invented.
    const zip = await openPackage(readFileSync(join(folder, 'demo.xlsx')));
    for (const name of Object.values(SHEETS)) {
      const cells = await sheetCells(zip, name);
      for (const cell of cells.values()) if (cell.formula) expect(cell.value).toBeDefined();
    }
    for (const name of [SHEETS.about, SHEETS.wafers, SHEETS.sweep, SHEETS.table]) {
      const cells = await sheetCells(zip, name);
      expect(cells.get('A2')?.value).toMatch(/^Invented demo data/);
    }
  });

  it('writes the values form with --values and prints the same sweep', async () => {
    const live = driftcell('demo', '-o', 'live.xlsx');
    const result = driftcell('demo', '-o', 'values.xlsx', '--values');
    expect(result.status).toBe(0);
    const lines = result.stdout.trim().split('\n');
    expect(lines.at(-1)).toBe('wrote values.xlsx (values form): 5 sheets, 31 formulas as plain values, listed on sheet "Formulas"');
    expect(lines.slice(0, -1)).toEqual(live.stdout.trim().split('\n').slice(0, -1));
    const zip = await openPackage(readFileSync(join(folder, 'values.xlsx')));
    const liveZip = await openPackage(readFileSync(join(folder, 'live.xlsx')));
    for (const name of Object.values(SHEETS)) {
      const cells = await sheetCells(zip, name);
      const liveCells = await sheetCells(liveZip, name);
      for (const cell of cells.values()) expect(cell.formula).toBeUndefined();
      // Every number and formula result as the live form caches it (plain text may differ: About says which form it is).
      for (const [address, cell] of liveCells) {
        if (cell.attributes.t !== 's') expect({ address, value: cells.get(address)?.value }).toEqual({ address, value: cell.value });
      }
    }
    const about = [...(await sheetCells(zip, SHEETS.about)).values()].map((c) => c.value).join('\n');
    expect(about).toMatch(/this is the values form/);
    const listing = await sheetCells(zip, 'Formulas');
    const sweepAnchor = [...listing.values()].find((c) => c.value === `C${SWEEP_LAYOUT.firstRow}`);
    expect(sweepAnchor).toBeDefined();
    const row = sweepAnchor?.address.slice(1);
    expect(listing.get(`D${row}`)?.value).toMatch(/^=DRIFT\.RESISTOR\(DRIFT\.RESISTIVITY\(/);
  });

  it('refuses to overwrite an existing file and suggests -o', () => {
    writeFileSync(join(folder, 'driftcell-demo.xlsx'), 'keep');
    const result = driftcell('demo');
    expect(result.status).toBe(2);
    expect(result.stderr).toMatch(/driftcell-demo\.xlsx already exists; not overwriting it\. Choose another name with -o/);
    expect(readFileSync(join(folder, 'driftcell-demo.xlsx'), 'utf8')).toBe('keep');
  });
});
