/**
 * The two classical limits of Planck's law, typed, and their exact relative
 * errors against it.
 *
 * With x = hc/(λkT) = hν/(kT):
 * - Rayleigh–Jeans (x ≪ 1): B_λ ≈ 2ckT/λ⁴, B_ν ≈ 2ν²kT/c². Relative error
 *   (B_RJ − B)/B = expm1(x)/x − 1 ≈ x/2, always > 0 (it overestimates).
 * - Wien (x ≫ 1): B_λ ≈ (2hc²/λ⁵)e⁻ˣ, B_ν ≈ (2hν³/c²)e⁻ˣ. Relative error
 *   (B_W − B)/B = −e⁻ˣ exactly, always < 0 (it underestimates).
 *
 * The relative errors are computed from x formed in double-double, not by
 * subtracting two radiances, so they stay accurate where they are tiny:
 * −e⁻ˣ to a few ulp even at 1e-300, expm1(x)/x − 1 to ≤ 3e-16 up to x = 700;
 * between x = 700 and its overflow at x ≈ 716 the kernel evaluates it as
 * exp(x − ln x), good to ~x·1.1e-16 (measured worst 5.7e-14 against mpmath).
 *
 * Sources: Rayleigh, Phil. Mag. 49, 539 (1900); Jeans, Phil. Mag. 10, 91
 * (1905); Wien, Ann. Phys. 294, 662 (1896); constants CODATA 2018.
 *
 * @module
 */
import type { NotAirWavelength } from "../quantity/medium";
import { defineLaw } from "../law/define";
import { lawInput } from "../law/input";
import { kinds } from "../quantity/aliases";
import type {
  Dimensionless,
  Frequency,
  SpectralRadiancePerFrequency,
  SpectralRadiancePerWavelength,
  Temperature,
} from "../quantity/aliases";
import type { SystemName } from "../quantity/quantity";
import type { UnitSystem } from "../quantity/system";
import { rayleighJeansRelativeErrorUnchecked, wienRelativeErrorUnchecked } from "./kernels/approximations";
import { FORM_LAMBDA_ENERGY, FORM_NU_ENERGY, SHAPE_RJ, SHAPE_WIEN, spectralCore } from "./kernels/planck-core";

const wavelength = lawInput("wavelength", kinds.length, { vacuum: true });
const frequency = lawInput("frequency", kinds.frequency);
const temperature = lawInput("temperature", kinds.temperature);

const rjLambda = defineLaw({
  name: "Rayleigh–Jeans B_λ",
  inputs: [wavelength, temperature],
  result: kinds.spectralRadiancePerWavelength,
  kernel: (l, t) => spectralCore(SHAPE_RJ, FORM_LAMBDA_ENERGY, l, t),
});
const rjNu = defineLaw({
  name: "Rayleigh–Jeans B_ν",
  inputs: [frequency, temperature],
  result: kinds.spectralRadiancePerFrequency,
  kernel: (f, t) => spectralCore(SHAPE_RJ, FORM_NU_ENERGY, f, t),
});
const wienLambda = defineLaw({
  name: "Wien B_λ",
  inputs: [wavelength, temperature],
  result: kinds.spectralRadiancePerWavelength,
  kernel: (l, t) => spectralCore(SHAPE_WIEN, FORM_LAMBDA_ENERGY, l, t),
});
const wienNu = defineLaw({
  name: "Wien B_ν",
  inputs: [frequency, temperature],
  result: kinds.spectralRadiancePerFrequency,
  kernel: (f, t) => spectralCore(SHAPE_WIEN, FORM_NU_ENERGY, f, t),
});
const rjErrorLambda = defineLaw({
  name: "the Rayleigh–Jeans relative error",
  inputs: [wavelength, temperature],
  result: kinds.dimensionless,
  kernel: (l, t) => rayleighJeansRelativeErrorUnchecked(FORM_LAMBDA_ENERGY, l, t),
});
const rjErrorNu = defineLaw({
  name: "the Rayleigh–Jeans relative error",
  inputs: [frequency, temperature],
  result: kinds.dimensionless,
  kernel: (f, t) => rayleighJeansRelativeErrorUnchecked(FORM_NU_ENERGY, f, t),
});
const wienErrorLambda = defineLaw({
  name: "the Wien relative error",
  inputs: [wavelength, temperature],
  result: kinds.dimensionless,
  kernel: (l, t) => wienRelativeErrorUnchecked(FORM_LAMBDA_ENERGY, l, t),
});
const wienErrorNu = defineLaw({
  name: "the Wien relative error",
  inputs: [frequency, temperature],
  result: kinds.dimensionless,
  kernel: (f, t) => wienRelativeErrorUnchecked(FORM_NU_ENERGY, f, t),
});

