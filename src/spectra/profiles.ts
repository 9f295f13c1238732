/**
 * Line profiles and line widths, typed.
 *
 * Profiles are area-normalised functions of the wavelength offset from line
 * centre, Δ = λ − λ₀ (`Length<S>`), with ∫ φ dΔ = 1, so their value is *per
 * unit wavelength*: the result type is `Wavenumber<S>` (dimension 1/length:
 * m⁻¹ in SI, cm⁻¹ in CGS — read it in e.g. `units.per_cm`; it is a profile
 * density, not a spectroscopic wavenumber). Widths are wavelength widths
 * (`Length<S>`), in the same system:
 *
 * - Gaussian with Doppler width b (the 1/e half-width; b = √2 σ):
 *   φ_G = exp(−Δ²/b²) / (b √π).
 * - Lorentzian with half-width at half-maximum γ: φ_L = γ / (π (Δ² + γ²)).
 * - Voigt, their convolution: φ_V = Re w((Δ + iγ)/b) / (b √π), w the
 *   Faddeeva function (J. A. C. Weideman, SIAM J. Numer. Anal. 31, 1497
 *   (1994), and a continued fraction far out); γ → 0 gives φ_G, b = 0 gives
 *   φ_L exactly. Accuracy ≤ 1e-6 relative (requirement; kernels/faddeeva.test.ts)
 *   and ≤ 1e-9 against an independent quadrature (kernels/profiles.test.ts).
 *
 * Widths (D. F. Gray, "The Observation and Analysis of Stellar
 * Photospheres", ch. 11; Rybicki & Lightman 1979, §10.6):
 *
 * - Doppler velocity width b_v = √(2kT/m + ξ²) (thermal plus microturbulence
 *   ξ in quadrature); in wavelength Δλ_D = λ₀ b_v/c, in frequency
 *   Δν_D = ν₀ b_v/c.
 * - Lorentz HWHM from a damping constant Γ (the total decay rate of the two
 *   levels, s⁻¹, typed as `Frequency`): γ_ν = Γ/(4π) in frequency and, to
 *   first order in γ/ν₀, γ_λ = λ₀² Γ/(4π c) in wavelength.
 *
 * A centre wavelength may be in vacuum, in air or unbranded: the widths
 * scale with λ₀, and using an air λ₀ changes them by n − 1 ≈ 3 × 10⁻⁴
 * relative, far below the accuracy of T, ξ or Γ.
 *
 * @module
 */
import { defineLaw } from "../law/define";
import { lawInput } from "../law/input";
import type { BatchResult } from "../law/batch";
import { kinds } from "../quantity/aliases";
import type { Frequency, Length, LengthArray, Mass, Temperature, Velocity, Wavenumber, WavenumberArray } from "../quantity/aliases";
import type { AnyQuantity, SystemName } from "../quantity/quantity";
import type { UnitSystem } from "../quantity/system";
import { gaussianProfileUnchecked, lorentzianProfileUnchecked, voigtProfileUnchecked } from "./kernels/profiles";
import {
  atomicMassUnchecked,
  dopplerVelocityWidthUnchecked,
  dopplerWidthFromSigma as dopplerWidthFromSigmaKernel,
  dopplerWidthUnchecked,
  gaussianFwhmFromDopplerWidth,
  lorentzHwhmFrequencyUnchecked,
  lorentzHwhmWavelengthUnchecked,
  voigtFwhmApprox,
} from "./kernels/widths";

const offset = lawInput("offset", kinds.length, { check: "finite" });
const gaussianWidth = lawInput("dopplerWidth", kinds.length);
const lorentzianWidth = lawInput("lorentzHwhm", kinds.length);
const voigtGaussianWidth = lawInput("dopplerWidth", kinds.length, { check: "nonNegative" });
const voigtLorentzianWidth = lawInput("lorentzHwhm", kinds.length, { check: "nonNegative" });

