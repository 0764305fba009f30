/**
 * Germanium and gallium arsenide: R. Quay, C. Moglestue, V. Palankovski,
 * S. Selberherr, "A temperature dependent model for the saturation velocity
 * in semiconductor materials", Materials Science in Semiconductor Processing
 * 3, 149 (2000):
 *
 *   v_sat(T) = v_sat,300 / ((1 − A) + A·(T/300 K))
 *
 * v_sat,300 and A per material and carrier, from memory. The paper gives no
 * field exponent, so β is Caughey & Thomas's silicon value (2 for electrons,
 * 1 for holes): an assumption of ours, stated in each entry.
 */
import { CAUGHEY_THOMAS_FIELD_EXPONENTS, CAUGHEY_THOMAS_FIELD_SOURCE } from './caugheyThomasField';
import type { CarrierHighFieldTable, EvaluationRange, MaterialHighFieldTables, VelocitySource } from './types';
import type { Carrier } from '../sample';

/** Registry code of the Quay et al. (2000) saturation velocities. */
export const QUAY_MODEL_CODE = 'quay-2000';

/** Citation and validity of the Quay et al. (2000) model, for the model registry. */
export const QUAY_SOURCE: VelocitySource = {
  citation:
    'R. Quay, C. Moglestue, V. Palankovski, S. Selberherr, Mater. Sci. Semicond. Process. 3, 149 (2000) ' +
    '(v_sat,300 and A from memory)',
  validity:
    'fitted to published saturation velocities of each material, roughly 77–500 K (range from memory); ' +
    'the form stays finite and positive, evaluated 20–1000 K and extrapolated outside the fitted range',
};

/** Where a material's tables are evaluated: the form has no singularity at any T > 0. */
const QUAY_EVALUATION_RANGE: EvaluationRange = {
  min: 20,
  max: 1000,
  reason: 'the Quay form is finite at every temperature; fitted roughly 77–500 K and extrapolated outside',
};

/** Why β comes from Caughey & Thomas for these materials. */
function assumedExponentSource(carrier: Carrier): VelocitySource {
  return {
    citation: `${CAUGHEY_THOMAS_FIELD_SOURCE.citation}; β = ${CAUGHEY_THOMAS_FIELD_EXPONENTS[carrier]} transferred from Si (our assumption)`,
    validity: 'not fitted to this material: Quay et al. give v_sat only; the shape of the knee is an estimate',
  };
}

/** One Quay entry. */
function quayEntry(carrier: Carrier, valueAt300: number, temperatureCoefficient: number): CarrierHighFieldTable {
  return {
    modelCode: QUAY_MODEL_CODE,
    saturationVelocity: { form: 'quay', valueAtReference: valueAt300, referenceTemperature: 300, temperatureCoefficient },
    saturationSource: QUAY_SOURCE,
    fieldExponent: { form: 'constant', value: CAUGHEY_THOMAS_FIELD_EXPONENTS[carrier] },
    fieldExponentSource: assumedExponentSource(carrier),
    evaluationRange: QUAY_EVALUATION_RANGE,
  };
}

/** Quay et al. (2000) germanium: v_sat,300 = 0.70e7 / 0.63e7 cm/s, A = 0.45 / 0.39 (electrons / holes; from memory). */
export const QUAY_GERMANIUM: MaterialHighFieldTables = {
  material: 'Ge',
  electron: quayEntry('electron', 0.7e7, 0.45),
  hole: quayEntry('hole', 0.63e7, 0.39),
};

/**
 * Quay et al. (2000) gallium arsenide: v_sat,300 = 0.72e7 / 0.90e7 cm/s,
 * A = 0.44 / 0.59 (electrons / holes; from memory). For electrons this is the
 * high-field value beyond the transferred-electron peak.
 */
export const QUAY_GALLIUM_ARSENIDE: MaterialHighFieldTables = {
  material: 'GaAs',
  electron: quayEntry('electron', 0.72e7, 0.44),
  hole: quayEntry('hole', 0.9e7, 0.59),
  limitations:
    'GaAs electrons show negative differential mobility (transferred-electron effect): the measured velocity peaks ' +
    'near 2e7 cm/s around 3–4 kV/cm at 300 K and falls toward v_sat at higher field (common practice, no source). ' +
    'The monotone Caughey–Thomas curve has no peak, so between about 1e3 and 1e4 V/cm it underestimates the electron ' +
    'velocity, by up to a factor of about three near the peak.',
};
