import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { constants } from "../constants/index";
import { CGS, SI } from "../quantity/system";
import { units } from "../quantity/units";
import { assume, type Frequency, type Length, type Temperature, type Wavenumber } from "../quantity/index";
import * as K from "./kernels/wien";
import {
  temperatureFromPeakFrequency,
  temperatureFromPeakWavelength,
  temperatureFromPeakWavenumber,
  temperatureFromPhotonPeakFrequency,
  temperatureFromPhotonPeakWavelength,
  temperatureFromPhotonPeakWavenumber,
  peakFrequency,
  peakWavelength,
  peakWavenumber,
  photonPeakFrequency,
  photonPeakWavelength,
  photonPeakWavenumber,
} from "./wien";
import { planckRadianceWavelength, planckPhotonRadianceWavenumber } from "./planck";

const logUniform = (lo: number, hi: number) =>
  fc.double({ min: Math.log(lo), max: Math.log(hi), noNaN: true }).map((u) => Math.exp(u));
const T = (k: number) => assume<Temperature>(k);
const tempArb = logUniform(1e-2, 1e10);

/** |v − printed| below one unit of the last printed digit, v ≥ printed (CODATA prints truncated digits). */
function agreesToPrinted(v: number, printed: number, lastDigit: number): void {
  expect(v).toBeGreaterThanOrEqual(printed);
  expect(v - printed).toBeLessThan(lastDigit);
}

describe("CODATA 2018 displacement constants through the typed API and the typed constants", () => {
  it("the kernels and the typed constants share one root: λ_max(1 K) is constants.wienB exactly, in SI and CGS", () => {
    expect(peakWavelength(SI, T(1))).toBe(constants.wienB.si as number);
    expect(peakWavelength(CGS, T(1))).toBe(constants.wienB.cgs as number);
    expect(peakFrequency(SI, T(1))).toBe(constants.wienBPrime.si as number);
    expect(peakFrequency(CGS, T(1))).toBe(constants.wienBPrime.cgs as number);
  });
  it("b = 2.897 771 955e-3 m K = 0.289 777 1955 cm K (CODATA 2018, printed truncated to 10 digits)", () => {
    agreesToPrinted(constants.wienB.si, 2.897771955e-3, 1e-12);
    agreesToPrinted(constants.wienB.cgs, 2.897771955e-1, 1e-10);
    agreesToPrinted(SI.valueIn(peakWavelength(SI, SI.of(1, units.K)), units.m), 2.897771955e-3, 1e-12);
  });
  it("b′ = 5.878 925 757e10 Hz K^-1 (CODATA 2018, printed truncated to 10 digits)", () => {
    agreesToPrinted(constants.wienBPrime.si, 5.878925757e10, 10);
    agreesToPrinted(SI.valueIn(peakFrequency(CGS, CGS.of(1, units.K)), units.Hz), 5.878925757e10, 10);
  });
});

describe("worked solar example: the peak of B_λ", () => {
  it("T☉ = 5772 K (IAU 2015 B3) peaks near 502 nm in both systems ('≈ 502 nm' is common practice)", () => {
    // b/5772 K = 502.04 nm; 502 printed to 3 digits → within 0.5 nm
    const lS = peakWavelength(SI, constants.Tsun.si);
    const lC = peakWavelength(CGS, constants.Tsun.cgs);
    expect(Math.abs(SI.valueIn(lS, units.nm) - 502)).toBeLessThan(0.5);
    expect(Math.abs(CGS.valueIn(lC, units.nm) - 502)).toBeLessThan(0.5);
    expect(lC).toBe(lS * 100); // cm = 100 × m exactly (one rounding each)
    // and it is the maximum of the typed B_λ there
    const top = planckRadianceWavelength(CGS, lC, constants.Tsun.cgs);
    expect(planckRadianceWavelength(CGS, assume<Length<"CGS">>(lC * 1.001), constants.Tsun.cgs)).toBeLessThan(top);
    expect(planckRadianceWavelength(CGS, assume<Length<"CGS">>(lC / 1.001), constants.Tsun.cgs)).toBeLessThan(top);
  });
  it("c/ν_max is not λ_max: their product is c·x₃/x₅ ≈ 0.568 c (different densities)", () => {
    const t = constants.Tsun.si;
    const prod = peakWavelength(SI, t) * peakFrequency(SI, t);
    expect(Math.abs(prod / 299792458 - K.WIEN_X_FREQUENCY / K.WIEN_X_WAVELENGTH)).toBeLessThan(1e-15);
  });
});

