/**
 * What the sweep builder can sweep: a curated list of catalog functions and
 * how the axes map onto their parameters. Everything else (labels, units,
 * parameter lists, choices, defaults) is read from the catalog when the pane
 * loads, so functions, materials or models added later appear by themselves;
 * a listed function the catalog lacks is left out.
 */
import { CATALOG } from '../../catalog';
import type { FunctionSpec, ParameterSpec } from '../../catalog/types';

/** The parameter a doping axis feeds. */
export const DOPING_PARAMETER = 'doping';
/** The parameter a temperature axis feeds (always in K). */
export const TEMPERATURE_PARAMETER = 'temperature_K';

/** One entry of the curated list. */
export interface QuantityEntry {
  /** Catalog name of the function whose value is plotted. */
  readonly name: string;
  /**
   * For functions of resistivity (SHEETRES, RESISTOR): the doping-and-temperature function whose
   * result feeds the named parameter, so the sweep runs over doping like the others.
   */
  readonly through?: { readonly name: string; readonly parameter: string };
  /** Whether the values span decades (log axis); false for quantities that can be negative or vary little. */
  readonly logValues: boolean;
}

/** The curated list, in menu order. */
export const QUANTITY_ENTRIES: readonly QuantityEntry[] = [
  { name: 'RESISTIVITY', logValues: true },
  { name: 'CONDUCTIVITY', logValues: true },
  { name: 'MOBILITY', logValues: false },
  { name: 'MAJORITY', logValues: true },
  { name: 'MINORITY', logValues: true },
  { name: 'INTRINSIC', logValues: true },
  { name: 'NIEFF', logValues: true },
  { name: 'DIFFUSIVITY', logValues: false },
  { name: 'VSAT', logValues: false },
  { name: 'SHEETRES', through: { name: 'RESISTIVITY', parameter: 'resistivity' }, logValues: true },
  { name: 'RESISTOR', through: { name: 'RESISTIVITY', parameter: 'resistivity' }, logValues: true },
  // TCR changes sign near intrinsic conduction, so its values stay on a linear axis.
  { name: 'TCR', logValues: false },
];

/** A quantity resolved against the catalog. */
export interface SweepQuantity {
  /** Menu key: the plotted function's name. */
  readonly id: string;
  /** e.g. 'Resistivity ρ' (the catalog's result description). */
  readonly label: string;
  /** Result unit, e.g. 'Ω·cm', or null. */
  readonly unit: string | null;
  /** The plotted function. */
  readonly outer: FunctionSpec;
  /** The function that takes doping/temperature: `outer` itself, or the one feeding it. */
  readonly inner: FunctionSpec;
  /** Name of outer's parameter that receives inner's result, when inner ≠ outer. */
  readonly throughParameter: string | null;
  readonly logValues: boolean;
  /** Whether inner has a doping / temperature parameter. */
  readonly hasDoping: boolean;
  readonly hasTemperature: boolean;
}

/** A parameter the user sets with a control (not fed by an axis or by the inner function). */
export interface SettingParameter {
  /** 'inner' or 'outer' function. */
  readonly owner: 'inner' | 'outer';
  readonly spec: ParameterSpec;
}

function elementwiseByName(name: string, catalog: readonly FunctionSpec[]): FunctionSpec | undefined {
  const spec = catalog.find((f) => f.name === name);
  return spec !== undefined && spec.kind === 'elementwise' ? spec : undefined;
}

/**
 * The quantities this catalog supports, in menu order.
 *
 * @param catalog - the function list (default: CATALOG)
 * @example availableQuantities().map((q) => q.id) // ['RESISTIVITY', 'CONDUCTIVITY', …]
 */
export function availableQuantities(catalog: readonly FunctionSpec[] = CATALOG): SweepQuantity[] {
  const quantities: SweepQuantity[] = [];
  for (const entry of QUANTITY_ENTRIES) {
    const outer = elementwiseByName(entry.name, catalog);
    if (outer === undefined) continue;
    const inner = entry.through === undefined ? outer : elementwiseByName(entry.through.name, catalog);
    if (inner === undefined) continue;
    if (entry.through !== undefined && !outer.parameters.some((p) => p.name === entry.through?.parameter)) continue;
    const hasDoping = inner.parameters.some((p) => p.name === DOPING_PARAMETER);
    const hasTemperature = inner.parameters.some((p) => p.name === TEMPERATURE_PARAMETER);
    if (!hasDoping && !hasTemperature) continue;
    quantities.push({
      id: outer.name,
      label: outer.result.description,
      unit: outer.result.unit,
      outer,
      inner,
      throughParameter: entry.through?.parameter ?? null,
      logValues: entry.logValues,
      hasDoping,
      hasTemperature,
    });
  }
  return quantities;
}

/** The parameters the user sets for a quantity: inner's (except axes), then outer's (except the fed one). */
export function settingParameters(quantity: SweepQuantity): SettingParameter[] {
  const inner = quantity.inner.parameters
    .filter((p) => p.name !== DOPING_PARAMETER && p.name !== TEMPERATURE_PARAMETER)
    .map((spec) => ({ owner: 'inner' as const, spec }));
  if (quantity.throughParameter === null) return inner;
  const outer = quantity.outer.parameters
    .filter((p) => p.name !== quantity.throughParameter)
    .map((spec) => ({
      owner: 'outer' as const,
      spec,
    }));
  return [...inner, ...outer];
}
