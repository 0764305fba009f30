/**
 * Layers: dopant depth profiles, their junctions, and the sheet resistance of
 * diffused and implanted layers by integrating the local conductivity.
 */
export { erf, erfc, erfcinv, logErfc } from './specialFunctions';
export { integrate, type QuadratureOptions, type QuadratureResult } from './integrate';
export {
  PROFILE_CODES,
  DEFAULT_PROFILE,
  resolveProfile,
  diffusedDensity,
  junctionDepth,
  characteristicLength,
  implantPeakDensity,
  implantDensity,
  implantSpan,
  type ProfileCode,
  type DiffusedProfile,
  type ImplantProfile,
  type ImplantSpan,
} from './profiles';
export {
  LAYER_INTEGRATION,
  diffusedLayerConductance,
  diffusedLayerSheetResistance,
  implantedLayerConductance,
  implantedLayerSheetResistance,
  type LayerConditions,
  type DiffusedLayer,
  type ImplantedLayer,
  type LayerConductance,
} from './sheetResistance';
export { LAYER_MODELS } from './modelInfo';
