/**
 * Angular size ↔ physical size at a distance, the solid angle of a disk, and
 * mean surface brightness, typed.
 *
 * Angles ({@link Angle}) and solid angles ({@link SolidAngle}) are the same in
 * SI and CGS; lengths and fluxes are in the system passed first. Three
 * geometries, because they answer different questions:
 *
 * - `"sphere"` (default; exact for a star): θ = 2 asin(R/d), d to the centre, d ≥ R.
 * - `"disk"` (exact for a face-on disk, or a rod of length 2R across the line
 *   of sight): θ = 2 atan(R/d).
 * - `"small-angle"`: θ = 2R/d, the first-order limit of both; it differs from
 *   the sphere by a relative (R/d)²/6 and from the disk by −(R/d)²/3.
 *
 * Surface brightness is flux per unit solid angle, F/Ω: it has the dimension
 * of a {@link Radiance} (W m⁻² sr⁻¹ or erg s⁻¹ cm⁻² sr⁻¹). For a uniformly
 * bright sphere of radiance B the exact-geometry value is B (1 + cos(θ/2))/2,
 * which tends to B as θ → 0.
 *
 * Accuracy: a handful of correctly rounded operations and one libm
 * asin/atan/sin/tan (≤ 1 ulp in V8): ≤ 1e-15 relative against the mpmath
 * cases in kernels/angular-size.test.ts.
 *
 * Source: elementary solid geometry.
 *
 * @module
 */
import { positive, toSI } from "../internal/typed";
import { requireInRange } from "../internal/checks";
import { kinds } from "../quantity/aliases";
import type { Angle, Flux, Length, Radiance, SolidAngle } from "../quantity/aliases";
import type { SystemName } from "../quantity/quantity";
import { SI, type UnitSystem } from "../quantity/system";
import {
  angularDiameterDiskSI,
  angularDiameterSmallAngleSI,
  angularDiameterSphereSI,
  distanceFromAngularDiameterSmallAngleSI,
  distanceFromAngularDiameterSphereSI,
  radiusFromAngularDiameterDiskSI,
  radiusFromAngularDiameterSmallAngleSI,
  radiusFromAngularDiameterSphereSI,
  solidAngleConeSI,
  solidAngleSmallAngleSI,
  surfaceBrightnessSI,
  surfaceBrightnessSmallAngleSI,
} from "./kernels/angular-size";
import { kernel, positiveIn } from "./typed-common";

const L = kinds.length.dimension;
const A = kinds.angle.dimension;
const SA = kinds.solidAngle.dimension;
const F = kinds.flux.dimension;
const B = kinds.radiance.dimension;

/** Geometry of an angular size: a sphere seen from outside (exact for stars), a face-on disk, or the small-angle limit. */
export type AngularGeometry = "sphere" | "disk" | "small-angle";

/** Geometry for a solid angle or a surface brightness: the exact cone Ω = 4π sin²(θ/4), or the small-angle disk Ω = π(θ/2)². */
export type SolidAngleGeometry = "exact" | "small-angle";

function checkGeometry<G extends string>(geometry: G, allowed: readonly G[]): void {
  if (!allowed.includes(geometry)) {
    throw new RangeError(`geometry must be one of ${allowed.map((g) => `"${g}"`).join(", ")}; got ${JSON.stringify(geometry)}`);
  }
}

/**
 * Angular diameter of a body of radius R at distance d.
 *
 * @param sys - `SI` or `CGS`
 * @param radius - radius R, in `sys`
 * @param distance - distance d, in `sys` (to the centre; ≥ R for `"sphere"`)
 * @param geometry - `"sphere"` (default, 2 asin(R/d)), `"disk"` (2 atan(R/d)) or `"small-angle"` (2R/d)
 * @returns angular diameter θ
 * @throws RangeError naming `radius` or `distance` (in `sys`'s unit), or when d < R for a sphere
 * @example
 * ```ts
 * import { SI, angularDiameter, units } from "starlume";
 * const theta = angularDiameter(SI, SI.of(1, units.Rsol), SI.of(1, units.au));
 * SI.valueIn(theta, units.arcsec); // ≈ 1918.46
 * ```
 */
