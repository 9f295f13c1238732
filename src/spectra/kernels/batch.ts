/**
 * Batch convention of the spectra kernels: a function over a Float64Array
 * never throws because of one bad row. It writes NaN in the output for every
 * invalid row and returns the indices of those rows, in increasing order, in
 * `invalid` (empty when all rows were valid). Structural problems (output
 * shorter than input, invalid scalar parameters shared by all rows) are
 * checked before anything is written and throw a RangeError.
 *
 * @packageDocumentation
 */

/** Result of a batch kernel: indices of the rows written as NaN. */
export interface BatchReport {
  /** Indices of invalid input rows (output NaN there), increasing. */
  readonly invalid: number[];
}

/** Throw unless `output` can hold `input.length` values. @internal */
export function requireOutputLength(input: ArrayLike<number>, output: ArrayLike<number>): void {
  if (output.length < input.length) {
    throw new RangeError(`output must have length >= ${input.length} (the input length); got ${output.length}`);
  }
}
