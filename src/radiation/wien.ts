/**
 * Wien's displacement law, typed: where a blackbody spectrum peaks, and the
 * temperature whose spectrum peaks at a given place.
 *
 * The peak of a spectral density ∝ uⁿ⁻¹/(eᵘ−1)-like solves x = n(1 − e⁻ˣ),
 * x = hc/(λkT) = hν/(kT):
 * - energy per unit wavelength (B_λ): n = 5, λ_max = b/T, b = c₂/x₅
 *   (CODATA 2018: b = 2.897 771 955… × 10⁻³ m K = 0.289 777 1955… cm K);
 * - energy per unit frequency or wavenumber (B_ν, B_σ̃): n = 3,
 *   ν_max = b′T, b′ = x₃k/h (CODATA 2018: 5.878 925 757… × 10¹⁰ Hz K⁻¹),
 *   σ̃_max = ν_max/c;
 * - photons per unit wavelength: n = 4; per unit frequency or wavenumber: n = 2.
 *
 * **λ_max·ν_max ≠ c.** B_λ and B_ν are densities per unit wavelength and per
 * unit frequency; the Jacobian |dν/dλ| = c/λ² moves the maximum, so
 * c/ν_max ≈ 1.76 λ_max. Each peak belongs to its own density: pick the
 * function for the density you plot or measure.
 *
 * The roots x₂…x₅ are computed once (src/values/wien-roots.ts) and shared
 * with the typed constants `constants.wienB` and `constants.wienBPrime`.
 * Accuracy: each result is one multiplication or division by a constant, so
 * ≤ 2 ulp from the exact-constant value (see kernels/wien.test.ts).
 *
 * Source: W. Wien, Sitzungsber. Preuss. Akad. Wiss. (1893); CODATA 2018.
 *
 * @module
 */
import type { NotAirWavelength } from "../quantity/medium";
import { defineLaw } from "../law/define";
import { lawInput } from "../law/input";
import { kinds } from "../quantity/aliases";
import type { Frequency, Length, Temperature, Wavenumber } from "../quantity/aliases";
import type { SystemName } from "../quantity/quantity";
import type { UnitSystem } from "../quantity/system";
import {
  temperatureFromPeakFrequencyUnchecked,
  temperatureFromPeakWavelengthUnchecked,
  temperatureFromPeakWavenumberUnchecked,
  temperatureFromPhotonPeakFrequencyUnchecked,
  temperatureFromPhotonPeakWavelengthUnchecked,
  temperatureFromPhotonPeakWavenumberUnchecked,
  wienPeakFrequencyUnchecked,
  wienPeakWavelengthUnchecked,
  wienPeakWavenumberUnchecked,
  wienPhotonPeakFrequencyUnchecked,
  wienPhotonPeakWavelengthUnchecked,
  wienPhotonPeakWavenumberUnchecked,
} from "./kernels/wien";

const temperature = lawInput("temperature", kinds.temperature);
const peakWavelength = lawInput("peakWavelength", kinds.length, { vacuum: true });
const peakFrequency = lawInput("peakFrequency", kinds.frequency);
const peakWavenumber = lawInput("peakWavenumber", kinds.wavenumber);

