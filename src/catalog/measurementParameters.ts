/**
 * Parameter builders for the measurement-analysis functions (four-point probe,
 * van der Pauw, Hall, wafer certificates): optional lengths whose blank means
 * "not given" rather than a default, and a reducing list of numbers.
 */
import { excludesZero, requiredNumber, type NumberRule } from './parameters';
import type { ParameterSpec } from './types';
import { InputError, type CellInput } from './values';

type Plain = Exclude<CellInput, { kind: 'failure' }>;

function isBlank(value: Plain): boolean {
  return value === null || (typeof value === 'string' && value.trim() === '');
}

/** A positive length in µm that may be left blank; blank gives undefined (the case without that dimension). */
export function optionalLength(name: string, description: string): ParameterSpec<number | undefined> {
  const present = requiredNumber({ name, unit: 'µm', description, min: 0, minExclusive: true });
  return {
    name,
    type: 'number',
    unit: 'µm',
    description,
    optional: true,
    zeroIsBlank: true,
    parse: (value) => (isBlank(value) ? undefined : present.parse(value)),
  };
}

interface ListOptions extends NumberRule {
  readonly name: string;
  readonly unit: string | null;
  readonly description: string;
}

/**
 * A reducing argument: a range of one or more numbers consumed whole (blank
 * cells skipped), handed to the implementation as a list in row-major order.
 */
export function numberList(options: ListOptions): ParameterSpec<readonly number[]> {
  const { name, unit, description } = options;
  const element = requiredNumber(options);
  const reduce = (elements: readonly Plain[]): readonly number[] => {
    const values = elements.filter((value) => !isBlank(value)).map((value) => element.parse(value));
    if (values.length === 0) throw new InputError(`${name} holds no values: give one or more numbers (blank cells are skipped)`);
    return values;
  };
  return {
    name,
    type: 'number',
    unit,
    description,
    optional: false,
    zeroIsBlank: excludesZero(options),
    parse: (value) => reduce([value]),
    reduce,
  };
}

/** Probe voltage and current, shared by DRIFT.FOURPOINT and DRIFT.FOURPOINTRS. */
export const probeVoltage = requiredNumber({
  name: 'voltage_V',
  unit: 'V',
  description: 'Voltage between the two inner probes, in V; same sign as the current.',
});
export const probeCurrent = requiredNumber({
  name: 'current_A',
  unit: 'A',
  description: 'Current forced through the two outer probes, in A; not 0.',
});
