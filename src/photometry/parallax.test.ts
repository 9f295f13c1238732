import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { PARSEC } from "../values/constants";
import type { Angle, Length } from "../quantity/aliases";
import { CGS, SI } from "../quantity/system";
import { times10 } from "../quantity/unit";
import { units } from "../quantity/units";
import { distanceFromParallaxExactSI, distanceFromParallaxSI, distanceEstimateFromParallaxSI } from "./kernels/parallax";
import {
  distanceFromParallax,
  distanceFromParallaxExact,
  distanceEstimateFromParallax,
  parallaxFromDistance,
  parallaxFromDistanceExact,
  PARALLAX_BIAS_THRESHOLD,
} from "./parallax";

const rel = (a: number, b: number): number => Math.abs(a - b) / Math.abs(b);
const logUniform = (lo: number, hi: number) => fc.double({ min: lo, max: hi, noNaN: true }).map((e) => 10 ** e);

describe("typed parallax", () => {
  it("a parallax of 100 mas is 10 pc (IAU 2015 B2 parsec = (648000/π) au), to the last bit", () => {
    const d = distanceFromParallax(SI, SI.of(100, units.mas));
    expect(SI.valueIn(d, units.pc)).toBe(10);
    expect(d).toBe(10 * PARSEC);
    expect(CGS.valueIn(distanceFromParallax(CGS, CGS.of(100, units.mas)), units.pc)).toBe(10);
  });

  it("mas, arcsec and µas are units of one typed angle: the same parallax gives the same distance (≤ 1 ulp from unit rounding)", () => {
    const a = distanceFromParallax(SI, SI.of(0.1, units.arcsec));
    const b = distanceFromParallax(SI, SI.of(100, units.mas));
    const c = distanceFromParallax(SI, SI.of(1e5, units.uas));
    expect(rel(a, b)).toBeLessThanOrEqual(2.3e-16);
    expect(rel(c, b)).toBeLessThanOrEqual(2.3e-16);
  });

  it("in SI equals the kernels bit for bit; in CGS it is exactly SI × 100 (property)", () => {
    fc.assert(
      fc.property(logUniform(-12, -3), (p) => {
        const ds = distanceFromParallax(SI, p as Angle);
        expect(ds).toBe(distanceFromParallaxSI(p));
        expect(distanceFromParallax(CGS, p as Angle)).toBe(times10(ds, 2));
        expect(distanceFromParallaxExact(SI, p as Angle)).toBe(distanceFromParallaxExactSI(p));
        expect(distanceFromParallaxExact(CGS, p as Angle)).toBe(times10(distanceFromParallaxExactSI(p), 2));
      }),
    );
  });

  it("exact and usual forms differ by the relative p²/3 of tan p vs p (series of tan)", () => {
    const p = SI.of(1, units.deg);
    const exact = distanceFromParallaxExact(SI, p);
    const usual = distanceFromParallax(SI, p);
    const x = Math.PI / 180;
    // usual/exact = tan x / x = 1 + x²/3 + 2x⁴/15 + 17x⁶/315 + … (Taylor series of tan): the omitted
    // term is 1.5e-8 of the kept ones at x = 1°, and the doubles add ~2e-12 relative: 1e-7
    expect(rel(usual / exact - 1, (x * x) / 3 + (2 * x ** 4) / 15)).toBeLessThan(1e-7);
    // and at 1 au the exact parallax is 45° (tan π/4 = 1)
    expect(rel(parallaxFromDistanceExact(SI, SI.of(1, units.au)), Math.PI / 4)).toBeLessThan(2.3e-16);
  });

  it("parallax from distance inverts distance from parallax, in both systems (property; two roundings)", () => {
    fc.assert(
      fc.property(logUniform(13, 25), (d) => {
        const ps = parallaxFromDistance(SI, d as Length<"SI">);
        expect(rel(distanceFromParallax(SI, ps), d)).toBeLessThan(4.5e-16);
        const pc = parallaxFromDistance(CGS, (d * 100) as Length<"CGS">);
        expect(rel(pc, ps)).toBeLessThan(4.5e-16);
        expect(rel(distanceFromParallaxExact(SI, parallaxFromDistanceExact(SI, d as Length<"SI">)), d)).toBeLessThan(1e-15);
      }),
    );
    expect(SI.valueIn(parallaxFromDistance(SI, SI.of(10, units.pc)), units.mas)).toBeCloseTo(100, 12);
  });

  it("flags inversion bias above σ_p/p = 0.1 by default (common practice; Lutz & Kelker 1973), or above the given threshold", () => {
    expect(PARALLAX_BIAS_THRESHOLD).toBe(0.1);
    const biased = distanceEstimateFromParallax(SI, SI.of(2, units.mas), SI.of(0.5, units.mas));
    expect(biased.inversionBiased).toBe(true);
    expect(biased.fractionalParallaxError).toBeCloseTo(0.25, 15);
    expect(biased.threshold).toBe(0.1);
    expect(SI.valueIn(biased.distance, units.pc)).toBeCloseTo(500, 10);
    const fine = distanceEstimateFromParallax(CGS, CGS.of(20, units.mas), CGS.of(1, units.mas));
    expect(fine.inversionBiased).toBe(false);
    // σ_d = d σ_p/p = 50 pc × 0.05 = 2.5 pc, in cm
    expect(rel(CGS.valueIn(fine.sigmaDistance, units.pc), 2.5)).toBeLessThan(1e-15);
    expect(distanceEstimateFromParallax(SI, SI.of(20, units.mas), SI.of(1, units.mas), { threshold: 0.04 }).inversionBiased).toBe(true);
    // zero uncertainty is allowed and gives σ_d = 0
    expect(distanceEstimateFromParallax(CGS, CGS.of(20, units.mas), CGS.of(0, units.mas)).sigmaDistance).toBe(0);
    // and in SI the fields equal the kernel's
    const k = distanceEstimateFromParallaxSI(SI.of(2, units.mas), SI.of(0.5, units.mas));
    expect(biased.distance).toBe(k.distanceM);
    expect(biased.sigmaDistance).toBe(k.sigmaDistanceM);
  });

  it("errors name the parameter, value and unit", () => {
    expect(() => distanceFromParallax(SI, SI.of(-1, units.mas))).toThrow(/^parallax must be a finite number > 0 rad; got -4\.8/);
    expect(() => distanceFromParallaxExact(CGS, CGS.of(90, units.deg))).toThrow(/^parallax must be in \[5e-324, 1\.5707963267948963\] rad \(the exact geometry needs p < π\/2 rad\); got 1\.5707963267948966$/);
    expect(() => parallaxFromDistance(CGS, -5 as Length<"CGS">)).toThrow(/^distance must be a finite number > 0 cm; got -5$/);
    expect(() => distanceEstimateFromParallax(SI, SI.of(1, units.mas), SI.of(-1, units.mas))).toThrow(/^parallax uncertainty must be a finite number >= 0 rad/);
    expect(() => distanceEstimateFromParallax(SI, SI.of(1, units.mas), SI.of(0.1, units.mas), { threshold: 0 })).toThrow(/^threshold must be in/);
    // a distance that does not fit in CGS (AU / 5e-324 rad overflows in metres already)
    expect(() => distanceFromParallax(CGS, 5e-324 as Angle)).toThrow(/^distance overflows the double range in cm for parallax=5e-324 rad$/);
  });
});

