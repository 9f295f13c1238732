/**
 * Astronomical magnitudes: Pogson's relation, distance modulus, the IAU 2015
 * bolometric magnitude scale, AB magnitudes, and f_ν ↔ f_λ.
 *
 * Floating-point notes. Logarithms use `Math.log10`, which is exact for exact
 * powers of ten in practice (V8 and SpiderMonkey return exactly 2 for
 * `Math.log10(100)`; the tests pin this). Inverse relations evaluate
 * 10^(Δm / −2.5) — dividing by 2.5 (exactly representable) is one correctly
 * rounded operation, whereas multiplying by 0.4 (not representable) would add
 * a second rounding; with this form a magnitude difference of exactly −5 gives
 * an exponent of exactly 2 and a flux ratio of exactly 100.
 *
 * Sources: Pogson 1856, MNRAS 17, 12 (the ratio 100^(1/5) per magnitude);
 * IAU 2015 Resolution B2 (bolometric zero points L₀ and f₀); Oke & Gunn 1983,
 * ApJ 266, 713 (AB system, 3631 Jy zero point — common practice).
 *
 * @module
 */
import { AB_ZERO_POINT, C, F0, L0, PARSEC } from "../../values/constants";
import { requireFinite, requirePositive } from "../../internal/checks";
import { requireFiniteResult, requirePositiveResult } from "./common";

/** 10 pc in m, the reference distance of absolute magnitudes (derived from the IAU 2015 B2 parsec). */
export const TEN_PARSECS_M = 10 * PARSEC;

/**
 * −2.5 log10(r), with + 0 so that r = 1 gives +0 rather than −0 (−2.5 × 0 = −0
 * in IEEE 754). @internal
 */
function pogsonMag(r: number): number {
  return -2.5 * Math.log10(r) + 0;
}

/**
 * 10^(mag / −2.5) with an explicit overflow check (underflow to 0 is allowed
 * and documented by callers). @internal
 */
function pogsonRatio(mag: number, what: string): number {
  const r = 10 ** (mag / -2.5);
  if (r === Infinity) throw new RangeError(`${what} overflows a double for a magnitude of ${String(mag)}`);
  return r;
}

/**
 * Pogson's relation, flux ratio → magnitude difference:
 * m₁ − m₂ = −2.5 log10(F₁/F₂). A ratio of exactly 100 gives exactly −5.
 *
 * @param fluxRatio - F₁/F₂ (> 0, finite, dimensionless)
 * @returns m₁ − m₂, mag
 * @throws RangeError naming `flux ratio`
 * @example
 * ```ts
 * import { magnitudeDifferenceFromFluxRatio } from "./magnitudes";
 * const dm = magnitudeDifferenceFromFluxRatio(100); // -5 (exactly)
 * ```
 */
export function magnitudeDifferenceFromFluxRatio(fluxRatio: number): number {
  requirePositive("flux ratio", fluxRatio, "(dimensionless)");
  return pogsonMag(fluxRatio);
}

/**
 * Pogson's relation, magnitude difference → flux ratio:
 * F₁/F₂ = 10^((m₁ − m₂) / −2.5). Underflows to 0 for Δm ≳ 810 mag.
 *
 * @param magnitudeDifference - m₁ − m₂, mag (finite)
 * @returns F₁/F₂ (dimensionless)
 * @throws RangeError naming `magnitude difference`, or when the ratio overflows (Δm ≲ −770)
 * @example
 * ```ts
 * import { fluxRatioFromMagnitudeDifference } from "./magnitudes";
 * const r = fluxRatioFromMagnitudeDifference(-5); // 100 (exactly)
 * ```
 */
export function fluxRatioFromMagnitudeDifference(magnitudeDifference: number): number {
  requireFinite("magnitude difference", magnitudeDifference, "mag");
  return pogsonRatio(magnitudeDifference, "flux ratio");
}

