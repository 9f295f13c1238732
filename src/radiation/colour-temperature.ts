/**
 * Colour temperature, typed: the temperature of the blackbody whose spectrum
 * has a given ratio of spectral densities at two wavelengths, or of band-mean
 * radiances through two response curves.
 *
 * The monochromatic ratio ρ(T) = B_λ(λ₁, T)/B_λ(λ₂, T) is strictly monotonic
 * in T for λ₁ ≠ λ₂, running from 0 or ∞ (Wien limit, T → 0) to (λ₂/λ₁)⁴
 * (Rayleigh–Jeans limit, T → ∞). The solver (Brent's method on ln T over
 * [1e-2 K, 1e10 K], working with ln B so nothing under- or overflows) always
 * converges inside that bracket; a ratio no blackbody in the bracket produces
 * raises a RangeError that states the achievable range, with the wavelengths
 * in the caller's unit.
 *
 * The ratio is of densities **per unit wavelength** (B_λ, or observed F_λ,
 * which is proportional to B_λ for a blackbody seen at any distance). A ratio
 * of F_ν values differs by (λ₁/λ₂)² and gives a wrong temperature; pass the
 * densities themselves to {@link colourTemperatureFromSpectralDensities}
 * and the compiler rejects F_ν.
 *
 * Conditioning: near the Rayleigh–Jeans limit ρ hardly depends on T, so a
 * small error in the ratio becomes a large error in T (condition number
 * 1/|d ln ρ/d ln T| = 1/|x₁/(1−e^−x₁) − x₂/(1−e^−x₂)|), whatever the solver.
 * The solver itself round-trips T → ρ → T to that conditioning times a few
 * ulp (kernels/colour-temperature.test.ts).
 *
 * Source: Planck's law; R. P. Brent, Algorithms for Minimization without
 * Derivatives (1973), ch. 4.
 *
 * @module
 */
import type { NotAirWavelength } from "../quantity/medium";
import { kinds } from "../quantity/aliases";
import type {
  Length,
  SpectralFluxPerWavelength,
  SpectralRadiancePerWavelength,
  Temperature,
} from "../quantity/aliases";
import type { Pure, SystemName } from "../quantity/quantity";
import type { UnitSystem } from "../quantity/system";
import { requirePositive } from "../internal/checks";
import { lnBandMeanUnchecked, responseWeights, type ResponseConvention } from "./kernels/band-response";
import {
  COLOUR_TEMPERATURE_MAX_K,
  COLOUR_TEMPERATURE_MIN_K,
  colourTemperatureFromBandRatioSI,
  colourTemperatureFromRatioSI,
} from "./kernels/colour-temperature";
import { lnPlanckLambdaUnchecked } from "./kernels/planck";
import { positiveSI, responseCurveSI } from "./internal";
import type { ResponseCurve } from "./response";

const L = kinds.length.dimension;

/**
 * The temperature range the colour-temperature solvers search (both ends
 * included): 1e-2 K to 1e10 K.
 *
 * @example
 * ```ts
 * import { SI, colourTemperatureRange, units } from "starlume";
 * SI.valueIn(colourTemperatureRange.max, units.K); // 1e10
 * ```
 */
export const colourTemperatureRange: {
  /** Lower end of the search, 1e-2 K. */
  readonly min: Temperature;
  /** Upper end of the search, 1e10 K. */
  readonly max: Temperature;
} = Object.freeze({
  min: COLOUR_TEMPERATURE_MIN_K as Temperature,
  max: COLOUR_TEMPERATURE_MAX_K as Temperature,
});

/**
 * Throw, in the caller's terms, when `lnTarget` lies outside the range of
 * `lnRatioAt` over the search bracket. Mirrors the kernel's bracket test
 * (same end points, same arithmetic), so a ratio accepted here is accepted
 * by the kernel.
 */
