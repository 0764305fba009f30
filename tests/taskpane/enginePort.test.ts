/** The engine-backed WorkbookPort: formulas evaluate as the catalog computes them; plans are recorded. */
import { CATALOG, evaluate } from '../../src/catalog';
import { createEnginePort } from '../../src/taskpane/enginePort';
import type { CellBlock } from '../../src/taskpane/port';

const cell = (row: number, column: number, rowCount = 1, columnCount = 1, sheet = 'Sheet1'): CellBlock => ({
  sheet,
  row,
  column,
  rowCount,
  columnCount,
});
const RESISTIVITY = CATALOG.find((f) => f.name === 'RESISTIVITY')!;

describe('createEnginePort', () => {
  it('writes constants and a DRIFT formula and reads back the catalog value and the formula text', async () => {
    const port = createEnginePort();
    await port.write(cell(0, 0, 1, 2), [[1e15, '=DRIFT.RESISTIVITY(A1,"B")']]);
    const contents = await port.read(cell(0, 0, 1, 2));
    const expected = evaluate(RESISTIVITY, [1e15, 'B'])[0][0];
    expect(contents.values).toEqual([[1e15, expected]]);
    expect(contents.formulas).toEqual([[null, '=DRIFT.RESISTIVITY(A1,"B")']]);
  });

  it('spills a formula written into its anchor cell only', async () => {
    const port = createEnginePort();
    await port.write(cell(0, 0, 3, 1), [[1e14], [1e15], [1e16]]);
    await port.write(cell(0, 1), [['=DRIFT.RESISTIVITY(A1:A3,"phosphorus")']]);
    const { values, formulas } = await port.read(cell(0, 1, 3, 1));
    const expected = evaluate(RESISTIVITY, [[[1e14], [1e15], [1e16]], 'phosphorus']);
    expect(values).toEqual(expected);
    expect(formulas).toEqual([['=DRIFT.RESISTIVITY(A1:A3,"phosphorus")'], [null], [null]]);
  });

  it('accepts formula text as Excel writes it (upper-case exponent) and reads it back as written', async () => {
    const port = createEnginePort();
    await port.write(cell(0, 0), [['=DRIFT.RESISTIVITY(1E+15,"B")']]);
    const { values, formulas } = await port.read(cell(0, 0));
    expect(values[0][0]).toBe(evaluate(RESISTIVITY, [1e15, 'B'])[0][0]);
    expect(formulas[0][0]).toBe('=DRIFT.RESISTIVITY(1E+15,"B")');
    await port.write(cell(0, 0), [[5]]);
    expect((await port.read(cell(0, 0))).formulas).toEqual([[null]]);
  });

  it('shows errors as { error } and empty cells as null', async () => {
    const port = createEnginePort();
    await port.write(cell(0, 0, 1, 3), [['=DRIFT.RESISTIVITY(-1,"B")', null, 'text']]);
    const { values } = await port.read(cell(0, 0, 1, 3));
    expect(values).toEqual([[{ error: '#VALUE!' }, null, 'text']]);
  });

  it('refuses a block whose size does not match the cells, and reads of unknown sheets', async () => {
    const port = createEnginePort();
    await expect(port.write(cell(0, 0, 2, 2), [[1, 2]])).rejects.toThrow(/needs 2×2 cells, got 1×2/);
    await expect(port.read(cell(0, 0, 1, 1, 'Nope'))).rejects.toThrow(/no sheet named 'Nope'/);
  });

  it('reports the selection it was given (A1 of the first sheet at first)', async () => {
    const port = createEnginePort({ Lots: [['x']] });
    await expect(port.selection()).resolves.toEqual(cell(0, 0, 1, 1, 'Lots'));
    port.select(cell(4, 2, 1, 1, 'Lots'));
    await expect(port.selection()).resolves.toEqual(cell(4, 2, 1, 1, 'Lots'));
  });

  it('records chart, highlight and style plans in order', async () => {
    const port = createEnginePort();
    const chart = {
      sheet: 'Sheet1',
      title: 't',
      series: [{ name: 's', x: cell(0, 0, 2, 1), y: cell(0, 1, 2, 1) }],
      xTitle: 'x',
      yTitle: 'y',
      xLogarithmic: true,
      yLogarithmic: false,
      anchor: cell(0, 3),
    };
    await port.addChart(chart);
    await port.addHighlight({ block: cell(0, 0, 3, 1), text: 'FAIL', fill: '#ffeeee', fontColor: '#660000' });
    await port.style({ block: cell(0, 0), bold: true });
    expect(port.charts).toEqual([chart]);
    expect(port.highlights.map((h) => h.text)).toEqual(['FAIL']);
    expect(port.styles).toEqual([{ block: cell(0, 0), bold: true }]);
    await expect(port.addChart({ ...chart, series: [] })).rejects.toThrow(/at least one series/);
  });
});
