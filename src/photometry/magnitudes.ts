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
 * Each function is a law of the law toolkit (`defineLaw`): inputs are
 * checked once, in the caller's unit (magnitudes: finite, named in mag), and
 * a result beyond the double range in the caller's system is a RangeError
 * naming the arguments, never Infinity.
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
import { defineLaw } from "../law/define";
import { lawInput } from "../law/input";
import { kinds } from "../quantity/aliases";
import type { Flux, Length, Power, SpectralFluxPerFrequency, SpectralFluxPerWavelength } from "../quantity/aliases";
import type { AnyQuantity, Pure, SystemName } from "../quantity/quantity";
import { SI, type UnitSystem } from "../quantity/system";
import {
  abMagnitudeUnchecked,
  absoluteBolometricMagnitudeUnchecked,
  absoluteMagnitudeUnchecked,
  apparentBolometricMagnitudeUnchecked,
  apparentMagnitudeUnchecked,
  bolometricFluxFromApparentMagnitudeUnchecked,
  distanceFromDistanceModulusUnchecked,
  distanceModulusUnchecked,
  fLambdaFromFNuUnchecked,
  fluxRatioFromMagnitudeDifferenceUnchecked,
  fNuFromFLambdaUnchecked,
  luminosityFromAbsoluteBolometricMagnitudeUnchecked,
  magnitudeDifferenceFromFluxRatioUnchecked,
  magnitudeDifferenceOfFluxesUnchecked,
  spectralFluxDensityFromAbMagnitudeUnchecked,
} from "./kernels/magnitudes";

/** A magnitude input: a plain number in mag, any finite value. */
const mag = (name: string) => lawInput(name, kinds.dimensionless, { check: "finite", unit: "mag" });

const distanceIn = lawInput("distance", kinds.length);
const luminosityIn = lawInput("luminosity", kinds.power);
const bolometricFluxIn = lawInput("bolometric flux", kinds.flux);
const fNuIn = lawInput("spectral flux density f_nu", kinds.spectralFluxPerFrequency);
const fLambdaIn = lawInput("spectral flux density f_lambda", kinds.spectralFluxPerWavelength);
const wavelengthIn = lawInput("wavelength", kinds.length);
const extinctionIn = mag("extinction");

const magnitudeDifferenceLaw = defineLaw({
  name: "magnitude difference",
  inputs: [lawInput("flux ratio", kinds.dimensionless)],
  result: kinds.dimensionless,
  kernel: magnitudeDifferenceFromFluxRatioUnchecked,
});
const fluxRatioLaw = defineLaw({
  name: "flux ratio",
  inputs: [mag("magnitude difference")],
  result: kinds.dimensionless,
  kernel: fluxRatioFromMagnitudeDifferenceUnchecked,
});
/** Two fluxes of one (any) kind, in one unit: read as plain numbers, since only their ratio matters. */
const fluxesMagnitudeDifferenceLaw = defineLaw({
  name: "magnitude difference",
  inputs: [lawInput("flux1", kinds.dimensionless), lawInput("flux2", kinds.dimensionless)],
  result: kinds.dimensionless,
  kernel: magnitudeDifferenceOfFluxesUnchecked,
});
const distanceModulusLaw = defineLaw({ name: "distance modulus", inputs: [distanceIn, extinctionIn], result: kinds.dimensionless, kernel: distanceModulusUnchecked });
const distanceFromModulusLaw = defineLaw({
  name: "distance",
  inputs: [mag("distance modulus"), extinctionIn],
  result: kinds.length,
  kernel: distanceFromDistanceModulusUnchecked,
});
const absoluteMagnitudeLaw = defineLaw({
  name: "absolute magnitude",
  inputs: [mag("apparent magnitude"), distanceIn, extinctionIn],
  result: kinds.dimensionless,
  kernel: absoluteMagnitudeUnchecked,
});
const apparentMagnitudeLaw = defineLaw({
  name: "apparent magnitude",
  inputs: [mag("absolute magnitude"), distanceIn, extinctionIn],
  result: kinds.dimensionless,
  kernel: apparentMagnitudeUnchecked,
});
const absoluteBolometricLaw = defineLaw({ name: "absolute bolometric magnitude", inputs: [luminosityIn], result: kinds.dimensionless, kernel: absoluteBolometricMagnitudeUnchecked });
const luminosityFromMagLaw = defineLaw({
  name: "luminosity",
  inputs: [mag("absolute bolometric magnitude")],
  result: kinds.power,
  kernel: luminosityFromAbsoluteBolometricMagnitudeUnchecked,
});
const apparentBolometricLaw = defineLaw({ name: "apparent bolometric magnitude", inputs: [bolometricFluxIn], result: kinds.dimensionless, kernel: apparentBolometricMagnitudeUnchecked });
const bolometricFluxLaw = defineLaw({
  name: "bolometric flux",
  inputs: [mag("apparent bolometric magnitude")],
  result: kinds.flux,
  kernel: bolometricFluxFromApparentMagnitudeUnchecked,
});
const abMagnitudeLaw = defineLaw({ name: "AB magnitude", inputs: [fNuIn], result: kinds.dimensionless, kernel: abMagnitudeUnchecked });
const fNuFromAbLaw = defineLaw({
  name: "spectral flux density f_nu",
  inputs: [mag("AB magnitude")],
  result: kinds.spectralFluxPerFrequency,
  kernel: spectralFluxDensityFromAbMagnitudeUnchecked,
});
const fLambdaLaw = defineLaw({ name: "spectral flux density f_lambda", inputs: [fNuIn, wavelengthIn], result: kinds.spectralFluxPerWavelength, kernel: fLambdaFromFNuUnchecked });
const fNuLaw = defineLaw({ name: "spectral flux density f_nu", inputs: [fLambdaIn, wavelengthIn], result: kinds.spectralFluxPerFrequency, kernel: fNuFromFLambdaUnchecked });

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
  // a pure number is the same in every system: SI phrases the messages
  return magnitudeDifferenceLaw(SI, fluxRatio);
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
  return fluxRatioLaw(SI, magnitudeDifference);
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
  // Q is any flux-like kind in any system; both are in one unit, so their plain numbers are all the law needs
  const f1: number = flux1;
  const f2: number = flux2;
  return fluxesMagnitudeDifferenceLaw(SI, f1, f2);
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
  return distanceModulusLaw(sys, distance, extinction);
}

