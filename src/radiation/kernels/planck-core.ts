/**
 * Shared machinery of the Planck-family kernels: one routine that evaluates
 * A·u^p·g(x) for the six spectral forms (per wavelength / frequency /
 * wavenumber, energy / photon counts) and three spectral shapes (exact Planck
 * g = 1/(eˣ−1), Wien g = e^−x, Rayleigh–Jeans g = 1/x), robustly for every
 * finite positive input.
 *
 * Fast path (u ∈ [1e-50, 1e50], T ∈ [1e-200, 1e200]): the prefactor A·u^p is
 * a normal double; x is formed in double-double (see `exact.ts`) and g is
 * evaluated with `expm1` (Rayleigh–Jeans end, no cancellation), or for
 * x > 700 as e^(−x/2)·e^(−x/2) applied one factor at a time so that a huge
 * prefactor times an underflowing exponential still gives the true tiny value.
 * Slow path (anything else): the same quantity in logarithms, ln B = ln A +
 * p ln u − ln(eˣ−1), with asymptotic forms of ln(eˣ−1) at both ends; it is
 * accurate to ~|ln B|·1e-16 relative (≤ ~1e-13).
 *
 * Returns +Infinity only when the true value exceeds the double range; the
 * public wrappers turn that into a RangeError (or NaN in batch paths).
 *
 * @internal
 */
import { C, C1L, H } from "../../constants/values";
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

/** Fast-path evaluation of P·g(x) with x = dd.hi + dd.lo. */
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
 * A·u^p·g(x) for spectral variable u (m, Hz or m^-1) and temperature T (K);
 * inputs assumed finite and positive. +Infinity signals true overflow.
 */
export function spectralCore(shape: number, form: number, u: number, T: number): number {
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

/** Plain-double x = hc/(λkT) (for factors whose sensitivity to x is ≤ 1). */
export function xOf(form: number, u: number, T: number): number {
  if (form <= FORM_LAMBDA_PHOTON) return C2_HI / u / T;
  if (form <= FORM_NU_PHOTON) return (H_OVER_K_HI * u) / T;
  return (C2_HI * u) / T;
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
