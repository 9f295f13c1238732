/**
 * Wien's displacement law: where the blackbody spectrum peaks.
 *
 * The peak of a density ∝ uⁿ⁻¹·... /(eˣ−1) solves x = n(1 − e^−x), x = hc/(λkT)
 * or hν/(kT):
 * - n = 5: peak of B_λ (energy per unit wavelength), x₅ ≈ 4.965114;
 * - n = 3: peak of B_ν and of B_σ̃ (energy per unit frequency or wavenumber —
 *   the same peak, since ν = cσ̃ is a linear change of variable), x₃ ≈ 2.821439;
 * - n = 4: peak of the photon radiance per unit wavelength, x₄ ≈ 3.920690;
 * - n = 2: peak of the photon radiance per unit frequency / wavenumber, x₂ ≈ 1.593624.
 * The four roots are computed once, in src/values/wien-roots.ts (the same
 * roots behind the typed constants `constants.wienB` and `constants.wienBPrime`),
 * and imported here so that kernels and constants share one value; the
 * displacement constants follow: b = c₂/x₅ (m K), b′ = x₃k/h (Hz K^-1).
 * {@link solveWienPeakX} solves the same equation for any other n.
 *
 * **λ_peak · ν_peak ≠ c.** B_λ and B_ν are densities per unit wavelength and
 * per unit frequency; they are related by the Jacobian |dν/dλ| = c/λ²
 * (B_λ = B_ν c/λ²), which is not constant, so it moves the maximum:
 * λ_peak = hc/(x₅kT) while c/ν_peak = hc/(x₃kT), about 1.76 times longer.
 * Neither is "the" peak; each belongs to its own density.
 *
 * Source: W. Wien, Sitzungsber. Preuss. Akad. Wiss. (1893); CODATA 2018
 * (which prints b = 2.897 771 955... × 10^-3 m K and
 * b′ = 5.878 925 757... × 10^10 Hz K^-1).
 */
import { C, C2, H, K_B } from "../../values/constants";
import {
  WIEN_X_ENERGY_FREQUENCY,
  WIEN_X_ENERGY_WAVELENGTH,
  WIEN_X_PHOTON_FREQUENCY as X2,
  WIEN_X_PHOTON_WAVELENGTH as X4,
} from "../../values/wien-roots";
import { requireInRange, requirePositive } from "../../internal/checks";

/**
 * Positive root of x = n(1 − e^−x) for n > 1 (Newton's method from x₀ = n;
 * f(x) = x − n + n e^−x, f′(x) = 1 − n e^−x, which is positive near the root).
 *
 * @param n - the exponent of the density (5, 4, 3, 2 for the usual peaks); finite, 1 < n ≤ 1e6
 * @returns x (dimensionless)
 * @throws RangeError when n is outside (1, 1e6]
 * @example
 * ```ts
 * solveWienPeakX(5); // 4.965114231744276
 * ```
 */
export function solveWienPeakX(n: number): number {
  requireInRange("n", n, 1, 1e6, "(dimensionless; must exceed 1)");
  if (n === 1) throw new RangeError("n must be > 1 (dimensionless); got 1");
  // For n near 1 the root is near 0: start from 2(n−1) there, else from n.
  let x = n < 1.5 ? 2 * (n - 1) : n;
  for (let i = 0; i < 100; i++) {
    const e = Math.exp(-x);
    const f = x - n + n * e;
    const fp = 1 - n * e;
    const dx = f / fp;
    x -= dx;
    if (Math.abs(dx) <= 1e-17 * x) break;
  }
  return x;
}

/** x₅: peak of B_λ (energy per unit wavelength); from src/values/wien-roots.ts. */
export const WIEN_X_WAVELENGTH = WIEN_X_ENERGY_WAVELENGTH;
/** x₃: peak of B_ν and of B_σ̃ (energy per unit frequency or wavenumber); from src/values/wien-roots.ts. */
export const WIEN_X_FREQUENCY = WIEN_X_ENERGY_FREQUENCY;
/** x₄: peak of the photon radiance per unit wavelength; from src/values/wien-roots.ts. */
export const WIEN_X_PHOTON_WAVELENGTH = X4;
/** x₂: peak of the photon radiance per unit frequency or wavenumber; from src/values/wien-roots.ts. */
export const WIEN_X_PHOTON_FREQUENCY = X2;

