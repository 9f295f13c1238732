/**
 * Planck's law for a blackbody, as spectral radiance (per steradian) in SI
 * units, in the three spectral variables and two counting conventions:
 *
 * | function                                | density per unit | unit                                |
 * |-----------------------------------------|------------------|-------------------------------------|
 * | {@link planckRadianceWavelengthSI}      | wavelength λ     | W m^-2 sr^-1 m^-1 (= W m^-3 sr^-1)  |
 * | {@link planckRadianceFrequencySI}       | frequency ν      | W m^-2 sr^-1 Hz^-1                  |
 * | {@link planckRadianceWavenumberSI}      | wavenumber σ̃=1/λ | W m^-2 sr^-1 (m^-1)^-1 (= W m^-1 sr^-1) |
 * | {@link planckPhotonRadianceWavelengthSI}| wavelength       | photons s^-1 m^-2 sr^-1 m^-1        |
 * | {@link planckPhotonRadianceFrequencySI} | frequency        | photons s^-1 m^-2 sr^-1 Hz^-1       |
 * | {@link planckPhotonRadianceWavenumberSI}| wavenumber       | photons s^-1 m^-2 sr^-1 (m^-1)^-1   |
 *
 * Source: M. Planck, Ann. Phys. 4, 553 (1901); constants CODATA 2018
 * (c₁L = 2hc², c₂ = hc/k). All kernels are accurate to ≤ 1e-13 relative
 * (worst-case bound ≈ 1e-14, measured ≤ 5.1e-15; see planck-core.ts and planck.test.ts) against a 40-digit mpmath reference for
 * λ ∈ [1e-12, 1e4] m, T ∈ [1e-2, 1e10] K wherever the result is a normal
 * double; they return the true tiny value or 0 on underflow, and never NaN or
 * Infinity for finite positive input (a true value beyond ~1.8e308, which
 * needs T ≳ 1e200 K, throws a RangeError instead).
 */
import { C1L } from "../../values/constants";
import { requirePositive } from "../../internal/checks";
import { batchOut, type RadiationBatchResult } from "./batch";
import { C2_HI, H_OVER_K_HI } from "./exact";

const LN_C2 = Math.log(C2_HI);
const LN_H_OVER_K = Math.log(H_OVER_K_HI);
import {
  FORM_LAMBDA_ENERGY,
  FORM_LAMBDA_PHOTON,
  FORM_NU_ENERGY,
  FORM_NU_PHOTON,
  FORM_SIGMA_ENERGY,
  FORM_SIGMA_PHOTON,
  SHAPE_PLANCK,
  X_PLAIN_MAX,
  X_PLAIN_MIN,
  lnSpectralCore,
  overflowError,
  planckLambdaEnergyCore,
  planckNuEnergyCore,
  spectralCore,
  spectralCoreExtended,
  xOf,
} from "./planck-core";

function checked(form: number, name: string, unit: string, u: number, T: number, what: string): number {
  requirePositive(name, u, unit);
  requirePositive("temperature", T, "K");
  const v = spectralCore(SHAPE_PLANCK, form, u, T);
  if (v === Infinity) throw overflowError(what, `${name}=${u} ${unit}, temperature=${T} K`);
  return v;
}

/**
 * Spectral radiance per unit wavelength of a blackbody,
 * B_λ(λ, T) = (2hc²/λ⁵) / (exp(hc/(λkT)) − 1).
 *
 * @param wavelengthM - vacuum wavelength λ, m (finite, > 0)
 * @param temperatureK - temperature T, K (finite, > 0)
 * @returns B_λ in W m^-2 sr^-1 m^-1 (0 when it underflows)
 * @throws RangeError for non-finite or non-positive input, naming the parameter
 * Source: Planck (1901); CODATA 2018 constants.
 * @example
 * ```ts
 * const b = planckRadianceWavelengthSI(500e-9, 5772); // ≈ 2.624e13 W m^-3 sr^-1
 * ```
 */
