/**
 * Typed measurements of an absorption line on a sampled spectrum, against a
 * continuum sampled on the same grid, within a wavelength window [lo, hi]:
 * only grid points with lo ≤ λ ≤ hi are used (no interpolation at the
 * edges), integrals by the trapezoidal rule.
 *
 * - Equivalent width W = ∫ (1 − F/F_c) dλ (`Length<S>`; positive for
 *   absorption, negative for emission).
 * - Centroid λ̄ = ∫ λ (1 − F/F_c) dλ / ∫ (1 − F/F_c) dλ, a wavelength in
 *   the grid's medium (branded like the grid, plain if the grid is plain).
 * - Depth d = 1 − min(F/F_c) (`Dimensionless`, grid points only).
 *
 * Flux and continuum must have one type (any quantity array in the system,
 * or `DimensionlessArray` for normalised spectra); the window bounds must
 * be in the grid's medium (medium.ts rule 4). These are reductions, not
 * row-wise maps: a non-finite flux or a continuum that is not > 0 inside
 * the window, a grid that is not strictly increasing, or fewer than two
 * points in the window throw a RangeError naming the parameter.
 *
 * Accuracy: exact for piecewise-linear data (trapezoid); on a Voigt line
 * sampled at b/8 the trapezoid error is negligible (~e^{−(8π)²}) and the
 * window truncation dominates (synthesize.test.ts).
 *
 * @module
 */
import { show } from "../internal/checks";
import { lawInput } from "../law/input";
import { lawOutput } from "../law/output";
import { kinds } from "../quantity/aliases";
import type { Dimensionless, Length, LengthArray } from "../quantity/aliases";
import type { SystemName } from "../quantity/quantity";
import type { UnitSystem } from "../quantity/system";
import { equivalentWidthUnchecked, lineCentroidUnchecked, lineDepthUnchecked } from "./kernels/measure";
import type { SameMediumAs, WavelengthOnGrid } from "./medium";
import { gridToSI, type SpectrumArray } from "./synthesize";

const loInput = lawInput("lo", kinds.length, { check: "finite" });
const hiInput = lawInput("hi", kinds.length, { check: "finite" });
const windowInputs = [loInput, hiInput];
const equivalentWidthOut = lawOutput("equivalent width", kinds.length);
const centroidOut = lawOutput("centroid", kinds.length);

/** First index with grid[i] >= x (`strict`: > x); the grid is increasing. */
function bound(grid: Float64Array, x: number, strict: boolean): number {
  let a = 0;
  let b = grid.length;
  while (a < b) {
    const m = (a + b) >>> 1;
    const g = grid[m] as number;
    if (strict ? g <= x : g < x) a = m + 1;
    else b = m;
  }
  return a;
}

/** A measurement window, checked: the grid in SI and the grid points i0 … i1 − 1 inside [lo, hi]. */
interface Window {
  readonly gridSI: Float64Array;
  readonly i0: number;
  readonly i1: number;
}

/**
 * Check everything a measurement needs, once and in the caller's units
 * (module header), and find the window on the caller's grid.
 */
function windowOf(
  sys: UnitSystem<SystemName>,
  grid: Float64Array,
  flux: Float64Array,
  continuum: Float64Array,
  lo: number,
  hi: number,
): Window {
  const unit = sys.coherentUnit(kinds.length.dimension);
  const gridSI = gridToSI(sys, grid);
  const n = grid.length;
  if (flux.length !== n) throw new RangeError(`flux must have the grid length ${n}; got ${flux.length}`);
  if (continuum.length !== n) throw new RangeError(`continuum must have the grid length ${n}; got ${continuum.length}`);
  loInput.toSI(sys, lo);
  hiInput.toSI(sys, hi);
  if (!(hi > lo)) throw new RangeError(`hi must be greater than lo (${show(lo)}) ${unit}; got ${show(hi)}`);
  const i0 = bound(grid, lo, false);
  const i1 = bound(grid, hi, true);
  if (i1 - i0 < 2) {
    throw new RangeError(`the window [lo, hi] = [${show(lo)}, ${show(hi)}] ${unit} must contain at least 2 grid points; got ${i1 - i0}`);
  }
  for (let i = i0; i < i1; i++) {
    const f = flux[i] as number;
    const c = continuum[i] as number;
    if (!(f - f === 0)) throw new RangeError(`flux must be finite in the window; element ${i} is ${show(f)}`);
    if (!(c > 0 && c < Infinity)) throw new RangeError(`continuum must be finite and > 0 in the window; element ${i} is ${show(c)}`);
  }
  return { gridSI, i0, i1 };
}

/** An SI length result in the caller's system; RangeError naming the window when it is not finite there. */
function lengthIn(sys: UnitSystem<SystemName>, out: typeof equivalentWidthOut, valueSI: number, lo: number, hi: number): number {
  const v = out.fromSI(sys, valueSI);
  if (v !== v) throw new RangeError(out.reason(sys, valueSI, windowInputs, [lo, hi]));
  return v;
}

