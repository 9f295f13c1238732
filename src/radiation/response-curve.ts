/**
 * The typed response curve of a band: a wavelength grid in one system and a
 * dimensionless response on it.
 *
 * @module
 */
import type { LengthArray } from "../quantity/aliases";
import type { SystemName } from "../quantity/quantity";

/**
 * A tabulated response curve in system `S`: wavelengths (in `S`: m or cm)
 * and the dimensionless response at each.
 *
 * Requirements, checked on every use (RangeError naming the field, index
 * and the caller's unit): at least 2 points; `wavelengths` finite, > 0 and
 * strictly increasing; `response` of the same length, finite and ≥ 0, and
 * not all 0. The overall scale of `response` does not matter.
 *
 * @example
 * ```ts
 * import { CGS, units, type ResponseCurve } from "starlume";
 * const v: ResponseCurve<"CGS"> = {
 *   wavelengths: CGS.arrayOf([480, 500, 550, 600, 650], units.nm),
 *   response: [0, 0.5, 1, 0.5, 0],
 * };
 * ```
 */
export interface ResponseCurve<S extends SystemName> {
  /** Grid wavelengths, strictly increasing, in system `S`. */
  readonly wavelengths: LengthArray<S>;
  /** Response at each grid wavelength (dimensionless, ≥ 0). */
  readonly response: ArrayLike<number>;
}
