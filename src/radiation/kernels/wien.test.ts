import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { C } from "../../values/constants";
import fx from "../../../test/fixtures/planck_constants.json";
import {
  planckPhotonRadianceFrequencySI,
  planckPhotonRadianceWavelengthSI,
  planckRadianceFrequencySI,
  planckRadianceWavelengthSI,
  planckRadianceWavenumberSI,
} from "./planck";
import {
  WIEN_B_FREQUENCY,
  WIEN_B_WAVELENGTH,
  WIEN_X_FREQUENCY,
  WIEN_X_PHOTON_FREQUENCY,
  WIEN_X_PHOTON_WAVELENGTH,
  WIEN_X_WAVELENGTH,
  solveWienPeakX,
  temperatureFromPeakFrequencySI,
  temperatureFromPeakWavelengthSI,
  temperatureFromPeakWavenumberSI,
  temperatureFromPhotonPeakFrequencySI,
  temperatureFromPhotonPeakWavelengthSI,
  temperatureFromPhotonPeakWavenumberSI,
  peakFrequencySI,
  peakWavelengthSI,
  peakWavenumberSI,
  photonPeakFrequencySI,
  photonPeakWavelengthSI,
  photonPeakWavenumberSI,
} from "./wien";

const logUniform = (lo: number, hi: number) =>
  fc.double({ min: Math.log(lo), max: Math.log(hi), noNaN: true }).map((u) => Math.exp(u));
const tempArb = logUniform(1e-2, 1e10);

/** Agreement to the printed digits of a truncated constant: |v − p| < one unit of the last printed digit. */
function agreesToPrinted(v: number, printed: number, lastDigit: number): void {
  expect(v).toBeGreaterThanOrEqual(printed);
  expect(v - printed).toBeLessThan(lastDigit);
}

describe("Wien roots x_n of x = n(1 − e^−x)", () => {
  it("match mpmath n + W₀(−n e^−n) (test/fixtures/planck_constants.json) to 1 ulp", () => {
    // Source: mpmath lambertw at 40 digits, correctly rounded; tolerance 1 ulp of x (Newton in double).
    const pairs: [number, number][] = [
      [WIEN_X_PHOTON_FREQUENCY, fx.values.x2],
      [WIEN_X_FREQUENCY, fx.values.x3],
      [WIEN_X_PHOTON_WAVELENGTH, fx.values.x4],
      [WIEN_X_WAVELENGTH, fx.values.x5],
    ];
    for (const [got, want] of pairs) expect(Math.abs(got - want)).toBeLessThanOrEqual(Number.EPSILON * want);
  });

  it("solves other n (n = 1.01 near the x → 0 end, n = 100)", () => {
    for (const n of [1.01, 1.5, 7, 100]) {
      const x = solveWienPeakX(n);
      expect(Math.abs(x - n * (1 - Math.exp(-x)))).toBeLessThan(4 * Number.EPSILON * n);
      expect(x).toBeGreaterThan(0);
    }
    expect(() => solveWienPeakX(1)).toThrow(/n/);
    expect(() => solveWienPeakX(0.5)).toThrow(/n/);
  });
});

describe("CODATA 2018 displacement constants", () => {
  it("b = 2.897 771 955e-3 m K (CODATA 2018, printed truncated to 10 digits)", () => {
    agreesToPrinted(WIEN_B_WAVELENGTH, 2.897771955e-3, 1e-12);
  });
  it("b′ = 5.878 925 757e10 Hz K^-1 (CODATA 2018, printed truncated to 10 digits)", () => {
    agreesToPrinted(WIEN_B_FREQUENCY, 5.878925757e10, 10); // last printed digit is 10 Hz K^-1
  });
  it("b, b′ match the mpmath values (fixture) to 2 ulp", () => {
    expect(Math.abs(WIEN_B_WAVELENGTH / fx.values.b - 1)).toBeLessThan(4.5e-16);
    expect(Math.abs(WIEN_B_FREQUENCY / fx.values.bPrime - 1)).toBeLessThan(4.5e-16);
  });
});

