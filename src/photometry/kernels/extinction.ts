/**
 * Interstellar extinction: the Cardelli, Clayton & Mathis (1989) law, and
 * reddening / dereddening of fluxes and magnitudes.
 *
 * CCM89 (Cardelli, Clayton & Mathis 1989, ApJ 345, 245, eqs. 2–5; coefficients
 * from memory, cross-checked by the continuity of the four pieces at their
 * joins and by the paper's normalisation a = 1, b = 0 at V, see the tests):
 *
 *   A_λ / A_V = a(x) + b(x) / R_V,   x = 1/λ in µm⁻¹, R_V = A_V / E(B−V)
 *
 * - infrared, 0.3 ≤ x < 1.1: a = 0.574 x^1.61, b = −0.527 x^1.61
 * - optical/NIR, 1.1 ≤ x < 3.3, y = x − 1.82:
 *   a = 1 + 0.17699y − 0.50447y² − 0.02427y³ + 0.72085y⁴ + 0.01979y⁵ − 0.77530y⁶ + 0.32999y⁷
 *   b = 1.41338y + 2.28305y² + 1.07233y³ − 5.38434y⁴ − 0.62251y⁵ + 5.30260y⁶ − 2.09002y⁷
 * - ultraviolet, 3.3 ≤ x ≤ 8:
 *   a = 1.752 − 0.316x − 0.104/((x − 4.67)² + 0.341) + F_a
 *   b = −3.090 + 1.825x + 1.206/((x − 4.62)² + 0.263) + F_b
 *   with F_a = F_b = 0 for x < 5.9, else
 *   F_a = −0.04473(x − 5.9)² − 0.009779(x − 5.9)³, F_b = 0.2130(x − 5.9)² + 0.1207(x − 5.9)³
 * - far ultraviolet, 8 < x ≤ 10:
 *   a = −1.073 − 0.628(x − 8) + 0.137(x − 8)² − 0.070(x − 8)³
 *   b = 13.670 + 4.257(x − 8) − 0.420(x − 8)² + 0.374(x − 8)³
 *
 * Domain: 0.3 ≤ x ≤ 10 µm⁻¹, i.e. 0.1 µm ≤ λ ≤ 3.333… µm (= 1/0.3 µm; the
 * check is made on x = 1/λ, so pass λ ≤ 3.3333 µm); outside it a
 * `RangeError` is thrown, the law is not extrapolated.
 *
 * R_V: the paper fitted sight lines spanning roughly R_V ≈ 2.6–5.5 (from
 * memory; exported as {@link CCM89_RV_FIT_MIN}/{@link CCM89_RV_FIT_MAX}).
 * These kernels accept any finite R_V > 0 so that callers can explore, but
 * values outside the fitted span are extrapolations of an empirical fit and
 * can be unphysical (e.g. A_λ < 0 in the infrared for R_V < 0.92). Warn in
 * the caller if that matters; the diffuse Milky Way average is R_V = 3.1.
 *
 * @module
 */
import { requireFinite, requirePositive } from "../../internal/checks";
import { requireFiniteResult } from "./common";

/** Lower end of the R_V range spanned by the CCM89 sample (≈ 2.6, from memory). */
export const CCM89_RV_FIT_MIN = 2.6;
/** Upper end of the R_V range spanned by the CCM89 sample (≈ 5.5, from memory). */
export const CCM89_RV_FIT_MAX = 5.5;
/** Lower limit of the CCM89 law in inverse wavelength, µm⁻¹. */
export const CCM89_X_MIN_INV_UM = 0.3;
/** Upper limit of the CCM89 law in inverse wavelength, µm⁻¹. */
export const CCM89_X_MAX_INV_UM = 10;
/** Diffuse-ISM mean total-to-selective extinction ratio R_V = 3.1 (common practice). */
export const RV_DIFFUSE_ISM = 3.1;

function checkX(xInvUm: number): void {
  if (!(xInvUm >= CCM89_X_MIN_INV_UM && xInvUm <= CCM89_X_MAX_INV_UM)) {
    throw new RangeError(
      `inverse wavelength x must be in [0.3, 10] µm^-1 (wavelength 0.1 to 3.333 µm) for the CCM89 law; got ${String(xInvUm)}`,
    );
  }
}

