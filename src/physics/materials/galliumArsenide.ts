/**
 * Gallium arsenide (zinc blende): band gap, effective densities of states,
 * dopants. No published ni fit is offered, so ni comes from the 'dos' model
 * (Eg(T) with Nc, Nv). "From memory" marks values recalled rather than read.
 */

import { GALLIUM_ARSENIDE_DOPANTS, GALLIUM_ARSENIDE_RELATIVE_PERMITTIVITY } from './galliumArsenideDopants';
import type { DensityOfStatesModel, Material, VarshniBandgap } from './types';
import { LOWEST_NUMERIC_TEMPERATURE } from './temperature';
import { densityOfStatesText, varshniText } from './citationText';
import { exponentText, parameterText as t } from '../parameterText';

/**
 * Varshni-form fit of the GaAs gap as Thurmond gives it (form of
 * Y. P. Varshni, Physica 34, 149 (1967)). Eg(300 K) = 1.4225 eV, matching the
 * 1.42 eV of Sze & Ng's property table.
 */
const GALLIUM_ARSENIDE_VARSHNI = { gapAtZero: 1.519, alpha: 5.405e-4, beta: 204 } as const;

export const THURMOND_1975_GALLIUM_ARSENIDE_BANDGAP: VarshniBandgap = {
  code: 'thurmond-gaas',
  name: 'Thurmond (1975) Varshni-form band gap of GaAs',
  ...GALLIUM_ARSENIDE_VARSHNI,
  citation:
    'C. D. Thurmond, J. Electrochem. Soc. 122, 1133 (1975), as quoted by S. M. Sze, K. K. Ng, Physics of ' +
    `Semiconductor Devices, 3rd ed., Wiley 2007, ch. 1: ${varshniText(GALLIUM_ARSENIDE_VARSHNI)} ` +
    '(values from memory)',
  validity:
    'fitted to GaAs gap data from near 0 K to above room temperature (from memory); evaluated here up to the ' +
    'melting point, 1511 K (extrapolation)',
  equation: 'src/physics/bands/bandgap.ts',
  parameterTable: 'src/physics/materials/galliumArsenide.ts',
  tests: ['tests/physics/reference/sze-ng-2007-ge-gaas.reference.test.ts', 'tests/physics/materials/hosts.test.ts'],
};

/**
 * Sze & Ng's 300 K effective densities of states of GaAs with the T^3/2 law.
 * Edition: the 3rd (2007) table gives Nv = 9.0e18 cm⁻³; the 2nd edition (1981)
 * gave 7.0e18 cm⁻³ (both from memory). The 3rd-edition value is used.
 */
const GALLIUM_ARSENIDE_BANDS = {
  conductionBand: { valueAtReference: 4.7e17, referenceTemperature: 300, exponent: 1.5 },
  valenceBand: { valueAtReference: 9.0e18, referenceTemperature: 300, exponent: 1.5 },
} as const;

export const SZE_NG_2007_GALLIUM_ARSENIDE_DENSITY_OF_STATES: DensityOfStatesModel = {
  code: 'sze-ng-dos-gaas',
  name: 'Sze & Ng (2007) effective densities of states of GaAs',
  ...GALLIUM_ARSENIDE_BANDS,
  citation:
    'S. M. Sze, K. K. Ng, Physics of Semiconductor Devices, 3rd ed., Wiley 2007, Appendix, properties of GaAs ' +
    `at 300 K: Nc = ${densityOfStatesText(GALLIUM_ARSENIDE_BANDS.conductionBand)} cm⁻³, ` +
    `Nv = ${densityOfStatesText(GALLIUM_ARSENIDE_BANDS.valenceBand, 2)} cm⁻³ (the 2nd ed., 1981, gave Nv = 7.0e18; from memory); ` +
    `T^${exponentText(GALLIUM_ARSENIDE_BANDS.conductionBand.exponent)} law: constant effective masses (common practice, no source)`,
  validity:
    '300 K values; the T^3/2 law ignores the temperature dependence of the masses and the L and X valleys, ' +
    'which fill above about 500 K, so Nc and ni at high temperature are underestimates',
  equation: 'src/physics/bands/densityOfStates.ts',
  parameterTable: 'src/physics/materials/galliumArsenide.ts',
  tests: ['tests/physics/reference/sze-ng-2007-ge-gaas.reference.test.ts', 'tests/physics/materials/hosts.test.ts'],
};

/** Melting point of GaAs, 1238 °C (common practice, no source). */
const GALLIUM_ARSENIDE_MELTING_POINT = 1511; // K

/** 8 atoms per cubic cell, lattice constant 5.653 Å (common practice, no source). */
const GALLIUM_ARSENIDE_ATOMIC_DENSITY = 4.42e22; // cm⁻³

export const GALLIUM_ARSENIDE: Material = {
  code: 'GaAs',
  name: 'gallium arsenide',
  temperatureDomain: {
    min: LOWEST_NUMERIC_TEMPERATURE,
    max: GALLIUM_ARSENIDE_MELTING_POINT,
    reason:
      `from 1 K (below, the exponentials leave double-precision range) to the melting point of GaAs, ` +
      `${t(GALLIUM_ARSENIDE_MELTING_POINT)} K ` +
      '(free surfaces lose arsenic well below it); each model’s own validated range is narrower (see DRIFT.MODELS)',
  },
  atomicDensity: GALLIUM_ARSENIDE_ATOMIC_DENSITY,
  relativePermittivity: GALLIUM_ARSENIDE_RELATIVE_PERMITTIVITY,
  hostPropertiesCitation:
    `atomic density ${t(GALLIUM_ARSENIDE_ATOMIC_DENSITY)} cm⁻³ and melting point ` +
    `${t(GALLIUM_ARSENIDE_MELTING_POINT)} K: common practice, no source; ` +
    `εr = ${t(GALLIUM_ARSENIDE_RELATIVE_PERMITTIVITY)}: ` +
    'S. M. Sze, K. K. Ng, Physics of Semiconductor Devices, 3rd ed., Wiley 2007, Appendix (from memory)',
  bandgap: THURMOND_1975_GALLIUM_ARSENIDE_BANDGAP,
  densityOfStates: SZE_NG_2007_GALLIUM_ARSENIDE_DENSITY_OF_STATES,
  intrinsicFits: [],
  dopants: GALLIUM_ARSENIDE_DOPANTS,
  dopantTable: 'src/physics/materials/galliumArsenideDopants.ts',
  genericDopants: { donor: 'donor', acceptor: 'acceptor' },
};
