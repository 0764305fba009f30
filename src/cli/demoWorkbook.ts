/**
 * The demo workbook: a fictional pressure-sensor maker ("Quillmoor Barometrics",
 * invented) qualifies incoming wafers and sizes a diffused-bar resistor over
 * −40…150 °C. Every lot, wafer, window, measurement and design value below is
 * invented demo data; the formulas are live and the engine fills in their
 * cached results.
 */
import ExcelJS from 'exceljs';
import { columnLetters } from '../engine/xlsx';
import { storedFormula } from '../engine/formulaText';

/** Offset between the Celsius and kelvin scales (exact by definition of the kelvin; common practice, no source). */
const CELSIUS_TO_KELVIN = 273.15;

export const DEMO_COMPANY = 'Quillmoor Barometrics (fictional)';
export const INVENTED_NOTE = 'Invented demo data: the company, lots, wafers, windows and measurements are made up for illustration.';

/** Sheet names, referred to by formulas and by the CLI's printout. */
export const SHEETS = {
  about: 'About',
  wafers: 'Incoming wafers',
  sweep: 'Resistor sweep',
  table: 'Resistivity table',
  models: 'Models',
} as const;

/** One supplier wafer as received (invented). */
interface WaferRecord {
  readonly lot: string;
  readonly wafer: string;
  readonly dopant: string;
  /** Ordered resistivity window, Ω·cm. */
  readonly rhoMin: number;
  readonly rhoMax: number;
  /** Incoming-inspection four-point-probe reading, Ω·cm. */
  readonly rhoMeasured: number;
}

/** Invented: n-type device wafers for the sensing die, p-type wafers for a reference die. */
const WAFERS: readonly WaferRecord[] = [
  { lot: 'NQ-2417', wafer: 'W01', dopant: 'phosphorus', rhoMin: 4, rhoMax: 6, rhoMeasured: 4.8 },
  { lot: 'NQ-2417', wafer: 'W02', dopant: 'phosphorus', rhoMin: 4, rhoMax: 6, rhoMeasured: 5.3 },
  { lot: 'NQ-2417', wafer: 'W03', dopant: 'phosphorus', rhoMin: 4, rhoMax: 6, rhoMeasured: 6.4 },
  { lot: 'NQ-2431', wafer: 'W01', dopant: 'phosphorus', rhoMin: 4, rhoMax: 6, rhoMeasured: 4.1 },
  { lot: 'NQ-2431', wafer: 'W02', dopant: 'phosphorus', rhoMin: 4, rhoMax: 6, rhoMeasured: 5.9 },
  { lot: 'RB-0932', wafer: 'W07', dopant: 'B', rhoMin: 10, rhoMax: 20, rhoMeasured: 12.5 },
  { lot: 'RB-0932', wafer: 'W08', dopant: 'B', rhoMin: 10, rhoMax: 20, rhoMeasured: 9.2 },
  { lot: 'RB-0932', wafer: 'W09', dopant: 'B', rhoMin: 10, rhoMax: 20, rhoMeasured: 17.9 },
];

/**
 * Invented resistor design: a shallow p+ boron diffusion (about 42 Ω/sq at
 * 20 °C) treated as a uniform bar at an effective doping. At 1e20 cm⁻³ the
 * resistance rises steadily with temperature, as measured for heavily doped
 * Si (positive TCR below the intrinsic temperature); near 1e18 cm⁻³ the sign
 * at room temperature is marginal, so that doping is not used here.
 */
const RESISTOR_DESIGN = {
  dopant: 'B',
  effectiveDoping: 1e20,
  lengthUm: 450,
  widthUm: 15,
  thicknessUm: 0.3,
} as const;

/** The sweep: −40 to 150 °C in 10 °C steps (the sensor's invented rating). */
const SWEEP_CELSIUS: readonly number[] = Array.from({ length: 20 }, (_, i) => -40 + 10 * i);
/** Index (0-based) of the 20 °C row, the reference for the relative change. */
const REFERENCE_ROW = SWEEP_CELSIUS.indexOf(20);

