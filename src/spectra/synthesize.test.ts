import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { CGS, SI } from "../quantity/system";
import { times10 } from "../quantity/unit";
import { units } from "../quantity/units";
import { assume, assumeArray } from "../quantity/quantity";
import type {
  DimensionlessArray,
  Length,
  LengthArray,
  SpectralFluxPerWavelengthArray,
  Temperature,
} from "../quantity/aliases";
import { planckRadianceWavelengthBatch } from "../radiation/planck";
import { equivalentWidthSI, lineCentroidSI, lineDepthSI } from "./kernels/measure";
import { equivalentWidthFromTau0SI, synthesizeSpectrumSI, tau0FromEquivalentWidthSI } from "./kernels/synthesize";
import { equivalentWidth, lineCentroid, lineDepth } from "./measure";
import { airWavelength, airWavelengthArray, vacuumWavelength } from "./medium";
import {
  equivalentWidthFromTau0,
  synthesizePlanckSpectrum,
  synthesizeSpectrum,
  tau0FromEquivalentWidth,
  type SynthesisLine,
} from "./synthesize";

const rel = (a: number, b: number): number => Math.abs(a / b - 1);
const SQRT_PI = Math.sqrt(Math.PI);
const lenSI = (x: number) => assume<Length<"SI">>(x);
const lenCGS = (x: number) => assume<Length<"CGS">>(x);

function gridOf(lo: number, step: number, n: number): Float64Array {
  const g = new Float64Array(n);
  for (let i = 0; i < n; i++) g[i] = lo + i * step;
  return g;
}

describe("synthesis: typed = kernel (SI)", () => {
  it("the flux and τ₀ are the kernel's, for τ₀ and W lines, Doppler width and σ", () => {
    const n = 3001;
    const g = gridOf(656e-9, 1e-12, n);
    const cont = new Float64Array(n).map((_, i) => 1e13 * (1 + 1e-4 * i));
    const kernelLines = [
      { centreM: 656.5e-9, dopplerWidthM: 3e-11, lorentzHwhmM: 1e-12, tau0: 2 },
      { centreM: 657.2e-9, gaussianSigmaM: 2e-11, lorentzHwhmM: 0, equivalentWidthM: 1e-12 },
    ];
    const ref = new Float64Array(n);
    const r = synthesizeSpectrumSI(g, cont, kernelLines, ref);
    const typed = synthesizeSpectrum(
      SI,
      assumeArray<LengthArray<"SI">>(g),
      assumeArray<SpectralFluxPerWavelengthArray<"SI">>(cont),
      [
        { center: lenSI(656.5e-9), dopplerWidth: lenSI(3e-11), lorentzHwhm: lenSI(1e-12), tau0: 2 },
        { center: lenSI(657.2e-9), gaussianSigma: lenSI(2e-11), equivalentWidth: lenSI(1e-12) },
      ],
    );
    expect(Array.from(typed.flux)).toEqual(Array.from(ref));
    expect(Array.from(typed.tau0)).toEqual(Array.from(r.tau0));
    expect(typed.invalid).toEqual([]);
    // the inputs are not modified
    expect(cont[0]).toBe(1e13);
  });
  it("curve of growth helpers are the kernel's", () => {
    expect(equivalentWidthFromTau0(SI, 3, lenSI(2e-12), lenSI(1e-13))).toBe(equivalentWidthFromTau0SI(3, 2e-12, 1e-13));
    expect(equivalentWidthFromTau0(SI, 3, lenSI(2e-12))).toBe(equivalentWidthFromTau0SI(3, 2e-12, 0));
    expect(tau0FromEquivalentWidth(SI, lenSI(5e-12), lenSI(2e-12), lenSI(1e-13))).toBe(tau0FromEquivalentWidthSI(5e-12, 2e-12, 1e-13));
    // CGS: a length × 10², τ₀ unchanged (same physical inputs after one scaling each)
    const w = equivalentWidthFromTau0(CGS, 3, lenCGS(2e-10), lenCGS(1e-11));
    expect(rel(w, times10(equivalentWidthFromTau0(SI, 3, lenSI(2e-12), lenSI(1e-13)), 2))).toBeLessThan(1e-14);
    expect(rel(tau0FromEquivalentWidth(CGS, lenCGS(5e-10), lenCGS(2e-10)), tau0FromEquivalentWidth(SI, lenSI(5e-12), lenSI(2e-12)))).toBeLessThan(1e-9);
  });
});

