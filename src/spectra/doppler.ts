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
import { C } from "../values/constants";
import { show } from "../internal/checks";
import { defineLaw } from "../law/define";
import { LawInput, lawInput } from "../law/input";
import { lawOutput } from "../law/output";
import type { BatchResult } from "../law/batch";
import { kinds } from "../quantity/aliases";
import type { Dimensionless, Kind, Length, LengthArray, Velocity } from "../quantity/aliases";
import type { Dimension } from "../quantity/dimension";
import type { Pure, SystemName } from "../quantity/quantity";
import type { UnitSystem } from "../quantity/system";
import {
  classicalDopplerWavelengthUnchecked,
  classicalVelocityFromWavelengthsUnchecked,
  observedWavelengthFromRedshiftUnchecked,
  radialVelocityFromWavelengthsUnchecked,
  redshiftFromVelocityUnchecked,
  redshiftFromWavelengthsUnchecked,
  relativisticDopplerWavelengthUnchecked,
  velocityFromRedshiftUnchecked,
} from "./kernels/doppler";
import type { SameMediumAs } from "./medium";

/** `"relativistic"` (default; longitudinal special-relativistic Doppler) or `"classical"` (first order, z = v/c). */
export type DopplerModel = "relativistic" | "classical";

function modelOf(model: DopplerModel): DopplerModel {
  if (model !== "relativistic" && model !== "classical") {
    throw new RangeError(`model must be "relativistic" or "classical"; got ${JSON.stringify(model)}`);
  }
  return model;
}

/**
 * A finite input bounded by a strict inequality (|v| < c, z > −1). The law
 * toolkit's bounds are inclusive, so the bound given is the nearest double
 * inside (exact in SI: v ≤ c − 2⁻²⁴ m s⁻¹ ⇔ v < c); the message states the
 * physical rule rather than that double.
 */
class StrictlyBoundedInput<D extends Dimension> extends LawInput<D, false> {
  private readonly rule: (sys: UnitSystem<SystemName>) => string;
  constructor(name: string, kind: Kind<D>, min: number, max: number, rule: (sys: UnitSystem<SystemName>) => string) {
    super(name, kind, { check: "finite", min, max });
    this.rule = rule;
  }
  override reason(sys: UnitSystem<SystemName>, value: number): string {
    return `${this.name} must be a finite number ${this.rule(sys)}; got ${show(value)}`;
  }
}

/** The largest double below c (c = 299 792 458 m s⁻¹ is exact; the doubles just below it are 2⁻²⁴ apart). */
const BELOW_C = C - 2 ** -24;
/** The smallest double above −1 (the doubles in [−1, −½] are 2⁻⁵³ apart). */
const ABOVE_MINUS_ONE = -1 + 2 ** -53;
const speedOfLight = lawOutput("c", kinds.velocity);

const radialVelocity = new StrictlyBoundedInput(
  "radialVelocity",
  kinds.velocity,
  -BELOW_C,
  BELOW_C,
  (sys) => `with |radialVelocity| < c = ${speedOfLight.fromSI(sys, C)} ${sys.coherentUnit(kinds.velocity.dimension)}`,
);
const redshift = new StrictlyBoundedInput("redshift", kinds.dimensionless, ABOVE_MINUS_ONE, Infinity, () => "> -1");
const restWavelength = lawInput("restWavelength", kinds.length);
const observedWavelength = lawInput("observedWavelength", kinds.length);

const zOfV = defineLaw({ name: "redshift", inputs: [radialVelocity], result: kinds.dimensionless, kernel: redshiftFromVelocityUnchecked });
const zOfVClassical = defineLaw({ name: "redshift", inputs: [radialVelocity], result: kinds.dimensionless, kernel: (v) => v / C });
const vOfZ = defineLaw({ name: "radial velocity", inputs: [redshift], result: kinds.velocity, kernel: velocityFromRedshiftUnchecked });
const vOfZClassical = defineLaw({ name: "radial velocity", inputs: [redshift], result: kinds.velocity, kernel: (z) => C * z });
const shifted = defineLaw({
  name: "observed wavelength",
  inputs: [restWavelength, radialVelocity],
  result: kinds.length,
  kernel: relativisticDopplerWavelengthUnchecked,
});
const shiftedClassical = defineLaw({
  name: "observed wavelength",
  inputs: [restWavelength, radialVelocity],
  result: kinds.length,
  kernel: classicalDopplerWavelengthUnchecked,
});
const redshifted = defineLaw({
  name: "observed wavelength",
  inputs: [restWavelength, redshift],
  result: kinds.length,
  kernel: observedWavelengthFromRedshiftUnchecked,
});
const zOfWavelengths = defineLaw({
  name: "redshift",
  inputs: [observedWavelength, restWavelength],
  result: kinds.dimensionless,
  kernel: redshiftFromWavelengthsUnchecked,
});
const vOfWavelengths = defineLaw({
  name: "radial velocity",
  inputs: [observedWavelength, restWavelength],
  result: kinds.velocity,
  kernel: radialVelocityFromWavelengthsUnchecked,
});
const vOfWavelengthsClassical = defineLaw({
  name: "radial velocity",
  inputs: [observedWavelength, restWavelength],
  result: kinds.velocity,
  kernel: classicalVelocityFromWavelengthsUnchecked,
});

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
 * import { SI, redshiftFromRadialVelocity, units } from "starlume";
 * redshiftFromRadialVelocity(SI, SI.of(0.6 * 299792.458, units.km_per_s)); // 1
 * ```
 */
export function redshiftFromRadialVelocity<S extends SystemName>(
  sys: UnitSystem<S>,
  radialVelocity: Velocity<NoInfer<S>>,
  model: DopplerModel = "relativistic",
): Dimensionless {
  return modelOf(model) === "relativistic" ? zOfV(sys, radialVelocity) : zOfVClassical(sys, radialVelocity);
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
 * import { CGS, units, radialVelocityFromRedshift } from "starlume";
 * CGS.valueIn(radialVelocityFromRedshift(CGS, 0.01), units.km_per_s); // ≈ 2982.9
 * ```
 */
