/**
 * Batch convention of the spectra kernels, the library's one batch contract
 * (`BatchResult` in src/law/batch.ts): a function over a Float64Array never
 * throws because of one bad row. It writes NaN in the output for every
 * invalid row and returns `{ values, invalid, reasons }`: `values` is the
 * output array, `invalid` the indices of the NaN rows in increasing order
 * (empty when all rows were valid) and `reasons[k]` the message the scalar
 * kernel would throw for row `invalid[k]` (SI units). Structural problems
 * (output shorter than input, invalid scalar parameters shared by all rows)
 * are checked before anything is written and throw a RangeError.
 *
 * @packageDocumentation
 */

/** Throw unless `output` can hold `input.length` values. @internal */
export function requireOutputLength(input: ArrayLike<number>, output: ArrayLike<number>): void {
  if (output.length < input.length) {
    throw new RangeError(`output must have length >= ${input.length} (the input length); got ${output.length}`);
  }
}
