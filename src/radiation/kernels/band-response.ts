/**
 * Blackbody radiance averaged over a user's tabulated response curve
 * (filter × detector transmission), on the user's own — possibly
 * non-uniform — wavelength grid, with its temperature derivative.
 *
 * Conventions (R(λ) is the tabulated response, B_λ Planck's law):
 * - energy-counting detector (bolometer):  ⟨B⟩ = ∫B_λ R dλ / ∫R dλ
 * - photon-counting detector (CCD):        ⟨B⟩ = ∫B_λ R λ dλ / ∫R λ dλ
 * (the photon weight λ/hc cancels except for the λ, e.g. Bessell & Murphy,
 * PASP 124, 140, 2012).
 * Both integrals use the trapezoid rule on the given grid, so the *same*
 * weights apply to numerator and denominator. Accuracy: the trapezoid rule is
 * second order — the error of each integral is −Σ hᵢ³ f″(ξᵢ)/12, i.e. O(h²)
 * for a smooth integrand (halving the step divides it by ≈ 4; see the
 * convergence test). The result is exact for a response that is itself a
 * tabulated piecewise-linear curve only up to the curvature of B_λ across
 * each grid step, so supply a grid that resolves both R and B_λ.
 * ∂⟨B⟩/∂T = ∫(∂B_λ/∂T) w dλ / ∫w dλ with ∂B_λ/∂T = (B_λ/T)·x/(1 − e^−x).
 */
import { requirePositive } from "../../internal/checks";
import {
  lnPlanckLambdaUnchecked,
  planckLambdaDerivativeTUnchecked,
  planckLambdaUnchecked,
} from "./planck";

/** Detector counting convention. */
export type ResponseConvention = "energy" | "photon";

/** A tabulated response curve: wavelengths (m, strictly increasing) and dimensionless response (≥ 0). */
export interface ResponseCurveSI {
  readonly wavelengthsM: ArrayLike<number>;
  readonly response: ArrayLike<number>;
}

/**
 * Validate a response curve and return its trapezoid weights
 * wᵢ·Rᵢ·(λᵢ for photons), so that ∫f·R(·λ) dλ ≈ Σ weightsᵢ·f(λᵢ).
 * @internal
 */
export function responseWeights(curve: ResponseCurveSI, convention: ResponseConvention): Float64Array {
  const l = curve.wavelengthsM;
  const r = curve.response;
  const n = l.length;
  if (n < 2) throw new RangeError(`wavelengthsM must have at least 2 points; got ${n}`);
  if (r.length !== n) throw new RangeError(`response must have the same length as wavelengthsM (${n}); got ${r.length}`);
  if (convention !== "energy" && convention !== "photon") {
    throw new RangeError(`convention must be "energy" or "photon"; got ${String(convention)}`);
  }
  for (let i = 0; i < n; i++) {
    const li = l[i] as number;
    requirePositive(`wavelengthsM[${i}]`, li, "m");
    if (i > 0 && !(li > (l[i - 1] as number))) {
      throw new RangeError(`wavelengthsM must be strictly increasing; got wavelengthsM[${i}] = ${li} m after ${l[i - 1]} m`);
    }
    const ri = r[i] as number;
    if (!(ri >= 0) || ri === Infinity) {
      throw new RangeError(`response[${i}] must be a finite number >= 0 (dimensionless); got ${ri}`);
    }
  }
  const w = trapezoidWeights(l, r, convention);
  let total = 0;
  for (let i = 0; i < n; i++) total += w[i] as number;
  if (!(total > 0)) throw new RangeError("response must be positive somewhere (its integral is 0)");
  return w;
}

/**
 * The trapezoid weights wᵢ·Rᵢ (·λᵢ for photons) of a curve whose checks the
 * caller has done (wavelengths in m, finite, > 0, strictly increasing;
 * response finite, ≥ 0, of the same length). @internal
 */
export function trapezoidWeights(wavelengthsM: ArrayLike<number>, response: ArrayLike<number>, convention: ResponseConvention): Float64Array {
  const l = wavelengthsM;
  const n = l.length;
  const w = new Float64Array(n);
  for (let i = 0; i < n; i++) {
    const left = i > 0 ? (l[i] as number) - (l[i - 1] as number) : 0;
    const right = i < n - 1 ? (l[i + 1] as number) - (l[i] as number) : 0;
    let wi = 0.5 * (left + right) * (response[i] as number);
    if (convention === "photon") wi *= l[i] as number;
    w[i] = wi;
  }
  return w;
}

