/**
 * Workbook round trips: a workbook written with exceljs in a temporary folder
 * is recalculated and written back; the result is checked both as exceljs
 * reads it and as raw package XML (what Excel reads: array-formula markup,
 * dynamic-array metadata, cached values in every spilled cell).
 */
import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import ExcelJS from 'exceljs';
import { findFunction } from '../../src/catalog';
import { evaluate } from '../../src/catalog/broadcast';
import type { ArgumentInput } from '../../src/catalog';
import { engineFormula } from '../../src/engine/formulaText';
import { markDynamicArrays } from '../../src/engine/dynamicArrays';
import {
  WorkbookReadError,
  legacyArrayFill,
  loadWorkbook,
  readWorkbookFile,
  recalculateWorkbook,
  workbookBytes,
  type RecalcSummary,
} from '../../src/engine/xlsx';
import { catalogGrid } from './support/compare';
import { addressesOf, openPackage, partText, sheetCells, type XmlCell } from './support/sheetXml';

let folder: string;
beforeEach(() => {
  folder = mkdtempSync(join(tmpdir(), 'driftcell-xlsx-'));
});
afterEach(() => rmSync(folder, { recursive: true, force: true }));

function direct(name: string, args: ArgumentInput[]) {
  const spec = findFunction(name);
  if (!spec) throw new Error(name);
  return catalogGrid(evaluate(spec, args));
}

/** Writes a workbook with exceljs, reads it back from disk, recalculates it, and returns the written bytes. */
async function roundTrip(
  fill: (workbook: ExcelJS.Workbook) => void,
  dynamicAnchors?: ReadonlyMap<string, readonly string[]>,
): Promise<{ bytes: Buffer; summary: RecalcSummary }> {
  const source = new ExcelJS.Workbook();
  fill(source);
  const input = join(folder, 'input.xlsx');
  await source.xlsx.writeFile(input);
  // An input whose array formulas are spills, as Excel 365 and Driftcell write them.
  if (dynamicAnchors !== undefined)
    writeFileSync(input, await markDynamicArrays(Buffer.from(await source.xlsx.writeBuffer()), dynamicAnchors));
  const workbook = await readWorkbookFile(input);
  const summary = recalculateWorkbook(workbook);
  const bytes = await workbookBytes(workbook, summary);
  writeFileSync(join(folder, 'output.xlsx'), bytes);
  return { bytes, summary };
}

/** What a cached XML value stands for, in the comparison vocabulary (errors by code only). */
function cached(cell: XmlCell | undefined): unknown {
  if (cell?.value === undefined) return null;
  if (cell.attributes.t === 'e') return cell.value;
  if (cell.attributes.t === 's' || cell.attributes.t === 'str') return cell.value;
  return Number(cell.value);
}

function codesOnly(grid: ReturnType<typeof direct>): unknown[][] {
  return grid.map((row) => row.map((v) => (typeof v === 'object' && v !== null ? v.code : v)));
}

