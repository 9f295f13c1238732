/**
 * Planck's law, typed: spectral radiance of a blackbody per unit wavelength,
 * frequency or wavenumber, in energy or photon counts, in SI or CGS.
 *
 * Each function takes the system first (`SI` or `CGS`); every other argument
 * must be in that system (system-free ones such as temperature and frequency
 * fit either), and the result comes back in it. Mixing systems does not
 * compile. Values are radiances (per steradian); multiply by π sr with
 * {@link lambertianExitance} for the flux leaving a Lambertian surface.
 *
 * Accuracy: ≤ 1e-13 relative to a 40-digit mpmath reference for λ from 1e-12 m
 * to 1e4 m and T from 1e-2 K to 1e10 K wherever the value is a normal double
 * (measured worst 5.1e-15, bound ≈1e-14 from the plain-double x below x = 32; see kernels/planck.test.ts). Never NaN or Infinity
 * for finite positive input: deep in the Wien tail the true tiny value, or 0
 * on underflow; a value beyond the double range (in SI, or only after the
 * ×10ᵏ to CGS) throws a RangeError naming the caller's arguments, or in a
 * batch becomes a NaN row listed in `invalid`. The temperature derivatives
 * ∂B_λ/∂T and ∂B_ν/∂T are here too, for fitters.
 *
 * Source: M. Planck, Ann. Phys. 4, 553 (1901); constants CODATA 2018.
 *
 * @module
 */
import type { NotAirWavelength, NotAirWavelengthArray } from "../quantity/medium";
import type { BatchResult } from "../law/batch";
import { defineLaw } from "../law/define";
import { lawInput } from "../law/input";
import { kinds } from "../quantity/aliases";
import type {
  Frequency,
  SpectralPhotonRadiancePerFrequency,
  SpectralPhotonRadiancePerWavelength,
  SpectralPhotonRadiancePerWavenumber,
  SpectralRadiancePerFrequency,
  SpectralRadiancePerWavelength,
  SpectralRadiancePerWavelengthArray,
  SpectralRadiancePerWavenumber,
  Temperature,
  TemperatureArray,
  Wavenumber,
} from "../quantity/aliases";
import type { AnyQuantity, Brand, SystemName, SystemTag } from "../quantity/quantity";
import { dimension, type Dimension, type L_M_T_K_N_A_Sr } from "../quantity/dimension";
import type { Quantity } from "../quantity/quantity";
import type { Product, Quotient } from "../quantity/arithmetic";
import type { SolidAngle } from "../quantity/aliases";
import type { UnitSystem } from "../quantity/system";
import {
  planckLambdaEnergyCore,
  planckLambdaPhotonCore,
  planckNuEnergyCore,
  planckNuPhotonCore,
  planckSigmaEnergyCore,
  planckSigmaPhotonCore,
} from "./kernels/planck-core";
import { planckLambdaDerivativeTUnchecked, planckNuDerivativeTUnchecked } from "./kernels/planck";

const DBL = dimension({ length: -1, mass: 1, time: -3, temperature: -1, solidAngle: -1 }) as SpectralRadiancePerWavelengthPerTemperatureDimension;
const DBN = dimension({ mass: 1, time: -2, temperature: -1, solidAngle: -1 }) as SpectralRadiancePerFrequencyPerTemperatureDimension;

/** Dimension of ∂B_λ/∂T: W m⁻² sr⁻¹ m⁻¹ K⁻¹ (SI) or erg s⁻¹ cm⁻² sr⁻¹ cm⁻¹ K⁻¹ (CGS). */
export type SpectralRadiancePerWavelengthPerTemperatureDimension = L_M_T_K_N_A_Sr<-1, 1, -3, -1, 0, 0, -1>;
/** ∂B_λ/∂T, the temperature derivative of a spectral radiance per unit wavelength, in system `S`. */
export type SpectralRadiancePerWavelengthPerTemperature<S extends SystemName> = Quantity<SpectralRadiancePerWavelengthPerTemperatureDimension, S>;
/** Dimension of ∂B_ν/∂T: W m⁻² sr⁻¹ Hz⁻¹ K⁻¹ (SI) or erg s⁻¹ cm⁻² sr⁻¹ Hz⁻¹ K⁻¹ (CGS). */
export type SpectralRadiancePerFrequencyPerTemperatureDimension = L_M_T_K_N_A_Sr<0, 1, -2, -1, 0, 0, -1>;
/** ∂B_ν/∂T, the temperature derivative of a spectral radiance per unit frequency, in system `S`. */
export type SpectralRadiancePerFrequencyPerTemperature<S extends SystemName> = Quantity<SpectralRadiancePerFrequencyPerTemperatureDimension, S>;

