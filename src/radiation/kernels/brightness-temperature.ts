/**
 * Brightness temperature: the temperature of the blackbody whose Planck
 * radiance equals a measured monochromatic radiance (exact inversion of
 * Planck's law), and its Rayleigh–Jeans version used in radio astronomy.
 *
 * Exact: T_b = c₂ / (λ ln(1 + c₁L/(λ⁵B_λ))) = (hν/k) / ln(1 + 2hν³/(c²B_ν)),
 * with ln(1 + y) evaluated as log1p(y) (accurate in the Rayleigh–Jeans regime
 * y ≪ 1) and, when y itself would overflow or underflow, from ln y.
 * Rayleigh–Jeans: T_RJ = λ⁴B_λ/(2ck) = c²B_ν/(2kν²).
 * Source: e.g. Rybicki & Lightman, Radiative Processes in Astrophysics (1979), §1.5.
 */
import { C, C1L, K_B } from "../../values/constants";
import { requirePositive } from "../../internal/checks";
import { C2_HI, H_OVER_K_HI } from "./exact";
import { TWO_H_OVER_C2 } from "./planck-core";
import { scaledPower } from "./scaled";

const LN_C1L = Math.log(C1L);
const LN_TWO_H_OVER_C2 = Math.log(TWO_H_OVER_C2);
const LN_MAX = Math.log(Number.MAX_VALUE);
const LN_C2 = Math.log(C2_HI);
const LN_H_OVER_K = Math.log(H_OVER_K_HI);
const NORMAL_MIN = 2.2250738585072014e-308;

function isNormal(v: number): boolean {
  return v >= NORMAL_MIN && v !== Infinity;
}

/**
 * Shared inversion: T = num/ℓ with ℓ = ln(1 + y), y = exp(lnY) (y passed
 * directly when it was computable, else NaN), num = exp(lnNum) (passed
 * directly when computable, else NaN). Works in logs whenever a piece leaves
 * the normal double range.
 */
function invert(num: number, lnNum: number, y: number, lnY: number): number {
  let ell: number;
  let lnEll: number;
  if (isNormal(y)) {
    ell = Math.log1p(y);
    lnEll = Math.log(ell);
  } else if (lnY > 0) {
    ell = lnY + Math.log1p(Math.exp(-lnY)); // y huge: ln(1+y) = ln y + ln(1 + 1/y)
    lnEll = Math.log(ell);
  } else {
    ell = Math.exp(lnY); // y tiny: ln(1+y) = y to double precision
    lnEll = lnY;
  }
  if (isNormal(num) && isNormal(ell)) {
    const T = num / ell;
    if (isNormal(T)) return T;
  }
  const lnT = lnNum - lnEll;
  return lnT > LN_MAX ? Infinity : Math.exp(lnT);
}

/** T_b from (λ, B_λ) without input checks; +Infinity signals overflow. @internal */
export function brightnessTemperatureWavelengthUnchecked(wavelengthM: number, radiance: number): number {
  const l = wavelengthM;
  const lnL = Math.log(l);
  const lnY = LN_C1L - 5 * lnL - Math.log(radiance);
  // y = 2hc²/(λ⁵B) without spurious under/overflow of λ⁵ (a subnormal y would
  // carry few bits; ln(1+y) ≠ y for y ≳ 1e-17, so y must be exact whenever normal)
  const y = scaledPower(C1L, l, -5, radiance);
  return invert(C2_HI / l, LN_C2 - lnL, y, lnY);
}

/** T_b from (ν, B_ν) without input checks; +Infinity signals overflow. @internal */
export function brightnessTemperatureFrequencyUnchecked(frequencyHz: number, radiance: number): number {
  const nu = frequencyHz;
  const lnNu = Math.log(nu);
  const lnY = LN_TWO_H_OVER_C2 + 3 * lnNu - Math.log(radiance);
  const y = scaledPower(TWO_H_OVER_C2, nu, 3, radiance);
  return invert(H_OVER_K_HI * nu, LN_H_OVER_K + lnNu, y, lnY);
}

/** T_RJ from (λ, B_λ) without input checks; +Infinity signals overflow. @internal */
export function rayleighJeansBrightnessTemperatureWavelengthUnchecked(wavelengthM: number, radiance: number): number {
  // λ⁴B/(2ck) with no spurious under/overflow of λ⁴ or λ⁴B; +Infinity only on true overflow
  return scaledPower(radiance, wavelengthM, 4, 2 * C * K_B);
}

/** T_RJ from (ν, B_ν) without input checks; +Infinity signals overflow. @internal */
export function rayleighJeansBrightnessTemperatureFrequencyUnchecked(frequencyHz: number, radiance: number): number {
  // c²B/(2kν²), no spurious under/overflow of ν² or c²B
  return scaledPower(radiance, frequencyHz, -2, (2 * K_B) / (C * C));
}

