/**
 * The live preview's numbers: the sweep's call evaluated by the catalog
 * itself (the same evaluate() the engine and Excel bindings use), over the
 * same axis values the table will hold.
 */
import { evaluate, findFunction } from '../../catalog';
import type { ArgumentInput, CellInput, CellOutput, Grid } from '../../catalog/values';
import { isFailure } from '../../catalog/values';
import type { SweepArgument } from './arguments';
import type { SweepLayoutInput } from './plan';

/** One curve of the preview: points where the value is a finite number. */
export interface PreviewSeries {
  readonly name: string;
  readonly points: readonly (readonly [number, number])[];
  /** Indices into `points` before which the line breaks, because the axis values between gave no number; absent means none. */
  readonly breaks?: readonly number[];
  /** How many axis values gave an error, and the first one's code and message; absent means none. */
  readonly refused?: { readonly count: number; readonly of: number; readonly message: string };
}

/** One stretch of the model band: x with the lowest and highest model value there. */
export type BandSegment = readonly (readonly [x: number, low: number, high: number])[];

/** The preview: curves plus the first error message met, if any element failed. */
export interface Preview {
  readonly series: readonly PreviewSeries[];
  /**
   * Compare models: the band from the lowest to the highest model at each axis value where at least two models
   * gave a number, in unbroken stretches; absent or null when one model is drawn.
   */
  readonly band?: readonly BandSegment[] | null;
  /** Index of the emphasised series (the default model when comparing models); absent or null for none. */
  readonly emphasised?: number | null;
  readonly xLabel: string;
  readonly xLogarithmic: boolean;
  readonly yLogarithmic: boolean;
  readonly firstError: string | null;
  /** Result grid, rows × columns as the table will show it. */
  readonly grid: Grid<CellOutput>;
}

function specOf(qualified: string) {
  const spec = findFunction(qualified);
  if (spec === undefined) throw new Error(`${qualified} is not in the catalog`);
  return spec;
}

/**
 * Evaluates the sweep in the pane.
 *
 * @param input - a resolved sweep (resolveSweep)
 * @returns the curves the chart will show
 */
export function previewSweep(input: SweepLayoutInput): Preview {
  const { call, doping, temperature, quantity } = input;
  const dopingColumn: Grid<CellInput> | null = doping === null ? null : doping.map((d) => [d]);
  // Temperatures run across a row when doping runs down a column, else down a column.
  const temperatureGrid: Grid<CellInput> | null =
    temperature === null ? null : doping !== null ? [[...temperature.kelvin]] : temperature.kelvin.map((k) => [k]);
  let innerGrid: Grid<CellOutput> | null = null;
  const argumentValue = (argument: SweepArgument): ArgumentInput => {
    switch (argument.kind) {
      case 'doping-axis':
        return dopingColumn ?? undefined;
      case 'temperature-axis':
        return temperatureGrid ?? undefined;
      case 'number':
      case 'text':
        return argument.value;
      case 'blank':
        return null;
      case 'models':
        // One row of codes: against a column axis the result has a column per model, as DRIFT.MODELCODES spills it.
        return [[...argument.codes]];
      case 'inner':
        return innerGrid as Grid<CellInput>;
    }
  };
  if (call.innerName !== null) innerGrid = evaluate(specOf(call.innerName), call.innerArguments.map(argumentValue));
  const grid = evaluate(specOf(call.outerName), call.outerArguments.map(argumentValue));
  let firstError: string | null = null;
  const column = (j: number) => grid.map((row) => row[j]);
  const curve = (name: string, xs: readonly number[], ys: readonly CellOutput[]): PreviewSeries => {
    const points: [number, number][] = [];
    const breaks: number[] = [];
    let refused: { count: number; of: number; message: string } | undefined;
    let gap = false;
    ys.forEach((y, i) => {
      if (typeof y === 'number' && Number.isFinite(y)) {
        if (gap && points.length > 0) breaks.push(points.length);
        points.push([xs[i], y]);
        gap = false;
        return;
      }
      gap = true;
      if (isFailure(y)) {
        firstError ??= `${y.code} ${y.message}`;
        refused =
          refused === undefined
            ? {
                count: 1,
                of: ys.length,
                message: `${y.code} ${y.message}`,
              }
            : { ...refused, count: refused.count + 1 };
      }
    });
    return { name, points, ...(breaks.length > 0 ? { breaks } : {}), ...(refused !== undefined ? { refused } : {}) };
  };
  const xs = doping ?? temperature!.kelvin;
  const base = {
    xLabel: doping !== null ? 'Doping (cm⁻³)' : 'Temperature (K)',
    xLogarithmic: doping !== null,
    yLogarithmic: quantity.logValues,
    grid,
  };
  if (input.models !== undefined && input.models !== null) {
    const series = input.models.codes.map((code, j) => curve(code, xs, column(j)));
    return { ...base, series, band: modelBand(xs, grid), emphasised: 0, firstError };
  }
  let series: PreviewSeries[];
  if (doping !== null && temperature !== null) series = temperature.kelvin.map((k, j) => curve(`${k} K`, doping, column(j)));
  else series = [curve(quantity.label, xs, column(0))];
  return { ...base, series, firstError };
}

/**
 * The band between the lowest and highest model at each axis value where at least two models gave a finite number
 * (one model alone has no spread); a value where fewer did breaks the band.
 *
 * @param xs - the axis values, one per grid row
 * @param grid - rows: axis values; columns: models
 * @example modelBand([1, 2], [[3, 5], [4, 2]]) // [[[1, 3, 5], [2, 2, 4]]]
 */
export function modelBand(xs: readonly number[], grid: Grid<CellOutput>): BandSegment[] {
  const segments: [number, number, number][][] = [];
  let current: [number, number, number][] | null = null;
  grid.forEach((row, i) => {
    const values = row.filter((v): v is number => typeof v === 'number' && Number.isFinite(v));
    if (values.length < 2) {
      current = null;
      return;
    }
    if (current === null) {
      current = [];
      segments.push(current);
    }
    current.push([xs[i], Math.min(...values), Math.max(...values)]);
  });
  return segments;
}
