/**
 * Issue 14 §5: workbooks written by other programs. The corpus is generated
 * here by general-purpose tools (openpyxl from Debian's python3-openpyxl;
 * LibreOffice Calc headless re-saving them), each with its expected one-line
 * outcome: what the copy cannot carry (charts, pivot tables, macros) is
 * dropped with a notice and the rest recalculates; comments and tables
 * survive; a refusal names the real cause; no library warning reaches the
 * terminal. .ci/run installs both programs.
 */
import { spawnSync } from 'node:child_process';
import { existsSync, mkdtempSync, readdirSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import ExcelJS from 'exceljs';

const PYTHON = '/usr/bin/python3';
const SOFFICE = '/usr/bin/soffice';
const cli = join(__dirname, '..', '..', 'dist', 'node', 'cli', 'main.js');
let folder: string;

function run(command: string, args: string[], timeout = 180_000) {
  const result = spawnSync(command, args, { cwd: folder, encoding: 'utf8', timeout });
  if (result.error) throw result.error;
  return result;
}

beforeAll(() => {
  for (const [tool, what] of [
    [PYTHON, 'Debian python3'],
    [SOFFICE, 'Debian libreoffice-calc-nogui'],
  ]) {
    if (!existsSync(tool)) throw new Error(`${tool} is missing: install ${what} (.ci/run does)`);
  }
  if (!existsSync(cli)) throw new Error(`${cli} is missing: run \`npx tsc -p tsconfig.json\``);
  folder = mkdtempSync(join(tmpdir(), 'driftcell-writers-'));
  const made = run(PYTHON, [join(__dirname, 'support', 'otherWriters.py'), folder]);
  if (made.status !== 0) throw new Error(`openpyxl corpus: ${made.stderr}`);
  // LibreOffice re-saves three of them as .xlsx (its own writer: tables without style info, its chart parts).
  const lo = join(folder, 'libreoffice');
  const profile = `file://${join(folder, 'profile')}`;
  const converted = run(SOFFICE, [
    `-env:UserInstallation=${profile}`,
    '--headless',
    '--convert-to',
    'xlsx',
    '--outdir',
    lo,
    'chart.xlsx',
    'comment.xlsx',
    'table.xlsx',
  ]);
  if (!existsSync(join(lo, 'table.xlsx'))) throw new Error(`LibreOffice did not convert: ${converted.stderr}`);
}, 240_000);
afterAll(() => rmSync(folder, { recursive: true, force: true }));

function recalc(input: string, output = 'out.xlsx') {
  rmSync(join(folder, output), { force: true });
  return run(process.execPath, [cli, 'recalc', input, '-o', output], 90_000);
}

/** B2:B4 of the written copy: resistivities of boron at 1e15, 1e16, 1e17 cm⁻³ (Ω·cm, ≈ 13.5, 1.4, 0.2). */
async function writtenValues(output = 'out.xlsx'): Promise<{ values: number[]; sheet: ExcelJS.Worksheet }> {
  const workbook = new ExcelJS.Workbook();
  await workbook.xlsx.readFile(join(folder, output));
  const sheet = workbook.worksheets[0];
  const values = ['B2', 'B3', 'B4'].map((a) => (sheet.getCell(a).value as ExcelJS.CellFormulaValue).result as number);
  return { values, sheet };
}

function expectRecalculated(values: number[]): void {
  // Boron-doped silicon at 300 K: ≈ 13 Ω·cm at 1e15, ≈ 1.4 at 1e16, ≈ 0.2 at 1e17 (Sze & Ng's
  // resistivity chart, read by eye, from memory); the check is that numbers were computed at all.
  expect(values[0]).toBeGreaterThan(10);
  expect(values[0]).toBeLessThan(17);
  expect(values[1]).toBeGreaterThan(values[2]);
}

describe.each([
  ['chart.xlsx', 'openpyxl'],
  ['libreoffice/chart.xlsx', 'LibreOffice'],
])('a workbook with a chart (%s, by %s)', (input) => {
  it('drops the chart with a notice and recalculates the rest', async () => {
    const result = recalc(input);
    expect(result.status).toBe(0);
    expect(result.stderr).toBe('sheet "Data": 1 chart not carried into the copy\n');
    expectRecalculated((await writtenValues()).values);
  });
});

describe.each([
  ['comment.xlsx', 'openpyxl'],
  ['libreoffice/comment.xlsx', 'LibreOffice'],
])('a workbook with a comment (%s, by %s)', (input) => {
  it('keeps the comment’s text and recalculates', async () => {
    const result = recalc(input);
    expect({ status: result.status, stderr: result.stderr }).toEqual({ status: 0, stderr: '' });
    const { values, sheet } = await writtenValues();
    expectRecalculated(values);
    const note = sheet.getCell('A1').note;
    const text = typeof note === 'string' ? note : (note?.texts ?? []).map((t) => t.text).join('');
    expect(text).toContain('doping in cm-3');
  });
});

describe.each([
  ['table.xlsx', 'openpyxl'],
  ['libreoffice/table.xlsx', 'LibreOffice'],
])('a workbook with a table (%s, by %s)', (input) => {
  it('keeps the table and recalculates', async () => {
    const result = recalc(input);
    expect({ status: result.status, stderr: result.stderr }).toEqual({ status: 0, stderr: '' });
    const { values, sheet } = await writtenValues();
    expectRecalculated(values);
    expect(
      sheet.getTables().map((t) => (t as unknown as { name: string }).name ?? (t as unknown as { table: { name: string } }).table.name),
    ).toEqual(['Lots']);
  });
});

describe('refusals and notices that name the real cause', () => {
  it('a sheet name over 31 characters, with no library warning', () => {
    const result = recalc('longname.xlsx');
    expect({ status: result.status, stdout: result.stdout }).toEqual({ status: 2, stdout: '' });
    expect(result.stderr).toBe(
      'driftcell: longname.xlsx: cannot be recalculated: sheet name "A sheet name that is longer than thirty-one" has 43 characters; Excel allows at most 31: rename the sheet and save again\n',
    );
  });

  it('an .xlsm input: says its macros are dropped, and an .xlsm output name is refused', async () => {
    const refused = recalc('macros.xlsm', 'out.xlsm');
    expect(refused.status).toBe(2);
    expect(refused.stderr).toMatch(
      /^driftcell: recalc writes \.xlsx workbooks \(macros are not carried\); give an -o name ending in \.xlsx, not out\.xlsm\n$/,
    );
    const result = recalc('macros.xlsm');
    expect(result.status).toBe(0);
    expect(result.stderr).toBe('macros (vbaProject.bin) not carried into the copy\n');
    expectRecalculated((await writtenValues()).values);
    expect(readdirSync(folder)).not.toContain('out.xlsm');
  });
});
