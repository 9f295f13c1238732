import { describe, expect, it } from "vitest";
import type { CliIO } from "./context";
import { parseHeader } from "./io/header";
import { detectFormat, headerNotes, inputFormatFor, openTable, type TableItem } from "./table-in";

function fakeIO(stdin: string, chunk = 5): { io: CliIO; err: string[] } {
  const err: string[] = [];
  const sink = { write: (s: string) => (err.push(s), true) };
  const io = {
    stdout: { write: () => true },
    stderr: sink,
    stdin: (async function* () {
      for (let i = 0; i < stdin.length; i += chunk) yield stdin.slice(i, i + chunk);
    })(),
  } as unknown as CliIO;
  return { io, err };
}

async function all(it: AsyncIterator<TableItem>): Promise<TableItem[]> {
  const out: TableItem[] = [];
  for (;;) {
    const r = await it.next();
    if (r.done === true) return out;
    out.push(r.value);
  }
}

describe("format detection on stdin", () => {
  it("stdin without --input-format is decided by its content", () => {
    expect(inputFormatFor("-", undefined)).toBe("auto");
    expect(inputFormatFor("-", "csv")).toBe("csv");
    expect(detectFormat('\ufeff  \n{"a":1}', "stdin")).toBe("jsonl");
    expect(detectFormat("star,teff [K]\n", "stdin")).toBe("csv");
    expect(() => detectFormat('<?xml version="1.0"?><VOTABLE>', "stdin")).toThrow(/XML/);
    expect(() => detectFormat("SIMPLE  =                    T", "stdin")).toThrow(/FITS/);
    expect(() => detectFormat('[{"a":1}]', "stdin")).toThrow(/one object per line/);
  });
  it("JSON Lines on stdin is read as JSON Lines, even when the first chunks are blank", async () => {
    const { io } = fakeIO('\n\n   \n{"star":"a","teff [K]":5772}\n{"star":"b","teff [K]":5000}\n', 3);
    const t = await openTable("-", "auto", io);
    expect(t.columns.map((c) => c.name)).toEqual(["star", "teff"]);
    const rows = await all(t.items);
    expect(rows.map((r) => r.kind)).toEqual(["row", "row"]);
  });
  it("CSV on stdin still reads as CSV", async () => {
    const { io } = fakeIO("star,teff [K]\na,5772\n");
    const t = await openTable("-", "auto", io);
    expect(t.columns.map((c) => c.unit)).toEqual([null, "K"]);
    expect((await all(t.items)).length).toBe(1);
  });
});

describe("JSON Lines keys absent from the first object", () => {
  it("the row is kept and the keys are reported on stderr, never dropped silently", async () => {
    const { io, err } = fakeIO(['{"star":"a","teff [K]":5772}', '{"star":"b","teff [K]":5000,"colour":"red"}', '{"star":"c","colour":"blue","e_x":1}'].join("\n"));
    const t = await openTable("-", "jsonl", io);
    const rows = await all(t.items);
    expect(rows.map((r) => r.kind)).toEqual(["row", "row", "row"]);
    expect(rows[1]?.kind === "row" ? rows[1].cells : []).toEqual(["b", 5000]);
    expect(err.join("")).toMatch(/keys not in the first object \(line 1\) were not read: 'colour' \(2 rows, first on line 2\), 'e_x' \(1 row, first on line 3\)/);
  });
});

describe("notes on uncertainty columns", () => {
  it("a conventional spelling read as an uncertainty is said so; a look-alike that is not read names why and the fix", () => {
    const notes = headerNotes(parseHeader(["teff [K]", "e_teff [K]", "logg", "logg_err [dex]", "feh", "sigma_feh", "mass", "mass_err", "sigma(mass)", "e_radius"]));
    expect(notes).toEqual([
      "column 'e_teff' is read as the standard uncertainty of 'teff'",
      "column 'logg_err' looks like the uncertainty of 'logg' but is not read as one: 'logg' has no unit and 'logg_err' has one; write 'sigma(logg)'",
      "column 'sigma_feh' looks like the uncertainty of 'feh' but is not read as one: 'sigma_x' is not an uncertainty spelling; write 'sigma(feh)'",
      "column 'mass_err' looks like the uncertainty of 'mass' but is not read as one: 'sigma(mass)' already is; remove one of them",
    ]);
  });
  it("the notes reach stderr when a table is opened", async () => {
    const { io, err } = fakeIO("star,teff [K],teff_err\na,5772,10\n");
    await openTable("-", "auto", io);
    expect(err.join("")).toContain("stdin: column 'teff_err' looks like the uncertainty of 'teff' but is not read as one: 'teff' is in [K] and 'teff_err' has no unit; write 'sigma(teff) [K]'");
  });
});
