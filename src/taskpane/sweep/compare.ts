/**
 * The sweep's "compare models": instead of one model, every model that
 * applies to the quantity for the chosen material and dopant, as
 * DRIFT.MODELCODES lists them (default first). The formula's model argument
 * becomes that DRIFT.MODELCODES call with literal arguments, so it spills one
 * column per model in Excel and the headless engine alike (the engine fixes
 * a spill's size from the formula text, so the arguments cannot be cells).
 *
 * The spread this shows is how far published fits disagree with one another
 * at the same conditions, not a measurement uncertainty.
 */
import { findFunction } from '../../catalog';
import { applicableModelCodes, modelQuantityOfParameter, type ModelQuantity } from '../../catalog/modelCodes';
import { qualifiedName } from '../../catalog/naming';
import type { ParameterSpec } from '../../catalog/types';
import { settingKey, textLiteral, type ModelsArgument, type SettingValues } from './arguments';
import { settingParameters, type SweepQuantity } from './quantities';

/** The catalog function that lists the codes. */
const MODEL_CODES_FUNCTION = 'MODELCODES';

/** Help shown beside the option: what the band is and is not. */
export const COMPARE_MODELS_HELP =
  'Draws every model that applies to this material and dopant (DRIFT.MODELCODES), the default heavier, over a band from the ' +
  'lowest to the highest. The band is how far published fits disagree with one another, not a measurement uncertainty. ' +
  'Inserts the codes as a header row over one formula, a column and a chart series per model.';

/** The model setting of a quantity that compare-models replaces. */
export interface ModelSetting {
  /** settingKey of the model control, e.g. 'inner:model'. */
  readonly key: string;
  readonly spec: ParameterSpec;
  /** DRIFT.MODELCODES' quantity word for that argument. */
  readonly modelQuantity: ModelQuantity;
}

/**
 * The setting whose codes DRIFT.MODELCODES lists, or null when the quantity's functions take no model argument
 * (MAJORITY, MINORITY, VSAT). Asked of the catalog per parameter (modelQuantityOfParameter).
 *
 * @example modelSettingOf(rho)?.key // 'inner:model'
 */
export function modelSettingOf(quantity: SweepQuantity): ModelSetting | null {
  for (const { owner, spec } of settingParameters(quantity)) {
    const modelQuantity = modelQuantityOfParameter(spec);
    if (modelQuantity !== undefined) return { key: settingKey(owner, spec.name), spec, modelQuantity };
  }
  return null;
}

/** The comparison: the codes, and the argument that puts them into the formula. */
export interface ModelComparison {
  readonly setting: ModelSetting;
  /** The codes, default first. */
  readonly codes: readonly string[];
  /** The DRIFT.MODELCODES call without '=', e.g. 'DRIFT.MODELCODES("resistivity","Si","B")'. */
  readonly call: string;
  readonly argument: ModelsArgument;
}

/**
 * The models to compare for the entered settings: the material and dopant controls of the function that takes the
 * model (blank material: the function's default, Si; blank or absent dopant: any dopant).
 *
 * @param quantity - what is swept
 * @param values - entered setting values by settingKey
 * @returns the comparison, or a problem saying why there is none
 * @example compareModels(rho, { 'inner:dopant': 'B' }) // codes f723-anchored … astm-f723, call DRIFT.MODELCODES("resistivity",,"B")
 */
export function compareModels(
  quantity: SweepQuantity,
  values: SettingValues,
): { ok: true; comparison: ModelComparison } | { ok: false; problem: string } {
  const setting = modelSettingOf(quantity);
  if (setting === null)
    return {
      ok: false,
      problem: `Compare models needs a model argument; ` + `${quantity.label} (${qualifiedName(quantity.outer)}) has none.`,
    };
  const owner = setting.key.slice(0, setting.key.indexOf(':')) as 'inner' | 'outer';
  const function_ = owner === 'inner' ? quantity.inner : quantity.outer;
  const entered = (name: string): string | undefined => {
    if (!function_.parameters.some((p) => p.name === name)) return undefined;
    const text = (values[settingKey(owner, name)] ?? '').trim();
    return text === '' ? undefined : text;
  };
  const material = entered('material');
  const dopant = entered('dopant');
  let codes: readonly string[];
  try {
    codes = applicableModelCodes(setting.modelQuantity, material, dopant);
  } catch (error) {
    return { ok: false, problem: `Compare models: ${error instanceof Error ? error.message : String(error)}` };
  }
  const spec = findFunction(MODEL_CODES_FUNCTION);
  if (spec === undefined) return { ok: false, problem: `Compare models needs DRIFT.${MODEL_CODES_FUNCTION}, which this catalog lacks.` };
  // Literal arguments only, trailing blanks dropped, a blank material before a dopant left empty: DRIFT.MODELCODES("resistivity",,"B").
  const literals = [
    textLiteral(setting.modelQuantity),
    material === undefined ? '' : textLiteral(material),
    dopant === undefined ? '' : textLiteral(dopant),
  ];
  while (literals[literals.length - 1] === '') literals.pop();
  const call = `${qualifiedName(spec)}(${literals.join(',')})`;
  return { ok: true, comparison: { setting, codes, call, argument: { key: setting.key, argument: { kind: 'models', codes, call } } } };
}
