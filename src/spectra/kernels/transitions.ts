/**
 * Transitions between levels of hydrogen-like ions: energy (J), vacuum
 * wavenumber (m⁻¹), frequency (Hz) and vacuum wavelength (m); the named
 * hydrogen series (Lyman … Humphreys) and their limits; ionization energies.
 *
 * Bohr transitions use E = h c R∞ Z² (μ/m_e) (1/n₁² − 1/n₂²), with the
 * bracket evaluated as (n₂ − n₁)(n₂ + n₁)/(n₁² n₂²) to avoid cancellation.
 * Dirac transitions use the levels of hydrogen-like.ts. Wavelengths are in
 * vacuum; use air-vacuum.ts for air wavelengths.
 *
 * @packageDocumentation
 */

import { C, H, RYDBERG } from "../../values/constants";
import { show } from "../../internal/checks";
import {
  diracFMinusOne,
  diracLevelCentroidEnergyUnchecked,
  reducedMassRatioUnchecked,
  reducedMassUnchecked,
  requireJ,
  requireNuclearCharge,
  requireNuclearMass,
  requireQuantumNumber,
} from "./hydrogen-like";

/** Throw a RangeError unless nLower and nUpper are integers ≥ 1 with nLower < nUpper. @internal */
export function requireOrdered(nLower: number, nUpper: number): void {
  requireQuantumNumber("nLower", nLower);
  requireQuantumNumber("nUpper", nUpper);
  if (!(nLower < nUpper)) {
    throw new RangeError(`nUpper must be greater than nLower (${nLower}); got ${show(nUpper)}`);
  }
}

/**
 * Vacuum wavenumber of the Bohr transition n_lower → n_upper,
 * σ = R∞ Z² (μ/m_e) (1/n_l² − 1/n_u²), m⁻¹.
 *
 * @param nLower lower principal quantum number (integer ≥ 1)
 * @param nUpper upper principal quantum number (integer > nLower)
 * @param z nuclear charge number (1–137)
 * @param nuclearMassKg nuclear mass, kg (Infinity allowed)
 * @example
 * ```ts
 * transitionWavenumberSI(1, 2, 1, PROTON_MASS_KG); // Lyman α ≈ 8.2259e6 m^-1
 * ```
 */
export function transitionWavenumberSI(nLower: number, nUpper: number, z: number, nuclearMassKg: number): number {
  requireOrdered(nLower, nUpper);
  requireNuclearCharge(z);
  return transitionWavenumberUnchecked(nLower, nUpper, z, requireNuclearMass(nuclearMassKg));
}

/** {@link transitionWavenumberSI} without the checks (levels ordered, Z and M valid). @internal */
export function transitionWavenumberUnchecked(nLower: number, nUpper: number, z: number, nuclearMassKg: number): number {
  // 1/n_l² − 1/n_u² = [(n_u − n_l)/n_u]·[1 + n_l/n_u]/n_l², divided by n_l
  // twice last: no square is formed, so n_u up to 1.8e308 gives the series
  // limit, and huge n_l underflow gradually instead of giving NaN.
  const k = RYDBERG * z * z * reducedMassRatioUnchecked(nuclearMassKg);
  return ((k * ((nUpper - nLower) / nUpper)) / nLower) * ((1 + nLower / nUpper) / nLower);
}

/** 1/σ of the Bohr transition, m, formed as n_l/(K a) · n_l/b so that it stays finite wherever it is a double. @internal */
function bohrWavelength(nLower: number, nUpper: number, z: number, nuclearMassKg: number): number {
  const k = RYDBERG * z * z * reducedMassRatioUnchecked(nuclearMassKg);
  return (nLower / (k * ((nUpper - nLower) / nUpper))) * (nLower / (1 + nLower / nUpper));
}

/**
 * Energy of the Bohr transition, E = h c σ, J. Parameters as
 * {@link transitionWavenumberSI}.
 *
 * @example
 * ```ts
 * transitionEnergySI(2, 3, 1, PROTON_MASS_KG); // Hα ≈ 3.026e-19 J
 * ```
 */
export function transitionEnergySI(nLower: number, nUpper: number, z: number, nuclearMassKg: number): number {
  return H * C * transitionWavenumberSI(nLower, nUpper, z, nuclearMassKg);
}

/** {@link transitionEnergySI} without the checks. @internal */
export function transitionEnergyUnchecked(nLower: number, nUpper: number, z: number, nuclearMassKg: number): number {
  return H * C * transitionWavenumberUnchecked(nLower, nUpper, z, nuclearMassKg);
}

/**
 * Frequency of the Bohr transition, ν = c σ, Hz.
 *
 * @example
 * ```ts
 * transitionFrequencySI(1, 2, 1, PROTON_MASS_KG); // ≈ 2.466e15 Hz
 * ```
 */
export function transitionFrequencySI(nLower: number, nUpper: number, z: number, nuclearMassKg: number): number {
  return C * transitionWavenumberSI(nLower, nUpper, z, nuclearMassKg);
}

