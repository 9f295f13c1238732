/**
 * Doppler shifts, typed: radial velocity (`Velocity<S>`: m s⁻¹ or cm s⁻¹,
 * positive = receding) ↔ redshift z (`Dimensionless`), and shifted lines.
 *
 * Relativistic longitudinal Doppler effect (default), β = v/c:
 *   1 + z = √((1 + β)/(1 − β)),  z = expm1(atanh β) (no cancellation),
 *   β = z(2 + z)/(2 + z(2 + z)).
 * Classical (first order): z = v/c, v = cz — accurate to O(β²)
 * (β²/2 = 5 × 10⁻⁸ at 100 km s⁻¹). Special relativity as in G. B. Rybicki &
 * A. P. Lightman, "Radiative Processes in Astrophysics" (1979), §4.8;
 * transverse motion and gravitational redshift are not included.
 *
 * Media: a shifted wavelength keeps its medium brand (an air wavelength
 * stays an air wavelength). The shift λ_obs = (1 + z) λ_rest is exact for
 * vacuum wavelengths; applied to air wavelengths it neglects the dispersion
 * of air between λ_rest and λ_obs: the exact air result is
 * (1 + z) λ_air · n(λ_vac)/n((1 + z) λ_vac), so the relative error is
 * ≈ |z| λ |dn/dλ|. Measured over the standard-air range for |z| ≤ 10⁻²
 * (doppler.test.ts): ≤ 4.4 × 10⁻⁵ |z| for λ ≥ 300 nm (4.3 × 10⁻⁸, i.e.
 * 13 m s⁻¹, at |z| = 10⁻³), ≤ 1.4 × 10⁻⁵ |z| for λ ≥ 500 nm, ≤ 1.5 × 10⁻⁴ |z|
 * down to 200 nm; 5.1 × 10⁻⁶ at z = 0.1 and 300 nm. For large redshifts of
 * air wavelengths, or near 200 nm, convert to vacuum first.
 *
 * Velocities must satisfy |v| < c; redshifts must be finite and > −1;
 * wavelengths finite and > 0 (RangeError in the caller's unit).
 *
 * @module
 */
import { C } from "../constants/values";
import { requireFinite } from "../internal/checks";
import { fromSI, positive, toSI } from "../internal/typed";
import { kinds } from "../quantity/aliases";
import type { Dimensionless, Length, LengthArray, Velocity } from "../quantity/aliases";
import type { Pure, SystemName } from "../quantity/quantity";
import type { UnitSystem } from "../quantity/system";
import type { BatchResult } from "../law/batch";
import { show } from "./checks";
import {
  classicalDopplerWavelengthSI,
  classicalVelocityFromWavelengthsSI,
  dopplerShiftWavelengthsSI,
  observedWavelengthFromRedshiftSI,
  radialVelocityFromWavelengthsSI,
  redshiftFromVelocitySI,
  redshiftFromWavelengthsSI,
  relativisticDopplerWavelengthSI,
  velocityFromRedshiftSI,
} from "./kernels/doppler";
import type { SameMediumAs } from "./medium";

const L = kinds.length.dimension;
const V = kinds.velocity.dimension;

/** `"relativistic"` (default; longitudinal special-relativistic Doppler) or `"classical"` (first order, z = v/c). */
export type DopplerModel = "relativistic" | "classical";

function modelOf(model: DopplerModel): DopplerModel {
  if (model !== "relativistic" && model !== "classical") {
    throw new RangeError(`model must be "relativistic" or "classical"; got ${JSON.stringify(model)}`);
  }
  return model;
}

/** |v| < c in the caller's unit; returns v in m s⁻¹. */
function subluminalSI(sys: UnitSystem<SystemName>, name: string, v: number): number {
  const si = toSI(sys, v, V);
  if (!(Math.abs(si) < C)) {
    throw new RangeError(
      `${name} must be a finite number with |${name}| < c = ${fromSI(sys, C, V)} ${sys.coherentUnit(V)}; got ${show(v)}`,
    );
  }
  return si;
}

function redshiftChecked(z: number): number {
  requireFinite("redshift", z, "(dimensionless)");
  if (!(z > -1)) throw new RangeError(`redshift must be a finite number > -1 (dimensionless); got ${show(z)}`);
  return z;
}

