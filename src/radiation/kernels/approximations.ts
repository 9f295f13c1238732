/**
 * The two classical limits of Planck's law and their exact relative errors.
 *
 * With x = hc/(λkT) = hν/(kT) and B the exact Planck radiance:
 * - Rayleigh–Jeans (x ≪ 1): B_RJ = B·(eˣ−1)/x, so
 *   (B_RJ − B)/B = (eˣ − 1 − x)/x = expm1(x)/x − 1 (always > 0: RJ overestimates);
 * - Wien (x ≫ 1): B_W = B·(1 − e^−x), so (B_W − B)/B = −e^−x exactly
 *   (always < 0: Wien underestimates).
 * Sources: Rayleigh, Phil. Mag. 49, 539 (1900); Jeans, Phil. Mag. 10, 91
 * (1905); Wien, Ann. Phys. 294, 662 (1896).
 */
import { isPositiveFinite, requirePositive } from "../../internal/checks";
import {
  FORM_LAMBDA_ENERGY,
  FORM_NU_ENERGY,
  SHAPE_RJ,
  SHAPE_WIEN,
  computeX,
  overflowError,
  spectralCore,
} from "./planck-core";
import { dd } from "./exact";

function approx(shape: number, form: number, name: string, unit: string, u: number, T: number, what: string): number {
  requirePositive(name, u, unit);
  requirePositive("temperature", T, "K");
  const v = spectralCore(shape, form, u, T);
  if (v === Infinity) throw overflowError(what, `${name}=${u} ${unit}, temperature=${T} K`);
  return v;
}

/**
 * Rayleigh–Jeans spectral radiance per unit wavelength, B_λ ≈ 2ckT/λ⁴.
 *
 * @param wavelengthM - wavelength λ, m (finite, > 0)
 * @param temperatureK - temperature T, K (finite, > 0)
 * @returns W m^-2 sr^-1 m^-1
 * @throws RangeError for non-finite or non-positive input
 * Source: Rayleigh (1900), Jeans (1905).
 * @example
 * ```ts
 * const b = rayleighJeansRadianceWavelengthSI(0.01, 300);
 * ```
 */
export function rayleighJeansRadianceWavelengthSI(wavelengthM: number, temperatureK: number): number {
  return approx(SHAPE_RJ, FORM_LAMBDA_ENERGY, "wavelength", "m", wavelengthM, temperatureK, "Rayleigh–Jeans B_λ");
}

/**
 * Rayleigh–Jeans spectral radiance per unit frequency, B_ν ≈ 2ν²kT/c².
 *
 * @param frequencyHz - frequency ν, Hz (finite, > 0)
 * @param temperatureK - temperature T, K (finite, > 0)
 * @returns W m^-2 sr^-1 Hz^-1
 * @throws RangeError for non-finite or non-positive input
 * Source: Rayleigh (1900), Jeans (1905).
 * @example
 * ```ts
 * const b = rayleighJeansRadianceFrequencySI(1.4e9, 2.7255);
 * ```
 */
export function rayleighJeansRadianceFrequencySI(frequencyHz: number, temperatureK: number): number {
  return approx(SHAPE_RJ, FORM_NU_ENERGY, "frequency", "Hz", frequencyHz, temperatureK, "Rayleigh–Jeans B_ν");
}

/**
 * Wien's approximation per unit wavelength, B_λ ≈ (2hc²/λ⁵)·exp(−hc/(λkT)).
 *
 * @param wavelengthM - wavelength λ, m (finite, > 0)
 * @param temperatureK - temperature T, K (finite, > 0)
 * @returns W m^-2 sr^-1 m^-1 (0 on underflow)
 * @throws RangeError for non-finite or non-positive input
 * Source: Wien (1896).
 * @example
 * ```ts
 * const b = wienRadianceWavelengthSI(400e-9, 3000);
 * ```
 */
export function wienRadianceWavelengthSI(wavelengthM: number, temperatureK: number): number {
  return approx(SHAPE_WIEN, FORM_LAMBDA_ENERGY, "wavelength", "m", wavelengthM, temperatureK, "Wien B_λ");
}

