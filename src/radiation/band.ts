/**
 * Blackbody emission in a spectral band, typed: the fraction of the exitance
 * (or of the photon exitance) below, above or between given wavelengths or
 * frequencies, and the radiance integrated over a wavelength band.
 *
 * With x = hc/(λkT) = hν/(kT), the fraction emitted at wavelengths below λ
 * (the handbook "blackbody radiation function" F(0→λT)) is
 *   F(0→λT) = (15/π⁴) ∫ₓ^∞ t³/(eᵗ−1) dt,
 * and for photon counts (1/(2ζ(3))) ∫ₓ^∞ t²/(eᵗ−1) dt. Fractions are pure
 * numbers, the same in SI and CGS; the system only fixes the unit of the
 * wavelengths you pass.
 *
 * Band radiance: ∫_{λ₁}^{λ₂} B_λ dλ = (σT⁴/π)·[F(0→λ₂T) − F(0→λ₁T)], a
 * {@link Radiance} (per steradian; multiply by π sr with `lambertianExitance`
 * for the flux leaving the surface). The photon version is
 * (σ_γT³/π)·(photon fraction), a {@link PhotonRadiance}.
 *
 * Accuracy: every fraction and its complement to ~1e-15 relative, even where
 * it is 1e-300 (series in e⁻ⁿˣ on the short-wave side, Bernoulli series on
 * the long-wave side, Gauss–Legendre for bands narrower than Δx = 1, x in
 * double-double); measured against 40-digit mpmath in
 * kernels/band-fraction.test.ts.
 *
 * Source: Planck's law integrated; series as in M. F. Modest, Radiative Heat
 * Transfer, ch. 1; constants CODATA 2018.
 *
 * @module
 */
import type { NotAirWavelength } from "../quantity/medium";
import { show } from "../internal/checks";
import { defineLaw } from "../law/define";
import { lawInput } from "../law/input";
import { kinds } from "../quantity/aliases";
import type { Dimensionless, Frequency, PhotonRadiance, Radiance, Temperature } from "../quantity/aliases";
import type { SystemName } from "../quantity/quantity";
import type { UnitSystem } from "../quantity/system";
import {
  bandPhotonRadianceWavelengthUnchecked,
  bandRadianceWavelengthUnchecked,
  fractionAboveFrequencyUnchecked,
  fractionAboveWavelengthUnchecked,
  fractionBelowFrequencyUnchecked,
  fractionBelowWavelengthUnchecked,
  fractionBetweenWavelengthsUnchecked,
} from "./kernels/band-fraction";

const wavelength = lawInput("wavelength", kinds.length, { vacuum: true });
const wavelength1 = lawInput("wavelength1", kinds.length, { vacuum: true });
const wavelength2 = lawInput("wavelength2", kinds.length, { vacuum: true });
const frequency = lawInput("frequency", kinds.frequency);
const temperature = lawInput("temperature", kinds.temperature);

const FRACTION = "the band fraction";
const PHOTON_FRACTION = "the photon band fraction";