/** Wien wavelength displacement constant b = c₂/x₅, m K (CODATA 2018: 2.897 771 955e-3). */
export const WIEN_B_WAVELENGTH = C2 / WIEN_X_WAVELENGTH;
/** Wien frequency displacement constant b′ = x₃k/h, Hz K^-1 (CODATA 2018: 5.878 925 757e10). */
export const WIEN_B_FREQUENCY = (WIEN_X_FREQUENCY * K_B) / H;
/** Wavenumber displacement constant x₃k/(hc), m^-1 K^-1. */
export const WIEN_B_WAVENUMBER = (WIEN_X_FREQUENCY * K_B) / (H * C);
/** Photon-count wavelength displacement constant c₂/x₄, m K. */
export const WIEN_B_PHOTON_WAVELENGTH = C2 / WIEN_X_PHOTON_WAVELENGTH;
/** Photon-count frequency displacement constant x₂k/h, Hz K^-1. */
export const WIEN_B_PHOTON_FREQUENCY = (WIEN_X_PHOTON_FREQUENCY * K_B) / H;
/** Photon-count wavenumber displacement constant x₂k/(hc), m^-1 K^-1. */
export const WIEN_B_PHOTON_WAVENUMBER = (WIEN_X_PHOTON_FREQUENCY * K_B) / (H * C);

/** {@link peakWavelengthSI} without input checks: 0 or +Infinity where the true value leaves the double range. @internal */
export function wienPeakWavelengthUnchecked(temperatureK: number): number {
  return WIEN_B_WAVELENGTH / temperatureK;
}

/** {@link peakFrequencySI} without input checks: 0 or +Infinity where the true value leaves the double range. @internal */
export function wienPeakFrequencyUnchecked(temperatureK: number): number {
  return WIEN_B_FREQUENCY * temperatureK;
}

/** {@link peakWavenumberSI} without input checks: 0 or +Infinity where the true value leaves the double range. @internal */
export function wienPeakWavenumberUnchecked(temperatureK: number): number {
  return WIEN_B_WAVENUMBER * temperatureK;
}

/** {@link photonPeakWavelengthSI} without input checks: 0 or +Infinity where the true value leaves the double range. @internal */
export function wienPhotonPeakWavelengthUnchecked(temperatureK: number): number {
  return WIEN_B_PHOTON_WAVELENGTH / temperatureK;
}

/** {@link photonPeakFrequencySI} without input checks: 0 or +Infinity where the true value leaves the double range. @internal */
export function wienPhotonPeakFrequencyUnchecked(temperatureK: number): number {
  return WIEN_B_PHOTON_FREQUENCY * temperatureK;
}

/** {@link photonPeakWavenumberSI} without input checks: 0 or +Infinity where the true value leaves the double range. @internal */
export function wienPhotonPeakWavenumberUnchecked(temperatureK: number): number {
  return WIEN_B_PHOTON_WAVENUMBER * temperatureK;
}

/** {@link temperatureFromPeakWavelengthSI} without input checks: 0 or +Infinity where the true value leaves the double range. @internal */
export function temperatureFromPeakWavelengthUnchecked(peakWavelengthM: number): number {
  return WIEN_B_WAVELENGTH / peakWavelengthM;
}

/** {@link temperatureFromPeakFrequencySI} without input checks: 0 or +Infinity where the true value leaves the double range. @internal */
export function temperatureFromPeakFrequencyUnchecked(peakFrequencyHz: number): number {
  return peakFrequencyHz / WIEN_B_FREQUENCY;
}

/** {@link temperatureFromPeakWavenumberSI} without input checks: 0 or +Infinity where the true value leaves the double range. @internal */
export function temperatureFromPeakWavenumberUnchecked(peakWavenumberPerM: number): number {
  return peakWavenumberPerM / WIEN_B_WAVENUMBER;
}

/** {@link temperatureFromPhotonPeakWavelengthSI} without input checks: 0 or +Infinity where the true value leaves the double range. @internal */
export function temperatureFromPhotonPeakWavelengthUnchecked(peakWavelengthM: number): number {
  return WIEN_B_PHOTON_WAVELENGTH / peakWavelengthM;
}

/** {@link temperatureFromPhotonPeakFrequencySI} without input checks: 0 or +Infinity where the true value leaves the double range. @internal */
export function temperatureFromPhotonPeakFrequencyUnchecked(peakFrequencyHz: number): number {
  return peakFrequencyHz / WIEN_B_PHOTON_FREQUENCY;
}

/** {@link temperatureFromPhotonPeakWavenumberSI} without input checks: 0 or +Infinity where the true value leaves the double range. @internal */
export function temperatureFromPhotonPeakWavenumberUnchecked(peakWavenumberPerM: number): number {
  return peakWavenumberPerM / WIEN_B_PHOTON_WAVENUMBER;
}

