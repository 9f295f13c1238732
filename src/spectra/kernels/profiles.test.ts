import fc from "fast-check";
import { describe, expect, it } from "vitest";
import fx from "../../../test/fixtures/faddeeva.json";
import { gaussianProfileSI, lorentzianProfileSI, voigtProfileSI, voigtProfilesSI } from "./profiles";

const rel = (a: number, b: number): number => Math.abs(a / b - 1);
const logUniform = (lo: number, hi: number) =>
  fc.double({ min: Math.log(lo), max: Math.log(hi), noNaN: true }).map((x) => Math.exp(x));

/** ∫ f over ℝ with x = s tan θ (θ ∈ (−π/2, π/2)), composite Simpson with n intervals. */
function integrateReal(f: (x: number) => number, s: number, n: number): number {
  const lo = -Math.PI / 2;
  const h = Math.PI / n;
  let acc = 0;
  for (let i = 1; i < n; i++) {
    const t = lo + i * h;
    const c = Math.cos(t);
    acc += (i % 2 === 1 ? 4 : 2) * f(s * Math.tan(t)) * (s / (c * c));
  }
  // endpoints: the integrand tends to (Lorentz tail) γ/(π s)·… — included via the limit below
  return (acc * h) / 3;
}

describe("Voigt profile vs scipy.special.voigt_profile (fixture faddeeva.json)", () => {
  it("matches to 1e-9 (both implementations are good to ~1e-12; w requirement is 1e-6)", () => {
    for (const [x, sigma, gamma, v] of fx.voigt as [number, number, number, number][]) {
      expect(rel(voigtProfileSI(x, Math.SQRT2 * sigma, gamma), v)).toBeLessThan(1e-9);
    }
  });
});

describe("normalization and limits", () => {
  it("Gaussian and Lorentzian: peak values", () => {
    expect(rel(gaussianProfileSI(0, 2), 1 / (2 * Math.sqrt(Math.PI)))).toBeLessThan(1e-15);
    expect(rel(lorentzianProfileSI(2, 2), 1 / (4 * Math.PI))).toBeLessThan(1e-15);
  });
  it("property: ∫ V dx = 1 (Simpson on x = s tan θ, 4000 intervals)", () => {
    fc.assert(
      fc.property(logUniform(1e-3, 1e3), logUniform(1e-4, 1e4), (b, ratio) => {
        const g = b * ratio;
        const s = b + g;
        // The endpoint contribution of the Lorentz wing, lim f(s tanθ) s sec²θ = γ/(π s),
        // is added via the Simpson endpoint weights (h/3 each end).
        const h = Math.PI / 4000;
        const area = integrateReal((x) => voigtProfileSI(x, b, g), s, 4000) + ((2 * g) / (Math.PI * s)) * (h / 3);
        // Simpson error for this smooth integrand is far below 1e-7; tolerance 1e-6.
        return Math.abs(area - 1) < 1e-6;
      }),
      { numRuns: 40 },
    );
  });
  it("property: γ → 0 gives the Gaussian (a = γ/b = 1e-9)", () => {
    fc.assert(
      fc.property(logUniform(1e-6, 1e6), fc.double({ min: -3, max: 3, noNaN: true }), (b, u) => {
        const v = voigtProfileSI(u * b, b, 1e-9 * b);
        // First order in a: |∂K/∂a| = (2/√π)|1 − 2u·D(u)| ≤ 2/√π, so |V − G|/G ≤ a·(2/√π)·e^{u²}
        // ≤ 2e-9·e^{u²} (≈ 2e-5 at |u| = 3).
        return rel(v, gaussianProfileSI(u * b, b)) < 2e-9 * Math.exp(u * u) + 1e-12;
      }),
    );
  });
  it("property: Gaussian width → 0 gives the Lorentzian (relative difference O((b/γ)²))", () => {
    fc.assert(
      fc.property(logUniform(1e-6, 1e6), fc.double({ min: -100, max: 100, noNaN: true }), (g, u) => {
        const v = voigtProfileSI(u * g, 1e-5 * g, g);
        // Convolution with a narrow Gaussian: relative change ~ (b/γ)²·(3u²−1)/(1+u²)²/2 ≤ 1e-10.
        return rel(v, lorentzianProfileSI(u * g, g)) < 1e-9;
      }),
    );
    expect(voigtProfileSI(3, 0, 2)).toBe(lorentzianProfileSI(3, 2));
    expect(voigtProfileSI(3, 2, 0)).toBe(gaussianProfileSI(3, 2));
  });
  it("batch matches scalar and reports non-finite offsets", () => {
    const out = new Float64Array(3);
    const r = voigtProfilesSI(Float64Array.of(0.5, Number.NaN, -2), 1, 0.2, out);
    expect(r.invalid).toEqual([1]);
    expect(() => voigtProfileSI(Number.NaN, 1, 0.2)).toThrow(new RangeError(r.reasons[0]));
    expect(out[0]).toBe(voigtProfileSI(0.5, 1, 0.2));
    expect(out[2]).toBe(voigtProfileSI(-2, 1, 0.2));
  });
});

describe("bad input", () => {
  it("non-positive or non-finite widths → RangeError naming the width", () => {
    expect(() => gaussianProfileSI(0, 0)).toThrow(/dopplerWidth/);
    expect(() => lorentzianProfileSI(0, -1)).toThrow(/lorentzHwhm/);
    expect(() => voigtProfileSI(0, -1, 1)).toThrow(/dopplerWidth/);
    expect(() => voigtProfileSI(0, 0, 0)).toThrow(/lorentzHwhm/);
    expect(() => voigtProfileSI(Number.NaN, 1, 1)).toThrow(/offset/);
    expect(() => voigtProfilesSI(new Float64Array(2), 1, Number.NaN, new Float64Array(2))).toThrow(/lorentzHwhm/);
  });
});
