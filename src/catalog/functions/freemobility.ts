import { SILICON, carrierFor, fitMobility, freeCarrierMobility, mobilityModelCodes } from '../../physics';
import { carrier, counterDoping, dopant, doping, material, mobilityModel, sampleOf, temperature } from '../common';
import { elementwise } from '../types';
import { EQUILIBRIUM_MODELS, MOBILITY_MODELS } from '../citedModels';
import { prose } from '../../text/prose';

/** FREEMOBILITY ÷ MOBILITY of the majority carrier in uncompensated Si at 300 K (masetti), for the help text. */
function factor(dopantCode: string, density: number, digits = 2): string {
  const sample = sampleOf(SILICON, 300, dopantCode, density, 0);
  const majority = sample.dopant.kind === 'donor' ? 'electron' : 'hole';
  return (freeCarrierMobility('masetti', majority, sample) / fitMobility('masetti', majority, sample)).toFixed(digits);
}

export const FREEMOBILITY = elementwise({
  name: 'FREEMOBILITY',
  summary: 'Mobility per free carrier, such that σ = q(n·μn + p·μp) with Driftcell’s carrier densities, in cm²/(V·s).',
  help: prose`Returns the mobility per free carrier: the value that, multiplied by the free-carrier density
    Driftcell computes with incomplete ionization, gives the conductivity of the selected model. For the same
    named model

    CONDUCTIVITY = q·(MAJORITY·FREEMOBILITY(majority) + MINORITY·FREEMOBILITY(minority))

    with DRIFT.MAJORITY and DRIFT.MINORITY for the same doping, dopant, temperature, material and
    counter_doping (equivalently n from DRIFT.ELECTRONS and p from DRIFT.HOLES with the generic dopants n and
    p), q the elementary charge.

    How it relates to DRIFT.MOBILITY: the silicon fits (${mobilityModelCodes(SILICON).join(', ')}) were made
    as σ = q·N·μ with every dopant counted as ionized, so DRIFT.MOBILITY is a mobility per dopant. Per free
    carrier the same σ needs that value divided by the ionized share at 300 K (the fits' reference
    temperature): FREEMOBILITY = MOBILITY × N_net/n(300 K) for the net-majority carrier under a silicon model.
    At 1e17 cm⁻³ the factor is ${factor('P', 1e17)} (P) to ${factor('B', 1e17)} (B); at 1e18 cm⁻³, where about
    a fifth of the dopants are neutral at 300 K, it is ${factor('P', 1e18)} (P) to ${factor('B', 1e18)} (B).
    At other temperatures freeze-out enters through n, not through this factor. For minority carriers, and for
    the Ge, GaAs and 4H-SiC fits (made against measured free-carrier mobilities), FREEMOBILITY equals
    MOBILITY.

    Blank model: chosen per carrier exactly as in DRIFT.MOBILITY (klaassen for a Si minority carrier, the
    material's default otherwise). DRIFT.CONDUCTIVITY with a blank model uses its own default model for both
    carriers, so to reproduce it term by term pass the same model name to both.

    Use it for hand calculations with Driftcell's carrier densities (σ, drift currents, Hall or
    sheet-resistance estimates); use DRIFT.MOBILITY where a published mobility is wanted.`,
  result: { unit: 'cm²/(V·s)', description: 'Mobility per free carrier' },
  parameters: [doping, dopant, temperature, carrier, mobilityModel, material, counterDoping] as const,
  examples: [
    { formula: '=DRIFT.FREEMOBILITY(1e18,"B")', note: 'holes in 1e18 cm⁻³ B-doped Si: about 210, where Masetti’s published value is 160' },
    {
      formula: '=DRIFT.FREEMOBILITY(1e19,"B",300,"minority")',
      note: 'minority electrons in p+ Si: equal to DRIFT.MOBILITY (klaassen, the blank choice)',
    },
  ],
  models: [...MOBILITY_MODELS, ...EQUILIBRIUM_MODELS],
  compute: (density, dopantCode, temperatureK, role, model, materialValue, counter) => {
    const sample = sampleOf(materialValue, temperatureK, dopantCode, density, counter);
    return freeCarrierMobility(model, carrierFor(sample.dopant, role), sample);
  },
});
