/**
 * Crystalline silicon: band gap, effective densities of states, published
 * intrinsic-density fits, dopants. Each table states its source and the range
 * the source validated; "from memory" marks values recalled rather than read
 * from the paper while writing this table.
 */

import { SILICON_DOPANTS } from './siliconDopants';
import type { DensityOfStatesModel, IntrinsicDensityFit, Material, VarshniBandgap } from './types';
import { LOWEST_NUMERIC_TEMPERATURE } from './temperature';
import { densityOfStatesText, intrinsicFitText, varshniText } from './citationText';
import { parameterText as t } from '../parameterText';

/**
 * Thurmond's Varshni-form fit of the Si gap.
 * Eg(300 K) = 1.1245 eV; Eg(77 K) = 1.1661 eV.
 */
const THURMOND_CONSTANTS = { gapAtZero: 1.17, alpha: 4.73e-4, beta: 636 } as const;

export const THURMOND_1975_BANDGAP: VarshniBandgap = {
  code: 'thurmond',
  name: 'Thurmond (1975) Varshni-form band gap',
  ...THURMOND_CONSTANTS,
  citation: `C. D. Thurmond, J. Electrochem. Soc. 122, 1133 (1975); ${varshniText(THURMOND_CONSTANTS, 4)} (values from memory)`,
  validity:
    'fitted to Si gap data from near 0 K to well above room temperature (from memory); the physics core ' +
    'evaluates it over 1–1687 K (between 1.17 and 0.59 eV there), the spreadsheet functions at 20–1000 K',
  equation: 'src/physics/bands/bandgap.ts',
  parameterTable: 'src/physics/materials/silicon.ts',
  tests: ['tests/physics/reference/thurmond-1975.reference.test.ts', 'tests/physics/bands/bandgap.test.ts'],
};

/**
 * Green's effective densities of states. The 300 K values are Green's; the
 * temperature laws (T/300)^1.58 and (T/300)^1.85 are the power-law
 * approximations of his temperature-dependent density-of-states masses
 * (exponents from memory). They describe the growth of the DOS masses with T
 * (mostly the valence band), which a plain T^3/2 law misses; with them the
 * 'dos' ni model tracks the measured ni(T) of Misiakos & Tsamakis within
 * about 10% from 78 K to 1000 K.
 */
const GREEN_BANDS = {
  conductionBand: { valueAtReference: 2.86e19, referenceTemperature: 300, exponent: 1.58 },
  valenceBand: { valueAtReference: 3.1e19, referenceTemperature: 300, exponent: 1.85 },
} as const;

export const GREEN_1990_DENSITY_OF_STATES: DensityOfStatesModel = {
  code: 'green-1990',
  name: 'Green (1990) effective densities of states',
  ...GREEN_BANDS,
  citation:
    `M. A. Green, J. Appl. Phys. 67, 2944 (1990): Nc(300 K) = ${densityOfStatesText(GREEN_BANDS.conductionBand)} cm⁻³, ` +
    `Nv(300 K) = ${densityOfStatesText(GREEN_BANDS.valenceBand, 3)} cm⁻³; ` +
    `temperature exponents ${t(GREEN_BANDS.conductionBand.exponent)} and ${t(GREEN_BANDS.valenceBand.exponent)} (from memory)`,
  validity:
    '300 K values; power laws approximate Green’s masses over about 200–500 K (from memory) and are extrapolated outside that range',
  equation: 'src/physics/bands/densityOfStates.ts',
  parameterTable: 'src/physics/materials/silicon.ts',
  tests: ['tests/physics/reference/green-1990.reference.test.ts', 'tests/physics/bands/densityOfStates.test.ts'],
};

/**
 * Misiakos & Tsamakis: measured ni from 78 to 340 K. Gives 9.70e9 cm⁻³ at
 * 300 K from the fit (paper's quoted value 9.65e9 cm⁻³, confirmed by
 * Altermatt et al., J. Appl. Phys. 93, 1598 (2003)).
 *
 * Why it is used over the whole temperature domain (decision): the form
 * A·T^2.54·exp(−6726/T) is analytic, and d ln ni/dT = 2.54/T + 6726/T² > 0, so
 * it grows strictly and has no kinks at any T > 0. Outside 78–340 K it is an
 * extrapolation, but a physical one: the gap it implies together with Green's
 * Nc, Nv (kT·ln(Nc·Nv/ni²), the gap the equilibrium solver uses) stays within
 * 0.015 eV of Thurmond's independent Eg(T) from 1 K to 1687 K, and ni agrees
 * with the 'dos' model (Thurmond gap + Green DOS) to within 10% from 78 K to
 * 1000 K. Splicing another model in at 340 K would create a kink for no gain.
 */
const MISIAKOS_CONSTANTS = { prefactor: 5.29e19, referenceTemperature: 300, exponent: 2.54, activationTemperature: 6726 } as const;

/** ni of a fit at its reference temperature, A·exp(−Θ/Tref), in the form help texts print (e.g. 9.70e9). */
function atReference(fit: {
  readonly prefactor: number;
  readonly referenceTemperature: number;
  readonly activationTemperature: number;
}): string {
  return (fit.prefactor * Math.exp(-fit.activationTemperature / fit.referenceTemperature)).toExponential(2).replace('e+', 'e');
}