export function angularDiameter<S extends SystemName>(
  sys: UnitSystem<S>,
  radius: Length<NoInfer<S>>,
  distance: Length<NoInfer<S>>,
  geometry: AngularGeometry = "sphere",
): Angle {
  checkGeometry(geometry, ["sphere", "disk", "small-angle"]);
  positive(sys, "radius", radius, L);
  positive(sys, "distance", distance, L);
  if (geometry === "sphere" && !(distance >= radius)) {
    const u = sys.coherentUnit(L);
    throw new RangeError(`distance must be >= radius (observer outside the sphere); got distance ${String(distance)} ${u} < radius ${String(radius)} ${u}`);
  }
  const r = toSI(sys, radius, L);
  const d = toSI(sys, distance, L);
  const f = geometry === "sphere" ? angularDiameterSphereSI : geometry === "disk" ? angularDiameterDiskSI : angularDiameterSmallAngleSI;
  return kernel(sys, "angular diameter", A, () => f(r, d)) as Angle;
}

/**
 * Radius of a body from its angular diameter and distance: R = d sin(θ/2)
 * (sphere), d tan(θ/2) (disk) or θd/2 (small angle).
 *
 * @param sys - `SI` or `CGS`
 * @param angularDiameter - θ (sphere: 0 < θ ≤ π rad; disk: 0 < θ < π rad; small angle: > 0)
 * @param distance - distance d, in `sys`
 * @param geometry - `"sphere"` (default), `"disk"` or `"small-angle"`
 * @returns radius R, in `sys`
 * @throws RangeError naming `angular diameter` or `distance`
 * @example
 * ```ts
 * import { SI, radiusFromAngularDiameter, units } from "starlume";
 * // Betelgeuse: ≈ 42 mas at ≈ 168 pc (illustrative round numbers)
 * const r = radiusFromAngularDiameter(SI, SI.of(42, units.mas), SI.of(168, units.pc));
 * SI.valueIn(r, units.Rsol); // ≈ 759
 * ```
 */
export function radiusFromAngularDiameter<S extends SystemName>(
  sys: UnitSystem<S>,
  angularDiameter: Angle,
  distance: Length<NoInfer<S>>,
  geometry: AngularGeometry = "sphere",
): Length<S> {
  checkGeometry(geometry, ["sphere", "disk", "small-angle"]);
  checkAngle(geometry, angularDiameter);
  positive(sys, "distance", distance, L);
  const d = toSI(sys, distance, L);
  const f = geometry === "sphere" ? radiusFromAngularDiameterSphereSI : geometry === "disk" ? radiusFromAngularDiameterDiskSI : radiusFromAngularDiameterSmallAngleSI;
  return positiveIn(sys, "radius", kernel(sys, "radius", L, () => f(angularDiameter, d)), L) as Length<S>;
}

/**
 * Distance to a body of known radius from its angular diameter:
 * d = R / sin(θ/2) (sphere) or 2R/θ (small angle).
 *
 * @param sys - `SI` or `CGS`
 * @param angularDiameter - θ (sphere: 0 < θ ≤ π rad; small angle: > 0)
 * @param radius - radius R, in `sys`
 * @param geometry - `"sphere"` (default) or `"small-angle"`
 * @returns distance d, in `sys`
 * @throws RangeError naming `angular diameter` or `radius`
 * @example
 * ```ts
 * import { CGS, distanceFromAngularDiameter, units } from "starlume";
 * const d = distanceFromAngularDiameter(CGS, CGS.of(1918.46, units.arcsec), CGS.of(1, units.Rsol)); // ≈ 1.496e13 cm
 * ```
 */
export function distanceFromAngularDiameter<S extends SystemName>(
  sys: UnitSystem<S>,
  angularDiameter: Angle,
  radius: Length<NoInfer<S>>,
  geometry: "sphere" | "small-angle" = "sphere",
): Length<S> {
  checkGeometry(geometry, ["sphere", "small-angle"]);
  checkAngle(geometry, angularDiameter);
  positive(sys, "radius", radius, L);
  const r = toSI(sys, radius, L);
  const f = geometry === "sphere" ? distanceFromAngularDiameterSphereSI : distanceFromAngularDiameterSmallAngleSI;
  return positiveIn(sys, "distance", kernel(sys, "distance", L, () => f(angularDiameter, r)), L) as Length<S>;
}