describe('a spilled result', () => {
  it('is written as a dynamic array over exactly its range, with a cached value in every cell', async () => {
    const { bytes, summary } = await roundTrip((wb) => {
      const inputs = wb.addWorksheet('Inputs');
      inputs.getCell('B1').value = 250;
      inputs.getCell('C1').value = 300;
      inputs.getCell('D1').value = 350;
      inputs.getCell('A2').value = 1e15;
      inputs.getCell('A3').value = 1e16;
      const out = wb.addWorksheet('Table out');
      out.getCell('B2').value = { formula: 'DRIFT.RESISTIVITY(Inputs!A2:A3,"B",Inputs!B1:D1)' } as ExcelJS.CellFormulaValue;
    });
    expect(summary.arrays).toEqual([{ sheet: 'Table out', anchor: 'B2', ref: 'B2:D3', rows: 2, columns: 3 }]);

    const zip = await openPackage(bytes);
    const cells = await sheetCells(zip, 'Table out');
    const anchor = cells.get('B2');
    expect(anchor?.formula?.attributes).toEqual({ t: 'array', ref: 'B2:D3' });
    expect(anchor?.formula?.text).toBe('_xldudf_DRIFT_RESISTIVITY(Inputs!A2:A3,"B",Inputs!B1:D1)');
    expect(anchor?.attributes.cm).toBe('1');
    const expected = direct('RESISTIVITY', [[[1e15], [1e16]], 'B', [[250, 300, 350]]]);
    const range = addressesOf('B2:D3');
    range.forEach((address, i) => {
      const cell = cells.get(address);
      expect(cell?.value).toBeDefined();
      expect(cached(cell)).toBe(expected[Math.floor(i / 3)][i % 3]);
      if (address !== 'B2') expect(cell?.formula).toBeUndefined();
    });

    const metadata = await partText(zip, 'xl/metadata.xml');
    expect(metadata).toContain('<metadataType name="XLDAPR"');
    expect(metadata).toContain('<xda:dynamicArrayProperties fDynamic="1" fCollapsed="0"/>');
    expect(metadata).toContain('<cellMetadata count="1"><bk><rc t="1" v="0"/></bk></cellMetadata>');
    expect(await partText(zip, '[Content_Types].xml')).toContain(
      '<Override PartName="/xl/metadata.xml" ContentType="application/vnd.openxmlformats-officedocument.spreadsheetml.sheetMetadata+xml"/>',
    );
    expect(await partText(zip, 'xl/_rels/workbook.xml.rels')).toMatch(
      /<Relationship Id="rId\d+" Type="http:\/\/schemas.openxmlformats.org\/officeDocument\/2006\/relationships\/sheetMetadata" Target="metadata.xml"\/>/,
    );
  });

  it('reads back through exceljs with the same values and the array formula', async () => {
    const { bytes } = await roundTrip((wb) => {
      const s = wb.addWorksheet('S');
      s.getCell('A1').value = 1;
      s.getCell('A2').value = 2;
      s.getCell('B1').value = { formula: 'DRIFT.SHEETRES(A1:A2,10)' } as ExcelJS.CellFormulaValue;
    });
    const back = await loadWorkbook(bytes);
    const sheet = back.getWorksheet('S') as ExcelJS.Worksheet;
    const expected = direct('SHEETRES', [[[1], [2]], 10]);
    expect(sheet.getCell('B1').value).toMatchObject({
      formula: '_xldudf_DRIFT_SHEETRES(A1:A2,10)',
      shareType: 'array',
      ref: 'B1:B2',
      result: expected[0][0],
    });
    expect(sheet.getCell('B2').value).toBe(expected[1][0]);
  });

  it('keeps errors inside a spill as error cells and lists them with their messages', async () => {
    const { bytes, summary } = await roundTrip((wb) => {
      const s = wb.addWorksheet('S');
      s.getCell('A1').value = 1e15;
      s.getCell('A2').value = -3;
      s.getCell('B1').value = { formula: 'DRIFT.RESISTIVITY(A1:A2,"phosphorus")' } as ExcelJS.CellFormulaValue;
    });
    const cells = await sheetCells(await openPackage(bytes), 'S');
    const expected = direct('RESISTIVITY', [[[1e15], [-3]], 'phosphorus']);
    expect(cached(cells.get('B1'))).toBe(expected[0][0]);
    expect(cells.get('B2')?.attributes.t).toBe('e');
    expect(cells.get('B2')?.value).toBe('#VALUE!');
    expect(summary.problems).toEqual([{ sheet: 'S', address: 'B2', ...(expected[1][0] as object) }]);
  });

  it('shows #SPILL! on its anchor instead of covering a user’s cell, which keeps its value', async () => {
    const { bytes, summary } = await roundTrip((wb) => {
      const s = wb.addWorksheet('S');
      s.getCell('A1').value = 1;
      s.getCell('A2').value = 2;
      s.getCell('B1').value = { formula: 'DRIFT.SHEETRES(A1:A2,10)' } as ExcelJS.CellFormulaValue;
      s.getCell('B2').value = 'keep me';
    });
    const cells = await sheetCells(await openPackage(bytes), 'S');
    expect(cells.get('B1')?.formula?.attributes).toEqual({ t: 'array', ref: 'B1' });
    expect(cells.get('B1')?.attributes.t).toBe('e');
    expect(cells.get('B1')?.value).toBe('#SPILL!');
    expect(cells.get('B2')?.value).toBe('keep me');
    expect(summary.problems.map((p) => p.code)).toEqual(['#SPILL!']);
  });

  it('does not spill into merged cells', async () => {
    const { bytes } = await roundTrip((wb) => {
      const s = wb.addWorksheet('S');
      s.getCell('A1').value = { formula: 'DRIFT.SHEETRES({1;2},10)' } as ExcelJS.CellFormulaValue;
      s.mergeCells('A2:B2');
    });
    const cells = await sheetCells(await openPackage(bytes), 'S');
    expect(cells.get('A1')?.value).toBe('#SPILL!');
    expect(cells.get('A2')?.value).toBeUndefined();
  });

  it('still computes a one-cell array formula that sits in a merged cell', async () => {
    const { bytes } = await roundTrip((wb) => {
      const s = wb.addWorksheet('S');
      s.mergeCells('A1:B1');
      s.getCell('A1').value = { formula: 'DRIFT.SHEETRES(1,10)', shareType: 'array', ref: 'A1', result: 0 } as ExcelJS.CellFormulaValue;
    });
    const cells = await sheetCells(await openPackage(bytes), 'S');
    expect(cells.get('A1')?.formula?.attributes).toEqual({ t: 'array', ref: 'A1' });
    expect(cached(cells.get('A1'))).toBe(direct('SHEETRES', [1, 10])[0][0]);
  });

  it('replaces an earlier spill’s cached cells: a shorter result leaves the rest empty', async () => {
    const { bytes } = await roundTrip(
      (wb) => {
        const s = wb.addWorksheet('S');
        s.getCell('A1').value = 5;
        s.getCell('A2').value = 7;
        // As a file from an earlier calculation has it: the anchor's range and stale values below.
        s.getCell('B1').value = {
          formula: 'DRIFT.SHEETRES(A1:A2,1)',
          shareType: 'array',
          ref: 'B1:B4',
          result: 1,
        } as ExcelJS.CellFormulaValue;
        for (const address of ['B2', 'B3', 'B4']) s.getCell(address).value = 99;
      },
      new Map([['S', ['B1']]]),
    );
    const cells = await sheetCells(await openPackage(bytes), 'S');
    const expected = direct('SHEETRES', [[[5], [7]], 1]);
    expect(cells.get('B1')?.formula?.attributes.ref).toBe('B1:B2');
    expect(cached(cells.get('B1'))).toBe(expected[0][0]);
    expect(cached(cells.get('B2'))).toBe(expected[1][0]);
    expect(cells.get('B3')?.value).toBeUndefined();
    expect(cells.get('B4')?.value).toBeUndefined();
  });

  it('is stable: recalculating the written file again writes the same cells', async () => {
    const { bytes } = await roundTrip((wb) => {
      const s = wb.addWorksheet('S');
      s.getCell('A1').value = { formula: 'DRIFT.CONDUCTIVITY({1e15;1e16},"phosphorus",{250,300})' } as ExcelJS.CellFormulaValue;
    });
    const again = await loadWorkbook(bytes);
    const summary = recalculateWorkbook(again);
    const second = await sheetCells(await openPackage(await workbookBytes(again, summary)), 'S');
    const first = await sheetCells(await openPackage(bytes), 'S');
    for (const address of addressesOf('A1:B2')) {
      expect(second.get(address)?.value).toBe(first.get(address)?.value);
      expect(second.get(address)?.formula).toEqual(first.get(address)?.formula);
    }
  });
});

