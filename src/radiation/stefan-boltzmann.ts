/**
 * The Stefan–Boltzmann law and its photon-count analogue, typed.
 *
 * - Exitance (power leaving a blackbody surface per unit area, into the
 *   hemisphere): M = σT⁴, σ = 2π⁵k⁴/(15h³c²) = 5.670 374 419… × 10⁻⁸ W m⁻² K⁻⁴
 *   = 5.670 374 419… × 10⁻⁵ erg s⁻¹ cm⁻² K⁻⁴ (CODATA 2018, exact).
 *   An exitance is a {@link Flux}; a radiance (per steradian) is not, and
 *   does not type-check here: put the π back with `lambertianExitance`.
 * - Luminosity of a spherical blackbody: L = 4πR²σT⁴ (the relation by which
 *   IAU 2015 Resolution B3 defines the nominal T☉ = 5772 K from L☉ and R☉).
 * - Photons: M_γ = σ_γT³, σ_γ = 4πζ(3)k³/(h³c²) ≈ 1.5205 × 10¹⁵
 *   photons s⁻¹ m⁻² K⁻³; a sphere emits Ṅ = 4πR²σ_γT³ photons s⁻¹.
 *
 * Accuracy: each result is a product of a constant and powers of the inputs,
 * formed directly (≤ ~4 ulp) or, when an intermediate would leave the normal
 * double range, in logarithms; a result that truly exceeds the double range
 * throws. See kernels/stefan-boltzmann.test.ts.
 *
 * Sources: J. Stefan (1879), L. Boltzmann (1884); CODATA 2018; IAU 2015 B3.
 *
 * @module
 */
import { defineLaw } from "../law/define";
import { lawInput } from "../law/input";
import { kinds } from "../quantity/aliases";
import type { Flux, Length, PhotonFlux, PhotonRate, Power, Temperature } from "../quantity/aliases";
import type { SystemName } from "../quantity/quantity";
import type { UnitSystem } from "../quantity/system";
import {
  luminosityFromRadiusTemperatureUnchecked,
  photonEmissionRateUnchecked,
  photonExitanceUnchecked,
  radiusFromLuminosityTemperatureUnchecked,
  stefanBoltzmannExitanceUnchecked,
  temperatureFromExitanceUnchecked,
  temperatureFromLuminosityRadiusUnchecked,
} from "./kernels/stefan-boltzmann";

const temperature = lawInput("temperature", kinds.temperature);
const radius = lawInput("radius", kinds.length);
const luminosity = lawInput("luminosity", kinds.power);
const exitance = lawInput("exitance", kinds.flux);

const exitanceLaw = defineLaw({
  name: "the exitance σT⁴",
  inputs: [temperature],
  result: kinds.flux,
  kernel: stefanBoltzmannExitanceUnchecked,
});
const temperatureFromExitanceLaw = defineLaw({
  name: "the temperature",
  inputs: [exitance],
  result: kinds.temperature,
  kernel: temperatureFromExitanceUnchecked,
});
const luminosityLaw = defineLaw({
  name: "the luminosity 4πR²σT⁴",
  inputs: [radius, temperature],
  result: kinds.power,
  kernel: luminosityFromRadiusTemperatureUnchecked,
});
const radiusLaw = defineLaw({
  name: "the radius",
  inputs: [luminosity, temperature],
  result: kinds.length,
  kernel: radiusFromLuminosityTemperatureUnchecked,
});
const temperatureFromLuminosityLaw = defineLaw({
  name: "the temperature",
  inputs: [luminosity, radius],
  result: kinds.temperature,
  kernel: temperatureFromLuminosityRadiusUnchecked,
});
const photonExitanceLaw = defineLaw({
  name: "the photon exitance",
  inputs: [temperature],
  result: kinds.photonFlux,
  kernel: photonExitanceUnchecked,
});
const photonRateLaw = defineLaw({
  name: "the photon emission rate",
  inputs: [radius, temperature],
  result: kinds.photonRate,
  kernel: photonEmissionRateUnchecked,
});

/**
 * Blackbody exitance M = σT⁴.
 *
 * @param sys - `SI` (W m⁻²) or `CGS` (erg s⁻¹ cm⁻², 1000 times the SI number)
 * @param temperature - temperature T
 * @throws RangeError when T is not finite and > 0, or σT⁴ overflows (T ≳ 1e79 K)
 * @example
 * ```ts
 * import { SI, stefanBoltzmannExitance, units } from "starlume";
 * SI.valueIn(stefanBoltzmannExitance(SI, SI.of(5772, units.K)), units.W_per_m2); // ≈ 6.294e7
 * ```
 */
export function stefanBoltzmannExitance<S extends SystemName>(sys: UnitSystem<S>, temperature: Temperature): Flux<S> {
  return exitanceLaw(sys, temperature);
}

