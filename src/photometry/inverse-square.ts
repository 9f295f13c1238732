/**
 * The inverse-square law, typed: flux at a distance from a luminosity, and
 * each of the three quantities from the other two, in SI or CGS.
 *
 * F = L / (4π d²) for an isotropic point emitter with nothing absorbing on
 * the way (apply extinction separately, see {@link reddenFlux}); for a
 * uniformly bright sphere it is exact at any distance outside the sphere.
 * Distances are Euclidean (no cosmology).
 *
 * Each function takes the system first; luminosity, flux and distance must
 * be in that system and the result comes back in it. A luminosity where a
 * flux is wanted, a radiance (per steradian) where a flux is wanted, or a
 * CGS distance in an SI call does not compile.
 *
 * Each function is a law of the law toolkit (`defineLaw`): inputs are
 * checked once, in the caller's unit, and a result that overflows in the
 * caller's system (possibly only after the ×10ᵏ into CGS) is a RangeError
 * naming the arguments, never Infinity.
 *
 * Accuracy: a few correctly rounded operations, ≤ 4e-16 relative to a
 * 50-digit mpmath reference (kernels/inverse-square.test.ts).
 *
 * Source: the inverse-square law; IAU 2015 Resolution B3 for the solar check
 * L☉ᴺ / (4π au²) = S☉ᴺ within the rounding of L☉ᴺ.
 *
 * @module
 */
import { defineLaw } from "../law/define";
import { lawInput } from "../law/input";
import { kinds } from "../quantity/aliases";
import type { Flux, Length, Power } from "../quantity/aliases";
import type { SystemName } from "../quantity/quantity";
import type { UnitSystem } from "../quantity/system";
import { distanceFromLuminosityFluxUnchecked, fluxFromLuminosityUnchecked, luminosityFromFluxUnchecked } from "./kernels/inverse-square";

const luminosityIn = lawInput("luminosity", kinds.power);
const fluxIn = lawInput("flux", kinds.flux);
const distanceIn = lawInput("distance", kinds.length);

const fluxLaw = defineLaw({ name: "flux", inputs: [luminosityIn, distanceIn], result: kinds.flux, kernel: fluxFromLuminosityUnchecked });
const luminosityLaw = defineLaw({ name: "luminosity", inputs: [fluxIn, distanceIn], result: kinds.power, kernel: luminosityFromFluxUnchecked });
const distanceLaw = defineLaw({ name: "distance", inputs: [luminosityIn, fluxIn], result: kinds.length, kernel: distanceFromLuminosityFluxUnchecked });

/**
 * Flux received at a distance from an isotropic emitter: F = L / (4π d²).
 *
 * @param sys - `SI` (result in W m⁻²) or `CGS` (erg s⁻¹ cm⁻²)
 * @param luminosity - luminosity L, in `sys` (W or erg s⁻¹)
 * @param distance - distance d, in `sys`
 * @returns flux F, in `sys`
 * @throws RangeError naming `luminosity` or `distance` (value and unit of `sys`) unless finite and > 0, or when F overflows the double range in `sys` (naming the arguments; a flux below the smallest double is 0)
 * @example
 * ```ts
 * import { SI, fluxFromLuminosity, units } from "starlume";
 * const s = fluxFromLuminosity(SI, SI.of(1, units.Lsun), SI.of(1, units.au)); // ≈ 1361 W m^-2
 * ```
 */
export function fluxFromLuminosity<S extends SystemName>(
  sys: UnitSystem<S>,
  luminosity: Power<NoInfer<S>>,
  distance: Length<NoInfer<S>>,
): Flux<S> {
  return fluxLaw(sys, luminosity, distance);
}

/**
 * Luminosity of an isotropic emitter from the flux received at a distance:
 * L = 4π d² F.
 *
 * @param sys - `SI` (result in W) or `CGS` (erg s⁻¹)
 * @param flux - flux F, in `sys`
 * @param distance - distance d, in `sys`
 * @returns luminosity L, in `sys`
 * @throws RangeError naming `flux` or `distance` unless finite and > 0, or when L overflows the double range in `sys` (naming the arguments)
 * @example
 * ```ts
 * import { CGS, luminosityFromFlux, units } from "starlume";
 * const l = luminosityFromFlux(CGS, CGS.of(1361, units.W_per_m2), CGS.of(1, units.au)); // ≈ 3.828e33 erg s^-1
 * ```
 */
export function luminosityFromFlux<S extends SystemName>(
  sys: UnitSystem<S>,
  flux: Flux<NoInfer<S>>,
  distance: Length<NoInfer<S>>,
): Power<S> {
  return luminosityLaw(sys, flux, distance);
}

/**
 * Distance of an isotropic emitter of known luminosity from its flux
 * (Euclidean luminosity distance): d = √(L / (4π F)).
 *
 * @param sys - `SI` (result in m) or `CGS` (cm)
 * @param luminosity - luminosity L, in `sys`
 * @param flux - flux F, in `sys`
 * @returns distance d, in `sys`
 * @throws RangeError naming `luminosity` or `flux` unless finite and > 0
 * @example
 * ```ts
 * import { SI, distanceFromLuminosityFlux, units } from "starlume";
 * const d = distanceFromLuminosityFlux(SI, SI.of(1, units.Lsun), SI.of(1361, units.W_per_m2));
 * SI.valueIn(d, units.au); // ≈ 1.0000
 * ```
 */
export function distanceFromLuminosityFlux<S extends SystemName>(
  sys: UnitSystem<S>,
  luminosity: Power<NoInfer<S>>,
  flux: Flux<NoInfer<S>>,
): Length<S> {
  return distanceLaw(sys, luminosity, flux);
}
