import fc from "fast-check";
import { describe, expect, test } from "vitest";
import { constants } from "../constants/index";
import { kinds } from "./aliases";
import { CGS, SI } from "./system";
import { multiplyUnits, powerUnit, prefixed, type Unit } from "./unit";
import { units } from "./units";

const ULP = Number.EPSILON;
const rel = (a: number, b: number) => (a === b ? 0 : Math.abs(a - b) / Math.max(Math.abs(a), Math.abs(b)));
const allUnits = Object.values(units) as Unit[];
/** Log-uniform positive doubles over 1e-30 … 1e30, either sign. */
const magnitude = fc
  .tuple(fc.double({ min: -30, max: 30, noNaN: true }), fc.boolean())
  .map(([e, neg]) => (neg ? -1 : 1) * 10 ** e);

describe("exact definitions (IAU 2012 B2, IAU 2015 B2, SI)", () => {
  test("1 au = 149 597 870 700 m; 1 pc = 648000/π au", () => {
    expect(SI.of(1, units.au) as number).toBe(149597870700);
    expect(rel(SI.valueIn(SI.of(1, units.pc), units.au), 648000 / Math.PI)).toBeLessThan(2 * ULP);
  });
  test("1 ly = 9 460 730 472 580 800 m; 1 pc = 3.261 563 777 ly (from memory; 10 digits)", () => {
    expect(SI.of(1, units.ly) as number).toBe(9460730472580800);
    expect(SI.valueIn(SI.of(1, units.pc), units.ly)).toBeCloseTo(3.261563777, 9);
  });
  test("1 eV = 1.602 176 634e-19 J exactly; 1 keV in erg", () => {
    expect(SI.of(1, units.eV) as number).toBe(1.602176634e-19);
    expect(CGS.of(1, units.keV) as number).toBe(1.602176634e-9);
  });
  test("1 Jy = 1e-26 W m^-2 Hz^-1 = 1e-23 erg s^-1 cm^-2 Hz^-1", () => {
    expect(SI.of(1, units.Jy) as number).toBe(1e-26);
    expect(CGS.of(1, units.Jy) as number).toBe(1e-23);
    expect(CGS.of(3631, units.Jy) as number).toBe(3.631e-20);
  });
  test("decimal units convert exactly: 5000 Å = 5e-5 cm = 500 nm", () => {
    expect(CGS.of(5000, units.angstrom) as number).toBe(5e-5);
    expect(SI.valueIn(SI.of(5000, units.angstrom), units.nm)).toBe(500);
    expect(CGS.of(1, units.J) as number).toBe(1e7);
    expect(SI.of(1, units.erg) as number).toBe(1e-7);
  });
  test("angles: 1 mas = π/648 000 000 rad; 1 deg² = (π/180)² sr", () => {
    expect(rel(SI.of(1, units.mas), Math.PI / 648e6)).toBeLessThan(2 * ULP);
    expect(rel(SI.of(1, units.sqdeg), (Math.PI / 180) ** 2)).toBeLessThan(2 * ULP);
    // the whole sky is 4π sr ≈ 41 252.96 deg² (common practice)
    expect(SI.valueIn(SI.of(4 * Math.PI, units.sr), units.sqdeg)).toBeCloseTo(41252.96, 2);
  });
  test("time: Julian year = 365.25 d = 31 557 600 s", () => {
    expect(SI.of(1, units.yr) as number).toBe(31557600);
    expect(SI.of(1, units.day) as number).toBe(86400);
  });
  test("wavenumbers: 1 cm^-1 = 100 m^-1", () => {
    expect(SI.of(1, units.per_cm) as number).toBe(100);
    expect(CGS.of(1, units.per_cm) as number).toBe(1);
  });
  test("solar units are the IAU 2015 B3 nominal values", () => {
    expect(SI.of(1, units.Rsol) as number).toBe(6.957e8);
    expect(CGS.of(1, units.Lsol) as number).toBe(3.828e33);
  });
});

