import { dopingWindow, resolveDopant, SILICON } from '../../physics';
import { dopant, resistivityModel, temperature } from '../common';
import { RESISTIVITY_MODELS } from '../citedModels';
import { requiredNumber } from '../parameters';
import { tupleFunction } from '../types';
import { DOPING_WINDOW_NAMES, dopingMax, dopingMin, dopingWindowOf } from './doping';
import { prose } from '../../text/prose';

function resistivityBound(name: string, what: string) {
  return requiredNumber({
    name,
    unit: 'Ω·cm',
    description: prose`${what} of the certificate's window, in Ω·cm,
    > 0.`,
    min: 0,
    minExclusive: true,
  });
}

export const DOPINGRANGE = tupleFunction({
  name: 'DOPINGRANGE',
  summary: 'Doping window [at ρmax, at ρmin] of a wafer certificate’s resistivity window, spilled as one row, in cm⁻³.',
  help: prose`Converts a resistivity window, as a wafer certificate states it, into the matching window of
    dopant density. It spills one row of two values: the density at resistivity_max and the density at
    resistivity_min. Where ρ falls as doping rises (always at room temperature) the first is the lower
    density, so the row reads low to high; on the rising stretch of low-temperature freeze-out the order is
    reversed. Each value is exactly what DRIFT.DOPING gives for that resistivity with the same model (blank:
    silicon's default f723-anchored), in silicon, without counter-doping. With the default model and
    temperature 296.15 K (23 °C, the temperature certificates refer to) the window is ASTM F723's own N-from-ρ
    conversion for B and P; at other temperatures the physics model carries the temperature dependence. Model
    astm-f723 gives the standard literally (B, P, As; 290–305 K).

    Given columns of windows, it spills one row per window. resistivity_min above resistivity_max is an error.

    Where one resistivity belongs to several densities (at low temperature freeze-out makes ρ rise and fall
    again with doping), the row is an error listing them, as in DRIFT.DOPING; doping_min and doping_max (cm⁻³,
    ends included) choose, for both ends of the window: exactly one solution between them is used.

    Cautions: a certificate's resistivity is measured (usually by four-point probe at the wafer centre) with
    its own tolerance; the doping window inherits the measurement's uncertainty and the model's, and it says
    nothing about radial variation (see DRIFT.RADIALVARIATION).`,
  result: { unit: 'cm⁻³', description: 'Dopant density window [at ρmax, at ρmin]' },
  columns: ['doping at resistivity_max', 'doping at resistivity_min'],
  parameters: [
    resistivityBound('resistivity_min', 'Low end'),
    resistivityBound('resistivity_max', 'High end'),
    dopant,
    temperature,
    resistivityModel,
    dopingMin,
    dopingMax,
  ] as const,
  examples: [
    { formula: '=DRIFT.DOPINGRANGE(8,12,"B")', note: 'a 8–12 Ω·cm boron wafer: two densities in a row' },
    { formula: '=DRIFT.DOPINGRANGE({1;0.005},{3;0.02},{"phosphorus";"Sb"})', note: 'two certificates, one window per row' },
    { formula: '=DRIFT.DOPINGRANGE(8,12,"B",296.15)', note: 'at 23 °C: the ASTM F723 window' },
    { formula: '=DRIFT.DOPINGRANGE(8,12,"B",,"masetti")', note: 'the same window from the Masetti physics alone' },
  ],
  models: RESISTIVITY_MODELS,
  compute: (rhoMin, rhoMax, dopantCode, temperatureK, model, min, max) =>
    dopingWindow(
      rhoMin,
      rhoMax,
      { material: SILICON, temperature: temperatureK, dopant: resolveDopant(SILICON, dopantCode), counterDensity: 0 },
      model,
      dopingWindowOf(min, max),
      DOPING_WINDOW_NAMES,
    ),
});
