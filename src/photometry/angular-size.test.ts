import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { AU, R_SUN, SIGMA, T_SUN } from "../values/constants";
import type { Angle, Flux, Length, Radiance } from "../quantity/aliases";
import { CGS, SI } from "../quantity/system";
import { times10 } from "../quantity/unit";
import { units } from "../quantity/units";
import {
  angularDiameterDiskSI,
  angularDiameterSmallAngleSI,
  angularDiameterSphereSI,
  solidAngleConeSI,
  surfaceBrightnessSI,
} from "./kernels/angular-size";
import {
  angularDiameter,
  distanceFromAngularDiameter,
  radiusFromAngularDiameter,
  solidAngleFromAngularDiameter,
  surfaceBrightness,
  type AngularGeometry,
} from "./angular-size";

const rel = (a: number, b: number): number => Math.abs(a - b) / Math.abs(b);
const logUniform = (lo: number, hi: number) => fc.double({ min: lo, max: hi, noNaN: true }).map((e) => 10 ** e);
const geometries: AngularGeometry[] = ["sphere", "disk", "small-angle"];

describe("typed angular size", () => {
  it("in SI equals the kernels bit for bit, per geometry", () => {
    const r = SI.of(1, units.Rsun), d = SI.of(1, units.au);
    expect(angularDiameter(SI, r, d)).toBe(angularDiameterSphereSI(R_SUN, AU));
    expect(angularDiameter(SI, r, d, "disk")).toBe(angularDiameterDiskSI(R_SUN, AU));
    expect(angularDiameter(SI, r, d, "small-angle")).toBe(angularDiameterSmallAngleSI(R_SUN, AU));
    expect(solidAngleFromAngularDiameter(SI.of(1, units.deg))).toBe(solidAngleConeSI(Math.PI / 180));
    expect(surfaceBrightness(SI, SI.of(1361, units.W_per_m2), SI.of(0.5, units.deg))).toBe(surfaceBrightnessSI(1361, Math.PI / 360));
  });

  it("angles are system-free: CGS lengths give the same angle (≤ 1 ulp from converting R and d); lengths back in CGS are SI × 100", () => {
    for (const g of geometries) {
      const a = angularDiameter(SI, SI.of(1, units.Rsun), SI.of(1, units.au), g);
      const b = angularDiameter(CGS, CGS.of(1, units.Rsun), CGS.of(1, units.au), g);
      expect(rel(b, a)).toBeLessThan(4.5e-16);
      const rs = radiusFromAngularDiameter(SI, a, SI.of(1, units.au), g);
      expect(radiusFromAngularDiameter(CGS, a, times10(SI.of(1, units.au), 2) as Length<"CGS">, g)).toBe(times10(rs, 2));
    }
  });

  it("the Sun from 1 au: θ = 2 asin(R☉ᴺ/au) = 1918.4623721723203″ (mpmath, 40 digits; IAU 2015 B3 R☉ᴺ, IAU 2012 au)", () => {
    const theta = angularDiameter(SI, SI.of(1, units.Rsun), SI.of(1, units.au));
    // mpmath: 2 asin(6.957e8 / 149597870700) = 0.0093009680472299524999 rad; asin ≤ 1 ulp, division 0.5 ulp
    expect(rel(theta, 0.0093009680472299525)).toBeLessThan(4.5e-16);
    // through the arcsec unit: one more rounding
    expect(rel(SI.valueIn(theta, units.arcsec), 1918.4623721723203)).toBeLessThan(7e-16);
  });

  it("sphere > small angle > disk, by (R/d)²/6 and (R/d)²/3 (Taylor series of asin and atan)", () => {
    const x = 0.01;
    const r = SI.of(x, units.m), d = SI.of(1, units.m);
    const s = angularDiameter(SI, r, d, "sphere"), k = angularDiameter(SI, r, d, "small-angle"), t = angularDiameter(SI, r, d, "disk");
    // next terms are O(x⁴) ≈ 1e-8 relative to the x² terms
    expect(rel(s / k - 1, (x * x) / 6)).toBeLessThan(1e-3);
    expect(rel(1 - t / k, (x * x) / 3)).toBeLessThan(1e-3);
  });

  it("radius and distance invert the angular diameter in each geometry (property; ≤ 1e-14 from libm asin/sin)", () => {
    fc.assert(
      fc.property(logUniform(5, 12), logUniform(1, 12), fc.constantFrom(...geometries), (r, ratio, g) => {
        const d = r * (1 + ratio);
        const theta = angularDiameter(SI, r as Length<"SI">, d as Length<"SI">, g);
        expect(rel(radiusFromAngularDiameter(SI, theta, d as Length<"SI">, g), r)).toBeLessThan(1e-14);
        if (g !== "disk") expect(rel(distanceFromAngularDiameter(SI, theta, r as Length<"SI">, g), d)).toBeLessThan(1e-14);
      }),
    );
  });

  it("surface brightness is a radiance: a Lambertian sphere at T☉ᴺ seen from 1 au gives σT⁴/π × (1 + cos(θ/2))/2", () => {
    // received flux from a uniform sphere: σT⁴ (R/d)² exactly; Ω = 2π(1 − cos(θ/2)) with sin(θ/2) = R/d
    const f = (SIGMA * T_SUN ** 4 * (R_SUN / AU) ** 2) as Flux<"SI">;
    const theta = angularDiameter(SI, SI.of(1, units.Rsun), SI.of(1, units.au));
    const sb: Radiance<"SI"> = surfaceBrightness(SI, f, theta);
    const b = (SIGMA * T_SUN ** 4) / Math.PI;
    // identity F/Ω = B (1 + cos(θ/2))/2; a dozen roundings: 1e-14
    expect(rel(sb, (b * (1 + Math.cos(theta / 2))) / 2)).toBeLessThan(1e-14);
    // CGS: erg s^-1 cm^-2 sr^-1 = 1000 × W m^-2 sr^-1, exactly (flux converts exactly by 10^3 here)
    expect(surfaceBrightness(CGS, times10(f, 3) as Flux<"CGS">, theta)).toBe(times10(sb, 3));
    // small-angle: F/(π(θ/2)²) → σT⁴/π for a sphere whose flux is (θ/2)² σT⁴
    const tiny = SI.of(1, units.mas);
    const ft = (((tiny / 2) ** 2) * SIGMA * T_SUN ** 4) as Flux<"SI">;
    expect(rel(surfaceBrightness(SI, ft, tiny, "small-angle"), b)).toBeLessThan(1e-15);
  });

  it("solid angle of a 1° disk is π/4 square degrees to first order (exact cone: −(θ/2)²/12 · relative)", () => {
    const omega = SI.valueIn(solidAngleFromAngularDiameter(SI.of(1, units.deg)), units.sqdeg);
    const x = Math.PI / 360;
    // 4π sin²(θ/4) / (π(θ/2)²) = 1 − (θ/2)²/12 + …
    expect(rel(omega, (Math.PI / 4) * (1 - (x * x) / 12))).toBeLessThan(1e-9);
    expect(rel(SI.valueIn(solidAngleFromAngularDiameter(SI.of(1, units.deg), "small-angle"), units.sqdeg), Math.PI / 4)).toBeLessThan(1e-15);
  });

  it("errors name the parameter and the caller's unit; an observer inside the sphere is rejected", () => {
    expect(() => angularDiameter(CGS, CGS.of(2, units.m), CGS.of(1, units.m))).toThrow(/^distance must be >= radius .* got distance 100 cm < radius 200 cm$/);
    expect(() => angularDiameter(CGS, CGS.of(2, units.m), CGS.of(1, units.m), "disk")).not.toThrow();
    expect(() => angularDiameter(SI, -1 as Length<"SI">, SI.of(1, units.m))).toThrow(/^radius must be a finite number > 0 m; got -1$/);
    expect(() => radiusFromAngularDiameter(CGS, 4 as Angle, CGS.of(1, units.pc))).toThrow(/^angular diameter must be in \[.*\] rad; got 4$/);
    expect(() => radiusFromAngularDiameter(CGS, Math.PI as Angle, CGS.of(1, units.pc), "disk")).toThrow(/< π rad for a flat disk/);
    expect(() => distanceFromAngularDiameter(CGS, SI.of(1, units.mas), -2 as Length<"CGS">)).toThrow(/^radius must be a finite number > 0 cm; got -2$/);
    expect(() => surfaceBrightness(CGS, -1 as Flux<"CGS">, SI.of(1, units.mas))).toThrow(/^flux must be a finite number > 0 g s\^-3; got -1$/);
    expect(() => angularDiameter(SI, SI.of(1, units.m), SI.of(1, units.m), "cube" as AngularGeometry)).toThrow(/^geometry must be one of/);
  });

  it("range messages give the bounds in rad; a result beyond the double range only in CGS names the caller's unit", () => {
    expect(() => solidAngleFromAngularDiameter(7 as Angle)).toThrow(/^angular diameter must be in \[5e-324, 6\.283185307179586\] rad; got 7$/);
    expect(() => distanceFromAngularDiameter(SI, 0 as Angle, SI.of(1, units.Rsun))).toThrow(/^angular diameter must be a finite number > 0 rad; got 0$/);
    // d < R is checked after each input's own check: an invalid radius is named as such
    expect(() => angularDiameter(CGS, NaN as Length<"CGS">, 1 as Length<"CGS">)).toThrow(/^radius must be a finite number > 0 cm; got NaN$/);
    // d = 2R/θ with R = 1e296 m, θ = 1e-10 rad: 2e306 m fits in SI, 2e308 cm does not
    expect(distanceFromAngularDiameter(SI, 1e-10 as Angle, 1e296 as Length<"SI">, "small-angle")).toBe(2e306);
    expect(() => distanceFromAngularDiameter(CGS, 1e-10 as Angle, 1e298 as Length<"CGS">, "small-angle")).toThrow(
      /^distance overflows the double range in cm for angular diameter=1e-10 rad, radius=1e\+298 cm$/,
    );
  });
});
