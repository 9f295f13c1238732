import fc from "fast-check";
import { describe, expect, it } from "vitest";
import type { Flux, Length, SpectralFluxPerFrequency, SpectralFluxPerWavelength } from "../quantity/aliases";
import { CGS, SI } from "../quantity/system";
import { units } from "../quantity/units";
import { ccm89ExtinctionMagSI, ccm89RatioSI } from "./kernels/extinction";
import {
  aVFromColourExcess,
  CCM89_RV_RANGE,
  ccm89Extinction,
  ccm89Ratio,
  colourExcessFromAV,
  dereddenFlux,
  dereddenMagnitude,
  reddenFlux,
  reddenMagnitude,
  RV_DIFFUSE,
} from "./extinction";
import { magnitudeDifference } from "./magnitudes";

const rel = (a: number, b: number): number => Math.abs(a - b) / Math.abs(b);

describe("typed extinction", () => {
  it("CCM89 at a typed wavelength equals the kernel in SI, and CGS wavelengths give the same ratio (≤ 1 ulp of λ)", () => {
    fc.assert(
      fc.property(fc.double({ min: 0.31, max: 9.9, noNaN: true }), fc.double({ min: 2.6, max: 5.5, noNaN: true }), (x, rv) => {
        const lam = 1e-6 / x;
        expect(ccm89Ratio(SI, lam as Length<"SI">, rv)).toBe(ccm89RatioSI(lam, rv));
        expect(ccm89Extinction(SI, lam as Length<"SI">, 1.5, rv)).toBe(ccm89ExtinctionMagSI(lam, 1.5, rv));
        // λ in cm converts back with ≤ 0.5 ulp; the curve's slope |d ln(A_λ/A_V)/d ln λ| ≲ 3 → ≤ 1e-15 (except near its zero crossing, excluded by R_V ≥ 2.6)
        expect(rel(ccm89Ratio(CGS, (lam * 100) as Length<"CGS">, rv), ccm89RatioSI(lam, rv))).toBeLessThan(1e-15);
      }),
    );
  });

  it("is normalised at V (a = 1, b = 0 at x = 1.82 µm^-1; CCM89) and defaults to R_V = 3.1 (common practice)", () => {
    expect(RV_DIFFUSE).toBe(3.1);
    expect(CCM89_RV_RANGE).toEqual([2.6, 5.5]);
    // λ = 1/1.82 µm: x reproduced to ~1 ulp; da/dx ≈ 0.18 there → 1e-15
    expect(Math.abs(ccm89Ratio(SI, SI.of(1 / 1.82, units.um)) - 1)).toBeLessThan(1e-14);
    expect(ccm89Ratio(SI, SI.of(2.2, units.um))).toBe(ccm89RatioSI(2.2e-6, 3.1));
    expect(ccm89Extinction(CGS, CGS.of(2.2, units.um), 1)).toBeCloseTo(ccm89ExtinctionMagSI(2.2e-6, 1, 3.1), 14);
  });

  it("E(B−V) ↔ A_V with R_V (default 3.1)", () => {
    expect(aVFromColourExcess(0.1)).toBeCloseTo(0.31, 15);
    expect(colourExcessFromAV(0.31)).toBeCloseTo(0.1, 15);
    expect(aVFromColourExcess(0.1, 5)).toBe(0.5);
  });

  it("reddening keeps the quantity's type and system, and dims by exactly A magnitudes (Pogson; property)", () => {
    const fnu: SpectralFluxPerFrequency<"SI"> = reddenFlux(SI.of(100, units.mJy), 5);
    expect(SI.valueIn(fnu, units.mJy)).toBeCloseTo(1, 13);
    const flam: SpectralFluxPerWavelength<"CGS"> = dereddenFlux(CGS.of(1e-13, units.erg_per_s_cm2_A), 2.5);
    expect(rel(CGS.valueIn(flam, units.erg_per_s_cm2_A), 1e-12)).toBeLessThan(1e-15);
    fc.assert(
      fc.property(fc.double({ min: -20, max: 20, noNaN: true }), fc.double({ min: 0, max: 10, noNaN: true }), (e, a) => {
        const f = (10 ** e) as Flux<"CGS">;
        const red = reddenFlux(f, a);
        // m(red) − m(f) = A: 10^(−A/2.5) then log10: ≤ 1e-14 mag
        expect(Math.abs(magnitudeDifference(red, f) - a)).toBeLessThan(1e-14);
        expect(rel(dereddenFlux(red, a), f)).toBeLessThan(1e-14);
        expect(dereddenMagnitude(reddenMagnitude(e, a), a)).toBeCloseTo(e, 13);
      }),
    );
  });

  it("errors name the parameter and the caller's unit; outside 0.1–3.333 µm the law is not extrapolated", () => {
    expect(() => ccm89Ratio(CGS, CGS.of(5, units.um))).toThrow(/^wavelength must be in \[0\.00001, 0\.0003333\d*\] cm \(x = 1\/λ in \[0\.3, 10\] µm\^-1 for the CCM89 law\); got 0\.0005$/);
    expect(() => ccm89Ratio(SI, SI.of(50, units.nm))).toThrow(/^wavelength must be in \[1e-7, 0\.000003333\d*\] m .*; got 5e-8$/);
    expect(() => ccm89Ratio(CGS, -1 as Length<"CGS">)).toThrow(/^wavelength must be a finite number > 0 cm; got -1$/);
    expect(() => ccm89Ratio(SI, SI.of(1, units.um), 0)).toThrow(/^R_V must be a finite number > 0/);
    expect(() => ccm89Extinction(SI, SI.of(1, units.um), NaN)).toThrow(/^A_V must be a finite number mag; got NaN$/);
    expect(() => reddenFlux(SI.of(-1, units.Jy), 1)).toThrow(/^flux must be a finite number > 0/);
  });

  it("the range edges are the CCM89 x = 0.3 and 10 µm^-1 exactly, in SI and CGS; overflow and magnitudes are named in mag", () => {
    // x = 1/λ: λ = 1e-7 m is x = 10, λ = 1e-6/0.3 m is x = 0.3 (both ends inclusive in the paper's fit)
    expect(ccm89Ratio(SI, 1e-7 as Length<"SI">)).toBe(ccm89RatioSI(1e-7, 3.1));
    expect(ccm89Ratio(SI, (1e-6 / 0.3) as Length<"SI">)).toBe(ccm89RatioSI(1e-6 / 0.3, 3.1));
    // 1e-5 cm is 1e-5 / 100 m (one rounding; just inside the range)
    expect(ccm89Ratio(CGS, 1e-5 as Length<"CGS">)).toBe(ccm89RatioSI(1e-5 / 100, 3.1));
    // 1e300 × 10^(25/2.5) = 1e310 is beyond the double range in any unit
    expect(() => dereddenFlux(SI.of(1e300, units.W_per_m2), 25)).toThrow(/^dereddened flux overflows the double range for flux=1e\+300, extinction=25 mag$/);
    expect(() => reddenMagnitude(10, Infinity)).toThrow(/^extinction must be a finite number mag; got Infinity$/);
    expect(() => aVFromColourExcess(NaN)).toThrow(/^E\(B-V\) must be a finite number mag; got NaN$/);
    expect(() => colourExcessFromAV(1, -3.1)).toThrow(/^R_V must be a finite number > 0; got -3\.1$/);
  });
});
