/**
 * Benchmark 2: 100,000 cells of DRIFT.MOBILITY in the headless engine against
 * the same Caughey–Thomas fit typed by hand as cell arithmetic, with the
 * parameters of src/physics/mobility/caugheyThomas.ts. Both sheets hold the
 * same 1,000 × 100 block of doping values and a 1,000 × 100 block of formulas
 * that refer to them; the time is that of building and calculating the engine.
 * Target: ours ÷ hand-typed ≤ 1.2.
 */
import type { Sheets } from 'hyperformula';
import { createEngine } from '../src/engine/engine';
import { CAUGHEY_THOMAS_TABLE } from '../src/physics/mobility/caugheyThomas';
import { caugheyThomasMobility } from '../src/physics/mobility/caugheyThomas';
import { a1, dopingAt, formulaNumber } from './lib/sheets';
import { sideBySide } from './lib/timing';
import { figure, ratio, show, target, type Section } from './lib/results';

export const MOBILITY_MAX_RATIO = 1.2;

/** The fit as a spreadsheet user would type it, for electrons. */
export function handTypedFit(cell: string): string {
  const { minimum, maximum, referenceDensity, alpha } = CAUGHEY_THOMAS_TABLE.electron;
  const [mn, mx, ref, a] = [minimum, maximum, referenceDensity, alpha].map(formulaNumber);
  return `=${mn}+(${mx}-${mn})/(1+(${cell}/${ref})^${a})`;
}

/** The DRIFT call for the same carrier and model. */
export function driftCall(cell: string): string {
  return `=DRIFT.MOBILITY(${cell},"phosphorus",300,"majority","caughey-thomas")`;
}

/** rows × columns doping values, then as many formulas, each referring to its doping cell. */
function sheet(rows: number, columns: number, formula: (cell: string) => string): Sheets {
  const data: (number | string)[][] = [];
  for (let r = 0; r < rows; r++) {
    const row: (number | string)[] = [];
    for (let c = 0; c < columns; c++) row.push(dopingAt(r * columns + c, rows * columns));
    for (let c = 0; c < columns; c++) row.push(formula(a1(r, c)));
    data.push(row);
  }
  return { Sheet1: data };
}

function buildAndCheck(sheets: Sheets, rows: number, columns: number, check: (doping: number, value: number) => void): void {
  const engine = createEngine(sheets);
  try {
    for (const [r, c] of [
      [0, 0],
      [rows - 1, columns - 1],
      [rows >> 1, columns >> 1],
    ]) {
      const doping = engine.getCellValue({ sheet: 0, row: r, col: c }) as number;
      check(doping, engine.getCellValue({ sheet: 0, row: r, col: columns + c }) as number);
    }
  } finally {
    engine.destroy();
  }
}

/** Runs benchmark 2. */
export function runEngineMobility(rows = 1000, columns = 100): Section {
  const ours = sheet(rows, columns, driftCall);
  const hand = sheet(rows, columns, handTypedFit);
  const checkOurs = (doping: number, value: number) => {
    // Ours is the fit times the full-ionization correction (≥ 1, ≤ about 1.3).
    const fit = caugheyThomasMobility('electron', doping);
    if (!(value >= fit * (1 - 1e-12) && value < fit * 1.4)) throw new Error(`DRIFT.MOBILITY(${doping}) = ${value}, fit ${fit}`);
  };
  const checkHand = (doping: number, value: number) => {
    const fit = caugheyThomasMobility('electron', doping);
    if (!(Math.abs(value - fit) <= 1e-12 * fit)) throw new Error(`hand-typed fit at ${doping} = ${value}, physics ${fit}`);
  };
  // Warm both paths up on a small sheet so that the timed rounds are not the JIT's first.
  buildAndCheck(sheet(50, 20, driftCall), 50, 20, checkOurs);
  buildAndCheck(sheet(50, 20, handTypedFit), 50, 20, checkHand);
  const [oursMs, handMs] = sideBySide(
    [() => buildAndCheck(ours, rows, columns, checkOurs), () => buildAndCheck(hand, rows, columns, checkHand)],
    3,
    0,
  );
  const cells = rows * columns;
  const r = ratio(oursMs, handMs);
  const t = target('drift_vs_hand_typed_ratio', r, MOBILITY_MAX_RATIO, 'ours no slower (≤ 1.2)');
  return {
    title: 'DRIFT.MOBILITY in the engine',
    description: `${cells} cells of ${driftCall('A1')} against ${handTypedFit('A1')}, build + calculate in HyperFormula (createEngine).`,
    figures: {
      cells,
      drift_ms: figure(oursMs, 'ms'),
      hand_typed_ms: figure(handMs, 'ms'),
      drift_us_per_cell: figure((oursMs * 1e3) / cells, 'µs'),
      hand_typed_us_per_cell: figure((handMs * 1e3) / cells, 'µs'),
      drift_vs_hand_typed_ratio: r,
    },
    targets: [t],
    rows: [
      {
        benchmark: `2. ${cells} cells DRIFT.MOBILITY vs hand-typed Caughey–Thomas, engine`,
        ours: show(oursMs, 'ms'),
        other: show(handMs, 'ms'),
        ratio: `${r}`,
        target: '≤ 1.2',
        met: t.met ? 'yes' : 'no',
      },
    ],
  };
}
