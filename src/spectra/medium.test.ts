import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { CGS, SI } from "../quantity/system";
import { times10 } from "../quantity/unit";
import { units } from "../quantity/units";
import { assume, assumeArray } from "../quantity/quantity";
import type { Length, LengthArray } from "../quantity/aliases";
import {
  AIR_WAVELENGTH_MAX_M,
  AIR_WAVELENGTH_MIN_M,
  airRefractiveIndexSI,
  airToVacuumWavelengthSI,
  vacuumToAirWavelengthSI,
} from "./kernels/air-vacuum";
import {
  airRefractiveIndex,
  vacuumFromAir,
  vacuumFromAirBatch,
  airWavelength,
  airWavelengthArray,
  airFromVacuum,
  airFromVacuumBatch,
  vacuumWavelength,
  vacuumWavelengthArray,
} from "./medium";

const rel = (a: number, b: number): number => Math.abs(a / b - 1);
const vacSI = (m: number) => vacuumWavelength(SI, assume<Length<"SI">>(m));
const airSI = (m: number) => airWavelength(SI, assume<Length<"SI">>(m));

describe("typed = kernel (SI), CGS = SI × 10² exactly", () => {
  const samples = [200.1e-9, 486.27e-9, 656.4614e-9, 1.875e-6, 19.9e-6];
  it("airFromVacuum, vacuumFromAir, airRefractiveIndex in SI return the kernel's numbers", () => {
    for (const m of samples) {
      expect(airFromVacuum(SI, vacSI(m))).toBe(vacuumToAirWavelengthSI(m));
      expect(vacuumFromAir(SI, airSI(m))).toBe(airToVacuumWavelengthSI(m));
      expect(airRefractiveIndex(SI, vacSI(m))).toBe(airRefractiveIndexSI(m));
    }
  });
  it("in CGS the same physical input gives the SI result × 100 (one correctly rounded scaling)", () => {
    for (const m of samples) {
      const cm = times10(m, 2);
      const si = times10(cm, -2); // the SI form of the CGS input
      expect(airFromVacuum(CGS, vacuumWavelength(CGS, assume<Length<"CGS">>(cm)))).toBe(times10(airFromVacuum(SI, vacSI(si)), 2));
      expect(vacuumFromAir(CGS, airWavelength(CGS, assume<Length<"CGS">>(cm)))).toBe(times10(vacuumFromAir(SI, airSI(si)), 2));
      expect(airRefractiveIndex(CGS, assume<Length<"CGS">>(cm))).toBe(airRefractiveIndex(SI, vacSI(si)));
    }
  });
});

describe("against NIST ASD wavelengths (from memory (NIST ASD)), branded", () => {
  // NIST converts with Peck & Reeder (1972), which differs from Edlén (1966) by ≤ 1.3e-8 in
  // n − 1 (kernels/air-vacuum.test.ts); the remembered digits (±0.1 pm at 656 nm, ±0.1 pm for
  // Na D) add ≤ 1.5e-7 and 1.7e-7 → tolerances 1.2e-7 (Hα) and 2e-7 (Na D), as in the kernel tests.
  it("Hα: vacuum 656.4614 nm → air 656.2801 nm, in SI and in Å (CGS)", () => {
    const air = airFromVacuum(SI, vacuumWavelength(SI, SI.of(656.4614, units.nm)));
    expect(rel(SI.valueIn(air, units.nm), 656.2801)).toBeLessThan(1.2e-7);
    const airC = airFromVacuum(CGS, vacuumWavelength(CGS, CGS.of(6564.614, units.angstrom)));
    expect(rel(CGS.valueIn(airC, units.angstrom), 6562.801)).toBeLessThan(1.2e-7);
  });
  it("Na D2: air 5889.951 Å → vacuum 5891.583 Å", () => {
    const vac = vacuumFromAir(CGS, airWavelength(CGS, CGS.of(5889.951, units.angstrom)));
    expect(rel(CGS.valueIn(vac, units.angstrom), 5891.583)).toBeLessThan(2e-7);
  });
});

