/**
 * The sweep's table and chart as plans for a WorkbookPort: where the title,
 * headers (with units), axis cells and the ONE spilled DRIFT formula go, the
 * styles, and a native XY chart with log axes where the values span decades.
 *
 * Layouts, with the anchor at the top-left (the selected cell):
 * - doping only: title; "Doping (cm⁻³)" | result; doping values down, formula beside the first.
 * - temperature only: title; [°C] | K | result; temperatures down, formula beside the first K.
 * - both: title; [°C row]; K row across; doping values down; formula at the first data cell: a table.
 */
import type { CellBlock, CellInput, ChartPlan, StylePlan } from '../port';
import { blockAddress, cellName } from '../port';
import type { BlockWrite, SheetPlan } from '../sheetPlan';
import { formulaText, type SweepCall } from './arguments';
import type { TemperatureUnit } from './axes';
import type { ModelComparison } from './compare';
import type { SweepQuantity } from './quantities';

/** Rows and columns of an Excel worksheet (Microsoft, "Excel specifications and limits"). */
const SHEET_ROWS = 1_048_576;
const SHEET_COLUMNS = 16_384;

/** Number formats for the axis and result cells. */
export const DOPING_FORMAT = '0.00E+00';
export const LOG_RESULT_FORMAT = '0.000E+00';
export const LINEAR_RESULT_FORMAT = '0.000';

/** What the plan needs to know about the sweep. */
export interface SweepLayoutInput {
  readonly quantity: SweepQuantity;
  readonly call: SweepCall;
  /** Doping values (cm⁻³), or null when doping is fixed. */
  readonly doping: readonly number[] | null;
  /** Temperatures in K and as entered, or null when the temperature is fixed. */
  readonly temperature: { readonly kelvin: readonly number[]; readonly entered: readonly number[]; readonly unit: TemperatureUnit } | null;
  /** Words for the fixed settings, for the title (e.g. 'B, Si, 300 K'). */
  readonly description: string;
  /** Every applicable model, one column each, when comparing models (one swept axis); else null or absent. */
  readonly models?: ModelComparison | null;
}

/** The whole insertion: the table as a sheet plan (no highlights), its footprint and the chart. */
export interface SweepPlan extends SheetPlan {
  /** Every cell the table occupies, spill included; must be empty before writing. */
  readonly footprint: CellBlock;
  /** The anchor of the spilled formula and its text. */
  readonly formulaCell: CellBlock;
  readonly formula: string;
  /** Where the results spill. */
  readonly results: CellBlock;
  readonly chart: ChartPlan;
  /** When comparing models: the header cell of the DRIFT.MODELCODES formula (it spills one code per result column) and its text. */
  readonly modelCodes: { readonly cell: CellBlock; readonly formula: string } | null;
}

/** Header text of a value with its unit, e.g. 'Resistivity ρ (Ω·cm)'. */
export function withUnit(label: string, unit: string | null): string {
  return unit === null ? label : `${label} (${unit})`;
}

function block(sheet: string, row: number, column: number, rowCount = 1, columnCount = 1): CellBlock {
  return { sheet, row, column, rowCount, columnCount };
}

/** The label of a temperature in K as a chart series name, e.g. '300 K'. */
function kelvinName(kelvin: number): string {
  return `${kelvin} K`;
}

/**
 * Plans the table and chart at `anchor`.
 *
 * @param input - quantity, call, axes and description
 * @param anchor - the top-left cell (only its sheet, row and column are used)
 * @throws RangeError when neither axis is swept or the table would not fit on the sheet
 */