const wienPeakWavelengthLaw = defineLaw({
  name: "the peak wavelength",
  inputs: [temperature],
  result: kinds.length,
  kernel: wienPeakWavelengthUnchecked,
});
const wienPeakFrequencyLaw = defineLaw({
  name: "the peak frequency",
  inputs: [temperature],
  result: kinds.frequency,
  kernel: wienPeakFrequencyUnchecked,
});
const wienPeakWavenumberLaw = defineLaw({
  name: "the peak wavenumber",
  inputs: [temperature],
  result: kinds.wavenumber,
  kernel: wienPeakWavenumberUnchecked,
});
const wienPhotonPeakWavelengthLaw = defineLaw({
  name: "the photon peak wavelength",
  inputs: [temperature],
  result: kinds.length,
  kernel: wienPhotonPeakWavelengthUnchecked,
});
const wienPhotonPeakFrequencyLaw = defineLaw({
  name: "the photon peak frequency",
  inputs: [temperature],
  result: kinds.frequency,
  kernel: wienPhotonPeakFrequencyUnchecked,
});
const wienPhotonPeakWavenumberLaw = defineLaw({
  name: "the photon peak wavenumber",
  inputs: [temperature],
  result: kinds.wavenumber,
  kernel: wienPhotonPeakWavenumberUnchecked,
});
const temperatureFromPeakWavelengthLaw = defineLaw({
  name: "the temperature",
  inputs: [peakWavelength],
  result: kinds.temperature,
  kernel: temperatureFromPeakWavelengthUnchecked,
});
const temperatureFromPeakFrequencyLaw = defineLaw({
  name: "the temperature",
  inputs: [peakFrequency],
  result: kinds.temperature,
  kernel: temperatureFromPeakFrequencyUnchecked,
});
const temperatureFromPeakWavenumberLaw = defineLaw({
  name: "the temperature",
  inputs: [peakWavenumber],
  result: kinds.temperature,
  kernel: temperatureFromPeakWavenumberUnchecked,
});
const temperatureFromPhotonPeakWavelengthLaw = defineLaw({
  name: "the temperature",
  inputs: [peakWavelength],
  result: kinds.temperature,
  kernel: temperatureFromPhotonPeakWavelengthUnchecked,
});
const temperatureFromPhotonPeakFrequencyLaw = defineLaw({
  name: "the temperature",
  inputs: [peakFrequency],
  result: kinds.temperature,
  kernel: temperatureFromPhotonPeakFrequencyUnchecked,
});
const temperatureFromPhotonPeakWavenumberLaw = defineLaw({
  name: "the temperature",
  inputs: [peakWavenumber],
  result: kinds.temperature,
  kernel: temperatureFromPhotonPeakWavenumberUnchecked,
});

/**
 * Wavelength of the maximum of B_λ: λ_max = b/T, b = c₂/x₅ ≈ 2.898e-3 m K.
 *
 * @param sys - `SI` (result in m) or `CGS` (cm)
 * @param temperature - temperature T
 * @throws RangeError when T is not finite and > 0, or λ_max overflows (subnormal T)
 * @example
 * ```ts
 * import { SI, units, peakWavelength } from "starlume";
 * SI.valueIn(peakWavelength(SI, SI.of(5772, units.K)), units.nm); // ≈ 502.0
 * ```
 */
export function peakWavelength<S extends SystemName>(sys: UnitSystem<S>, temperature: Temperature): Length<S> {
  return wienPeakWavelengthLaw(sys, temperature);
}

/**
 * Frequency of the maximum of B_ν: ν_max = b′T, b′ = x₃k/h ≈ 5.879e10 Hz K⁻¹.
 * Note c/ν_max ≈ 1.76 λ_max (a different density).
 *
 * @param sys - `SI` or `CGS` (frequency is the same in both)
 * @param temperature - temperature T
 * @throws RangeError when T is not finite and > 0, or ν_max overflows
 * @example
 * ```ts
 * import { SI, units, peakFrequency } from "starlume";
 * SI.valueIn(peakFrequency(SI, SI.of(2.7255, units.K)), units.GHz); // ≈ 160.2 (CMB)
 * ```
 */
export function peakFrequency<S extends SystemName>(sys: UnitSystem<S>, temperature: Temperature): Frequency {
  return wienPeakFrequencyLaw(sys, temperature);
}

/**
 * Wavenumber of the maximum of B_σ̃: σ̃_max = x₃kT/(hc) = ν_max/c (the
 * wavenumber peak coincides with the frequency peak).
 *
 * @param sys - `SI` (result in m⁻¹) or `CGS` (cm⁻¹)
 * @param temperature - temperature T
 * @throws RangeError when T is not finite and > 0, or σ̃_max overflows
 * @example
 * ```ts
 * import { CGS, units, peakWavenumber } from "starlume";
 * CGS.valueIn(peakWavenumber(CGS, CGS.of(300, units.K)), units.per_cm); // ≈ 588.3
 * ```
 */
