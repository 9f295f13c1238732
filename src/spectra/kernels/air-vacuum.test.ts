import fc from "fast-check";
import { describe, expect, it } from "vitest";
import fx from "../../../test/fixtures/air-vacuum.json";
import {
  AIR_WAVELENGTH_MAX_M,
  AIR_WAVELENGTH_MIN_M,
  VACUUM_WAVELENGTH_MAX_M,
  VACUUM_WAVELENGTH_MIN_M,
  airRefractiveIndexSI,
  airToVacuumWavelengthSI,
  airToVacuumWavelengthsSI,
  vacuumToAirWavelengthSI,
  vacuumToAirWavelengthsSI,
} from "./air-vacuum";

const rel = (a: number, b: number): number => Math.abs(a / b - 1);

describe("Edlén 1966 standard air vs mpmath (fixture air-vacuum.json, 40 digits)", () => {
  it("n(λ_vac) and vacuum → air, 200 nm – 20 µm", () => {
    // Direct double evaluation of a 3-term rational expression: ≤ 1e-15 expected; 1e-14 allowed.
    for (const r of fx.rows) {
      expect(rel(airRefractiveIndexSI(r.vacuum_m), r.n_of_vacuum)).toBeLessThan(1e-14);
      expect(rel(vacuumToAirWavelengthSI(r.vacuum_m), r.air_of_vacuum_m)).toBeLessThan(1e-14);
    }
  });
  it("air → vacuum (Newton) vs mpmath.findroot: ≤ 1e-10 (requirement; measured ≤ 2e-16)", () => {
    for (const r of fx.rows) {
      expect(rel(airToVacuumWavelengthSI(r.air_m), r.vacuum_of_air_m)).toBeLessThan(1e-10);
    }
  });
});

describe("sample conversions (from memory (NIST ASD))", () => {
  // NIST ASD converts with the Peck & Reeder (1972) dispersion formula, which differs from
  // Edlén 1966 by ≤ 1.3e-8 in n − 1 over 0.2–2 µm (computed when writing this test, with
  // Peck & Reeder's coefficients from memory); the remembered digits (0.1 pm at 656 nm,
  // and the Na D values only to about ±0.1 pm, i.e. ±0.001 Å) add ≤ 1.5e-7 and 1.7e-7.
  // Tolerances: 1.2e-7 (Hα), 2e-7 (Na D).
  it("Hα: vacuum 656.4614 nm ↔ air 656.2801 nm", () => {
    expect(rel(vacuumToAirWavelengthSI(656.4614e-9), 656.2801e-9)).toBeLessThan(1.2e-7);
    expect(rel(airToVacuumWavelengthSI(656.2801e-9), 656.4614e-9)).toBeLessThan(1.2e-7);
  });
  it("Na D2: air 588.9951 nm ↔ vacuum 589.1583 nm; Na D1: air 589.5924 nm ↔ vacuum 589.7558 nm", () => {
    expect(rel(airToVacuumWavelengthSI(588.9951e-9), 589.1583e-9)).toBeLessThan(2e-7);
    expect(rel(airToVacuumWavelengthSI(589.5924e-9), 589.7558e-9)).toBeLessThan(2e-7);
    expect(rel(vacuumToAirWavelengthSI(589.7558e-9), 589.5924e-9)).toBeLessThan(2e-7);
  });
  it("n − 1 of standard air at 589 nm ≈ 2.77e-4 (common practice: '2.77 × 10⁻⁴ in the visible')", () => {
    // 3 significant digits → rel 2e-3 on n − 1.
    expect(Math.abs((airRefractiveIndexSI(589.3e-9) - 1) / 2.77e-4 - 1)).toBeLessThan(2e-3);
  });
});