/**
 * Temperature of a blackbody with the given exitance, T = (M/σ)^¼.
 *
 * @param sys - `SI` or `CGS` (the system of `exitance`)
 * @param exitance - M, in `sys` (W m⁻² or erg s⁻¹ cm⁻²)
 * @throws RangeError when M is not finite and > 0
 * @example
 * ```ts
 * import { CGS, temperatureFromExitance, units } from "starlume";
 * temperatureFromExitance(CGS, CGS.of(6.294e10, units.erg_per_s_cm2)); // ≈ 5772 K
 * ```
 */
export function temperatureFromExitance<S extends SystemName>(sys: UnitSystem<S>, exitance: Flux<NoInfer<S>>): Temperature {
  return temperatureFromExitanceLaw(sys, exitance);
}

/**
 * Luminosity of a spherical blackbody, L = 4πR²σT⁴.
 *
 * @param sys - `SI` (W) or `CGS` (erg s⁻¹)
 * @param radius - R, in `sys`
 * @param temperature - effective temperature T
 * @throws RangeError when R or T is not finite and > 0, or L overflows
 * @example
 * ```ts
 * import { SI, constants, luminosityFromRadiusTemperature, units } from "starlume";
 * const l = luminosityFromRadiusTemperature(SI, constants.Rsun.si, constants.Tsun.si);
 * SI.valueIn(l, units.Lsun); // ≈ 1.0000 (IAU 2015 B3)
 * ```
 */
export function luminosityFromRadiusTemperature<S extends SystemName>(
  sys: UnitSystem<S>,
  radius: Length<NoInfer<S>>,
  temperature: Temperature,
): Power<S> {
  return luminosityLaw(sys, radius, temperature);
}

/**
 * Radius of a spherical blackbody from its luminosity and temperature,
 * R = √(L/(4πσ))/T².
 *
 * @param sys - `SI` (m) or `CGS` (cm)
 * @param luminosity - L, in `sys`
 * @param temperature - effective temperature T
 * @throws RangeError when L or T is not finite and > 0, or R overflows
 * @example
 * ```ts
 * import { CGS, radiusFromLuminosityTemperature, units } from "starlume";
 * const r = radiusFromLuminosityTemperature(CGS, CGS.of(1, units.Lsun), CGS.of(5772, units.K));
 * CGS.valueIn(r, units.Rsun); // ≈ 1.0000
 * ```
 */
export function radiusFromLuminosityTemperature<S extends SystemName>(
  sys: UnitSystem<S>,
  luminosity: Power<NoInfer<S>>,
  temperature: Temperature,
): Length<S> {
  return radiusLaw(sys, luminosity, temperature);
}

/**
 * Effective temperature of a spherical blackbody from its luminosity and
 * radius, T = (L/(4πσR²))^¼.
 *
 * @param sys - `SI` or `CGS` (the system of `luminosity` and `radius`)
 * @param luminosity - L, in `sys`
 * @param radius - R, in `sys`
 * @throws RangeError when L or R is not finite and > 0
 * @example
 * ```ts
 * import { SI, temperatureFromLuminosityRadius, units } from "starlume";
 * temperatureFromLuminosityRadius(SI, SI.of(1, units.Lsun), SI.of(1, units.Rsun)); // ≈ 5772 K
 * ```
 */
export function temperatureFromLuminosityRadius<S extends SystemName>(
  sys: UnitSystem<S>,
  luminosity: Power<NoInfer<S>>,
  radius: Length<NoInfer<S>>,
): Temperature {
  return temperatureFromLuminosityLaw(sys, luminosity, radius);
}

/**
 * Blackbody photon exitance M_γ = σ_γT³ (photons per unit time and area, into the hemisphere).
 *
 * @param sys - `SI` (photons s⁻¹ m⁻²) or `CGS` (photons s⁻¹ cm⁻², 10⁻⁴ times the SI number)
 * @param temperature - temperature T
 * @throws RangeError when T is not finite and > 0, or the result overflows
 * @example
 * ```ts
 * import { SI, photonExitance, units } from "starlume";
 * const n = photonExitance(SI, SI.of(2.7255, units.K)); // ≈ 3.08e16 photons s^-1 m^-2
 * ```
 */
export function photonExitance<S extends SystemName>(sys: UnitSystem<S>, temperature: Temperature): PhotonFlux<S> {
  return photonExitanceLaw(sys, temperature);
}

/**
 * Photon emission rate of a spherical blackbody, Ṅ = 4πR²σ_γT³ (photons s⁻¹, the same in both systems).
 *
 * @param sys - `SI` or `CGS` (the system of `radius`)
 * @param radius - R, in `sys`
 * @param temperature - temperature T
 * @throws RangeError when R or T is not finite and > 0, or the result overflows
 * @example
 * ```ts
 * import { CGS, photonEmissionRate, units } from "starlume";
 * const rate = photonEmissionRate(CGS, CGS.of(1, units.Rsun), CGS.of(5772, units.K)); // photons s^-1
 * ```
 */
export function photonEmissionRate<S extends SystemName>(
  sys: UnitSystem<S>,
  radius: Length<NoInfer<S>>,
  temperature: Temperature,
): PhotonRate {
  return photonRateLaw(sys, radius, temperature);
}
