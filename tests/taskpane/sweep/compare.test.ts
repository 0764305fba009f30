/**
 * The sweep's "compare models": which quantities offer it, the models it
 * draws (DRIFT.MODELCODES' list for the chosen material and dopant), the
 * layout it inserts (a header row of codes above ONE spilled formula whose
 * model argument is the DRIFT.MODELCODES call), and, through the headless
 * engine, that every column equals the single-model call of its code.
 */
import { evaluate, findFunction } from '../../../src/catalog';
import { applicableModelCodes } from '../../../src/catalog/modelCodes';
import { createEnginePort } from '../../../src/taskpane/enginePort';
import { compareModels, modelSettingOf } from '../../../src/taskpane/sweep/compare';
import { insertSweep, SweepRefusal } from '../../../src/taskpane/sweep/insert';
import { planSweep, type SweepLayoutInput } from '../../../src/taskpane/sweep/plan';
import { describePreview } from '../../../src/taskpane/sweep/plot';
import { modelBand, previewSweep } from '../../../src/taskpane/sweep/preview';
import { resolveSweep, type SweepForm } from '../../../src/taskpane/sweep/settings';
import { BASE_FORM, at, quantities, resolvedFrom } from './form';

const quantity = (id: string) => quantities.find((q) => q.id === id)!;
/** The base sweep with compare models on, in 25 K steps. */
const BASE: SweepForm = { ...BASE_FORM, temperatureStep: '25', compareModels: true };

function resolved(form: Partial<SweepForm>): SweepLayoutInput {
  return resolvedFrom(BASE, form);
}

describe('which quantities compare models', () => {
  it.each([
    ['RESISTIVITY', 'inner:model', 'resistivity'],
    ['CONDUCTIVITY', 'inner:model', 'resistivity'],
    ['TCR', 'inner:model', 'resistivity'],
    ['SHEETRES', 'inner:model', 'resistivity'],
    ['MOBILITY', 'inner:model', 'mobility'],
    ['DIFFUSIVITY', 'inner:model', 'mobility'],
    ['INTRINSIC', 'inner:model', 'intrinsic'],
    ['NIEFF', 'inner:model', 'bandgap-narrowing'],
  ])('%s: its %s argument takes %s codes', (id, key, modelQuantity) => {
    expect(modelSettingOf(quantity(id))).toMatchObject({ key, modelQuantity });
  });

  it.each(['MAJORITY', 'MINORITY', 'VSAT'])('%s has no model argument, so no comparison', (id) => {
    expect(modelSettingOf(quantity(id))).toBeNull();
    const result = resolveSweep(
      {
        ...BASE,
        quantityId: id,
        values: id === 'VSAT' ? {} : { 'inner:dopant': 'B' },
        dopingSwept: id !== 'VSAT',
        temperatureSwept: id === 'VSAT',
      },
      quantities,
    );
    expect(result).toEqual({
      ok: false,
      problems: [expect.stringMatching(/^Compare models needs a model argument/)],
      invalid: ['compareModels'],
    });
  });
});

describe('compareModels', () => {
  it('lists DRIFT.MODELCODES’ codes for the dopant: astm-f723 for B, not for Ga (ASTM F723 covers B, P and As)', () => {
    const boron = compareModels(quantity('RESISTIVITY'), { 'inner:dopant': 'B' });
    expect(boron.ok && boron.comparison.codes).toEqual(applicableModelCodes('resistivity', undefined, 'B'));
    expect(boron.ok && boron.comparison.codes).toContain('astm-f723');
    expect(boron.ok && boron.comparison.call).toBe('DRIFT.MODELCODES("resistivity",,"B")');
    const gallium = compareModels(quantity('RESISTIVITY'), { 'inner:dopant': 'Ga', 'inner:material': 'Si' });
    expect(gallium.ok && gallium.comparison.codes).not.toContain('astm-f723');
    expect(gallium.ok && gallium.comparison.call).toBe('DRIFT.MODELCODES("resistivity","Si","Ga")');
  });

  it('a function without a dopant argument asks for any dopant; the material is passed on', () => {
    const ni = compareModels(quantity('INTRINSIC'), { 'inner:material': 'Ge' });
    expect(ni.ok && ni.comparison).toMatchObject({
      codes: applicableModelCodes('intrinsic', 'Ge'),
      call: 'DRIFT.MODELCODES("intrinsic","Ge")',
    });
  });

  it('says what is wrong when the material has no such model', () => {
    // Apparent bandgap narrowing has parameters for silicon only (DRIFT.MODELCODES help).
    const result = compareModels(quantity('NIEFF'), { 'inner:dopant': 'donor', 'inner:material': 'GaAs' });
    expect(result.ok).toBe(false);
    if (!result.ok) expect(result.problem).toMatch(/^Compare models: .*GaAs/);
  });
});

