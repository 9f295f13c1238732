/**
 * Shared machinery of the Planck-family kernels: one routine that evaluates
 * A·u^p·g(x) for the six spectral forms (per wavelength / frequency /
 * wavenumber, energy / photon counts) and three spectral shapes (exact Planck
 * g = 1/(eˣ−1), Wien g = e^−x, Rayleigh–Jeans g = 1/x), robustly for every
 * finite positive input.
 *
 * Three paths, chosen per call:
 *
 * 1. Plain path (Planck shape only; x ≤ {@link X_PLAIN_MAX} = 32 and the
 *    prefactor a normal double): exactly the textbook expression,
 *    A·u^p / expm1(x) with x = c₂/(λT) (or hν/(kT), c₂σ̃/T) in plain doubles.
 *    The error of x is ≤ 2 roundings of the operands plus the rounding of the
 *    constant (|δx/x| ≤ 2u + 0.42u, u = 2^−53), and the relative sensitivity
 *    of B to x is x/(1 − e^−x) ≤ x + 1, so this costs at most
 *    (x + 1)·2.42u ≤ 33·2.42u ≈ 8.9e-15 relative at the threshold, on top of
 *    the ≤ 9u of the prefactor, expm1 and the divisions — worst-case bound
 *    ≈ 1e-14, a tenth of the 1e-13 accuracy target (measured worst over the
 *    mpmath fixture: 5.1e-15, at x ≈ 30; ≤ 7e-16 for x ≤ 4).
 * 2. Extended path (x > 32, the Wien tail, and the Wien / Rayleigh–Jeans
 *    shapes; u ∈ [1e-50, 1e50], T ∈ [1e-200, 1e200]): x is formed in
 *    double-double (see `exact.ts`), so its error no longer grows with x
 *    (B to ~1e-15 even at x ≈ 800); g is evaluated with `expm1`, or for
 *    x > 700 as e^(−x/2)·e^(−x/2) applied one factor at a time so that a
 *    huge prefactor times an underflowing exponential still gives the true
 *    tiny value.
 * 3. Log path (anything else): the same quantity in logarithms, ln B = ln A +
 *    p ln u − ln(eˣ−1), with asymptotic forms of ln(eˣ−1) at both ends; it is
 *    accurate to ~|ln B|·1e-16 relative (≤ ~1e-13).
 *
 * Returns +Infinity only when the true value exceeds the double range; the
 * public wrappers turn that into a RangeError (or NaN in batch paths).
 *
 * The per-form Planck cores ({@link planckLambdaEnergyCore} and its five
 * siblings) are small, shape- and form-specific functions that the engine can
 * inline into a caller's loop; {@link spectralCore} dispatches to them. They
 * evaluate the plain expression first and test the conditions after it: a
 * branch *around* the `expm1` call measured ~1.4× slower in V8 (Node 20) than
 * the same loop without it, a test after it ~1.1×; for the rare inputs that
 * fail the test the wasted `expm1` is small beside the extended path.
 *
 * @internal
 */
import { C, C1L, H } from "../../values/constants";
import { C2_HI, C2_LO, H_OVER_K_HI, H_OVER_K_LO, dd, ddDivProduct, ddMulDiv } from "./exact";

/** Spectral variable / counting form. */
export const FORM_LAMBDA_ENERGY = 0;
export const FORM_LAMBDA_PHOTON = 1;
export const FORM_NU_ENERGY = 2;
export const FORM_NU_PHOTON = 3;
export const FORM_SIGMA_ENERGY = 4;
export const FORM_SIGMA_PHOTON = 5;
/** Spectral shape. */
export const SHAPE_PLANCK = 0;
export const SHAPE_WIEN = 1;
export const SHAPE_RJ = 2;

/** 2h/c², prefactor of B_ν (W s³ m^-2 sr^-1 ... = J s³ m^-2), derived from CODATA h, c. */
export const TWO_H_OVER_C2 = (2 * H) / (C * C);
/** 2/c², prefactor of the photon radiance per unit frequency (s² m^-2). */
export const TWO_OVER_C2 = 2 / (C * C);
/** 2c, prefactor of the photon radiance per unit wavelength / wavenumber (m s^-1). */
export const TWO_C = 2 * C;

