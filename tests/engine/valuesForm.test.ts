/**
 * The values form: every formula cell written as its result, the formulas
 * listed on their own sheet, nothing of the user's overwritten. Checked in the
 * written package XML (what any reader gets); tests/interop runs LibreOffice on it.
 */
import ExcelJS from 'exceljs';
import { convertToValues, valuesWorkbookBytes } from '../../src/engine/valuesForm';
import { loadWorkbook, recalculateWorkbook, workbookBytes } from '../../src/engine/xlsx';
import { openPackage, partText, sheetCells } from './support/sheetXml';

async function fileOf(fill: (workbook: ExcelJS.Workbook) => void): Promise<Buffer> {
  const workbook = new ExcelJS.Workbook();
  fill(workbook);
  return Buffer.from(await workbook.xlsx.writeBuffer());
}

function sample(wb: ExcelJS.Workbook): void {
  const s = wb.addWorksheet('Lots');
  s.getCell('A1').value = 1e15;
  s.getCell('A2').value = 1e16;
  s.getCell('B1').value = { formula: 'DRIFT.RESISTIVITY(A1:A2,"B")' } as ExcelJS.CellFormulaValue;
  s.getCell('B1').numFmt = '0.000E+00';
  s.getCell('C1').value = { formula: 'DRIFT.SHEETRES(B1,10)' } as ExcelJS.CellFormulaValue;
  s.getCell('D1').value = { formula: 'DRIFT.SHEETRES(A1:A2,10)', shareType: 'array', ref: 'D1:D2' } as ExcelJS.CellFormulaValue;
  s.getCell('E1').value = { formula: 'DRIFT.DOPING(-1,"B")' } as ExcelJS.CellFormulaValue;
  s.getCell('F1').value = { formula: 'SUM(A1:A2)' } as ExcelJS.CellFormulaValue;
  // The user's own sheet of that name stays as it is; the listing takes the next free name.
  const mine = wb.addWorksheet('formulas');
  mine.getCell('A1').value = 'my notes';
}

describe('the values form', () => {
  it('writes every formula cell as its result and lists the formulas on a free sheet name', async () => {
    const input = await fileOf(sample);
    const liveBook = await loadWorkbook(input);
    const liveZip = await openPackage(await workbookBytes(liveBook, recalculateWorkbook(liveBook)));
    const live = await sheetCells(liveZip, 'Lots');

    const book = await loadWorkbook(input);
    recalculateWorkbook(book);
    const form = convertToValues(book);
    expect(form.sheet).toBe('Formulas 2');
    const zip = await openPackage(await valuesWorkbookBytes(book));
    const cells = await sheetCells(zip, 'Lots');

    // No formula anywhere, and no dynamic-array metadata.
    for (const cell of cells.values()) expect(cell.formula).toBeUndefined();
    expect(await partText(zip, 'xl/metadata.xml')).toBeUndefined();
    // The same values as the live form caches, errors as error cells, formats kept.
    for (const address of ['A1', 'A2', 'B1', 'B2', 'C1', 'D1', 'D2', 'E1', 'F1']) {
      expect({ address, value: cells.get(address)?.value, t: cells.get(address)?.attributes.t }).toEqual({
        address,
        value: live.get(address)?.value,
        t: live.get(address)?.attributes.t,
      });
    }
    expect(cells.get('E1')?.attributes.t).toBe('e');
    expect(cells.get('B1')?.attributes.s).toBe(live.get('B1')?.attributes.s);

    const mine = await sheetCells(zip, 'formulas');
    expect(mine.get('A1')?.value).toBe('my notes');
    const listing = await sheetCells(zip, 'Formulas 2');
    const row = (r: number) => ['A', 'B', 'C', 'D'].map((c) => listing.get(`${c}${r}`)?.value);
    expect(row(3)).toEqual(['Sheet', 'Cell', 'Result fills', 'Formula']);
    expect([4, 5, 6, 7, 8].map(row)).toEqual([
      ['Lots', 'B1', 'B1:B2', '=DRIFT.RESISTIVITY(A1:A2,"B")'],
      ['Lots', 'C1', 'C1', '=DRIFT.SHEETRES(B1,10)'],
      ['Lots', 'D1', 'D1:D2', '=DRIFT.SHEETRES(A1:A2,10)'],
      ['Lots', 'E1', 'E1', '=DRIFT.DOPING(-1,"B")'],
      ['Lots', 'F1', 'F1', '=SUM(A1:A2)'],
    ]);
    // The listing holds text, never formulas a program would evaluate.
    for (const cell of listing.values()) expect(cell.formula).toBeUndefined();
    expect(form.formulas).toHaveLength(5);
  });
});