describe('resolveSweep with compare models', () => {
  it('sweeps one axis only, saying how to fix it', () => {
    const result = resolveSweep({ ...BASE, temperatureSwept: true }, quantities);
    expect(result).toEqual({
      ok: false,
      problems: [expect.stringMatching(/^Compare models sweeps one axis: uncheck Sweep doping or Sweep temperature/)],
      invalid: ['compareModels'],
    });
  });

  it('ignores the single model chosen, and says so in the title words', () => {
    const input = resolved({ values: { 'inner:dopant': 'B', 'inner:model': 'arora' } });
    expect(input.description).toBe('B, 300 K, 6 resistivity models');
    expect(planSweep(input, at(0, 0)).formula).toBe('=DRIFT.RESISTIVITY(A3:A7,"B",300,DRIFT.MODELCODES("resistivity",,"B"))');
  });
});

describe('planSweep comparing models', () => {
  it('doping: header row of codes (DRIFT.MODELCODES, spilled) above one formula spilling doping × models; a series per model, default emphasised', () => {
    const input = resolved({});
    const codes = input.models!.codes;
    const plan = planSweep(input, at(1, 1));
    expect(plan.footprint).toEqual(at(1, 1, 7, 1 + codes.length));
    expect(plan.modelCodes).toEqual({ cell: at(2, 2), formula: '=DRIFT.MODELCODES("resistivity",,"B")' });
    expect(plan.formulaCell).toEqual(at(3, 2));
    expect(plan.formula).toBe('=DRIFT.RESISTIVITY(B4:B8,"B",300,DRIFT.MODELCODES("resistivity",,"B"))');
    expect(plan.results).toEqual(at(3, 2, 5, codes.length));
    expect(plan.writes[0].cells).toEqual([
      ['Resistivity ρ (Ω·cm): DRIFT.RESISTIVITY, B, 300 K, 6 resistivity models'],
      ['Doping (cm⁻³) ↓ · Model →'],
    ]);
    // Two formulas in all: the codes and the values; the rest is their spill.
    expect(plan.writes.flatMap((w) => w.cells.flat()).filter((c) => typeof c === 'string' && c.startsWith('='))).toEqual([
      plan.modelCodes!.formula,
      plan.formula,
    ]);
    expect(plan.chart.series.map((s) => s.name)).toEqual(codes);
    expect(plan.chart.series.map((s) => s.emphasised === true)).toEqual(codes.map((_, j) => j === 0));
    expect(plan.chart.series[2]).toMatchObject({ x: at(3, 1, 5, 1), y: at(3, 4, 5, 1) });
    expect(plan.chart).toMatchObject({
      xLogarithmic: true,
      yLogarithmic: true,
      title: 'Resistivity ρ (Ω·cm), 6 models',
      anchor: at(1, 1 + 1 + codes.length + 1),
    });
  });

  it('temperature in °C: °C and K columns, the formula takes the K column', () => {
    const input = resolved({
      dopingSwept: false,
      temperatureSwept: true,
      temperatureUnit: '°C',
      temperatureFrom: '0',
      temperatureTo: '50',
      temperatureStep: '25',
    });
    const plan = planSweep(input, at(0, 0));
    expect(plan.writes[0].cells).toEqual([
      [expect.any(String), null],
      ['Temperature (°C)', 'Temperature (K) ↓ · Model →'],
    ]);
    expect(plan.writes[1]).toEqual({
      block: at(2, 0, 3, 2),
      cells: [
        [0, 273.15],
        [25, 298.15],
        [50, 323.15],
      ],
    });
    expect(plan.modelCodes!.cell).toEqual(at(1, 2));
    expect(plan.formula).toBe('=DRIFT.RESISTIVITY(1E+15,"B",B3:B5,DRIFT.MODELCODES("resistivity",,"B"))');
    expect(plan.chart).toMatchObject({ xLogarithmic: false, xTitle: 'Temperature (K)' });
    expect(plan.chart.series[0].x).toEqual(at(2, 1, 3, 1));
  });

  it('SHEETRES: the codes go into the nested RESISTIVITY call', () => {
    const plan = planSweep(
      resolved({ quantityId: 'SHEETRES', values: { 'inner:dopant': 'phosphorus', 'outer:thickness_um': '2' } }),
      at(0, 0),
    );
    expect(plan.formula).toBe('=DRIFT.SHEETRES(DRIFT.RESISTIVITY(A3:A7,"phosphorus",300,DRIFT.MODELCODES("resistivity",,"phosphorus")),2)');
  });
});

