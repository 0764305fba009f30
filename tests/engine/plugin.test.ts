/**
 * The catalog inside HyperFormula, at workbook level: each result is compared
 * with the catalog's evaluate() on the same inputs (the engine must add
 * nothing and lose nothing), plus the engine-only concerns: spill sizes,
 * references, blanks, upstream errors and built-ins around DRIFT calls.
 */
import { DetailedCellError, ErrorType, HyperFormula, type CellValue, type RawCellContent } from 'hyperformula';
import { findFunction } from '../../src/catalog';
import { evaluate } from '../../src/catalog/broadcast';
import type { ArgumentInput, FunctionSpec } from '../../src/catalog';
import { createEngine, evaluateFormula } from '../../src/engine/engine';
import { catalogGrid, engineGrid, fromEngine } from './support/compare';

function spec(name: string): FunctionSpec {
  const found = findFunction(name);
  if (!found) throw new Error(`no catalog entry ${name}`);
  return found;
}

/** Catalog result for the given arguments, in comparable form. */
function direct(name: string, args: ArgumentInput[]) {
  return catalogGrid(evaluate(spec(name), args));
}

let engine: HyperFormula;
afterEach(() => engine?.destroy());

function build(sheets: Record<string, RawCellContent[][]>): HyperFormula {
  engine = createEngine(sheets);
  return engine;
}

/** Values of a rectangle (0-based, inclusive) of a sheet. */
function rangeValues(sheet: number, top: number, left: number, bottom: number, right: number): CellValue[][] {
  return engine.getRangeValues({ start: { sheet, row: top, col: left }, end: { sheet, row: bottom, col: right } });
}

function cell(sheet: number, row: number, col: number): CellValue {
  return engine.getCellValue({ sheet, row, col });
}

describe('single cells', () => {
  it('gives the catalog value for scalar arguments from cells', () => {
    build({ S: [[1e15, 'B', '=DRIFT.RESISTIVITY(A1,B1)']] });
    expect([[fromEngine(cell(0, 0, 2))]]).toEqual(direct('RESISTIVITY', [1e15, 'B']));
    expect(engine.isCellPartOfArray({ sheet: 0, row: 0, col: 2 })).toBe(false);
  });

  it('accepts function names in any case', () => {
    build({ S: [['=drift.sheetres(1,10)', '=DRIFT.SHEETRES(1,10)']] });
    expect(cell(0, 0, 0)).toBe(cell(0, 0, 1));
  });

  it('reads typed numbers (percent) as their plain value', () => {
    build({ S: [['=DRIFT.SHEETRES(100%,10)', '=DRIFT.SHEETRES(1,10)']] });
    expect(cell(0, 0, 0)).toBe(cell(0, 0, 1));
  });
});