/**
 * Distance modulus, with an optional extinction term:
 * m − M = 5 log10(d / 10 pc) + A.
 *
 * @param distanceM - distance d, m (> 0)
 * @param extinctionMag - extinction A in the band, mag (finite; default 0)
 * @returns m − M, mag
 * @throws RangeError naming `distance` or `extinction`
 * @example
 * ```ts
 * import { distanceModulusSI } from "./magnitudes";
 * const mu = distanceModulusSI(3.0856775814913673e18); // 100 pc → 5 mag
 * ```
 */
export function distanceModulusSI(distanceM: number, extinctionMag = 0): number {
  requirePositive("distance", distanceM, "m");
  requireFinite("extinction", extinctionMag, "mag");
  return 5 * Math.log10(distanceM / TEN_PARSECS_M) + extinctionMag;
}

/**
 * Distance from a distance modulus (optionally including extinction A):
 * d = 10 pc × 10^((m − M − A) / 5).
 *
 * @param distanceModulusMag - m − M, mag (finite)
 * @param extinctionMag - extinction A, mag (finite; default 0)
 * @returns distance d, m
 * @throws RangeError naming `distance modulus` or `extinction`; or when d is not representable
 * @example
 * ```ts
 * import { distanceFromDistanceModulusSI } from "./magnitudes";
 * const d = distanceFromDistanceModulusSI(5); // 100 pc in m
 * ```
 */
export function distanceFromDistanceModulusSI(distanceModulusMag: number, extinctionMag = 0): number {
  requireFinite("distance modulus", distanceModulusMag, "mag");
  requireFinite("extinction", extinctionMag, "mag");
  return requirePositiveResult("distance", TEN_PARSECS_M * 10 ** ((distanceModulusMag - extinctionMag) / 5), "m");
}

/**
 * Absolute magnitude from apparent magnitude and distance:
 * M = m − 5 log10(d / 10 pc) − A.
 *
 * @param apparentMag - apparent magnitude m, mag (finite)
 * @param distanceM - distance d, m (> 0)
 * @param extinctionMag - extinction A, mag (finite; default 0)
 * @returns absolute magnitude M, mag
 * @throws RangeError naming `apparent magnitude`, `distance` or `extinction`
 * @example
 * ```ts
 * import { absoluteMagnitudeSI } from "./magnitudes";
 * const M = absoluteMagnitudeSI(10, 3.0856775814913673e18); // 5
 * ```
 */
export function absoluteMagnitudeSI(apparentMag: number, distanceM: number, extinctionMag = 0): number {
  requireFinite("apparent magnitude", apparentMag, "mag");
  return requireFiniteResult("absolute magnitude", apparentMag - distanceModulusSI(distanceM, extinctionMag), "mag");
}

/**
 * Apparent magnitude from absolute magnitude and distance:
 * m = M + 5 log10(d / 10 pc) + A.
 *
 * @param absoluteMag - absolute magnitude M, mag (finite)
 * @param distanceM - distance d, m (> 0)
 * @param extinctionMag - extinction A, mag (finite; default 0)
 * @returns apparent magnitude m, mag
 * @throws RangeError naming `absolute magnitude`, `distance` or `extinction`
 * @example
 * ```ts
 * import { apparentMagnitudeSI } from "./magnitudes";
 * const m = apparentMagnitudeSI(4.83, 3.0856775814913673e17); // 4.83 at 10 pc
 * ```
 */
export function apparentMagnitudeSI(absoluteMag: number, distanceM: number, extinctionMag = 0): number {
  requireFinite("absolute magnitude", absoluteMag, "mag");
  return requireFiniteResult("apparent magnitude", absoluteMag + distanceModulusSI(distanceM, extinctionMag), "mag");
}

/**
 * Absolute bolometric magnitude on the IAU 2015 Resolution B2 scale:
 * M_bol = −2.5 log10(L / L₀), L₀ = 3.0128 × 10²⁸ W.
 *
 * @param luminosityW - luminosity L, W (> 0)
 * @returns M_bol, mag
 * @throws RangeError naming `luminosity`
 * @example
 * ```ts
 * import { absoluteBolometricMagnitudeSI } from "./magnitudes";
 * const mSun = absoluteBolometricMagnitudeSI(3.828e26); // ≈ 4.74
 * ```
 */