export function planckRadianceWavelengthSI(wavelengthM: number, temperatureK: number): number {
  return checked(FORM_LAMBDA_ENERGY, "wavelength", "m", wavelengthM, temperatureK, "spectral radiance B_λ");
}

/**
 * Spectral radiance per unit frequency of a blackbody,
 * B_ν(ν, T) = (2hν³/c²) / (exp(hν/(kT)) − 1).
 *
 * @param frequencyHz - frequency ν, Hz (finite, > 0)
 * @param temperatureK - temperature T, K (finite, > 0)
 * @returns B_ν in W m^-2 sr^-1 Hz^-1
 * @throws RangeError for non-finite or non-positive input
 * Source: Planck (1901); CODATA 2018 constants.
 * @example
 * ```ts
 * const b = planckRadianceFrequencySI(1.4e9, 2.7255); // CMB at 21 cm
 * ```
 */
export function planckRadianceFrequencySI(frequencyHz: number, temperatureK: number): number {
  return checked(FORM_NU_ENERGY, "frequency", "Hz", frequencyHz, temperatureK, "spectral radiance B_ν");
}

/**
 * Spectral radiance per unit wavenumber σ̃ = 1/λ (in m^-1, not cm^-1) of a
 * blackbody, B_σ̃(σ̃, T) = 2hc²σ̃³ / (exp(hcσ̃/(kT)) − 1).
 *
 * @param wavenumberPerM - wavenumber σ̃, m^-1 (finite, > 0)
 * @param temperatureK - temperature T, K (finite, > 0)
 * @returns B_σ̃ in W m^-2 sr^-1 (m^-1)^-1
 * @throws RangeError for non-finite or non-positive input
 * Source: Planck (1901); CODATA 2018 constants.
 * @example
 * ```ts
 * const b = planckRadianceWavenumberSI(100000, 300); // 1000 cm^-1 at 300 K
 * ```
 */
export function planckRadianceWavenumberSI(wavenumberPerM: number, temperatureK: number): number {
  return checked(FORM_SIGMA_ENERGY, "wavenumber", "m^-1", wavenumberPerM, temperatureK, "spectral radiance B_σ");
}

/**
 * Photon spectral radiance per unit wavelength, N_λ = B_λ/(hc/λ)
 * = (2c/λ⁴) / (exp(hc/(λkT)) − 1).
 *
 * @param wavelengthM - wavelength λ, m (finite, > 0)
 * @param temperatureK - temperature T, K (finite, > 0)
 * @returns N_λ in photons s^-1 m^-2 sr^-1 m^-1
 * @throws RangeError for non-finite or non-positive input
 * Source: Planck (1901) divided by the photon energy hc/λ.
 * @example
 * ```ts
 * const n = planckPhotonRadianceWavelengthSI(550e-9, 5772);
 * ```
 */
export function planckPhotonRadianceWavelengthSI(wavelengthM: number, temperatureK: number): number {
  return checked(FORM_LAMBDA_PHOTON, "wavelength", "m", wavelengthM, temperatureK, "photon radiance N_λ");
}

/**
 * Photon spectral radiance per unit frequency, N_ν = B_ν/(hν)
 * = (2ν²/c²) / (exp(hν/(kT)) − 1).
 *
 * @param frequencyHz - frequency ν, Hz (finite, > 0)
 * @param temperatureK - temperature T, K (finite, > 0)
 * @returns N_ν in photons s^-1 m^-2 sr^-1 Hz^-1
 * @throws RangeError for non-finite or non-positive input
 * Source: Planck (1901) divided by the photon energy hν.
 * @example
 * ```ts
 * const n = planckPhotonRadianceFrequencySI(5e14, 5772);
 * ```
 */
export function planckPhotonRadianceFrequencySI(frequencyHz: number, temperatureK: number): number {
  return checked(FORM_NU_PHOTON, "frequency", "Hz", frequencyHz, temperatureK, "photon radiance N_ν");
}

