/**
 * Inverse-square law for an isotropic point emitter.
 *
 * All three kernels assume the source radiates isotropically (the same power
 * per unit solid angle in every direction), there is no absorption or
 * scattering between source and observer (apply extinction separately, see
 * `extinction.ts`), and the distance is large enough that the source can be
 * treated as a point (for a uniformly bright sphere of radius R the relation
 * F = L/(4πd²) is in fact exact for any d ≥ R). Distances are Euclidean
 * (no cosmological corrections).
 *
 * Source: the inverse-square law; e.g. any introductory astrophysics text.
 *
 * @module
 */
import { requirePositive } from "../../internal/checks";
import { FOUR_PI, requirePositiveResult, scaledQuotient, scaledSqrtQuotient } from "./common";

/**
 * Bolometric (or band) flux received at a distance from an isotropic emitter:
 * F = L / (4π d²).
 *
 * Evaluated as (L / 4π) / d / d so that d² never overflows; results that
 * underflow below the smallest double throw.
 *
 * @param luminosityW - luminosity L, W (> 0, finite)
 * @param distanceM - distance d, m (> 0, finite)
 * @returns flux F, W m^-2
 * @throws RangeError naming `luminosity` or `distance` when not finite and > 0
 * @example
 * ```ts
 * import { fluxFromLuminositySI } from "./inverse-square";
 * const solarConstant = fluxFromLuminositySI(3.828e26, 149597870700); // ≈ 1361 W m^-2
 * ```
 */
export function fluxFromLuminositySI(luminosityW: number, distanceM: number): number {
  requirePositive("luminosity", luminosityW, "W");
  requirePositive("distance", distanceM, "m");
  return requirePositiveResult("flux", fluxFromLuminosityUnchecked(luminosityW, distanceM), "W m^-2");
}

/** F = L / (4π d²) without input or result checks (see {@link fluxFromLuminositySI}); 0 on underflow. @internal */
export function fluxFromLuminosityUnchecked(luminosityW: number, distanceM: number): number {
  return scaledQuotient(luminosityW, 1, 1, 1, FOUR_PI, distanceM, distanceM);
}

/**
 * Luminosity of an isotropic emitter from the flux received at a distance:
 * L = 4π d² F.
 *
 * @param fluxWm2 - flux F, W m^-2 (> 0, finite)
 * @param distanceM - distance d, m (> 0, finite)
 * @returns luminosity L, W
 * @throws RangeError naming `flux` or `distance`; or when L overflows a double
 * @example
 * ```ts
 * import { luminosityFromFluxSI } from "./inverse-square";
 * const lSun = luminosityFromFluxSI(1361, 149597870700); // ≈ 3.828e26 W
 * ```
 */
export function luminosityFromFluxSI(fluxWm2: number, distanceM: number): number {
  requirePositive("flux", fluxWm2, "W m^-2");
  requirePositive("distance", distanceM, "m");
  return requirePositiveResult("luminosity", luminosityFromFluxUnchecked(fluxWm2, distanceM), "W");
}

/** L = 4π d² F without input or result checks (see {@link luminosityFromFluxSI}); +Infinity on overflow. @internal */
export function luminosityFromFluxUnchecked(fluxWm2: number, distanceM: number): number {
  return scaledQuotient(FOUR_PI, fluxWm2, distanceM, distanceM, 1, 1, 1);
}

/**
 * Distance of an isotropic emitter of known luminosity from its flux (the
 * "luminosity distance" in a static Euclidean space): d = √(L / (4π F)).
 *
 * Evaluated as √(L/4π) / √F when the direct quotient would overflow or
 * underflow.
 *
 * @param luminosityW - luminosity L, W (> 0, finite)
 * @param fluxWm2 - flux F, W m^-2 (> 0, finite)
 * @returns distance d, m
 * @throws RangeError naming `luminosity` or `flux`
 * @example
 * ```ts
 * import { distanceFromLuminosityFluxSI } from "./inverse-square";
 * const au = distanceFromLuminosityFluxSI(3.828e26, 1361); // ≈ 1.496e11 m
 * ```
 */
export function distanceFromLuminosityFluxSI(luminosityW: number, fluxWm2: number): number {
  requirePositive("luminosity", luminosityW, "W");
  requirePositive("flux", fluxWm2, "W m^-2");
  return requirePositiveResult("distance", distanceFromLuminosityFluxUnchecked(luminosityW, fluxWm2), "m");
}

/** d = √(L / (4π F)) without input or result checks (see {@link distanceFromLuminosityFluxSI}). @internal */
export function distanceFromLuminosityFluxUnchecked(luminosityW: number, fluxWm2: number): number {
  return scaledSqrtQuotient(luminosityW, FOUR_PI, fluxWm2);
}
