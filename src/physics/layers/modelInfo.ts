import type { ModelInfo } from '../modelInfo';
import { parameterText as t } from '../parameterText';
import { LAYER_INTEGRATION } from './sheetResistance';
import { prose } from '../../text/prose';

/**
 * Descriptions of the layer models (Irvin's integration, the diffusion
 * profiles, the implant profile) for the model registry and DRIFT.MODELS().
 */

const IRVIN_CITATION =
  'J. C. Irvin, "Resistivity of bulk silicon and of diffused layers in silicon", Bell Syst. Tech. J. 41, ' +
  '387–410 (1962) (citation from memory)';

const AS_DIFFUSED =
  'Ideal as-diffused profile: no concentration-dependent diffusion, no kink-and-tail, no surface pile-up or ' +
  'depletion; Ns up to about solid solubility (≈ 1e20–5e20 cm⁻³).';

/** Every model owned by the layer part of the core, lower-case codes. */
export const LAYER_MODELS: readonly ModelInfo[] = [
  {
    code: 'irvin-layers',
    quantity: 'sheet resistance of diffused and implanted layers',
    name: 'Irvin (1962) integration: Rs = 1/∫q(nμn + pμp)dx from the surface to the junction',
    citation: IRVIN_CITATION,
    validity:
      'Layers thicker than a few Debye lengths; 20–1000 K as the equilibrium and mobility models; ' +
      'Fermi–Dirac carrier statistics; no band-gap narrowing in the equilibrium solve, so above about ' +
      '1e19 cm⁻³ results are approximate.',
    notes:
      'Each depth is treated as a uniform sample of the layer dopant over the opposite-type background ' +
      '(incomplete ionization, compensation, default mobility model), where Irvin used his bulk ' +
      'resistivity curve and full ionization; depletion at the junction is ignored. Adaptive ' +
      `Gauss–Kronrod (7/15) quadrature, target ${t(LAYER_INTEGRATION.relativeTolerance)} relative.`,
    equation: 'src/physics/layers/sheetResistance.ts',
    parameterTable: 'src/physics/layers/sheetResistance.ts',
    tests: ['tests/physics/reference/irvin-1962-layers.reference.test.ts', 'tests/physics/layers/sheetResistance.test.ts'],
  },
  {
    code: 'gaussian',
    quantity: 'diffused dopant profile',
    name: 'Gaussian N(x) = Ns·exp(−(x/L)²), limited-source drive-in (default)',
    citation: `Solution of Fick's second law for a fixed dose, common practice, no source; used for layers by ${IRVIN_CITATION}`,
    validity: AS_DIFFUSED,
    notes: 'L = 2·sqrt(D·t); junction at xj = L·sqrt(ln(Ns/NB)).',
    equation: 'src/physics/layers/profiles.ts',
    parameterTable: 'src/physics/layers/profiles.ts',
    tests: [
      'tests/physics/reference/irvin-1962-layers.reference.test.ts',
      'tests/physics/layers/profiles.test.ts',
      'tests/physics/layers/sheetResistance.test.ts',
    ],
  },
  {
    code: 'erfc',
    quantity: 'diffused dopant profile',
    name: 'Complementary error function N(x) = Ns·erfc(x/L), constant-source predeposition',
    citation: prose`Solution of Fick's second law for a fixed surface concentration, common practice, no
      source; used for layers by ${IRVIN_CITATION}. erfc from W. J. Cody, Math. Comp. 23, 631 (1969)`,
    validity: AS_DIFFUSED,
    notes: 'L = 2·sqrt(D·t); junction at xj = L·erfcinv(NB/Ns).',
    equation: 'src/physics/layers/profiles.ts',
    parameterTable: 'src/physics/layers/profiles.ts',
    tests: ['tests/physics/reference/irvin-1962-layers.reference.test.ts', 'tests/physics/layers/profiles.test.ts'],
  },
  {
    code: 'lss-gaussian-implant',
    quantity: 'implanted dopant profile',
    name: 'As-implanted Gaussian N(x) = Φ/(√(2π)ΔRp)·exp(−(x−Rp)²/2ΔRp²) from range Rp and straggle ΔRp',
    citation:
      'J. Lindhard, M. Scharff, H. E. Schiøtt, Mat. Fys. Medd. Dan. Vid. Selsk. 33, no. 14 (1963) (range ' +
      'theory giving Rp and ΔRp; citation from memory); Gaussian form: common practice, no source',
    validity:
      'Amorphous-target approximation: no channelling tail, no skew (light ions such as B are skewed); as implanted, before any anneal.',
    notes:
      'Truncated at the surface: the part of the Gaussian above x = 0 is lost, not reflected. Assumed fully ' +
      'electrically activated with no implant damage (as-implanted, fully activated, no damage).',
    equation: 'src/physics/layers/profiles.ts',
    parameterTable: 'src/physics/layers/profiles.ts',
    tests: ['tests/physics/layers/profiles.test.ts', 'tests/physics/layers/sheetResistance.test.ts'],
  },
];
