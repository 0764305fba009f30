/**
 * Builds .xlsx packages part by part with JSZip, so tests can make files
 * exceljs would never write: huge sheets written quickly, parts that expand
 * enormously, sizes that lie, and packages with parts missing.
 */
import { crc32, deflateRawSync } from 'node:zlib';
import JSZip from 'jszip';

const CONTENT_TYPES = `<?xml version="1.0" encoding="UTF-8" standalone="yes"?>
<Types xmlns="http://schemas.openxmlformats.org/package/2006/content-types"><Default Extension="rels" ContentType="application/vnd.openxmlformats-package.relationships+xml"/><Default Extension="xml" ContentType="application/xml"/><Override PartName="/xl/workbook.xml" ContentType="application/vnd.openxmlformats-officedocument.spreadsheetml.sheet.main+xml"/><Override PartName="/xl/worksheets/sheet1.xml" ContentType="application/vnd.openxmlformats-officedocument.spreadsheetml.worksheet+xml"/></Types>`;
const ROOT_RELS = `<?xml version="1.0" encoding="UTF-8" standalone="yes"?>
<Relationships xmlns="http://schemas.openxmlformats.org/package/2006/relationships"><Relationship Id="rId1" Type="http://schemas.openxmlformats.org/officeDocument/2006/relationships/officeDocument" Target="xl/workbook.xml"/></Relationships>`;
const WORKBOOK = `<?xml version="1.0" encoding="UTF-8" standalone="yes"?>
<workbook xmlns="http://schemas.openxmlformats.org/spreadsheetml/2006/main" xmlns:r="http://schemas.openxmlformats.org/officeDocument/2006/relationships"><sheets><sheet name="Sheet1" sheetId="1" r:id="rId1"/></sheets></workbook>`;
const WORKBOOK_RELS = `<?xml version="1.0" encoding="UTF-8" standalone="yes"?>
<Relationships xmlns="http://schemas.openxmlformats.org/package/2006/relationships"><Relationship Id="rId1" Type="http://schemas.openxmlformats.org/officeDocument/2006/relationships/worksheet" Target="worksheets/sheet1.xml"/></Relationships>`;

export const SHEET_HEAD = `<?xml version="1.0" encoding="UTF-8" standalone="yes"?>
<worksheet xmlns="http://schemas.openxmlformats.org/spreadsheetml/2006/main"><sheetData>`;
export const SHEET_TAIL = '</sheetData></worksheet>';

/** A one-sheet package whose sheet part is given as bytes or text. */
export async function packageWithSheet(sheetXml: string | Buffer, options: { compressionLevel?: number } = {}): Promise<Buffer> {
  const zip = new JSZip();
  zip.file('[Content_Types].xml', CONTENT_TYPES);
  zip.file('_rels/.rels', ROOT_RELS);
  zip.file('xl/workbook.xml', WORKBOOK);
  zip.file('xl/_rels/workbook.xml.rels', WORKBOOK_RELS);
  zip.file('xl/worksheets/sheet1.xml', sheetXml);
  return zip.generateAsync({ type: 'nodebuffer', compression: 'DEFLATE', compressionOptions: { level: options.compressionLevel ?? 6 } });
}

/** Sheet XML with `rows` rows of `columns` numeric cells, and a DRIFT formula in the first row. */
export function numericSheet(rows: number, columns: number): Buffer {
  const parts: string[] = [SHEET_HEAD];
  const letters = Array.from({ length: columns }, (_, c) => columnLetters(c + 1));
  for (let r = 1; r <= rows; r++) {
    let row = `<row r="${r}">`;
    for (let c = 0; c < columns; c++) row += `<c r="${letters[c]}${r}"><v>${r}</v></c>`;
    parts.push(`${row}</row>`);
  }
  parts.push(SHEET_TAIL);
  return Buffer.from(parts.join(''), 'latin1');
}

export function columnLetters(column: number): string {
  let letters = '';
  for (let n = column; n > 0; n = Math.floor((n - 1) / 26)) letters = String.fromCharCode(65 + ((n - 1) % 26)) + letters;
  return letters;
}

/** A valid small package with one DRIFT formula. */
export function smallSheet(): string {
  return `${SHEET_HEAD}<row r="1"><c r="A1"><v>1000000000000000</v></c><c r="B1"><f>DRIFT.RESISTIVITY(A1,"B")</f></c></row>${SHEET_TAIL}`;
}

/** Offsets of zip records, for tests that rewrite declared sizes. */
export function centralDirectoryEntries(zip: Buffer): { offset: number; name: string }[] {
  const entries: { offset: number; name: string }[] = [];
  for (let i = zip.indexOf(Buffer.from([0x50, 0x4b, 0x01, 0x02])); i >= 0; i = zip.indexOf(Buffer.from([0x50, 0x4b, 0x01, 0x02]), i + 4)) {
    const nameLength = zip.readUInt16LE(i + 28);
    entries.push({ offset: i, name: zip.toString('latin1', i + 46, i + 46 + nameLength) });
  }
  return entries;
}

/**
 * A zip written directly with Node's native zlib (JSZip's JavaScript deflate
 * takes many seconds over 200 MB): every part deflated, sizes and CRCs true.
 */
export function nativeZip(parts: readonly { name: string; data: Buffer }[]): Buffer {
  const locals: Buffer[] = [];
  const centrals: Buffer[] = [];
  let offset = 0;
  for (const { name, data } of parts) {
    const nameBytes = Buffer.from(name, 'utf8');
    const compressed = deflateRawSync(data, { level: 1 });
    const crc = crc32(data);
    const local = Buffer.alloc(30);
    local.writeUInt32LE(0x04034b50, 0);
    local.writeUInt16LE(20, 4);
    local.writeUInt16LE(8, 8);
    local.writeUInt32LE(crc, 14);
    local.writeUInt32LE(compressed.length, 18);
    local.writeUInt32LE(data.length, 22);
    local.writeUInt16LE(nameBytes.length, 26);
    const central = Buffer.alloc(46);
    central.writeUInt32LE(0x02014b50, 0);
    central.writeUInt16LE(20, 4);
    central.writeUInt16LE(20, 6);
    central.writeUInt16LE(8, 10);
    central.writeUInt32LE(crc, 16);
    central.writeUInt32LE(compressed.length, 20);
    central.writeUInt32LE(data.length, 24);
    central.writeUInt16LE(nameBytes.length, 28);
    central.writeUInt32LE(offset, 42);
    locals.push(local, nameBytes, compressed);
    centrals.push(central, nameBytes);
    offset += 30 + nameBytes.length + compressed.length;
  }
  const directory = Buffer.concat(centrals);
  const end = Buffer.alloc(22);
  end.writeUInt32LE(0x06054b50, 0);
  end.writeUInt16LE(parts.length, 8);
  end.writeUInt16LE(parts.length, 10);
  end.writeUInt32LE(directory.length, 12);
  end.writeUInt32LE(offset, 16);
  return Buffer.concat([...locals, directory, end]);
}

/** The parts of a one-sheet package, for nativeZip. */
export function sheetPackageParts(sheetXml: Buffer): { name: string; data: Buffer }[] {
  return [
    { name: '[Content_Types].xml', data: Buffer.from(CONTENT_TYPES) },
    { name: '_rels/.rels', data: Buffer.from(ROOT_RELS) },
    { name: 'xl/workbook.xml', data: Buffer.from(WORKBOOK) },
    { name: 'xl/_rels/workbook.xml.rels', data: Buffer.from(WORKBOOK_RELS) },
    { name: 'xl/worksheets/sheet1.xml', data: sheetXml },
  ];
}
