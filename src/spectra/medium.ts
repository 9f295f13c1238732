/**
 * The medium of a wavelength, in the type: vacuum or standard air.
 *
 * A wavelength measured in air is shorter than the same line's vacuum
 * wavelength by n − 1 ≈ 2.8 × 10⁻⁴ (83 km s⁻¹ as a Doppler velocity), so
 * mixing the two is a real and silent error. Here a wavelength may carry a
 * compile-time *medium brand* on top of its `Length<S>` type:
 * {@link VacuumWavelength} or {@link AirWavelength}. At run time both are
 * plain numbers in the system's length unit (m or cm).
 *
 * The rule, used by every function of the spectra module:
 *
 * 1. **Branded wavelengths say their medium.** Functions that compute a
 *    wavelength from physics (line lists, photon conversions) return
 *    {@link VacuumWavelength}; {@link airFromVacuum} returns
 *    {@link AirWavelength}; {@link vacuumWavelength} and
 *    {@link airWavelength} brand a length you have.
 * 2. **Where the physics needs a vacuum wavelength** (E = hc/λ, ν = c/λ,
 *    σ = 1/λ, a Planck continuum), the parameter is a
 *    {@link NotAirWavelength}: a vacuum wavelength or an unbranded `Length`
 *    (an unbranded length counts as vacuum, the library-wide convention, as
 *    in the radiation module). An air wavelength does not compile there.
 * 3. **The two conversions demand the brand of their input**:
 *    {@link airFromVacuum} takes only a {@link VacuumWavelength} and
 *    {@link vacuumFromAir} only an {@link AirWavelength}, so the medium is
 *    stated exactly where it changes, and converting twice does not compile.
 * 4. **Where several wavelengths meet** (observed vs rest wavelength, a grid
 *    vs line centres vs a measurement window), branded ones must share one
 *    medium ({@link SameMediumAs}); an unbranded one matches either. Results
 *    keep the medium of their input: a Doppler-shifted air wavelength is an
 *    air wavelength, the centroid measured on an air grid is an air
 *    wavelength.
 * 5. **Medium-free lengths** (offsets from a line centre, widths, equivalent
 *    widths) are plain `Length<S>`; a branded wavelength is accepted where
 *    a plain `Length<S>` is asked for (it is a subtype), e.g. as the centre
 *    of a Doppler width.
 *
 * Arithmetic (`add`, `mul`, …) and `CGS.from` return plain quantities: the
 * brand is dropped and must be restated with {@link vacuumWavelength} or
 * {@link airWavelength}.
 *
 * Standard air: refractive index n(λ_vac) of dry air at 15 °C, 101 325 Pa,
 * 0.03 % CO₂ from B. Edlén (1966), "The refractive index of air",
 * Metrologia 2, 71:
 *
 *   n − 1 = 10⁻⁸ [8342.13 + 2 406 030 / (130 − σ²) + 15 997 / (38.9 − σ²)],
 *
 * σ = 1/λ_vac in µm⁻¹; λ_air = λ_vac / n(λ_vac). This is the form used for
 * the IAU standard-air convention by D. C. Morton (1991, ApJS 77, 119;
 * 2000, ApJS 130, 403); between 200 nm and 20 µm it differs from the Edlén
 * (1953) formula adopted by the IAU in 1957 by < 1.4 × 10⁻⁸ in n − 1.
 * Validity range: air wavelengths 200 nm – 20 µm (Edlén's fit covers about
 * 0.2–2 µm; its extrapolation to 20 µm is the common practice of infrared
 * line lists); outside it the conversions throw a RangeError (scalars) or
 * write NaN and report the row (arrays). Air → vacuum inverts the formula
 * by Newton's method; round trips agree to ≤ 1e-14 relative.
 *
 * @module
 */
export type {
  AirWavelength,
  AirWavelengthArray,
  MaybeInMedium,
  Medium,
  MediumOf,
  MediumTag,
  NotAirWavelength,
  NotAirWavelengthArray,
  NotVacuumWavelength,
  NotVacuumWavelengthArray,
  SameMediumAs,
  VacuumWavelength,
  VacuumWavelengthArray,
  WavelengthOnGrid,
} from "../quantity/medium";
import type {
  AirWavelength,
  AirWavelengthArray,
  MediumTag,
  NotAirWavelength,
  NotAirWavelengthArray,
  NotVacuumWavelength,
  NotVacuumWavelengthArray,
  SameMediumAs,
  VacuumWavelength,
  VacuumWavelengthArray,
} from "../quantity/medium";
import type { BatchResult } from "../law/batch";
import { defineLaw } from "../law/define";
import { lawInput } from "../law/input";
import { kinds } from "../quantity/aliases";
import type { Dimensionless } from "../quantity/aliases";
import type { SystemName } from "../quantity/quantity";
import type { UnitSystem } from "../quantity/system";
import {
  AIR_WAVELENGTH_MAX_M,
  AIR_WAVELENGTH_MIN_M,
  VACUUM_WAVELENGTH_MAX_M,
  VACUUM_WAVELENGTH_MIN_M,
  airRefractiveIndexUnchecked,
  airToVacuumWavelengthUnchecked,
  vacuumToAirWavelengthUnchecked,
} from "./kernels/air-vacuum";

