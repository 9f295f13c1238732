import fc from "fast-check";
import { describe, expect, it } from "vitest";
import fixture from "../../../test/fixtures/photometry.json";
import { AB_ZERO_POINT, F0, JANSKY, L0, L_SUN, PARSEC, S_SUN } from "../../values/constants";
import {
  abMagnitudeSI,
  absoluteBolometricMagnitudeSI,
  absoluteMagnitudeSI,
  apparentBolometricMagnitudeSI,
  apparentMagnitudeSI,
  bolometricFluxFromApparentBolometricMagnitudeSI,
  distanceFromDistanceModulusSI,
  distanceModulusSI,
  fLambdaFromFNuSI,
  fNuFromFLambdaSI,
  fluxRatioFromMagnitudeDifference,
  luminosityFromAbsoluteBolometricMagnitudeSI,
  magnitudeDifferenceFromFluxRatio,
  spectralFluxDensityFromAbMagnitudeSI,
  TEN_PARSECS_M,
} from "./magnitudes";
import { fluxFromLuminositySI } from "./inverse-square";

const rel = (a: number, b: number): number => Math.abs(a - b) / Math.abs(b);
const logUniform = (lo: number, hi: number) => fc.double({ min: lo, max: hi, noNaN: true }).map((e) => 10 ** e);

describe("Pogson's relation", () => {
  it("a flux ratio of exactly 100 is exactly 5 magnitudes, both ways (Pogson 1856)", () => {
    // Math.log10(100) is exactly 2 in V8, and −2.5 × 2 is exact.
    expect(magnitudeDifferenceFromFluxRatio(100)).toBe(-5);
    expect(magnitudeDifferenceFromFluxRatio(0.01)).toBe(5);
    // −5 / −2.5 = 2 exactly (2.5 is representable) and 10 ** 2 = 100 exactly.
    expect(fluxRatioFromMagnitudeDifference(-5)).toBe(100);
    expect(fluxRatioFromMagnitudeDifference(5)).toBe(0.01);
    expect(fluxRatioFromMagnitudeDifference(0)).toBe(1);
    // every exact power of 10^(2k) maps to an exact multiple of 5 mag
    for (let k = -10; k <= 10; k++) expect(magnitudeDifferenceFromFluxRatio(10 ** (2 * k))).toBe(-5 * k + 0); // + 0: k = 0 gives +0
  });

  it("round-trips (property): Δm → ratio → Δm within 2e-15 mag absolute over ±50 mag", () => {
    fc.assert(
      fc.property(fc.double({ min: -50, max: 50, noNaN: true }), (dm) => {
        // 10^x has relative error ~|x| ln10 ε ≈ 20 × 2.2e-16 at |x| = 20; mapped back to mag
        // ×2.5/ln10 ≈ 1.1: ≲ 1e-14 mag. Bound: 1e-14 mag.
        expect(Math.abs(magnitudeDifferenceFromFluxRatio(fluxRatioFromMagnitudeDifference(dm)) - dm)).toBeLessThan(1e-14);
      }),
    );
  });

  it("is additive: ratios multiply when magnitudes add (property)", () => {
    fc.assert(
      fc.property(logUniform(-5, 5), logUniform(-5, 5), (r1, r2) => {
        const sum = magnitudeDifferenceFromFluxRatio(r1) + magnitudeDifferenceFromFluxRatio(r2);
        expect(Math.abs(magnitudeDifferenceFromFluxRatio(r1 * r2) - sum)).toBeLessThan(1e-14);
      }),
    );
  });
});

