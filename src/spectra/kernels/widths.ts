/**
 * Line widths: thermal + microturbulent Doppler widths and Lorentz
 * (damping) half-widths, and FWHM conversions.
 *
 * - Doppler width (1/e half-width of the Gaussian in velocity), thermal and
 *   microturbulent velocities added in quadrature (e.g. Gray, "The
 *   Observation and Analysis of Stellar Photospheres", ch. 11; Rybicki &
 *   Lightman 1979, §10.6): b = √(2kT/m + ξ²), m s⁻¹; in wavelength
 *   Δλ_D = λ₀ b/c, in frequency Δν_D = ν₀ b/c.
 * - A damping constant Γ (s⁻¹, the total decay rate of the two levels)
 *   gives a Lorentzian of HWHM γ_ν = Γ/(4π) in frequency and, to first
 *   order in γ/ν₀, γ_λ = λ₀² Γ/(4π c) in wavelength.
 *
 * @packageDocumentation
 */

import { C, K_B, M_U } from "../../values/constants";
import { requireNonNegative, requirePositive } from "../../internal/checks";

/**
 * Mass of an atom from its relative atomic mass (e.g. 55.845 for Fe),
 * m = A_r m_u, kg.
 *
 * @example
 * ```ts
 * atomicMassKg(1.00794); // ≈ 1.6737e-27 kg
 * ```
 */
export function atomicMassKg(relativeAtomicMass: number): number {
  return atomicMassUnchecked(requirePositive("relativeAtomicMass", relativeAtomicMass, "(u)"));
}

/** {@link atomicMassKg} without the input check. @internal */
export function atomicMassUnchecked(relativeAtomicMass: number): number {
  return relativeAtomicMass * M_U;
}

/**
 * Doppler velocity width b = √(2kT/m + ξ²), m s⁻¹ (thermal + microturbulence
 * in quadrature).
 *
 * @param temperatureK kinetic temperature, K (> 0)
 * @param massKg absorber mass, kg (> 0)
 * @param microturbulenceMs microturbulent velocity ξ, m s⁻¹ (≥ 0)
 * @example
 * ```ts
 * dopplerVelocityWidthSI(5772, atomicMassKg(55.845), 1000); // ≈ 1.72e3 m/s
 * ```
 */
export function dopplerVelocityWidthSI(temperatureK: number, massKg: number, microturbulenceMs: number): number {
  requirePositive("temperatureK", temperatureK, "K");
  requirePositive("massKg", massKg, "kg");
  requireNonNegative("microturbulenceMs", microturbulenceMs, "m s^-1");
  return dopplerVelocityWidthUnchecked(temperatureK, massKg, microturbulenceMs);
}

/** {@link dopplerVelocityWidthSI} without the input checks. @internal */
export function dopplerVelocityWidthUnchecked(temperatureK: number, massKg: number, microturbulenceMs: number): number {
  return Math.sqrt((2 * K_B * temperatureK) / massKg + microturbulenceMs * microturbulenceMs);
}

/**
 * Doppler width in wavelength, Δλ_D = λ₀ b / c, m.
 *
 * @example
 * ```ts
 * dopplerWidthWavelengthSI(656.28e-9, 1e4, atomicMassKg(1.008), 0); // ≈ 2.81e-11 m
 * ```
 */
export function dopplerWidthWavelengthSI(
  centreWavelengthM: number,
  temperatureK: number,
  massKg: number,
  microturbulenceMs: number,
): number {
  requirePositive("centreWavelengthM", centreWavelengthM, "m");
  return dopplerWidthUnchecked(centreWavelengthM, dopplerVelocityWidthSI(temperatureK, massKg, microturbulenceMs));
}

/**
 * Doppler width x₀ b / c of a line centred at x₀ (a wavelength in m, or a
 * frequency in Hz) for the velocity width b (m s⁻¹), without checks. @internal
 */
export function dopplerWidthUnchecked(center: number, velocityWidthMs: number): number {
  return (center * velocityWidthMs) / C;
}