export function absoluteBolometricMagnitudeSI(luminosityW: number): number {
  requirePositive("luminosity", luminosityW, "W");
  return pogsonMag(luminosityW / L0);
}

/**
 * Luminosity from an absolute bolometric magnitude (IAU 2015 B2):
 * L = L₀ × 10^(M_bol / −2.5).
 *
 * @param absoluteBolometricMag - M_bol, mag (finite)
 * @returns luminosity L, W
 * @throws RangeError naming `absolute bolometric magnitude`; or when L is not representable
 * @example
 * ```ts
 * import { luminosityFromAbsoluteBolometricMagnitudeSI } from "./magnitudes";
 * const l = luminosityFromAbsoluteBolometricMagnitudeSI(0); // 3.0128e28 W
 * ```
 */
export function luminosityFromAbsoluteBolometricMagnitudeSI(absoluteBolometricMag: number): number {
  requireFinite("absolute bolometric magnitude", absoluteBolometricMag, "mag");
  return requirePositiveResult("luminosity", L0 * pogsonRatio(absoluteBolometricMag, "luminosity"), "W");
}

/**
 * Apparent bolometric magnitude on the IAU 2015 Resolution B2 scale:
 * m_bol = −2.5 log10(f / f₀), f₀ = L₀ / (4π (10 pc)²) ≈ 2.518 × 10⁻⁸ W m⁻².
 *
 * @param bolometricFluxWm2 - bolometric flux f, W m^-2 (> 0)
 * @returns m_bol, mag
 * @throws RangeError naming `bolometric flux`
 * @example
 * ```ts
 * import { apparentBolometricMagnitudeSI } from "./magnitudes";
 * const mSun = apparentBolometricMagnitudeSI(1361); // ≈ -26.832
 * ```
 */
export function apparentBolometricMagnitudeSI(bolometricFluxWm2: number): number {
  requirePositive("bolometric flux", bolometricFluxWm2, "W m^-2");
  return pogsonMag(bolometricFluxWm2 / F0);
}

/**
 * Bolometric flux from an apparent bolometric magnitude (IAU 2015 B2):
 * f = f₀ × 10^(m_bol / −2.5).
 *
 * @param apparentBolometricMag - m_bol, mag (finite)
 * @returns bolometric flux f, W m^-2
 * @throws RangeError naming `apparent bolometric magnitude`; or when f is not representable
 * @example
 * ```ts
 * import { bolometricFluxFromApparentBolometricMagnitudeSI } from "./magnitudes";
 * const f = bolometricFluxFromApparentBolometricMagnitudeSI(-26.832); // ≈ 1361 W m^-2
 * ```
 */
export function bolometricFluxFromApparentBolometricMagnitudeSI(apparentBolometricMag: number): number {
  requireFinite("apparent bolometric magnitude", apparentBolometricMag, "mag");
  return requirePositiveResult("bolometric flux", F0 * pogsonRatio(apparentBolometricMag, "bolometric flux"), "W m^-2");
}

/**
 * AB magnitude from spectral flux density per unit frequency:
 * m_AB = −2.5 log10(f_ν / 3631 Jy) (Oke & Gunn 1983; common practice).
 *
 * @param fNuWm2Hz - f_ν, W m^-2 Hz^-1 (> 0); 1 Jy = 1e-26 W m^-2 Hz^-1
 * @returns m_AB, mag
 * @throws RangeError naming `spectral flux density`
 * @example
 * ```ts
 * import { abMagnitudeSI } from "./magnitudes";
 * const m = abMagnitudeSI(1e-32); // 1 µJy → ≈ 23.9
 * ```
 */
export function abMagnitudeSI(fNuWm2Hz: number): number {
  requirePositive("spectral flux density", fNuWm2Hz, "W m^-2 Hz^-1");
  return pogsonMag(fNuWm2Hz / AB_ZERO_POINT);
}