describe("distance modulus", () => {
  it("a star at 10 pc has m = M; 100 pc is μ = 5 exactly", () => {
    expect(distanceModulusSI(TEN_PARSECS_M)).toBe(0);
    expect(absoluteMagnitudeSI(7.25, 10 * PARSEC)).toBe(7.25);
    expect(apparentMagnitudeSI(-1.5, 10 * PARSEC)).toBe(-1.5);
    // log10(10) = 1 exactly after the ratio 100 pc/10 pc rounds to 10 (it is exact here)
    expect(distanceModulusSI(100 * PARSEC)).toBe(5);
  });

  it("matches mpmath at sample distances (photometry.py)", () => {
    for (const row of fixture.distance_modulus) {
      // ratio and log10 each ≤ 1 ulp: |Δμ| ≤ 5/ln10 × 2 × 1.1e-16 × … ≲ 2e-15 mag
      expect(Math.abs(distanceModulusSI(row.d_m) - row.mu)).toBeLessThan(2e-15);
    }
  });

  it("includes extinction: m − M = μ₀ + A, and the distance inverts it", () => {
    const d = 250 * PARSEC;
    const mu0 = distanceModulusSI(d);
    expect(distanceModulusSI(d, 0.4)).toBe(mu0 + 0.4);
    expect(rel(distanceFromDistanceModulusSI(mu0 + 0.4, 0.4), d)).toBeLessThan(1e-14);
    expect(absoluteMagnitudeSI(12, d, 0.4)).toBe(12 - (mu0 + 0.4));
  });

  it("apparent ↔ absolute round trip and distance round trip (property, 1e-3 pc to 1 Gpc)", () => {
    fc.assert(
      fc.property(fc.double({ min: -3, max: 9, noNaN: true }), fc.double({ min: -10, max: 20, noNaN: true }), (e, M) => {
        const d = 10 ** e * PARSEC;
        expect(Math.abs(absoluteMagnitudeSI(apparentMagnitudeSI(M, d), d) - M)).toBeLessThan(1e-13);
        // 10^(μ/5) with μ up to 50: relative error ~ 10 ln10 ε ≈ 5e-15
        expect(rel(distanceFromDistanceModulusSI(distanceModulusSI(d)), d)).toBeLessThan(1e-14);
      }),
    );
  });
});

describe("IAU 2015 Resolution B2 bolometric magnitudes", () => {
  it("M_bol,☉ = 4.74 and m_bol,☉ = −26.832 (IAU 2015 B2, printed digits)", () => {
    // 4.74 printed to 2 decimals → ±0.005
    expect(Math.abs(absoluteBolometricMagnitudeSI(L_SUN) - 4.74)).toBeLessThan(0.005);
    // −26.832 printed to 3 decimals → ±0.0005
    expect(Math.abs(apparentBolometricMagnitudeSI(S_SUN) - -26.832)).toBeLessThan(0.0005);
    // and the double computation agrees with mpmath at 50 digits (≤ 1e-14 mag)
    expect(Math.abs(absoluteBolometricMagnitudeSI(L_SUN) - fixture.sun.M_bol)).toBeLessThan(1e-14);
    expect(Math.abs(apparentBolometricMagnitudeSI(S_SUN) - fixture.sun.m_bol_from_S)).toBeLessThan(1e-14);
  });

  it("zero points: M_bol = 0 at L₀ and m_bol = 0 at f₀; f₀ = 2.518 021 002e-8 W m^-2 (IAU 2015 B2)", () => {
    expect(absoluteBolometricMagnitudeSI(L0)).toBe(0);
    expect(apparentBolometricMagnitudeSI(F0)).toBe(0);
    expect(luminosityFromAbsoluteBolometricMagnitudeSI(0)).toBe(L0);
    // B2 prints f₀ = 2.518 021 002... × 10^-8, truncated after 10 digits → one unit in the
    // last digit, 1e-17/2.518e-8 = 4e-10 relative, and the truncated value is below the true one
    expect(rel(F0, 2.518021002e-8)).toBeLessThan(4e-10);
    expect(F0).toBeGreaterThan(2.518021002e-8);
    expect(rel(F0, fixture.constants.f0)).toBeLessThan(4e-16);
  });

  it("matches mpmath at sample luminosities and fluxes (photometry.py)", () => {
    for (const row of fixture.bolometric) {
      const lw = Number(row.L_W);
      expect(Math.abs(absoluteBolometricMagnitudeSI(lw) - row.M_bol)).toBeLessThan(2e-14);
      expect(Math.abs(apparentBolometricMagnitudeSI(Number(row.f_Wm2)) - row.m_bol)).toBeLessThan(2e-14);
    }
  });

  it("a star's m_bol − M_bol equals its distance modulus, and round trips hold (property)", () => {
    fc.assert(
      fc.property(logUniform(20, 33), fc.double({ min: -2, max: 6, noNaN: true }), (l, e) => {
        const d = 10 ** e * PARSEC;
        const f = fluxFromLuminositySI(l, d);
        const mu = apparentBolometricMagnitudeSI(f) - absoluteBolometricMagnitudeSI(l);
        // f₀ = L₀/(4π(10 pc)²) makes this identity exact in real arithmetic
        expect(Math.abs(mu - distanceModulusSI(d))).toBeLessThan(1e-13);
        expect(rel(luminosityFromAbsoluteBolometricMagnitudeSI(absoluteBolometricMagnitudeSI(l)), l)).toBeLessThan(2e-14);
        expect(rel(bolometricFluxFromApparentBolometricMagnitudeSI(apparentBolometricMagnitudeSI(f)), f)).toBeLessThan(2e-14);
      }),
    );
  });
});

