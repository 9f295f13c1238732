/**
 * Helpers for typed wrappers around plain-number SI kernels: move a number
 * between a system's coherent unit and SI, and validate typed input with a
 * message in the caller's own units.
 *
 * @internal
 */
import type { Dimension } from "../quantity/dimension";
import type { SystemName } from "../quantity/quantity";
import type { UnitSystem } from "../quantity/system";
import { times10 } from "../quantity/unit";
import { requireFinite, requirePositive } from "./checks";

/** A value in `sys`'s coherent unit of `d`, as SI. */
export function toSI(sys: UnitSystem<SystemName>, value: number, d: Dimension): number {
  return times10(value, sys.exp10(d));
}

/** An SI value of dimension `d`, in `sys`'s coherent unit. */
export function fromSI(sys: UnitSystem<SystemName>, valueSI: number, d: Dimension): number {
  return times10(valueSI, -sys.exp10(d));
}

/** A typed array (copied when the system is not SI) in SI. */
export function arrayToSI(sys: UnitSystem<SystemName>, values: Float64Array, d: Dimension): Float64Array {
  const n = sys.exp10(d);
  if (n === 0) return values;
  const out = new Float64Array(values.length);
  for (let i = 0; i < values.length; i++) out[i] = times10(values[i] as number, n);
  return out;
}

/** Throw a RangeError unless finite and > 0, naming the caller's unit. */
export function positive(sys: UnitSystem<SystemName>, name: string, value: number, d: Dimension): number {
  // the unit text is built only when the check fails (valid input stays cheap)
  return value > 0 && value !== Infinity ? value : requirePositive(name, value, sys.coherentUnit(d));
}

/** Throw a RangeError unless finite, naming the caller's unit. */
export function finite(sys: UnitSystem<SystemName>, name: string, value: number, d: Dimension): number {
  return Number.isFinite(value) ? value : requireFinite(name, value, sys.coherentUnit(d));
}
