/**
 * The sweep's plan and insertion: quantities come from the catalog, the table
 * holds axis cells, units in the headers and ONE spilled formula that refers
 * to them, the chart plan has log axes where the values span decades, and the
 * formulas, evaluated by the headless engine, give what the catalog computes.
 */
import { CATALOG, evaluate, findFunction } from '../../../src/catalog';
import { createEnginePort } from '../../../src/taskpane/enginePort';
import { insertSweep, SweepRefusal } from '../../../src/taskpane/sweep/insert';
import { planSweep } from '../../../src/taskpane/sweep/plan';
import { previewSweep } from '../../../src/taskpane/sweep/preview';
import { availableQuantities, QUANTITY_ENTRIES, settingParameters } from '../../../src/taskpane/sweep/quantities';
import { resolveSweep, type SweepForm } from '../../../src/taskpane/sweep/settings';
import type { SweepLayoutInput } from '../../../src/taskpane/sweep/plan';
import { BASE_FORM, at, quantities, resolvedFrom } from './form';

function resolved(form: Partial<SweepForm>): SweepLayoutInput {
  return resolvedFrom(BASE_FORM, form);
}

describe('availableQuantities', () => {
  it('lists the curated functions the catalog has, with the catalog’s labels and units', () => {
    const ids = quantities.map((q) => q.id);
    const expected = QUANTITY_ENTRIES.map((e) => e.name).filter((name) => CATALOG.some((f) => f.name === name));
    expect(ids).toEqual(expected);
    const rho = quantities.find((q) => q.id === 'RESISTIVITY')!;
    expect(rho.label).toBe(findFunction('RESISTIVITY')!.result.description);
    expect(rho.unit).toBe('Ω·cm');
    expect(quantities.find((q) => q.id === 'INTRINSIC')).toMatchObject({ hasDoping: false, hasTemperature: true });
  });

  it('leaves out a listed function the catalog lacks', () => {
    const without = CATALOG.filter((f) => f.name !== 'TCR' && f.name !== 'MOBILITY');
    expect(availableQuantities(without).map((q) => q.id)).not.toEqual(expect.arrayContaining(['TCR']));
    expect(availableQuantities(without).map((q) => q.id)).not.toContain('MOBILITY');
  });

  it('sweeps SHEETRES over doping through RESISTIVITY, asking only for the thickness besides', () => {
    const sheet = quantities.find((q) => q.id === 'SHEETRES')!;
    expect(sheet.inner.name).toBe('RESISTIVITY');
    expect(
      settingParameters(sheet)
        .filter((s) => s.owner === 'outer')
        .map((s) => s.spec.name),
    ).toEqual(['thickness_um']);
  });
});

describe('resolveSweep', () => {
  it('lists every problem with what is allowed', () => {
    const result = resolveSweep({ ...BASE_FORM, dopingFrom: '0', quantityId: 'SHEETRES' }, quantities);
    expect(result.ok).toBe(false);
    if (result.ok) return;
    expect(result.problems).toEqual([expect.stringMatching(/above 0 cm⁻³/), expect.stringMatching(/Enter thickness_um \(µm\)/)]);
    expect(result.invalid).toEqual(['dopingFrom', 'dopingTo', 'pointsPerDecade', 'outer:thickness_um']);
  });

  it('refuses hex, binary and octal text such as "0x10" instead of reading it as 16', () => {
    const fixed = resolveSweep({ ...BASE_FORM, dopingSwept: false, temperatureSwept: true, fixedDoping: '0x10' }, quantities);
    expect(fixed.ok).toBe(false);
    if (!fixed.ok) {
      expect(fixed.problems).toEqual(['Fixed doping must be a number above 0 in cm⁻³, e.g. 1e15 (got "0x10").']);
      expect(fixed.invalid).toEqual(['fixedDoping']);
    }
    const axis = resolveSweep({ ...BASE_FORM, dopingFrom: '0x10' }, quantities);
    expect(axis.ok).toBe(false);
    if (!axis.ok) expect(axis.problems).toEqual(['Doping from and to must be numbers in cm⁻³, e.g. 1e14 and 1e19.']);
    const setting = resolveSweep(
      { ...BASE_FORM, quantityId: 'SHEETRES', values: { 'inner:dopant': 'B', 'outer:thickness_um': '0b11' } },
      quantities,
    );
    expect(setting.ok).toBe(false);
    if (!setting.ok) {
      expect(setting.problems).toEqual(['thickness_um must be a number in µm (got "0b11").']);
      expect(setting.invalid).toEqual(['outer:thickness_um']);
    }
    const temperature = resolveSweep({ ...BASE_FORM, fixedTemperature: '0o17' }, quantities);
    expect(temperature.ok).toBe(false);
    if (!temperature.ok)
      expect(temperature.problems).toEqual(['Fixed temperature must be a number above absolute zero in K (got "0o17").']);
  });

  it('needs an axis', () => {
    const result = resolveSweep({ ...BASE_FORM, dopingSwept: false }, quantities);
    expect(result.ok).toBe(false);
    if (!result.ok) expect(result.problems).toEqual(['Sweep doping, temperature or both.']);
  });
});