/** `v`, or the checked kernels' RangeError when it left the double range (the message is built only then). */
function finite(v: number, what: string, name: string, value: number, unit: string): number {
  if (v === Infinity || v === 0) {
    throw new RangeError(`${what} is outside the double range for ${name}=${value} ${unit}`);
  }
  return v;
}

/**
 * Wavelength of the maximum of B_λ: λ_max = b/T with b = c₂/x₅.
 *
 * @param temperatureK - temperature T, K (finite, > 0)
 * @returns λ_max, m
 * @throws RangeError for bad input (or a subnormal T whose λ_max overflows)
 * Source: Wien's displacement law; CODATA 2018 b.
 * @example
 * ```ts
 * peakWavelengthSI(5772); // ≈ 5.020e-7 m (502 nm)
 * ```
 */
export function peakWavelengthSI(temperatureK: number): number {
  requirePositive("temperature", temperatureK, "K");
  return finite(wienPeakWavelengthUnchecked(temperatureK), "peak wavelength", "temperature", temperatureK, "K");
}

/**
 * Frequency of the maximum of B_ν: ν_max = b′T, b′ = x₃k/h. Note
 * c/ν_max ≠ λ_max (see module notes).
 *
 * @param temperatureK - temperature T, K (finite, > 0)
 * @returns ν_max, Hz
 * @throws RangeError for bad input
 * Source: Wien's displacement law; CODATA 2018 b′.
 * @example
 * ```ts
 * peakFrequencySI(5772); // ≈ 3.393e14 Hz
 * ```
 */
export function peakFrequencySI(temperatureK: number): number {
  requirePositive("temperature", temperatureK, "K");
  return finite(wienPeakFrequencyUnchecked(temperatureK), "peak frequency", "temperature", temperatureK, "K");
}

/**
 * Wavenumber of the maximum of B_σ̃: σ̃_max = x₃kT/(hc) = ν_max/c (the
 * wavenumber peak coincides with the frequency peak).
 *
 * @param temperatureK - temperature T, K (finite, > 0)
 * @returns σ̃_max, m^-1
 * @throws RangeError for bad input
 * Source: Wien's displacement law.
 * @example
 * ```ts
 * peakWavenumberSI(300); // ≈ 5.88e4 m^-1 (588 cm^-1)
 * ```
 */
export function peakWavenumberSI(temperatureK: number): number {
  requirePositive("temperature", temperatureK, "K");
  return finite(wienPeakWavenumberUnchecked(temperatureK), "peak wavenumber", "temperature", temperatureK, "K");
}

/**
 * Wavelength of the maximum of the photon radiance N_λ: c₂/(x₄T).
 *
 * @param temperatureK - temperature T, K (finite, > 0)
 * @returns m
 * @throws RangeError for bad input
 * Source: Wien's displacement law for photon counts (n = 4).
 * @example
 * ```ts
 * photonPeakWavelengthSI(5772); // ≈ 6.36e-7 m
 * ```
 */
export function photonPeakWavelengthSI(temperatureK: number): number {
  requirePositive("temperature", temperatureK, "K");
  return finite(wienPhotonPeakWavelengthUnchecked(temperatureK), "photon peak wavelength", "temperature", temperatureK, "K");
}

/**
 * Frequency of the maximum of the photon radiance N_ν: x₂kT/h.
 *
 * @param temperatureK - temperature T, K (finite, > 0)
 * @returns Hz
 * @throws RangeError for bad input
 * Source: Wien's displacement law for photon counts (n = 2).
 * @example
 * ```ts
 * photonPeakFrequencySI(5772);
 * ```
 */
export function photonPeakFrequencySI(temperatureK: number): number {
  requirePositive("temperature", temperatureK, "K");
  return finite(wienPhotonPeakFrequencyUnchecked(temperatureK), "photon peak frequency", "temperature", temperatureK, "K");
}

/**
 * Wavenumber of the maximum of the photon radiance N_σ̃: x₂kT/(hc).
 *
 * @param temperatureK - temperature T, K (finite, > 0)
 * @returns m^-1
 * @throws RangeError for bad input
 * Source: Wien's displacement law for photon counts (n = 2).
 * @example
 * ```ts
 * photonPeakWavenumberSI(5772);
 * ```
 */
export function photonPeakWavenumberSI(temperatureK: number): number {
  requirePositive("temperature", temperatureK, "K");
  return finite(wienPhotonPeakWavenumberUnchecked(temperatureK), "photon peak wavenumber", "temperature", temperatureK, "K");
}