describe('ranges and inline arrays as arguments', () => {
  it('spills a column of results for a column range', () => {
    build({ S: [[1e14, '=DRIFT.RESISTIVITY(A1:A3,"phosphorus")'], [1e15], [1e16]] });
    expect(engineGrid(rangeValues(0, 0, 1, 2, 1))).toEqual(direct('RESISTIVITY', [[[1e14], [1e15], [1e16]], 'phosphorus']));
  });

  it('spills the full grid for a doping column against a temperature row', () => {
    build({
      S: [[null, 250, 300, 350], [1e15, null, null, null, '=DRIFT.RESISTIVITY(A2:A4,"B",B1:D1)'], [1e16], [1e17]],
    });
    const spilled = engineGrid(rangeValues(0, 1, 4, 3, 6));
    expect(spilled).toEqual(direct('RESISTIVITY', [[[1e15], [1e16], [1e17]], 'B', [[250, 300, 350]]]));
    expect(spilled.flat().every((v) => typeof v === 'number')).toBe(true);
    // Nothing beyond the predicted 3×3 block.
    expect(cell(0, 1, 7)).toBeNull();
    expect(cell(0, 4, 4)).toBeNull();
  });

  it('spills inline arrays the same way', () => {
    build({ S: [['=DRIFT.CONDUCTIVITY({1e15;1e16},"phosphorus",{250,300,350})']] });
    expect(engineGrid(rangeValues(0, 0, 0, 1, 2))).toEqual(direct('CONDUCTIVITY', [[[1e15], [1e16]], 'phosphorus', [[250, 300, 350]]]));
  });

  it('sizes a nested DRIFT call by its own arguments', () => {
    build({ S: [[1e15, '=DRIFT.SHEETRES(DRIFT.RESISTIVITY(A1:A3,"B"),{1,2})'], [1e16], [1e17]] });
    const inner = evaluate(spec('RESISTIVITY'), [[[1e15], [1e16], [1e17]], 'B']);
    expect(engineGrid(rangeValues(0, 0, 1, 2, 2))).toEqual(direct('SHEETRES', [inner, [[1, 2]]]));
  });

  it('gives #N/A with the catalog message where an argument cannot fill the result', () => {
    build({ S: [['=DRIFT.SHEETRES({1,2,3},{10,20})']] });
    const row = engineGrid(rangeValues(0, 0, 0, 0, 2));
    expect(row).toEqual(direct('SHEETRES', [[[1, 2, 3]], [[10, 20]]]));
    expect(row[0][2]).toMatchObject({ code: '#N/A' });
  });

  it('spills DRIFT.MODELS() as the catalog table', () => {
    const models = spec('MODELS');
    const table = evaluate(models, []);
    build({ S: [['=DRIFT.MODELS()']] });
    expect(engineGrid(rangeValues(0, 0, 0, table.length - 1, table[0].length - 1))).toEqual(catalogGrid(table));
    expect(cell(0, table.length, 0)).toBeNull();
  });
});

describe('errors', () => {
  it('puts an error with its message in the one element whose input is bad', () => {
    build({ S: [[1e15, '=DRIFT.RESISTIVITY(A1:A3,"B")'], [-1], [1e16]] });
    const values = rangeValues(0, 0, 1, 2, 1);
    expect(engineGrid(values)).toEqual(direct('RESISTIVITY', [[[1e15], [-1], [1e16]], 'B']));
    const bad = values[1][0] as DetailedCellError;
    expect(bad).toBeInstanceOf(DetailedCellError);
    expect(bad.type).toBe(ErrorType.VALUE);
    expect(bad.message).toMatch(/doping/);
    expect(typeof values[0][0]).toBe('number');
    expect(typeof values[2][0]).toBe('number');
  });

  it('keeps the message of a scalar error', () => {
    build({ S: [['=DRIFT.DOPING(10,"Xe")']] });
    expect([[fromEngine(cell(0, 0, 0))]]).toEqual(direct('DOPING', [10, 'Xe']));
    expect((cell(0, 0, 0) as DetailedCellError).message).toMatch(/dopant/);
  });

  it('passes upstream errors through unchanged, element by element', () => {
    build({ S: [['=1/0', '=DRIFT.SHEETRES(A1,10)', '=DRIFT.SHEETRES(A1:A2,10)'], [2]] });
    const scalar = cell(0, 0, 1) as DetailedCellError;
    expect(scalar.type).toBe(ErrorType.DIV_BY_ZERO);
    const column = rangeValues(0, 0, 2, 1, 2);
    expect((column[0][0] as DetailedCellError).type).toBe(ErrorType.DIV_BY_ZERO);
    expect(column[1][0]).toBe(direct('SHEETRES', [2, 10])[0][0]);
  });

  it('passes a nested DRIFT error out with its message', () => {
    build({ S: [['=DRIFT.SHEETRES(DRIFT.RESISTIVITY(-1,"B"),5)', '=DRIFT.RESISTIVITY(-1,"B")']] });
    expect(fromEngine(cell(0, 0, 0))).toEqual(fromEngine(cell(0, 0, 1)));
    expect(fromEngine(cell(0, 0, 0))).toMatchObject({ code: '#VALUE!' });
  });

  it('reports too many arguments and a missing required one in the catalog’s words', () => {
    build({ S: [['=DRIFT.SHEETRES(1,2,3)', '=DRIFT.SHEETRES(1)']] });
    expect([[fromEngine(cell(0, 0, 0))]]).toEqual(direct('SHEETRES', [1, 2, 3]));
    expect([[fromEngine(cell(0, 0, 1))]]).toEqual(direct('SHEETRES', [1]));
  });

  it('rejects a boolean where a number is required, with the catalog message', () => {
    build({ S: [['=DRIFT.SHEETRES(TRUE,10)']] });
    expect([[fromEngine(cell(0, 0, 0))]]).toEqual(direct('SHEETRES', [true, 10]));
  });

  it('shows #SPILL! rather than covering a filled cell', () => {
    build({ S: [[1e15, '=DRIFT.RESISTIVITY(A1:A3,"B")'], [1e16, 'user note'], [1e17]] });
    expect(fromEngine(cell(0, 0, 1))).toMatchObject({ code: '#SPILL!' });
    expect(cell(0, 1, 1)).toBe('user note');
  });

  it('refuses a result larger than its arguments’ shapes foretold, with a message', () => {
    build({ S: [[3, '=DRIFT.SHEETRES(SEQUENCE(A1),1)']] });
    const value = cell(0, 0, 1) as DetailedCellError;
    expect(value.type).toBe(ErrorType.VALUE);
    expect(value.message).toMatch(/foreseen/);
  });
});

