/**
 * Interstellar extinction, typed: the Cardelli, Clayton & Mathis (1989) law
 * at a typed wavelength, reddening and dereddening of fluxes and magnitudes,
 * and E(B−V) ↔ A_V.
 *
 * CCM89 (ApJ 345, 245, eqs. 2–5; coefficients from memory, checked by the
 * continuity of the pieces and the normalisation a = 1, b = 0 at V in
 * kernels/extinction.test.ts):
 *
 *   A_λ / A_V = a(x) + b(x) / R_V,   x = 1/λ in µm⁻¹,   R_V = A_V / E(B−V)
 *
 * valid for 0.3 ≤ x ≤ 10 µm⁻¹ (0.1 µm ≤ λ ≤ 3.333 µm; the law is not
 * extrapolated: outside it a RangeError names the wavelength in the caller's
 * unit). R_V defaults to 3.1, the diffuse-ISM mean (common practice); the
 * paper's sight lines span R_V ≈ 2.6–5.5 (from memory), beyond which the fit
 * is an extrapolation.
 *
 * Extinctions, colour excesses and magnitudes are plain numbers in mag
 * (see the magnitudes module): they are accepted as {@link Pure} (a number or
 * a `Dimensionless`), so an angle or a length passed as one does not
 * compile. {@link reddenFlux} and {@link dereddenFlux} are generic over any
 * flux-like quantity and return the same type they were given.
 *
 * @module
 */
import { defineLaw } from "../law/define";
import { lawInput } from "../law/input";
import { kinds } from "../quantity/aliases";
import type { Length } from "../quantity/aliases";
import type { Dimension } from "../quantity/dimension";
import type { AnyQuantity, Brand, Pure, SystemName, SystemTag } from "../quantity/quantity";
import { SI, type UnitSystem } from "../quantity/system";
import {
  aVFromColorExcessUnchecked,
  ccm89ExtinctionUnchecked,
  ccm89RatioUnchecked,
  CCM89_RV_FIT_MAX,
  CCM89_RV_FIT_MIN,
  CCM89_X_MAX_INV_UM,
  CCM89_X_MIN_INV_UM,
  colorExcessFromAVUnchecked,
  dereddenFluxUnchecked,
  dereddenMagnitudeUnchecked,
  reddenFluxUnchecked,
  reddenMagnitudeUnchecked,
  RV_DIFFUSE_ISM,
} from "./kernels/extinction";

/** A magnitude input: a plain number in mag, any finite value. */
const mag = (name: string) => lawInput(name, kinds.dimensionless, { check: "finite", unit: "mag" });

/** λ in the CCM89 fit range, x = 1/λ in [0.3, 10] µm⁻¹ (bounds in SI: 1e-7 m to 3.333…e-6 m). */
const wavelengthIn = lawInput("wavelength", kinds.length, {
  min: 1e-6 / CCM89_X_MAX_INV_UM,
  max: 1e-6 / CCM89_X_MIN_INV_UM,
  rangeNote: "x = 1/λ in [0.3, 10] µm^-1 for the CCM89 law",
});
const rVIn = lawInput("R_V", kinds.dimensionless);
const aVIn = mag("A_V");
const extinctionIn = mag("extinction");
const magnitudeIn = mag("magnitude");
/** A flux-like value, read as a plain number in its own unit (the result stays in that unit). */
const fluxIn = lawInput("flux", kinds.dimensionless);

const ratioLaw = defineLaw({ name: "A_λ/A_V", inputs: [wavelengthIn, rVIn], result: kinds.dimensionless, kernel: ccm89RatioUnchecked });
const extinctionLaw = defineLaw({ name: "extinction", inputs: [wavelengthIn, aVIn, rVIn], result: kinds.dimensionless, kernel: ccm89ExtinctionUnchecked });
const aVLaw = defineLaw({ name: "A_V", inputs: [mag("E(B-V)"), rVIn], result: kinds.dimensionless, kernel: aVFromColorExcessUnchecked });
const colorExcessLaw = defineLaw({ name: "E(B-V)", inputs: [aVIn, rVIn], result: kinds.dimensionless, kernel: colorExcessFromAVUnchecked });
const reddenFluxLaw = defineLaw({ name: "reddened flux", inputs: [fluxIn, extinctionIn], result: kinds.dimensionless, kernel: reddenFluxUnchecked });
const dereddenFluxLaw = defineLaw({ name: "dereddened flux", inputs: [fluxIn, extinctionIn], result: kinds.dimensionless, kernel: dereddenFluxUnchecked });
const reddenMagnitudeLaw = defineLaw({ name: "reddened magnitude", inputs: [magnitudeIn, extinctionIn], result: kinds.dimensionless, kernel: reddenMagnitudeUnchecked });
const dereddenMagnitudeLaw = defineLaw({ name: "dereddened magnitude", inputs: [magnitudeIn, extinctionIn], result: kinds.dimensionless, kernel: dereddenMagnitudeUnchecked });