/**
 * Wien's approximation per unit frequency, B_ν ≈ (2hν³/c²)·exp(−hν/(kT)).
 *
 * @param frequencyHz - frequency ν, Hz (finite, > 0)
 * @param temperatureK - temperature T, K (finite, > 0)
 * @returns W m^-2 sr^-1 Hz^-1 (0 on underflow)
 * @throws RangeError for non-finite or non-positive input
 * Source: Wien (1896).
 * @example
 * ```ts
 * const b = wienRadianceFrequencySI(1e15, 5772);
 * ```
 */
export function wienRadianceFrequencySI(frequencyHz: number, temperatureK: number): number {
  return approx(SHAPE_WIEN, FORM_NU_ENERGY, "frequency", "Hz", frequencyHz, temperatureK, "Wien B_ν");
}

/**
 * Relative error of the Rayleigh–Jeans law as a function of x = hν/(kT):
 * (B_RJ − B)/B = expm1(x)/x − 1 = Σ_{k≥1} x^k/(k+1)!, evaluated by its series for
 * x < 0.5 (no cancellation) and directly above; ≈ x/2 for small x.
 *
 * @param x - dimensionless hν/(kT) = hc/(λkT) (finite, > 0)
 * @returns the relative error (dimensionless, > 0)
 * @throws RangeError for x not finite or ≤ 0, or x ≳ 716 where the error itself exceeds the double range
 * @example
 * ```ts
 * rayleighJeansRelativeErrorFromX(0.01); // ≈ 0.005017
 * ```
 */
export function rayleighJeansRelativeErrorFromX(x: number): number {
  requirePositive("x", x, "(dimensionless)");
  const v = rjRelErr(x, 0);
  if (v === Infinity) {
    throw new RangeError(`x must be <= ~716 for the Rayleigh–Jeans relative error to fit a double; got ${x}`);
  }
  return v;
}

function rjRelErr(x: number, xl: number): number {
  let v: number;
  if (x < 0.5) {
    // Σ_{k≥1} x^k/(k+1)!; 25 terms reach 1e-17 relative at x = 0.5.
    let term = x / 2;
    v = term;
    for (let k = 2; k < 30; k++) {
      term *= x / (k + 1);
      v += term;
      if (term < 1e-17 * v) break;
    }
    // first-order correction for the low part of x: dv/dx = 1/2 + x/3 + …
    return v + xl * (0.5 + x / 3);
  }
  if (x <= 700) {
    const em1 = Math.expm1(x);
    v = em1 / x - 1;
    // dv/dx / v = ((x−1)(eˣ−1) + x) / (x(eˣ−1−x)) (→ (x−1)/x for large x)
    return v * (1 + (xl * ((x - 1) * em1 + x)) / (x * (em1 - x)));
  }
  v = Math.exp(x - Math.log(x));
  return v === Infinity ? v : v * (1 + (xl * (x - 1)) / x);
}

/**
 * Relative error of the Rayleigh–Jeans law at (λ, T): expm1(x)/x − 1 with
 * x = hc/(λkT) (x formed in double-double).
 *
 * @param wavelengthM - wavelength λ, m (finite, > 0)
 * @param temperatureK - temperature T, K (finite, > 0)
 * @returns (B_RJ − B)/B (dimensionless, > 0)
 * @throws RangeError for bad input or when the error exceeds the double range (x ≳ 716)
 * Source: exact ratio of the Rayleigh–Jeans and Planck laws.
 * @example
 * ```ts
 * rayleighJeansRelativeErrorWavelengthSI(1e-3, 300); // ≈ 0.0243 (x ≈ 0.048)
 * ```
 */
export function rayleighJeansRelativeErrorWavelengthSI(wavelengthM: number, temperatureK: number): number {
  requirePositive("wavelength", wavelengthM, "m");
  requirePositive("temperature", temperatureK, "K");
  computeX(FORM_LAMBDA_ENERGY, wavelengthM, temperatureK);
  return rjFromDD();
}