const belowWavelength = defineLaw({
  name: FRACTION,
  inputs: [wavelength, temperature],
  result: kinds.dimensionless,
  kernel: (l, t) => fractionBelowWavelengthUnchecked(3, l, t),
});
const aboveWavelength = defineLaw({
  name: FRACTION,
  inputs: [wavelength, temperature],
  result: kinds.dimensionless,
  kernel: (l, t) => fractionAboveWavelengthUnchecked(3, l, t),
});
const betweenWavelengths = defineLaw({
  name: FRACTION,
  inputs: [wavelength1, wavelength2, temperature],
  result: kinds.dimensionless,
  kernel: (l1, l2, t) => fractionBetweenWavelengthsUnchecked(3, l1, l2, t),
});
const aboveFrequency = defineLaw({
  name: FRACTION,
  inputs: [frequency, temperature],
  result: kinds.dimensionless,
  kernel: (f, t) => fractionAboveFrequencyUnchecked(3, f, t),
});
const belowFrequency = defineLaw({
  name: FRACTION,
  inputs: [frequency, temperature],
  result: kinds.dimensionless,
  kernel: (f, t) => fractionBelowFrequencyUnchecked(3, f, t),
});
const photonBelowWavelength = defineLaw({
  name: PHOTON_FRACTION,
  inputs: [wavelength, temperature],
  result: kinds.dimensionless,
  kernel: (l, t) => fractionBelowWavelengthUnchecked(2, l, t),
});
const photonAboveWavelength = defineLaw({
  name: PHOTON_FRACTION,
  inputs: [wavelength, temperature],
  result: kinds.dimensionless,
  kernel: (l, t) => fractionAboveWavelengthUnchecked(2, l, t),
});
const photonBetweenWavelengths = defineLaw({
  name: PHOTON_FRACTION,
  inputs: [wavelength1, wavelength2, temperature],
  result: kinds.dimensionless,
  kernel: (l1, l2, t) => fractionBetweenWavelengthsUnchecked(2, l1, l2, t),
});
const photonAboveFrequency = defineLaw({
  name: PHOTON_FRACTION,
  inputs: [frequency, temperature],
  result: kinds.dimensionless,
  kernel: (f, t) => fractionAboveFrequencyUnchecked(2, f, t),
});
const photonBelowFrequency = defineLaw({
  name: PHOTON_FRACTION,
  inputs: [frequency, temperature],
  result: kinds.dimensionless,
  kernel: (f, t) => fractionBelowFrequencyUnchecked(2, f, t),
});
const bandRadiance = defineLaw({
  name: "the band radiance",
  inputs: [wavelength1, wavelength2, temperature],
  result: kinds.radiance,
  kernel: bandRadianceWavelengthUnchecked,
});
const bandPhotonRadiance = defineLaw({
  name: "the band photon radiance",
  inputs: [wavelength1, wavelength2, temperature],
  result: kinds.photonRadiance,
  kernel: bandPhotonRadianceWavelengthUnchecked,
});

/**
 * The RangeError for band edges given in the wrong order (λ₂ < λ₁ in the
 * caller's unit). Each input is checked first, so a value that is invalid on
 * its own is reported as such, as the law would.
 */
function reversedBand(sys: UnitSystem<SystemName>, l1: number, l2: number, t: number): never {
  wavelength1.toSI(sys, l1);
  wavelength2.toSI(sys, l2);
  temperature.toSI(sys, t);
  const unit = sys.coherentUnit(kinds.length.dimension);
  throw new RangeError(`wavelength2 must be >= wavelength1 (${show(l1)} ${unit}); got ${show(l2)}`);
}

/**
 * Fraction of a blackbody's exitance emitted at wavelengths below λ,
 * F(0→λT). Accurate to ~1e-15 relative even where it is tiny.
 *
 * @param sys - `SI` or `CGS` (the system of `wavelength`)
 * @param wavelength - λ, in `sys`
 * @param temperature - T
 * @returns a fraction in [0, 1]
 * @throws RangeError when λ or T is not finite and > 0
 * @example
 * ```ts
 * import { SI, blackbodyFractionBelowWavelength, units } from "starlume";
 * // at λT = b ≈ 2898 µm K (the peak of B_λ) a quarter of the energy is emitted shortward
 * blackbodyFractionBelowWavelength(SI, SI.of(2897.77, units.um), SI.of(1, units.K)); // ≈ 0.250
 * ```
 */
export function blackbodyFractionBelowWavelength<S extends SystemName>(
  sys: UnitSystem<S>,
  wavelength: NotAirWavelength<NoInfer<S>>,
  temperature: Temperature,
): Dimensionless {
  return belowWavelength(sys, wavelength, temperature);
}

