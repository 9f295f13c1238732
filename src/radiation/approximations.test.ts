import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { CGS, SI } from "../quantity/system";
import { units } from "../quantity/units";
import { assume, type Frequency, type Length, type Temperature } from "../quantity/index";
import * as K from "./kernels/approximations";
import {
  rayleighJeansRadianceFrequency,
  rayleighJeansRadianceWavelength,
  rayleighJeansRelativeErrorFrequency,
  rayleighJeansRelativeErrorWavelength,
  wienRadianceFrequency,
  wienRadianceWavelength,
  wienRelativeErrorFrequency,
  wienRelativeErrorWavelength,
} from "./approximations";
import { planckRadianceFrequency, planckRadianceWavelength } from "./planck";

const logUniform = (lo: number, hi: number) =>
  fc.double({ min: Math.log(lo), max: Math.log(hi), noNaN: true }).map((u) => Math.exp(u));
const T = (k: number) => assume<Temperature>(k);
const cm = (v: number) => assume<Length<"CGS">>(v);
const m = (v: number) => assume<Length<"SI">>(v);
const hz = (v: number) => assume<Frequency>(v);

describe("typed approximations agree with the SI kernels", () => {
  it("SI: identical numbers; CGS: B_λ × 10 and B_ν × 1000 exactly, relative errors unchanged", () => {
    fc.assert(
      fc.property(logUniform(1e-7, 10), logUniform(1, 1e6), (lcm, t) => {
        const l = lcm / 100; // what the CGS wrapper hands the kernel
        const nu = 29979245800 / lcm;
        expect(rayleighJeansRadianceWavelength(SI, m(l), T(t))).toBe(K.rayleighJeansRadianceWavelengthSI(l, t));
        expect(wienRadianceWavelength(SI, m(l), T(t))).toBe(K.wienRadianceWavelengthSI(l, t));
        expect(rayleighJeansRadianceWavelength(CGS, cm(lcm), T(t))).toBe(K.rayleighJeansRadianceWavelengthSI(l, t) * 10);
        expect(wienRadianceWavelength(CGS, cm(lcm), T(t))).toBe(K.wienRadianceWavelengthSI(l, t) * 10);
        expect(rayleighJeansRadianceFrequency(CGS, hz(nu), T(t))).toBe(K.rayleighJeansRadianceFrequencySI(nu, t) * 1000);
        expect(wienRadianceFrequency(CGS, hz(nu), T(t))).toBe(K.wienRadianceFrequencySI(nu, t) * 1000);
        expect(rayleighJeansRadianceFrequency(SI, hz(nu), T(t))).toBe(K.rayleighJeansRadianceFrequencySI(nu, t));
        expect(wienRadianceFrequency(SI, hz(nu), T(t))).toBe(K.wienRadianceFrequencySI(nu, t));
        // relative errors are pure numbers: the same in both systems
        expect(wienRelativeErrorWavelength(CGS, cm(lcm), T(t))).toBe(K.wienRelativeErrorWavelengthSI(l, t));
        expect(wienRelativeErrorFrequency(CGS, hz(nu), T(t))).toBe(K.wienRelativeErrorFrequencySI(nu, t));
        const x = 0.014387768775039339 / (l * t);
        if (x < 700) {
          expect(rayleighJeansRelativeErrorWavelength(CGS, cm(lcm), T(t))).toBe(K.rayleighJeansRelativeErrorWavelengthSI(l, t));
          expect(rayleighJeansRelativeErrorFrequency(SI, hz(nu), T(t))).toBe(K.rayleighJeansRelativeErrorFrequencySI(nu, t));
        }
      }),
      { numRuns: 100 },
    );
  });
});