/**
 * Equivalent width W = ∫ (1 − F/F_c) dλ over the grid points in [lo, hi].
 *
 * @param sys - `SI` (m) or `CGS` (cm)
 * @param grid - wavelengths in `sys`, strictly increasing
 * @param flux - F on the grid (finite in the window)
 * @param continuum - F_c on the grid, the flux's type (> 0 in the window)
 * @param lo - window start (grid's medium)
 * @param hi - window end (> lo)
 * @throws RangeError for a bad grid, window, flux or continuum (module header)
 * @example
 * ```ts
 * import { SI, assumeArray, equivalentWidth, units, type DimensionlessArray } from "starlume";
 * const grid = SI.arrayOf([499.9, 500.0, 500.1], units.nm);
 * const flux = assumeArray<DimensionlessArray>(Float64Array.of(1, 0.5, 1));
 * const cont = assumeArray<DimensionlessArray>(Float64Array.of(1, 1, 1));
 * SI.valueIn(equivalentWidth(SI, grid, flux, cont, SI.of(499.9, units.nm), SI.of(500.1, units.nm)), units.nm); // 0.05
 * ```
 */
export function equivalentWidth<S extends SystemName, G extends LengthArray<S>, C extends SpectrumArray<S>>(
  sys: UnitSystem<S>,
  grid: G,
  flux: C,
  continuum: NoInfer<C>,
  lo: SameMediumAs<NoInfer<S>, NoInfer<G>>,
  hi: SameMediumAs<NoInfer<S>, NoInfer<G>>,
): Length<S> {
  const w = windowOf(sys, grid, flux, continuum, lo, hi);
  return lengthIn(sys, equivalentWidthOut, equivalentWidthUnchecked(w.gridSI, flux, continuum, w.i0, w.i1), lo, hi) as Length<S>;
}

/**
 * Flux-deficit–weighted centroid λ̄ = ∫ λ (1 − F/F_c) dλ / ∫ (1 − F/F_c) dλ
 * over the window; branded like the grid. Throws a RangeError if the
 * deficit integrates to zero.
 *
 * @example
 * ```ts
 * import { SI, airWavelength, airWavelengthArray, assumeArray, lineCentroid, units, type DimensionlessArray } from "starlume";
 * const grid = airWavelengthArray(SI, SI.arrayOf([656.1, 656.2, 656.3, 656.4], units.nm));
 * const flux = assumeArray<DimensionlessArray>(Float64Array.of(1, 0.6, 0.8, 1));
 * const cont = assumeArray<DimensionlessArray>(Float64Array.of(1, 1, 1, 1));
 * const c = lineCentroid(SI, grid, flux, cont, airWavelength(SI, SI.of(656.1, units.nm)), airWavelength(SI, SI.of(656.4, units.nm))); // AirWavelength<"SI">
 * ```
 */
export function lineCentroid<S extends SystemName, G extends LengthArray<S>, C extends SpectrumArray<S>>(
  sys: UnitSystem<S>,
  grid: G,
  flux: C,
  continuum: NoInfer<C>,
  lo: SameMediumAs<NoInfer<S>, NoInfer<G>>,
  hi: SameMediumAs<NoInfer<S>, NoInfer<G>>,
): WavelengthOnGrid<S, G> {
  const w = windowOf(sys, grid, flux, continuum, lo, hi);
  const c = lineCentroidUnchecked(w.gridSI, flux, continuum, w.i0, w.i1);
  if (c !== c) {
    const unit = sys.coherentUnit(kinds.length.dimension);
    throw new RangeError(`flux has no deficit against continuum in [lo, hi] = [${show(lo)}, ${show(hi)}] ${unit}: the centroid is undefined`);
  }
  return lengthIn(sys, centroidOut, c, lo, hi) as WavelengthOnGrid<S, G>;
}

/**
 * Line depth d = 1 − min(F/F_c) over the grid points in the window.
 *
 * @example
 * ```ts
 * import { CGS, assumeArray, lineDepth, units, type DimensionlessArray } from "starlume";
 * const grid = CGS.arrayOf([4999, 5000, 5001], units.angstrom);
 * const flux = assumeArray<DimensionlessArray>(Float64Array.of(1, 0.3, 1));
 * const cont = assumeArray<DimensionlessArray>(Float64Array.of(1, 1, 1));
 * lineDepth(CGS, grid, flux, cont, CGS.of(4999, units.angstrom), CGS.of(5001, units.angstrom)); // 0.7
 * ```
 */
export function lineDepth<S extends SystemName, G extends LengthArray<S>, C extends SpectrumArray<S>>(
  sys: UnitSystem<S>,
  grid: G,
  flux: C,
  continuum: NoInfer<C>,
  lo: SameMediumAs<NoInfer<S>, NoInfer<G>>,
  hi: SameMediumAs<NoInfer<S>, NoInfer<G>>,
): Dimensionless {
  const w = windowOf(sys, grid, flux, continuum, lo, hi);
  return lineDepthUnchecked(flux, continuum, w.i0, w.i1) as Dimensionless;
}
