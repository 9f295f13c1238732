/**
 * Distance from trigonometric (annual) parallax.
 *
 * Kernels take the parallax angle in radians and return metres; the typed
 * layer converts from mas, arcsec or µas.
 *
 * - Exact geometry: the parallax p is the angle subtended by 1 au at the star,
 *   so d = 1 au / tan p (distance from the Sun, baseline perpendicular to the
 *   line of sight).
 * - Usual (small-angle) form: d = 1 pc × (1″ / p). Because the parsec is
 *   defined as exactly (648000/π) au (IAU 2015 Resolution B2), this is
 *   identically d = 1 au / p, which is how it is evaluated (one division,
 *   correctly rounded). For any measured stellar parallax (p < 1″ ≈ 4.8e-6 rad)
 *   the two forms differ by a relative p²/3 < 1e-11.
 *
 * **Bias warning.** Inverting a parallax is a biased distance estimator once
 * the fractional parallax error σ_p/p exceeds about 0.1–0.2 (common practice;
 * see e.g. Lutz & Kelker 1973, PASP 85, 573, and later work on astrometric
 * parallaxes): 1/p is a non-linear transform of a noisy quantity, its
 * distribution is skewed, and the first-order uncertainty σ_d = d σ_p / p is
 * then meaningless. Beyond that threshold a probabilistic distance estimate
 * (a posterior with an explicit distance prior) is advised.
 * {@link distanceEstimateFromParallaxSI} sets a flag when the threshold is exceeded.
 *
 * @module
 */
import { AU } from "../../values/constants";
import { requireInRange, requireNonNegative, requirePositive } from "../../internal/checks";
import { requirePositiveResult } from "./common";

/** Default fractional-parallax-error threshold (σ_p/p) above which a distance from 1/p is flagged (common practice). */
export const PARALLAX_FRACTIONAL_ERROR_THRESHOLD = 0.1;

/**
 * Distance from parallax with the exact geometry: d = 1 au / tan p.
 *
 * @param parallaxRad - parallax p, rad, 0 < p < π/2
 * @returns distance d, m
 * @throws RangeError naming `parallax` unless 0 < p < π/2
 * @example
 * ```ts
 * import { distanceFromParallaxExactSI } from "./parallax";
 * const d = distanceFromParallaxExactSI(0.1 * Math.PI / 648000); // 100 mas → ≈ 10 pc in m
 * ```
 */
export function distanceFromParallaxExactSI(parallaxRad: number): number {
  requirePositive("parallax", parallaxRad, "rad");
  if (!(parallaxRad < Math.PI / 2)) {
    throw new RangeError(`parallax must be < π/2 rad for the exact geometry; got ${String(parallaxRad)}`);
  }
  return requirePositiveResult("distance", distanceFromParallaxExactUnchecked(parallaxRad), "m");
}

/** d = 1 au / tan p without input or result checks (see {@link distanceFromParallaxExactSI}). @internal */
export function distanceFromParallaxExactUnchecked(parallaxRad: number): number {
  return AU / Math.tan(parallaxRad);
}

/**
 * Distance from parallax in the usual small-angle form d = 1 pc × (1″/p),
 * evaluated as the identical d = 1 au / p (the parsec is (648000/π) au
 * exactly, IAU 2015 B2).
 *
 * @param parallaxRad - parallax p, rad (> 0, finite)
 * @returns distance d, m
 * @throws RangeError naming `parallax` when p ≤ 0 or not finite
 * @example
 * ```ts
 * import { distanceFromParallaxSI } from "./parallax";
 * const d = distanceFromParallaxSI(0.1 * Math.PI / 648000); // 100 mas → 10 pc = 3.0857e17 m
 * ```
 */
export function distanceFromParallaxSI(parallaxRad: number): number {
  requirePositive("parallax", parallaxRad, "rad");
  return requirePositiveResult("distance", distanceFromParallaxUnchecked(parallaxRad), "m");
}

/** d = 1 au / p without input or result checks (see {@link distanceFromParallaxSI}); +Infinity on overflow. @internal */
export function distanceFromParallaxUnchecked(parallaxRad: number): number {
  return AU / parallaxRad;
}

/**
 * Parallax from distance in the small-angle form p = 1 au / d (rad); the
 * inverse of {@link distanceFromParallaxSI}.
 *
 * @param distanceM - distance d, m (> 0, finite)
 * @returns parallax p, rad
 * @throws RangeError naming `distance`
 * @example
 * ```ts
 * import { parallaxFromDistanceSI } from "./parallax";
 * const p = parallaxFromDistanceSI(3.0856775814913673e17); // ≈ 4.848e-7 rad = 100 mas
 * ```
 */
export function parallaxFromDistanceSI(distanceM: number): number {
  requirePositive("distance", distanceM, "m");
  return requirePositiveResult("parallax", parallaxFromDistanceUnchecked(distanceM), "rad");
}

/** p = 1 au / d without input or result checks (see {@link parallaxFromDistanceSI}); 0 on underflow. @internal */
export function parallaxFromDistanceUnchecked(distanceM: number): number {
  return AU / distanceM;
}