function requireReachable(lnRatioAt: (T: number) => number, lnTarget: number, ratio: number, what: string): void {
  const t0 = Math.exp(Math.log(COLOUR_TEMPERATURE_MIN_K));
  const t1 = Math.exp(Math.log(COLOUR_TEMPERATURE_MAX_K));
  const f0 = lnRatioAt(t0) - lnTarget;
  const f1 = lnRatioAt(t1) - lnTarget;
  if ((f0 <= 0 && f1 >= 0) || (f0 >= 0 && f1 <= 0)) return;
  const r0 = Math.exp(f0 + lnTarget);
  const r1 = Math.exp(f1 + lnTarget);
  throw new RangeError(
    `ratio ${ratio} is not produced by any blackbody between ${COLOUR_TEMPERATURE_MIN_K} K and ${COLOUR_TEMPERATURE_MAX_K} K: ` +
      `${what} ranges from ${r0} (at ${COLOUR_TEMPERATURE_MIN_K} K) to ${r1} (at ${COLOUR_TEMPERATURE_MAX_K} K)`,
  );
}

/**
 * Colour temperature from the ratio of two monochromatic spectral densities
 * per unit wavelength, ratio = B_λ(λ₁, T)/B_λ(λ₂, T) (or F_λ(λ₁)/F_λ(λ₂)).
 *
 * @param sys - `SI` or `CGS` (the system of both wavelengths)
 * @param wavelength1 - λ₁, in `sys`
 * @param wavelength2 - λ₂ ≠ λ₁, in `sys`
 * @param ratio - the per-unit-wavelength ratio at λ₁ over λ₂ (finite, > 0)
 * @returns T in [1e-2 K, 1e10 K]
 * @throws RangeError for bad input, λ₁ = λ₂, or a ratio that no blackbody in
 *   that range produces (the message gives the achievable range)
 * @example
 * ```ts
 * import { SI, colourTemperatureFromRatio, units } from "starlume";
 * colourTemperatureFromRatio(SI, SI.of(440, units.nm), SI.of(550, units.nm), 1.2); // ≈ 7125 K
 * ```
 */
export function colourTemperatureFromRatio<S extends SystemName>(
  sys: UnitSystem<S>,
  wavelength1: NotAirWavelength<NoInfer<S>>,
  wavelength2: NotAirWavelength<NoInfer<S>>,
  ratio: Pure,
): Temperature {
  const l1 = positiveSI(sys, "wavelength1", wavelength1, L);
  const l2 = positiveSI(sys, "wavelength2", wavelength2, L);
  requirePositive("ratio", ratio, "(dimensionless)");
  const unit = sys.coherentUnit(L);
  if (l1 === l2) {
    throw new RangeError(
      `wavelength2 must differ from wavelength1 (${wavelength1} ${unit}); got ${wavelength2} ${unit}, where the ratio is always 1`,
    );
  }
  requireReachable(
    (t) => lnPlanckLambdaUnchecked(l1, t) - lnPlanckLambdaUnchecked(l2, t),
    Math.log(ratio),
    ratio,
    `B_λ(${wavelength1} ${unit})/B_λ(${wavelength2} ${unit})`,
  );
  return colourTemperatureFromRatioSI(l1, l2, ratio) as Temperature;
}

/**
 * Colour temperature from two measured spectral densities per unit
 * wavelength and their wavelengths: the ratio density1/density2 is formed
 * here. Both densities must be of one kind (two B_λ radiances or two F_λ
 * flux densities) and in `sys`; an F_ν, or a mixed pair, does not compile.
 *
 * @param sys - `SI` or `CGS`
 * @param wavelength1 - λ₁, in `sys`
 * @param density1 - B_λ or F_λ at λ₁, in `sys`
 * @param wavelength2 - λ₂ ≠ λ₁, in `sys`
 * @param density2 - the same kind of quantity at λ₂
 * @returns T in [1e-2 K, 1e10 K]
 * @throws RangeError as {@link colourTemperatureFromRatio} (naming `density1`/`density2` when one is not finite and > 0)
 * @example
 * ```ts
 * import { CGS, colourTemperatureFromSpectralDensities, units } from "starlume";
 * const fB = CGS.of(3.1e-9, units.erg_per_s_cm2_A);
 * const fV = CGS.of(2.4e-9, units.erg_per_s_cm2_A);
 * colourTemperatureFromSpectralDensities(CGS, CGS.of(440, units.nm), fB, CGS.of(550, units.nm), fV);
 * ```
 */
