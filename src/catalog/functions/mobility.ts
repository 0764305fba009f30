import { carrierFor, mobility } from '../../physics';
import { carrier, counterDoping, dopant, doping, material, mobilityModel, sampleOf, temperature } from '../common';
import { elementwise } from '../types';

export const MOBILITY = elementwise({
  name: 'MOBILITY',
  summary: 'Low-field drift mobility of electrons or holes, in cm²/(V·s).',
  help: `Returns the low-field drift mobility of free carriers from the selected doping-dependent model, at the total impurity density (doping + counter_doping).

The published fits (Masetti, Arora, Caughey–Thomas) were made against resistivity and the *total* dopant density, as if every dopant were ionized. Driftcell's carrier densities include incomplete ionization, so for the majority carrier the fit is divided by the ionized share at 300 K (the fits' reference temperature): then σ = q(nμn + pμp) with DRIFT.MAJORITY and DRIFT.MINORITY reproduces the published resistivity at 300 K, and freeze-out still shows at low temperature. Below 1e17 cm⁻³ this correction is under 4 %; it is largest near 1e18 cm⁻³, where about a fifth of the dopants are not ionized at 300 K and the drift mobility is 25–30 % above the published curve. DRIFT.MOBILITY therefore differs from a handbook mobility plot there by design, while DRIFT.RESISTIVITY matches the published fit. Minority carriers use the fit unchanged.

The default (masetti) is dopant-specific for As, P and B and takes its temperature dependence from Arora's fit (200–500 K); see the model table for each model's range.`,
  result: { unit: 'cm²/(V·s)', description: 'Drift mobility' },
  parameters: [doping, dopant, temperature, carrier, mobilityModel, material, counterDoping] as const,
  examples: [
    { formula: '=DRIFT.MOBILITY(1e16,"P")', note: 'electrons in 1e16 cm⁻³ phosphorus-doped Si at 300 K' },
    { formula: '=DRIFT.MOBILITY(1e17,"B",300,"minority")', note: 'minority electrons in p-type Si' },
    { formula: '=DRIFT.MOBILITY(A2:A30,"As",,,"arora")', note: 'a doping column with the Arora model' },
  ],
  models: ['masetti', 'arora', 'caughey-thomas'],
  compute: (density, dopantCode, temperatureK, role, model, materialValue, counter) => {
    const sample = sampleOf(materialValue, temperatureK, dopantCode, density, counter);
    return mobility(model, carrierFor(sample.dopant, role), sample);
  },
});
