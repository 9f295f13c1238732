import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { constants } from "../constants/index";
import { CGS, SI } from "../quantity/system";
import { units } from "../quantity/units";
import type { Flux, LengthArray, SpectralRadiancePerWavelength, Temperature, TemperatureArray } from "../quantity/aliases";
import { assume, assumeArray, kinds, type Length } from "../quantity/index";
import * as K from "./kernels/planck";
import {
  lambertianExitance,
  lambertianRadiance,
  planckPhotonRadianceFrequency,
  planckPhotonRadianceWavelength,
  planckPhotonRadianceWavenumber,
  planckRadianceFrequency,
  planckRadianceFrequencyDerivativeT,
  planckRadianceWavelength,
  planckRadianceWavelengthBatch,
  planckRadianceWavelengthDerivativeT,
  planckRadianceWavenumber,
} from "./planck";

const logUniform = (lo: number, hi: number) =>
  fc.double({ min: Math.log(lo), max: Math.log(hi), noNaN: true }).map((u) => Math.exp(u));
const T = (k: number) => assume<Temperature>(k);
const cm = (v: number) => assume<Length<"CGS">>(v);
const m = (v: number) => assume<Length<"SI">>(v);

describe("typed Planck family agrees with the SI kernels", () => {
  it("in SI the typed call returns exactly the kernel's number (no conversion happens)", () => {
    fc.assert(
      fc.property(logUniform(1e-9, 1e-1), logUniform(1, 1e6), (l, t) => {
        expect(planckRadianceWavelength(SI, m(l), T(t))).toBe(K.planckRadianceWavelengthSI(l, t));
        expect(planckPhotonRadianceWavelength(SI, m(l), T(t))).toBe(K.planckPhotonRadianceWavelengthSI(l, t));
        const nu = 299792458 / l;
        expect(planckRadianceFrequency(SI, nu as never, T(t))).toBe(K.planckRadianceFrequencySI(nu, t));
        expect(planckPhotonRadianceFrequency(SI, nu as never, T(t))).toBe(K.planckPhotonRadianceFrequencySI(nu, t));
        expect(planckRadianceWavenumber(SI, (1 / l) as never, T(t))).toBe(K.planckRadianceWavenumberSI(1 / l, t));
        expect(planckPhotonRadianceWavenumber(SI, (1 / l) as never, T(t))).toBe(K.planckPhotonRadianceWavenumberSI(1 / l, t));
        expect(planckRadianceWavelengthDerivativeT(SI, m(l), T(t))).toBe(K.planckRadianceWavelengthDerivativeTSI(l, t));
        expect(planckRadianceFrequencyDerivativeT(SI, nu as never, T(t))).toBe(K.planckRadianceFrequencyDerivativeTSI(nu, t));
      }),
      { numRuns: 100 },
    );
  });

  it("in CGS each result is the kernel's SI number × 10^k exactly, k from the dimension", () => {
    // 1 W m^-2 sr^-1 m^-1 = 10^7 erg s^-1 / (10^4 cm^2) / sr / (10^2 cm) = 10 erg s^-1 cm^-2 sr^-1 cm^-1 (k = 1);
    // per Hz: 10^7/10^4 = 10^3 (k = 3); per wavenumber: 10^7/10^4 × 10^2 = 10^5 (k = 5);
    // photons m^-2 sr^-1 m^-1 = 10^-6 photons cm^-2 sr^-1 cm^-1 (k = −6); per Hz k = −4; per m^-1 k = −2.
    // The CGS argument is converted to SI by the same exact scaling (÷100 for cm), so the kernel sees lcm/100.
    fc.assert(
      fc.property(logUniform(1e-7, 10), logUniform(1, 1e6), (lcm, t) => {
        const l = lcm / 100;
        expect(planckRadianceWavelength(CGS, cm(lcm), T(t))).toBe(K.planckRadianceWavelengthSI(l, t) * 10);
        expect(planckPhotonRadianceWavelength(CGS, cm(lcm), T(t))).toBe(K.planckPhotonRadianceWavelengthSI(l, t) / 1e6);
        const nu = 29979245800 / lcm;
        expect(planckRadianceFrequency(CGS, nu as never, T(t))).toBe(K.planckRadianceFrequencySI(nu, t) * 1000);
        expect(planckPhotonRadianceFrequency(CGS, nu as never, T(t))).toBe(K.planckPhotonRadianceFrequencySI(nu, t) / 1e4);
        const kcm = 1 / lcm; // cm^-1 → m^-1 is × 100
        expect(planckRadianceWavenumber(CGS, kcm as never, T(t))).toBe(K.planckRadianceWavenumberSI(kcm * 100, t) * 1e5);
        expect(planckPhotonRadianceWavenumber(CGS, kcm as never, T(t))).toBe(K.planckPhotonRadianceWavenumberSI(kcm * 100, t) / 100);
        // ∂B_λ/∂T has B_λ's length and mass exponents: k = 1; ∂B_ν/∂T: k = 3
        expect(planckRadianceWavelengthDerivativeT(CGS, cm(lcm), T(t))).toBe(K.planckRadianceWavelengthDerivativeTSI(l, t) * 10);
        expect(planckRadianceFrequencyDerivativeT(CGS, nu as never, T(t))).toBe(K.planckRadianceFrequencyDerivativeTSI(nu, t) * 1000);
      }),
      { numRuns: 100 },
    );
  });

  it("the same physical wavelength in either system gives the same physical radiance", () => {
    // 500 nm: CGS.of gives 5e-5 cm, SI.of 5e-7 m; 5e-5/100 is exactly the double 5e-7 (checked), so the
    // kernel sees the same argument and the two results differ only by the exact factor 10 of CGS.from.
    const lS = SI.of(500, units.nm);
    const lC = CGS.of(500, units.nm);
    expect(lC / 100).toBe(lS);
    const bS = planckRadianceWavelength(SI, lS, constants.Tsun.si);
    const bC = planckRadianceWavelength(CGS, lC, constants.Tsun.cgs);
    expect(bC).toBe(CGS.from(bS, kinds.spectralRadiancePerWavelength));
    // and for any wavelength: agreement to the rounding of the unit conversion of λ (×100 then ÷100:
    // ≤ 2 × 0.5 ulp ≤ 2.3e-16 relative in λ, amplified by |d ln B/d ln λ| = |x/(1 − e^−x) − 5| ≤ 5 + x),
    // plus each kernel's own error (≤ 6.7e-16 measured against mpmath, kernels/planck.test.ts) and the
    // rounding of ×10: tolerance (5 + x)·2.3e-16 + 1.5e-15.
    fc.assert(
      fc.property(logUniform(1e-8, 1e-2), logUniform(300, 1e5), (l, t) => {
        const si = planckRadianceWavelength(SI, m(l), T(t));
        const cg = planckRadianceWavelength(CGS, cm(l * 100), T(t));
        const x = 0.014387768775039339 / (l * t);
        if (si > 1e-290) expect(Math.abs(cg / 10 / si - 1)).toBeLessThan((5 + x) * 2.3e-16 + 1.5e-15);
      }),
      { numRuns: 100 },
    );
  });
});

