/**
 * Input validation shared by every law. Each check throws a `RangeError`
 * whose message names the parameter, the offending value and the unit the
 * caller was expected to use, e.g.
 * `temperature must be a finite number > 0 K; got -3`.
 *
 * @internal
 */

/** Format a value for an error message without losing sign or NaN. */
export function show(value: number): string {
  return Object.is(value, -0) ? "-0" : String(value);
}

/** Throw unless `value` is finite and strictly positive. Returns the value. */
export function requirePositive(name: string, value: number, unit: string): number {
  if (!(value > 0) || value === Infinity) {
    throw new RangeError(`${name} must be a finite number > 0 ${unit}; got ${show(value)}`);
  }
  return value;
}

/** Throw unless `value` is finite and ≥ 0. Returns the value. */
export function requireNonNegative(name: string, value: number, unit: string): number {
  if (!(value >= 0) || value === Infinity) {
    throw new RangeError(`${name} must be a finite number >= 0 ${unit}; got ${show(value)}`);
  }
  return value;
}

/** Throw unless `value` is finite (any sign). Returns the value. */
export function requireFinite(name: string, value: number, unit: string): number {
  if (!Number.isFinite(value)) {
    throw new RangeError(`${name} must be a finite number ${unit}; got ${show(value)}`);
  }
  return value;
}

/** Throw unless `lo <= value <= hi` (both finite). Returns the value. */
export function requireInRange(name: string, value: number, lo: number, hi: number, unit: string): number {
  if (!(value >= lo && value <= hi)) {
    throw new RangeError(`${name} must be in [${lo}, ${hi}] ${unit}; got ${show(value)}`);
  }
  return value;
}

/** True when `value` is finite and strictly positive (for batch paths, which never throw). */
export function isPositiveFinite(value: number): boolean {
  return value > 0 && value !== Infinity;
}
