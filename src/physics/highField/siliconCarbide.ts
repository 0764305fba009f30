/**
 * 4H-SiC: I. A. Khan, J. A. Cooper, Jr., "Measurement of high-field electron
 * transport in silicon carbide", IEEE Trans. Electron Devices 47, 269 (2000)
 * and Materials Science Forum 338–342, 761 (2000): electron saturated drift
 * velocity about 2.2e7 cm/s at room temperature, field perpendicular to the c
 * axis (from memory). Only that temperature is tabulated here: the core
 * refuses other temperatures rather than invent a temperature law. No hole
 * saturation velocity is tabulated (none we could cite).
 */
import { CAUGHEY_THOMAS_FIELD_EXPONENTS, CAUGHEY_THOMAS_FIELD_SOURCE } from './caugheyThomasField';
import type { MaterialHighFieldTables, VelocitySource } from './types';
import { parameterText as t } from '../parameterText';
import { prose } from '../../text/prose';

/** Registry code of the Khan & Cooper (2000) 4H-SiC electron saturation velocity. */
export const KHAN_COOPER_MODEL_CODE = 'khan-cooper-2000';

/** Khan & Cooper (2000) 4H-SiC electron saturated drift velocity at 300 K, cm/s (from memory). */
export const KHAN_COOPER_SATURATION_VELOCITY = 2.2e7;

/** Citation and validity of the Khan & Cooper value, for the model registry. */
export const KHAN_COOPER_SOURCE: VelocitySource = {
  citation:
    'I. A. Khan, J. A. Cooper, Jr., IEEE Trans. Electron Devices 47, 269 (2000); Mater. Sci. Forum 338–342, 761 (2000) ' +
    `(v_sat = ${t(KHAN_COOPER_SATURATION_VELOCITY)} cm/s from memory)`,
  validity: '4H-SiC electrons, 300 K only, field perpendicular to the c axis; no temperature law tabulated',
};

/** The one temperature at which the value is used, K. */
const MEASURED_TEMPERATURE = 300;

/** Khan & Cooper (2000) 4H-SiC electrons; holes not tabulated. */
export const KHAN_COOPER_SILICON_CARBIDE: MaterialHighFieldTables = {
  material: '4H-SiC',
  electron: {
    modelCode: KHAN_COOPER_MODEL_CODE,
    saturationVelocity: { form: 'single-temperature', value: KHAN_COOPER_SATURATION_VELOCITY, temperature: MEASURED_TEMPERATURE },
    saturationSource: KHAN_COOPER_SOURCE,
    fieldExponent: { form: 'constant', value: CAUGHEY_THOMAS_FIELD_EXPONENTS.electron },
    fieldExponentSource: {
      citation: prose`${CAUGHEY_THOMAS_FIELD_SOURCE.citation}; β = ${CAUGHEY_THOMAS_FIELD_EXPONENTS.electron}
        transferred from Si (our assumption)`,
      validity: 'not fitted to 4H-SiC: the shape of the knee is an estimate',
    },
    evaluationRange: {
      min: MEASURED_TEMPERATURE,
      max: MEASURED_TEMPERATURE,
      reason: 'only the 300 K value of Khan & Cooper (2000) is tabulated; no temperature law is invented',
    },
  },
  hole: {
    missing: 'no published hole saturation velocity for 4H-SiC in this release: for material 4H-SiC only the electron carrier is tabulated',
  },
  limitations: 'Electron transport in 4H-SiC is anisotropic; the value is for fields perpendicular to the c axis.',
};
