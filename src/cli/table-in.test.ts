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

describe("FITS input", () => {
  it("solve gives the same table from a FITS file as from the same rows in CSV; FITS units go through the unit parser", { timeout: 60_000 }, async () => {
    const { writeFitsTable } = await import("./io/fits");
    const { runCli } = await import("./test-util");
    const { mkdtempSync, writeFileSync } = await import("node:fs");
    const { tmpdir } = await import("node:os");
    const { join } = await import("node:path");
    const dir = mkdtempSync(join(tmpdir(), "starlume-fits-in-"));
    const rows = [
      ["Sun", 5772, 1, 1, 0.01, 10, 0.1],
      ["b", 4800, 50, 0.8, 0.05, 25, 1],
    ] as const;
    writeFileSync(
      join(dir, "t.fits"),
      writeFitsTable({
        columns: [
          { name: "name", type: "A", width: 8, unit: null },
          { name: "teff", type: "D", width: 1, unit: "K" },
          { name: "teff_err", type: "D", width: 1, unit: "K" },
          { name: "radius", type: "D", width: 1, unit: "solRad" },
          { name: "e_radius", type: "D", width: 1, unit: "solRad" },
          { name: "distance", type: "D", width: 1, unit: "pc" },
          { name: "distance_error", type: "D", width: 1, unit: "pc" },
        ],
        rows: rows.map((r) => [...r]),
      }),
    );
    const csv = ["name,teff [K],sigma(teff) [K],radius [Rsun],sigma(radius) [Rsun],distance [pc],sigma(distance) [pc]", ...rows.map((r) => r.join(","))].join("\n");
    writeFileSync(join(dir, "t.csv"), csv);
    const a = await runCli(["solve", "t.csv", "--format", "json"], { cwd: dir });
    const b = await runCli(["solve", "t.fits", "--format", "json"], { cwd: dir });
    expect(b.code).toBe(a.code);
    const strip = (text: string): unknown[] =>
      // input columns echo their own header texts, and "line" is the CSV line (header = line 1) or the FITS row
      (JSON.parse(text) as Record<string, unknown>[]).map((o) => Object.fromEntries(Object.entries(o).filter(([k]) => k !== "line" && (!/teff|radius|distance/.test(k) || !/\[/.test(k)))));
    expect(strip(b.stdout)).toEqual(strip(a.stdout));
    expect((JSON.parse(b.stdout) as { line: number }[]).map((o) => o.line)).toEqual([1, 2]);
    expect(Object.keys((JSON.parse(b.stdout) as object[])[0] as object).length).toBeGreaterThan(5);
    expect(b.stderr).toContain("column 'teff_err' is read as the standard uncertainty of 'teff'");
    const bad = await runCli(["solve", "t.fits", "--input-format", "fits"], { cwd: dir, stdin: "" });
    expect(bad.code).toBe(b.code);
    writeFileSync(join(dir, "cut.fits"), new Uint8Array(100));
    const cut = await runCli(["solve", "cut.fits"], { cwd: dir });
    expect(cut.code).toBe(2);
    expect(cut.stderr).toMatch(/cut\.fits: FITS byte 100/);
  });
});
