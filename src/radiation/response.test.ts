import fc from "fast-check";
import { describe, expect, it } from "vitest";
import typed from "../../test/fixtures/radiation_typed.json";
import { CGS, SI } from "../quantity/system";
import { units } from "../quantity/units";
import { assume, assumeArray, type LengthArray, type Temperature } from "../quantity/index";
import * as K from "./kernels/band-response";
import { bandRadianceWavelength } from "./band";
import { bandMeanRadiance, bandMeanRadianceDerivativeT, type ResponseCurve } from "./response";

const T = (k: number) => assume<Temperature>(k);
const logUniform = (lo: number, hi: number) =>
  fc.double({ min: Math.log(lo), max: Math.log(hi), noNaN: true }).map((u) => Math.exp(u));

/** The fixture's triangle (390–440–490 nm) on a grid of `step` nm, in a system. */
function triangle<S extends "SI" | "CGS">(sys: typeof SI | typeof CGS, step: number): ResponseCurve<S> {
  const nm: number[] = [];
  const r: number[] = [];
  for (let v = 390; v <= 490; v += step) {
    nm.push(v);
    r.push(v <= 440 ? (v - 390) / 50 : (490 - v) / 50);
  }
  return { wavelengths: sys.arrayOf(nm, units.nm) as unknown as LengthArray<S>, response: r };
}
const rows = (typed as unknown as { bandMean: { stepNm: number; T: number; convention: "energy" | "photon"; trapezoid: number; exact: number }[] })
  .bandMean;

describe("band-mean radiance through a typed response curve", () => {
  it("SI: the kernel's number; CGS: the kernel on the grid converted to m, × 10 exactly", () => {
    fc.assert(
      fc.property(logUniform(100, 1e5), fc.constantFrom("energy" as const, "photon" as const), (t, conv) => {
        const cS = triangle<"SI">(SI, 5);
        const cC = triangle<"CGS">(CGS, 5);
        expect(bandMeanRadiance(SI, cS, T(t), conv)).toBe(K.bandMeanRadianceWavelengthSI({ wavelengthsM: cS.wavelengths, response: cS.response }, t, conv));
        const gridM = Float64Array.from(cC.wavelengths, (v) => v / 100);
        expect(bandMeanRadiance(CGS, cC, T(t), conv)).toBe(K.bandMeanRadianceWavelengthSI({ wavelengthsM: gridM, response: cC.response }, t, conv) * 10);
        expect(bandMeanRadianceDerivativeT(CGS, cC, T(t), conv)).toBe(
          K.bandMeanRadianceDerivativeTSI({ wavelengthsM: gridM, response: cC.response }, t, conv) * 10,
        );
      }),
      { numRuns: 40 },
    );
  });

  it("computes exactly the trapezoid sum on the user's grid (mpmath, test/fixtures/radiation_typed.json) to 1e-14", () => {
    // Source: test/fixtures/gen/radiation_typed.py evaluates the same trapezoid sum at 40 digits. Our sum of ≤ 101
    // positive terms, each B_λ ≤ 7e-16 relative, stays within ~1e-15; 1e-14 allows for the CGS ×10 and ÷100 steps.
    for (const row of rows) {
      const v = CGS.valueIn(bandMeanRadiance(CGS, triangle<"CGS">(CGS, row.stepNm), T(row.T), row.convention), units.W_per_m2_sr_nm) * 1e9;
      expect(Math.abs(v / row.trapezoid - 1)).toBeLessThan(1e-14);
    }
  });

  it("trapezoid error against the exact integral (mpmath quad) is second order in the step: ×25 per 5× refinement", () => {
    // Source: the same fixture's "exact" (the response is piecewise linear on every grid, so only B_λ's curvature
    // between grid points contributes). Measured: 1.6e-3 (25 nm), 6.2e-5 (5 nm), 2.5e-6 (1 nm) at 5772 K, energy.
    const errs = new Map<string, number>();
    for (const row of rows) {
      const v = SI.valueIn(bandMeanRadiance(SI, triangle<"SI">(SI, row.stepNm), T(row.T), row.convention), units.W_per_m2_sr_nm) * 1e9;
      errs.set(`${row.stepNm} ${row.T} ${row.convention}`, Math.abs(v / row.exact - 1));
    }
    console.log("band-mean trapezoid error vs exact integral:", Object.fromEntries(errs));
    for (const t of [5772, 3000]) {
      for (const conv of ["energy", "photon"]) {
        const e25 = errs.get(`25 ${t} ${conv}`) as number;
        const e5 = errs.get(`5 ${t} ${conv}`) as number;
        const e1 = errs.get(`1 ${t} ${conv}`) as number;
        // h² scaling: each 5× refinement divides the error by 25 (accept 22–28: the h⁴ term is small)
        expect(e25 / e5).toBeGreaterThan(22);
        expect(e25 / e5).toBeLessThan(28);
        expect(e5 / e1).toBeGreaterThan(22);
        expect(e5 / e1).toBeLessThan(28);
        expect(e1).toBeLessThan(2e-5);
      }
    }
  });

  it("a boxcar response gives the band radiance divided by the band width (CGS), to the trapezoid error", () => {
    // Analytic: ⟨B_λ⟩ over a flat response = ∫B_λ dλ / Δλ = bandRadianceWavelength / Δλ (≤ 1e-15).
    // 400–700 nm at 0.1 nm: trapezoid error ≈ −(h²/12)·[B′]/∫B with h = 1e-8 cm; measured −1.26e-8
    // (and −1.26e-6 at 1 nm: exactly h²). Assert 2e-8.
    const nm = Array.from({ length: 3001 }, (_, i) => 400 + i * 0.1);
    const curve: ResponseCurve<"CGS"> = { wavelengths: CGS.arrayOf(nm, units.nm), response: nm.map(() => 1) };
    const mean = bandMeanRadiance(CGS, curve, T(5772));
    const exact = bandRadianceWavelength(CGS, CGS.of(400, units.nm), CGS.of(700, units.nm), T(5772)) / (CGS.of(300, units.nm) as number);
    expect(Math.abs(mean / exact - 1)).toBeLessThan(2e-8);
  });

  it("∂⟨B⟩/∂T matches a central difference of the typed band mean (CGS)", () => {
    fc.assert(
      fc.property(logUniform(300, 1e5), (t) => {
        const c = triangle<"CGS">(CGS, 5);
        const h = t * 1e-5;
        const fd = (bandMeanRadiance(CGS, c, T(t + h), "photon") - bandMeanRadiance(CGS, c, T(t - h), "photon")) / (2 * h);
        // central difference: truncation ~ (h/T)² × x² ≈ 1e-10 × x², rounding ~ 1e-16/1e-5; x ≤ c₂/(390 nm · T) ≤ 123
        const x = 0.014387768775039339 / (390e-9 * t);
        expect(Math.abs(fd / bandMeanRadianceDerivativeT(CGS, c, T(t), "photon") - 1)).toBeLessThan(1e-9 * (1 + x * x));
      }),
      { numRuns: 30 },
    );
  });
});

