/**
 * The Excel adapter's Office.js calls, checked against office-addin-mock's
 * OfficeMockObject standing in for the `Excel` namespace: which ranges it
 * asks for, what it loads and writes, and how charts and highlights are set up.
 */
import { OfficeMockObject } from 'office-addin-mock';

// office-addin-mock needs only the OfficeApp enum from office-addin-manifest, whose main entry loads
// ES-module-only packages jest cannot require; hand it the enum's own module.
jest.mock('office-addin-manifest', () => jest.requireActual('office-addin-manifest/lib/officeApp'));
import { EMPHASISED_LINE_POINTS, createExcelPort, type ExcelHost } from '../../src/taskpane/excelPort';
import type { CellBlock } from '../../src/taskpane/port';

/** Builds a mock Excel whose worksheets/ranges/charts record every call into `log`. */
function mockExcel(rangeData: Record<string, unknown> = {}) {
  const log: {
    getItem: string[];
    getRange: string[];
    chartAdd: unknown[][];
    seriesAdd: string[];
    position: unknown[];
    conditional: string[];
  } = {
    getItem: [],
    getRange: [],
    chartAdd: [],
    seriesAdd: [],
    position: [],
    conditional: [],
  };
  const makeSeries = () => ({
    name: '',
    x: null as unknown,
    y: null as unknown,
    format: { line: { weight: 0 } },
    setXAxisValues(r: unknown) {
      this.x = r;
    },
    setValues(r: unknown) {
      this.y = r;
    },
  });
  const firstSeries = makeSeries();
  const addedSeries: ReturnType<typeof makeSeries>[] = [];
  const conditionalFormat = { cellValue: { rule: null as unknown, format: { fill: { color: '' }, font: { color: '' } } } };
  const data = {
    context: {
      workbook: {
        selected: { rowIndex: 4, columnIndex: 2, rowCount: 1, columnCount: 1, worksheet: { name: 'Lots' } },
        getSelectedRange() {
          return this.selected;
        },
        worksheets: {
          sheet: {
            range: {
              values: [[]],
              formulas: [[]],
              valueTypes: [[]],
              numberFormat: [[]],
              format: { font: { bold: false } },
              conditionalFormats: {
                add(type: string) {
                  log.conditional.push(type);
                  return conditionalFormat;
                },
              },
              ...rangeData,
            },
            getRange(address: string) {
              log.getRange.push(address);
              return this.range;
            },
            charts: {
              chart: {
                title: { text: '' },
                axes: { categoryAxis: { scaleType: '', title: { text: '' } }, valueAxis: { scaleType: '', title: { text: '' } } },
                series: {
                  getItemAt: (i: number) => (i === 0 ? firstSeries : undefined),
                  add(name: string) {
                    log.seriesAdd.push(name);
                    const s = makeSeries();
                    addedSeries.push(s);
                    return s;
                  },
                },
                setPosition(start: unknown) {
                  log.position.push(start);
                },
              },
              add(...args: unknown[]) {
                log.chartAdd.push(args);
                return this.chart;
              },
            },
          },
          getItem(name: string) {
            log.getItem.push(name);
            return this.sheet;
          },
        },
      },
    },
    run: async function (this: { context: unknown }, batch: (context: unknown) => Promise<unknown>) {
      return batch(this.context);
    },
  };
  // eslint-disable-next-line @typescript-eslint/no-explicit-any -- office-addin-mock's context has no type to name
  const excel = new OfficeMockObject(data as never) as unknown as ExcelHost & { context: any };
  return { excel, log, firstSeries, addedSeries, conditionalFormat };
}

const block = (row: number, column: number, rowCount = 1, columnCount = 1): CellBlock => ({
  sheet: 'Lots',
  row,
  column,
  rowCount,
  columnCount,
});

