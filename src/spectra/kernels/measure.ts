/**
 * Measurements of an absorption line on a sampled spectrum, against a
 * continuum sampled on the same grid, within a wavelength window
 * [loM, hiM]: only grid points with loM ≤ λ ≤ hiM are used (no
 * interpolation at the window edges), integrals by the trapezoidal rule.
 *
 * - Equivalent width W = ∫ (1 − F/F_c) dλ, m (positive for absorption).
 * - Centroid λ̄ = ∫ λ (1 − F/F_c) dλ / ∫ (1 − F/F_c) dλ, m (flux-deficit
 *   weighted; meaningful for a pure absorption or pure emission feature).
 * - Depth d = max (1 − F/F_c) = 1 − min F/F_c.
 * - A least-squares polynomial continuum (degree 0–3) fitted to line-free
 *   regions.
 *
 * These are reductions, not row-wise maps: a non-finite flux, a non-positive
 * or non-finite continuum inside the window, a grid that is not strictly
 * increasing, or fewer than two points in the window throw a RangeError
 * naming the parameter.
 *
 * @packageDocumentation
 */

import { requireFinite } from "../../internal/checks";
import { requireIncreasingGrid } from "./synthesize";

interface Window {
  i0: number;
  i1: number; // exclusive
}

function lowerBound(grid: Float64Array, x: number): number {
  let lo = 0;
  let hi = grid.length;
  while (lo < hi) {
    const mid = (lo + hi) >>> 1;
    if ((grid[mid] as number) < x) lo = mid + 1;
    else hi = mid;
  }
  return lo;
}

function upperBound(grid: Float64Array, x: number): number {
  let lo = 0;
  let hi = grid.length;
  while (lo < hi) {
    const mid = (lo + hi) >>> 1;
    if ((grid[mid] as number) <= x) lo = mid + 1;
    else hi = mid;
  }
  return lo;
}

function prepare(
  wavelengthsM: Float64Array,
  flux: Float64Array,
  continuum: Float64Array,
  loM: number,
  hiM: number,
): Window {
  requireIncreasingGrid("wavelengthsM", wavelengthsM);
  const n = wavelengthsM.length;
  if (flux.length !== n) throw new RangeError(`flux must have the grid length ${n}; got ${flux.length}`);
  if (continuum.length !== n) throw new RangeError(`continuum must have the grid length ${n}; got ${continuum.length}`);
  requireFinite("loM", loM, "m");
  requireFinite("hiM", hiM, "m");
  if (!(hiM > loM)) throw new RangeError(`hiM must be greater than loM (${loM}) m; got ${hiM}`);
  const i0 = lowerBound(wavelengthsM, loM);
  const i1 = upperBound(wavelengthsM, hiM);
  if (i1 - i0 < 2) {
    throw new RangeError(`the window [loM, hiM] = [${loM}, ${hiM}] m must contain at least 2 grid points; got ${i1 - i0}`);
  }
  for (let i = i0; i < i1; i++) {
    const f = flux[i] as number;
    const c = continuum[i] as number;
    if (!Number.isFinite(f)) throw new RangeError(`flux must be finite in the window; element ${i} is ${f}`);
    if (!(c > 0 && c !== Infinity)) {
      throw new RangeError(`continuum must be finite and > 0 in the window; element ${i} is ${c}`);
    }
  }
  return { i0, i1 };
}

/**
 * Equivalent width W = ∫ (1 − F/F_c) dλ over the grid points in [loM, hiM]
 * (trapezoidal rule), m. Positive for absorption, negative for emission.
 *
 * @param wavelengthsM grid, m (strictly increasing)
 * @param flux observed or synthetic flux F on the grid
 * @param continuum continuum F_c on the grid (same unit as F, > 0 in the window)
 * @param loM window start, m
 * @param hiM window end, m
 * @example
 * ```ts
 * equivalentWidthSI(grid, flux, continuum, 656.2e-9, 656.4e-9);
 * ```
 */
export function equivalentWidthSI(
  wavelengthsM: Float64Array,
  flux: Float64Array,
  continuum: Float64Array,
  loM: number,
  hiM: number,
): number {
  const { i0, i1 } = prepare(wavelengthsM, flux, continuum, loM, hiM);
  return equivalentWidthUnchecked(wavelengthsM, flux, continuum, i0, i1);
}

/**
 * {@link equivalentWidthSI} over the grid points i0 … i1 − 1, without the
 * checks (grid increasing, at least two points, flux finite and continuum
 * finite and > 0 there). @internal
 */
