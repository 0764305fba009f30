/**
 * Checks an .xlsx package before exceljs sees it. exceljs (through JSZip)
 * inflates every part into memory and builds an object per cell, trusting the
 * sizes the zip declares, so a small file can claim or expand to gigabytes
 * and take the process down. This reads the zip's central directory itself,
 * inflates each part with a hard output cap (native zlib, maxOutputLength),
 * counts the cells of every worksheet, and refuses with a one-line reason:
 * password-protected workbooks and old .xls files (OLE compound files),
 * truncated or damaged zips, encrypted or unusually compressed parts, and
 * packages beyond the limits below.
 */
import { inflateRawSync } from 'node:zlib';
import { SheetBoundExceeded, checkSheetBounds } from './sheetBounds';

/**
 * Largest .xlsx file read, bytes. The file is read whole into memory; a
 * package is never larger than what it expands to, so the expanded limit
 * bounds it too.
 */
export const MAX_PACKAGE_BYTES = 128 * 1024 * 1024;

/**
 * Largest total size the package's parts may expand to, bytes. One million
 * cells of ordinary sheet XML take about 30–100 MB; exceljs holds every
 * expanded part in memory at once, and a zip bomb (a few hundred kB that
 * inflate to gigabytes) must stop here, not in exceljs.
 */
export const MAX_EXPANDED_BYTES = 128 * 1024 * 1024;

/**
 * Most cells (non-empty `<c>` elements, all sheets together) read. exceljs
 * and HyperFormula together take about 1.3 kB per cell: measured on a 2-core
 * machine, one million numeric cells recalculated in about 18 s with a peak of
 * 1.3 GB, inside Node's default heap; two million took 34 s and 2.6 GB,
 * which machines with Node's smaller default heaps cannot give.
 */
export const MAX_CELLS = 1_000_000;

/** Most parts in a package. A workbook has a few dozen; each part costs exceljs an object and a buffer. */
export const MAX_PARTS = 10_000;

/** Signature of an OLE compound file: old .xls files and password-protected (encrypted) OOXML. */
const OLE_SIGNATURE = Buffer.from([0xd0, 0xcf, 0x11, 0xe0, 0xa1, 0xb1, 0x1a, 0xe1]);
/** Stream name every encrypted OOXML package has inside its compound file (UTF-16LE). */
const ENCRYPTED_PACKAGE_STREAM = Buffer.from('EncryptedPackage', 'utf16le');

const LOCAL_HEADER = 0x04034b50;
const CENTRAL_HEADER = 0x02014b50;
const END_OF_CENTRAL_DIRECTORY = 0x06054b50;
const END_RECORD_SIZE = 22;
/** The end record may be followed by a comment of up to 65 535 bytes. */
const MAX_COMMENT = 0xffff;
const STORED = 0;
const DEFLATED = 8;

/** A package the checks refuse; the message is one line, without the file name. */
export class PackageRejected extends Error {
  constructor(
    message: string,
    /** 'format': not a readable .xlsx package; 'limit': readable but beyond a limit above. */
    readonly reason: 'format' | 'limit' = 'format',
  ) {
    super(message);
    this.name = 'PackageRejected';
  }
}

function megabytes(bytes: number): string {
  return `${Math.round(bytes / (1024 * 1024))} MB`;
}

/**
 * exceljs 4.4's own rule for a worksheet part (lib/xlsx/xlsx.js, loadFromFiles):
 * the entry name, one leading "/" removed, matched anywhere by this unanchored
 * pattern, so "/xl/worksheets/sheet1.xml", "xl/worksheets/sheet1.xmlX" and
 * "a/xl/worksheets/sheet2.xml" are all parsed as sheets.
 */
const EXCELJS_WORKSHEET_PART = /xl\/worksheets\/sheet(\d+)[.]xml/;

/**
 * The worksheet parts, whose cells count against MAX_CELLS and whose extents
 * are bounded (sheetBounds.ts): every part exceljs will parse as a sheet, and
 * any other XML part under xl/worksheets/.
 */
export function isWorksheetPart(name: string): boolean {
  const entry = name.startsWith('/') ? name.slice(1) : name;
  return EXCELJS_WORKSHEET_PART.test(entry) || /^\/?xl\/worksheets\/[^/]+\.xml$/i.test(name);
}

/** Counts `<c …>` / `<x:c …>` start tags (not `<col>`, `<cfRule>` …) in sheet XML. */
function countCells(xml: Buffer): number {
  const text = xml.toString('latin1');
  let count = 0;
  for (const _ of text.matchAll(/<(?:[A-Za-z_][\w.-]*:)?c[\s/>]/g)) count++;
  return count;
}

function findEndRecord(bytes: Buffer): number {
  const earliest = Math.max(0, bytes.length - END_RECORD_SIZE - MAX_COMMENT);
  for (let i = bytes.length - END_RECORD_SIZE; i >= earliest; i--) {
    if (bytes.readUInt32LE(i) === END_OF_CENTRAL_DIRECTORY) return i;
  }
  return -1;
}

/** Refuses files that are not zip packages, saying what they look like instead. */
function refuseNonZip(bytes: Buffer): never {
  if (bytes.length >= OLE_SIGNATURE.length && bytes.subarray(0, OLE_SIGNATURE.length).equals(OLE_SIGNATURE)) {
    if (bytes.includes(ENCRYPTED_PACKAGE_STREAM)) {
      throw new PackageRejected('it is password-protected (encrypted); save a copy without a password and recalculate that');
    }
    throw new PackageRejected('it is an old binary .xls workbook, not .xlsx; save it as .xlsx first');
  }
  if (bytes.length >= 4 && bytes.readUInt32LE(0) === LOCAL_HEADER) {
    throw new PackageRejected('it is truncated or damaged (the zip package has no central directory)');
  }
  throw new PackageRejected('it is not a zip package');
}