describe('formulas in a recalculated workbook', () => {
  it('are computed across sheets, with built-ins, workbook names and Excel’s literals', async () => {
    const { bytes, summary } = await roundTrip((wb) => {
      const lots = wb.addWorksheet('Lot data');
      lots.getCell('A1').value = 4;
      lots.getCell('B1').value = 6;
      const calc = wb.addWorksheet('Calc');
      calc.getCell('A1').value = { formula: 'DRIFT.DOPING(\'Lot data\'!A1:B1,"phosphorus")' } as ExcelJS.CellFormulaValue;
      calc.getCell('A2').value = { formula: "SUM('Lot data'!A1:B1)*2" } as ExcelJS.CellFormulaValue;
      calc.getCell('A3').value = { formula: 'DRIFT.SHEETRES(rho_min,10)' } as ExcelJS.CellFormulaValue;
      calc.getCell('A4').value = { formula: 'IF(A2>10,TRUE,FALSE)' } as ExcelJS.CellFormulaValue;
      calc.getCell('A5').value = { formula: "_xlfn.STDEV.S('Lot data'!A1:B1)" } as ExcelJS.CellFormulaValue;
      calc.getCell('A6').value = { formula: '_xldudf_DRIFT_SHEETRES(2,10)' } as ExcelJS.CellFormulaValue;
      calc.getCell('A7').value = { formula: 'ROUND(A1,-10)/1e15' } as ExcelJS.CellFormulaValue;
      calc.getCell('A8').value = { formula: 'drift.sheetres(2,10)' } as ExcelJS.CellFormulaValue;
      calc.getCell('A9').value = { formula: '_xldudf_drift_sheetres(2,10)' } as ExcelJS.CellFormulaValue;
      wb.definedNames.add("'Lot data'!$A$1", 'rho_min');
    });
    expect(summary.problems).toEqual([]);
    const cells = await sheetCells(await openPackage(bytes), 'Calc');
    const doping = direct('DOPING', [[[4, 6]], 'phosphorus'])[0] as number[];
    expect(cached(cells.get('A1'))).toBe(doping[0]);
    expect(cached(cells.get('B1'))).toBe(doping[1]);
    expect(cached(cells.get('A2'))).toBe(20);
    expect(cached(cells.get('A3'))).toBe(direct('SHEETRES', [4, 10])[0][0]);
    expect(cells.get('A4')?.attributes.t).toBe('b');
    expect(cells.get('A4')?.value).toBe('1');
    // Sample standard deviation of {4, 6} is √2 (definition; common practice, no source).
    expect(cached(cells.get('A5'))).toBeCloseTo(Math.SQRT2, 12);
    expect(cached(cells.get('A6'))).toBe(direct('SHEETRES', [2, 10])[0][0]);
    // Built-in prefixes are kept as the file had them; DRIFT calls, in any form read, are written in
    // the one form Excel stores for add-in functions (formulaText.ts).
    expect(cells.get('A5')?.formula?.text).toBe("_xlfn.STDEV.S('Lot data'!A1:B1)");
    expect(cells.get('A6')?.formula?.text).toBe('_xldudf_DRIFT_SHEETRES(2,10)');
    expect(cells.get('A1')?.formula?.text).toBe('_xldudf_DRIFT_DOPING(\'Lot data\'!A1:B1,"phosphorus")');
    expect(cells.get('A3')?.formula?.text).toBe('_xldudf_DRIFT_SHEETRES(rho_min,10)');
    for (const address of ['A8', 'A9']) {
      expect(cells.get(address)?.formula?.text).toBe('_xldudf_DRIFT_SHEETRES(2,10)');
      expect(cached(cells.get(address))).toBe(direct('SHEETRES', [2, 10])[0][0]);
    }
    expect(cached(cells.get('A7'))).toBe((Math.round(doping[0] / 1e10) * 1e10) / 1e15);
  });

  it('computes each cell of a shared formula and writes it as its own formula', async () => {
    const { bytes } = await roundTrip((wb) => {
      const s = wb.addWorksheet('S');
      s.getCell('A1').value = 1;
      s.getCell('A2').value = 3;
      s.getCell('B1').value = { formula: 'DRIFT.SHEETRES(A1,10)', result: 0 } as ExcelJS.CellFormulaValue;
      s.getCell('B2').value = { sharedFormula: 'B1', result: 0 } as ExcelJS.CellSharedFormulaValue;
    });
    const cells = await sheetCells(await openPackage(bytes), 'S');
    expect(cached(cells.get('B1'))).toBe(direct('SHEETRES', [1, 10])[0][0]);
    expect(cached(cells.get('B2'))).toBe(direct('SHEETRES', [3, 10])[0][0]);
    expect(cells.get('B2')?.formula?.text).toBe('_xldudf_DRIFT_SHEETRES(A2,10)');
  });

  it('keeps text that looks like a number or a formula as text', async () => {
    const { bytes } = await roundTrip((wb) => {
      const s = wb.addWorksheet('S');
      s.getCell('A1').value = '12';
      s.getCell('A2').value = '=not a formula';
      s.getCell('B1').value = { formula: 'ISTEXT(A1)' } as ExcelJS.CellFormulaValue;
      s.getCell('B2').value = { formula: 'LEN(A2)' } as ExcelJS.CellFormulaValue;
    });
    const cells = await sheetCells(await openPackage(bytes), 'S');
    expect(cells.get('B1')?.value).toBe('1');
    expect(cached(cells.get('B2'))).toBe('=not a formula'.length);
    expect(cells.get('A2')?.value).toBe('=not a formula');
  });
});

