import fc from "fast-check";
import { describe, expect, test } from "vitest";
import { kinds } from "./aliases";
import { describeDimension } from "./dimension";
import { ParseError, parseQuantityText, parseUnit } from "./parse";
import { CGS, SI } from "./system";
import { units } from "./units";

const rel = (a: number, b: number) => Math.abs(a - b) / Math.abs(b);

describe("the compound-unit grammar", () => {
  test("the examples of the documentation", () => {
    expect(SI.parse("6.957e8 m", kinds.length) as number).toBe(6.957e8);
    expect(SI.parse("5772 K", kinds.temperature) as number).toBe(5772);
    expect(rel(SI.parse("1.2 mas", kinds.angle), (1.2e-3 / 3600) * (Math.PI / 180))).toBeLessThan(3e-16);
    // 1 erg s^-1 cm^-2 Å^-1 = 1e-7 W / (1e-4 m² × 1e-10 m) = 1e7 W m^-3
    expect(rel(SI.parse("3.6e-13 erg s^-1 cm^-2 A^-1", kinds.spectralFluxPerWavelength), 3.6e-6)).toBeLessThan(3e-16);
    expect(rel(CGS.parse("3.6e-13 erg s^-1 cm^-2 A^-1", kinds.spectralFluxPerWavelength), 3.6e-5)).toBeLessThan(3e-16);
  });
  test("separators, slashes, parentheses and superscripts agree", () => {
    const forms = ["W m^-2 sr^-1", "W/m^2/sr", "W / (m^2 sr)", "W·m⁻²·sr⁻¹", "W*m**-2*sr**-1", "W m⁻² sr⁻¹"];
    for (const f of forms) {
      const u = parseUnit(f);
      expect(describeDimension(u.dimension), f).toBe("M T-3 Ω-1");
      expect(u.factor, f).toBe(1);
    }
  });
  test("prefixes, aliases and Unicode spellings", () => {
    expect(parseUnit("GHz").factor).toBe(1e9);
    expect(parseUnit("mJy").factor).toBe(1e-29);
    expect(parseUnit("µJy").factor).toBe(1e-32);
    expect(parseUnit("uJy").factor).toBe(1e-32);
    expect(parseUnit("keV").factor).toBe(1.602176634e-16);
    expect(parseUnit("Gpc").factor).toBeCloseTo(3.0856775814913673e25, -10);
    expect(parseUnit("Myr").factor).toBe(31557600e6);
    expect(parseUnit("Å").factor).toBe(1e-10);
    expect(parseUnit("\u212B").factor).toBe(1e-10);
    expect(parseUnit("angstrom").factor).toBe(1e-10);
    expect(parseUnit("um").factor).toBe(1e-6);
    expect(parseUnit("μm").factor).toBe(1e-6);
    expect(parseUnit("uas").symbol).toBe("µas");
    expect(parseUnit("min").factor).toBe(60); // exact symbol beats milli-inch
    expect(parseUnit("R☉").factor).toBe(6.957e8);
    expect(parseUnit("Rsun").factor).toBe(6.957e8);
    expect(parseUnit("cm^-1").factor).toBe(100);
    // prefixed units are named with the prefix's name (SI Brochure)
    expect(parseUnit("mK").name).toBe("millikelvin");
    expect(parseUnit("kN").name).toBe("kilonewton");
    expect(parseUnit("uJy").name).toBe("microjansky");
  });
  test("an empty unit is a pure number", () => {
    expect(parseQuantityText("  2.5 ").value).toBe(2.5);
    expect(describeDimension(parseQuantityText("2.5").unit.dimension)).toBe("1");
    expect(parseQuantityText("−3 K").value).toBe(-3); // Unicode minus
  });
});

describe("errors name the position and what was expected", () => {
  const cases: [string, number, RegExp][] = [
    ["", 0, /number/],
    ["m 5", 0, /number/],
    ["5 furlong", 2, /unknown unit "furlong"/],
    ["5 m^", 4, /integer/],
    ["5 m^x", 4, /integer/],
    ["5 (m s", 6, /"\)"/],
    ["5K", 1, /space/],
    ["5 m^9", 3, /-4 to 4/],
    ["5 m / ", 6, /unit symbol/],
    ["1e999 m", 0, /finite/],
  ];
  for (const [text, pos, re] of cases) {
    test(JSON.stringify(text), () => {
      try {
        parseQuantityText(text);
        expect.unreachable();
      } catch (e) {
        expect(e).toBeInstanceOf(ParseError);
        const pe = e as ParseError;
        expect(pe.position).toBe(pos);
        expect(pe.message).toMatch(re);
      }
    });
  }
  test("a unit of the wrong kind is refused at run time", () => {
    expect(() => SI.parse("1.2 mas", kinds.length)).toThrow(/as a length .* dimension A/);
    expect(() => SI.parse("5 W m^-2", kinds.radiance)).toThrow(ParseError);
    expect(() => SI.parse("5 Jy", kinds.spectralFluxPerWavelength)).toThrow(/per wavelength/);
  });
});

describe("robustness (properties)", () => {
  test("random text yields a value or a ParseError, nothing else", () => {
    const alphabet = fc.constantFrom(..."0123456789.eE+-−^*/·() mkgsKJWAÅµuHzJyradegrcsinpMG⁻²³☉".split(""));
    fc.assert(
      fc.property(fc.array(alphabet, { maxLength: 24 }).map((a) => a.join("")), (text) => {
        try {
          const { value } = parseQuantityText(text);
          return Number.isFinite(value);
        } catch (e) {
          return e instanceof ParseError;
        }
      }),
      { numRuns: 2000 },
    );
  });
  test("arbitrary unicode strings too", () => {
    fc.assert(
      fc.property(fc.string({ unit: "grapheme", maxLength: 30 }), (text) => {
        try {
          parseQuantityText(text);
          return true;
        } catch (e) {
          return e instanceof ParseError;
        }
      }),
      { numRuns: 1000 },
    );
  });
  test("generated compound units parse to the product of their factors", () => {
    const names = ["m", "cm", "s", "erg", "J", "Å", "sr", "Hz", "K", "g", "W", "Jy", "nm"] as const;
    fc.assert(
      fc.property(
        fc.array(fc.tuple(fc.constantFrom(...names), fc.integer({ min: -3, max: 3 })), { minLength: 1, maxLength: 4 }),
        (parts) => {
          const text = parts.map(([n, e]) => `${n}^${e}`).join(" ");
          let u;
          try {
            u = parseUnit(text);
          } catch (e) {
            return e instanceof ParseError; // dimension exponent overflow
          }
          const expected = parts.reduce((acc, [n, e]) => acc * parseUnit(n).factor ** e, 1);
          return Math.abs(u.factor - expected) <= 1e-14 * Math.abs(expected);
        },
      ),
    );
  });
});
