import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { C } from "../values/constants";
import { CGS, SI } from "../quantity/system";
import { times10 } from "../quantity/unit";
import { units } from "../quantity/units";
import { assume, assumeArray } from "../quantity/quantity";
import type { Length, LengthArray, Velocity } from "../quantity/aliases";
import {
  classicalDopplerWavelengthSI,
  classicalVelocityFromWavelengthsSI,
  dopplerShiftWavelengthsSI,
  observedWavelengthFromRedshiftSI,
  radialVelocityFromWavelengthsSI,
  redshiftFromRadialVelocitySI,
  redshiftFromWavelengthsSI,
  relativisticDopplerWavelengthSI,
  radialVelocityFromRedshiftSI,
} from "./kernels/doppler";
import { AIR_WAVELENGTH_MAX_M } from "./kernels/air-vacuum";
import {
  observedWavelengthFromRadialVelocity,
  observedWavelengthFromRadialVelocityBatch,
  radialVelocityFromWavelengths,
  redshiftFromRadialVelocity,
  redshiftFromWavelengths,
  observedWavelengthFromRedshift,
  radialVelocityFromRedshift,
  type DopplerModel,
} from "./doppler";
import { vacuumFromAir, airWavelength, airFromVacuum, vacuumWavelength } from "./medium";
import { ions } from "./levels";
import { transitionVacuumWavelength } from "./lines";

const rel = (a: number, b: number): number => Math.abs(a / b - 1);
const lenSI = (x: number) => assume<Length<"SI">>(x);
const lenCGS = (x: number) => assume<Length<"CGS">>(x);
const vSI = (x: number) => assume<Velocity<"SI">>(x);
const vCGS = (x: number) => assume<Velocity<"CGS">>(x);
const signedLog = (lo: number, hi: number) =>
  fc.tuple(fc.boolean(), fc.double({ min: Math.log(lo), max: Math.log(hi), noNaN: true })).map(([s, x]) => (s ? 1 : -1) * Math.exp(x));

describe("typed = kernel (SI)", () => {
  it("scalar functions", () => {
    for (const v of [-2.9e8, -3e4, 1e-3, 1.2e5, 0.6 * C]) {
      expect(redshiftFromRadialVelocity(SI, vSI(v))).toBe(redshiftFromRadialVelocitySI(v));
      expect(redshiftFromRadialVelocity(SI, vSI(v), "classical")).toBe(v / C);
      expect(observedWavelengthFromRadialVelocity(SI, lenSI(656.28e-9), vSI(v))).toBe(relativisticDopplerWavelengthSI(656.28e-9, v));
      expect(observedWavelengthFromRadialVelocity(SI, lenSI(656.28e-9), vSI(v), "classical")).toBe(classicalDopplerWavelengthSI(656.28e-9, v));
    }
    for (const z of [-0.5, 1e-6, 0.1, 3, 1100]) {
      expect(radialVelocityFromRedshift(SI, z)).toBe(radialVelocityFromRedshiftSI(z));
      expect(radialVelocityFromRedshift(SI, z, "classical")).toBe(C * z);
      expect(observedWavelengthFromRedshift(SI, lenSI(121.567e-9), z)).toBe(observedWavelengthFromRedshiftSI(121.567e-9, z));
    }
    expect(redshiftFromWavelengths(SI, lenSI(660e-9), lenSI(600e-9))).toBe(redshiftFromWavelengthsSI(660e-9, 600e-9));
    expect(radialVelocityFromWavelengths(SI, lenSI(656.3e-9), lenSI(656.28e-9))).toBe(radialVelocityFromWavelengthsSI(656.3e-9, 656.28e-9));
    expect(radialVelocityFromWavelengths(SI, lenSI(656.3e-9), lenSI(656.28e-9), "classical")).toBe(
      classicalVelocityFromWavelengthsSI(656.3e-9, 656.28e-9),
    );
  });
  it("line lists", () => {
    const rest = Float64Array.of(656.28e-9, 486.13e-9, -1, Number.NaN, 2e-6);
    const ref = new Float64Array(5);
    const r = dopplerShiftWavelengthsSI(rest, 3e5, ref);
    const typed = observedWavelengthFromRadialVelocityBatch(SI, assumeArray<LengthArray<"SI">>(rest), vSI(3e5));
    expect(typed.invalid).toEqual(r.invalid);
    expect(typed.invalid).toEqual([2, 3]);
    for (const i of [0, 1, 4]) expect(typed.values[i]).toBe(ref[i]);
    expect(typed.values[2]).toBeNaN();
    // a new array: the input is untouched
    expect(rest[0]).toBe(656.28e-9);
    // classical: each row is the scalar classical shift
    const cl = observedWavelengthFromRadialVelocityBatch(SI, assumeArray<LengthArray<"SI">>(rest), vSI(3e5), "classical");
    expect(cl.values[1]).toBe(classicalDopplerWavelengthSI(486.13e-9, 3e5));
  });
});

