/**
 * Issue 14 §2: a formula the headless engine cannot evaluate (a function it
 * lacks, a table or external reference) keeps its formula and Excel's cached
 * value; cells depending on it calculate from that value; recalc lists it.
 * The cached values stand for what Excel computed when it saved the file.
 */
import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import ExcelJS from 'exceljs';
import { readWorkbookFile, recalculateWorkbook, workbookBytes, type RecalcSummary } from '../../src/engine/xlsx';

let folder: string;
beforeEach(() => {
  folder = mkdtempSync(join(tmpdir(), 'driftcell-unevaluable-'));
});
afterEach(() => rmSync(folder, { recursive: true, force: true }));

async function recalc(fill: (sheet: ExcelJS.Worksheet) => void): Promise<{ summary: RecalcSummary; sheet: ExcelJS.Worksheet }> {
  const source = new ExcelJS.Workbook();
  fill(source.addWorksheet('Data'));
  const input = join(folder, 'in.xlsx');
  await source.xlsx.writeFile(input);
  const workbook = await readWorkbookFile(input);
  const summary = recalculateWorkbook(workbook);
  const written = new ExcelJS.Workbook();
  const output = join(folder, 'out.xlsx');
  writeFileSync(output, await workbookBytes(workbook, summary));
  await written.xlsx.readFile(output);
  return { summary, sheet: written.getWorksheet('Data')! };
}

const formula = (sheet: ExcelJS.Worksheet, address: string) => sheet.getCell(address).value as ExcelJS.CellFormulaValue;

describe('formulas the engine lacks keep Excel’s cached value', () => {
  it('INDIRECT, LET, CELL, INFO, GETPIVOTDATA, a table and an external reference', async () => {
    const cases: [string, string, number][] = [
      ['B1', 'INDIRECT("A1")', 1e16],
      ['B2', '_xlfn.LET(_xlpm.x,A1,_xlpm.x*2)', 2e16],
      ['B3', 'CELL("row",A3)', 3],
      ['B4', 'INFO("numfile")', 1],
      ['B5', 'GETPIVOTDATA("Sum",$H$1)', 42],
      ['B6', 'SUM(Table1[Doping])', 7],
      ['B7', '[1]Sheet1!A1', 5],
    ];
    const { summary, sheet } = await recalc((data) => {
      data.getCell('A1').value = 1e16;
      for (const [address, text, result] of cases) data.getCell(address).value = { formula: text, result };
    });
    for (const [address, text, result] of cases) expect(formula(sheet, address)).toEqual({ formula: text, result });
    expect(summary.kept.map((k) => k.address).sort()).toEqual(cases.map(([a]) => a).sort());
    expect(summary.kept.find((k) => k.address === 'B1')?.reason).toBe('the headless engine has no INDIRECT');
    expect(summary.kept.find((k) => k.address === 'B6')?.reason).toMatch(/cannot read this formula \(table or external references/);
    expect(summary.problems).toEqual([]);
  });

  it('a DRIFT formula fed by a kept cell recalculates from the cached value', async () => {
    const { summary, sheet } = await recalc((data) => {
      data.getCell('A1').value = 1e16;
      data.getCell('B1').value = { formula: 'INDIRECT("A1")', result: 1e16 };
      data.getCell('C1').value = { formula: '_xldudf_DRIFT_RESISTIVITY(B1,"B")', result: 0 };
      data.getCell('D1').value = { formula: '_xldudf_DRIFT_RESISTIVITY(A1,"B")', result: 0 };
    });
    expect(summary.kept.map((k) => k.address)).toEqual(['B1']);
    const fed = formula(sheet, 'C1').result as number;
    expect(fed).toBeGreaterThan(0);
    expect(fed).toBe(formula(sheet, 'D1').result);
  });

  it('a kept legacy array formula keeps its whole range', async () => {
    const { summary, sheet } = await recalc((data) => {
      data.getCell('A1').value = 1;
      data.getCell('A2').value = 2;
      data.getCell('B1').value = { formula: 'INDIRECT("A1:A2")', result: 1, shareType: 'array', ref: 'B1:B2' } as ExcelJS.CellValue;
      data.getCell('B2').value = 2;
    });
    expect(summary.kept.map((k) => k.address)).toEqual(['B1']);
    expect(formula(sheet, 'B1').result).toBe(1);
    expect(sheet.getCell('B2').value).toBe(2);
  });

  it('recalculates as before where the error is the formula’s own', async () => {
    const { summary, sheet } = await recalc((data) => {
      data.getCell('A1').value = { formula: 'NOSUCHNAME+1', result: { error: '#NAME?' } };
      data.getCell('A2').value = { formula: '_xldudf_DRIFT_RESISTIVITY(-1,"B")', result: 3 };
    });
    expect(summary.kept).toEqual([]);
    expect(formula(sheet, 'A1').result).toEqual({ error: '#NAME?' });
    expect(formula(sheet, 'A2').result).toEqual({ error: '#VALUE!' });
  });
});
