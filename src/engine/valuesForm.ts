/**
 * The values form of a recalculated workbook, for programs that do not know
 * the DRIFT add-in: every formula cell (DRIFT or not, spilled or not) becomes
 * its result as a plain value, so no program has anything to recalculate, and
 * every formula is listed as text on a sheet of its own ("Formulas"), so a
 * reader still sees how each value was made.
 *
 * LibreOffice Calc, for example, shows `#NAME?` for array formulas with DRIFT
 * calls even when their cached values are stored, and for every DRIFT cell
 * when it recalculates on load; plain values it shows as they are
 * (tests/interop/libreoffice.test.ts runs it on both forms).
 */
import ExcelJS from 'exceljs';
import { cellAddress } from './xlsx';
import { displayFormula } from './formulaText';
import type { StoredFormula } from './workbookCells';
import { lastColumnValidationsAsRanges } from './lastColumnValidations';

/** The listing sheet's name; a number is added when the workbook has a sheet of that name already. */
export const FORMULAS_SHEET = 'Formulas';
/** Excel's limit on sheet-name length (characters). */
const MAX_SHEET_NAME = 31;

/** One formula as listed. */
export interface ListedFormula {
  readonly sheet: string;
  /** Formula cell, A1 style. */
  readonly address: string;
  /** The range its result fills (the cell itself for a single result). */
  readonly fills: string;
  /** As a person types it, e.g. `=DRIFT.RESISTIVITY(A2,"B")`. */
  readonly formula: string;
}

/** What the conversion did. */
export interface ValuesForm {
  /** The sheet that lists the formulas. */
  readonly sheet: string;
  readonly formulas: readonly ListedFormula[];
}

/** A free sheet name: `Formulas`, else `Formulas 2`, `Formulas 3` … (Excel compares names without case). */
function freeSheetName(workbook: ExcelJS.Workbook): string {
  const taken = new Set(workbook.worksheets.map((sheet) => sheet.name.toLowerCase()));
  for (let n = 1; ; n++) {
    const name = n === 1 ? FORMULAS_SHEET : `${FORMULAS_SHEET} ${n}`.slice(0, MAX_SHEET_NAME);
    if (!taken.has(name.toLowerCase())) return name;
  }
}

/** A formula cell's cached result as a plain cell value (null when it has none). */
function plainResult(cell: ExcelJS.Cell): ExcelJS.CellValue {
  const result = (cell.value as ExcelJS.CellFormulaValue).result;
  return result === undefined ? null : (result as ExcelJS.CellValue);
}

/**
 * Turns a recalculated workbook into its values form, in place: each formula
 * cell gets its cached result as a plain value (cell formats kept), and a new
 * sheet lists sheet, cell, filled range and formula text of every formula.
 * No existing cell or sheet is overwritten: the listing gets a free name.
 *
 * @param workbook - after recalculateWorkbook (xlsx.ts); changed in place
 * @returns the listing sheet's name and what it lists
 * @example const { sheet } = convertToValues(workbook) // 'Formulas'
 */
export function convertToValues(workbook: ExcelJS.Workbook): ValuesForm {
  const formulas: ListedFormula[] = [];
  const cells: ExcelJS.Cell[] = [];
  for (const worksheet of workbook.worksheets) {
    worksheet.eachRow({ includeEmpty: false }, (row) => {
      row.eachCell({ includeEmpty: false }, (cell) => {
        if (cell.type !== ExcelJS.ValueType.Formula) return;
        const stored = cell.value as StoredFormula;
        const address = cellAddress(Number(cell.row), Number(cell.col));
        const fills = stored.shareType === 'array' && stored.ref ? stored.ref.replace(/\$/g, '') : address;
        formulas.push({ sheet: worksheet.name, address, fills, formula: displayFormula(cell.formula) });
        cells.push(cell);
      });
    });
  }
  // Changed after the walk: a cell is read as a formula before any is replaced.
  for (const cell of cells) cell.value = plainResult(cell);

  const name = freeSheetName(workbook);
  const listing = workbook.addWorksheet(name);
  listing.getCell('A1').value = 'Formulas of this workbook, as text';
  listing.getCell('A1').font = { bold: true, size: 14 };
  listing.getCell('A2').value =
    'This is the values form (driftcell --values): in the other sheets every formula cell holds its result ' +
    'as a plain value, so any program shows the numbers without recalculating. The formulas that gave ' +
    'them are listed here.';
  const header = ['Sheet', 'Cell', 'Result fills', 'Formula'];
  header.forEach((text, i) => {
    listing.getCell(3, i + 1).value = text;
    listing.getCell(3, i + 1).font = { bold: true };
  });
  formulas.forEach((entry, i) => {
    const row = listing.getRow(4 + i);
    row.getCell(1).value = entry.sheet;
    row.getCell(2).value = entry.address;
    row.getCell(3).value = entry.fills;
    row.getCell(4).value = entry.formula;
  });
  [20, 8, 14, 90].forEach((width, i) => (listing.getColumn(i + 1).width = width));
  return { sheet: name, formulas };
}

/** The values form as .xlsx bytes (it has no formulas, so no array marks). */
export async function valuesWorkbookBytes(workbook: ExcelJS.Workbook): Promise<Buffer> {
  lastColumnValidationsAsRanges(workbook);
  return Buffer.from(await workbook.xlsx.writeBuffer());
}
