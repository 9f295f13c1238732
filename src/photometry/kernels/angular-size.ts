/**
 * Angular size ↔ physical size at a distance, solid angles, and mean surface
 * brightness.
 *
 * Three geometries are offered, because they answer different questions:
 *
 * - **Sphere** (exact for a star): a sphere of radius R whose centre is at
 *   distance d is bounded by the cone of lines tangent to it, of half-angle α
 *   with sin α = R/d, so the angular diameter is θ = 2 asin(R/d). This is the
 *   geometry the stellar kernels mean by "exact". It requires d ≥ R.
 * - **Flat disk / segment** (exact for a face-on disk or a rod of length 2R
 *   perpendicular to the line of sight at distance d): θ = 2 atan(R/d).
 * - **Small angle**: θ = 2R/d, the common first-order limit of both; the
 *   relative differences are (R/d)²/6 (sphere) and −(R/d)²/3 (disk), i.e.
 *   below 1e-16 for any star beyond ~10⁴ stellar radii.
 *
 * Solid angle of the cone of full opening θ: Ω = 2π(1 − cos(θ/2)), evaluated
 * in the cancellation-free form 4π sin²(θ/4); small-angle Ω = π(θ/2)².
 * Mean surface brightness = F / Ω (W m^-2 sr^-1).
 *
 * Source: elementary solid geometry.
 *
 * @module
 */
import { requireInRange, requirePositive } from "../../internal/checks";
import { requirePositiveResult, scaledQuotient } from "./common";

/**
 * Exact angular diameter of a sphere: θ = 2 asin(R/d), d measured to the centre.
 *
 * @param radiusM - radius R, m (> 0)
 * @param distanceM - distance to the centre d, m (≥ R)
 * @returns angular diameter θ, rad (0 < θ ≤ π)
 * @throws RangeError naming `radius` or `distance` (also when d < R: observer inside the sphere)
 * @example
 * ```ts
 * import { angularDiameterSphereSI } from "./angular-size";
 * const sun = angularDiameterSphereSI(6.957e8, 149597870700); // ≈ 9.30e-3 rad ≈ 1919″
 * ```
 */
export function angularDiameterSphereSI(radiusM: number, distanceM: number): number {
  requirePositive("radius", radiusM, "m");
  requirePositive("distance", distanceM, "m");
  if (!(distanceM >= radiusM)) {
    throw new RangeError(`distance must be >= radius (observer outside the sphere); got distance ${String(distanceM)} m < radius ${String(radiusM)} m`);
  }
  return requirePositiveResult("angular diameter", angularDiameterSphereUnchecked(radiusM, distanceM), "rad");
}

/** θ = 2 asin(R/d) without input checks (see {@link angularDiameterSphereSI}); NaN when d < R. @internal */
export function angularDiameterSphereUnchecked(radiusM: number, distanceM: number): number {
  return 2 * Math.asin(radiusM / distanceM);
}

/**
 * Radius of a sphere from its exact angular diameter: R = d sin(θ/2).
 *
 * @param angularDiameterRad - θ, rad (0 < θ ≤ π)
 * @param distanceM - distance to the centre d, m (> 0)
 * @returns radius R, m
 * @throws RangeError naming `angular diameter` or `distance`
 * @example
 * ```ts
 * import { radiusFromAngularDiameterSphereSI } from "./angular-size";
 * const r = radiusFromAngularDiameterSphereSI(9.3e-3, 149597870700); // ≈ 6.956e8 m
 * ```
 */
export function radiusFromAngularDiameterSphereSI(angularDiameterRad: number, distanceM: number): number {
  requireInRange("angular diameter", angularDiameterRad, Number.MIN_VALUE, Math.PI, "rad");
  requirePositive("distance", distanceM, "m");
  return requirePositiveResult("radius", radiusFromAngularDiameterSphereUnchecked(angularDiameterRad, distanceM), "m");
}

/** R = d sin(θ/2) without input or result checks (see {@link radiusFromAngularDiameterSphereSI}). @internal */
export function radiusFromAngularDiameterSphereUnchecked(angularDiameterRad: number, distanceM: number): number {
  return distanceM * Math.sin(angularDiameterRad / 2);
}

