/**
 * Helpers shared by the photometry kernels.
 *
 * Batch convention for the whole photometry area: a batch kernel never
 * throws mid-array. It writes NaN into every output of an invalid row, writes
 * a reason code (one of {@link PhotometryBatchReason}) into a caller-supplied
 * `Uint8Array`, and returns the number of invalid rows. Nothing is dropped.
 *
 * @internal
 */

/** Per-row reason codes written by photometry batch kernels. */
export const PhotometryBatchReason = {
  /** Row is valid; outputs are finite. */
  OK: 0,
  /** An input value or uncertainty is NaN or ±Infinity. */
  NON_FINITE: 1,
  /** An input that must be > 0 (distance, parallax, flux, temperature, …) is ≤ 0. */
  NON_POSITIVE: 2,
  /** An input uncertainty is negative. */
  NEGATIVE_UNCERTAINTY: 3,
  /** The inputs are valid but a result is not representable as a finite positive double. */
  RESULT_OUT_OF_RANGE: 4,
} as const;

/** Union of the reason codes in {@link PhotometryBatchReason}. */
export type PhotometryBatchReasonCode = (typeof PhotometryBatchReason)[keyof typeof PhotometryBatchReason];

/**
 * Throw a `RangeError` unless a computed result is finite and > 0. Used where
 * valid but astronomically extreme inputs would overflow or underflow a double,
 * so that a kernel never silently returns Infinity or 0 for a positive quantity.
 */
export function requirePositiveResult(what: string, value: number, unit: string): number {
  if (!(value > 0) || value === Infinity) {
    throw new RangeError(`${what} is not representable as a finite number > 0 ${unit} (got ${String(value)}); inputs are out of the double-precision range`);
  }
  return value;
}

/** Throw a `RangeError` unless a computed result is finite (any sign). */
export function requireFiniteResult(what: string, value: number, unit: string): number {
  if (!Number.isFinite(value)) {
    throw new RangeError(`${what} is not representable as a finite number ${unit} (got ${String(value)}); inputs are out of the double-precision range`);
  }
  return value;
}

/** 4π, computed once. */
export const FOUR_PI = 4 * Math.PI;


export { log10Ratio, scaledQuotient, scaledSqrtQuotient, timesPow10 } from "../../radiation/kernels/scaled";