describe("peaks", () => {
  it("solar peak near 502 nm (IAU 2015 B3 T☉ = 5772 K; '≈ 502 nm' is common practice)", () => {
    // b/5772 K = 502.04 nm; '502 nm' printed to 3 digits → within 0.5 nm
    expect(Math.abs(peakWavelengthSI(5772) - 502e-9)).toBeLessThan(0.5e-9);
  });
  it("a 3000 K star peaks in the near-IR (> 700 nm) and a 10 000 K star in the UV (< 400 nm) (common practice)", () => {
    expect(peakWavelengthSI(3000)).toBeGreaterThan(700e-9); // 966 nm
    expect(peakWavelengthSI(10000)).toBeLessThan(400e-9); // 290 nm
  });
  it("each peak is a local maximum of its own density", () => {
    fc.assert(
      fc.property(tempArb, (T) => {
        const cases: [number, (u: number, t: number) => number][] = [
          [peakWavelengthSI(T), planckRadianceWavelengthSI],
          [peakFrequencySI(T), planckRadianceFrequencySI],
          [peakWavenumberSI(T), planckRadianceWavenumberSI],
          [photonPeakWavelengthSI(T), planckPhotonRadianceWavelengthSI],
          [photonPeakFrequencySI(T), planckPhotonRadianceFrequencySI],
        ];
        for (const [u, f] of cases) {
          const top = f(u, T);
          expect(f(u * 1.0001, T)).toBeLessThan(top);
          expect(f(u / 1.0001, T)).toBeLessThan(top);
        }
      }),
      { numRuns: 50 },
    );
  });
  it("λ_peak·ν_peak ≠ c: the product is c·x₃/x₅ ≈ 0.568c (different densities)", () => {
    const T = 5772;
    const ratio = (peakWavelengthSI(T) * peakFrequencySI(T)) / C;
    expect(Math.abs(ratio - WIEN_X_FREQUENCY / WIEN_X_WAVELENGTH)).toBeLessThan(1e-15);
    expect(ratio).toBeLessThan(0.57);
    // the wavenumber peak coincides with the frequency peak: σ̃ = ν/c
    expect(Math.abs((peakWavenumberSI(T) * C) / peakFrequencySI(T) - 1)).toBeLessThan(1e-15);
  });
  it("every inverse round-trips", () => {
    fc.assert(
      fc.property(tempArb, (T) => {
        const rt = [
          temperatureFromPeakWavelengthSI(peakWavelengthSI(T)),
          temperatureFromPeakFrequencySI(peakFrequencySI(T)),
          temperatureFromPeakWavenumberSI(peakWavenumberSI(T)),
          temperatureFromPhotonPeakWavelengthSI(photonPeakWavelengthSI(T)),
          temperatureFromPhotonPeakFrequencySI(photonPeakFrequencySI(T)),
          temperatureFromPhotonPeakWavenumberSI(photonPeakWavenumberSI(T)),
        ];
        // two roundings each way → ≤ 2 ulp
        for (const t of rt) expect(Math.abs(t / T - 1)).toBeLessThanOrEqual(2 * Number.EPSILON);
      }),
    );
  });
});

describe("bad input", () => {
  it.each([0, -3, NaN, Infinity])("temperature %s → RangeError naming the parameter", (v) => {
    expect(() => peakWavelengthSI(v)).toThrow(/temperature/);
    expect(() => photonPeakFrequencySI(v)).toThrow(/temperature/);
  });
  it.each([0, -3, NaN, Infinity])("peak %s → RangeError naming the parameter", (v) => {
    expect(() => temperatureFromPeakWavelengthSI(v)).toThrow(/peakWavelength/);
    expect(() => temperatureFromPeakFrequencySI(v)).toThrow(/peakFrequency/);
    expect(() => temperatureFromPeakWavenumberSI(v)).toThrow(/peakWavenumber/);
  });
  it("a subnormal temperature whose peak wavelength overflows → RangeError", () => {
    expect(() => peakWavelengthSI(5e-324)).toThrow(/outside the double range/);
  });
});
