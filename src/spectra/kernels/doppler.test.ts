import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { C } from "../../values/constants";
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
} from "./doppler";

const rel = (a: number, b: number): number => Math.abs(a / b - 1);
const logUniform = (lo: number, hi: number) =>
  fc.double({ min: Math.log(lo), max: Math.log(hi), noNaN: true }).map((x) => Math.exp(x));
const signedLog = (lo: number, hi: number) =>
  fc.tuple(logUniform(lo, hi), fc.boolean()).map(([x, s]) => (s ? x : -x));

describe("relativistic Doppler", () => {
  it("exact textbook points: β = 0.6 → 1 + z = 2; β = −0.6 → 1 + z = 1/2", () => {
    // √(1.6/0.4) = 2 exactly; double rounding only → 4e-16.
    expect(rel(redshiftFromRadialVelocitySI(0.6 * C), 1)).toBeLessThan(4e-16);
    expect(rel(relativisticDopplerWavelengthSI(500e-9, -0.6 * C), 250e-9)).toBeLessThan(4e-16);
    expect(rel(radialVelocityFromRedshiftSI(1), 0.6 * C)).toBeLessThan(4e-16);
    expect(rel(radialVelocityFromWavelengthsSI(250e-9, 500e-9), -0.6 * C)).toBeLessThan(4e-16);
  });
  it("small-β expansion: z = β + β²/2 + β³/2 + … (series of √((1+β)/(1−β)))", () => {
    // At β = 1e-6 the β⁴ term (3/8 β⁴ ≈ 4e-25) is negligible; result good to rounding.
    const b = 1e-6;
    expect(rel(redshiftFromRadialVelocitySI(b * C), b + (b * b) / 2 + (b * b * b) / 2)).toBeLessThan(1e-15);
  });
  it("property: velocity → wavelength → velocity round trip (|β| from 1e-9 to 0.99)", () => {
    fc.assert(
      fc.property(signedLog(1e-9, 0.99), logUniform(1e-10, 1), (beta, lam) => {
        const v = beta * C;
        const obs = relativisticDopplerWavelengthSI(lam, v);
        // stable z and β forms: error ≲ a few ulp of λ divided by |z| ≈ |β| → 1e-16/|β| relative.
        return Math.abs(radialVelocityFromWavelengthsSI(obs, lam) - v) <= 1e-15 * Math.abs(v) + 4e-16 * C;
      }),
    );
  });
  it("property: redshift ↔ velocity round trip", () => {
    fc.assert(
      fc.property(signedLog(1e-12, 0.999), (beta) => {
        const v = beta * C;
        return Math.abs(radialVelocityFromRedshiftSI(redshiftFromRadialVelocitySI(v)) - v) <= 4e-15 * Math.abs(v);
      }),
    );
  });
  it("property: classical limit — relativistic and classical agree to O(β²)", () => {
    fc.assert(
      fc.property(signedLog(1e-8, 1e-2), logUniform(1e-9, 1e-3), (beta, lam) => {
        const r = relativisticDopplerWavelengthSI(lam, beta * C);
        const c = classicalDopplerWavelengthSI(lam, beta * C);
        // λ_rel − λ_cl = λ(β²/2 + β³/2 + …): bound λβ² (plus rounding of λ)
        return Math.abs(r - c) <= lam * beta * beta + 4e-16 * lam;
      }),
    );
  });
  it("classical velocity and redshift from wavelengths", () => {
    expect(rel(classicalVelocityFromWavelengthsSI(500.5e-9, 500e-9), C * 1e-3)).toBeLessThan(1e-12);
    expect(rel(redshiftFromWavelengthsSI(660e-9, 600e-9), 0.1)).toBeLessThan(1e-14);
    expect(rel(observedWavelengthFromRedshiftSI(121.567e-9, 3), 486.268e-9)).toBeLessThan(1e-15);
  });
  it("line list: batch matches scalar, reports bad rows, works in place", () => {
    const lines = Float64Array.of(656.28e-9, -1, 486.13e-9, Number.NaN);
    const out = new Float64Array(4);
    const r = dopplerShiftWavelengthsSI(lines, 1e5, out);
    expect(r.invalid).toEqual([1, 3]);
    expect(r.reasons).toEqual(["restWavelengthM must be a finite number > 0 m; got -1", "restWavelengthM must be a finite number > 0 m; got NaN"]);
    expect(() => relativisticDopplerWavelengthSI(-1, 1e5)).toThrow(new RangeError(r.reasons[0]));
    expect(out[0]).toBe(relativisticDopplerWavelengthSI(656.28e-9, 1e5));
    expect(out[1]).toBeNaN();
    dopplerShiftWavelengthsSI(lines, 1e5, lines);
    expect(lines[2]).toBe(out[2]);
  });
});

describe("bad input", () => {
  it("|v| ≥ c → RangeError naming the velocity", () => {
    expect(() => relativisticDopplerWavelengthSI(500e-9, C)).toThrow(/radialVelocityMs/);
    expect(() => relativisticDopplerWavelengthSI(500e-9, -2 * C)).toThrow(/radialVelocityMs/);
    expect(() => classicalDopplerWavelengthSI(500e-9, C)).toThrow(/radialVelocityMs/);
    expect(() => redshiftFromRadialVelocitySI(Number.NaN)).toThrow(/radialVelocityMs/);
    expect(() => dopplerShiftWavelengthsSI(new Float64Array(1), C, new Float64Array(1))).toThrow(/radialVelocityMs/);
  });
  it("bad wavelengths and redshifts → RangeError naming them", () => {
    expect(() => relativisticDopplerWavelengthSI(0, 1)).toThrow(/restWavelengthM/);
    expect(() => radialVelocityFromWavelengthsSI(-1, 1e-7)).toThrow(/observedWavelengthM/);
    expect(() => radialVelocityFromRedshiftSI(-1)).toThrow(/redshift/);
    expect(() => observedWavelengthFromRedshiftSI(1e-7, Infinity)).toThrow(/redshift/);
  });
});
