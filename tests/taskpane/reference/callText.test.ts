import { findFunction } from '../../../src/catalog';
import { rowReferences } from '../../../src/taskpane/certificate/plan';
import { applySheetPlan, firstFilledCell, PaneRefusal } from '../../../src/taskpane/sheetPlan';
import { parseNumberField } from '../../../src/taskpane/dom';
import { callText, parameterNamed, stringLiteral } from '../../../src/taskpane/reference/callText';
import { MemoryPort } from '../support/memoryPort';

describe('calls by parameter name', () => {
  const doping = findFunction('DOPING')!;

  it('places arguments in the catalog’s order, keeps inner blanks and drops trailing ones', () => {
    expect(callText(doping, { dopant: '"B"', resistivity: 'D2' })).toBe('DRIFT.DOPING(D2,"B")');
    expect(callText(doping, { resistivity: 'D2', dopant: 'K2', material: '$W$7' })).toBe('DRIFT.DOPING(D2,K2,,,$W$7)');
  });

  it('refuses a name the entry does not have, and a blank required argument', () => {
    expect(() => callText(doping, { resistivity: 'D2', dopant: 'B', thickness: '5' })).toThrow(
      `DRIFT.DOPING has no parameter 'thickness'; its parameters are ${doping.parameters.map((p) => p.name).join(', ')}`,
    );
    expect(() => callText(doping, { resistivity: 'D2' })).toThrow("DRIFT.DOPING needs its argument 'dopant'");
    expect(() => parameterNamed(doping, 'nope')).toThrow(/DRIFT.DOPING has no parameter 'nope'/);
  });

  it('quotes text as a formula string', () => {
    expect(stringLiteral('say "hi"')).toBe('"say ""hi"""');
  });
});

describe('row references', () => {
  it('joins contiguous columns into ranges', () => {
    expect(rowReferences([5, 6, 7, 9], 1)).toBe('F2:H2,J2');
    expect(rowReferences([2], 0)).toBe('C1');
    expect(rowReferences([27, 26], 4)).toBe('AA5:AB5');
  });
});

describe('sheet plans', () => {
  it('finds the first filled cell row by row, formulas included', async () => {
    const port = new MemoryPort();
    const block = { sheet: 'Sheet1', row: 0, column: 0, rowCount: 3, columnCount: 3 };
    expect(await firstFilledCell(port, block)).toBeNull();
    port.put(2, 0, [['=1+1']]);
    port.put(1, 2, [[0]]);
    expect(await firstFilledCell(port, block)).toBe('C2');
  });

  it('checks every block before writing any, so a refusal leaves the sheet untouched', async () => {
    const port = new MemoryPort();
    port.put(5, 5, [['keep']]);
    const plan = {
      writes: [
        { block: { sheet: 'Sheet1', row: 0, column: 0, rowCount: 1, columnCount: 1 }, cells: [['a']] },
        { block: { sheet: 'Sheet1', row: 5, column: 5, rowCount: 1, columnCount: 1 }, cells: [['b']] },
      ],
      styles: [],
      highlights: [],
    };
    await expect(applySheetPlan(port, plan)).rejects.toBeInstanceOf(PaneRefusal);
    expect(port.writes).toEqual([]);
    expect(port.input(0, 0)).toBeUndefined();
  });

  it('a plan whose cells do not fit its block is a fault, not a refusal', async () => {
    const port = new MemoryPort();
    const plan = {
      writes: [{ block: { sheet: 'Sheet1', row: 0, column: 0, rowCount: 1, columnCount: 2 }, cells: [['a']] }],
      styles: [],
      highlights: [],
    };
    const error = await applySheetPlan(port, plan).catch((e: unknown) => e);
    expect(error).toBeInstanceOf(Error);
    expect(error).not.toBeInstanceOf(PaneRefusal);
  });
});

describe('number fields', () => {
  it('read plain and exponent notation, blank as null, and refuse anything else with the text', () => {
    expect(parseNumberField(' 1e15 ', 'Min')).toBe(1e15);
    expect(parseNumberField('2.5E+16', 'Min')).toBe(2.5e16);
    expect(parseNumberField('', 'Min')).toBeNull();
    expect(() => parseNumberField('1,5e15', 'Needed doping min')).toThrow(
      "Needed doping min: '1,5e15' is not a number; type digits with a point for decimals, e.g. 1e15 or 2.5E+16.",
    );
  });
});