/**
 * Temperature whose B_λ peaks at the given wavelength: T = b/λ_max.
 *
 * @param peakWavelengthM - λ_max, m (finite, > 0)
 * @returns T, K
 * @throws RangeError for bad input
 * Source: Wien's displacement law.
 * @example
 * ```ts
 * temperatureFromPeakWavelengthSI(502e-9); // ≈ 5772 K
 * ```
 */
export function temperatureFromPeakWavelengthSI(peakWavelengthM: number): number {
  requirePositive("peakWavelength", peakWavelengthM, "m");
  return finite(temperatureFromPeakWavelengthUnchecked(peakWavelengthM), "temperature", "peakWavelength", peakWavelengthM, "m");
}

/**
 * Temperature whose B_ν peaks at the given frequency: T = ν_max/b′.
 *
 * @param peakFrequencyHz - ν_max, Hz (finite, > 0)
 * @returns T, K
 * @throws RangeError for bad input
 * Source: Wien's displacement law.
 * @example
 * ```ts
 * temperatureFromPeakFrequencySI(1.6e11); // ≈ 2.72 K (CMB)
 * ```
 */
export function temperatureFromPeakFrequencySI(peakFrequencyHz: number): number {
  requirePositive("peakFrequency", peakFrequencyHz, "Hz");
  return finite(temperatureFromPeakFrequencyUnchecked(peakFrequencyHz), "temperature", "peakFrequency", peakFrequencyHz, "Hz");
}

/**
 * Temperature whose B_σ̃ peaks at the given wavenumber: T = σ̃_max·hc/(x₃k).
 *
 * @param peakWavenumberPerM - σ̃_max, m^-1 (finite, > 0)
 * @returns T, K
 * @throws RangeError for bad input
 * Source: Wien's displacement law.
 * @example
 * ```ts
 * temperatureFromPeakWavenumberSI(58800); // ≈ 300 K
 * ```
 */
export function temperatureFromPeakWavenumberSI(peakWavenumberPerM: number): number {
  requirePositive("peakWavenumber", peakWavenumberPerM, "m^-1");
  return finite(temperatureFromPeakWavenumberUnchecked(peakWavenumberPerM), "temperature", "peakWavenumber", peakWavenumberPerM, "m^-1");
}

/**
 * Temperature whose photon radiance N_λ peaks at the given wavelength: T = c₂/(x₄λ).
 *
 * @param peakWavelengthM - photon-count peak wavelength, m (finite, > 0)
 * @returns T, K
 * @throws RangeError for bad input
 * @example
 * ```ts
 * temperatureFromPhotonPeakWavelengthSI(636e-9);
 * ```
 */
export function temperatureFromPhotonPeakWavelengthSI(peakWavelengthM: number): number {
  requirePositive("peakWavelength", peakWavelengthM, "m");
  return finite(temperatureFromPhotonPeakWavelengthUnchecked(peakWavelengthM), "temperature", "peakWavelength", peakWavelengthM, "m");
}

/**
 * Temperature whose photon radiance N_ν peaks at the given frequency: T = hν/(x₂k).
 *
 * @param peakFrequencyHz - photon-count peak frequency, Hz (finite, > 0)
 * @returns T, K
 * @throws RangeError for bad input
 * @example
 * ```ts
 * temperatureFromPhotonPeakFrequencySI(1.9e14);
 * ```
 */
export function temperatureFromPhotonPeakFrequencySI(peakFrequencyHz: number): number {
  requirePositive("peakFrequency", peakFrequencyHz, "Hz");
  return finite(temperatureFromPhotonPeakFrequencyUnchecked(peakFrequencyHz), "temperature", "peakFrequency", peakFrequencyHz, "Hz");
}

/**
 * Temperature whose photon radiance N_σ̃ peaks at the given wavenumber: T = hcσ̃/(x₂k).
 *
 * @param peakWavenumberPerM - photon-count peak wavenumber, m^-1 (finite, > 0)
 * @returns T, K
 * @throws RangeError for bad input
 * @example
 * ```ts
 * temperatureFromPhotonPeakWavenumberSI(6.4e5);
 * ```
 */
export function temperatureFromPhotonPeakWavenumberSI(peakWavenumberPerM: number): number {
  requirePositive("peakWavenumber", peakWavenumberPerM, "m^-1");
  return finite(temperatureFromPhotonPeakWavenumberUnchecked(peakWavenumberPerM), "temperature", "peakWavenumber", peakWavenumberPerM, "m^-1");
}