export function planSweep(input: SweepLayoutInput, anchor: CellBlock): SweepPlan {
  const { quantity, call, doping, temperature } = input;
  if (doping === null && temperature === null)
    throw new RangeError('Sweep doping, temperature or both: with both fixed there is nothing to tabulate.');
  if (input.models !== undefined && input.models !== null) return planModelComparison(input, input.models, anchor);
  const sheet = anchor.sheet;
  const top = anchor.row;
  const left = anchor.column;
  const resultHeader = withUnit(quantity.label, quantity.unit);
  const title = `${resultHeader}: ${call.outerName}, ${input.description}`;
  const celsius = temperature !== null && temperature.unit === '°C';
  const writes: BlockWrite[] = [];
  const styles: StylePlan[] = [];
  let footprint: CellBlock;
  let formulaCell: CellBlock;
  let results: CellBlock;
  let references: { doping: string | null; temperature: string | null };
  let series: ChartPlan['series'];
  let xTitle: string;
  const resultFormat = quantity.logValues ? LOG_RESULT_FORMAT : LINEAR_RESULT_FORMAT;

  if (doping !== null && temperature !== null) {
    // Doping down a column, temperature across a row: the formula spills a table.
    const columns = 1 + temperature.kelvin.length;
    const headerRows = celsius ? 2 : 1;
    const dataTop = top + 1 + headerRows;
    footprint = block(sheet, top, left, 1 + headerRows + doping.length, columns);
    const header: CellInput[][] = [[title, ...Array<CellInput>(columns - 1).fill(null)]];
    if (celsius) header.push(['Temperature (°C) →', ...temperature.entered]);
    header.push(['Doping (cm⁻³) ↓ · Temperature (K) →', ...temperature.kelvin]);
    writes.push({ block: block(sheet, top, left, header.length, columns), cells: header });
    const dopingCells = block(sheet, dataTop, left, doping.length, 1);
    writes.push({ block: dopingCells, cells: doping.map((d) => [d]) });
    const kelvinCells = block(sheet, dataTop - 1, left + 1, 1, temperature.kelvin.length);
    references = { doping: blockAddress(dopingCells), temperature: blockAddress(kelvinCells) };
    formulaCell = block(sheet, dataTop, left + 1);
    results = block(sheet, dataTop, left + 1, doping.length, temperature.kelvin.length);
    series = temperature.kelvin.map((k, j) => ({
      name: kelvinName(k),
      x: dopingCells,
      y: block(sheet, dataTop, left + 1 + j, doping.length, 1),
    }));
    xTitle = 'Doping (cm⁻³)';
    styles.push(
      { block: block(sheet, top + 1, left, headerRows, columns), bold: true },
      { block: dopingCells, numberFormat: DOPING_FORMAT },
    );
  } else if (doping !== null) {
    const dataTop = top + 2;
    footprint = block(sheet, top, left, 2 + doping.length, 2);
    writes.push({
      block: block(sheet, top, left, 2, 2),
      cells: [
        [title, null],
        ['Doping (cm⁻³)', resultHeader],
      ],
    });
    const dopingCells = block(sheet, dataTop, left, doping.length, 1);
    writes.push({ block: dopingCells, cells: doping.map((d) => [d]) });
    references = { doping: blockAddress(dopingCells), temperature: null };
    formulaCell = block(sheet, dataTop, left + 1);
    results = block(sheet, dataTop, left + 1, doping.length, 1);
    series = [{ name: quantity.label, x: dopingCells, y: results }];
    xTitle = 'Doping (cm⁻³)';
    styles.push({ block: block(sheet, top + 1, left, 1, 2), bold: true }, { block: dopingCells, numberFormat: DOPING_FORMAT });
  } else {
    const axis = temperature!;
    const dataTop = top + 2;
    const kelvinColumn = celsius ? left + 1 : left;
    const columns = celsius ? 3 : 2;
    footprint = block(sheet, top, left, 2 + axis.kelvin.length, columns);
    const headers: CellInput[] = celsius ? ['Temperature (°C)', 'Temperature (K)', resultHeader] : ['Temperature (K)', resultHeader];
    writes.push({ block: block(sheet, top, left, 2, columns), cells: [[title, ...Array<CellInput>(columns - 1).fill(null)], headers] });
    const axisCells = block(sheet, dataTop, left, axis.kelvin.length, celsius ? 2 : 1);
    writes.push({ block: axisCells, cells: axis.kelvin.map((k, i) => (celsius ? [axis.entered[i], k] : [k])) });
    const kelvinCells = block(sheet, dataTop, kelvinColumn, axis.kelvin.length, 1);
    references = { doping: null, temperature: blockAddress(kelvinCells) };
    formulaCell = block(sheet, dataTop, kelvinColumn + 1);
    results = block(sheet, dataTop, kelvinColumn + 1, axis.kelvin.length, 1);
    series = [{ name: quantity.label, x: kelvinCells, y: results }];
    xTitle = 'Temperature (K)';
    styles.push({ block: block(sheet, top + 1, left, 1, columns), bold: true });
  }
  checkFits(footprint);
  styles.unshift({ block: block(sheet, top, left), bold: true });
  styles.push({ block: results, numberFormat: resultFormat });
  const formula = formulaText(call, references);
  writes.push({ block: formulaCell, cells: [[formula]] });
  const chart: ChartPlan = {
    sheet,
    title: resultHeader,
    series,
    xTitle,
    yTitle: resultHeader,
    xLogarithmic: doping !== null,
    yLogarithmic: quantity.logValues,
    anchor: block(sheet, top, left + footprint.columnCount + 1),
  };
  return { footprint, writes, formulaCell, formula, results, styles, highlights: [], chart, modelCodes: null };
}

