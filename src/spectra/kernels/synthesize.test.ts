import fc from "fast-check";
import { describe, expect, it } from "vitest";
import fx from "../../../test/fixtures/curve-of-growth.json";
import { equivalentWidthSI, lineCentroidSI, lineDepthSI } from "./measure";
import { equivalentWidthFromTau0SI, synthesizeSpectrumSI, tau0FromEquivalentWidthSI } from "./synthesize";

const rel = (a: number, b: number): number => Math.abs(a / b - 1);
const SQRT_PI = Math.sqrt(Math.PI);

function grid(lo: number, step: number, n: number): Float64Array {
  const g = new Float64Array(n);
  for (let i = 0; i < n; i++) g[i] = lo + i * step;
  return g;
}

describe("curve of growth vs mpmath quadrature (fixture curve-of-growth.json)", () => {
  it("W(τ₀, a)/b for τ₀ = 1e-3 … 1e6 and a = 0 … 3 to 2e-9 (measured ≤ 6.1e-10)", () => {
    for (const [tau0, a, wb] of fx.rows as [number, number, number][]) {
      expect(rel(equivalentWidthFromTau0SI(tau0, 1e-11, a * 1e-11) / 1e-11, wb)).toBeLessThan(2e-9);
    }
  });
  it("pure Gaussian: W = b√π Σ (−1)^{k+1} τ₀^k / (k! √k) (series of ∫(1 − e^{−τ₀e^{−u²}}) du)", () => {
    for (const tau0 of [1e-4, 0.05, 0.5, 2]) {
      let s = 0;
      let term = 1;
      for (let k = 1; k < 80; k++) {
        term *= tau0 / k;
        s += ((k % 2 === 1 ? 1 : -1) * term) / Math.sqrt(k);
      }
      // Series summed in double; for τ₀ ≤ 2 the alternating terms are ≤ 2 → ≤ 1e-15 abs.
      expect(rel(equivalentWidthFromTau0SI(tau0, 1, 0), SQRT_PI * s)).toBeLessThan(1e-12);
    }
  });
  it("property: τ₀ → W → τ₀ round trip (root finder) to 1e-8", () => {
    fc.assert(
      fc.property(
        fc.double({ min: Math.log(1e-4), max: Math.log(1e5), noNaN: true }).map(Math.exp),
        fc.oneof(fc.constant(0), fc.double({ min: Math.log(1e-4), max: Math.log(3), noNaN: true }).map(Math.exp)),
        (tau0, a) => {
          const w = equivalentWidthFromTau0SI(tau0, 2e-12, a * 2e-12);
          // W solved to 1e-10 relative; dτ₀/τ₀ = (dW/W)/(dlnW/dlnτ₀) and dlnW/dlnτ₀ ≥ ~0.05
          // over this range (flat part of the curve of growth) → 2e-9; allow 1e-8.
          return rel(tau0FromEquivalentWidthSI(w, 2e-12, a * 2e-12), tau0) < 1e-8;
        },
      ),
      { numRuns: 25 },
    );
  });
});