describe("synthesis in CGS", () => {
  it("the same physical spectrum in CGS: continuum × 10^k gives flux × 10^k, the same τ₀", () => {
    const n = 2001;
    const gSI = gridOf(500e-9, 2e-12, n);
    const gCGS = new Float64Array(n).map((_, i) => times10(gSI[i] as number, 2));
    const cSI = new Float64Array(n).fill(2.5e13); // W m⁻² m⁻¹
    const cCGS = new Float64Array(n).fill(times10(2.5e13, -1)); // erg s⁻¹ cm⁻² cm⁻¹ = 10⁻¹ W m⁻² m⁻¹
    const si = synthesizeSpectrum(SI, assumeArray<LengthArray<"SI">>(gSI), assumeArray<SpectralFluxPerWavelengthArray<"SI">>(cSI), [
      { center: lenSI(501e-9), dopplerWidth: lenSI(5e-12), lorentzHwhm: lenSI(5e-14), equivalentWidth: lenSI(4e-12) },
    ]);
    const cgs = synthesizeSpectrum(CGS, assumeArray<LengthArray<"CGS">>(gCGS), assumeArray<SpectralFluxPerWavelengthArray<"CGS">>(cCGS), [
      { center: lenCGS(501e-7), dopplerWidth: lenCGS(5e-10), lorentzHwhm: lenCGS(5e-12), equivalentWidth: lenCGS(4e-10) },
    ]);
    // Each length is rounded once more on the CGS path (cm → m); that moves u = Δλ/b by
    // ~1e-16·λ/b ≈ 1e-11 at most, which changes τ by ≤ |dτ/du|·1e-11 and the flux ratio by
    // ≲ 1e-11; τ₀ from W is solved to 1e-10 relative in W. Tolerances: τ₀ 1e-9, flux 1e-10.
    expect(rel(cgs.tau0[0] as number, si.tau0[0] as number)).toBeLessThan(1e-9);
    let worst = 0;
    for (let i = 0; i < n; i++) worst = Math.max(worst, rel((cgs.flux[i] as number) * 10, si.flux[i] as number));
    expect(worst).toBeLessThan(1e-10);
  });
  it("a synthesized weak line's measured equivalent width equals the input W (typed API, CGS, air grid)", () => {
    fc.assert(
      fc.property(
        fc.double({ min: Math.log(1e-4), max: Math.log(1e-2), noNaN: true }).map(Math.exp),
        fc.oneof(fc.constant(0), fc.double({ min: Math.log(1e-4), max: Math.log(0.1), noNaN: true }).map(Math.exp)),
        fc.double({ min: -0.5, max: 0.5, noNaN: true }),
        (wOverB, a, shift) => {
          const b = 2e-10; // cm (0.02 Å)
          const n = 40001;
          const step = b / 8;
          const grid = airWavelengthArray(CGS, assumeArray<LengthArray<"CGS">>(gridOf(5e-5 - 20000 * step, step, n)));
          const cont = assumeArray<DimensionlessArray>(new Float64Array(n).fill(1));
          const center = airWavelength(CGS, lenCGS(5e-5 + shift * step));
          const W = wOverB * b;
          const tauCutoff = 1e-13;
          const line: SynthesisLine<"CGS", "air"> = { center, dopplerWidth: lenCGS(b), lorentzHwhm: lenCGS(a * b), equivalentWidth: lenCGS(W) };
          const { flux, tau0 } = synthesizeSpectrum(CGS, grid, cont, [line], { tauCutoff });
          const lo = airWavelength(CGS, lenCGS(grid[0] as number));
          const hi = airWavelength(CGS, lenCGS(grid[n - 1] as number));
          const measured = equivalentWidth(CGS, grid, flux, cont, lo, hi);
          // Error budget (as kernels/synthesize.test.ts): the trapezoid at b/8 is exact to
          // ~e^{−(8π)²}; Lorentz wings beyond the grid edge L = 2500 b hold 2a/(πL/b) of W;
          // the documented truncation bound 2 τ_cut Δ / W; W solved to 1e-10; plus the grid
          // round trip cm → m (1e-16 relative per point).
          const t0 = tau0[0] as number;
          const delta = 1.1 * b * Math.max(Math.sqrt(Math.log(t0 / tauCutoff)), Math.sqrt((t0 * a) / (SQRT_PI * 0.5 * tauCutoff)));
          const tail = (2 * a) / (Math.PI * 2500);
          const trunc = (2 * tauCutoff * delta) / W;
          return Math.abs(measured / W - 1) < tail * 1.05 + trunc + 1e-9;
        },
      ),
      { numRuns: 10 },
    );
  });
  it("weak-line limit: W = τ₀ b √π (Gaussian) for τ₀ = 1e-4, through the typed API", () => {
    // W(τ₀) = b√π Σ (−1)^{k+1} τ₀^k/(k! √k) = b√π τ₀ (1 − τ₀/(2√2) + τ₀²/(6√3) − …): two terms
    // leave τ₀²/(6√3) ≈ 1e-9 relative; the quadrature is good to ~1e-10 → tolerance 2e-9
    const w = equivalentWidthFromTau0(CGS, 1e-4, CGS.of(0.03, units.angstrom));
    expect(rel(CGS.valueIn(w, units.angstrom), 1e-4 * 0.03 * SQRT_PI * (1 - 1e-4 / (2 * Math.SQRT2)))).toBeLessThan(2e-9);
    // and the one-term (weak-line) limit is off by τ₀/(2√2) = 3.5e-5: the check above can tell
    expect(rel(CGS.valueIn(w, units.angstrom), 1e-4 * 0.03 * SQRT_PI)).toBeGreaterThan(3e-5);
  });
});

