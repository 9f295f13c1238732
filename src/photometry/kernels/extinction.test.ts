import fc from "fast-check";
import { describe, expect, it } from "vitest";
import fixture from "../../../test/fixtures/ccm89.json";
import {
  aVFromColourExcess,
  ccm89AInverseMicron,
  ccm89BInverseMicron,
  ccm89ExtinctionMagSI,
  ccm89RatioInverseMicron,
  ccm89RatioSI,
  colourExcessFromAV,
  dereddenFlux,
  dereddenMagnitude,
  reddenFlux,
  reddenMagnitude,
} from "./extinction";

const rel = (a: number, b: number): number => Math.abs(a - b) / Math.abs(b);

describe("CCM89 extinction law (Cardelli, Clayton & Mathis 1989, ApJ 345, 245, eqs. 2–5)", () => {
  it("matches an independent mpmath evaluation of the same law (ccm89.py; checks the implementation)", () => {
    let worst = 0;
    for (const row of fixture.rows) {
      const a = ccm89AInverseMicron(row.x_inv_um);
      const b = ccm89BInverseMicron(row.x_inv_um);
      // Horner in doubles vs exact power sums: error ≲ 8 terms × ulp of the largest term (≲ 15)
      // → absolute 1e-14 (a and b are O(1)–O(20))
      expect(Math.abs(a - row.a)).toBeLessThan(1e-14);
      expect(Math.abs(b - row.b)).toBeLessThan(1e-14);
      for (const rv of fixture.rv) {
        const got = ccm89RatioInverseMicron(row.x_inv_um, Number(rv));
        const want = row.ratio[rv as keyof typeof row.ratio];
        worst = Math.max(worst, Math.abs(got - want));
        expect(Math.abs(got - want)).toBeLessThan(1e-14);
      }
    }
    expect(worst).toBeLessThan(1e-14);
  });

  it("is normalised at V: a(1.82) = 1, b(1.82) = 0, so A_V/A_V = 1 for any R_V (CCM89 construction)", () => {
    expect(ccm89AInverseMicron(1.82)).toBe(1);
    expect(ccm89BInverseMicron(1.82)).toBe(0);
    // at λ = 0.549 µm (x = 1.8215, y ≈ 0.0015) the ratio is 1 within the slope × Δy:
    // |da/dy| ≈ 0.18, |db/dy|/R_V ≤ 1.41/2.6 → |Δ| ≤ 0.72 × 0.0015 ≈ 1.1e-3
    for (const rv of [2.6, 3.1, 4.0, 5.5]) expect(Math.abs(ccm89RatioSI(0.549e-6, rv) - 1)).toBeLessThan(1.2e-3);
  });

  it("gives A_B/A_V ≈ 1 + 1/R_V at B (x ≈ 2.27, where CCM89's a ≈ b ≈ 1, from memory)", () => {
    // a(2.27) = 0.99975, b(2.27) = 1.0068 (fixture); the definition R_V = A_V/E(B−V) implies
    // A_B/A_V = 1 + 1/R_V exactly for the band pair; the fit reproduces it to ~0.01
    for (const rv of [2.6, 3.1, 4.0, 5.5]) expect(Math.abs(ccm89RatioInverseMicron(2.27, rv) - (1 + 1 / rv))).toBeLessThan(0.01);
  });

  it("its pieces join continuously at x = 1.1, 3.3 and 8 µm⁻¹ (validates the remembered coefficients)", () => {
    // The published law is continuous to the precision of its printed coefficients;
    // a mis-remembered coefficient would typically break continuity by ≫ 1e-2.
    // Measured jumps: 3e-4 (a) and 1.9e-3 (b) at 1.1; 2e-4 at 3.3; 1e-4 and 3e-4 at 8.
    const eps = 1e-12;
    for (const [x, tol] of [[1.1, 2.5e-3], [3.3, 5e-4], [8, 5e-4]] as const) {
      expect(Math.abs(ccm89AInverseMicron(x - eps) - ccm89AInverseMicron(x))).toBeLessThan(tol);
      expect(Math.abs(ccm89BInverseMicron(x - eps) - ccm89BInverseMicron(x + eps))).toBeLessThan(tol);
    }
    // F_a, F_b switch on at x = 5.9 with zero value and zero slope: continuous to rounding
    expect(Math.abs(ccm89AInverseMicron(5.9 - 1e-12) - ccm89AInverseMicron(5.9))).toBeLessThan(1e-11);
  });

  it("reproduces the tabulated near-infrared/optical A_λ/A_V for R_V = 3.1 (CCM89 Table 3, from memory)", () => {
    // Table values printed to 3 decimals; the band effective wavelengths are also from
    // memory (R 0.70, I 0.90, J 1.25, H 1.60, K 2.20 µm), so allow 2 units of the last digit.
    const table: readonly (readonly [number, number])[] = [
      [0.7e-6, 0.751],
      [0.9e-6, 0.479],
      [1.25e-6, 0.282],
      [1.6e-6, 0.19],
      [2.2e-6, 0.114],
    ];
    for (const [lam, want] of table) expect(Math.abs(ccm89RatioSI(lam, 3.1) - want)).toBeLessThan(0.002);
  });

  it("has the 2175 Å bump: a local maximum of A_λ/A_V near x ≈ 4.6 µm⁻¹ (R_V = 3.1)", () => {
    const f = (x: number) => ccm89RatioInverseMicron(x, 3.1);
    expect(f(4.6)).toBeGreaterThan(f(4.0));
    expect(f(4.6)).toBeGreaterThan(f(5.3));
  });

  // For R_V ≳ 5.4 the optical polynomial flattens and turns over slightly
  // near x ≈ 3 µm⁻¹ (at R_V = 5.5: A/A_V = 1.30507 at x = 2.95, 1.30109 at
  // x = 3.20), a known feature of the CCM 1989 fit for large R_V, so the
  // monotonicity property is stated for 2.6 ≤ R_V ≤ 5.3.
  it("is monotone increasing with x through the IR and optical for 2.6 ≤ R_V ≤ 5.3 (property)", () => {
    fc.assert(
      fc.property(fc.double({ min: 0.3, max: 3.28, noNaN: true }), fc.double({ min: 2.6, max: 5.3, noNaN: true }), (x, rv) => {
        expect(ccm89RatioInverseMicron(x + 0.01, rv)).toBeGreaterThan(ccm89RatioInverseMicron(x, rv));
      }),
    );
  });

  it("agrees between the wavelength and inverse-micron forms, and scales with A_V", () => {
    expect(rel(ccm89RatioSI(2.2e-6, 3.1), ccm89RatioInverseMicron(1 / 2.2, 3.1))).toBeLessThan(1e-15);
    expect(rel(ccm89ExtinctionMagSI(0.44e-6, 2, 3.1), 2 * ccm89RatioSI(0.44e-6, 3.1))).toBeLessThan(1e-15);
  });

  it("rejects x outside [0.3, 10] µm⁻¹ and λ outside [0.1, 3.333] µm, and bad R_V", () => {
    for (const x of [0.29, 10.01, 0, -1, NaN, Infinity]) {
      expect(() => ccm89AInverseMicron(x)).toThrow(/inverse wavelength x/);
      expect(() => ccm89RatioInverseMicron(x, 3.1)).toThrow(/inverse wavelength x/);
    }
    for (const lam of [0.09e-6, 3.4e-6]) expect(() => ccm89RatioSI(lam, 3.1)).toThrow(/wavelength must be in/);
    for (const lam of [0, -1, NaN, Infinity]) expect(() => ccm89RatioSI(lam, 3.1)).toThrow(/wavelength/);
    expect(ccm89RatioInverseMicron(0.3, 3.1)).toBeGreaterThan(0);
    expect(ccm89RatioInverseMicron(10, 3.1)).toBeGreaterThan(0);
    for (const rv of [0, -3.1, NaN, Infinity]) expect(() => ccm89RatioSI(0.55e-6, rv)).toThrow(/R_V/);
    expect(() => ccm89ExtinctionMagSI(0.55e-6, NaN, 3.1)).toThrow(/A_V/);
  });
});