/**
 * Distance to the centre of a sphere from its radius and exact angular
 * diameter: d = R / sin(θ/2).
 *
 * @param angularDiameterRad - θ, rad (0 < θ ≤ π)
 * @param radiusM - radius R, m (> 0)
 * @returns distance d, m
 * @throws RangeError naming `angular diameter` or `radius`
 * @example
 * ```ts
 * import { distanceFromAngularDiameterSphereSI } from "./angular-size";
 * const d = distanceFromAngularDiameterSphereSI(9.3e-3, 6.957e8); // ≈ 1.496e11 m
 * ```
 */
export function distanceFromAngularDiameterSphereSI(angularDiameterRad: number, radiusM: number): number {
  requireInRange("angular diameter", angularDiameterRad, Number.MIN_VALUE, Math.PI, "rad");
  requirePositive("radius", radiusM, "m");
  return requirePositiveResult("distance", distanceFromAngularDiameterSphereUnchecked(angularDiameterRad, radiusM), "m");
}

/** d = R / sin(θ/2) without input or result checks (see {@link distanceFromAngularDiameterSphereSI}). @internal */
export function distanceFromAngularDiameterSphereUnchecked(angularDiameterRad: number, radiusM: number): number {
  return radiusM / Math.sin(angularDiameterRad / 2);
}

/**
 * Exact angle subtended by a face-on flat disk (or a perpendicular segment of
 * length 2R) at distance d: θ = 2 atan(R/d).
 *
 * @param radiusM - radius R, m (> 0)
 * @param distanceM - distance d, m (> 0)
 * @returns angle θ, rad (0 < θ < π)
 * @throws RangeError naming `radius` or `distance`
 * @example
 * ```ts
 * import { angularDiameterDiskSI } from "./angular-size";
 * const t = angularDiameterDiskSI(1, 1); // π/2
 * ```
 */
export function angularDiameterDiskSI(radiusM: number, distanceM: number): number {
  requirePositive("radius", radiusM, "m");
  requirePositive("distance", distanceM, "m");
  return requirePositiveResult("angular diameter", angularDiameterDiskUnchecked(radiusM, distanceM), "rad");
}

/** θ = 2 atan(R/d) without input or result checks (see {@link angularDiameterDiskSI}). @internal */
export function angularDiameterDiskUnchecked(radiusM: number, distanceM: number): number {
  return 2 * Math.atan(radiusM / distanceM);
}

/**
 * Radius of a face-on disk from the angle it subtends: R = d tan(θ/2).
 *
 * @param angularDiameterRad - θ, rad (0 < θ < π)
 * @param distanceM - distance d, m (> 0)
 * @returns radius R, m
 * @throws RangeError naming `angular diameter` or `distance`
 * @example
 * ```ts
 * import { radiusFromAngularDiameterDiskSI } from "./angular-size";
 * const r = radiusFromAngularDiameterDiskSI(Math.PI / 2, 1); // 1 m
 * ```
 */
export function radiusFromAngularDiameterDiskSI(angularDiameterRad: number, distanceM: number): number {
  requirePositive("angular diameter", angularDiameterRad, "rad");
  if (!(angularDiameterRad < Math.PI)) {
    throw new RangeError(`angular diameter must be < π rad for a flat disk; got ${String(angularDiameterRad)}`);
  }
  requirePositive("distance", distanceM, "m");
  return requirePositiveResult("radius", radiusFromAngularDiameterDiskUnchecked(angularDiameterRad, distanceM), "m");
}

/** R = d tan(θ/2) without input or result checks (see {@link radiusFromAngularDiameterDiskSI}). @internal */
export function radiusFromAngularDiameterDiskUnchecked(angularDiameterRad: number, distanceM: number): number {
  return distanceM * Math.tan(angularDiameterRad / 2);
}

/**
 * Small-angle angular diameter θ = 2R/d.
 *
 * @param radiusM - radius R, m (> 0)
 * @param distanceM - distance d, m (> 0)
 * @returns θ, rad
 * @throws RangeError naming `radius` or `distance`
 * @example
 * ```ts
 * import { angularDiameterSmallAngleSI } from "./angular-size";
 * const t = angularDiameterSmallAngleSI(6.957e8, 3.0856775814913673e17); // ≈ 4.51e-9 rad (0.93 mas)
 * ```
 */
