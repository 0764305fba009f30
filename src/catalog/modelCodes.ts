/**
 * Which model codes apply to a quantity for a material (and a dopant where it
 * matters): the list DRIFT.MODELCODES spills as one row, so that a function
 * taking a `model` argument spills across every applicable model, and the
 * list the task pane offers for a function's model argument.
 *
 * Every list is the physics' own (resistivityModelCodes, mobilityModelCodes,
 * intrinsicModelCodes, the bandgap-narrowing table), in its order, so the
 * material's default comes first and the codes stand in the order the help
 * pages cite them (src/catalog/citedModels.ts builds those from the same
 * lists). The one dopant rule, that ASTM F723 covers B, P and As only, is the
 * standard's own check (f723SpeciesFor), asked rather than restated.
 */
import {
  BANDGAP_NARROWING_MODEL_CODES,
  ASTM_F723_CODE,
  F723_ANCHOR_TEMPERATURE,
  PhysicsDomainError,
  f723SpeciesFor,
  intrinsicModelCodes,
  mobilityModelCodes,
  resistivityModelCodes,
  resolveBandgapNarrowingModel,
  resolveDopant,
  type Dopant,
  type Material,
} from '../physics';
import { dopant as dopantParameter, intrinsicModel, material as materialParameter, mobilityModel, resistivityModel } from './common';
import { bandgapNarrowingModel } from './functions/nieff';
import { codeParameter } from './parameters';
import type { FunctionSpec, ParameterSpec } from './types';
import { InputError } from './values';

/** A quantity whose model codes can be listed (DRIFT.MODELCODES' first argument). */
export type ModelQuantity = 'resistivity' | 'mobility' | 'intrinsic' | 'bandgap-narrowing';

interface QuantityEntry {
  /** The catalog's `model` argument that takes these codes (identity: modelQuantityOf compares it). */
  readonly parameter: ParameterSpec;
  /** What the codes are, for help. */
  readonly what: string;
  /** The functions whose model argument takes them, for help (tests/catalog/modelCodes.test.ts holds these to the catalog). */
  readonly takenBy: readonly string[];
  /** The codes for a host, and a dopant when one is given; default first. */
  readonly codes: (host: Material, dopant: Dopant | undefined) => readonly string[];
}

/** Whether ASTM F723 covers a dopant, by the standard's own check (uncompensated, at its own temperature). */
function f723CoversDopant(dopant: Dopant): boolean {
  try {
    f723SpeciesFor(dopant.symbol, 0, F723_ANCHOR_TEMPERATURE);
    return true;
  } catch (error) {
    if (error instanceof PhysicsDomainError) return false;
    throw error;
  }
}

/** Bandgap-narrowing codes with parameters for a host; the physics refuses a host it has none for. */
function bandgapNarrowingCodes(host: Material): readonly string[] {
  resolveBandgapNarrowingModel(host);
  return BANDGAP_NARROWING_MODEL_CODES.filter((code) => {
    try {
      resolveBandgapNarrowingModel(host, code);
      return true;
    } catch (error) {
      if (error instanceof PhysicsDomainError) return false;
      throw error;
    }
  });
}

/** Every quantity, in the order help lists them. */
const QUANTITIES: Readonly<Record<ModelQuantity, QuantityEntry>> = {
  resistivity: {
    parameter: resistivityModel,
    what: 'resistivity models',
    takenBy: ['RESISTIVITY', 'CONDUCTIVITY', 'DOPING', 'DOPINGRANGE', 'RESISTIVITYAT', 'TCR'],
    codes: (host, dopant) =>
      resistivityModelCodes(host).filter((code) => code !== ASTM_F723_CODE || dopant === undefined || f723CoversDopant(dopant)),
  },
  mobility: {
    parameter: mobilityModel,
    what: 'mobility models',
    takenBy: ['MOBILITY', 'FREEMOBILITY', 'DIFFUSIVITY'],
    codes: (host) => mobilityModelCodes(host),
  },
  intrinsic: {
    parameter: intrinsicModel,
    what: 'intrinsic-density (ni) models',
    takenBy: ['INTRINSIC'],
    codes: (host) => intrinsicModelCodes(host),
  },
  'bandgap-narrowing': {
    parameter: bandgapNarrowingModel,
    what: 'apparent bandgap-narrowing models, silicon only',
    takenBy: ['NIEFF'],
    codes: (host) => bandgapNarrowingCodes(host),
  },
};