/**
 * Redshift of a source with radial velocity v: z = √((1+β)/(1−β)) − 1
 * (relativistic) or z = v/c (classical).
 *
 * @param sys - `SI` or `CGS` (the system of the velocity)
 * @param radialVelocity - v, positive when receding, |v| < c
 * @param model - `"relativistic"` (default) or `"classical"`
 * @throws RangeError when |v| ≥ c or v is not finite
 * @example
 * ```ts
 * import { SI, redshiftFromVelocity, units } from "starlume";
 * redshiftFromVelocity(SI, SI.of(0.6 * 299792.458, units.km_per_s)); // 1
 * ```
 */
export function redshiftFromVelocity<S extends SystemName>(
  sys: UnitSystem<S>,
  radialVelocity: Velocity<NoInfer<S>>,
  model: DopplerModel = "relativistic",
): Dimensionless {
  const v = subluminalSI(sys, "radialVelocity", radialVelocity);
  return (modelOf(model) === "relativistic" ? redshiftFromVelocitySI(v) : v / C) as Dimensionless;
}

/**
 * Radial velocity of a source with redshift z: v = c z(2+z)/(2+z(2+z))
 * (relativistic) or v = cz (classical; may exceed c for z > 1, as the
 * conventional "cz" does).
 *
 * @param sys - `SI` (m s⁻¹) or `CGS` (cm s⁻¹)
 * @param redshift - z, finite and > −1 (a plain number or `Dimensionless`)
 * @param model - `"relativistic"` (default) or `"classical"`
 * @example
 * ```ts
 * import { CGS, units, velocityFromRedshift } from "starlume";
 * CGS.valueIn(velocityFromRedshift(CGS, 0.01), units.km_per_s); // ≈ 2982.9
 * ```
 */
export function velocityFromRedshift<S extends SystemName>(
  sys: UnitSystem<S>,
  redshift: Pure,
  model: DopplerModel = "relativistic",
): Velocity<S> {
  const z = redshiftChecked(redshift);
  const v = modelOf(model) === "relativistic" ? velocityFromRedshiftSI(z) : C * z;
  return fromSI(sys, v, V) as Velocity<S>;
}

/**
 * The wavelength at which a line of rest wavelength λ is observed from a
 * source with radial velocity v: λ √((1+β)/(1−β)) (relativistic) or
 * λ (1 + β) (classical). The result has the type of the input, medium brand
 * included (module header for the air approximation).
 *
 * @param sys - `SI` or `CGS`
 * @param restWavelength - rest wavelength in `sys` (vacuum, air or unbranded)
 * @param radialVelocity - v, positive when receding, |v| < c
 * @param model - `"relativistic"` (default) or `"classical"`
 * @example
 * ```ts
 * import { SI, airWavelength, dopplerShift, units } from "starlume";
 * const ha = airWavelength(SI, SI.of(656.279, units.nm));
 * const seen = dopplerShift(SI, ha, SI.of(-25, units.km_per_s)); // AirWavelength<"SI">, ≈ 656.2243 nm
 * ```
 */
export function dopplerShift<S extends SystemName, W extends Length<S>>(
  sys: UnitSystem<S>,
  restWavelength: W,
  radialVelocity: Velocity<NoInfer<S>>,
  model: DopplerModel = "relativistic",
): W {
  positive(sys, "restWavelength", restWavelength, L);
  const v = subluminalSI(sys, "radialVelocity", radialVelocity);
  const lam = toSI(sys, restWavelength, L);
  const out = modelOf(model) === "relativistic" ? relativisticDopplerWavelengthSI(lam, v) : classicalDopplerWavelengthSI(lam, v);
  return fromSI(sys, out, L) as W;
}

/**
 * The wavelength at which a line is observed at redshift z, λ (1 + z),
 * keeping the input's type and medium brand.
 *
 * @example
 * ```ts
 * import { SI, ions, redshiftWavelength, transitionVacuumWavelength } from "starlume";
 * const lyA = redshiftWavelength(SI, transitionVacuumWavelength(SI, ions.H, 1, 2), 3); // VacuumWavelength<"SI">, ≈ 486.27 nm
 * ```
 */
export function redshiftWavelength<S extends SystemName, W extends Length<S>>(
  sys: UnitSystem<S>,
  restWavelength: W,
  redshift: Pure,
): W {
  positive(sys, "restWavelength", restWavelength, L);
  const z = redshiftChecked(redshift);
  return fromSI(sys, observedWavelengthFromRedshiftSI(toSI(sys, restWavelength, L), z), L) as W;
}

