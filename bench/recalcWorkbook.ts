/**
 * Benchmark 5: `driftcell recalc` of a 20,000-row wafer log (invented data,
 * generated with exceljs in a temporary folder), run as a child process of the
 * built CLI: wall time and peak resident memory (from /usr/bin/time -v when
 * present, else by polling the child's VmHWM in /proc).
 */
import { spawn } from 'node:child_process';
import { existsSync, mkdtempSync, readFileSync, rmSync, statSync } from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import ExcelJS from 'exceljs';
import { storedFormula } from '../src/engine/formulaText';
import { figure, show, type Section } from './lib/results';

const GNU_TIME = '/usr/bin/time';
/** Formulas per wafer row. */
const FORMULAS_PER_ROW = 4;

/** Writes the wafer log: lot, wafer, dopant, measured ρ, thickness, and DRIFT formulas per row. */
export async function writeWaferLog(file: string, rows: number): Promise<void> {
  const workbook = new ExcelJS.Workbook();
  const sheet = workbook.addWorksheet('Wafers');
  sheet.addRow([
    'Lot',
    'Wafer',
    'Dopant',
    'Resistivity (Ω·cm)',
    'Thickness (µm)',
    'Doping (cm⁻³)',
    'Sheet resistance (Ω/sq)',
    'Majority mobility (cm²/(V·s))',
    'Resistivity check (Ω·cm)',
  ]);
  for (let i = 0; i < rows; i++) {
    const r = i + 2;
    const boron = i % 3 !== 0;
    // Invented: resistivities spread over 1–20 Ω·cm in a repeating pattern.
    const rho = Number((1 + ((i * 7919) % 1900) / 100).toFixed(2));
    sheet.addRow([`LOT${String(Math.floor(i / 25) + 1).padStart(4, '0')}`, (i % 25) + 1, boron ? 'B' : 'phosphorus', rho, 725]);
    const row = sheet.getRow(r);
    const formulas = [
      `=DRIFT.DOPING(D${r},C${r})`,
      `=DRIFT.SHEETRES(D${r},E${r})`,
      `=DRIFT.MOBILITY(F${r},C${r})`,
      `=DRIFT.RESISTIVITY(F${r},C${r})`,
    ];
    formulas.forEach((text, k) => (row.getCell(6 + k).value = { formula: storedFormula(text) } as ExcelJS.CellFormulaValue));
  }
  await workbook.xlsx.writeFile(file);
}

export interface ChildRun {
  readonly wallMs: number;
  readonly peakKiB: number;
  readonly method: string;
  readonly status: number | null;
  readonly stderr: string;
}

/** Runs the command, measuring wall time and peak RSS. */
export function runMeasured(command: string, args: readonly string[]): Promise<ChildRun> {
  const useTime = existsSync(GNU_TIME);
  const [exe, argv] = useTime ? [GNU_TIME, ['-v', command, ...args]] : [command, [...args]];
  return new Promise((resolve, reject) => {
    const start = process.hrtime.bigint();
    const child = spawn(exe, argv, { stdio: ['ignore', 'pipe', 'pipe'] });
    let stderr = '';
    let polledKiB = 0;
    child.stderr.on('data', (d: Buffer) => (stderr += d.toString()));
    child.stdout.resume();
    const poll = useTime
      ? undefined
      : setInterval(() => {
          try {
            const match = /VmHWM:\s+(\d+) kB/.exec(readFileSync(`/proc/${child.pid}/status`, 'utf8'));
            if (match) polledKiB = Math.max(polledKiB, Number(match[1]));
          } catch {
            // the child has ended between two polls
          }
        }, 20);
    child.on('error', reject);
    child.on('close', (status) => {
      if (poll) clearInterval(poll);
      const wallMs = Number(process.hrtime.bigint() - start) / 1e6;
      const reported = /Maximum resident set size \(kbytes\): (\d+)/.exec(stderr);
      resolve({
        wallMs,
        peakKiB: reported ? Number(reported[1]) : polledKiB,
        method: useTime ? '/usr/bin/time -v' : '/proc VmHWM polled every 20 ms',
        status,
        stderr,
      });
    });
  });
}

/** Runs benchmark 5. */
export async function runRecalcWorkbook(projectRoot: string, rows = 20000): Promise<Section> {
  const cli = path.join(projectRoot, 'dist', 'node', 'cli', 'main.js');
  if (!existsSync(cli)) throw new Error(`${cli} is missing: run npm run build first`);
  const folder = mkdtempSync(path.join(os.tmpdir(), 'driftcell-bench-'));
  try {
    const input = path.join(folder, 'wafer-log.xlsx');
    const output = path.join(folder, 'wafer-log-recalculated.xlsx');
    await writeWaferLog(input, rows);
    const run = await runMeasured(process.execPath, [cli, 'recalc', input, '-o', output]);
    if (run.status !== 0) throw new Error(`driftcell recalc exited with ${run.status}: ${run.stderr.slice(-2000)}`);
    const formulas = rows * FORMULAS_PER_ROW;
    const peakMiB = run.peakKiB / 1024;
    return {
      title: 'driftcell recalc of a wafer log',
      description: `${rows} wafer rows × ${FORMULAS_PER_ROW} DRIFT formulas (DOPING, SHEETRES, MOBILITY, RESISTIVITY) recalculated by the built CLI in a child process; peak RSS by ${run.method}.`,
      figures: {
        rows,
        formulas,
        input_kib: figure(statSync(input).size / 1024, 'KiB'),
        output_kib: figure(statSync(output).size / 1024, 'KiB'),
        wall_ms: figure(run.wallMs, 'ms'),
        wall_us_per_formula: figure((run.wallMs * 1e3) / formulas, 'µs'),
        peak_rss_mib: figure(peakMiB, 'MiB'),
        peak_rss_method: run.method,
      },
      targets: [],
      rows: [
        {
          benchmark: `5. driftcell recalc, ${rows}-row wafer log (${formulas} formulas): wall time`,
          ours: show(run.wallMs, 'ms'),
          other: '—',
          ratio: '—',
          target: '—',
          met: '—',
        },
        {
          benchmark: `5. driftcell recalc, ${rows}-row wafer log: peak RSS`,
          ours: show(peakMiB, 'MiB'),
          other: '—',
          ratio: '—',
          target: '—',
          met: '—',
        },
      ],
    };
  } finally {
    rmSync(folder, { recursive: true, force: true });
  }
}
