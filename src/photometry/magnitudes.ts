/**
 * Astronomical magnitudes, typed: Pogson's relation, the distance modulus,
 * apparent ↔ absolute magnitudes, the IAU 2015 bolometric scale, AB
 * magnitudes, and f_ν ↔ f_λ.
 *
 * **Magnitudes are plain numbers.** A magnitude (or a magnitude difference,
 * an extinction A, a colour excess) is a pure number in mag. Every function
 * here accepts it as a {@link Pure}: a plain `number` or a `Dimensionless`
 * quantity, while a branded quantity of any other dimension (an angle in
 * mas, a length, a flux) is rejected at compile time. Magnitudes are returned
 * as plain `number`s, so ordinary arithmetic (m + 5, m₁ − m₂) just works.
 * The physical quantities on the other side — distance, luminosity,
 * bolometric flux, f_ν, f_λ — are typed and in the system passed first.
 *
 * f_ν (per unit frequency, W m⁻² Hz⁻¹, erg s⁻¹ cm⁻² Hz⁻¹, Jy via `units.Jy`)
 * and f_λ (per unit wavelength, W m⁻² m⁻¹, erg s⁻¹ cm⁻² cm⁻¹ or Å⁻¹) are
 * different dimensions; converting between them needs the wavelength
 * (f_λ = f_ν c/λ²), and handing one where the other is wanted does not compile.
 *
 * Accuracy: logarithms and powers of ten (≤ 1 ulp in V8) plus a few roundings;
 * Pogson's relation is exact for exact powers of 100 (100 ↔ −5 mag).
 * Against 50-digit mpmath (kernels/magnitudes.test.ts): ≤ 2e-15 relative for
 * fluxes, ≤ 1e-14 mag absolute for magnitudes.
 *
 * Sources: Pogson 1856, MNRAS 17, 12; IAU 2015 Resolution B2 (L₀ = 3.0128e28 W,
 * f₀ = L₀/(4π (10 pc)²) ≈ 2.518e-8 W m⁻²); Oke & Gunn 1983, ApJ 266, 713
 * (AB zero point 3631 Jy, common practice).
 *
 * @module
 */
import { positive, toSI } from "../internal/typed";
import { kinds } from "../quantity/aliases";
import type { Flux, Length, Power, SpectralFluxPerFrequency, SpectralFluxPerWavelength } from "../quantity/aliases";
import type { AnyQuantity, Pure, SystemName } from "../quantity/quantity";
import type { UnitSystem } from "../quantity/system";
import {
  abMagnitudeSI,
  absoluteBolometricMagnitudeSI,
  absoluteMagnitudeSI,
  apparentBolometricMagnitudeSI,
  apparentMagnitudeSI,
  bolometricFluxFromApparentMagnitudeSI,
  distanceFromDistanceModulusSI,
  distanceModulusSI,
  fLambdaFromFNuSI,
  fluxRatioFromMagnitudeDifference as fluxRatioKernel,
  fNuFromFLambdaSI,
  luminosityFromAbsoluteBolometricMagnitudeSI,
  magnitudeDifferenceFromFluxRatio as magnitudeDifferenceKernel,
  spectralFluxDensityFromAbMagnitudeSI,
} from "./kernels/magnitudes";
import { finiteMag, kernel, positiveIn } from "./typed-common";

const L = kinds.length.dimension;
const P = kinds.power.dimension;
const F = kinds.flux.dimension;
const FNU = kinds.spectralFluxPerFrequency.dimension;
const FLAM = kinds.spectralFluxPerWavelength.dimension;

/**
 * Pogson's relation, flux ratio → magnitude difference: m₁ − m₂ = −2.5 log₁₀(F₁/F₂).
 *
 * @param fluxRatio - F₁/F₂, a pure number (> 0)
 * @returns m₁ − m₂, mag (a ratio of exactly 100 gives exactly −5)
 * @throws RangeError naming `flux ratio` unless finite and > 0
 * @example
 * ```ts
 * import { magnitudeDifferenceFromFluxRatio } from "starlume";
 * magnitudeDifferenceFromFluxRatio(100); // -5
 * ```
 */
