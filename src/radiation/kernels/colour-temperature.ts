/**
 * Colour temperature: the temperature of the blackbody whose spectrum has a
 * given ratio of fluxes at two wavelengths (or in two bands).
 *
 * The ratio ρ(T) = B_λ(λ₁, T)/B_λ(λ₂, T) is strictly monotonic in T for
 * λ₁ ≠ λ₂ (d ln ρ/d ln T = x₁/(1−e^−x₁) − x₂/(1−e^−x₂) and x/(1−e^−x) is
 * increasing), running from 0 or ∞ as T → 0 (Wien) to (λ₂/λ₁)⁴ as T → ∞
 * (Rayleigh–Jeans). The root is found on u = ln T over [1e-2, 1e10] K by
 * Brent's method (R. P. Brent, Algorithms for Minimization without
 * Derivatives, 1973, ch. 4), which keeps a sign-changing bracket and so
 * always converges; ln ρ is formed from ln B (never under/overflows). A ratio
 * that no blackbody in that range produces raises a RangeError stating the
 * achievable range.
 * Note: near the Rayleigh–Jeans limit ρ hardly depends on T, so a small
 * error in the measured ratio gives a large error in T (condition number
 * 1/|d ln ρ/d ln T|), whatever the solver.
 */
import { requirePositive } from "../../internal/checks";
import { lnBandMeanUnchecked, responseWeights, type ResponseConvention, type ResponseCurveSI } from "./band-response";
import { lnPlanckLambdaUnchecked } from "./planck";

/** Search range of the colour-temperature solvers, K. */
export const COLOUR_TEMPERATURE_MIN_K = 1e-2;
/** Upper end of the search range, K. */
export const COLOUR_TEMPERATURE_MAX_K = 1e10;

/** Brent's root finder for f on [a, b] with f(a)·f(b) ≤ 0; returns the root. */
function brent(f: (u: number) => number, a: number, b: number, fa: number, fb: number): number {
  if (fa === 0) return a;
  if (fb === 0) return b;
  let c = a;
  let fc = fa;
  let d = b - a;
  let e = d;
  for (let iter = 0; iter < 200; iter++) {
    if ((fb > 0 && fc > 0) || (fb < 0 && fc < 0)) {
      c = a;
      fc = fa;
      d = b - a;
      e = d;
    }
    if (Math.abs(fc) < Math.abs(fb)) {
      a = b;
      b = c;
      c = a;
      fa = fb;
      fb = fc;
      fc = fa;
    }
    const tol = 2 * Number.EPSILON * Math.abs(b) + 1e-16;
    const m = 0.5 * (c - b);
    if (Math.abs(m) <= tol || fb === 0) return b;
    if (Math.abs(e) >= tol && Math.abs(fa) > Math.abs(fb)) {
      let p: number;
      let q: number;
      const s = fb / fa;
      if (a === c) {
        p = 2 * m * s;
        q = 1 - s;
      } else {
        const qq = fa / fc;
        const r = fb / fc;
        p = s * (2 * m * qq * (qq - r) - (b - a) * (r - 1));
        q = (qq - 1) * (r - 1) * (s - 1);
      }
      if (p > 0) q = -q;
      else p = -p;
      if (2 * p < Math.min(3 * m * q - Math.abs(tol * q), Math.abs(e * q))) {
        e = d;
        d = p / q;
      } else {
        d = m;
        e = m;
      }
    } else {
      d = m;
      e = m;
    }
    a = b;
    fa = fb;
    b += Math.abs(d) > tol ? d : m > 0 ? tol : -tol;
    fb = f(b);
  }
  return b;
}

/**
 * The ratios at the two ends of the search range, written by
 * {@link solveColourTemperatureUnchecked} when it finds no root (for the
 * caller's message). @internal
 */
export const colourTemperatureReach = {
  /** The ratio at 1e-2 K. */
  atMin: NaN,
  /** The ratio at 1e10 K. */
  atMax: NaN,
};

/**
 * The temperature in [1e-2 K, 1e10 K] where `lnRatioAt(T)` equals
 * `lnTarget` (Brent on ln T), or NaN when the target lies outside the range
 * of `lnRatioAt` over that bracket; then {@link colourTemperatureReach}
 * holds the ratios at its two ends. No input checks. @internal
 */
export function solveColourTemperatureUnchecked(lnRatioAt: (T: number) => number, lnTarget: number): number {
  const u0 = Math.log(COLOUR_TEMPERATURE_MIN_K);
  const u1 = Math.log(COLOUR_TEMPERATURE_MAX_K);
  const f = (u: number): number => lnRatioAt(Math.exp(u)) - lnTarget;
  const f0 = f(u0);
  const f1 = f(u1);
  if (!(f0 <= 0 && f1 >= 0) && !(f0 >= 0 && f1 <= 0)) {
    colourTemperatureReach.atMin = Math.exp(f0 + lnTarget);
    colourTemperatureReach.atMax = Math.exp(f1 + lnTarget);
    return NaN;
  }
  return Math.exp(brent(f, u0, u1, f0, f1));
}

