/**
 * Brightness temperature, typed: the temperature of the blackbody whose
 * Planck radiance equals a measured monochromatic radiance, and the
 * Rayleigh–Jeans version radio astronomers quote.
 *
 * Exact (inverting Planck's law):
 *   T_b = c₂ / (λ ln(1 + 2hc²/(λ⁵B_λ))) = (hν/k) / ln(1 + 2hν³/(c²B_ν)).
 * Rayleigh–Jeans: T_RJ = λ⁴B_λ/(2ck) = c²B_ν/(2kν²); T_RJ ≤ T_b, equal only
 * for hν ≪ kT.
 *
 * The argument is a *radiance* (per steradian) per unit wavelength or per
 * unit frequency, matching the function's name: B_λ and B_ν have different
 * dimensions, so passing one for the other does not compile. A flux density
 * (no sr⁻¹) does not compile either: divide it by the source's solid angle
 * first.
 *
 * Accuracy: ≤ 1e-14 relative (measured worst 6.7e-16) when inverting the
 * 40-digit mpmath Planck fixture over λ ∈ [1e-12, 1e4] m,
 * T ∈ [1e-2, 1e10] K (kernels/brightness-temperature.test.ts); ln(1 + y) is
 * evaluated as log1p(y), and from ln y when y leaves the double range, so
 * the Rayleigh–Jeans and deep Wien regimes keep full precision.
 *
 * Source: inversion of Planck's law, e.g. Rybicki & Lightman, Radiative
 * Processes in Astrophysics (1979), §1.5; constants CODATA 2018.
 *
 * @module
 */
import type { NotAirWavelength } from "../quantity/medium";
import { defineLaw } from "../law/define";
import { lawInput } from "../law/input";
import { kinds } from "../quantity/aliases";
import type { Frequency, SpectralRadiancePerFrequency, SpectralRadiancePerWavelength, Temperature } from "../quantity/aliases";
import type { SystemName } from "../quantity/quantity";
import type { UnitSystem } from "../quantity/system";
import {
  brightnessTemperatureFrequencyUnchecked,
  brightnessTemperatureWavelengthUnchecked,
  rayleighJeansBrightnessTemperatureFrequencyUnchecked,
  rayleighJeansBrightnessTemperatureWavelengthUnchecked,
} from "./kernels/brightness-temperature";

const wavelength = lawInput("wavelength", kinds.length, { vacuum: true });
const frequency = lawInput("frequency", kinds.frequency);
const radianceLambda = lawInput("radiance", kinds.spectralRadiancePerWavelength);
const radianceNu = lawInput("radiance", kinds.spectralRadiancePerFrequency);

const tbLambda = defineLaw({
  name: "the brightness temperature",
  inputs: [wavelength, radianceLambda],
  result: kinds.temperature,
  kernel: brightnessTemperatureWavelengthUnchecked,
});
const tbNu = defineLaw({
  name: "the brightness temperature",
  inputs: [frequency, radianceNu],
  result: kinds.temperature,
  kernel: brightnessTemperatureFrequencyUnchecked,
});
const trjLambda = defineLaw({
  name: "the Rayleigh–Jeans brightness temperature",
  inputs: [wavelength, radianceLambda],
  result: kinds.temperature,
  kernel: rayleighJeansBrightnessTemperatureWavelengthUnchecked,
});
const trjNu = defineLaw({
  name: "the Rayleigh–Jeans brightness temperature",
  inputs: [frequency, radianceNu],
  result: kinds.temperature,
  kernel: rayleighJeansBrightnessTemperatureFrequencyUnchecked,
});

/**
 * Brightness temperature of a monochromatic radiance per unit wavelength,
 * T_b = c₂ / (λ·ln(1 + 2hc²/(λ⁵B_λ))).
 *
 * @param sys - `SI` or `CGS` (the system of `wavelength` and `radiance`)
 * @param wavelength - vacuum wavelength λ, in `sys`
 * @param radiance - B_λ at λ, in `sys` (W m⁻² sr⁻¹ m⁻¹ or erg s⁻¹ cm⁻² sr⁻¹ cm⁻¹)
 * @throws RangeError when λ or B_λ is not finite and > 0, or T_b overflows
 * @example
 * ```ts
 * import { CGS, brightnessTemperatureWavelength, planckRadianceWavelength, units } from "starlume";
 * const lambda = CGS.of(500, units.nm);
 * const b = planckRadianceWavelength(CGS, lambda, CGS.of(5772, units.K));
 * brightnessTemperatureWavelength(CGS, lambda, b); // ≈ 5772 K
 * ```
 */