const LN_C1L = Math.log(C1L);
const LN_TWO_H_OVER_C2 = Math.log(TWO_H_OVER_C2);
const LN_TWO_OVER_C2 = Math.log(TWO_OVER_C2);
const LN_TWO_C = Math.log(TWO_C);
const LN_C2 = Math.log(C2_HI);
const LN_H_OVER_K = Math.log(H_OVER_K_HI);

/** Extended-path evaluation of P·g(x) with x = dd.hi + dd.lo. */
function scale(shape: number, P: number): number {
  const xh = dd.hi;
  const xl = dd.lo;
  if (shape === SHAPE_PLANCK) {
    if (xh <= 700) {
      const em1 = Math.expm1(xh);
      // g(xh+xl) = g(xh)·(1 − xl·(1+g(xh))) to first order; xl·(1+g) ≤ ~1e-16.
      return (P / em1) * (1 - xl * (1 + 1 / em1));
    }
    // 1/(1−e^−x) = 1 to double precision for x > 700.
    const e = Math.exp(-0.5 * xh);
    return P * e * e * (1 - xl);
  }
  if (shape === SHAPE_WIEN) {
    if (xh <= 700) return P * Math.exp(-xh) * (1 - xl);
    const e = Math.exp(-0.5 * xh);
    return P * e * e * (1 - xl);
  }
  // Rayleigh–Jeans: P/x.
  return (P / xh) * (1 - xl / xh);
}

/** ln(g(x)) from ln x (and x itself when it is a normal double), for the slow path. */
function lnShape(shape: number, lnX: number, xDirect: number): number {
  // Prefer the directly computed x (≈2 ulp) over exp(ln x) (≈|ln x| ulp).
  const x = xDirect >= 1e-300 && xDirect <= 1e300 ? xDirect : Math.exp(lnX);
  if (shape === SHAPE_RJ) return -lnX;
  if (shape === SHAPE_WIEN) return -x;
  if (lnX < -30) return -(lnX + 0.5 * x); // ln(eˣ−1) = ln x + x/2 + O(x²)
  if (x > 700) return -x; // ln(eˣ−1) = x + ln(1−e^−x), e^−700 negligible
  return -Math.log(Math.expm1(x));
}

/**
 * Largest x for which the Planck cores use a plain-double x (see the module
 * comment: worst-case cost ≈ (x + 1)·2.42·2^−53 ≤ 8.9e-15 relative at x = 32).
 * Above it the double-double x of {@link spectralCoreExtended} is used.
 */
export const X_PLAIN_MAX = 32;
/**
 * Smallest x for the plain path: x ≥ 1e-290 is a normal double and keeps the
 * product λT (or the quotient's operands) far from overflow, so x carries
 * only its roundings; smaller x (or 0 from an overflowing product) takes the
 * extended or log path.
 */
export const X_PLAIN_MIN = 1e-290;

/**
 * A·u^p·g(x) for spectral variable u (m, Hz or m^-1) and temperature T (K);
 * inputs assumed finite and positive. +Infinity signals true overflow.
 * The Planck shape goes to the per-form cores (plain path for x ≤ 32); the
 * others, and x > 32, to {@link spectralCoreExtended}.
 */
export function spectralCore(shape: number, form: number, u: number, T: number): number {
  if (shape === SHAPE_PLANCK) {
    switch (form) {
      case FORM_LAMBDA_ENERGY:
        return planckLambdaEnergyCore(u, T);
      case FORM_LAMBDA_PHOTON:
        return planckLambdaPhotonCore(u, T);
      case FORM_NU_ENERGY:
        return planckNuEnergyCore(u, T);
      case FORM_NU_PHOTON:
        return planckNuPhotonCore(u, T);
      case FORM_SIGMA_ENERGY:
        return planckSigmaEnergyCore(u, T);
      default:
        return planckSigmaPhotonCore(u, T);
    }
  }
  return spectralCoreExtended(shape, form, u, T);
}

