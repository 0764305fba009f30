/**
 * Descriptions of the measurement-analysis models, for the model registry
 * (models.ts), DRIFT.MODELS() and the help pages.
 */
import type { ModelInfo } from '../modelInfo';
import { parameterText as t } from '../parameterText';
import { MINIMUM_DIAMETER_RATIO, THIN_LAYER_FACTOR } from './fourPoint';

export const MEASUREMENT_MODELS: readonly ModelInfo[] = [
  {
    code: 'valdes-1954',
    quantity: 'four-point-probe resistivity of bulk and finite-thickness samples',
    name: 'Valdes (1954) collinear four-point probe, image method',
    citation:
      'L. B. Valdes, "Resistivity measurements on germanium for transistors", Proc. IRE 42, 420 ' +
      '(1954) (tabulated divisors recalled from memory)',
    validity:
      'homogeneous isotropic sample, point contacts far from lateral edges; non-conducting bottom face; any thickness (exact image series)',
    notes: 'ρ = 2π·s·(V/I)/G(t/s); G is summed exactly from the image series here rather than read from a table.',
    equation: 'src/physics/measurement/fourPoint.ts',
    parameterTable: 'src/physics/measurement/fourPoint.ts',
    tests: ['tests/physics/reference/valdes-1954.reference.test.ts', 'tests/physics/measurement/fourPoint.test.ts'],
  },
  {
    code: 'smits-1958',
    quantity: 'four-point-probe sheet resistance of thin layers and circular slices',
    name: 'Smits (1958) thin-layer and finite-slice correction factors',
    citation:
      'F. M. Smits, "Measurement of sheet resistivities with the four-point probe", Bell Syst. ' +
      'Tech. J. 37, 711 (1958) (tabulated factors recalled from memory)',
    validity: `thin layer (t ≪ s) on an insulator; circular slice measured at its centre along a diameter, d/s ≥ ${MINIMUM_DIAMETER_RATIO}`,
    notes:
      `Rs = (π/ln 2)·V/I ≈ ${t(THIN_LAYER_FACTOR, 4)}·V/I for an unbounded layer; C(d/s) = π/(ln 2 + ` +
      `ln((d²/s² + 3)/(d²/s² − 3))) for a disc; ` +
      'thickness and diameter factors multiplied, as Smits does for thin slices.',
    equation: 'src/physics/measurement/fourPoint.ts',
    parameterTable: 'src/physics/measurement/fourPoint.ts',
    tests: ['tests/physics/reference/smits-1958.reference.test.ts', 'tests/physics/measurement/fourPoint.test.ts'],
  },
  {
    code: 'van-der-pauw-1958',
    quantity: 'sheet resistance of a layer of arbitrary shape',
    name: 'van der Pauw (1958) four-contact method',
    citation:
      'L. J. van der Pauw, "A method of measuring specific resistivity and Hall effect of discs of ' +
      'arbitrary shape", Philips Res. Rep. 13, 1 (1958)',
    validity: 'uniform layer without holes, contacts small and on its periphery',
    notes: 'exp(−πRa/Rs) + exp(−πRb/Rs) = 1 solved exactly with a bracketed root finder.',
    equation: 'src/physics/measurement/vanDerPauw.ts',
    parameterTable: 'src/physics/measurement/vanDerPauw.ts',
    tests: [
      'tests/physics/reference/van-der-pauw-1958.reference.test.ts',
      'tests/physics/reference/mpmath-oracles.reference.test.ts',
      'tests/physics/measurement/vanDerPauw.test.ts',
    ],
  },
  {
    code: 'hall-effect',
    quantity: 'carrier density and mobility from the Hall coefficient',
    name: 'Single-carrier Hall analysis with a Hall scattering factor',
    citation: 'common practice, no source (textbook single-carrier relation R_H = ±r_H/(q·n))',
    validity: 'one dominant carrier type; weak magnetic field (μB ≪ 1); r_H ≈ 1.1–1.2 for lattice scattering (from memory)',
    notes: 'Sign convention: a negative density means electrons (n-type), a positive one holes (p-type).',
    equation: 'src/physics/measurement/hall.ts',
    parameterTable: 'src/physics/measurement/hall.ts',
    tests: ['tests/physics/measurement/hall.test.ts'],
  },
];
