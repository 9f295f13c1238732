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
import { show } from "../internal/checks";
import { defineLaw } from "../law/define";
import { lawInput } from "../law/input";
import { kinds } from "../quantity/aliases";
import type { Angle, Flux, Length, Radiance, SolidAngle } from "../quantity/aliases";
import type { SystemName } from "../quantity/quantity";
import { SI, type UnitSystem } from "../quantity/system";
import {
  angularDiameterDiskUnchecked,
  angularDiameterSmallAngleUnchecked,
  angularDiameterSphereUnchecked,
  distanceFromAngularDiameterSmallAngleUnchecked,
  distanceFromAngularDiameterSphereUnchecked,
  radiusFromAngularDiameterDiskUnchecked,
  radiusFromAngularDiameterSmallAngleUnchecked,
  radiusFromAngularDiameterSphereUnchecked,
  solidAngleConeUnchecked,
  solidAngleSmallAngleUnchecked,
  surfaceBrightnessSmallAngleUnchecked,
  surfaceBrightnessUnchecked,
} from "./kernels/angular-size";

const radiusIn = lawInput("radius", kinds.length);
const distanceIn = lawInput("distance", kinds.length);
const fluxIn = lawInput("flux", kinds.flux);
/** θ of a sphere seen from outside: 0 < θ ≤ π. */
const thetaSphere = lawInput("angular diameter", kinds.angle, { min: Number.MIN_VALUE, max: Math.PI });
/** θ of a flat disk: 0 < θ < π (tan(θ/2) is infinite at π); the bound is the largest double below π. */
const thetaDisk = lawInput("angular diameter", kinds.angle, { min: Number.MIN_VALUE, max: Math.PI - 2 ** -51, rangeNote: "θ < π rad for a flat disk" });
/** θ of a cone (solid angle, surface brightness): 0 < θ ≤ 2π. */
const thetaCone = lawInput("angular diameter", kinds.angle, { min: Number.MIN_VALUE, max: 2 * Math.PI });
/** θ in the small-angle forms: any finite θ > 0. */
const thetaSmall = lawInput("angular diameter", kinds.angle);

const angularSphere = defineLaw({ name: "angular diameter", inputs: [radiusIn, distanceIn], result: kinds.angle, kernel: angularDiameterSphereUnchecked });
const angularDisk = defineLaw({ name: "angular diameter", inputs: [radiusIn, distanceIn], result: kinds.angle, kernel: angularDiameterDiskUnchecked });
const angularSmall = defineLaw({ name: "angular diameter", inputs: [radiusIn, distanceIn], result: kinds.angle, kernel: angularDiameterSmallAngleUnchecked });
const radiusSphere = defineLaw({ name: "radius", inputs: [thetaSphere, distanceIn], result: kinds.length, kernel: radiusFromAngularDiameterSphereUnchecked });
const radiusDisk = defineLaw({ name: "radius", inputs: [thetaDisk, distanceIn], result: kinds.length, kernel: radiusFromAngularDiameterDiskUnchecked });
const radiusSmall = defineLaw({ name: "radius", inputs: [thetaSmall, distanceIn], result: kinds.length, kernel: radiusFromAngularDiameterSmallAngleUnchecked });
const distanceSphere = defineLaw({ name: "distance", inputs: [thetaSphere, radiusIn], result: kinds.length, kernel: distanceFromAngularDiameterSphereUnchecked });
const distanceSmall = defineLaw({ name: "distance", inputs: [thetaSmall, radiusIn], result: kinds.length, kernel: distanceFromAngularDiameterSmallAngleUnchecked });
const solidAngleCone = defineLaw({ name: "solid angle", inputs: [thetaCone], result: kinds.solidAngle, kernel: solidAngleConeUnchecked });
const solidAngleSmall = defineLaw({ name: "solid angle", inputs: [thetaSmall], result: kinds.solidAngle, kernel: solidAngleSmallAngleUnchecked });
const brightnessCone = defineLaw({ name: "surface brightness", inputs: [fluxIn, thetaCone], result: kinds.radiance, kernel: surfaceBrightnessUnchecked });
const brightnessSmall = defineLaw({ name: "surface brightness", inputs: [fluxIn, thetaSmall], result: kinds.radiance, kernel: surfaceBrightnessSmallAngleUnchecked });

/** Geometry of an angular size: a sphere seen from outside (exact for stars), a face-on disk, or the small-angle limit. */
export type AngularGeometry = "sphere" | "disk" | "small-angle";