describe('one formula the engine cannot take (issue 14 §3)', () => {
  // Excel accepts formulas up to 8,192 characters and 64 levels of nesting (Microsoft's
  // "Excel specifications and limits", from memory); the parser's recursion gives out earlier.
  it('a 2,000-term sum and 150 nested parentheses fail alone, with a message', () => {
    const expected = { kind: 'error', code: '#VALUE!', message: 'the formula is too long or too deeply nested for the headless engine' };
    expect(evaluateFormula(`=${Array(2000).fill('1').join('+')}`)).toEqual(expected);
    // How deep the parser gets depends on the stack left to it (less in the CLI than under jest):
    // 150 levels either evaluate or fail alone; 5,000 fail everywhere.
    expect([1, expected]).toContainEqual(evaluateFormula(`=${'('.repeat(150)}1${')'.repeat(150)}`));
    expect(evaluateFormula(`=${'('.repeat(5000)}1${')'.repeat(5000)}`)).toEqual(expected);
  });

  it('refuses a result of more than a million cells before reserving it', () => {
    expect(evaluateFormula('=SEQUENCE(1048576,1)*SEQUENCE(1,16384)')).toMatchObject({
      kind: 'error',
      code: '#VALUE!',
      message: expect.stringMatching(/^the formula gives 1,048,576×16,384 values/),
    });
    expect(evaluateFormula('=SEQUENCE(1048576,4)')).toMatchObject({
      kind: 'error',
      code: '#VALUE!',
      message: expect.stringMatching(/^the formula gives 1,048,576×4 values/),
    });
  });
});

describe('blank and omitted optional arguments', () => {
  it('uses the default for an empty argument, a blank cell and an omitted argument alike', () => {
    build({
      S: [
        [
          '=DRIFT.RESISTIVITY(1e15,"B",,"astm-f723")',
          '=DRIFT.RESISTIVITY(1e15,"B",Z9,"astm-f723")',
          '=DRIFT.RESISTIVITY(1e15,"B",300,"astm-f723")',
        ],
      ],
    });
    const expected = direct('RESISTIVITY', [1e15, 'B', undefined, 'astm-f723']);
    expect([[fromEngine(cell(0, 0, 0))]]).toEqual(expected);
    expect([[fromEngine(cell(0, 0, 1))]]).toEqual(expected);
    expect([[fromEngine(cell(0, 0, 2))]]).toEqual(expected);
  });

  it('treats blank cells inside a range as defaults for optional arguments', () => {
    build({ S: [[null, '=DRIFT.MOBILITY(1e16,"phosphorus",A1:A2)'], [350]] });
    expect(engineGrid(rangeValues(0, 0, 1, 1, 1))).toEqual(direct('MOBILITY', [1e16, 'phosphorus', [[300], [350]]]));
  });

  it('reports a blank required argument as missing', () => {
    build({ S: [[null, '=DRIFT.RESISTIVITY(A1,"B")']] });
    expect([[fromEngine(cell(0, 0, 1))]]).toEqual(direct('RESISTIVITY', [null, 'B']));
  });
});

