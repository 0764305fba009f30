/**
 * The catalog: every DRIFT spreadsheet function, in the order help and the
 * README list them. Hosts register exactly this list.
 */
import { BANDGAP } from './functions/bandgap';
import { CONDUCTIVITY } from './functions/conductivity';
import { CURRENTDENSITY } from './functions/currentdensity';
import { VELOCITY } from './functions/velocity';
import { VSAT } from './functions/vsat';
import { TCR } from './functions/tcr';
import { DIFFUSIVITY } from './functions/diffusivity';
import { DOPING } from './functions/doping';
import { RESISTIVITYAT } from './functions/resistivityat';
import { ELECTRONS } from './functions/electrons';
import { FERMILEVEL } from './functions/fermilevel';
import { HOLES } from './functions/holes';
import { IONIZED } from './functions/ionized';
import { MAJORITY } from './functions/majority';
import { MINORITY } from './functions/minority';
import { MOBILITY } from './functions/mobility';
import { FREEMOBILITY } from './functions/freemobility';
import { MODELS } from './functions/models';
import { MODELCODES } from './functions/modelcodes';
import { CONDUCTIONDOS } from './functions/conductiondos';
import { INTRINSIC } from './functions/intrinsic';
import { NIEFF } from './functions/nieff';
import { VALENCEDOS } from './functions/valencedos';
import { RESISTIVITY } from './functions/resistivity';
import { RESISTOR } from './functions/resistor';
import { SHEETRES } from './functions/sheetres';
import { LAYERSHEETRES } from './functions/layersheetres';
import { IMPLANTSHEETRES } from './functions/implantsheetres';
import { JUNCTIONDEPTH } from './functions/junctiondepth';
import { FOURPOINT } from './functions/fourpoint';
import { FOURPOINTRS } from './functions/fourpointrs';
import { VANDERPAUW } from './functions/vanderpauw';
import { HALLDENSITY } from './functions/halldensity';
import { HALLMOBILITY } from './functions/hallmobility';
import { RESISTORLENGTH } from './functions/resistorlength';
import { RESISTORTEMP } from './functions/resistortemp';
import { DOPINGRANGE } from './functions/dopingrange';
import { DOPINGSPREAD, RESISTIVITYSPREAD } from './functions/modelspread';
import { RADIALVARIATION } from './functions/radialvariation';
import type { FunctionSpec } from './types';

export const CATALOG: readonly FunctionSpec[] = [
  BANDGAP,
  CONDUCTIONDOS,
  VALENCEDOS,
  INTRINSIC,
  NIEFF,
  ELECTRONS,
  HOLES,
  MAJORITY,
  MINORITY,
  IONIZED,
  FERMILEVEL,
  MOBILITY,
  FREEMOBILITY,
  DIFFUSIVITY,
  CONDUCTIVITY,
  RESISTIVITY,
  DOPING,
  CURRENTDENSITY,
  VELOCITY,
  VSAT,
  TCR,
  RESISTIVITYAT,
  SHEETRES,
  RESISTOR,
  LAYERSHEETRES,
  IMPLANTSHEETRES,
  JUNCTIONDEPTH,
  FOURPOINT,
  FOURPOINTRS,
  VANDERPAUW,
  HALLDENSITY,
  HALLMOBILITY,
  RESISTORLENGTH,
  RESISTORTEMP,
  DOPINGRANGE,
  RESISTIVITYSPREAD,
  DOPINGSPREAD,
  RADIALVARIATION,
  MODELS,
  MODELCODES,
] as readonly FunctionSpec[];

const BY_NAME = new Map(CATALOG.map((spec) => [spec.name, spec]));

/** Looks a function up by name, with or without the DRIFT. prefix, any case. */
export function findFunction(name: string): FunctionSpec | undefined {
  const bare = name
    .trim()
    .toUpperCase()
    .replace(/^DRIFT\./, '');
  return BY_NAME.get(bare);
}

/**
 * The functions whose help pages cite a model: from a registry entry's code
 * (MODEL_REGISTRY, src/physics/models.ts) to the catalog entries that use it.
 *
 * @param code - a model code, any case, e.g. 'Masetti'
 * @returns function names without the DRIFT. prefix, in catalog order (empty for a code no function cites)
 * @example functionsCiting('sproul-green') // → ['INTRINSIC']
 */
export function functionsCiting(code: string): readonly string[] {
  const wanted = code.trim().toLowerCase();
  return CATALOG.filter((spec) => spec.models.some((cited) => cited.toLowerCase() === wanted)).map((spec) => spec.name);
}

export { evaluate, toFailure, unwrapSingle } from './broadcast';
export { NAMESPACE, qualifiedName } from './naming';
export type { FunctionSpec, ParameterSpec, ElementwiseSpec, TableSpec, TupleSpec, RowSpec } from './types';
export * from './values';
