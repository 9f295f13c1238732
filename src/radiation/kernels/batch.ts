/**
 * Batch convention of the radiation kernels: a batch function never throws
 * part-way through an array. Each invalid row (non-finite or non-positive
 * input, or a true result outside the double range) is written as NaN and its
 * index is listed in `invalid` (ascending). Invalid *scalar* arguments that
 * apply to every row (e.g. the one temperature of a wavelength batch) and a
 * wrong-length `out` array are caller errors and throw a RangeError before any
 * row is written.
 */
export interface RadiationBatchResult {
  /** The output array (the caller's `out` when given). */
  readonly values: Float64Array;
  /** Indices of rows written as NaN, ascending; empty when every row is valid. */
  readonly invalid: number[];
}

/** Allocate or check the output array of a batch call. @internal */
export function batchOut(n: number, out: Float64Array | undefined): Float64Array {
  if (out === undefined) return new Float64Array(n);
  if (out.length !== n) {
    throw new RangeError(`out must have the same length as the input (${n}); got ${out.length}`);
  }
  return out;
}