/** Convert λ (m) to x = 1/λ (µm⁻¹), validating λ and the CCM89 domain. */
function xFromWavelength(wavelengthM: number): number {
  requirePositive("wavelength", wavelengthM, "m");
  const x = 1e-6 / wavelengthM;
  if (!(x >= CCM89_X_MIN_INV_UM && x <= CCM89_X_MAX_INV_UM)) {
    throw new RangeError(
      `wavelength must be in [1e-7, 3.333e-6] m (x = 1/λ in [0.3, 10] µm^-1) for the CCM89 law; got ${String(wavelengthM)} m`,
    );
  }
  return x;
}

/**
 * CCM89 coefficient a(x), unchecked (x already in [0.3, 10]). Polynomials in
 * Horner form. @internal
 */
function aUnchecked(x: number): number {
  if (x < 1.1) return 0.574 * x ** 1.61;
  if (x < 3.3) {
    const y = x - 1.82;
    return 1 + y * (0.17699 + y * (-0.50447 + y * (-0.02427 + y * (0.72085 + y * (0.01979 + y * (-0.7753 + y * 0.32999))))));
  }
  if (x <= 8) {
    let fa = 0;
    if (x >= 5.9) {
      const u = x - 5.9;
      fa = u * u * (-0.04473 - 0.009779 * u);
    }
    const v = x - 4.67;
    return 1.752 - 0.316 * x - 0.104 / (v * v + 0.341) + fa;
  }
  const t = x - 8;
  return -1.073 + t * (-0.628 + t * (0.137 - 0.07 * t));
}

/** CCM89 coefficient b(x), unchecked. @internal */
function bUnchecked(x: number): number {
  if (x < 1.1) return -0.527 * x ** 1.61;
  if (x < 3.3) {
    const y = x - 1.82;
    return y * (1.41338 + y * (2.28305 + y * (1.07233 + y * (-5.38434 + y * (-0.62251 + y * (5.3026 + y * -2.09002))))));
  }
  if (x <= 8) {
    let fb = 0;
    if (x >= 5.9) {
      const u = x - 5.9;
      fb = u * u * (0.213 + 0.1207 * u);
    }
    const v = x - 4.62;
    return -3.09 + 1.825 * x + 1.206 / (v * v + 0.263) + fb;
  }
  const t = x - 8;
  return 13.67 + t * (4.257 + t * (-0.42 + 0.374 * t));
}

/**
 * CCM89 coefficient a(x) (Cardelli, Clayton & Mathis 1989, ApJ 345, 245,
 * eqs. 2–5; coefficients from memory).
 *
 * @param xInvUm - inverse wavelength x = 1/λ, µm⁻¹, 0.3 ≤ x ≤ 10
 * @returns a(x) (dimensionless)
 * @throws RangeError naming `inverse wavelength x` outside [0.3, 10]
 * @example
 * ```ts
 * import { ccm89AInverseMicron } from "./extinction";
 * const a = ccm89AInverseMicron(1.82); // 1 (V band)
 * ```
 */
export function ccm89AInverseMicron(xInvUm: number): number {
  checkX(xInvUm);
  return aUnchecked(xInvUm);
}

/**
 * CCM89 coefficient b(x) (Cardelli, Clayton & Mathis 1989, ApJ 345, 245,
 * eqs. 2–5; coefficients from memory).
 *
 * @param xInvUm - inverse wavelength x = 1/λ, µm⁻¹, 0.3 ≤ x ≤ 10
 * @returns b(x) (dimensionless)
 * @throws RangeError naming `inverse wavelength x` outside [0.3, 10]
 * @example
 * ```ts
 * import { ccm89BInverseMicron } from "./extinction";
 * const b = ccm89BInverseMicron(1.82); // 0 (V band)
 * ```
 */
export function ccm89BInverseMicron(xInvUm: number): number {
  checkX(xInvUm);
  return bUnchecked(xInvUm);
}

/**
 * CCM89 extinction curve A_λ / A_V = a(x) + b(x)/R_V at an inverse wavelength.
 *
 * @param xInvUm - x = 1/λ, µm⁻¹, 0.3 ≤ x ≤ 10
 * @param rV - R_V = A_V / E(B−V) (> 0; fitted span ≈ 2.6–5.5)
 * @returns A_λ / A_V (dimensionless)
 * @throws RangeError naming `inverse wavelength x` or `R_V`
 * @example
 * ```ts
 * import { ccm89RatioInverseMicron } from "./extinction";
 * const r = ccm89RatioInverseMicron(1 / 2.2, 3.1); // K band ≈ 0.114
 * ```
 */
export function ccm89RatioInverseMicron(xInvUm: number, rV: number): number {
  checkX(xInvUm);
  requirePositive("R_V", rV, "(dimensionless)");
  return aUnchecked(xInvUm) + bUnchecked(xInvUm) / rV;
}

