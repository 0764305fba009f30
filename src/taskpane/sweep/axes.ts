/**
 * The sweep axes: a logarithmic doping grid (from, to, points per decade)
 * and a linear temperature grid (from, to, step) entered in K or °C, always
 * handed to formulas in K. Bad settings give messages that say what is
 * allowed.
 */
import { MAX_DENSITY } from '../../catalog/common';

/** Most rows a doping axis may have (keeps the table and chart readable). */
export const MAX_DOPING_POINTS = 400;
/** Most points per decade. */
export const MAX_POINTS_PER_DECADE = 100;
/** Most temperatures on an axis. */
export const MAX_TEMPERATURE_POINTS = 200;
/** Most temperature columns when both axes are swept (one chart series each). */
export const MAX_TEMPERATURE_COLUMNS = 24;
/** 0 °C in kelvin (definition of the Celsius scale, SI Brochure 9th ed., 2019). */
export const CELSIUS_ZERO_K = 273.15;

export type TemperatureUnit = 'K' | '°C';

/** Settings of the doping axis as entered. */
export interface DopingAxisSettings {
  readonly from: number;
  readonly to: number;
  readonly pointsPerDecade: number;
}

/** Settings of the temperature axis as entered, in `unit`. */
export interface TemperatureAxisSettings {
  readonly from: number;
  readonly to: number;
  readonly step: number;
  readonly unit: TemperatureUnit;
}

/** Rounds to 12 significant digits so grid points read as typed (1e15, not 1.0000000000000002e15). */
function tidy(value: number): number {
  return Number(value.toPrecision(12));
}

/** Problems with doping axis settings; empty when they are fine. */
export function dopingAxisProblems(axis: DopingAxisSettings): string[] {
  const problems: string[] = [];
  const finite = [axis.from, axis.to].every(Number.isFinite);
  if (!finite) problems.push('Doping from and to must be numbers in cm⁻³, e.g. 1e14 and 1e19.');
  else {
    if (axis.from <= 0) problems.push(`Doping "from" must be above 0 cm⁻³ (got ${axis.from}).`);
    // The catalog's own upper limit for dopant densities, so every grid point is a doping the functions accept.
    if (axis.to > MAX_DENSITY)
      problems.push(`Doping "to" must be at most ${MAX_DENSITY.toExponential()} cm⁻³ (got ${axis.to.toExponential()}).`);
    if (axis.from >= axis.to)
      problems.push(`Doping "from" (${axis.from.toExponential()}) must be below "to" (${axis.to.toExponential()}).`);
  }
  if (!Number.isInteger(axis.pointsPerDecade) || axis.pointsPerDecade < 1 || axis.pointsPerDecade > MAX_POINTS_PER_DECADE) {
    problems.push(`Points per decade must be a whole number from 1 to ${MAX_POINTS_PER_DECADE} (got ${axis.pointsPerDecade}).`);
  }
  if (problems.length === 0) {
    const count = dopingPointCount(axis);
    if (count > MAX_DOPING_POINTS)
      problems.push(
        `That doping axis has ${count} points; at most ` +
          `${MAX_DOPING_POINTS} are allowed. Use fewer points per decade or a narrower range.`,
      );
  }
  return problems;
}

function dopingPointCount(axis: DopingAxisSettings): number {
  const steps = Math.floor(axis.pointsPerDecade * Math.log10(axis.to / axis.from) + 1e-9);
  const lastOnGrid = axis.from * 10 ** (steps / axis.pointsPerDecade);
  return steps + 1 + (Math.abs(lastOnGrid / axis.to - 1) > 1e-9 ? 1 : 0);
}

/**
 * The doping grid: from, then evenly spaced in log10 with `pointsPerDecade`
 * per decade, ending at `to` (added if it is not on the grid).
 *
 * @throws RangeError listing the problems when the settings are not allowed
 * @example dopingAxis({ from: 1e14, to: 1e16, pointsPerDecade: 2 }) // [1e14, 3.16227766017e14, 1e15, 3.16227766017e15, 1e16]
 */
export function dopingAxis(axis: DopingAxisSettings): number[] {
  const problems = dopingAxisProblems(axis);
  if (problems.length > 0) throw new RangeError(problems.join(' '));
  const steps = Math.floor(axis.pointsPerDecade * Math.log10(axis.to / axis.from) + 1e-9);
  const values = Array.from({ length: steps + 1 }, (_, k) => tidy(axis.from * 10 ** (k / axis.pointsPerDecade)));
  if (Math.abs(values[values.length - 1] / axis.to - 1) > 1e-9) values.push(axis.to);
  return values;
}

/** Converts a temperature in `unit` to K. */
export function toKelvin(value: number, unit: TemperatureUnit): number {
  return unit === 'K' ? value : tidy(value + CELSIUS_ZERO_K);
}

/** Converts a temperature in K to `unit`. */
export function fromKelvin(kelvin: number, unit: TemperatureUnit): number {
  return unit === 'K' ? kelvin : tidy(kelvin - CELSIUS_ZERO_K);
}

/** Problems with temperature axis settings; empty when they are fine. `maxPoints` depends on the layout. */
export function temperatureAxisProblems(axis: TemperatureAxisSettings, maxPoints: number = MAX_TEMPERATURE_POINTS): string[] {
  const problems: string[] = [];
  if (![axis.from, axis.to, axis.step].every(Number.isFinite)) return [`Temperature from, to and step must be numbers in ${axis.unit}.`];
  if (toKelvin(axis.from, axis.unit) <= 0)
    problems.push(`Temperature "from" must be above absolute zero (0 K = −273.15 °C; got ${axis.from} ${axis.unit}).`);
  if (axis.from >= axis.to) problems.push(`Temperature "from" (${axis.from} ${axis.unit}) must be below "to" (${axis.to} ${axis.unit}).`);
  if (axis.step <= 0) problems.push(`Temperature step must be above 0 (got ${axis.step} ${axis.unit}).`);
  if (problems.length === 0) {
    const count = Math.floor((axis.to - axis.from) / axis.step + 1e-9) + 1;
    if (count > maxPoints)
      problems.push(`That temperature axis has ${count} points; at most ${maxPoints} ` + `are allowed here. Use a larger step.`);
  }
  return problems;
}

/**
 * The temperature grid in the entered unit: from, from+step, …, up to `to`.
 *
 * @throws RangeError listing the problems when the settings are not allowed
 * @example temperatureAxis({ from: 250, to: 350, step: 50, unit: 'K' }) // [250, 300, 350]
 */
export function temperatureAxis(axis: TemperatureAxisSettings, maxPoints: number = MAX_TEMPERATURE_POINTS): number[] {
  const problems = temperatureAxisProblems(axis, maxPoints);
  if (problems.length > 0) throw new RangeError(problems.join(' '));
  const count = Math.floor((axis.to - axis.from) / axis.step + 1e-9) + 1;
  return Array.from({ length: count }, (_, k) => tidy(axis.from + k * axis.step));
}