describe('built-ins around and inside DRIFT calls', () => {
  it('aggregates a spilled DRIFT result', () => {
    build({ S: [['=SUM(DRIFT.SHEETRES({1,2},10))', '=MAX(DRIFT.RESISTIVITY({1e15,1e16},"B"))']] });
    const sheetres = direct('SHEETRES', [[[1, 2]], 10])[0] as number[];
    expect(cell(0, 0, 0)).toBe(sheetres[0] + sheetres[1]);
    expect(cell(0, 0, 1)).toBe(Math.max(...(direct('RESISTIVITY', [[[1e15, 1e16]], 'B'])[0] as number[])));
  });

  it('takes array arithmetic and array built-ins as arguments', () => {
    build({
      S: [
        [1, '=DRIFT.RESISTIVITY(A1:A2*1e15,"B")', '=DRIFT.RESISTIVITY(SEQUENCE(2)*1e15,"B")', '=DRIFT.SHEETRES(TRANSPOSE(A1:A2),10)'],
        [10],
      ],
    });
    const expected = direct('RESISTIVITY', [[[1e15], [1e16]], 'B']);
    expect(engineGrid(rangeValues(0, 0, 1, 1, 1))).toEqual(expected);
    expect(engineGrid(rangeValues(0, 0, 2, 1, 2))).toEqual(direct('RESISTIVITY', [[[1e15], [2e15]], 'B']));
    expect(engineGrid(rangeValues(0, 0, 3, 0, 4))).toEqual(direct('SHEETRES', [[[1, 10]], 10]));
  });

  it('lets built-ins pick from DRIFT tables and round DRIFT values', () => {
    build({ S: [['=INDEX(DRIFT.MODELS(),1,1)', '=ROUND(DRIFT.SHEETRES(1,3),2)', '=IF(DRIFT.SHEETRES(1,10)>999,"high","low")']] });
    expect(cell(0, 0, 0)).toBe('code');
    expect(cell(0, 0, 1)).toBe(Math.round((direct('SHEETRES', [1, 3])[0][0] as number) * 100) / 100);
    expect(cell(0, 0, 2)).toBe('high');
  });
});

describe('references across sheets', () => {
  it('reads ranges and cells of another sheet, quoted names included', () => {
    build({
      'Lot data': [
        ['lot', 'rho min', 'rho max'],
        ['NQ-1', 4, 6],
      ],
      Results: [['=DRIFT.DOPING(\'Lot data\'!B2:C2,"phosphorus")', null, "=DRIFT.SHEETRES('Lot data'!B2,10)"]],
    });
    const results = engine.getSheetId('Results') as number;
    expect(engineGrid(rangeValues(results, 0, 0, 0, 1))).toEqual(direct('DOPING', [[[4, 6]], 'phosphorus']));
    expect([[fromEngine(cell(results, 0, 2))]]).toEqual(direct('SHEETRES', [4, 10]));
  });
});

