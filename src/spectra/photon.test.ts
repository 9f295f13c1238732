import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { CGS, SI } from "../quantity/system";
import { times10 } from "../quantity/unit";
import { units } from "../quantity/units";
import { assume } from "../quantity/quantity";
import type { Energy, Frequency, Length, Wavenumber } from "../quantity/aliases";
import {
  frequencyFromPhotonEnergySI,
  frequencyFromWavelengthSI,
  frequencyFromWavenumberSI,
  photonEnergyFromFrequencySI,
  photonEnergyFromVacuumWavelengthSI,
  photonEnergyFromWavenumberSI,
  wavelengthFromFrequencySI,
  wavelengthFromPhotonEnergySI,
  wavelengthFromWavenumberSI,
  wavenumberFromFrequencySI,
  wavenumberFromPhotonEnergySI,
  wavenumberFromWavelengthSI,
} from "./kernels/photon";
import {
  frequencyFromVacuumWavelength,
  frequencyFromWavenumber,
  photonEnergyFromFrequency,
  photonEnergyFromVacuumWavelength,
  photonEnergyFromWavenumber,
  frequencyFromPhotonEnergy,
  vacuumWavelengthFromPhotonEnergy,
  wavenumberFromPhotonEnergy,
  vacuumWavelengthFromFrequency,
  vacuumWavelengthFromWavenumber,
  wavenumberFromFrequency,
  wavenumberFromVacuumWavelength,
} from "./photon";
import { vacuumWavelength } from "./medium";

const rel = (a: number, b: number): number => Math.abs(a / b - 1);
const lenSI = (x: number) => assume<Length<"SI">>(x);
const lenCGS = (x: number) => assume<Length<"CGS">>(x);
const eSI = (x: number) => assume<Energy<"SI">>(x);
const eCGS = (x: number) => assume<Energy<"CGS">>(x);
const kSI = (x: number) => assume<Wavenumber<"SI">>(x);
const kCGS = (x: number) => assume<Wavenumber<"CGS">>(x);
const nu = (x: number) => assume<Frequency>(x);

describe("typed = kernel (SI); CGS = SI × 10^k exactly for the same physical input", () => {
  const lams = [1e-12, 121.567e-9, 500e-9, 0.21106114054, 3];
  it("from wavelength", () => {
    for (const m of lams) {
      expect(photonEnergyFromVacuumWavelength(SI, lenSI(m))).toBe(photonEnergyFromVacuumWavelengthSI(m));
      expect(frequencyFromVacuumWavelength(SI, lenSI(m))).toBe(frequencyFromWavelengthSI(m));
      expect(wavenumberFromVacuumWavelength(SI, lenSI(m))).toBe(wavenumberFromWavelengthSI(m));
      const cm = times10(m, 2);
      const si = times10(cm, -2);
      expect(photonEnergyFromVacuumWavelength(CGS, lenCGS(cm))).toBe(times10(photonEnergyFromVacuumWavelength(SI, lenSI(si)), 7));
      expect(frequencyFromVacuumWavelength(CGS, lenCGS(cm))).toBe(frequencyFromVacuumWavelength(SI, lenSI(si)));
      expect(wavenumberFromVacuumWavelength(CGS, lenCGS(cm))).toBe(times10(wavenumberFromVacuumWavelength(SI, lenSI(si)), -2));
    }
  });
  it("from energy, frequency and wavenumber", () => {
    for (const j of [1e-25, 1.602176634e-19, 3e-12]) {
      expect(vacuumWavelengthFromPhotonEnergy(SI, eSI(j))).toBe(wavelengthFromPhotonEnergySI(j));
      expect(frequencyFromPhotonEnergy(SI, eSI(j))).toBe(frequencyFromPhotonEnergySI(j));
      expect(wavenumberFromPhotonEnergy(SI, eSI(j))).toBe(wavenumberFromPhotonEnergySI(j));
      const erg = times10(j, 7);
      const si = times10(erg, -7);
      expect(vacuumWavelengthFromPhotonEnergy(CGS, eCGS(erg))).toBe(times10(vacuumWavelengthFromPhotonEnergy(SI, eSI(si)), 2));
      expect(frequencyFromPhotonEnergy(CGS, eCGS(erg))).toBe(frequencyFromPhotonEnergy(SI, eSI(si)));
      expect(wavenumberFromPhotonEnergy(CGS, eCGS(erg))).toBe(times10(wavenumberFromPhotonEnergy(SI, eSI(si)), -2));
    }
    for (const hz of [1.420405751768e9, 4.568e14, 2.4e18]) {
      expect(photonEnergyFromFrequency(SI, nu(hz))).toBe(photonEnergyFromFrequencySI(hz));
      expect(vacuumWavelengthFromFrequency(SI, nu(hz))).toBe(wavelengthFromFrequencySI(hz));
      expect(wavenumberFromFrequency(SI, nu(hz))).toBe(wavenumberFromFrequencySI(hz));
      expect(photonEnergyFromFrequency(CGS, nu(hz))).toBe(times10(photonEnergyFromFrequency(SI, nu(hz)), 7));
      expect(vacuumWavelengthFromFrequency(CGS, nu(hz))).toBe(times10(vacuumWavelengthFromFrequency(SI, nu(hz)), 2));
      expect(wavenumberFromFrequency(CGS, nu(hz))).toBe(times10(wavenumberFromFrequency(SI, nu(hz)), -2));
    }
    for (const k of [1, 1.5233e6, 8.2e6]) {
      expect(photonEnergyFromWavenumber(SI, kSI(k))).toBe(photonEnergyFromWavenumberSI(k));
      expect(vacuumWavelengthFromWavenumber(SI, kSI(k))).toBe(wavelengthFromWavenumberSI(k));
      expect(frequencyFromWavenumber(SI, kSI(k))).toBe(frequencyFromWavenumberSI(k));
      const pc = times10(k, -2);
      const si = times10(pc, 2);
      expect(photonEnergyFromWavenumber(CGS, kCGS(pc))).toBe(times10(photonEnergyFromWavenumber(SI, kSI(si)), 7));
      expect(vacuumWavelengthFromWavenumber(CGS, kCGS(pc))).toBe(times10(vacuumWavelengthFromWavenumber(SI, kSI(si)), 2));
      expect(frequencyFromWavenumber(CGS, kCGS(pc))).toBe(frequencyFromWavenumber(SI, kSI(si)));
    }
  });
});