/** Mean R_V = A_V / E(B−V) of the diffuse Milky Way ISM: 3.1 (common practice). The default everywhere here. */
export const RV_DIFFUSE: number = RV_DIFFUSE_ISM;
/** R_V span of the CCM89 sample, ≈ [2.6, 5.5] (from memory); values outside are extrapolations of the fit. */
export const CCM89_RV_RANGE: readonly [number, number] = [CCM89_RV_FIT_MIN, CCM89_RV_FIT_MAX];

/**
 * A flux-like quantity that extinction dims: energy flux, flux density per
 * frequency or wavelength, radiance and their spectral forms (mass¹ and
 * time⁻³ or time⁻²), or photon fluxes and radiances (time⁻¹, per area).
 */
export type FluxLike =
  | (AnyQuantity &
      Brand<
        Dimension & {
          /** Mass exponent 1: an energy quantity (W = kg m² s⁻³). */
          readonly mass: 1;
          /** Time exponent −3 (flux, radiance and their per-wavelength or per-wavenumber forms) or −2 (their per-frequency forms). */
          readonly time: -3 | -2;
        },
        SystemTag
      >)
  | (AnyQuantity &
      Brand<
        Dimension & {
          /** Mass exponent 0: a photon (count) quantity. */
          readonly mass: 0;
          /** Time exponent −1: photons per second. */
          readonly time: -1;
          /** Length exponent −2 (photons per area), −3 (per area per wavelength) or −1 (per area per wavenumber). */
          readonly length: -1 | -2 | -3;
        },
        SystemTag
      >);

/**
 * CCM89 extinction curve A_λ / A_V = a(x) + b(x)/R_V at a wavelength.
 *
 * @param sys - `SI` or `CGS`
 * @param wavelength - vacuum wavelength λ, in `sys`; 0.1 µm ≤ λ ≤ 3.333 µm
 * @param rV - R_V (> 0; default 3.1)
 * @returns A_λ / A_V (a pure number)
 * @throws RangeError naming `wavelength` (with the valid range in `sys`'s unit) or `R_V`
 * @example
 * ```ts
 * import { SI, ccm89Ratio, units } from "starlume";
 * ccm89Ratio(SI, SI.of(2.2, units.um)); // K band, ≈ 0.114
 * ccm89Ratio(SI, SI.of(440, units.nm), 3.1); // B band, ≈ 1.32
 * ```
 */
export function ccm89Ratio<S extends SystemName>(sys: UnitSystem<S>, wavelength: Length<NoInfer<S>>, rV: Pure = RV_DIFFUSE_ISM): number {
  return ratioLaw(sys, wavelength, rV);
}

/**
 * Extinction A_λ in mag at a wavelength from A_V (CCM89): A_λ = A_V (a(x) + b(x)/R_V).
 *
 * @param sys - `SI` or `CGS`
 * @param wavelength - vacuum wavelength λ, in `sys`; 0.1 µm ≤ λ ≤ 3.333 µm
 * @param aV - A_V, mag
 * @param rV - R_V (> 0; default 3.1)
 * @returns A_λ, mag
 * @throws RangeError naming `wavelength`, `A_V` or `R_V`
 * @example
 * ```ts
 * import { CGS, ccm89Extinction, units } from "starlume";
 * ccm89Extinction(CGS, CGS.of(2.2, units.um), 1); // ≈ 0.114 mag
 * ```
 */
export function ccm89Extinction<S extends SystemName>(
  sys: UnitSystem<S>,
  wavelength: Length<NoInfer<S>>,
  aV: Pure,
  rV: Pure = RV_DIFFUSE_ISM,
): number {
  return extinctionLaw(sys, wavelength, aV, rV);
}