export function colourTemperatureFromSpectralDensities<
  S extends SystemName,
  Q extends SpectralRadiancePerWavelength<S> | SpectralFluxPerWavelength<S>,
>(
  sys: UnitSystem<S>,
  wavelength1: NotAirWavelength<NoInfer<S>>,
  density1: Q,
  wavelength2: NotAirWavelength<NoInfer<S>>,
  density2: NoInfer<Q>,
): Temperature {
  // F_λ or B_λ (= F_λ per sr): the message names both units of the caller's system.
  const u = sys.coherentUnit(kinds.spectralFluxPerWavelength.dimension);
  const unit = `${u} (or ${u} sr^-1)`;
  requirePositive("density1", density1, unit);
  requirePositive("density2", density2, unit);
  const ratio = density1 / density2;
  if (!(ratio > 0) || ratio === Infinity) {
    throw new RangeError(`density1/density2 = ${density1}/${density2} is outside the double range`);
  }
  return colourTemperatureFromRatio(sys, wavelength1, wavelength2, ratio);
}

/**
 * Colour temperature from the ratio of two band-mean radiances measured
 * through tabulated response curves, ratio = ⟨B_λ⟩₁/⟨B_λ⟩₂ (see
 * `bandMeanRadiance` for the conventions and the trapezoid accuracy). A root
 * exists whenever the ratio lies between its values at 1e-2 K and 1e10 K; for
 * non-overlapping bands the ratio is monotonic in T and the root is unique.
 *
 * @param sys - `SI` or `CGS` (the system of both curves)
 * @param band1 - response curve 1, in `sys`
 * @param band2 - response curve 2, in `sys`
 * @param ratio - ⟨B_λ⟩₁/⟨B_λ⟩₂ (finite, > 0)
 * @param convention - `"energy"` (default) or `"photon"` counting
 * @returns T in [1e-2 K, 1e10 K]
 * @throws RangeError for an invalid curve or ratio, or a ratio no blackbody in range produces
 * @example
 * ```ts
 * import { SI, colourTemperatureFromBandRatio, units } from "starlume";
 * const b = { wavelengths: SI.arrayOf([390, 440, 490], units.nm), response: [0, 1, 0] };
 * const v = { wavelengths: SI.arrayOf([500, 550, 600], units.nm), response: [0, 1, 0] };
 * colourTemperatureFromBandRatio(SI, b, v, 1.1, "photon");
 * ```
 */
export function colourTemperatureFromBandRatio<S extends SystemName>(
  sys: UnitSystem<S>,
  band1: ResponseCurve<NoInfer<S>>,
  band2: ResponseCurve<NoInfer<S>>,
  ratio: Pure,
  convention: ResponseConvention = "energy",
): Temperature {
  requirePositive("ratio", ratio, "(dimensionless)");
  const c1 = responseCurveSI(sys, band1, "band1");
  const c2 = responseCurveSI(sys, band2, "band2");
  const w1 = responseWeights(c1, convention);
  const w2 = responseWeights(c2, convention);
  requireReachable(
    (t) => lnBandMeanUnchecked(c1.wavelengthsM, w1, t) - lnBandMeanUnchecked(c2.wavelengthsM, w2, t),
    Math.log(ratio),
    ratio,
    `⟨B_λ⟩(band1)/⟨B_λ⟩(band2) (${convention} counting)`,
  );
  return colourTemperatureFromBandRatioSI(c1, c2, ratio, convention) as Temperature;
}
