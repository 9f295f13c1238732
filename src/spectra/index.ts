/**
 * Spectra, typed: hydrogen-like levels and lines, air and vacuum
 * wavelengths as distinct types, photon conversions, Doppler shifts, line
 * profiles and widths, spectrum synthesis and line measurements, in SI or
 * CGS. The plain-number SI kernels in `./kernels` stay internal.
 *
 * @module
 */
export {
  airRefractiveIndex,
  vacuumFromAir,
  vacuumFromAirBatch,
  airWavelength,
  airWavelengthArray,
  airFromVacuum,
  airFromVacuumBatch,
  vacuumWavelength,
  vacuumWavelengthArray,
} from "./medium";
export type {
  AirWavelength,
  AirWavelengthArray,
  MaybeInMedium,
  Medium,
  MediumOf,
  MediumTag,
  NotAirWavelength,
  NotAirWavelengthArray,
  NotVacuumWavelength,
  NotVacuumWavelengthArray,
  SameMediumAs,
  VacuumWavelength,
  VacuumWavelengthArray,
  WavelengthOnGrid,
} from "./medium";
export {
  bohrLevelEnergy,
  diracLevelCentroidEnergy,
  diracLevelEnergy,
  ion,
  ionFromMassNumber,
  ionizationEnergy,
  ions,
  nuclearMass,
  reducedMass,
} from "./levels";
export type { Ion, LevelModel, LevelModelOptions } from "./levels";
export {
  diracTransitionEnergy,
  hydrogenSeries,
  seriesLimitEnergy,
  seriesLimitVacuumWavelength,
  seriesLineEnergy,
  seriesLineVacuumWavelength,
  seriesLowerLevel,
  seriesVacuumWavelengths,
  transitionEnergy,
  transitionFrequency,
  transitionVacuumWavelength,
  transitionWavenumber,
} from "./lines";
export type { DiracLevel, SeriesName } from "./lines";
export {
  frequencyFromVacuumWavelength,
  frequencyFromWavenumber,
  photonEnergyFromFrequency,
  photonEnergyFromVacuumWavelength,
  photonEnergyFromWavenumber,
  frequencyFromPhotonEnergy,
  vacuumWavelengthFromPhotonEnergy,
  wavenumberFromPhotonEnergy,
  vacuumWavelengthFromFrequency,
  vacuumWavelengthFromWavenumber,
  wavenumberFromFrequency,
  wavenumberFromVacuumWavelength,
} from "./photon";
export {
  observedWavelengthFromRadialVelocity,
  observedWavelengthFromRadialVelocityBatch,
  radialVelocityFromWavelengths,
  redshiftFromRadialVelocity,
  redshiftFromWavelengths,
  observedWavelengthFromRedshift,
  radialVelocityFromRedshift,
} from "./doppler";
export type { DopplerModel } from "./doppler";
export {
  atomicMass,
  dopplerVelocityWidth,
  dopplerWidth,
  dopplerWidthFrequency,
  dopplerWidthFromSigma,
  gaussianFwhm,
  gaussianProfile,
  lorentzHwhm,
  lorentzHwhmFrequency,
  lorentzianProfile,
  voigtFwhm,
  voigtProfile,
  voigtProfileBatch,
} from "./profiles";
export {
  equivalentWidthFromTau0,
  synthesizePlanckSpectrum,
  synthesizeSpectrum,
  tau0FromEquivalentWidth,
} from "./synthesize";
export type {
  PlanckSynthesisResult,
  SpectrumArray,
  SynthesisLine,
  SynthesisLineStrength,
  SynthesisLineWidth,
  SynthesisOptions,
  SynthesisResult,
} from "./synthesize";
export { equivalentWidth, lineCentroid, lineDepth } from "./measure";