const gaussian = defineLaw({ name: "φ_G", inputs: [offset, gaussianWidth], result: kinds.wavenumber, kernel: gaussianProfileUnchecked });
const lorentzian = defineLaw({ name: "φ_L", inputs: [offset, lorentzianWidth], result: kinds.wavenumber, kernel: lorentzianProfileUnchecked });
const voigt = defineLaw({
  name: "φ_V",
  inputs: [offset, voigtGaussianWidth, voigtLorentzianWidth],
  result: kinds.wavenumber,
  kernel: voigtProfileUnchecked,
});

/**
 * The one joint condition of the Voigt widths, checked before the law (whose
 * inputs are checked one at a time): b and γ not both 0.
 */
function requireSomeWidth(sys: UnitSystem<SystemName>, dopplerWidth: number, lorentzHwhm: number): void {
  if (dopplerWidth === 0 && lorentzHwhm === 0) throw new RangeError(lorentzianWidth.reason(sys, lorentzHwhm));
}

const relativeAtomicMass = lawInput("relativeAtomicMass", kinds.dimensionless);
const temperature = lawInput("temperature", kinds.temperature);
const mass = lawInput("mass", kinds.mass);
const microturbulence = lawInput("microturbulence", kinds.velocity, { check: "nonNegative" });
const centreWavelength = lawInput("centreWavelength", kinds.length);
const centreFrequency = lawInput("centreFrequency", kinds.frequency);
const dampingRate = lawInput("dampingRate", kinds.frequency, { check: "nonNegative" });

const atomMass = defineLaw({ name: "atomic mass", inputs: [relativeAtomicMass], result: kinds.mass, kernel: atomicMassUnchecked });
const velocityWidth = defineLaw({
  name: "Doppler velocity width",
  inputs: [temperature, mass, microturbulence],
  result: kinds.velocity,
  kernel: dopplerVelocityWidthUnchecked,
});
const thermalVelocityWidth = defineLaw({
  name: "Doppler velocity width",
  inputs: [temperature, mass],
  result: kinds.velocity,
  kernel: (t, m) => dopplerVelocityWidthUnchecked(t, m, 0),
});
const wavelengthWidth = defineLaw({
  name: "Doppler width",
  inputs: [centreWavelength, temperature, mass, microturbulence],
  result: kinds.length,
  kernel: (l, t, m, xi) => dopplerWidthUnchecked(l, dopplerVelocityWidthUnchecked(t, m, xi)),
});
const thermalWavelengthWidth = defineLaw({
  name: "Doppler width",
  inputs: [centreWavelength, temperature, mass],
  result: kinds.length,
  kernel: (l, t, m) => dopplerWidthUnchecked(l, dopplerVelocityWidthUnchecked(t, m, 0)),
});
const frequencyWidth = defineLaw({
  name: "Doppler width",
  inputs: [centreFrequency, temperature, mass, microturbulence],
  result: kinds.frequency,
  kernel: (f, t, m, xi) => dopplerWidthUnchecked(f, dopplerVelocityWidthUnchecked(t, m, xi)),
});
const thermalFrequencyWidth = defineLaw({
  name: "Doppler width",
  inputs: [centreFrequency, temperature, mass],
  result: kinds.frequency,
  kernel: (f, t, m) => dopplerWidthUnchecked(f, dopplerVelocityWidthUnchecked(t, m, 0)),
});
const lorentzWavelength = defineLaw({
  name: "Lorentz HWHM",
  inputs: [centreWavelength, dampingRate],
  result: kinds.length,
  kernel: lorentzHwhmWavelengthUnchecked,
});
const lorentzFrequency = defineLaw({ name: "Lorentz HWHM", inputs: [dampingRate], result: kinds.frequency, kernel: lorentzHwhmFrequencyUnchecked });