describe('reading files that are not workbooks', () => {
  it('rejects bytes that are not a zip package, in one line', async () => {
    await expect(loadWorkbook(Buffer.from('plain text, not a workbook'))).rejects.toThrow(WorkbookReadError);
    await expect(loadWorkbook(Buffer.from('plain text'))).rejects.toThrow(/^not an \.xlsx workbook \([^\n]*\)$/);
  });

  it('names a missing file', async () => {
    await expect(readWorkbookFile(join(folder, 'missing.xlsx'))).rejects.toThrow(/no such file/);
  });
});

describe('engineFormula', () => {
  it('drops storage prefixes and maps add-in names, but not inside quotes', () => {
    expect(engineFormula('_xlfn.SEQUENCE(3)')).toBe('=SEQUENCE(3)');
    expect(engineFormula('_xlfn._xlws.SORT(A1:A3)')).toBe('=SORT(A1:A3)');
    expect(engineFormula('_xldudf_DRIFT_RESISTIVITY(A2,"B")')).toBe('=DRIFT.RESISTIVITY(A2,"B")');
    expect(engineFormula('SUM(\'_xlfn. sheet\'!A1)&"_xlfn.x"')).toBe('=SUM(\'_xlfn. sheet\'!A1)&"_xlfn.x"');
    expect(engineFormula('LEN("say ""_xlfn."" twice")')).toBe('=LEN("say ""_xlfn."" twice")');
  });
});