export const MISIAKOS_TSAMAKIS_1993_FIT: IntrinsicDensityFit = {
  code: 'misiakos',
  name: 'Misiakos & Tsamakis (1993) ni fit',
  ...MISIAKOS_CONSTANTS,
  citation:
    `K. Misiakos, D. Tsamakis, J. Appl. Phys. 74, 3293 (1993): ${intrinsicFitText(MISIAKOS_CONSTANTS)}; ` +
    `these constants give ${atReference(MISIAKOS_CONSTANTS)} cm⁻³ at 300 K, the paper quotes 9.65e9 (fit constants and quote from memory)`,
  validity: 'measured 78–340 K; smooth, strictly increasing extrapolation outside (see notes)',
  notes:
    'Default. Outside 78–340 K the same analytic fit is extrapolated: it stays within 10% of the ' +
    'DOS-based model (Thurmond gap, Green 1990 Nc/Nv) from 78 K to 1000 K, and the gap it implies with ' +
    'Green’s Nc, Nv stays within 0.015 eV of Thurmond’s from 1 K to 1687 K.',
  equation: 'src/physics/bands/intrinsicDensity.ts',
  parameterTable: 'src/physics/materials/silicon.ts',
  tests: ['tests/physics/reference/misiakos-tsamakis-1993.reference.test.ts', 'tests/physics/bands/intrinsicDensity.test.ts'],
};

/**
 * Sproul & Green: ni from 275 to 375 K; the paper quotes 1.00e10 cm⁻³ at 300 K,
 * its constants give 1.015e10 (checked by a test). Altermatt et
 * al. (2003) showed this value is a few percent high because band-gap
 * narrowing in the doped test devices was not accounted for (from memory).
 */
const SPROUL_GREEN_CONSTANTS = { prefactor: 9.38e19, referenceTemperature: 300, exponent: 2, activationTemperature: 6884 } as const;

export const SPROUL_GREEN_1991_FIT: IntrinsicDensityFit = {
  code: 'sproul-green',
  name: 'Sproul & Green (1991) ni fit',
  ...SPROUL_GREEN_CONSTANTS,
  citation:
    `A. B. Sproul, M. A. Green, J. Appl. Phys. 70, 846 (1991): ${intrinsicFitText(SPROUL_GREEN_CONSTANTS)}; ` +
    `these constants give ${atReference(SPROUL_GREEN_CONSTANTS)} cm⁻³ at 300 K, the paper quotes 1.00e10 ` +
    `(fit constants and quote from memory)`,
  validity: 'measured 275–375 K; extrapolated outside',
  notes:
    'About 5% above the default at 300 K; Altermatt et al., J. Appl. Phys. 93, 1598 (2003) attribute the ' +
    'difference to band-gap narrowing in the measured devices.',
  equation: 'src/physics/bands/intrinsicDensity.ts',
  parameterTable: 'src/physics/materials/silicon.ts',
  tests: ['tests/physics/reference/sproul-green-1991.reference.test.ts', 'tests/physics/bands/intrinsicDensity.test.ts'],
};

/** Melting point of Si: solid-state models end there. */
const SILICON_MELTING_POINT = 1687; // K (1414 °C), common practice, no source

/** 8 atoms per cubic cell, lattice constant 5.431 Å (common practice, no source). */
const SILICON_ATOMIC_DENSITY = 4.994e22; // cm⁻³

/**
 * Static relative permittivity of Si, 11.9 (S. M. Sze, K. K. Ng, Physics of
 * Semiconductor Devices, 3rd ed., Wiley 2007, Appendix table of Si properties;
 * from memory). Used only to scale dopant ionization models to other hosts.
 */
const SILICON_RELATIVE_PERMITTIVITY = 11.9;

export const SILICON: Material = {
  code: 'Si',
  name: 'silicon',
  temperatureDomain: {
    min: LOWEST_NUMERIC_TEMPERATURE,
    max: SILICON_MELTING_POINT,
    reason:
      'from 1 K (below, the exponentials leave double-precision range) to the melting point of silicon, ' +
      `${t(SILICON_MELTING_POINT)} K; each model’s own validated range is narrower (see DRIFT.MODELS)`,
  },
  atomicDensity: SILICON_ATOMIC_DENSITY,
  relativePermittivity: SILICON_RELATIVE_PERMITTIVITY,
  hostPropertiesCitation:
    `atomic density (8 atoms per 5.431 Å cubic cell) and melting point ${t(SILICON_MELTING_POINT)} K: common practice, no source; ` +
    `εr = ${t(SILICON_RELATIVE_PERMITTIVITY)}: S. M. Sze, K. K. Ng, Physics of Semiconductor Devices, 3rd ` +
    `ed., Wiley 2007, Appendix (from memory)`,
  bandgap: THURMOND_1975_BANDGAP,
  densityOfStates: GREEN_1990_DENSITY_OF_STATES,
  intrinsicFits: [MISIAKOS_TSAMAKIS_1993_FIT, SPROUL_GREEN_1991_FIT],
  dopants: SILICON_DOPANTS,
  dopantTable: 'src/physics/materials/siliconDopants.ts',
  genericDopants: { donor: 'donor', acceptor: 'acceptor' },
};
