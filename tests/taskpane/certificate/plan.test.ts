/**
 * The certificate check's plan, written through an in-memory port and then
 * evaluated by the real engine. Expected numbers come from calling the
 * catalog directly (tests/catalog/support/call.ts), so these tests check that
 * the written formulas reference the right cells and parameters, not the
 * physics (which has its own reference tests).
 */
import { findFunction, qualifiedName } from '../../../src/catalog';
import { dopantCodeProblem, typedDopantCodes, SILICON } from '../../../src/physics';
import { dopantCodeFor, dopantCodeFormula } from '../../../src/taskpane/certificate/typeCodes';
import { planCertificateCheck, type CertificateSettings } from '../../../src/taskpane/certificate/plan';
import { addCertificateCheck, readCertificateTable } from '../../../src/taskpane/certificate/session';
import { PaneRefusal } from '../../../src/taskpane/sheetPlan';
import type { ResultError } from '../../../src/engine/engine';
import { value } from '../../catalog/support/call';
import { MemoryPort, valueAt } from '../support/memoryPort';
import { CERTIFICATE_ROWS, CERTIFICATE_TABLE, CHECK_HEADERS, WAFER_ROWS, expectedDopantOfType } from './fixture';
import { FIRST_NEW, LEFT, TOP, numberAt, portWithTable } from './tablePort';

const BASE: Omit<CertificateSettings, 'mapping'> = {
  neededMin: 1e15,
  neededMax: 2e15,
  windowRule: 'certified-inside-needed',
  typeMeansConductivity: true,
  dopant: 'B',
  resistivityUnit: 'ohm-cm',
  thicknessUnit: 'um',
  temperatureK: 300,
  model: 'masetti',
  material: 'Si',
  radialLimitPercent: null,
};

function mean(values: readonly number[]): number {
  return values.reduce((sum, v) => sum + v, 0) / values.length;
}

