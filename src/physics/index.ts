/**
 * Public API of the physics core: pure functions in K, cm⁻³, eV, cm²/(V·s),
 * Ω·cm. Everything the catalog layer uses is re-exported from here; the
 * modules behind it are implementation detail.
 */

export { PhysicsDomainError } from './errors';

// Constants and the root finder.
export { ELEMENTARY_CHARGE, BOLTZMANN, PLANCK, ELECTRON_MASS, thermalVoltage } from './constants';
export { findRoot } from './solve';

// Materials, bands, dopants, equilibrium.
export {
  MATERIAL_CODES,
  MATERIALS,
  resolveMaterial,
  SILICON,
  GERMANIUM,
  GALLIUM_ARSENIDE,
  SILICON_CARBIDE_4H,
  type Material,
} from './materials';
export {
  bandgap,
  conductionBandDensity,
  valenceBandDensity,
  INTRINSIC_MODEL_CODES,
  intrinsicDensity,
  intrinsicModelCodes,
  fermiDiracHalf,
  fermiDiracMinusHalf,
  BOLTZMANN_STATISTICS,
  FERMI_DIRAC_STATISTICS,
  BANDGAP_NARROWING_MODEL_CODES,
  apparentBandgapNarrowing,
  effectiveIntrinsicDensity,
  resolveBandgapNarrowingModel,
} from './bands';
export {
  dopantCodes,
  typedDopantCodes,
  dopantCodeProblem,
  readDopant,
  resolveDopant,
  genericDopant,
  type Dopant,
  type DopantKind,
} from './dopants';
export { solveEquilibrium, ionizedFraction, type DopantDensity, type Equilibrium } from './equilibrium';

// Samples, mobility, transport, inverse.
export { sampleDopants, carrierFor, resolveCarrierRole, CARRIER_ROLES, type Sample, type Carrier, type CarrierRole } from './sample';
export {
  MOBILITY_MODEL_CODES,
  ALL_MOBILITY_MODEL_CODES,
  mobilityModelCodes,
  defaultMobilityModel,
  defaultMobilityModelFor,
  defaultMinorityMobilityModel,
  SILICON_MINORITY_MOBILITY_MODEL,
  fitMobility,
  mobility,
  freeCarrierMobility,
  diffusivity,
} from './mobility';
export { ARORA_FITTED_TEMPERATURES } from './mobility/arora';
export {
  RESISTIVITY_MODEL_CODES,
  ALL_RESISTIVITY_MODEL_CODES,
  F723_ANCHORED_CODE,
  ASTM_F723_CODE,
  anchoredResistivity,
  resistivityModelCodes,
  conductivity,
  resistivity,
  currentDensity,
  FIELD_DEPENDENCE_CODES,
  type FieldDependence,
} from './transport';

// High-field drift and the temperature coefficient of resistivity.
export {
  saturationVelocity,
  fieldExponent,
  caugheyThomasVelocity,
  driftVelocity,
  saturatedCurrentDensity,
  HIGH_FIELD_MATERIAL_CODES,
  HIGH_FIELD_TABLES,
  type CarrierHighFieldTable,
  type MaterialHighFieldTables,
} from './highField';
export { resistivityTemperatureCoefficient, temperatureDerivative, type TemperatureBounds } from './temperatureCoefficient';
export {
  dopingForResistivity,
  dopingSolutions,
  AmbiguousDopingError,
  type DensityWindow,
  type DensityWindowNames,
  type DopingSolution,
} from './inverse';
export { f723Resistivity, f723Density, f723SpeciesFor, F723_VALIDITY, type F723Species } from './astmF723';
export { F723_ANCHOR_TEMPERATURE } from './f723Anchored';
export { resistivitySpread, dopingSpread, type ModelSpread } from './modelSpread';
export { resistivityAtTemperature, conversionModel, CERTIFICATE_TEMPERATURE } from './temperatureConversion';

// Geometry of uniform conductors.
export { CM_PER_UM, sheetResistance, resistorValue } from './geometry';

// Layers: diffusion and implant profiles, junctions, layer sheet resistance.
export {
  erfc,
  erfcinv,
  PROFILE_CODES,
  DEFAULT_PROFILE,
  resolveProfile,
  junctionDepth,
  diffusedLayerSheetResistance,
  implantedLayerSheetResistance,
  diffusedLayerConductance,
  implantedLayerConductance,
  LAYER_INTEGRATION,
  type ProfileCode,
  type DiffusedLayer,
  type ImplantedLayer,
  type LayerConductance,
} from './layers';

// Measurement analysis (the barrel of src/physics/measurement).
export * from './measurement';
export { TYPICAL_CONTACT_HEAD_SQUARES, resistorLength, resistorAtTemperature, type TemperatureCoefficients } from './resistorDesign';

// Model registry.
export { MODEL_REGISTRY, modelInfo, type ModelInfo } from './models';

// Codes and constants the catalog cites in help text and model lists; exported
// here so the catalog reaches physics only through this barrel.
export { IONIZATION_MODEL_CODE } from './ionization';
export { ionizationModelCode } from './materials/modelInfo';
export { CAUGHEY_THOMAS_FIELD_CODE, carrierHighFieldTable, canaliExponentAt300K } from './highField';
export { TCR_RELATIVE_STEP } from './temperatureCoefficient';
