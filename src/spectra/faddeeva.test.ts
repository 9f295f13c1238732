import fc from "fast-check";
import { describe, expect, it } from "vitest";
import plane from "../../test/fixtures/faddeeva-plane.json";
import { faddeeva } from "./faddeeva";

const rows = plane.w as [number, number, number, number, number][];

/** Worst errors of the exported w(z) over the fixture, split by half-plane. */
function sweep(): { upperRe: number; upperIm: number; lower: number; nonFinite: number; thrown: number } {
  let upperRe = 0;
  let upperIm = 0;
  let lower = 0;
  let nonFinite = 0;
  let thrown = 0;
  for (const [x, y, re, im, scale] of rows) {
    let w: { re: number; im: number };
    try {
      w = faddeeva({ re: x, im: y });
    } catch {
      thrown++;
      continue;
    }
    if (!Number.isFinite(w.re) || !Number.isFinite(w.im)) nonFinite++;
    if (y >= 0) {
      // Re w relative (0 only where the true value underflows: then it must be 0 or a subnormal)
      const eRe = re === 0 ? Math.abs(w.re) / Number.MIN_VALUE : Math.abs(w.re - re) / Math.abs(re);
      const mod = Math.hypot(re, im);
      const s = Math.abs(im) > 1e-10 * mod ? Math.abs(im) : mod;
      const eIm = s === 0 ? Math.abs(w.im) : Math.abs(w.im - im) / s;
      // a true value in the subnormal range carries only its own absolute precision
      upperRe = Math.max(upperRe, Math.abs(re) < 2.2250738585072014e-308 ? Math.abs(w.re - re) / 2.2250738585072014e-308 * 1e-16 : eRe);
      upperIm = Math.max(upperIm, eIm);
    } else {
      lower = Math.max(lower, Math.hypot(w.re - re, w.im - im) / scale);
    }
  }
  return { upperRe, upperIm, lower, nonFinite, thrown };
}

describe("faddeeva(z) over the whole plane vs mpmath (faddeeva-plane.json, 60 digits)", () => {
  const r = sweep();
  it("the reference is converged (40 vs 60 digits)", () => {
    expect(plane.max_rel_precision_check).toBeLessThan(1e-25);
    expect(rows.length).toBeGreaterThan(15000);
  });
  it("every fixture point (all representable) gives a finite answer, no throw", () => {
    expect(r.thrown).toBe(0);
    expect(r.nonFinite).toBe(0);
  });
  it("upper half-plane: Re w ≤ 5e-12 relative, Im w ≤ 1e-12 relative where not negligible (doc figures)", () => {
    expect(r.upperRe).toBeLessThan(5e-12);
    expect(r.upperIm).toBeLessThan(1e-12);
  });
  it("lower half-plane: error ≤ 1e-13 of 2|e^{−z²}| + |w(−z)| (doc figure)", () => {
    expect(r.lower).toBeLessThan(1e-13);
  });
});

