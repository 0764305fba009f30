/**
 * The certificate check's optional model-spread columns: DRIFT.DOPINGSPREAD at
 * ρmax and at ρmin beside the doping window, one spilled formula per end and
 * row. Expected numbers come from calling the catalog directly (evaluate()),
 * so these tests check the written formulas and the layout, not the physics
 * (tests of modelSpread.ts do that).
 */
import { evaluate, findFunction, isFailure, qualifiedName, type ArgumentInput } from '../../../src/catalog';
import { planCertificateCheck, type CertificateSettings } from '../../../src/taskpane/certificate/plan';
import { addCertificateCheck } from '../../../src/taskpane/certificate/session';
import { PaneRefusal } from '../../../src/taskpane/sheetPlan';
import type { ResultElement, ResultError } from '../../../src/engine/engine';
import { value } from '../../catalog/support/call';
import { valueAt } from '../support/memoryPort';
import { dopingOverModels } from './dopingOverModels';
import { CERTIFICATE_ROWS, CHECK_HEADERS, expectedDopantOfType } from './fixture';
import { FIRST_NEW, LEFT, TOP, portWithTable } from './tablePort';

const DOPINGSPREAD = qualifiedName(findFunction('DOPINGSPREAD')!);

const BASE: Omit<CertificateSettings, 'mapping'> = {
  neededMin: 1e15,
  neededMax: 2e15,
  windowRule: 'certified-inside-needed',
  typeMeansConductivity: true,
  dopant: 'B',
  resistivityUnit: 'ohm-cm',
  thicknessUnit: 'um',
  temperatureK: 296.15,
  model: '',
  material: '',
  radialLimitPercent: null,
};

/** The six headers the option adds after the window check, in order. */
const SPREAD_HEADERS = ['ρmax', 'ρmin'].flatMap((end) => [
  `Doping at ${end} over models: lowest (cm⁻³)`,
  `Doping at ${end} over models: highest (cm⁻³)`,
  `Doping at ${end} over models: relative spread (highest/lowest − 1)`,
]);
/** Offsets (from the first new column) of the two spilled formulas with the fixture fully mapped. */
const AT_MAX = 4;
const AT_MIN = 7;

/** DRIFT.DOPINGSPREAD called directly: [lowest, highest, relative spread]. */
function spread(...args: ArgumentInput[]): [number, number, number] {
  const row = evaluate(findFunction('DOPINGSPREAD')!, args)[0];
  if (!row.every((cell): cell is number => typeof cell === 'number')) throw new Error(`DOPINGSPREAD gave ${JSON.stringify(row)}`);
  return row as [number, number, number];
}

function rowOf(values: Map<string, ResultElement[][]>, sheetRow: number, from: number, count: number): ResultElement[] {
  return Array.from({ length: count }, (_, k) => valueAt(values, sheetRow, from + k));
}

function expectClose(shown: readonly ResultElement[], expected: readonly number[]): void {
  expect(shown.every((cell) => typeof cell === 'number')).toBe(true);
  (shown as number[]).forEach((cell, k) =>
    k < 2 ? expect(cell / expected[k]).toBeCloseTo(1, 12) : expect(cell).toBeCloseTo(expected[k], 12),
  );
}

