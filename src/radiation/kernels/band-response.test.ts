import fc from "fast-check";
import { describe, expect, it } from "vitest";
import fx from "../../../test/fixtures/planck_band_response.json";
import { bandMeanRadianceDerivativeTSI, bandMeanRadianceWavelengthSI, type ResponseCurveSI } from "./band-response";
import { bandRadianceWavelengthSI } from "./band-fraction";

function gaussianCurve(mu: number, s: number, n: number, jitter = 0): ResponseCurveSI {
  // n intervals over [mu − 5s, mu + 5s]; optional deterministic non-uniform spacing
  const l: number[] = [];
  const r: number[] = [];
  for (let i = 0; i <= n; i++) {
    const u = i / n;
    const warped = u + jitter * Math.sin(2 * Math.PI * u) / (2 * Math.PI); // smooth, monotone for jitter < 1
    const lam = mu - 5 * s + 10 * s * warped;
    l.push(lam);
    r.push(Math.exp(-(((lam - mu) / s) ** 2) / 2));
  }
  return { wavelengthsM: l, response: r };
}

const rows = (fx as unknown as { rows: { mu: number; s: number; T: number; energyMean: number; photonMean: number; energyMeanDT: number }[] }).rows;

describe("band-mean radiance against mpmath quadrature (test/fixtures/planck_band_response.json)", () => {
  it("trapezoid converges at second order (error ratio ≈ 4 per halving) to the mpmath value", () => {
    for (const row of rows) {
      const errs = [100, 200, 400].map((n) =>
        Math.abs(bandMeanRadianceWavelengthSI(gaussianCurve(row.mu, row.s, n, 0.3), row.T, "energy") / row.energyMean - 1),
      );
      // second order: each halving divides the error by ~4 (accept 3.5–4.5: the h⁴ term is small)
      expect(errs[0]! / errs[1]!).toBeGreaterThan(3.5);
      expect(errs[0]! / errs[1]!).toBeLessThan(4.5);
      expect(errs[1]! / errs[2]!).toBeGreaterThan(3.5);
      expect(errs[1]! / errs[2]!).toBeLessThan(4.5);
    }
  });
  it("with 4000 intervals, energy, photon and ∂/∂T means agree with mpmath to 1e-6", () => {
    // Trapezoid error ~ h²·(curvature): at n = 4000 the measured error is ≲ 1e-7 for these
    // smooth cases (from the convergence rate above: err(100)·(100/4000)² ); 1e-6 is the bound.
    for (const row of rows) {
      const c = gaussianCurve(row.mu, row.s, 4000, 0.3);
      expect(Math.abs(bandMeanRadianceWavelengthSI(c, row.T, "energy") / row.energyMean - 1)).toBeLessThan(1e-6);
      expect(Math.abs(bandMeanRadianceWavelengthSI(c, row.T, "photon") / row.photonMean - 1)).toBeLessThan(1e-6);
      expect(Math.abs(bandMeanRadianceDerivativeTSI(c, row.T, "energy") / row.energyMeanDT - 1)).toBeLessThan(1e-6);
    }
  });
  it("photon and energy conventions differ (λ weighting): photon mean is larger on the Wien side", () => {
    const row = rows[1]!; // 440 nm at 3000 K: B_λ rising with λ → λ-weighting raises the mean
    const c = gaussianCurve(row.mu, row.s, 400);
    expect(bandMeanRadianceWavelengthSI(c, row.T, "photon")).toBeGreaterThan(bandMeanRadianceWavelengthSI(c, row.T, "energy"));
  });
});

describe("analytic check: boxcar response", () => {
  it("mean over a boxcar = band radiance / Δλ (band fraction), second-order convergence", () => {
    const l1 = 400e-9;
    const l2 = 700e-9;
    const T = 5772;
    const exact = bandRadianceWavelengthSI(l1, l2, T) / (l2 - l1);
    const err = (n: number) => {
      const l: number[] = [];
      const r: number[] = [];
      for (let i = 0; i <= n; i++) {
        l.push(l1 + ((l2 - l1) * i) / n);
        r.push(1);
      }
      return Math.abs(bandMeanRadianceWavelengthSI({ wavelengthsM: l, response: r }, T) / exact - 1);
    };
    const e1 = err(50);
    const e2 = err(100);
    expect(e1 / e2).toBeGreaterThan(3.9);
    expect(e1 / e2).toBeLessThan(4.1);
    expect(err(3200)).toBeLessThan(1e-7);
  });
});

describe("derivative", () => {
  it("∂⟨B⟩/∂T matches a central difference of ⟨B⟩", () => {
    const logU = (lo: number, hi: number) => fc.double({ min: Math.log(lo), max: Math.log(hi), noNaN: true }).map(Math.exp);
    fc.assert(
      fc.property(logU(100, 1e5), (T) => {
        const c = gaussianCurve(1e-6, 1e-7, 50);
        const h = T * 1e-5;
        const fd = (bandMeanRadianceWavelengthSI(c, T + h, "photon") - bandMeanRadianceWavelengthSI(c, T - h, "photon")) / (2 * h);
        const d = bandMeanRadianceDerivativeTSI(c, T, "photon");
        const x = 0.014387768775039339 / (0.5e-6 * T); // largest x on the grid
        if (d > 1e-280) expect(Math.abs(fd / d - 1)).toBeLessThan(1e-9 * (1 + x * x));
      }),
      { numRuns: 30 },
    );
  });
});

describe("bad input", () => {
  const ok = { wavelengthsM: [1e-6, 2e-6], response: [1, 1] };
  it("rejects bad curves with a RangeError naming the field", () => {
    expect(() => bandMeanRadianceWavelengthSI({ wavelengthsM: [1e-6], response: [1] }, 300)).toThrow(/wavelengthsM/);
    expect(() => bandMeanRadianceWavelengthSI({ wavelengthsM: [1e-6, 2e-6], response: [1] }, 300)).toThrow(/response/);
    expect(() => bandMeanRadianceWavelengthSI({ wavelengthsM: [2e-6, 1e-6], response: [1, 1] }, 300)).toThrow(/strictly increasing/);
    expect(() => bandMeanRadianceWavelengthSI({ wavelengthsM: [-1, 1e-6], response: [1, 1] }, 300)).toThrow(/wavelengthsM\[0\]/);
    expect(() => bandMeanRadianceWavelengthSI({ wavelengthsM: [1e-6, 2e-6], response: [1, NaN] }, 300)).toThrow(/response\[1\]/);
    expect(() => bandMeanRadianceWavelengthSI({ wavelengthsM: [1e-6, 2e-6], response: [0, 0] }, 300)).toThrow(/response/);
    expect(() => bandMeanRadianceWavelengthSI({ wavelengthsM: [1e-6, 2e-6], response: [-1, 1] }, 300)).toThrow(/response\[0\]/);
  });
  it.each([0, -1, NaN, Infinity])("temperature %s → RangeError", (v) => {
    expect(() => bandMeanRadianceWavelengthSI(ok, v)).toThrow(/temperature/);
    expect(() => bandMeanRadianceDerivativeTSI(ok, v)).toThrow(/temperature/);
  });
  it("rejects an unknown convention", () => {
    expect(() => bandMeanRadianceWavelengthSI(ok, 300, "bogus" as "energy")).toThrow(/convention/);
  });
});