export function magnitudeDifferenceFromFluxRatio(fluxRatio: Pure): number {
  return magnitudeDifferenceKernel(fluxRatio);
}

/**
 * Pogson's relation, magnitude difference → flux ratio: F₁/F₂ = 10^((m₁ − m₂)/−2.5).
 *
 * @param magnitudeDifference - m₁ − m₂, mag (finite)
 * @returns F₁/F₂ (underflows to 0 beyond ≈ +810 mag)
 * @throws RangeError naming `magnitude difference`, or when the ratio overflows (≲ −770 mag)
 * @example
 * ```ts
 * import { fluxRatioFromMagnitudeDifference } from "starlume";
 * fluxRatioFromMagnitudeDifference(-5); // 100
 * ```
 */
export function fluxRatioFromMagnitudeDifference(magnitudeDifference: Pure): number {
  return fluxRatioKernel(magnitudeDifference);
}

/**
 * Magnitude difference between two fluxes of the same kind and system:
 * m₁ − m₂ = −2.5 log₁₀(F₁/F₂). Any flux-like quantity works (bolometric
 * flux, f_ν, f_λ, counts…), but both must be the same type: comparing an f_ν
 * with an f_λ, or an SI flux with a CGS one, does not compile.
 *
 * @param flux1 - F₁ (> 0)
 * @param flux2 - F₂ (> 0), same type as F₁
 * @returns m₁ − m₂, mag
 * @throws RangeError naming `flux1` or `flux2` unless finite and > 0
 * @example
 * ```ts
 * import { SI, magnitudeDifference, units } from "starlume";
 * magnitudeDifference(SI.of(1, units.mJy), SI.of(100, units.mJy)); // 5
 * ```
 */
export function magnitudeDifference<Q extends AnyQuantity>(flux1: Q, flux2: NoInfer<Q>): number {
  if (!(flux1 > 0) || flux1 === Infinity) throw new RangeError(`flux1 must be a finite number > 0; got ${String(flux1)}`);
  if (!(flux2 > 0) || flux2 === Infinity) throw new RangeError(`flux2 must be a finite number > 0; got ${String(flux2)}`);
  const r = flux1 / flux2;
  // the quotient of two positive finite doubles can under/overflow; the log of each then still works
  return r > 0 && r !== Infinity ? magnitudeDifferenceKernel(r) : -2.5 * (Math.log10(flux1) - Math.log10(flux2));
}

/**
 * Distance modulus with optional extinction: m − M = 5 log₁₀(d / 10 pc) + A.
 *
 * @param sys - `SI` or `CGS`
 * @param distance - distance d, in `sys`
 * @param extinction - extinction A in the band, mag (default 0)
 * @returns m − M, mag
 * @throws RangeError naming `distance` or `extinction`
 * @example
 * ```ts
 * import { SI, distanceModulus, units } from "starlume";
 * distanceModulus(SI, SI.of(100, units.pc)); // 5
 * ```
 */
export function distanceModulus<S extends SystemName>(sys: UnitSystem<S>, distance: Length<NoInfer<S>>, extinction: Pure = 0): number {
  positive(sys, "distance", distance, L);
  finiteMag("extinction", extinction);
  return distanceModulusSI(toSI(sys, distance, L), extinction);
}

/**
 * Distance from a distance modulus (less any extinction A):
 * d = 10 pc × 10^((m − M − A)/5).
 *
 * @param sys - `SI` or `CGS` (the system of the result)
 * @param distanceModulus - m − M, mag
 * @param extinction - A, mag (default 0)
 * @returns distance d, in `sys`
 * @throws RangeError naming `distance modulus` or `extinction`, or when d is not representable
 * @example
 * ```ts
 * import { CGS, distanceFromDistanceModulus, units } from "starlume";
 * CGS.valueIn(distanceFromDistanceModulus(CGS, 5), units.pc); // 100
 * ```
 */