/**
 * Photon spectral radiance per unit wavenumber, N_σ̃ = B_σ̃/(hcσ̃)
 * = 2cσ̃² / (exp(hcσ̃/(kT)) − 1).
 *
 * @param wavenumberPerM - wavenumber σ̃, m^-1 (finite, > 0)
 * @param temperatureK - temperature T, K (finite, > 0)
 * @returns N_σ̃ in photons s^-1 m^-2 sr^-1 (m^-1)^-1
 * @throws RangeError for non-finite or non-positive input
 * Source: Planck (1901) divided by the photon energy hcσ̃.
 * @example
 * ```ts
 * const n = planckPhotonRadianceWavenumberSI(2e6, 5772);
 * ```
 */
export function planckPhotonRadianceWavenumberSI(wavenumberPerM: number, temperatureK: number): number {
  return checked(FORM_SIGMA_PHOTON, "wavenumber", "m^-1", wavenumberPerM, temperatureK, "photon radiance N_σ");
}

/**
 * Natural logarithm of B_λ(λ, T) (B_λ in W m^-2 sr^-1 m^-1), finite for every
 * finite positive input even where B_λ itself under- or overflows — used by
 * the inversions (colour temperature) at extreme temperatures.
 * ln B_λ = ln(2hc²) − 5 ln λ − ln(exp(x) − 1), x = hc/(λkT).
 *
 * @param wavelengthM - wavelength λ, m (finite, > 0)
 * @param temperatureK - temperature T, K (finite, > 0)
 * @returns ln(B_λ / (1 W m^-3 sr^-1)) (dimensionless)
 * @throws RangeError for non-finite or non-positive input
 * @example
 * ```ts
 * const lnB = logPlanckRadianceWavelengthSI(1e-9, 1); // ≈ −6.2e6 (B itself underflows)
 * ```
 */
export function logPlanckRadianceWavelengthSI(wavelengthM: number, temperatureK: number): number {
  requirePositive("wavelength", wavelengthM, "m");
  requirePositive("temperature", temperatureK, "K");
  return lnPlanckLambdaUnchecked(wavelengthM, temperatureK);
}

/** ln B_λ without input checks (inputs finite, > 0). @internal */
export function lnPlanckLambdaUnchecked(lambda: number, T: number): number {
  const b = planckLambdaEnergyCore(lambda, T);
  // Use the accurate direct value when it is a normal double.
  if (b >= 1e-300 && b !== Infinity) return Math.log(b);
  return lnSpectralCore(SHAPE_PLANCK, FORM_LAMBDA_ENERGY, lambda, T);
}

/** B_λ without input checks; +Infinity signals overflow. @internal */
export function planckLambdaUnchecked(lambda: number, T: number): number {
  return planckLambdaEnergyCore(lambda, T);
}

/** ∂B_λ/∂T without input checks (see {@link planckRadianceWavelengthDerivativeTSI}). @internal */
export function planckLambdaDerivativeTUnchecked(lambda: number, T: number): number {
  return derivativeT(FORM_LAMBDA_ENERGY, lambda, T, planckLambdaEnergyCore(lambda, T));
}

/** ∂B_ν/∂T without input checks (see {@link planckRadianceFrequencyDerivativeTSI}); +Infinity signals overflow. @internal */
export function planckNuDerivativeTUnchecked(nu: number, T: number): number {
  return derivativeT(FORM_NU_ENERGY, nu, T, planckNuEnergyCore(nu, T));
}

/**
 * ∂B/∂T = (B/T)·x/(1 − e^−x) from B = b. Plain when B, B/T and the result are
 * normal doubles; otherwise in logarithms, ln B − ln T + ln(x/(1 − e^−x)),
 * so the derivative stays finite and accurate where B itself overflows or
 * underflows (x/T can be huge at very low T, tiny at very high T), with
 * ln(x/(1 − e^−x)) → ln x (x > 700) and → x/2 (x < 1e-8) at the two ends.
 */