/**
 * Spectral flux density per unit frequency from an AB magnitude:
 * f_ν = 3631 Jy × 10^(m_AB / −2.5).
 *
 * @param abMag - m_AB, mag (finite)
 * @returns f_ν, W m^-2 Hz^-1
 * @throws RangeError naming `AB magnitude`; or when f_ν is not representable
 * @example
 * ```ts
 * import { spectralFluxDensityFromAbMagnitudeSI } from "./magnitudes";
 * const f = spectralFluxDensityFromAbMagnitudeSI(0); // 3.631e-23 W m^-2 Hz^-1
 * ```
 */
export function spectralFluxDensityFromAbMagnitudeSI(abMag: number): number {
  requireFinite("AB magnitude", abMag, "mag");
  return requirePositiveResult("spectral flux density", AB_ZERO_POINT * pogsonRatio(abMag, "spectral flux density"), "W m^-2 Hz^-1");
}

/**
 * Flux density per unit wavelength from flux density per unit frequency at
 * a wavelength λ (vacuum): f_λ = f_ν c / λ² (from f_ν |dν| = f_λ |dλ|, ν = c/λ).
 *
 * @param fNuWm2Hz - f_ν, W m^-2 Hz^-1 (> 0)
 * @param wavelengthM - λ, m (> 0)
 * @returns f_λ, W m^-2 m^-1 (= W m^-3)
 * @throws RangeError naming `spectral flux density` or `wavelength`
 * @example
 * ```ts
 * import { fLambdaFromFNuSI } from "./magnitudes";
 * const fl = fLambdaFromFNuSI(3.631e-23, 5.5e-7); // ≈ 3.6e-2 W m^-3 (3.6e-11 W m^-2 nm^-1)
 * ```
 */
export function fLambdaFromFNuSI(fNuWm2Hz: number, wavelengthM: number): number {
  requirePositive("spectral flux density", fNuWm2Hz, "W m^-2 Hz^-1");
  requirePositive("wavelength", wavelengthM, "m");
  return requirePositiveResult("f_lambda", (fNuWm2Hz * (C / wavelengthM)) / wavelengthM, "W m^-3");
}

/**
 * Flux density per unit frequency from flux density per unit wavelength:
 * f_ν = f_λ λ² / c.
 *
 * @param fLambdaWm3 - f_λ, W m^-2 m^-1 (> 0)
 * @param wavelengthM - λ, m (> 0)
 * @returns f_ν, W m^-2 Hz^-1
 * @throws RangeError naming `spectral flux density` or `wavelength`
 * @example
 * ```ts
 * import { fNuFromFLambdaSI } from "./magnitudes";
 * const fn = fNuFromFLambdaSI(3.6e-2, 5.5e-7); // ≈ 3.6e-23 W m^-2 Hz^-1
 * ```
 */
export function fNuFromFLambdaSI(fLambdaWm3: number, wavelengthM: number): number {
  requirePositive("spectral flux density", fLambdaWm3, "W m^-3");
  requirePositive("wavelength", wavelengthM, "m");
  return requirePositiveResult("f_nu", ((fLambdaWm3 * wavelengthM) / C) * wavelengthM, "W m^-2 Hz^-1");
}

// ---- unchecked cores (for the typed laws, which check their inputs in the caller's unit) ----

/** m₁ − m₂ = −2.5 log₁₀(r) without input checks (see {@link magnitudeDifferenceFromFluxRatio}). @internal */
export function magnitudeDifferenceFromFluxRatioUnchecked(fluxRatio: number): number {
  return pogsonMag(fluxRatio);
}

/** F₁/F₂ = 10^(Δm/−2.5) without input or result checks (see {@link fluxRatioFromMagnitudeDifference}); +Infinity on overflow. @internal */
export function fluxRatioFromMagnitudeDifferenceUnchecked(magnitudeDifference: number): number {
  return 10 ** (magnitudeDifference / -2.5);
}

/**
 * m₁ − m₂ = −2.5 log₁₀(F₁/F₂) for two positive finite fluxes in one unit,
 * without input checks: when the quotient under- or overflows, the
 * difference of the logarithms is used instead. @internal
 */
