import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { constants } from "../constants/index";
import { CGS, SI } from "../quantity/system";
import { units } from "../quantity/units";
import { assume, type Flux, type Length, type Power, type Temperature } from "../quantity/index";
import * as K from "./kernels/stefan-boltzmann";
import {
  luminosityFromRadiusTemperature,
  photonEmissionRate,
  photonExitance,
  radiusFromLuminosityTemperature,
  stefanBoltzmannExitance,
  temperatureFromExitance,
  temperatureFromLuminosityRadius,
} from "./stefan-boltzmann";

const logUniform = (lo: number, hi: number) =>
  fc.double({ min: Math.log(lo), max: Math.log(hi), noNaN: true }).map((u) => Math.exp(u));
const T = (k: number) => assume<Temperature>(k);
const cm = (v: number) => assume<Length<"CGS">>(v);
const tempArb = logUniform(1e-2, 1e10);
const radiusCmArb = logUniform(1e-1, 1e17);

describe("typed Stefan–Boltzmann agrees with the SI kernels; CGS is SI × 10^k exactly", () => {
  it("σT⁴ in erg s⁻¹ cm⁻² is exactly 1000 × the W m⁻² value (1 W m⁻² = 10⁷ erg s⁻¹ / 10⁴ cm²)", () => {
    fc.assert(
      fc.property(tempArb, (t) => {
        const si = stefanBoltzmannExitance(SI, T(t));
        expect(si).toBe(K.stefanBoltzmannExitanceSI(t));
        expect(stefanBoltzmannExitance(CGS, T(t))).toBe(si * 1000);
      }),
      { numRuns: 100 },
    );
  });
  it("luminosity ×10⁷ (erg s⁻¹ per W), radius ×100, photon exitance ÷10⁴, photon rate unchanged", () => {
    fc.assert(
      fc.property(radiusCmArb, logUniform(1, 1e6), (rcm, t) => {
        const r = rcm / 100; // what the CGS wrapper hands the kernel
        const lSI = K.luminosityFromRadiusTemperatureSI(r, t);
        expect(luminosityFromRadiusTemperature(SI, assume<Length<"SI">>(r), T(t))).toBe(lSI);
        expect(luminosityFromRadiusTemperature(CGS, cm(rcm), T(t))).toBe(lSI * 1e7);
        const lcgs = lSI * 1e7;
        expect(radiusFromLuminosityTemperature(CGS, assume<Power<"CGS">>(lcgs), T(t))).toBe(
          K.radiusFromLuminosityTemperatureSI(lcgs / 1e7, t) * 100,
        );
        expect(temperatureFromLuminosityRadius(CGS, assume<Power<"CGS">>(lcgs), cm(rcm))).toBe(
          K.temperatureFromLuminosityRadiusSI(lcgs / 1e7, r),
        );
        expect(photonExitance(CGS, T(t))).toBe(K.photonExitanceSI(t) / 1e4);
        expect(photonEmissionRate(CGS, cm(rcm), T(t))).toBe(K.photonEmissionRateSI(r, t));
        const mcgs = K.stefanBoltzmannExitanceSI(t) * 1000;
        expect(temperatureFromExitance(CGS, assume<Flux<"CGS">>(mcgs))).toBe(K.temperatureFromExitanceSI(mcgs / 1000));
      }),
      { numRuns: 100 },
    );
  });
  it("round trips through the typed API in CGS: T → M → T, (R, T) → L → R and → T (≤ 8 ulp)", () => {
    // each direction is a few roundings (powers, square roots, ×10^k conversions): 8 ulp bounds them
    fc.assert(
      fc.property(radiusCmArb, tempArb, (rcm, t) => {
        expect(Math.abs(temperatureFromExitance(CGS, stefanBoltzmannExitance(CGS, T(t))) / t - 1)).toBeLessThan(8 * Number.EPSILON);
        const l = luminosityFromRadiusTemperature(CGS, cm(rcm), T(t));
        expect(Math.abs(radiusFromLuminosityTemperature(CGS, l, T(t)) / rcm - 1)).toBeLessThan(8 * Number.EPSILON);
        expect(Math.abs(temperatureFromLuminosityRadius(CGS, l, cm(rcm)) / t - 1)).toBeLessThan(8 * Number.EPSILON);
      }),
      { numRuns: 100 },
    );
  });
  it("L = 4πR²·M: luminosity is the exitance times the sphere's area (to 4 ulp)", () => {
    fc.assert(
      fc.property(radiusCmArb, logUniform(1, 1e6), (rcm, t) => {
        const l = luminosityFromRadiusTemperature(CGS, cm(rcm), T(t));
        const viaM = 4 * Math.PI * rcm * rcm * stefanBoltzmannExitance(CGS, T(t));
        expect(Math.abs(l / viaM - 1)).toBeLessThan(4 * Number.EPSILON);
      }),
      { numRuns: 100 },
    );
  });
});