describe("properties", () => {
  const logUniform = (lo: number, hi: number) =>
    fc.double({ min: Math.log(lo), max: Math.log(hi), noNaN: true }).map((x) => Math.exp(x));
  it("air → vacuum → air round trip to 1e-10 (measured ≤ 3e-16)", () => {
    fc.assert(
      fc.property(logUniform(AIR_WAVELENGTH_MIN_M, AIR_WAVELENGTH_MAX_M), (a0) => {
        const a = Math.min(Math.max(a0, AIR_WAVELENGTH_MIN_M), AIR_WAVELENGTH_MAX_M);
        return rel(vacuumToAirWavelengthSI(airToVacuumWavelengthSI(a)), a) < 1e-10;
      }),
    );
  });
  it("vacuum → air → vacuum round trip to 1e-10", () => {
    fc.assert(
      fc.property(logUniform(VACUUM_WAVELENGTH_MIN_M, VACUUM_WAVELENGTH_MAX_M), (v0) => {
        const v = Math.min(Math.max(v0, VACUUM_WAVELENGTH_MIN_M), VACUUM_WAVELENGTH_MAX_M);
        return rel(airToVacuumWavelengthSI(vacuumToAirWavelengthSI(v)), v) < 1e-10;
      }),
    );
  });
  it("air wavelength is shorter than vacuum, by 2.7e-4 to 3.3e-4 relative (normal dispersion)", () => {
    fc.assert(
      fc.property(logUniform(VACUUM_WAVELENGTH_MIN_M, VACUUM_WAVELENGTH_MAX_M), (v0) => {
        const v = Math.min(Math.max(v0, VACUUM_WAVELENGTH_MIN_M), VACUUM_WAVELENGTH_MAX_M);
        const d = 1 - vacuumToAirWavelengthSI(v) / v;
        return d > 2.7e-4 && d < 3.3e-4;
      }),
    );
  });
  it("batch matches scalar and reports out-of-range rows", () => {
    const input = Float64Array.of(500e-9, 100e-9, Number.NaN, 2e-6, 1e-3);
    const out = new Float64Array(5);
    const r = vacuumToAirWavelengthsSI(input, out);
    expect(r.invalid).toEqual([1, 2, 4]);
    expect(r.values).toBe(out);
    // each reason is the message the scalar kernel throws for that row
    expect(() => vacuumToAirWavelengthSI(100e-9)).toThrow(new RangeError(r.reasons[0]));
    expect(r.reasons[1]).toMatch(/^vacuumWavelengthM must be in .* m \(standard-air formula range, 200 nm to 20 µm in air\); got NaN$/);
    expect(out[0]).toBe(vacuumToAirWavelengthSI(500e-9));
    expect(out[1]).toBeNaN();
    const back = new Float64Array(5);
    expect(airToVacuumWavelengthsSI(out, back).invalid).toEqual([1, 2, 4]);
    expect(back[0]).toBe(airToVacuumWavelengthSI(out[0] as number));
    expect(rel(back[3] as number, 2e-6)).toBeLessThan(1e-10);
  });
});

describe("bad input", () => {
  it("wavelengths outside 200 nm – 20 µm → RangeError naming the parameter", () => {
    expect(() => vacuumToAirWavelengthSI(150e-9)).toThrow(/vacuumWavelengthM must be in/);
    expect(() => airToVacuumWavelengthSI(199e-9)).toThrow(/airWavelengthM must be in/);
    expect(() => airToVacuumWavelengthSI(30e-6)).toThrow(/airWavelengthM/);
    expect(() => airRefractiveIndexSI(Number.NaN)).toThrow(/vacuumWavelengthM/);
    expect(() => vacuumToAirWavelengthSI(-500e-9)).toThrow(RangeError);
    expect(() => vacuumToAirWavelengthsSI(new Float64Array(3), new Float64Array(2))).toThrow(/output must/);
  });
  it("the range limits correspond: vacuum limits are the vacuum wavelengths of the air limits", () => {
    expect(rel(vacuumToAirWavelengthSI(VACUUM_WAVELENGTH_MIN_M), AIR_WAVELENGTH_MIN_M)).toBeLessThan(1e-15);
    expect(rel(vacuumToAirWavelengthSI(VACUUM_WAVELENGTH_MAX_M), AIR_WAVELENGTH_MAX_M)).toBeLessThan(1e-15);
  });
});