describe("AB magnitudes and f_ν ↔ f_λ", () => {
  it("m_AB = 0 at 3631 Jy; 1 µJy ↔ 23.9 AB (common practice); 48.60 cgs zero point (Oke & Gunn 1983, from memory)", () => {
    expect(abMagnitudeSI(3631 * JANSKY)).toBe(0);
    expect(spectralFluxDensityFromAbMagnitudeSI(0)).toBe(AB_ZERO_POINT);
    // "23.9" is printed to 1 decimal → ±0.05; mpmath value 23.900066 to 1e-14
    expect(Math.abs(abMagnitudeSI(1e-6 * JANSKY) - 23.9)).toBeLessThan(0.05);
    expect(Math.abs(abMagnitudeSI(1e-6 * JANSKY) - fixture.ab.m_of_1uJy)).toBeLessThan(1e-14);
    expect(rel(spectralFluxDensityFromAbMagnitudeSI(23.9), fixture.ab.fnu_of_m_23p9)).toBeLessThan(1e-14);
    // m_AB = −2.5 log10(f_ν / erg s^-1 cm^-2 Hz^-1) − 48.60; 1 W m^-2 Hz^-1 = 1e3 erg s^-1 cm^-2 Hz^-1.
    // 48.60 printed to 2 decimals → ±0.005
    const fnuCgs = 1e3 * spectralFluxDensityFromAbMagnitudeSI(17.3);
    expect(Math.abs(-2.5 * Math.log10(fnuCgs) - 48.6 - 17.3)).toBeLessThan(0.005);
  });

  it("f_λ = f_ν c/λ² at 550 nm matches mpmath, and round-trips (property)", () => {
    expect(rel(fLambdaFromFNuSI(AB_ZERO_POINT, 550e-9), fixture.ab.flambda_3631Jy_550nm)).toBeLessThan(5e-16);
    fc.assert(
      fc.property(logUniform(-35, -20), logUniform(-8, -2), (fnu, lam) => {
        expect(rel(fNuFromFLambdaSI(fLambdaFromFNuSI(fnu, lam), lam), fnu)).toBeLessThan(1e-15);
        // f_λ λ = f_ν ν (same power per logarithmic interval)
        expect(rel(fLambdaFromFNuSI(fnu, lam) * lam, fnu * (299792458 / lam))).toBeLessThan(1e-15);
      }),
    );
  });
});

describe("bad input", () => {
  it("throws RangeError naming the parameter", () => {
    for (const bad of [0, -1, NaN, Infinity]) {
      expect(() => magnitudeDifferenceFromFluxRatio(bad)).toThrow(/flux ratio/);
      expect(() => distanceModulusSI(bad)).toThrow(/distance/);
      expect(() => absoluteMagnitudeSI(1, bad)).toThrow(/distance/);
      expect(() => absoluteBolometricMagnitudeSI(bad)).toThrow(/luminosity/);
      expect(() => apparentBolometricMagnitudeSI(bad)).toThrow(/bolometric flux/);
      expect(() => abMagnitudeSI(bad)).toThrow(/spectral flux density/);
      expect(() => fLambdaFromFNuSI(1, bad)).toThrow(/wavelength/);
      expect(() => fNuFromFLambdaSI(bad, 1e-6)).toThrow(/spectral flux density/);
    }
    for (const bad of [NaN, Infinity, -Infinity]) {
      expect(() => fluxRatioFromMagnitudeDifference(bad)).toThrow(/magnitude difference/);
      expect(() => distanceModulusSI(1e17, bad)).toThrow(/extinction/);
      expect(() => absoluteMagnitudeSI(bad, 1e17)).toThrow(/apparent magnitude/);
      expect(() => apparentMagnitudeSI(bad, 1e17)).toThrow(/absolute magnitude/);
      expect(() => distanceFromDistanceModulusSI(bad)).toThrow(/distance modulus/);
      expect(() => luminosityFromAbsoluteBolometricMagnitudeSI(bad)).toThrow(/absolute bolometric magnitude/);
      expect(() => bolometricFluxFromApparentBolometricMagnitudeSI(bad)).toThrow(/apparent bolometric magnitude/);
      expect(() => spectralFluxDensityFromAbMagnitudeSI(bad)).toThrow(/AB magnitude/);
    }
    // overflow is reported, not returned as Infinity
    expect(() => fluxRatioFromMagnitudeDifference(-1000)).toThrow(RangeError);
    expect(() => luminosityFromAbsoluteBolometricMagnitudeSI(-800)).toThrow(/luminosity/);
  });
});
