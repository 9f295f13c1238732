import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { S_SUN } from "../values/constants";
import { toSI } from "../internal/typed";
import { kinds } from "../quantity/aliases";
import { CGS, SI } from "../quantity/system";
import { times10 } from "../quantity/unit";
import { units } from "../quantity/units";
import type { Flux, Length, Power } from "../quantity/aliases";
import { distanceFromLuminosityFluxSI, fluxFromLuminositySI, luminosityFromFluxSI } from "./kernels/inverse-square";
import { distanceFromLuminosityFlux, fluxFromLuminosity, luminosityFromFlux } from "./inverse-square";

const rel = (a: number, b: number): number => Math.abs(a - b) / Math.abs(b);
const logUniform = (lo: number, hi: number) => fc.double({ min: lo, max: hi, noNaN: true }).map((e) => 10 ** e);
const L = kinds.length.dimension, P = kinds.power.dimension, F = kinds.flux.dimension;
/** An SI value as CGS, when the conversion round-trips exactly (so the CGS call sees the same SI number). */
const cgs = (x: number, d: typeof L | typeof P | typeof F): number | undefined => {
  const c = times10(x, -CGS.exp10(d));
  return toSI(CGS, c, d) === x ? c : undefined;
};

describe("typed inverse-square law", () => {
  it("the Sun: L☉ᴺ at 1 au gives S☉ᴺ = 1361 W m^-2 within the rounding of L☉ᴺ (IAU 2015 B3), in SI and CGS", () => {
    // IAU 2015 B3 rounds L☉ᴺ = 4π au² S☉ᴺ to 3.828e26 W: ≤ 0.0005/3.828 = 1.31e-4 relative
    const s = fluxFromLuminosity(SI, SI.of(1, units.Lsun), SI.of(1, units.au));
    expect(rel(SI.valueIn(s, units.W_per_m2), S_SUN)).toBeLessThan(1.31e-4);
    const sc = fluxFromLuminosity(CGS, CGS.of(1, units.Lsun), CGS.of(1, units.au));
    expect(rel(CGS.valueIn(sc, units.erg_per_s_cm2), 1.361e6)).toBeLessThan(1.31e-4);
    const l = luminosityFromFlux(SI, SI.of(S_SUN, units.W_per_m2), SI.of(1, units.au));
    expect(rel(SI.valueIn(l, units.Lsun), 1)).toBeLessThan(1.31e-4);
    // d ∝ L^(1/2): half the rounding
    const d = distanceFromLuminosityFlux(SI, SI.of(1, units.Lsun), SI.of(S_SUN, units.W_per_m2));
    expect(rel(SI.valueIn(d, units.au), 1)).toBeLessThan(0.66e-4);
  });

  it("in SI equals the kernel bit for bit (property)", () => {
    fc.assert(
      fc.property(logUniform(10, 40), logUniform(3, 26), (l, d) => {
        const f = fluxFromLuminositySI(l, d);
        expect(fluxFromLuminosity(SI, l as Power<"SI">, d as Length<"SI">)).toBe(f);
        expect(luminosityFromFlux(SI, f as Flux<"SI">, d as Length<"SI">)).toBe(luminosityFromFluxSI(f, d));
        expect(distanceFromLuminosityFlux(SI, l as Power<"SI">, f as Flux<"SI">)).toBe(distanceFromLuminosityFluxSI(l, f));
      }),
    );
  });

  it("in CGS equals the SI result × 10^k exactly (erg s^-1 cm^-2: k = 3; erg s^-1: 7; cm: 2) when the inputs convert exactly (property)", () => {
    fc.assert(
      fc.property(logUniform(10, 40), logUniform(3, 26), (l, d) => {
        const lc = cgs(l, P), dc = cgs(d, L);
        fc.pre(lc !== undefined && dc !== undefined);
        const f = fluxFromLuminosity(SI, l as Power<"SI">, d as Length<"SI">);
        expect(fluxFromLuminosity(CGS, lc as Power<"CGS">, dc as Length<"CGS">)).toBe(times10(f, 3));
        const fc_ = cgs(f, F);
        fc.pre(fc_ !== undefined);
        expect(luminosityFromFlux(CGS, fc_ as Flux<"CGS">, dc as Length<"CGS">)).toBe(times10(luminosityFromFlux(SI, f, d as Length<"SI">), 7));
        expect(distanceFromLuminosityFlux(CGS, lc as Power<"CGS">, fc_ as Flux<"CGS">)).toBe(times10(distanceFromLuminosityFlux(SI, l as Power<"SI">, f), 2));
      }),
      { numRuns: 200 },
    );
  });

  it("errors name the parameter, its value and the caller's unit", () => {
    expect(() => fluxFromLuminosity(CGS, CGS.of(1, units.Lsun), -1 as Length<"CGS">)).toThrow(/^distance must be a finite number > 0 cm; got -1$/);
    expect(() => fluxFromLuminosity(SI, SI.of(1, units.Lsun), -1 as Length<"SI">)).toThrow(/^distance must be a finite number > 0 m; got -1$/);
    expect(() => fluxFromLuminosity(CGS, 0 as Power<"CGS">, CGS.of(1, units.au))).toThrow(/^luminosity must be a finite number > 0 cm\^2 g s\^-3; got 0$/);
    expect(() => luminosityFromFlux(SI, NaN as Flux<"SI">, SI.of(1, units.au))).toThrow(/^flux must be a finite number > 0 kg s\^-3; got NaN$/);
    expect(() => distanceFromLuminosityFlux(CGS, CGS.of(1, units.Lsun), Infinity as Flux<"CGS">)).toThrow(/flux .* g s\^-3/);
  });

  it("a result that overflows in the caller's system is a RangeError in that system's unit, never Infinity", () => {
    // 1e300 W m^-2 at 1e10 m: L = 1.26e321 overflows in SI already
    expect(() => luminosityFromFlux(SI, 1e300 as Flux<"SI">, 1e10 as Length<"SI">)).toThrow(/^luminosity overflows the double range in m\^2 kg s\^-3 for flux=1e\+300 kg s\^-3, distance=10000000000 m$/);
    // 1e300 W ≈ 1e307 erg s^-1 is fine; 1e302 W is representable in SI but not in CGS (1e309 erg s^-1)
    const l = luminosityFromFlux(SI, (1e302 / (4 * Math.PI)) as Flux<"SI">, 1 as Length<"SI">);
    expect(Number.isFinite(l)).toBe(true);
    expect(() => luminosityFromFlux(CGS, (1e305 / (4 * Math.PI)) as Flux<"CGS">, 100 as Length<"CGS">)).toThrow(/^luminosity overflows the double range in cm\^2 g s\^-3 for flux=7\.9\d*e\+303 g s\^-3, distance=100 cm$/);
  });

  it("F d² is invariant (property): the law is an inverse square", () => {
    fc.assert(
      fc.property(logUniform(20, 30), logUniform(5, 20), fc.double({ min: 0.5, max: 2, noNaN: true }), (l, d, k) => {
        const f1 = fluxFromLuminosity(SI, l as Power<"SI">, d as Length<"SI">);
        const f2 = fluxFromLuminosity(SI, l as Power<"SI">, (d * k) as Length<"SI">);
        // a few roundings on each side: 1e-15
        expect(rel(f2 * k * k, f1)).toBeLessThan(1e-15);
      }),
    );
  });
});