/**
 * Gaussian profile per unit wavelength, φ_G(Δ) = exp(−(Δ/b)²)/(b√π).
 *
 * @param sys - `SI` (m⁻¹) or `CGS` (cm⁻¹)
 * @param offset - Δ = λ − λ₀, in `sys` (any sign)
 * @param dopplerWidth - b = √2 σ (1/e half-width), > 0
 * @throws RangeError when Δ is not finite or b is not finite and > 0
 * @example
 * ```ts
 * import { SI, gaussianProfile, units } from "starlume";
 * const peak = gaussianProfile(SI, SI.of(0, units.nm), SI.of(0.03, units.nm)); // 1/(√π · 0.03 nm) in m^-1
 * ```
 */
export function gaussianProfile<S extends SystemName>(
  sys: UnitSystem<S>,
  offset: Length<NoInfer<S>>,
  dopplerWidth: Length<NoInfer<S>>,
): Wavenumber<S> {
  return gaussian(sys, offset, dopplerWidth);
}

/**
 * Lorentzian profile per unit wavelength, φ_L(Δ) = γ / (π(Δ² + γ²)).
 *
 * @param sys - `SI` (m⁻¹) or `CGS` (cm⁻¹)
 * @param offset - Δ, in `sys`
 * @param lorentzHwhm - γ (half-width at half-maximum), > 0
 * @example
 * ```ts
 * import { CGS, lorentzianProfile, units } from "starlume";
 * const wing = lorentzianProfile(CGS, CGS.of(1, units.angstrom), CGS.of(0.01, units.angstrom)); // cm^-1
 * ```
 */
export function lorentzianProfile<S extends SystemName>(
  sys: UnitSystem<S>,
  offset: Length<NoInfer<S>>,
  lorentzHwhm: Length<NoInfer<S>>,
): Wavenumber<S> {
  return lorentzian(sys, offset, lorentzHwhm);
}

/**
 * Voigt profile per unit wavelength, φ_V(Δ) = Re w((Δ + iγ)/b)/(b√π).
 *
 * @param sys - `SI` (m⁻¹) or `CGS` (cm⁻¹)
 * @param offset - Δ, in `sys`
 * @param dopplerWidth - b ≥ 0
 * @param lorentzHwhm - γ ≥ 0 (b and γ not both 0)
 * @throws RangeError for a non-finite offset or bad widths
 * @example
 * ```ts
 * import { SI, units, voigtProfile } from "starlume";
 * const phi = voigtProfile(SI, SI.of(0.01, units.nm), SI.of(0.03, units.nm), SI.of(0.003, units.nm));
 * ```
 */
export function voigtProfile<S extends SystemName>(
  sys: UnitSystem<S>,
  offset: Length<NoInfer<S>>,
  dopplerWidth: Length<NoInfer<S>>,
  lorentzHwhm: Length<NoInfer<S>>,
): Wavenumber<S> {
  requireSomeWidth(sys, dopplerWidth, lorentzHwhm);
  return voigt(sys, offset, dopplerWidth, lorentzHwhm);
}

/**
 * {@link voigtProfile} over many offsets (a new array). Widths are checked
 * once (RangeError, before any row is written); a non-finite offset gives
 * NaN, is listed in `invalid` and has its reason in `reasons`.
 *
 * @example
 * ```ts
 * import { SI, units, voigtProfileBatch } from "starlume";
 * const offsets = SI.arrayOf([-0.1, 0, 0.1], units.nm);
 * const { values } = voigtProfileBatch(SI, offsets, SI.of(0.03, units.nm), SI.of(0.003, units.nm)); // WavenumberArray<"SI">
 * ```
 */
export function voigtProfileBatch<S extends SystemName>(
  sys: UnitSystem<S>,
  offsets: LengthArray<NoInfer<S>>,
  dopplerWidth: Length<NoInfer<S>>,
  lorentzHwhm: Length<NoInfer<S>>,
): BatchResult<WavenumberArray<S>> {
  requireSomeWidth(sys, dopplerWidth, lorentzHwhm);
  return voigt.batch(sys, offsets, dopplerWidth, lorentzHwhm);
}