export function distanceFromDistanceModulus<S extends SystemName>(sys: UnitSystem<S>, distanceModulus: Pure, extinction: Pure = 0): Length<S> {
  finiteMag("distance modulus", distanceModulus);
  finiteMag("extinction", extinction);
  const d = kernel(sys, "distance", L, () => distanceFromDistanceModulusSI(distanceModulus, extinction));
  return positiveIn(sys, "distance", d, L) as Length<S>;
}

/**
 * Absolute magnitude: M = m − 5 log₁₀(d / 10 pc) − A.
 *
 * @param sys - `SI` or `CGS`
 * @param apparentMagnitude - m, mag
 * @param distance - distance d, in `sys`
 * @param extinction - A, mag (default 0)
 * @returns M, mag
 * @throws RangeError naming `apparent magnitude`, `distance` or `extinction`
 * @example
 * ```ts
 * import { SI, absoluteMagnitude, units } from "starlume";
 * absoluteMagnitude(SI, 10, SI.of(100, units.pc)); // 5
 * ```
 */
export function absoluteMagnitude<S extends SystemName>(
  sys: UnitSystem<S>,
  apparentMagnitude: Pure,
  distance: Length<NoInfer<S>>,
  extinction: Pure = 0,
): number {
  finiteMag("apparent magnitude", apparentMagnitude);
  positive(sys, "distance", distance, L);
  finiteMag("extinction", extinction);
  return absoluteMagnitudeSI(apparentMagnitude, toSI(sys, distance, L), extinction);
}

/**
 * Apparent magnitude: m = M + 5 log₁₀(d / 10 pc) + A.
 *
 * @param sys - `SI` or `CGS`
 * @param absoluteMagnitude - M, mag
 * @param distance - distance d, in `sys`
 * @param extinction - A, mag (default 0)
 * @returns m, mag
 * @throws RangeError naming `absolute magnitude`, `distance` or `extinction`
 * @example
 * ```ts
 * import { CGS, apparentMagnitude, units } from "starlume";
 * apparentMagnitude(CGS, 4.74, CGS.of(1, units.au)); // ≈ -26.83
 * ```
 */
export function apparentMagnitude<S extends SystemName>(
  sys: UnitSystem<S>,
  absoluteMagnitude: Pure,
  distance: Length<NoInfer<S>>,
  extinction: Pure = 0,
): number {
  finiteMag("absolute magnitude", absoluteMagnitude);
  positive(sys, "distance", distance, L);
  finiteMag("extinction", extinction);
  return apparentMagnitudeSI(absoluteMagnitude, toSI(sys, distance, L), extinction);
}

/**
 * Absolute bolometric magnitude on the IAU 2015 B2 scale: M_bol = −2.5 log₁₀(L / L₀), L₀ = 3.0128e28 W.
 *
 * @param sys - `SI` or `CGS`
 * @param luminosity - L, in `sys`
 * @returns M_bol, mag
 * @throws RangeError naming `luminosity`
 * @example
 * ```ts
 * import { SI, absoluteBolometricMagnitude, units } from "starlume";
 * absoluteBolometricMagnitude(SI, SI.of(1, units.Lsol)); // ≈ 4.74
 * ```
 */
export function absoluteBolometricMagnitude<S extends SystemName>(sys: UnitSystem<S>, luminosity: Power<NoInfer<S>>): number {
  positive(sys, "luminosity", luminosity, P);
  return kernel(sys, "luminosity", P, () => absoluteBolometricMagnitudeSI(toSI(sys, luminosity, P)));
}

/**
 * Luminosity from an absolute bolometric magnitude (IAU 2015 B2): L = L₀ 10^(M_bol/−2.5).
 *
 * @param sys - `SI` (W) or `CGS` (erg s⁻¹)
 * @param absoluteBolometricMagnitude - M_bol, mag
 * @returns L, in `sys`
 * @throws RangeError naming `absolute bolometric magnitude`, or when L is not representable
 * @example
 * ```ts
 * import { CGS, luminosityFromAbsoluteBolometricMagnitude } from "starlume";
 * luminosityFromAbsoluteBolometricMagnitude(CGS, 0); // 3.0128e35 erg s^-1
 * ```
 */
