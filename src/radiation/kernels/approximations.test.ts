import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { C } from "../../values/constants";
import fx from "../../../test/fixtures/planck.json";
import {
  rayleighJeansRadianceFrequencySI,
  rayleighJeansRadianceWavelengthSI,
  rayleighJeansRelativeErrorFrequencySI,
  rayleighJeansRelativeErrorFromX,
  rayleighJeansRelativeErrorWavelengthSI,
  wienRadianceFrequencySI,
  wienRadianceWavelengthSI,
  wienRelativeErrorFrequencySI,
  wienRelativeErrorWavelengthSI,
} from "./approximations";
import { planckRadianceWavelengthSI } from "./planck";
import { lambertianExitanceFromRadianceSI, radianceFromLambertianExitanceSI } from "./lambertian";

const logUniform = (lo: number, hi: number) =>
  fc.double({ min: Math.log(lo), max: Math.log(hi), noNaN: true }).map((u) => Math.exp(u));
const lambdaArb = logUniform(1e-12, 1e4);
const tempArb = logUniform(1e-2, 1e10);
const rows = (fx as unknown as { rows: { lambda: number; T: number; x: number; B_lambda: number | null }[] }).rows;

describe("relative-error functions against the mpmath Planck reference", () => {
  it("B_RJ = B(1 + ε_RJ) and B_W = B(1 + ε_W) reproduce the fixture B_λ to 1e-13", () => {
    // Source: test/fixtures/planck.json (mpmath). This ties the closed forms ε_RJ = expm1(x)/x − 1 and
    // ε_W = −e^−x to an independent reference: B = B_approx/(1 + ε).
    let worst = 0;
    for (const r of rows) {
      if (r.B_lambda === null) continue;
      const rj = rayleighJeansRadianceWavelengthSI(r.lambda, r.T);
      const w = wienRadianceWavelengthSI(r.lambda, r.T);
      if (r.x < 50 && rj < 1e300) worst = Math.max(worst, Math.abs(rj / (1 + rayleighJeansRelativeErrorWavelengthSI(r.lambda, r.T)) / r.B_lambda - 1));
      // 1 + ε_W = 1 − e^−x loses digits for small x (cancellation), so use the Wien side only for x > 0.1
      if (w > 1e-300 && r.x > 0.1) worst = Math.max(worst, Math.abs(w / (1 + wienRelativeErrorWavelengthSI(r.lambda, r.T)) / r.B_lambda - 1));
    }
    console.log(`approximations: worst relative error of B_approx/(1+ε) vs mpmath B_λ ${worst.toExponential(2)}`);
    expect(worst).toBeLessThan(1e-13);
  });
  it("ε_RJ(x) series and direct branches: Σ x^k/(k+1)! for small x (Taylor, exact coefficients)", () => {
    for (const x of [1e-10, 1e-5, 1e-3]) {
      const taylor = x / 2 + (x * x) / 6 + (x * x * x) / 24 + x ** 4 / 120 + x ** 5 / 720 + x ** 6 / 5040;
      expect(Math.abs(rayleighJeansRelativeErrorFromX(x) / taylor - 1)).toBeLessThan(1e-15);
    }
    // continuity across the 0.5 switch
    const a = rayleighJeansRelativeErrorFromX(0.5 * (1 - 1e-15));
    const b = rayleighJeansRelativeErrorFromX(0.5);
    expect(Math.abs(a / b - 1)).toBeLessThan(1e-14);
    expect(() => rayleighJeansRelativeErrorFromX(800)).toThrow(/x/);
    expect(Number.isFinite(rayleighJeansRelativeErrorFromX(710))).toBe(true);
  });
  it("Rayleigh–Jeans is 1% accurate for x < 0.01987 and Wien for x > ln 100 = 4.605 (thresholds from the closed forms)", () => {
    // x/2 + x²/6 + x³/24 = 0.01 at x = 0.019868…
    expect(rayleighJeansRelativeErrorFromX(0.0198)).toBeLessThan(0.01);
    expect(rayleighJeansRelativeErrorFromX(0.0199)).toBeGreaterThan(0.01);
    const T = 300;
    const lam = (x: number) => 0.014387768775039339 / (x * T);
    expect(-wienRelativeErrorWavelengthSI(lam(4.61), T)).toBeLessThan(0.01);
    expect(-wienRelativeErrorWavelengthSI(lam(4.6), T)).toBeGreaterThan(0.01);
  });
});

