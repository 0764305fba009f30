/**
 * Registry entries (DRIFT.MODELS, help pages, README) of the velocity–field
 * form and of the saturation-velocity tables, built from the citation
 * constants beside each table.
 */
import type { ModelInfo } from '../modelInfo';
import { CAUGHEY_THOMAS_FIELD_SOURCE } from './caugheyThomasField';
import { CANALI_MODEL_CODE, CANALI_SOURCE } from './canali';
import { QUAY_GALLIUM_ARSENIDE, QUAY_MODEL_CODE, QUAY_SOURCE } from './quay';
import { KHAN_COOPER_MODEL_CODE, KHAN_COOPER_SILICON_CARBIDE, KHAN_COOPER_SOURCE } from './siliconCarbide';

/** Registry code of the Caughey–Thomas velocity–field relation. */
export const CAUGHEY_THOMAS_FIELD_CODE = 'caughey-thomas-field';

const VELOCITY = 'drift velocity vs field';
const SATURATION = 'saturation velocity';

export const HIGH_FIELD_MODELS: readonly ModelInfo[] = [
  {
    code: CAUGHEY_THOMAS_FIELD_CODE,
    quantity: VELOCITY,
    name: 'Caughey–Thomas (1967) velocity–field relation',
    citation: CAUGHEY_THOMAS_FIELD_SOURCE.citation,
    validity: CAUGHEY_THOMAS_FIELD_SOURCE.validity,
    notes:
      'μ0 is the sample’s low-field drift mobility (the material’s default mobility model, as DRIFT.MOBILITY gives it), ' +
      'so v = μ0·E exactly at low field. Monotone: no velocity overshoot or negative differential mobility.',
  },
  {
    code: CANALI_MODEL_CODE,
    quantity: `${SATURATION} and field exponent, Si`,
    name: 'Canali et al. (1975) v_m(T) = 1.53e9·T^−0.87 (e), 1.62e8·T^−0.52 (h) cm/s; β = 2.57e-2·T^0.66 (e), 0.46·T^0.17 (h)',
    citation: CANALI_SOURCE.citation,
    validity: CANALI_SOURCE.validity,
  },
  {
    code: QUAY_MODEL_CODE,
    quantity: `${SATURATION}, Ge and GaAs`,
    name: 'Quay et al. (2000) v_sat(T) = v_sat,300/((1 − A) + A·T/300 K)',
    citation: QUAY_SOURCE.citation,
    validity: QUAY_SOURCE.validity,
    notes:
      'Ge: v_sat,300 = 0.70e7 (e), 0.63e7 (h) cm/s, A = 0.45, 0.39; GaAs: 0.72e7 (e), 0.90e7 (h) cm/s, A = 0.44, 0.59 ' +
      '(from memory). Field exponent β = 2 (e), 1 (h) from Caughey–Thomas, not fitted to these materials. ' +
      (QUAY_GALLIUM_ARSENIDE.limitations ?? ''),
  },
  {
    code: KHAN_COOPER_MODEL_CODE,
    quantity: `${SATURATION}, 4H-SiC electrons`,
    name: 'Khan & Cooper (2000) 4H-SiC electron saturated drift velocity, 2.2e7 cm/s',
    citation: KHAN_COOPER_SOURCE.citation,
    validity: KHAN_COOPER_SOURCE.validity,
    notes:
      `β = 2 from Caughey–Thomas, not fitted to 4H-SiC. No hole value is tabulated. ${KHAN_COOPER_SILICON_CARBIDE.limitations ?? ''}`,
  },
];
