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
}

/** The preview: curves plus the first error message met, if any element failed. */
export interface Preview {
  readonly series: readonly PreviewSeries[];
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
  const temperatureGrid: Grid<CellInput> | null = temperature === null ? null : doping !== null ? [[...temperature.kelvin]] : temperature.kelvin.map((k) => [k]);
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
    ys.forEach((y, i) => {
      if (isFailure(y)) firstError ??= `${y.code} ${y.message}`;
      else if (typeof y === 'number' && Number.isFinite(y)) points.push([xs[i], y]);
    });
    return { name, points };
  };
  let series: PreviewSeries[];
  if (doping !== null && temperature !== null) series = temperature.kelvin.map((k, j) => curve(`${k} K`, doping, column(j)));
  else if (doping !== null) series = [curve(quantity.label, doping, column(0))];
  else series = [curve(quantity.label, temperature!.kelvin, column(0))];
  return { series, xLabel: doping !== null ? 'Doping (cm⁻³)' : 'Temperature (K)', xLogarithmic: doping !== null, yLogarithmic: quantity.logValues, firstError, grid };
}