/**
 * Rayleigh–Jeans spectral radiance per unit wavelength, B_λ ≈ 2ckT/λ⁴.
 *
 * @param sys - `SI` (W m⁻² sr⁻¹ m⁻¹) or `CGS` (erg s⁻¹ cm⁻² sr⁻¹ cm⁻¹)
 * @param wavelength - vacuum wavelength λ, in `sys`
 * @param temperature - temperature T
 * @throws RangeError when λ or T is not finite and > 0, or the result overflows
 * @example
 * ```ts
 * import { CGS, rayleighJeansRadianceWavelength, units } from "starlume";
 * const b = rayleighJeansRadianceWavelength(CGS, CGS.of(1, units.mm), CGS.of(300, units.K));
 * ```
 */
export function rayleighJeansRadianceWavelength<S extends SystemName>(
  sys: UnitSystem<S>,
  wavelength: NotAirWavelength<NoInfer<S>>,
  temperature: Temperature,
): SpectralRadiancePerWavelength<S> {
  return rjLambda(sys, wavelength, temperature);
}

/**
 * Rayleigh–Jeans spectral radiance per unit frequency, B_ν ≈ 2ν²kT/c².
 *
 * @param sys - `SI` (W m⁻² sr⁻¹ Hz⁻¹) or `CGS` (erg s⁻¹ cm⁻² sr⁻¹ Hz⁻¹)
 * @param frequency - frequency ν
 * @param temperature - temperature T
 * @throws RangeError when ν or T is not finite and > 0, or the result overflows
 * @example
 * ```ts
 * import { SI, rayleighJeansRadianceFrequency, units } from "starlume";
 * const b = rayleighJeansRadianceFrequency(SI, SI.of(1.4, units.GHz), SI.of(2.7255, units.K));
 * ```
 */
export function rayleighJeansRadianceFrequency<S extends SystemName>(
  sys: UnitSystem<S>,
  frequency: Frequency,
  temperature: Temperature,
): SpectralRadiancePerFrequency<S> {
  return rjNu(sys, frequency, temperature);
}

/**
 * Wien's approximation per unit wavelength, B_λ ≈ (2hc²/λ⁵)·exp(−hc/(λkT)).
 * 0 where the true value underflows.
 *
 * @param sys - `SI` (W m⁻² sr⁻¹ m⁻¹) or `CGS` (erg s⁻¹ cm⁻² sr⁻¹ cm⁻¹)
 * @param wavelength - vacuum wavelength λ, in `sys`
 * @param temperature - temperature T
 * @throws RangeError when λ or T is not finite and > 0, or the result overflows
 * @example
 * ```ts
 * import { SI, units, wienRadianceWavelength } from "starlume";
 * const b = wienRadianceWavelength(SI, SI.of(400, units.nm), SI.of(3000, units.K));
 * ```
 */
export function wienRadianceWavelength<S extends SystemName>(
  sys: UnitSystem<S>,
  wavelength: NotAirWavelength<NoInfer<S>>,
  temperature: Temperature,
): SpectralRadiancePerWavelength<S> {
  return wienLambda(sys, wavelength, temperature);
}

/**
 * Wien's approximation per unit frequency, B_ν ≈ (2hν³/c²)·exp(−hν/(kT)).
 *
 * @param sys - `SI` (W m⁻² sr⁻¹ Hz⁻¹) or `CGS` (erg s⁻¹ cm⁻² sr⁻¹ Hz⁻¹)
 * @param frequency - frequency ν
 * @param temperature - temperature T
 * @throws RangeError when ν or T is not finite and > 0, or the result overflows
 * @example
 * ```ts
 * import { CGS, units, wienRadianceFrequency } from "starlume";
 * const b = wienRadianceFrequency(CGS, CGS.of(1000, units.THz), CGS.of(5772, units.K));
 * ```
 */
