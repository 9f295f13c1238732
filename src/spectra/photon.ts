/**
 * Photon conversions, typed: energy E (`Energy<S>`: J or erg; eV through
 * `units.eV`), vacuum wavelength λ, frequency ν (`Frequency`, Hz in both
 * systems) and vacuum wavenumber σ = 1/λ (`Wavenumber<S>`: m⁻¹ or cm⁻¹):
 *
 *   E = hν = hc/λ = hcσ,  ν = c/λ = cσ.
 *
 * h and c are exact in the SI since 2019 (CODATA 2018), so the only error is
 * floating-point rounding: ≤ 2 ulp in SI, plus one correctly rounded
 * power-of-ten scaling per CGS conversion.
 *
 * Wavelengths here are vacuum wavelengths (the relations above hold only in
 * vacuum): inputs are {@link NotAirWavelength} — a {@link VacuumWavelength}
 * or an unbranded `Length<S>`, never an {@link AirWavelength} — and outputs
 * are {@link VacuumWavelength}. Every input must be finite and > 0
 * (RangeError naming the parameter and the caller's unit); a result beyond
 * the double range in the caller's system (possibly only after the ×10ᵏ into
 * CGS) throws a RangeError naming the argument instead of returning Infinity.
 *
 * @module
 */
import { defineLaw } from "../law/define";
import { lawInput } from "../law/input";
import { kinds } from "../quantity/aliases";
import type { Energy, Frequency, Wavenumber } from "../quantity/aliases";
import type { SystemName } from "../quantity/quantity";
import type { UnitSystem } from "../quantity/system";
import {
  frequencyFromPhotonEnergyUnchecked,
  frequencyFromWavelengthUnchecked,
  frequencyFromWavenumberUnchecked,
  photonEnergyFromFrequencyUnchecked,
  photonEnergyFromWavelengthUnchecked,
  photonEnergyFromWavenumberUnchecked,
  wavelengthFromFrequencyUnchecked,
  wavelengthFromPhotonEnergyUnchecked,
  wavelengthFromWavenumberUnchecked,
  wavenumberFromFrequencyUnchecked,
  wavenumberFromPhotonEnergyUnchecked,
  wavenumberFromWavelengthUnchecked,
} from "./kernels/photon";
import type { NotAirWavelength, VacuumWavelength } from "./medium";

const wavelength = lawInput("wavelength", kinds.length, { vacuum: true });
const energy = lawInput("energy", kinds.energy);
const frequency = lawInput("frequency", kinds.frequency);
const wavenumber = lawInput("wavenumber", kinds.wavenumber);

const energyOfWavelength = defineLaw({
  name: "photon energy",
  inputs: [wavelength],
  result: kinds.energy,
  kernel: photonEnergyFromWavelengthUnchecked,
});
const wavelengthOfEnergy = defineLaw({
  name: "vacuum wavelength",
  inputs: [energy],
  result: kinds.length,
  kernel: wavelengthFromPhotonEnergyUnchecked,
});
const energyOfFrequency = defineLaw({
  name: "photon energy",
  inputs: [frequency],
  result: kinds.energy,
  kernel: photonEnergyFromFrequencyUnchecked,
});
const frequencyOfEnergy = defineLaw({
  name: "frequency",
  inputs: [energy],
  result: kinds.frequency,
  kernel: frequencyFromPhotonEnergyUnchecked,
});
const energyOfWavenumber = defineLaw({
  name: "photon energy",
  inputs: [wavenumber],
  result: kinds.energy,
  kernel: photonEnergyFromWavenumberUnchecked,
});
const wavenumberOfEnergy = defineLaw({
  name: "vacuum wavenumber",
  inputs: [energy],
  result: kinds.wavenumber,
  kernel: wavenumberFromPhotonEnergyUnchecked,
});
const frequencyOfWavelength = defineLaw({
  name: "frequency",
  inputs: [wavelength],
  result: kinds.frequency,
  kernel: frequencyFromWavelengthUnchecked,
});
const wavelengthOfFrequency = defineLaw({
  name: "vacuum wavelength",
  inputs: [frequency],
  result: kinds.length,
  kernel: wavelengthFromFrequencyUnchecked,
});
const wavenumberOfWavelength = defineLaw({
  name: "vacuum wavenumber",
  inputs: [wavelength],
  result: kinds.wavenumber,
  kernel: wavenumberFromWavelengthUnchecked,
});
const wavelengthOfWavenumber = defineLaw({
  name: "vacuum wavelength",
  inputs: [wavenumber],
  result: kinds.length,
  kernel: wavelengthFromWavenumberUnchecked,
});
const frequencyOfWavenumber = defineLaw({
  name: "frequency",
  inputs: [wavenumber],
  result: kinds.frequency,
  kernel: frequencyFromWavenumberUnchecked,
});
const wavenumberOfFrequency = defineLaw({
  name: "vacuum wavenumber",
  inputs: [frequency],
  result: kinds.wavenumber,
  kernel: wavenumberFromFrequencyUnchecked,
});

