import fc from "fast-check";
import { describe, expect, it } from "vitest";
import fixture from "../../../test/fixtures/photometry.json";
import { AU, L_SUN, S_SUN } from "../../values/constants";
import { distanceFromLuminosityFluxSI, fluxFromLuminositySI, luminosityFromFluxSI } from "./inverse-square";

const rel = (a: number, b: number): number => Math.abs(a - b) / Math.abs(b);
/** Log-uniform double in [10^lo, 10^hi]. */
const logUniform = (lo: number, hi: number) => fc.double({ min: lo, max: hi, noNaN: true }).map((e) => 10 ** e);

describe("inverse-square law", () => {
  it("nominal solar luminosity at 1 au gives the nominal solar constant (IAU 2015 B3)", () => {
    // IAU 2015 B3 defines L☉ᴺ = 4π (1 au)² S☉ᴺ rounded to 3.828e26 W: the rounding of
    // 3.828 in its 4th significant digit is ≤ 0.0005/3.828 = 1.31e-4 relative, so
    // L☉ᴺ/(4π au²) must equal S☉ᴺ = 1361 W m^-2 within that.
    const f = fluxFromLuminositySI(L_SUN, AU);
    expect(rel(f, S_SUN)).toBeLessThan(1.31e-4);
    // and the double computation agrees with mpmath at 50 digits (photometry.py) to a few ulp
    expect(rel(f, fixture.sun.flux_at_1au)).toBeLessThan(4e-16);
  });

  it("luminosity from the nominal solar constant at 1 au recovers L☉ᴺ within its rounding", () => {
    // same IAU 2015 B3 rounding argument: 1.31e-4 relative
    expect(rel(luminosityFromFluxSI(S_SUN, AU), L_SUN)).toBeLessThan(1.31e-4);
  });

  it("distance from L☉ᴺ and S☉ᴺ is 1 au within half the rounding (d ∝ L^1/2)", () => {
    expect(rel(distanceFromLuminosityFluxSI(L_SUN, S_SUN), AU)).toBeLessThan(0.66e-4);
  });

  it("round-trips L → F → L and L,F → d (property)", () => {
    fc.assert(
      fc.property(logUniform(10, 40), logUniform(3, 26), (l, d) => {
        const f = fluxFromLuminositySI(l, d);
        // each path is ≤ 5 correctly rounded operations: 1e-15 relative is generous but meaningful
        expect(rel(luminosityFromFluxSI(f, d), l)).toBeLessThan(1e-15);
        expect(rel(distanceFromLuminosityFluxSI(l, f), d)).toBeLessThan(1e-15);
      }),
    );
  });

  it("flux scales as d^-2 (property)", () => {
    fc.assert(
      fc.property(logUniform(10, 40), logUniform(3, 24), fc.double({ min: 1.001, max: 1000, noNaN: true }), (l, d, k) => {
        const ratio = fluxFromLuminositySI(l, d) / fluxFromLuminositySI(l, k * d);
        expect(rel(ratio, k * k)).toBeLessThan(2e-15);
      }),
    );
  });

  it("handles extreme but representable inputs without overflow", () => {
    // d² would overflow (1e200² = 1e400) but F = L/(4πd²) is representable
    expect(fluxFromLuminositySI(1e300, 1e200)).toBeGreaterThan(0);
    // L/(4πF) overflows (1e600) but d = 1e300/√(4π) = 2.8209479177387814e299 does not (value by hand: 1/√(4π) = 0.28209479177387814)
    expect(rel(distanceFromLuminosityFluxSI(1e300, 1e-300), 2.8209479177387814e299)).toBeLessThan(1e-15);
    expect(() => luminosityFromFluxSI(1e300, 1e200)).toThrow(RangeError);
    expect(() => fluxFromLuminositySI(1e-300, 1e200)).toThrow(/flux is not representable/);
  });

  it("rejects bad input with a RangeError naming the parameter", () => {
    for (const bad of [0, -1, NaN, Infinity, -Infinity]) {
      expect(() => fluxFromLuminositySI(bad, 1)).toThrow(/luminosity/);
      expect(() => fluxFromLuminositySI(1, bad)).toThrow(/distance/);
      expect(() => luminosityFromFluxSI(bad, 1)).toThrow(/flux/);
      expect(() => luminosityFromFluxSI(1, bad)).toThrow(/distance/);
      expect(() => distanceFromLuminosityFluxSI(bad, 1)).toThrow(/luminosity/);
      expect(() => distanceFromLuminosityFluxSI(1, bad)).toThrow(/flux/);
    }
    expect(() => fluxFromLuminositySI(1, -1)).toThrow(RangeError);
  });
});