describe('model spread columns in the certificate check', () => {
  it('are off by default: without the option, or with it false, the check is exactly as before', async () => {
    const { port, mapping } = await portWithTable();
    const table = { block: await port.selection(), contents: await port.read(await port.selection()) };
    const absent = planCertificateCheck(table, { ...BASE, mapping });
    const off = planCertificateCheck(table, { ...BASE, mapping, modelSpread: false });
    expect(absent.headers).toEqual(CHECK_HEADERS);
    expect(off).toEqual(absent);
    expect(JSON.stringify(absent.writes)).not.toContain(DOPINGSPREAD);
  });

  it('adds three columns per end of the window after the window check, one spilled DOPINGSPREAD per end and row', async () => {
    const { port, mapping } = await portWithTable();
    const plan = await addCertificateCheck(port, await port.selection(), { ...BASE, mapping, modelSpread: true });
    expect(plan.headers).toEqual([...CHECK_HEADERS.slice(0, 4), ...SPREAD_HEADERS, ...CHECK_HEADERS.slice(4)]);
    expect(plan.summary).toBe(
      'Checks 4 wafer rows: 14 new columns in Sheet1!L2:Y6, parameters in AA2:AB5 (change them there to re-check).',
    );
    const firstRow = plan.writes[0].cells[1];
    // Same ρ cell, dopant cell and temperature cell as the doping columns beside it; spill cells left empty.
    expect(firstRow.slice(1, 3)).toEqual(['=DRIFT.DOPING(F3,L3,$AB$5)', '=DRIFT.DOPING(E3,L3,$AB$5)']);
    expect(firstRow.slice(AT_MAX, AT_MIN + 3)).toEqual([
      `=${DOPINGSPREAD}(F3,L3,$AB$5)`,
      null,
      null,
      `=${DOPINGSPREAD}(E3,L3,$AB$5)`,
      null,
      null,
    ]);
    // The pass/fail formula reads the window check and the readings check only, never the spread.
    expect(firstRow.at(-1)).toBe('=IF(AND(O3="yes",V3<>"no"),"PASS","FAIL")');

    const values = port.engineValues();
    CERTIFICATE_ROWS.forEach((row, index) => {
      const sheetRow = TOP + 1 + index;
      const code = expectedDopantOfType(row[2]);
      const [rhoMin, rhoMax] = [row[3], row[4]] as number[];
      const atMax = spread(rhoMax, code, 296.15);
      const atMin = spread(rhoMin, code, 296.15);
      expectClose(rowOf(values, sheetRow, FIRST_NEW + AT_MAX, 3), atMax);
      expectClose(rowOf(values, sheetRow, FIRST_NEW + AT_MIN, 3), atMin);
      // And, without DOPINGSPREAD: the lowest and highest of DRIFT.DOPING under each model by name.
      for (const [offset, rho] of [
        [AT_MAX, rhoMax],
        [AT_MIN, rhoMin],
      ] as const) {
        const { lowest, highest, relative } = dopingOverModels(rho, code, 296.15);
        expectClose(rowOf(values, sheetRow, FIRST_NEW + offset, 3), [lowest, highest, relative]);
      }
      // The default model (f723-anchored) is one of the models the spread covers, so its doping lies inside.
      for (const [end, range] of [
        [1, atMax],
        [2, atMin],
      ] as const) {
        const doping = valueAt(values, sheetRow, FIRST_NEW + end) as number;
        expect(doping).toBeGreaterThanOrEqual(range[0] * (1 - 1e-12));
        expect(doping).toBeLessThanOrEqual(range[1] * (1 + 1e-12));
      }
    });
  });

  it('show the spread only: the verdicts are those of the check without it, even where the spread crosses the needed window', async () => {
    // Wafer W01 (ρmax 12 Ω·cm, acceptor): the default model's doping is above 1.08e15, the lowest over the models below it.
    const neededMin = 1.08e15;
    const [lowest] = spread(12, 'acceptor', 296.15);
    expect(lowest).toBeLessThan(neededMin);
    expect(value('DOPING', 12, 'acceptor', 296.15)).toBeGreaterThan(neededMin);
    const verdicts = async (modelSpread: boolean): Promise<ResultElement[]> => {
      const { port, mapping } = await portWithTable();
      const plan = await addCertificateCheck(port, await port.selection(), { ...BASE, mapping, neededMin, modelSpread });
      const values = port.engineValues();
      return CERTIFICATE_ROWS.map((_, index) => valueAt(values, TOP + 1 + index, plan.passFailBlock.column));
    };
    const without = await verdicts(false);
    expect(without[0]).toBe('PASS');
    expect(await verdicts(true)).toEqual(without);
  });

  it('formats the densities like the doping columns and the relative spread as a percentage', async () => {
    const { port, mapping } = await portWithTable();
    await addCertificateCheck(port, await port.selection(), { ...BASE, mapping, modelSpread: true });
    const formatOf = (offset: number) =>
      port.styles.find((style) => style.block.column === FIRST_NEW + offset && style.numberFormat !== undefined)?.numberFormat;
    expect([AT_MAX, AT_MAX + 1, AT_MAX + 2, AT_MIN, AT_MIN + 1, AT_MIN + 2].map(formatOf)).toEqual([
      '0.00E+00',
      '0.00E+00',
      '0.0%',
      '0.00E+00',
      '0.00E+00',
      '0.0%',
    ]);
  });

  it('with readings measured at another temperature, is still the certificate’s ρ at the certificate’s temperature', async () => {
    const { port, mapping } = await portWithTable();
    const plan = await addCertificateCheck(port, await port.selection(), {
      ...BASE,
      mapping,
      modelSpread: true,
      measuredAt: { value: 25, unit: 'C' },
    });
    const labels = plan.writes[1].cells.map((row) => row[0]);
    const temperatureCell = `$${'AF'}$${TOP + 1 + labels.indexOf('Temperature (K)')}`;
    expect(plan.parameterBlock.column).toBe(30); // AE: 18 new columns (4 corrected readings) and one empty column
    expect(labels).toContain('Readings measured at (K)');
    expect(plan.writes[0].cells[1][AT_MAX]).toBe(`=${DOPINGSPREAD}(F3,L3,${temperatureCell})`);
    const values = port.engineValues();
    const [row] = CERTIFICATE_ROWS;
    expectClose(rowOf(values, TOP + 1, FIRST_NEW + AT_MIN, 3), spread(row[3] as number, expectedDopantOfType(row[2]), 296.15));
  });

  it('passes the chosen material and the resistivity unit’s factor, not the chosen model (the spread covers every model)', async () => {
    const table = [
      ['Wafer', 'Type', 'Rho min (mOhm-cm)', 'Rho max (mOhm-cm)'],
      ['Z1', 'N', 2, 4],
    ];
    const { port, mapping } = await portWithTable(table);
    const plan = await addCertificateCheck(port, await port.selection(), {
      ...BASE,
      mapping,
      modelSpread: true,
      model: 'masetti',
      material: 'Si',
      neededMin: 1e18,
      neededMax: 1e20,
      resistivityUnit: 'mohm-cm',
    });
    // New columns F:O (dopant code first), one empty column, parameters Q2:R7: title, min, max, temperature, model, material.
    const first = LEFT + table[0].length;
    const cellsOfRow = plan.writes[0].cells[1];
    const valueColumn = plan.parameterBlock.column + 1;
    const materialCell = `$${String.fromCharCode(65 + valueColumn)}$${TOP + 1 + 5}`;
    const temperatureCell = `$${String.fromCharCode(65 + valueColumn)}$${TOP + 1 + 3}`;
    expect(plan.writes[1].cells[5]).toEqual(['Material', 'Si']);
    expect(cellsOfRow[AT_MAX]).toBe(`=${DOPINGSPREAD}(E3*0.001,F3,${temperatureCell},${materialCell})`);
    const values = port.engineValues();
    expectClose(rowOf(values, TOP + 1, first + AT_MAX, 3), spread(0.004, 'donor', 296.15, 'Si'));
    expectClose(rowOf(values, TOP + 1, first + AT_MIN, 3), spread(0.002, 'donor', 296.15, 'Si'));
  });

  it('in a material with one resistivity model, shows that model’s doping twice and a spread of 0', async () => {
    // DRIFT.DOPINGSPREAD's help: "another material has one model, so its spread is 0".
    const table = [
      ['Wafer', 'Rho min', 'Rho max'],
      ['G1', 1, 3],
    ];
    const { port, mapping } = await portWithTable(table);
    await addCertificateCheck(port, await port.selection(), {
      ...BASE,
      mapping,
      dopant: 'donor',
      material: 'GaAs',
      neededMin: 1e14,
      neededMax: 1e16,
      modelSpread: true,
    });
    const values = port.engineValues();
    const first = LEFT + table[0].length;
    for (const [offset, rho] of [
      [3, 3],
      [6, 1],
    ] as const) {
      const only = value('DOPING', rho, 'donor', 296.15, undefined, 'GaAs');
      expectClose(rowOf(values, TOP + 1, first + offset, 3), [only, only, 0]);
    }
  });

  it('a row whose DOPINGSPREAD is an error (77 K freeze-out) shows the error with its message in all three cells', async () => {
    // At 77 K, ρ of P-doped silicon falls, rises and falls again with doping
    // (tests/physics/inverseAmbiguity.test.ts): 0.30–0.42 Ω·cm has three dopings.
    const table = [
      ['Wafer', 'Rho min', 'Rho max'],
      ['A', 0.3, 0.42],
    ];
    const { port, mapping } = await portWithTable(table);
    await addCertificateCheck(port, await port.selection(), {
      ...BASE,
      mapping,
      dopant: 'phosphorus',
      temperatureK: 77,
      modelSpread: true,
    });
    const values = port.engineValues();
    const first = LEFT + table[0].length;
    const direct = evaluate(findFunction('DOPINGSPREAD')!, [0.42, 'phosphorus', 77])[0][0];
    expect(isFailure(direct)).toBe(true);
    // No dopant column: spread columns start after doping at ρmax, at ρmin and the window check.
    for (const shown of rowOf(values, TOP + 1, first + 3, 3)) {
      expect(shown).toMatchObject({ kind: 'error', code: '#VALUE!' });
      expect((shown as ResultError).message).toBe(isFailure(direct) ? direct.message : '');
      expect((shown as ResultError).message).toMatch(/^model [a-z0-9-]+: 3 densities of P give resistivity/);
    }
  });

  it('never writes over the user’s cells: a filled cell where only the spread columns go refuses the check', async () => {
    // X4 is beyond the plain check's columns (L:S) and parameters (U:V), inside the columns with the spread (L:Y).
    const plain = await portWithTable();
    plain.port.put(TOP + 2, FIRST_NEW + 12, [['note']]);
    await expect(addCertificateCheck(plain.port, await plain.port.selection(), { ...BASE, mapping: plain.mapping })).resolves.toBeDefined();

    const { port, mapping } = await portWithTable();
    port.put(TOP + 2, FIRST_NEW + 12, [['note']]);
    await expect(addCertificateCheck(port, await port.selection(), { ...BASE, mapping, modelSpread: true })).rejects.toThrow(
      new PaneRefusal(
        'Nothing was written: Sheet1!L2:Y6 must be empty, but X4 holds something. Clear that block or choose another place, then try again.',
      ),
    );
    expect(port.writes).toEqual([]);
    expect(port.highlights).toEqual([]);
    expect(port.styles).toEqual([]);
  });

  it('refuses when a cell the spread spills into is filled, though the plan writes no formula there', async () => {
    const { port, mapping } = await portWithTable();
    port.put(TOP + 4, FIRST_NEW + AT_MIN + 2, [[0]]);
    await expect(addCertificateCheck(port, await port.selection(), { ...BASE, mapping, modelSpread: true })).rejects.toThrow(
      /^Nothing was written: Sheet1!L2:Y6 must be empty, but U6 holds something\./,
    );
    expect(port.writes).toEqual([]);
  });
});