describe("Planck continuum", () => {
  it("the continuum is planckRadianceWavelengthBatch; with no lines the flux equals it", () => {
    const g = CGS.arrayOf(Array.from({ length: 101 }, (_, i) => 4000 + 10 * i), units.angstrom);
    const t = CGS.of(5772, units.K);
    const r = synthesizePlanckSpectrum(CGS, g, t, []);
    const ref = planckRadianceWavelengthBatch(CGS, g, t);
    expect(Array.from(r.continuum)).toEqual(Array.from(ref.values));
    expect(Array.from(r.flux)).toEqual(Array.from(ref.values));
    expect(r.invalid).toEqual([]);
  });
  it("a line on a blackbody: depth 1 − e^{−τ₀} at an on-grid centre, centroid at the centre, rows ≤ 0 reported", () => {
    const n = 2001;
    const step = 0.001; // nm
    const g = SI.arrayOf(Array.from({ length: n }, (_, i) => -0.5 + 655.5 + i * step), units.nm);
    const centreIndex = 1000;
    const center = vacuumWavelength(SI, lenSI(g[centreIndex] as number));
    const r = synthesizePlanckSpectrum(SI, g, assume<Temperature>(9500), [{ center, dopplerWidth: SI.of(0.03, units.nm), tau0: 0.8 }]);
    const lo = SI.of(655.7, units.nm);
    const hi = SI.of(656.3, units.nm);
    // F/F_c at the centre is exp(−τ₀) to rounding (≤ 4 ulp)
    expect(rel(lineDepth(SI, g, r.flux, r.continuum, lo, hi), 1 - Math.exp(-0.8))).toBeLessThan(1e-14);
    // symmetric line on a uniform grid, window symmetric about the centre (±300 steps = ±10 b):
    // the centroid is the centre to rounding of the window sums (≪ 1e-6 of a step)
    expect(Math.abs(lineCentroid(SI, g, r.flux, r.continuum, lo, hi) - center)).toBeLessThan(1e-6 * step * 1e-9);
    // a grid starting at a negative wavelength: B_λ is NaN there and those rows are reported
    const g2 = assumeArray<LengthArray<"SI">>(Float64Array.of(-1e-9, 0, 1e-7, 2e-7));
    const r2 = synthesizePlanckSpectrum(SI, g2, assume<Temperature>(5000), []);
    expect(r2.invalid).toEqual([0, 1]);
    expect(r2.flux[0]).toBeNaN();
  });
});

