/**
 * Writes a call of a catalog function as formula text, with arguments placed by
 * the catalog's parameter names rather than by position, so that a renamed or
 * reordered parameter fails loudly here instead of silently shifting an
 * argument in a formula the pane writes.
 */
import { qualifiedName } from '../../catalog/naming';
import type { FunctionSpec } from '../../catalog/types';

/** Argument text per parameter name; a missing or empty entry is left blank. */
export type NamedArguments = Readonly<Record<string, string | undefined>>;

/**
 * The call `DRIFT.NAME(a,b,,d)` (without a leading '=').
 *
 * Arguments follow the catalog's parameter order; blank ones between given
 * arguments stay as empty slots (the function then uses its default), blank
 * ones at the end are dropped.
 *
 * @param spec - catalog entry
 * @param args - argument text by parameter name, e.g. `{ resistivity: 'D2', dopant: '"B"' }`
 * @returns formula text without '='
 * @throws Error naming the parameter when a name is not one of the spec's, or a required argument is blank
 * @example callText(DOPING, { resistivity: 'D2', dopant: '"B"' }) // 'DRIFT.DOPING(D2,"B")'
 */
export function callText(spec: FunctionSpec, args: NamedArguments): string {
  const known = new Set(spec.parameters.map((parameter) => parameter.name));
  const unknown = Object.keys(args).filter((name) => !known.has(name));
  if (unknown.length > 0) {
    throw new Error(
      `${qualifiedName(spec)} has no parameter ${unknown.map((name) => `'${name}'`).join(', ')}; ` +
        `its parameters are ${spec.parameters.map((parameter) => parameter.name).join(', ')}`,
    );
  }
  const texts = spec.parameters.map((parameter) => {
    const text = args[parameter.name]?.trim() ?? '';
    if (text === '' && !parameter.optional) throw new Error(`${qualifiedName(spec)} needs its argument '${parameter.name}'`);
    return text;
  });
  while (texts.length > 0 && texts[texts.length - 1] === '') texts.pop();
  return `${qualifiedName(spec)}(${texts.join(',')})`;
}

/**
 * A catalog parameter by name, for labels and units.
 *
 * @param spec - catalog entry
 * @param name - parameter name, e.g. 'temperature_K'
 * @throws Error listing the spec's parameters when the name is not one of them
 * @example parameterNamed(DOPING, 'temperature_K').unit // 'K'
 */
export function parameterNamed(spec: FunctionSpec, name: string): FunctionSpec['parameters'][number] {
  const found = spec.parameters.find((parameter) => parameter.name === name);
  if (found === undefined) {
    throw new Error(
      `${qualifiedName(spec)} has no parameter '${name}'; its parameters are ` +
        `${spec.parameters.map((parameter) => parameter.name).join(', ')}`,
    );
  }
  return found;
}

/**
 * Text as a formula string literal: quotes doubled, as Excel and the engine read them.
 *
 * @example stringLiteral('say "hi"') // '"say ""hi"""'
 */
export function stringLiteral(text: string): string {
  return `"${text.replace(/"/g, '""')}"`;
}