describe('certificate check on the fictional test table', () => {
  it('writes one formula row per wafer that the engine evaluates to the catalog’s numbers', async () => {
    const { port, mapping } = await portWithTable();
    const plan = await addCertificateCheck(port, await port.selection(), { ...BASE, mapping });
    expect(plan.headers).toEqual(CHECK_HEADERS);
    const values = port.engineValues();
    WAFER_ROWS.forEach((row, index) => {
      const sheetRow = TOP + 1 + index;
      const [, , type, rhoMin, rhoMax, centre, e1, e2, e3, thickness] = row;
      // The certificate's P/N are conductivity types: generic acceptor / donor.
      const code = expectedDopantOfType(type);
      expect(valueAt(values, sheetRow, FIRST_NEW)).toBe(code);
      const atMax = value('DOPING', rhoMax, code, 300, 'masetti', 'Si');
      const atMin = value('DOPING', rhoMin, code, 300, 'masetti', 'Si');
      expect(numberAt(values, sheetRow, FIRST_NEW + 1)).toBeCloseTo(atMax, -8);
      expect(numberAt(values, sheetRow, FIRST_NEW + 1) / atMax).toBeCloseTo(1, 12);
      expect(numberAt(values, sheetRow, FIRST_NEW + 2) / atMin).toBeCloseTo(1, 12);
      // Higher resistivity, lower doping.
      expect(atMax).toBeLessThan(atMin);
      const inside = atMax >= BASE.neededMin && atMin <= BASE.neededMax;
      expect(valueAt(values, sheetRow, FIRST_NEW + 3)).toBe(inside ? 'yes' : 'no');
      const readings = [centre, e1, e2, e3];
      const readingsInside = Math.min(...readings) >= rhoMin && Math.max(...readings) <= rhoMax;
      expect(valueAt(values, sheetRow, FIRST_NEW + 4)).toBe(readingsInside ? 'yes' : 'no');
      expect(numberAt(values, sheetRow, FIRST_NEW + 5) / value('SHEETRES', mean(readings), thickness)).toBeCloseTo(1, 12);
      expect(numberAt(values, sheetRow, FIRST_NEW + 6)).toBeCloseTo(value('RADIALVARIATION', centre, [[e1, e2, e3]]), 12);
      expect(valueAt(values, sheetRow, FIRST_NEW + 7)).toBe(inside && readingsInside ? 'PASS' : 'FAIL');
    });
    // The fixture exercises both verdicts.
    const verdicts = CERTIFICATE_ROWS.map((_, index) => valueAt(values, TOP + 1 + index, FIRST_NEW + 7));
    expect(new Set(verdicts)).toEqual(new Set(['PASS', 'FAIL']));
  });

  it('uses catalog names and parameter cells, not pasted numbers', async () => {
    const { port, mapping } = await portWithTable();
    const plan = planCertificateCheck(
      { block: await port.selection(), contents: await port.read(await port.selection()) },
      { ...BASE, mapping },
    );
    const firstRow = plan.writes[0].cells[1] as string[];
    const doping = qualifiedName(findFunction('DOPING')!);
    expect(firstRow[1]).toBe(`=${doping}(F3,L3,$V$5,$V$6,$V$7)`);
    expect(firstRow[2]).toBe(`=${doping}(E3,L3,$V$5,$V$6,$V$7)`);
    expect(firstRow[3]).toBe('=IF(AND(MIN(M3,N3)>=$V$3,MAX(M3,N3)<=$V$4),"yes","no")');
    expect(firstRow[5]).toBe(`=${qualifiedName(findFunction('SHEETRES')!)}(AVERAGE(G3:J3),K3)`);
    expect(firstRow[6]).toBe(`=${qualifiedName(findFunction('RADIALVARIATION')!)}(G3,H3:J3)`);
    expect(plan.writes[1].cells).toEqual([
      ['Certificate check parameters', null],
      ['Needed doping min (cm⁻³)', 1e15],
      ['Needed doping max (cm⁻³)', 2e15],
      ['Temperature (K)', 300],
      ['Doping model', 'masetti'],
      ['Material', 'Si'],
    ]);
    expect(plan.writes[1].block).toEqual({ sheet: 'Sheet1', row: 1, column: 20, rowCount: 6, columnCount: 2 });
    // No literal number in any data formula (other than "no readings" = COUNT()=0): every value comes from a cell.
    const formulas = plan.writes[0].cells.slice(1).flat() as string[];
    const withoutReferences = formulas.map((formula) =>
      formula.replace(/\$?[A-Z]{1,3}\$?\d+/g, 'REF').replace(/COUNT\(([^)]*)\)=0/g, 'COUNT($1)=ZERO'),
    );
    expect(withoutReferences.filter((formula) => /\d/.test(formula))).toEqual([]);
  });

  it('re-checks live: changing a parameter cell changes the verdicts', async () => {
    const { port, mapping } = await portWithTable();
    const plan = await addCertificateCheck(port, await port.selection(), { ...BASE, mapping });
    const windowRow = TOP + 1; // needed min sits in the block's second row
    const valueColumn = plan.parameterBlock.column + 1;
    const before = port.engineValues();
    expect(valueAt(before, TOP + 1, FIRST_NEW + 7)).toBe('PASS');
    port.put(windowRow, valueColumn, [[1.5e15]]);
    const after = port.engineValues();
    // Wafer W01's certified doping starts below 1.5e15 (its ρmax of 12 Ω·cm), so it no longer passes.
    expect(value('DOPING', 12, 'acceptor')).toBeLessThan(1.5e15);
    expect(valueAt(after, TOP + 1, FIRST_NEW + 7)).toBe('FAIL');
  });

  it('adds bold headers, number formats and PASS/FAIL highlights on the pass/fail column', async () => {
    const { port, mapping } = await portWithTable();
    const plan = await addCertificateCheck(port, await port.selection(), { ...BASE, mapping });
    expect(port.highlights.map((h) => h.text)).toEqual(['PASS', 'FAIL']);
    expect(
      port.highlights.every(
        (h) => h.block.column === FIRST_NEW + 7 && h.block.row === TOP + 1 && h.block.rowCount === CERTIFICATE_ROWS.length,
      ),
    ).toBe(true);
    expect(port.highlights.every((h) => /^#[0-9a-f]{6}$/.test(h.fill) && /^#[0-9a-f]{6}$/.test(h.fontColor))).toBe(true);
    expect(port.styles[0]).toEqual({ block: { ...plan.columnsBlock, rowCount: 1 }, bold: true });
    expect(port.styles.some((s) => s.numberFormat === '0.00E+00' && s.block.column === FIRST_NEW + 1)).toBe(true);
  });

  it('never writes over the user’s cells: refuses, names the block and the filled cell, writes nothing', async () => {
    const { port, mapping } = await portWithTable();
    port.put(TOP + 3, FIRST_NEW + 4, [['note']]);
    await expect(addCertificateCheck(port, await port.selection(), { ...BASE, mapping })).rejects.toThrow(
      new PaneRefusal(
        'Nothing was written: Sheet1!L2:S6 must be empty, but P5 holds something. Clear that block or choose another place, then try again.',
      ),
    );
    expect(port.writes).toEqual([]);
    expect(port.highlights).toEqual([]);
  });

  it('refuses when the parameter block is not empty', async () => {
    const { port, mapping } = await portWithTable();
    port.put(TOP + 2, FIRST_NEW + 10, [['x']]);
    await expect(addCertificateCheck(port, await port.selection(), { ...BASE, mapping })).rejects.toThrow(
      /Sheet1!U2:V7 must be empty, but V4/,
    );
  });
});

describe('options', () => {
  it('a model and material left to their defaults get no cell, and the formulas omit them', async () => {
    const { port, mapping } = await portWithTable();
    const plan = await addCertificateCheck(port, await port.selection(), { ...BASE, mapping, model: '', material: '' });
    expect(plan.writes[1].cells.map((row) => row[0])).toEqual([
      'Certificate check parameters',
      'Needed doping min (cm⁻³)',
      'Needed doping max (cm⁻³)',
      'Temperature (K)',
    ]);
    expect(plan.writes[0].cells[1][1]).toBe(`=${qualifiedName(findFunction('DOPING')!)}(F3,L3,$V$5)`);
    const values = port.engineValues();
    expect(numberAt(values, TOP + 1, FIRST_NEW + 1) / value('DOPING', 12, 'acceptor')).toBeCloseTo(1, 12);
  });

  it('with the conductivity-type switch off, P is phosphorus and N nitrogen (not a silicon dopant: the row shows an error)', async () => {
    const { port, mapping } = await portWithTable();
    await addCertificateCheck(port, await port.selection(), { ...BASE, mapping, typeMeansConductivity: false });
    const values = port.engineValues();
    expect(valueAt(values, TOP + 1, FIRST_NEW)).toBe('phosphorus');
    expect(numberAt(values, TOP + 1, FIRST_NEW + 1) / value('DOPING', 12, 'phosphorus', 300, 'masetti')).toBeCloseTo(1, 12);
    expect(valueAt(values, TOP + 3, FIRST_NEW)).toBe('nitrogen');
    expect(valueAt(values, TOP + 3, FIRST_NEW + 1)).toMatchObject({
      kind: 'error',
      code: '#VALUE!',
      message: expect.stringContaining("unknown dopant 'nitrogen' for silicon"),
    });
  });

  it('reads a lone p or n on the certificate as P or N: the same word in any case, whichever the switch', async () => {
    for (const typeMeansConductivity of [true, false]) {
      for (const [upper, lower] of [
        ['P', 'p'],
        ['N', 'n'],
      ]) {
        expect(dopantCodeFor(lower, typeMeansConductivity)).toBe(dopantCodeFor(upper, typeMeansConductivity));
        expect(dopantCodeFor(` ${lower} `, typeMeansConductivity)).toBe(dopantCodeFor(upper, typeMeansConductivity));
      }
      for (const entry of ['P', 'p', 'N', 'n']) {
        // Whatever the switch, what reaches the functions is never a lone letter they would refuse.
        expect(dopantCodeProblem(dopantCodeFor(entry, typeMeansConductivity))).toBeNull();
      }
      for (const entry of ['B', 'boron', 'As', 'n-type', 'P-Type', 'Phosphorus'])
        expect(dopantCodeFor(entry, typeMeansConductivity)).toBe(entry);
    }
    expect(['P', 'N'].map((entry) => dopantCodeFor(entry, true))).toEqual(['acceptor', 'donor']);
    expect(['P', 'N'].map((entry) => dopantCodeFor(entry, false))).toEqual(['phosphorus', 'nitrogen']);
    expect(dopantCodeFormula('C2', true)).toBe('IF(TRIM(C2)="P","acceptor",IF(TRIM(C2)="N","donor",TRIM(C2)))');
    const table = [
      ['Wafer', 'Type', 'Rho min', 'Rho max'],
      ['Z1', 'p', 8, 12],
      ['Z2', 'P', 8, 12],
    ];
    const { port, mapping } = await portWithTable(table);
    await addCertificateCheck(port, await port.selection(), { ...BASE, mapping });
    const values = port.engineValues();
    const first = LEFT + table[0].length;
    expect([valueAt(values, TOP + 1, first), valueAt(values, TOP + 2, first)]).toEqual(['acceptor', 'acceptor']);
    expect(numberAt(values, TOP + 1, first + 1)).toBe(numberAt(values, TOP + 2, first + 1));
  });

  it('without a type column, every row uses the dopant parameter cell', async () => {
    const table = CERTIFICATE_TABLE.map((row) => [row[0], row[3], row[4]]);
    const { port, mapping } = await portWithTable(table);
    expect(mapping).toEqual(['lot', 'rho-min', 'rho-max']);
    const plan = await addCertificateCheck(port, await port.selection(), { ...BASE, mapping, dopant: 'As' });
    expect(plan.headers[0]).toBe('Doping at ρmax (cm⁻³)');
    expect(plan.writes[1].cells[3]).toEqual(['Dopant (no type column)', 'As']);
    const values = port.engineValues();
    expect(numberAt(values, TOP + 1, LEFT + 3) / value('DOPING', 12, 'As')).toBeCloseTo(1, 12);
    // No readings, thickness, centre or edge: window check and pass/fail only.
    expect(plan.headers).toEqual(['Doping at ρmax (cm⁻³)', 'Doping at ρmin (cm⁻³)', 'Certified doping inside needed window', 'Pass/fail']);
  });

  it('a row whose resistivity several dopings give (77 K freeze-out) shows the error listing them, not a number', async () => {
    // At 77 K, ρ of P-doped silicon falls, rises and falls again with doping
    // (tests/physics/inverseAmbiguity.test.ts): 0.30–0.42 Ω·cm has three dopings, 2–6 Ω·cm one.
    const table = [
      ['Wafer', 'Rho min', 'Rho max'],
      ['A', 0.3, 0.42],
      ['B', 2, 6],
    ];
    const { port, mapping } = await portWithTable(table);
    await addCertificateCheck(port, await port.selection(), { ...BASE, mapping, dopant: 'phosphorus', temperatureK: 77 });
    const values = port.engineValues();
    for (const column of [LEFT + 3, LEFT + 4]) {
      const shown = valueAt(values, TOP + 1, column);
      expect(shown).toMatchObject({ kind: 'error', code: '#VALUE!' });
      expect((shown as ResultError).message).toMatch(/^3 densities of P give resistivity .* Give doping_min and\/or doping_max/);
    }
    expect(valueAt(values, TOP + 1, LEFT + 6)).toMatchObject({ kind: 'error' }); // pass/fail: no verdict from an ambiguous doping
    expect(numberAt(values, TOP + 2, LEFT + 3) / value('DOPING', 6, 'phosphorus', 77, 'masetti')).toBeCloseTo(1, 12);
    expect(['PASS', 'FAIL']).toContain(valueAt(values, TOP + 2, LEFT + 6));
  });

  it('converts mΩ·cm and mm with documented factors', async () => {
    const table = [
      ['Wafer', 'Type', 'Rho min (mOhm-cm)', 'Rho max (mOhm-cm)', 'Rho centre (mOhm-cm)', 'THK (mm)'],
      ['Z1', 'N', 2, 4, 3, 0.525],
    ];
    const { port, mapping } = await portWithTable(table);
    const plan = await addCertificateCheck(port, await port.selection(), {
      ...BASE,
      mapping,
      neededMin: 1e18,
      neededMax: 1e20,
      resistivityUnit: 'mohm-cm',
      thicknessUnit: 'mm',
    });
    const values = port.engineValues();
    const first = LEFT + table[0].length;
    expect(plan.writes[0].cells[1][1]).toMatch(/\(E3\*0\.001,/);
    expect(numberAt(values, TOP + 1, first + 1) / value('DOPING', 0.004, 'donor')).toBeCloseTo(1, 12);
    expect(numberAt(values, TOP + 1, first + 5) / value('SHEETRES', 0.003, 525)).toBeCloseTo(1, 12);
    expect(valueAt(values, TOP + 1, first + 6)).toBe('PASS');
  });

  it('averages separate edge columns before the radial variation, and applies the limit', async () => {
    const table = [
      ['Wafer', 'Type', 'Rho min', 'Rho max', 'Edge 1', 'Centre', 'Edge 2'],
      ['Z1', 'P', 8, 12, 10.4, 10, 10.8],
      ['Z2', 'P', 8, 12, 11.5, 10, 11.9],
    ];
    const { port, mapping } = await portWithTable(table);
    expect(mapping).toEqual(['wafer', 'type', 'rho-min', 'rho-max', 'rho-edge', 'rho-center', 'rho-edge']);
    const plan = await addCertificateCheck(port, await port.selection(), { ...BASE, mapping, radialLimitPercent: 10 });
    const first = LEFT + table[0].length;
    const rvColumn = plan.headers.indexOf('Radial variation (%)');
    expect(plan.writes[0].cells[1][rvColumn]).toBe(`=${qualifiedName(findFunction('RADIALVARIATION')!)}(G3,AVERAGE(F3,H3))`);
    expect(plan.writes[1].cells.at(-1)).toEqual(['Max |radial variation| (%)', 10]);
    const values = port.engineValues();
    const rv1 = value('RADIALVARIATION', 10, [[10.4, 10.8]]);
    const rv2 = value('RADIALVARIATION', 10, [[11.5, 11.9]]);
    expect(numberAt(values, TOP + 1, first + rvColumn)).toBeCloseTo(rv1, 12);
    expect(numberAt(values, TOP + 2, first + rvColumn)).toBeCloseTo(rv2, 12);
    expect([Math.abs(rv1) <= 10, Math.abs(rv2) <= 10]).toEqual([true, false]);
    const passColumn = first + plan.headers.indexOf('Pass/fail');
    expect([valueAt(values, TOP + 1, passColumn), valueAt(values, TOP + 2, passColumn)]).toEqual(['PASS', 'FAIL']);
  });

  it('the other window rule: the needed window must lie inside the certified doping', async () => {
    const { port, mapping } = await portWithTable();
    const plan = await addCertificateCheck(port, await port.selection(), {
      ...BASE,
      mapping,
      windowRule: 'needed-inside-certified',
      neededMin: 1.2e15,
      neededMax: 1.5e15,
    });
    expect(plan.headers[3]).toBe('Needed window inside certified doping');
    const values = port.engineValues();
    CERTIFICATE_ROWS.forEach((row, index) => {
      const code = row[2] === 'P' ? 'acceptor' : row[2] === 'N' ? 'donor' : String(row[2]);
      const low = value('DOPING', row[4] as number, code);
      const high = value('DOPING', row[3] as number, code);
      expect(valueAt(values, TOP + 1 + index, FIRST_NEW + 3)).toBe(low <= 1.2e15 && high >= 1.5e15 ? 'yes' : 'no');
    });
  });
});

describe('refusals and warnings', () => {
  async function attempt(change: Partial<CertificateSettings>, table = CERTIFICATE_TABLE): Promise<unknown> {
    const { port, mapping } = await portWithTable(table);
    return addCertificateCheck(port, await port.selection(), { ...BASE, mapping, ...change }).catch((error: unknown) => error);
  }

  it.each([
    [{ neededMin: 3e15 }, /Needed doping min \(3000000000000000\) is above needed doping max/],
    [{ neededMin: 0 }, /Needed doping min must be a number above 0/],
    [{ neededMax: Number.NaN }, /Needed doping max must be a number/],
    [{ temperatureK: 5 }, /Temperature must be 20–1000 K; got 5/],
    [{ model: 'nobody' }, /Unknown model 'nobody': allowed are f723-anchored, masetti/],
    [{ material: 'Xx' }, /Unknown material 'Xx': allowed are Si/],
    [{ thicknessUnit: null }, /thickness column 'Thickness \(um\)' names no unit the check knows/],
    [{ resistivityUnit: '' }, /Choose the unit of the resistivity columns/],
    [{ radialLimitPercent: -1 }, /radial variation limit must be a number ≥ 0/],
  ] as const)('%j', async (change, message) => {
    const error = await attempt(change);
    expect(error).toBeInstanceOf(PaneRefusal);
    expect((error as Error).message).toMatch(message);
  });

  it('refuses without ρ min / ρ max columns, and with a role given twice', async () => {
    const { port, mapping } = await portWithTable();
    const block = await port.selection();
    const noMin = mapping.map((role) => (role === 'rho-min' ? 'ignore' : role));
    await expect(addCertificateCheck(port, block, { ...BASE, mapping: noMin })).rejects.toThrow(/No column is mapped to 'ρ min'/);
    const twice = mapping.map((role) => (role === 'lot' ? 'wafer' : role));
    await expect(addCertificateCheck(port, block, { ...BASE, mapping: twice })).rejects.toThrow(
      /'Wafer' is given to 2 columns \(Lot, Wafer\)/,
    );
  });

  it('refuses a one-row selection and a selection with no numbers in ρ min/max', async () => {
    const port = new MemoryPort();
    port.put(0, 0, [['Rho min', 'Rho max']]);
    port.select(0, 0, 1, 2);
    await expect(readCertificateTable(port)).rejects.toThrow(/header row included: the selection Sheet1!A1:B1 has only one row/);
    port.select(0, 0, 1_048_576, 2); // whole columns A:B
    await expect(readCertificateTable(port)).rejects.toThrow(
      /Sheet1!A1:B1048576 is 1048576 rows × 2 columns; select just the certificate table \(at most 5000 rows/,
    );
    const error = await attempt({}, [
      ['Rho min', 'Rho max'],
      ['8-12', 'n/a'],
    ]);
    expect((error as Error).message).toMatch(/No row of Sheet1!B2:C3 has positive numbers in both the ρ min and ρ max columns/);
  });

  it('leaves out empty rows at the end of a generous selection, and says so', async () => {
    const port = new MemoryPort();
    port.put(TOP, LEFT, CERTIFICATE_TABLE);
    port.select(TOP, LEFT, CERTIFICATE_TABLE.length + 20, CERTIFICATE_TABLE[0].length);
    const { table, guess } = await readCertificateTable(port);
    expect(table.block.rowCount).toBe(CERTIFICATE_TABLE.length);
    expect(guess.notes[0]).toBe('The empty rows at the end of the selection (20) are left out.');
    const plan = await addCertificateCheck(port, table.block, { ...BASE, mapping: guess.mapping });
    expect(plan.columnsBlock.rowCount).toBe(CERTIFICATE_TABLE.length);
    port.put(30, 0, [['Rho min', 'Rho max']]);
    port.select(30, 0, 5, 2);
    await expect(readCertificateTable(port)).rejects.toThrow('The selection Sheet1!A31:B35 has a header row but no wafer rows below it.');
  });

  it('warns about unknown types and swapped windows, naming the rows, and still writes', async () => {
    const table = [
      ['Wafer', 'Type', 'Rho min', 'Rho max'],
      ['A', 'P', 8, 12],
      ['B', 'X-type', 8, 12],
      ['C', 'N', 3, 1],
    ];
    const { port, mapping } = await portWithTable(table);
    const plan = await addCertificateCheck(port, await port.selection(), { ...BASE, mapping });
    expect(plan.warnings).toEqual([
      'Rows 5: ρ min is above ρ max; the check uses the lower and higher of the two.',
      `Type not known as a dopant in row 4 ('X-type'); those rows show an error. Allowed (any case): ${typedDopantCodes(SILICON).join(', ')}, n-type, p-type or element names.`,
    ]);
    const values = port.engineValues();
    const shown = valueAt(values, TOP + 2, LEFT + 4 + 1);
    expect(shown).toMatchObject({ kind: 'error', message: expect.stringMatching(/unknown dopant 'X-type'/) });
  });
});
