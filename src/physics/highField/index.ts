/**
 * High-field drift: saturation-velocity tables per material and carrier,
 * the Caughey–Thomas velocity–field relation, drift velocity of a sample and
 * the saturated drift current density.
 */
export type {
  CarrierHighFieldTable,
  EvaluationRange,
  FieldExponentLaw,
  MaterialHighFieldTables,
  MissingHighFieldTable,
  SaturationVelocityLaw,
  VelocitySource,
} from './types';
export { CAUGHEY_THOMAS_FIELD_EXPONENTS, CAUGHEY_THOMAS_FIELD_SOURCE, caugheyThomasVelocity } from './caugheyThomasField';
export { CANALI_MODEL_CODE, CANALI_SOURCE, CANALI_FIELD_EXPONENT_LAWS, canaliExponentAt300K } from './canali';
export {
  QUAY_MODEL_CODE,
  QUAY_PARAMETERS,
  QUAY_SILICON,
  QUAY_GERMANIUM,
  QUAY_GALLIUM_ARSENIDE,
  QUAY_SOURCE,
  SILICON_HOLE_LAW_CROSSING_K,
} from './quay';
export { KHAN_COOPER_MODEL_CODE, KHAN_COOPER_SILICON_CARBIDE, KHAN_COOPER_SOURCE } from './siliconCarbide';
export {
  HIGH_FIELD_TABLES,
  HIGH_FIELD_MATERIAL_CODES,
  materialHighFieldTables,
  carrierHighFieldTable,
  missingSaturationVelocity,
} from './tables';
export { saturationVelocity, fieldExponent } from './saturationVelocity';
export { driftVelocity } from './driftVelocity';
export { saturatedCurrentDensity } from './currentDensity';
export { CAUGHEY_THOMAS_FIELD_CODE, HIGH_FIELD_MODELS } from './modelInfo';
