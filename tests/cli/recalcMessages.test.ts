/**
 * What recalc prints about a workbook: sheet names and messages escaped for
 * the terminal, hints, the cell that blocks a spill, and file types it does
 * not read (issue 13 §4, issue 14 §6).
 */
import ExcelJS from 'exceljs';
import { describeSummary, unreadableType } from '../../src/cli/recalc';
import { findSpillBlockers } from '../../src/cli/spillBlockers';
import { recalculateWorkbook } from '../../src/engine/xlsx';

function workbookWith(fill: (sheet: ExcelJS.Worksheet) => void, name = 'Sheet1'): ExcelJS.Workbook {
  const workbook = new ExcelJS.Workbook();
  fill(workbook.addWorksheet(name));
  return workbook;
}

describe('a blocked spill', () => {
  it('names the first filled cell inside the range the result needs', () => {
    const workbook = workbookWith((sheet) => {
      sheet.getCell('A1').value = { formula: 'SEQUENCE(3,2)' } as ExcelJS.CellFormulaValue;
      sheet.getCell('B3').value = 'in the way';
      sheet.getCell('D1').value = { formula: 'D5:D7*2' } as ExcelJS.CellFormulaValue;
      sheet.getCell('D2').value = 7;
    });
    const summary = recalculateWorkbook(workbook);
    const blockers = findSpillBlockers(workbook, summary.problems);
    expect(Object.fromEntries(blockers)).toEqual({ 'Sheet1!A1': 'B3', 'Sheet1!D1': 'D2' });
    const { notes } = describeSummary(summary, 'out.xlsx', undefined, blockers);
    expect(notes).toContain(
      '  Sheet1!A1: #SPILL! the result needs cells that are filled: B3 blocks it; clear B3 (and any other filled cell in the way) so the result can spill',
    );
  });
});

describe('describeSummary', () => {
  it('escapes sheet names and messages and adds hints below the cell', () => {
    const workbook = workbookWith((sheet) => {
      sheet.getCell('A1').value = { formula: '_xldudf_DRIFT_RESISTIVITY(1e15,"B",-40)' } as ExcelJS.CellFormulaValue;
      sheet.getCell('A2').value = { formula: '_xldudf_DRIFT_RESISTIVITY(1e15,B)' } as ExcelJS.CellFormulaValue;
    }, 'Lot\u202eA');
    const { notes } = describeSummary(recalculateWorkbook(workbook), 'out.xlsx');
    expect(notes).toEqual([
      '1 formula cell kept as the file had it (formula and cached value, not recalculated):',
      "  'Lot\\u{202e}A'!A2: the headless engine could not take the name B from the workbook",
      '    hint: B is not a defined name; if it is a code (dopant, material, model …), write it as text in double quotes: "B"',
      '1 cell shows errors:',
      "  'Lot\\u{202e}A'!A1: #VALUE! temperature_K must be ≥ 20 K and ≤ 1000 K; got -40",
      '    hint: temperatures are in kelvin (K = °C + 273.15): -40 °C is 233.15 K',
    ]);
  });
});

describe('unreadableType', () => {
  it('tells to save an .ods, .xls or .csv file as .xlsx', () => {
    expect(unreadableType('lots.ods', Buffer.alloc(0))).toMatch(
      /^lots\.ods is an OpenDocument spreadsheet \(\.ods\); recalc reads \.xlsx workbooks: open it in LibreOffice Calc or Excel, save it as \.xlsx/,
    );
    expect(unreadableType('lots.xls', Buffer.alloc(0))).toMatch(/^lots\.xls is an Excel 97–2003 workbook \(\.xls\); recalc reads \.xlsx/);
    expect(unreadableType('lots.csv', Buffer.alloc(0))).toMatch(/^lots\.csv is a CSV text file, not a workbook/);
    expect(unreadableType('lots.xlsx', Buffer.alloc(0))).toBeUndefined();
  });

  it('knows an OpenDocument spreadsheet by its first zip entry "mimetype", whatever its name', () => {
    // OASIS ODF 1.2 part 3 §3.3: "mimetype" is the first entry, stored uncompressed; zip local header is 30 bytes (PKWARE APPNOTE 4.3.7).
    const header = Buffer.alloc(30);
    header.write('PK\u0003\u0004', 0, 'latin1');
    const head = Buffer.concat([header, Buffer.from('mimetypeapplication/vnd.oasis.opendocument.spreadsheet', 'latin1')]);
    expect(unreadableType('renamed.xlsx', head)).toMatch(/^renamed\.xlsx is an OpenDocument spreadsheet/);
  });
});
