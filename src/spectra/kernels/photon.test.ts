import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { EV } from "../../values/constants";
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
} from "./photon";

const rel = (a: number, b: number): number => Math.abs(a / b - 1);
const logUniform = (lo: number, hi: number) =>
  fc.double({ min: Math.log(lo), max: Math.log(hi), noNaN: true }).map((x) => Math.exp(x));

describe("photon conversions", () => {
  it("hc = 1239.841 98 eV nm (CODATA 2018, exact h, c, e; printed 1239.841 984…)", () => {
    // 1 nm photon: E = 1239.841984 eV; 10 digits printed → rel 1e-9.
    expect(rel(photonEnergyFromVacuumWavelengthSI(1e-9) / EV, 1239.841984)).toBeLessThan(1e-9);
  });
  it("21-cm line: ν = 1 420 405 751.768 Hz ↔ λ = 0.211 061 140 54 m (from memory)", () => {
    // 11 digits remembered → rel 1e-10.
    expect(rel(wavelengthFromFrequencySI(1420405751.768), 0.21106114054)).toBeLessThan(1e-10);
  });
  it("1 eV ↔ 8065.544 cm⁻¹ (CODATA 2018 printed 8065.543 937… cm⁻¹) and 241.798 924 THz", () => {
    expect(rel(wavenumberFromPhotonEnergySI(EV) / 100, 8065.543937)).toBeLessThan(1e-9);
    expect(rel(frequencyFromPhotonEnergySI(EV), 2.417989242e14)).toBeLessThan(1e-9);
  });
  it("property: every round trip returns the input (≤ 4 ulp)", () => {
    fc.assert(
      fc.property(logUniform(1e-15, 1e3), (lam) => {
        const e = photonEnergyFromVacuumWavelengthSI(lam);
        const nu = frequencyFromWavelengthSI(lam);
        const s = wavenumberFromWavelengthSI(lam);
        return (
          rel(wavelengthFromPhotonEnergySI(e), lam) < 1e-15 &&
          rel(wavelengthFromFrequencySI(nu), lam) < 1e-15 &&
          rel(wavelengthFromWavenumberSI(s), lam) < 1e-15 &&
          rel(photonEnergyFromFrequencySI(nu), e) < 1e-15 &&
          rel(photonEnergyFromWavenumberSI(s), e) < 1e-15 &&
          rel(frequencyFromWavenumberSI(s), nu) < 1e-15 &&
          rel(wavenumberFromFrequencySI(nu), s) < 1e-15 &&
          rel(frequencyFromPhotonEnergySI(e), nu) < 1e-15 &&
          rel(wavenumberFromPhotonEnergySI(e), s) < 1e-15
        );
      }),
    );
  });
  it("bad input → RangeError naming the parameter", () => {
    expect(() => photonEnergyFromVacuumWavelengthSI(0)).toThrow(/wavelengthM/);
    expect(() => wavelengthFromPhotonEnergySI(-1)).toThrow(/energyJ/);
    expect(() => frequencyFromWavelengthSI(Number.NaN)).toThrow(/wavelengthM/);
    expect(() => wavelengthFromFrequencySI(Infinity)).toThrow(/frequencyHz/);
    expect(() => wavelengthFromWavenumberSI(0)).toThrow(/wavenumberPerM/);
  });
});