/**
 * Mass of an atom from its relative atomic mass, m = A_r m_u
 * (m_u = 1.660 539 066 60 × 10⁻²⁷ kg, CODATA 2018).
 *
 * @param sys - `SI` (kg) or `CGS` (g)
 * @param relativeAtomicMass - A_r, e.g. 55.845 for Fe (> 0)
 * @example
 * ```ts
 * import { CGS, atomicMass } from "starlume";
 * atomicMass(CGS, 1.008); // ≈ 1.6738e-24 g
 * ```
 */
export function atomicMass<S extends SystemName>(sys: UnitSystem<S>, relativeAtomicMass: number): Mass<S> {
  return atomMass(sys, relativeAtomicMass);
}

/**
 * Doppler velocity width b_v = √(2kT/m + ξ²) (thermal and microturbulent
 * velocities in quadrature).
 *
 * @param sys - `SI` (m s⁻¹) or `CGS` (cm s⁻¹)
 * @param temperature - kinetic temperature T (> 0)
 * @param mass - absorber mass m, in `sys` (see {@link atomicMass})
 * @param microturbulence - ξ ≥ 0, in `sys` (default 0)
 * @example
 * ```ts
 * import { SI, atomicMass, dopplerVelocityWidth, units } from "starlume";
 * SI.valueIn(dopplerVelocityWidth(SI, SI.of(1e4, units.K), atomicMass(SI, 1.008)), units.km_per_s); // ≈ 12.8
 * ```
 */
export function dopplerVelocityWidth<S extends SystemName>(
  sys: UnitSystem<S>,
  temperature: Temperature,
  mass: Mass<NoInfer<S>>,
  microturbulence?: Velocity<NoInfer<S>>,
): Velocity<S> {
  return microturbulence === undefined
    ? thermalVelocityWidth(sys, temperature, mass)
    : velocityWidth(sys, temperature, mass, microturbulence);
}

/**
 * Doppler width in wavelength, Δλ_D = λ₀ b_v / c, b_v = √(2kT/m + ξ²).
 *
 * @param sys - `SI` (m) or `CGS` (cm)
 * @param centreWavelength - line centre λ₀ (any medium), > 0
 * @param temperature - T (> 0)
 * @param mass - absorber mass (> 0)
 * @param microturbulence - ξ ≥ 0 (default 0)
 * @example
 * ```ts
 * import { CGS, atomicMass, dopplerWidth, units } from "starlume";
 * const b = dopplerWidth(CGS, CGS.of(6562.8, units.angstrom), CGS.of(1e4, units.K), atomicMass(CGS, 1.008));
 * CGS.valueIn(b, units.angstrom); // ≈ 0.281
 * ```
 */
export function dopplerWidth<S extends SystemName>(
  sys: UnitSystem<S>,
  centreWavelength: Length<NoInfer<S>>,
  temperature: Temperature,
  mass: Mass<NoInfer<S>>,
  microturbulence?: Velocity<NoInfer<S>>,
): Length<S> {
  return microturbulence === undefined
    ? thermalWavelengthWidth(sys, centreWavelength, temperature, mass)
    : wavelengthWidth(sys, centreWavelength, temperature, mass, microturbulence);
}

/**
 * Doppler width in frequency, Δν_D = ν₀ b_v / c.
 *
 * @param sys - `SI` or `CGS` (the system of the mass and ξ)
 * @param centreFrequency - ν₀ (> 0)
 * @example
 * ```ts
 * import { SI, atomicMass, dopplerWidthFrequency, units } from "starlume";
 * SI.valueIn(dopplerWidthFrequency(SI, SI.of(456.68, units.THz), SI.of(1e4, units.K), atomicMass(SI, 1.008)), units.GHz); // ≈ 19.6
 * ```
 */