describe('evaluateFormula', () => {
  it('evaluates with or without the leading =', () => {
    expect(evaluateFormula('DRIFT.SHEETRES(1,10)')).toEqual(evaluateFormula('=DRIFT.SHEETRES(1,10)'));
    expect([[evaluateFormula('=DRIFT.SHEETRES(1,10)')]]).toEqual(direct('SHEETRES', [1, 10]));
  });

  it('returns the rows of a spill and errors as code and message', () => {
    const result = evaluateFormula('=DRIFT.RESISTIVITY({1e15,-1},"B")');
    expect(Array.isArray(result)).toBe(true);
    const expected = direct('RESISTIVITY', [[[1e15, -1]], 'B'])[0];
    expect((result as unknown[][])[0][0]).toBe(expected[0]);
    expect((result as unknown[][])[0][1]).toEqual({ kind: 'error', ...(expected[1] as object) });
  });

  it('answers an unreadable formula with #ERROR! and says so', () => {
    expect(evaluateFormula('=1+')).toMatchObject({ kind: 'error', code: '#ERROR!', message: expect.stringMatching(/not a valid formula/) });
    expect(evaluateFormula('')).toMatchObject({ kind: 'error', code: '#ERROR!' });
  });

  it('names an unknown function', () => {
    expect(evaluateFormula('DRIFT.NOSUCH(1)')).toMatchObject({ kind: 'error', code: '#NAME?' });
  });

  it('refuses cell, range, column, row and other-sheet references: it has no workbook (issue 14 §6)', () => {
    const refs: [string, string][] = [
      ['=A1+1', 'cell A1'],
      ['=DRIFT.RESISTIVITY($B$2,"B")', 'cell B2'],
      ['=SUM($B$2:C3)', 'range B2:C3'],
      ['=SUM(A:A)', 'columns A:A'],
      ['=SUM(1:1)', 'rows 1:1'],
      ['=Sheet1!B2', 'cell B2'],
      ["='Other sheet'!A1", 'cell A1 of another sheet'],
      ['=E15*2', 'cell E15'],
    ];
    for (const [formula, named] of refs) {
      const result = evaluateFormula(formula);
      expect({ formula, result }).toMatchObject({ formula, result: { kind: 'error', code: '#REF!' } });
      expect((result as { message: string }).message).toContain(
        `the formula refers to ${named}, but a formula evaluated on its own has no workbook`,
      );
      expect((result as { message: string }).message).toContain('driftcell recalc');
    }
  });

  it('does not take function names, names, or quoted text for references', () => {
    expect(evaluateFormula('=LOG10(100)')).toBe(2);
    expect(evaluateFormula('="A1"&"B2:C3"')).toBe('A1B2:C3');
    expect(evaluateFormula('=TRUE')).toBe(true);
    expect(evaluateFormula('=DRIFT.SHEETRES(1,10)')).toBe(1000);
    expect(evaluateFormula('=DRIFT.RESISTIVITY(1e15,B)')).toMatchObject({ kind: 'error', code: '#NAME?' });
  });

  it('gives an error, not 0, for a Hall density below the smallest double (issue 14 §6)', () => {
    // 1e-300/(1.602e-19 × 1e308) ≈ 6e-590 cm⁻³ (arithmetic), below 4.9e-324, the least positive double (IEEE 754 binary64).
    const result = evaluateFormula('=DRIFT.HALLDENSITY(1e308,1e-300)');
    expect(result).toMatchObject({ kind: 'error', code: '#VALUE!' });
    expect((result as { message: string }).message).toMatch(
      /carrier density for these arguments is about 1e-589 cm⁻³, smaller than 5e-324/,
    );
    const mobility = evaluateFormula('=DRIFT.HALLMOBILITY(1e-300,1e300)');
    expect((mobility as { message: string }).message).toMatch(/mobility for these arguments is about 1e-600 /);
  });
});

describe('registration', () => {
  it('registers every catalog function once, whatever the number of engines', () => {
    build({ S: [] });
    createEngine().destroy();
    const names = HyperFormula.getRegisteredFunctionNames('enGB');
    for (const name of ['DRIFT.BANDGAP', 'DRIFT.RESISTIVITY', 'DRIFT.MODELS']) expect(names).toContain(name);
  });
});