/** Runtime dimensions of the two derivative quantities (for `SI.from` / `CGS.from`). */
export const derivativeKinds = {
  /** ∂B_λ/∂T: W m⁻² sr⁻¹ m⁻¹ K⁻¹ (SI) or erg s⁻¹ cm⁻² sr⁻¹ cm⁻¹ K⁻¹ (CGS). */
  spectralRadiancePerWavelengthPerTemperature: {
    /** Readable name, used in error messages. */
    name: "spectral radiance per wavelength per temperature",
    /** Runtime dimension L⁻¹ M T⁻³ Θ⁻¹ Ω⁻¹. */
    dimension: DBL,
  },
  /** ∂B_ν/∂T: W m⁻² sr⁻¹ Hz⁻¹ K⁻¹ (SI) or erg s⁻¹ cm⁻² sr⁻¹ Hz⁻¹ K⁻¹ (CGS). */
  spectralRadiancePerFrequencyPerTemperature: {
    /** Readable name, used in error messages. */
    name: "spectral radiance per frequency per temperature",
    /** Runtime dimension M T⁻² Θ⁻¹ Ω⁻¹. */
    dimension: DBN,
  },
} as const;

const wavelength = lawInput("wavelength", kinds.length, { vacuum: true });
const frequency = lawInput("frequency", kinds.frequency);
const wavenumber = lawInput("wavenumber", kinds.wavenumber);
const temperature = lawInput("temperature", kinds.temperature);

const bLambda = defineLaw({
  name: "B_λ",
  inputs: [wavelength, temperature],
  result: kinds.spectralRadiancePerWavelength,
  kernel: planckLambdaEnergyCore,
});
const bNu = defineLaw({
  name: "B_ν",
  inputs: [frequency, temperature],
  result: kinds.spectralRadiancePerFrequency,
  kernel: planckNuEnergyCore,
});
const bSigma = defineLaw({
  name: "B_σ̃",
  inputs: [wavenumber, temperature],
  result: kinds.spectralRadiancePerWavenumber,
  kernel: planckSigmaEnergyCore,
});
const nLambda = defineLaw({
  name: "photon radiance N_λ",
  inputs: [wavelength, temperature],
  result: kinds.spectralPhotonRadiancePerWavelength,
  kernel: planckLambdaPhotonCore,
});
const nNu = defineLaw({
  name: "photon radiance N_ν",
  inputs: [frequency, temperature],
  result: kinds.spectralPhotonRadiancePerFrequency,
  kernel: planckNuPhotonCore,
});
const nSigma = defineLaw({
  name: "photon radiance N_σ̃",
  inputs: [wavenumber, temperature],
  result: kinds.spectralPhotonRadiancePerWavenumber,
  kernel: planckSigmaPhotonCore,
});
const dbLambda = defineLaw({
  name: "∂B_λ/∂T",
  inputs: [wavelength, temperature],
  result: derivativeKinds.spectralRadiancePerWavelengthPerTemperature,
  kernel: planckLambdaDerivativeTUnchecked,
});
const dbNu = defineLaw({
  name: "∂B_ν/∂T",
  inputs: [frequency, temperature],
  result: derivativeKinds.spectralRadiancePerFrequencyPerTemperature,
  kernel: planckNuDerivativeTUnchecked,
});

/**
 * Spectral radiance per unit wavelength, B_λ(λ, T) = (2hc²/λ⁵) / (exp(hc/λkT) − 1).
 *
 * @param sys - `SI` (result in W m⁻² sr⁻¹ m⁻¹) or `CGS` (erg s⁻¹ cm⁻² sr⁻¹ cm⁻¹)
 * @param wavelength - vacuum wavelength λ, in `sys`
 * @param temperature - temperature T
 * @throws RangeError when λ or T is not finite and > 0 (naming it, its value and unit)
 * @example
 * ```ts
 * import { CGS, SI, planckRadianceWavelength, units } from "starlume";
 * const b = planckRadianceWavelength(SI, SI.of(500, units.nm), SI.of(5772, units.K));
 * SI.valueIn(b, units.W_per_m2_sr_nm); // ≈ 2.624e4 W m^-2 sr^-1 nm^-1
 * const bc = planckRadianceWavelength(CGS, CGS.of(5000, units.angstrom), SI.of(5772, units.K)); // erg s^-1 cm^-2 sr^-1 cm^-1
 * ```
 */