/** {@link transitionFrequencySI} without the checks. @internal */
export function transitionFrequencyUnchecked(nLower: number, nUpper: number, z: number, nuclearMassKg: number): number {
  return C * transitionWavenumberUnchecked(nLower, nUpper, z, nuclearMassKg);
}

/**
 * Vacuum wavelength of the Bohr transition, λ = 1/σ, m.
 *
 * @example
 * ```ts
 * transitionVacuumWavelengthSI(2, 3, 1, PROTON_MASS_KG); // Hα ≈ 6.5647e-7 m
 * ```
 */
export function transitionVacuumWavelengthSI(nLower: number, nUpper: number, z: number, nuclearMassKg: number): number {
  requireOrdered(nLower, nUpper);
  requireNuclearCharge(z);
  return bohrWavelength(nLower, nUpper, z, requireNuclearMass(nuclearMassKg));
}

/** {@link transitionVacuumWavelengthSI} without the checks. @internal */
export function transitionVacuumWavelengthUnchecked(nLower: number, nUpper: number, z: number, nuclearMassKg: number): number {
  return bohrWavelength(nLower, nUpper, z, nuclearMassKg);
}

/**
 * Energy of the transition between Dirac levels (n_l, j_l) → (n_u, j_u),
 * E = μc² [f(n_u, j_u) − f(n_l, j_l)], J (see diracLevelEnergySI for the
 * formula and what it omits). Levels are ordered by (n, j); the lower level
 * must come first (same n with j_u > j_l is a fine-structure transition).
 *
 * @example
 * ```ts
 * diracTransitionEnergySI(2, 0.5, 3, 1.5, 1, PROTON_MASS_KG); // Hα component 2p½–3d3/2
 * ```
 */
export function diracTransitionEnergySI(
  nLower: number,
  jLower: number,
  nUpper: number,
  jUpper: number,
  z: number,
  nuclearMassKg: number,
): number {
  requireQuantumNumber("nLower", nLower);
  requireQuantumNumber("nUpper", nUpper);
  requireJ("jLower", jLower, nLower);
  requireJ("jUpper", jUpper, nUpper);
  requireNuclearCharge(z);
  requireLevelAbove(nLower, jLower, nUpper, jUpper);
  return diracTransitionEnergyUnchecked(nLower, jLower, nUpper, jUpper, z, requireNuclearMass(nuclearMassKg));
}

/** Throw a RangeError unless (nUpper, jUpper) is above (nLower, jLower) (both levels already valid). @internal */
export function requireLevelAbove(nLower: number, jLower: number, nUpper: number, jUpper: number): void {
  if (!(nLower < nUpper || (nLower === nUpper && jLower < jUpper))) {
    throw new RangeError(
      `nUpper, jUpper must name a level above (nLower, jLower) = (${nLower}, ${jLower}); got (${show(nUpper)}, ${show(jUpper)})`,
    );
  }
}

/** {@link diracTransitionEnergySI} without the checks. @internal */
export function diracTransitionEnergyUnchecked(
  nLower: number,
  jLower: number,
  nUpper: number,
  jUpper: number,
  z: number,
  nuclearMassKg: number,
): number {
  const mc2 = reducedMassUnchecked(nuclearMassKg) * C * C;
  return mc2 * (diracFMinusOne(nUpper, jUpper, z) - diracFMinusOne(nLower, jLower, z));
}

/**
 * Energy between the statistical-weight centroids of the Dirac fine-structure
 * levels of shells n_l and n_u (diracLevelCentroidEnergySI), J: an estimate
 * of the centre of gravity of an unresolved hydrogenic multiplet such as Hα.
 *
 * @example
 * ```ts
 * diracCentroidTransitionEnergySI(2, 3, 1, PROTON_MASS_KG);
 * ```
 */
export function diracCentroidTransitionEnergySI(nLower: number, nUpper: number, z: number, nuclearMassKg: number): number {
  requireOrdered(nLower, nUpper);
  requireNuclearCharge(z);
  return diracCentroidTransitionEnergyUnchecked(nLower, nUpper, z, requireNuclearMass(nuclearMassKg));
}

/** {@link diracCentroidTransitionEnergySI} without the checks. @internal */
export function diracCentroidTransitionEnergyUnchecked(nLower: number, nUpper: number, z: number, nuclearMassKg: number): number {
  return diracLevelCentroidEnergyUnchecked(nUpper, z, nuclearMassKg) - diracLevelCentroidEnergyUnchecked(nLower, z, nuclearMassKg);
}

/**
 * Ionization energy from level n in the Bohr model,
 * I_n = h c R∞ Z² (μ/m_e) / n², J (positive).
 *
 * @example
 * ```ts
 * ionizationEnergySI(1, 1, PROTON_MASS_KG) / 1.602176634e-19; // 13.598 287 eV
 * ```
 */