export function luminosityFromAbsoluteBolometricMagnitude<S extends SystemName>(sys: UnitSystem<S>, absoluteBolometricMagnitude: Pure): Power<S> {
  finiteMag("absolute bolometric magnitude", absoluteBolometricMagnitude);
  const l = kernel(sys, "luminosity", P, () => luminosityFromAbsoluteBolometricMagnitudeSI(absoluteBolometricMagnitude));
  return positiveIn(sys, "luminosity", l, P) as Power<S>;
}

/**
 * Apparent bolometric magnitude on the IAU 2015 B2 scale: m_bol = −2.5 log₁₀(f / f₀), f₀ ≈ 2.518e-8 W m⁻².
 *
 * @param sys - `SI` or `CGS`
 * @param bolometricFlux - bolometric flux (irradiance) f, in `sys`
 * @returns m_bol, mag
 * @throws RangeError naming `bolometric flux`
 * @example
 * ```ts
 * import { SI, apparentBolometricMagnitude, units } from "starlume";
 * apparentBolometricMagnitude(SI, SI.of(1361, units.W_per_m2)); // ≈ -26.832
 * ```
 */
export function apparentBolometricMagnitude<S extends SystemName>(sys: UnitSystem<S>, bolometricFlux: Flux<NoInfer<S>>): number {
  positive(sys, "bolometric flux", bolometricFlux, F);
  return kernel(sys, "bolometric flux", F, () => apparentBolometricMagnitudeSI(toSI(sys, bolometricFlux, F)));
}

/**
 * Bolometric flux from an apparent bolometric magnitude (IAU 2015 B2): f = f₀ 10^(m_bol/−2.5).
 *
 * @param sys - `SI` (W m⁻²) or `CGS` (erg s⁻¹ cm⁻²)
 * @param apparentBolometricMagnitude - m_bol, mag
 * @returns f, in `sys`
 * @throws RangeError naming `apparent bolometric magnitude`, or when f is not representable
 * @example
 * ```ts
 * import { SI, bolometricFluxFromApparentMagnitude, units } from "starlume";
 * SI.valueIn(bolometricFluxFromApparentMagnitude(SI, -26.832), units.W_per_m2); // ≈ 1361
 * ```
 */
export function bolometricFluxFromApparentMagnitude<S extends SystemName>(sys: UnitSystem<S>, apparentBolometricMagnitude: Pure): Flux<S> {
  finiteMag("apparent bolometric magnitude", apparentBolometricMagnitude);
  const f = kernel(sys, "bolometric flux", F, () => bolometricFluxFromApparentMagnitudeSI(apparentBolometricMagnitude));
  return positiveIn(sys, "bolometric flux", f, F) as Flux<S>;
}

/**
 * AB magnitude of a spectral flux density per unit frequency:
 * m_AB = −2.5 log₁₀(f_ν / 3631 Jy).
 *
 * @param sys - `SI` or `CGS`
 * @param fNu - f_ν, in `sys` (e.g. `SI.of(3631, units.Jy)`)
 * @returns m_AB, mag
 * @throws RangeError naming `spectral flux density` (f_ν) in `sys`'s unit
 * @example
 * ```ts
 * import { SI, abMagnitude, units } from "starlume";
 * abMagnitude(SI, SI.of(3631, units.Jy)); // 0
 * abMagnitude(SI, SI.of(1, units.uJy)); // ≈ 23.9
 * ```
 */
export function abMagnitude<S extends SystemName>(sys: UnitSystem<S>, fNu: SpectralFluxPerFrequency<NoInfer<S>>): number {
  positive(sys, "spectral flux density f_nu", fNu, FNU);
  return kernel(sys, "spectral flux density f_nu", FNU, () => abMagnitudeSI(toSI(sys, fNu, FNU)));
}