/**
 * Brightness temperature of a monochromatic radiance per unit wavelength,
 * T_b = c₂ / (λ·ln(1 + 2hc²/(λ⁵B_λ))).
 *
 * @param wavelengthM - λ, m (finite, > 0)
 * @param radiance - B_λ, W m^-2 sr^-1 m^-1 (finite, > 0)
 * @returns T_b, K
 * @throws RangeError for bad input
 * Source: inversion of Planck's law.
 * @example
 * ```ts
 * brightnessTemperatureWavelengthSI(500e-9, 2.63e13); // ≈ 5772 K
 * ```
 */
export function brightnessTemperatureWavelengthSI(wavelengthM: number, radiance: number): number {
  requirePositive("wavelength", wavelengthM, "m");
  requirePositive("radiance", radiance, "W m^-2 sr^-1 m^-1");
  const v = brightnessTemperatureWavelengthUnchecked(wavelengthM, radiance);
  if (v === Infinity) throw new RangeError(`brightness temperature (wavelength=${wavelengthM} m, radiance=${radiance}) overflows the double range`);
  return v;
}

/**
 * Brightness temperature of a monochromatic radiance per unit frequency,
 * T_b = (hν/k) / ln(1 + 2hν³/(c²B_ν)).
 *
 * @param frequencyHz - ν, Hz (finite, > 0)
 * @param radiance - B_ν, W m^-2 sr^-1 Hz^-1 (finite, > 0)
 * @returns T_b, K
 * @throws RangeError for bad input
 * Source: inversion of Planck's law.
 * @example
 * ```ts
 * brightnessTemperatureFrequencySI(1.6e11, 3.8e-18); // ≈ 2.7 K (CMB near its peak)
 * ```
 */
export function brightnessTemperatureFrequencySI(frequencyHz: number, radiance: number): number {
  requirePositive("frequency", frequencyHz, "Hz");
  requirePositive("radiance", radiance, "W m^-2 sr^-1 Hz^-1");
  const v = brightnessTemperatureFrequencyUnchecked(frequencyHz, radiance);
  if (v === Infinity) throw new RangeError(`brightness temperature (frequency=${frequencyHz} Hz, radiance=${radiance}) overflows the double range`);
  return v;
}

/**
 * Rayleigh–Jeans brightness temperature per unit wavelength,
 * T_RJ = λ⁴B_λ/(2ck) (equals the exact T_b only for hc/(λkT) ≪ 1).
 *
 * @param wavelengthM - λ, m (finite, > 0)
 * @param radiance - B_λ, W m^-2 sr^-1 m^-1 (finite, > 0)
 * @returns T_RJ, K
 * @throws RangeError for bad input or overflow
 * Source: Rayleigh–Jeans law.
 * @example
 * ```ts
 * rayleighJeansBrightnessTemperatureWavelengthSI(0.21, 1e-9);
 * ```
 */
export function rayleighJeansBrightnessTemperatureWavelengthSI(wavelengthM: number, radiance: number): number {
  requirePositive("wavelength", wavelengthM, "m");
  requirePositive("radiance", radiance, "W m^-2 sr^-1 m^-1");
  const v = rayleighJeansBrightnessTemperatureWavelengthUnchecked(wavelengthM, radiance);
  if (v === Infinity) throw new RangeError(`Rayleigh–Jeans temperature overflows the double range for wavelength=${wavelengthM} m`);
  return v;
}

/**
 * Rayleigh–Jeans brightness temperature per unit frequency (the radio
 * astronomer's T_B), T_RJ = c²B_ν/(2kν²).
 *
 * @param frequencyHz - ν, Hz (finite, > 0)
 * @param radiance - B_ν, W m^-2 sr^-1 Hz^-1 (finite, > 0)
 * @returns T_RJ, K
 * @throws RangeError for bad input or overflow
 * Source: Rayleigh–Jeans law.
 * @example
 * ```ts
 * rayleighJeansBrightnessTemperatureFrequencySI(1.4204e9, 1e-20);
 * ```
 */
export function rayleighJeansBrightnessTemperatureFrequencySI(frequencyHz: number, radiance: number): number {
  requirePositive("frequency", frequencyHz, "Hz");
  requirePositive("radiance", radiance, "W m^-2 sr^-1 Hz^-1");
  const v = rayleighJeansBrightnessTemperatureFrequencyUnchecked(frequencyHz, radiance);
  if (v === Infinity) throw new RangeError(`Rayleigh–Jeans temperature overflows the double range for frequency=${frequencyHz} Hz`);
  return v;
}
