import fc from "fast-check";
import { describe, expect, it } from "vitest";
import fixture from "../../../test/fixtures/photometry.json";
import { AU, R_SUN, S_SUN, SIGMA } from "../../values/constants";
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
} from "./angular-size";

const rel = (a: number, b: number): number => Math.abs(a - b) / Math.abs(b);
const logUniform = (lo: number, hi: number) => fc.double({ min: lo, max: hi, noNaN: true }).map((e) => 10 ** e);

describe("angular size", () => {
  it("the Sun at 1 au in the three geometries matches mpmath (photometry.py)", () => {
    // asin/atan are ≤ 1 ulp in V8; with the quotient: 3e-16
    expect(rel(angularDiameterSphereSI(R_SUN, AU), fixture.sun.theta_sphere_1au)).toBeLessThan(3e-16);
    expect(rel(angularDiameterDiskSI(R_SUN, AU), fixture.sun.theta_disk_1au)).toBeLessThan(3e-16);
    expect(rel(angularDiameterSmallAngleSI(R_SUN, AU), fixture.sun.theta_small_1au)).toBeLessThan(3e-16);
  });

  it("sphere and disk bracket the small-angle form by (R/d)²/6 and −(R/d)²/3", () => {
    const x = R_SUN / AU; // 4.65e-3
    const x2 = x * x;
    const small = angularDiameterSmallAngleSI(R_SUN, AU);
    // Taylor series asin(x)/x = 1 + x²/6 + 3x⁴/40 + …, atan(x)/x = 1 − x²/3 + x⁴/5 − …;
    // omitted x⁶ terms are ~x⁴ ≈ 5e-10 relative to the x² term, and rounding of the
    // ~1e-5 differences is ~3e-16/1e-5 = 3e-11: tolerance 1e-9
    expect(rel(angularDiameterSphereSI(R_SUN, AU) / small - 1, x2 / 6 + (3 * x2 * x2) / 40)).toBeLessThan(1e-9);
    expect(rel(angularDiameterDiskSI(R_SUN, AU) / small - 1, -x2 / 3 + (x2 * x2) / 5)).toBeLessThan(1e-9);
  });

  it("limits: a sphere touched from its surface spans π; a disk at d = R spans π/2", () => {
    expect(angularDiameterSphereSI(1, 1)).toBe(Math.PI);
    expect(rel(angularDiameterDiskSI(1, 1), Math.PI / 2)).toBeLessThan(3e-16);
  });

  it("round-trips R ↔ θ ↔ d in all geometries (property)", () => {
    fc.assert(
      fc.property(logUniform(3, 12), logUniform(0.01, 8), (r, k) => {
        const d = r * (1 + k); // d > R
        const ts = angularDiameterSphereSI(r, d);
        expect(rel(radiusFromAngularDiameterSphereSI(ts, d), r)).toBeLessThan(2e-15);
        expect(rel(distanceFromAngularDiameterSphereSI(ts, r), d)).toBeLessThan(2e-15);
        const td = angularDiameterDiskSI(r, d);
        expect(rel(radiusFromAngularDiameterDiskSI(td, d), r)).toBeLessThan(2e-15);
        const tsm = angularDiameterSmallAngleSI(r, d);
        expect(rel(radiusFromAngularDiameterSmallAngleSI(tsm, d), r)).toBeLessThan(5e-16);
        expect(rel(distanceFromAngularDiameterSmallAngleSI(tsm, r), d)).toBeLessThan(5e-16);
      }),
    );
  });

  it("solid angles: hemisphere 2π, full sphere 4π, Sun matches mpmath, small-angle limit", () => {
    expect(rel(solidAngleConeSI(Math.PI), 2 * Math.PI)).toBeLessThan(3e-16);
    expect(rel(solidAngleConeSI(2 * Math.PI), 4 * Math.PI)).toBeLessThan(3e-16);
    // cancellation-free form: full precision at the Sun's 9.3 mrad (2π(1−cos) would lose ~5 digits)
    expect(rel(solidAngleConeSI(fixture.sun.theta_sphere_1au), fixture.sun.omega_cone_1au)).toBeLessThan(5e-16);
    // Ω_cone/Ω_small = 1 − θ²/48 + …
    const t = 1e-3;
    expect(rel(solidAngleConeSI(t) / solidAngleSmallAngleSI(t), 1 - (t * t) / 48)).toBeLessThan(1e-13);
  });

  it("surface brightness of the Sun matches mpmath; a blackbody sphere gives σT⁴/π in the small-angle form", () => {
    expect(rel(surfaceBrightnessSI(S_SUN, fixture.sun.theta_sphere_1au), fixture.sun.surface_brightness_1au)).toBeLessThan(5e-16);
    fc.assert(
      fc.property(logUniform(3, 5), logUniform(-12, -5), (temp, theta) => {
        const flux = (theta / 2) ** 2 * SIGMA * temp ** 4; // small-angle flux of a uniformly bright sphere
        expect(rel(surfaceBrightnessSmallAngleSI(flux, theta), (SIGMA * temp ** 4) / Math.PI)).toBeLessThan(3e-15);
        // exact-cone version differs by 1 + O(θ²)
        expect(rel(surfaceBrightnessSI(flux, theta), (SIGMA * temp ** 4) / Math.PI)).toBeLessThan(3e-15 + theta * theta);
      }),
    );
  });

  it("rejects bad input, naming the parameter", () => {
    for (const bad of [0, -1, NaN, Infinity]) {
      expect(() => angularDiameterSphereSI(bad, 1)).toThrow(/radius/);
      expect(() => angularDiameterSphereSI(1, bad)).toThrow(/distance/);
      expect(() => angularDiameterDiskSI(bad, 1)).toThrow(/radius/);
      expect(() => angularDiameterSmallAngleSI(1, bad)).toThrow(/distance/);
      expect(() => radiusFromAngularDiameterSphereSI(bad, 1)).toThrow(/angular diameter/);
      expect(() => radiusFromAngularDiameterDiskSI(1e-3, bad)).toThrow(/distance/);
      expect(() => distanceFromAngularDiameterSmallAngleSI(1e-3, bad)).toThrow(/radius/);
      expect(() => solidAngleConeSI(bad)).toThrow(/angular diameter/);
      expect(() => surfaceBrightnessSI(bad, 1e-3)).toThrow(/flux/);
      expect(() => surfaceBrightnessSmallAngleSI(1, bad)).toThrow(/angular diameter/);
    }
    expect(() => angularDiameterSphereSI(2, 1)).toThrow(/distance must be >= radius/);
    expect(() => radiusFromAngularDiameterSphereSI(4, 1)).toThrow(/angular diameter/);
    expect(() => radiusFromAngularDiameterDiskSI(Math.PI, 1)).toThrow(/angular diameter/);
  });
});
