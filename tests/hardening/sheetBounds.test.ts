/**
 * Issue 14 §1: tiny files that declare enormous extents (a value at
 * XFD1048576, a merge or data validation over the whole sheet, a column
 * definition up to 2,000,000,000, a row numbered 2,000,000,000, an array
 * formula over the whole sheet) and sheet parts named so that only exceljs's
 * own unanchored pattern finds them. Each is refused before exceljs parses
 * it, in one line naming the limit and the element; the CLI runs as a child
 * process with Node's default heap, and the input is left unchanged.
 */
import { spawnSync } from 'node:child_process';
import { existsSync, mkdtempSync, readFileSync, readdirSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import ExcelJS from 'exceljs';
import { MAX_CELLS, PackageRejected, checkPackage, isWorksheetPart } from '../../src/engine/packageCheck';
import { MAX_USED_RANGE_CELLS, checkSheetBounds, parseArea } from '../../src/engine/sheetBounds';
import { SHEET_HEAD, SHEET_TAIL, nativeZip, sheetPackageParts } from './support/rawWorkbook';

const CHILD_TIMEOUT_MS = 90_000;
const cli = join(__dirname, '..', '..', 'dist', 'node', 'cli', 'main.js');
let folder: string;

beforeAll(() => {
  if (!existsSync(cli)) throw new Error(`${cli} is missing: run \`npx tsc -p tsconfig.json\` (npm test builds it)`);
});
beforeEach(() => {
  folder = mkdtempSync(join(tmpdir(), 'driftcell-bounds-'));
});
afterEach(() => rmSync(folder, { recursive: true, force: true }));

/** A one-sheet package: `data` inside sheetData, `after` after it (or before it, for <cols>). */
function workbook(data: string, after = '', sheetName = 'xl/worksheets/sheet1.xml'): Buffer {
  const cols = after.startsWith('<cols') ? after : '';
  const rest = cols === '' ? after : '';
  const head = SHEET_HEAD.replace('<sheetData>', `${cols}<sheetData>`);
  const parts = sheetPackageParts(Buffer.from(`${head}${data}</sheetData>${rest}</worksheet>`));
  parts[4] = { name: sheetName, data: parts[4].data };
  return nativeZip(parts);
}

function refusal(bytes: Buffer): string {
  const input = join(folder, 'in.xlsx');
  writeFileSync(input, bytes);
  const env = { ...process.env };
  delete env.NODE_OPTIONS;
  const result = spawnSync(process.execPath, [cli, 'recalc', 'in.xlsx', '-o', 'out.xlsx'], {
    cwd: folder,
    encoding: 'utf8',
    timeout: CHILD_TIMEOUT_MS,
    env,
  });
  expect(result.signal).toBeNull();
  expect({ status: result.status, stdout: result.stdout }).toEqual({ status: 2, stdout: '' });
  expect(result.stderr).toMatch(/^driftcell: [^\n]+\n$/);
  expect(readFileSync(input).equals(bytes)).toBe(true);
  expect(readdirSync(folder)).toEqual(['in.xlsx']);
  return result.stderr.trim();
}

const A1 = '<row r="1"><c r="A1"><v>1</v></c></row>';
const GRID = "Excel's grid of 1,048,576 rows × 16,384 columns (A1:XFD1048576)";
const PREFIX = 'driftcell: in.xlsx: too large to recalculate (xl/worksheets/sheet1.xml: ';

describe('recalc bounds what a small file can declare, before exceljs reads it', () => {
  it('a used range of the whole sheet (A1 and XFD1048576; A1, XFD1 and A1048576)', () => {
    const expected = `${PREFIX}its used range A1:XFD1048576 spans 17,179,869,184 cells, more than the 4,000,000 Driftcell recalculates per sheet)`;
    expect(refusal(workbook(`${A1}<row r="1048576"><c r="XFD1048576"><v>2</v></c></row>`))).toBe(expected);
    expect(
      refusal(
        workbook('<row r="1"><c r="A1"><v>1</v></c><c r="XFD1"><v>1</v></c></row><row r="1048576"><c r="A1048576"><v>2</v></c></row>'),
      ),
    ).toBe(expected);
  });

  it('a merge over the whole sheet, a column definition to 2,000,000,000 and a row numbered 2,000,000,000', () => {
    expect(refusal(workbook(A1, '<mergeCells count="1"><mergeCell ref="C1:XFD1048576"/></mergeCells>'))).toBe(
      `${PREFIX}merged ranges cover more than 100,000 cells (at mergeCell C1:XFD1048576))`,
    );
    expect(refusal(workbook(A1, '<cols><col min="1" max="2000000000" width="9"/></cols>'))).toBe(
      `${PREFIX}column definition <col max="2000000000"> is outside ${GRID})`,
    );
    expect(refusal(workbook('<row r="2000000000"><c r="A2000000000"><v>1</v></c></row>'))).toBe(
      `${PREFIX}row 2000000000 is outside ${GRID})`,
    );
  });

  it('data validation over whole columns or the whole sheet, and an array formula over the whole sheet', () => {
    const validation = (sqref: string) =>
      `<dataValidations count="1"><dataValidation type="whole" sqref="${sqref}"><formula1>1</formula1></dataValidation></dataValidations>`;
    expect(refusal(workbook(A1, validation('A1:XFD1048576')))).toBe(
      `${PREFIX}data validation covers more than 1,048,576 cells (at sqref A1:XFD1048576))`,
    );
    expect(refusal(workbook(A1, validation('A:B')))).toBe(`${PREFIX}data validation covers more than 1,048,576 cells (at sqref A:B))`);
    expect(refusal(workbook('<row r="1"><c r="A1"><f t="array" ref="A1:XFD1048576">1+1</f><v>2</v></c></row>'))).toBe(
      `${PREFIX}array formula ranges cover more than 1,000,000 cells (at ref A1:XFD1048576))`,
    );
  });

  it('one whole-column validation, within its limit, still recalculates', () => {
    const bytes = workbook(
      A1,
      '<dataValidations count="1"><dataValidation type="whole" sqref="A1:A1000"><formula1>1</formula1></dataValidation></dataValidations>',
    );
    writeFileSync(join(folder, 'in.xlsx'), bytes);
    const result = spawnSync(process.execPath, [cli, 'recalc', 'in.xlsx', '-o', 'out.xlsx'], {
      cwd: folder,
      encoding: 'utf8',
      timeout: CHILD_TIMEOUT_MS,
    });
    expect({ status: result.status, stderr: result.stderr }).toEqual({ status: 0, stderr: '' });
  });
});

describe('the guard sees every part exceljs parses as a sheet', () => {
  it('matches exceljs 4.4\'s unanchored pattern, leading "/" removed', () => {
    for (const name of [
      'xl/worksheets/sheet1.xml',
      '/xl/worksheets/sheet1.xml',
      'xl/worksheets/sheet1.xmlX',
      'junk/xl/worksheets/sheet7.xml',
    ]) {
      expect(isWorksheetPart(name)).toBe(true);
    }
    expect(isWorksheetPart('xl/worksheets/_rels/sheet1.xml.rels')).toBe(false);
  });

  it.each(['/xl/worksheets/sheet1.xml', 'xl/worksheets/sheet1.xmlX'])('counts the cells of a sheet part named %s', (name) => {
    const row = `<row>${'<c><v>1</v></c>'.repeat(1100)}</row>`;
    const bytes = workbook(row.repeat(1000), '', name);
    expect(() => checkPackage(bytes)).toThrow(PackageRejected);
    expect(() => checkPackage(bytes)).toThrow(`more than ${MAX_CELLS.toLocaleString('en-US')} cells`);
  });
});

describe('checkSheetBounds', () => {
  it('reads A1 areas, whole columns and whole rows', () => {
    expect(parseArea('$B$2:$D$9')).toEqual({ top: 2, left: 2, bottom: 9, right: 4 });
    expect(parseArea('C:A')).toEqual({ top: 1, left: 1, bottom: 1_048_576, right: 3 });
    expect(parseArea('3:5')).toEqual({ top: 3, left: 1, bottom: 5, right: 16_384 });
    expect(parseArea('not a ref')).toBeUndefined();
  });

  it('lets a used range of exactly the limit through', () => {
    // 1000 rows × 4000 columns = 4,000,000 cells: the corners only.
    const xml = Buffer.from(
      `${SHEET_HEAD}<row r="1"><c r="A1"><v>1</v></c></row><row r="1000"><c r="EWV1000"><v>1</v></c></row>${SHEET_TAIL}`,
    );
    expect(MAX_USED_RANGE_CELLS).toBe(4_000_000);
    expect(() => checkSheetBounds(xml, 'sheet')).not.toThrow();
  });
});

describe('formula results beyond MAX_RESULT_CELLS refuse the workbook, naming the cell', () => {
  it('SEQUENCE(1048576,4) and a whole column times a whole row', () => {
    expect(refusal(workbook('<row r="1"><c r="A1"><f>_xlfn.SEQUENCE(1048576,4)</f></c></row>'))).toBe(
      'driftcell: in.xlsx: too large to recalculate (sheet "Sheet1": the formula in A1 gives 1,048,576×4 values, more than the 1,000,000 cells one result may fill)',
    );
    expect(refusal(workbook('<row r="1"><c r="A1"><v>1</v></c><c r="B1"><f>C:C*3:3</f></c></row>'))).toMatch(
      /^driftcell: in\.xlsx: too large to recalculate \(sheet "Sheet1": the formula in B1 gives .* values, more than the 1,000,000 cells one result may fill\)$/,
    );
  });
});

describe("a formula within Excel's limits that the engine cannot parse fails alone (issue 14 §3)", () => {
  it('=A1+…+A1200 keeps its formula and cached value; its dependent recalculates from it; exit 1', async () => {
    // 1200 terms are 6,093 characters, within Excel's 8,192-character formula limit (Excel's
    // specifications and limits page; common practice, no source for the exact term count).
    const terms = Array.from({ length: 1200 }, (_, i) => `A${i + 1}`).join('+');
    expect(terms.length).toBeLessThan(8192);
    const rows = Array.from({ length: 1200 }, (_, i) => {
      const extra = i === 0 ? `<c r="B1"><f>${terms}</f><v>1200</v></c><c r="C1"><f>B1*2</f><v>0</v></c>` : '';
      return `<row r="${i + 1}"><c r="A${i + 1}"><v>1</v></c>${extra}</row>`;
    });
    const input = join(folder, 'in.xlsx');
    writeFileSync(input, workbook(rows.join('')));
    const env = { ...process.env };
    delete env.NODE_OPTIONS;
    const result = spawnSync(process.execPath, [cli, 'recalc', 'in.xlsx', '-o', 'out.xlsx'], {
      cwd: folder,
      encoding: 'utf8',
      timeout: CHILD_TIMEOUT_MS,
      env,
    });
    expect(result.signal).toBeNull();
    expect(result.stderr).toContain('1 formula cell kept as the file had it');
    expect(result.stderr).toContain('Sheet1!B1: the formula is too long or too deeply nested for the headless engine');
    expect(result.status).toBe(1);
    const written = new ExcelJS.Workbook();
    await written.xlsx.readFile(join(folder, 'out.xlsx'));
    const sheet = written.worksheets[0];
    expect(sheet.getCell('B1').value).toEqual({ formula: terms, result: 1200 });
    expect((sheet.getCell('C1').value as ExcelJS.CellFormulaValue).result).toBe(2400);
  });
});
