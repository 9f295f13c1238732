/**
 * Photon conversions between energy E (J), vacuum wavelength λ (m),
 * frequency ν (Hz) and vacuum wavenumber σ = 1/λ (m⁻¹):
 * E = hν = hc/λ = hcσ, ν = c/λ. Exact SI constants h and c (CODATA 2018,
 * SI 2019), so the only error is floating-point rounding (≤ 2 ulp).
 * Every input must be finite and > 0 (RangeError naming the parameter).
 *
 * @packageDocumentation
 */

import { C, H } from "../../values/constants";
import { requirePositive } from "../../internal/checks";

const HC = H * C;

/**
 * Photon energy from vacuum wavelength, E = hc/λ, J.
 * @example
 * ```ts
 * photonEnergyFromVacuumWavelengthSI(500e-9); // 3.9729e-19 J
 * ```
 */
export function photonEnergyFromVacuumWavelengthSI(wavelengthM: number): number {
  return photonEnergyFromWavelengthUnchecked(requirePositive("wavelengthM", wavelengthM, "m"));
}

/** {@link photonEnergyFromVacuumWavelengthSI} without the input check (wavelengthM finite, > 0 assumed). @internal */
export function photonEnergyFromWavelengthUnchecked(wavelengthM: number): number {
  return HC / wavelengthM;
}

/**
 * Vacuum wavelength from photon energy, λ = hc/E, m.
 * @example
 * ```ts
 * wavelengthFromPhotonEnergySI(3.9729e-19); // ≈ 5e-7 m
 * ```
 */
export function wavelengthFromPhotonEnergySI(energyJ: number): number {
  return wavelengthFromPhotonEnergyUnchecked(requirePositive("energyJ", energyJ, "J"));
}

/** {@link wavelengthFromPhotonEnergySI} without the input check (energyJ finite, > 0 assumed). @internal */
export function wavelengthFromPhotonEnergyUnchecked(energyJ: number): number {
  return HC / energyJ;
}

/**
 * Frequency from vacuum wavelength, ν = c/λ, Hz.
 * @example
 * ```ts
 * frequencyFromWavelengthSI(1); // 299792458 Hz
 * ```
 */
export function frequencyFromWavelengthSI(wavelengthM: number): number {
  return frequencyFromWavelengthUnchecked(requirePositive("wavelengthM", wavelengthM, "m"));
}

/** {@link frequencyFromWavelengthSI} without the input check (wavelengthM finite, > 0 assumed). @internal */
export function frequencyFromWavelengthUnchecked(wavelengthM: number): number {
  return C / wavelengthM;
}

/**
 * Vacuum wavelength from frequency, λ = c/ν, m.
 * @example
 * ```ts
 * wavelengthFromFrequencySI(1.420405751768e9); // 21-cm line, 0.2110 m
 * ```
 */
export function wavelengthFromFrequencySI(frequencyHz: number): number {
  return wavelengthFromFrequencyUnchecked(requirePositive("frequencyHz", frequencyHz, "Hz"));
}

/** {@link wavelengthFromFrequencySI} without the input check (frequencyHz finite, > 0 assumed). @internal */
export function wavelengthFromFrequencyUnchecked(frequencyHz: number): number {
  return C / frequencyHz;
}

/**
 * Vacuum wavenumber from vacuum wavelength, σ = 1/λ, m⁻¹.
 * @example
 * ```ts
 * wavenumberFromWavelengthSI(1e-6); // 1e6 m^-1
 * ```
 */
export function wavenumberFromWavelengthSI(wavelengthM: number): number {
  return wavenumberFromWavelengthUnchecked(requirePositive("wavelengthM", wavelengthM, "m"));
}

/** {@link wavenumberFromWavelengthSI} without the input check (wavelengthM finite, > 0 assumed). @internal */
export function wavenumberFromWavelengthUnchecked(wavelengthM: number): number {
  return 1 / wavelengthM;
}

/**
 * Vacuum wavelength from vacuum wavenumber, λ = 1/σ, m.
 * @example
 * ```ts
 * wavelengthFromWavenumberSI(1e6); // 1e-6 m
 * ```
 */
export function wavelengthFromWavenumberSI(wavenumberPerM: number): number {
  return wavelengthFromWavenumberUnchecked(requirePositive("wavenumberPerM", wavenumberPerM, "m^-1"));
}

