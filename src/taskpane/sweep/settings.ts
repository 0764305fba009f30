/**
 * From what the user entered (all text, as read from the controls) to a
 * checked sweep: the axes, the call, and words for the title; or the list
 * of problems, each saying what is wrong and what is allowed.
 */
import { parseDecimalText } from '../../catalog/parameters';
import { buildCall, numberText, settingKey, type SettingValues } from './arguments';
import { compareModels, type ModelComparison } from './compare';
import {
  MAX_TEMPERATURE_COLUMNS,
  MAX_TEMPERATURE_POINTS,
  dopingAxis,
  dopingAxisProblems,
  temperatureAxis,
  temperatureAxisProblems,
  toKelvin,
  type TemperatureUnit,
} from './axes';
import type { SweepLayoutInput } from './plan';
import { settingParameters, type SweepQuantity } from './quantities';

/** The sweep builder's controls as text. */
export interface SweepForm {
  readonly quantityId: string;
  readonly dopingSwept: boolean;
  readonly dopingFrom: string;
  readonly dopingTo: string;
  readonly pointsPerDecade: string;
  readonly fixedDoping: string;
  readonly temperatureSwept: boolean;
  readonly temperatureUnit: TemperatureUnit;
  readonly temperatureFrom: string;
  readonly temperatureTo: string;
  readonly temperatureStep: string;
  readonly fixedTemperature: string;
  /** Setting values by settingKey ('inner:dopant', 'outer:thickness_um', …). */
  readonly values: SettingValues;
  /** Every applicable model instead of the one chosen (one swept axis only); absent means no. */
  readonly compareModels?: boolean;
}

/** The form field a compare-models problem marks invalid. */
export const COMPARE_MODELS_FIELD = 'compareModels';

/**
 * A resolved sweep, or what is wrong: messages, and the fields at fault (SweepForm field names for the axes,
 * settingKeys for the settings) so the controls can be marked invalid.
 */
export type ResolvedSweep =
  | { readonly ok: true; readonly input: SweepLayoutInput }
  | { readonly ok: false; readonly problems: readonly string[]; readonly invalid: readonly string[] };

/** Reads a number field in decimal notation (parseDecimalText); '', non-numbers and hex/binary/octal text ('0x10') give NaN. */
function number(text: string): number {
  return parseDecimalText(text) ?? NaN;
}

/**
 * Checks the form and resolves it.
 *
 * @param form - the controls' text
 * @param quantities - the available quantities (availableQuantities())
 * @example resolveSweep(form, availableQuantities()).ok
 */
export function resolveSweep(form: SweepForm, quantities: readonly SweepQuantity[]): ResolvedSweep {
  const quantity = quantities.find((q) => q.id === form.quantityId);
  if (quantity === undefined)
    return {
      ok: false,
      problems: [`Choose a quantity; "${form.quantityId}" is not one of ${quantities.map((q) => q.id).join(', ')}.`],
      invalid: ['quantityId'],
    };
  const problems: string[] = [];
  const invalid: string[] = [];
  const dopingSwept = quantity.hasDoping && form.dopingSwept;
  const temperatureSwept = quantity.hasTemperature && form.temperatureSwept;
  if (!dopingSwept && !temperatureSwept) {
    problems.push(
      quantity.hasDoping && quantity.hasTemperature
        ? 'Sweep doping, temperature or both.'
        : `Sweep ${quantity.hasDoping ? 'doping' : 'temperature'}: ${quantity.label} has no other axis.`,
    );
  }

  let doping: number[] | null = null;
  let fixedDoping: number | null = null;
  if (dopingSwept) {
    const axis = { from: number(form.dopingFrom), to: number(form.dopingTo), pointsPerDecade: number(form.pointsPerDecade) };
    const axisProblems = dopingAxisProblems(axis);
    if (axisProblems.length > 0) {
      problems.push(...axisProblems);
      invalid.push('dopingFrom', 'dopingTo', 'pointsPerDecade');
    } else doping = dopingAxis(axis);
  } else if (quantity.hasDoping) {
    fixedDoping = number(form.fixedDoping);
    if (!(fixedDoping > 0)) {
      problems.push(`Fixed doping must be a number above 0 in cm⁻³, e.g. 1e15 (got "${form.fixedDoping}").`);
      invalid.push('fixedDoping');
    }
  }

  let temperature: SweepLayoutInput['temperature'] = null;
  let fixedKelvin: number | null = null;
  if (temperatureSwept) {
    const axis = {
      from: number(form.temperatureFrom),
      to: number(form.temperatureTo),
      step: number(form.temperatureStep),
      unit: form.temperatureUnit,
    };
    const limit = dopingSwept ? MAX_TEMPERATURE_COLUMNS : MAX_TEMPERATURE_POINTS;
    const axisProblems = temperatureAxisProblems(axis, limit);
    if (axisProblems.length > 0) {
      problems.push(...axisProblems);
      invalid.push('temperatureFrom', 'temperatureTo', 'temperatureStep');
    } else {
      const entered = temperatureAxis(axis, limit);
      temperature = { entered, kelvin: entered.map((t) => toKelvin(t, form.temperatureUnit)), unit: form.temperatureUnit };
    }
  } else if (quantity.hasTemperature) {
    const value = number(form.fixedTemperature);
    fixedKelvin = Number.isFinite(value) ? toKelvin(value, form.temperatureUnit) : NaN;
    if (!(fixedKelvin > 0)) {
      problems.push(`Fixed temperature must be a number above absolute zero in ${form.temperatureUnit} (got "${form.fixedTemperature}").`);
      invalid.push('fixedTemperature');
    }
  }

  let models: ModelComparison | null = null;
  if (form.compareModels === true) {
    const compared = compareModels(quantity, form.values);
    if (!compared.ok) {
      problems.push(compared.problem);
      invalid.push(COMPARE_MODELS_FIELD);
    } else if (dopingSwept && temperatureSwept) {
      // Models × doping × temperature would need a table per model; one axis keeps one spilled formula and one chart.
      problems.push(
        'Compare models sweeps one axis: uncheck Sweep doping or Sweep temperature (with both, ' +
          'each model would need a table of its own).',
      );
      invalid.push(COMPARE_MODELS_FIELD);
    } else models = compared.comparison;
  }

  const {
    call,
    problems: callProblems,
    invalid: callInvalid,
  } = buildCall(quantity, form.values, { doping: fixedDoping, temperatureK: fixedKelvin }, models?.argument ?? null);
  problems.push(...callProblems);
  invalid.push(...callInvalid);
  if (problems.length > 0) return { ok: false, problems, invalid };

  const words: string[] = [];
  for (const { owner, spec } of settingParameters(quantity)) {
    const key = settingKey(owner, spec.name);
    const text = (form.values[key] ?? '').trim();
    if (text === '' || key === models?.setting.key) continue;
    words.push(spec.type === 'text' ? text : `${spec.name} ${text}${spec.unit ? ` ${spec.unit}` : ''}`);
  }
  if (fixedDoping !== null) words.push(`${numberText(fixedDoping)} cm⁻³`);
  if (fixedKelvin !== null) words.push(`${fixedKelvin} K`);
  if (models !== null) words.push(`${models.codes.length} ${models.setting.modelQuantity} models`);
  return { ok: true, input: { quantity, call, doping, temperature, description: words.join(', '), models } };
}