describe("Lambertian exitance puts the π back", () => {
  it("lambertianExitance multiplies by π (sr) and lambertianRadiance divides it back", () => {
    const b = planckRadianceWavelength(SI, SI.of(500, units.nm), SI.of(5772, units.K));
    expect(lambertianExitance(b)).toBe(Math.PI * b);
    // π·b/π: two roundings → within 1 ulp
    expect(Math.abs(lambertianRadiance(lambertianExitance(b)) / b - 1)).toBeLessThanOrEqual(Number.EPSILON);
  });

  it("0 is a valid radiance and exitance (an underflowed B_λ)", () => {
    const zero = planckRadianceWavelength(SI, m(1e-12), T(1e-2)); // underflows to exactly 0 (kernels/planck.test.ts)
    expect(zero).toBe(0);
    expect(lambertianExitance(zero)).toBe(0);
    expect(lambertianRadiance(lambertianExitance(zero))).toBe(0);
  });

  it.each([-1, -Number.MIN_VALUE, NaN, Infinity, -Infinity])("%s is rejected with the standard RangeError (no unit: any system)", (v) => {
    const radiance = assume<SpectralRadiancePerWavelength<"CGS">>(v);
    expect(() => lambertianExitance(radiance)).toThrow(RangeError);
    expect(() => lambertianExitance(radiance)).toThrow(`radiance must be a finite number >= 0; got ${String(v)}`);
    expect(() => lambertianRadiance(assume<Flux<"SI">>(v))).toThrow(`exitance must be a finite number >= 0; got ${String(v)}`);
  });
});

