/**
 * Benchmark 7 (issue 14 §1): `driftcell recalc` of a workbook at the cell
 * limit, 1,000,000 cells (MAX_CELLS), run as a child process of the built
 * CLI: wall time and peak resident memory, measured as benchmark 5 does
 * (/usr/bin/time -v, else the child's VmHWM polled in /proc: the peak of the
 * whole process, heap and buffers alike, which is what the machine must have).
 *
 * The mix (invented data, written by exceljs's streaming writer with shared
 * strings, as Excel stores text): 200,000 rows × 5 columns — dopant as text,
 * doping (cm⁻³) and thickness (µm) as numbers, and two DRIFT formulas per row,
 * =DRIFT.RESISTIVITY(B,A) and =DRIFT.SHEETRES(D,C): 600,000 values and
 * 400,000 formulas, a share of formulas (40 %) well above a typical log's.
 *
 * Target: peak RSS under 4 GiB, so a workbook Driftcell accepts recalculates
 * on an ordinary 8 GB machine; memory grows with the cells present, never
 * with declared extents (those are refused before reading, sheetBounds.ts).
 */
import { existsSync, mkdtempSync, rmSync, statSync } from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import ExcelJS from 'exceljs';
import { MAX_CELLS } from '../src/engine/packageCheck';
import { storedFormula } from '../src/engine/formulaText';
import { dopingAt } from './lib/sheets';
import { runMeasured } from './recalcWorkbook';
import { figure, show, target, type Section } from './lib/results';

/** Columns per row: dopant, doping, thickness, resistivity formula, sheet-resistance formula. */
const COLUMNS = 5;
const FORMULAS_PER_ROW = 2;
/** Peak resident memory the recalculation must stay under, MiB. */
export const MILLION_MAX_PEAK_MIB = 4096;

/** Writes `rows` rows of the mix above (no header: every cell counts toward the million). */
export async function writeMillionCellWorkbook(file: string, rows: number): Promise<void> {
  const workbook = new ExcelJS.stream.xlsx.WorkbookWriter({ filename: file, useSharedStrings: true, useStyles: false });
  const sheet = workbook.addWorksheet('Wafers');
  for (let i = 0; i < rows; i++) {
    const r = i + 1;
    const row = sheet.addRow([i % 3 === 0 ? 'phosphorus' : 'B', Number(dopingAt(i % 1000, 1000).toPrecision(4)), 725]);
    row.getCell(4).value = { formula: storedFormula(`=DRIFT.RESISTIVITY(B${r},A${r})`) } as ExcelJS.CellFormulaValue;
    row.getCell(5).value = { formula: storedFormula(`=DRIFT.SHEETRES(D${r},C${r})`) } as ExcelJS.CellFormulaValue;
    row.commit();
  }
  sheet.commit();
  await workbook.commit();
}

/** Runs benchmark 7. */
export async function runRecalcMillion(projectRoot: string, rows = MAX_CELLS / COLUMNS): Promise<Section> {
  const cli = path.join(projectRoot, 'dist', 'node', 'cli', 'main.js');
  if (!existsSync(cli)) throw new Error(`${cli} is missing: run npm run build first`);
  const folder = mkdtempSync(path.join(os.tmpdir(), 'driftcell-bench-'));
  try {
    const input = path.join(folder, 'million.xlsx');
    const output = path.join(folder, 'million-recalculated.xlsx');
    await writeMillionCellWorkbook(input, rows);
    const run = await runMeasured(process.execPath, [cli, 'recalc', input, '-o', output]);
    if (run.status !== 0) throw new Error(`driftcell recalc exited with ${run.status}: ${run.stderr.slice(-2000)}`);
    const cells = rows * COLUMNS;
    const formulas = rows * FORMULAS_PER_ROW;
    const peakMiB = run.peakKiB / 1024;
    const t = target('peak_rss_mib', peakMiB, MILLION_MAX_PEAK_MIB, 'peak RSS under 4 GiB');
    return {
      title: 'driftcell recalc at the cell limit',
      description: `${rows} rows × ${COLUMNS} columns = ${cells} cells (dopant text, doping, thickness; =DRIFT.RESISTIVITY and =DRIFT.SHEETRES per row: ${formulas} formulas) recalculated by the built CLI in a child process; peak RSS by ${run.method}.`,
      figures: {
        rows,
        cells,
        formulas,
        input_kib: figure(statSync(input).size / 1024, 'KiB'),
        output_kib: figure(statSync(output).size / 1024, 'KiB'),
        wall_ms: figure(run.wallMs, 'ms'),
        peak_rss_mib: figure(peakMiB, 'MiB'),
        peak_rss_bytes_per_cell: figure((run.peakKiB * 1024) / cells, 'B'),
        peak_rss_method: run.method,
      },
      targets: [t],
      rows: [
        {
          benchmark: `7. driftcell recalc, ${cells} cells (${formulas} DRIFT formulas): wall time`,
          ours: show(run.wallMs, 'ms'),
          other: '—',
          ratio: '—',
          target: '—',
          met: '—',
        },
        {
          benchmark: `7. driftcell recalc, ${cells} cells: peak RSS`,
          ours: show(peakMiB, 'MiB'),
          other: '—',
          ratio: '—',
          target: '< 4096 MiB',
          met: t.met ? 'yes' : 'no',
        },
      ],
    };
  } finally {
    rmSync(folder, { recursive: true, force: true });
  }
}
