import { describe, expect, test } from "vitest";
import fixture from "../../test/fixtures/constants.json";
import { constants } from "./index";
import { WIEN_X_ENERGY_FREQUENCY, WIEN_X_ENERGY_WAVELENGTH, WIEN_X_PHOTON_FREQUENCY, WIEN_X_PHOTON_WAVELENGTH } from "../values/wien-roots";

/** Relative difference. */
const rel = (a: number, b: number) => Math.abs(a - b) / Math.abs(b);

/** Number of significant digits in the shortest decimal form of a printed value. */
function printedDigits(x: number): { digits: number; lastPlace: number } {
  const [mant, exp] = x.toExponential().split("e") as [string, string];
  const digits = mant.replace("-", "").replace(".", "").length;
  return { digits, lastPlace: Number(exp) - digits + 1 };
}

type Key = keyof typeof constants;

describe("CODATA 2018 values (reference: scipy.constants 1.10, which carries CODATA 2018)", () => {
  // Constants CODATA lists with a standard uncertainty or as exact decimals:
  // our value must be the very same double and carry the same uncertainty.
  const same: [Key, keyof typeof fixture.codata][] = [
    ["h", "h"],
    ["c", "c"],
    ["kB", "kB"],
    ["NA", "NA"],
    ["eV", "eV"],
    ["G", "G"],
    ["alpha", "alpha"],
    ["Rinf", "Rinf"],
    ["me", "me"],
    ["mp", "mp"],
    ["mu", "mu"],
  ];
  for (const [ours, ref] of same) {
    test(`${ours} equals CODATA 2018 '${ref}' with its uncertainty`, () => {
      const r = fixture.codata[ref];
      expect(constants[ours].si as number).toBe(r.value);
      // uncertainties are printed to 2 digits; compare to that precision
      expect(constants[ours].uncertaintySI).toBeCloseTo(r.uncertainty, 30);
      if (r.uncertainty > 0) expect(rel(constants[ours].uncertaintySI, r.uncertainty)).toBeLessThan(1e-12);
      expect(constants[ours].exact).toBe(r.uncertainty === 0);
    });
  }

  // Exact constants CODATA prints truncated ("5.670 374 419...") because they
  // derive from the exact defining constants: ours, computed from h, c, k,
  // must agree with every printed digit (printed ≤ ours < printed + one unit
  // in the last printed place, allowing for either truncation or rounding).
  const derived: Key[] = ["sigma", "c1", "c1L", "c2", "wienB", "wienBPrime", "R", "hbar"];
  for (const key of derived) {
    test(`${key} agrees with all digits CODATA 2018 prints`, () => {
      const printed = fixture.codata[key as keyof typeof fixture.codata].value;
      const ours = constants[key].si as number;
      const { digits, lastPlace } = printedDigits(printed);
      const unit = 10 ** lastPlace;
      expect(digits).toBeGreaterThanOrEqual(9);
      expect(Math.abs(ours - printed)).toBeLessThan(unit);
      expect(constants[key].exact).toBe(true);
    });
  }
});

describe("derived constants against 50-digit mpmath (test/fixtures/gen/constants.py)", () => {
  // Each is a handful of floating-point operations (≤ 10, each ≤ 0.5 ulp),
  // so 5 ulp ≈ 1.1e-15 relative bounds the error; we allow 2e-15.
  const cases: [Key | "x5" | "x3" | "x4" | "x2", number][] = [
    ["sigma", constants.sigma.si],
    ["c1", constants.c1.si],
    ["c1L", constants.c1L.si],
    ["c2", constants.c2.si],
    ["wienB", constants.wienB.si],
    ["wienBPrime", constants.wienBPrime.si],
    ["pc", constants.pc.si],
    ["f0", constants.f0.si],
    ["ly", constants.ly.si],
    ["Msun", constants.Msun.si],
    ["x5", WIEN_X_ENERGY_WAVELENGTH],
    ["x3", WIEN_X_ENERGY_FREQUENCY],
    ["x4", WIEN_X_PHOTON_WAVELENGTH],
    ["x2", WIEN_X_PHOTON_FREQUENCY],
  ];
  for (const [key, ours] of cases) {
    test(`${key}`, () => {
      const ref = fixture.derived[key as keyof typeof fixture.derived];
      if (key.startsWith("x")) {
        // a root of one equation, solved by Newton to convergence: it must be
        // the correctly rounded double of the 50-digit root
        expect(ours).toBe(ref.value);
      } else {
        expect(rel(ours, ref.value)).toBeLessThan(2e-15);
      }
    });
  }
});