function derivativeT(form: number, u: number, T: number, b: number): number {
  if (b >= 1e-290 && b !== Infinity) {
    const bt = b / T;
    if (bt >= 1e-290 && bt !== Infinity) {
      const x = xOf(form, u, T);
      // x/(1 − e^−x): → 1 (RJ) for x → 0, → x (Wien) for large x.
      const f = x === 0 ? 1 : x / -Math.expm1(-x);
      const d = bt * f;
      if (d !== Infinity) return d;
    }
  }
  const lnX = form === FORM_NU_ENERGY ? LN_H_OVER_K + Math.log(u) - Math.log(T) : LN_C2 - Math.log(u) - Math.log(T);
  let lnF: number;
  if (lnX > 6.6) lnF = lnX; // x > 735: 1 − e^−x = 1
  else if (lnX < -18.4) lnF = 0.5 * Math.exp(lnX); // x < 1e-8: ln(x/(1 − e^−x)) = x/2 + O(x²)
  else {
    const x = Math.exp(lnX);
    lnF = Math.log(x / -Math.expm1(-x));
  }
  return Math.exp(lnSpectralCore(SHAPE_PLANCK, form, u, T) - Math.log(T) + lnF);
}

/**
 * Temperature derivative of the spectral radiance per unit wavelength,
 * ∂B_λ/∂T = (B_λ/T) · x/(1 − e^−x), x = hc/(λkT)
 * (→ B_λ/T in the Rayleigh–Jeans limit, → B_λ x/T in the Wien limit).
 * Needed by fitters of band fluxes (∂(band flux)/∂T).
 *
 * @param wavelengthM - wavelength λ, m (finite, > 0)
 * @param temperatureK - temperature T, K (finite, > 0)
 * @returns ∂B_λ/∂T in W m^-2 sr^-1 m^-1 K^-1
 * @throws RangeError for non-finite or non-positive input, or overflow
 * Source: derivative of Planck's law.
 * @example
 * ```ts
 * const d = planckRadianceWavelengthDerivativeTSI(500e-9, 5772);
 * ```
 */
export function planckRadianceWavelengthDerivativeTSI(wavelengthM: number, temperatureK: number): number {
  requirePositive("wavelength", wavelengthM, "m");
  requirePositive("temperature", temperatureK, "K");
  const d = planckLambdaDerivativeTUnchecked(wavelengthM, temperatureK);
  if (d === Infinity) {
    throw overflowError("∂B_λ/∂T", `wavelength=${wavelengthM} m, temperature=${temperatureK} K`);
  }
  return d;
}

/**
 * Temperature derivative of the spectral radiance per unit frequency,
 * ∂B_ν/∂T = (B_ν/T) · x/(1 − e^−x), x = hν/(kT).
 *
 * @param frequencyHz - frequency ν, Hz (finite, > 0)
 * @param temperatureK - temperature T, K (finite, > 0)
 * @returns ∂B_ν/∂T in W m^-2 sr^-1 Hz^-1 K^-1
 * @throws RangeError for non-finite or non-positive input, or overflow
 * Source: derivative of Planck's law.
 * @example
 * ```ts
 * const d = planckRadianceFrequencyDerivativeTSI(1e11, 2.7255);
 * ```
 */
export function planckRadianceFrequencyDerivativeTSI(frequencyHz: number, temperatureK: number): number {
  requirePositive("frequency", frequencyHz, "Hz");
  requirePositive("temperature", temperatureK, "K");
  const d = planckNuDerivativeTUnchecked(frequencyHz, temperatureK);
  if (d === Infinity) {
    throw overflowError("∂B_ν/∂T", `frequency=${frequencyHz} Hz, temperature=${temperatureK} K`);
  }
  return d;
}

/**
 * B_λ over many wavelengths at one temperature (allocation-free when `out` is
 * given). Invalid rows (wavelength not finite or ≤ 0) are written as NaN and
 * listed in `invalid`; the call never throws part-way through the array.
 *
 * @param wavelengthsM - wavelengths λ, m
 * @param temperatureK - temperature T, K (finite, > 0; a bad value throws before any row is written)
 * @param out - optional output array of the same length
 * @returns `{ values, invalid }` with values in W m^-2 sr^-1 m^-1
 * @throws RangeError for a bad temperature or a wrong-length `out`
 * Source: Planck (1901); CODATA 2018 constants.
 * @example
 * ```ts
 * const { values, invalid } = planckRadianceWavelengthBatchSI(new Float64Array([4e-7, 5e-7, -1]), 5772);
 * // invalid = [2], values[2] is NaN
 * ```
 */
