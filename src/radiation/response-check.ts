/**
 * Checks of a typed response curve, in the caller's units, and its move to SI
 * for the kernels (shared by the band-mean radiance and the band colour
 * temperature).
 *
 * @internal
 */
import { show } from "../internal/checks";
import { lawInput } from "../law/input";
import { kinds } from "../quantity/aliases";
import type { SystemName } from "../quantity/quantity";
import type { UnitSystem } from "../quantity/system";
import type { ResponseCurveSI } from "./kernels/band-response";
import type { ResponseCurve } from "./response-curve";

/** One grid wavelength: finite, > 0 (the name is per index, given on the error path). */
const gridPoint = lawInput("wavelength", kinds.length);
/** One response value: finite, ≥ 0. */
const responsePoint = lawInput("response", kinds.dimensionless, { check: "nonNegative" });

/** The standard RangeError for grid point `i`, naming `name.wavelengths[i]` and the caller's unit. */
function badPoint(sys: UnitSystem<SystemName>, name: string, i: number, value: number): RangeError {
  return new RangeError(lawInput(`${name}.wavelengths[${i}]`, kinds.length).reason(sys, value));
}

/**
 * Check a typed curve in the caller's units and return it in SI for the
 * kernels. Every message names the field and index (`band2.wavelengths[3]`,
 * `curve.response[0]`) and the caller's unit: at least 2 points; wavelengths
 * finite, > 0 and strictly increasing (also once converted to m); response of
 * the same length, finite, ≥ 0 and not 0 everywhere.
 *
 * @internal
 */
export function responseCurveSI(sys: UnitSystem<SystemName>, curve: ResponseCurve<SystemName>, name: string): ResponseCurveSI {
  const l = curve.wavelengths as Float64Array;
  const r = curve.response;
  const n = l.length;
  if (n < 2) throw new RangeError(`${name}.wavelengths must have at least 2 points; got ${n}`);
  if (r.length !== n) throw new RangeError(`${name}.response must have the same length as ${name}.wavelengths (${n}); got ${r.length}`);
  let any = false;
  for (let i = 0; i < n; i++) {
    const li = l[i] as number;
    if (!gridPoint.passes(li)) throw badPoint(sys, name, i, li);
    if (i > 0 && !(li > (l[i - 1] as number))) {
      const unit = sys.coherentUnit(kinds.length.dimension);
      throw new RangeError(
        `${name}.wavelengths must be strictly increasing; got ${name}.wavelengths[${i}] = ${show(li)} ${unit} after ${show(l[i - 1] as number)} ${unit}`,
      );
    }
    const ri = r[i] as number;
    if (!responsePoint.passes(ri)) {
      throw new RangeError(lawInput(`${name}.response[${i}]`, kinds.dimensionless, { check: "nonNegative" }).reason(sys, ri));
    }
    if (ri > 0) any = true;
  }
  if (!any) throw new RangeError(`${name}.response must be positive somewhere (it is 0 at every wavelength)`);
  if (sys.name === "SI") return { wavelengthsM: l, response: r };
  // A grid valid in cm can still underflow, or collapse onto one double, on the way to metres (values near 1e-308 cm).
  const lSI = new Float64Array(n);
  for (let i = 0; i < n; i++) {
    const li = l[i] as number;
    const v = gridPoint.rowToSI(sys, li);
    if (v !== v) throw badPoint(sys, name, i, li);
    if (i > 0 && !(v > (lSI[i - 1] as number))) {
      const unit = sys.coherentUnit(kinds.length.dimension);
      throw new RangeError(
        `${name}.wavelengths[${i}] = ${show(li)} ${unit} is not distinct from ${name}.wavelengths[${i - 1}] once converted to SI (both ${show(v)} m)`,
      );
    }
    lSI[i] = v;
  }
  return { wavelengthsM: lSI, response: r };
}