export function planckRadianceWavelength<S extends SystemName>(
  sys: UnitSystem<S>,
  wavelength: NotAirWavelength<NoInfer<S>>,
  temperature: Temperature,
): SpectralRadiancePerWavelength<S> {
  return bLambda(sys, wavelength, temperature);
}

/**
 * Spectral radiance per unit frequency, B_ν(ν, T) = (2hν³/c²) / (exp(hν/kT) − 1).
 *
 * @param sys - `SI` (W m⁻² sr⁻¹ Hz⁻¹) or `CGS` (erg s⁻¹ cm⁻² sr⁻¹ Hz⁻¹)
 * @param frequency - frequency ν (the same in both systems)
 * @param temperature - temperature T
 * @throws RangeError when ν or T is not finite and > 0
 * @example
 * ```ts
 * import { SI, planckRadianceFrequency, units } from "starlume";
 * const b = planckRadianceFrequency(SI, SI.of(160, units.GHz), SI.of(2.7255, units.K));
 * ```
 */
export function planckRadianceFrequency<S extends SystemName>(
  sys: UnitSystem<S>,
  frequency: Frequency,
  temperature: Temperature,
): SpectralRadiancePerFrequency<S> {
  return bNu(sys, frequency, temperature);
}

/**
 * Spectral radiance per unit wavenumber σ̃ = 1/λ,
 * B_σ̃(σ̃, T) = 2hc²σ̃³ / (exp(hcσ̃/kT) − 1).
 *
 * @param sys - `SI` (W m⁻² sr⁻¹ (m⁻¹)⁻¹) or `CGS` (erg s⁻¹ cm⁻² sr⁻¹ (cm⁻¹)⁻¹)
 * @param wavenumber - wavenumber σ̃, in `sys` (m⁻¹ or cm⁻¹)
 * @param temperature - temperature T
 * @throws RangeError when σ̃ or T is not finite and > 0
 * @example
 * ```ts
 * import { CGS, planckRadianceWavenumber, units } from "starlume";
 * const b = planckRadianceWavenumber(CGS, CGS.of(1000, units.per_cm), CGS.of(300, units.K));
 * ```
 */
export function planckRadianceWavenumber<S extends SystemName>(
  sys: UnitSystem<S>,
  wavenumber: Wavenumber<NoInfer<S>>,
  temperature: Temperature,
): SpectralRadiancePerWavenumber<S> {
  return bSigma(sys, wavenumber, temperature);
}

/**
 * Spectral photon radiance per unit wavelength, B_λ / (hc/λ) = (2c/λ⁴) / (exp(hc/λkT) − 1).
 *
 * @param sys - `SI` (photons s⁻¹ m⁻² sr⁻¹ m⁻¹) or `CGS` (photons s⁻¹ cm⁻² sr⁻¹ cm⁻¹)
 * @param wavelength - vacuum wavelength, in `sys`
 * @param temperature - temperature
 * @throws RangeError when λ or T is not finite and > 0
 * @example
 * ```ts
 * import { SI, planckPhotonRadianceWavelength, units } from "starlume";
 * const n = planckPhotonRadianceWavelength(SI, SI.of(2.2, units.um), SI.of(3000, units.K));
 * ```
 */
export function planckPhotonRadianceWavelength<S extends SystemName>(
  sys: UnitSystem<S>,
  wavelength: NotAirWavelength<NoInfer<S>>,
  temperature: Temperature,
): SpectralPhotonRadiancePerWavelength<S> {
  return nLambda(sys, wavelength, temperature);
}