export function ionizationEnergySI(n: number, z: number, nuclearMassKg: number): number {
  requireQuantumNumber("n", n);
  requireNuclearCharge(z);
  return ionizationEnergyUnchecked(n, z, requireNuclearMass(nuclearMassKg));
}

/** {@link ionizationEnergySI} without the checks. @internal */
export function ionizationEnergyUnchecked(n: number, z: number, nuclearMassKg: number): number {
  return (H * C * RYDBERG * z * z * reducedMassRatioUnchecked(nuclearMassKg)) / n / n;
}

/** Names of the hydrogen series and their lower levels n₁. */
export const HYDROGEN_SERIES = Object.freeze({
  lyman: 1,
  balmer: 2,
  paschen: 3,
  brackett: 4,
  pfund: 5,
  humphreys: 6,
} as const);

/** A named series: Lyman (n₁ = 1), Balmer (2), Paschen (3), Brackett (4), Pfund (5), Humphreys (6); the keys of {@link hydrogenSeries}. */
export type SeriesName = keyof typeof HYDROGEN_SERIES;

/**
 * Lower level n₁ of a named series. Throws RangeError for an unknown name.
 *
 * @example
 * ```ts
 * seriesLowerLevel("balmer"); // 2
 * ```
 */
export function seriesLowerLevel(series: SeriesName): number {
  const n = Object.prototype.hasOwnProperty.call(HYDROGEN_SERIES, series)
    ? HYDROGEN_SERIES[series]
    : undefined;
  if (n === undefined) {
    throw new RangeError(
      `series must be one of ${Object.keys(HYDROGEN_SERIES).join(", ")}; got ${JSON.stringify(series)}`,
    );
  }
  return n;
}

/**
 * Vacuum wavelength of the line of a named series with upper level nUpper
 * (Bohr model with reduced mass), m.
 *
 * @example
 * ```ts
 * seriesLineVacuumWavelengthSI("balmer", 3, 1, PROTON_MASS_KG); // Hα ≈ 656.47 nm
 * ```
 */
export function seriesLineVacuumWavelengthSI(series: SeriesName, nUpper: number, z: number, nuclearMassKg: number): number {
  return transitionVacuumWavelengthSI(seriesLowerLevel(series), nUpper, z, nuclearMassKg);
}

/**
 * Energy of the line of a named series with upper level nUpper, J.
 *
 * @example
 * ```ts
 * seriesLineEnergySI("lyman", 2, 1, PROTON_MASS_KG);
 * ```
 */
export function seriesLineEnergySI(series: SeriesName, nUpper: number, z: number, nuclearMassKg: number): number {
  return transitionEnergySI(seriesLowerLevel(series), nUpper, z, nuclearMassKg);
}

/**
 * Series limit (n_upper → ∞) energy of a named series: the ionization energy
 * of its lower level, J.
 *
 * @example
 * ```ts
 * seriesLimitEnergySI("lyman", 1, PROTON_MASS_KG); // = ionizationEnergySI(1, …)
 * ```
 */
export function seriesLimitEnergySI(series: SeriesName, z: number, nuclearMassKg: number): number {
  return ionizationEnergySI(seriesLowerLevel(series), z, nuclearMassKg);
}

/**
 * Series-limit vacuum wavelength, λ∞ = n₁² / (R∞ Z² μ/m_e), m.
 *
 * @example
 * ```ts
 * seriesLimitVacuumWavelengthSI("lyman", 1, PROTON_MASS_KG); // ≈ 91.18 nm
 * ```
 */
export function seriesLimitVacuumWavelengthSI(series: SeriesName, z: number, nuclearMassKg: number): number {
  const n1 = seriesLowerLevel(series);
  requireNuclearCharge(z);
  return seriesLimitVacuumWavelengthUnchecked(n1, z, requireNuclearMass(nuclearMassKg));
}

/** {@link seriesLimitVacuumWavelengthSI} for lower level n₁, without the checks. @internal */
export function seriesLimitVacuumWavelengthUnchecked(n1: number, z: number, nuclearMassKg: number): number {
  return (n1 / (RYDBERG * z * z * reducedMassRatioUnchecked(nuclearMassKg))) * n1;
}

/**
 * Vacuum wavelengths of the first `count` lines of a named series
 * (n_upper = n₁ + 1 … n₁ + count), m, written into a new Float64Array.
 *
 * @example
 * ```ts
 * seriesVacuumWavelengthsSI("balmer", 4, 1, PROTON_MASS_KG); // Hα, Hβ, Hγ, Hδ
 * ```
 */
export function seriesVacuumWavelengthsSI(series: SeriesName, count: number, z: number, nuclearMassKg: number): Float64Array {
  const n1 = seriesLowerLevel(series);
  if (!Number.isInteger(count) || count < 1) {
    throw new RangeError(`count must be an integer >= 1; got ${show(count)}`);
  }
  const out = new Float64Array(count);
  for (let i = 0; i < count; i++) out[i] = transitionVacuumWavelengthSI(n1, n1 + 1 + i, z, nuclearMassKg);
  return out;
}