/**
 * Fraction of a blackbody's exitance emitted at wavelengths above λ,
 * 1 − F(0→λT), computed directly (not by subtraction) where it is small.
 *
 * @param sys - `SI` or `CGS` (the system of `wavelength`)
 * @param wavelength - λ, in `sys`
 * @param temperature - T
 * @returns a fraction in [0, 1]
 * @throws RangeError when λ or T is not finite and > 0
 * @example
 * ```ts
 * import { CGS, blackbodyFractionAboveWavelength, units } from "starlume";
 * blackbodyFractionAboveWavelength(CGS, CGS.of(1, units.mm), CGS.of(5772, units.K)); // ≈ 7.9e-10 (far-IR tail of the Sun)
 * ```
 */
export function blackbodyFractionAboveWavelength<S extends SystemName>(
  sys: UnitSystem<S>,
  wavelength: NotAirWavelength<NoInfer<S>>,
  temperature: Temperature,
): Dimensionless {
  return aboveWavelength(sys, wavelength, temperature);
}

/**
 * Fraction of a blackbody's exitance between two wavelengths λ₁ ≤ λ < λ₂,
 * without catastrophic cancellation for narrow or far-tail bands.
 *
 * @param sys - `SI` or `CGS` (the system of both wavelengths)
 * @param wavelength1 - λ₁, in `sys`
 * @param wavelength2 - λ₂ ≥ λ₁, in `sys`
 * @param temperature - T
 * @returns a fraction in [0, 1]
 * @throws RangeError when an input is not finite and > 0, or λ₂ < λ₁
 * @example
 * ```ts
 * import { SI, blackbodyFractionBetweenWavelengths, units } from "starlume";
 * blackbodyFractionBetweenWavelengths(SI, SI.of(380, units.nm), SI.of(780, units.nm), SI.of(5772, units.K)); // ≈ 0.45
 * ```
 */
export function blackbodyFractionBetweenWavelengths<S extends SystemName>(
  sys: UnitSystem<S>,
  wavelength1: NotAirWavelength<NoInfer<S>>,
  wavelength2: NotAirWavelength<NoInfer<S>>,
  temperature: Temperature,
): Dimensionless {
  if (wavelength2 < wavelength1) reversedBand(sys, wavelength1, wavelength2, temperature);
  return betweenWavelengths(sys, wavelength1, wavelength2, temperature);
}

/**
 * Fraction of a blackbody's exitance emitted at frequencies above ν
 * (equivalently, at wavelengths below c/ν; x formed from ν directly).
 *
 * @param sys - `SI` or `CGS` (kept for a uniform call shape)
 * @param frequency - ν
 * @param temperature - T
 * @returns a fraction in [0, 1]
 * @throws RangeError when ν or T is not finite and > 0
 * @example
 * ```ts
 * import { SI, blackbodyFractionAboveFrequency, units } from "starlume";
 * // energy beyond the Lyman limit (13.6 eV ↔ 3.288e15 Hz) of a 30 000 K blackbody
 * blackbodyFractionAboveFrequency(SI, SI.of(3288, units.THz), SI.of(30000, units.K));
 * ```
 */
export function blackbodyFractionAboveFrequency<S extends SystemName>(
  sys: UnitSystem<S>,
  frequency: Frequency,
  temperature: Temperature,
): Dimensionless {
  return aboveFrequency(sys, frequency, temperature);
}

/**
 * Fraction of a blackbody's exitance emitted at frequencies below ν.
 *
 * @param sys - `SI` or `CGS`
 * @param frequency - ν
 * @param temperature - T
 * @returns a fraction in [0, 1]
 * @throws RangeError when ν or T is not finite and > 0
 * @example
 * ```ts
 * import { SI, blackbodyFractionBelowFrequency, units } from "starlume";
 * blackbodyFractionBelowFrequency(SI, SI.of(1, units.THz), SI.of(5772, units.K)); // ≈ 2.9e-8: the Sun's share below 1 THz
 * ```
 */
export function blackbodyFractionBelowFrequency<S extends SystemName>(
  sys: UnitSystem<S>,
  frequency: Frequency,
  temperature: Temperature,
): Dimensionless {
  return belowFrequency(sys, frequency, temperature);
}