describe("physics of the limits through the typed API", () => {
  it("the relative-error functions equal approx/Planck − 1 (CGS), within the rounding of the two radiances", () => {
    fc.assert(
      fc.property(logUniform(1e-6, 1), logUniform(10, 1e5), (lcm, t) => {
        const b = planckRadianceWavelength(CGS, cm(lcm), T(t));
        if (b < 1e-290) return;
        const w = wienRadianceWavelength(CGS, cm(lcm), T(t));
        const eW = wienRelativeErrorWavelength(CGS, cm(lcm), T(t));
        // approx/B − 1 by subtraction carries ~1e-15 absolute (each radiance ≤ ~7e-16 relative);
        // the functions are exact-formula values, so compare with an absolute 4e-15 plus 1e-14 relative.
        expect(Math.abs(w / b - 1 - eW)).toBeLessThan(4e-15 + 1e-14 * Math.abs(eW));
        const x = 1.4387768775039338 / (lcm * t);
        if (x < 716) {
          // (beyond x ≈ 716 the Rayleigh–Jeans error exceeds the double range and throws; tested below)
          const rj = rayleighJeansRadianceWavelength(CGS, cm(lcm), T(t));
          const eRJ = rayleighJeansRelativeErrorWavelength(CGS, cm(lcm), T(t));
          // For x > 700 the kernel forms ε_RJ as exp(x − ln x), whose rounded exponent costs ~x·1.1e-16
          // relative (measured 5.7e-14 worst over x ∈ (700, 716] against mpmath; 2.9e-16 below 700).
          const relRJ = x > 700 ? 2.2e-16 * x : 1e-14;
          expect(Math.abs(rj / b - 1 - eRJ)).toBeLessThan(4e-15 + relRJ * eRJ);
          expect(eRJ).toBeGreaterThan(0); // Rayleigh–Jeans overestimates
        }
        expect(eW).toBeLessThanOrEqual(0); // Wien underestimates
      }),
      { numRuns: 100 },
    );
  });

  it("at 1 mm and 300 K the Rayleigh–Jeans error is ≈ x/2 + x²/6 with x = c₂/(λT) ≈ 0.048", () => {
    // Series expm1(x)/x − 1 = x/2 + x²/6 + x³/24 + … (exact identity); three terms leave < x⁴/120 ≈ 4.5e-8.
    const x = 0.014387768775039339 / (1e-3 * 300);
    const e = rayleighJeansRelativeErrorWavelength(SI, SI.of(1, units.mm), SI.of(300, units.K));
    expect(Math.abs(e - (x / 2 + (x * x) / 6 + (x * x * x) / 24))).toBeLessThan((x ** 4 / 120) * 1.1);
  });

  it("Wien's relative error at (ν, T) is −exp(−hν/kT): −e^−1 at hν = kT (6.62607015e-34, 1.380649e-23 exact, CODATA 2018)", () => {
    const t = 1000;
    const nu = (1.380649e-23 * t) / 6.62607015e-34;
    // ν rounded to a double: x = 1 ± 1.1e-16, so −e^−x = −e^−1 to ~2e-16 relative; allow 4 ulp
    expect(Math.abs(wienRelativeErrorFrequency(CGS, hz(nu), T(t)) / -Math.exp(-1) - 1)).toBeLessThan(1e-15);
    // and the Planck/Wien ratio at the same point, through the typed radiances (each ≤ 7e-16 relative)
    const ratio = wienRadianceFrequency(CGS, hz(nu), T(t)) / planckRadianceFrequency(CGS, hz(nu), T(t));
    expect(Math.abs(ratio - (1 - Math.exp(-1)))).toBeLessThan(3e-15);
  });
});

describe("errors name the caller's unit", () => {
  it.each([0, -2, NaN, Infinity])("wavelength %s in CGS → RangeError in cm", (v) => {
    expect(() => rayleighJeansRadianceWavelength(CGS, cm(v), T(300))).toThrow(/^wavelength must be a finite number > 0 cm; got/);
    expect(() => wienRelativeErrorWavelength(CGS, cm(v), T(300))).toThrow(/^wavelength must be a finite number > 0 cm; got/);
    expect(() => wienRadianceWavelength(SI, m(v), T(300))).toThrow(/^wavelength must be a finite number > 0 m; got/);
  });
  it("an error beyond the double range (x ≳ 716) names the CGS arguments in cm", () => {
    // λ = 1e-5 cm at 1 K: x = c₂/(λT) ≈ 1.4e5
    expect(() => rayleighJeansRelativeErrorWavelength(CGS, cm(1e-5), T(1))).toThrow(
      "the Rayleigh–Jeans relative error overflows the double range for wavelength=0.00001 cm, temperature=1 K",
    );
    // an SI caller gets the same sentence in m
    expect(() => rayleighJeansRelativeErrorWavelength(SI, m(1e-7), T(1))).toThrow(
      "the Rayleigh–Jeans relative error overflows the double range for wavelength=1e-7 m, temperature=1 K",
    );
  });
});