export function brightnessTemperatureWavelength<S extends SystemName>(
  sys: UnitSystem<S>,
  wavelength: NotAirWavelength<NoInfer<S>>,
  radiance: SpectralRadiancePerWavelength<NoInfer<S>>,
): Temperature {
  return tbLambda(sys, wavelength, radiance);
}

/**
 * Brightness temperature of a monochromatic radiance per unit frequency,
 * T_b = (hν/k) / ln(1 + 2hν³/(c²B_ν)).
 *
 * @param sys - `SI` or `CGS` (the system of `radiance`)
 * @param frequency - frequency ν
 * @param radiance - B_ν at ν, in `sys` (W m⁻² sr⁻¹ Hz⁻¹ or erg s⁻¹ cm⁻² sr⁻¹ Hz⁻¹)
 * @throws RangeError when ν or B_ν is not finite and > 0, or T_b overflows
 * @example
 * ```ts
 * import { SI, brightnessTemperatureFrequency, planckRadianceFrequency, units } from "starlume";
 * const nu = SI.of(160, units.GHz);
 * brightnessTemperatureFrequency(SI, nu, planckRadianceFrequency(SI, nu, SI.of(2.7255, units.K))); // ≈ 2.7255 K
 * ```
 */
export function brightnessTemperatureFrequency<S extends SystemName>(
  sys: UnitSystem<S>,
  frequency: Frequency,
  radiance: SpectralRadiancePerFrequency<NoInfer<S>>,
): Temperature {
  return tbNu(sys, frequency, radiance);
}

/**
 * Rayleigh–Jeans brightness temperature per unit wavelength, T_RJ = λ⁴B_λ/(2ck)
 * (equals T_b only for hc/(λkT) ≪ 1; below it otherwise).
 *
 * @param sys - `SI` or `CGS`
 * @param wavelength - λ, in `sys`
 * @param radiance - B_λ, in `sys`
 * @throws RangeError when λ or B_λ is not finite and > 0, or T_RJ overflows
 * @example
 * ```ts
 * import { SI, planckRadianceWavelength, rayleighJeansBrightnessTemperatureWavelength, units } from "starlume";
 * const lambda = SI.of(21, units.cm);
 * const b = planckRadianceWavelength(SI, lambda, SI.of(10, units.K));
 * rayleighJeansBrightnessTemperatureWavelength(SI, lambda, b); // ≈ 9.966 K (x ≈ 0.0069)
 * ```
 */
export function rayleighJeansBrightnessTemperatureWavelength<S extends SystemName>(
  sys: UnitSystem<S>,
  wavelength: NotAirWavelength<NoInfer<S>>,
  radiance: SpectralRadiancePerWavelength<NoInfer<S>>,
): Temperature {
  return trjLambda(sys, wavelength, radiance);
}

/**
 * Rayleigh–Jeans brightness temperature per unit frequency (the radio
 * astronomer's T_B), T_RJ = c²B_ν/(2kν²).
 *
 * @param sys - `SI` or `CGS` (the system of `radiance`)
 * @param frequency - ν
 * @param radiance - B_ν, in `sys`
 * @throws RangeError when ν or B_ν is not finite and > 0, or T_RJ overflows
 * @example
 * ```ts
 * import { CGS, planckRadianceFrequency, rayleighJeansBrightnessTemperatureFrequency, units } from "starlume";
 * const nu = CGS.of(1.4204, units.GHz);
 * rayleighJeansBrightnessTemperatureFrequency(CGS, nu, planckRadianceFrequency(CGS, nu, CGS.of(100, units.K))); // ≈ 99.97 K
 * ```
 */
export function rayleighJeansBrightnessTemperatureFrequency<S extends SystemName>(
  sys: UnitSystem<S>,
  frequency: Frequency,
  radiance: SpectralRadiancePerFrequency<NoInfer<S>>,
): Temperature {
  return trjNu(sys, frequency, radiance);
}
