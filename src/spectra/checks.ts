/**
 * Input checks shared by the typed spectra wrappers: messages name the
 * caller's parameter, value and unit (in the caller's system), so the kernels'
 * SI-named messages are only ever a fallback.
 *
 * @internal
 */
import { fromSI } from "../internal/typed";
import type { Dimension } from "../quantity/dimension";
import type { SystemName } from "../quantity/quantity";
import type { UnitSystem } from "../quantity/system";
import { requireNuclearCharge } from "./kernels/hydrogen-like";
import type { Ion, LevelModel, LevelModelOptions } from "./levels";

/** Format a value for an error message without losing sign or NaN. */
export function show(value: number): string {
  return Object.is(value, -0) ? "-0" : String(value);
}

/**
 * Throw a RangeError unless `valueSI` (the SI form of the caller's `value`)
 * lies in [loSI, hiSI]; the message gives the range in the caller's unit.
 */
export function inRangeSI(
  sys: UnitSystem<SystemName>,
  name: string,
  value: number,
  valueSI: number,
  loSI: number,
  hiSI: number,
  d: Dimension,
  note: string,
): void {
  if (!(valueSI >= loSI && valueSI <= hiSI)) {
    const lo = fromSI(sys, loSI, d);
    const hi = fromSI(sys, hiSI, d);
    throw new RangeError(`${name} must be in [${lo}, ${hi}] ${sys.coherentUnit(d)} (${note}); got ${show(value)}`);
  }
}

/** Throw unless every element of `grid` is finite and the elements strictly increase (caller's unit). */
export function increasingGrid(sys: UnitSystem<SystemName>, name: string, grid: Float64Array, d: Dimension): void {
  for (let i = 0; i < grid.length; i++) {
    const v = grid[i] as number;
    if (!Number.isFinite(v) || (i > 0 && !(v > (grid[i - 1] as number)))) {
      throw new RangeError(
        `${name} must be finite and strictly increasing (${sys.coherentUnit(d)}); element ${i} is ${show(v)}`,
      );
    }
  }
}

/** Throw unless the ion's Z and nuclear mass are valid (for ions built by hand rather than with `ion`). */
export function checkedIon(ionValue: Ion): Ion {
  requireNuclearCharge(ionValue.z);
  if (!(ionValue.nuclearMassKg > 0)) {
    throw new RangeError(
      `ion.nuclearMassKg must be a number > 0 kg (Infinity for the infinite-mass limit); got ${show(ionValue.nuclearMassKg)}`,
    );
  }
  return ionValue;
}

/** The level model named by the options (default `"bohr"`); RangeError for an unknown name. */
export function modelOf(options: LevelModelOptions | undefined): LevelModel {
  const m = options?.model ?? "bohr";
  if (m !== "bohr" && m !== "dirac-centroid") {
    throw new RangeError(`options.model must be "bohr" or "dirac-centroid"; got ${JSON.stringify(m)}`);
  }
  return m;
}
