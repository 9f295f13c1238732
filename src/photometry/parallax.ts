/**
 * Distance from trigonometric parallax, typed.
 *
 * A parallax is an {@link Angle}: milliarcseconds, arcseconds and
 * microarcseconds are units of that one typed angle
 * (`SI.of(12.3, units.mas)`), so a parallax given as a plain number or as a
 * length does not compile. Angles are the same in SI and CGS; the distance
 * comes back in the system passed first.
 *
 * - Usual form: d = 1 pc × (1″ / p). The parsec is (648000/π) au exactly
 *   (IAU 2015 Resolution B2), so this is identically d = 1 au / p, evaluated
 *   that way (one correctly rounded division): 100 mas is 10 pc to the last bit.
 * - Exact geometry: d = 1 au / tan p (baseline perpendicular to the line of
 *   sight). For any measured stellar parallax (p < 1″) the two differ by a
 *   relative p²/3 < 1e-11.
 *
 * **Bias.** Inverting a parallax is a biased distance estimator once the
 * fractional error σ_p/p exceeds about 0.1–0.2: 1/p is a non-linear transform
 * of a noisy number, its distribution is skewed, and the first-order
 * uncertainty σ_d = d σ_p/p stops meaning anything (Lutz & Kelker 1973,
 * PASP 85, 573, for the related bias in samples selected on parallax; the
 * 0.1 threshold is common practice in work with large astrometric surveys).
 * {@link distanceEstimateFromParallax} raises `inversionBiased` above the threshold;
 * use a probabilistic estimate with an explicit distance prior there.
 *
 * @module
 */
import { defineLaw } from "../law/define";
import { lawInput } from "../law/input";
import { lawOutput } from "../law/output";
import { kinds } from "../quantity/aliases";
import type { Angle, Length } from "../quantity/aliases";
import type { SystemName } from "../quantity/quantity";
import type { UnitSystem } from "../quantity/system";
import {
  distanceFromParallaxExactUnchecked,
  distanceFromParallaxUnchecked,
  PARALLAX_FRACTIONAL_ERROR_THRESHOLD,
  parallaxFromDistanceExactUnchecked,
  parallaxFromDistanceUnchecked,
} from "./kernels/parallax";

/** The largest double below π/2: the exact geometry needs p < π/2 (tan p is infinite there). */
const BELOW_HALF_PI = Math.PI / 2 - 2 ** -52;

const parallaxIn = lawInput("parallax", kinds.angle);
const exactParallaxIn = lawInput("parallax", kinds.angle, { min: Number.MIN_VALUE, max: BELOW_HALF_PI, rangeNote: "the exact geometry needs p < π/2 rad" });
const sigmaParallaxIn = lawInput("parallax uncertainty", kinds.angle, { check: "nonNegative" });
const thresholdIn = lawInput("threshold", kinds.dimensionless, { check: "finite", min: Number.MIN_VALUE, max: Number.MAX_VALUE, rangeNote: "dimensionless σ_p/p" });
const distanceIn = lawInput("distance", kinds.length);

const distanceLaw = defineLaw({ name: "distance", inputs: [parallaxIn], result: kinds.length, kernel: distanceFromParallaxUnchecked });
const distanceExactLaw = defineLaw({ name: "distance", inputs: [exactParallaxIn], result: kinds.length, kernel: distanceFromParallaxExactUnchecked });
const parallaxLaw = defineLaw({ name: "parallax", inputs: [distanceIn], result: kinds.angle, kernel: parallaxFromDistanceUnchecked });
const parallaxExactLaw = defineLaw({ name: "parallax", inputs: [distanceIn], result: kinds.angle, kernel: parallaxFromDistanceExactUnchecked });
const sigmaDistanceOut = lawOutput("distance uncertainty", kinds.length);

/** Default σ_p/p above which {@link distanceEstimateFromParallax} flags the inverted distance as biased: 0.1 (common practice). */
export const PARALLAX_BIAS_THRESHOLD: number = PARALLAX_FRACTIONAL_ERROR_THRESHOLD;

/**
 * Distance from parallax in the usual form d = 1 pc × (1″/p) (= 1 au / p exactly).
 *
 * @param sys - `SI` (result in m) or `CGS` (cm)
 * @param parallax - parallax p, an angle (e.g. `SI.of(100, units.mas)`)
 * @returns distance d, in `sys`
 * @throws RangeError naming `parallax` unless finite and > 0 rad, or when d overflows the double range in `sys` (naming the parallax)
 * @example
 * ```ts
 * import { SI, distanceFromParallax, units } from "starlume";
 * const d = distanceFromParallax(SI, SI.of(100, units.mas));
 * SI.valueIn(d, units.pc); // 10
 * ```
 */
export function distanceFromParallax<S extends SystemName>(sys: UnitSystem<S>, parallax: Angle): Length<S> {
  return distanceLaw(sys, parallax);
}

/**
 * Distance from parallax with the exact geometry d = 1 au / tan p.
 *
 * @param sys - `SI` or `CGS`
 * @param parallax - parallax p, an angle, 0 < p < π/2 rad
 * @returns distance d, in `sys`
 * @throws RangeError naming `parallax` unless 0 < p < π/2 rad
 * @example
 * ```ts
 * import { CGS, distanceFromParallaxExact, units } from "starlume";
 * const d = distanceFromParallaxExact(CGS, CGS.of(768.0665, units.mas)); // Proxima Cen, ≈ 4.0175e18 cm
 * ```
 */