/**
 * The RangeError for a ratio no blackbody in the search range produces,
 * after {@link solveColourTemperatureUnchecked} returned NaN. @internal
 */
export function unreachableRatioError(ratio: number, what: string): RangeError {
  return new RangeError(
    `ratio ${ratio} is not produced by any blackbody between ${COLOUR_TEMPERATURE_MIN_K} K and ` +
      `${COLOUR_TEMPERATURE_MAX_K} K: ${what} ranges from ${colourTemperatureReach.atMin} (at ${COLOUR_TEMPERATURE_MIN_K} K) ` +
      `to ${colourTemperatureReach.atMax} (at ${COLOUR_TEMPERATURE_MAX_K} K)`,
  );
}

function solve(lnRatioAt: (T: number) => number, lnTarget: number, what: string): number {
  const t = solveColourTemperatureUnchecked(lnRatioAt, lnTarget);
  if (t !== t) throw unreachableRatioError(Math.exp(lnTarget), what);
  return t;
}

/**
 * Colour temperature from the ratio of two monochromatic radiances (or flux
 * densities per unit wavelength), ratio = B_λ(λ₁, T)/B_λ(λ₂, T).
 *
 * @param wavelength1M - λ₁, m (finite, > 0)
 * @param wavelength2M - λ₂, m (finite, > 0, ≠ λ₁)
 * @param ratio - F_λ(λ₁)/F_λ(λ₂) (finite, > 0, dimensionless)
 * @returns T, K, in [1e-2, 1e10]
 * @throws RangeError for bad input, λ₁ = λ₂, or a ratio outside the range
 *   produced by blackbodies of 1e-2 K … 1e10 K (the message gives that range)
 * Source: Planck's law; Brent (1973).
 * @example
 * ```ts
 * const r = planckRadianceWavelengthSI(440e-9, 6000) / planckRadianceWavelengthSI(550e-9, 6000);
 * colourTemperatureFromRatioSI(440e-9, 550e-9, r); // ≈ 6000 K
 * ```
 */
export function colourTemperatureFromRatioSI(wavelength1M: number, wavelength2M: number, ratio: number): number {
  requirePositive("wavelength1", wavelength1M, "m");
  requirePositive("wavelength2", wavelength2M, "m");
  requirePositive("ratio", ratio, "(dimensionless)");
  if (wavelength1M === wavelength2M) {
    throw new RangeError(`wavelength2 must differ from wavelength1 (${wavelength1M} m); the ratio is then always 1`);
  }
  return solve(
    (T) => lnPlanckLambdaUnchecked(wavelength1M, T) - lnPlanckLambdaUnchecked(wavelength2M, T),
    Math.log(ratio),
    `B_λ(${wavelength1M} m)/B_λ(${wavelength2M} m)`,
  );
}

/**
 * Colour temperature from the ratio of two band-mean radiances measured
 * through tabulated response curves, ratio = ⟨B_λ⟩₁/⟨B_λ⟩₂ (see
 * band-response.ts for the energy/photon conventions and trapezoid weights).
 * A root is guaranteed whenever the ratio lies between its values at 1e-2 K
 * and 1e10 K; for non-overlapping bands the ratio is monotonic in T, so the
 * root is then unique.
 *
 * @param band1 - response curve 1 (wavelengths in m, strictly increasing; response ≥ 0)
 * @param band2 - response curve 2
 * @param ratio - ⟨B⟩₁/⟨B⟩₂ (finite, > 0)
 * @param convention - "energy" (default) or "photon"
 * @returns T, K
 * @throws RangeError for bad curves, a bad ratio, or a ratio no blackbody in range produces
 * @example
 * ```ts
 * const b = { wavelengthsM: [400e-9, 440e-9, 480e-9], response: [0, 1, 0] };
 * const v = { wavelengthsM: [500e-9, 550e-9, 600e-9], response: [0, 1, 0] };
 * colourTemperatureFromBandRatioSI(b, v, 1.1);
 * ```
 */
export function colourTemperatureFromBandRatioSI(
  band1: ResponseCurveSI,
  band2: ResponseCurveSI,
  ratio: number,
  convention: ResponseConvention = "energy",
): number {
  requirePositive("ratio", ratio, "(dimensionless)");
  const w1 = responseWeights(band1, convention);
  const w2 = responseWeights(band2, convention);
  return solve(
    (T) => lnBandMeanUnchecked(band1.wavelengthsM, w1, T) - lnBandMeanUnchecked(band2.wavelengthsM, w2, T),
    Math.log(ratio),
    "the band ratio",
  );
}
