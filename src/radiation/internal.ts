/**
 * Shared steps of the typed radiation wrappers: validate an argument in the
 * caller's unit and move it to SI for the kernel; move a kernel's SI result
 * into the caller's system without letting it overflow there; and restate a
 * kernel's range error in the caller's units.
 *
 * @internal
 */
import type { Dimension } from "../quantity/dimension";
import type { SystemName } from "../quantity/quantity";
import { SI, type UnitSystem } from "../quantity/system";
import { requirePositive } from "../internal/checks";
import { arrayToSI, fromSI, positive, toSI } from "../internal/typed";
import { kinds } from "../quantity/aliases";
import type { ResponseCurveSI } from "./kernels/band-response";
import type { ResponseCurve } from "./response";

/** One argument as the caller gave it: name, value, dimension (for its unit). */
export type Arg = readonly [name: string, value: number, dimension: Dimension];

/**
 * Check that `value` is finite and > 0 in the caller's unit and return it in
 * SI. A value that is valid in the caller's system but leaves the double
 * range on conversion (e.g. 1e-320 cm) throws a RangeError in the caller's
 * unit rather than reaching the kernel as 0 or Infinity.
 */
export function positiveSI(sys: UnitSystem<SystemName>, name: string, value: number, d: Dimension): number {
  // `positive` builds the unit text for its message on every call; test first, so valid input skips that.
  if (!(value > 0) || value === Infinity) positive(sys, name, value, d);
  const v = toSI(sys, value, d);
  if (!(v > 0) || v === Infinity) {
    throw new RangeError(
      `${name} = ${value} ${sys.coherentUnit(d)} is outside the double range once converted to SI (${v} ${SI.coherentUnit(d)})`,
    );
  }
  return v;
}

/** `name=value unit, …` in the caller's units. */
export function describe(sys: UnitSystem<SystemName>, args: readonly Arg[]): string {
  return args.map(([n, v, d]) => `${n}=${v} ${sys.coherentUnit(d)}`.trimEnd()).join(", ");
}

/**
 * The error to throw when a kernel rejected arguments the wrapper had already
 * validated (so the kernel's complaint is about the double range of a result):
 * in SI the kernel's own error; in CGS a RangeError naming the arguments in
 * the caller's units, with the kernel's error as its `cause`.
 */
export function kernelError(sys: UnitSystem<SystemName>, error: unknown, what: string, args: readonly Arg[]): unknown {
  if (sys.name === "SI" || !(error instanceof RangeError)) return error;
  return new RangeError(`${what} is outside the double range for ${describe(sys, args)}`, { cause: error });
}

/**
 * Validate two arguments (finite, > 0, in the caller's units), run a
 * two-argument SI kernel on them, and return its result in the caller's
 * system. The argument list for messages is built only on the error paths.
 */
export function eval2(
  sys: UnitSystem<SystemName>,
  kernel: (a: number, b: number) => number,
  what: string,
  out: Dimension,
  aName: string,
  a: number,
  aDim: Dimension,
  bName: string,
  b: number,
  bDim: Dimension,
): number {
  const aSI = positiveSI(sys, aName, a, aDim);
  const bSI = positiveSI(sys, bName, b, bDim);
  let v: number;
  try {
    v = kernel(aSI, bSI);
  } catch (e) {
    throw kernelError(sys, e, what, [[aName, a, aDim], [bName, b, bDim]]);
  }
  const r = fromSI(sys, v, out);
  if (r === Infinity || r === -Infinity) throw overflowIn(sys, what, out, [[aName, a, aDim], [bName, b, bDim]]);
  return r;
}

/** {@link eval2} for a one-argument kernel. */
export function eval1(
  sys: UnitSystem<SystemName>,
  kernel: (a: number) => number,
  what: string,
  out: Dimension,
  aName: string,
  a: number,
  aDim: Dimension,
): number {
  const aSI = positiveSI(sys, aName, a, aDim);
  let v: number;
  try {
    v = kernel(aSI);
  } catch (e) {
    throw kernelError(sys, e, what, [[aName, a, aDim]]);
  }
  const r = fromSI(sys, v, out);
  if (r === Infinity || r === -Infinity) throw overflowIn(sys, what, out, [[aName, a, aDim]]);
  return r;
}

/** A RangeError for a result that overflows in the caller's system. */
export function overflowIn(sys: UnitSystem<SystemName>, what: string, out: Dimension, args: readonly Arg[]): RangeError {
  return new RangeError(`${what} overflows the double range in ${sys.coherentUnit(out)} for ${describe(sys, args)}`);
}

/**
 * Check a typed curve in the caller's units (naming `name.wavelengths[i]`,
 * `name.response[i]`) and return it in SI for the kernels.
 */
export function responseCurveSI(sys: UnitSystem<SystemName>, curve: ResponseCurve<SystemName>, name: string): ResponseCurveSI {
  const l = curve.wavelengths as Float64Array;
  const r = curve.response;
  const n = l.length;
  const unit = sys.coherentUnit(kinds.length.dimension);
  if (n < 2) throw new RangeError(`${name}.wavelengths must have at least 2 points; got ${n}`);
  if (r.length !== n) throw new RangeError(`${name}.response must have the same length as ${name}.wavelengths (${n}); got ${r.length}`);
  let any = false;
  for (let i = 0; i < n; i++) {
    const li = l[i] as number;
    requirePositive(`${name}.wavelengths[${i}]`, li, unit);
    if (i > 0 && !(li > (l[i - 1] as number))) {
      throw new RangeError(
        `${name}.wavelengths must be strictly increasing; got ${name}.wavelengths[${i}] = ${li} ${unit} after ${l[i - 1]} ${unit}`,
      );
    }
    const ri = r[i] as number;
    if (!(ri >= 0) || ri === Infinity) {
      throw new RangeError(`${name}.response[${i}] must be a finite number >= 0 (dimensionless); got ${ri}`);
    }
    if (ri > 0) any = true;
  }
  if (!any) throw new RangeError(`${name}.response must be positive somewhere (it is 0 at every wavelength)`);
  const lSI = arrayToSI(sys, l, kinds.length.dimension);
  if (lSI !== l) {
    // A CGS grid valid in cm can still collapse or underflow on the way to metres (values near 1e-308 cm).
    for (let i = 0; i < n; i++) {
      const v = lSI[i] as number;
      if (!(v > 0) || (i > 0 && !(v > (lSI[i - 1] as number)))) {
        throw new RangeError(
          `${name}.wavelengths[${i}] = ${l[i]} ${unit} is outside the double range, or not distinct from its neighbour, once converted to m`,
        );
      }
    }
  }
  return { wavelengthsM: lSI, response: r };
}
