import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { C, L0 } from "../values/constants";
import type { Dimensionless, Flux, Length, Power, SpectralFluxPerFrequency, SpectralFluxPerWavelength } from "../quantity/aliases";
import { CGS, SI } from "../quantity/system";
import { times10 } from "../quantity/unit";
import { units } from "../quantity/units";
import { abMagnitudeSI, apparentBolometricMagnitudeSI, fLambdaFromFNuSI } from "./kernels/magnitudes";
import {
  abMagnitude,
  absoluteBolometricMagnitude,
  absoluteMagnitude,
  apparentBolometricMagnitude,
  apparentMagnitude,
  bolometricFluxFromApparentBolometricMagnitude,
  distanceFromDistanceModulus,
  distanceModulus,
  fLambdaFromFNu,
  fluxRatioFromMagnitudeDifference,
  fNuFromAbMagnitude,
  fNuFromFLambda,
  luminosityFromAbsoluteBolometricMagnitude,
  magnitudeDifference,
  magnitudeDifferenceFromFluxRatio,
} from "./magnitudes";

const rel = (a: number, b: number): number => Math.abs(a - b) / Math.abs(b);
const logUniform = (lo: number, hi: number) => fc.double({ min: lo, max: hi, noNaN: true }).map((e) => 10 ** e);