/**
 * Total extinction from colour excess: A_V = R_V E(B−V).
 *
 * @param colorExcess - E(B−V), mag
 * @param rV - R_V (> 0; default 3.1)
 * @returns A_V, mag
 * @throws RangeError naming `E(B-V)` or `R_V`
 * @example
 * ```ts
 * import { aVFromColourExcess } from "starlume";
 * aVFromColourExcess(0.1); // 0.31
 * ```
 */
export function aVFromColourExcess(colorExcess: Pure, rV: Pure = RV_DIFFUSE_ISM): number {
  // pure numbers are the same in every system: SI phrases the messages
  return aVLaw(SI, colorExcess, rV);
}

/**
 * Colour excess from total extinction: E(B−V) = A_V / R_V.
 *
 * @param aV - A_V, mag
 * @param rV - R_V (> 0; default 3.1)
 * @returns E(B−V), mag
 * @throws RangeError naming `A_V` or `R_V`
 * @example
 * ```ts
 * import { colourExcessFromAV } from "starlume";
 * colourExcessFromAV(0.31); // 0.1
 * ```
 */
export function colourExcessFromAV(aV: Pure, rV: Pure = RV_DIFFUSE_ISM): number {
  return colorExcessLaw(SI, aV, rV);
}

/**
 * Redden a flux-like quantity: F_obs = F_intrinsic × 10^(A/−2.5). Returns the
 * type it was given (an SI f_λ stays an SI f_λ).
 *
 * @param flux - intrinsic flux, flux density or radiance (> 0)
 * @param extinction - A at its wavelength or band, mag
 * @returns the extinguished value, same type (underflows to 0 for A ≳ 800 mag)
 * @throws RangeError naming `flux` or `extinction`
 * @example
 * ```ts
 * import { SI, reddenFlux, units } from "starlume";
 * const f = reddenFlux(SI.of(100, units.mJy), 5); // 1 mJy
 * ```
 */
export function reddenFlux<Q extends FluxLike>(flux: Q, extinction: Pure): Q {
  // Q is any flux-like kind in any system: the factor 10^(A/−2.5) keeps it in its own unit
  const f: number = flux;
  return reddenFluxLaw(SI, f, extinction) as number as Q;
}

/**
 * Deredden (correct) a flux-like quantity: F_intrinsic = F_obs × 10^(A/2.5).
 *
 * @param flux - observed flux, flux density or radiance (> 0)
 * @param extinction - A at its wavelength or band, mag
 * @returns the corrected value, same type
 * @throws RangeError naming `flux` or `extinction`, or on overflow
 * @example
 * ```ts
 * import { CGS, dereddenFlux, units } from "starlume";
 * const f = dereddenFlux(CGS.of(1e-13, units.erg_per_s_cm2), 2.5); // 1e-12 erg s^-1 cm^-2
 * ```
 */
export function dereddenFlux<Q extends FluxLike>(flux: Q, extinction: Pure): Q {
  const f: number = flux;
  return dereddenFluxLaw(SI, f, extinction) as number as Q;
}

/**
 * Redden a magnitude: m_obs = m_intrinsic + A.
 *
 * @param magnitude - intrinsic magnitude, mag
 * @param extinction - A, mag
 * @returns observed magnitude, mag
 * @throws RangeError naming `magnitude` or `extinction`
 * @example
 * ```ts
 * import { reddenMagnitude } from "starlume";
 * reddenMagnitude(10, 0.31); // 10.31
 * ```
 */
export function reddenMagnitude(magnitude: Pure, extinction: Pure): number {
  return reddenMagnitudeLaw(SI, magnitude, extinction);
}

/**
 * Deredden a magnitude: m_intrinsic = m_obs − A.
 *
 * @param magnitude - observed magnitude, mag
 * @param extinction - A, mag
 * @returns intrinsic magnitude, mag
 * @throws RangeError naming `magnitude` or `extinction`
 * @example
 * ```ts
 * import { dereddenMagnitude } from "starlume";
 * dereddenMagnitude(10.31, 0.31); // 10
 * ```
 */
export function dereddenMagnitude(magnitude: Pure, extinction: Pure): number {
  return dereddenMagnitudeLaw(SI, magnitude, extinction);
}