describe("measurement: typed = kernel (SI), CGS × 10^k", () => {
  const n = 2001;
  const g = gridOf(500e-9, 1e-12, n);
  const cont = new Float64Array(n).fill(5);
  const flux = new Float64Array(n).map((_, i) => 5 * (1 - Math.max(0, 0.4 * (1 - Math.abs((g[i] as number) - 501e-9) / 100e-12))));
  const G = assumeArray<LengthArray<"SI">>(g);
  const F = assumeArray<DimensionlessArray>(flux);
  const Cc = assumeArray<DimensionlessArray>(cont);
  it("equivalent width, centroid, depth in SI are the kernel's numbers", () => {
    expect(equivalentWidth(SI, G, F, Cc, lenSI(500.5e-9), lenSI(501.5e-9))).toBe(equivalentWidthSI(g, flux, cont, 500.5e-9, 501.5e-9));
    expect(lineCentroid(SI, G, F, Cc, lenSI(500.5e-9), lenSI(501.5e-9))).toBe(lineCentroidSI(g, flux, cont, 500.5e-9, 501.5e-9));
    expect(lineDepth(SI, G, F, Cc, lenSI(500.5e-9), lenSI(501.5e-9))).toBe(lineDepthSI(g, flux, cont, 500.5e-9, 501.5e-9));
  });
  it("a triangular line: W = 0.4 × 100 pm, centroid 501 nm, depth 0.4 (trapezoid exact for piecewise-linear data), in CGS", () => {
    const gc = assumeArray<LengthArray<"CGS">>(new Float64Array(n).map((_, i) => times10(g[i] as number, 2)));
    const w = equivalentWidth(CGS, gc, F, Cc, lenCGS(500.5e-7), lenCGS(501.5e-7));
    // sum of 200 trapezoids of ~1e-12 with rounding of the grid differences: ≤ 1e-9 relative
    expect(rel(w, 0.4 * 100e-10)).toBeLessThan(1e-9);
    expect(rel(w, times10(equivalentWidthSI(g, flux, cont, 500.5e-9, 501.5e-9), 2))).toBeLessThan(1e-12);
    expect(Math.abs(lineCentroid(CGS, gc, F, Cc, lenCGS(500.5e-7), lenCGS(501.5e-7)) - 501e-7)).toBeLessThan(1e-16);
    expect(rel(lineDepth(CGS, gc, F, Cc, lenCGS(500.5e-7), lenCGS(501.5e-7)), 0.4)).toBeLessThan(1e-9);
  });
  it("an emission feature has a negative equivalent width", () => {
    const em = assumeArray<DimensionlessArray>(new Float64Array(n).map((_, i) => 10 - (flux[i] as number)));
    expect(equivalentWidth(SI, G, em, Cc, lenSI(500.5e-9), lenSI(501.5e-9))).toBeLessThan(0);
  });
});

describe("bad input: RangeError naming the parameter and the caller's unit", () => {
  const g = assumeArray<LengthArray<"CGS">>(gridOf(1e-4, 1e-10, 10));
  const c = assumeArray<DimensionlessArray>(new Float64Array(10).fill(1));
  it("synthesis lines", () => {
    const bad = (line: unknown) => () => synthesizeSpectrum(CGS, g, c, [line as SynthesisLine<"CGS">]);
    expect(bad({ center: lenCGS(1e-4), tau0: 1 })).toThrow(/^lines\[0\] must give exactly one of dopplerWidth or gaussianSigma \(cm\)$/);
    expect(bad({ center: lenCGS(1e-4), dopplerWidth: lenCGS(1e-10), gaussianSigma: lenCGS(1e-10), tau0: 1 })).toThrow(/exactly one of dopplerWidth/);
    expect(bad({ center: lenCGS(1e-4), dopplerWidth: lenCGS(1e-10) })).toThrow(/^lines\[0\] must give exactly one of tau0 or equivalentWidth$/);
    expect(bad({ center: lenCGS(-1), dopplerWidth: lenCGS(1e-10), tau0: 1 })).toThrow(/^lines\[0\]\.center must be a finite number > 0 cm; got -1$/);
    expect(bad({ center: lenCGS(1e-4), dopplerWidth: lenCGS(0), tau0: 1 })).toThrow(/^lines\[0\]\.dopplerWidth must be a finite number > 0 cm/);
    expect(bad({ center: lenCGS(1e-4), dopplerWidth: lenCGS(1), lorentzHwhm: lenCGS(-1), tau0: 1 })).toThrow(/^lines\[0\]\.lorentzHwhm must be a finite number >= 0 cm/);
    expect(bad({ center: lenCGS(1e-4), dopplerWidth: lenCGS(1), tau0: -1 })).toThrow(/^lines\[0\]\.tau0 must/);
    expect(bad({ center: lenCGS(1e-4), dopplerWidth: lenCGS(1), equivalentWidth: lenCGS(Number.NaN) })).toThrow(/^lines\[0\]\.equivalentWidth must be a finite number >= 0 cm/);
  });
  it("grid, continuum, options", () => {
    const rev = assumeArray<LengthArray<"CGS">>(gridOf(1e-4, 1e-10, 10).reverse());
    expect(() => synthesizeSpectrum(CGS, rev, c, [])).toThrow(/^grid must be finite and strictly increasing \(cm\); element 1 is/);
    expect(() => synthesizeSpectrum(CGS, g, assumeArray<DimensionlessArray>(new Float64Array(3)), [])).toThrow(/^continuum must have length >= 10/);
    expect(() => synthesizeSpectrum(CGS, g, c, [], { tauCutoff: 0 })).toThrow(/tauCutoff/);
    expect(() => synthesizePlanckSpectrum(CGS, g, assume<Temperature>(-5), [])).toThrow(/^temperature must/);
    expect(() => equivalentWidthFromTau0(CGS, -1, lenCGS(1))).toThrow(/^tau0 must/);
    expect(() => tau0FromEquivalentWidth(CGS, lenCGS(1), lenCGS(0))).toThrow(/^dopplerWidth must be a finite number > 0 cm/);
  });
  it("measurement windows and arrays", () => {
    expect(() => equivalentWidth(CGS, g, c, c, lenCGS(2e-4), lenCGS(1e-4))).toThrow(/^hi must be greater than lo \(0\.0002\) cm; got 0\.0001$/);
    expect(() => equivalentWidth(CGS, g, c, c, lenCGS(0), lenCGS(1e-5))).toThrow(/^the window \[lo, hi\] = \[0, 0\.00001\] cm must contain at least 2 grid points; got 0$/);
    expect(() => lineDepth(CGS, g, c, c, lenCGS(Number.NaN), lenCGS(1))).toThrow(/^lo must be a finite number cm/);
    expect(() => lineDepth(CGS, g, assumeArray<DimensionlessArray>(new Float64Array(3)), c, lenCGS(0), lenCGS(1))).toThrow(/^flux must have the grid length 10/);
    const zero = assumeArray<DimensionlessArray>(new Float64Array(10));
    expect(() => lineDepth(CGS, g, c, zero, lenCGS(0), lenCGS(1))).toThrow(/^continuum must be finite and > 0 in the window/);
    expect(() => lineCentroid(CGS, g, c, c, lenCGS(0), lenCGS(1))).toThrow(/centroid is undefined/);
  });
});