export function wienRadianceFrequency<S extends SystemName>(
  sys: UnitSystem<S>,
  frequency: Frequency,
  temperature: Temperature,
): SpectralRadiancePerFrequency<S> {
  return wienNu(sys, frequency, temperature);
}

/**
 * Relative error of the Rayleigh–Jeans law at (λ, T),
 * (B_RJ − B)/B = expm1(x)/x − 1 with x = hc/(λkT) (≈ x/2 for small x).
 * The same number in both systems (`sys` only fixes the unit of λ).
 *
 * @param sys - `SI` or `CGS` (the system of `wavelength`)
 * @param wavelength - vacuum wavelength λ, in `sys`
 * @param temperature - temperature T
 * @returns the relative error, > 0
 * @throws RangeError for bad input, or when the error itself exceeds the double range (x ≳ 716)
 * @example
 * ```ts
 * import { SI, rayleighJeansRelativeErrorWavelength, units } from "starlume";
 * rayleighJeansRelativeErrorWavelength(SI, SI.of(1, units.mm), SI.of(300, units.K)); // ≈ 0.0244
 * ```
 */
export function rayleighJeansRelativeErrorWavelength<S extends SystemName>(
  sys: UnitSystem<S>,
  wavelength: NotAirWavelength<NoInfer<S>>,
  temperature: Temperature,
): Dimensionless {
  return rjErrorLambda(sys, wavelength, temperature);
}

/**
 * Relative error of the Rayleigh–Jeans law at (ν, T), expm1(x)/x − 1 with x = hν/(kT).
 *
 * @param sys - `SI` or `CGS` (kept for a uniform call shape; frequency is the same in both)
 * @param frequency - frequency ν
 * @param temperature - temperature T
 * @returns the relative error, > 0
 * @throws RangeError for bad input, or when the error exceeds the double range
 * @example
 * ```ts
 * import { SI, rayleighJeansRelativeErrorFrequency, units } from "starlume";
 * rayleighJeansRelativeErrorFrequency(SI, SI.of(100, units.GHz), SI.of(2.7255, units.K)); // ≈ 1.74 (x ≈ 1.76)
 * ```
 */
export function rayleighJeansRelativeErrorFrequency<S extends SystemName>(
  sys: UnitSystem<S>,
  frequency: Frequency,
  temperature: Temperature,
): Dimensionless {
  return rjErrorNu(sys, frequency, temperature);
}

/**
 * Relative error of Wien's approximation at (λ, T): exactly −exp(−x),
 * x = hc/(λkT); in (−1, 0], tending to 0⁻ on the short-wave side.
 *
 * @param sys - `SI` or `CGS` (the system of `wavelength`)
 * @param wavelength - vacuum wavelength λ, in `sys`
 * @param temperature - temperature T
 * @returns (B_W − B)/B
 * @throws RangeError for bad input
 * @example
 * ```ts
 * import { CGS, units, wienRelativeErrorWavelength } from "starlume";
 * wienRelativeErrorWavelength(CGS, CGS.of(500, units.nm), CGS.of(5772, units.K)); // ≈ −0.0069
 * ```
 */
export function wienRelativeErrorWavelength<S extends SystemName>(
  sys: UnitSystem<S>,
  wavelength: NotAirWavelength<NoInfer<S>>,
  temperature: Temperature,
): Dimensionless {
  return wienErrorLambda(sys, wavelength, temperature);
}

/**
 * Relative error of Wien's approximation at (ν, T): exactly −exp(−hν/(kT)).
 *
 * @param sys - `SI` or `CGS` (kept for a uniform call shape)
 * @param frequency - frequency ν
 * @param temperature - temperature T
 * @returns (B_W − B)/B, in (−1, 0]
 * @throws RangeError for bad input
 * @example
 * ```ts
 * import { SI, units, wienRelativeErrorFrequency } from "starlume";
 * wienRelativeErrorFrequency(SI, SI.of(1000, units.THz), SI.of(5772, units.K));
 * ```
 */
export function wienRelativeErrorFrequency<S extends SystemName>(
  sys: UnitSystem<S>,
  frequency: Frequency,
  temperature: Temperature,
): Dimensionless {
  return wienErrorNu(sys, frequency, temperature);
}