/**
 * Fraction of a blackbody's *photon* emission at wavelengths below λ,
 * (1/(2ζ(3))) ∫ₓ^∞ t²/(eᵗ−1) dt.
 *
 * @param sys - `SI` or `CGS` (the system of `wavelength`)
 * @param wavelength - λ, in `sys`
 * @param temperature - T
 * @returns a fraction in [0, 1]
 * @throws RangeError when λ or T is not finite and > 0
 * @example
 * ```ts
 * import { SI, blackbodyPhotonFractionBelowWavelength, units } from "starlume";
 * blackbodyPhotonFractionBelowWavelength(SI, SI.of(500, units.nm), SI.of(5772, units.K));
 * ```
 */
export function blackbodyPhotonFractionBelowWavelength<S extends SystemName>(
  sys: UnitSystem<S>,
  wavelength: NotAirWavelength<NoInfer<S>>,
  temperature: Temperature,
): Dimensionless {
  return photonBelowWavelength(sys, wavelength, temperature);
}

/**
 * Fraction of a blackbody's photon emission at wavelengths above λ.
 *
 * @param sys - `SI` or `CGS` (the system of `wavelength`)
 * @param wavelength - λ, in `sys`
 * @param temperature - T
 * @returns a fraction in [0, 1]
 * @throws RangeError when λ or T is not finite and > 0
 * @example
 * ```ts
 * import { CGS, blackbodyPhotonFractionAboveWavelength, units } from "starlume";
 * blackbodyPhotonFractionAboveWavelength(CGS, CGS.of(1, units.um), CGS.of(5772, units.K));
 * ```
 */
export function blackbodyPhotonFractionAboveWavelength<S extends SystemName>(
  sys: UnitSystem<S>,
  wavelength: NotAirWavelength<NoInfer<S>>,
  temperature: Temperature,
): Dimensionless {
  return photonAboveWavelength(sys, wavelength, temperature);
}

/**
 * Fraction of a blackbody's photon emission between two wavelengths λ₁ ≤ λ < λ₂.
 *
 * @param sys - `SI` or `CGS` (the system of both wavelengths)
 * @param wavelength1 - λ₁, in `sys`
 * @param wavelength2 - λ₂ ≥ λ₁, in `sys`
 * @param temperature - T
 * @returns a fraction in [0, 1]
 * @throws RangeError when an input is not finite and > 0, or λ₂ < λ₁
 * @example
 * ```ts
 * import { SI, blackbodyPhotonFractionBetweenWavelengths, units } from "starlume";
 * blackbodyPhotonFractionBetweenWavelengths(SI, SI.of(400, units.nm), SI.of(700, units.nm), SI.of(5772, units.K));
 * ```
 */
export function blackbodyPhotonFractionBetweenWavelengths<S extends SystemName>(
  sys: UnitSystem<S>,
  wavelength1: NotAirWavelength<NoInfer<S>>,
  wavelength2: NotAirWavelength<NoInfer<S>>,
  temperature: Temperature,
): Dimensionless {
  if (wavelength2 < wavelength1) reversedBand(sys, wavelength1, wavelength2, temperature);
  return photonBetweenWavelengths(sys, wavelength1, wavelength2, temperature);
}

/**
 * Fraction of a blackbody's photon emission at frequencies above ν.
 *
 * @param sys - `SI` or `CGS`
 * @param frequency - ν
 * @param temperature - T
 * @returns a fraction in [0, 1]
 * @throws RangeError when ν or T is not finite and > 0
 * @example
 * ```ts
 * import { SI, blackbodyPhotonFractionAboveFrequency, units } from "starlume";
 * // hydrogen-ionizing share of the photons of a 40 000 K blackbody
 * blackbodyPhotonFractionAboveFrequency(SI, SI.of(3288, units.THz), SI.of(40000, units.K));
 * ```
 */
export function blackbodyPhotonFractionAboveFrequency<S extends SystemName>(
  sys: UnitSystem<S>,
  frequency: Frequency,
  temperature: Temperature,
): Dimensionless {
  return photonAboveFrequency(sys, frequency, temperature);
}

