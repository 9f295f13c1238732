import fc from "fast-check";
import { describe, expect, it } from "vitest";
import typed from "../../test/fixtures/radiation_typed.json";
import { CGS, SI } from "../quantity/system";
import { units } from "../quantity/units";
import { assume, assumeArray, type Length, type LengthArray, type SpectralFluxPerWavelength, type Temperature } from "../quantity/index";
import * as K from "./kernels/colour-temperature";
import {
  colourTemperatureFromBandRatio,
  colourTemperatureFromRatio,
  colourTemperatureFromSpectralDensities,
  colourTemperatureRange,
} from "./colour-temperature";
import { planckRadianceWavelength } from "./planck";
import { logPlanckRadianceWavelengthSI } from "./kernels/planck";
import { bandMeanRadiance, type ResponseCurve } from "./response";

const logUniform = (lo: number, hi: number) =>
  fc.double({ min: Math.log(lo), max: Math.log(hi), noNaN: true }).map((u) => Math.exp(u));
const T = (k: number) => assume<Temperature>(k);
const cm = (v: number) => assume<Length<"CGS">>(v);
const m = (v: number) => assume<Length<"SI">>(v);
const g = (x: number) => x / -Math.expm1(-x);

describe("colour temperature from a monochromatic ratio", () => {
  it("matches mpmath's root for B_λ(440 nm)/B_λ(550 nm) = 1.2 (test/fixtures/radiation_typed.json), SI and CGS", () => {
    // Source: mpmath findroot at 40 digits. Condition number 1/(g(x₁) − g(x₂)) ≈ 1.15 at 7125 K, so a few ulp in
    // ln ρ (rounding of the two ln B) give ≲ 1e-15 in T; 1e-13 allows for the CGS ÷100 of both wavelengths.
    const c = typed.colourTemperature;
    const tS = colourTemperatureFromRatio(SI, m(c.lambda1), m(c.lambda2), c.ratio);
    const tC = colourTemperatureFromRatio(CGS, CGS.of(440, units.nm), CGS.of(550, units.nm), c.ratio);
    expect(Math.abs(tS / c.T - 1)).toBeLessThan(1e-13);
    expect(Math.abs(tC / c.T - 1)).toBeLessThan(1e-13);
  });

  it("SI: the kernel's number; CGS: the kernel on λ/100", () => {
    fc.assert(
      fc.property(logUniform(1e-5, 1e-1), logUniform(1.05, 3), logUniform(100, 1e6), (l1cm, k, t) => {
        const l2cm = l1cm * k;
        const b1 = planckRadianceWavelength(CGS, cm(l1cm), T(t));
        const b2 = planckRadianceWavelength(CGS, cm(l2cm), T(t));
        if (b1 < 1e-290 || b2 < 1e-290) return; // keep the ratio a normal double
        const r = b1 / b2;
        expect(colourTemperatureFromRatio(CGS, cm(l1cm), cm(l2cm), r)).toBe(K.colourTemperatureFromRatioSI(l1cm / 100, l2cm / 100, r));
        expect(colourTemperatureFromRatio(SI, m(l1cm / 100), m(l2cm / 100), r)).toBe(K.colourTemperatureFromRatioSI(l1cm / 100, l2cm / 100, r));
      }),
      { numRuns: 60 },
    );
  });

  it("round-trips T → ratio of typed B_λ → T (CGS), to the conditioning of the ratio", () => {
    fc.assert(
      fc.property(logUniform(1e-5, 1e-1), logUniform(1.05, 3), logUniform(10, 1e7), (l1cm, k, t) => {
        const l2cm = l1cm * k;
        const b1 = planckRadianceWavelength(CGS, cm(l1cm), T(t));
        const b2 = planckRadianceWavelength(CGS, cm(l2cm), T(t));
        if (b1 < 1e-290 || b2 < 1e-290) return;
        const got = colourTemperatureFromSpectralDensities(CGS, cm(l1cm), b1, cm(l2cm), b2);
        // An error δ in ln ρ maps to δ/s in ln T, s = d ln ρ/d ln T = g(x₁) − g(x₂) (→ 0 towards Rayleigh–Jeans).
        // δ: the typed B_λ values (≤ 7e-16 each from the kernel, plus ≤ 0.5 ulp of λ ÷ 100 times |d ln B/d ln λ| ≤ 5 + x,
        // plus ×10) and the ratio: ≤ 2(1.3e-15 + 1.1e-16·x); and the solver's own ln B (each ~|ln B|·1.1e-16,
        // as in kernels/colour-temperature.test.ts): (|ln B₁| + |ln B₂|)·2.2e-16. Brent stops within 6e-15 in ln T.
        const x1 = 1.4387768775039338 / (l1cm * t);
        const s = g(x1) - g(x1 / k);
        const lnB = Math.abs(logPlanckRadianceWavelengthSI(l1cm / 100, t)) + Math.abs(logPlanckRadianceWavelengthSI((l1cm * k) / 100, t));
        const delta = 2 * (1.3e-15 + 1.1e-16 * x1) + lnB * 2.2e-16;
        expect(Math.abs(Math.log(got / t))).toBeLessThan(delta / s + 1e-14);
      }),
      { numRuns: 80 },
    );
  });

  it("the wrapper's reachability test is the kernel's: it throws exactly when the kernel would", () => {
    fc.assert(
      fc.property(logUniform(1e-7, 1e-3), logUniform(1.05, 3), logUniform(1e-300, 1e300), (l1, k, r) => {
        let kernelThrew = false;
        try {
          K.colourTemperatureFromRatioSI(l1, l1 * k, r);
        } catch {
          kernelThrew = true;
        }
        let typedThrew = false;
        try {
          colourTemperatureFromRatio(SI, m(l1), m(l1 * k), r);
        } catch {
          typedThrew = true;
        }
        expect(typedThrew).toBe(kernelThrew);
      }),
      { numRuns: 200 },
    );
  });

  it("a ratio no blackbody produces → RangeError giving the achievable range, wavelengths in cm", () => {
    // T → ∞ limit of B_λ(λ₁)/B_λ(λ₂) is (λ₂/λ₁)⁴ = 16 for λ₂ = 2λ₁ (Rayleigh–Jeans): 20 is unreachable
    expect(() => colourTemperatureFromRatio(CGS, cm(1e-4), cm(2e-4), 20)).toThrow(
      /^ratio 20 is not produced by any blackbody between 0\.01 K and 10000000000 K: B_λ\(0\.0001 cm\)\/B_λ\(0\.0002 cm\) ranges from 0 \(at 0\.01 K\) to 15\.99\d+ \(at 10000000000 K\)$/,
    );
    expect(() => colourTemperatureFromRatio(CGS, cm(1e-4), cm(1e-4), 1)).toThrow(
      "wavelength2 must differ from wavelength1 (0.0001 cm); got 0.0001 cm, where the ratio is always 1",
    );
    expect(() => colourTemperatureFromRatio(CGS, cm(-1), cm(1e-4), 1)).toThrow("wavelength1 must be a finite number > 0 cm; got -1");
    expect(() => colourTemperatureFromRatio(CGS, cm(1e-4), cm(2e-4), 0)).toThrow(/^ratio must be a finite number > 0/);
    expect(colourTemperatureRange.min).toBe(K.COLOUR_TEMPERATURE_MIN_K);
    expect(colourTemperatureRange.max).toBe(K.COLOUR_TEMPERATURE_MAX_K);
  });

  it("F_λ densities give the same temperature as their ratio, and bad densities name the caller's units", () => {
    const f1 = CGS.of(3.1e-9, units.erg_per_s_cm2_A);
    const f2 = CGS.of(2.4e-9, units.erg_per_s_cm2_A);
    const l1 = CGS.of(440, units.nm);
    const l2 = CGS.of(550, units.nm);
    expect(colourTemperatureFromSpectralDensities(CGS, l1, f1, l2, f2)).toBe(colourTemperatureFromRatio(CGS, l1, l2, f1 / f2));
    expect(() => colourTemperatureFromSpectralDensities(CGS, l1, assume<SpectralFluxPerWavelength<"CGS">>(-1), l2, f2)).toThrow(
      "density1 must be a finite number > 0 cm^-1 g s^-3 (or cm^-1 g s^-3 sr^-1); got -1",
    );
  });
});

