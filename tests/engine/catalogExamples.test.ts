/**
 * Every catalog example that needs no cells gives, through the engine, exactly
 * what the catalog's evaluate() gives for it directly (same numbers, same
 * errors, same spill shape). Examples that refer to cells are checked to be
 * formulas the engine can read.
 */
import { DetailedCellError, ErrorType, type HyperFormula } from 'hyperformula';
import { CATALOG } from '../../src/catalog';
import { createEngine } from '../../src/engine/engine';
import { qualifiedName } from '../../src/catalog/naming';
import { catalogGrid, engineGrid } from './support/compare';
import { evaluateDirectly } from './support/directFormula';

const examples = CATALOG.flatMap((spec) => spec.examples.map((example) => ({ name: qualifiedName(spec), formula: example.formula })));
const selfContained = examples.filter((e) => evaluateDirectly(e.formula) !== undefined);
const withCells = examples.filter((e) => evaluateDirectly(e.formula) === undefined);

let engine: HyperFormula;
beforeEach(() => {
  engine = createEngine({ Examples: [] });
});
afterEach(() => engine.destroy());

describe('self-contained catalog examples', () => {
  it('cover every catalog function', () => {
    const covered = new Set(selfContained.map((e) => e.name));
    expect(CATALOG.map(qualifiedName).filter((name) => !covered.has(name))).toEqual([]);
  });

  it.each(selfContained)('$formula gives the catalog’s own result', ({ formula }) => {
    const expected = evaluateDirectly(formula);
    if (expected === undefined) throw new Error('not self-contained');
    engine.setCellContents({ sheet: 0, row: 0, col: 0 }, formula);
    const rows = expected.length;
    const columns = expected[0].length;
    const values = engine.getRangeValues({ start: { sheet: 0, row: 0, col: 0 }, end: { sheet: 0, row: rows - 1, col: columns - 1 } });
    expect(engineGrid(values)).toEqual(catalogGrid(expected));
    // The spill is exactly the catalog's shape: nothing right of it or below it.
    expect(engine.getCellValue({ sheet: 0, row: 0, col: columns })).toBeNull();
    expect(engine.getCellValue({ sheet: 0, row: rows, col: 0 })).toBeNull();
  });
});

describe('catalog examples that refer to cells', () => {
  it.each(withCells)('$formula is a formula the engine reads', ({ formula }) => {
    expect(engine.validateFormula(formula)).toBe(true);
    engine.setCellContents({ sheet: 0, row: 50, col: 20 }, formula);
    const value = engine.getCellValue({ sheet: 0, row: 50, col: 20 });
    // Referenced cells are blank here, so any value or error may result, but never an unknown name.
    expect(value instanceof DetailedCellError ? value.type : 'no error').not.toBe(ErrorType.NAME);
  });
});