describe('createExcelPort', () => {
  it('selection() loads the selected range and its sheet name, 0-based', async () => {
    const { excel } = mockExcel();
    await expect(createExcelPort(excel).selection()).resolves.toEqual({ sheet: 'Lots', row: 4, column: 2, rowCount: 1, columnCount: 1 });
  });

  it('read() asks for the block by address and maps empty cells, errors and formulas', async () => {
    const { excel, log } = mockExcel({
      values: [
        [1e15, '', '#VALUE!'],
        ['p', 12.5, true],
      ],
      formulas: [
        [1e15, '', '=DRIFT.RESISTIVITY(A1,"B")'],
        ['p', '=B1*2', true],
      ],
      valueTypes: [
        ['Double', 'Empty', 'Error'],
        ['String', 'Double', 'Boolean'],
      ],
    });
    const contents = await createExcelPort(excel).read(block(1, 0, 2, 3));
    expect(log.getItem).toEqual(['Lots']);
    expect(log.getRange).toEqual(['A2:C3']);
    expect(contents.values).toEqual([
      [1e15, null, { error: '#VALUE!' }],
      ['p', 12.5, true],
    ]);
    expect(contents.formulas).toEqual([
      [null, null, '=DRIFT.RESISTIVITY(A1,"B")'],
      [null, '=B1*2', null],
    ]);
  });

  it('write() sets the formulas of exactly the block, empty cells as ""', async () => {
    const { excel, log } = mockExcel();
    await createExcelPort(excel).write(block(1, 1, 1, 3), [['=DRIFT.INTRINSIC(300)', null, 7]]);
    expect(log.getRange).toEqual(['B2:D2']);
    expect(excel.context.workbook.worksheets.sheet.range.formulas).toEqual([['=DRIFT.INTRINSIC(300)', '', 7]]);
  });

  it('write() of a row whose tuple formula spills right leaves the spill cells empty ("") and the formulas after them in place', async () => {
    // The certificate check's model spread: one DOPINGSPREAD per end, two null cells for its spill, then the next column's formula.
    const { excel, log } = mockExcel();
    const header = [
      'Doping at ρmax over models: lowest (cm⁻³)',
      'Doping at ρmax over models: highest (cm⁻³)',
      'Doping at ρmax over models: relative spread (highest/lowest − 1)',
      'Pass/fail',
    ];
    const row = ['=DRIFT.DOPINGSPREAD(F3,L3,$AB$5)', null, null, '=IF(O3="yes","PASS","FAIL")'];
    await createExcelPort(excel).write(block(1, 15, 2, 4), [header, row]);
    expect(log.getRange).toEqual(['P2:S3']);
    expect(excel.context.workbook.worksheets.sheet.range.formulas).toEqual([
      header,
      ['=DRIFT.DOPINGSPREAD(F3,L3,$AB$5)', '', '', '=IF(O3="yes","PASS","FAIL")'],
    ]);
  });

  it('write() of a spilled formula touches only its anchor cell', async () => {
    const { excel, log } = mockExcel();
    await createExcelPort(excel).write(block(2, 1), [['=DRIFT.RESISTIVITY(A3:A9,"B",B2:D2)']]);
    expect(log.getRange).toEqual(['B3']);
    expect(excel.context.workbook.worksheets.sheet.range.formulas).toEqual([['=DRIFT.RESISTIVITY(A3:A9,"B",B2:D2)']]);
  });

  it('write() refuses cells that do not match the block', async () => {
    const { excel } = mockExcel();
    await expect(createExcelPort(excel).write(block(0, 0, 2, 1), [['x']])).rejects.toThrow(/needs 2×1 cells, got 1×1/);
  });

  it('style() sets bold and a number format for every cell of the block', async () => {
    const { excel } = mockExcel();
    await createExcelPort(excel).style({ block: block(0, 0, 2, 2), bold: true, numberFormat: '0.00E+00' });
    const range = excel.context.workbook.worksheets.sheet.range;
    expect(range.format.font.bold).toBe(true);
    expect(range.numberFormat).toEqual([
      ['0.00E+00', '0.00E+00'],
      ['0.00E+00', '0.00E+00'],
    ]);
  });

  it('addChart() adds an XY chart with explicit series ranges, titles and log axes', async () => {
    const { excel, log, firstSeries, addedSeries } = mockExcel();
    await createExcelPort(excel).addChart({
      sheet: 'Lots',
      title: 'Resistivity',
      series: [
        { name: '300 K', x: block(2, 0, 5, 1), y: block(2, 1, 5, 1) },
        { name: '350 K', x: block(2, 0, 5, 1), y: block(2, 2, 5, 1) },
      ],
      xTitle: 'doping (cm⁻³)',
      yTitle: 'ρ (Ω·cm)',
      xLogarithmic: true,
      yLogarithmic: true,
      anchor: block(0, 5),
    });
    expect(log.chartAdd).toHaveLength(1);
    expect(log.chartAdd[0][0]).toBe('XYScatterLines');
    expect(log.chartAdd[0][2]).toBe('Columns');
    const chart = excel.context.workbook.worksheets.sheet.charts.chart;
    expect(chart.title.text).toBe('Resistivity');
    expect(firstSeries.name).toBe('300 K');
    expect(log.seriesAdd).toEqual(['350 K']);
    expect(addedSeries[0].name).toBe('350 K');
    // First the chart's source, then x and y of each series, in order.
    expect(log.getRange).toEqual(['B3:B7', 'A3:A7', 'B3:B7', 'A3:A7', 'C3:C7']);
    expect(chart.axes.categoryAxis.scaleType).toBe('Logarithmic');
    expect(chart.axes.valueAxis.scaleType).toBe('Logarithmic');
    expect(chart.axes.categoryAxis.title.text).toBe('doping (cm⁻³)');
    expect(chart.axes.valueAxis.title.text).toBe('ρ (Ω·cm)');
    expect(log.position).toEqual(['F1']);
  });

  it('addChart() draws an emphasised series (the default model among compared ones) with a heavier line, the others as Excel draws them', async () => {
    const { excel, firstSeries, addedSeries } = mockExcel();
    await createExcelPort(excel).addChart({
      sheet: 'Lots',
      title: 'Resistivity, 3 models',
      series: [
        { name: 'f723-anchored', x: block(2, 0, 5, 1), y: block(2, 1, 5, 1), emphasised: true },
        { name: 'masetti', x: block(2, 0, 5, 1), y: block(2, 2, 5, 1) },
        { name: 'arora', x: block(2, 0, 5, 1), y: block(2, 3, 5, 1) },
      ],
      xTitle: 'doping (cm⁻³)',
      yTitle: 'ρ (Ω·cm)',
      xLogarithmic: true,
      yLogarithmic: true,
      anchor: block(0, 5),
    });
    expect(firstSeries.name).toBe('f723-anchored');
    expect(firstSeries.format.line.weight).toBe(EMPHASISED_LINE_POINTS);
    expect(addedSeries.map((s) => [s.name, s.format.line.weight])).toEqual([
      ['masetti', 0],
      ['arora', 0],
    ]);
  });

  it('addChart() keeps a linear axis linear', async () => {
    const { excel } = mockExcel();
    await createExcelPort(excel).addChart({
      sheet: 'Lots',
      title: 'ni',
      series: [{ name: 'ni', x: block(1, 0, 3, 1), y: block(1, 1, 3, 1) }],
      xTitle: 'T (K)',
      yTitle: 'ni (cm⁻³)',
      xLogarithmic: false,
      yLogarithmic: true,
      anchor: block(0, 3),
    });
    const chart = excel.context.workbook.worksheets.sheet.charts.chart;
    expect(chart.axes.categoryAxis.scaleType).toBe('Linear');
    expect(chart.axes.valueAxis.scaleType).toBe('Logarithmic');
  });

  it('addChart() and addHighlight() say which requirement set is missing, before touching the workbook', async () => {
    const { excel, log } = mockExcel();
    const port = createExcelPort(excel, (set, version) => !(set === 'ExcelApi' && Number(version) >= 1.6));
    const series = [{ name: 'ni', x: block(1, 0, 3, 1), y: block(1, 1, 3, 1) }];
    await expect(
      port.addChart({
        sheet: 'Lots',
        title: 'ni',
        series,
        xTitle: 'x',
        yTitle: 'y',
        xLogarithmic: false,
        yLogarithmic: true,
        anchor: block(0, 3),
      }),
    ).rejects.toThrow(/needs ExcelApi 1\.7/);
    await expect(port.addHighlight({ block: block(1, 7, 10, 1), text: 'FAIL', fill: '#f8d7da', fontColor: '#6b0f1a' })).rejects.toThrow(
      /needs ExcelApi 1\.6/,
    );
    expect(log.chartAdd).toEqual([]);
    expect(log.conditional).toEqual([]);
  });

  it('addHighlight() adds a cell-value rule equal to the text, with its colours', async () => {
    const { excel, log, conditionalFormat } = mockExcel();
    await createExcelPort(excel).addHighlight({ block: block(1, 7, 10, 1), text: 'FAIL', fill: '#f8d7da', fontColor: '#6b0f1a' });
    expect(log.getRange).toEqual(['H2:H11']);
    expect(log.conditional).toEqual(['CellValue']);
    expect(conditionalFormat.cellValue.rule).toEqual({ formula1: '="FAIL"', operator: 'EqualTo' });
    expect(conditionalFormat.cellValue.format.fill.color).toBe('#f8d7da');
    expect(conditionalFormat.cellValue.format.font.color).toBe('#6b0f1a');
  });
});