export function distanceFromParallaxExact<S extends SystemName>(sys: UnitSystem<S>, parallax: Angle): Length<S> {
  return distanceExactLaw(sys, parallax);
}

/**
 * Parallax from distance in the usual form p = 1 au / d (rad); the inverse
 * of {@link distanceFromParallax}.
 *
 * @param sys - `SI` or `CGS`
 * @param distance - distance d, in `sys`
 * @returns parallax p (read it in mas with `SI.valueIn(p, units.mas)`)
 * @throws RangeError naming `distance` unless finite and > 0
 * @example
 * ```ts
 * import { SI, parallaxFromDistance, units } from "starlume";
 * SI.valueIn(parallaxFromDistance(SI, SI.of(10, units.pc)), units.mas); // 100
 * ```
 */
export function parallaxFromDistance<S extends SystemName>(sys: UnitSystem<S>, distance: Length<NoInfer<S>>): Angle {
  return parallaxLaw(sys, distance);
}

/**
 * Parallax from distance with the exact geometry p = atan(1 au / d).
 *
 * @param sys - `SI` or `CGS`
 * @param distance - distance d, in `sys`
 * @returns parallax p, 0 < p < π/2
 * @throws RangeError naming `distance` unless finite and > 0
 * @example
 * ```ts
 * import { SI, parallaxFromDistanceExact, units } from "starlume";
 * const p = parallaxFromDistanceExact(SI, SI.of(1, units.au)); // π/4 rad
 * ```
 */
export function parallaxFromDistanceExact<S extends SystemName>(sys: UnitSystem<S>, distance: Length<NoInfer<S>>): Angle {
  return parallaxExactLaw(sys, distance);
}

/** Options of {@link distanceEstimateFromParallax}. */
export interface ParallaxDistanceEstimateOptions {
  /** σ_p/p above which `inversionBiased` is set (finite, > 0). Default {@link PARALLAX_BIAS_THRESHOLD} = 0.1. */
  readonly threshold?: number;
}

/** Result of {@link distanceEstimateFromParallax}, in the caller's system. */
export interface ParallaxDistanceEstimate<S extends SystemName> {
  /** d = 1 au / p. */
  readonly distance: Length<S>;
  /** First-order standard uncertainty σ_d = d σ_p / p (not meaningful when `inversionBiased`). */
  readonly sigmaDistance: Length<S>;
  /** Fractional parallax error σ_p / p. */
  readonly fractionalParallaxError: number;
  /** True when σ_p / p > threshold: 1/p is then a biased estimator and σ_d is not a useful uncertainty. */
  readonly inversionBiased: boolean;
  /** The threshold that was applied. */
  readonly threshold: number;
}

/**
 * Distance, first-order uncertainty and a bias flag from a parallax and its
 * standard uncertainty (see the module notes on Lutz–Kelker-type bias).
 *
 * @param sys - `SI` or `CGS`
 * @param parallax - parallax p (> 0)
 * @param sigmaParallax - its standard uncertainty σ_p (≥ 0)
 * @param options - `threshold` for the bias flag (default 0.1)
 * @returns distance and σ in `sys`, σ_p/p, the flag and the threshold used
 * @throws RangeError naming `parallax`, `parallax uncertainty` or `threshold`
 * @example
 * ```ts
 * import { SI, distanceEstimateFromParallax, units } from "starlume";
 * const r = distanceEstimateFromParallax(SI, SI.of(2, units.mas), SI.of(0.5, units.mas));
 * r.inversionBiased; // true (σ_p/p = 0.25 > 0.1)
 * SI.valueIn(r.distance, units.pc); // 500
 * ```
 */
export function distanceEstimateFromParallax<S extends SystemName>(
  sys: UnitSystem<S>,
  parallax: Angle,
  sigmaParallax: Angle,
  options: ParallaxDistanceEstimateOptions = {},
): ParallaxDistanceEstimate<S> {
  const distance = distanceLaw(sys, parallax); // checks the parallax; refuses a distance beyond the double range
  const sp = sigmaParallaxIn.toSI(sys, sigmaParallax);
  const threshold = thresholdIn.toSI(sys, options.threshold ?? PARALLAX_BIAS_THRESHOLD);
  const fractionalParallaxError = sp / parallax;
  const sdSI = distanceFromParallaxUnchecked(parallax) * fractionalParallaxError;
  const sigmaDistance = sigmaDistanceOut.fromSI(sys, sdSI);
  if (sigmaDistance !== sigmaDistance) {
    throw new RangeError(`${sigmaDistanceOut.reason(sys, sdSI, [parallaxIn, sigmaParallaxIn], [parallax, sigmaParallax])} (too large for a first-order estimate)`);
  }
  return {
    distance,
    sigmaDistance: sigmaDistance as Length<S>,
    fractionalParallaxError,
    inversionBiased: fractionalParallaxError > threshold,
    threshold,
  };
}