/** Doping down the resistivity table, cm⁻³ (one and three per decade). */
const TABLE_DOPING: readonly number[] = [1e14, 3e14, 1e15, 3e15, 1e16, 3e16, 1e17, 3e17, 1e18, 3e18, 1e19];
/** Temperatures across the table, °C: the rating's ends and points between. */
const TABLE_CELSIUS: readonly number[] = [-40, 0, 25, 50, 100, 150];

/** Where the resistor sweep table and its design inputs (label in column 1, value in 2) sit, for the CLI's printout. */
export const SWEEP_LAYOUT = {
  inputFirstRow: 3,
  inputRows: 5,
  headerRow: 10,
  firstRow: 11,
  rows: SWEEP_CELSIUS.length,
  celsiusColumn: 1,
  kelvinColumn: 2,
  resistanceColumn: 3,
} as const;

const INPUT_FILL: ExcelJS.Fill = { type: 'pattern', pattern: 'solid', fgColor: { argb: 'FFFFF4CC' } };
const FORMULA_FILL: ExcelJS.Fill = { type: 'pattern', pattern: 'solid', fgColor: { argb: 'FFDDEBF7' } };

function title(sheet: ExcelJS.Worksheet, text: string): void {
  sheet.getCell('A1').value = text;
  sheet.getCell('A1').font = { bold: true, size: 14 };
  sheet.getCell('A2').value = INVENTED_NOTE;
  sheet.getCell('A2').font = { italic: true, color: { argb: 'FF7F6000' } };
}

function headers(sheet: ExcelJS.Worksheet, row: number, texts: readonly string[]): void {
  texts.forEach((text, i) => {
    const cell = sheet.getCell(row, i + 1);
    cell.value = text;
    cell.font = { bold: true };
    cell.alignment = { wrapText: true, vertical: 'bottom' };
  });
}

function input(cell: ExcelJS.Cell, value: ExcelJS.CellValue, numFmt?: string): void {
  cell.value = value;
  cell.fill = INPUT_FILL;
  if (numFmt) cell.numFmt = numFmt;
}

/** Writes a live formula, DRIFT calls in the stored form Excel binds to the add-in. */
function formula(cell: ExcelJS.Cell, text: string, numFmt?: string): void {
  cell.value = { formula: storedFormula(text) } as ExcelJS.CellFormulaValue;
  cell.fill = FORMULA_FILL;
  if (numFmt) cell.numFmt = numFmt;
}

/** Fills cells a spill will cover with the formula colour, so the table reads as one block. */
function spillArea(sheet: ExcelJS.Worksheet, top: number, left: number, rows: number, columns: number, numFmt: string): void {
  for (let r = top; r < top + rows; r++) {
    for (let c = left; c < left + columns; c++) {
      const cell = sheet.getCell(r, c);
      cell.fill = FORMULA_FILL;
      cell.numFmt = numFmt;
    }
  }
}

function aboutSheet(workbook: ExcelJS.Workbook, valuesForm: boolean): void {
  const sheet = workbook.addWorksheet(SHEETS.about);
  title(sheet, `${DEMO_COMPANY}: wafer qualification and resistor sizing`);
  const lines = [
    '',
    'What this workbook shows (all figures invented):',
    `• ${SHEETS.wafers}: each supplier wafer's ordered resistivity window turned into a doping window with ` +
      `one spilled DRIFT.DOPING per row, the measured value's doping, and a window check.`,
    `• ${SHEETS.sweep}: a boron-diffused bar resistor's value from −40 to 150 °C, as ONE spilled formula ` +
      `DRIFT.RESISTOR(DRIFT.RESISTIVITY(…)).`,
    `• ${SHEETS.table}: resistivity for a doping column against a temperature row, from one spilled DRIFT.RESISTIVITY.`,
    `• ${SHEETS.models}: DRIFT.MODELS(), every model code with its citation and validity range.`,
    '',
    valuesForm
      ? 'Yellow cells are inputs; blue cells hold the results of formulas as plain values (this is the ' +
        'values form); the formulas are listed on sheet "Formulas". Editing an input here updates nothing: ' +
        'use the live demo (driftcell demo without --values).'
      : 'Yellow cells are inputs; blue cells hold live formulas (with cached results), so editing an input and recalculating updates them.',
    'The resistor is treated as a uniform bar at an effective doping: a first sizing estimate, not an ' +
      'integration over a diffusion profile.',
  ];
  lines.forEach((text, i) => (sheet.getCell(3 + i, 1).value = text));
  const countRow = 4 + lines.length;
  sheet.getCell(countRow, 1).value = 'Wafers outside their window:';
  sheet.getCell(countRow, 1).font = { bold: true };
  const lastWaferRow = 4 + WAFERS.length - 1;
  formula(sheet.getCell(countRow, 2), `COUNTIF('${SHEETS.wafers}'!J4:J${lastWaferRow},"OUT OF WINDOW")`, '0');
  sheet.getColumn(1).width = 30;
}

