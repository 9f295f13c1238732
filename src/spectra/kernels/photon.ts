/**
 * Photon conversions between energy E (J), vacuum wavelength λ (m),
 * frequency ν (Hz) and vacuum wavenumber σ = 1/λ (m⁻¹):
 * E = hν = hc/λ = hcσ, ν = c/λ. Exact SI constants h and c (CODATA 2018,
 * SI 2019), so the only error is floating-point rounding (≤ 2 ulp).
 * Every input must be finite and > 0 (RangeError naming the parameter).
 *
 * @packageDocumentation
 */

import { C, H } from "../../constants/values";
import { requirePositive } from "../../internal/checks";

const HC = H * C;

/**
 * Photon energy from vacuum wavelength, E = hc/λ, J.
 * @example
 * ```ts
 * photonEnergyFromWavelengthSI(500e-9); // 3.9729e-19 J
 * ```
 */
export function photonEnergyFromWavelengthSI(wavelengthM: number): number {
  return HC / requirePositive("wavelengthM", wavelengthM, "m");
}

/**
 * Vacuum wavelength from photon energy, λ = hc/E, m.
 * @example
 * ```ts
 * wavelengthFromPhotonEnergySI(3.9729e-19); // ≈ 5e-7 m
 * ```
 */
export function wavelengthFromPhotonEnergySI(energyJ: number): number {
  return HC / requirePositive("energyJ", energyJ, "J");
}

/**
 * Frequency from vacuum wavelength, ν = c/λ, Hz.
 * @example
 * ```ts
 * frequencyFromWavelengthSI(1); // 299792458 Hz
 * ```
 */
export function frequencyFromWavelengthSI(wavelengthM: number): number {
  return C / requirePositive("wavelengthM", wavelengthM, "m");
}

/**
 * Vacuum wavelength from frequency, λ = c/ν, m.
 * @example
 * ```ts
 * wavelengthFromFrequencySI(1.420405751768e9); // 21-cm line, 0.2110 m
 * ```
 */
export function wavelengthFromFrequencySI(frequencyHz: number): number {
  return C / requirePositive("frequencyHz", frequencyHz, "Hz");
}

/**
 * Vacuum wavenumber from vacuum wavelength, σ = 1/λ, m⁻¹.
 * @example
 * ```ts
 * wavenumberFromWavelengthSI(1e-6); // 1e6 m^-1
 * ```
 */
export function wavenumberFromWavelengthSI(wavelengthM: number): number {
  return 1 / requirePositive("wavelengthM", wavelengthM, "m");
}

/**
 * Vacuum wavelength from vacuum wavenumber, λ = 1/σ, m.
 * @example
 * ```ts
 * wavelengthFromWavenumberSI(1e6); // 1e-6 m
 * ```
 */
export function wavelengthFromWavenumberSI(wavenumberPerM: number): number {
  return 1 / requirePositive("wavenumberPerM", wavenumberPerM, "m^-1");
}

/**
 * Photon energy from frequency, E = hν, J.
 * @example
 * ```ts
 * photonEnergyFromFrequencySI(1e15); // 6.62607015e-19 J
 * ```
 */
export function photonEnergyFromFrequencySI(frequencyHz: number): number {
  return H * requirePositive("frequencyHz", frequencyHz, "Hz");
}

/**
 * Frequency from photon energy, ν = E/h, Hz.
 * @example
 * ```ts
 * frequencyFromPhotonEnergySI(6.62607015e-19); // 1e15 Hz
 * ```
 */
export function frequencyFromPhotonEnergySI(energyJ: number): number {
  return requirePositive("energyJ", energyJ, "J") / H;
}

/**
 * Photon energy from vacuum wavenumber, E = hcσ, J.
 * @example
 * ```ts
 * photonEnergyFromWavenumberSI(1e6); // 1.98645e-19 J
 * ```
 */
export function photonEnergyFromWavenumberSI(wavenumberPerM: number): number {
  return HC * requirePositive("wavenumberPerM", wavenumberPerM, "m^-1");
}

/**
 * Vacuum wavenumber from photon energy, σ = E/(hc), m⁻¹.
 * @example
 * ```ts
 * wavenumberFromPhotonEnergySI(1.98644586e-19); // ≈ 1e6 m^-1
 * ```
 */
export function wavenumberFromPhotonEnergySI(energyJ: number): number {
  return requirePositive("energyJ", energyJ, "J") / HC;
}

/**
 * Frequency from vacuum wavenumber, ν = cσ, Hz.
 * @example
 * ```ts
 * frequencyFromWavenumberSI(1); // 299792458 Hz
 * ```
 */
export function frequencyFromWavenumberSI(wavenumberPerM: number): number {
  return C * requirePositive("wavenumberPerM", wavenumberPerM, "m^-1");
}

/**
 * Vacuum wavenumber from frequency, σ = ν/c, m⁻¹.
 * @example
 * ```ts
 * wavenumberFromFrequencySI(299792458); // 1 m^-1
 * ```
 */
export function wavenumberFromFrequencySI(frequencyHz: number): number {
  return requirePositive("frequencyHz", frequencyHz, "Hz") / C;
}