/** The quantity words, in the order help lists them. */
export const MODEL_QUANTITIES = Object.keys(QUANTITIES) as readonly ModelQuantity[];

/** "resistivity: resistivity models (RESISTIVITY, …); mobility: …", for help. */
export const MODEL_QUANTITY_LIST = MODEL_QUANTITIES.map(
  (quantity) => `${quantity}: ${QUANTITIES[quantity].what} (${QUANTITIES[quantity].takenBy.join(', ')})`,
).join('; ');

/** The functions whose model argument takes a quantity's codes, as help names them. */
export function functionsTaking(quantity: ModelQuantity): readonly string[] {
  return QUANTITIES[quantity].takenBy;
}

/** DRIFT.MODELCODES' first argument: a quantity word, any case. */
export const modelQuantity = codeParameter<ModelQuantity>({
  name: 'quantity',
  description: `Which models: ${MODEL_QUANTITIES.join(', ')} (any case); list on the help page.`,
  choices: () => MODEL_QUANTITIES,
  resolve: (code) => code as ModelQuantity,
});

/** An optional dopant: blank means any dopant (every code that applies to some dopant of the material). */
export const anyDopant: ParameterSpec<string> = {
  ...dopantParameter,
  description: 'Dopant (B, As, phosphorus…, donor / acceptor); blank means any. It matters for astm-f723 (B, P, As only).',
  optional: true,
  defaultText: 'any dopant',
  parse(value) {
    if (value === null || (typeof value === 'string' && value.trim() === '')) return '';
    return dopantParameter.parse(value);
  },
};

/**
 * The codes for parsed arguments: a material and a dopant text ('' = any).
 * Throws InputError for a dopant the material does not know or a quantity
 * with no model for the material.
 */
export function modelCodesFor(quantity: ModelQuantity, host: Material, dopantText: string): readonly string[] {
  let dopant: Dopant | undefined;
  try {
    dopant = dopantText === '' ? undefined : resolveDopant(host, dopantText);
  } catch (error) {
    if (error instanceof PhysicsDomainError) throw new InputError(error.message);
    throw error;
  }
  let codes: readonly string[];
  try {
    codes = [...new Set(QUANTITIES[quantity].codes(host, dopant))];
  } catch (error) {
    if (error instanceof PhysicsDomainError) throw new InputError(`material ${host.code}: ${error.message}`);
    throw error;
  }
  if (codes.length === 0) throw new InputError(`material ${host.code}: no ${quantity} model has parameters for ${host.name}`);
  return codes;
}

/**
 * Codes of the models that apply to a quantity for a material (typed code, blank = silicon/default material) and
 * dopant (typed code, blank = any dopant); default first. Throws the catalog's InputError (clear message naming
 * what is allowed) for an unknown quantity, material or dopant.
 */
export function applicableModelCodes(quantity: ModelQuantity, material?: string, dopant?: string): readonly string[] {
  const parsedQuantity = modelQuantity.parse(quantity);
  const host = materialParameter.parse(material ?? null);
  const dopantText = anyDopant.parse(dopant ?? null);
  return modelCodesFor(parsedQuantity, host, dopantText);
}

const QUANTITY_OF_PARAMETER = new Map<ParameterSpec, ModelQuantity>(
  MODEL_QUANTITIES.map((quantity) => [QUANTITIES[quantity].parameter, quantity]),
);

/** The quantity whose codes a catalog parameter takes (it is one of the shared `model` arguments), or undefined. */
export function modelQuantityOfParameter(parameter: ParameterSpec): ModelQuantity | undefined {
  return QUANTITY_OF_PARAMETER.get(parameter);
}

/** The quantity whose codes a catalog function's `model` argument takes, or undefined when it has none. */
export function modelQuantityOf(spec: FunctionSpec): ModelQuantity | undefined {
  for (const parameter of spec.parameters as readonly ParameterSpec[]) {
    const quantity = modelQuantityOfParameter(parameter);
    if (quantity !== undefined) return quantity;
  }
  return undefined;
}