describe('planSweep', () => {
  it('doping only: title, headers with units, doping cells, one formula referring to them, log-log chart', () => {
    const plan = planSweep(resolved({}), at(1, 1));
    expect(plan.footprint).toEqual(at(1, 1, 7, 2));
    expect(plan.formulaCell).toEqual(at(3, 2));
    expect(plan.formula).toBe('=DRIFT.RESISTIVITY(B4:B8,"B",300)');
    expect(plan.writes[0].cells[1]).toEqual(['Doping (cm⁻³)', 'Resistivity ρ (Ω·cm)']);
    expect(plan.writes.filter((w) => w.cells.flat().some((c) => typeof c === 'string' && c.startsWith('=')))).toHaveLength(1);
    expect(plan.chart).toMatchObject({
      xLogarithmic: true,
      yLogarithmic: true,
      xTitle: 'Doping (cm⁻³)',
      yTitle: 'Resistivity ρ (Ω·cm)',
      anchor: at(1, 4),
    });
    expect(plan.chart.series).toEqual([{ name: 'Resistivity ρ', x: at(3, 1, 5, 1), y: at(3, 2, 5, 1) }]);
  });

  it('both axes: doping down, kelvin across (°C shown above), the formula spills a table, one series per temperature', () => {
    const plan = planSweep(
      resolved({ temperatureSwept: true, temperatureUnit: '°C', temperatureFrom: '0', temperatureTo: '100', temperatureStep: '50' }),
      at(0, 0),
    );
    expect(plan.writes[0].cells[1]).toEqual(['Temperature (°C) →', 0, 50, 100]);
    expect(plan.writes[0].cells[2]).toEqual(['Doping (cm⁻³) ↓ · Temperature (K) →', 273.15, 323.15, 373.15]);
    expect(plan.formula).toBe('=DRIFT.RESISTIVITY(A4:A8,"B",B3:D3)');
    expect(plan.results).toEqual(at(3, 1, 5, 3));
    expect(plan.chart.series.map((s) => s.name)).toEqual(['273.15 K', '323.15 K', '373.15 K']);
  });

  it('temperature only: INTRINSIC against K on a linear x axis, log y', () => {
    const plan = planSweep(resolved({ quantityId: 'INTRINSIC', dopingSwept: false, temperatureSwept: true, values: {} }), at(0, 0));
    expect(plan.formula).toBe('=DRIFT.INTRINSIC(A3:A5)');
    expect(plan.chart).toMatchObject({ xLogarithmic: false, yLogarithmic: true, xTitle: 'Temperature (K)' });
  });

  it('leaves optional arguments blank between given ones, so the function’s default applies', () => {
    const plan = planSweep(resolved({ values: { 'inner:dopant': 'phosphorus', 'inner:material': 'Si' } }), at(0, 0));
    expect(plan.formula).toBe('=DRIFT.RESISTIVITY(A3:A7,"phosphorus",300,,"Si")');
  });

  it('SHEETRES nests RESISTIVITY so one formula still does the whole column', () => {
    const plan = planSweep(resolved({ quantityId: 'SHEETRES', values: { 'inner:dopant': 'B', 'outer:thickness_um': '2' } }), at(0, 0));
    expect(plan.formula).toBe('=DRIFT.SHEETRES(DRIFT.RESISTIVITY(A3:A7,"B",300),2)');
    expect(plan.writes[0].cells[1][1]).toBe('Sheet resistance Rs (Ω/sq)');
  });
});