describe("properties", () => {
  it("RJ overestimates and Wien underestimates Planck everywhere", () => {
    fc.assert(
      fc.property(lambdaArb, tempArb, (l, T) => {
        const b = planckRadianceWavelengthSI(l, T);
        if (b < 1e-290 || b > 1e290) return;
        expect(rayleighJeansRadianceWavelengthSI(l, T)).toBeGreaterThanOrEqual(b);
        expect(wienRadianceWavelengthSI(l, T)).toBeLessThanOrEqual(b);
      }),
    );
  });
  it("frequency forms agree with the wavelength forms via B_λ = B_ν c/λ²", () => {
    fc.assert(
      fc.property(lambdaArb, tempArb, (l, T) => {
        const nu = C / l;
        const rjl = rayleighJeansRadianceWavelengthSI(l, T);
        if (rjl > 1e-290 && rjl < 1e290) {
          expect(Math.abs((rayleighJeansRadianceFrequencySI(nu, T) * C) / (l * l) / rjl - 1)).toBeLessThan(4e-15);
        }
        const wl = wienRadianceWavelengthSI(l, T);
        const x = 0.014387768775039339 / (l * T);
        if (wl > 1e-290) expect(Math.abs((wienRadianceFrequencySI(nu, T) * C) / (l * l) / wl - 1)).toBeLessThan(1e-15 * (8 + 2 * x));
        expect(Math.abs(wienRelativeErrorFrequencySI(nu, T) - wienRelativeErrorWavelengthSI(l, T))).toBeLessThanOrEqual(
          1e-15 * (1 + x) * Math.abs(wienRelativeErrorWavelengthSI(l, T)) + 1e-300,
        );
        if (x < 700) {
          const a = rayleighJeansRelativeErrorFrequencySI(nu, T);
          const b2 = rayleighJeansRelativeErrorWavelengthSI(l, T);
          expect(Math.abs(a / b2 - 1)).toBeLessThan(1e-15 * (4 + x));
        }
      }),
    );
  });
});

describe("Lambertian exitance", () => {
  it("M = πL and back", () => {
    expect(lambertianExitanceFromRadianceSI(1)).toBe(Math.PI);
    expect(radianceFromLambertianExitanceSI(Math.PI)).toBe(1);
    expect(lambertianExitanceFromRadianceSI(0)).toBe(0);
    expect(() => lambertianExitanceFromRadianceSI(-1)).toThrow(/radiance/);
    expect(() => radianceFromLambertianExitanceSI(NaN)).toThrow(/exitance/);
  });
});

describe("bad input", () => {
  it.each([0, -1, NaN, Infinity])("%s → RangeError naming the parameter", (v) => {
    expect(() => rayleighJeansRadianceWavelengthSI(v, 300)).toThrow(/wavelength/);
    expect(() => rayleighJeansRadianceFrequencySI(1e9, v)).toThrow(/temperature/);
    expect(() => wienRadianceWavelengthSI(1e-6, v)).toThrow(/temperature/);
    expect(() => wienRadianceFrequencySI(v, 300)).toThrow(/frequency/);
    expect(() => rayleighJeansRelativeErrorWavelengthSI(v, 300)).toThrow(/wavelength/);
    expect(() => wienRelativeErrorFrequencySI(v, 300)).toThrow(/frequency/);
    expect(() => rayleighJeansRelativeErrorFromX(v)).toThrow(/x/);
  });
});
