import { resistivity, resistivityModelCodes } from '../../physics';
import { counterDoping, dopant, doping, material, resistivityModel, sampleOf, temperature } from '../common';
import { elementwise } from '../types';
import { RESISTIVITY_MODELS, otherMaterialDefaults } from '../citedModels';
import { prose } from '../../text/prose';

export const RESISTIVITY = elementwise({
  name: 'RESISTIVITY',
  summary: 'Resistivity ρ = 1/σ of a doped sample, in Ω·cm.',
  help: prose`Returns ρ = 1/[q(n·μn + p·μp)] for the given dopant density, temperature and model. In silicon
    the default, f723-anchored, is that physics (Masetti mobilities, incomplete ionization) multiplied by a
    factor depending on the dopant density only, chosen so that at 296.15 K (23 °C) in uncompensated B- or
    P-doped silicon it is the ASTM F723 conversion over the standard's range (B 1e12–1e21, P 1e12–5e20 cm⁻³);
    the temperature and counter-doping dependence are the physics model's, and outside the standard's range
    the factor levels off smoothly. It has its own name because away from 23 °C or with counter-doping it is
    not F723 itself; at the blank temperature, 300 K, it is about 1–3 % above the 23 °C value. Other dopants
    (As included) get the physics model unchanged. Model masetti gives the physics alone, astm-f723 the
    standard literally (B, P, As; 290–305 K; no counter-doping). A doping column against a temperature row
    spills the whole table: =DRIFT.RESISTIVITY(A2:A40,"B",B1:H1).

    For Ge, GaAs and 4H-SiC (material argument) a blank model means the material's own mobility fit
    (${otherMaterialDefaults(resistivityModelCodes, 'list')}); f723-anchored, astm-f723 and silicon's mobility
    models are refused there. In 4H-SiC the deep acceptors (Al about 0.2 eV) are only partly ionized at 300 K,
    which the resistivity shows.`,
  result: { unit: 'Ω·cm', description: 'Resistivity ρ' },
  parameters: [doping, dopant, temperature, resistivityModel, material, counterDoping] as const,
  examples: [
    { formula: '=DRIFT.RESISTIVITY(1e15,"B")', note: 'about 13 Ω·cm' },
    { formula: '=DRIFT.RESISTIVITY(1e15,"B",296.15)', note: 'at 23 °C: the ASTM F723 value' },
    { formula: '=DRIFT.RESISTIVITY(1e15,"B",,"astm-f723")', note: 'the ASTM F723 conversion itself' },
    { formula: '=DRIFT.RESISTIVITY(A2:A40,"B",B1:H1)', note: 'doping down, temperature across: a full table' },
    { formula: '=DRIFT.RESISTIVITY(1e18,"Al",,,"4H-SiC")', note: 'Al-doped 4H-SiC: about 1.3 Ω·cm, most of the deep acceptors neutral' },
  ],
  models: RESISTIVITY_MODELS,
  compute: (density, dopantCode, temperatureK, model, materialValue, counter) =>
    resistivity(sampleOf(materialValue, temperatureK, dopantCode, density, counter), model),
});
