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