function wafersSheet(workbook: ExcelJS.Workbook): void {
  const sheet = workbook.addWorksheet(SHEETS.wafers);
  title(sheet, 'Incoming wafer qualification');
  headers(sheet, 3, [
    'Lot',
    'Wafer',
    'Dopant',
    'ρ min ordered (Ω·cm)',
    'ρ max ordered (Ω·cm)',
    'ρ measured (Ω·cm)',
    'Doping at ρ min (cm⁻³)',
    'Doping at ρ max (cm⁻³)',
    'Doping from measured ρ (cm⁻³)',
    'Window check',
  ]);
  WAFERS.forEach((w, i) => {
    const r = 4 + i;
    input(sheet.getCell(r, 1), w.lot);
    input(sheet.getCell(r, 2), w.wafer);
    input(sheet.getCell(r, 3), w.dopant);
    input(sheet.getCell(r, 4), w.rhoMin, '0.00');
    input(sheet.getCell(r, 5), w.rhoMax, '0.00');
    input(sheet.getCell(r, 6), w.rhoMeasured, '0.00');
    // One formula per wafer spills the two ends of the doping window across G:H.
    formula(sheet.getCell(r, 7), `DRIFT.DOPING(D${r}:E${r},C${r})`, '0.00E+00');
    spillArea(sheet, r, 8, 1, 1, '0.00E+00');
    formula(sheet.getCell(r, 9), `DRIFT.DOPING(F${r},C${r})`, '0.00E+00');
    formula(sheet.getCell(r, 10), `IF(AND(F${r}>=D${r},F${r}<=E${r}),"in window","OUT OF WINDOW")`);
  });
  [10, 8, 8, 12, 12, 12, 16, 16, 18, 16].forEach((width, i) => (sheet.getColumn(i + 1).width = width));
}

function sweepSheet(workbook: ExcelJS.Workbook): void {
  const sheet = workbook.addWorksheet(SHEETS.sweep);
  title(sheet, 'Diffused-bar resistor over −40…150 °C');
  const design: [string, ExcelJS.CellValue, string | undefined][] = [
    ['Dopant of the diffusion', RESISTOR_DESIGN.dopant, undefined],
    ['Effective doping (cm⁻³)', RESISTOR_DESIGN.effectiveDoping, '0.00E+00'],
    ['Length (µm)', RESISTOR_DESIGN.lengthUm, '0'],
    ['Width (µm)', RESISTOR_DESIGN.widthUm, '0'],
    ['Thickness = junction depth (µm)', RESISTOR_DESIGN.thicknessUm, '0.0'],
  ];
  design.forEach(([label, value, numFmt], i) => {
    sheet.getCell(SWEEP_LAYOUT.inputFirstRow + i, 1).value = label;
    input(sheet.getCell(SWEEP_LAYOUT.inputFirstRow + i, 2), value, numFmt);
  });
  const { headerRow, firstRow, rows } = SWEEP_LAYOUT;
  const lastRow = firstRow + rows - 1;
  headers(sheet, headerRow, ['T (°C)', 'T (K)', 'R (Ω)', 'Change vs 20 °C']);
  SWEEP_CELSIUS.forEach((celsius, i) => input(sheet.getCell(firstRow + i, 1), celsius, '0'));
  formula(sheet.getCell(firstRow, 2), `A${firstRow}:A${lastRow}+${CELSIUS_TO_KELVIN}`, '0.00');
  spillArea(sheet, firstRow + 1, 2, rows - 1, 1, '0.00');
  // The key formula: the whole sweep from one cell.
  formula(sheet.getCell(firstRow, 3), `DRIFT.RESISTOR(DRIFT.RESISTIVITY($B$4,$B$3,B${firstRow}:B${lastRow}),$B$5,$B$6,$B$7)`, '#,##0.0');
  spillArea(sheet, firstRow + 1, 3, rows - 1, 1, '#,##0.0');
  formula(sheet.getCell(firstRow, 4), `C${firstRow}:C${lastRow}/INDEX(C${firstRow}:C${lastRow},${REFERENCE_ROW + 1})-1`, '0.0%');
  spillArea(sheet, firstRow + 1, 4, rows - 1, 1, '0.0%');
  [32, 12, 14, 16].forEach((width, i) => (sheet.getColumn(i + 1).width = width));
}