describe("reddening and colour excess", () => {
  it("A_V/E(B−V) = R_V (definition), both directions", () => {
    expect(aVFromColourExcess(0.1, 3.1)).toBe(0.1 * 3.1);
    expect(rel(colourExcessFromAV(aVFromColourExcess(0.37, 3.1), 3.1), 0.37)).toBeLessThan(2.3e-16);
    fc.assert(
      fc.property(fc.double({ min: 0, max: 5, noNaN: true }), fc.double({ min: 2, max: 6, noNaN: true }), (ebv, rv) => {
        const av = aVFromColourExcess(ebv, rv);
        expect(Math.abs(av / rv - ebv)).toBeLessThanOrEqual(4.5e-16 * Math.max(ebv, 1e-300));
      }),
    );
  });

  it("5 mag of extinction dims a flux by exactly 100; redden/deredden round-trip (property)", () => {
    expect(reddenFlux(100, 5)).toBe(1);
    expect(dereddenFlux(1, 5)).toBe(100);
    expect(reddenMagnitude(10, 0.31)).toBe(10.31);
    expect(dereddenMagnitude(10.31, 0.31)).toBeCloseTo(10, 14);
    fc.assert(
      fc.property(fc.double({ min: -20, max: 20, noNaN: true }).map((e) => 10 ** e), fc.double({ min: 0, max: 30, noNaN: true }), (f, a) => {
        // two powers of 10 with exponent ≤ 12: relative error ≲ 2 × 12 ln10 ε ≈ 1.2e-14
        expect(rel(dereddenFlux(reddenFlux(f, a), a), f)).toBeLessThan(2e-14);
      }),
    );
  });

  it("rejects bad input naming the parameter", () => {
    expect(() => reddenFlux(0, 1)).toThrow(/flux/);
    expect(() => dereddenFlux(1, NaN)).toThrow(/extinction/);
    expect(() => reddenMagnitude(NaN, 1)).toThrow(/magnitude/);
    expect(() => aVFromColourExcess(Infinity, 3.1)).toThrow(/E\(B-V\)/);
    expect(() => colourExcessFromAV(1, 0)).toThrow(/R_V/);
  });
});