export function planckRadianceWavelengthBatchSI(
  wavelengthsM: Float64Array,
  temperatureK: number,
  out?: Float64Array,
): RadiationBatchResult {
  requirePositive("temperature", temperatureK, "K");
  const values = batchOut(wavelengthsM.length, out);
  const invalid: number[] = [];
  const T = temperatureK;
  const n = wavelengthsM.length;
  for (let i = 0; i < n; i++) {
    const l = wavelengthsM[i] as number;
    // The plain path of planckLambdaEnergyCore, written out (same operations, so
    // bit-identical). Its conditions also reject every invalid row: λ ≤ 0, NaN or
    // ±Infinity fails the range test on λ (or gives x < 0, NaN, 0 or Infinity).
    // (Evaluated before the test, as in the core: see planck-core.ts.)
    const x = C2_HI / (l * T);
    const l2 = l * l;
    let v = C1L / (l2 * l2 * l) / Math.expm1(x);
    if (!(x <= X_PLAIN_MAX && x >= X_PLAIN_MIN && l >= 1e-50 && l <= 1e50)) {
      v = l > 0 && l < Infinity ? spectralCoreExtended(SHAPE_PLANCK, FORM_LAMBDA_ENERGY, l, T) : NaN;
    }
    // v < Infinity is false for NaN and for a true overflow
    if (v < Infinity) values[i] = v;
    else {
      values[i] = NaN;
      invalid.push(i);
    }
  }
  return { values, invalid };
}

/**
 * B_λ at one wavelength over many temperatures. Invalid rows (temperature not
 * finite or ≤ 0, or a true value beyond the double range) are written as NaN
 * and listed in `invalid`.
 *
 * @param wavelengthM - wavelength λ, m (finite, > 0; a bad value throws before any row is written)
 * @param temperaturesK - temperatures T, K
 * @param out - optional output array of the same length
 * @returns `{ values, invalid }` with values in W m^-2 sr^-1 m^-1
 * @throws RangeError for a bad wavelength or a wrong-length `out`
 * Source: Planck (1901); CODATA 2018 constants.
 * @example
 * ```ts
 * const { values } = planckRadianceTemperatureBatchSI(2.2e-6, new Float64Array([3000, 5772, 10000]));
 * ```
 */
export function planckRadianceTemperatureBatchSI(
  wavelengthM: number,
  temperaturesK: Float64Array,
  out?: Float64Array,
): RadiationBatchResult {
  requirePositive("wavelength", wavelengthM, "m");
  const values = batchOut(temperaturesK.length, out);
  const invalid: number[] = [];
  // The prefactor 2hc²/λ⁵ is the same for every row: formed once, with the
  // same operations as planckLambdaEnergyCore, so each row is bit-identical to
  // the scalar kernel (the plain-path conditions are the same too).
  const l = wavelengthM;
  const l2 = l * l;
  const P = C1L / (l2 * l2 * l);
  const plainL = l >= 1e-50 && l <= 1e50;
  const n = temperaturesK.length;
  for (let i = 0; i < n; i++) {
    const t = temperaturesK[i] as number;
    // T ≤ 0, NaN or ±Infinity gives x < 0, NaN, Infinity or 0: never the plain path
    const x = C2_HI / (l * t);
    let v = P / Math.expm1(x);
    if (!(plainL && x <= X_PLAIN_MAX && x >= X_PLAIN_MIN)) {
      v = t > 0 && t < Infinity ? spectralCoreExtended(SHAPE_PLANCK, FORM_LAMBDA_ENERGY, l, t) : NaN;
    }
    if (v < Infinity) values[i] = v;
    else {
      values[i] = NaN;
      invalid.push(i);
    }
  }
  return { values, invalid };
}
