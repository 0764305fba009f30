import { CERTIFICATE_TEMPERATURE, resistivityAtTemperature, resolveDopant } from '../../physics';
import { TEMPERATURE_RANGE_K, counterDoping, dopant, material, resistivityModel } from '../common';
import { optionalNumber, requiredNumber } from '../parameters';
import { elementwise } from '../types';
import { RESISTIVITY_MODELS } from '../citedModels';
import { DOPING_WINDOW_NAMES, dopingMax, dopingMin, dopingWindowOf } from './doping';
import { prose } from '../../text/prose';

const measuredResistivity = requiredNumber({
  name: 'resistivity',
  unit: 'Ω·cm',
  description: 'Resistivity read at measured_temperature_K, in Ω·cm, > 0.',
  min: 0,
  minExclusive: true,
});

const measuredTemperature = requiredNumber({
  name: 'measured_temperature_K',
  unit: 'K',
  description: prose`Temperature the resistivity was measured at, in kelvin (°C + 273.15),
    ${TEMPERATURE_RANGE_K.min}–${TEMPERATURE_RANGE_K.max} K.`,
  min: TEMPERATURE_RANGE_K.min,
  max: TEMPERATURE_RANGE_K.max,
});

const targetTemperature = optionalNumber({
  name: 'target_temperature_K',
  unit: 'K',
  description: prose`Temperature to convert to, in kelvin,
    ${TEMPERATURE_RANGE_K.min}–${TEMPERATURE_RANGE_K.max} K; blank means ${CERTIFICATE_TEMPERATURE} K (23 °C,
    where certificates state resistivity).`,
  defaultValue: CERTIFICATE_TEMPERATURE,
  min: TEMPERATURE_RANGE_K.min,
  max: TEMPERATURE_RANGE_K.max,
});

export const RESISTIVITYAT = elementwise({
  name: 'RESISTIVITYAT',
  summary: 'Resistivity measured at one temperature converted to another (default 23 °C), in Ω·cm.',
  help: prose`Corrects a resistivity reading taken at the lab's temperature to another temperature, by default
    ${CERTIFICATE_TEMPERATURE} K (23 °C), where certificates and ASTM F723 state resistivity. The reading is
    turned into a dopant density at measured_temperature_K (as DRIFT.DOPING does) and the resistivity of that
    density is evaluated at target_temperature_K (as DRIFT.RESISTIVITY does). For small temperature
    differences this is the usual first-order correction ρ·(1 + TCR·ΔT) with the TCR of DRIFT.TCR; it stays
    right where the TCR itself changes with temperature. Equal temperatures return the reading unchanged.

    Both steps use one forward model, so converting to the measurement temperature gives the reading back.
    Silicon's default, f723-anchored, is anchored to one F723 equation in each direction, and mixing them
    would move a reading by up to 3–4.5 % with no temperature change at all; so here a blank model (or
    f723-anchored) uses the physics it is built on (masetti in silicon), whose temperature dependence at a
    given density is exactly the anchored model's. astm-f723 has no temperature dependence and is refused.
    Temperatures are in kelvin (°C + 273.15).

    Where several densities give the reading at the measurement temperature (freeze-out at low temperature,
    light p-type near intrinsic) the result is an error listing them, as in DRIFT.DOPING; doping_min and
    doping_max (cm⁻³) choose one.`,
  result: { unit: 'Ω·cm', description: 'Resistivity at the target temperature' },
  parameters: [
    measuredResistivity,
    dopant,
    measuredTemperature,
    targetTemperature,
    resistivityModel,
    material,
    counterDoping,
    dopingMin,
    dopingMax,
  ] as const,
  examples: [
    { formula: '=DRIFT.RESISTIVITYAT(10.2,"B",298.15)', note: 'a boron wafer read at 25 °C, corrected to 23 °C' },
    { formula: '=DRIFT.RESISTIVITYAT(B2:B20,"phosphorus",C2:C20+273.15)', note: 'a column of readings, each with its °C' },
    { formula: '=DRIFT.RESISTIVITYAT(5,"phosphorus",296.15,350)', note: 'a 23 °C value at 350 K' },
  ],
  models: RESISTIVITY_MODELS,
  compute: (rho, dopantCode, measuredK, targetK, model, materialValue, counter, min, max) =>
    resistivityAtTemperature(
      rho,
      { material: materialValue, temperature: measuredK, dopant: resolveDopant(materialValue, dopantCode), counterDensity: counter },
      targetK,
      model,
      dopingWindowOf(min, max),
      DOPING_WINDOW_NAMES,
    ),
});