/**
 * Distance from a distance modulus (less any extinction A):
 * d = 10 pc × 10^((m − M − A)/5).
 *
 * @param sys - `SI` or `CGS` (the system of the result)
 * @param distanceModulus - m − M, mag
 * @param extinction - A, mag (default 0)
 * @returns distance d, in `sys`
 * @throws RangeError naming `distance modulus` or `extinction`, or when d overflows the double range in `sys` (a distance below the smallest double is 0)
 * @example
 * ```ts
 * import { CGS, distanceFromDistanceModulus, units } from "starlume";
 * CGS.valueIn(distanceFromDistanceModulus(CGS, 5), units.pc); // 100
 * ```
 */
export function distanceFromDistanceModulus<S extends SystemName>(sys: UnitSystem<S>, distanceModulus: Pure, extinction: Pure = 0): Length<S> {
  return distanceFromModulusLaw(sys, distanceModulus, extinction);
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
  return absoluteMagnitudeLaw(sys, apparentMagnitude, distance, extinction);
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
  return apparentMagnitudeLaw(sys, absoluteMagnitude, distance, extinction);
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
 * absoluteBolometricMagnitude(SI, SI.of(1, units.Lsun)); // ≈ 4.74
 * ```
 */
export function absoluteBolometricMagnitude<S extends SystemName>(sys: UnitSystem<S>, luminosity: Power<NoInfer<S>>): number {
  return absoluteBolometricLaw(sys, luminosity);
}

/**
 * Luminosity from an absolute bolometric magnitude (IAU 2015 B2): L = L₀ 10^(M_bol/−2.5).
 *
 * @param sys - `SI` (W) or `CGS` (erg s⁻¹)
 * @param absoluteBolometricMagnitude - M_bol, mag
 * @returns L, in `sys`
 * @throws RangeError naming `absolute bolometric magnitude`, or when L overflows the double range in `sys` (naming the magnitude; below the smallest double it is 0)
 * @example
 * ```ts
 * import { CGS, luminosityFromAbsoluteBolometricMagnitude } from "starlume";
 * luminosityFromAbsoluteBolometricMagnitude(CGS, 0); // 3.0128e35 erg s^-1
 * ```
 */
export function luminosityFromAbsoluteBolometricMagnitude<S extends SystemName>(sys: UnitSystem<S>, absoluteBolometricMagnitude: Pure): Power<S> {
  return luminosityFromMagLaw(sys, absoluteBolometricMagnitude);
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
  return apparentBolometricLaw(sys, bolometricFlux);
}

/**
 * Bolometric flux from an apparent bolometric magnitude (IAU 2015 B2): f = f₀ 10^(m_bol/−2.5).
 *
 * @param sys - `SI` (W m⁻²) or `CGS` (erg s⁻¹ cm⁻²)
 * @param apparentBolometricMagnitude - m_bol, mag
 * @returns f, in `sys`
 * @throws RangeError naming `apparent bolometric magnitude`, or when f overflows the double range in `sys` (below the smallest double it is 0)
 * @example
 * ```ts
 * import { SI, bolometricFluxFromApparentBolometricMagnitude, units } from "starlume";
 * SI.valueIn(bolometricFluxFromApparentBolometricMagnitude(SI, -26.832), units.W_per_m2); // ≈ 1361
 * ```
 */
export function bolometricFluxFromApparentBolometricMagnitude<S extends SystemName>(sys: UnitSystem<S>, apparentBolometricMagnitude: Pure): Flux<S> {
  return bolometricFluxLaw(sys, apparentBolometricMagnitude);
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
  return abMagnitudeLaw(sys, fNu);
}

/**
 * Spectral flux density per unit frequency of an AB magnitude: f_ν = 3631 Jy × 10^(m_AB/−2.5).
 *
 * @param sys - `SI` (W m⁻² Hz⁻¹) or `CGS` (erg s⁻¹ cm⁻² Hz⁻¹)
 * @param abMagnitude - m_AB, mag
 * @returns f_ν, in `sys` (read it in Jy with `SI.valueIn(f, units.Jy)`)
 * @throws RangeError naming `AB magnitude`, or when f_ν overflows the double range in `sys` (below the smallest double it is 0)
 * @example
 * ```ts
 * import { SI, fNuFromAbMagnitude, units } from "starlume";
 * SI.valueIn(fNuFromAbMagnitude(SI, 0), units.Jy); // 3631
 * ```
 */
export function fNuFromAbMagnitude<S extends SystemName>(sys: UnitSystem<S>, abMagnitude: Pure): SpectralFluxPerFrequency<S> {
  return fNuFromAbLaw(sys, abMagnitude);
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
  return fLambdaLaw(sys, fNu, wavelength);
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
  return fNuLaw(sys, fLambda, wavelength);
}
