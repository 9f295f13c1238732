/**
 * The one batch contract of starlume: a function over typed arrays never
 * throws part-way. Each row that cannot be computed (an input outside its
 * domain, or a true result outside the double range) is written as NaN, its
 * index is listed in `invalid` (ascending) and the reason, the same sentence
 * the scalar form would throw, is at the same position in `reasons`.
 * Arguments shared by every row, and arrays of different lengths, are the
 * caller's errors: they throw a `RangeError` before any row is written.
 *
 * @module
 */

/**
 * Result of a batch: the values (NaN in invalid rows), the indices of the
 * invalid rows and a reason for each.
 *
 * @example
 * ```ts
 * import { SI, planckRadianceWavelengthBatch, units } from "starlume";
 * const r = planckRadianceWavelengthBatch(SI, SI.arrayOf([500, -1], units.nm), SI.of(5772, units.K));
 * r.invalid; // [1]
 * r.reasons; // ["wavelength must be a finite number > 0 m; got -1e-9"]
 * ```
 */
export interface BatchResult<A> {
  /** Output array, NaN in invalid rows. */
  readonly values: A;
  /** Ascending indices of invalid rows; empty when every row is valid. */
  readonly invalid: number[];
  /** `reasons[k]` says why row `invalid[k]` is invalid (the message its scalar form would throw). */
  readonly reasons: string[];
}

/**
 * Collects invalid rows while a batch loop runs (internal): indices come in
 * ascending order, so no sorting is needed.
 *
 * @internal
 */
export class BatchLog {
  /** Invalid row indices. */
  readonly invalid: number[] = [];
  /** Reasons, aligned with `invalid`. */
  readonly reasons: string[] = [];
  /** Record row `i` as invalid. */
  add(i: number, reason: string): void {
    this.invalid.push(i);
    this.reasons.push(reason);
  }
  /** The batch result over `values`. */
  result<A>(values: A): BatchResult<A> {
    return { values, invalid: this.invalid, reasons: this.reasons };
  }
}

/**
 * The common row count of a batch's arguments: every array must have the same
 * length (scalars broadcast). Throws a `RangeError` naming the first argument
 * whose length differs.
 *
 * @internal
 */
export function batchLength(names: readonly string[], args: readonly (number | ArrayLike<number>)[]): number {
  let n = -1;
  let first = "";
  for (let k = 0; k < args.length; k++) {
    const a = args[k];
    if (typeof a === "number") continue;
    const m = (a as ArrayLike<number>).length;
    if (n < 0) {
      n = m;
      first = names[k] as string;
    } else if (m !== n) {
      throw new RangeError(`${names[k]} must have the same length as ${first} (${n}); got ${m}`);
    }
  }
  return n < 0 ? 1 : n;
}