/**
 * Photon energy from vacuum wavelength, E = hc/λ.
 *
 * @param sys - `SI` (J) or `CGS` (erg)
 * @param wavelength - vacuum wavelength (or unbranded length), in `sys`
 * @throws RangeError unless λ is finite and > 0
 * @example
 * ```ts
 * import { SI, photonEnergyFromVacuumWavelength, units } from "starlume";
 * SI.valueIn(photonEnergyFromVacuumWavelength(SI, SI.of(500, units.nm)), units.eV); // ≈ 2.4797
 * ```
 */
export function photonEnergyFromVacuumWavelength<S extends SystemName>(
  sys: UnitSystem<S>,
  wavelength: NotAirWavelength<NoInfer<S>>,
): Energy<S> {
  return energyOfWavelength(sys, wavelength);
}

/**
 * Vacuum wavelength of a photon of energy E, λ = hc/E.
 *
 * @param sys - `SI` (m) or `CGS` (cm)
 * @param energy - photon energy, in `sys`
 * @throws RangeError unless E is finite and > 0
 * @example
 * ```ts
 * import { CGS, vacuumWavelengthFromPhotonEnergy, units } from "starlume";
 * const lambda = vacuumWavelengthFromPhotonEnergy(CGS, CGS.of(13.6, units.eV));
 * CGS.valueIn(lambda, units.nm); // ≈ 91.165
 * ```
 */
export function vacuumWavelengthFromPhotonEnergy<S extends SystemName>(
  sys: UnitSystem<S>,
  energy: Energy<NoInfer<S>>,
): VacuumWavelength<S> {
  return wavelengthOfEnergy(sys, energy) as VacuumWavelength<S>;
}

/**
 * Photon energy from frequency, E = hν.
 *
 * @param sys - `SI` (J) or `CGS` (erg)
 * @param frequency - frequency ν
 * @throws RangeError unless ν is finite and > 0
 * @example
 * ```ts
 * import { SI, photonEnergyFromFrequency, units } from "starlume";
 * photonEnergyFromFrequency(SI, SI.of(1, units.GHz)); // 6.62607015e-25 J
 * ```
 */
export function photonEnergyFromFrequency<S extends SystemName>(sys: UnitSystem<S>, frequency: Frequency): Energy<S> {
  return energyOfFrequency(sys, frequency);
}

/**
 * Frequency of a photon of energy E, ν = E/h.
 *
 * @example
 * ```ts
 * import { SI, frequencyFromPhotonEnergy, units } from "starlume";
 * SI.valueIn(frequencyFromPhotonEnergy(SI, SI.of(1, units.eV)), units.THz); // ≈ 241.7989
 * ```
 */
export function frequencyFromPhotonEnergy<S extends SystemName>(sys: UnitSystem<S>, energy: Energy<NoInfer<S>>): Frequency {
  return frequencyOfEnergy(sys, energy);
}

/**
 * Photon energy from vacuum wavenumber, E = hcσ.
 *
 * @example
 * ```ts
 * import { CGS, photonEnergyFromWavenumber, units } from "starlume";
 * CGS.valueIn(photonEnergyFromWavenumber(CGS, CGS.of(8065.543937, units.per_cm)), units.eV); // ≈ 1
 * ```
 */
export function photonEnergyFromWavenumber<S extends SystemName>(
  sys: UnitSystem<S>,
  wavenumber: Wavenumber<NoInfer<S>>,
): Energy<S> {
  return energyOfWavenumber(sys, wavenumber);
}