/** A wavelength to brand: finite and > 0, in the caller's unit. */
const anyLength = lawInput("length", kinds.length);
/** A vacuum wavelength inside the standard-air formula's range (SI bounds; messages print them in the caller's unit). */
const vacuumInRange = lawInput("wavelength", kinds.length, {
  vacuum: true,
  min: VACUUM_WAVELENGTH_MIN_M,
  max: VACUUM_WAVELENGTH_MAX_M,
  rangeNote: "standard-air formula range, 200 nm to 20 µm in air",
});
/** An air wavelength inside the formula's range, 200 nm to 20 µm. */
const airInRange = lawInput("wavelength", kinds.length, {
  min: AIR_WAVELENGTH_MIN_M,
  max: AIR_WAVELENGTH_MAX_M,
  rangeNote: "standard-air formula range",
});

const refractiveIndex = defineLaw({
  name: "refractive index",
  inputs: [vacuumInRange],
  result: kinds.dimensionless,
  kernel: airRefractiveIndexUnchecked,
});
const toAir = defineLaw({
  name: "air wavelength",
  inputs: [vacuumInRange],
  result: kinds.length,
  kernel: vacuumToAirWavelengthUnchecked,
});
const toVacuum = defineLaw({
  name: "vacuum wavelength",
  inputs: [airInRange],
  result: kinds.length,
  kernel: airToVacuumWavelengthUnchecked,
});

/**
 * Brand a length as a vacuum wavelength. Throws unless it is finite and > 0.
 * An air wavelength does not compile here (use {@link vacuumFromAir}).
 *
 * @param sys - `SI` or `CGS`
 * @param length - the wavelength, in `sys`
 * @throws RangeError when the length is not finite and > 0 (in the caller's unit)
 * @example
 * ```ts
 * import { SI, units, vacuumWavelength } from "starlume";
 * const lyA = vacuumWavelength(SI, SI.of(121.567, units.nm)); // VacuumWavelength<"SI">
 * ```
 */
export function vacuumWavelength<S extends SystemName>(
  sys: UnitSystem<S>,
  length: NotAirWavelength<NoInfer<S>>,
): VacuumWavelength<S> {
  anyLength.toSI(sys, length); // the check only: the value is kept as given
  return length as number as VacuumWavelength<S>;
}

/**
 * Brand a length as a standard-air wavelength. Throws unless it is finite
 * and > 0. A vacuum wavelength does not compile here (use {@link airFromVacuum}).
 *
 * @param sys - `SI` or `CGS`
 * @param length - the wavelength, in `sys`
 * @throws RangeError when the length is not finite and > 0
 * @example
 * ```ts
 * import { CGS, airWavelength, units } from "starlume";
 * const naD2 = airWavelength(CGS, CGS.of(5889.951, units.angstrom)); // AirWavelength<"CGS">
 * ```
 */
export function airWavelength<S extends SystemName>(
  sys: UnitSystem<S>,
  length: NotVacuumWavelength<NoInfer<S>>,
): AirWavelength<S> {
  anyLength.toSI(sys, length); // the check only: the value is kept as given
  return length as number as AirWavelength<S>;
}

/**
 * Brand an array of lengths as vacuum wavelengths (no copy, no check: the
 * functions that read it validate its rows).
 *
 * @example
 * ```ts
 * import { SI, units, vacuumWavelengthArray } from "starlume";
 * const grid = vacuumWavelengthArray(SI, SI.arrayOf([656.0, 656.5, 657.0], units.nm));
 * ```
 */
export function vacuumWavelengthArray<S extends SystemName>(
  sys: UnitSystem<S>,
  lengths: NotAirWavelengthArray<NoInfer<S>>,
): VacuumWavelengthArray<S> {
  void sys;
  return lengths as Float64Array as VacuumWavelengthArray<S>;
}

/**
 * Brand an array of lengths as standard-air wavelengths (no copy, no check).
 *
 * @example
 * ```ts
 * import { SI, airWavelengthArray, units } from "starlume";
 * const observed = airWavelengthArray(SI, SI.arrayOf([6562.0, 6562.8, 6563.6], units.angstrom));
 * ```
 */
export function airWavelengthArray<S extends SystemName>(
  sys: UnitSystem<S>,
  lengths: NotVacuumWavelengthArray<NoInfer<S>>,
): AirWavelengthArray<S> {
  void sys;
  return lengths as Float64Array as AirWavelengthArray<S>;
}