describe('insertSweep on the engine workbook', () => {
  /** The catalog's values for the same call (Node), to compare with the engine's cells. */
  function catalogValues(input: SweepLayoutInput): unknown[][] {
    return previewSweep(input).grid;
  }

  it.each([
    ['RESISTIVITY over doping', {}],
    [
      'RESISTIVITY over doping × °C',
      { temperatureSwept: true, temperatureUnit: '°C' as const, temperatureFrom: '0', temperatureTo: '100', temperatureStep: '50' },
    ],
    ['MOBILITY of minority electrons', { quantityId: 'MOBILITY', values: { 'inner:dopant': 'B', 'inner:carrier': 'electron' } }],
    ['SHEETRES of a 2 µm layer', { quantityId: 'SHEETRES', values: { 'inner:dopant': 'phosphorus', 'outer:thickness_um': '2' } }],
    ['INTRINSIC over temperature', { quantityId: 'INTRINSIC', dopingSwept: false, temperatureSwept: true, values: {} }],
  ])('%s: the spilled formula evaluates to the catalog’s numbers', async (_name, form) => {
    const input = resolved(form);
    const port = createEnginePort();
    port.select(at(2, 1));
    const { plan, chartError } = await insertSweep(port, input);
    expect(chartError).toBeNull();
    const { values, formulas } = await port.read(plan.results);
    const expected = catalogValues(input);
    expect(values).toHaveLength(expected.length);
    values.forEach((row, r) => row.forEach((v, c) => expect(v).toBeCloseTo(expected[r][c] as number, 10)));
    // Only the anchor holds a formula; the rest is its spill.
    expect(formulas.flat().filter((f) => f !== null)).toEqual([plan.formula]);
    expect(port.charts).toEqual([plan.chart]);
  });

  it('the cells equal a direct catalog call with the same doping column (independent of the preview code)', async () => {
    const port = createEnginePort();
    const { plan } = await insertSweep(port, resolved({ values: { 'inner:dopant': 'phosphorus' } }));
    const { values } = await port.read(plan.results);
    const direct = evaluate(findFunction('RESISTIVITY')!, [
      [[1e14], [316227766017000], [1e15], [3162277660170000], [1e16]],
      'phosphorus',
      300,
    ]);
    expect(values).toEqual(direct);
  });

  it('keeps the table when the workbook cannot make the chart, and says why', async () => {
    const port = createEnginePort();
    const refusing = { ...port, addChart: async () => Promise.reject(new Error('An XY chart with log axes needs ExcelApi 1.7')) };
    const { plan, chartError } = await insertSweep(refusing, resolved({}));
    expect(chartError).toMatch(/needs ExcelApi 1\.7/);
    expect((await port.read(plan.formulaCell)).formulas).toEqual([[plan.formula]]);
  });

  it.each(quantities.map((q) => [q.id, q] as const))(
    '%s with its defaults (required numbers set to 1): engine cells equal the catalog',
    async (_id, quantity) => {
      const values: Record<string, string> = {};
      for (const { owner, spec } of settingParameters(quantity)) {
        if (spec.optional) continue;
        values[`${owner}:${spec.name}`] = spec.choices?.()[0] ?? '1';
      }
      const input = resolved({ quantityId: quantity.id, dopingSwept: quantity.hasDoping, temperatureSwept: !quantity.hasDoping, values });
      const port = createEnginePort();
      const { plan } = await insertSweep(port, input);
      const { values: shown } = await port.read(plan.results);
      const expected = previewSweep(input).grid;
      expect(shown.flat().some((v) => typeof v === 'number')).toBe(true);
      shown.forEach((row, r) =>
        row.forEach((v, c) =>
          typeof expected[r][c] === 'number'
            ? expect(v as number).toBeCloseTo(expected[r][c] as number, 10)
            : expect(v).toEqual({ error: (expected[r][c] as { code: string }).code }),
        ),
      );
      expect(plan.chart.yLogarithmic).toBe(QUANTITY_ENTRIES.find((e) => e.name === quantity.id)!.logValues);
    },
  );

  it('refuses to overwrite, naming the block and the cells in the way, and writes nothing', async () => {
    const port = createEnginePort({ Sheet1: [[], [], [], [], [null, null, 'mine']] });
    port.select(at(0, 1));
    await expect(insertSweep(port, resolved({}))).rejects.toThrow(SweepRefusal);
    await expect(insertSweep(port, resolved({}))).rejects.toThrow(/Sheet1!B1:C7 \(7 rows × 2 columns\), but C5 is not empty/);
    const { values } = await port.read(at(0, 1, 7, 2));
    expect(values.flat().filter((v) => v !== null)).toEqual(['mine']);
    expect(port.charts).toEqual([]);
  });
});