/**
 * Spectral photon radiance per unit frequency, B_ν / (hν) = (2ν²/c²) / (exp(hν/kT) − 1).
 *
 * @param sys - `SI` (photons s⁻¹ m⁻² sr⁻¹ Hz⁻¹) or `CGS` (photons s⁻¹ cm⁻² sr⁻¹ Hz⁻¹)
 * @param frequency - frequency
 * @param temperature - temperature
 * @throws RangeError when ν or T is not finite and > 0
 * @example
 * ```ts
 * import { SI, planckPhotonRadianceFrequency, units } from "starlume";
 * const n = planckPhotonRadianceFrequency(SI, SI.of(100, units.THz), SI.of(3000, units.K));
 * ```
 */
export function planckPhotonRadianceFrequency<S extends SystemName>(
  sys: UnitSystem<S>,
  frequency: Frequency,
  temperature: Temperature,
): SpectralPhotonRadiancePerFrequency<S> {
  return nNu(sys, frequency, temperature);
}

/**
 * Spectral photon radiance per unit wavenumber, 2cσ̃² / (exp(hcσ̃/kT) − 1).
 *
 * @param sys - `SI` or `CGS`
 * @param wavenumber - wavenumber, in `sys`
 * @param temperature - temperature
 * @throws RangeError when σ̃ or T is not finite and > 0
 * @example
 * ```ts
 * import { CGS, planckPhotonRadianceWavenumber, units } from "starlume";
 * const n = planckPhotonRadianceWavenumber(CGS, CGS.of(2000, units.per_cm), CGS.of(1500, units.K));
 * ```
 */
export function planckPhotonRadianceWavenumber<S extends SystemName>(
  sys: UnitSystem<S>,
  wavenumber: Wavenumber<NoInfer<S>>,
  temperature: Temperature,
): SpectralPhotonRadiancePerWavenumber<S> {
  return nSigma(sys, wavenumber, temperature);
}

/**
 * Temperature derivative of B_λ, ∂B_λ/∂T = (B_λ/T)·x/(1 − e⁻ˣ), x = hc/(λkT)
 * (→ B_λ/T in the Rayleigh–Jeans limit, → B_λ·x/T in the Wien limit): the
 * Jacobian a temperature fitter needs.
 *
 * @param sys - `SI` (W m⁻² sr⁻¹ m⁻¹ K⁻¹) or `CGS` (erg s⁻¹ cm⁻² sr⁻¹ cm⁻¹ K⁻¹)
 * @param wavelength - vacuum wavelength λ, in `sys`
 * @param temperature - temperature T
 * @throws RangeError when λ or T is not finite and > 0, or the result overflows
 * @example
 * ```ts
 * import { SI, planckRadianceWavelengthDerivativeT, units } from "starlume";
 * const d = planckRadianceWavelengthDerivativeT(SI, SI.of(500, units.nm), SI.of(5772, units.K)); // W m^-2 sr^-1 m^-1 K^-1
 * ```
 */
export function planckRadianceWavelengthDerivativeT<S extends SystemName>(
  sys: UnitSystem<S>,
  wavelength: NotAirWavelength<NoInfer<S>>,
  temperature: Temperature,
): SpectralRadiancePerWavelengthPerTemperature<S> {
  return dbLambda(sys, wavelength, temperature);
}

/**
 * Temperature derivative of B_ν, ∂B_ν/∂T = (B_ν/T)·x/(1 − e⁻ˣ), x = hν/(kT).
 *
 * @param sys - `SI` (W m⁻² sr⁻¹ Hz⁻¹ K⁻¹) or `CGS` (erg s⁻¹ cm⁻² sr⁻¹ Hz⁻¹ K⁻¹)
 * @param frequency - frequency ν
 * @param temperature - temperature T
 * @throws RangeError when ν or T is not finite and > 0, or the result overflows
 * @example
 * ```ts
 * import { CGS, planckRadianceFrequencyDerivativeT, units } from "starlume";
 * const d = planckRadianceFrequencyDerivativeT(CGS, CGS.of(100, units.GHz), CGS.of(2.7255, units.K));
 * ```
 */
export function planckRadianceFrequencyDerivativeT<S extends SystemName>(
  sys: UnitSystem<S>,
  frequency: Frequency,
  temperature: Temperature,
): SpectralRadiancePerFrequencyPerTemperature<S> {
  return dbNu(sys, frequency, temperature);
}