export function magnitudeDifferenceOfFluxesUnchecked(flux1: number, flux2: number): number {
  const r = flux1 / flux2;
  return r > 0 && r !== Infinity ? pogsonMag(r) : -2.5 * (Math.log10(flux1) - Math.log10(flux2));
}

/** m − M = 5 log₁₀(d / 10 pc) + A without input checks (see {@link distanceModulusSI}). @internal */
export function distanceModulusUnchecked(distanceM: number, extinctionMag: number): number {
  return 5 * Math.log10(distanceM / TEN_PARSECS_M) + extinctionMag;
}

/** d = 10 pc × 10^((μ − A)/5) without input or result checks (see {@link distanceFromDistanceModulusSI}). @internal */
export function distanceFromDistanceModulusUnchecked(distanceModulusMag: number, extinctionMag: number): number {
  return TEN_PARSECS_M * 10 ** ((distanceModulusMag - extinctionMag) / 5);
}

/** M = m − 5 log₁₀(d / 10 pc) − A without input or result checks (see {@link absoluteMagnitudeSI}). @internal */
export function absoluteMagnitudeUnchecked(apparentMag: number, distanceM: number, extinctionMag: number): number {
  return apparentMag - distanceModulusUnchecked(distanceM, extinctionMag);
}

/** m = M + 5 log₁₀(d / 10 pc) + A without input or result checks (see {@link apparentMagnitudeSI}). @internal */
export function apparentMagnitudeUnchecked(absoluteMag: number, distanceM: number, extinctionMag: number): number {
  return absoluteMag + distanceModulusUnchecked(distanceM, extinctionMag);
}

/** M_bol = −2.5 log₁₀(L / L₀) without input checks (see {@link absoluteBolometricMagnitudeSI}). @internal */
export function absoluteBolometricMagnitudeUnchecked(luminosityW: number): number {
  return pogsonMag(luminosityW / L0);
}

/** L = L₀ 10^(M_bol/−2.5) without input or result checks (see {@link luminosityFromAbsoluteBolometricMagnitudeSI}). @internal */
export function luminosityFromAbsoluteBolometricMagnitudeUnchecked(absoluteBolometricMag: number): number {
  return L0 * 10 ** (absoluteBolometricMag / -2.5);
}

/** m_bol = −2.5 log₁₀(f / f₀) without input checks (see {@link apparentBolometricMagnitudeSI}). @internal */
export function apparentBolometricMagnitudeUnchecked(bolometricFluxWm2: number): number {
  return pogsonMag(bolometricFluxWm2 / F0);
}

/** f = f₀ 10^(m_bol/−2.5) without input or result checks (see {@link bolometricFluxFromApparentBolometricMagnitudeSI}). @internal */
export function bolometricFluxFromApparentMagnitudeUnchecked(apparentBolometricMag: number): number {
  return F0 * 10 ** (apparentBolometricMag / -2.5);
}

/** m_AB = −2.5 log₁₀(f_ν / 3631 Jy) without input checks (see {@link abMagnitudeSI}). @internal */
export function abMagnitudeUnchecked(fNuWm2Hz: number): number {
  return pogsonMag(fNuWm2Hz / AB_ZERO_POINT);
}

/** f_ν = 3631 Jy × 10^(m_AB/−2.5) without input or result checks (see {@link spectralFluxDensityFromAbMagnitudeSI}). @internal */
export function spectralFluxDensityFromAbMagnitudeUnchecked(abMag: number): number {
  return AB_ZERO_POINT * 10 ** (abMag / -2.5);
}

/** f_λ = f_ν c / λ² without input or result checks (see {@link fLambdaFromFNuSI}). @internal */
export function fLambdaFromFNuUnchecked(fNuWm2Hz: number, wavelengthM: number): number {
  return (fNuWm2Hz * (C / wavelengthM)) / wavelengthM;
}

/** f_ν = f_λ λ² / c without input or result checks (see {@link fNuFromFLambdaSI}). @internal */
export function fNuFromFLambdaUnchecked(fLambdaWm3: number, wavelengthM: number): number {
  return ((fLambdaWm3 * wavelengthM) / C) * wavelengthM;
}