/**
 * CCM89 extinction curve A_λ / A_V at a vacuum wavelength in metres.
 *
 * @param wavelengthM - λ, m, 1e-7 ≤ λ ≤ 3.333e-6
 * @param rV - R_V (> 0; fitted span ≈ 2.6–5.5)
 * @returns A_λ / A_V (dimensionless)
 * @throws RangeError naming `wavelength` or `R_V`
 * @example
 * ```ts
 * import { ccm89RatioSI } from "./extinction";
 * const r = ccm89RatioSI(4.4e-7, 3.1); // B band ≈ 1.32
 * ```
 */
export function ccm89RatioSI(wavelengthM: number, rV: number): number {
  const x = xFromWavelength(wavelengthM);
  requirePositive("R_V", rV, "(dimensionless)");
  return aUnchecked(x) + bUnchecked(x) / rV;
}

/**
 * Extinction A_λ (mag) at a wavelength from A_V and R_V with the CCM89 law:
 * A_λ = A_V (a(x) + b(x)/R_V).
 *
 * @param wavelengthM - λ, m, 1e-7 ≤ λ ≤ 3.333e-6
 * @param aVMag - A_V, mag (finite; normally ≥ 0)
 * @param rV - R_V (> 0)
 * @returns A_λ, mag
 * @throws RangeError naming `wavelength`, `A_V` or `R_V`
 * @example
 * ```ts
 * import { ccm89ExtinctionMagSI } from "./extinction";
 * const aK = ccm89ExtinctionMagSI(2.2e-6, 1, 3.1); // ≈ 0.114 mag
 * ```
 */
export function ccm89ExtinctionMagSI(wavelengthM: number, aVMag: number, rV: number): number {
  requireFinite("A_V", aVMag, "mag");
  return requireFiniteResult("extinction", aVMag * ccm89RatioSI(wavelengthM, rV), "mag");
}

/**
 * Total extinction from colour excess: A_V = R_V × E(B−V).
 *
 * @param colourExcessBVMag - E(B−V), mag (finite)
 * @param rV - R_V (> 0)
 * @returns A_V, mag
 * @throws RangeError naming `E(B-V)` or `R_V`
 * @example
 * ```ts
 * import { aVFromColourExcess } from "./extinction";
 * const aV = aVFromColourExcess(0.1, 3.1); // 0.31
 * ```
 */
export function aVFromColourExcess(colourExcessBVMag: number, rV: number): number {
  requireFinite("E(B-V)", colourExcessBVMag, "mag");
  requirePositive("R_V", rV, "(dimensionless)");
  return requireFiniteResult("A_V", rV * colourExcessBVMag, "mag");
}

/**
 * Colour excess from total extinction: E(B−V) = A_V / R_V.
 *
 * @param aVMag - A_V, mag (finite)
 * @param rV - R_V (> 0)
 * @returns E(B−V), mag
 * @throws RangeError naming `A_V` or `R_V`
 * @example
 * ```ts
 * import { colourExcessFromAV } from "./extinction";
 * const ebv = colourExcessFromAV(0.31, 3.1); // 0.1
 * ```
 */
export function colourExcessFromAV(aVMag: number, rV: number): number {
  requireFinite("A_V", aVMag, "mag");
  requirePositive("R_V", rV, "(dimensionless)");
  return requireFiniteResult("E(B-V)", aVMag / rV, "mag");
}

/**
 * Redden a flux: F_obs = F_intrinsic × 10^(A / −2.5).
 *
 * @param fluxIntrinsic - intrinsic flux (any flux unit, > 0)
 * @param extinctionMag - A at the flux's wavelength/band, mag (finite)
 * @returns observed (extinguished) flux, same unit (may underflow to 0 for A ≳ 800 mag)
 * @throws RangeError naming `flux` or `extinction`
 * @example
 * ```ts
 * import { reddenFlux } from "./extinction";
 * const f = reddenFlux(100, 5); // 1
 * ```
 */
export function reddenFlux(fluxIntrinsic: number, extinctionMag: number): number {
  requirePositive("flux", fluxIntrinsic, "(flux unit)");
  requireFinite("extinction", extinctionMag, "mag");
  return requireFiniteResult("reddened flux", fluxIntrinsic * 10 ** (extinctionMag / -2.5), "(flux unit)");
}