describe("a band mean beyond the double range in CGS only", () => {
  it("names the temperature and the CGS unit of the result", () => {
    // Rayleigh–Jeans side at λ ≈ 1e-12 m: B_λ ≈ 2ckT/λ⁴ ≈ 5e307 W m⁻² sr⁻¹ m⁻¹ (finite); ×10 into CGS overflows.
    const t = 5e307 / ((2 * 299792458 * 1.380649e-23) / 1e-48);
    const grid = (xs: number[]) => assumeArray<LengthArray<"CGS">>(new Float64Array(xs));
    const curveSI = { wavelengths: assumeArray<LengthArray<"SI">>(new Float64Array([1e-12, 1.001e-12])), response: [1, 1] };
    expect(Number.isFinite(bandMeanRadiance(SI, curveSI, T(t)))).toBe(true);
    expect(() => bandMeanRadiance(CGS, { wavelengths: grid([1e-10, 1.001e-10]), response: [1, 1] }, T(t))).toThrow(
      `the band-mean radiance overflows the double range in cm^-1 g s^-3 sr^-1 for temperature=${String(t)} K`,
    );
  });
});

describe("invalid curves: RangeError naming the field, the index and the caller's unit", () => {
  const grid = (xs: number[]) => assumeArray<LengthArray<"CGS">>(new Float64Array(xs));
  it("CGS curves are reported in cm", () => {
    expect(() => bandMeanRadiance(CGS, { wavelengths: grid([1e-4, -2e-4]), response: [1, 1] }, T(300))).toThrow(
      "curve.wavelengths[1] must be a finite number > 0 cm; got -0.0002",
    );
    expect(() => bandMeanRadiance(CGS, { wavelengths: grid([2e-4, 1e-4]), response: [1, 1] }, T(300))).toThrow(
      "curve.wavelengths must be strictly increasing; got curve.wavelengths[1] = 0.0001 cm after 0.0002 cm",
    );
    expect(() => bandMeanRadiance(CGS, { wavelengths: grid([1e-4]), response: [1] }, T(300))).toThrow(/at least 2 points/);
    expect(() => bandMeanRadiance(CGS, { wavelengths: grid([1e-4, 2e-4]), response: [1] }, T(300))).toThrow(/curve.response must have the same length/);
    expect(() => bandMeanRadiance(CGS, { wavelengths: grid([1e-4, 2e-4]), response: [1, NaN] }, T(300))).toThrow(/curve.response\[1\]/);
    expect(() => bandMeanRadiance(CGS, { wavelengths: grid([1e-4, 2e-4]), response: [0, 0] }, T(300))).toThrow(/positive somewhere/);
    expect(() => bandMeanRadiance(CGS, { wavelengths: grid([1e-4, 2e-4]), response: [1, 1] }, T(-1))).toThrow(
      "temperature must be a finite number > 0 K; got -1",
    );
    expect(() => bandMeanRadiance(CGS, { wavelengths: grid([1e-4, 2e-4]), response: [1, 1] }, T(300), "bogus" as "energy")).toThrow(/convention/);
  });
  it("SI curves are reported in m; a CGS grid that collapses on conversion to m is caught", () => {
    const gridSI = assumeArray<LengthArray<"SI">>(new Float64Array([1e-6, NaN]));
    expect(() => bandMeanRadiance(SI, { wavelengths: gridSI, response: [1, 1] }, T(300))).toThrow(
      "curve.wavelengths[1] must be a finite number > 0 m; got NaN",
    );
    // 1e-322 and 1.5e-322 cm are distinct subnormals but both round to 0 m
    expect(() => bandMeanRadiance(CGS, { wavelengths: grid([1e-322, 1.5e-322]), response: [1, 1] }, T(300))).toThrow(
      "curve.wavelengths[0] = 1e-322 cm is outside the double range once converted to SI (0 m)",
    );
    // 3e-322 and 3.5e-322 cm are distinct and > 0, but both round to the smallest subnormal, 5e-324 m
    expect(() => bandMeanRadiance(CGS, { wavelengths: grid([3e-322, 3.5e-322]), response: [1, 1] }, T(300))).toThrow(
      "curve.wavelengths[1] = 3.5e-322 cm is not distinct from curve.wavelengths[0] once converted to SI (both 5e-324 m)",
    );
  });
});
