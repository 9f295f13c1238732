import { describe, expect, it } from "vitest";
import { equivalentWidthSI, fitPolynomialContinuumSI, lineCentroidSI, lineDepthSI } from "./measure";

const rel = (a: number, b: number): number => Math.abs(a / b - 1);

describe("measurements on analytic spectra", () => {
  const n = 2001;
  const g = new Float64Array(n);
  for (let i = 0; i < n; i++) g[i] = 500e-9 + i * 1e-12;
  const cont = new Float64Array(n).fill(5);

  it("equivalent width of a triangular absorption (trapezoid exact for piecewise-linear data)", () => {
    // depth 0.4 at 501.0 nm falling linearly to 0 at ±100 pm: W = 0.4 × 100 pm.
    const flux = new Float64Array(n);
    for (let i = 0; i < n; i++) {
      const d = Math.max(0, 0.4 * (1 - Math.abs((g[i] as number) - 501e-9) / 100e-12));
      flux[i] = 5 * (1 - d);
    }
    expect(rel(equivalentWidthSI(g, flux, cont, 500.5e-9, 501.5e-9), 0.4 * 100e-12)).toBeLessThan(1e-9);
    expect(Math.abs(lineCentroidSI(g, flux, cont, 500.5e-9, 501.5e-9) - 501e-9)).toBeLessThan(1e-18);
    expect(rel(lineDepthSI(g, flux, cont, 500.5e-9, 501.5e-9), 0.4)).toBeLessThan(1e-9);
  });

  it("polynomial continuum recovers a cubic from line-free regions exactly (to rounding)", () => {
    const flux = new Float64Array(n);
    const x0 = 501e-9;
    for (let i = 0; i < n; i++) {
      const x = ((g[i] as number) - x0) / 1e-9;
      flux[i] = 2 + 0.3 * x - 0.2 * x * x + 0.05 * x * x * x;
      if (Math.abs(x) < 0.1) flux[i] = (flux[i] as number) * 0.5; // a line in the middle
    }
    const out = new Float64Array(n);
    const fit = fitPolynomialContinuumSI(g, flux, [500e-9, 500.8e-9, 501.2e-9, 502e-9], 3, out);
    // Exact cubic data: residuals at rounding level (normal equations on scaled x, cond ~ 1e3).
    expect(fit.rms).toBeLessThan(1e-11);
    const i = 1000; // line centre
    expect(rel(out[i] as number, 2)).toBeLessThan(1e-11);
    // 800 + 800 pm of windows at 1 pm steps, both ends inclusive (floating-point edges ±1 point each)
    expect(Math.abs(fit.count - 1601)).toBeLessThanOrEqual(1);
  });

  it("bad input → RangeError naming the parameter", () => {
    const f = new Float64Array(n).fill(1);
    expect(() => equivalentWidthSI(g, f.subarray(1), cont, 500e-9, 501e-9)).toThrow(/flux/);
    expect(() => equivalentWidthSI(g, f, cont, 501e-9, 500e-9)).toThrow(/hiM/);
    expect(() => equivalentWidthSI(g, f, cont, 400e-9, 400.0001e-9)).toThrow(/window/);
    const badC = cont.slice();
    badC[10] = 0;
    expect(() => lineDepthSI(g, f, badC, 500e-9, 501e-9)).toThrow(/continuum must be finite and > 0/);
    expect(() => lineCentroidSI(g, cont, cont, 500e-9, 501e-9)).toThrow(/centroid is undefined/);
    expect(() => fitPolynomialContinuumSI(g, f, [500e-9], 1, new Float64Array(n))).toThrow(/regionsM/);
    expect(() => fitPolynomialContinuumSI(g, f, [500e-9, 501e-9], 4, new Float64Array(n))).toThrow(/degree/);
  });
});