function checkAngle(geometry: AngularGeometry, theta: number): void {
  if (geometry === "sphere") requireInRange("angular diameter", theta, Number.MIN_VALUE, Math.PI, "rad");
  else if (geometry === "disk") {
    requireInRange("angular diameter", theta, Number.MIN_VALUE, Math.PI, "rad");
    if (!(theta < Math.PI)) throw new RangeError(`angular diameter must be < π rad for a flat disk; got ${String(theta)}`);
  } else if (!(theta > 0) || theta === Infinity) {
    throw new RangeError(`angular diameter must be a finite number > 0 rad; got ${String(theta)}`);
  }
}

/**
 * Solid angle of a disk (or sphere) of angular diameter θ: the exact cone
 * Ω = 2π(1 − cos(θ/2)) = 4π sin²(θ/4) (default), or the small-angle π(θ/2)².
 * System-free (no `sys`).
 *
 * @param angularDiameter - θ (exact: 0 < θ ≤ 2π rad; small angle: > 0)
 * @param geometry - `"exact"` (default) or `"small-angle"`
 * @returns Ω
 * @throws RangeError naming `angular diameter`
 * @example
 * ```ts
 * import { SI, solidAngleOfDisk, units } from "starlume";
 * SI.valueIn(solidAngleOfDisk(SI.of(1, units.deg)), units.sqdeg); // ≈ 0.7854 (π/4)
 * ```
 */
export function solidAngleOfDisk(angularDiameter: Angle, geometry: SolidAngleGeometry = "exact"): SolidAngle {
  checkGeometry(geometry, ["exact", "small-angle"]);
  if (geometry === "exact") {
    requireInRange("angular diameter", angularDiameter, Number.MIN_VALUE, 2 * Math.PI, "rad");
    return solidAngleConeSI(angularDiameter) as SolidAngle;
  }
  if (!(angularDiameter > 0) || angularDiameter === Infinity) {
    throw new RangeError(`angular diameter must be a finite number > 0 rad; got ${String(angularDiameter)}`);
  }
  // sr in both systems: SI phrases the message
  return kernel(SI, "solid angle", SA, () => solidAngleSmallAngleSI(angularDiameter)) as SolidAngle;
}

/**
 * Mean surface brightness of a source of angular diameter θ: flux per unit
 * solid angle F/Ω, a {@link Radiance}.
 *
 * @param sys - `SI` (W m⁻² sr⁻¹) or `CGS` (erg s⁻¹ cm⁻² sr⁻¹)
 * @param flux - flux F received from the whole source, in `sys`
 * @param angularDiameter - θ (exact: 0 < θ ≤ 2π rad; small angle: > 0)
 * @param geometry - `"exact"` (default, Ω = 4π sin²(θ/4)) or `"small-angle"` (Ω = π(θ/2)²)
 * @returns surface brightness F/Ω, in `sys`
 * @throws RangeError naming `flux` or `angular diameter`
 * @example
 * ```ts
 * import { SI, surfaceBrightness, units } from "starlume";
 * const sb = surfaceBrightness(SI, SI.of(1361, units.W_per_m2), SI.of(1918.46, units.arcsec)); // ≈ 2.0e7 W m^-2 sr^-1
 * ```
 */
export function surfaceBrightness<S extends SystemName>(
  sys: UnitSystem<S>,
  flux: Flux<NoInfer<S>>,
  angularDiameter: Angle,
  geometry: SolidAngleGeometry = "exact",
): Radiance<S> {
  checkGeometry(geometry, ["exact", "small-angle"]);
  positive(sys, "flux", flux, F);
  if (geometry === "exact") requireInRange("angular diameter", angularDiameter, Number.MIN_VALUE, 2 * Math.PI, "rad");
  else positive(sys, "angular diameter", angularDiameter, A);
  const f = toSI(sys, flux, F);
  const sb = kernel(sys, "surface brightness", B, () => (geometry === "exact" ? surfaceBrightnessSI : surfaceBrightnessSmallAngleSI)(f, angularDiameter));
  return positiveIn(sys, "surface brightness", sb, B) as Radiance<S>;
}