describe("reference values", () => {
  it("hc = 1239.841 98 eV nm (CODATA 2018: exact h, c, e; printed 1239.841 984…)", () => {
    // exact constants → only rounding: 10 significant digits compared → 1e-10
    const e = photonEnergyFromVacuumWavelength(SI, SI.of(1, units.nm));
    expect(rel(SI.valueIn(e, units.eV), 1239.84198)).toBeLessThan(1e-8);
    expect(rel(SI.valueIn(vacuumWavelengthFromPhotonEnergy(SI, SI.of(1, units.eV)), units.nm), 1239.841984)).toBeLessThan(1e-9);
  });
  it("1 eV ↔ 8065.543 937 cm⁻¹ and 241.798 924 THz (CODATA 2018 printed values), in CGS", () => {
    // 10 significant digits → 1e-9
    expect(rel(CGS.valueIn(wavenumberFromPhotonEnergy(CGS, CGS.of(1, units.eV)), units.per_cm), 8065.543937)).toBeLessThan(1e-9);
    expect(rel(SI.valueIn(frequencyFromPhotonEnergy(CGS, CGS.of(1, units.eV)), units.THz), 241.798924)).toBeLessThan(1e-8);
  });
  it("21-cm line: ν = 1 420 405 751.768 Hz ↔ λ = 21.106 114 054 cm (from memory)", () => {
    // 11 significant digits remembered → 1e-10
    const lam = vacuumWavelengthFromFrequency(CGS, SI.of(1420405751.768, units.Hz));
    expect(rel(CGS.valueIn(lam, units.cm), 21.106114054)).toBeLessThan(1e-10);
  });
});

describe("properties", () => {
  const logUniform = (lo: number, hi: number) =>
    fc.double({ min: Math.log(lo), max: Math.log(hi), noNaN: true }).map((x) => Math.exp(x));
  it("λ → E → λ, λ → ν → λ and λ → σ → E → λ in CGS return the input (≤ 1e-15: a few roundings and scalings)", () => {
    fc.assert(
      fc.property(logUniform(1e-10, 1e4), (cm) => {
        const lam = vacuumWavelength(CGS, lenCGS(cm));
        const a = vacuumWavelengthFromPhotonEnergy(CGS, photonEnergyFromVacuumWavelength(CGS, lam));
        const b = vacuumWavelengthFromFrequency(CGS, frequencyFromVacuumWavelength(CGS, lam));
        const c = vacuumWavelengthFromPhotonEnergy(CGS, photonEnergyFromWavenumber(CGS, wavenumberFromVacuumWavelength(CGS, lam)));
        return rel(a, cm) < 1e-15 && rel(b, cm) < 1e-15 && rel(c, cm) < 1e-15;
      }),
      { numRuns: 200 },
    );
  });
  it("E = hν = hcσ agree for every frequency", () => {
    fc.assert(
      fc.property(logUniform(1e6, 1e20), (hz) => {
        const e1 = photonEnergyFromFrequency(SI, nu(hz));
        const e2 = photonEnergyFromWavenumber(SI, wavenumberFromFrequency(SI, nu(hz)));
        return rel(e1, e2) < 1e-15;
      }),
      { numRuns: 200 },
    );
  });
});

describe("bad input: RangeError naming the parameter and the caller's unit", () => {
  it("non-positive or non-finite inputs", () => {
    expect(() => photonEnergyFromVacuumWavelength(CGS, lenCGS(0))).toThrow(/^wavelength must be a finite number > 0 cm; got 0$/);
    expect(() => vacuumWavelengthFromPhotonEnergy(CGS, eCGS(-1))).toThrow(/^energy must be a finite number > 0 cm\^2 g s\^-2; got -1$/);
    expect(() => vacuumWavelengthFromFrequency(SI, nu(Number.NaN))).toThrow(/^frequency must be a finite number > 0 s\^-1; got NaN$/);
    expect(() => vacuumWavelengthFromWavenumber(CGS, kCGS(Infinity))).toThrow(/^wavenumber must be a finite number > 0 cm\^-1/);
  });
});

describe("CGS: values beyond the double range are refused in the caller's unit", () => {
  it("a result finite in SI but not after the ×10² into cm", () => {
    // λ = c/ν = 9.99e306 m for ν = 3e-299 Hz: 9.99e308 cm overflows
    expect(Number.isFinite(vacuumWavelengthFromFrequency(SI, nu(3e-299)))).toBe(true);
    expect(() => vacuumWavelengthFromFrequency(CGS, nu(3e-299))).toThrow(/^vacuum wavelength overflows the double range in cm for frequency=3e-299 s\^-1$/);
  });
  it("an input valid in cm⁻¹ that leaves the double range in m⁻¹", () => {
    expect(() => photonEnergyFromWavenumber(CGS, kCGS(1e307))).toThrow(/^wavenumber = 1e\+307 cm\^-1 is outside the double range once converted to SI \(Infinity m\^-1\)$/);
  });
});
