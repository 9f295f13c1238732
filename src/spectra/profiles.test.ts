import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { C, K_B, M_U } from "../values/constants";
import { CGS, SI } from "../quantity/system";
import { times10 } from "../quantity/unit";
import { units } from "../quantity/units";
import { assume, assumeArray } from "../quantity/quantity";
import type { Frequency, Length, LengthArray, Mass, Temperature, Velocity } from "../quantity/aliases";
import { gaussianProfileSI, lorentzianProfileSI, voigtProfileSI } from "./kernels/profiles";
import {
  dopplerVelocityWidthSI,
  dopplerWidthFrequencySI,
  dopplerWidthWavelengthSI,
  lorentzHwhmFrequencySI,
  lorentzHwhmWavelengthSI,
} from "./kernels/widths";
import {
  atomicMass,
  dopplerVelocityWidth,
  dopplerWidth,
  dopplerWidthFrequency,
  dopplerWidthFromSigma,
  gaussianFwhm,
  gaussianProfile,
  lorentzHwhm,
  lorentzHwhmFrequency,
  lorentzianProfile,
  voigtFwhm,
  voigtProfile,
  voigtProfileBatch,
} from "./profiles";

const rel = (a: number, b: number): number => Math.abs(a / b - 1);
const lenSI = (x: number) => assume<Length<"SI">>(x);
const lenCGS = (x: number) => assume<Length<"CGS">>(x);
const cgsOf = (m: number) => lenCGS(times10(m, 2));
const siOfCgs = (m: number) => lenSI(times10(times10(m, 2), -2));
const T = (k: number) => assume<Temperature>(k);
const hz = (x: number) => assume<Frequency>(x);

describe("profiles: typed = kernel (SI); CGS = SI × 10⁻² exactly (per cm instead of per m)", () => {
  const cases: [number, number, number][] = [
    [0, 3e-11, 3e-12],
    [2e-11, 3e-11, 1e-13],
    [-5e-10, 1e-12, 4e-12],
    [1e-9, 2e-11, 0],
  ];
  it("Gaussian, Lorentzian, Voigt", () => {
    for (const [d, b, g] of cases) {
      expect(gaussianProfile(SI, lenSI(d), lenSI(b))).toBe(gaussianProfileSI(d, b));
      expect(voigtProfile(SI, lenSI(d), lenSI(b), lenSI(g))).toBe(voigtProfileSI(d, b, g));
      if (g > 0) expect(lorentzianProfile(SI, lenSI(d), lenSI(g))).toBe(lorentzianProfileSI(d, g));
      expect(gaussianProfile(CGS, cgsOf(d), cgsOf(b))).toBe(times10(gaussianProfile(SI, siOfCgs(d), siOfCgs(b)), -2));
      expect(voigtProfile(CGS, cgsOf(d), cgsOf(b), cgsOf(g))).toBe(times10(voigtProfile(SI, siOfCgs(d), siOfCgs(b), siOfCgs(g)), -2));
      if (g > 0) expect(lorentzianProfile(CGS, cgsOf(d), cgsOf(g))).toBe(times10(lorentzianProfile(SI, siOfCgs(d), siOfCgs(g)), -2));
    }
  });
  it("the array form equals the scalar one and reports non-finite offsets", () => {
    const offsets = assumeArray<LengthArray<"CGS">>(Float64Array.of(-3e-9, 0, 1e-9, Number.NaN));
    const b = lenCGS(3e-9);
    const g = lenCGS(3e-10);
    const r = voigtProfileBatch(CGS, offsets, b, g);
    expect(r.invalid).toEqual([3]);
    for (let i = 0; i < 3; i++) expect(r.values[i]).toBe(voigtProfile(CGS, lenCGS(offsets[i] as number), b, g));
    expect(r.values[3]).toBeNaN();
  });
  it("property: the profiles are normalised per unit wavelength (∫ φ dΔ = 1), in CGS", () => {
    fc.assert(
      fc.property(fc.double({ min: Math.log(1e-3), max: Math.log(1), noNaN: true }).map(Math.exp), (a) => {
        // b = 0.3 Å; trapezoid at b/20 over ±L = ±2000 b: the Lorentz wings beyond L hold
        // 2γ/(πL) = 2a/(2000π) ≤ 3.2e-4 of the area; the trapezoid error on a smooth profile
        // sampled at b/20 is negligible (≪ 1e-9). Tolerance: the wing bound × 1.05 + 1e-9.
        const b = 0.3e-8;
        const step = b / 20;
        const n = 2 * 40000 + 1;
        const offs = new Float64Array(n);
        for (let i = 0; i < n; i++) offs[i] = (i - 40000) * step;
        const { values } = voigtProfileBatch(CGS, assumeArray<LengthArray<"CGS">>(offs), lenCGS(b), lenCGS(a * b));
        let s = 0;
        for (let i = 0; i < n; i++) s += (values[i] as number) * (i === 0 || i === n - 1 ? 0.5 : 1);
        const area = s * step;
        const tail = (2 * a) / (Math.PI * 2000);
        return Math.abs(area - (1 - tail)) < tail * 0.05 + 1e-9;
      }),
      { numRuns: 8 },
    );
  });
  it("peak values: φ_G(0) = 1/(b√π), φ_L(0) = 1/(πγ), read in per-Å units", () => {
    const b = CGS.of(0.25, units.angstrom);
    const perA = (x: number) => x * 1e-8; // cm⁻¹ → Å⁻¹
    // a division and the 1e-8 scalings: ≤ 4 ulp
    expect(rel(perA(gaussianProfile(CGS, CGS.of(0, units.angstrom), b)), 1 / (0.25 * Math.sqrt(Math.PI)))).toBeLessThan(1e-15);
    expect(rel(perA(lorentzianProfile(CGS, CGS.of(0, units.angstrom), b)), 1 / (Math.PI * 0.25))).toBeLessThan(1e-15);
  });
});

