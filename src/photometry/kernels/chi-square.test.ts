import { describe, expect, it } from "vitest";
import fixture from "../../../test/fixtures/photometry.json";
import { chiSquareLogSurvival, erfcxNonNegative, sigmaFromLogTailProbability } from "./chi-square";

const rel = (a: number, b: number): number => Math.abs(a - b) / Math.abs(b);

describe("chi-square tails (reference: mpmath gammainc / erfc at 50 digits, photometry.py)", () => {
  it("erfcx matches mpmath and scipy", () => {
    for (const row of fixture.erfcx) {
      // series branch loses ≤ 1/erfc(1.5) ≈ 30 ulp; continued fraction converges to ~1e-16: 1e-14
      expect(rel(erfcxNonNegative(row.u), row.erfcx)).toBeLessThan(1e-14);
      // scipy.special.erfcx is an independent double implementation; same bound
      expect(rel(erfcxNonNegative(row.u), row.scipy)).toBeLessThan(1e-14);
    }
  });

  it("ln Q(χ²|k) and the Gaussian-equivalent sigma match mpmath for k = 1…5, χ² up to 5e4", () => {
    for (const row of fixture.chi2) {
      const lnp = chiSquareLogSurvival(row.chi2, row.dof);
      // ln p near 0 (p ≈ 1) is compared absolutely, far tails relatively: 1e-13
      expect(Math.abs(lnp - row.ln_p)).toBeLessThan(1e-13 * Math.max(1, Math.abs(row.ln_p)));
      // scipy.stats.chi2.sf cross-check where it does not underflow
      if (row.scipy_p > 1e-300) expect(rel(Math.exp(lnp), row.scipy_p)).toBeLessThan(1e-12);
      // sigma: Newton converged to 1e-15 relative; the conditioning dz/d ln p = −1/(z …) is ≤ 1
      expect(Math.abs(sigmaFromLogTailProbability(lnp) - row.sigma)).toBeLessThan(1e-11 * Math.max(1, row.sigma));
    }
  });

  it("known anchors: dof 1 gives √χ² sigma; 3σ two-sided is p = 0.0026998 (common practice)", () => {
    expect(sigmaFromLogTailProbability(chiSquareLogSurvival(9, 1))).toBeCloseTo(3, 12);
    // p(|Z| > 3) = 0.002699796 (standard normal table, printed to 7 significant digits)
    expect(rel(Math.exp(chiSquareLogSurvival(9, 1)), 0.002699796)).toBeLessThan(5e-7);
    expect(chiSquareLogSurvival(0, 3)).toBe(0);
    expect(sigmaFromLogTailProbability(0)).toBe(0);
    expect(chiSquareLogSurvival(2, 2)).toBeCloseTo(-1, 15);
  });

  it("rejects bad input naming the parameter", () => {
    expect(() => chiSquareLogSurvival(-1, 1)).toThrow(/chi2/);
    expect(() => chiSquareLogSurvival(1, 0)).toThrow(/dof/);
    expect(() => chiSquareLogSurvival(1, 1.5)).toThrow(/dof/);
    expect(() => sigmaFromLogTailProbability(0.1)).toThrow(/lnP/);
    expect(() => erfcxNonNegative(-1)).toThrow(/u/);
  });
});