describe("CGS = SI × 10^k exactly for the same physical input", () => {
  it("velocities × 10², redshifts unchanged, wavelengths × 10²", () => {
    for (const model of ["relativistic", "classical"] as DopplerModel[]) {
      for (const z of [-0.3, 1e-4, 2]) {
        expect(radialVelocityFromRedshift(CGS, z, model)).toBe(times10(radialVelocityFromRedshift(SI, z, model), 2));
      }
      for (const ms of [-1e5, 42, 2.5e7]) {
        const cms = times10(ms, 2);
        const si = times10(cms, -2);
        expect(redshiftFromRadialVelocity(CGS, vCGS(cms), model)).toBe(redshiftFromRadialVelocity(SI, vSI(si), model));
        const lamCm = times10(486.27e-9, 2);
        const lamSi = times10(lamCm, -2);
        expect(observedWavelengthFromRadialVelocity(CGS, lenCGS(lamCm), vCGS(cms), model)).toBe(times10(observedWavelengthFromRadialVelocity(SI, lenSI(lamSi), vSI(si), model), 2));
        const arr = assumeArray<LengthArray<"CGS">>(Float64Array.of(lamCm, 0));
        const shifted = observedWavelengthFromRadialVelocityBatch(CGS, arr, vCGS(cms), model);
        expect(shifted.values[0]).toBe(times10(observedWavelengthFromRadialVelocity(SI, lenSI(lamSi), vSI(si), model), 2));
        expect(shifted.invalid).toEqual([1]);
      }
    }
  });
});