/**
 * Vacuum wavenumber of a photon of energy E, σ = E/(hc).
 *
 * @example
 * ```ts
 * import { CGS, wavenumberFromPhotonEnergy, units } from "starlume";
 * CGS.valueIn(wavenumberFromPhotonEnergy(CGS, CGS.of(1, units.eV)), units.per_cm); // ≈ 8065.544
 * ```
 */
export function wavenumberFromPhotonEnergy<S extends SystemName>(
  sys: UnitSystem<S>,
  energy: Energy<NoInfer<S>>,
): Wavenumber<S> {
  return wavenumberOfEnergy(sys, energy);
}

/**
 * Frequency of light of a vacuum wavelength, ν = c/λ.
 *
 * @example
 * ```ts
 * import { SI, frequencyFromVacuumWavelength, units } from "starlume";
 * SI.valueIn(frequencyFromVacuumWavelength(SI, SI.of(21.106114054, units.cm)), units.MHz); // ≈ 1420.4058
 * ```
 */
export function frequencyFromVacuumWavelength<S extends SystemName>(
  sys: UnitSystem<S>,
  wavelength: NotAirWavelength<NoInfer<S>>,
): Frequency {
  return frequencyOfWavelength(sys, wavelength);
}

/**
 * Vacuum wavelength of light of frequency ν, λ = c/ν.
 *
 * @example
 * ```ts
 * import { SI, units, vacuumWavelengthFromFrequency } from "starlume";
 * SI.valueIn(vacuumWavelengthFromFrequency(SI, SI.of(1420.405751768, units.MHz)), units.cm); // ≈ 21.106
 * ```
 */
export function vacuumWavelengthFromFrequency<S extends SystemName>(
  sys: UnitSystem<S>,
  frequency: Frequency,
): VacuumWavelength<S> {
  return wavelengthOfFrequency(sys, frequency) as VacuumWavelength<S>;
}

/**
 * Vacuum wavenumber of a vacuum wavelength, σ = 1/λ.
 *
 * @example
 * ```ts
 * import { CGS, units, wavenumberFromVacuumWavelength } from "starlume";
 * CGS.valueIn(wavenumberFromVacuumWavelength(CGS, CGS.of(10, units.um)), units.per_cm); // ≈ 1000
 * ```
 */
export function wavenumberFromVacuumWavelength<S extends SystemName>(
  sys: UnitSystem<S>,
  wavelength: NotAirWavelength<NoInfer<S>>,
): Wavenumber<S> {
  return wavenumberOfWavelength(sys, wavelength);
}

/**
 * Vacuum wavelength of a vacuum wavenumber, λ = 1/σ.
 *
 * @example
 * ```ts
 * import { CGS, units, vacuumWavelengthFromWavenumber } from "starlume";
 * CGS.valueIn(vacuumWavelengthFromWavenumber(CGS, CGS.of(15233, units.per_cm)), units.nm); // ≈ 656.47
 * ```
 */
export function vacuumWavelengthFromWavenumber<S extends SystemName>(
  sys: UnitSystem<S>,
  wavenumber: Wavenumber<NoInfer<S>>,
): VacuumWavelength<S> {
  return wavelengthOfWavenumber(sys, wavenumber) as VacuumWavelength<S>;
}

/**
 * Frequency of a vacuum wavenumber, ν = cσ.
 *
 * @example
 * ```ts
 * import { CGS, frequencyFromWavenumber, units } from "starlume";
 * CGS.valueIn(frequencyFromWavenumber(CGS, CGS.of(1, units.per_cm)), units.GHz); // 29.9792458
 * ```
 */
export function frequencyFromWavenumber<S extends SystemName>(
  sys: UnitSystem<S>,
  wavenumber: Wavenumber<NoInfer<S>>,
): Frequency {
  return frequencyOfWavenumber(sys, wavenumber);
}

/**
 * Vacuum wavenumber of a frequency, σ = ν/c.
 *
 * @example
 * ```ts
 * import { CGS, units, wavenumberFromFrequency } from "starlume";
 * CGS.valueIn(wavenumberFromFrequency(CGS, CGS.of(29.9792458, units.GHz)), units.per_cm); // 1
 * ```
 */
export function wavenumberFromFrequency<S extends SystemName>(sys: UnitSystem<S>, frequency: Frequency): Wavenumber<S> {
  return wavenumberOfFrequency(sys, frequency);
}