describe("widths: typed = kernel (SI); CGS consistent", () => {
  it("Doppler velocity, wavelength and frequency widths; Lorentz widths", () => {
    const m = atomicMass(SI, 55.845);
    expect(m).toBe(55.845 * M_U);
    const xi = assume<Velocity<"SI">>(1500);
    expect(dopplerVelocityWidth(SI, T(5772), m, xi)).toBe(dopplerVelocityWidthSI(5772, m, 1500));
    expect(dopplerVelocityWidth(SI, T(5772), m)).toBe(dopplerVelocityWidthSI(5772, m, 0));
    expect(dopplerWidth(SI, lenSI(525e-9), T(5772), m, xi)).toBe(dopplerWidthWavelengthSI(525e-9, 5772, m, 1500));
    expect(dopplerWidthFrequency(SI, hz(5.7e14), T(5772), m, xi)).toBe(dopplerWidthFrequencySI(5.7e14, 5772, m, 1500));
    expect(lorentzHwhm(SI, lenSI(121.567e-9), hz(6.2649e8))).toBe(lorentzHwhmWavelengthSI(121.567e-9, 6.2649e8));
    expect(lorentzHwhmFrequency(SI, hz(6.2649e8))).toBe(lorentzHwhmFrequencySI(6.2649e8));
  });
  it("CGS: velocity width × 10², wavelength widths × 10² (same physical inputs; the mass and ξ each rescaled once)", () => {
    const mSI = atomicMass(SI, 1.008);
    const mCGS = atomicMass(CGS, 1.008);
    const xiCGS = CGS.of(2, units.km_per_s);
    const xiSI = SI.of(2, units.km_per_s);
    // 2kT/m with m from one correctly rounded scaling each way, sqrt: ≤ 2e-16 → 1e-15
    expect(rel(dopplerVelocityWidth(CGS, T(1e4), mCGS, xiCGS), times10(dopplerVelocityWidth(SI, T(1e4), mSI, xiSI), 2))).toBeLessThan(1e-15);
    expect(rel(dopplerWidth(CGS, CGS.of(6562.8, units.angstrom), T(1e4), mCGS), times10(dopplerWidth(SI, SI.of(656.28, units.nm), T(1e4), mSI), 2))).toBeLessThan(1e-15);
    expect(lorentzHwhmFrequency(CGS, hz(1e8))).toBe(lorentzHwhmFrequency(SI, hz(1e8)));
    expect(rel(lorentzHwhm(CGS, CGS.of(1215.67, units.angstrom), hz(1e8)), times10(lorentzHwhm(SI, SI.of(121.567, units.nm), hz(1e8)), 2))).toBeLessThan(1e-15);
  });
  it("hydrogen at 10 000 K: b = √(2kT/m) = 12.85 km/s (textbook, e.g. Gray ch. 11: '12.8 km/s')", () => {
    // m_H = 1.008 u; 4 significant digits of the textbook value → 5e-4
    const b = dopplerVelocityWidth(CGS, CGS.of(1e4, units.K), atomicMass(CGS, 1.008));
    expect(rel(CGS.valueIn(b, units.km_per_s), 12.85)).toBeLessThan(5e-4);
    expect(rel(b, times10(Math.sqrt((2 * K_B * 1e4) / (1.008 * M_U)), 2))).toBeLessThan(1e-15);
  });
  it("Lyman α natural width: A = 6.2649e8 s⁻¹ → FWHM 2Γ/4π = 99.7 MHz (both from memory)", () => {
    // 3 significant digits → 5e-4
    expect(rel((2 * lorentzHwhmFrequency(SI, SI.of(6.2649e8, units.Hz))) / 1e6, 99.7)).toBeLessThan(5e-4);
  });
  it("property: Δλ_D/λ = Δν_D/ν = b/c, and γ_λ = λ² γ_ν / c", () => {
    fc.assert(
      fc.property(
        fc.double({ min: Math.log(1e-7), max: Math.log(1e-4), noNaN: true }).map(Math.exp),
        fc.double({ min: 10, max: 1e5, noNaN: true }),
        fc.double({ min: 1, max: 250, noNaN: true }),
        (lamCm, t, a) => {
          const lam = lenCGS(lamCm);
          const m = atomicMass(CGS, a);
          const b = dopplerVelocityWidth(CGS, T(t), m);
          const dl = dopplerWidth(CGS, lam, T(t), m);
          const nu = (C * 100) / lamCm;
          const dn = dopplerWidthFrequency(CGS, hz(nu), T(t), m);
          const g = lorentzHwhm(CGS, lam, hz(1e8));
          const gn = lorentzHwhmFrequency(CGS, hz(1e8));
          // a handful of roundings and scalings: 1e-14
          return rel(dl / lamCm, b / (C * 100)) < 1e-14 && rel(dn / nu, b / (C * 100)) < 1e-14 && rel(g, (lamCm * lamCm * gn) / (C * 100)) < 1e-14;
        },
      ),
      { numRuns: 100 },
    );
  });
  it("FWHM helpers keep the type and follow the kernel formulas", () => {
    const b = SI.of(0.03, units.nm);
    expect(rel(gaussianFwhm(b), 2 * 0.03e-9 * Math.sqrt(Math.LN2))).toBeLessThan(1e-15);
    expect(rel(dopplerWidthFromSigma(b), Math.SQRT2 * 0.03e-9)).toBeLessThan(1e-15);
    // Olivero & Longbothum limits: f_L = 0 gives f_G; f_G = 0 gives 0.5346 f_L + √0.2166 f_L = 1.0000 f_L (to 1e-4)
    expect(voigtFwhm(b, SI.of(0, units.nm))).toBe(b);
    expect(rel(voigtFwhm(SI.of(0, units.nm), b), b)).toBeLessThan(1e-4);
  });
});

