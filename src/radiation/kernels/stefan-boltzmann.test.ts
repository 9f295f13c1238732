import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { C1, C1L, C2, L_SUN, R_SUN, SIGMA, T_SUN } from "../../values/constants";
import fx from "../../../test/fixtures/planck_constants.json";
import {
  SIGMA_PHOTON,
  ZETA3,
  luminosityFromRadiusTemperatureSI,
  photonEmissionRateSI,
  photonExitanceSI,
  radiusFromLuminosityTemperatureSI,
  stefanBoltzmannExitanceSI,
  temperatureFromExitanceSI,
  temperatureFromLuminosityRadiusSI,
} from "./stefan-boltzmann";
import { bandPhotonRadianceWavelengthSI } from "./band-fraction";

const logUniform = (lo: number, hi: number) =>
  fc.double({ min: Math.log(lo), max: Math.log(hi), noNaN: true }).map((u) => Math.exp(u));
const tempArb = logUniform(1e-2, 1e10);
const radiusArb = logUniform(1e-3, 1e15);

function agreesToPrinted(v: number, printed: number, lastDigit: number): void {
  // CODATA prints these exact-but-irrational constants truncated ("…"), so v ∈ [printed, printed + 1 unit).
  expect(v).toBeGreaterThanOrEqual(printed);
  expect(v - printed).toBeLessThan(lastDigit);
}

describe("CODATA 2018 radiation constants (printed values, truncated)", () => {
  it("σ = 5.670 374 419e-8 W m^-2 K^-4", () => agreesToPrinted(SIGMA, 5.670374419e-8, 1e-17));
  it("c₁ = 3.741 771 852e-16 W m²", () => agreesToPrinted(C1, 3.741771852e-16, 1e-25));
  it("c₁L = 1.191 042 972e-16 W m² sr^-1", () => agreesToPrinted(C1L, 1.191042972e-16, 1e-25));
  it("c₂ = 1.438 776 877e-2 m K", () => agreesToPrinted(C2, 1.438776877e-2, 1e-11));
});

describe("ζ(3) and the photon Stefan–Boltzmann constant", () => {
  it("ζ(3) from Apéry's series equals mpmath.zeta(3) (fixture) to 1 ulp", () => {
    expect(Math.abs(ZETA3 - fx.values.zeta3)).toBeLessThanOrEqual(Number.EPSILON);
  });
  it("σ_γ = 4πζ(3)k³/(h³c²) matches mpmath (fixture) to 4 ulp", () => {
    // k³/h³ and c² each add ~1 rounding → 4 ulp
    expect(Math.abs(SIGMA_PHOTON / fx.values.sigmaPhoton - 1)).toBeLessThan(4 * Number.EPSILON);
  });
  it("photon exitance = π × ∫N_λ dλ over all wavelengths (via the photon band fraction)", () => {
    fc.assert(
      fc.property(tempArb, (T) => {
        const total = Math.PI * bandPhotonRadianceWavelengthSI(1e-4 / T, 1e9 / T, T);
        expect(Math.abs(total / photonExitanceSI(T) - 1)).toBeLessThan(1e-14);
      }),
      { numRuns: 50 },
    );
  });
});

describe("IAU 2015 Resolution B3 solar example", () => {
  it("4πR☉²σT☉⁴ = L☉ within the rounding of the nominal values", () => {
    // R☉ᴺ = 6.957e8 m (4 digits → rel ±5e-5/6.957 = 7.2e-5), T☉ᴺ = 5772 K (4 digits → ±0.5/5772 = 8.7e-5),
    // L☉ᴺ = 3.828e26 W (4 digits → 1.3e-4). L ∝ R²T⁴ → 2·7.2e-5 + 4·8.7e-5 + 1.3e-4 = 6.2e-4.
    const L = luminosityFromRadiusTemperatureSI(R_SUN, T_SUN);
    expect(Math.abs(L / L_SUN - 1)).toBeLessThan(6.2e-4);
    // and T☉ from L☉, R☉ rounds to 5772 K (IAU B3 states T☉ᴺ = 5772 K)
    expect(Math.round(temperatureFromLuminosityRadiusSI(L_SUN, R_SUN))).toBe(5772);
  });
});

