/**
 * 4H silicon carbide: band gap, effective densities of states, dopants.
 * No published ni fit is offered, so ni comes from the 'dos' model
 * (Eg(T) with Nc, Nv). The crystal is uniaxial; the scalar parameters here
 * are the ones usually quoted for transport perpendicular to the c axis.
 * All values from memory.
 */

import { LEVINSHTEIN_2001, SILICON_CARBIDE_4H_DOPANTS, SILICON_CARBIDE_4H_RELATIVE_PERMITTIVITY } from './siliconCarbide4HDopants';
import type { DensityOfStatesModel, Material, VarshniBandgap } from './types';
import { LOWEST_NUMERIC_TEMPERATURE } from './temperature';
import { absolutePowerLawText, densityOfStatesText, varshniText } from './citationText';
import { parameterText as t } from '../parameterText';

/**
 * Varshni-form gap of 4H-SiC, Eg(T) = 3.265 − 6.5e-4·T²/(T + 1300) eV:
 * 3.228 eV at 300 K, within the 3.23–3.26 eV usually quoted.
 */
const SILICON_CARBIDE_4H_VARSHNI = { gapAtZero: 3.265, alpha: 6.5e-4, beta: 1300 } as const;

export const LEVINSHTEIN_2001_SILICON_CARBIDE_4H_BANDGAP: VarshniBandgap = {
  code: 'levinshtein-gap-4h-sic',
  name: 'Levinshtein et al. (2001) Varshni-form band gap of 4H-SiC',
  ...SILICON_CARBIDE_4H_VARSHNI,
  citation: `${LEVINSHTEIN_2001}: ${varshniText(SILICON_CARBIDE_4H_VARSHNI)} (values from memory)`,
  validity:
    'fitted to optical gap data up to several hundred kelvin (from memory); evaluated here up to 3100 K ' +
    '(extrapolation above about 700 K)',
  equation: 'src/physics/bands/bandgap.ts',
  parameterTable: 'src/physics/materials/siliconCarbide4H.ts',
  tests: ['tests/physics/materials/hosts.test.ts'],
};

/**
 * Effective densities of states of 4H-SiC, Nc = 3.25e15·T^3/2 and
 * Nv = 4.8e15·T^3/2 cm⁻³ (1.69e19 and 2.49e19 at 300 K); Nc counts the three
 * equivalent M-point minima.
 */
const SILICON_CARBIDE_4H_BANDS = {
  conductionBand: { valueAtReference: 1.69e19, referenceTemperature: 300, exponent: 1.5 },
  valenceBand: { valueAtReference: 2.49e19, referenceTemperature: 300, exponent: 1.5 },
} as const;

export const LEVINSHTEIN_2001_SILICON_CARBIDE_4H_DENSITY_OF_STATES: DensityOfStatesModel = {
  code: 'levinshtein-dos-4h-sic',
  name: 'Levinshtein et al. (2001) effective densities of states of 4H-SiC',
  ...SILICON_CARBIDE_4H_BANDS,
  citation:
    `${LEVINSHTEIN_2001}: Nc ≈ ${absolutePowerLawText(SILICON_CARBIDE_4H_BANDS.conductionBand, 3)}, ` +
    `Nv ≈ ${absolutePowerLawText(SILICON_CARBIDE_4H_BANDS.valenceBand, 2)} cm⁻³, i.e. ` +
    `${densityOfStatesText(SILICON_CARBIDE_4H_BANDS.conductionBand)} and ` +
    `${densityOfStatesText(SILICON_CARBIDE_4H_BANDS.valenceBand)} cm⁻³ at 300 K ` +
    '(values from memory)',
  validity: 'constant-mass estimate; ni at 300 K (about 1e-8 cm⁻³) is an order-of-magnitude value',
  equation: 'src/physics/bands/densityOfStates.ts',
  parameterTable: 'src/physics/materials/siliconCarbide4H.ts',
  tests: ['tests/physics/materials/hosts.test.ts'],
};

/** 4H-SiC decomposes (sublimes) near 2830 °C instead of melting (common practice, no source). */
const SILICON_CARBIDE_DECOMPOSITION = 3100; // K

/** Si–C pairs per volume of the 4H cell, 9.64e22 atoms/cm³ (common practice, no source). */
const SILICON_CARBIDE_ATOMIC_DENSITY = 9.64e22; // cm⁻³

export const SILICON_CARBIDE_4H: Material = {
  code: '4H-SiC',
  name: '4H silicon carbide',
  temperatureDomain: {
    min: LOWEST_NUMERIC_TEMPERATURE,
    max: SILICON_CARBIDE_DECOMPOSITION,
    reason:
      'from 1 K (below, the exponentials leave double-precision range) to the decomposition of SiC near ' +
      `${t(SILICON_CARBIDE_DECOMPOSITION)} K; each model’s own validated range is much narrower (see DRIFT.MODELS)`,
  },
  atomicDensity: SILICON_CARBIDE_ATOMIC_DENSITY,
  relativePermittivity: SILICON_CARBIDE_4H_RELATIVE_PERMITTIVITY,
  hostPropertiesCitation:
    `atomic density ${t(SILICON_CARBIDE_ATOMIC_DENSITY)} cm⁻³ and decomposition near ${t(SILICON_CARBIDE_DECOMPOSITION)} K: ` +
    `common practice, no source; εr = ${t(SILICON_CARBIDE_4H_RELATIVE_PERMITTIVITY)} ` +
    `(perpendicular to c): ${LEVINSHTEIN_2001} (from memory)`,
  bandgap: LEVINSHTEIN_2001_SILICON_CARBIDE_4H_BANDGAP,
  densityOfStates: LEVINSHTEIN_2001_SILICON_CARBIDE_4H_DENSITY_OF_STATES,
  intrinsicFits: [],
  dopants: SILICON_CARBIDE_4H_DOPANTS,
  dopantTable: 'src/physics/materials/siliconCarbide4HDopants.ts',
  genericDopants: { donor: 'donor', acceptor: 'acceptor' },
};