/**
 * Parallax from distance with the exact geometry p = atan(1 au / d); the
 * inverse of {@link distanceFromParallaxExactSI}.
 *
 * @param distanceM - distance d, m (> 0, finite)
 * @returns parallax p, rad (0 < p < π/2)
 * @throws RangeError naming `distance`
 * @example
 * ```ts
 * import { parallaxFromDistanceExactSI } from "./parallax";
 * const p = parallaxFromDistanceExactSI(149597870700); // π/4 rad
 * ```
 */
export function parallaxFromDistanceExactSI(distanceM: number): number {
  requirePositive("distance", distanceM, "m");
  return requirePositiveResult("parallax", parallaxFromDistanceExactUnchecked(distanceM), "rad");
}

/** p = atan(1 au / d) without input or result checks (see {@link parallaxFromDistanceExactSI}). @internal */
export function parallaxFromDistanceExactUnchecked(distanceM: number): number {
  return Math.atan(AU / distanceM);
}

/**
 * First-order (linear) standard uncertainty of d = 1 au / p:
 * σ_d = d σ_p / p = 1 au × σ_p / p². Only meaningful when σ_p/p ≲ 0.1 (see the
 * module notes on bias).
 *
 * @param parallaxRad - parallax p, rad (> 0)
 * @param sigmaParallaxRad - standard uncertainty σ_p, rad (≥ 0)
 * @returns σ_d, m
 * @throws RangeError naming `parallax` or `parallax uncertainty`
 * @example
 * ```ts
 * import { distanceUncertaintyFromParallaxSI } from "./parallax";
 * const mas = Math.PI / 648000 / 1000;
 * const s = distanceUncertaintyFromParallaxSI(100 * mas, 1 * mas); // 1 % of 10 pc
 * ```
 */
export function distanceUncertaintyFromParallaxSI(parallaxRad: number, sigmaParallaxRad: number): number {
  requirePositive("parallax", parallaxRad, "rad");
  requireNonNegative("parallax uncertainty", sigmaParallaxRad, "rad");
  const d = requirePositiveResult("distance", AU / parallaxRad, "m");
  const s = d * (sigmaParallaxRad / parallaxRad);
  if (s === Infinity) throw new RangeError("distance uncertainty overflows a double; parallax uncertainty is too large for a first-order estimate");
  return s;
}

/** Result of {@link distanceEstimateFromParallaxSI}. */
export interface ParallaxDistanceEstimate {
  /** Distance d = 1 au / p, m. */
  readonly distanceM: number;
  /** First-order standard uncertainty σ_d = d σ_p / p, m. */
  readonly sigmaDistanceM: number;
  /** Fractional parallax error σ_p / p. */
  readonly fractionalParallaxError: number;
  /**
   * True when σ_p / p exceeds the threshold: 1/p is then a biased estimator
   * and σ_d is not a useful uncertainty; use a probabilistic distance estimate.
   */
  readonly inversionBiased: boolean;
}

/**
 * Distance, first-order uncertainty and a bias flag from a parallax and its
 * standard uncertainty. The flag is raised when σ_p/p > threshold (default
 * 0.1, common practice; inverting parallaxes becomes biased beyond about
 * 0.1–0.2, cf. Lutz & Kelker 1973).
 *
 * @param parallaxRad - parallax p, rad (> 0, finite)
 * @param sigmaParallaxRad - standard uncertainty σ_p, rad (≥ 0, finite)
 * @param threshold - fractional error above which `inversionBiased` is set (> 0, default 0.1)
 * @returns distance (m), its uncertainty (m), σ_p/p, and the flag
 * @throws RangeError naming `parallax`, `parallax uncertainty` or `threshold`
 * @example
 * ```ts
 * import { distanceEstimateFromParallaxSI } from "./parallax";
 * const mas = Math.PI / 648000 / 1000;
 * const r = distanceEstimateFromParallaxSI(2 * mas, 0.5 * mas); // r.inversionBiased === true (25 %)
 * ```
 */
export function distanceEstimateFromParallaxSI(
  parallaxRad: number,
  sigmaParallaxRad: number,
  threshold: number = PARALLAX_FRACTIONAL_ERROR_THRESHOLD,
): ParallaxDistanceEstimate {
  requirePositive("parallax", parallaxRad, "rad");
  requireNonNegative("parallax uncertainty", sigmaParallaxRad, "rad");
  requireInRange("threshold", threshold, Number.MIN_VALUE, Number.MAX_VALUE, "(dimensionless σ_p/p)");
  const distanceM = requirePositiveResult("distance", AU / parallaxRad, "m");
  const fractionalParallaxError = sigmaParallaxRad / parallaxRad;
  const sigmaDistanceM = distanceM * fractionalParallaxError;
  if (sigmaDistanceM === Infinity || fractionalParallaxError === Infinity) {
    throw new RangeError("distance uncertainty overflows a double; parallax uncertainty is too large for a first-order estimate");
  }
  return { distanceM, sigmaDistanceM, fractionalParallaxError, inversionBiased: fractionalParallaxError > threshold };
}