/**
 * Refractive index of standard air (Edlén 1966, module header) at a vacuum
 * wavelength: n = 1 + 10⁻⁸[8342.13 + 2 406 030/(130 − σ²) + 15 997/(38.9 − σ²)],
 * σ in µm⁻¹. Dimensionless, ≈ 1.000 276 at Hα.
 *
 * @param sys - `SI` or `CGS`
 * @param wavelength - vacuum wavelength (or unbranded length), in `sys`; 200.065 nm to 20.005 µm
 * @throws RangeError outside the formula's range (in the caller's unit)
 * @example
 * ```ts
 * import { SI, airRefractiveIndex, units, vacuumWavelength } from "starlume";
 * airRefractiveIndex(SI, vacuumWavelength(SI, SI.of(656.46, units.nm))); // ≈ 1.000276
 * ```
 */
export function airRefractiveIndex<S extends SystemName>(
  sys: UnitSystem<S>,
  wavelength: NotAirWavelength<NoInfer<S>>,
): Dimensionless {
  return refractiveIndex(sys, wavelength);
}

/**
 * Standard-air wavelength of a vacuum wavelength, λ_air = λ_vac / n(λ_vac)
 * (Edlén 1966; module header). Exactly one rounding of the kernel result
 * when converting to CGS.
 *
 * @param sys - `SI` or `CGS`
 * @param wavelength - a {@link VacuumWavelength} in `sys` (vacuum range 200.065 nm – 20.005 µm)
 * @returns the {@link AirWavelength}
 * @throws RangeError outside the range (in the caller's unit)
 * @example
 * ```ts
 * import { SI, units, airFromVacuum, vacuumWavelength } from "starlume";
 * const ha = airFromVacuum(SI, vacuumWavelength(SI, SI.of(656.4614, units.nm)));
 * SI.valueIn(ha, units.nm); // ≈ 656.2801
 * ```
 */
export function airFromVacuum<S extends SystemName>(
  sys: UnitSystem<S>,
  wavelength: VacuumWavelength<NoInfer<S>>,
): AirWavelength<S> {
  return toAir(sys, wavelength) as AirWavelength<S>;
}

/**
 * Vacuum wavelength of a standard-air wavelength: the root of
 * λ_vac / n(λ_vac) = λ_air (Edlén 1966; Newton's method, module header).
 *
 * @param sys - `SI` or `CGS`
 * @param wavelength - an {@link AirWavelength} in `sys` (200 nm – 20 µm)
 * @returns the {@link VacuumWavelength}
 * @throws RangeError outside the range (in the caller's unit)
 * @example
 * ```ts
 * import { CGS, vacuumFromAir, airWavelength, units } from "starlume";
 * const naD2 = vacuumFromAir(CGS, airWavelength(CGS, CGS.of(5889.951, units.angstrom)));
 * CGS.valueIn(naD2, units.angstrom); // ≈ 5891.583
 * ```
 */
export function vacuumFromAir<S extends SystemName>(
  sys: UnitSystem<S>,
  wavelength: AirWavelength<NoInfer<S>>,
): VacuumWavelength<S> {
  return toVacuum(sys, wavelength) as VacuumWavelength<S>;
}

/**
 * {@link airFromVacuum} over an array (a new array). Never throws part-way:
 * rows outside the range, or not finite, become NaN, are listed in
 * `invalid`, and `reasons` holds the message {@link airFromVacuum} would throw
 * for each.
 *
 * @example
 * ```ts
 * import { SI, units, airFromVacuumBatch, vacuumWavelengthArray } from "starlume";
 * const { values, invalid, reasons } = airFromVacuumBatch(SI, vacuumWavelengthArray(SI, SI.arrayOf([486.27, 656.47, 50], units.nm)));
 * // invalid = [2]; reasons[0] = "wavelength must be in [2.00064…e-7, 0.0000200…] m (standard-air formula range, …); got 5e-8"
 * ```
 */
export function airFromVacuumBatch<S extends SystemName>(
  sys: UnitSystem<S>,
  wavelengths: VacuumWavelengthArray<NoInfer<S>>,
): BatchResult<AirWavelengthArray<S>> {
  return toAir.batch(sys, wavelengths) as BatchResult<AirWavelengthArray<S>>;
}

/**
 * {@link vacuumFromAir} over an array (a new array; bad rows NaN, listed in
 * `invalid` with their reasons in `reasons`).
 *
 * @example
 * ```ts
 * import { SI, vacuumFromAirBatch, airWavelengthArray, units } from "starlume";
 * const { values } = vacuumFromAirBatch(SI, airWavelengthArray(SI, SI.arrayOf([5889.951, 5895.924], units.angstrom)));
 * ```
 */
export function vacuumFromAirBatch<S extends SystemName>(
  sys: UnitSystem<S>,
  wavelengths: AirWavelengthArray<NoInfer<S>>,
): BatchResult<VacuumWavelengthArray<S>> {
  return toVacuum.batch(sys, wavelengths) as BatchResult<VacuumWavelengthArray<S>>;
}
