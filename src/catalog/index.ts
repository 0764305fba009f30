/**
 * The catalog: every DRIFT spreadsheet function, in the order help and the
 * README list them. Hosts register exactly this list.
 */
import { BANDGAP } from './functions/bandgap';
import { CONDUCTIVITY } from './functions/conductivity';
import { CURRENTDENSITY } from './functions/currentdensity';
import { DIFFUSIVITY } from './functions/diffusivity';
import { DOPING } from './functions/doping';
import { ELECTRONS } from './functions/electrons';
import { FERMILEVEL } from './functions/fermilevel';
import { HOLES } from './functions/holes';
import { IONIZED } from './functions/ionized';
import { MAJORITY } from './functions/majority';
import { MINORITY } from './functions/minority';
import { MOBILITY } from './functions/mobility';
import { MODELS } from './functions/models';
import { NC } from './functions/nc';
import { NI } from './functions/ni';
import { NV } from './functions/nv';
import { RESISTIVITY } from './functions/resistivity';
import { RESISTOR } from './functions/resistor';
import { SHEETRES } from './functions/sheetres';
import type { FunctionSpec } from './types';

export const CATALOG: readonly FunctionSpec[] = [
  BANDGAP,
  NC,
  NV,
  NI,
  ELECTRONS,
  HOLES,
  MAJORITY,
  MINORITY,
  IONIZED,
  FERMILEVEL,
  MOBILITY,
  DIFFUSIVITY,
  CONDUCTIVITY,
  RESISTIVITY,
  DOPING,
  CURRENTDENSITY,
  SHEETRES,
  RESISTOR,
  MODELS,
] as readonly FunctionSpec[];

const BY_NAME = new Map(CATALOG.map((spec) => [spec.name, spec]));

/** Looks a function up by name, with or without the DRIFT. prefix, any case. */
export function findFunction(name: string): FunctionSpec | undefined {
  const bare = name.trim().toUpperCase().replace(/^DRIFT\./, '');
  return BY_NAME.get(bare);
}

export { evaluate, toFailure, unwrapSingle } from './broadcast';
export { NAMESPACE, qualifiedName } from './naming';
export type { FunctionSpec, ParameterSpec, ElementwiseSpec, TableSpec } from './types';
export * from './values';