describe("typed magnitudes", () => {
  it("IAU 2015 B2: M_bol,☉ = 4.74 from L☉ᴺ and m_bol,☉ = −26.832 from S☉ᴺ (to the digits the resolution prints)", () => {
    // B2 prints 4.74 (±0.005 by rounding) and −26.832 (±0.0005)
    expect(Math.abs(absoluteBolometricMagnitude(SI, SI.of(1, units.Lsun)) - 4.74)).toBeLessThan(0.005);
    expect(Math.abs(absoluteBolometricMagnitude(CGS, CGS.of(1, units.Lsun)) - 4.74)).toBeLessThan(0.005);
    expect(Math.abs(apparentBolometricMagnitude(SI, SI.of(1361, units.W_per_m2)) + 26.832)).toBeLessThan(0.0005);
    expect(Math.abs(apparentBolometricMagnitude(CGS, CGS.of(1.361e6, units.erg_per_s_cm2)) + 26.832)).toBeLessThan(0.0005);
    // zero points: M_bol = 0 ↔ L₀ = 3.0128e28 W exactly; in CGS exactly SI × 10^7
    expect(luminosityFromAbsoluteBolometricMagnitude(SI, 0)).toBe(L0);
    expect(luminosityFromAbsoluteBolometricMagnitude(CGS, 0)).toBe(times10(L0, 7));
    // f₀ = 2.518 021 002e-8 W m^-2 (B2 prints ten digits: 4e-10 relative)
    expect(rel(SI.valueIn(bolometricFluxFromApparentBolometricMagnitude(SI, 0), units.W_per_m2), 2.518021002e-8)).toBeLessThan(4e-10);
  });

  it("3631 Jy is AB 0, in SI and CGS; 1 µJy is AB 23.9 (m_AB = 8.90 − 2.5 log₁₀(f_ν/Jy), Oke & Gunn 1983; common practice)", () => {
    expect(abMagnitude(SI, SI.of(3631, units.Jy))).toBe(0);
    expect(abMagnitude(CGS, CGS.of(3631, units.Jy))).toBe(0);
    // 8.90 is 2.5 log10 3631 = 8.8998 rounded: 2.5e-4 from the rounding
    expect(Math.abs(abMagnitude(SI, SI.of(1, units.uJy)) - 23.9)).toBeLessThan(2.5e-4);
    expect(SI.valueIn(fNuFromAbMagnitude(SI, 0), units.Jy)).toBeCloseTo(3631, 10);
    expect(CGS.valueIn(fNuFromAbMagnitude(CGS, 0), units.Jy)).toBeCloseTo(3631, 10);
  });

  it("Pogson: a flux ratio of 100 is exactly −5 mag and back; magnitudes accept plain numbers and Dimensionless", () => {
    expect(magnitudeDifferenceFromFluxRatio(100)).toBe(-5);
    expect(fluxRatioFromMagnitudeDifference(-5)).toBe(100);
    expect(fluxRatioFromMagnitudeDifference(-5 as Dimensionless)).toBe(100);
    expect(magnitudeDifference(SI.of(1, units.mJy), SI.of(100, units.mJy))).toBe(5);
    // per-wavelength densities work too, if both are per wavelength
    const a = CGS.of(2e-15, units.erg_per_s_cm2_A), b = CGS.of(2e-13, units.erg_per_s_cm2_A);
    expect(magnitudeDifference(a, b)).toBe(5);
    // quotient underflow does not break it: 1e-300 vs 1e300 is 1500 mag
    expect(magnitudeDifference(1e-300 as Flux<"SI">, 1e300 as Flux<"SI">)).toBeCloseTo(1500, 10);
  });

  it("distance modulus: 100 pc is 5 mag; extinction adds; SI and CGS agree and invert (property)", () => {
    expect(distanceModulus(SI, SI.of(100, units.pc))).toBe(5);
    expect(distanceModulus(CGS, CGS.of(100, units.pc), 0.3)).toBeCloseTo(5.3, 14);
    expect(distanceFromDistanceModulus(CGS, 5)).toBe(times10(distanceFromDistanceModulus(SI, 5), 2));
    fc.assert(
      fc.property(logUniform(14, 26), fc.double({ min: -30, max: 30, noNaN: true }), fc.double({ min: 0, max: 5, noNaN: true }), (d, m, a) => {
        const ds = d as Length<"SI">;
        const M = absoluteMagnitude(SI, m, ds, a);
        // m − M − A = 5 log10(d/10 pc): a few roundings of numbers ≤ 60 in size → 1e-13 mag
        expect(Math.abs(apparentMagnitude(SI, M, ds, a) - m)).toBeLessThan(1e-13);
        expect(Math.abs(absoluteMagnitude(CGS, m, (d * 100) as Length<"CGS">, a) - M)).toBeLessThan(1e-13);
        // and the distance from the modulus: (ln10/5) × 1e-13 mag ≈ 5e-14, plus exp rounding
        expect(rel(distanceFromDistanceModulus(SI, m - M, a), d)).toBeLessThan(2e-13);
      }),
    );
  });

  it("apparent bolometric magnitude and the flux agree with the kernel in SI and invert (property)", () => {
    fc.assert(
      fc.property(logUniform(-20, 5), (f) => {
        const m = apparentBolometricMagnitude(SI, f as Flux<"SI">);
        expect(m).toBe(apparentBolometricMagnitudeSI(f));
        // 10^x with |x| ≤ 20: relative error ≈ ln10 × |x| × ε ≈ 1e-14
        expect(rel(bolometricFluxFromApparentBolometricMagnitude(SI, m), f)).toBeLessThan(2e-14);
        expect(rel(bolometricFluxFromApparentBolometricMagnitude(CGS, m), f * 1000)).toBeLessThan(2e-14);
      }),
    );
    fc.assert(
      fc.property(logUniform(20, 34), (l) => {
        const M = absoluteBolometricMagnitude(SI, l as Power<"SI">);
        expect(rel(luminosityFromAbsoluteBolometricMagnitude(SI, M), l)).toBeLessThan(2e-14);
      }),
    );
  });

  it("f_ν ↔ f_λ: f_λ = f_ν c/λ² (by hand: 3631 Jy at 5500 Å = 3.5985e-9 erg s^-1 cm^-2 Å^-1), SI equals kernel, CGS is SI × 10 exactly", () => {
    const fl = fLambdaFromFNu(CGS, CGS.of(3631, units.Jy), CGS.of(5500, units.angstrom));
    // 3.631e-20 × 2.99792458e10 / (5.5e-5)² erg s^-1 cm^-2 cm^-1, × 1e-8 per Å (hand arithmetic, exact c)
    expect(rel(CGS.valueIn(fl, units.erg_per_s_cm2_A), (3.631e-20 * 2.99792458e10) / 5.5e-5 / 5.5e-5 / 1e8)).toBeLessThan(1e-15);
    fc.assert(
      fc.property(logUniform(-35, -20), logUniform(-8, -3), (fn, lam) => {
        const s = fLambdaFromFNu(SI, fn as SpectralFluxPerFrequency<"SI">, lam as Length<"SI">);
        expect(s).toBe(fLambdaFromFNuSI(fn, lam));
        const fnC = times10(fn, 3), lamC = times10(lam, 2);
        // W m^-2 Hz^-1 → erg s^-1 cm^-2 Hz^-1 is ×10³; W m^-3 → erg s^-1 cm^-3 is ×10: exact when the inputs convert exactly
        if (times10(fnC, -3) === fn && times10(lamC, -2) === lam) {
          expect(fLambdaFromFNu(CGS, fnC as SpectralFluxPerFrequency<"CGS">, lamC as Length<"CGS">)).toBe(times10(s, 1));
        }
        // round trip: 5 roundings each way
        expect(rel(fNuFromFLambda(SI, s, lam as Length<"SI">), fn)).toBeLessThan(1.2e-15);
        // and the invariant f_λ λ = f_ν ν (= f_ν c/λ)
        expect(rel(s * lam, (fn * C) / lam)).toBeLessThan(1e-15);
      }),
    );
    expect(abMagnitudeSI(3.631e-23)).toBe(abMagnitude(SI, 3.631e-23 as SpectralFluxPerFrequency<"SI">));
  });

  it("errors name the parameter, value and the caller's unit (or mag)", () => {
    expect(() => abMagnitude(CGS, -1 as SpectralFluxPerFrequency<"CGS">)).toThrow(/^spectral flux density f_nu must be a finite number > 0 g s\^-2; got -1$/);
    expect(() => fNuFromFLambda(SI, 0 as SpectralFluxPerWavelength<"SI">, SI.of(1, units.um))).toThrow(/^spectral flux density f_lambda must be a finite number > 0 m\^-1 kg s\^-3; got 0$/);
    expect(() => fLambdaFromFNu(CGS, CGS.of(1, units.Jy), -3 as Length<"CGS">)).toThrow(/^wavelength must be a finite number > 0 cm; got -3$/);
    expect(() => distanceModulus(CGS, 0 as Length<"CGS">)).toThrow(/^distance must be a finite number > 0 cm; got 0$/);
    expect(() => distanceModulus(SI, SI.of(1, units.pc), NaN)).toThrow(/^extinction must be a finite number mag; got NaN$/);
    expect(() => absoluteMagnitude(SI, Infinity, SI.of(1, units.pc))).toThrow(/^apparent magnitude must be a finite number mag/);
    expect(() => luminosityFromAbsoluteBolometricMagnitude(CGS, -800)).toThrow(/luminosity .* cm\^2 g s\^-3/);
    expect(() => magnitudeDifference(SI.of(0, units.Jy), SI.of(1, units.Jy))).toThrow(/^flux1 must be a finite number > 0; got 0$/);
  });

  it("a result that fits in SI but not in CGS is refused in the caller's unit, naming the arguments (magnitudes in mag)", () => {
    // L₀ 10^(690/2.5) = 3.0e304 W fits; ×10^7 erg s^-1 does not
    expect(luminosityFromAbsoluteBolometricMagnitude(SI, -690)).toBeGreaterThan(3e304);
    expect(() => luminosityFromAbsoluteBolometricMagnitude(CGS, -690)).toThrow(
      /^luminosity overflows the double range in cm\^2 g s\^-3 for absolute bolometric magnitude=-690 mag$/,
    );
    // f_λ = f_ν c/λ² = 1e300 × 2.998e8 / 4 = 7.5e307 W m^-3 fits; ×10 erg s^-1 cm^-3 does not
    expect(fLambdaFromFNu(SI, 1e300 as SpectralFluxPerFrequency<"SI">, 2 as Length<"SI">)).toBeGreaterThan(7e307);
    expect(() => fLambdaFromFNu(CGS, 1e303 as SpectralFluxPerFrequency<"CGS">, 200 as Length<"CGS">)).toThrow(
      /^spectral flux density f_lambda overflows the double range in cm\^-1 g s\^-3 for spectral flux density f_nu=1e\+303 g s\^-2, wavelength=200 cm$/,
    );
    // 10 pc × 10^(1600/5) overflows in SI already
    expect(() => distanceFromDistanceModulus(CGS, 1600)).toThrow(/^distance overflows the double range in cm for distance modulus=1600 mag, extinction=0 mag$/);
    expect(() => fluxRatioFromMagnitudeDifference(-800)).toThrow(/^flux ratio overflows the double range for magnitude difference=-800 mag$/);
    expect(() => fNuFromAbMagnitude(SI, NaN)).toThrow(/^AB magnitude must be a finite number mag; got NaN$/);
  });
});
