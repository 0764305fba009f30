/**
 * Silicon: C. Canali, G. Majni, R. Minder, G. Ottaviani, "Electron and hole
 * drift velocity measurements in silicon and their empirical relation to
 * electric field and temperature", IEEE Trans. Electron Devices 22, 1045
 * (1975). Time-of-flight drift velocities from 3e2 to 6e4 V/cm at
 * temperatures up to 430 K (abstract), fitted with the Caughey–Thomas form
 * and temperature laws that the authors offer for extrapolation:
 *
 *   v_m = A·T^a,   β = B·T^b   (T in kelvin)
 *
 * Constants from memory; they give v_m(300 K) ≈ 1.07e7 cm/s (electrons) and
 * 8.37e6 cm/s (holes), β(300 K) ≈ 1.109 and 1.213, the values commonly quoted.
 */
import type { MaterialHighFieldTables, VelocitySource } from './types';

/** Registry code of the Canali et al. (1975) silicon parameters. */
export const CANALI_MODEL_CODE = 'canali-1975';

const CANALI_CITATION =
  'C. Canali, G. Majni, R. Minder, G. Ottaviani, IEEE Trans. Electron Devices 22, 1045 (1975) ' +
  '(temperature laws from memory)';

/** Citation and validity of the Canali et al. (1975) fit, for the model registry. */
export const CANALI_SOURCE: VelocitySource = {
  citation: CANALI_CITATION,
  validity:
    'high-purity Si, 3e2–6e4 V/cm, measured up to 430 K (abstract); the temperature laws are the ' +
    'authors’ extrapolation formula; evaluated 77–1000 K, extrapolated above 430 K',
};

/**
 * Below 77 K the power law v_m ∝ T^−0.87 keeps growing without bound while
 * measured saturation velocities level off at low temperature (common
 * practice, no source): the core refuses there instead of extrapolating.
 */
const CANALI_EVALUATION_RANGE = {
  min: 77,
  max: 1000,
  reason:
    'Canali et al. measured up to 430 K; their power laws are extrapolated to 1000 K, but not below 77 K, ' +
    'where v_m ∝ T^−0.87 grows without bound while measured saturation velocities level off',
} as const;

/** Canali et al. (1975) electron and hole parameters for Si. Values from memory. */
export const CANALI_SILICON: MaterialHighFieldTables = {
  material: 'Si',
  electron: {
    modelCode: CANALI_MODEL_CODE,
    saturationVelocity: { form: 'power-law', prefactor: 1.53e9, exponent: -0.87 },
    saturationSource: CANALI_SOURCE,
    fieldExponent: { form: 'power-law', prefactor: 2.57e-2, exponent: 0.66 },
    fieldExponentSource: CANALI_SOURCE,
    evaluationRange: CANALI_EVALUATION_RANGE,
  },
  hole: {
    modelCode: CANALI_MODEL_CODE,
    saturationVelocity: { form: 'power-law', prefactor: 1.62e8, exponent: -0.52 },
    saturationSource: CANALI_SOURCE,
    fieldExponent: { form: 'power-law', prefactor: 0.46, exponent: 0.17 },
    fieldExponentSource: CANALI_SOURCE,
    evaluationRange: CANALI_EVALUATION_RANGE,
  },
};