function tableSheet(workbook: ExcelJS.Workbook): void {
  const sheet = workbook.addWorksheet(SHEETS.table);
  title(sheet, 'Resistivity (Ω·cm) by doping and temperature');
  sheet.getCell('A3').value = 'Dopant';
  input(sheet.getCell('B3'), 'B');
  const headerRow = 5;
  const firstRow = headerRow + 1;
  const lastRow = firstRow + TABLE_DOPING.length - 1;
  sheet.getCell(headerRow - 1, 1).value = 'T (°C) →';
  sheet.getCell(headerRow, 1).value = 'N (cm⁻³) ↓   T (K) →';
  sheet.getCell(headerRow, 1).font = { bold: true };
  const lastColumn = columnLetters(1 + TABLE_CELSIUS.length);
  TABLE_CELSIUS.forEach((celsius, i) => input(sheet.getCell(headerRow - 1, 2 + i), celsius, '0'));
  formula(sheet.getCell(headerRow, 2), `B${headerRow - 1}:${lastColumn}${headerRow - 1}+${CELSIUS_TO_KELVIN}`, '0.00');
  spillArea(sheet, headerRow, 3, 1, TABLE_CELSIUS.length - 1, '0.00');
  TABLE_DOPING.forEach((n, i) => input(sheet.getCell(firstRow + i, 1), n, '0.0E+00'));
  formula(
    sheet.getCell(firstRow, 2),
    `DRIFT.RESISTIVITY(A${firstRow}:A${lastRow},$B$3,B${headerRow}:${lastColumn}${headerRow})`,
    '0.000E+00',
  );
  spillArea(sheet, firstRow, 2, TABLE_DOPING.length, TABLE_CELSIUS.length, '0.000E+00');
  sheet.getColumn(1).width = 22;
  for (let c = 2; c <= 1 + TABLE_CELSIUS.length; c++) sheet.getColumn(c).width = 12;
}

function modelsSheet(workbook: ExcelJS.Workbook): void {
  const sheet = workbook.addWorksheet(SHEETS.models);
  sheet.getCell('A1').value = 'Model codes, citations and validity ranges';
  sheet.getCell('A1').font = { bold: true, size: 14 };
  formula(sheet.getCell('A3'), 'DRIFT.MODELS()');
  [16, 28, 40, 80, 60].forEach((width, i) => (sheet.getColumn(i + 1).width = width));
}

/**
 * Builds the demo workbook with its formulas (results not yet computed).
 *
 * @param valuesForm - the workbook will be written in its values form (the About sheet says so)
 * @returns an exceljs workbook; recalculate it before writing
 */
export function buildDemoWorkbook(valuesForm = false): ExcelJS.Workbook {
  const workbook = new ExcelJS.Workbook();
  workbook.creator = 'driftcell demo';
  workbook.title = `${DEMO_COMPANY} demo: invented data`;
  aboutSheet(workbook, valuesForm);
  wafersSheet(workbook);
  sweepSheet(workbook);
  tableSheet(workbook);
  modelsSheet(workbook);
  return workbook;
}