export function peakWavenumber<S extends SystemName>(sys: UnitSystem<S>, temperature: Temperature): Wavenumber<S> {
  return wienPeakWavenumberLaw(sys, temperature);
}

/**
 * Wavelength of the maximum of the photon radiance per unit wavelength: c₂/(x₄T).
 *
 * @param sys - `SI` (m) or `CGS` (cm)
 * @param temperature - temperature T
 * @throws RangeError when T is not finite and > 0, or the result overflows
 * @example
 * ```ts
 * import { SI, units, photonPeakWavelength } from "starlume";
 * SI.valueIn(photonPeakWavelength(SI, SI.of(5772, units.K)), units.nm); // ≈ 635.8
 * ```
 */
export function photonPeakWavelength<S extends SystemName>(sys: UnitSystem<S>, temperature: Temperature): Length<S> {
  return wienPhotonPeakWavelengthLaw(sys, temperature);
}

/**
 * Frequency of the maximum of the photon radiance per unit frequency: x₂kT/h.
 *
 * @param sys - `SI` or `CGS`
 * @param temperature - temperature T
 * @throws RangeError when T is not finite and > 0, or the result overflows
 * @example
 * ```ts
 * import { SI, units, photonPeakFrequency } from "starlume";
 * const nu = photonPeakFrequency(SI, SI.of(5772, units.K)); // ≈ 1.92e14 Hz
 * ```
 */
export function photonPeakFrequency<S extends SystemName>(sys: UnitSystem<S>, temperature: Temperature): Frequency {
  return wienPhotonPeakFrequencyLaw(sys, temperature);
}

/**
 * Wavenumber of the maximum of the photon radiance per unit wavenumber: x₂kT/(hc).
 *
 * @param sys - `SI` (m⁻¹) or `CGS` (cm⁻¹)
 * @param temperature - temperature T
 * @throws RangeError when T is not finite and > 0, or the result overflows
 * @example
 * ```ts
 * import { CGS, units, photonPeakWavenumber } from "starlume";
 * const k = photonPeakWavenumber(CGS, CGS.of(5772, units.K)); // ≈ 6393 cm^-1
 * ```
 */
export function photonPeakWavenumber<S extends SystemName>(sys: UnitSystem<S>, temperature: Temperature): Wavenumber<S> {
  return wienPhotonPeakWavenumberLaw(sys, temperature);
}

/**
 * Temperature whose B_λ peaks at the given wavelength: T = b/λ_max.
 *
 * @param sys - `SI` or `CGS` (the system of `peakWavelength`)
 * @param peakWavelength - λ_max, in `sys`
 * @throws RangeError when λ_max is not finite and > 0, or T overflows
 * @example
 * ```ts
 * import { CGS, temperatureFromPeakWavelength, units } from "starlume";
 * temperatureFromPeakWavelength(CGS, CGS.of(502, units.nm)); // ≈ 5772 K
 * ```
 */
export function temperatureFromPeakWavelength<S extends SystemName>(
  sys: UnitSystem<S>,
  peakWavelength: NotAirWavelength<NoInfer<S>>,
): Temperature {
  return temperatureFromPeakWavelengthLaw(sys, peakWavelength);
}

/**
 * Temperature whose B_ν peaks at the given frequency: T = ν_max/b′.
 *
 * @param sys - `SI` or `CGS`
 * @param peakFrequency - ν_max
 * @throws RangeError when ν_max is not finite and > 0 (a subnormal input whose T underflows gives 0 K)
 * @example
 * ```ts
 * import { SI, temperatureFromPeakFrequency, units } from "starlume";
 * temperatureFromPeakFrequency(SI, SI.of(160.2, units.GHz)); // ≈ 2.725 K
 * ```
 */