/** Σ wᵢ B_λ(λᵢ, T) / Σ wᵢ without checks; +Infinity signals overflow. @internal */
export function bandMeanUnchecked(wavelengthsM: ArrayLike<number>, w: Float64Array, temperatureK: number): number {
  let num = 0;
  let den = 0;
  for (let i = 0; i < w.length; i++) {
    const wi = w[i] as number;
    den += wi;
    if (wi > 0) num += wi * planckLambdaUnchecked(wavelengthsM[i] as number, temperatureK);
  }
  return num / den;
}

/** Σ wᵢ ∂B_λ/∂T(λᵢ, T) / Σ wᵢ without checks; +Infinity signals overflow. @internal */
export function bandMeanDerivativeTUnchecked(wavelengthsM: ArrayLike<number>, w: Float64Array, temperatureK: number): number {
  let num = 0;
  let den = 0;
  for (let i = 0; i < w.length; i++) {
    const wi = w[i] as number;
    den += wi;
    if (wi > 0) num += wi * planckLambdaDerivativeTUnchecked(wavelengthsM[i] as number, temperatureK);
  }
  return num / den;
}

function checkedT(temperatureK: number): void {
  requirePositive("temperature", temperatureK, "K");
}

/**
 * Response-weighted mean spectral radiance of a blackbody,
 * ⟨B_λ⟩ = Σ wᵢ B_λ(λᵢ, T) / Σ wᵢ with trapezoid weights wᵢ (× λᵢ for photon counting).
 *
 * @param curve - tabulated response: wavelengths in m (strictly increasing, ≥ 2 points), response ≥ 0
 * @param temperatureK - T, K (finite, > 0)
 * @param convention - "energy" (default) or "photon" counting
 * @returns ⟨B_λ⟩ in W m^-2 sr^-1 m^-1
 * @throws RangeError for an invalid curve or temperature, or overflow
 * Source: Planck's law; trapezoid rule; conventions of Bessell & Murphy (2012).
 * @example
 * ```ts
 * const curve = { wavelengthsM: [500e-9, 550e-9, 600e-9], response: [0, 1, 0] };
 * bandMeanRadianceWavelengthSI(curve, 5772, "photon");
 * ```
 */
export function bandMeanRadianceWavelengthSI(
  curve: ResponseCurveSI,
  temperatureK: number,
  convention: ResponseConvention = "energy",
): number {
  checkedT(temperatureK);
  const v = bandMeanUnchecked(curve.wavelengthsM, responseWeights(curve, convention), temperatureK);
  if (v === Infinity) throw new RangeError(`band-mean radiance overflows the double range at temperature=${temperatureK} K`);
  return v;
}

/**
 * Temperature derivative of the response-weighted mean radiance,
 * ∂⟨B_λ⟩/∂T = Σ wᵢ ∂B_λ/∂T(λᵢ, T) / Σ wᵢ (analytic ∂B_λ/∂T), for fitters.
 *
 * @param curve - tabulated response (as for {@link bandMeanRadianceWavelengthSI})
 * @param temperatureK - T, K (finite, > 0)
 * @param convention - "energy" (default) or "photon"
 * @returns W m^-2 sr^-1 m^-1 K^-1
 * @throws RangeError for an invalid curve or temperature, or overflow
 * @example
 * ```ts
 * const curve = { wavelengthsM: [500e-9, 550e-9, 600e-9], response: [0, 1, 0] };
 * bandMeanRadianceDerivativeTSI(curve, 5772);
 * ```
 */
export function bandMeanRadianceDerivativeTSI(
  curve: ResponseCurveSI,
  temperatureK: number,
  convention: ResponseConvention = "energy",
): number {
  checkedT(temperatureK);
  const v = bandMeanDerivativeTUnchecked(curve.wavelengthsM, responseWeights(curve, convention), temperatureK);
  if (v === Infinity) throw new RangeError(`band-mean ∂B/∂T overflows the double range at temperature=${temperatureK} K`);
  return v;
}

/**
 * Natural log of the band-mean radiance, finite at any temperature (log-sum-exp
 * over the grid), used by the colour-temperature solver.
 * @internal
 */
export function lnBandMeanUnchecked(wavelengths: ArrayLike<number>, w: Float64Array, T: number): number {
  let m = -Infinity;
  let den = 0;
  for (let i = 0; i < w.length; i++) {
    const wi = w[i] as number;
    den += wi;
    if (wi > 0) {
      const lb = lnPlanckLambdaUnchecked(wavelengths[i] as number, T);
      if (lb > m) m = lb;
    }
  }
  let s = 0;
  for (let i = 0; i < w.length; i++) {
    const wi = w[i] as number;
    if (wi > 0) s += wi * Math.exp(lnPlanckLambdaUnchecked(wavelengths[i] as number, T) - m);
  }
  return m + Math.log(s / den);
}
