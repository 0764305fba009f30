import { dopingForResistivity, resolveDopant, type DensityWindow } from '../../physics';
import { MAX_DENSITY, counterDoping, dopant, material, resistivity, resistivityModel, temperature } from '../common';
import { requiredNumber } from '../parameters';
import type { ParameterSpec } from '../types';
import { elementwise } from '../types';
import { RESISTIVITY_MODELS } from '../citedModels';
import type { CellInput } from '../values';
import { prose } from '../../text/prose';

/** Names of the density window's ends, as arguments of DRIFT.DOPING and DRIFT.DOPINGRANGE. */
export const DOPING_WINDOW_NAMES = { min: 'doping_min', max: 'doping_max' } as const;

function isBlank(value: Exclude<CellInput, { kind: 'failure' }>): boolean {
  return value === null || (typeof value === 'string' && value.trim() === '');
}

/**
 * One end of the density window; blank means that end is open. The low end
 * may be 0 (no bound either); the high end must be > 0, so a 0 there can only
 * be Excel's empty cell and counts as blank.
 */
function windowEnd(name: string, description: string, minExclusive: boolean): ParameterSpec<number | undefined> {
  const present = requiredNumber({ name, unit: 'cm⁻³', description, min: 0, minExclusive, max: MAX_DENSITY });
  return {
    name,
    type: 'number',
    unit: 'cm⁻³',
    description,
    details:
      'Where several dopant densities give the same resistivity (at low temperature, freeze-out makes ρ ' +
      'rise and fall again with doping; near intrinsic, light p-type doping exceeds the intrinsic ρ), ' +
      'the result is an error listing them. doping_min and doping_max (ends included) choose the one ' +
      'meant: exactly one solution between them is returned. Blank: no bound.',
    optional: true,
    zeroIsBlank: present.zeroIsBlank,
    parse: (value) => (isBlank(value) ? undefined : present.parse(value)),
  };
}

/** Lowest dopant density to accept, for picking one of several solutions. */
export const dopingMin = windowEnd(
  DOPING_WINDOW_NAMES.min,
  'Lowest dopant density accepted in cm⁻³, to ' + 'pick one where several give the resistivity; blank: no bound.',
  false,
);
/** Highest dopant density to accept, for picking one of several solutions. */
export const dopingMax = windowEnd(
  DOPING_WINDOW_NAMES.max,
  'Highest dopant density accepted in cm⁻³, to ' + 'pick one where several give the resistivity; blank: no bound.',
  true,
);

/** The window the two optional arguments give. */
export function dopingWindowOf(min: number | undefined, max: number | undefined): DensityWindow {
  return { min, max };
}

export const DOPING = elementwise({
  name: 'DOPING',
  summary: 'Dopant density that gives a resistivity (the inverse of DRIFT.RESISTIVITY), in cm⁻³.',
  help: prose`Finds the density of the given dopant for which the resistivity model, with the same
    temperature, model, material and counter-doping, gives the resistivity, with a bracketed root finder. For
    every model but silicon's default the two functions are exact inverses of DRIFT.RESISTIVITY (to about 1e-9
    relative). The default, f723-anchored, follows the standard in each direction: ASTM F723 gives one
    equation for ρ from N and another for N from ρ, and this function is anchored to the second, so at 296.15
    K (23 °C) without counter-doping it returns F723's own N-from-ρ value for B and P (what incoming
    inspection converts a certificate with). Then DRIFT.RESISTIVITY of the result differs from the resistivity
    by the standard's own inconsistency between its two equations (up to about 3 % for B and 4.5 % for P, as
    F723 states). Model masetti gives the exact inverse of the physics alone. A resistivity that no density of
    this dopant can reach (for example above the intrinsic value, or above what the counter-doping allows)
    gives an error stating the reachable range.

    Resistivity does not always fall as doping rises, so one resistivity can belong to several densities: at
    low temperature (for example 77 K) freeze-out makes moderately doped silicon more resistive than lighter
    doping up to the Mott transition, so up to three densities give the same ρ; near intrinsic, light p-type
    doping is slightly more resistive than intrinsic material. DRIFT.DOPING never chooses silently: it scans
    the whole density range, and where more than one density gives the resistivity the result is an error
    listing them (3 significant digits). Give doping_min and/or doping_max (cm⁻³, ends included) to choose:
    exactly one solution between them is returned; none or several is an error listing the solutions. Where
    the solution is unique, doping_min and doping_max only check it.`,
  result: { unit: 'cm⁻³', description: 'Dopant density' },
  parameters: [resistivity, dopant, temperature, resistivityModel, material, counterDoping, dopingMin, dopingMax] as const,
  examples: [
    { formula: '=DRIFT.DOPING(10,"B")', note: 'boron density of a 10 Ω·cm p-type wafer' },
    { formula: '=DRIFT.DOPING(B2:C2,"phosphorus")', note: 'a certificate’s ρ window to a doping window' },
    { formula: '=DRIFT.DOPING(10,"B",296.15)', note: 'at 23 °C: the ASTM F723 value' },
    {
      formula: '=DRIFT.DOPING(0.4,"phosphorus",77,,,,1e16,3e17)',
      note: 'at 77 K three densities give 0.4 Ω·cm: the one between 1e16 and 3e17',
    },
  ],
  models: RESISTIVITY_MODELS,
  compute: (target, dopantCode, temperatureK, model, materialValue, counter, min, max) =>
    dopingForResistivity(
      target,
      { material: materialValue, temperature: temperatureK, dopant: resolveDopant(materialValue, dopantCode), counterDensity: counter },
      model,
      dopingWindowOf(min, max),
      DOPING_WINDOW_NAMES,
    ).density,
});
