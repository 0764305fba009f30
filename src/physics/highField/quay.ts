/**
 * Saturation velocities of Si, Ge and GaAs: R. Quay, C. Moglestue,
 * V. Palankovski, S. Selberherr, "A temperature dependent model for the
 * saturation velocity in semiconductor materials", Materials Science in
 * Semiconductor Processing 3, 149 (2000):
 *
 *   v_sat(T) = v_sat,300 / ((1 − A) + A·(T/300 K))
 *
 * The form is from memory (the retrieved text lost the equation image). The
 * parameters v_sat,300 and A were read in V. Palankovski's dissertation (TU
 * Wien, 2000), Table 3.31 ("Parameter values for velocity saturation model",
 * taken from the Quay et al. paper; iue.tuwien.ac.at/phd/palankovski/node48).
 * With this form they give Si electrons 1.24e7 cm/s at 77 K, inside the
 * measured 1.2–1.4e7 cm/s; the complementary reading (A ↔ 1 − A) would give
 * 2.2e7 cm/s, far outside, which is how the form was checked against data.
 *
 * Quay et al. give no field exponent: for Ge and GaAs β is Caughey & Thomas's
 * silicon value (2 for electrons, 1 for holes), for Si Canali et al.'s 300 K
 * value (canali.ts): assumptions of ours, stated in each entry.
 */
import { CAUGHEY_THOMAS_FIELD_EXPONENTS, CAUGHEY_THOMAS_FIELD_SOURCE } from './caugheyThomasField';
import { CANALI_MODEL_CODE, CANALI_SOURCE, canaliExponentAt300K } from './canali';
import type { CarrierHighFieldTable, EvaluationRange, MaterialHighFieldTables, VelocitySource } from './types';
import type { Carrier } from '../sample';
import { prose } from '../../text/prose';

/** Registry code of the Quay et al. (2000) saturation velocities. */
export const QUAY_MODEL_CODE = 'quay-2000';

/** Citation and validity of the Quay et al. (2000) model, for the model registry. */
export const QUAY_SOURCE: VelocitySource = {
  citation:
    'R. Quay, C. Moglestue, V. Palankovski, S. Selberherr, Mater. Sci. Semicond. Process. 3, 149 (2000) ' +
    '(v_sat,300 and A read in V. Palankovski, dissertation, TU Wien 2000, Table 3.31; form from memory)',
  validity:
    'fitted to published saturation velocities of each material, roughly 77–500 K (range from memory); ' +
    'the form stays finite and positive; evaluated up to 1000 K and extrapolated above the fitted range',
};

/** Reference temperature of the Quay form, K. */
const QUAY_REFERENCE_TEMPERATURE = 300;

/** Quay et al. (2000) parameters [v_sat,300 in cm/s, A], read in Palankovski (2000) Table 3.31 (given there in m/s). */
export const QUAY_PARAMETERS = {
  Si: { electron: [1.0e7, 0.26], hole: [0.704e7, 0.63] },
  Ge: { electron: [0.7e7, 0.55], hole: [0.63e7, 0.61] },
  GaAs: { electron: [0.72e7, 0.56], hole: [0.9e7, 0.41] },
} as const satisfies Record<string, Record<Carrier, readonly [number, number]>>;

/** Where the Ge and GaAs tables are evaluated: the form has no singularity at any T > 0. */
const QUAY_EVALUATION_RANGE: EvaluationRange = {
  min: 20,
  max: 1000,
  reason: 'the Quay form is finite at every temperature; fitted roughly 77–500 K and extrapolated outside',
};

/** Why β comes from Caughey & Thomas for Ge and GaAs. */
function assumedExponentSource(carrier: Carrier): VelocitySource {
  return {
    citation: prose`${CAUGHEY_THOMAS_FIELD_SOURCE.citation}; β = ${CAUGHEY_THOMAS_FIELD_EXPONENTS[carrier]}
      transferred from Si (our assumption)`,
    validity: 'not fitted to this material: Quay et al. give v_sat only; the shape of the knee is an estimate',
  };
}

/** The Quay law of one material and carrier. */
function quayLaw(material: keyof typeof QUAY_PARAMETERS, carrier: Carrier) {
  const [valueAtReference, temperatureCoefficient] = QUAY_PARAMETERS[material][carrier];
  return { form: 'quay', valueAtReference, referenceTemperature: QUAY_REFERENCE_TEMPERATURE, temperatureCoefficient } as const;
}

/** One Ge or GaAs entry. */
function quayEntry(material: 'Ge' | 'GaAs', carrier: Carrier): CarrierHighFieldTable {
  return {
    modelCode: QUAY_MODEL_CODE,
    saturationVelocity: quayLaw(material, carrier),
    saturationSource: QUAY_SOURCE,
    fieldExponent: { form: 'constant', value: CAUGHEY_THOMAS_FIELD_EXPONENTS[carrier] },
    fieldExponentSource: assumedExponentSource(carrier),
    evaluationRange: QUAY_EVALUATION_RANGE,
  };
}