/**
 * Deredden (correct) a flux: F_intrinsic = F_obs × 10^(A / 2.5).
 *
 * @param fluxObserved - observed flux (any flux unit, > 0)
 * @param extinctionMag - A, mag (finite)
 * @returns intrinsic flux, same unit
 * @throws RangeError naming `flux` or `extinction`; or on overflow
 * @example
 * ```ts
 * import { dereddenFlux } from "./extinction";
 * const f = dereddenFlux(1, 5); // 100
 * ```
 */
export function dereddenFlux(fluxObserved: number, extinctionMag: number): number {
  requirePositive("flux", fluxObserved, "(flux unit)");
  requireFinite("extinction", extinctionMag, "mag");
  return requireFiniteResult("dereddened flux", fluxObserved * 10 ** (extinctionMag / 2.5), "(flux unit)");
}

/**
 * Redden a magnitude: m_obs = m_intrinsic + A.
 *
 * @param magIntrinsic - intrinsic magnitude, mag (finite)
 * @param extinctionMag - A, mag (finite)
 * @returns observed magnitude, mag
 * @throws RangeError naming `magnitude` or `extinction`
 * @example
 * ```ts
 * import { reddenMagnitude } from "./extinction";
 * const m = reddenMagnitude(10, 0.31); // 10.31
 * ```
 */
export function reddenMagnitude(magIntrinsic: number, extinctionMag: number): number {
  requireFinite("magnitude", magIntrinsic, "mag");
  requireFinite("extinction", extinctionMag, "mag");
  return requireFiniteResult("reddened magnitude", magIntrinsic + extinctionMag, "mag");
}

/**
 * Deredden a magnitude: m_intrinsic = m_obs − A.
 *
 * @param magObserved - observed magnitude, mag (finite)
 * @param extinctionMag - A, mag (finite)
 * @returns intrinsic magnitude, mag
 * @throws RangeError naming `magnitude` or `extinction`
 * @example
 * ```ts
 * import { dereddenMagnitude } from "./extinction";
 * const m = dereddenMagnitude(10.31, 0.31); // 10
 * ```
 */
export function dereddenMagnitude(magObserved: number, extinctionMag: number): number {
  requireFinite("magnitude", magObserved, "mag");
  requireFinite("extinction", extinctionMag, "mag");
  return requireFiniteResult("dereddened magnitude", magObserved - extinctionMag, "mag");
}

// ---- unchecked cores (for the typed laws, which check their inputs in the caller's unit) ----

/** A_λ/A_V = a(x) + b(x)/R_V at x = 1/λ (µm⁻¹) without input checks (see {@link ccm89RatioSI}): the caller keeps λ in the fit range. @internal */
export function ccm89RatioUnchecked(wavelengthM: number, rV: number): number {
  const x = 1e-6 / wavelengthM;
  return aUnchecked(x) + bUnchecked(x) / rV;
}

/** A_λ = A_V (a(x) + b(x)/R_V) without input or result checks (see {@link ccm89ExtinctionMagSI}). @internal */
export function ccm89ExtinctionUnchecked(wavelengthM: number, aVMag: number, rV: number): number {
  return aVMag * ccm89RatioUnchecked(wavelengthM, rV);
}

/** A_V = R_V E(B−V) without input or result checks (see {@link aVFromColourExcess}). @internal */
export function aVFromColorExcessUnchecked(colourExcessBVMag: number, rV: number): number {
  return rV * colourExcessBVMag;
}

/** E(B−V) = A_V / R_V without input or result checks (see {@link colourExcessFromAV}). @internal */
export function colorExcessFromAVUnchecked(aVMag: number, rV: number): number {
  return aVMag / rV;
}

/** F × 10^(A/−2.5) without input or result checks (see {@link reddenFlux}). @internal */
export function reddenFluxUnchecked(fluxIntrinsic: number, extinctionMag: number): number {
  return fluxIntrinsic * 10 ** (extinctionMag / -2.5);
}

/** F × 10^(A/2.5) without input or result checks (see {@link dereddenFlux}); +Infinity on overflow. @internal */
export function dereddenFluxUnchecked(fluxObserved: number, extinctionMag: number): number {
  return fluxObserved * 10 ** (extinctionMag / 2.5);
}

/** m + A without input or result checks (see {@link reddenMagnitude}). @internal */
export function reddenMagnitudeUnchecked(magIntrinsic: number, extinctionMag: number): number {
  return magIntrinsic + extinctionMag;
}

/** m − A without input or result checks (see {@link dereddenMagnitude}). @internal */
export function dereddenMagnitudeUnchecked(magObserved: number, extinctionMag: number): number {
  return magObserved - extinctionMag;
}
