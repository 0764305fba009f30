/**
 * `driftcell recalc` on files that are not workbooks it can read: junk,
 * truncated zips, password-protected workbooks (OLE compound files), old
 * .xls, zip bombs (parts that expand to 200 MB, sizes that lie), two million
 * cells, and a zip with no worksheet. Run as a child process, as a user runs
 * it, with Node's default heap (NODE_OPTIONS cleared, no --max-old-space-size).
 *
 * Each must end with one line on stderr, exit status 2, in bounded time (the
 * child is given a generous timeout and must have finished by itself), with
 * the input byte-for-byte unchanged and no output or temporary file left.
 */
import { spawnSync } from 'node:child_process';
import { createHash } from 'node:crypto';
import { closeSync, existsSync, ftruncateSync, mkdtempSync, openSync, readFileSync, readdirSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import JSZip from 'jszip';
import { MAX_CELLS, MAX_EXPANDED_BYTES, MAX_PACKAGE_BYTES, checkPackage } from '../../src/engine/packageCheck';
import {
  SHEET_HEAD,
  SHEET_TAIL,
  centralDirectoryEntries,
  nativeZip,
  packageWithSheet,
  sheetPackageParts,
  smallSheet,
} from './support/rawWorkbook';

/** Generous, for slow CI; a run that needs it has failed anyway (it is not a timing assertion). */
const CHILD_TIMEOUT_MS = 90_000;

/** The CLI as `npm run build` compiled it (npm test builds first); checked to be there. */
const cli = { main: join(__dirname, '..', '..', 'dist', 'node', 'cli', 'main.js') };
let folder: string;

beforeAll(() => {
  if (!existsSync(cli.main)) throw new Error(`${cli.main} is missing: run \`npm run build\` first (npm test does)`);
});
beforeEach(() => {
  folder = mkdtempSync(join(tmpdir(), 'driftcell-hardening-'));
});
afterEach(() => rmSync(folder, { recursive: true, force: true }));

function sha256(path: string): string {
  return createHash('sha256').update(readFileSync(path)).digest('hex');
}

/** Runs recalc on the bytes and checks everything every refusal must satisfy; returns the stderr line. */
function refusal(bytes: Buffer, name = 'input.xlsx'): string {
  const input = join(folder, name);
  writeFileSync(input, bytes);
  const before = sha256(input);
  const env = { ...process.env };
  delete env.NODE_OPTIONS;
  const result = spawnSync(process.execPath, [cli.main, 'recalc', name, '-o', 'out.xlsx'], {
    cwd: folder,
    encoding: 'utf8',
    timeout: CHILD_TIMEOUT_MS,
    env,
  });
  expect(result.error).toBeUndefined();
  expect(result.signal).toBeNull();
  expect({ status: result.status, stdout: result.stdout }).toEqual({ status: 2, stdout: '' });
  expect(result.stderr).toMatch(/^driftcell: [^\n]+\n$/);
  expect(result.stderr).not.toMatch(/\bat .*\(.*:\d+:\d+\)|unexpected failure/);
  expect(sha256(input)).toBe(before);
  expect(readdirSync(folder)).toEqual([name]);
  rmSync(input);
  return result.stderr.trim();
}

function oleFile(streamNames: string[]): Buffer {
  // A compound-file header (signature, then zeros) and directory names in UTF-16LE, as Office writes them.
  const header = Buffer.alloc(512);
  Buffer.from([0xd0, 0xcf, 0x11, 0xe0, 0xa1, 0xb1, 0x1a, 0xe1]).copy(header);
  return Buffer.concat([header, ...streamNames.map((n) => Buffer.from(n, 'utf16le')), Buffer.alloc(512)]);
}

describe('recalc refuses files it cannot read, in one line', () => {
  it('plain text, an empty file and random bytes', () => {
    expect(refusal(Buffer.from('name,value\nA,1\n'))).toBe('driftcell: input.xlsx: not an .xlsx workbook (it is not a zip package)');
    expect(refusal(Buffer.alloc(0))).toBe('driftcell: input.xlsx: not an .xlsx workbook (it is not a zip package)');
    expect(refusal(Buffer.from(Array.from({ length: 4096 }, (_, i) => (i * 131 + 7) % 256)))).toMatch(/not an \.xlsx workbook/);
  });

  it('a workbook cut short anywhere', async () => {
    const whole = await packageWithSheet(smallSheet());
    expect(refusal(whole.subarray(0, Math.floor(whole.length / 2)))).toBe(
      'driftcell: input.xlsx: not an .xlsx workbook (it is truncated or damaged (the zip package has no central directory))',
    );
    // Cut inside the central directory's end record: the directory is gone.
    expect(refusal(whole.subarray(0, whole.length - 10))).toMatch(/truncated or damaged/);
    // Central directory intact, a part's data overwritten: exceljs or the inflater meets garbage.
    const damaged = Buffer.from(whole);
    const entry = centralDirectoryEntries(damaged).find((e) => e.name === 'xl/worksheets/sheet1.xml');
    if (!entry) throw new Error('no sheet entry');
    const local = damaged.readUInt32LE(entry.offset + 42);
    damaged.fill(0xff, local + 40, local + 60);
    expect(refusal(damaged)).toMatch(/^driftcell: input\.xlsx: not an \.xlsx workbook \(/);
  });

  it('a password-protected workbook (an OLE compound file holding EncryptedPackage) and an old .xls', () => {
    expect(refusal(oleFile(['EncryptionInfo', 'EncryptedPackage']))).toBe(
      'driftcell: input.xlsx: not an .xlsx workbook (it is password-protected (encrypted); save a copy without a password and recalculate that)',
    );
    expect(refusal(oleFile(['Workbook', 'SummaryInformation']), 'old.xls')).toMatch(
      /^driftcell: old\.xls is an Excel 97–2003 workbook \(\.xls\); recalc reads \.xlsx workbooks: open it in LibreOffice Calc or Excel, save it as \.xlsx/,
    );
  });

  it('a zip that holds no workbook', async () => {
    const zip = new JSZip();
    zip.file('readme.txt', 'not a workbook');
    expect(refusal(await zip.generateAsync({ type: 'nodebuffer', compression: 'DEFLATE' }))).toMatch(
      /^driftcell: input\.xlsx: not an \.xlsx workbook \(/,
    );
  });

  it('a zip bomb: a sheet of 200 MB of repeated bytes in a small file', async () => {
    const filler = Buffer.alloc(200 * 1024 * 1024, 0x20);
    const bomb = nativeZip(sheetPackageParts(Buffer.concat([Buffer.from(SHEET_HEAD), filler, Buffer.from(SHEET_TAIL)])));
    // JSZip itself reads it as a valid package (the check is not refusing a broken zip).
    expect(Object.keys((await JSZip.loadAsync(bomb, { checkCRC32: false })).files)).toContain('xl/worksheets/sheet1.xml');
    expect(bomb.length).toBeLessThan(2 * 1024 * 1024);
    expect(refusal(bomb)).toBe(
      `driftcell: input.xlsx: too large to recalculate (its parts declare 200 MB when expanded, more than the ${MAX_EXPANDED_BYTES / 2 ** 20} MB Driftcell reads)`,
    );
    // The same bomb with its declared sizes rewritten to look small: the inflater's cap still stops it.
    const liar = Buffer.from(bomb);
    for (const entry of centralDirectoryEntries(liar)) liar.writeUInt32LE(1000, entry.offset + 24);
    expect(refusal(liar)).toMatch(
      /^driftcell: input\.xlsx: too large to recalculate \(its parts expand to more than 128 MB, the most Driftcell reads \(part xl\/worksheets\/sheet1\.xml alone goes past it\)\)$/,
    );
  }, 120_000);

  it('a file larger than the limit, refused before it is read', () => {
    const input = join(folder, 'big.xlsx');
    const fd = openSync(input, 'w');
    ftruncateSync(fd, MAX_PACKAGE_BYTES + 1); // sparse: no disk space needed
    closeSync(fd);
    const result = spawnSync(process.execPath, [cli.main, 'recalc', 'big.xlsx', '-o', 'out.xlsx'], {
      cwd: folder,
      encoding: 'utf8',
      timeout: CHILD_TIMEOUT_MS,
    });
    expect(result.status).toBe(2);
    expect(result.stderr).toBe('driftcell: big.xlsx: too large to recalculate (it is 128.0 MB, more than the 128 MB Driftcell reads)\n');
    expect(readdirSync(folder)).toEqual(['big.xlsx']);
  });

  it('a part that declares 4 GB', async () => {
    const bytes = await packageWithSheet(smallSheet());
    const entry = centralDirectoryEntries(bytes).find((e) => e.name === 'xl/worksheets/sheet1.xml');
    if (!entry) throw new Error('no sheet entry');
    bytes.writeUInt32LE(0xfffffff0, entry.offset + 24);
    expect(refusal(bytes)).toMatch(/^driftcell: input\.xlsx: too large to recalculate \(its parts declare 4096 MB when expanded/);
  });

  it(`a sheet of two million cells, refused before it is parsed (limit ${MAX_CELLS})`, async () => {
    // 1000 rows of 2000 cells; the r attributes are optional in SpreadsheetML, which keeps the file quick to build.
    const row = `<row>${'<c><v>1</v></c>'.repeat(2000)}</row>`;
    const xml = Buffer.from(`${SHEET_HEAD}${row.repeat(1000)}${SHEET_TAIL}`, 'latin1');
    const bytes = nativeZip(sheetPackageParts(xml));
    expect(refusal(bytes)).toBe(
      'driftcell: input.xlsx: too large to recalculate (it has more than 1,000,000 cells, the most Driftcell recalculates (each takes about 1.3 kB of memory))',
    );
  }, 120_000);
});

describe('the package check itself', () => {
  it('counts cells of every worksheet, prefixed or not, but not <col> or <cfRule>', async () => {
    const xml = `${SHEET_HEAD}<cols><col min="1" max="2"/></cols><row r="1"><c r="A1"><v>1</v></c><c r="B1"/><x:c r="C1">2</x:c></row>${SHEET_TAIL}<conditionalFormatting><cfRule type="x"/></conditionalFormatting>`;
    expect(checkPackage(await packageWithSheet(xml))).toBe(3);
  });

  it('recalculates a sheet longer than HyperFormula\'s default 40 000 rows (it used to fail with "Sheet size limit exceeded")', () => {
    const rows = Array.from({ length: 50_000 }, (_, i) => `<row r="${i + 1}"><c r="A${i + 1}"><v>${i + 1}</v></c></row>`).join('');
    const xml = Buffer.from(`${SHEET_HEAD}${rows}<row r="50001"><c r="B50001"><f>SUM(A1:A50000)</f></c></row>${SHEET_TAIL}`);
    writeFileSync(join(folder, 'long.xlsx'), nativeZip(sheetPackageParts(xml)));
    const result = spawnSync(process.execPath, [cli.main, 'recalc', 'long.xlsx', '-o', 'out.xlsx'], {
      cwd: folder,
      encoding: 'utf8',
      timeout: CHILD_TIMEOUT_MS,
    });
    expect({ status: result.status, stderr: result.stderr }).toEqual({ status: 0, stderr: '' });
    expect(result.stdout).toBe('wrote out.xlsx: 1 sheet, 1 formula, 0 spilled results\n');
  });

  it('lets an ordinary workbook through, and recalc then works with the input unchanged', async () => {
    const input = join(folder, 'fine.xlsx');
    writeFileSync(input, await packageWithSheet(smallSheet()));
    const before = sha256(input);
    const result = spawnSync(process.execPath, [cli.main, 'recalc', 'fine.xlsx', '-o', 'out.xlsx'], {
      cwd: folder,
      encoding: 'utf8',
      timeout: CHILD_TIMEOUT_MS,
    });
    expect(result.status).toBe(0);
    expect(sha256(input)).toBe(before);
    expect(readdirSync(folder).sort()).toEqual(['fine.xlsx', 'out.xlsx']);
  });
});