/**
 * Temperature below which Quay's Si hole law exceeds the electron law, K
 * (about 101 K): solves v_e(T) = v_h(T), linear in T for the Quay form.
 * Measured high-field velocities of holes in Si stay below those of
 * electrons (Jacoboni et al. 1977 review, from memory), so holes are refused
 * there instead of returning a hole velocity above the electron one.
 */
export const SILICON_HOLE_LAW_CROSSING_K: number = (() => {
  const [ve, ae] = QUAY_PARAMETERS.Si.electron;
  const [vh, ah] = QUAY_PARAMETERS.Si.hole;
  // ve·((1−ah) + ah·t) = vh·((1−ae) + ae·t), t = T/300 K.
  const t = (vh * (1 - ae) - ve * (1 - ah)) / (ve * ah - vh * ae);
  return t * QUAY_REFERENCE_TEMPERATURE;
})();

/** Highest temperature evaluated in Si, K (extrapolated above Quay's fitted range). */
const SILICON_MAX_K = 1000;

/** β of Si from Canali et al. at 300 K, held constant (our assumption). */
function siliconExponentSource(carrier: Carrier): VelocitySource {
  return {
    citation: `${CANALI_SOURCE.citation}; β = ${canaliExponentAt300K(carrier).toFixed(3)} (their 300 K value)`,
    validity: CANALI_SOURCE.validity,
  };
}

/**
 * Silicon: Quay et al. (2000) v_sat(T), Canali et al. (1975) β at 300 K.
 * Electrons 1.0e7 cm/s at 300 K, 1.24e7 at 77 K; holes 7.04e6 cm/s at 300 K,
 * from about 101 K.
 */
export const QUAY_SILICON: MaterialHighFieldTables = {
  material: 'Si',
  electron: {
    modelCode: QUAY_MODEL_CODE,
    saturationVelocity: quayLaw('Si', 'electron'),
    saturationSource: QUAY_SOURCE,
    fieldExponent: { form: 'constant', value: canaliExponentAt300K('electron') },
    fieldExponentSource: siliconExponentSource('electron'),
    fieldExponentModelCode: CANALI_MODEL_CODE,
    evaluationRange: {
      min: 77,
      max: SILICON_MAX_K,
      reason:
        'Quay’s fit covers roughly 77–500 K and is extrapolated above; below 77 K the measured high-field velocity ' +
        'depends on crystal direction (Jacoboni et al. 1977, from memory) and is not tabulated',
    },
  },
  hole: {
    modelCode: QUAY_MODEL_CODE,
    saturationVelocity: quayLaw('Si', 'hole'),
    saturationSource: QUAY_SOURCE,
    fieldExponent: { form: 'constant', value: canaliExponentAt300K('hole') },
    fieldExponentSource: siliconExponentSource('hole'),
    fieldExponentModelCode: CANALI_MODEL_CODE,
    evaluationRange: {
      min: Math.ceil(SILICON_HOLE_LAW_CROSSING_K),
      max: SILICON_MAX_K,
      reason:
        `below ${Math.ceil(SILICON_HOLE_LAW_CROSSING_K)} K Quay’s hole law exceeds the electron law, while measured hole ` +
        'velocities in Si stay below electron ones; extrapolated above about 500 K',
    },
  },
};

/** Quay et al. (2000) germanium: v_sat,300 = 0.70e7 / 0.63e7 cm/s, A = 0.55 / 0.61 (electrons / holes). */
export const QUAY_GERMANIUM: MaterialHighFieldTables = {
  material: 'Ge',
  electron: quayEntry('Ge', 'electron'),
  hole: quayEntry('Ge', 'hole'),
};

/**
 * Quay et al. (2000) gallium arsenide: v_sat,300 = 0.72e7 / 0.90e7 cm/s,
 * A = 0.56 / 0.41 (electrons / holes). For electrons this is the high-field
 * value beyond the transferred-electron peak.
 */
export const QUAY_GALLIUM_ARSENIDE: MaterialHighFieldTables = {
  material: 'GaAs',
  electron: quayEntry('GaAs', 'electron'),
  hole: quayEntry('GaAs', 'hole'),
  limitations:
    'GaAs electrons show negative differential mobility (transferred-electron effect): the measured velocity peaks ' +
    'near 2e7 cm/s around 3–4 kV/cm at 300 K and falls toward v_sat at higher field (common practice, no source). ' +
    'The monotone Caughey–Thomas curve has no peak, so between about 1e3 and 1e4 V/cm it underestimates the electron ' +
    'velocity, by up to a factor of about three near the peak.',
};
