/**
 * Found by structuralExtremes.test.ts: data validation reaching Excel's last
 * column XFD made exceljs 4.4's writer fail ("16385 is out of bounds", an
 * unexpected failure of recalc). Written now, with the same cells and rule.
 */
import JSZip from 'jszip';
import { loadWorkbook, recalculateWorkbook, workbookBytes } from '../../src/engine/xlsx';
import { convertToValues, valuesWorkbookBytes } from '../../src/engine/valuesForm';
import { SHEET_HEAD, nativeZip, sheetPackageParts } from './support/rawWorkbook';

const SHEET = `${SHEET_HEAD}<row r="1"><c r="A1"><f>DRIFT.SHEETRES(10,5)</f></c></row></sheetData><dataValidations count="2"><dataValidation type="whole" operator="greaterThan" sqref="A1:XFD1 XFD2:XFD3"><formula1>0</formula1></dataValidation><dataValidation type="decimal" operator="lessThan" sqref="XFD4"><formula1>1</formula1></dataValidation></dataValidations></worksheet>`;

async function validations(bytes: Buffer): Promise<string[]> {
  const xml = (await (await JSZip.loadAsync(bytes)).file('xl/worksheets/sheet1.xml')?.async('string')) ?? '';
  return [...xml.matchAll(/<dataValidation\b[^>]*>/g)]
    .map((m) => `${/type="(\w+)"/.exec(m[0])?.[1]} ${/sqref="([^"]+)"/.exec(m[0])?.[1]}`)
    .sort();
}

describe('data validation in Excel’s last column', () => {
  it('is written in the live form, every cell with its rule', async () => {
    const workbook = await loadWorkbook(nativeZip(sheetPackageParts(Buffer.from(SHEET))));
    const bytes = await workbookBytes(workbook, recalculateWorkbook(workbook));
    expect(await validations(bytes)).toEqual(['decimal XFD4:XFD4', 'whole A1:XFC1', 'whole XFD1:XFD3']);
  });

  it('is written in the values form', async () => {
    const workbook = await loadWorkbook(nativeZip(sheetPackageParts(Buffer.from(SHEET))));
    recalculateWorkbook(workbook);
    convertToValues(workbook);
    expect(await validations(await valuesWorkbookBytes(workbook))).toEqual(['decimal XFD4:XFD4', 'whole A1:XFC1', 'whole XFD1:XFD3']);
  });
});
