/**
 * Photometry, typed: the inverse-square law, parallax, angular size and
 * surface brightness, magnitudes (Pogson, distance modulus, IAU 2015
 * bolometric scale, AB), CCM89 extinction, and the stellar-parameter solver.
 *
 * @module
 */
export { distanceFromLuminosityFlux, fluxFromLuminosity, luminosityFromFlux } from "./inverse-square";
export {
  distanceFromParallax,
  distanceFromParallaxExact,
  distanceEstimateFromParallax,
  parallaxFromDistance,
  parallaxFromDistanceExact,
  PARALLAX_BIAS_THRESHOLD,
  type ParallaxDistanceEstimate,
  type ParallaxDistanceEstimateOptions,
} from "./parallax";
export {
  angularDiameter,
  distanceFromAngularDiameter,
  radiusFromAngularDiameter,
  solidAngleFromAngularDiameter,
  surfaceBrightness,
  type AngularGeometry,
  type SolidAngleGeometry,
} from "./angular-size";
export {
  abMagnitude,
  absoluteBolometricMagnitude,
  absoluteMagnitude,
  apparentBolometricMagnitude,
  apparentMagnitude,
  bolometricFluxFromApparentBolometricMagnitude,
  distanceFromDistanceModulus,
  distanceModulus,
  fLambdaFromFNu,
  fluxRatioFromMagnitudeDifference,
  fNuFromAbMagnitude,
  fNuFromFLambda,
  luminosityFromAbsoluteBolometricMagnitude,
  magnitudeDifference,
  magnitudeDifferenceFromFluxRatio,
} from "./magnitudes";
export {
  aVFromColourExcess,
  CCM89_RV_RANGE,
  ccm89Extinction,
  ccm89Ratio,
  colourExcessFromAV,
  dereddenFlux,
  dereddenMagnitude,
  reddenFlux,
  reddenMagnitude,
  RV_DIFFUSE,
  type FluxLike,
} from "./extinction";
export {
  createStarBatchSolver,
  solveStar,
  STAR_QUANTITY_NAMES,
  StarBatchReason,
  type Estimate,
  type EstimateJSON,
  type Measurement,
  type PureArray,
  type StarBatchColumn,
  type StarBatchColumnArray,
  type StarBatchColumns,
  type StarBatchInput,
  type StarBatchOutput,
  type StarBatchResult,
  type StarBatchSolver,
  type StarConsistencyReport,
  type StarCovariance,
  type StarObservationName,
  type StarObservations,
  type StarQuantityName,
  type StarSolution,
  type StarSolutionJSON,
} from "./solver";