describe('inserting a comparison into the engine workbook', () => {
  it.each([
    ['RESISTIVITY of B over doping', {}, 'RESISTIVITY'],
    [
      'MOBILITY of minority electrons over doping',
      { quantityId: 'MOBILITY', values: { 'inner:dopant': 'B', 'inner:carrier': 'electron' } },
      'MOBILITY',
    ],
    ['INTRINSIC over temperature', { quantityId: 'INTRINSIC', dopingSwept: false, temperatureSwept: true, values: {} }, 'INTRINSIC'],
  ])('%s: the header shows the codes and every column equals the single-model call of its code', async (_name, form, name) => {
    const input = resolved(form);
    const codes = input.models!.codes;
    const port = createEnginePort();
    port.select(at(1, 1));
    const { plan, chartError } = await insertSweep(port, input);
    expect(chartError).toBeNull();
    expect((await port.read({ ...plan.modelCodes!.cell, columnCount: codes.length })).values).toEqual([codes]);
    const { values, formulas } = await port.read(plan.results);
    expect(formulas.flat().filter((f) => f !== null)).toEqual([plan.formula]);
    // The same call with one literal model code, axis values read back from the cells (the wiring; physics has its own reference tests).
    const axis = await port.read(plan.chart.series[0].x);
    const spec = findFunction(name)!;
    codes.forEach((code, j) => {
      const args = input.call.outerArguments.map((argument) => {
        switch (argument.kind) {
          case 'doping-axis':
          case 'temperature-axis':
            return axis.values as number[][];
          case 'models':
            return code;
          case 'number':
          case 'text':
            return argument.value;
          default:
            return null;
        }
      });
      const single = evaluate(spec, args);
      values.forEach((row, r) => expect(row[j]).toBe(single[r][0]));
    });
    expect(port.charts).toEqual([plan.chart]);
  });

  it('a model that refuses part of the range shows its error there; the others still compute (astm-f723 outside 290–305 K)', async () => {
    const input = resolved({
      dopingSwept: false,
      temperatureSwept: true,
      temperatureFrom: '250',
      temperatureTo: '350',
      temperatureStep: '25',
    });
    const codes = input.models!.codes;
    const f723 = codes.indexOf('astm-f723');
    expect(f723).toBeGreaterThan(0);
    const port = createEnginePort();
    const { plan } = await insertSweep(port, input);
    const { values } = await port.read(plan.results);
    // ASTM F723 is a 23 °C standard; the catalog accepts it from 290 to 305 K (DRIFT.MODELCODES help): only 300 K computes.
    expect(values.map((row) => typeof row[f723] === 'number')).toEqual([false, false, true, false, false]);
    expect(values.filter((_, r) => r !== 2).map((row) => row[f723])).toEqual(Array(4).fill({ error: '#VALUE!' }));
    values.forEach((row) => row.forEach((v, j) => j !== f723 && expect(typeof v).toBe('number')));

    const preview = previewSweep(input);
    expect(preview.series[f723]).toMatchObject({
      name: 'astm-f723',
      points: [[300, expect.any(Number)]],
      refused: { count: 4, of: 5, message: expect.stringMatching(/^#VALUE! /) },
    });
    // The band still spans the other models at every temperature.
    expect(preview.band!.flat().map((b) => b[0])).toEqual([250, 275, 300, 325, 350]);
    expect(describePreview(preview, 'Resistivity ρ (Ω·cm)')).toMatch(/; astm-f723 refused 4 of 5 values \(#VALUE! .+\)\.$/);
  });

  it('refuses when a cell the codes would spill into is filled, and writes nothing', async () => {
    const input = resolved({});
    const port = createEnginePort({ Sheet1: [[], [null, null, null, null, null, 'mine']] });
    await expect(insertSweep(port, input)).rejects.toThrow(SweepRefusal);
    await expect(insertSweep(port, input)).rejects.toThrow(/Sheet1!A1:G7 \(7 rows × 7 columns\), but F2 is not empty/);
    const { values } = await port.read(at(0, 0, 7, 7));
    expect(values.flat().filter((v) => v !== null)).toEqual(['mine']);
    expect(port.charts).toEqual([]);
  });
});

describe('modelBand', () => {
  it('spans the lowest to the highest model where at least two give a number, breaking where fewer do', () => {
    const grid = [
      [3, 5, 4],
      [2, { code: '#VALUE!', message: 'x' }, 6],
      [1, { code: '#VALUE!', message: 'x' }, { code: '#VALUE!', message: 'x' }],
      [7, 8, 9],
    ] as const;
    expect(modelBand([1, 2, 3, 4], grid as never)).toEqual([
      [
        [1, 3, 5],
        [2, 2, 6],
      ],
      [[4, 7, 9]],
    ]);
  });
});

describe('describePreview of a comparison', () => {
  it('names the models, the default with its end values, and the band’s widest ratio on a log axis', () => {
    const preview = previewSweep(resolved({}));
    const text = describePreview(preview, 'Resistivity ρ (Ω·cm)');
    expect(text).toMatch(
      /^Resistivity ρ \(Ω·cm\) against Doping \(cm⁻³\), log x, log y: 6 models \(f723-anchored, masetti, arora, caughey-thomas, klaassen, astm-f723\); default f723-anchored \(heavier line\) .+ at 1\.00e\+14 to .+ at 1\.00e\+16; shaded band from the lowest to the highest model, widest \(a factor [\d.]+\) at .+\.$/,
    );
  });
});