/**
 * B_λ(λ, T) = 2hc²/λ⁵ / (exp(c₂/(λT)) − 1) in W m^-2 sr^-1 m^-1, for λ in m
 * and T in K, without input checks (finite, > 0 assumed); +Infinity signals a
 * true value beyond the double range, 0 or a subnormal an underflow.
 * Accurate to ≤ 1e-14 relative (plain path, x ≤ 32) or ~1e-15 (beyond).
 *
 * @param l - wavelength λ, m
 * @param T - temperature T, K
 * @returns B_λ, W m^-2 sr^-1 m^-1
 * Source: Planck (1901); CODATA 2018 constants.
 * @example
 * ```ts
 * const v = planckLambdaEnergyCore(500e-9, 5772); // ≈ 2.624e13 W m^-3 sr^-1
 * ```
 * @internal
 */
export function planckLambdaEnergyCore(l: number, T: number): number {
  const x = C2_HI / (l * T);
  const l2 = l * l;
  const v = C1L / (l2 * l2 * l) / Math.expm1(x);
  if (x <= X_PLAIN_MAX && x >= X_PLAIN_MIN && l >= 1e-50 && l <= 1e50) return v;
  return spectralCoreExtended(SHAPE_PLANCK, FORM_LAMBDA_ENERGY, l, T);
}

/**
 * Photon radiance per wavelength N_λ(λ, T) = 2c/λ⁴ / (exp(c₂/(λT)) − 1) in
 * photons s^-1 m^-2 sr^-1 m^-1, without input checks (as {@link planckLambdaEnergyCore}).
 *
 * @param l - wavelength λ, m
 * @param T - temperature T, K
 * @returns N_λ, photons s^-1 m^-2 sr^-1 m^-1
 * Source: Planck (1901); CODATA 2018 constants.
 * @example
 * ```ts
 * const v = planckLambdaPhotonCore(550e-9, 5772);
 * ```
 * @internal
 */
export function planckLambdaPhotonCore(l: number, T: number): number {
  const x = C2_HI / (l * T);
  const l2 = l * l;
  const v = TWO_C / (l2 * l2) / Math.expm1(x);
  if (x <= X_PLAIN_MAX && x >= X_PLAIN_MIN && l >= 1e-50 && l <= 1e50) return v;
  return spectralCoreExtended(SHAPE_PLANCK, FORM_LAMBDA_PHOTON, l, T);
}

/**
 * B_ν(ν, T) = 2hν³/c² / (exp(hν/(kT)) − 1) in W m^-2 sr^-1 Hz^-1, for ν in Hz
 * and T in K, without input checks (as {@link planckLambdaEnergyCore}).
 *
 * @param nu - frequency ν, Hz
 * @param T - temperature T, K
 * @returns B_ν, W m^-2 sr^-1 Hz^-1
 * Source: Planck (1901); CODATA 2018 constants.
 * @example
 * ```ts
 * const v = planckNuEnergyCore(1.4e9, 2.7255); // CMB at 21 cm
 * ```
 * @internal
 */
export function planckNuEnergyCore(nu: number, T: number): number {
  const x = (H_OVER_K_HI * nu) / T;
  const v = (TWO_H_OVER_C2 * (nu * nu * nu)) / Math.expm1(x);
  if (x <= X_PLAIN_MAX && x >= X_PLAIN_MIN && nu >= 1e-50 && nu <= 1e50) return v;
  return spectralCoreExtended(SHAPE_PLANCK, FORM_NU_ENERGY, nu, T);
}

/**
 * Photon radiance per frequency N_ν(ν, T) = 2ν²/c² / (exp(hν/(kT)) − 1) in
 * photons s^-1 m^-2 sr^-1 Hz^-1, without input checks (as {@link planckLambdaEnergyCore}).
 *
 * @param nu - frequency ν, Hz
 * @param T - temperature T, K
 * @returns N_ν, photons s^-1 m^-2 sr^-1 Hz^-1
 * Source: Planck (1901); CODATA 2018 constants.
 * @example
 * ```ts
 * const v = planckNuPhotonCore(5e14, 5772);
 * ```
 * @internal
 */