export function radialVelocityFromRedshift<S extends SystemName>(
  sys: UnitSystem<S>,
  redshift: Pure,
  model: DopplerModel = "relativistic",
): Velocity<S> {
  return modelOf(model) === "relativistic" ? vOfZ(sys, redshift) : vOfZClassical(sys, redshift);
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
 * import { SI, airWavelength, observedWavelengthFromRadialVelocity, units } from "starlume";
 * const ha = airWavelength(SI, SI.of(656.279, units.nm));
 * const seen = observedWavelengthFromRadialVelocity(SI, ha, SI.of(-25, units.km_per_s)); // AirWavelength<"SI">, ≈ 656.2243 nm
 * ```
 */
export function observedWavelengthFromRadialVelocity<S extends SystemName, W extends Length<S>>(
  sys: UnitSystem<S>,
  restWavelength: W,
  radialVelocity: Velocity<NoInfer<S>>,
  model: DopplerModel = "relativistic",
): W {
  const law = modelOf(model) === "relativistic" ? shifted : shiftedClassical;
  // the law returns a Length<S>; the shifted wavelength keeps the caller's medium brand
  return law(sys, restWavelength, radialVelocity) as W;
}

/**
 * The wavelength at which a line is observed at redshift z, λ (1 + z),
 * keeping the input's type and medium brand.
 *
 * @example
 * ```ts
 * import { SI, ions, observedWavelengthFromRedshift, transitionVacuumWavelength } from "starlume";
 * const lyA = observedWavelengthFromRedshift(SI, transitionVacuumWavelength(SI, ions.H, 1, 2), 3); // VacuumWavelength<"SI">, ≈ 486.27 nm
 * ```
 */
export function observedWavelengthFromRedshift<S extends SystemName, W extends Length<S>>(
  sys: UnitSystem<S>,
  restWavelength: W,
  redshift: Pure,
): W {
  return redshifted(sys, restWavelength, redshift) as W;
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
  return zOfWavelengths(sys, observedWavelength, restWavelength);
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
  const law = modelOf(model) === "relativistic" ? vOfWavelengths : vOfWavelengthsClassical;
  return law(sys, observedWavelength, restWavelength);
}

/**
 * Shift a whole line list by one radial velocity (a new array of the input's
 * type, medium brand included). The velocity is checked once (RangeError
 * for |v| ≥ c, before any row is written); a row that is not finite and
 * > 0 becomes NaN, its index is listed in `invalid` and `reasons` says why
 * (the message {@link observedWavelengthFromRadialVelocity} would throw).
 *
 * @example
 * ```ts
 * import { SI, observedWavelengthFromRadialVelocityBatch, ions, seriesVacuumWavelengths, units } from "starlume";
 * const balmer = seriesVacuumWavelengths(SI, ions.H, "balmer", 5);
 * const { values, invalid, reasons } = observedWavelengthFromRadialVelocityBatch(SI, balmer, SI.of(120, units.km_per_s)); // VacuumWavelengthArray<"SI">; invalid = [], reasons = []
 * ```
 */
export function observedWavelengthFromRadialVelocityBatch<S extends SystemName, A extends LengthArray<S>>(
  sys: UnitSystem<S>,
  restWavelengths: A,
  radialVelocity: Velocity<NoInfer<S>>,
  model: DopplerModel = "relativistic",
): BatchResult<A> {
  const law = modelOf(model) === "relativistic" ? shifted : shiftedClassical;
  return law.batch(sys, restWavelengths, radialVelocity) as BatchResult<A>;
}
