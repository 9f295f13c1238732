/**
 * Blackbody SED fitting: bands, fits to photometry and spectra, and the
 * hand-off to radius and luminosity.
 *
 * @module
 */
export {
  createBlackbodyFitter,
  fitBlackbody,
  fitBlackbodySpectrum,
  gaussianBand,
  responseBand,
  stellarParametersFromFit,
  topHatBand,
} from "./blackbody";
export type {
  AbMagnitudeObservation,
  BandDatum,
  BandObservation,
  BandShapeOptions,
  BlackbodyFit,
  BlackbodyFitFlags,
  BlackbodyFitOptions,
  BlackbodyFitter,
  BlackbodyFitSI,
  BlackbodySpectrumFit,
  DistanceMeasurement,
  FitBand,
  FitParameterName,
  FitStopReason,
  FluxPerFrequencyObservation,
  FluxPerWavelengthObservation,
  ResponseConvention,
  SpectrumObservation,
  StellarFromFitSI,
  StellarParameters,
} from "./blackbody";
export type { DerivedQuantitySI, StarConsistencySI, StarInputKindSI, StarQuantitySI } from "../photometry/kernels/solver";
// SED models you can compose and extend (plain SI numbers), the model fitter and the least-squares engine
export {
  blackbodyComponentSI,
  ccm89AttenuationSI,
  modifiedBlackbodyComponentSI,
  prepareSedModelSI,
  sedModelSI,
  sedSpectrumSI,
} from "./kernels/sed-model";
export type {
  AttenuationSI,
  BlackbodyComponentOptionsSI,
  ComponentEvaluatorSI,
  ModelChannelSI,
  ModelParameterSI,
  ModifiedBlackbodyOptionsSI,
  ParameterTransform,
  PreparedSedModelSI,
  SedComponentSI,
  SedModelSI,
  SedTermSI,
} from "./kernels/sed-model";
export { compareExcessSI, createSedFitterSI, DATA_AB_MAGNITUDE, DATA_FLUX_LAMBDA } from "./kernels/model-fit";
export type {
  ExcessComparisonSI,
  FitChannelSI,
  ParameterCovarianceSI,
  ParameterEstimateSI,
  SedFitFlagsSI,
  SedFitOutcomeSI,
  SedFitSI,
  SedFitterSettingsSI,
  SedFitterSI,
  StartContextSI,
  StartStrategySI,
} from "./kernels/model-fit";
export { choleskySolveInPlace, createLeastSquaresSolver, symmetricInverse } from "./kernels/least-squares";
export type { LeastSquaresOutcome, LeastSquaresProblem, LeastSquaresSettings, LeastSquaresSolver, StopReason } from "./kernels/least-squares";
