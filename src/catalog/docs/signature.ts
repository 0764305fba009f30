/**
 * How a catalog function is written out for people: `=DRIFT.NAME(a, [b])`.
 * Shared by help pages, the README table and the CLI so they never disagree.
 */
import { qualifiedName } from '../naming';
import type { FunctionSpec, ParameterSpec } from '../types';

export { qualifiedName };

export function parameterLabel(param: ParameterSpec): string {
  return param.optional ? `[${param.name}]` : param.name;
}

/** The call as a user types it, optional arguments in brackets. */
export function signature(spec: FunctionSpec): string {
  return `${qualifiedName(spec)}(${spec.parameters.map(parameterLabel).join(', ')})`;
}