describe("IAU definitions and nominal values (printed values of the resolutions)", () => {
  test("astronomical unit is exactly 149 597 870 700 m (IAU 2012 B2)", () => {
    expect(constants.au.si as number).toBe(149597870700);
    expect(constants.au.cgs as number).toBe(14959787070000);
  });
  test("parsec is (648000/π) au; IAU 2015 B2 prints 3.085 677 581 491 367 × 10^16 m", () => {
    expect(rel(constants.pc.si, 3.085677581491367e16)).toBeLessThan(1.7e-16); // 16 printed digits
  });
  test("f₀ = 2.518 021 002... × 10^-8 W m^-2 (IAU 2015 B2, printed truncated to 10 digits)", () => {
    const d = constants.f0.si - 2.518021002e-8;
    expect(d).toBeGreaterThanOrEqual(0);
    expect(d).toBeLessThan(1e-17); // one unit in the last printed place
  });
  test("L₀ = 3.0128 × 10^28 W exactly (IAU 2015 B2)", () => {
    expect(constants.L0.si as number).toBe(3.0128e28);
    expect(constants.L0.cgs as number).toBe(3.0128e35);
  });
  test("IAU 2015 B3 nominal solar and planetary values, exactly as printed", () => {
    expect(constants.Rsun.si as number).toBe(6.957e8);
    expect(constants.Ssun.si as number).toBe(1361);
    expect(constants.Lsun.si as number).toBe(3.828e26);
    expect(constants.Tsun.si as number).toBe(5772);
    expect(constants.GMsun.si as number).toBe(1.3271244e20);
    expect(constants.REarthEq.si as number).toBe(6.3781e6);
    expect(constants.REarthPolar.si as number).toBe(6.3568e6);
    expect(constants.RJupiterEq.si as number).toBe(7.1492e7);
    expect(constants.RJupiterPolar.si as number).toBe(6.6854e7);
    expect(constants.GMEarth.si as number).toBe(3.986004e14);
    expect(constants.GMJupiter.si as number).toBe(1.2668653e17);
  });
  test("light-year is c × 365.25 d = 9 460 730 472 580 800 m exactly (IAU)", () => {
    expect(constants.ly.si as number).toBe(9460730472580800);
  });
  test("jansky is 10^-26 W m^-2 Hz^-1 = 10^-23 erg s^-1 cm^-2 Hz^-1", () => {
    expect(constants.Jy.si as number).toBe(1e-26);
    expect(constants.Jy.cgs as number).toBe(1e-23);
  });
  test("solar mass carries G's relative uncertainty (CODATA 2018: 2.2e-5)", () => {
    expect(constants.Msun.relativeUncertainty).toBeCloseTo(0.00015 / 6.6743, 12);
  });
});

describe("CGS values", () => {
  test("conversions by exact powers of ten", () => {
    expect(constants.h.cgs as number).toBe(6.62607015e-27); // erg s
    expect(constants.kB.cgs as number).toBe(1.380649e-16); // erg K^-1
    expect(constants.c.cgs as number).toBe(29979245800); // cm s^-1
    expect(constants.Lsun.cgs as number).toBe(3.828e33); // erg s^-1
    expect(constants.G.cgs as number).toBe(6.6743e-8); // cm^3 g^-1 s^-2
    expect(constants.me.cgs as number).toBe(9.1093837015e-28); // g
  });
  test("σ in CGS is 5.670 374 419e-5 erg s^-1 cm^-2 K^-4 (CODATA 2018 printed value × 10^3)", () => {
    expect(Math.abs(constants.sigma.cgs - 5.670374419e-5)).toBeLessThan(1e-14);
  });
  test("system-free constants have the same value in both systems", () => {
    expect(constants.Tsun.cgs as number).toBe(constants.Tsun.si as number);
    expect(constants.alpha.cgs as number).toBe(constants.alpha.si as number);
    expect(constants.wienBPrime.cgs as number).toBe(constants.wienBPrime.si as number);
  });
});
