/**
 * Everything the Function reference shows about one catalog entry, gathered
 * from the catalog and the model registry (never written out by hand): the
 * signature with units, each parameter, the result, the cited models with
 * their validity ranges, and the examples.
 */
import { qualifiedName } from '../../catalog/naming';
import type { FunctionSpec, ParameterSpec } from '../../catalog/types';
import { PhysicsDomainError, modelInfo, type ModelInfo } from '../../catalog/physicsFacade';

/** One parameter as the reference lists it. */
export interface ParameterDetail {
  readonly name: string;
  readonly unit: string | null;
  readonly optional: boolean;
  readonly defaultText: string | null;
  readonly description: string;
  /** Allowed codes, for code parameters. */
  readonly choices: readonly string[];
}

/** A model the entry cites; `info` is null when the registry has no such code. */
export interface ModelDetail {
  readonly code: string;
  readonly info: ModelInfo | null;
}

export interface FunctionDetails {
  readonly qualifiedName: string;
  readonly summary: string;
  /** e.g. 'DRIFT.SHEETRES(resistivity (Ω·cm), thickness_um (µm)) → Ω/sq' */
  readonly signature: string;
  readonly parameters: readonly ParameterDetail[];
  readonly result: { readonly unit: string | null; readonly description: string };
  /** Column names of a function that spills a fixed row (tuple entries). */
  readonly columns: readonly string[];
  readonly models: readonly ModelDetail[];
  readonly examples: FunctionSpec['examples'];
  /** Help text as paragraphs. */
  readonly help: readonly string[];
}

/**
 * A model code's registry entry (the registry's own look-up, case-insensitive), or null when it has none.
 *
 * @example citedModel('masetti')?.citation
 */
export function citedModel(code: string): ModelInfo | null {
  try {
    return modelInfo(code);
  } catch (error) {
    if (error instanceof PhysicsDomainError) return null;
    throw error;
  }
}

/**
 * One argument as the signature shows it: name, unit in parentheses, optional ones in brackets.
 *
 * @example parameterWithUnit(temperature) // '[temperature_K (K)]'
 */
export function parameterWithUnit(parameter: ParameterSpec): string {
  const text = parameter.unit === null ? parameter.name : `${parameter.name} (${parameter.unit})`;
  return parameter.optional ? `[${text}]` : text;
}

/**
 * The call with units and the result unit.
 *
 * @example signatureWithUnits(SHEETRES) // 'DRIFT.SHEETRES(resistivity (Ω·cm), thickness_um (µm)) → Ω/sq'
 */
export function signatureWithUnits(spec: FunctionSpec): string {
  const call = `${qualifiedName(spec)}(${spec.parameters.map(parameterWithUnit).join(', ')})`;
  return spec.result.unit === null ? call : `${call} → ${spec.result.unit}`;
}

/**
 * Details of a catalog entry.
 *
 * @param spec - catalog entry
 * @example describeFunction(DOPING).models[0].info?.citation
 */
export function describeFunction(spec: FunctionSpec): FunctionDetails {
  return {
    qualifiedName: qualifiedName(spec),
    summary: spec.summary,
    signature: signatureWithUnits(spec),
    parameters: spec.parameters.map((parameter) => ({
      name: parameter.name,
      unit: parameter.unit,
      optional: parameter.optional,
      defaultText: parameter.defaultText ?? null,
      description: parameter.description,
      choices: parameter.choices?.() ?? [],
    })),
    result: spec.result,
    columns: spec.kind === 'tuple' ? spec.columns : [],
    models: spec.models.map((code) => ({ code, info: citedModel(code) })),
    examples: spec.examples,
    help: spec.help
      .split(/\n\s*\n/)
      .map((paragraph) => paragraph.trim())
      .filter((paragraph) => paragraph !== ''),
  };
}
