/**
 * DRIFT.MODELCODES in HyperFormula: a row whose length follows its arguments'
 * values. From literal arguments the engine sizes the spill exactly, alone or
 * as another DRIFT function's model argument; a cell reference or a computed
 * argument cannot be sized from the formula text and gives #VALUE! saying so
 * (src/engine/plugin.ts, module note).
 */
import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import ExcelJS from 'exceljs';
import { DetailedCellError, ErrorType, HyperFormula, type CellValue, type RawCellContent } from 'hyperformula';
import { evaluate, findFunction, type ArgumentInput, type FunctionSpec } from '../../src/catalog';
import { applicableModelCodes } from '../../src/catalog/modelCodes';
import { createEngine, evaluateFormula } from '../../src/engine/engine';
import { readWorkbookFile, recalculateWorkbook, workbookBytes } from '../../src/engine/xlsx';
import { catalogGrid, engineGrid, fromEngine } from './support/compare';
import { openPackage, sheetCells } from './support/sheetXml';

function spec(name: string): FunctionSpec {
  const found = findFunction(name);
  if (!found) throw new Error(`no catalog entry ${name}`);
  return found;
}

let engine: HyperFormula;
afterEach(() => engine?.destroy());

function build(sheets: Record<string, RawCellContent[][]>): HyperFormula {
  engine = createEngine(sheets);
  return engine;
}

function rangeValues(top: number, left: number, bottom: number, right: number): CellValue[][] {
  return engine.getRangeValues({ start: { sheet: 0, row: top, col: left }, end: { sheet: 0, row: bottom, col: right } });
}

function cell(row: number, col: number): CellValue {
  return engine.getCellValue({ sheet: 0, row, col });
}

/** The spill's extent as the engine placed it: columns of the anchor's row that belong to its array. */
function spillWidth(row: number, col: number): number {
  let width = 0;
  while (engine.isCellPartOfArray({ sheet: 0, row, col: col + width })) width += 1;
  return width;
}

const NEEDS_TYPED =
  /^DRIFT\.MODELCODES needs its arguments typed into the formula in this engine \(driftcell calc, recalc\), e\.g\. DRIFT\.MODELCODES\("resistivity","Si","B"\): .*a cell reference or a computed argument cannot be used here\. Excel also takes them from cells\.$/;

describe('spill size from literal arguments', () => {
  it.each([
    ['"resistivity","Si","B"', ['resistivity', 'Si', 'B']],
    ['"resistivity",,"Ga"', ['resistivity', null, 'Ga']],
    ['"mobility"', ['mobility']],
    ['"MOBILITY","GE"', ['mobility', 'Ge']],
    ['"intrinsic"', ['intrinsic']],
    ['"bandgap-narrowing","Si",', ['bandgap-narrowing', 'Si', null]],
  ] as [string, ArgumentInput[]][])('DRIFT.MODELCODES(%s) spills exactly the catalog row', (text, args) => {
    const expected = evaluate(spec('MODELCODES'), args);
    const width = expected[0].length;
    build({ S: [[`=DRIFT.MODELCODES(${text})`, null, null, null, null, null, null, null]] });
    expect(engineGrid(rangeValues(0, 0, 0, width - 1))).toEqual(catalogGrid(expected));
    if (width > 1) expect(spillWidth(0, 0)).toBe(width);
    expect(cell(0, width)).toBeNull();
    expect(cell(1, 0)).toBeNull();
  });

  it('gives one error, not a row, for a refused argument; the cell beside stays free', () => {
    build({ S: [['=DRIFT.MODELCODES("resistivity","Si","P")', 'mine']] });
    expect(fromEngine(cell(0, 0))).toEqual({
      code: '#VALUE!',
      message: 'dopant "P" could mean phosphorus or a generic acceptor (p-type); type "phosphorus" or "acceptor"',
    });
    expect(cell(0, 1)).toBe('mine');
  });

  it('shows #SPILL! rather than covering a filled cell in its row', () => {
    build({ S: [['=DRIFT.MODELCODES("resistivity","Si","B")', null, null, 'mine']] });
    expect(fromEngine(cell(0, 0))).toMatchObject({ code: '#SPILL!' });
    expect(cell(0, 3)).toBe('mine');
  });

  it('is sized exactly inside built-ins too', () => {
    const codes = applicableModelCodes('resistivity', 'Si', 'B');
    build({ S: [['=COLUMNS(DRIFT.MODELCODES("resistivity","Si","B"))', '=TRANSPOSE(DRIFT.MODELCODES("resistivity","Si","B"))']] });
    expect(cell(0, 0)).toBe(codes.length);
    expect(rangeValues(0, 1, codes.length - 1, 1)).toEqual(codes.map((code) => [code]));
  });
});