describe("bad input: RangeError naming the parameter and the caller's unit", () => {
  it("profiles", () => {
    expect(() => gaussianProfile(CGS, lenCGS(0), lenCGS(0))).toThrow(/^dopplerWidth must be a finite number > 0 cm; got 0$/);
    expect(() => lorentzianProfile(SI, lenSI(Number.NaN), lenSI(1))).toThrow(/^offset must be a finite number m; got NaN$/);
    expect(() => voigtProfile(SI, lenSI(0), lenSI(0), lenSI(0))).toThrow(/^lorentzHwhm must be a finite number > 0 m; got 0$/);
    expect(() => voigtProfile(CGS, lenCGS(0), lenCGS(-1), lenCGS(1))).toThrow(/^dopplerWidth must be a finite number >= 0 cm/);
    expect(() => voigtProfileBatch(CGS, assumeArray<LengthArray<"CGS">>(new Float64Array(1)), lenCGS(1), lenCGS(-1))).toThrow(/^lorentzHwhm must/);
  });
  it("widths", () => {
    const m = atomicMass(CGS, 1);
    expect(() => dopplerVelocityWidth(CGS, T(-1), m)).toThrow(/^temperature must be a finite number > 0 K/);
    expect(() => dopplerVelocityWidth(CGS, T(1), assume<Mass<"CGS">>(0))).toThrow(/^mass must be a finite number > 0 g; got 0$/);
    expect(() => dopplerWidth(CGS, lenCGS(1e-5), T(1), m, assume<Velocity<"CGS">>(-1))).toThrow(/^microturbulence must be a finite number >= 0 cm s\^-1/);
    expect(() => dopplerWidth(SI, lenSI(-1), T(1), atomicMass(SI, 1))).toThrow(/^centreWavelength must/);
    expect(() => lorentzHwhm(SI, lenSI(1e-7), hz(-1))).toThrow(/^dampingRate must be a finite number >= 0 s\^-1/);
    expect(() => atomicMass(SI, 0)).toThrow(/relativeAtomicMass/);
  });
});

describe("batch reasons and results beyond the double range", () => {
  it("non-finite offsets are reported with the scalar message; widths both 0 throw before any row", () => {
    const offsets = assumeArray<LengthArray<"CGS">>(Float64Array.of(0, Number.NaN, Infinity));
    const r = voigtProfileBatch(CGS, offsets, lenCGS(3e-9), lenCGS(0));
    expect(r.invalid).toEqual([1, 2]);
    expect(r.reasons).toEqual(["offset must be a finite number cm; got NaN", "offset must be a finite number cm; got Infinity"]);
    expect(() => voigtProfile(CGS, lenCGS(Number.NaN), lenCGS(3e-9), lenCGS(0))).toThrow(new RangeError(r.reasons[0]));
    expect(() => voigtProfileBatch(CGS, offsets, lenCGS(0), lenCGS(0))).toThrow(/^lorentzHwhm must be a finite number > 0 cm; got 0$/);
  });
  it("a profile too tall for a double throws naming the arguments instead of returning Infinity", () => {
    // φ_G(0) = 1/(b√π) = 5.6e309 m⁻¹ for b = 1e-310 m
    expect(() => gaussianProfile(SI, lenSI(0), lenSI(1e-310))).toThrow(/^φ_G overflows the double range in m\^-1 for offset=0 m, dopplerWidth=1e-310 m$/);
  });
});
