/**
 * Bounds on what one worksheet's XML can make the reader and the engine do,
 * checked on the raw part before exceljs parses it. exceljs builds an object
 * per cell of every merged range, per column up to the largest `<col max>`,
 * and per address of every data-validation range; the engine and the old-
 * spill bookkeeping walk the used range and every array-formula range. A
 * few kilobytes can declare billions of each, so each is measured here from
 * the declared extents and refused beyond a limit (one line naming the
 * limit and the element).
 */

/** Rows and columns of an Excel worksheet (Microsoft, "Excel specifications and limits"). */
export const GRID_ROWS = 1_048_576;
export const GRID_COLUMNS = 16_384;

/**
 * Largest used range (rows spanned × columns spanned by the cells present) of
 * one sheet. The engine's grid grows with the used range, not with the cells
 * present: a single value at XFD1048576 took 1.6 GB before it aborted.
 */
export const MAX_USED_RANGE_CELLS = 4_000_000;

/**
 * Most cells all merged ranges of a sheet may cover together: exceljs makes an object per covered cell, so memory
 * follows the merged area (about 0.2 GB per 100,000 cells), not the content.
 */
export const MAX_MERGED_CELLS = 100_000;

/** Most cells all data-validation ranges of a sheet may cover together (exceljs keeps one entry per address). */
export const MAX_VALIDATED_CELLS = 1_048_576;

/** Most cells all array-formula ranges (`<f t="array" ref=…>`) of a sheet may cover together. */
export const MAX_ARRAY_RANGE_CELLS = 1_000_000;

/** Raised for a sheet beyond one of the bounds above; the message is one line. */
export class SheetBoundExceeded extends Error {
  constructor(message: string) {
    super(message);
    this.name = 'SheetBoundExceeded';
  }
}

interface Area {
  readonly top: number;
  readonly left: number;
  readonly bottom: number;
  readonly right: number;
}

function columnNumber(letters: string): number {
  let n = 0;
  for (const ch of letters.toUpperCase()) n = n * 26 + ch.charCodeAt(0) - 64;
  return n;
}

/** One A1 reference or area (`B2`, `$B$2:$D$9`, whole columns `A:C`, whole rows `3:5`), 1-based; undefined if unreadable. */
export function parseArea(ref: string): Area | undefined {
  const text = ref.trim().replace(/\$/g, '');
  let m = /^([A-Za-z]{1,7})(\d{1,12})(?::([A-Za-z]{1,7})(\d{1,12}))?$/.exec(text);
  if (m) {
    const left = columnNumber(m[1]);
    const top = Number(m[2]);
    const right = m[3] ? columnNumber(m[3]) : left;
    const bottom = m[4] ? Number(m[4]) : top;
    return { top: Math.min(top, bottom), left: Math.min(left, right), bottom: Math.max(top, bottom), right: Math.max(left, right) };
  }
  m = /^([A-Za-z]{1,7}):([A-Za-z]{1,7})$/.exec(text);
  if (m) {
    const [a, b] = [columnNumber(m[1]), columnNumber(m[2])];
    return { top: 1, left: Math.min(a, b), bottom: GRID_ROWS, right: Math.max(a, b) };
  }
  m = /^(\d{1,12}):(\d{1,12})$/.exec(text);
  if (m) {
    const [a, b] = [Number(m[1]), Number(m[2])];
    return { top: Math.min(a, b), left: 1, bottom: Math.max(a, b), right: GRID_COLUMNS };
  }
  return undefined;
}

function areaCells(area: Area): number {
  return (area.bottom - area.top + 1) * (area.right - area.left + 1);
}

function insideGrid(area: Area): boolean {
  return area.top >= 1 && area.left >= 1 && area.bottom <= GRID_ROWS && area.right <= GRID_COLUMNS;
}

function attribute(tag: string, name: string): string | undefined {
  const m = new RegExp(`\\s${name}\\s*=\\s*(?:"([^"]*)"|'([^']*)')`).exec(tag);
  return m ? (m[1] ?? m[2]) : undefined;
}

const GRID_TEXT =
  `Excel's grid of ${GRID_ROWS.toLocaleString('en-US')} rows × ` + `${GRID_COLUMNS.toLocaleString('en-US')} columns (A1:XFD1048576)`;

function count(n: number): string {
  return n.toLocaleString('en-US');
}

/** Sums the areas of a space-separated range list, refusing areas outside the grid. */
function rangeListCells(list: string, element: string): number {
  let total = 0;
  for (const ref of list.split(/\s+/).filter((r) => r !== '')) {
    const area = parseArea(ref);
    if (area === undefined) throw new SheetBoundExceeded(`${element} has the unreadable range "${ref.slice(0, 40)}"`);
    if (!insideGrid(area)) throw new SheetBoundExceeded(`${element} ${ref.slice(0, 40)} reaches outside ${GRID_TEXT}`);
    total += areaCells(area);
  }
  return total;
}

