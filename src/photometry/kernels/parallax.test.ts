import fc from "fast-check";
import { describe, expect, it } from "vitest";
import fixture from "../../../test/fixtures/photometry.json";
import { AU, PARSEC } from "../../values/constants";
import {
  distanceFromParallaxExactSI,
  distanceFromParallaxSI,
  distanceUncertaintyFromParallaxSI,
  distanceEstimateFromParallaxSI,
  parallaxFromDistanceExactSI,
  parallaxFromDistanceSI,
} from "./parallax";

const rel = (a: number, b: number): number => Math.abs(a - b) / Math.abs(b);
const MAS = Math.PI / 648000 / 1000;

describe("parallax → distance", () => {
  it("a parallax of 100 mas is 10 pc (definition of the parsec, IAU 2015 B2)", () => {
    // 100 mas in rad carries 2 roundings (π/648000/1000 × 100) and the division 1 more: 4 ulp
    expect(rel(distanceFromParallaxSI(100 * MAS), 10 * PARSEC)).toBeLessThan(4 * 2.3e-16);
  });

  it("matches mpmath exact and small-angle distances (photometry.py)", () => {
    for (const row of fixture.parallax) {
      // the input angle is the fixture's double; both forms are 1–2 operations: 3e-16
      expect(rel(distanceFromParallaxSI(row.p_rad), row.d_small_m)).toBeLessThan(3e-16);
      // tan adds ≤ 1 ulp (V8 fdlibm) plus the rounding of p: 4e-16
      expect(rel(distanceFromParallaxExactSI(row.p_rad), row.d_exact_m)).toBeLessThan(4e-16);
    }
  });

  it("exact and small-angle forms differ by p²/3 (Taylor series of tan), negligible for stars", () => {
    const p = 768.0665 * MAS; // Proxima Centauri's parallax (from memory), the largest stellar one
    const diff = 1 - distanceFromParallaxExactSI(p) / distanceFromParallaxSI(p);
    // expected p²/3 ≈ 4.6e-12; tolerance: the difference of two ~1e-16-accurate numbers
    expect(Math.abs(diff - (p * p) / 3)).toBeLessThan(5e-16);
    // At p = 45° the exact form gives exactly 1 au (tan π/4 = 1 to ~1 ulp)
    expect(rel(distanceFromParallaxExactSI(Math.PI / 4), AU)).toBeLessThan(3e-16);
  });

  it("round-trips distance ↔ parallax (property, log-uniform 1e-3 to 1e6 pc)", () => {
    fc.assert(
      fc.property(fc.double({ min: -3, max: 6, noNaN: true }), (e) => {
        const d = 10 ** e * PARSEC;
        expect(rel(distanceFromParallaxSI(parallaxFromDistanceSI(d)), d)).toBeLessThan(5e-16);
        expect(rel(distanceFromParallaxExactSI(parallaxFromDistanceExactSI(d)), d)).toBeLessThan(1e-15);
      }),
    );
  });

  it("first-order uncertainty σ_d = d σ_p / p", () => {
    // 100 ± 1 mas → 10 pc ± 1 % = 0.1 pc (by hand)
    expect(rel(distanceUncertaintyFromParallaxSI(100 * MAS, 1 * MAS), 0.1 * PARSEC)).toBeLessThan(1e-15);
    expect(distanceUncertaintyFromParallaxSI(100 * MAS, 0)).toBe(0);
  });

  it("flags fractional parallax errors above the threshold (default 0.1)", () => {
    const ok = distanceEstimateFromParallaxSI(10 * MAS, 0.5 * MAS);
    expect(ok.inversionBiased).toBe(false);
    expect(rel(ok.fractionalParallaxError, 0.05)).toBeLessThan(1e-15);
    expect(rel(ok.distanceM, 100 * PARSEC)).toBeLessThan(1e-15);
    expect(rel(ok.sigmaDistanceM, 5 * PARSEC)).toBeLessThan(1e-15);
    expect(distanceEstimateFromParallaxSI(10 * MAS, 1.5 * MAS).inversionBiased).toBe(true);
    expect(distanceEstimateFromParallaxSI(10 * MAS, 1.5 * MAS, 0.2).inversionBiased).toBe(false);
    expect(distanceEstimateFromParallaxSI(10 * MAS, 2.5 * MAS, 0.2).inversionBiased).toBe(true);
  });

  it("rejects p ≤ 0, non-finite values and bad uncertainties, naming the parameter", () => {
    for (const bad of [0, -1e-9, NaN, Infinity, -Infinity]) {
      expect(() => distanceFromParallaxSI(bad)).toThrow(/parallax/);
      expect(() => distanceFromParallaxExactSI(bad)).toThrow(/parallax/);
      expect(() => distanceEstimateFromParallaxSI(bad, 1e-9)).toThrow(/parallax/);
      expect(() => parallaxFromDistanceSI(bad)).toThrow(/distance/);
      expect(() => parallaxFromDistanceExactSI(bad)).toThrow(/distance/);
      expect(() => distanceEstimateFromParallaxSI(1e-8, 1e-9, bad)).toThrow(/threshold/);
    }
    expect(() => distanceFromParallaxExactSI(Math.PI / 2)).toThrow(/parallax must be < π\/2/);
    expect(() => distanceEstimateFromParallaxSI(1e-8, -1e-9)).toThrow(/parallax uncertainty/);
    expect(() => distanceUncertaintyFromParallaxSI(1e-8, NaN)).toThrow(/parallax uncertainty/);
    expect(() => distanceEstimateFromParallaxSI(1e-8, 1e-9)).not.toThrow();
  });
});