describe('as the model argument of another DRIFT function', () => {
  const dopings = [1e14, 1e15, 1e16, 1e17, 1e18];

  it('gives one column per model beside a column of dopings, each equal to that model called alone', () => {
    const codes = applicableModelCodes('resistivity', 'Si', 'B');
    build({
      S: [
        ['doping', '=DRIFT.MODELCODES("resistivity","Si","B")'],
        ...dopings.map((doping, i) => [
          doping,
          i === 0 ? '=DRIFT.RESISTIVITY(A2:A6,"B",300,DRIFT.MODELCODES("resistivity","Si","B"))' : null,
        ]),
      ],
    });
    // The header row and the table under it have the same width: every model once.
    expect(rangeValues(0, 1, 0, codes.length)).toEqual([codes]);
    expect(spillWidth(1, 1)).toBe(codes.length);
    expect(cell(1, codes.length + 1)).toBeNull();
    expect(cell(dopings.length + 1, 1)).toBeNull();
    const table = engineGrid(rangeValues(1, 1, dopings.length, codes.length));
    codes.forEach((code, c) => {
      const alone = catalogGrid(evaluate(spec('RESISTIVITY'), [dopings.map((d) => [d]), 'B', 300, code]));
      expect([code, table.map((row) => row[c])]).toEqual([code, alone.map((row) => row[0])]);
    });
    // Every silicon model computes boron at 300 K in this range, so no column is an error.
    expect(table.flat().every((value) => typeof value === 'number')).toBe(true);
  });

  it('keeps a model’s refusal in its own column (astm-f723 away from 23 °C), the others computing', () => {
    const codes = applicableModelCodes('resistivity', 'Si', 'B');
    build({ S: [['=DRIFT.RESISTIVITY(1e15,"B",350,DRIFT.MODELCODES("resistivity","Si","B"))']] });
    const values = engineGrid(rangeValues(0, 0, 0, codes.length - 1))[0];
    codes.forEach((code, c) =>
      expect([code, values[c]]).toEqual([code, catalogGrid(evaluate(spec('RESISTIVITY'), [1e15, 'B', 350, code]))[0][0]]),
    );
    expect(values[codes.indexOf('astm-f723')]).toMatchObject({ code: '#VALUE!' });
    expect(values.filter((value) => typeof value === 'number')).toHaveLength(codes.length - 1);
  });

  it('spills mobility across every mobility model of the material', () => {
    for (const host of ['Si', 'GaAs']) {
      const codes = applicableModelCodes('mobility', host);
      const result = evaluateFormula(`=DRIFT.MOBILITY(1e17,"donor",300,"electron",DRIFT.MODELCODES("mobility","${host}"),"${host}")`);
      const expected = codes.map((code) => evaluate(spec('MOBILITY'), [1e17, 'donor', 300, 'electron', code, host])[0][0]);
      expect([host, codes.length === 1 ? [result] : (result as unknown[][])[0]]).toEqual([host, expected]);
    }
  });
});

