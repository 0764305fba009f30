/**
 * Inserting a function lays out its arguments and a formula that references
 * them. For every catalog entry the inserted formula, evaluated by the real
 * engine, gives exactly what the catalog's evaluate() gives for the same
 * argument values (so the layout passes the right cells in the right order).
 */
import { CATALOG, evaluate, findFunction, isFailure, type ArgumentInput, type CellInput, type CellOutput } from '../../../src/catalog';
import { evaluateFormula, type ResultElement } from '../../../src/engine/engine';
import { PaneRefusal } from '../../../src/taskpane/sheetPlan';
import { exampleArguments, insertFunction, planInsert, prefillValues, resultSize } from '../../../src/taskpane/reference/insert';
import { MemoryPort, valueAt } from '../support/memoryPort';

/** A cell's value as formula text: text quoted, a blank as an empty argument. */
function formulaLiteral(value: CellInput | undefined): string {
  if (value === null || value === undefined) return '';
  return typeof value === 'string' ? `"${value.replace(/"/g, '""')}"` : String(value);
}

/** 0-based column of A1 letters. */
function columnIndex(letters: string): number {
  return [...letters].reduce((n, letter) => n * 26 + letter.charCodeAt(0) - 64, 0) - 1;
}

function comparable(value: CellOutput | ResultElement): unknown {
  if (value !== null && typeof value === 'object')
    return 'code' in value ? { error: value.code } : { error: (value as { code: string }).code };
  return value;
}

describe('example arguments', () => {
  const doping = findFunction('DOPING')!;
  it('reads numbers, text, blanks and inline arrays; marks references and calls as other', () => {
    expect(exampleArguments('=DRIFT.DOPING(10,"B")', doping)).toEqual([
      { kind: 'value', value: 10 },
      { kind: 'value', value: 'B' },
    ]);
    expect(exampleArguments('=DRIFT.DOPING(1e-2, "say ""x""", ,TRUE)', doping)).toEqual([
      { kind: 'value', value: 0.01 },
      { kind: 'value', value: 'say "x"' },
      { kind: 'blank' },
      { kind: 'value', value: true },
    ]);
    expect(exampleArguments('=DRIFT.DOPING(B2:C2,"phosphorus")', doping)![0]).toEqual({ kind: 'other', text: 'B2:C2' });
    expect(exampleArguments('=DRIFT.DOPING({1,2;3,4},MAX(1,2))', doping)).toEqual([
      { kind: 'array', values: [1, 2, 3, 4] },
      { kind: 'other', text: 'MAX(1,2)' },
    ]);
  });

  it('refuses formulas that are not one plain call of the entry', () => {
    expect(exampleArguments('=DRIFT.INTRINSIC(300)', doping)).toBeNull();
    expect(exampleArguments('=DRIFT.DOPING(1)+DRIFT.DOPING(2)', doping)).toBeNull();
    expect(exampleArguments('=DRIFT.DOPING(10,"B")*2', doping)).toBeNull();
  });
});

describe('prefill', () => {
  it('takes the first example made of plain values, optional arguments blank', () => {
    const doping = findFunction('DOPING')!;
    const first = exampleArguments(doping.examples[0].formula, doping)!;
    const values = prefillValues(doping);
    expect(values).toHaveLength(doping.parameters.length);
    first.forEach((argument, index) => expect(values[index]).toEqual([argument.kind === 'value' ? argument.value : null]));
    expect(values.slice(first.length).every((cells) => cells.length === 1 && cells[0] === null)).toBe(true);
  });

  it('lays a reducing argument’s inline array along its row', () => {
    const radial = findFunction('RADIALVARIATION')!;
    const edges = radial.parameters.findIndex((p) => p.reduce !== undefined);
    const example = radial.examples.map((e) => exampleArguments(e.formula, radial)!).find((args) => args[edges]?.kind === 'array');
    expect(example).toBeDefined();
    const array = example![edges];
    if (array.kind !== 'array') throw new Error('no inline array');
    expect(prefillValues(radial)[edges]).toEqual(array.values);
  });
});

