/**
 * Low-field mobility of gallium arsenide after Sotoodeh, Khalid and
 * Rezazadeh, "Empirical low-field mobility model for III–V compounds
 * applicable in device simulation codes", J. Appl. Phys. 87, 2890 (2000):
 *
 *   μ(N, T) = μmin + (μmax·(300/T)^θ1 − μmin) / (1 + (N / (Nref·(T/300)^θ2))^λ)
 *
 * i.e. the temperature-scaled Caughey–Thomas form of materialFits.ts with
 * a = 0, b = −θ1, c = θ2, d = 0. Parameter values from memory.
 */
import type { FitParameters, MaterialMobilityFit, ScaledCaugheyThomasParameters } from './fitTypes';
import { parameterText as t } from '../parameterText';

/** Sotoodeh et al. (2000), GaAs, in the scaled form's coefficients (values from memory). */
const PARAMETERS: FitParameters = {
  electron: {
    minimum: { value: 500, exponent: 0 },
    maximum: { value: 9400, exponent: -2.1 },
    referenceDensity: { value: 6.0e16, exponent: 3.0 },
    alpha: { value: 0.394, exponent: 0 },
  },
  hole: {
    minimum: { value: 20, exponent: 0 },
    maximum: { value: 491.5, exponent: -2.2 },
    referenceDensity: { value: 1.48e17, exponent: 3.0 },
    alpha: { value: 0.38, exponent: 0 },
  },
};

/**
 * One carrier's values in the paper's order and symbols: μmax, μmin, Nref, λ,
 * θ1, θ2. θ2 and the electrons' Nref are quoted to two digits (3.0, 6.0e16).
 */
function paperValues(p: ScaledCaugheyThomasParameters, referenceDensityDigits?: number): readonly string[] {
  return [
    t(p.maximum.value),
    t(p.minimum.value),
    t(p.referenceDensity.value, referenceDensityDigits),
    t(p.alpha.value),
    t(-p.maximum.exponent),
    t(p.referenceDensity.exponent, 2),
  ];
}

const [ELECTRON_MAX, ELECTRON_MIN, ELECTRON_NREF, ELECTRON_LAMBDA, ELECTRON_THETA1, ELECTRON_THETA2] = paperValues(PARAMETERS.electron, 2);

export const GALLIUM_ARSENIDE_SOTOODEH_FIT: MaterialMobilityFit = {
  code: 'sotoodeh',
  name: 'Sotoodeh, Khalid, Rezazadeh (2000) mobility of GaAs',
  materialCode: 'GaAs',
  parameters: PARAMETERS,
  parameterTable: 'src/physics/mobility/galliumArsenideSotoodeh.ts',
  tests: [
    'tests/physics/reference/sze-ng-2007-ge-gaas.reference.test.ts',
    'tests/physics/mobility/materialFits.test.ts',
    'tests/catalog/publishedMobility.test.ts',
  ],
  citation:
    `M. Sotoodeh, A. H. Khalid, A. A. Rezazadeh, J. Appl. Phys. 87, 2890 (2000), GaAs: electrons μmax ${ELECTRON_MAX}, ` +
    `μmin ${ELECTRON_MIN} cm²/(V·s), Nref ${ELECTRON_NREF} cm⁻³, λ ${ELECTRON_LAMBDA}, θ1 ${ELECTRON_THETA1}, θ2 ${ELECTRON_THETA2}; ` +
    `holes ${paperValues(PARAMETERS.hole).join(', ')} (values from memory)`,
  validity:
    'fitted to published GaAs mobility data, about 1e14–1e19 cm⁻³ at 300 K and roughly 100–500 K (from memory); extrapolated outside',
  notes:
    'Default for GaAs. Not dopant-specific. Above about 1200 K (outside the validity) μmax·(300/T)^θ1 falls ' +
    'below μmin. The fit describes free-carrier mobility (used unchanged, no full-ionization correction).',
};
