import fc from "fast-check";
import { describe, expect, it } from "vitest";
import fx from "../../test/fixtures/planck.json";
import { CGS, SI } from "../quantity/system";
import { units } from "../quantity/units";
import {
  assume,
  type Frequency,
  type Length,
  type SpectralRadiancePerFrequency,
  type SpectralRadiancePerWavelength,
  type Temperature,
} from "../quantity/index";
import * as K from "./kernels/brightness-temperature";
import {
  brightnessTemperatureFrequency,
  brightnessTemperatureWavelength,
  rayleighJeansBrightnessTemperatureFrequency,
  rayleighJeansBrightnessTemperatureWavelength,
} from "./brightness-temperature";
import { planckRadianceFrequency, planckRadianceWavelength } from "./planck";

const logUniform = (lo: number, hi: number) =>
  fc.double({ min: Math.log(lo), max: Math.log(hi), noNaN: true }).map((u) => Math.exp(u));
const T = (k: number) => assume<Temperature>(k);
const cm = (v: number) => assume<Length<"CGS">>(v);
const hz = (v: number) => assume<Frequency>(v);
const blC = (v: number) => assume<SpectralRadiancePerWavelength<"CGS">>(v);
const bnC = (v: number) => assume<SpectralRadiancePerFrequency<"CGS">>(v);
const rows = (fx as unknown as { rows: { lambda: number; T: number; nu: number; B_lambda: number | null; B_nu: number | null }[] }).rows;

describe("typed brightness temperature", () => {
  it("SI: the kernel's number; CGS: the kernel on λ/100 and B/10 (B_λ) or B/1000 (B_ν)", () => {
    fc.assert(
      fc.property(logUniform(1e-7, 10), logUniform(1e-20, 1e20), (lcm, b) => {
        expect(brightnessTemperatureWavelength(SI, assume<Length<"SI">>(lcm), assume<SpectralRadiancePerWavelength<"SI">>(b))).toBe(
          K.brightnessTemperatureWavelengthSI(lcm, b),
        );
        expect(brightnessTemperatureWavelength(CGS, cm(lcm), blC(b))).toBe(K.brightnessTemperatureWavelengthSI(lcm / 100, b / 10));
        expect(rayleighJeansBrightnessTemperatureWavelength(CGS, cm(lcm), blC(b))).toBe(
          K.rayleighJeansBrightnessTemperatureWavelengthSI(lcm / 100, b / 10),
        );
        const nu = 29979245800 / lcm;
        expect(brightnessTemperatureFrequency(CGS, hz(nu), bnC(b))).toBe(K.brightnessTemperatureFrequencySI(nu, b / 1000));
        expect(rayleighJeansBrightnessTemperatureFrequency(CGS, hz(nu), bnC(b))).toBe(
          K.rayleighJeansBrightnessTemperatureFrequencySI(nu, b / 1000),
        );
      }),
      { numRuns: 100 },
    );
  });

  it("inverts the mpmath Planck reference given in CGS units (test/fixtures/planck.json) to 1e-14", () => {
    // Source: mpmath 40-digit B_λ, B_ν (SI). Converting to CGS (×10, ×1000) and back (÷) adds ≤ 2 roundings; the
    // inversion damps relative errors in B by 1/(x/(1 − e^−x)) ≤ 1, so the kernel's 1e-14 bound stands.
    let worst = 0;
    for (const r of rows) {
      if (r.B_lambda !== null && r.B_lambda * 10 < Number.MAX_VALUE) {
        worst = Math.max(worst, Math.abs(brightnessTemperatureWavelength(CGS, cm(r.lambda * 100), blC(r.B_lambda * 10)) / r.T - 1));
      }
      if (r.B_nu !== null && r.B_nu * 1000 < Number.MAX_VALUE) {
        worst = Math.max(worst, Math.abs(brightnessTemperatureFrequency(CGS, hz(r.nu), bnC(r.B_nu * 1000)) / r.T - 1));
      }
    }
    console.log(`typed brightness temperature (CGS input): worst relative error vs fixture ${worst.toExponential(2)}`);
    expect(worst).toBeLessThan(1e-14);
  });

  it("round trip T → typed B_λ → T_b in CGS, and T_RJ ≤ T_b with T_RJ/T_b = x/(e^x − 1)", () => {
    fc.assert(
      fc.property(logUniform(1e-7, 10), logUniform(1, 1e7), (lcm, t) => {
        const b = planckRadianceWavelength(CGS, cm(lcm), T(t));
        if (b < 1e-290) return;
        expect(Math.abs(brightnessTemperatureWavelength(CGS, cm(lcm), b) / t - 1)).toBeLessThan(1e-14);
        const trj = rayleighJeansBrightnessTemperatureWavelength(CGS, cm(lcm), b);
        expect(trj).toBeLessThanOrEqual(t * (1 + 1e-15));
        // T_RJ = λ⁴B_λ/(2ck) = T·x/(eˣ − 1) exactly; a few roundings on each side → 1e-14 (x ≤ ~700 keeps it normal)
        const x = 1.4387768775039338 / (lcm * t);
        if (x < 700) expect(Math.abs(trj / (t * (x / Math.expm1(x))) - 1)).toBeLessThan(1e-14 * (1 + x));
      }),
      { numRuns: 100 },
    );
  });

  it("the CMB: B_ν(160 GHz, 2.7255 K) read back gives 2.7255 K; its Rayleigh–Jeans temperature is far lower (x ≈ 2.8)", () => {
    const nu = SI.of(160, units.GHz);
    const b = planckRadianceFrequency(CGS, nu, CGS.of(2.7255, units.K));
    expect(Math.abs(brightnessTemperatureFrequency(CGS, nu, b) / 2.7255 - 1)).toBeLessThan(1e-14);
    const x = (6.62607015e-34 * 160e9) / (1.380649e-23 * 2.7255);
    expect(Math.abs(rayleighJeansBrightnessTemperatureFrequency(CGS, nu, b) / (2.7255 * (x / Math.expm1(x))) - 1)).toBeLessThan(1e-14);
  });
});

describe("errors name the caller's unit", () => {
  it.each([0, -1, NaN, Infinity])("%s → RangeError in the caller's unit", (v) => {
    expect(() => brightnessTemperatureWavelength(CGS, cm(v), blC(1))).toThrow(/^wavelength must be a finite number > 0 cm; got/);
    expect(() => brightnessTemperatureWavelength(CGS, cm(1e-4), blC(v))).toThrow(/^radiance must be a finite number > 0 cm\^-1 g s\^-3 sr\^-1; got/);
    expect(() => brightnessTemperatureFrequency(CGS, hz(1e9), bnC(v))).toThrow(/^radiance must be a finite number > 0 g s\^-2 sr\^-1; got/);
    expect(() => rayleighJeansBrightnessTemperatureFrequency(SI, hz(v), assume<SpectralRadiancePerFrequency<"SI">>(1))).toThrow(
      /^frequency must be a finite number > 0 s\^-1; got/,
    );
  });
  it("a T_RJ beyond the double range names the CGS arguments", () => {
    expect(() => rayleighJeansBrightnessTemperatureWavelength(CGS, cm(1e200), blC(1e100))).toThrow(
      "the Rayleigh–Jeans brightness temperature overflows the double range in K for wavelength=1e+200 cm, radiance=1e+100 cm^-1 g s^-3 sr^-1",
    );
  });
});