describe('arguments the formula text does not hold', () => {
  it('gives #VALUE! saying to type them, for a cell reference, a computed argument and a name', () => {
    build({
      S: [
        ['resistivity', '=DRIFT.MODELCODES(A1)'],
        [null, '=DRIFT.MODELCODES("resist"&"ivity")'],
        [null, '=DRIFT.MODELCODES("resistivity",LOWER("SI"))'],
        [null, '=DRIFT.RESISTIVITY(1e15,"B",300,DRIFT.MODELCODES(A1))'],
      ],
    });
    for (let row = 0; row < 4; row++) {
      const value = cell(row, 1) as DetailedCellError;
      expect(value).toBeInstanceOf(DetailedCellError);
      expect(value.type).toBe(ErrorType.VALUE);
      expect([row, value.message]).toEqual([row, expect.stringMatching(NEEDS_TYPED)]);
      expect(cell(row, 2)).toBeNull();
    }
  });

  it('stays that error when the referenced cell changes', () => {
    build({ S: [['resistivity', '=DRIFT.MODELCODES(A1)']] });
    engine.setCellContents({ sheet: 0, row: 0, col: 0 }, [['mobility']]);
    expect((cell(0, 1) as DetailedCellError).message).toMatch(NEEDS_TYPED);
  });

  it('reports too many arguments in the catalog’s words, not as a reference problem', () => {
    build({ S: [['=DRIFT.MODELCODES("resistivity","Si","B",B1)', 1]] });
    expect(fromEngine(cell(0, 0))).toEqual({ code: '#VALUE!', message: 'DRIFT.MODELCODES takes at most 3 arguments; got 4' });
  });
});

describe('recalc of a workbook', () => {
  let folder: string;
  beforeEach(() => {
    folder = mkdtempSync(join(tmpdir(), 'driftcell-modelcodes-'));
  });
  afterEach(() => rmSync(folder, { recursive: true, force: true }));

  it('writes the header row and the per-model table as spills of exactly their width, and the reference form as one error', async () => {
    const codes = applicableModelCodes('resistivity', 'Si', 'B');
    const source = new ExcelJS.Workbook();
    const sheet = source.addWorksheet('S');
    [1e15, 1e16, 1e17].forEach((doping, i) => (sheet.getCell(`A${i + 2}`).value = doping));
    // As Excel stores an add-in's functions in a file (DEVELOPERS.md, Workbook formula text).
    sheet.getCell('B1').value = { formula: '_xldudf_DRIFT_MODELCODES("resistivity","Si","B")' } as ExcelJS.CellFormulaValue;
    sheet.getCell('B2').value = {
      formula: '_xldudf_DRIFT_RESISTIVITY(A2:A4,"B",300,_xldudf_DRIFT_MODELCODES("resistivity","Si","B"))',
    } as ExcelJS.CellFormulaValue;
    sheet.getCell('A7').value = 'mobility';
    sheet.getCell('B7').value = { formula: 'DRIFT.MODELCODES(A7)' } as ExcelJS.CellFormulaValue;
    const input = join(folder, 'input.xlsx');
    await source.xlsx.writeFile(input);

    const workbook = await readWorkbookFile(input);
    const summary = recalculateWorkbook(workbook);
    const last = String.fromCharCode('B'.charCodeAt(0) + codes.length - 1);
    expect(summary.arrays).toEqual([
      { sheet: 'S', anchor: 'B1', ref: `B1:${last}1`, rows: 1, columns: codes.length },
      { sheet: 'S', anchor: 'B2', ref: `B2:${last}4`, rows: 3, columns: codes.length },
    ]);
    expect(summary.problems).toEqual([{ sheet: 'S', address: 'B7', code: '#VALUE!', message: expect.stringMatching(NEEDS_TYPED) }]);

    const bytes = await workbookBytes(workbook, summary);
    writeFileSync(join(folder, 'output.xlsx'), bytes);
    const cells = await sheetCells(await openPackage(bytes), 'S');
    expect(cells.get('B1')?.formula?.attributes).toEqual({ t: 'array', ref: `B1:${last}1` });
    expect(codes.map((_, c) => cells.get(`${String.fromCharCode(66 + c)}1`)?.value)).toEqual(codes);
    codes.forEach((code, c) => {
      const column = String.fromCharCode(66 + c);
      const alone = evaluate(spec('RESISTIVITY'), [[[1e15], [1e16], [1e17]], 'B', 300, code]).map((row) => row[0]);
      expect([code, [2, 3, 4].map((r) => Number(cells.get(`${column}${r}`)?.value))]).toEqual([code, alone]);
    });
    expect(cells.get('B7')?.attributes.t).toBe('e');
    expect(cells.get('B7')?.value).toBe('#VALUE!');
  });
});