/** {@link wavelengthFromWavenumberSI} without the input check (wavenumberPerM finite, > 0 assumed). @internal */
export function wavelengthFromWavenumberUnchecked(wavenumberPerM: number): number {
  return 1 / wavenumberPerM;
}

/**
 * Photon energy from frequency, E = hν, J.
 * @example
 * ```ts
 * photonEnergyFromFrequencySI(1e15); // 6.62607015e-19 J
 * ```
 */
export function photonEnergyFromFrequencySI(frequencyHz: number): number {
  return photonEnergyFromFrequencyUnchecked(requirePositive("frequencyHz", frequencyHz, "Hz"));
}

/** {@link photonEnergyFromFrequencySI} without the input check (frequencyHz finite, > 0 assumed). @internal */
export function photonEnergyFromFrequencyUnchecked(frequencyHz: number): number {
  return H * frequencyHz;
}

/**
 * Frequency from photon energy, ν = E/h, Hz.
 * @example
 * ```ts
 * frequencyFromPhotonEnergySI(6.62607015e-19); // 1e15 Hz
 * ```
 */
export function frequencyFromPhotonEnergySI(energyJ: number): number {
  return frequencyFromPhotonEnergyUnchecked(requirePositive("energyJ", energyJ, "J"));
}

/** {@link frequencyFromPhotonEnergySI} without the input check (energyJ finite, > 0 assumed). @internal */
export function frequencyFromPhotonEnergyUnchecked(energyJ: number): number {
  return energyJ / H;
}

/**
 * Photon energy from vacuum wavenumber, E = hcσ, J.
 * @example
 * ```ts
 * photonEnergyFromWavenumberSI(1e6); // 1.98645e-19 J
 * ```
 */
export function photonEnergyFromWavenumberSI(wavenumberPerM: number): number {
  return photonEnergyFromWavenumberUnchecked(requirePositive("wavenumberPerM", wavenumberPerM, "m^-1"));
}

/** {@link photonEnergyFromWavenumberSI} without the input check (wavenumberPerM finite, > 0 assumed). @internal */
export function photonEnergyFromWavenumberUnchecked(wavenumberPerM: number): number {
  return HC * wavenumberPerM;
}

/**
 * Vacuum wavenumber from photon energy, σ = E/(hc), m⁻¹.
 * @example
 * ```ts
 * wavenumberFromPhotonEnergySI(1.98644586e-19); // ≈ 1e6 m^-1
 * ```
 */
export function wavenumberFromPhotonEnergySI(energyJ: number): number {
  return wavenumberFromPhotonEnergyUnchecked(requirePositive("energyJ", energyJ, "J"));
}

/** {@link wavenumberFromPhotonEnergySI} without the input check (energyJ finite, > 0 assumed). @internal */
export function wavenumberFromPhotonEnergyUnchecked(energyJ: number): number {
  return energyJ / HC;
}

/**
 * Frequency from vacuum wavenumber, ν = cσ, Hz.
 * @example
 * ```ts
 * frequencyFromWavenumberSI(1); // 299792458 Hz
 * ```
 */
export function frequencyFromWavenumberSI(wavenumberPerM: number): number {
  return frequencyFromWavenumberUnchecked(requirePositive("wavenumberPerM", wavenumberPerM, "m^-1"));
}

/** {@link frequencyFromWavenumberSI} without the input check (wavenumberPerM finite, > 0 assumed). @internal */
export function frequencyFromWavenumberUnchecked(wavenumberPerM: number): number {
  return C * wavenumberPerM;
}

/**
 * Vacuum wavenumber from frequency, σ = ν/c, m⁻¹.
 * @example
 * ```ts
 * wavenumberFromFrequencySI(299792458); // 1 m^-1
 * ```
 */
export function wavenumberFromFrequencySI(frequencyHz: number): number {
  return wavenumberFromFrequencyUnchecked(requirePositive("frequencyHz", frequencyHz, "Hz"));
}

/** {@link wavenumberFromFrequencySI} without the input check (frequencyHz finite, > 0 assumed). @internal */
export function wavenumberFromFrequencyUnchecked(frequencyHz: number): number {
  return frequencyHz / C;
}
