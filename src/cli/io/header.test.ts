import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { formatColumnHeader, parseColumnHeader, parseHeader } from "./header";

// Expected values below follow the convention written in header.ts and docs/guides/table-format.md.

describe("parseColumnHeader", () => {
  it("splits name and unit", () => {
    expect(parseColumnHeader("teff [K]")).toEqual({ name: "teff", unit: "K", uncertaintyOf: null, uncertaintySide: null });
    expect(parseColumnHeader("  flux_g   [ erg s^-1 cm^-2 A^-1 ] ")).toEqual({
      name: "flux_g",
      unit: "erg s^-1 cm^-2 A^-1",
      uncertaintyOf: null,
      uncertaintySide: null,
    });
    expect(parseColumnHeader("parallax[mas]").unit).toBe("mas");
  });

  it("treats a cell without brackets as text / pure number", () => {
    expect(parseColumnHeader("star")).toEqual({ name: "star", unit: null, uncertaintyOf: null, uncertaintySide: null });
    expect(parseColumnHeader("n obs").name).toBe("n obs");
  });

  it("recognizes sigma(x), σ(x), sigma-(x), sigma+(x)", () => {
    expect(parseColumnHeader("sigma(parallax) [mas]")).toEqual({
      name: "sigma(parallax)",
      unit: "mas",
      uncertaintyOf: "parallax",
      uncertaintySide: "both",
    });
    expect(parseColumnHeader("σ(teff) [K]").uncertaintyOf).toBe("teff");
    expect(parseColumnHeader("sigma-(logg) [dex]").uncertaintySide).toBe("lower");
    expect(parseColumnHeader("sigma+(logg) [dex]").uncertaintySide).toBe("upper");
    // Not the convention: a column merely named with sigma in it.
    expect(parseColumnHeader("sigma_clip").uncertaintyOf).toBeNull();
    expect(parseColumnHeader("sigma [km/s]").uncertaintyOf).toBeNull();
  });

  it("throws a SyntaxError naming the column for malformed cells", () => {
    expect(() => parseColumnHeader("", 3)).toThrow(/column 3.*empty column name/);
    expect(() => parseColumnHeader("teff []", 2)).toThrow(/column 2.*empty unit/);
    expect(() => parseColumnHeader("teff [K", 1)).toThrow(/last thing/);
    expect(() => parseColumnHeader("teff [K] x", 1)).toThrow(/last thing/);
    expect(() => parseColumnHeader("teff [[K]]", 1)).toThrow(/one pair/);
    expect(() => parseColumnHeader("[K]", 1)).toThrow(/missing column name/);
    expect(() => parseColumnHeader("teff K]", 1)).toThrow(/without/);
    expect(() => parseColumnHeader("sigma() [K]", 1)).toThrow(SyntaxError);
  });

  it("property: formatColumnHeader then parseColumnHeader gives back name and unit", () => {
    const text = fc.string({ unit: fc.constantFrom("a", "b", "_", "1", " ", "/", "^", "-", "é"), minLength: 1, maxLength: 8 });
    fc.assert(
      fc.property(text, fc.option(text, { nil: null }), (rawName, rawUnit) => {
        const name = rawName.trim();
        const unit = rawUnit === null ? null : rawUnit.trim();
        fc.pre(name !== "" && unit !== "");
        const spec = parseColumnHeader(formatColumnHeader({ name, unit }));
        expect([spec.name, spec.unit]).toEqual([name, unit]);
      }),
    );
  });
});

describe("parseHeader (table-level rules)", () => {
  it("parses a full header", () => {
    const cols = parseHeader(["star", "parallax [mas]", "sigma(parallax) [mas]", "logg [dex]", "sigma-(logg) [dex]", "sigma+(logg) [dex]"]);
    expect(cols.map((c) => [c.name, c.unit, c.uncertaintyOf, c.uncertaintySide])).toEqual([
      ["star", null, null, null],
      ["parallax", "mas", null, null],
      ["sigma(parallax)", "mas", "parallax", "both"],
      ["logg", "dex", null, null],
      ["sigma-(logg)", "dex", "logg", "lower"],
      ["sigma+(logg)", "dex", "logg", "upper"],
    ]);
  });

  it("allows an uncertainty column before its value column and in a different unit", () => {
    // Unit compatibility (mas vs uas) is the unit parser's job, not this module's.
    expect(parseHeader(["sigma(parallax) [uas]", "parallax [mas]"])[0]?.uncertaintyOf).toBe("parallax");
  });

  it("rejects duplicates, dangling and inconsistent uncertainty columns", () => {
    expect(() => parseHeader(["a", "b", "a [K]"])).toThrow(/column 3.*duplicate.*column 1/);
    expect(() => parseHeader(["teff [K]", "sigma(logg) [dex]"])).toThrow(/column 2.*no such column/);
    expect(() => parseHeader(["x [K]", "sigma(x) [K]", "sigma(sigma(x)) [K]"])).toThrow(/itself an uncertainty/);
    expect(() => parseHeader(["x [K]", "sigma(x)"])).toThrow(/needs a unit/);
    expect(() => parseHeader(["x", "sigma(x) [K]"])).toThrow(/has a unit/);
    expect(() => parseHeader(["x", "sigma(x)", "sigma-(x)"])).toThrow(/symmetric/);
  });

  it("accepts an empty header row", () => {
    expect(parseHeader([])).toEqual([]);
  });
});

describe("conventional uncertainty spellings", () => {
  it("x_error, x_err, e_x and err_x name the uncertainty of an existing column x", () => {
    const cols = parseHeader(["star", "teff [K]", "e_teff [K]", "parallax [mas]", "parallax_error [mas]", "logg", "logg_err", "feh", "err_feh"]);
    expect(cols.map((c) => c.uncertaintyOf)).toEqual([null, null, "teff", null, "parallax", null, "logg", null, "feh"]);
    expect(cols[2]?.uncertaintyPattern).toBe("e_{x}");
    expect(cols[2]?.uncertaintySide).toBe("both");
  });
  it("without a matching value column, or with a unit mismatch, the column stays plain", () => {
    const cols = parseHeader(["e_mass [Msun]", "teff [K]", "teff_err"]);
    expect(cols.map((c) => c.uncertaintyOf)).toEqual([null, null, null]);
  });
  it("sigma(x) wins over a conventional spelling, which stays plain", () => {
    const cols = parseHeader(["teff [K]", "sigma(teff) [K]", "e_teff [K]"]);
    expect(cols.map((c) => c.uncertaintyOf)).toEqual([null, "teff", null]);
  });
  it("the templates are configurable; [] recognises sigma(x) only", () => {
    expect(parseHeader(["teff [K]", "e_teff [K]"], { uncertaintyPatterns: [] })[1]?.uncertaintyOf).toBeNull();
    expect(parseHeader(["teff [K]", "teff_unc [K]"], { uncertaintyPatterns: ["{x}_unc"] })[1]?.uncertaintyOf).toBe("teff");
  });
});