export function equivalentWidthUnchecked(wavelengthsM: Float64Array, flux: Float64Array, continuum: Float64Array, i0: number, i1: number): number {
  let s = 0;
  let prev = 1 - (flux[i0] as number) / (continuum[i0] as number);
  for (let i = i0 + 1; i < i1; i++) {
    const d = 1 - (flux[i] as number) / (continuum[i] as number);
    s += 0.5 * (d + prev) * ((wavelengthsM[i] as number) - (wavelengthsM[i - 1] as number));
    prev = d;
  }
  return s;
}

/**
 * Flux-deficit-weighted centroid λ̄ = ∫ λ (1 − F/F_c) dλ / ∫ (1 − F/F_c) dλ
 * over the window (trapezoidal rule), m. Throws a RangeError if the
 * deficit integrates to zero.
 *
 * @example
 * ```ts
 * lineCentroidSI(grid, flux, continuum, 656.2e-9, 656.4e-9);
 * ```
 */
export function lineCentroidSI(
  wavelengthsM: Float64Array,
  flux: Float64Array,
  continuum: Float64Array,
  loM: number,
  hiM: number,
): number {
  const { i0, i1 } = prepare(wavelengthsM, flux, continuum, loM, hiM);
  const c = lineCentroidUnchecked(wavelengthsM, flux, continuum, i0, i1);
  if (c !== c) throw new RangeError(`flux has no deficit against continuum in [${loM}, ${hiM}] m: the centroid is undefined`);
  return c;
}

/**
 * {@link lineCentroidSI} over the grid points i0 … i1 − 1, without the
 * checks ({@link equivalentWidthUnchecked}); NaN when the deficit integrates
 * to zero. @internal
 */
export function lineCentroidUnchecked(wavelengthsM: Float64Array, flux: Float64Array, continuum: Float64Array, i0: number, i1: number): number {
  // Offsets from the window's first point keep λ·d sums well conditioned.
  const ref = wavelengthsM[i0] as number;
  let s0 = 0;
  let s1 = 0;
  let prevD = 1 - (flux[i0] as number) / (continuum[i0] as number);
  let prevX = 0;
  for (let i = i0 + 1; i < i1; i++) {
    const d = 1 - (flux[i] as number) / (continuum[i] as number);
    const x = (wavelengthsM[i] as number) - ref;
    const h = x - prevX;
    s0 += 0.5 * (d + prevD) * h;
    s1 += 0.5 * (x * d + prevX * prevD) * h;
    prevD = d;
    prevX = x;
  }
  return s0 === 0 ? NaN : ref + s1 / s0;
}

/**
 * Line depth d = 1 − min(F/F_c) over the window (grid points only; no
 * sub-grid interpolation of the minimum). Dimensionless.
 *
 * @example
 * ```ts
 * lineDepthSI(grid, flux, continuum, 656.2e-9, 656.4e-9); // e.g. 0.63
 * ```
 */
export function lineDepthSI(
  wavelengthsM: Float64Array,
  flux: Float64Array,
  continuum: Float64Array,
  loM: number,
  hiM: number,
): number {
  const { i0, i1 } = prepare(wavelengthsM, flux, continuum, loM, hiM);
  return lineDepthUnchecked(flux, continuum, i0, i1);
}

/** {@link lineDepthSI} over the grid points i0 … i1 − 1, without the checks. @internal */
export function lineDepthUnchecked(flux: Float64Array, continuum: Float64Array, i0: number, i1: number): number {
  let m = Infinity;
  for (let i = i0; i < i1; i++) m = Math.min(m, (flux[i] as number) / (continuum[i] as number));
  return 1 - m;
}

/** Result of {@link fitPolynomialContinuumSI}. */
export interface ContinuumFitSI {
  /** Coefficients c_k of Σ c_k x^k with x = (λ − centreM)/halfSpanM. */
  readonly coefficients: Float64Array;
  /** Centre of the scaled variable, m. */
  readonly centreM: number;
  /** Half-span of the scaled variable, m. */
  readonly halfSpanM: number;
  /** Root-mean-square residual of the fitted points (unit of the flux). */
  readonly rms: number;
  /** Number of grid points used. */
  readonly count: number;
}

/**
 * Least-squares polynomial continuum of degree 0–3 fitted to the grid points
 * inside line-free regions, evaluated on the whole grid into `out`. The
 * abscissa is scaled to x = (λ − λ_mid)/half-span of the grid, and the normal
 * equations (at most 4×4, well conditioned after scaling) are solved by
 * Gaussian elimination with partial pivoting.
 *
 * @param wavelengthsM grid, m (strictly increasing)
 * @param flux flux on the grid (finite in the regions)
 * @param regionsM flattened [lo₀, hi₀, lo₁, hi₁, …] line-free windows, m
 * @param degree polynomial degree, integer 0–3
 * @param out continuum on the whole grid (output)
 * @example
 * ```ts
 * fitPolynomialContinuumSI(grid, flux, [650e-9, 655e-9, 658e-9, 662e-9], 1, cont);
 * ```
 */