describe("faddeeva(z): special values and identities", () => {
  it("w(0) = 1 exactly", () => {
    expect(faddeeva({ re: 0, im: 0 })).toEqual({ re: 1, im: 0 });
  });
  it("w(i) = erfcx(1) = 0.427 583 576 155 807 (from memory, A&S table 7.1; 15 digits → 1e-14)", () => {
    const w = faddeeva({ re: 0, im: 1 });
    expect(Math.abs(w.re / 0.427583576155807 - 1)).toBeLessThan(1e-14);
    expect(w.im).toBe(0);
  });
  it("real axis: Re w(x) = e^{−x²}; Im w(1) = (2/√π) D(1), Dawson D(1) = 0.538 079 506 912 768 (from memory, A&S table 7.5)", () => {
    const w = faddeeva({ re: 1, im: 0 });
    expect(Math.abs(w.re / Math.exp(-1) - 1)).toBeLessThan(1e-15);
    expect(Math.abs(w.im / ((2 / Math.sqrt(Math.PI)) * 0.538079506912768) - 1)).toBeLessThan(1e-14);
  });
  it("negative imaginary axis: w(−iy) = 2e^{y²} − erfcx(y) (A&S 7.1.11), e.g. y = 1", () => {
    const w = faddeeva({ re: 0, im: -1 });
    expect(Math.abs(w.re / (2 * Math.E - 0.427583576155807) - 1)).toBeLessThan(1e-14);
    expect(w.im).toBe(0);
  });
  it("|z| → ∞: w ~ i/(√π z); at z = 1e300 (1 + i) the answer is finite and exact to rounding", () => {
    const w = faddeeva({ re: 1e300, im: 1e300 });
    // i/(√π z) = (1 + i)/(2√π · 1e300)
    const v = 1 / (2 * Math.sqrt(Math.PI) * 1e300);
    expect(Math.abs(w.re / v - 1)).toBeLessThan(4e-16);
    expect(Math.abs(w.im / v - 1)).toBeLessThan(4e-16);
    const far = faddeeva({ re: Number.MAX_VALUE, im: 0 });
    expect(far.re).toBe(0);
    expect(far.im).toBeGreaterThan(0);
  });
  it("lower half-plane at |x| = |y| ≳ 1e154 (the phase 2xy overflows a double): |w| = 2 to rounding", () => {
    for (const t of [1e160, 1e250, 1e300]) {
      const w = faddeeva({ re: t, im: -t });
      expect(Math.abs(Math.hypot(w.re, w.im) - 2)).toBeLessThan(1e-13);
    }
  });
  it("throws a RangeError naming z.im when |w| overflows, and z.re / z.im for non-finite parts", () => {
    expect(() => faddeeva({ re: 0, im: -27 })).toThrow(/z\.im = -27/);
    expect(() => faddeeva({ re: Number.NaN, im: 0 })).toThrow(/z\.re must be a finite number/);
    expect(() => faddeeva({ re: 0, im: Infinity })).toThrow(/z\.im must be a finite number/);
    // just inside: y² − x² = 26² = 676 < 709
    expect(Number.isFinite(faddeeva({ re: 0, im: -26 }).re)).toBe(true);
  });
  it("property: symmetry w(−z̄) = conj w(z) over the whole plane (exact)", () => {
    fc.assert(
      fc.property(fc.double({ min: -1e6, max: 1e6, noNaN: true }), fc.double({ min: -20, max: 1e6, noNaN: true }), (x, y) => {
        const a = faddeeva({ re: x, im: y });
        const b = faddeeva({ re: -x, im: y });
        return a.re === b.re && a.im === -b.im;
      }),
    );
  });
  it("property: reflection w(z) + w(−z) = 2e^{−z²} for |z| ≤ 6 (to 1e-12 of the terms)", () => {
    fc.assert(
      fc.property(fc.double({ min: -4, max: 4, noNaN: true }), fc.double({ min: -4, max: 4, noNaN: true }), (x, y) => {
        const a = faddeeva({ re: x, im: y });
        const b = faddeeva({ re: -x, im: -y });
        const m = Math.exp(y * y - x * x);
        const er = 2 * m * Math.cos(-2 * x * y);
        const ei = 2 * m * Math.sin(-2 * x * y);
        const scale = Math.hypot(a.re, a.im) + Math.hypot(b.re, b.im);
        return Math.hypot(a.re + b.re - er, a.im + b.im - ei) <= 1e-12 * scale;
      }),
    );
  });
  it("property: derivative identity w′ = −2zw + 2i/√π (DLMF 7.10), by central differences, |z| ≤ 5, y ≥ 0", () => {
    fc.assert(
      fc.property(fc.double({ min: -5, max: 5, noNaN: true }), fc.double({ min: 0.05, max: 5, noNaN: true }), (x, y) => {
        const h = 1e-5;
        const p = faddeeva({ re: x + h, im: y });
        const m = faddeeva({ re: x - h, im: y });
        const w = faddeeva({ re: x, im: y });
        const dr = (p.re - m.re) / (2 * h);
        const di = (p.im - m.im) / (2 * h);
        const er = -2 * (x * w.re - y * w.im);
        const ei = -2 * (x * w.im + y * w.re) + 2 / Math.sqrt(Math.PI);
        // central difference error ~ h²|w‴|/6 plus rounding 1e-16/h
        return Math.hypot(dr - er, di - ei) < 1e-8;
      }),
    );
  });
});
