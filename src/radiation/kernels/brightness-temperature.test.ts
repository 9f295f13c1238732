import fc from "fast-check";
import { describe, expect, it } from "vitest";
import fx from "../../../test/fixtures/planck.json";
import {
  brightnessTemperatureFrequencySI,
  brightnessTemperatureWavelengthSI,
  rayleighJeansBrightnessTemperatureFrequencySI,
  rayleighJeansBrightnessTemperatureWavelengthSI,
} from "./brightness-temperature";
import { planckRadianceFrequencySI, planckRadianceWavelengthSI } from "./planck";
import { rayleighJeansRadianceFrequencySI, rayleighJeansRadianceWavelengthSI } from "./approximations";

const logUniform = (lo: number, hi: number) =>
  fc.double({ min: Math.log(lo), max: Math.log(hi), noNaN: true }).map((u) => Math.exp(u));
const rows = (fx as unknown as { rows: { lambda: number; T: number; nu: number; x: number; B_lambda: number | null; B_nu: number | null }[] }).rows;

describe("brightness temperature inverts the mpmath Planck reference", () => {
  it("T_b(λ, B_λ ref) and T_b(ν, B_ν ref) return the fixture T to ≤ 1e-14 relative", () => {
    // Source: test/fixtures/planck.json (mpmath). The reference B carries ≤ 0.5 ulp; its effect on T_b is
    // that relative error divided by d ln B/d ln T = x/(1 − e^−x) ≥ 1, so ≤ 1.1e-16; log1p and the
    // divisions add a few ulp → 1e-14 is generous but far below any physical use.
    let worst = 0;
    for (const r of rows) {
      if (r.B_lambda !== null) worst = Math.max(worst, Math.abs(brightnessTemperatureWavelengthSI(r.lambda, r.B_lambda) / r.T - 1));
      if (r.B_nu !== null) worst = Math.max(worst, Math.abs(brightnessTemperatureFrequencySI(r.nu, r.B_nu) / r.T - 1));
    }
    console.log(`brightness temperature: worst relative error vs fixture ${worst.toExponential(2)}`);
    expect(worst).toBeLessThan(1e-14);
  });
});

describe("properties", () => {
  it("round trip T → B → T_b over the whole λ, T box", () => {
    fc.assert(
      fc.property(logUniform(1e-12, 1e4), logUniform(1e-2, 1e10), (l, T) => {
        const b = planckRadianceWavelengthSI(l, T);
        if (b < 1e-300) return;
        expect(Math.abs(brightnessTemperatureWavelengthSI(l, b) / T - 1)).toBeLessThan(1e-14);
      }),
    );
  });
  it("Rayleigh–Jeans brightness temperature inverts the Rayleigh–Jeans law exactly and ≥ T_b", () => {
    fc.assert(
      fc.property(logUniform(1e-6, 1), logUniform(1, 1e6), (l, T) => {
        const rj = rayleighJeansRadianceWavelengthSI(l, T);
        expect(Math.abs(rayleighJeansBrightnessTemperatureWavelengthSI(l, rj) / T - 1)).toBeLessThan(4e-16 * 8);
        const nu = 299792458 / l;
        const rjn = rayleighJeansRadianceFrequencySI(nu, T);
        expect(Math.abs(rayleighJeansBrightnessTemperatureFrequencySI(nu, rjn) / T - 1)).toBeLessThan(4e-16 * 8);
        // for a true blackbody the RJ temperature underestimates: T_RJ = T·x/(eˣ−1) ≤ T
        const b = planckRadianceFrequencySI(nu, T);
        if (b > 1e-300) expect(rayleighJeansBrightnessTemperatureFrequencySI(nu, b)).toBeLessThanOrEqual(T * (1 + 1e-15));
      }),
    );
  });
  it("extreme radiances (outside the double range of the intermediate y) give finite results", () => {
    // y = 2hc²/(λ⁵B) overflows: B = 1e-300 at λ = 1e-12 m
    const t1 = brightnessTemperatureWavelengthSI(1e-12, 1e-300);
    expect(Number.isFinite(t1) && t1 > 0).toBe(true);
    // B_λ at λ = 1e-12 m for T = 0.5e8 K (x ≈ 288): normal value, Wien regime
    const b = planckRadianceWavelengthSI(1e-12, 0.5e8);
    expect(Math.abs(brightnessTemperatureWavelengthSI(1e-12, b) / 0.5e8 - 1)).toBeLessThan(1e-14);
    // huge B at long wavelength: y tiny (RJ limit); T_b = λ⁴B/(2ck)
    const t2 = brightnessTemperatureWavelengthSI(1e3, 1e200);
    expect(Math.abs(t2 / rayleighJeansBrightnessTemperatureWavelengthSI(1e3, 1e200) - 1)).toBeLessThan(1e-12);
    expect(Number.isFinite(brightnessTemperatureWavelengthSI(1e-60, 1e-300))).toBe(true);
    expect(Number.isFinite(brightnessTemperatureFrequencySI(1e-100, 1e-300))).toBe(true);
  });
});

describe("bad input", () => {
  it.each([0, -1, NaN, Infinity])("%s → RangeError naming the parameter", (v) => {
    expect(() => brightnessTemperatureWavelengthSI(v, 1)).toThrow(/wavelength/);
    expect(() => brightnessTemperatureWavelengthSI(1e-6, v)).toThrow(/radiance/);
    expect(() => brightnessTemperatureFrequencySI(v, 1)).toThrow(/frequency/);
    expect(() => rayleighJeansBrightnessTemperatureFrequencySI(1e9, v)).toThrow(/radiance/);
    expect(() => rayleighJeansBrightnessTemperatureWavelengthSI(v, 1)).toThrow(/wavelength/);
  });
});
