/**
 * Helpers shared by the typed photometry wrappers: checks of magnitudes
 * (plain numbers), conversion of kernel results into the caller's system with
 * a range check, and re-phrasing of kernel range errors in the caller's unit.
 *
 * @internal
 */
import { requireFinite } from "../internal/checks";
import { fromSI } from "../internal/typed";
import type { Dimension } from "../quantity/dimension";
import type { Pure, SystemName } from "../quantity/quantity";
import type { UnitSystem } from "../quantity/system";

/** Throw a RangeError unless a magnitude (a plain number, mag) is finite. */
export function finiteMag(name: string, value: Pure): number {
  return requireFinite(name, value, "mag");
}

/**
 * Run a kernel on inputs already validated in the caller's units. A kernel
 * `RangeError` can then only mean that the result (or an SI intermediate)
 * is out of the double range; it is re-thrown naming the result in the
 * caller's unit (the kernel's SI message is kept as the `cause`).
 */
export function kernel<T>(sys: UnitSystem<SystemName>, what: string, d: Dimension, run: () => T): T {
  try {
    return run();
  } catch (e) {
    if (e instanceof RangeError) {
      throw new RangeError(
        `${what} is not representable as a finite number > 0 ${sys.coherentUnit(d)}; inputs are out of the double-precision range`,
        { cause: e },
      );
    }
    throw e;
  }
}

/** An SI result in the caller's system, checked to be finite and > 0 there (CGS scaling may overflow or underflow). */
export function positiveIn(sys: UnitSystem<SystemName>, what: string, valueSI: number, d: Dimension): number {
  const v = fromSI(sys, valueSI, d);
  if (!(v > 0) || v === Infinity) {
    throw new RangeError(`${what} is not representable as a finite number > 0 ${sys.coherentUnit(d)} (got ${String(v)}); inputs are out of the double-precision range`);
  }
  return v;
}
