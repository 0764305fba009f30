/**
 * `driftcell demo [-o file] [--values]`: writes the demo workbook (invented
 * data, live formulas with cached results, or with `--values` its values form)
 * and prints its resistor sweep.
 */
import { existsSync } from 'node:fs';
import ExcelJS from 'exceljs';
import { recalculateWorkbook, workbookBytes } from '../engine/xlsx';
import { convertToValues, valuesWorkbookBytes, type ValuesForm } from '../engine/valuesForm';
import { buildDemoWorkbook, DEMO_COMPANY, INVENTED_NOTE, SHEETS, SWEEP_LAYOUT } from './demoWorkbook';
import { CliFailure, EXIT_OK, type Output } from './failure';
import { resolveOutputPath, writeFileAtomically } from './files';
import { formatElement } from './format';

export const DEFAULT_DEMO_FILE = 'driftcell-demo.xlsx';

/** Decimals printed per sweep column (°C, K, Ω): the table is for reading; the file keeps full precision. */
const PRINTED_DECIMALS = [0, 2, 1] as const;

/** A written cell's shown value: its value, or its formula's cached result. */
function shownValue(cell: ExcelJS.Cell, decimals: number): string {
  const value = cell.value;
  const shown = typeof value === 'object' && value !== null && 'formula' in value ? (value as ExcelJS.CellFormulaValue).result : value;
  if (typeof shown === 'number') return shown.toFixed(decimals);
  if (typeof shown === 'string' || typeof shown === 'boolean') return formatElement(shown);
  if (typeof shown === 'object' && shown !== null && 'error' in shown) return (shown as ExcelJS.CellErrorValue).error;
  return '';
}

/** An input as printed: large and small numbers in exponent form (1e+20), others as they are. */
function inputText(value: ExcelJS.CellValue): string {
  if (typeof value === 'number') {
    return value !== 0 && (Math.abs(value) >= 1e6 || Math.abs(value) < 1e-3) ? value.toExponential() : String(value);
  }
  if (typeof value === 'string' || typeof value === 'boolean') return formatElement(value);
  return '';
}

/**
 * The resistor's design inputs as printed, `label: value` per line, read from
 * the sweep sheet itself (the cells the sweep formula refers to).
 */
export function sweepInputs(workbook: ExcelJS.Workbook): string[] {
  const sheet = workbook.getWorksheet(SHEETS.sweep);
  if (sheet === undefined) throw new Error(`the demo has no sheet "${SHEETS.sweep}"`);
  const { inputFirstRow, inputRows } = SWEEP_LAYOUT;
  const lines: string[] = [];
  for (let r = inputFirstRow; r < inputFirstRow + inputRows; r++) {
    lines.push(`  ${formatElement(String(sheet.getCell(r, 1).value ?? ''))}: ${inputText(sheet.getCell(r, 2).value)}`);
  }
  return lines;
}

/**
 * The resistor sweep as printed: header, then T (°C), T (K), R (Ω) per row,
 * tab-separated, from the recalculated workbook.
 */
export function sweepTable(workbook: ExcelJS.Workbook): string[] {
  const sheet = workbook.getWorksheet(SHEETS.sweep);
  if (sheet === undefined) throw new Error(`the demo has no sheet "${SHEETS.sweep}"`);
  const { headerRow, firstRow, rows, celsiusColumn, kelvinColumn, resistanceColumn } = SWEEP_LAYOUT;
  const columns = [celsiusColumn, kelvinColumn, resistanceColumn];
  const line = (r: number) => columns.map((c, i) => shownValue(sheet.getCell(r, c), PRINTED_DECIMALS[i])).join('\t');
  const lines = [line(headerRow)];
  for (let r = firstRow; r < firstRow + rows; r++) lines.push(line(r));
  return lines;
}

/**
 * Writes the demo workbook to `file` (never over an existing file) and prints
 * the resistor sweep.
 *
 * @returns the exit status (0); failures are thrown as CliFailure
 */
export async function runDemo(file: string, output: Output, options: { readonly values?: boolean } = {}): Promise<number> {
  const target = resolveOutputPath(file);
  if (existsSync(target)) {
    throw new CliFailure(`${file} already exists; not overwriting it. Choose another name with -o <file>`);
  }
  const workbook = buildDemoWorkbook(options.values === true);
  const summary = recalculateWorkbook(workbook);
  // The sweep is printed before the values form replaces the formulas (it reads cached results either way).
  const sweep = sweepTable(workbook);
  const inputs = sweepInputs(workbook);
  let values: ValuesForm | undefined;
  if (options.values) values = convertToValues(workbook);
  const bytes = values ? await valuesWorkbookBytes(workbook) : await workbookBytes(workbook, summary);
  writeFileAtomically(target, bytes, false);

  output.out(`${DEMO_COMPANY}: diffused-bar resistor over −40…150 °C (sheet "${SHEETS.sweep}")`);
  output.out(INVENTED_NOTE);
  output.out('');
  output.out(
    'Inputs (a uniform bar at an effective doping; R = DRIFT.RESISTOR(DRIFT.RESISTIVITY(doping, ' +
      'dopant, T), length, width, thickness)):',
  );
  inputs.forEach(output.out);
  output.out('');
  sweep.forEach(output.out);
  output.out('');
  output.out(
    values
      ? `wrote ${file} (values form): ${summary.sheets.length} sheets, ${summary.formulas} formulas as ` +
          `plain values, listed on sheet "${values.sheet}"`
      : `wrote ${file}: ${summary.sheets.length} sheets, ${summary.formulas} formulas (live, with cached results)`,
  );
  for (const problem of summary.problems) {
    output.err(`warning: ${problem.sheet}!${problem.address} shows ${problem.code} ${problem.message}`);
  }
  return EXIT_OK;
}