export function temperatureFromPeakFrequency<S extends SystemName>(sys: UnitSystem<S>, peakFrequency: Frequency): Temperature {
  return temperatureFromPeakFrequencyLaw(sys, peakFrequency);
}

/**
 * Temperature whose B_σ̃ peaks at the given wavenumber: T = σ̃_max·hc/(x₃k).
 *
 * @param sys - `SI` or `CGS` (the system of `peakWavenumber`)
 * @param peakWavenumber - σ̃_max, in `sys` (m⁻¹ or cm⁻¹)
 * @throws RangeError when σ̃_max is not finite and > 0, or T overflows (a subnormal input whose T underflows gives 0 K)
 * @example
 * ```ts
 * import { CGS, temperatureFromPeakWavenumber, units } from "starlume";
 * temperatureFromPeakWavenumber(CGS, CGS.of(588.3, units.per_cm)); // ≈ 300 K
 * ```
 */
export function temperatureFromPeakWavenumber<S extends SystemName>(
  sys: UnitSystem<S>,
  peakWavenumber: Wavenumber<NoInfer<S>>,
): Temperature {
  return temperatureFromPeakWavenumberLaw(sys, peakWavenumber);
}

/**
 * Temperature whose photon radiance per unit wavelength peaks at the given wavelength: T = c₂/(x₄λ).
 *
 * @param sys - `SI` or `CGS`
 * @param peakWavelength - photon-count peak wavelength, in `sys`
 * @throws RangeError when the wavelength is not finite and > 0, or T overflows
 * @example
 * ```ts
 * import { SI, temperatureFromPhotonPeakWavelength, units } from "starlume";
 * temperatureFromPhotonPeakWavelength(SI, SI.of(635.8, units.nm)); // ≈ 5772 K
 * ```
 */
export function temperatureFromPhotonPeakWavelength<S extends SystemName>(
  sys: UnitSystem<S>,
  peakWavelength: NotAirWavelength<NoInfer<S>>,
): Temperature {
  return temperatureFromPhotonPeakWavelengthLaw(sys, peakWavelength);
}

/**
 * Temperature whose photon radiance per unit frequency peaks at the given frequency: T = hν/(x₂k).
 *
 * @param sys - `SI` or `CGS`
 * @param peakFrequency - photon-count peak frequency
 * @throws RangeError when the frequency is not finite and > 0 (a subnormal input whose T underflows gives 0 K)
 * @example
 * ```ts
 * import { SI, temperatureFromPhotonPeakFrequency, units } from "starlume";
 * temperatureFromPhotonPeakFrequency(SI, SI.of(191.66, units.THz)); // ≈ 5772 K
 * ```
 */
export function temperatureFromPhotonPeakFrequency<S extends SystemName>(sys: UnitSystem<S>, peakFrequency: Frequency): Temperature {
  return temperatureFromPhotonPeakFrequencyLaw(sys, peakFrequency);
}

/**
 * Temperature whose photon radiance per unit wavenumber peaks at the given wavenumber: T = hcσ̃/(x₂k).
 *
 * @param sys - `SI` or `CGS` (the system of `peakWavenumber`)
 * @param peakWavenumber - photon-count peak wavenumber, in `sys`
 * @throws RangeError when the wavenumber is not finite and > 0, or T overflows (a subnormal input whose T underflows gives 0 K)
 * @example
 * ```ts
 * import { CGS, temperatureFromPhotonPeakWavenumber, units } from "starlume";
 * temperatureFromPhotonPeakWavenumber(CGS, CGS.of(6393, units.per_cm)); // ≈ 5772 K
 * ```
 */
export function temperatureFromPhotonPeakWavenumber<S extends SystemName>(
  sys: UnitSystem<S>,
  peakWavenumber: Wavenumber<NoInfer<S>>,
): Temperature {
  return temperatureFromPhotonPeakWavenumberLaw(sys, peakWavenumber);
}