/**
 * Fraction of a blackbody's photon emission at frequencies below ν
 * (evaluated as the photon fraction at wavelengths above c/ν: one extra
 * rounding of c/ν, ≤ 1.1e-16 relative in x, which moves the fraction by at
 * most 2 × that relative on this long-wave side).
 *
 * @param sys - `SI` or `CGS`
 * @param frequency - ν
 * @param temperature - T
 * @returns a fraction in [0, 1]
 * @throws RangeError when ν or T is not finite and > 0
 * @example
 * ```ts
 * import { SI, blackbodyPhotonFractionBelowFrequency, units } from "starlume";
 * blackbodyPhotonFractionBelowFrequency(SI, SI.of(100, units.GHz), SI.of(2.7255, units.K)); // CMB photons below 100 GHz
 * ```
 */
export function blackbodyPhotonFractionBelowFrequency<S extends SystemName>(
  sys: UnitSystem<S>,
  frequency: Frequency,
  temperature: Temperature,
): Dimensionless {
  return photonBelowFrequency(sys, frequency, temperature);
}

/**
 * Blackbody radiance integrated over a wavelength band,
 * ∫_{λ₁}^{λ₂} B_λ dλ = (σT⁴/π)·(fraction between λ₁ and λ₂).
 *
 * @param sys - `SI` (W m⁻² sr⁻¹) or `CGS` (erg s⁻¹ cm⁻² sr⁻¹)
 * @param wavelength1 - λ₁, in `sys`
 * @param wavelength2 - λ₂ ≥ λ₁, in `sys`
 * @param temperature - T
 * @throws RangeError when an input is not finite and > 0, λ₂ < λ₁, or σT⁴ overflows
 * @example
 * ```ts
 * import { SI, bandRadianceWavelength, lambertianExitance, units } from "starlume";
 * const l = bandRadianceWavelength(SI, SI.of(380, units.nm), SI.of(780, units.nm), SI.of(5772, units.K));
 * const m = lambertianExitance(l); // W m^-2 leaving the surface in that band
 * ```
 */
export function bandRadianceWavelength<S extends SystemName>(
  sys: UnitSystem<S>,
  wavelength1: NotAirWavelength<NoInfer<S>>,
  wavelength2: NotAirWavelength<NoInfer<S>>,
  temperature: Temperature,
): Radiance<S> {
  if (wavelength2 < wavelength1) reversedBand(sys, wavelength1, wavelength2, temperature);
  return bandRadiance(sys, wavelength1, wavelength2, temperature);
}

/**
 * Blackbody photon radiance integrated over a wavelength band,
 * (σ_γT³/π)·(photon fraction between λ₁ and λ₂), σ_γ = 4πζ(3)k³/(h³c²).
 *
 * @param sys - `SI` (photons s⁻¹ m⁻² sr⁻¹) or `CGS` (photons s⁻¹ cm⁻² sr⁻¹)
 * @param wavelength1 - λ₁, in `sys`
 * @param wavelength2 - λ₂ ≥ λ₁, in `sys`
 * @param temperature - T
 * @throws RangeError when an input is not finite and > 0, or λ₂ < λ₁
 * @example
 * ```ts
 * import { CGS, bandPhotonRadianceWavelength, units } from "starlume";
 * const n = bandPhotonRadianceWavelength(CGS, CGS.of(400, units.nm), CGS.of(700, units.nm), CGS.of(5772, units.K));
 * ```
 */
export function bandPhotonRadianceWavelength<S extends SystemName>(
  sys: UnitSystem<S>,
  wavelength1: NotAirWavelength<NoInfer<S>>,
  wavelength2: NotAirWavelength<NoInfer<S>>,
  temperature: Temperature,
): PhotonRadiance<S> {
  if (wavelength2 < wavelength1) reversedBand(sys, wavelength1, wavelength2, temperature);
  return bandPhotonRadiance(sys, wavelength1, wavelength2, temperature);
}