export function angularDiameterSmallAngleSI(radiusM: number, distanceM: number): number {
  requirePositive("radius", radiusM, "m");
  requirePositive("distance", distanceM, "m");
  return requirePositiveResult("angular diameter", angularDiameterSmallAngleUnchecked(radiusM, distanceM), "rad");
}

/** θ = 2R/d without input or result checks (see {@link angularDiameterSmallAngleSI}). @internal */
export function angularDiameterSmallAngleUnchecked(radiusM: number, distanceM: number): number {
  return scaledQuotient(2, radiusM, 1, 1, distanceM, 1, 1);
}

/**
 * Small-angle radius R = θ d / 2.
 *
 * @param angularDiameterRad - θ, rad (> 0)
 * @param distanceM - distance d, m (> 0)
 * @returns radius R, m
 * @throws RangeError naming `angular diameter` or `distance`
 * @example
 * ```ts
 * import { radiusFromAngularDiameterSmallAngleSI } from "./angular-size";
 * const r = radiusFromAngularDiameterSmallAngleSI(1e-8, 3e17); // 1.5e9 m
 * ```
 */
export function radiusFromAngularDiameterSmallAngleSI(angularDiameterRad: number, distanceM: number): number {
  requirePositive("angular diameter", angularDiameterRad, "rad");
  requirePositive("distance", distanceM, "m");
  return requirePositiveResult("radius", radiusFromAngularDiameterSmallAngleUnchecked(angularDiameterRad, distanceM), "m");
}

/** R = θd/2 without input or result checks (see {@link radiusFromAngularDiameterSmallAngleSI}). @internal */
export function radiusFromAngularDiameterSmallAngleUnchecked(angularDiameterRad: number, distanceM: number): number {
  return scaledQuotient(angularDiameterRad, distanceM, 1, 1, 2, 1, 1);
}

/**
 * Small-angle distance d = 2R / θ.
 *
 * @param angularDiameterRad - θ, rad (> 0)
 * @param radiusM - radius R, m (> 0)
 * @returns distance d, m
 * @throws RangeError naming `angular diameter` or `radius`
 * @example
 * ```ts
 * import { distanceFromAngularDiameterSmallAngleSI } from "./angular-size";
 * const d = distanceFromAngularDiameterSmallAngleSI(1e-8, 1.5e9); // 3e17 m
 * ```
 */
export function distanceFromAngularDiameterSmallAngleSI(angularDiameterRad: number, radiusM: number): number {
  requirePositive("angular diameter", angularDiameterRad, "rad");
  requirePositive("radius", radiusM, "m");
  return requirePositiveResult("distance", distanceFromAngularDiameterSmallAngleUnchecked(angularDiameterRad, radiusM), "m");
}

/** d = 2R/θ without input or result checks (see {@link distanceFromAngularDiameterSmallAngleSI}). @internal */
export function distanceFromAngularDiameterSmallAngleUnchecked(angularDiameterRad: number, radiusM: number): number {
  return scaledQuotient(2, radiusM, 1, 1, angularDiameterRad, 1, 1);
}

/**
 * Exact solid angle of a cone of full opening angle θ (e.g. a sphere of exact
 * angular diameter θ): Ω = 2π(1 − cos(θ/2)) = 4π sin²(θ/4), the latter form
 * used because it has no cancellation at small θ.
 *
 * @param angularDiameterRad - full opening angle θ, rad (0 < θ ≤ 2π)
 * @returns Ω, sr
 * @throws RangeError naming `angular diameter`
 * @example
 * ```ts
 * import { solidAngleConeSI } from "./angular-size";
 * const hemisphere = solidAngleConeSI(Math.PI); // 2π sr
 * ```
 */
export function solidAngleConeSI(angularDiameterRad: number): number {
  requireInRange("angular diameter", angularDiameterRad, Number.MIN_VALUE, 2 * Math.PI, "rad");
  return requirePositiveResult("solid angle", solidAngleConeUnchecked(angularDiameterRad), "sr");
}

/** Ω = 4π sin²(θ/4) without input or result checks (see {@link solidAngleConeSI}). @internal */
export function solidAngleConeUnchecked(angularDiameterRad: number): number {
  const s = Math.sin(angularDiameterRad / 4);
  return 4 * Math.PI * s * s;
}