describe('insert at the active cell', () => {
  it('writes "name (unit) | value" rows and a formula referencing the value cells', async () => {
    const port = new MemoryPort();
    port.select(4, 2); // C5
    const sheetRes = findFunction('SHEETRES')!;
    const plan = await insertFunction(port, sheetRes);
    expect(plan.formula).toBe('=DRIFT.SHEETRES(D5,D6)');
    expect(port.writes).toHaveLength(1);
    expect(port.writes[0].block).toEqual({ sheet: 'Sheet1', row: 4, column: 2, rowCount: 3, columnCount: 2 });
    expect(port.writes[0].cells.map((row) => row[0])).toEqual([
      ...sheetRes.parameters.map((p) => `${p.name} (${p.unit})`),
      `DRIFT.SHEETRES (${sheetRes.result.unit})`,
    ]);
    expect(plan.summary).toBe('Inserted DRIFT.SHEETRES in Sheet1!D7 with its arguments in C5:D6; edit them there.');
  });

  it('labels optional arguments with what blank means', () => {
    const plan = planInsert(findFunction('DOPING')!, { sheet: 'S', row: 0, column: 0, rowCount: 1, columnCount: 1 });
    expect(plan.writes[0].cells[2][0]).toBe('temperature_K (K), optional: blank = 300');
  });

  it('refuses to write over anything, naming the block; the spill area of a tuple counts too', async () => {
    const port = new MemoryPort();
    port.put(1, 1, [['mine']]);
    port.select(0, 0);
    await expect(insertFunction(port, findFunction('SHEETRES')!)).rejects.toThrow(
      new PaneRefusal(
        'Nothing was written: Sheet1!A1:B3 must be empty, but B2 holds something. Clear that block or choose another place, then try again.',
      ),
    );
    // A tuple's row fits in the block itself (the block is as wide as the result).
    const range = findFunction('DOPINGRANGE')!;
    if (range.kind !== 'tuple') throw new Error('DOPINGRANGE is a tuple entry');
    expect(resultSize(range)).toEqual({ rows: 1, columns: range.columns.length });
    expect(planInsert(range, { sheet: 'S', row: 0, column: 0, rowCount: 1, columnCount: 1 }).writes[0].block.columnCount).toBe(
      1 + range.columns.length,
    );
    // A table's spill reaches below the block: those cells must be empty too.
    const models = findFunction('MODELS')!;
    const size = resultSize(models);
    expect(size.rows).toBeGreaterThan(3);
    const tablePort = new MemoryPort();
    tablePort.put(3, 1, [['x']]); // B4, inside the spill of a formula in B1
    tablePort.select(0, 0);
    const error = await insertFunction(tablePort, models).catch((e: unknown) => e);
    expect(error).toBeInstanceOf(PaneRefusal);
    expect((error as Error).message).toMatch(/must be empty, but B4 holds something/);
    expect(tablePort.writes).toEqual([]);
  });

  it.each(CATALOG.map((spec) => [spec.name]))('DRIFT.%s: the inserted formula gives the catalog’s own result', async (name) => {
    const spec = findFunction(name)!;
    const port = new MemoryPort();
    port.select(2, 1);
    const plan = await insertFunction(port, spec);
    const prefill = prefillValues(spec);
    const args: ArgumentInput[] = prefill.map((cells) => (cells.length > 1 ? [cells.map((cell) => cell)] : cells[0]));
    const expected = evaluate(spec, args);
    const values = port.engineValues();
    const { row, column } = plan.formulaCell;
    if (spec.kind === 'row') {
      // Excel reads a row entry's arguments from the cells; the headless engine cannot size a row from a
      // reference (src/engine/plugin.ts) and says so. The layout is checked by the same formula with the
      // referenced cells' values typed in, which the engine sizes and computes.
      expect(valueAt(values, row, column)).toMatchObject({
        code: '#VALUE!',
        message: expect.stringMatching(/needs its arguments typed into the formula/),
      });
      const typed = plan.formula.replace(/\b([A-Z]+)(\d+)\b/g, (_, letters: string, digits: string) =>
        formulaLiteral(port.sheets.get('Sheet1')?.[Number(digits) - 1]?.[columnIndex(letters)]),
      );
      const shownTyped = evaluateFormula(typed);
      expect((Array.isArray(shownTyped) ? shownTyped : [[shownTyped]]).map((cells) => cells.map(comparable))).toEqual(
        expected.map((cells) => cells.map(comparable)),
      );
      expect(resultSize(spec)).toEqual({ rows: 1, columns: expected[0].length });
      expect(plan.writes[0].block.columnCount).toBe(1 + expected[0].length);
    } else {
      const shown = expected.map((cells, r) => cells.map((_, c) => comparable(valueAt(values, row + r, column + c))));
      expect(shown).toEqual(expected.map((cells) => cells.map(comparable)));
    }
    // An entry with all its required arguments prefilled shows values, not errors.
    if (plan.missing.length === 0) expect(expected.flat().some((cell) => isFailure(cell))).toBe(false);
  });
});