describe("physics", () => {
  it("β = 0.6 → z = 1 exactly as the textbook point (Rybicki & Lightman §4.8): 1 + z = √(1.6/0.4) = 2", () => {
    // atanh/expm1 of 0.6: a few ulp → 1e-15
    expect(Math.abs(redshiftFromRadialVelocity(CGS, CGS.of(0.6 * 299792.458, units.km_per_s)) - 1)).toBeLessThan(1e-15);
  });
  it("property: velocity → redshift → velocity round trip in CGS (|β| 1e-12 … 0.999)", () => {
    fc.assert(
      fc.property(signedLog(1e-12, 0.999), fc.constantFrom<DopplerModel>("relativistic", "classical"), (beta, model) => {
        const v = vCGS(times10(beta * C, 2));
        // kernel bound 4e-15 relative (kernels/doppler.test.ts) plus two correctly rounded scalings
        return rel(radialVelocityFromRedshift(CGS, redshiftFromRadialVelocity(CGS, v, model), model), v) < 5e-15;
      }),
      { numRuns: 200 },
    );
  });
  it("property: shift a line, then measure its velocity: the velocity comes back (same medium, any brand)", () => {
    fc.assert(
      fc.property(signedLog(1e-7, 0.9), fc.double({ min: 200e-9, max: 20e-6, noNaN: true }), (beta, m) => {
        const rest = airWavelength(SI, lenSI(m));
        const v = vSI(beta * C);
        const obs = observedWavelengthFromRadialVelocity(SI, rest, v);
        // the kernel's bound (kernels/doppler.test.ts): |Δv| ≤ 1e-15|v| + 4e-16 c
        return Math.abs(radialVelocityFromWavelengths(SI, obs, rest) - v) <= 1e-15 * Math.abs(v) + 4e-16 * C;
      }),
      { numRuns: 200 },
    );
  });
  it("classical and relativistic agree to O(β²)", () => {
    const lam = vacuumWavelength(SI, SI.of(500, units.nm));
    const v = SI.of(100, units.km_per_s);
    const beta = 1e5 / C;
    const d = observedWavelengthFromRadialVelocity(SI, lam, v) - observedWavelengthFromRadialVelocity(SI, lam, v, "classical");
    // λ(β²/2 + β³/2 + …): compare with λβ²/2 to O(β) relative (3e-4), plus rounding of λ (1e-16 λ → 2e-9 of d)
    expect(rel(d, (lam * beta * beta) / 2)).toBeLessThan(1e-3);
  });
  it("a redshifted Lyman α at z = 3 is observed at 486.27 nm (vacuum), 486.13 nm in air", () => {
    const lyA = transitionVacuumWavelength(SI, ions.H, 1, 2, { model: "dirac-centroid" });
    const obs = observedWavelengthFromRedshift(SI, lyA, 3);
    // 4 × 121.5668 nm = 486.267 nm; the Dirac centroid is within 1e-5 of NIST's 121.567 (lines.test.ts)
    expect(rel(SI.valueIn(obs, units.nm), 4 * 121.567)).toBeLessThan(1e-5);
    expect(rel(SI.valueIn(airFromVacuum(SI, obs), units.nm), 486.13)).toBeLessThan(2e-5);
  });
  it("the air approximation: shifting an air wavelength directly vs through vacuum (module header bound)", () => {
    // exact: air → vacuum → shift → air. Measured worst cases on a 4000-point log grid, |z| ≤ 1e-2:
    // ≤ 4.4e-5|z| above 300 nm, ≤ 1.4e-5|z| above 500 nm, ≤ 1.5e-4|z| down to 200 nm.
    let worst300 = 0;
    let worst500 = 0;
    let worst200 = 0;
    for (const z of [1e-3, -1e-3, 1e-2, -1e-2]) {
      for (let i = 0; i <= 400; i++) {
        const m = 200e-9 * Math.pow(AIR_WAVELENGTH_MAX_M / 200e-9, i / 400);
        const air = airWavelength(SI, lenSI(m));
        const vac = vacuumFromAir(SI, air);
        const vacObs = observedWavelengthFromRedshift(SI, vac, z);
        if (!(vacObs >= 200.07e-9 && vacObs <= 20.005e-6)) continue;
        const exact = airFromVacuum(SI, vacObs);
        const r = rel(observedWavelengthFromRedshift(SI, air, z), exact) / Math.abs(z);
        worst200 = Math.max(worst200, r);
        if (m >= 300e-9) worst300 = Math.max(worst300, r);
        if (m >= 500e-9) worst500 = Math.max(worst500, r);
      }
    }
    expect(worst300).toBeLessThan(4.4e-5);
    expect(worst500).toBeLessThan(1.4e-5);
    expect(worst200).toBeLessThan(1.5e-4);
    // and it is a real effect, not rounding: ≥ 1e-6 |z| somewhere
    expect(worst500).toBeGreaterThan(1e-6);
  });
});

describe("bad input: RangeError naming the parameter and the caller's unit", () => {
  it("|v| ≥ c", () => {
    expect(() => redshiftFromRadialVelocity(CGS, vCGS(3e10))).toThrow(/^radialVelocity must be a finite number with \|radialVelocity\| < c = 29979245800 cm s\^-1; got 30000000000$/);
    expect(() => observedWavelengthFromRadialVelocity(SI, lenSI(5e-7), vSI(-C))).toThrow(/radialVelocity .* m s\^-1/);
    expect(() => observedWavelengthFromRadialVelocityBatch(SI, assumeArray<LengthArray<"SI">>(new Float64Array(2)), vSI(Number.NaN))).toThrow(/radialVelocity/);
  });
  it("redshift ≤ −1, bad wavelengths, bad model", () => {
    expect(() => radialVelocityFromRedshift(SI, -1)).toThrow(/^redshift must be a finite number > -1/);
    expect(() => observedWavelengthFromRedshift(SI, lenSI(5e-7), Number.NaN)).toThrow(/^redshift must/);
    expect(() => observedWavelengthFromRadialVelocity(CGS, lenCGS(-5e-5), vCGS(0))).toThrow(/^restWavelength must be a finite number > 0 cm; got -0.00005$/);
    expect(() => redshiftFromWavelengths(SI, lenSI(0), lenSI(1))).toThrow(/^observedWavelength must/);
    expect(() => radialVelocityFromWavelengths(SI, lenSI(1), lenSI(-1))).toThrow(/^restWavelength must/);
    expect(() => redshiftFromRadialVelocity(SI, vSI(1), "newtonian" as DopplerModel)).toThrow(/^model must be/);
  });
});