/**
 * Spectral flux density per unit frequency of an AB magnitude: f_ν = 3631 Jy × 10^(m_AB/−2.5).
 *
 * @param sys - `SI` (W m⁻² Hz⁻¹) or `CGS` (erg s⁻¹ cm⁻² Hz⁻¹)
 * @param abMagnitude - m_AB, mag
 * @returns f_ν, in `sys` (read it in Jy with `SI.valueIn(f, units.Jy)`)
 * @throws RangeError naming `AB magnitude`, or when f_ν is not representable
 * @example
 * ```ts
 * import { SI, fNuFromAbMagnitude, units } from "starlume";
 * SI.valueIn(fNuFromAbMagnitude(SI, 0), units.Jy); // 3631
 * ```
 */
export function fNuFromAbMagnitude<S extends SystemName>(sys: UnitSystem<S>, abMagnitude: Pure): SpectralFluxPerFrequency<S> {
  finiteMag("AB magnitude", abMagnitude);
  const f = kernel(sys, "spectral flux density f_nu", FNU, () => spectralFluxDensityFromAbMagnitudeSI(abMagnitude));
  return positiveIn(sys, "spectral flux density f_nu", f, FNU) as SpectralFluxPerFrequency<S>;
}

/**
 * Flux density per unit wavelength from flux density per unit frequency at
 * a vacuum wavelength λ: f_λ = f_ν c / λ² (from f_ν |dν| = f_λ |dλ|).
 *
 * @param sys - `SI` or `CGS`
 * @param fNu - f_ν, in `sys`
 * @param wavelength - vacuum wavelength λ, in `sys`
 * @returns f_λ, in `sys` (W m⁻² m⁻¹ or erg s⁻¹ cm⁻² cm⁻¹)
 * @throws RangeError naming `spectral flux density f_nu` or `wavelength`
 * @example
 * ```ts
 * import { CGS, fLambdaFromFNu, units } from "starlume";
 * const fl = fLambdaFromFNu(CGS, CGS.of(3631, units.Jy), CGS.of(5500, units.angstrom));
 * CGS.valueIn(fl, units.erg_per_s_cm2_A); // ≈ 3.5985e-9
 * ```
 */
export function fLambdaFromFNu<S extends SystemName>(
  sys: UnitSystem<S>,
  fNu: SpectralFluxPerFrequency<NoInfer<S>>,
  wavelength: Length<NoInfer<S>>,
): SpectralFluxPerWavelength<S> {
  positive(sys, "spectral flux density f_nu", fNu, FNU);
  positive(sys, "wavelength", wavelength, L);
  const f = kernel(sys, "spectral flux density f_lambda", FLAM, () => fLambdaFromFNuSI(toSI(sys, fNu, FNU), toSI(sys, wavelength, L)));
  return positiveIn(sys, "spectral flux density f_lambda", f, FLAM) as SpectralFluxPerWavelength<S>;
}

/**
 * Flux density per unit frequency from flux density per unit wavelength:
 * f_ν = f_λ λ² / c.
 *
 * @param sys - `SI` or `CGS`
 * @param fLambda - f_λ, in `sys`
 * @param wavelength - vacuum wavelength λ, in `sys`
 * @returns f_ν, in `sys`
 * @throws RangeError naming `spectral flux density f_lambda` or `wavelength`
 * @example
 * ```ts
 * import { CGS, fNuFromFLambda, units } from "starlume";
 * const fn = fNuFromFLambda(CGS, CGS.of(3.6e-9, units.erg_per_s_cm2_A), CGS.of(5500, units.angstrom));
 * CGS.valueIn(fn, units.Jy); // ≈ 3632.5
 * ```
 */
export function fNuFromFLambda<S extends SystemName>(
  sys: UnitSystem<S>,
  fLambda: SpectralFluxPerWavelength<NoInfer<S>>,
  wavelength: Length<NoInfer<S>>,
): SpectralFluxPerFrequency<S> {
  positive(sys, "spectral flux density f_lambda", fLambda, FLAM);
  positive(sys, "wavelength", wavelength, L);
  const f = kernel(sys, "spectral flux density f_nu", FNU, () => fNuFromFLambdaSI(toSI(sys, fLambda, FLAM), toSI(sys, wavelength, L)));
  return positiveIn(sys, "spectral flux density f_nu", f, FNU) as SpectralFluxPerFrequency<S>;
}