/**
 * Relative error of the Rayleigh–Jeans law at (ν, T): expm1(x)/x − 1, x = hν/(kT).
 *
 * @param frequencyHz - frequency ν, Hz (finite, > 0)
 * @param temperatureK - temperature T, K (finite, > 0)
 * @returns (B_RJ − B)/B (dimensionless, > 0)
 * @throws RangeError for bad input or when the error exceeds the double range
 * Source: exact ratio of the Rayleigh–Jeans and Planck laws.
 * @example
 * ```ts
 * rayleighJeansRelativeErrorFrequencySI(1e11, 2.7255);
 * ```
 */
export function rayleighJeansRelativeErrorFrequencySI(frequencyHz: number, temperatureK: number): number {
  requirePositive("frequency", frequencyHz, "Hz");
  requirePositive("temperature", temperatureK, "K");
  computeX(FORM_NU_ENERGY, frequencyHz, temperatureK);
  return rjFromDD();
}

function rjFromDD(): number {
  const x = dd.hi;
  if (!isPositiveFinite(x)) {
    // x underflowed to 0 (λT astronomically large): the error is x/2 → 0;
    // x overflowed: the error exceeds every double.
    if (x === 0) return 0;
    throw new RangeError(`x = hc/(λkT) is ${x}; the Rayleigh–Jeans relative error exceeds the double range`);
  }
  const v = rjRelErr(x, dd.lo);
  if (v === Infinity) {
    throw new RangeError(`x must be <= ~716 for the Rayleigh–Jeans relative error to fit a double; got ${x}`);
  }
  return v;
}

/**
 * The Rayleigh–Jeans relative error expm1(x)/x − 1 at (u, T) for a spectral
 * form (`FORM_LAMBDA_ENERGY` or `FORM_NU_ENERGY`), without input checks;
 * +Infinity where it exceeds the double range (x ≳ 716). @internal
 */
export function rayleighJeansRelativeErrorUnchecked(form: number, u: number, T: number): number {
  computeX(form, u, T);
  const x = dd.hi;
  if (x === 0) return 0;
  return x === Infinity ? x : rjRelErr(x, dd.lo);
}

/** Wien's relative error −exp(−x) at (u, T) for a spectral form, without input checks (always finite). @internal */
export function wienRelativeErrorUnchecked(form: number, u: number, T: number): number {
  computeX(form, u, T);
  return -Math.exp(-dd.hi) * (1 - dd.lo);
}

/**
 * Relative error of Wien's approximation at (λ, T): exactly −exp(−x),
 * x = hc/(λkT) (formed in double-double; tends to 0⁻ in the Wien limit).
 *
 * @param wavelengthM - wavelength λ, m (finite, > 0)
 * @param temperatureK - temperature T, K (finite, > 0)
 * @returns (B_W − B)/B (dimensionless, in (−1, 0])
 * @throws RangeError for bad input
 * Source: exact ratio of Wien's and Planck's laws.
 * @example
 * ```ts
 * wienRelativeErrorWavelengthSI(500e-9, 5772); // ≈ −0.0069 (x ≈ 4.99)
 * ```
 */
export function wienRelativeErrorWavelengthSI(wavelengthM: number, temperatureK: number): number {
  requirePositive("wavelength", wavelengthM, "m");
  requirePositive("temperature", temperatureK, "K");
  return wienRelativeErrorUnchecked(FORM_LAMBDA_ENERGY, wavelengthM, temperatureK);
}

/**
 * Relative error of Wien's approximation at (ν, T): exactly −exp(−hν/(kT)).
 *
 * @param frequencyHz - frequency ν, Hz (finite, > 0)
 * @param temperatureK - temperature T, K (finite, > 0)
 * @returns (B_W − B)/B (dimensionless, in (−1, 0])
 * @throws RangeError for bad input
 * Source: exact ratio of Wien's and Planck's laws.
 * @example
 * ```ts
 * wienRelativeErrorFrequencySI(1e15, 5772);
 * ```
 */
export function wienRelativeErrorFrequencySI(frequencyHz: number, temperatureK: number): number {
  requirePositive("frequency", frequencyHz, "Hz");
  requirePositive("temperature", temperatureK, "K");
  return wienRelativeErrorUnchecked(FORM_NU_ENERGY, frequencyHz, temperatureK);
}