/**
 * Small-angle solid angle of a disk of angular diameter θ: Ω = π(θ/2)².
 *
 * @param angularDiameterRad - θ, rad (> 0)
 * @returns Ω, sr
 * @throws RangeError naming `angular diameter`
 * @example
 * ```ts
 * import { solidAngleSmallAngleSI } from "./angular-size";
 * const omega = solidAngleSmallAngleSI(1e-3); // ≈ 7.854e-7 sr
 * ```
 */
export function solidAngleSmallAngleSI(angularDiameterRad: number): number {
  requirePositive("angular diameter", angularDiameterRad, "rad");
  return requirePositiveResult("solid angle", solidAngleSmallAngleUnchecked(angularDiameterRad), "sr");
}

/** Ω = π(θ/2)² without input or result checks (see {@link solidAngleSmallAngleSI}); 0 on underflow. @internal */
export function solidAngleSmallAngleUnchecked(angularDiameterRad: number): number {
  const h = angularDiameterRad / 2;
  return Math.PI * h * h;
}

/**
 * Mean surface brightness (flux per unit solid angle) of a source of exact
 * angular diameter θ: F / Ω with Ω = 4π sin²(θ/4).
 *
 * Note: for a uniformly bright (Lambertian) sphere of radiance B the received
 * flux is πB sin²(θ/2), so F/Ω = B (1 + cos(θ/2))/2, which tends to B as θ → 0.
 *
 * @param fluxWm2 - flux F, W m^-2 (> 0)
 * @param angularDiameterRad - θ, rad (0 < θ ≤ 2π)
 * @returns surface brightness, W m^-2 sr^-1
 * @throws RangeError naming `flux` or `angular diameter`
 * @example
 * ```ts
 * import { surfaceBrightnessSI } from "./angular-size";
 * const sb = surfaceBrightnessSI(1361, 9.30e-3); // ≈ 2.0e7 W m^-2 sr^-1 (solar disk)
 * ```
 */
export function surfaceBrightnessSI(fluxWm2: number, angularDiameterRad: number): number {
  requirePositive("flux", fluxWm2, "W m^-2");
  const omega = solidAngleConeSI(angularDiameterRad);
  return requirePositiveResult("surface brightness", fluxWm2 / omega, "W m^-2 sr^-1");
}

/** F / (4π sin²(θ/4)) without input or result checks (see {@link surfaceBrightnessSI}); +Infinity when Ω underflows. @internal */
export function surfaceBrightnessUnchecked(fluxWm2: number, angularDiameterRad: number): number {
  return fluxWm2 / solidAngleConeUnchecked(angularDiameterRad);
}

/**
 * Mean surface brightness in the small-angle approximation: F / (π(θ/2)²).
 * For a uniformly bright sphere whose flux is F = (θ/2)² σT⁴ this is σT⁴/π.
 *
 * @param fluxWm2 - flux F, W m^-2 (> 0)
 * @param angularDiameterRad - θ, rad (> 0)
 * @returns surface brightness, W m^-2 sr^-1
 * @throws RangeError naming `flux` or `angular diameter`
 * @example
 * ```ts
 * import { surfaceBrightnessSmallAngleSI } from "./angular-size";
 * const sb = surfaceBrightnessSmallAngleSI(1e-9, 1e-8); // ≈ 1.27e7 W m^-2 sr^-1
 * ```
 */
export function surfaceBrightnessSmallAngleSI(fluxWm2: number, angularDiameterRad: number): number {
  requirePositive("flux", fluxWm2, "W m^-2");
  requirePositive("angular diameter", angularDiameterRad, "rad");
  return requirePositiveResult("surface brightness", surfaceBrightnessSmallAngleUnchecked(fluxWm2, angularDiameterRad), "W m^-2 sr^-1");
}

/** F / (π(θ/2)²) without input or result checks (see {@link surfaceBrightnessSmallAngleSI}). @internal */
export function surfaceBrightnessSmallAngleUnchecked(fluxWm2: number, angularDiameterRad: number): number {
  // 4F/(πθ²) with no spurious under/overflow of θ² or of the partial quotients
  return scaledQuotient(4, fluxWm2, 1, 1, Math.PI, angularDiameterRad, angularDiameterRad);
}
