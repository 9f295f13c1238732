/**
 * The medium of a wavelength, as a compile-time brand: vacuum or standard
 * air. These types live in the quantity layer so that every law (radiation,
 * photometry, spectra) can demand a vacuum wavelength without importing the
 * spectra module; the conversions between the media are in
 * `spectra/medium.ts`, which re-exports these types.
 *
 * @module
 */
import type { Length, LengthArray } from "./aliases";
import type { SystemName } from "./quantity";

declare const mediumBrand: unique symbol;

/** The medium a wavelength is measured in: `"vacuum"` or (standard) `"air"`. */
export type Medium = "vacuum" | "air";

/** The compile-time medium brand of a wavelength (no run-time property). */
export interface MediumTag<M extends Medium> {
  /** The medium `M` (compile time only: no such property exists at run time). */
  readonly [mediumBrand]: M;
}

/** A wavelength in vacuum: `Length<S>` branded `"vacuum"`. */
export type VacuumWavelength<S extends SystemName> = Length<S> & MediumTag<"vacuum">;

/** A wavelength in standard air: `Length<S>` branded `"air"`. */
export type AirWavelength<S extends SystemName> = Length<S> & MediumTag<"air">;

/** A `Float64Array` of vacuum wavelengths. */
export type VacuumWavelengthArray<S extends SystemName> = LengthArray<S> & MediumTag<"vacuum">;

/** A `Float64Array` of standard-air wavelengths. */
export type AirWavelengthArray<S extends SystemName> = LengthArray<S> & MediumTag<"air">;

/** A vacuum wavelength, or a `Length<S>` with no medium brand (taken as vacuum). An air wavelength is rejected. */
export type NotAirWavelength<S extends SystemName> = Length<S> & {
  /** Absent (unbranded, taken as vacuum) or `"vacuum"` (compile time only). */
  readonly [mediumBrand]?: "vacuum";
};

/** An array of vacuum wavelengths, or an unbranded `LengthArray<S>` (taken as vacuum); air is rejected. */
export type NotAirWavelengthArray<S extends SystemName> = LengthArray<S> & {
  /** Absent (unbranded, taken as vacuum) or `"vacuum"` (compile time only). */
  readonly [mediumBrand]?: "vacuum";
};

/** An array of standard-air wavelengths, or an unbranded `LengthArray<S>`; vacuum is rejected. */
export type NotVacuumWavelengthArray<S extends SystemName> = LengthArray<S> & {
  /** Absent (unbranded) or `"air"` (compile time only). */
  readonly [mediumBrand]?: "air";
};

/** A standard-air wavelength or an unbranded `Length<S>`; a vacuum wavelength is rejected. */
export type NotVacuumWavelength<S extends SystemName> = Length<S> & {
  /** Absent (unbranded) or `"air"` (compile time only). */
  readonly [mediumBrand]?: "air";
};

/** The medium of a branded wavelength (or array) type; `Medium` (either) when `W` is unbranded. */
export type MediumOf<W> = W extends MediumTag<infer M> ? M : Medium;

/** A length in system `S` that is either unbranded or branded with a medium in `M`. */
export type MaybeInMedium<S extends SystemName, M extends Medium> = Length<S> & {
  /** Absent (unbranded) or a medium in `M` (compile time only). */
  readonly [mediumBrand]?: M;
};

/**
 * A length in system `S` whose medium, if branded, is the medium of `W`:
 * an unbranded length, or one branded like `W` (anything, when `W` itself
 * is unbranded).
 */
export type SameMediumAs<S extends SystemName, W> = MaybeInMedium<S, MediumOf<W>>;

/**
 * The type of a single wavelength taken from a grid of type `G`: branded
 * like the grid, or a plain `Length<S>` when the grid is unbranded.
 */
export type WavelengthOnGrid<S extends SystemName, G> = G extends MediumTag<infer M> ? Length<S> & MediumTag<M> : Length<S>;