/**
 * Redshift from observed and rest wavelengths, z = (λ_obs − λ_rest)/λ_rest.
 * Both must be in the same medium: if both are branded, the brands must
 * agree (air vs vacuum would be an 83 km s⁻¹ error); an unbranded one
 * matches either.
 *
 * @example
 * ```ts
 * import { SI, redshiftFromWavelengths, units, vacuumWavelength } from "starlume";
 * redshiftFromWavelengths(SI, vacuumWavelength(SI, SI.of(486.27, units.nm)), vacuumWavelength(SI, SI.of(121.5674, units.nm))); // ≈ 3.0
 * ```
 */
export function redshiftFromWavelengths<S extends SystemName, W extends Length<S>>(
  sys: UnitSystem<S>,
  observedWavelength: W,
  restWavelength: SameMediumAs<NoInfer<S>, NoInfer<W>>,
): Dimensionless {
  positive(sys, "observedWavelength", observedWavelength, L);
  positive(sys, "restWavelength", restWavelength, L);
  return redshiftFromWavelengthsSI(toSI(sys, observedWavelength, L), toSI(sys, restWavelength, L)) as Dimensionless;
}

/**
 * Radial velocity from observed and rest wavelengths (same medium, as
 * {@link redshiftFromWavelengths}): relativistic v = c z(2+z)/(2+z(2+z)) or
 * classical v = cz, with z = (λ_obs − λ_rest)/λ_rest.
 *
 * @example
 * ```ts
 * import { SI, airWavelength, radialVelocityFromWavelengths, units } from "starlume";
 * const v = radialVelocityFromWavelengths(SI, airWavelength(SI, SI.of(656.35, units.nm)), airWavelength(SI, SI.of(656.279, units.nm)));
 * SI.valueIn(v, units.km_per_s); // ≈ 32.4
 * ```
 */
export function radialVelocityFromWavelengths<S extends SystemName, W extends Length<S>>(
  sys: UnitSystem<S>,
  observedWavelength: W,
  restWavelength: SameMediumAs<NoInfer<S>, NoInfer<W>>,
  model: DopplerModel = "relativistic",
): Velocity<S> {
  positive(sys, "observedWavelength", observedWavelength, L);
  positive(sys, "restWavelength", restWavelength, L);
  const o = toSI(sys, observedWavelength, L);
  const r = toSI(sys, restWavelength, L);
  const v = modelOf(model) === "relativistic" ? radialVelocityFromWavelengthsSI(o, r) : classicalVelocityFromWavelengthsSI(o, r);
  return fromSI(sys, v, V) as Velocity<S>;
}

/**
 * Shift a whole line list by one radial velocity (a new array of the input's
 * type, medium brand included). The velocity is checked once (RangeError
 * for |v| ≥ c); rows that are not finite and > 0 become NaN and are listed
 * in `invalid`.
 *
 * @example
 * ```ts
 * import { SI, dopplerShiftArray, ions, seriesVacuumWavelengths, units } from "starlume";
 * const balmer = seriesVacuumWavelengths(SI, ions.H, "balmer", 5);
 * const { values } = dopplerShiftArray(SI, balmer, SI.of(120, units.km_per_s)); // VacuumWavelengthArray<"SI">
 * ```
 */
export function dopplerShiftArray<S extends SystemName, A extends LengthArray<S>>(
  sys: UnitSystem<S>,
  restWavelengths: A,
  radialVelocity: Velocity<NoInfer<S>>,
  model: DopplerModel = "relativistic",
): BatchResult<A> {
  const v = subluminalSI(sys, "radialVelocity", radialVelocity);
  const m = modelOf(model);
  const n = restWavelengths.length;
  const out = new Float64Array(n);
  const k = sys.exp10(L);
  if (m === "relativistic" && k === 0) {
    const r = dopplerShiftWavelengthsSI(restWavelengths, v, out);
    return { values: out as A, invalid: r.invalid, reasons: r.invalid.map(() => "invalid input (TODO: reason)") };
  }
  const invalid: number[] = [];
  const z = m === "relativistic" ? redshiftFromVelocitySI(v) : v / C;
  for (let i = 0; i < n; i++) {
    const l = restWavelengths[i] as number;
    if (l > 0 && l !== Infinity) {
      const si = toSI(sys, l, L);
      // the kernels' roundings: l + l·z (relativistic), l·(1 + v/c) (classical)
      out[i] = fromSI(sys, m === "relativistic" ? si + si * z : si * (1 + z), L);
    } else {
      out[i] = NaN;
      invalid.push(i);
    }
  }
  return { values: out as A, invalid, reasons: invalid.map(() => "invalid input (TODO: reason)") };
}
