import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { C, K_B, M_U } from "../../values/constants";
import {
  atomicMassKg,
  dopplerVelocityWidthSI,
  dopplerWidthFrequencySI,
  dopplerWidthFromSigma,
  dopplerWidthWavelengthSI,
  gaussianFwhmFromDopplerWidth,
  lorentzHwhmFrequencySI,
  lorentzHwhmWavelengthSI,
  voigtFwhmApprox,
} from "./widths";
import { gaussianProfileSI, voigtProfileSI } from "./profiles";

const rel = (a: number, b: number): number => Math.abs(a / b - 1);
const logUniform = (lo: number, hi: number) =>
  fc.double({ min: Math.log(lo), max: Math.log(hi), noNaN: true }).map((x) => Math.exp(x));

describe("Doppler widths", () => {
  it("hydrogen at 10 000 K: b = √(2kT/m) = 12.85 km/s (textbook value, e.g. Gray ch. 11: '12.8 km/s')", () => {
    // 3 significant digits → 5e-3.
    expect(rel(dopplerVelocityWidthSI(1e4, atomicMassKg(1.00794), 0), 12.85e3)).toBeLessThan(5e-3);
  });
  it("property: thermal and microturbulent parts add in quadrature; b ∝ √(T/m)", () => {
    fc.assert(
      fc.property(logUniform(10, 1e8), logUniform(1, 300), logUniform(1, 1e5), (t, a, xi) => {
        const m = a * M_U;
        const th = dopplerVelocityWidthSI(t, m, 0);
        const b = dopplerVelocityWidthSI(t, m, xi);
        return (
          rel(th * th + xi * xi, b * b) < 1e-14 &&
          rel(dopplerVelocityWidthSI(4 * t, m, 0), 2 * th) < 1e-15 &&
          rel(th, Math.sqrt((2 * K_B * t) / m)) < 1e-15
        );
      }),
    );
  });
  it("wavelength and frequency Doppler widths are consistent: Δλ/λ = Δν/ν = b/c", () => {
    const lam = 500e-9;
    const dl = dopplerWidthWavelengthSI(lam, 6000, atomicMassKg(55.845), 1500);
    const dn = dopplerWidthFrequencySI(C / lam, 6000, atomicMassKg(55.845), 1500);
    expect(rel(dl / lam, dn / (C / lam))).toBeLessThan(1e-15);
  });
  it("Gaussian FWHM = 2√(ln 2) b: the profile at ±FWHM/2 is half its peak", () => {
    const b = 3e-12;
    const f = gaussianFwhmFromDopplerWidth(b);
    expect(rel(gaussianProfileSI(f / 2, b), gaussianProfileSI(0, b) / 2)).toBeLessThan(1e-14);
    expect(rel(dopplerWidthFromSigma(1), Math.SQRT2)).toBeLessThan(1e-16);
  });
});

describe("Lorentz widths", () => {
  it("Lyman α natural width: A = 6.2649e8 s⁻¹ → FWHM 2Γ/4π = 99.7 MHz (both from memory)", () => {
    // 3 significant digits → 1e-3.
    expect(rel(2 * lorentzHwhmFrequencySI(6.2649e8), 99.7e6)).toBeLessThan(1e-3);
  });
  it("property: wavelength HWHM = λ²/c × frequency HWHM (dλ = λ² dν / c)", () => {
    fc.assert(
      fc.property(logUniform(1e-8, 1e-3), logUniform(1, 1e12), (lam, gam) => {
        return rel(lorentzHwhmWavelengthSI(lam, gam), ((lam * lam) / C) * lorentzHwhmFrequencySI(gam)) < 1e-15;
      }),
    );
  });
  it("Olivero & Longbothum FWHM is within 0.03 % of the true Voigt FWHM (their stated 0.02 %)", () => {
    for (const [b, g] of [[1, 0.1], [1, 1], [0.2, 1]] as const) {
      const fg = gaussianFwhmFromDopplerWidth(b);
      const fv = voigtFwhmApprox(fg, 2 * g);
      // Half maximum must sit at ±fv/2 to 3e-4 relative in width: check the profile there.
      const peak = voigtProfileSI(0, b, g);
      const lo = voigtProfileSI((fv / 2) * (1 - 3e-4), b, g);
      const hi = voigtProfileSI((fv / 2) * (1 + 3e-4), b, g);
      expect(lo).toBeGreaterThan(peak / 2);
      expect(hi).toBeLessThan(peak / 2);
    }
  });
  it("bad input → RangeError naming the parameter", () => {
    expect(() => dopplerVelocityWidthSI(0, 1e-26, 0)).toThrow(/temperatureK/);
    expect(() => dopplerVelocityWidthSI(100, -1, 0)).toThrow(/massKg/);
    expect(() => dopplerVelocityWidthSI(100, 1e-26, -1)).toThrow(/microturbulenceMs/);
    expect(() => lorentzHwhmWavelengthSI(0, 1)).toThrow(/centreWavelengthM/);
    expect(() => lorentzHwhmFrequencySI(Number.NaN)).toThrow(/dampingRatePerS/);
    expect(() => atomicMassKg(0)).toThrow(/relativeAtomicMass/);
  });
});
