import { carrierFor, mobility } from '../../physics';
import { carrier, counterDoping, dopant, doping, material, mobilityModel, sampleOf, temperature } from '../common';
import { elementwise } from '../types';
import { MOBILITY_MODELS } from '../citedModels';

export const MOBILITY = elementwise({
  name: 'MOBILITY',
  summary: 'Low-field drift mobility of electrons or holes, in cm²/(V·s).',
  help: `Returns the low-field drift mobility of free carriers from the selected doping-dependent model, at the total impurity density (doping + counter_doping).

The published fits (Masetti, Arora, Caughey–Thomas) were made against resistivity and the *total* dopant density, as if every dopant were ionized. Driftcell's carrier densities include incomplete ionization, so for the majority carrier the fit is divided by the ionized share at 300 K (the fits' reference temperature): then σ = q(nμn + pμp) with DRIFT.MAJORITY and DRIFT.MINORITY reproduces the published resistivity at 300 K, and freeze-out still shows at low temperature. Below 1e17 cm⁻³ this correction is under 4 %; it is largest near 1e18 cm⁻³, where about a fifth of the dopants are not ionized at 300 K and the drift mobility is 25–30 % above the published curve. DRIFT.MOBILITY therefore differs from a handbook mobility plot there by design, while DRIFT.RESISTIVITY matches the published fit. Minority carriers use the fit unchanged.

The default (masetti) is dopant-specific for As, P and B and takes its temperature dependence from Arora's fit (200–500 K); see the model table for each model's range.

klaassen (Klaassen 1992, silicon) is one model for majority and minority carriers. Unlike the other silicon models, which take the total impurity density, it treats donors, acceptors and the free carriers separately: a minority carrier is scattered less by the dopants that repel it and by the other carrier type, so in heavily doped material it moves faster than a majority carrier of the same type at the same doping (at 300 K about 1.8× for electrons in 1e19 cm⁻³ p-type vs n-type Si). Its temperature dependence is physically based: lattice scattering and the ionized-impurity terms each follow their own temperature law (fitted roughly 100–500 K; extrapolated outside). It takes dopant densities as in its fit and free carriers with the same 300 K ionized-share correction, so its 300 K resistivity follows the fit as well; at 300 K its majority mobility is within 5 % of masetti, whose μmax, μmin, Nref and α it shares.

Default away from 300 K: the default stays masetti (Masetti at 300 K times Arora's temperature ratio) at every temperature. Switching models with temperature would put a kink into every temperature sweep and would change results at 300 K, where masetti reproduces the resistivity standards. Choose klaassen for minority carriers, heavily doped or compensated material, and temperatures far from 300 K.

Other materials have their own fit, which is their default (blank model): hilsum for Ge, sotoodeh for GaAs, roschke-schwierz for 4H-SiC. These were fitted to measured free-carrier mobilities and are returned unchanged (no ionized-share correction); silicon's models are refused for them, with a message naming the model the material supports.`,
  result: { unit: 'cm²/(V·s)', description: 'Drift mobility' },
  parameters: [doping, dopant, temperature, carrier, mobilityModel, material, counterDoping] as const,
  examples: [
    { formula: '=DRIFT.MOBILITY(1e16,"phosphorus")', note: 'electrons in 1e16 cm⁻³ phosphorus-doped Si at 300 K' },
    { formula: '=DRIFT.MOBILITY(1e17,"B",300,"minority")', note: 'minority electrons in p-type Si' },
    { formula: '=DRIFT.MOBILITY(A2:A30,"As",,,"arora")', note: 'a doping column with the Arora model' },
    { formula: '=DRIFT.MOBILITY(1e19,"B",300,"minority","klaassen")', note: 'minority electrons in p+ Si with Klaassen’s model' },
    { formula: '=DRIFT.MOBILITY(1e17,"Si",,,,"GaAs")', note: 'electrons in Si-doped GaAs (sotoodeh, the GaAs default)' },
  ],
  models: MOBILITY_MODELS,
  compute: (density, dopantCode, temperatureK, role, model, materialValue, counter) => {
    const sample = sampleOf(materialValue, temperatureK, dopantCode, density, counter);
    return mobility(model, carrierFor(sample.dopant, role), sample);
  },
});
