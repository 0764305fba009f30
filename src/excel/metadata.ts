/**
 * Excel's custom-functions metadata (functions.json), generated from the
 * catalog so that names, argument order and optionality cannot drift apart.
 *
 * Choices, with the documentation facts behind them (Office "Manually create
 * JSON metadata for custom functions"):
 * - Every parameter is `type: "any"`, `dimensionality: "matrix"`: the catalog
 *   parses and validates each element itself and broadcasts ranges, so Excel
 *   must hand over numbers, text, booleans and blanks unchanged, as 2-D arrays.
 * - Results are `type: "any"`, `dimensionality: "matrix"`: every call returns
 *   a grid (1×1 for a single value), numbers and text (DRIFT.MODELS) mixed
 *   with CustomFunctions.Error elements.
 * - `allowErrorForDataTypeAny: true` ("allows a custom function to process
 *   errors as input values"; parameters of type any accept errors; default
 *   false). Without it one error anywhere in an input range would make Excel
 *   skip the call and error the whole spill; with it the error reaches the
 *   catalog and fails only the elements that use it.
 * - `allowCustomDataForDataTypeAny` is left out (false): Driftcell takes no
 *   data types (entities, formatted numbers) as inputs and returns none.
 * - No `options`: the functions are synchronous, not streaming, not volatile,
 *   and need neither the caller's address nor the arguments' addresses.
 * - `id` equals `name` (the catalog name, upper case) and must never change
 *   once published; functionNames.ts holds Office's naming rules and a name
 *   that breaks one stops the build.
 */
import type { FunctionSpec, ParameterSpec } from '../catalog/types';
import { helpFileName } from '../catalog/docs/helpPage';
import { whyInvalidFunctionId } from './functionNames';

export interface ParameterMetadata {
  readonly name: string;
  readonly description: string;
  readonly type: 'any';
  readonly dimensionality: 'matrix';
  readonly optional: boolean;
}

export interface FunctionMetadata {
  readonly id: string;
  readonly name: string;
  readonly description: string;
  readonly helpUrl: string;
  readonly parameters: readonly ParameterMetadata[];
  readonly result: { readonly type: 'any'; readonly dimensionality: 'matrix' };
}

export interface CustomFunctionsMetadata {
  readonly allowErrorForDataTypeAny: boolean;
  readonly functions: readonly FunctionMetadata[];
}

/**
 * The argument tooltip text: the catalog's description plus its unit and default.
 *
 * @param param - a catalog parameter
 * @returns e.g. `Lattice temperature in kelvin, 20–1000 K; blank means 300 K. Default: 300.`
 */
export function parameterDescription(param: ParameterSpec): string {
  const parts = [param.description.trim()];
  // The unit only where the sentence does not already name it ("in cm⁻³ … Unit: cm⁻³" says it twice).
  if (param.unit !== null && !parts[0].includes(param.unit)) parts.push(`Unit: ${param.unit}.`);
  if (param.optional && param.defaultText !== undefined) parts.push(`Default: ${param.defaultText}.`);
  return parts.join(' ');
}

/** The help page address of one function under a base URL. */
export function helpUrl(helpBaseUrl: string, name: string): string {
  return `${helpBaseUrl.replace(/\/+$/, '')}/help/${helpFileName(name)}`;
}

function functionMetadata(spec: FunctionSpec, helpBaseUrl: string): FunctionMetadata {
  const problem = whyInvalidFunctionId(spec.name);
  if (problem !== null) {
    throw new Error(
      `catalog name "${spec.name}" cannot be an Excel custom function id: it ${problem} ` + `(Office's custom-function naming rules)`,
    );
  }
  return {
    id: spec.name,
    name: spec.name,
    description: spec.summary,
    helpUrl: helpUrl(helpBaseUrl, spec.name),
    parameters: (spec.parameters as readonly ParameterSpec[]).map((param) => ({
      name: param.name,
      description: parameterDescription(param),
      type: 'any',
      dimensionality: 'matrix',
      optional: param.optional,
    })),
    result: { type: 'any', dimensionality: 'matrix' },
  };
}

/**
 * Builds functions.json from the catalog.
 *
 * @param catalog - the functions to publish, in order
 * @param helpBaseUrl - absolute URL the add-in is served from, e.g. `https://localhost:3000`
 * @returns the metadata object (serialise with JSON.stringify)
 * @example buildFunctionsMetadata(CATALOG, 'https://localhost:3000').functions[0].helpUrl // 'https://localhost:3000/help/bandgap.html'
 */
export function buildFunctionsMetadata(catalog: readonly FunctionSpec[], helpBaseUrl: string): CustomFunctionsMetadata {
  let base: URL;
  try {
    base = new URL(helpBaseUrl);
  } catch {
    throw new Error(`helpBaseUrl must be an absolute URL such as https://localhost:3000; got "${helpBaseUrl}"`);
  }
  if (base.protocol !== 'https:' && base.protocol !== 'http:') {
    throw new Error(`helpBaseUrl must use https (or http); got "${helpBaseUrl}"`);
  }
  const seen = new Set<string>();
  for (const spec of catalog) {
    if (seen.has(spec.name)) throw new Error(`catalog lists ${spec.name} twice; Excel ids must be unique`);
    seen.add(spec.name);
  }
  return {
    allowErrorForDataTypeAny: true,
    functions: catalog.map((spec) => functionMetadata(spec, helpBaseUrl)),
  };
}