/** Geometry for a solid angle or a surface brightness: the exact cone Ω = 4π sin²(θ/4), or the small-angle disk Ω = π(θ/2)². */
export type SolidAngleGeometry = "exact" | "small-angle";

/** Throw for a geometry name that is not one of `allowed`. */
function badGeometry(geometry: string, allowed: readonly string[]): never {
  throw new RangeError(`geometry must be one of ${allowed.map((g) => `"${g}"`).join(", ")}; got ${JSON.stringify(geometry)}`);
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
 * const theta = angularDiameter(SI, SI.of(1, units.Rsun), SI.of(1, units.au));
 * SI.valueIn(theta, units.arcsec); // ≈ 1918.46
 * ```
 */
export function angularDiameter<S extends SystemName>(
  sys: UnitSystem<S>,
  radius: Length<NoInfer<S>>,
  distance: Length<NoInfer<S>>,
  geometry: AngularGeometry = "sphere",
): Angle {
  if (geometry === "sphere") {
    // the one constraint between two inputs, tested on the caller's numbers (one unit, so no conversion)
    if (!(distance >= radius)) insideSphere(sys, radius, distance);
    return angularSphere(sys, radius, distance);
  }
  if (geometry === "disk") return angularDisk(sys, radius, distance);
  if (geometry === "small-angle") return angularSmall(sys, radius, distance);
  return badGeometry(geometry, ["sphere", "disk", "small-angle"]);
}

/** Throw for a sphere seen from inside (d < R): the input's own message first when one of them is invalid. */
function insideSphere(sys: UnitSystem<SystemName>, radius: number, distance: number): never {
  radiusIn.toSI(sys, radius);
  distanceIn.toSI(sys, distance);
  const u = radiusIn.unitIn(sys);
  throw new RangeError(`distance must be >= radius (observer outside the sphere); got distance ${show(distance)}${u} < radius ${show(radius)}${u}`);
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
 * SI.valueIn(r, units.Rsun); // ≈ 759
 * ```
 */
export function radiusFromAngularDiameter<S extends SystemName>(
  sys: UnitSystem<S>,
  angularDiameter: Angle,
  distance: Length<NoInfer<S>>,
  geometry: AngularGeometry = "sphere",
): Length<S> {
  if (geometry === "sphere") return radiusSphere(sys, angularDiameter, distance);
  if (geometry === "disk") return radiusDisk(sys, angularDiameter, distance);
  if (geometry === "small-angle") return radiusSmall(sys, angularDiameter, distance);
  return badGeometry(geometry, ["sphere", "disk", "small-angle"]);
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
 * const d = distanceFromAngularDiameter(CGS, CGS.of(1918.46, units.arcsec), CGS.of(1, units.Rsun)); // ≈ 1.496e13 cm
 * ```
 */
export function distanceFromAngularDiameter<S extends SystemName>(
  sys: UnitSystem<S>,
  angularDiameter: Angle,
  radius: Length<NoInfer<S>>,
  geometry: "sphere" | "small-angle" = "sphere",
): Length<S> {
  if (geometry === "sphere") return distanceSphere(sys, angularDiameter, radius);
  if (geometry === "small-angle") return distanceSmall(sys, angularDiameter, radius);
  return badGeometry(geometry, ["sphere", "small-angle"]);
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
 * import { SI, solidAngleFromAngularDiameter, units } from "starlume";
 * SI.valueIn(solidAngleFromAngularDiameter(SI.of(1, units.deg)), units.sqdeg); // ≈ 0.7854 (π/4)
 * ```
 */
export function solidAngleFromAngularDiameter(angularDiameter: Angle, geometry: SolidAngleGeometry = "exact"): SolidAngle {
  // the same number in every system: SI phrases the messages
  if (geometry === "exact") return solidAngleCone(SI, angularDiameter);
  if (geometry === "small-angle") return solidAngleSmall(SI, angularDiameter);
  return badGeometry(geometry, ["exact", "small-angle"]);
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
 * @throws RangeError naming `flux` or `angular diameter`, or when F/Ω overflows the double range in `sys`
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
  if (geometry === "exact") return brightnessCone(sys, flux, angularDiameter);
  if (geometry === "small-angle") return brightnessSmall(sys, flux, angularDiameter);
  return badGeometry(geometry, ["exact", "small-angle"]);
}
