import { ARORA_FITTED_TEMPERATURES, SILICON, carrierFor, fitMobility, mobility, mobilityModelCodes } from '../../physics';
import { carrier, counterDoping, dopant, doping, material, mobilityModel, sampleOf, temperature } from '../common';
import { elementwise } from '../types';
import { MOBILITY_MODELS, otherMaterialDefaults } from '../citedModels';
import { prose } from '../../text/prose';

/** Masetti's electron mobility in 1e18 cm⁻³ As-doped Si at 300 K, for the help text. */
const MASETTI_AS_1E18 = fitMobility('masetti', 'electron', sampleOf(SILICON, 300, 'As', 1e18, 0)).toFixed(0);

export const MOBILITY = elementwise({
  name: 'MOBILITY',
  summary: 'Low-field mobility of electrons or holes from the named published model, in cm²/(V·s).',
  help: prose`Returns the low-field mobility of electrons or holes exactly as the selected doping-dependent
    model publishes it, at the total impurity density (doping + counter_doping) and the given temperature:
    e.g. masetti gives ${MASETTI_AS_1E18} cm²/(V·s) for electrons in 1e18 cm⁻³ As-doped Si at 300 K, as
    Masetti et al.'s equation does.

    The silicon fits (Masetti, Arora, Caughey–Thomas, Klaassen) were made against resistivity and the *total*
    dopant density, as if every dopant were ionized: they are mobilities per dopant, σ = q·N·μ. Driftcell's
    carrier densities include incomplete ionization (DRIFT.MAJORITY is below N), so DRIFT.CONDUCTIVITY does
    not multiply these values by DRIFT.MAJORITY. It uses DRIFT.FREEMOBILITY, the mobility per free carrier:
    for the majority carrier under a silicon model this value divided by the ionized share at 300 K (up to
    about 1.3× near 1e18 cm⁻³), for minority carriers and for the Ge, GaAs and 4H-SiC fits this value itself.
    Then CONDUCTIVITY = q(MAJORITY·FREEMOBILITY(majority) + MINORITY·FREEMOBILITY(minority)) for the same
    named model, and at 300 K that equals q·N·MOBILITY(majority) plus the minority term, the published
    resistivity.

    Blank model: the model is chosen for the carrier's role in the sample by net doping (counter_doping
    included). A minority carrier in Si gets klaassen, the one silicon model with minority-carrier physics
    (minority electrons in 1e19 cm⁻³ B-doped Si: about 210 cm²/(V·s), near the measured values, where
    masetti's majority-electron fit gives 115). A majority carrier, and both carriers of an exactly
    compensated sample, get masetti. So a blank model gives the same result as masetti for majority carriers
    and as klaassen for minority carriers.

    masetti (Masetti et al. 1983) is dopant-specific for As, P and B and takes its temperature dependence from
    Arora's fit (${ARORA_FITTED_TEMPERATURES.min}–${ARORA_FITTED_TEMPERATURES.max} K); see the model table for each model's range.

    klaassen (Klaassen 1992, silicon) is one model for majority and minority carriers. Unlike the other
    silicon models, which take the total impurity density, it treats donors, acceptors and the free carriers
    separately: a minority carrier is scattered less by the dopants that repel it and by the other carrier
    type, so in heavily doped material it moves faster than a majority carrier of the same type at the same
    doping (at 300 K about 1.8× for electrons in 1e19 cm⁻³ p-type vs n-type Si). Its temperature dependence is
    physically based: lattice scattering and the ionized-impurity terms each follow their own temperature law
    (fitted roughly 100–500 K; extrapolated outside). As in its fit, the majority carrier's density is taken
    as the net doping at 300 K; at 300 K its majority mobility is within 5 % of masetti, whose μmax, μmin,
    Nref and α it shares.

    Default away from 300 K: the blank choice does not change with temperature (masetti, i.e. Masetti at 300 K
    times Arora's temperature ratio, for majority carriers at every temperature). Switching models with
    temperature would put a kink into every temperature sweep. Choose klaassen for heavily doped or
    compensated material and temperatures far from 300 K.

    Other materials have their own fit, which is their default (blank model) for both carriers:
    ${otherMaterialDefaults(mobilityModelCodes, 'for')}. These were fitted to measured free-carrier
    mobilities; silicon's models are refused for them, with a message naming the model the material supports.`,
  result: { unit: 'cm²/(V·s)', description: 'Mobility' },
  parameters: [doping, dopant, temperature, carrier, mobilityModel, material, counterDoping] as const,
  examples: [
    { formula: '=DRIFT.MOBILITY(1e16,"phosphorus")', note: 'electrons in 1e16 cm⁻³ phosphorus-doped Si at 300 K (masetti)' },
    {
      formula: '=DRIFT.MOBILITY(1e17,"B",300,"minority")',
      note: 'minority electrons in p-type Si (klaassen, the blank choice for minority carriers)',
    },
    { formula: '=DRIFT.MOBILITY(A2:A30,"As",,,"arora")', note: 'a doping column with the Arora model' },
    { formula: '=DRIFT.MOBILITY(1e19,"B",300,"minority","masetti")', note: 'the majority-electron fit at the same doping, for comparison' },
    { formula: '=DRIFT.MOBILITY(1e17,"Si",,,,"GaAs")', note: 'electrons in Si-doped GaAs (sotoodeh, the GaAs default)' },
  ],
  models: MOBILITY_MODELS,
  compute: (density, dopantCode, temperatureK, role, model, materialValue, counter) => {
    const sample = sampleOf(materialValue, temperatureK, dopantCode, density, counter);
    return mobility(model, carrierFor(sample.dopant, role), sample);
  },
});
