/** Analysis of electrical measurements: four-point probe, van der Pauw, Hall, wafer certificates. */
export {
  THIN_LAYER_FACTOR,
  MINIMUM_DIAMETER_RATIO,
  valdesDivisor,
  thicknessFactor,
  circularSliceFactor,
  fourPointResistivity,
  fourPointSheetResistance,
  type ProbeGeometry,
} from './fourPoint';
export { vanDerPauwSheetResistance } from './vanDerPauw';
export { hallDensity, hallMobility } from './hall';
export { radialVariation } from './radialVariation';
export { dopingWindow } from './dopingWindow';
export { MEASUREMENT_MODELS } from './modelInfo';