/**
 * Checks a package's structure and size before it is parsed.
 *
 * @param bytes - the whole file
 * @returns the number of cells its worksheets hold
 * @throws PackageRejected with a one-line reason when the file is not a readable .xlsx package or exceeds a limit
 * @example checkPackage(readFileSync('in.xlsx')) // 1234
 */
export function checkPackage(bytes: Buffer): number {
  if (bytes.length > MAX_PACKAGE_BYTES) {
    throw new PackageRejected(`it is ${megabytes(bytes.length)}, more than the ${megabytes(MAX_PACKAGE_BYTES)} Driftcell reads`, 'limit');
  }
  const end = bytes.length >= END_RECORD_SIZE ? findEndRecord(bytes) : -1;
  if (end < 0) refuseNonZip(bytes);
  const entries = bytes.readUInt16LE(end + 10);
  const directorySize = bytes.readUInt32LE(end + 12);
  const directoryOffset = bytes.readUInt32LE(end + 16);
  if (entries === 0xffff || directoryOffset === 0xffffffff || directorySize === 0xffffffff) {
    throw new PackageRejected('it is a ZIP64 package (over 4 GB or 65 535 parts), beyond what Driftcell reads', 'limit');
  }
  if (entries > MAX_PARTS) throw new PackageRejected(`it has ${entries} parts, more than the ${MAX_PARTS} Driftcell reads`, 'limit');
  if (directoryOffset + directorySize > end)
    throw new PackageRejected('it is truncated or damaged (its zip directory points past the end of the file)');

  let declared = 0;
  const parts: { name: string; method: number; flags: number; compressedSize: number; size: number; localOffset: number }[] = [];
  let at = directoryOffset;
  for (let i = 0; i < entries; i++) {
    if (at + 46 > end || bytes.readUInt32LE(at) !== CENTRAL_HEADER)
      throw new PackageRejected('it is truncated or damaged (its zip directory is broken)');
    const nameLength = bytes.readUInt16LE(at + 28);
    const part = {
      flags: bytes.readUInt16LE(at + 8),
      method: bytes.readUInt16LE(at + 10),
      compressedSize: bytes.readUInt32LE(at + 20),
      size: bytes.readUInt32LE(at + 24),
      localOffset: bytes.readUInt32LE(at + 42),
      name: bytes.toString('utf8', at + 46, at + 46 + nameLength),
    };
    parts.push(part);
    declared += part.size;
    at += 46 + nameLength + bytes.readUInt16LE(at + 30) + bytes.readUInt16LE(at + 32);
  }
  if (declared > MAX_EXPANDED_BYTES) {
    throw new PackageRejected(
      `its parts declare ${megabytes(declared)} when expanded, more than the ` + `${megabytes(MAX_EXPANDED_BYTES)} Driftcell reads`,
      'limit',
    );
  }

  // Declared sizes can lie: every part is inflated with a hard cap on what the whole package may expand to.
  let expanded = 0;
  let cells = 0;
  for (const part of parts) {
    if ((part.flags & 1) !== 0) throw new PackageRejected(`it is encrypted (part ${part.name}); save a copy without a password`);
    if (part.method !== STORED && part.method !== DEFLATED) {
      throw new PackageRejected(`part ${part.name} uses zip compression method ${part.method}; only stored and deflated parts are read`);
    }
    const local = part.localOffset;
    if (local + 30 > bytes.length || bytes.readUInt32LE(local) !== LOCAL_HEADER) {
      throw new PackageRejected(`it is truncated or damaged (part ${part.name} is missing)`);
    }
    const dataStart = local + 30 + bytes.readUInt16LE(local + 26) + bytes.readUInt16LE(local + 28);
    const dataEnd = dataStart + part.compressedSize;
    if (dataEnd > bytes.length) throw new PackageRejected(`it is truncated or damaged (part ${part.name} is cut short)`);
    const data = bytes.subarray(dataStart, dataEnd);
    const budget = MAX_EXPANDED_BYTES - expanded;
    let content: Buffer;
    if (part.method === STORED) {
      content = data;
    } else {
      try {
        content = inflateRawSync(data, { maxOutputLength: Math.max(1, budget) });
      } catch (e) {
        if ((e as NodeJS.ErrnoException).code === 'ERR_BUFFER_TOO_LARGE') {
          throw new PackageRejected(
            `its parts expand to more than ${megabytes(MAX_EXPANDED_BYTES)}, the ` +
              `most Driftcell reads (part ${part.name} alone goes past it)`,
            'limit',
          );
        }
        throw new PackageRejected(`it is truncated or damaged (part ${part.name} does not inflate)`);
      }
    }
    expanded += content.length;
    if (expanded > MAX_EXPANDED_BYTES) {
      throw new PackageRejected(`its parts expand to more than ${megabytes(MAX_EXPANDED_BYTES)}, the most Driftcell reads`, 'limit');
    }
    if (isWorksheetPart(part.name)) {
      try {
        checkSheetBounds(content, part.name);
      } catch (e) {
        if (e instanceof SheetBoundExceeded) throw new PackageRejected(e.message, 'limit');
        throw e;
      }
      cells += countCells(content);
      if (cells > MAX_CELLS) {
        throw new PackageRejected(
          `it has more than ${MAX_CELLS.toLocaleString('en-US')} cells, the most ` +
            `Driftcell recalculates (each takes about 1.3 kB of memory)`,
          'limit',
        );
      }
    }
  }
  return cells;
}