export function fitPolynomialContinuumSI(
  wavelengthsM: Float64Array,
  flux: Float64Array,
  regionsM: ArrayLike<number>,
  degree: number,
  out: Float64Array,
): ContinuumFitSI {
  requireIncreasingGrid("wavelengthsM", wavelengthsM);
  const n = wavelengthsM.length;
  if (flux.length !== n) throw new RangeError(`flux must have the grid length ${n}; got ${flux.length}`);
  if (out.length < n) throw new RangeError(`out must have length >= ${n} (the grid length); got ${out.length}`);
  if (!Number.isInteger(degree) || degree < 0 || degree > 3) {
    throw new RangeError(`degree must be an integer in [0, 3]; got ${degree}`);
  }
  if (regionsM.length === 0 || regionsM.length % 2 !== 0) {
    throw new RangeError(`regionsM must hold [lo, hi] pairs (even, non-zero length); got length ${regionsM.length}`);
  }
  const m = degree + 1;
  const centreM = 0.5 * ((wavelengthsM[0] as number) + (wavelengthsM[n - 1] as number));
  const halfSpanM = Math.max(0.5 * ((wavelengthsM[n - 1] as number) - (wavelengthsM[0] as number)), Number.MIN_VALUE);
  const ata = new Float64Array(m * m);
  const atb = new Float64Array(m);
  const used = new Uint8Array(n);
  let count = 0;
  for (let r = 0; r < regionsM.length; r += 2) {
    const lo = requireFinite(`regionsM[${r}]`, regionsM[r] as number, "m");
    const hi = requireFinite(`regionsM[${r + 1}]`, regionsM[r + 1] as number, "m");
    if (!(hi > lo)) throw new RangeError(`regionsM[${r + 1}] must be greater than regionsM[${r}] (${lo}) m; got ${hi}`);
    for (let i = lowerBound(wavelengthsM, lo); i < upperBound(wavelengthsM, hi); i++) {
      if (used[i]) continue;
      used[i] = 1;
      const f = flux[i] as number;
      if (!Number.isFinite(f)) throw new RangeError(`flux must be finite in the continuum regions; element ${i} is ${f}`);
      const x = ((wavelengthsM[i] as number) - centreM) / halfSpanM;
      let pj = 1;
      for (let j = 0; j < m; j++) {
        let pk = 1;
        for (let k = 0; k < m; k++) {
          ata[j * m + k] = (ata[j * m + k] as number) + pj * pk;
          pk *= x;
        }
        atb[j] = (atb[j] as number) + pj * f;
        pj *= x;
      }
      count++;
    }
  }
  if (count < m) {
    throw new RangeError(`regionsM must contain at least degree + 1 = ${m} grid points; got ${count}`);
  }
  // Gaussian elimination with partial pivoting on [ata | atb].
  for (let c = 0; c < m; c++) {
    let p = c;
    for (let r = c + 1; r < m; r++) if (Math.abs(ata[r * m + c] as number) > Math.abs(ata[p * m + c] as number)) p = r;
    if (p !== c) {
      for (let k = 0; k < m; k++) {
        const t = ata[c * m + k] as number;
        ata[c * m + k] = ata[p * m + k] as number;
        ata[p * m + k] = t;
      }
      const t = atb[c] as number;
      atb[c] = atb[p] as number;
      atb[p] = t;
    }
    const piv = ata[c * m + c] as number;
    if (piv === 0) throw new RangeError(`regionsM must span at least degree + 1 = ${m} distinct wavelengths`);
    for (let r = c + 1; r < m; r++) {
      const f = (ata[r * m + c] as number) / piv;
      for (let k = c; k < m; k++) ata[r * m + k] = (ata[r * m + k] as number) - f * (ata[c * m + k] as number);
      atb[r] = (atb[r] as number) - f * (atb[c] as number);
    }
  }
  const coef = new Float64Array(m);
  for (let r = m - 1; r >= 0; r--) {
    let s = atb[r] as number;
    for (let k = r + 1; k < m; k++) s -= (ata[r * m + k] as number) * (coef[k] as number);
    coef[r] = s / (ata[r * m + r] as number);
  }
  const evalAt = (lam: number): number => {
    const x = (lam - centreM) / halfSpanM;
    let v = 0;
    for (let k = m - 1; k >= 0; k--) v = v * x + (coef[k] as number);
    return v;
  };
  let ss = 0;
  for (let i = 0; i < n; i++) {
    const v = evalAt(wavelengthsM[i] as number);
    out[i] = v;
    if (used[i]) ss += ((flux[i] as number) - v) ** 2;
  }
  return { coefficients: coef, centreM, halfSpanM, rms: Math.sqrt(ss / count), count };
}