describe("system conversion", () => {
  test("SI → CGS for the solar luminosity, σ and B_λ units", () => {
    expect(CGS.from(SI.of(1, units.Lsol), kinds.power) as number).toBe(3.828e33);
    expect(rel(CGS.from(constants.sigma.si, kinds.fluxPerTemperature4), constants.sigma.cgs)).toBeLessThan(ULP);
    // 1 W m^-2 sr^-1 m^-1 = 10 erg s^-1 cm^-2 sr^-1 cm^-1 (10^7 erg / 10^4 cm² / 10^2 cm)
    expect(CGS.from(SI.of(1, units.W) as never, { dimension: kinds.spectralRadiancePerWavelength.dimension }) as number).toBe(10);
  });
  test("system-free quantities are unchanged", () => {
    expect(CGS.from(SI.of(5772, units.K), kinds.temperature) as number).toBe(5772);
  });
  test("property: SI → CGS → SI round trip within 1 ulp, any kind", () => {
    const kindList = Object.values(kinds);
    fc.assert(
      fc.property(magnitude, fc.constantFrom(...kindList), (x, kind) => {
        const si = SI.of(x, { ...units.m, dimension: kind.dimension } as Unit) as never;
        const back = SI.from(CGS.from(si, kind as never) as never, kind as never) as number;
        return rel(back, x) <= ULP;
      }),
    );
  });
});

describe("units round trip (properties)", () => {
  test("SI.valueIn(SI.of(x, u), u) ≈ x within 2 ulp for every built-in unit", () => {
    fc.assert(
      fc.property(magnitude, fc.constantFrom(...allUnits), (x, u) => {
        return rel(SI.valueIn(SI.of(x, u) as never, u), x) <= 2 * ULP;
      }),
      { numRuns: 500 },
    );
  });
  test("CGS.valueIn(CGS.of(x, u), u) ≈ x within 2 ulp", () => {
    fc.assert(
      fc.property(magnitude, fc.constantFrom(...allUnits), (x, u) => {
        return rel(CGS.valueIn(CGS.of(x, u) as never, u), x) <= 2 * ULP;
      }),
      { numRuns: 500 },
    );
  });
  test("composed units: (u·v) equals u then v", () => {
    fc.assert(
      fc.property(fc.constantFrom(...allUnits), fc.constantFrom(...allUnits), (u, v) => {
        try {
          const uv = multiplyUnits(u, v);
          return rel(uv.factor, u.factor * v.factor) <= 2 * ULP;
        } catch (e) {
          return e instanceof RangeError; // exponent overflow only
        }
      }),
    );
  });
  test("powers and prefixes", () => {
    expect(powerUnit(units.cm, 3).factor).toBe(1e-6);
    expect(prefixed("G", units.Hz).factor).toBe(1e9);
    expect(prefixed("micro", units.Jy).factor).toBe(1e-32);
    expect(() => prefixed("X", units.m)).toThrow(RangeError);
  });
  test("arrays: arrayOf / arrayIn", () => {
    const a = SI.arrayOf([400, 500, 600], units.nm);
    expect(Array.from(a)).toEqual([4e-7, 5e-7, 6e-7]);
    expect(Array.from(CGS.arrayIn(CGS.arrayOf([1, 2], units.km), units.m))).toEqual([1000, 2000]);
  });
});

describe("formatting", () => {
  test("readable output that parses back", () => {
    expect(SI.format(SI.of(5772, units.K), units.K, { digits: 4 })).toBe("5772 K");
    expect(SI.format(SI.of(6.957e8, units.m), units.m)).toBe("6.957e8 m");
    expect(CGS.format(CGS.of(656.28, units.nm), units.angstrom)).toBe("6562.8 Å");
    expect(SI.format(SI.of(1.5, units.mas), units.mas, { notation: "fixed", digits: 3 })).toBe("1.500 mas");
    expect(() => SI.format(SI.of(1, units.K), units.K, { digits: 0 })).toThrow(RangeError);
  });
  test("property: parse(format(q)) round trip with 17 digits is exact", () => {
    fc.assert(
      fc.property(magnitude, fc.constantFrom(...allUnits), (x, u) => {
        const q = SI.of(x, u) as never;
        const text = SI.format(q, u, { digits: 17 });
        const back = SI.parse(text, u) as number;
        return rel(back, q) <= 2 * ULP;
      }),
      { numRuns: 300 },
    );
  });
});