/** Refuses a table that would run off the sheet (one spare column for the chart beside it). */
function checkFits(footprint: CellBlock): void {
  if (footprint.row + footprint.rowCount > SHEET_ROWS || footprint.column + footprint.columnCount + 1 > SHEET_COLUMNS) {
    throw new RangeError(
      `The table needs ${footprint.rowCount} rows × ${footprint.columnCount} columns ` +
        `from ${cellName(footprint.row, footprint.column)}, which runs off the sheet; select a cell further ` +
        `up or left.`,
    );
  }
}

/**
 * Compare models, one swept axis: title; a header row whose last cells are =DRIFT.MODELCODES(…) spilling one code per
 * column; the axis down the first column(s) (°C, K for temperature); ONE formula at the first data cell whose model
 * argument is the same DRIFT.MODELCODES call, spilling axis × models. The chart has one series per model, the default
 * (first code) emphasised.
 *
 * doping:      title | ;  'Doping (cm⁻³) ↓ · Model →' | =DRIFT.MODELCODES(…) → ;  doping values | formula
 * temperature: title | ;  ['Temperature (°C)'] | 'Temperature (K) ↓ · Model →' | =DRIFT.MODELCODES(…) → ;  [°C] | K | formula
 */
function planModelComparison(input: SweepLayoutInput, models: ModelComparison, anchor: CellBlock): SweepPlan {
  const { quantity, call, doping, temperature } = input;
  if (doping !== null && temperature !== null) throw new RangeError('Compare models sweeps one axis: doping or temperature, not both.');
  const sheet = anchor.sheet;
  const top = anchor.row;
  const left = anchor.column;
  const count = models.codes.length;
  const resultHeader = withUnit(quantity.label, quantity.unit);
  const title = `${resultHeader}: ${call.outerName}, ${input.description}`;
  const celsius = temperature !== null && temperature.unit === '°C';
  const axisColumns = celsius ? 2 : 1;
  const rows = doping?.length ?? temperature!.kelvin.length;
  const dataTop = top + 2;
  const footprint = block(sheet, top, left, 2 + rows, axisColumns + count);
  checkFits(footprint);
  const valueLeft = left + axisColumns;
  const writes: BlockWrite[] = [];
  const styles: StylePlan[] = [{ block: block(sheet, top, left), bold: true }];
  const labels: CellInput[] =
    doping !== null
      ? ['Doping (cm⁻³) ↓ · Model →']
      : celsius
        ? ['Temperature (°C)', 'Temperature (K) ↓ · Model →']
        : ['Temperature (K) ↓ · Model →'];
  writes.push({
    block: block(sheet, top, left, 2, axisColumns),
    cells: [[title, ...Array<CellInput>(axisColumns - 1).fill(null)], labels],
  });
  let axisCells: CellBlock;
  let references: { doping: string | null; temperature: string | null };
  if (doping !== null) {
    axisCells = block(sheet, dataTop, left, rows, 1);
    writes.push({ block: axisCells, cells: doping.map((d) => [d]) });
    references = { doping: blockAddress(axisCells), temperature: null };
    styles.push({ block: axisCells, numberFormat: DOPING_FORMAT });
  } else {
    const axis = temperature!;
    writes.push({
      block: block(sheet, dataTop, left, rows, axisColumns),
      cells: axis.kelvin.map((k, i) => (celsius ? [axis.entered[i], k] : [k])),
    });
    axisCells = block(sheet, dataTop, valueLeft - 1, rows, 1);
    references = { doping: null, temperature: blockAddress(axisCells) };
  }
  const modelCodes = { cell: block(sheet, top + 1, valueLeft), formula: `=${models.call}` };
  writes.push({ block: modelCodes.cell, cells: [[modelCodes.formula]] });
  const formulaCell = block(sheet, dataTop, valueLeft);
  const formula = formulaText(call, references);
  writes.push({ block: formulaCell, cells: [[formula]] });
  const results = block(sheet, dataTop, valueLeft, rows, count);
  styles.push(
    { block: block(sheet, top + 1, left, 1, axisColumns + count), bold: true },
    { block: results, numberFormat: quantity.logValues ? LOG_RESULT_FORMAT : LINEAR_RESULT_FORMAT },
  );
  const chart: ChartPlan = {
    sheet,
    title: `${resultHeader}, ${count} models`,
    series: models.codes.map((code, j) => ({
      name: code,
      x: axisCells,
      y: block(sheet, dataTop, valueLeft + j, rows, 1),
      ...(j === 0 ? { emphasised: true } : {}),
    })),
    xTitle: doping !== null ? 'Doping (cm⁻³)' : 'Temperature (K)',
    yTitle: resultHeader,
    xLogarithmic: doping !== null,
    yLogarithmic: quantity.logValues,
    anchor: block(sheet, top, left + footprint.columnCount + 1),
  };
  return { footprint, writes, formulaCell, formula, results, styles, highlights: [], chart, modelCodes };
}
