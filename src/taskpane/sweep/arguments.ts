/**
 * The arguments of a sweep's formula, built once from the settings and used
 * twice: as formula text referencing the axis cells, and as catalog input
 * for the live preview, so the preview computes what the cells will show.
 */
import { parseDecimalText } from '../../catalog/parameters';
import type { ParameterSpec } from '../../catalog/types';
import { qualifiedName } from '../../catalog/naming';
import { DOPING_PARAMETER, TEMPERATURE_PARAMETER, type SweepQuantity } from './quantities';

/** One argument: an axis, a literal, or (for SHEETRES/RESISTOR) the inner call. */
export type SweepArgument =
  | { readonly kind: 'doping-axis' }
  | { readonly kind: 'temperature-axis' }
  | { readonly kind: 'number'; readonly value: number }
  | { readonly kind: 'text'; readonly value: string }
  | { readonly kind: 'inner' }
  /** An optional argument left out before a given one (`f(a,,c)`): the function's default. */
  | { readonly kind: 'blank' }
  /**
   * Every applicable model at once (the sweep's "compare models"): in the formula the DRIFT.MODELCODES call
   * (`call`, without '='), in the preview the row of codes it returns.
   */
  | { readonly kind: 'models'; readonly codes: readonly string[]; readonly call: string };

/** Key of a setting control: owner and parameter name, e.g. 'inner:dopant'. */
export function settingKey(owner: 'inner' | 'outer', name: string): string {
  return `${owner}:${name}`;
}

/** What the user entered for the non-axis parameters; '' or absent means "use the default". */
export type SettingValues = Readonly<Record<string, string>>;

/** Reads one entered value; returns the argument, null for "not given", or a problem message. */
function enteredArgument(spec: ParameterSpec, raw: string | undefined): SweepArgument | null | string {
  const text = (raw ?? '').trim();
  if (text === '') return null;
  if (spec.type === 'text') return { kind: 'text', value: text };
  const value = parseDecimalText(text);
  if (value === null) return `${spec.name} must be a number${spec.unit ? ` in ${spec.unit}` : ''} (got "${text}").`;
  return { kind: 'number', value };
}

/**
 * Arguments of one function in parameter order. Axis parameters take the axis (or the fixed value given);
 * trailing optional arguments left blank are dropped; blank ones before a given one stay empty (`f(a,,c)`),
 * which every catalog function reads as "use the default", in Excel and in the engine alike.
 */
function argumentsFor(
  parameters: readonly ParameterSpec[],
  owner: 'inner' | 'outer',
  values: SettingValues,
  fixed: { doping: number | null; temperatureK: number | null },
  feeds: string | null,
  models: ModelsArgument | null,
  problems: string[],
  invalid: string[],
): SweepArgument[] {
  const given: (SweepArgument | null)[] = parameters.map((spec) => {
    if (feeds !== null && spec.name === feeds) return { kind: 'inner' };
    if (models !== null && models.key === settingKey(owner, spec.name)) return models.argument;
    if (owner === 'inner' && spec.name === DOPING_PARAMETER)
      return fixed.doping === null
        ? { kind: 'doping-axis' }
        : {
            kind: 'number',
            value: fixed.doping,
          };
    if (owner === 'inner' && spec.name === TEMPERATURE_PARAMETER)
      return fixed.temperatureK === null
        ? { kind: 'temperature-axis' }
        : {
            kind: 'number',
            value: fixed.temperatureK,
          };
    const entered = enteredArgument(spec, values[settingKey(owner, spec.name)]);
    if (typeof entered === 'string') {
      problems.push(entered);
      invalid.push(settingKey(owner, spec.name));
      return null;
    }
    if (entered === null && !spec.optional) {
      problems.push(`Enter ${spec.name}${spec.unit ? ` (${spec.unit})` : ''}: ${spec.description}`);
      invalid.push(settingKey(owner, spec.name));
    }
    return entered;
  });
  let last = given.length - 1;
  while (last >= 0 && given[last] === null) last--;
  return given.slice(0, last + 1).map((argument) => argument ?? { kind: 'blank' });
}

/** The setting (by settingKey) whose single model is replaced by every applicable model, and the argument that does it. */
export interface ModelsArgument {
  readonly key: string;
  readonly argument: Extract<SweepArgument, { kind: 'models' }>;
}

/** The sweep's call: outer function name and arguments, plus inner's when it feeds outer. */
export interface SweepCall {
  readonly outerName: string;
  readonly outerArguments: readonly SweepArgument[];
  readonly innerName: string | null;
  readonly innerArguments: readonly SweepArgument[];
}

/**
 * Builds the call from the settings.
 *
 * @param quantity - what is swept
 * @param values - entered setting values by settingKey
 * @param fixed - doping (cm⁻³) and temperature (K) when that axis is not swept, else null
 * @param models - when comparing models: the model setting and the every-model argument that replaces it
 * @returns the call, any problems with the entered values, and the settingKeys of the values at fault
 */
export function buildCall(
  quantity: SweepQuantity,
  values: SettingValues,
  fixed: { doping: number | null; temperatureK: number | null },
  models: ModelsArgument | null = null,
): { call: SweepCall; problems: string[]; invalid: string[] } {
  const problems: string[] = [];
  const invalid: string[] = [];
  const innerArguments = argumentsFor(quantity.inner.parameters, 'inner', values, fixed, null, models, problems, invalid);
  if (quantity.throughParameter === null) {
    return {
      call: { outerName: qualifiedName(quantity.outer), outerArguments: innerArguments, innerName: null, innerArguments: [] },
      problems,
      invalid,
    };
  }
  const outerArguments = argumentsFor(
    quantity.outer.parameters,
    'outer',
    values,
    fixed,
    quantity.throughParameter,
    models,
    problems,
    invalid,
  );
  return {
    call: { outerName: qualifiedName(quantity.outer), outerArguments, innerName: qualifiedName(quantity.inner), innerArguments },
    problems,
    invalid,
  };
}

/** A number as formula text: plain digits for everyday sizes, else an exponent as Excel writes it (1E+15). */
export function numberText(value: number): string {
  const size = Math.abs(value);
  const exponent = size >= 1e5 || (size > 0 && size < 1e-3);
  return (exponent ? value.toExponential() : String(value)).replace('e', 'E');
}

/** Text as a formula string literal, quotes doubled: `"B"`. */
export function textLiteral(value: string): string {
  return `"${value.replace(/"/g, '""')}"`;
}

/**
 * The call as formula text.
 *
 * @param call - from buildCall
 * @param references - A1 references of the doping and temperature axis cells
 * @example formulaText(call, { doping: 'A3:A30', temperature: 'B2:F2' }) // '=DRIFT.RESISTIVITY(A3:A30,"B",B2:F2)'
 */
export function formulaText(call: SweepCall, references: { doping: string | null; temperature: string | null }): string {
  const text = (argument: SweepArgument): string => {
    switch (argument.kind) {
      case 'doping-axis':
        return references.doping ?? '';
      case 'temperature-axis':
        return references.temperature ?? '';
      case 'number':
        return numberText(argument.value);
      case 'text':
        return textLiteral(argument.value);
      case 'blank':
        return '';
      case 'models':
        return argument.call;
      case 'inner':
        return `${call.innerName}(${call.innerArguments.map(text).join(',')})`;
    }
  };
  return `=${call.outerName}(${call.outerArguments.map(text).join(',')})`;
}