export function dopplerWidthFrequency<S extends SystemName>(
  sys: UnitSystem<S>,
  centreFrequency: Frequency,
  temperature: Temperature,
  mass: Mass<NoInfer<S>>,
  microturbulence?: Velocity<NoInfer<S>>,
): Frequency {
  return microturbulence === undefined
    ? thermalFrequencyWidth(sys, centreFrequency, temperature, mass)
    : frequencyWidth(sys, centreFrequency, temperature, mass, microturbulence);
}

/**
 * Lorentz half-width at half-maximum in wavelength from a damping constant,
 * γ_λ = λ₀² Γ / (4π c) (first order in γ/ν₀).
 *
 * @param sys - `SI` (m) or `CGS` (cm)
 * @param centreWavelength - λ₀ (> 0, any medium)
 * @param dampingRate - Γ, the total decay rate (s⁻¹) of the two levels, ≥ 0
 * @example
 * ```ts
 * import { SI, lorentzHwhm, units } from "starlume";
 * SI.valueIn(lorentzHwhm(SI, SI.of(121.567, units.nm), SI.of(6.2649e8, units.Hz)), units.nm); // ≈ 2.46e-6
 * ```
 */
export function lorentzHwhm<S extends SystemName>(
  sys: UnitSystem<S>,
  centreWavelength: Length<NoInfer<S>>,
  dampingRate: Frequency,
): Length<S> {
  return lorentzWavelength(sys, centreWavelength, dampingRate);
}

/**
 * Lorentz half-width at half-maximum in frequency, γ_ν = Γ/(4π). The
 * system argument only fixes the call shape.
 *
 * @example
 * ```ts
 * import { SI, lorentzHwhmFrequency, units } from "starlume";
 * SI.valueIn(lorentzHwhmFrequency(SI, SI.of(6.2649e8, units.Hz)), units.MHz); // ≈ 49.9 (FWHM 99.7 MHz)
 * ```
 */
export function lorentzHwhmFrequency<S extends SystemName>(sys: UnitSystem<S>, dampingRate: Frequency): Frequency {
  return lorentzFrequency(sys, dampingRate);
}

/**
 * Gaussian FWHM from the Doppler width, 2 b √(ln 2); any width quantity
 * (wavelength, frequency, velocity), result of the same type.
 *
 * @example
 * ```ts
 * import { SI, gaussianFwhm, units } from "starlume";
 * gaussianFwhm(SI.of(0.03, units.nm)); // ≈ 4.995e-11 (m)
 * ```
 */
export function gaussianFwhm<Q extends AnyQuantity>(dopplerWidthValue: Q): Q {
  return gaussianFwhmFromDopplerWidth(dopplerWidthValue) as Q;
}

/**
 * Doppler width b = √2 σ from a Gaussian standard deviation σ (same type).
 *
 * @example
 * ```ts
 * import { SI, dopplerWidthFromSigma, units } from "starlume";
 * dopplerWidthFromSigma(SI.of(10, units.km_per_s)); // ≈ 14142 (m s^-1)
 * ```
 */
export function dopplerWidthFromSigma<Q extends AnyQuantity>(sigma: Q): Q {
  return dopplerWidthFromSigmaKernel(sigma) as Q;
}

/**
 * Approximate Voigt FWHM from the Gaussian and Lorentzian FWHMs,
 * f_V ≈ 0.5346 f_L + √(0.2166 f_L² + f_G²) — J. J. Olivero & R. L.
 * Longbothum (1977), JQSRT 17, 233; 0.02 % (measured ≤ 0.03 % against the
 * exact profile, kernels/widths.test.ts). Both widths of one type.
 *
 * @example
 * ```ts
 * import { SI, units, voigtFwhm } from "starlume";
 * voigtFwhm(SI.of(0.05, units.nm), SI.of(0.01, units.nm)); // ≈ 5.556e-11 (m)
 * ```
 */
export function voigtFwhm<Q extends AnyQuantity>(gaussianFwhmValue: Q, lorentzFwhm: NoInfer<Q>): Q {
  return voigtFwhmApprox(gaussianFwhmValue, lorentzFwhm) as Q;
}
