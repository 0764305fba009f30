/**
 * Benchmark 3: one spilled DRIFT.RESISTIVITY over a 1,000 × 100 doping ×
 * temperature grid against 100,000 single-cell formulas over the same grid,
 * each =DRIFT.RESISTIVITY($A2,"B",B$1). Time: build and calculate the engine.
 * Target: the spill at least 5× faster (ratio ≤ 0.2).
 */
import type { Sheets } from 'hyperformula';
import { createEngine } from '../src/engine/engine';
import { a1, dopingAt } from './lib/sheets';
import { sideBySide } from './lib/timing';
import { figure, ratio, show, target, type Section } from './lib/results';

export const SPILL_MAX_RATIO = 0.2;

/** Row 1: temperatures from 250 to 400 K in B1…; column A from row 2: doping values. */
function grid(rows: number, columns: number): (number | string | null)[][] {
  const data: (number | string | null)[][] = [[null, ...Array.from({ length: columns }, (_, c) => 250 + (150 * c) / (columns - 1))]];
  for (let r = 0; r < rows; r++) data.push([dopingAt(r, rows), ...new Array<null>(columns).fill(null)]);
  return data;
}

function spillSheet(rows: number, columns: number): Sheets {
  const data = grid(rows, columns);
  data[1][1] = `=DRIFT.RESISTIVITY(A2:${a1(rows, 0)},"B",B1:${a1(0, columns)})`;
  return { Sheet1: data };
}

function singleCellSheet(rows: number, columns: number): Sheets {
  const data = grid(rows, columns);
  for (let r = 1; r <= rows; r++) {
    for (let c = 1; c <= columns; c++) {
      const column = a1(0, c).replace(/\d+$/, '');
      data[r][c] = `=DRIFT.RESISTIVITY($A${r + 1},"B",${column}$1)`;
    }
  }
  return { Sheet1: data };
}

/** Builds, reads every result, and returns them row by row. */
function calculate(sheets: Sheets, rows: number, columns: number): Float64Array {
  const engine = createEngine(sheets);
  try {
    const values = new Float64Array(rows * columns);
    const block = engine.getRangeValues({ start: { sheet: 0, row: 1, col: 1 }, end: { sheet: 0, row: rows, col: columns } });
    block.forEach((row, r) => row.forEach((v, c) => (values[r * columns + c] = typeof v === 'number' ? v : NaN)));
    return values;
  } finally {
    engine.destroy();
  }
}

/** Runs benchmark 3. */
export function runSpill(rows = 1000, columns = 100): Section {
  const spill = spillSheet(rows, columns);
  const single = singleCellSheet(rows, columns);
  calculate(spillSheet(20, 10), 20, 10);
  calculate(singleCellSheet(20, 10), 20, 10);
  let spillValues: Float64Array = new Float64Array(0);
  let singleValues: Float64Array = new Float64Array(0);
  const [spillMs, singleMs] = sideBySide(
    [() => (spillValues = calculate(spill, rows, columns)), () => (singleValues = calculate(single, rows, columns))],
    3,
    0,
  );
  // Both must give the same numbers everywhere.
  for (let i = 0; i < spillValues.length; i++) {
    if (!(spillValues[i] === singleValues[i]))
      throw new Error(`spill and single cells differ at element ${i}: ${spillValues[i]} vs ${singleValues[i]}`);
  }
  const cells = rows * columns;
  const r = ratio(spillMs, singleMs);
  const t = target('spill_vs_single_cells_ratio', r, SPILL_MAX_RATIO, 'spill ≥ 5× faster (≤ 0.2)');
  return {
    title: 'Spill against single cells',
    description: `=DRIFT.RESISTIVITY(A2:A${rows + 1},"B",B1:${a1(0, columns)}) spilling ${rows}×${columns} against ${cells} single-cell formulas; build + calculate + read.`,
    figures: {
      elements: cells,
      spill_ms: figure(spillMs, 'ms'),
      single_cells_ms: figure(singleMs, 'ms'),
      spill_vs_single_cells_ratio: r,
      identical_results: true,
    },
    targets: [t],
    rows: [
      {
        benchmark: `3. one ${rows}×${columns} spilled DRIFT.RESISTIVITY vs ${cells} single cells`,
        ours: show(spillMs, 'ms'),
        other: show(singleMs, 'ms'),
        ratio: `${r}`,
        target: '≤ 0.2',
        met: t.met ? 'yes' : 'no',
      },
    ],
  };
}
