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
import { show } from "../internal/checks";
import { lawInput } from "../law/input";
import { kinds } from "../quantity/aliases";
import type { SpectralFluxPerWavelength, SpectralRadiancePerWavelength, Temperature } from "../quantity/aliases";
import type { Pure, SystemName } from "../quantity/quantity";
import type { UnitSystem } from "../quantity/system";
import { lnBandMeanUnchecked, trapezoidWeights, type ResponseConvention } from "./kernels/band-response";
import {
  COLOUR_TEMPERATURE_MAX_K,
  COLOUR_TEMPERATURE_MIN_K,
  solveColourTemperatureUnchecked,
  unreachableRatioError,
} from "./kernels/colour-temperature";
import { lnPlanckLambdaUnchecked } from "./kernels/planck";
import type { ResponseCurve } from "./response-curve";
import { responseCurveSI } from "./response-check";

const wavelength1Input = lawInput("wavelength1", kinds.length, { vacuum: true });
const wavelength2Input = lawInput("wavelength2", kinds.length, { vacuum: true });
const ratioInput = lawInput("ratio", kinds.dimensionless);
/** A density per unit wavelength (F_λ, or B_λ = F_λ per sr): only its check is used, the unit differs by sr. */
const densityInput = lawInput("density", kinds.spectralFluxPerWavelength);

/** The RangeError for a density that is not finite and > 0, naming both units it may have in `sys`. */
function badDensity(sys: UnitSystem<SystemName>, name: string, value: number): RangeError {
  const u = sys.coherentUnit(kinds.spectralFluxPerWavelength.dimension);
  return new RangeError(`${name} must be a finite number > 0 ${u} (or ${u} sr^-1); got ${show(value)}`);
}

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
  const l1 = wavelength1Input.toSI(sys, wavelength1);
  const l2 = wavelength2Input.toSI(sys, wavelength2);
  const lnTarget = Math.log(ratioInput.toSI(sys, ratio));
  if (l1 === l2) {
    const unit = sys.coherentUnit(kinds.length.dimension);
    throw new RangeError(
      `wavelength2 must differ from wavelength1 (${show(wavelength1)} ${unit}); got ${show(wavelength2)} ${unit}, where the ratio is always 1`,
    );
  }
  const t = solveColourTemperatureUnchecked((T) => lnPlanckLambdaUnchecked(l1, T) - lnPlanckLambdaUnchecked(l2, T), lnTarget);
  if (t !== t) {
    const unit = sys.coherentUnit(kinds.length.dimension);
    throw unreachableRatioError(ratio, `B_λ(${show(wavelength1)} ${unit})/B_λ(${show(wavelength2)} ${unit})`);
  }
  return t as Temperature;
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
  if (!densityInput.passes(density1)) throw badDensity(sys, "density1", density1);
  if (!densityInput.passes(density2)) throw badDensity(sys, "density2", density2);
  const ratio = density1 / density2;
  if (!(ratio > 0) || ratio === Infinity) {
    throw new RangeError(`density1/density2 = ${show(density1)}/${show(density2)} is outside the double range`);
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
  const lnTarget = Math.log(ratioInput.toSI(sys, ratio));
  const c1 = responseCurveSI(sys, band1, "band1");
  const c2 = responseCurveSI(sys, band2, "band2");
  if (convention !== "energy" && convention !== "photon") {
    throw new RangeError(`convention must be "energy" or "photon"; got ${String(convention)}`);
  }
  const l1 = c1.wavelengthsM;
  const l2 = c2.wavelengthsM;
  const w1 = trapezoidWeights(l1, c1.response, convention);
  const w2 = trapezoidWeights(l2, c2.response, convention);
  const t = solveColourTemperatureUnchecked((T) => lnBandMeanUnchecked(l1, w1, T) - lnBandMeanUnchecked(l2, w2, T), lnTarget);
  if (t !== t) throw unreachableRatioError(ratio, `⟨B_λ⟩(band1)/⟨B_λ⟩(band2) (${convention} counting)`);
  return t as Temperature;
}
