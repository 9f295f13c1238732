/**
 * Ready-made conversions by a fixed scale (internal to the quantity layer).
 *
 * Every unit decides once, when it is defined, how a value in it becomes a
 * value in each system's coherent unit and back, and keeps the answer as
 * functions of exactly two shapes, `v => v * k` and `v => v / k`:
 *
 * - a pure power of ten 10ⁿ with |n| ≤ 22 (nm, Å, cm, erg, Jy, kpc's prefix…)
 *   is an exact double, so the conversion multiplies by 10ⁿ (n ≥ 0) or
 *   divides by 10⁻ⁿ (n < 0): one correctly rounded operation;
 * - any other size (au, pc, eV, deg, powers of ten beyond 10²²) multiplies
 *   by its correctly rounded factor one way and divides by it the other way.
 *
 * Loops call the function (inlined at a call site that sees one unit) and
 * never read a scale, compare it with 1 or branch. The array loops come in
 * the same two shapes, so the choice between a multiply loop and a divide
 * loop is made once per array. For calls that see many units (`SI.of`), the
 * same scale is also kept as two numbers, `mul` and `div`, one of them 1.
 *
 * Nothing here is exported from the package; `UnitSystem.converter`,
 * `reader`, `converterFrom` and friends hand these functions out typed.
 *
 * @internal
 * @module
 */

/** Converts one number by a fixed scale. @internal */
export type ScaleOne = (value: number) => number;

/** Converts `values` by a fixed scale into `out` (of the same length) and returns `out`. @internal */
export type ScaleMany = (values: ArrayLike<number>, out: Float64Array) => Float64Array;

/**
 * A fixed scale between a unit and a system's coherent unit: `to` (value in
 * the unit → value in the coherent unit), `from` (the inverse) and their
 * array loops.
 * @internal
 */
export interface Scaling {
  /** Value in the unit → value in the system's coherent unit. */
  readonly to: ScaleOne;
  /** Value in the system's coherent unit → value in the unit. */
  readonly from: ScaleOne;
  /** `to` over an array. */
  readonly arrayTo: ScaleMany;
  /** `from` over an array. */
  readonly arrayFrom: ScaleMany;
  /**
   * The same scale as two numbers for calls that see many units (`of`,
   * `valueIn`): `to(v)` is bit-for-bit `(v * mul) / div` and `from(v)` is
   * `(v * div) / mul`, one of the two being 1 so the extra operation is
   * exact. (A call site that sees both closure shapes stops being inlined;
   * these two loads never do.)
   */
  readonly mul: number;
  /** See {@link Scaling.mul}. */
  readonly div: number;
}

/**
 * Key of a unit's scaling to SI base units (a symbol, so the property stays
 * out of the public surface and out of `Object.keys`).
 * @internal
 */
export const inSI: unique symbol = Symbol("starlume.scaling.SI");

/** Key of a unit's scaling to CGS base units. @internal */
export const inCGS: unique symbol = Symbol("starlume.scaling.CGS");

// The two scalar shapes and the two loop shapes. Keeping every converter to
// one of these four functions keeps call sites that see many units cheap.
function times(k: number): ScaleOne {
  return (v) => v * k;
}
function over(k: number): ScaleOne {
  return (v) => v / k;
}
function timesAll(k: number): ScaleMany {
  return (values, out) => {
    const n = out.length;
    for (let i = 0; i < n; i++) out[i] = (values[i] as number) * k;
    return out;
  };
}
function overAll(k: number): ScaleMany {
  return (values, out) => {
    const n = out.length;
    for (let i = 0; i < n; i++) out[i] = (values[i] as number) / k;
    return out;
  };
}

function scaling(to: ScaleOne, from: ScaleOne, arrayTo: ScaleMany, arrayFrom: ScaleMany, mul: number, div: number): Scaling {
  return Object.freeze({ to, from, arrayTo, arrayFrom, mul, div });
}

/**
 * Multiply by the correctly rounded factor `f` one way, divide by it the
 * other way (one rounding each, given `f`).
 * @internal
 */
export function factorScaling(f: number): Scaling {
  return scaling(times(f), over(f), timesAll(f), overAll(f), f, 1);
}

function buildPow10(n: number): Scaling {
  // beyond 10^22 the power is not a double: fall back to its correctly
  // rounded value, as a factor (this matches `times10`)
  if (n > 22 || n < -22) return factorScaling(Number(`1e${n}`));
  const p = Number(`1e${Math.abs(n)}`); // exact
  return n >= 0
    ? scaling(times(p), over(p), timesAll(p), overAll(p), p, 1)
    : scaling(over(p), times(p), overAll(p), timesAll(p), 1, p);
}

/**
 * Half-width of the table of powers of ten: every system shift 2·L + 3·M of
 * a dimension with exponents in [−12, 12] lies in [−60, 60].
 */
const SPAN = 60;

/** POW10[n + SPAN] is the scaling by 10ⁿ, for |n| ≤ SPAN. */
const POW10: readonly Scaling[] = Array.from({ length: 2 * SPAN + 1 }, (_, i) => buildPow10(i - SPAN));

/**
 * `SHIFT_MUL_DIV[2(n + SPAN)]` and `[2(n + SPAN) + 1]` are the `mul` and
 * `div` of the scaling by 10ⁿ, |n| ≤ SPAN, side by side in one typed array
 * (raw doubles, no boxes, no type checks): `(v * mul) / div` is `v × 10ⁿ`,
 * correctly rounded for |n| ≤ 22. Used by `from`, which computes n from a
 * dimension with two loads per call.
 * @internal
 */
export const SHIFT_MUL_DIV: Float64Array = Float64Array.from(POW10.flatMap((s) => [s.mul, s.div]));

/** Index of exponent 0 in {@link SHIFT_MUL_DIV} (in pairs). @internal */
export const SHIFT_ZERO = SPAN;

/**
 * The scaling by exactly 10ⁿ: one multiplication or division by an exact
 * double for |n| ≤ 22. Shared across units (nm and the CGS shift of a
 * wavenumber use the same functions).
 * @internal
 */
export function pow10Scaling(n: number): Scaling {
  return POW10[n + SPAN] ?? buildPow10(n);
}

/** `v => v × 10ⁿ` for any integer n (a ready converter from the table for |n| ≤ 60). @internal */
export function shiftBy(n: number): ScaleOne {
  return pow10Scaling(n).to;
}
