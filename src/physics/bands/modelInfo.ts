import { locationOf, type ModelInfo } from '../modelInfo';

/**
 * Descriptions of the band-structure, ni, statistics, bandgap-narrowing and ionization models, for
 * the model registry (models.ts) and DRIFT.MODELS(). Citations and validity
 * come from the parameter tables themselves so they cannot drift apart.
 */

import { SILICON } from '../materials/silicon';
import { IONIZATION_MODEL_CODE } from '../ionization';
import { BOLTZMANN_STATISTICS, FERMI_DIRAC_STATISTICS } from './statistics';
import { BANDGAP_NARROWING_MODELS } from './bandgapNarrowing';
import { DOS_INTRINSIC_MODEL } from './intrinsicDensity';
import { FERMI_DIRAC_TABLE_DEGREE, SERIES_LIMIT, SOMMERFELD_LIMIT } from './fermiDirac';
import { parameterText as t } from '../parameterText';

const NI = 'intrinsic density ni';
const [phosphorus, boron] = ['P', 'B'].map((symbol) => SILICON.dopants.find((dopant) => dopant.symbol === symbol)!);

/** Every model owned by the band-structure part of the core, lower-case codes. */
export const BAND_MODELS: readonly ModelInfo[] = [
  ...SILICON.intrinsicFits.map((fit) => ({
    code: fit.code,
    quantity: NI,
    name: fit.name,
    citation: fit.citation,
    validity: fit.validity,
    ...(fit.notes === undefined ? {} : { notes: fit.notes }),
    ...locationOf(fit),
  })),
  {
    code: DOS_INTRINSIC_MODEL,
    quantity: NI,
    name: 'ni = sqrt(Nc·Nv)·exp(−Eg/2kT) from the band gap and densities of states',
    citation: `${SILICON.bandgap.citation}; ${SILICON.densityOfStates.citation}`,
    validity: 'as its ingredients (band gap and density-of-states models)',
    notes:
      'Gives about 1.07e10 cm⁻³ at 300 K, 10% above the measured 9.65e9: the known mismatch between ' +
      'Green’s densities of states and measured ni; kept as an independent cross-check.',
    equation: 'src/physics/bands/intrinsicDensity.ts',
    // Its ingredients' tables: Thurmond's gap and Green's densities of states.
    parameterTable: 'src/physics/materials/silicon.ts',
    tests: ['tests/physics/reference/green-1990.reference.test.ts', 'tests/physics/bands/intrinsicDensity.test.ts'],
  },
  {
    code: SILICON.bandgap.code,
    quantity: 'band gap Eg',
    name: SILICON.bandgap.name,
    citation: SILICON.bandgap.citation,
    validity: SILICON.bandgap.validity,
    ...locationOf(SILICON.bandgap),
  },
  {
    code: SILICON.densityOfStates.code,
    quantity: 'effective densities of states Nc, Nv',
    name: SILICON.densityOfStates.name,
    citation: SILICON.densityOfStates.citation,
    validity: SILICON.densityOfStates.validity,
    ...locationOf(SILICON.densityOfStates),
  },
  {
    code: FERMI_DIRAC_STATISTICS.code,
    quantity: 'carrier statistics',
    name: FERMI_DIRAC_STATISTICS.name,
    citation:
      'F½ as normalised by J. S. Blakemore, Solid-State Electron. 25, 1067 (1982); computed by its alternating ' +
      `series (η ≤ ${t(SERIES_LIMIT)}), the trapezoidal rule after x = t² (L. N. Trefethen & J. A. C. Weideman, ` +
      `SIAM Review 56, 385 (2014)), tabulated once as Chebyshev interpolants of degree ${FERMI_DIRAC_TABLE_DEGREE} ` +
      `on unit intervals, and the Sommerfeld expansion (R. B. Dingle, Appl. Sci. Res. B 6, 225 (1957)) for η ≥ ` +
      `${t(SOMMERFELD_LIMIT)} (citations from memory); ` +
      'checked against mpmath polylog values',
    validity:
      'parabolic bands with the densities of states of the material; any Fermi level (F½ to 1e-13 relative for ' +
      'η from −708 up); band tails and non-parabolicity at very heavy doping (≳ 1e20 cm⁻³) are not modelled',
    notes:
      'Used by the equilibrium solver (the default statistics). Non-degenerate results equal Boltzmann ones to ' +
      'rounding; n·p = ni² then holds to the factor F½(ηc)/e^ηc of the majority carriers (1 − 1.2e-4 at 1e16 cm⁻³, ' +
      '300 K). Also gives the generalized Einstein relation D = μ·(kT/q)·F½(η)/F−½(η) used by DRIFT.DIFFUSIVITY. ' +
      'Bandgap narrowing is not included (see klaassen-bgn).',
    equation: 'src/physics/bands/fermiDirac.ts',
    // No fitted values: the Chebyshev tables are computed once from the integral, in the same file.
    parameterTable: 'src/physics/bands/fermiDirac.ts',
    tests: [
      'tests/physics/reference/mpmath-fermi-dirac.reference.test.ts',
      'tests/physics/bands/fermiDirac.test.ts',
      'tests/physics/bands/statistics.test.ts',
    ],
  },
  {
    code: BOLTZMANN_STATISTICS.code,
    quantity: 'carrier statistics',
    name: BOLTZMANN_STATISTICS.name,
    citation: 'common practice, no source',
    validity: 'non-degenerate carriers: Fermi level a few kT inside the gap (about n, p < 1e19 cm⁻³ at 300 K)',
    notes: 'Available in the core for comparison (solveEquilibrium’s statistics argument); the solver default is fermi-dirac.',
    equation: 'src/physics/bands/statistics.ts',
    parameterTable: 'src/physics/bands/statistics.ts',
    tests: ['tests/physics/bands/statistics.test.ts'],
  },
  ...BANDGAP_NARROWING_MODELS.map((model) => ({
    code: model.code,
    quantity: 'apparent bandgap narrowing, ni_eff',
    name: model.name,
    citation: model.citation,
    validity: model.validity,
    notes: model.notes,
    ...locationOf(model),
  })),
  {
    code: IONIZATION_MODEL_CODE,
    quantity: 'dopant ionization',
    name: 'Altermatt et al. (2006) incomplete ionization with Mott transition',
    citation: `${phosphorus.ionization.citation}; ${boron.ionization.citation}`,
    validity: phosphorus.ionization.validity,
    notes:
      'P, As, B fitted; Sb, Al, Ga, In use their own Sze & Ng ionization energy with the density ' +
      'dependence of P (Sb) or B (Al, Ga, In): assumption.',
    equation: 'src/physics/ionization.ts',
    parameterTable: SILICON.dopantTable,
    tests: ['tests/physics/reference/altermatt-2006.reference.test.ts', 'tests/physics/ionization.test.ts'],
  },
];
