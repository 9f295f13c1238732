import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { colourTemperatureFromBandRatioSI, colourTemperatureFromRatioSI } from "./colour-temperature";
import { planckRadianceWavelengthSI, logPlanckRadianceWavelengthSI } from "./planck";
import { bandMeanRadianceWavelengthSI, lnBandMeanUnchecked, responseWeights } from "./band-response";

const logUniform = (lo: number, hi: number) =>
  fc.double({ min: Math.log(lo), max: Math.log(hi), noNaN: true }).map((u) => Math.exp(u));

describe("colour temperature from a monochromatic ratio", () => {
  it("round-trips T → ratio → T (tolerance from the conditioning of the ratio)", () => {
    fc.assert(
      // T up to 1e9 K: within rounding of the 1e10 K end of the search range a deep-RJ ratio may fall
      // just outside the bracket and is (correctly) rejected.
      fc.property(logUniform(1e-7, 1e-3), logUniform(1.05, 3), logUniform(1e-2, 1e9), (l1, k, T) => {
        const l2 = l1 * k;
        const lnB1 = logPlanckRadianceWavelengthSI(l1, T);
        const lnB2 = logPlanckRadianceWavelengthSI(l2, T);
        const lnR = lnB1 - lnB2;
        if (Math.abs(lnR) > 700) return; // the ratio itself would not be a normal double
        const got = colourTemperatureFromRatioSI(l1, l2, Math.exp(lnR));
        // d ln ρ / d ln T = x₁/(1−e^−x₁) − x₂/(1−e^−x₂) =: s. An error δ in ln ρ — rounding of the two
        // ln B values, each ~|ln B|·1.1e-16, plus exp/log of the ratio — maps to δ/s in ln T.
        // Near RJ, s → (x₁ − x₂)/2 → 0: the ratio carries almost no temperature information.
        const x1 = 0.014387768775039339 / (l1 * T);
        const x2 = x1 / k;
        const g = (x: number) => x / -Math.expm1(-x);
        const s = g(x1) - g(x2);
        const tol = ((Math.abs(lnB1) + Math.abs(lnB2) + 4) * 2.2e-16) / s + 1e-14;
        expect(Math.abs(Math.log(got / T))).toBeLessThan(tol);
      }),
    );
  });
  it("a 6000 K ratio at 440/550 nm gives 6000 K", () => {
    const r = planckRadianceWavelengthSI(440e-9, 6000) / planckRadianceWavelengthSI(550e-9, 6000);
    expect(Math.abs(colourTemperatureFromRatioSI(440e-9, 550e-9, r) / 6000 - 1)).toBeLessThan(1e-13);
  });
  it("a ratio no blackbody produces → RangeError stating the achievable range", () => {
    // T → ∞ limit of B_λ(λ₁)/B_λ(λ₂) is (λ₂/λ₁)⁴ = 16 for λ₂ = 2λ₁: 20 is unreachable
    expect(() => colourTemperatureFromRatioSI(1e-6, 2e-6, 20)).toThrow(RangeError);
    expect(() => colourTemperatureFromRatioSI(1e-6, 2e-6, 20)).toThrow(/not produced by any blackbody/);
    expect(() => colourTemperatureFromRatioSI(1e-6, 1e-6, 1)).toThrow(/wavelength2/);
  });
  it.each([0, -1, NaN, Infinity])("bad input %s → RangeError naming the parameter", (v) => {
    expect(() => colourTemperatureFromRatioSI(v, 1e-6, 1)).toThrow(/wavelength1/);
    expect(() => colourTemperatureFromRatioSI(1e-6, v, 1)).toThrow(/wavelength2/);
    expect(() => colourTemperatureFromRatioSI(1e-6, 2e-6, v)).toThrow(/ratio/);
  });
});

describe("colour temperature from two band fluxes", () => {
  const tri = (c: number, w: number) => ({ wavelengthsM: [c - w, c - w / 2, c, c + w / 2, c + w], response: [0, 0.5, 1, 0.5, 0] });
  const bandB = tri(440e-9, 50e-9);
  const bandV = tri(550e-9, 50e-9);
  it("round-trips T → band ratio → T (energy and photon conventions)", () => {
    fc.assert(
      fc.property(logUniform(300, 1e6), fc.constantFrom("energy" as const, "photon" as const), (T, conv) => {
        const r = bandMeanRadianceWavelengthSI(bandB, T, conv) / bandMeanRadianceWavelengthSI(bandV, T, conv);
        const got = colourTemperatureFromBandRatioSI(bandB, bandV, r, conv);
        // same conditioning argument as the monochromatic case; s ≥ ~0.1 here → 1e-12 in ln T for T ≤ 1e6 K
        expect(Math.abs(Math.log(got / T))).toBeLessThan(1e-11 * (1 + T / 1e4));
      }),
      { numRuns: 40 },
    );
  });
  it("works where the band means themselves underflow (log-sum-exp): T = 30 K", () => {
    // At 30 K both band means are ~e^−1000 (below the double range) but their ratio ~e^−200 is normal.
    const T = 30;
    expect(bandMeanRadianceWavelengthSI(bandB, T)).toBe(0);
    const lnR = lnBandMeanUnchecked(bandB.wavelengthsM, responseWeights(bandB, "energy"), T) -
      lnBandMeanUnchecked(bandV.wavelengthsM, responseWeights(bandV, "energy"), T);
    expect(lnR).toBeLessThan(-100);
    const got = colourTemperatureFromBandRatioSI(bandB, bandV, Math.exp(lnR), "energy");
    // s = d ln ρ/d ln T ≈ |lnR| here, rounding of lnR (~|lnR|·4e-16) → ~4e-16 in ln T; allow 1e-13
    expect(Math.abs(Math.log(got / T))).toBeLessThan(1e-13);
  });
  it("unreachable band ratio → RangeError", () => {
    expect(() => colourTemperatureFromBandRatioSI(bandB, bandV, 1e6)).toThrow(/not produced/);
  });
});