describe("batch reasons and messages in the caller's unit", () => {
  it("a row whose continuum is not finite is reported with a reason; values is the flux", () => {
    const g = assumeArray<LengthArray<"CGS">>(gridOf(1e-4, 1e-10, 5));
    const c = assumeArray<DimensionlessArray>(Float64Array.of(1, 1, Number.NaN, 1, Infinity));
    const r = synthesizeSpectrum(CGS, g, c, []);
    expect(r.invalid).toEqual([2, 4]);
    expect(r.reasons).toEqual(["continuum must be finite on the grid; element 2 is NaN", "continuum must be finite on the grid; element 4 is Infinity"]);
    expect(r.values).toBe(r.flux);
  });
  it("on a Planck continuum the reasons are the Planck batch's", () => {
    const g = assumeArray<LengthArray<"CGS">>(Float64Array.of(-1e-7, 0, 1e-5, 2e-5));
    const r = synthesizePlanckSpectrum(CGS, g, assume<Temperature>(5000), []);
    const planck = planckRadianceWavelengthBatch(CGS, g, assume<Temperature>(5000));
    expect(r.invalid).toEqual([0, 1]);
    expect(r.reasons).toEqual(planck.reasons);
    expect(r.reasons).toEqual(["wavelength must be a finite number > 0 cm; got -1e-7", "wavelength must be a finite number > 0 cm; got 0"]);
  });
  it("CGS messages for lines, options and measurements", () => {
    const g = assumeArray<LengthArray<"CGS">>(gridOf(1e-4, 1e-10, 10));
    const c = assumeArray<DimensionlessArray>(new Float64Array(10).fill(1));
    const line = { center: lenCGS(1e-4), dopplerWidth: lenCGS(1e-10), tau0: -1 } as SynthesisLine<"CGS">;
    expect(() => synthesizeSpectrum(CGS, g, c, [line])).toThrow(/^lines\[0\]\.tau0 must be a finite number >= 0; got -1$/);
    expect(() => synthesizeSpectrum(CGS, g, c, [], { tauCutoff: 0 })).toThrow(/^options\.tauCutoff must be a finite number > 0; got 0$/);
    expect(() => equivalentWidthFromTau0(CGS, 1, lenCGS(1), lenCGS(-2))).toThrow(/^lorentzHwhm must be a finite number >= 0 cm; got -2$/);
    expect(() => lineCentroid(CGS, g, c, c, lenCGS(0), lenCGS(1))).toThrow(/^flux has no deficit against continuum in \[lo, hi\] = \[0, 1\] cm: the centroid is undefined$/);
    const badFlux = assumeArray<DimensionlessArray>(new Float64Array(10).fill(1));
    badFlux[3] = Number.NaN;
    expect(() => equivalentWidth(CGS, g, badFlux, c, lenCGS(0), lenCGS(1))).toThrow(/^flux must be finite in the window; element 3 is NaN$/);
    expect(() => synthesizeSpectrum(CGS, assumeArray<LengthArray<"CGS">>(Float64Array.of(1, 2, Number.NaN)), c, [])).toThrow(/^grid must be finite and strictly increasing \(cm\); element 2 is NaN$/);
  });
});
