/**
 * Blackbody radiance seen through a tabulated response curve (filter ×
 * detector × atmosphere), typed, with its temperature derivative for fitters.
 *
 * A {@link ResponseCurve} is a wavelength grid in one system (a
 * `LengthArray<S>`, strictly increasing, possibly non-uniform) and the
 * dimensionless response at each grid point. The band-mean radiance is
 * - energy-counting detector (bolometer):  ⟨B_λ⟩ = ∫B_λ R dλ / ∫R dλ
 * - photon-counting detector (CCD):        ⟨B_λ⟩ = ∫B_λ R λ dλ / ∫R λ dλ
 *   (the photon weight λ/hc cancels except for the λ; Bessell & Murphy,
 *   PASP 124, 140, 2012),
 * a spectral radiance per unit wavelength (`SpectralRadiancePerWavelength<S>`).
 *
 * **Accuracy: the trapezoid rule on your grid.** Both integrals use the same
 * trapezoid weights on the grid you supply, so the result is exact for B_λ
 * linear across each step and otherwise carries the trapezoid error
 * −Σ hᵢ³ f″(ξᵢ)/12, second order in the step: halving the step divides it by
 * ≈ 4. Measured against mpmath quadrature (response.test.ts): a triangular
 * 390–440–490 nm response at 5772 K is off by 1.6e-3 sampled every 25 nm,
 * 6.2e-5 every 5 nm and 2.5e-6 every 1 nm (at 3000 K, deeper in the Wien
 * tail: 4.7e-3, 1.9e-4, 7.4e-6); a 400–700 nm boxcar at 5772 K sampled
 * every 0.1 nm is within 1.3e-8. The number is only as good as your grid:
 * it must resolve both the response and the curvature of B_λ (steep in the
 * Wien tail, where x = hc/λkT ≫ 1).
 *
 * @module
 */
import { lawInput } from "../law/input";
import { lawOutput, type LawOutput } from "../law/output";
import { kinds } from "../quantity/aliases";
import type { LengthArray, SpectralRadiancePerWavelength, Temperature } from "../quantity/aliases";
import type { SystemName } from "../quantity/quantity";
import type { UnitSystem } from "../quantity/system";
import { bandMeanDerivativeTUnchecked, bandMeanUnchecked, trapezoidWeights, type ResponseConvention } from "./kernels/band-response";
import { derivativeKinds, type SpectralRadiancePerWavelengthPerTemperature } from "./planck";
import { responseCurveSI } from "./response-check";
import type { ResponseCurve } from "./response-curve";

export type { ResponseConvention } from "./kernels/band-response";

const temperatureInput = lawInput("temperature", kinds.temperature);
const meanOutput = lawOutput("the band-mean radiance", kinds.spectralRadiancePerWavelength);
const derivativeOutput = lawOutput("the band-mean ∂B_λ/∂T", derivativeKinds.spectralRadiancePerWavelengthPerTemperature);

export type { ResponseCurve } from "./response-curve";

/**
 * Check (T, convention, curve) in the caller's units, run a band-mean core on
 * the SI grid and its trapezoid weights, and return the result in the
 * caller's system (a RangeError naming T in the caller's unit when it is not
 * finite there).
 */
function run(
  sys: UnitSystem<SystemName>,
  core: (wavelengthsM: ArrayLike<number>, w: Float64Array, temperatureK: number) => number,
  output: LawOutput,
  curve: ResponseCurve<SystemName>,
  temperature: number,
  convention: ResponseConvention,
): number {
  const t = temperatureInput.toSI(sys, temperature);
  if (convention !== "energy" && convention !== "photon") {
    throw new RangeError(`convention must be "energy" or "photon"; got ${String(convention)}`);
  }
  const c = responseCurveSI(sys, curve, "curve");
  const v = core(c.wavelengthsM, trapezoidWeights(c.wavelengthsM, c.response, convention), t);
  const r = output.fromSI(sys, v);
  if (r !== r) throw new RangeError(output.reason(sys, v, [temperatureInput], [temperature]));
  return r;
}

/**
 * Response-weighted mean spectral radiance of a blackbody,
 * ⟨B_λ⟩ = Σ wᵢ B_λ(λᵢ, T) / Σ wᵢ with trapezoid weights wᵢ on the curve's
 * grid (× λᵢ for photon counting). Accuracy: that of the trapezoid rule on
 * your grid (see the module notes).
 *
 * @param sys - `SI` (W m⁻² sr⁻¹ m⁻¹) or `CGS` (erg s⁻¹ cm⁻² sr⁻¹ cm⁻¹); the curve must be in `sys`
 * @param curve - the response curve
 * @param temperature - T
 * @param convention - `"energy"` (default) or `"photon"` counting
 * @throws RangeError for an invalid curve, T or convention, or an overflowing result
 * @example
 * ```ts
 * import { SI, bandMeanRadiance, units } from "starlume";
 * const curve = { wavelengths: SI.arrayOf([500, 550, 600], units.nm), response: [0, 1, 0] };
 * const b = bandMeanRadiance(SI, curve, SI.of(5772, units.K), "photon");
 * SI.valueIn(b, units.W_per_m2_sr_nm); // ≈ 2.5e4
 * ```
 */
export function bandMeanRadiance<S extends SystemName>(
  sys: UnitSystem<S>,
  curve: ResponseCurve<NoInfer<S>>,
  temperature: Temperature,
  convention: ResponseConvention = "energy",
): SpectralRadiancePerWavelength<S> {
  return run(sys, bandMeanUnchecked, meanOutput, curve, temperature, convention) as SpectralRadiancePerWavelength<S>;
}

/**
 * Temperature derivative of the band-mean radiance,
 * ∂⟨B_λ⟩/∂T = Σ wᵢ ∂B_λ/∂T(λᵢ, T) / Σ wᵢ, with the analytic ∂B_λ/∂T; the
 * Jacobian for fitting a temperature to band fluxes. Same trapezoid
 * accuracy as {@link bandMeanRadiance}.
 *
 * @param sys - `SI` (W m⁻² sr⁻¹ m⁻¹ K⁻¹) or `CGS` (erg s⁻¹ cm⁻² sr⁻¹ cm⁻¹ K⁻¹)
 * @param curve - the response curve, in `sys`
 * @param temperature - T
 * @param convention - `"energy"` (default) or `"photon"`
 * @throws RangeError for an invalid curve, T or convention, or an overflowing result
 * @example
 * ```ts
 * import { CGS, bandMeanRadianceDerivativeT, units } from "starlume";
 * const curve = { wavelengths: CGS.arrayOf([500, 550, 600], units.nm), response: [0, 1, 0] };
 * const d = bandMeanRadianceDerivativeT(CGS, curve, CGS.of(5772, units.K));
 * ```
 */
export function bandMeanRadianceDerivativeT<S extends SystemName>(
  sys: UnitSystem<S>,
  curve: ResponseCurve<NoInfer<S>>,
  temperature: Temperature,
  convention: ResponseConvention = "energy",
): SpectralRadiancePerWavelengthPerTemperature<S> {
  return run(sys, bandMeanDerivativeTUnchecked, derivativeOutput, curve, temperature, convention) as SpectralRadiancePerWavelengthPerTemperature<S>;
}