describe("properties", () => {
  const logUniform = (lo: number, hi: number) =>
    fc.double({ min: Math.log(lo), max: Math.log(hi), noNaN: true }).map((x) => Math.exp(x));
  it("air → vacuum → air round trip in CGS to 1e-14 (kernel round trip ≤ 3e-16, plus two scalings)", () => {
    fc.assert(
      fc.property(logUniform(AIR_WAVELENGTH_MIN_M * 1.000001, AIR_WAVELENGTH_MAX_M * 0.999999), (m) => {
        const a = airWavelength(CGS, assume<Length<"CGS">>(times10(m, 2)));
        return rel(airFromVacuum(CGS, vacuumFromAir(CGS, a)), a) < 1e-14;
      }),
      { numRuns: 200 },
    );
  });
  it("the vacuum wavelength is the longer one, by n − 1 ∈ (2.7e-4, 3.3e-4)", () => {
    fc.assert(
      fc.property(logUniform(AIR_WAVELENGTH_MIN_M, AIR_WAVELENGTH_MAX_M), (m0) => {
        const m = Math.min(Math.max(m0, AIR_WAVELENGTH_MIN_M), AIR_WAVELENGTH_MAX_M);
        const v = vacuumFromAir(SI, airSI(m));
        const d = v / m - 1;
        return d > 2.7e-4 && d < 3.3e-4;
      }),
      { numRuns: 200 },
    );
  });
});

describe("arrays", () => {
  it("match the scalar conversions, report out-of-range rows, and work in CGS", () => {
    const v = vacuumWavelengthArray(SI, SI.arrayOf([486.27, 656.47, 50, Number.NaN, 2000], units.nm));
    const { values, invalid } = airFromVacuumBatch(SI, v);
    expect(invalid).toEqual([2, 3]);
    expect(values[0]).toBe(airFromVacuum(SI, vacSI(v[0] as number)));
    expect(values[2]).toBeNaN();
    const back = vacuumFromAirBatch(SI, values);
    expect(back.invalid).toEqual([2, 3]);
    expect(rel(back.values[4] as number, v[4] as number)).toBeLessThan(1e-14);
    const c = airWavelengthArray(CGS, assumeArray<LengthArray<"CGS">>(Float64Array.of(6562.8e-8, 1e-6)));
    const r = vacuumFromAirBatch(CGS, c);
    expect(r.invalid).toEqual([1]);
    expect(r.values[0]).toBe(vacuumFromAir(CGS, airWavelength(CGS, assume<Length<"CGS">>(6562.8e-8))));
    // the input is not modified
    expect(c[1]).toBe(1e-6);
  });
});

describe("bad input: RangeError naming the parameter, value and the caller's unit", () => {
  it("outside 200 nm – 20 µm", () => {
    expect(() => airFromVacuum(CGS, vacuumWavelength(CGS, CGS.of(1000, units.angstrom)))).toThrow(/^wavelength must be in \[0\.0000200064\d*, 0\.0020005\d*\] cm \(standard-air formula range.*got 0\.00001$/);
    expect(() => vacuumFromAir(SI, airSI(30e-6))).toThrow(/wavelength must be in \[2e-7, 0\.00002\] m .*got 0\.00003/);
    expect(() => airRefractiveIndex(SI, SI.of(100, units.nm))).toThrow(/wavelength must be in/);
    expect(() => vacuumFromAir(SI, assume<Length<"SI"> & ReturnType<typeof airSI>>(Number.NaN))).toThrow(/got NaN/);
  });
  it("constructors reject non-positive and non-finite lengths", () => {
    expect(() => vacuumWavelength(SI, SI.of(-1, units.nm))).toThrow(/^length must be a finite number > 0 m; got -1e-9$/);
    expect(() => airWavelength(CGS, assume<Length<"CGS">>(Infinity))).toThrow(/length must be a finite number > 0 cm/);
  });
});

describe("array rows carry the scalar form's message, in the caller's unit", () => {
  it("outside the formula's range, or not positive", () => {
    const r = airFromVacuumBatch(CGS, vacuumWavelengthArray(CGS, assumeArray<LengthArray<"CGS">>(Float64Array.of(6.5646e-5, 1e-5, -1))));
    expect(r.invalid).toEqual([1, 2]);
    expect(r.reasons[0]).toMatch(/^wavelength must be in \[0\.0000200064\d*, 0\.0020005\d*\] cm \(standard-air formula range, 200 nm to 20 µm in air\); got 0\.00001$/);
    expect(r.reasons[1]).toBe("wavelength must be a finite number > 0 cm; got -1");
    expect(() => airFromVacuum(CGS, vacuumWavelength(CGS, assume<Length<"CGS">>(1e-5)))).toThrow(new RangeError(r.reasons[0]));
    const a = vacuumFromAirBatch(SI, airWavelengthArray(SI, assumeArray<LengthArray<"SI">>(Float64Array.of(30e-6, 500e-9))));
    expect(a.invalid).toEqual([0]);
    expect(a.reasons).toEqual(["wavelength must be in [2e-7, 0.00002] m (standard-air formula range); got 0.00003"]);
  });
});
