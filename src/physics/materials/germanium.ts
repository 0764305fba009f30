/**
 * Crystalline germanium: band gap, effective densities of states, dopants.
 * No published ni fit is offered, so ni comes from the 'dos' model
 * (Eg(T) with Nc, Nv). "From memory" marks values recalled rather than read
 * from the source while writing this table.
 */

import { GERMANIUM_DOPANTS, GERMANIUM_RELATIVE_PERMITTIVITY } from './germaniumDopants';
import type { DensityOfStatesModel, Material, VarshniBandgap } from './types';
import { LOWEST_NUMERIC_TEMPERATURE } from './temperature';
import { densityOfStatesText, varshniText } from './citationText';
import { exponentText, parameterText as t } from '../parameterText';

/**
 * Varshni-form fit of the Ge gap as Thurmond gives it (the form of
 * Y. P. Varshni, Physica 34, 149 (1967)). Eg(300 K) = 0.6634 eV, matching the
 * 0.66 eV of Sze & Ng's property table.
 */
const GERMANIUM_VARSHNI = { gapAtZero: 0.7437, alpha: 4.774e-4, beta: 235 } as const;

export const THURMOND_1975_GERMANIUM_BANDGAP: VarshniBandgap = {
  code: 'thurmond-ge',
  name: 'Thurmond (1975) Varshni-form band gap of germanium',
  ...GERMANIUM_VARSHNI,
  citation:
    'C. D. Thurmond, J. Electrochem. Soc. 122, 1133 (1975), as quoted by S. M. Sze, K. K. Ng, Physics of ' +
    `Semiconductor Devices, 3rd ed., Wiley 2007, ch. 1: ${varshniText(GERMANIUM_VARSHNI)} ` +
    '(values from memory)',
  validity:
    'fitted to Ge gap data from near 0 K to about room temperature and above (from memory); evaluated here ' +
    'up to the melting point, 1211 K, where it gives 0.26 eV (extrapolation)',
  equation: 'src/physics/bands/bandgap.ts',
  parameterTable: 'src/physics/materials/germanium.ts',
  tests: ['tests/physics/reference/sze-ng-2007-ge-gaas.reference.test.ts', 'tests/physics/materials/hosts.test.ts'],
};

/**
 * Sze & Ng's 300 K effective densities of states of Ge with the T^3/2 law of
 * constant effective masses.
 */
const GERMANIUM_BANDS = {
  conductionBand: { valueAtReference: 1.04e19, referenceTemperature: 300, exponent: 1.5 },
  valenceBand: { valueAtReference: 6.0e18, referenceTemperature: 300, exponent: 1.5 },
} as const;

export const SZE_NG_2007_GERMANIUM_DENSITY_OF_STATES: DensityOfStatesModel = {
  code: 'sze-ng-dos-ge',
  name: 'Sze & Ng (2007) effective densities of states of germanium',
  ...GERMANIUM_BANDS,
  citation:
    'S. M. Sze, K. K. Ng, Physics of Semiconductor Devices, 3rd ed., Wiley 2007, Appendix, properties of Ge ' +
    `at 300 K: Nc = ${densityOfStatesText(GERMANIUM_BANDS.conductionBand)} cm⁻³, Nv = ` +
    `${densityOfStatesText(GERMANIUM_BANDS.valenceBand, 2)} cm⁻³ ` +
    `(from memory); T^${exponentText(GERMANIUM_BANDS.conductionBand.exponent)} law: constant effective masses ` +
    '(common practice, no source)',
  validity: '300 K values; the T^3/2 law ignores the temperature dependence of the masses, so ni away from 300 K is an estimate',
  equation: 'src/physics/bands/densityOfStates.ts',
  parameterTable: 'src/physics/materials/germanium.ts',
  tests: ['tests/physics/reference/sze-ng-2007-ge-gaas.reference.test.ts', 'tests/physics/materials/hosts.test.ts'],
};

/** Melting point of Ge, 938 °C: solid-state models end there (common practice, no source). */
const GERMANIUM_MELTING_POINT = 1211; // K

/** 8 atoms per cubic cell, lattice constant 5.658 Å (common practice, no source). */
const GERMANIUM_ATOMIC_DENSITY = 4.42e22; // cm⁻³

export const GERMANIUM: Material = {
  code: 'Ge',
  name: 'germanium',
  temperatureDomain: {
    min: LOWEST_NUMERIC_TEMPERATURE,
    max: GERMANIUM_MELTING_POINT,
    reason:
      'from 1 K (below, the exponentials leave double-precision range) to the melting point of germanium, ' +
      `${t(GERMANIUM_MELTING_POINT)} K; each model’s own validated range is narrower (see DRIFT.MODELS)`,
  },
  atomicDensity: GERMANIUM_ATOMIC_DENSITY,
  relativePermittivity: GERMANIUM_RELATIVE_PERMITTIVITY,
  hostPropertiesCitation:
    `atomic density ${t(GERMANIUM_ATOMIC_DENSITY)} cm⁻³ and melting point ${t(GERMANIUM_MELTING_POINT)} K: common practice, no source; ` +
    `εr = ${t(GERMANIUM_RELATIVE_PERMITTIVITY, 3)}: ` +
    'S. M. Sze, K. K. Ng, Physics of Semiconductor Devices, 3rd ed., Wiley 2007, Appendix (from memory)',
  bandgap: THURMOND_1975_GERMANIUM_BANDGAP,
  densityOfStates: SZE_NG_2007_GERMANIUM_DENSITY_OF_STATES,
  intrinsicFits: [],
  dopants: GERMANIUM_DOPANTS,
  dopantTable: 'src/physics/materials/germaniumDopants.ts',
  genericDopants: { donor: 'donor', acceptor: 'acceptor' },
};