export function planckNuPhotonCore(nu: number, T: number): number {
  const x = (H_OVER_K_HI * nu) / T;
  const v = (TWO_OVER_C2 * (nu * nu)) / Math.expm1(x);
  if (x <= X_PLAIN_MAX && x >= X_PLAIN_MIN && nu >= 1e-50 && nu <= 1e50) return v;
  return spectralCoreExtended(SHAPE_PLANCK, FORM_NU_PHOTON, nu, T);
}

/**
 * B_σ̃(σ̃, T) = 2hc²σ̃³ / (exp(c₂σ̃/T) − 1) in W m^-2 sr^-1 (m^-1)^-1, for σ̃ in
 * m^-1 and T in K, without input checks (as {@link planckLambdaEnergyCore}).
 *
 * @param s - wavenumber σ̃, m^-1
 * @param T - temperature T, K
 * @returns B_σ̃, W m^-2 sr^-1 (m^-1)^-1
 * Source: Planck (1901); CODATA 2018 constants.
 * @example
 * ```ts
 * const v = planckSigmaEnergyCore(100000, 300); // 1000 cm^-1 at 300 K
 * ```
 * @internal
 */
export function planckSigmaEnergyCore(s: number, T: number): number {
  const x = (C2_HI * s) / T;
  const v = (C1L * (s * s * s)) / Math.expm1(x);
  if (x <= X_PLAIN_MAX && x >= X_PLAIN_MIN && s >= 1e-50 && s <= 1e50) return v;
  return spectralCoreExtended(SHAPE_PLANCK, FORM_SIGMA_ENERGY, s, T);
}

/**
 * Photon radiance per wavenumber N_σ̃(σ̃, T) = 2cσ̃² / (exp(c₂σ̃/T) − 1) in
 * photons s^-1 m^-2 sr^-1 (m^-1)^-1, without input checks (as {@link planckLambdaEnergyCore}).
 *
 * @param s - wavenumber σ̃, m^-1
 * @param T - temperature T, K
 * @returns N_σ̃, photons s^-1 m^-2 sr^-1 (m^-1)^-1
 * Source: Planck (1901); CODATA 2018 constants.
 * @example
 * ```ts
 * const v = planckSigmaPhotonCore(2e6, 5772);
 * ```
 * @internal
 */
export function planckSigmaPhotonCore(s: number, T: number): number {
  const x = (C2_HI * s) / T;
  const v = (TWO_C * (s * s)) / Math.expm1(x);
  if (x <= X_PLAIN_MAX && x >= X_PLAIN_MIN && s >= 1e-50 && s <= 1e50) return v;
  return spectralCoreExtended(SHAPE_PLANCK, FORM_SIGMA_PHOTON, s, T);
}

/**
 * {@link spectralCore} with x always in double-double where the inputs allow
 * it (extended path), or in logarithms (log path): accurate to ~1e-15 for
 * every x, at about three times the cost of the plain path. Inputs assumed
 * finite and positive; +Infinity signals true overflow.
 */
export function spectralCoreExtended(shape: number, form: number, u: number, T: number): number {
  if (u >= 1e-50 && u <= 1e50 && T >= 1e-200 && T <= 1e200) {
    const u2 = u * u;
    let P: number;
    switch (form) {
      case FORM_LAMBDA_ENERGY:
        P = C1L / (u2 * u2 * u);
        break;
      case FORM_LAMBDA_PHOTON:
        P = TWO_C / (u2 * u2);
        break;
      case FORM_NU_ENERGY:
        P = TWO_H_OVER_C2 * (u2 * u);
        break;
      case FORM_NU_PHOTON:
        P = TWO_OVER_C2 * u2;
        break;
      case FORM_SIGMA_ENERGY:
        P = C1L * (u2 * u);
        break;
      default:
        P = TWO_C * u2;
    }
    if (form <= FORM_LAMBDA_PHOTON) ddDivProduct(C2_HI, C2_LO, u, T);
    else if (form <= FORM_NU_PHOTON) ddMulDiv(H_OVER_K_HI, H_OVER_K_LO, u, T);
    else ddMulDiv(C2_HI, C2_LO, u, T);
    return scale(shape, P);
  }
  return Math.exp(lnSpectralCore(shape, form, u, T));
}

