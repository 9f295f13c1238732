import Decimal from "decimal.js";
import fc from "fast-check";
import { describe, expect, test } from "vitest";
import { constants } from "../constants/index";
import { kinds } from "./aliases";
import { CGS, SI } from "./system";
import { defineUnit, multiplyUnits, powerUnit, prefixed, type Unit } from "./unit";
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
    expect(SI.of(1, units.Rsun) as number).toBe(6.957e8);
    expect(CGS.of(1, units.Lsun) as number).toBe(3.828e33);
  });
});

describe("system conversion", () => {
  test("SI → CGS for the solar luminosity, σ and B_λ units", () => {
    expect(CGS.from(SI.of(1, units.Lsun), kinds.power) as number).toBe(3.828e33);
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

// Exact reference arithmetic. Every double is m × 2^e with integer m, so its
// exact decimal expansion has at most 767 significant digits; with 1200 digits
// of working precision the products and quotients by powers of ten below are
// exact, and Number() of the exact decimal string is the correctly rounded
// double (ECMAScript's string-to-number conversion rounds correctly).
const D = Decimal.clone({ precision: 1200, toExpNeg: -9e15, toExpPos: 9e15 });
function exact(v: number): Decimal {
  const view = new DataView(new ArrayBuffer(8));
  view.setFloat64(0, v);
  const bits = view.getBigUint64(0);
  const sign = bits >> 63n ? -1 : 1;
  const biased = Number((bits >> 52n) & 0x7ffn);
  const frac = bits & 0xfffffffffffffn;
  const m = biased === 0 ? frac : frac | (1n << 52n);
  const e = (biased === 0 ? 1 : biased) - 1075;
  return new D(m.toString()).times(new D(2).pow(e)).times(sign);
}
/** The double nearest to the exact value `x` (ties to even), via a correctly rounding parse. */
const nearest = (x: Decimal): number => Number(x.toString());
/** The correctly rounded v × 10^n. */
const roundedTimesPow10 = (v: number, n: number): number => nearest(exact(v).times(new D(10).pow(n)));

/** Units whose size is an exact power of ten in SI (cm, nm, Å, erg, Jy, …), with that power. */
const decimalUnits = allUnits.filter((u) => /^1e[+-]\d+$/.test(u.mantissa.toExponential()));
const decimalExp = (u: Unit): number => u.exp10 + Number(u.mantissa.toExponential().slice(2));
const cgsShift = (u: Unit): number => 2 * u.dimension.length + 3 * u.dimension.mass;
/**
 * (system, unit, n) for every decimal unit whose size in that system is 10^n
 * with |n| ≤ 22, where 10^n is an exact double. Beyond that (the jansky:
 * 10^-26 W m^-2 Hz^-1, 10^-23 erg s^-1 cm^-2 Hz^-1) no double is 10^n and the
 * unit converts by its correctly rounded size like any other.
 */
const exactCases = [SI, CGS].flatMap((sys) =>
  decimalUnits
    .map((u) => [sys, u, decimalExp(u) + (sys === CGS ? cgsShift(u) : 0)] as const)
    .filter(([, , n]) => Math.abs(n) <= 22),
);
/** Any finite double (including subnormals and values that overflow after scaling). */
const anyDouble = fc.double({ noNaN: true, noDefaultInfinity: true });
const someDouble = fc.oneof(magnitude, anyDouble);

describe("decimal units convert with one correctly rounded operation (against decimal.js)", () => {
  test("the catalogue has decimal units in both directions of the shift", () => {
    // guards the properties below against passing on an empty list
    expect(decimalUnits.map((u) => u.symbol)).toEqual(expect.arrayContaining(["cm", "nm", "Å", "km", "erg", "Jy"]));
    expect(exactCases.filter(([sys]) => sys === SI).map(([, u]) => u.symbol)).toEqual(expect.arrayContaining(["cm", "nm", "Å", "km", "erg"]));
    expect(exactCases.filter(([sys]) => sys === CGS).map(([, u]) => u.symbol)).toEqual(expect.arrayContaining(["m", "nm", "Å", "J", "W"]));
    expect(exactCases.some(([, , n]) => n < 0) && exactCases.some(([, , n]) => n > 0)).toBe(true);
  });
  test("property: of / valueIn of a decimal unit are the correctly rounded v × 10^±n (|n| ≤ 22), both systems", () => {
    fc.assert(
      fc.property(someDouble, fc.constantFrom(...exactCases), (v, [sys, u, n]) => {
        expect(sys.of(v, u) as number).toBe(roundedTimesPow10(v, n));
        expect(sys.valueIn(v as never, u)).toBe(roundedTimesPow10(v, -n));
      }),
      { numRuns: 600 },
    );
  });
  test("property: SI ↔ CGS for every kind is the correctly rounded v × 10^±(2L + 3M)", () => {
    const kindList = Object.values(kinds);
    fc.assert(
      fc.property(someDouble, fc.constantFrom(...kindList), (v, kind) => {
        const n = 2 * kind.dimension.length + 3 * kind.dimension.mass;
        expect(CGS.from(v as never, kind as never) as number).toBe(roundedTimesPow10(v, n));
        expect(SI.from(v as never, kind as never) as number).toBe(roundedTimesPow10(v, -n));
      }),
      { numRuns: 400 },
    );
  });
  test("a power-of-ten mantissa other than 1 is folded into the exponent (0.001 m converts exactly)", () => {
    const milli = defineUnit("mm'", "millimetre written as 0.001 m", kinds.length.dimension, 0.001);
    fc.assert(
      fc.property(someDouble, (v) => {
        expect(SI.of(v, milli) as number).toBe(roundedTimesPow10(v, -3));
        expect(SI.valueIn(v as never, milli)).toBe(roundedTimesPow10(v, 3));
        expect(CGS.of(v, milli) as number).toBe(roundedTimesPow10(v, -1));
      }),
      { numRuns: 200 },
    );
    // 9 × 0.001 is 0.009000000000000001 (two roundings): the folding is what makes this exact
    expect(SI.of(9, milli) as number).toBe(0.009);
    expect(9 * 0.001).not.toBe(0.009);
  });
  test("property: every other unit multiplies by its correctly rounded size and divides by it, both systems", () => {
    const others = [SI, CGS].flatMap((sys) =>
      allUnits
        .filter((u) => !exactCases.some(([s2, u2]) => s2 === sys && u2 === u))
        .map((u) => [sys, u, u.exp10 + (sys === CGS ? cgsShift(u) : 0)] as const),
    );
    expect(others.length).toBeGreaterThan(20);
    expect(others.some(([sys, u]) => sys === SI && u === units.Jy)).toBe(true);
    fc.assert(
      fc.property(someDouble, fc.constantFrom(...others), (v, [sys, u, e]) => {
        const size = nearest(new D(String(u.mantissa)).times(new D(10).pow(e)));
        if (sys === SI) expect(u.factor).toBe(size);
        expect(sys.of(v, u) as number).toBe(v * size);
        expect(sys.valueIn(v as never, u)).toBe(v / size);
      }),
      { numRuns: 400 },
    );
  });
});

describe("converters (loop-speed forms)", () => {
  const systems = [SI, CGS] as const;
  test("property: converter / reader agree bit-for-bit with of / valueIn, every unit, both systems", () => {
    fc.assert(
      fc.property(someDouble, fc.constantFrom(...allUnits), fc.constantFrom(...systems), (v, u, sys) => {
        expect(Object.is(sys.converter(u)(v), sys.of(v, u))).toBe(true);
        expect(Object.is(sys.reader(u)(v as never), sys.valueIn(v as never, u))).toBe(true);
      }),
      { numRuns: 500 },
    );
  });
  test("property: converterFrom agrees bit-for-bit with from, every kind, both directions", () => {
    const kindList = Object.values(kinds);
    fc.assert(
      fc.property(someDouble, fc.constantFrom(...kindList), (v, kind) => {
        expect(Object.is(CGS.converterFrom(kind as never)(v as never), CGS.from(v as never, kind as never))).toBe(true);
        expect(Object.is(SI.converterFrom(kind as never)(v as never), SI.from(v as never, kind as never))).toBe(true);
      }),
      { numRuns: 300 },
    );
  });
  test("property: arrayOf / arrayIn agree element by element with of / valueIn (typed and plain arrays)", () => {
    fc.assert(
      fc.property(fc.array(someDouble, { maxLength: 20 }), fc.constantFrom(...allUnits), fc.constantFrom(...systems), (xs, u, sys) => {
        const typed = Float64Array.from(xs);
        const fromPlain = sys.arrayOf(xs, u);
        const fromTyped = sys.arrayOf(typed, u);
        const back = sys.arrayIn(typed as never, u);
        expect(fromPlain.length).toBe(xs.length);
        expect(back.length).toBe(xs.length);
        xs.forEach((x, i) => {
          expect(Object.is(fromPlain[i], sys.of(x, u))).toBe(true);
          expect(Object.is(fromTyped[i], sys.of(x, u))).toBe(true);
          expect(Object.is(back[i], sys.valueIn(x as never, u))).toBe(true);
        });
      }),
      { numRuns: 300 },
    );
  });
  test("property: reader(u)(converter(u)(x)) ≈ x within 2 ulp for every unit, both systems", () => {
    fc.assert(
      fc.property(magnitude, fc.constantFrom(...allUnits), fc.constantFrom(...systems), (x, u, sys) => {
        const read = sys.reader(u) as (q: number) => number;
        return rel(read(sys.converter(u)(x)), x) <= 2 * ULP;
      }),
      { numRuns: 500 },
    );
  });
  test("worked values: nm → Å, W → erg s⁻¹, m → cm", () => {
    expect(CGS.reader(units.angstrom)(CGS.converter(units.nm)(656.28))).toBe(6562.8);
    expect(CGS.converter(units.W)(1) as number).toBe(1e7);
    expect(CGS.converterFrom(kinds.power)(SI.of(1, units.Lsun)) as number).toBe(3.828e33);
    expect(SI.converterFrom(kinds.length)(CGS.of(1, units.m)) as number).toBe(1);
    expect(SI.converterFrom(kinds.wavenumber)(CGS.of(1, units.per_cm)) as number).toBe(100);
  });
  test("a converter is decided once: the same function for every call, none for kinds beyond the table", () => {
    expect(SI.converter(units.nm)).toBe(SI.converter(units.nm));
    expect(CGS.converterFrom(kinds.power)).toBe(CGS.converterFrom(units.W));
  });
  test("unit objects carry no enumerable scale fields", () => {
    expect(Object.keys(units.nm).sort()).toEqual(["dimension", "exp10", "factor", "mantissa", "name", "prefixable", "symbol"]);
  });
});