describe("worked solar example (IAU 2015 Resolution B3 nominal values)", () => {
  // B3 fixes R☉ᴺ = 6.957e8 m and L☉ᴺ = 3.828e26 W exactly and quotes T☉ᴺ = 5772 K, the value of
  // (L☉/(4πσR☉²))^¼ rounded to the nearest kelvin (from memory of the resolution's notes). So the only
  // mismatch is that rounding: |ΔT| ≤ 0.5 K → |ΔL/L| ≤ 4 × 0.5/5772 = 3.5e-4, |ΔR/R| ≤ 2 × 0.5/5772 = 1.7e-4.
  it("4πR☉²σT☉⁴ = L☉ within the rounding of T☉ᴺ, in SI and in CGS", () => {
    const lS = luminosityFromRadiusTemperature(SI, constants.Rsun.si, constants.Tsun.si);
    const lC = luminosityFromRadiusTemperature(CGS, constants.Rsun.cgs, constants.Tsun.cgs);
    expect(Math.abs(lS / constants.Lsun.si - 1)).toBeLessThan(3.5e-4);
    expect(Math.abs(lC / constants.Lsun.cgs - 1)).toBeLessThan(3.5e-4);
    expect(Math.abs(SI.valueIn(lS, units.Lsun) - 1)).toBeLessThan(3.5e-4);
    expect(Math.abs(CGS.valueIn(lC, units.erg_per_s) / 3.828e33 - 1)).toBeLessThan(3.5e-4); // L☉ = 3.828e33 erg s⁻¹
  });
  it("T from L☉ and R☉ rounds to 5772 K; R from L☉ and T☉ is R☉ within 1.7e-4", () => {
    const t = temperatureFromLuminosityRadius(CGS, constants.Lsun.cgs, constants.Rsun.cgs);
    expect(Math.round(t)).toBe(5772);
    const r = radiusFromLuminosityTemperature(SI, constants.Lsun.si, constants.Tsun.si);
    expect(Math.abs(SI.valueIn(r, units.Rsun) - 1)).toBeLessThan(1.7e-4);
  });
  it("the solar surface exitance σT☉⁴ ≈ 6.294e7 W m⁻² = 6.294e10 erg s⁻¹ cm⁻² (4 digits, common practice)", () => {
    expect(Math.abs(SI.valueIn(stefanBoltzmannExitance(SI, constants.Tsun.si), units.W_per_m2) / 6.294e7 - 1)).toBeLessThan(1e-4);
    expect(Math.abs(CGS.valueIn(stefanBoltzmannExitance(CGS, constants.Tsun.cgs), units.erg_per_s_cm2) / 6.294e10 - 1)).toBeLessThan(1e-4);
  });
  it("CMB photon exitance σ_γ T³ at 2.7255 K ≈ 3.08e16 photons s⁻¹ m⁻² (n_γ ≈ 411 cm⁻³ × c/4, common practice)", () => {
    // n_γ = 4 M_γ / c; the CMB photon density is ≈ 410.7 cm⁻³ at 2.7255 K (3 digits: 411)
    const nPerCm3 = (4 * photonExitance(CGS, CGS.of(2.7255, units.K))) / 29979245800;
    expect(Math.abs(nPerCm3 - 411)).toBeLessThan(0.5);
  });
});

describe("errors name the caller's unit", () => {
  it.each([0, -1, NaN, Infinity])("%s → RangeError in cm / erg-based units for a CGS caller", (v) => {
    expect(() => luminosityFromRadiusTemperature(CGS, cm(v), T(5772))).toThrow(/^radius must be a finite number > 0 cm; got/);
    expect(() => radiusFromLuminosityTemperature(CGS, assume<Power<"CGS">>(v), T(5772))).toThrow(
      /^luminosity must be a finite number > 0 cm\^2 g s\^-3; got/,
    );
    expect(() => temperatureFromExitance(CGS, assume<Flux<"CGS">>(v))).toThrow(/^exitance must be a finite number > 0 g s\^-3; got/);
    expect(() => temperatureFromExitance(SI, assume<Flux<"SI">>(v))).toThrow(/^exitance must be a finite number > 0 kg s\^-3; got/);
    expect(() => photonEmissionRate(CGS, cm(1), T(v))).toThrow(/^temperature must be a finite number > 0 K; got/);
  });
  it("σT⁴ finite in W m⁻² but beyond the double range in erg s⁻¹ cm⁻² throws for the CGS caller", () => {
    expect(Number.isFinite(stefanBoltzmannExitance(SI, T(2e78)))).toBe(true); // 9.1e305 W m⁻²
    expect(() => stefanBoltzmannExitance(CGS, T(2e78))).toThrow("the exitance σT⁴ overflows the double range in g s^-3 for temperature=2e+78 K");
    // beyond the range in both: each caller's message names its own units
    expect(() => stefanBoltzmannExitance(SI, T(1e80))).toThrow("the exitance σT⁴ overflows the double range in kg s^-3 for temperature=1e+80 K");
    expect(() => luminosityFromRadiusTemperature(CGS, cm(1e300), T(1e10))).toThrow(
      "the luminosity 4πR²σT⁴ overflows the double range in cm^2 g s^-3 for radius=1e+300 cm, temperature=10000000000 K",
    );
  });
});