/**
 * Natural log of {@link spectralCore}, computed entirely in logarithms (never
 * under- or overflows; −Infinity only when the value is 0 to infinite
 * precision, which cannot happen for finite inputs except through x = ∞).
 */
export function lnSpectralCore(shape: number, form: number, u: number, T: number): number {
  const lnU = Math.log(u);
  const lnT = Math.log(T);
  let lnP: number;
  let lnX: number;
  switch (form) {
    case FORM_LAMBDA_ENERGY:
      lnP = LN_C1L - 5 * lnU;
      lnX = LN_C2 - lnU - lnT;
      break;
    case FORM_LAMBDA_PHOTON:
      lnP = LN_TWO_C - 4 * lnU;
      lnX = LN_C2 - lnU - lnT;
      break;
    case FORM_NU_ENERGY:
      lnP = LN_TWO_H_OVER_C2 + 3 * lnU;
      lnX = LN_H_OVER_K + lnU - lnT;
      break;
    case FORM_NU_PHOTON:
      lnP = LN_TWO_OVER_C2 + 2 * lnU;
      lnX = LN_H_OVER_K + lnU - lnT;
      break;
    case FORM_SIGMA_ENERGY:
      lnP = LN_C1L + 3 * lnU;
      lnX = LN_C2 + lnU - lnT;
      break;
    default:
      lnP = LN_TWO_C + 2 * lnU;
      lnX = LN_C2 + lnU - lnT;
  }
  return lnP + lnShape(shape, lnX, xOf(form, u, T));
}

/** True when v is a normal double (no precision lost to underflow, not Infinity). */
function isNormal(v: number): boolean {
  return v >= 2.2250738585072014e-308 && v !== Infinity;
}

/**
 * Plain-double x = hc/(λkT), hν/(kT) or hcσ̃/(kT) (for factors whose
 * sensitivity to x is ≤ 1). The two operations are ordered so that no
 * intermediate leaves the normal range when another order keeps it inside
 * (a subnormal intermediate would carry only a few bits into a normal x);
 * when none does, x itself is beyond the normal range and comes from its
 * logarithm (0, a subnormal or Infinity, as the true value rounds).
 */
export function xOf(form: number, u: number, T: number): number {
  const k = form <= FORM_NU_PHOTON && form >= FORM_NU_ENERGY ? H_OVER_K_HI : C2_HI;
  if (form <= FORM_LAMBDA_PHOTON) {
    // k / (u·T)
    const a = k / u;
    if (isNormal(a)) return a / T;
    const b = k / T;
    if (isNormal(b)) return b / u;
    return Math.exp(Math.log(k) - Math.log(u) - Math.log(T));
  }
  // k·u / T
  const a = k * u;
  if (isNormal(a)) return a / T;
  const b = u / T;
  if (isNormal(b)) return k * b;
  const c = k / T;
  if (isNormal(c)) return c * u;
  return Math.exp(Math.log(k) + Math.log(u) - Math.log(T));
}

/**
 * x for the given form into `dd` (double-double where the inputs allow it,
 * otherwise a plain double with dd.lo = 0; x may then be 0 or Infinity).
 */
export function computeX(form: number, u: number, T: number): void {
  if (u >= 1e-50 && u <= 1e50 && T >= 1e-200 && T <= 1e200) {
    if (form <= FORM_LAMBDA_PHOTON) ddDivProduct(C2_HI, C2_LO, u, T);
    else if (form <= FORM_NU_PHOTON) ddMulDiv(H_OVER_K_HI, H_OVER_K_LO, u, T);
    else ddMulDiv(C2_HI, C2_LO, u, T);
    return;
  }
  dd.hi = xOf(form, u, T);
  dd.lo = 0;
}

/** The RangeError thrown when a true result exceeds the double range. */
export function overflowError(what: string, args: string): RangeError {
  return new RangeError(`${what} overflows the double range (> ${Number.MAX_VALUE}) for ${args}`);
}
