/**
 * FITS binary tables: byte layout against the FITS Standard 4.0 text (cards
 * of 80 characters, 2880-byte blocks, big-endian two's-complement integers
 * and IEEE floats), write → read round trips over random schemas, and
 * malformed files that must fail with a byte offset. When Debian's
 * `fitsverify` (the standard's conformance checker) is installed, the files
 * we write are checked with it; otherwise that test is skipped with a message.
 */
import { execFileSync } from "node:child_process";
import { mkdtempSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { FITS_BLOCK, FitsError, readFitsTable, writeFitsTable, type FitsColumn, type FitsTable } from "./fits";

const ascii = (b: Uint8Array, from: number, n: number): string => String.fromCharCode(...b.subarray(from, from + n));

const sample: FitsTable = {
  columns: [
    { name: "star", type: "A", width: 8, unit: null },
    { name: "teff", type: "D", width: 1, unit: "K" },
    { name: "flux", type: "E", width: 1, unit: "erg/s/cm2/Angstrom" },
    { name: "n_obs", type: "J", width: 1, unit: null, tnull: -1 },
    { name: "mag", type: "I", width: 1, unit: "mag", tscal: 0.001, tzero: 10, tnull: -32768 },
    { name: "ok", type: "L", width: 1, unit: null },
  ],
  rows: [
    ["Sun", 5772, 1.5e-13, 3, 14.25, true],
    ["Vega", null, null, null, null, null],
  ],
};

describe("byte layout (FITS Standard 4.0)", () => {
  const bytes = writeFitsTable(sample);
  it("blocks of 2880 bytes, cards of 80 characters, the mandatory keywords in order", () => {
    expect(bytes.length % FITS_BLOCK).toBe(0);
    expect(ascii(bytes, 0, 80)).toMatch(/^SIMPLE  = {20}T \/ /); // logical in column 30 (§4.2.2)
    expect(ascii(bytes, 80, 30)).toBe("BITPIX  =                    8");
    const ext = FITS_BLOCK;
    expect(ascii(bytes, ext, 20)).toBe("XTENSION= 'BINTABLE'");
    const keys = [0, 1, 2, 3, 4, 5, 6, 7].map((i) => ascii(bytes, ext + 80 * i, 8).trim());
    expect(keys).toEqual(["XTENSION", "BITPIX", "NAXIS", "NAXIS1", "NAXIS2", "PCOUNT", "GCOUNT", "TFIELDS"]); // §7.3.1 order
    expect(ascii(bytes, ext, FITS_BLOCK)).toContain("TUNIT3  = 'erg/s/cm2/Angstrom'");
    expect(ascii(bytes, ext, FITS_BLOCK)).toContain("TFORM1  = '8A      '"); // strings padded to 8 characters
  });
  it("data are big-endian: teff 5772 as IEEE double 0x40B68C0000000000, n_obs 3 as 00 00 00 03", () => {
    const data = 2 * FITS_BLOCK;
    expect([...bytes.subarray(data + 8, data + 16)]).toEqual([0x40, 0xb6, 0x8c, 0, 0, 0, 0, 0]);
    expect([...bytes.subarray(data + 20, data + 24)]).toEqual([0, 0, 0, 3]);
    // mag 14.25 with TZERO 10, TSCAL 0.001 is stored as 4250 = 0x109A
    expect([...bytes.subarray(data + 24, data + 26)]).toEqual([0x10, 0x9a]);
    expect(bytes[data + 26]).toBe(0x54); // logical T
  });
  it("reads back, with nulls", () => {
    const t = readFitsTable(bytes);
    expect(t.columns.map((c) => c.unit)).toEqual([null, "K", "erg/s/cm2/Angstrom", null, "mag", null]);
    expect(t.rows[0]?.[0]).toBe("Sun");
    expect(t.rows[0]?.[1]).toBe(5772);
    expect(Math.abs((t.rows[0]?.[2] as number) / 1.5e-13 - 1)).toBeLessThan(6e-8); // float32 (2^-24)
    expect(t.rows[0]?.[4]).toBeCloseTo(14.25, 12);
    expect(t.rows[1]).toEqual(["Vega", null, null, null, null, null]);
  });
});

describe("round trips (properties)", () => {
  const colArb: fc.Arbitrary<FitsColumn> = fc.oneof(
    fc.record({ name: fc.constant("d"), type: fc.constant("D" as const), width: fc.constant(1), unit: fc.constantFrom(null, "K", "erg/s/cm2/A") }),
    fc.record({ name: fc.constant("j"), type: fc.constant("J" as const), width: fc.constant(1), unit: fc.constant(null), tnull: fc.constant(-2147483648) }),
    fc.record({ name: fc.constant("k"), type: fc.constant("K" as const), width: fc.constant(1), unit: fc.constant(null), tnull: fc.constant(-999) }),
    fc.record({ name: fc.constant("i"), type: fc.constant("I" as const), width: fc.constant(1), unit: fc.constant("mag"), tnull: fc.constant(-32768), tscal: fc.constant(0.01), tzero: fc.constant(20) }),
    fc.record({ name: fc.constant("b"), type: fc.constant("B" as const), width: fc.constant(1), unit: fc.constant(null), tnull: fc.constant(255) }),
    fc.record({ name: fc.constant("l"), type: fc.constant("L" as const), width: fc.constant(1), unit: fc.constant(null) }),
    fc.record({ name: fc.constant("a"), type: fc.constant("A" as const), width: fc.integer({ min: 1, max: 12 }), unit: fc.constant(null) }),
  );
  const valueFor = (c: FitsColumn): fc.Arbitrary<FitsCell> => {
    const nul = fc.constant(null);
    switch (c.type) {
      case "D": return fc.oneof(nul, fc.double({ noNaN: true, noDefaultInfinity: true }));
      case "J": return fc.oneof(nul, fc.integer({ min: -2147483647, max: 2147483647 }));
      case "K": return fc.oneof(nul, fc.integer({ min: -(2 ** 40), max: 2 ** 40 }).filter((x) => x !== -999));
      case "I": return fc.oneof(nul, fc.integer({ min: -32767, max: 32767 }).map((n) => 20 + 0.01 * n));
      case "B": return fc.oneof(nul, fc.integer({ min: 0, max: 254 }));
      case "L": return fc.oneof(nul, fc.boolean());
      default: return fc.oneof(nul, fc.stringMatching(new RegExp(`^[!-~]([ -~]{0,${c.width - 1}}[!-~])?$`)).filter((s) => s.length <= c.width));
    }
  };
  type FitsCell = number | string | boolean | null;
  it("write → read gives back every cell (exactly; scaled columns to the scale's rounding)", () => {
    fc.assert(
      fc.property(
        fc.array(colArb, { minLength: 1, maxLength: 6 }).chain((cols) => {
          const columns = cols.map((c, i) => ({ ...c, name: `${c.name}${i}` }));
          return fc.tuple(fc.constant(columns), fc.array(fc.tuple(...columns.map(valueFor)), { maxLength: 20 }));
        }),
        ([columns, rows]) => {
          const back = readFitsTable(writeFitsTable({ columns, rows }));
          expect(back.columns.map((c) => [c.name, c.type, c.width, c.unit])).toEqual(columns.map((c) => [c.name, c.type, c.width, c.unit]));
          expect(back.rows.length).toBe(rows.length);
          rows.forEach((row, r) =>
            row.forEach((x, j) => {
              const y = back.rows[r]?.[j];
              if (columns[j]?.type === "I" && typeof x === "number") expect(Math.abs((y as number) - x)).toBeLessThan(1e-9);
              else expect(y).toEqual(Object.is(x, -0) ? -0 : x);
            }),
          );
        },
      ),
      { numRuns: 200 },
    );
  });
});

describe("malformed files name the byte offset", () => {
  const good = writeFitsTable(sample);
  const cases: [string, () => Uint8Array, RegExp][] = [
    ["shorter than a block", () => good.subarray(0, 100), /FITS byte 100: .*at least one 2880-byte block/],
    ["truncated data (NAXIS2 larger than the data)", () => good.subarray(0, 2 * FITS_BLOCK), /FITS byte 5760: data of extension 1 needs 54 bytes; the file has 0 left/],
    ["header without END", () => {
      const b = good.slice(0, 2 * FITS_BLOCK);
      const text = ascii(b, FITS_BLOCK, FITS_BLOCK);
      const at = FITS_BLOCK + text.indexOf("END     ");
      b.fill(0x20, at, at + 3);
      return b;
    }, /header without END/],
    ["bad TFORM", () => {
      const b = good.slice();
      const text = ascii(b, FITS_BLOCK, FITS_BLOCK);
      const at = FITS_BLOCK + text.indexOf("'8A      '") + 2;
      b[at] = "Z".charCodeAt(0);
      return b;
    }, /FITS byte \d+: TFORM1 = '8Z' is not a binary-table format|TFORM1/],
    ["not FITS", () => new Uint8Array(FITS_BLOCK).fill(0x20), /does not start with SIMPLE = T/],
  ];
  for (const [what, make, re] of cases) {
    it(what, () => {
      let err: unknown;
      try {
        readFitsTable(make());
      } catch (e) {
        err = e;
      }
      expect(err).toBeInstanceOf(FitsError);
      expect((err as FitsError).message).toMatch(re);
      expect((err as FitsError).offset).toBeGreaterThanOrEqual(0);
    });
  }
});

describe("conformance checker", () => {
  let fitsverify: string | undefined;
  try {
    fitsverify = execFileSync("sh", ["-c", "command -v fitsverify"], { encoding: "utf8" }).trim() || undefined;
  } catch {
    fitsverify = undefined;
  }
  it.skipIf(fitsverify === undefined)("fitsverify finds no error or warning in a written file (skipped when fitsverify is not installed: apt-get install fitsverify)", () => {
    const dir = mkdtempSync(join(tmpdir(), "starlume-fits-"));
    const file = join(dir, "t.fits");
    writeFileSync(file, writeFitsTable(sample, "STARS"));
    let out: string;
    try {
      out = execFileSync(fitsverify as string, [file], { encoding: "utf8" });
    } catch (e) {
      out = String((e as { stdout?: string }).stdout ?? e);
    }
    expect(out).toMatch(/Verification found 0 warning\(s\) and 0 error\(s\)/);
  });
  if (fitsverify === undefined) console.log("fitsverify is not installed: the conformance check of written FITS files is skipped (apt-get install fitsverify)");
});
