import { SILICON, intrinsicDensity } from '../../physics';
import { intrinsicModel, material, requiredTemperature } from '../common';
import { elementwise } from '../types';
import { INTRINSIC_MODELS } from '../citedModels';
import { prose } from '../../text/prose';

/** The default's ni of silicon at 300 K as help prints it, computed rather than typed. */
const SILICON_300K = intrinsicDensity(SILICON, 300, '').toExponential(2).replace('e+', 'e');

export const INTRINSIC = elementwise({
  name: 'INTRINSIC',
  summary: 'Intrinsic carrier density ni, in cm⁻³.',
  help: prose`Returns the intrinsic carrier density ni at the given temperature from the selected published
    model. The default gives ${SILICON_300K} cm⁻³ for silicon at 300 K. Ge, GaAs and 4H-SiC have no published
    ni fit here: their only model, dos, combines the material's band gap and densities of states (about
    2.1e13, 2.3e6 and 1.6e-8 cm⁻³ at 300 K); silicon's fits are refused for them. Every carrier-density
    function uses the same ni, so n·p = ni² holds throughout the catalog.`,
  result: { unit: 'cm⁻³', description: 'Intrinsic carrier density ni' },
  parameters: [requiredTemperature, material, intrinsicModel] as const,
  examples: [
    { formula: '=DRIFT.INTRINSIC(300)', note: `silicon at 300 K, ${SILICON_300K} cm⁻³` },
    { formula: '=DRIFT.INTRINSIC(300,,"sproul-green")', note: 'the same with the Sproul–Green fit' },
    { formula: '=DRIFT.INTRINSIC(300,"Ge")', note: 'germanium at 300 K, about 2.1e13 cm⁻³ (dos model)' },
  ],
  models: INTRINSIC_MODELS,
  compute: (temperatureK, materialValue, model) => intrinsicDensity(materialValue, temperatureK, model),
});