describe("colour temperature from two band-mean radiances", () => {
  const tri = (centreNm: number, halfNm: number): ResponseCurve<"CGS"> => ({
    wavelengths: CGS.arrayOf([centreNm - halfNm, centreNm - halfNm / 2, centreNm, centreNm + halfNm / 2, centreNm + halfNm], units.nm),
    response: [0, 0.5, 1, 0.5, 0],
  });
  const bandB = tri(440, 50);
  const bandV = tri(550, 50);

  it("round-trips T → typed band-mean ratio → T in CGS (energy and photon)", () => {
    fc.assert(
      fc.property(logUniform(300, 1e6), fc.constantFrom("energy" as const, "photon" as const), (t, conv) => {
        const r = bandMeanRadiance(CGS, bandB, T(t), conv) / bandMeanRadiance(CGS, bandV, T(t), conv);
        const got = colourTemperatureFromBandRatio(CGS, bandB, bandV, r, conv);
        // as the kernel's test: s ≥ ~0.1 for these bands up to 1e6 K → ≤ 1e-12 in ln T, growing towards RJ
        expect(Math.abs(Math.log(got / t))).toBeLessThan(1e-11 * (1 + t / 1e4));
      }),
      { numRuns: 40 },
    );
  });

  it("equals the kernel on the grids converted to m", () => {
    const toSI = (c: ResponseCurve<"CGS">) => ({ wavelengthsM: Float64Array.from(c.wavelengths, (v) => v / 100), response: c.response });
    expect(colourTemperatureFromBandRatio(CGS, bandB, bandV, 1.1, "photon")).toBe(K.colourTemperatureFromBandRatioSI(toSI(bandB), toSI(bandV), 1.1, "photon"));
  });

  it("unreachable ratios and invalid curves → RangeError naming the band and the caller's unit", () => {
    expect(() => colourTemperatureFromBandRatio(CGS, bandB, bandV, 1e6)).toThrow(
      /^ratio 1000000 is not produced by any blackbody between 0\.01 K and 10000000000 K: ⟨B_λ⟩\(band1\)\/⟨B_λ⟩\(band2\) \(energy counting\) ranges from/,
    );
    const bad: ResponseCurve<"CGS"> = { wavelengths: assumeArray<LengthArray<"CGS">>(new Float64Array([5e-5, 4e-5])), response: [1, 1] };
    expect(() => colourTemperatureFromBandRatio(CGS, bandB, bad, 1)).toThrow(
      "band2.wavelengths must be strictly increasing; got band2.wavelengths[1] = 0.00004 cm after 0.00005 cm",
    );
    expect(() => colourTemperatureFromBandRatio(CGS, bandB, bandV, NaN)).toThrow(/^ratio must be a finite number > 0/);
  });
});