/**
 * Checks one worksheet part's declared extents.
 *
 * @param xml - the part's expanded bytes
 * @param part - the part name, for messages
 * @throws SheetBoundExceeded naming the limit and the offending element
 * @example checkSheetBounds(Buffer.from('<worksheet><sheetData/></worksheet>'), 'xl/worksheets/sheet1.xml')
 */
export function checkSheetBounds(xml: Buffer, part: string): void {
  const text = xml.toString('latin1');
  let top = Infinity;
  let left = Infinity;
  let bottom = 0;
  let right = 0;
  let row = 0;
  let column = 0;
  let merged = 0;
  let validated = 0;
  let arrays = 0;
  const tags = /<(?:[A-Za-z_][\w.-]*:)?(row|c|mergeCell|col|dataValidation|conditionalFormatting|f)(?=[\s/>])[^>]*>/g;
  for (const match of text.matchAll(tags)) {
    const tag = match[0];
    switch (match[1]) {
      case 'row': {
        const r = attribute(tag, 'r');
        row = r === undefined ? row + 1 : Number(r);
        column = 0;
        if (!Number.isInteger(row) || row < 1 || row > GRID_ROWS) throw new SheetBoundExceeded(`${part}: row ${r} is outside ${GRID_TEXT}`);
        break;
      }
      case 'c': {
        const r = attribute(tag, 'r');
        let cellRow = row;
        if (r === undefined) column += 1;
        else {
          const area = parseArea(r);
          if (area === undefined) throw new SheetBoundExceeded(`${part}: cell reference "${r.slice(0, 40)}" cannot be read`);
          column = area.left;
          cellRow = area.top;
        }
        if (cellRow > GRID_ROWS || column > GRID_COLUMNS)
          throw new SheetBoundExceeded(`${part}: cell ${r ?? `in row ${row}`} is outside ${GRID_TEXT}`);
        top = Math.min(top, cellRow);
        bottom = Math.max(bottom, cellRow);
        left = Math.min(left, column);
        right = Math.max(right, column);
        break;
      }
      case 'mergeCell':
        merged += rangeListCells(attribute(tag, 'ref') ?? '', `${part}: merged range`);
        if (merged > MAX_MERGED_CELLS)
          throw new SheetBoundExceeded(
            `${part}: merged ranges cover more than ` + `${count(MAX_MERGED_CELLS)} cells (at mergeCell ${attribute(tag, 'ref')})`,
          );
        break;
      case 'col': {
        const max = Number(attribute(tag, 'max') ?? attribute(tag, 'min') ?? 1);
        if (!Number.isFinite(max) || max > GRID_COLUMNS)
          throw new SheetBoundExceeded(`${part}: column definition <col max="${attribute(tag, 'max')}"> is outside ${GRID_TEXT}`);
        break;
      }
      case 'dataValidation':
        validated += rangeListCells(attribute(tag, 'sqref') ?? '', `${part}: data validation`);
        if (validated > MAX_VALIDATED_CELLS)
          throw new SheetBoundExceeded(
            `${part}: data validation covers ` +
              `more than ${count(MAX_VALIDATED_CELLS)} cells (at sqref ` +
              `${attribute(tag, 'sqref')?.slice(0, 40)})`,
          );
        break;
      case 'conditionalFormatting':
        rangeListCells(attribute(tag, 'sqref') ?? '', `${part}: conditional format`);
        break;
      case 'f': {
        const ref = attribute(tag, 'ref');
        if (ref === undefined || attribute(tag, 't') !== 'array') break;
        arrays += rangeListCells(ref, `${part}: array formula range`);
        if (arrays > MAX_ARRAY_RANGE_CELLS)
          throw new SheetBoundExceeded(
            `${part}: array formula ranges ` + `cover more than ${count(MAX_ARRAY_RANGE_CELLS)} cells (at ref ${ref.slice(0, 40)})`,
          );
        break;
      }
    }
  }
  if (bottom > 0) {
    const used = (bottom - top + 1) * (right - left + 1);
    if (used > MAX_USED_RANGE_CELLS) {
      const range = `${columnLetters(left)}${top}:${columnLetters(right)}${bottom}`;
      throw new SheetBoundExceeded(
        `${part}: its used range ${range} spans ${count(used)} cells, more than ` +
          `the ${count(MAX_USED_RANGE_CELLS)} Driftcell recalculates per sheet`,
      );
    }
  }
}

function columnLetters(column: number): string {
  let letters = '';
  for (let n = column; n > 0; n = Math.floor((n - 1) / 26)) letters = String.fromCharCode(65 + ((n - 1) % 26)) + letters;
  return letters;
}
