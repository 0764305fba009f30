import { dopingSpread, resistivitySpread, resolveDopant } from '../../physics';
import { counterDoping, dopant, doping, material, resistivity, sampleOf, temperature } from '../common';
import { RESISTIVITY_MODELS } from '../citedModels';
import { tupleFunction } from '../types';
import { DOPING_WINDOW_NAMES, dopingMax, dopingMin, dopingWindowOf } from './doping';
import { prose } from '../../text/prose';

const WHAT_SPREAD_IS =
  `The spread is how far the published fits disagree for this sample, not a ` +
  `measurement uncertainty: fits made against the same data agree closely and can share a bias, and a ` +
  `resistivity measured on a wafer has its own tolerance besides. The models are every resistivity model ` +
  `of the material (see DRIFT.MODELS()): in silicon f723-anchored, masetti, arora, caughey-thomas, ` +
  `klaassen, and astm-f723 where the standard applies (B, P or As, uncompensated, 290–305 K, inside its ` +
  `range); another material has one model, so its spread is 0. A model that refuses the sample (for ` +
  `example several densities at 77 K) makes the row an error naming the model.`;

const COLUMNS = ['lowest', 'highest', 'relative spread (highest/lowest − 1)'];

export const RESISTIVITYSPREAD = tupleFunction({
  name: 'RESISTIVITYSPREAD',
  summary: 'Lowest and highest resistivity over the published models, and their relative spread, spilled as one row.',
  help: prose`Returns one row of three values for a sample: the lowest resistivity any applicable model gives
    (Ω·cm), the highest, and highest/lowest − 1. Given columns of doping, it spills one row per doping.

    ${WHAT_SPREAD_IS}`,
  result: { unit: 'Ω·cm', description: 'Resistivity [lowest, highest, relative spread]' },
  columns: COLUMNS,
  parameters: [doping, dopant, temperature, material, counterDoping] as const,
  examples: [
    { formula: '=DRIFT.RESISTIVITYSPREAD(1e16,"B")', note: 'how far the silicon models disagree at 1e16 cm⁻³ boron, 300 K' },
    { formula: '=DRIFT.RESISTIVITYSPREAD(A2:A20,"phosphorus",296.15)', note: 'a column of dopings at 23 °C: one row each' },
  ],
  models: RESISTIVITY_MODELS,
  compute: (density, dopantCode, temperatureK, materialValue, counter) => {
    const spread = resistivitySpread(sampleOf(materialValue, temperatureK, dopantCode, density, counter));
    return [spread.lowest, spread.highest, spread.relativeSpread];
  },
});

export const DOPINGSPREAD = tupleFunction({
  name: 'DOPINGSPREAD',
  summary: 'Lowest and highest dopant density for a resistivity over the published models, and their relative spread, as one row.',
  help: prose`Returns one row of three values for a resistivity: the lowest dopant density any applicable
    model gives for it (cm⁻³, as DRIFT.DOPING with that model), the highest, and highest/lowest − 1. A
    certificate row can carry it beside DRIFT.DOPINGRANGE: "doping 1.05e15 … 1.18e15 cm⁻³ depending on model".
    Where several densities give the resistivity (freeze-out at low temperature), doping_min and doping_max
    choose one for every model, as in DRIFT.DOPING.

    ${WHAT_SPREAD_IS}`,
  result: { unit: 'cm⁻³', description: 'Dopant density [lowest, highest, relative spread]' },
  columns: COLUMNS,
  parameters: [resistivity, dopant, temperature, material, counterDoping, dopingMin, dopingMax] as const,
  examples: [
    { formula: '=DRIFT.DOPINGSPREAD(10,"B",296.15)', note: 'a 10 Ω·cm boron certificate at 23 °C: the models’ range of doping' },
    { formula: '=DRIFT.DOPINGSPREAD(0.01,"phosphorus",296.15)', note: 'heavily doped phosphorus, where the fits disagree more' },
  ],
  models: RESISTIVITY_MODELS,
  compute: (target, dopantCode, temperatureK, materialValue, counter, min, max) => {
    const sample = {
      material: materialValue,
      temperature: temperatureK,
      dopant: resolveDopant(materialValue, dopantCode),
      counterDensity: counter,
    };
    const spread = dopingSpread(target, sample, dopingWindowOf(min, max), DOPING_WINDOW_NAMES);
    return [spread.lowest, spread.highest, spread.relativeSpread];
  },
});
