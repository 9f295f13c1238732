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
import { C } from "../constants/values";
import { kinds } from "../quantity/aliases";
import type { Dimensionless, Frequency, Length, PhotonRadiance, Radiance, Temperature } from "../quantity/aliases";
import type { SystemName } from "../quantity/quantity";
import type { UnitSystem } from "../quantity/system";
import {
  bandPhotonRadianceWavelengthSI,
  bandRadianceWavelengthSI,
  blackbodyFractionAboveFrequencySI,
  blackbodyFractionAboveWavelengthSI,
  blackbodyFractionBelowFrequencySI,
  blackbodyFractionBelowWavelengthSI,
  blackbodyFractionBetweenWavelengthsSI,
  blackbodyPhotonFractionAboveFrequencySI,
  blackbodyPhotonFractionAboveWavelengthSI,
  blackbodyPhotonFractionBelowWavelengthSI,
  blackbodyPhotonFractionBetweenWavelengthsSI,
} from "./kernels/band-fraction";
import { eval2, kernelError, overflowIn, positiveSI, type Arg } from "./internal";
import { fromSI } from "../internal/typed";

const L = kinds.length.dimension;
const F = kinds.frequency.dimension;
const T = kinds.temperature.dimension;
const ONE = kinds.dimensionless.dimension;
const R = kinds.radiance.dimension;
const NR = kinds.photonRadiance.dimension;

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
  return eval2(sys, blackbodyFractionBelowWavelengthSI, "the band fraction", ONE, "wavelength", wavelength, L, "temperature", temperature, T) as Dimensionless;
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
  return eval2(sys, blackbodyFractionAboveWavelengthSI, "the band fraction", ONE, "wavelength", wavelength, L, "temperature", temperature, T) as Dimensionless;
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
  return between(sys, blackbodyFractionBetweenWavelengthsSI, "the band fraction", ONE, wavelength1, wavelength2, temperature) as Dimensionless;
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
  return eval2(sys, blackbodyFractionAboveFrequencySI, "the band fraction", ONE, "frequency", frequency, F, "temperature", temperature, T) as Dimensionless;
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
  return eval2(sys, blackbodyFractionBelowFrequencySI, "the band fraction", ONE, "frequency", frequency, F, "temperature", temperature, T) as Dimensionless;
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
  return eval2(sys, blackbodyPhotonFractionBelowWavelengthSI, "the photon band fraction", ONE, "wavelength", wavelength, L, "temperature", temperature, T) as Dimensionless;
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
  return eval2(sys, blackbodyPhotonFractionAboveWavelengthSI, "the photon band fraction", ONE, "wavelength", wavelength, L, "temperature", temperature, T) as Dimensionless;
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
  return between(sys, blackbodyPhotonFractionBetweenWavelengthsSI, "the photon band fraction", ONE, wavelength1, wavelength2, temperature) as Dimensionless;
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
 * // hydrogen-ionising share of the photons of a 40 000 K blackbody
 * blackbodyPhotonFractionAboveFrequency(SI, SI.of(3288, units.THz), SI.of(40000, units.K));
 * ```
 */
export function blackbodyPhotonFractionAboveFrequency<S extends SystemName>(
  sys: UnitSystem<S>,
  frequency: Frequency,
  temperature: Temperature,
): Dimensionless {
  return eval2(sys, blackbodyPhotonFractionAboveFrequencySI, "the photon band fraction", ONE, "frequency", frequency, F, "temperature", temperature, T) as Dimensionless;
}

/** Photon fraction below ν, as the photon fraction above λ = c/ν (SI kernel form). */
function photonFractionBelowFrequencySI(frequencyHz: number, temperatureK: number): number {
  const lambda = C / frequencyHz;
  // c/ν overflows only for ν < c/MAX ≈ 1.7e-300 Hz, where x = hν/kT underflows for every
  // finite T and the fraction (≈ x²/(4ζ(3))) is 0 to double precision.
  if (lambda === Infinity) return 0;
  return blackbodyPhotonFractionAboveWavelengthSI(lambda, temperatureK);
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
  return eval2(sys, photonFractionBelowFrequencySI, "the photon band fraction", ONE, "frequency", frequency, F, "temperature", temperature, T) as Dimensionless;
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
  return between(sys, bandRadianceWavelengthSI, "the band radiance", R, wavelength1, wavelength2, temperature) as Radiance<S>;
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
  return between(sys, bandPhotonRadianceWavelengthSI, "the band photon radiance", NR, wavelength1, wavelength2, temperature) as PhotonRadiance<S>;
}

/** Validate (λ₁, λ₂, T) in the caller's units, run a between-wavelengths kernel, convert the result. */
function between(
  sys: UnitSystem<SystemName>,
  kernel: (l1: number, l2: number, t: number) => number,
  what: string,
  out: typeof ONE | typeof R | typeof NR,
  wavelength1: number,
  wavelength2: number,
  temperature: number,
): number {
  const l1 = positiveSI(sys, "wavelength1", wavelength1, L);
  const l2 = positiveSI(sys, "wavelength2", wavelength2, L);
  positiveSI(sys, "temperature", temperature, T);
  if (wavelength2 < wavelength1) {
    throw new RangeError(`wavelength2 must be >= wavelength1 (${wavelength1} ${sys.coherentUnit(L)}); got ${wavelength2}`);
  }
  const args: readonly Arg[] = [
    ["wavelength1", wavelength1, L],
    ["wavelength2", wavelength2, L],
    ["temperature", temperature, T],
  ];
  let v: number;
  try {
    v = kernel(l1, l2, temperature);
  } catch (e) {
    throw kernelError(sys, e, what, args);
  }
  const r = fromSI(sys, v, out);
  if (r === Infinity) throw overflowIn(sys, what, out, args);
  return r;
}