describe('errors stored in files', () => {
  it('are the catalog codes (a file keeps no messages)', async () => {
    const { bytes } = await roundTrip((wb) => {
      wb.addWorksheet('S').getCell('A1').value = { formula: 'DRIFT.SHEETRES({1,2,3},{10,20})' } as ExcelJS.CellFormulaValue;
    });
    const cells = await sheetCells(await openPackage(bytes), 'S');
    expect(addressesOf('A1:C1').map((a) => cached(cells.get(a)))).toEqual(codesOnly(direct('SHEETRES', [[[1, 2, 3]], [[10, 20]]]))[0]);
  });
});

describe('a legacy array formula (entered over a fixed range, no dynamic-array mark)', () => {
  const na = { code: '#N/A' };
  it('lays a result over its range as ECMA-376 §18.17.2 and Excel do: broadcast one value, row or column, #N/A elsewhere', () => {
    // The rules are ECMA-376 Part 1 §18.17.2 (single value fills every cell; an N×1 result's excess
    // columns clone its first column) and Microsoft's "return #N/A's if too large".
    const codes = (grid: ReturnType<typeof legacyArrayFill>) =>
      grid.map((row) => row.map((v) => (typeof v === 'object' && v !== null ? { code: (v as { value: string }).value } : v)));
    expect(codes(legacyArrayFill([[7]], 2, 2))).toEqual([
      [7, 7],
      [7, 7],
    ]);
    expect(codes(legacyArrayFill([[1], [2]], 3, 2))).toEqual([
      [1, 1],
      [2, 2],
      [na, na],
    ]);
    expect(codes(legacyArrayFill([[1, 2]], 2, 3))).toEqual([
      [1, 2, na],
      [1, 2, na],
    ]);
    expect(
      codes(
        legacyArrayFill(
          [
            [1, 2],
            [3, 4],
          ],
          3,
          3,
        ),
      ),
    ).toEqual([
      [1, 2, na],
      [3, 4, na],
      [na, na, na],
    ]);
  });

  it('keeps its whole declared range when the result is smaller: nothing in it is deleted', async () => {
    const { bytes, summary } = await roundTrip((wb) => {
      const s = wb.addWorksheet('S');
      s.getCell('A1').value = 5;
      s.getCell('A2').value = 7;
      s.getCell('B1').value = {
        formula: 'DRIFT.SHEETRES(A1:A2,1)',
        shareType: 'array',
        ref: 'B1:B4',
        result: 1,
      } as ExcelJS.CellFormulaValue;
      s.getCell('B2').value = 99;
      // Text another writer left inside the array's range: the range is the array's, so it gets the array's value.
      s.getCell('B3').value = 'user note';
      s.getCell('B4').value = 99;
    });
    const cells = await sheetCells(await openPackage(bytes), 'S');
    const expected = direct('SHEETRES', [[[5], [7]], 1]);
    expect(cells.get('B1')?.formula?.attributes).toEqual({ t: 'array', ref: 'B1:B4' });
    expect(cached(cells.get('B1'))).toBe(expected[0][0]);
    expect(cached(cells.get('B2'))).toBe(expected[1][0]);
    expect(cached(cells.get('B3'))).toBe('#N/A');
    expect(cached(cells.get('B4'))).toBe('#N/A');
    expect(summary.arrays).toEqual([{ sheet: 'S', anchor: 'B1', ref: 'B1:B4', rows: 4, columns: 1 }]);
    expect(summary.problems.map((p) => `${p.address} ${p.code}`)).toEqual(['B3 #N/A', 'B4 #N/A']);
  });

  it('clones a one-column result into the extra columns of its range', async () => {
    const { bytes } = await roundTrip((wb) => {
      const s = wb.addWorksheet('S');
      s.getCell('A1').value = 5;
      s.getCell('A2').value = 7;
      s.getCell('B1').value = { formula: 'A1:A2*2', shareType: 'array', ref: 'B1:C2', result: 10 } as ExcelJS.CellFormulaValue;
      for (const address of ['B2', 'C1', 'C2']) s.getCell(address).value = 0;
    });
    const cells = await sheetCells(await openPackage(bytes), 'S');
    expect(cells.get('B1')?.formula?.attributes.ref).toBe('B1:C2');
    expect(['B1', 'C1', 'B2', 'C2'].map((a) => cached(cells.get(a)))).toEqual([10, 10, 14, 14]);
  });

  it('leaves a formula another writer put inside its range alone, writing the array over its result only', async () => {
    const { bytes } = await roundTrip((wb) => {
      const s = wb.addWorksheet('S');
      s.getCell('A1').value = 5;
      s.getCell('A2').value = 7;
      s.getCell('B1').value = { formula: 'A1:A2*2', shareType: 'array', ref: 'B1:B3', result: 10 } as ExcelJS.CellFormulaValue;
      s.getCell('B3').value = { formula: 'A1+1', result: 6 } as ExcelJS.CellFormulaValue;
    });
    const cells = await sheetCells(await openPackage(bytes), 'S');
    expect(cells.get('B1')?.formula?.attributes.ref).toBe('B1:B2');
    expect(cells.get('B3')?.formula?.text).toBe('A1+1');
    expect(cached(cells.get('B3'))).toBe(6);
  });
});