describe("typed peaks agree with the kernels; CGS lengths ×100, wavenumbers ÷100 exactly", () => {
  it("all twelve functions", () => {
    fc.assert(
      fc.property(tempArb, (t) => {
        expect(peakWavelength(SI, T(t))).toBe(K.peakWavelengthSI(t));
        expect(peakWavelength(CGS, T(t))).toBe(K.peakWavelengthSI(t) * 100);
        expect(photonPeakWavelength(CGS, T(t))).toBe(K.photonPeakWavelengthSI(t) * 100);
        expect(peakWavenumber(CGS, T(t))).toBe(K.peakWavenumberSI(t) / 100);
        expect(photonPeakWavenumber(CGS, T(t))).toBe(K.photonPeakWavenumberSI(t) / 100);
        expect(peakFrequency(CGS, T(t))).toBe(K.peakFrequencySI(t));
        expect(photonPeakFrequency(CGS, T(t))).toBe(K.photonPeakFrequencySI(t));
        const l = K.peakWavelengthSI(t);
        expect(temperatureFromPeakWavelength(CGS, assume<Length<"CGS">>(l * 100))).toBe(K.temperatureFromPeakWavelengthSI((l * 100) / 100));
        const s = K.peakWavenumberSI(t);
        expect(temperatureFromPeakWavenumber(CGS, assume<Wavenumber<"CGS">>(s / 100))).toBe(K.temperatureFromPeakWavenumberSI((s / 100) * 100));
      }),
      { numRuns: 100 },
    );
  });

  it("every inverse round-trips in CGS (conversion + two roundings each way: ≤ 4 ulp)", () => {
    fc.assert(
      fc.property(tempArb, (t) => {
        const back = [
          temperatureFromPeakWavelength(CGS, peakWavelength(CGS, T(t))),
          temperatureFromPeakFrequency(CGS, peakFrequency(CGS, T(t))),
          temperatureFromPeakWavenumber(CGS, peakWavenumber(CGS, T(t))),
          temperatureFromPhotonPeakWavelength(CGS, photonPeakWavelength(CGS, T(t))),
          temperatureFromPhotonPeakFrequency(CGS, photonPeakFrequency(CGS, T(t))),
          temperatureFromPhotonPeakWavenumber(CGS, photonPeakWavenumber(CGS, T(t))),
        ];
        for (const b of back) expect(Math.abs(b / t - 1)).toBeLessThanOrEqual(4 * Number.EPSILON);
      }),
      { numRuns: 100 },
    );
  });

  it("the photon peak per wavenumber is a maximum of the typed photon radiance per wavenumber (CGS)", () => {
    fc.assert(
      fc.property(logUniform(1, 1e6), (t) => {
        const k = photonPeakWavenumber(CGS, T(t));
        const top = planckPhotonRadianceWavenumber(CGS, k, T(t));
        expect(planckPhotonRadianceWavenumber(CGS, assume<Wavenumber<"CGS">>(k * 1.0001), T(t))).toBeLessThan(top);
        expect(planckPhotonRadianceWavenumber(CGS, assume<Wavenumber<"CGS">>(k / 1.0001), T(t))).toBeLessThan(top);
      }),
      { numRuns: 50 },
    );
  });
});

describe("errors name the caller's unit", () => {
  it.each([0, -1, NaN, Infinity])("peak %s → RangeError in the caller's unit", (v) => {
    expect(() => temperatureFromPeakWavelength(CGS, assume<Length<"CGS">>(v))).toThrow(/^peakWavelength must be a finite number > 0 cm; got/);
    expect(() => temperatureFromPeakWavelength(SI, assume<Length<"SI">>(v))).toThrow(/^peakWavelength must be a finite number > 0 m; got/);
    expect(() => temperatureFromPeakWavenumber(CGS, assume<Wavenumber<"CGS">>(v))).toThrow(/^peakWavenumber must be a finite number > 0 cm\^-1; got/);
    expect(() => temperatureFromPhotonPeakFrequency(CGS, assume<Frequency>(v))).toThrow(/^peakFrequency must be a finite number > 0 s\^-1; got/);
    expect(() => peakWavelength(CGS, T(v))).toThrow(/^temperature must be a finite number > 0 K; got/);
  });
  it("a peak wavelength finite in m but beyond the double range in cm throws, naming cm", () => {
    const t = 2.897771955e-3 / 1e307; // subnormal T: λ_max ≈ 1e307 m = 1e309 cm
    expect(Number.isFinite(peakWavelength(SI, T(t)))).toBe(true);
    expect(() => peakWavelength(CGS, T(t))).toThrow(/^the peak wavelength overflows the double range in cm for temperature=/);
    expect(() => peakWavelength(CGS, T(5e-324))).toThrow("the peak wavelength overflows the double range in cm for temperature=5e-324 K");
  });
});