/**
 * Doppler width in frequency, Δν_D = ν₀ b / c, Hz.
 *
 * @example
 * ```ts
 * dopplerWidthFrequencySI(4.568e14, 1e4, atomicMassKg(1.008), 0); // ≈ 1.96e10 Hz
 * ```
 */
export function dopplerWidthFrequencySI(
  centreFrequencyHz: number,
  temperatureK: number,
  massKg: number,
  microturbulenceMs: number,
): number {
  requirePositive("centreFrequencyHz", centreFrequencyHz, "Hz");
  return dopplerWidthUnchecked(centreFrequencyHz, dopplerVelocityWidthSI(temperatureK, massKg, microturbulenceMs));
}

/**
 * Lorentz HWHM in frequency from a damping constant, γ_ν = Γ/(4π), Hz.
 *
 * @example
 * ```ts
 * lorentzHwhmFrequencySI(4.4e7); // ≈ 3.5e6 Hz
 * ```
 */
export function lorentzHwhmFrequencySI(dampingRatePerS: number): number {
  return lorentzHwhmFrequencyUnchecked(requireNonNegative("dampingRatePerS", dampingRatePerS, "s^-1"));
}

/** {@link lorentzHwhmFrequencySI} without the input check. @internal */
export function lorentzHwhmFrequencyUnchecked(dampingRatePerS: number): number {
  return dampingRatePerS / (4 * Math.PI);
}

/**
 * Lorentz HWHM in wavelength from a damping constant,
 * γ_λ = λ₀² Γ / (4π c), m (first order in γ/ν₀).
 *
 * @example
 * ```ts
 * lorentzHwhmWavelengthSI(121.567e-9, 6.265e8); // ≈ 2.46e-15 m
 * ```
 */
export function lorentzHwhmWavelengthSI(centreWavelengthM: number, dampingRatePerS: number): number {
  requirePositive("centreWavelengthM", centreWavelengthM, "m");
  requireNonNegative("dampingRatePerS", dampingRatePerS, "s^-1");
  return lorentzHwhmWavelengthUnchecked(centreWavelengthM, dampingRatePerS);
}

/** {@link lorentzHwhmWavelengthSI} without the input checks. @internal */
export function lorentzHwhmWavelengthUnchecked(centreWavelengthM: number, dampingRatePerS: number): number {
  return (centreWavelengthM * centreWavelengthM * dampingRatePerS) / (4 * Math.PI * C);
}

/**
 * Gaussian FWHM from the Doppler width, FWHM = 2 b √(ln 2) (same unit).
 *
 * @example
 * ```ts
 * gaussianFwhmFromDopplerWidth(1); // 1.6651
 * ```
 */
export function gaussianFwhmFromDopplerWidth(dopplerWidth: number): number {
  return 2 * requireNonNegative("dopplerWidth", dopplerWidth, "(any width unit)") * Math.sqrt(Math.LN2);
}

/**
 * Doppler width b = √2 σ from a Gaussian standard deviation σ (same unit).
 *
 * @example
 * ```ts
 * dopplerWidthFromSigma(1); // 1.41421
 * ```
 */
export function dopplerWidthFromSigma(sigma: number): number {
  return Math.SQRT2 * requireNonNegative("sigma", sigma, "(any width unit)");
}

/**
 * Approximate Voigt FWHM from the Gaussian and Lorentzian FWHMs,
 * f_V ≈ 0.5346 f_L + √(0.2166 f_L² + f_G²) — Olivero & Longbothum (1977),
 * JQSRT 17, 233; accurate to about 0.02 %.
 *
 * @example
 * ```ts
 * voigtFwhmApprox(1, 0); // 1
 * ```
 */
export function voigtFwhmApprox(gaussianFwhm: number, lorentzFwhm: number): number {
  requireNonNegative("gaussianFwhm", gaussianFwhm, "(any width unit)");
  requireNonNegative("lorentzFwhm", lorentzFwhm, "(any width unit)");
  return 0.5346 * lorentzFwhm + Math.sqrt(0.2166 * lorentzFwhm * lorentzFwhm + gaussianFwhm * gaussianFwhm);
}