describe("properties", () => {
  it("×10 in T → ×10⁴ in exitance (to a few ulp)", () => {
    fc.assert(
      fc.property(logUniform(1e-2, 1e9), (T) => {
        expect(Math.abs(stefanBoltzmannExitanceSI(10 * T) / stefanBoltzmannExitanceSI(T) / 1e4 - 1)).toBeLessThan(1e-15);
      }),
    );
  });
  it("every inverse round-trips", () => {
    fc.assert(
      fc.property(radiusArb, tempArb, (R, T) => {
        const L = luminosityFromRadiusTemperatureSI(R, T);
        expect(Math.abs(radiusFromLuminosityTemperatureSI(L, T) / R - 1)).toBeLessThan(2e-15);
        expect(Math.abs(temperatureFromLuminosityRadiusSI(L, R) / T - 1)).toBeLessThan(2e-15);
        expect(Math.abs(temperatureFromExitanceSI(stefanBoltzmannExitanceSI(T)) / T - 1)).toBeLessThan(2e-15);
      }),
    );
  });
  it("photon rate of a sphere = 4πR² × photon exitance; ∝ T³", () => {
    fc.assert(
      fc.property(radiusArb, logUniform(1e-2, 1e9), (R, T) => {
        expect(Math.abs(photonEmissionRateSI(R, T) / (4 * Math.PI * R * R * photonExitanceSI(T)) - 1)).toBeLessThan(1e-15);
        expect(Math.abs(photonExitanceSI(10 * T) / photonExitanceSI(T) / 1e3 - 1)).toBeLessThan(1e-15);
      }),
    );
  });
  it("no NaN/Infinity for finite positive input; true overflow throws a RangeError", () => {
    const anyPos = fc.double({ min: Number.MIN_VALUE, max: Number.MAX_VALUE, noNaN: true });
    fc.assert(
      fc.property(anyPos, anyPos, (a, b) => {
        const fns = [
          () => stefanBoltzmannExitanceSI(a),
          () => luminosityFromRadiusTemperatureSI(a, b),
          () => radiusFromLuminosityTemperatureSI(a, b),
          () => temperatureFromLuminosityRadiusSI(a, b),
          () => temperatureFromExitanceSI(a),
          () => photonExitanceSI(a),
          () => photonEmissionRateSI(a, b),
        ];
        for (const f of fns) {
          try {
            const v = f();
            expect(Number.isFinite(v) && v >= 0).toBe(true);
          } catch (e) {
            expect((e as Error).message).toMatch(/overflows/);
          }
        }
      }),
      { numRuns: 300 },
    );
  });
  it("1e10 K with a 1e15 m radius is finite (log-safe products)", () => {
    expect(Number.isFinite(luminosityFromRadiusTemperatureSI(1e15, 1e10))).toBe(true);
    // R·T² = 1e35, squared 1e70 · 4πσ ≈ 7.1e63 W
    expect(Math.abs(luminosityFromRadiusTemperatureSI(1e15, 1e10) / (4 * Math.PI * SIGMA * 1e70) - 1)).toBeLessThan(1e-15);
    // far outside: R = 1e200 m, T = 1e60 K → overflow reported, not Infinity
    expect(() => luminosityFromRadiusTemperatureSI(1e200, 1e60)).toThrow(/overflows/);
    // R = 1e-200 m, T = 1e-100 K → tiny but no NaN
    expect(luminosityFromRadiusTemperatureSI(1e-200, 1e-100)).toBe(0);
  });
});

describe("bad input", () => {
  it.each([0, -1, NaN, Infinity])("%s → RangeError naming the parameter", (v) => {
    expect(() => stefanBoltzmannExitanceSI(v)).toThrow(/temperature/);
    expect(() => luminosityFromRadiusTemperatureSI(v, 5000)).toThrow(/radius/);
    expect(() => radiusFromLuminosityTemperatureSI(v, 5000)).toThrow(/luminosity/);
    expect(() => temperatureFromLuminosityRadiusSI(1e26, v)).toThrow(/radius/);
    expect(() => temperatureFromExitanceSI(v)).toThrow(/exitance/);
    expect(() => photonEmissionRateSI(1, v)).toThrow(/temperature/);
  });
});