describe("the strict bounds |v| < c and z > −1 are exact, in either system", () => {
  it("v = c is refused and the largest double below c is accepted (SI); c in cm s⁻¹ is refused (CGS)", () => {
    expect(() => redshiftFromRadialVelocity(SI, vSI(C))).toThrow(/^radialVelocity must be a finite number with \|radialVelocity\| < c = 299792458 m s\^-1; got 299792458$/);
    expect(() => redshiftFromRadialVelocity(SI, vSI(-C))).toThrow(/got -299792458$/);
    // c − 2⁻²⁴ m s⁻¹ is the double just below c: 1 − β ≈ 2e-16, so 1 + z ≈ √(2/2e-16) ≈ 1e8 (finite)
    const z = redshiftFromRadialVelocity(SI, vSI(C - 2 ** -24));
    expect(z).toBeGreaterThan(1e7);
    expect(z).toBeLessThan(1e9);
    expect(() => observedWavelengthFromRadialVelocity(CGS, lenCGS(5e-5), vCGS(29979245800))).toThrow(/^radialVelocity must be a finite number with \|radialVelocity\| < c = 29979245800 cm s\^-1; got 29979245800$/);
  });
  it("z = −1 is refused, the next double above it accepted (v → −c)", () => {
    expect(() => radialVelocityFromRedshift(CGS, -1)).toThrow(/^redshift must be a finite number > -1; got -1$/);
    expect(() => observedWavelengthFromRedshift(CGS, lenCGS(5e-5), Number.NEGATIVE_INFINITY)).toThrow(/^redshift must be a finite number > -1; got -Infinity$/);
    const v = radialVelocityFromRedshift(CGS, -1 + 2 ** -53);
    // q = z(2 + z) rounds to z (2 + z rounds to 1), so v = c·z/(1 + 2⁻⁵³ → 1) = −c(1 − 2⁻⁵³):
    // just inside −c, within a few ulp of it
    expect(v).toBeGreaterThan(-29979245800);
    expect(rel(v, -29979245800)).toBeLessThan(1e-15);
  });
});

describe("line lists: each bad row carries the message its scalar form would throw", () => {
  it("non-positive and non-finite rows, in the caller's unit", () => {
    const rows = assumeArray<LengthArray<"CGS">>(Float64Array.of(6.5628e-5, 0, Number.NaN, -1e-5));
    const r = observedWavelengthFromRadialVelocityBatch(CGS, rows, vCGS(3e6));
    expect(r.invalid).toEqual([1, 2, 3]);
    expect(r.reasons).toEqual([
      "restWavelength must be a finite number > 0 cm; got 0",
      "restWavelength must be a finite number > 0 cm; got NaN",
      "restWavelength must be a finite number > 0 cm; got -0.00001",
    ]);
    expect(() => observedWavelengthFromRadialVelocity(CGS, lenCGS(0), vCGS(3e6))).toThrow(new RangeError(r.reasons[0]));
    expect(r.values[0]).toBe(observedWavelengthFromRadialVelocity(CGS, lenCGS(6.5628e-5), vCGS(3e6)));
    // the classical model reports the same rows
    expect(observedWavelengthFromRadialVelocityBatch(CGS, rows, vCGS(3e6), "classical").reasons).toEqual(r.reasons);
  });
  it("a shifted wavelength beyond the double range only in CGS is a reported row, not Infinity", () => {
    // v = 0.9c: 1 + z = √19 ≈ 4.36; 5e307 cm = 5e305 m → 2.2e306 m (finite), 2.2e308 cm (not)
    const v = 0.9 * 29979245800;
    const r = observedWavelengthFromRadialVelocityBatch(CGS, assumeArray<LengthArray<"CGS">>(Float64Array.of(5e307, 1e-5)), vCGS(v));
    expect(r.invalid).toEqual([0]);
    expect(r.reasons[0]).toBe(`observed wavelength overflows the double range in cm for restWavelength=5e+307 cm, radialVelocity=${v} cm s^-1`);
    expect(() => observedWavelengthFromRadialVelocity(CGS, lenCGS(5e307), vCGS(v))).toThrow(new RangeError(r.reasons[0]));
    expect(Number.isFinite(observedWavelengthFromRadialVelocity(SI, lenSI(5e305), vSI(0.9 * C)))).toBe(true);
  });
});
