/**
 * Band structure of the host: Eg(T), Nc(T), Nv(T), ni(T), the band-edge
 * description used by the solver, carrier statistics and model descriptions.
 */

export { bandgap } from './bandgap';
export { conductionBandDensity, valenceBandDensity, logConductionBandDensity, logValenceBandDensity } from './densityOfStates';
export {
  INTRINSIC_MODEL_CODES,
  DOS_INTRINSIC_MODEL,
  intrinsicDensity,
  intrinsicModelCodes,
  logIntrinsicDensity,
  resolveIntrinsicModel,
} from './intrinsicDensity';
export { bandEdges, type BandEdges } from './bandEdges';
export {
  BOLTZMANN_STATISTICS,
  FERMI_DIRAC_STATISTICS,
  DEFAULT_CARRIER_STATISTICS,
  levelOccupancy,
  type CarrierStatistics,
  type LevelOccupancy,
} from './statistics';
export { fermiDiracIntegral, fermiDiracHalf, fermiDiracMinusHalf, fermiDiracOverBoltzmann, type FermiDiracOrder } from './fermiDirac';
export {
  BANDGAP_NARROWING_MODELS,
  BANDGAP_NARROWING_MODEL_CODES,
  KLAASSEN_BGN,
  SLOTBOOM_1976_BGN,
  apparentBandgapNarrowing,
  effectiveIntrinsicDensity,
  resolveBandgapNarrowingModel,
  type ApparentBandgapNarrowingModel,
} from './bandgapNarrowing';
export { einsteinDegeneracyFactor, einsteinDegeneracyRatio } from './einsteinRelation';
export { BAND_MODELS } from './modelInfo';