/**
 * B_λ over many rows: the batch form of {@link planckRadianceWavelength},
 * with the same parameters in the same order. The wavelength, the
 * temperature or both may be typed arrays; arrays must have equal lengths, and
 * a single value is shared by every row (two single values give one row).
 * Never throws part-way: a row whose wavelength or temperature is not finite
 * and > 0 is written as NaN and listed in `invalid`, with the sentence the
 * scalar form would throw in `reasons`. A bad shared value or mismatched
 * lengths throw before any row is written. In SI the loop runs on the
 * caller's arrays directly; in CGS the wavelengths are first copied to SI.
 *
 * @param sys - `SI` or `CGS`
 * @param wavelength - wavelength or wavelengths (vacuum), in `sys`
 * @param temperature - temperature or temperatures
 * @example
 * ```ts
 * import { SI, assumeArray, planckRadianceWavelengthBatch, units, type TemperatureArray } from "starlume";
 * // many wavelengths, one temperature
 * const grid = SI.arrayOf([400, 500, 600, -1], units.nm);
 * const { values, invalid } = planckRadianceWavelengthBatch(SI, grid, SI.of(5772, units.K)); // invalid = [3]
 * // one wavelength, many temperatures
 * const temps = assumeArray<TemperatureArray>(new Float64Array([3000, 5772, 10000]));
 * const k = planckRadianceWavelengthBatch(SI, SI.of(2.2, units.um), temps).values;
 * ```
 */
export function planckRadianceWavelengthBatch<S extends SystemName>(
  sys: UnitSystem<S>,
  wavelength: NotAirWavelength<NoInfer<S>> | NotAirWavelengthArray<NoInfer<S>>,
  temperature: Temperature | TemperatureArray,
): BatchResult<SpectralRadiancePerWavelengthArray<S>> {
  return bLambda.batch(sys, wavelength, temperature);
}

/** A quantity whose dimension is "per steradian" (solid-angle exponent −1). */
export type PerSteradian = AnyQuantity &
  Brand<
    Dimension & {
      /** Solid-angle exponent −1 (sr⁻¹); the other exponents are free. */
      readonly solidAngle: -1;
    },
    SystemTag
  >;

/**
 * The checks of the Lambertian helpers: finite and ≥ 0. They take any
 * radiance-like quantity in either system and no system argument, so their
 * message names the value but no unit.
 */
const lambertianRadianceInput = lawInput("radiance", kinds.dimensionless, { check: "nonNegative" });
const lambertianExitanceInput = lawInput("exitance", kinds.dimensionless, { check: "nonNegative" });

/**
 * The exitance (flux leaving the surface, per unit area) of a Lambertian
 * emitter with the given radiance: M = π sr × L. Works for any radiance-like
 * quantity (total, spectral per λ/ν/σ̃, photon) and removes its sr⁻¹; this
 * is the explicit step where the "lost π" of radiance vs flux is put back.
 *
 * @throws RangeError when the radiance is not finite and ≥ 0 (`radiance must be a finite number >= 0; got -1`), or when π·radiance overflows
 * @example
 * ```ts
 * import { SI, lambertianExitance, planckRadianceWavelength, units, type SpectralFluxPerWavelength } from "starlume";
 * const b = planckRadianceWavelength(SI, SI.of(500, units.nm), SI.of(5772, units.K));
 * const m: SpectralFluxPerWavelength<"SI"> = lambertianExitance(b); // π B_λ
 * ```
 */
export function lambertianExitance<Q extends PerSteradian>(radiance: Q): Product<Q, SolidAngle> {
  const m = Math.PI * lambertianRadianceInput.si(radiance);
  if (m === Infinity) throw new RangeError(`the exitance π·radiance overflows the double range for radiance=${String(radiance)}`);
  return m as Product<Q, SolidAngle>;
}

/**
 * The radiance of a Lambertian emitter with the given exitance: L = M / (π sr).
 *
 * @throws RangeError when the exitance is not finite and ≥ 0 (`exitance must be a finite number >= 0; got NaN`)
 * @example
 * ```ts
 * import { SI, lambertianRadiance, units, type Radiance } from "starlume";
 * const l: Radiance<"SI"> = lambertianRadiance(SI.of(1361, units.W_per_m2));
 * ```
 */
export function lambertianRadiance<Q extends AnyQuantity>(exitance: Q): Quotient<Q, SolidAngle> {
  return (lambertianExitanceInput.si(exitance) / Math.PI) as Quotient<Q, SolidAngle>;
}