describe("synthesis", () => {
  it("property: a synthesized weak line's measured equivalent width equals the input W", () => {
    fc.assert(
      fc.property(
        fc.double({ min: Math.log(1e-4), max: Math.log(1e-2), noNaN: true }).map(Math.exp),
        fc.oneof(fc.constant(0), fc.double({ min: Math.log(1e-4), max: Math.log(0.1), noNaN: true }).map(Math.exp)),
        fc.double({ min: -0.5, max: 0.5, noNaN: true }),
        (wOverB, a, shift) => {
          const b = 2e-12;
          const n = 40001;
          const step = b / 8;
          const g = grid(500e-9 - 20000 * step, step, n);
          const cont = new Float64Array(n).fill(3.5);
          const flux = new Float64Array(n);
          const center = 500e-9 + shift * step;
          const W = wOverB * b;
          const tauCutoff = 1e-13;
          const rep = synthesizeSpectrumSI(
            g,
            cont,
            [{ centreM: center, dopplerWidthM: b, lorentzHwhmM: a * b, equivalentWidthM: W }],
            flux,
            { tauCutoff },
          );
          const measured = equivalentWidthSI(g, flux, cont, g[0] as number, g[n - 1] as number);
          // Error budget: (1) the trapezoid on an analytic integrand with step b/8 is exact to
          // ~e^{−(8π)²} — negligible; (2) the Lorentz wings beyond the grid edge L = 2500 b:
          // ∫_{|Δ|>L} τ / ∫ τ ≈ 2a/(π L/b) (weak line, K ≈ a/(√π u²)); (3) the documented
          // truncation bound 2 τ_cut Δ with Δ = 1.1 b max(√ln(τ₀/τ_cut), √(τ₀a/(√π K(0,a) τ_cut)))
          // (K(0,a) ≤ 1 used for the bound); (4) W solved to 1e-10.
          const t0 = rep.tau0[0] as number;
          const delta = 1.1 * b * Math.max(Math.sqrt(Math.log(t0 / tauCutoff)), Math.sqrt((t0 * a) / (SQRT_PI * 0.5 * tauCutoff)));
          const tail = (2 * a) / (Math.PI * 2500);
          const trunc = (2 * tauCutoff * delta) / W;
          return Math.abs(measured / W - 1) < tail * 1.05 + trunc + 1e-9;
        },
      ),
      { numRuns: 20 },
    );
  });

  it("line depth and centroid of a synthesized Gaussian line", () => {
    const b = 1e-11;
    const n = 4001;
    const g = grid(600e-9 - 2000 * (b / 10), b / 10, n);
    const cont = new Float64Array(n).fill(1);
    const flux = new Float64Array(n);
    const center = 600e-9 + 0.37 * (b / 10); // off-grid centre
    synthesizeSpectrumSI(g, cont, [{ centreM: center, gaussianSigmaM: b / Math.SQRT2, lorentzHwhmM: 0, tau0: 0.7 }], flux);
    // Symmetric profile, trapezoid on a fine grid: centroid exact to ≪ step; 1e-4 of a step allowed.
    expect(Math.abs(lineCentroidSI(g, flux, cont, g[0] as number, g[n - 1] as number) - center)).toBeLessThan(1e-4 * (b / 10));
    // Depth at the nearest grid point (0.037 b from centre): 1 − exp(−0.7 e^{−0.037²}).
    expect(rel(lineDepthSI(g, flux, cont, g[0] as number, g[n - 1] as number), 1 - Math.exp(-0.7 * Math.exp(-(0.037 ** 2))))).toBeLessThan(1e-3);
  });

  it("optical depths of overlapping lines add; invalid continuum rows are reported", () => {
    const n = 101;
    const g = grid(1e-6, 1e-12, n);
    const cont = new Float64Array(n).fill(2);
    cont[5] = Number.NaN;
    const one = new Float64Array(n);
    const two = new Float64Array(n);
    const line = { centreM: 1e-6 + 50e-12, dopplerWidthM: 10e-12, lorentzHwhmM: 1e-13, tau0: 0.4 };
    synthesizeSpectrumSI(g, cont, [line], one);
    const r = synthesizeSpectrumSI(g, cont, [line, line], two);
    expect(r.invalid).toEqual([5]);
    expect(r.reasons).toEqual(["continuum must be finite; element 5 is NaN"]);
    expect(r.values).toBe(two);
    expect(two[5]).toBeNaN();
    // exp(−2τ)·2 = (exp(−τ)·2)²/2
    expect(rel(two[50] as number, ((one[50] as number) ** 2) / 2)).toBeLessThan(1e-14);
    // out may alias the continuum
    const c2 = new Float64Array(n).fill(2);
    c2[7] = Infinity;
    const r2 = synthesizeSpectrumSI(g, c2, [line], c2);
    expect(c2[50]).toBe(one[50]);
    // the reason shows the continuum value, read before its row was overwritten
    expect(r2.reasons).toEqual(["continuum must be finite; element 7 is Infinity"]);
  });

  it("bad input → RangeError naming the parameter", () => {
    const g = grid(1e-6, 1e-12, 10);
    const c = new Float64Array(10).fill(1);
    const o = new Float64Array(10);
    expect(() => synthesizeSpectrumSI(g, c, [{ centreM: 1e-6, lorentzHwhmM: 0, tau0: 1 }], o)).toThrow(/lines\[0\] must give exactly one of dopplerWidthM/);
    expect(() => synthesizeSpectrumSI(g, c, [{ centreM: 1e-6, dopplerWidthM: 1e-12, lorentzHwhmM: 0 }], o)).toThrow(/tau0 or equivalentWidthM/);
    expect(() => synthesizeSpectrumSI(g, c, [{ centreM: 1e-6, dopplerWidthM: -1, lorentzHwhmM: 0, tau0: 1 }], o)).toThrow(/lines\[0\]\.dopplerWidthM/);
    expect(() => synthesizeSpectrumSI(g, c, [{ centreM: 1e-6, dopplerWidthM: 1e-12, lorentzHwhmM: 0, tau0: -1 }], o)).toThrow(/lines\[0\]\.tau0/);
    expect(() => synthesizeSpectrumSI(g.slice().reverse(), c, [], o)).toThrow(/wavelengthsM/);
    expect(() => synthesizeSpectrumSI(g, c.subarray(0, 5), [], o)).toThrow(/continuum/);
    expect(() => synthesizeSpectrumSI(g, c, [], o, { tauCutoff: 0 })).toThrow(/tauCutoff/);
    expect(() => tau0FromEquivalentWidthSI(-1, 1, 0)).toThrow(/equivalentWidthM/);
  });
});