describe("batch forms", () => {
  const temps = (xs: number[]) => assumeArray<TemperatureArray>(new Float64Array(xs));

  it("SI batch equals the scalar typed call row by row and reports invalid rows as NaN", () => {
    const grid = SI.arrayOf([400, 500, -1, 600, NaN, Infinity, 0, 700], units.nm);
    const { values, invalid } = planckRadianceWavelengthBatch(SI, grid, SI.of(5772, units.K));
    expect(invalid).toEqual([2, 4, 5, 6]);
    for (const i of [0, 1, 3, 7]) expect(values[i]).toBe(planckRadianceWavelength(SI, grid[i] as Length<"SI">, T(5772)));
    for (const i of invalid) expect(values[i]).toBeNaN();
  });

  it("CGS batch: values are 10 × the SI kernel on the converted grid, same invalid rows, input untouched", () => {
    const raw = [4e-5, 5e-5, -1, 6e-5, NaN];
    const grid = assumeArray<LengthArray<"CGS">>(new Float64Array(raw));
    const { values, invalid } = planckRadianceWavelengthBatch(CGS, grid, T(5772));
    expect(invalid).toEqual([2, 4]);
    expect(Array.from(grid)).toEqual(raw); // the caller's CGS array is copied, not converted in place
    for (const i of [0, 1, 3]) expect(values[i]).toBe(K.planckRadianceWavelengthSI((raw[i] as number) / 100, 5772) * 10);
  });

  it("CGS batch: a row finite in SI but overflowing ×10 becomes NaN and joins invalid, still ascending", () => {
    // Rayleigh–Jeans side, B_λ ≈ 2ckT/λ⁴: at λ = 1e-12 m choose T so that B_λ(SI) ≈ 5e307 (finite);
    // ×10 overflows in CGS.
    const l = 1e-12;
    const t = 5e307 / ((2 * 299792458 * 1.380649e-23) / l ** 4);
    const bSI = K.planckRadianceWavelengthSI(l, t);
    expect(Number.isFinite(bSI) && bSI > 1e307).toBe(true);
    const grid = assumeArray<LengthArray<"CGS">>(new Float64Array([-1, l * 100, 1]));
    const { values, invalid } = planckRadianceWavelengthBatch(CGS, grid, T(t));
    expect(invalid).toEqual([0, 1]);
    expect(values[1]).toBeNaN();
    expect(Number.isFinite(values[2])).toBe(true);
    // the scalar form throws instead, naming the caller's unit
    expect(() => planckRadianceWavelength(CGS, cm(l * 100), T(t))).toThrow(/overflows the double range in cm\^-1 g s\^-3 sr\^-1 for wavelength=1e-10 cm/);
  });

  it("temperature batch: SI equals the kernel; CGS is ×10; invalid temperatures reported", () => {
    const ts = temps([3000, -5, 5772, NaN, 1e4]);
    const si = planckRadianceWavelengthBatch(SI, SI.of(2.2, units.um), ts);
    const k = K.planckRadianceTemperatureBatchSI(2.2e-6, ts);
    expect(si.invalid).toEqual([1, 3]);
    expect(Array.from(si.values)).toEqual(Array.from(k.values));
    const cg = planckRadianceWavelengthBatch(CGS, cm(2.2e-4), ts);
    expect(cg.invalid).toEqual([1, 3]);
    for (const i of [0, 2, 4]) expect(cg.values[i]).toBe(K.planckRadianceWavelengthSI(2.2e-4 / 100, ts[i] as number) * 10);
  });

  it("wavelengths and temperatures both arrays: row i is the scalar B_λ(λ_i, T_i); unequal lengths throw before any row", () => {
    const grid = SI.arrayOf([400, 500, -1, 2200], units.nm);
    const ts = temps([3000, 5772, 5772, NaN]);
    const r = planckRadianceWavelengthBatch(SI, grid, ts);
    expect(r.invalid).toEqual([2, 3]);
    expect(r.reasons).toEqual(["wavelength must be a finite number > 0 m; got -1e-9", "temperature must be a finite number > 0 K; got NaN"]);
    for (const i of [0, 1]) expect(r.values[i]).toBe(planckRadianceWavelength(SI, SI.of(grid[i] as number, units.m), T(ts[i] as number)));
    expect(() => planckRadianceWavelengthBatch(SI, grid, temps([3000, 5772]))).toThrow(/must have the same length/);
  });

  it("reasons: each invalid row's reason is the sentence its scalar call throws, in the caller's unit", () => {
    // SI grid: the reasons name m and show the value the caller gave
    const grid = SI.arrayOf([500, -1, NaN, 600, 0], units.nm);
    const si = planckRadianceWavelengthBatch(SI, grid, T(5772));
    expect(si.invalid).toEqual([1, 2, 4]);
    expect(si.reasons).toEqual([
      "wavelength must be a finite number > 0 m; got -1e-9",
      "wavelength must be a finite number > 0 m; got NaN",
      "wavelength must be a finite number > 0 m; got 0",
    ]);
    // CGS: an input refused in cm, and a row finite in SI whose ×10 overflows, named in the CGS unit
    const l = 1e-12;
    const t = 5e307 / ((2 * 299792458 * 1.380649e-23) / l ** 4); // B_λ(SI) ≈ 5e307 (Rayleigh–Jeans side), as above
    const cgsGrid = assumeArray<LengthArray<"CGS">>(new Float64Array([-1, l * 100, 1, Infinity]));
    const cg = planckRadianceWavelengthBatch(CGS, cgsGrid, T(t));
    expect(cg.invalid).toEqual([0, 1, 3]);
    expect(cg.reasons).toEqual([
      "wavelength must be a finite number > 0 cm; got -1",
      `B_λ overflows the double range in cm^-1 g s^-3 sr^-1 for wavelength=1e-10 cm, temperature=${String(t)} K`,
      "wavelength must be a finite number > 0 cm; got Infinity",
    ]);
    cg.invalid.forEach((i, k) => {
      expect(() => planckRadianceWavelength(CGS, cm(cgsGrid[i] as number), T(t))).toThrow(cg.reasons[k] as string);
    });
    // temperature rows
    const tb = planckRadianceWavelengthBatch(CGS, cm(5e-5), temps([5772, -3, 0]));
    expect(tb.invalid).toEqual([1, 2]);
    expect(tb.reasons).toEqual(["temperature must be a finite number > 0 K; got -3", "temperature must be a finite number > 0 K; got 0"]);
    // no invalid rows: both lists empty
    const ok = planckRadianceWavelengthBatch(SI, SI.arrayOf([400, 500], units.nm), T(5772));
    expect(ok.invalid).toEqual([]);
    expect(ok.reasons).toEqual([]);
  });

  it("a bad shared argument throws before any row is written, in the caller's unit", () => {
    expect(() => planckRadianceWavelengthBatch(CGS, assumeArray<LengthArray<"CGS">>(new Float64Array(3)), T(-1))).toThrow(
      "temperature must be a finite number > 0 K; got -1",
    );
    expect(() => planckRadianceWavelengthBatch(CGS, cm(-2), temps([1]))).toThrow("wavelength must be a finite number > 0 cm; got -2");
  });
});

describe("errors name the caller's unit", () => {
  it.each([0, -1, NaN, Infinity])("wavelength %s: a CGS caller sees cm, an SI caller m", (v) => {
    expect(() => planckRadianceWavelength(CGS, cm(v), T(5772))).toThrow(/^wavelength must be a finite number > 0 cm; got/);
    expect(() => planckRadianceWavelength(SI, m(v), T(5772))).toThrow(/^wavelength must be a finite number > 0 m; got/);
    expect(() => planckRadianceWavenumber(CGS, v as never, T(5772))).toThrow(/^wavenumber must be a finite number > 0 cm\^-1; got/);
    expect(() => planckRadianceFrequency(CGS, v as never, T(5772))).toThrow(/^frequency must be a finite number > 0 s\^-1; got/);
    expect(() => planckRadianceWavelength(CGS, cm(1e-4), T(v))).toThrow(/^temperature must be a finite number > 0 K; got/);
  });

  it("a CGS value valid in cm but underflowing on conversion to m is reported in cm", () => {
    expect(() => planckRadianceWavelength(CGS, cm(1e-322), T(5772))).toThrow(/wavelength = 1e-322 cm is outside the double range once converted to SI/);
  });
});
