/**
 * Row accounting and messages of the table commands (issue 16, CLI part):
 * the parallax-bias flag, report directories that cannot be created,
 * bidirectional control characters in display text.
 */
import { mkdtempSync, readFileSync, rmSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { afterAll, describe, expect, it } from "vitest";
import { displayText } from "./context";
import { csvRecords, runCli } from "./test-util";

const dir = mkdtempSync(join(tmpdir(), "starlume-accounting-"));
afterAll(() => rmSync(dir, { recursive: true, force: true }));

const BIAS = "name,teff [K],sigma(teff) [K],plx [mas],sigma(plx) [mas],fbol [W m^-2],sigma(fbol) [W m^-2]\nfar,5000,50,0.5,0.3,1e-12,1e-14\nnear,5000,50,10,0.1,1e-12,1e-14\nedge,5000,50,10,1,1e-12,1e-14\n";

describe("solve: parallax bias", () => {
  it("flags σϖ/ϖ > 0.1 (the library's threshold) with a reason naming the user's column; 0.1 itself is not flagged", async () => {
    const r = await runCli(["solve", "-", "--format", "csv"], { stdin: BIAS });
    expect(r.code).toBe(0); // flagged rows are results
    const rows = csvRecords(r.stdout);
    expect(rows.map((x) => x.status)).toEqual(["flagged", "ok", "ok"]);
    expect(rows[0]?.reason).toContain("sigma(plx)/plx = 0.60 > 0.1");
    expect(rows[0]?.["distance [pc]"]).toBe("2000"); // still solved: 1/(0.5 mas)
    expect(r.stderr).toContain("solve: 3 rows, 2 ok, 1 flagged, 0 rejected");
  });
});

describe("report directories", () => {
  it("a directory that cannot be created is a usage error (exit 2), not a hang", async () => {
    const file = join(dir, "plain-file");
    writeFileSync(file, "x");
    for (const bad of [join(file, "sub"), "/proc/1/starlume-x/y"]) {
      const r = await runCli(["solve", "examples/demo-survey/solve-input.csv", "--quiet", "--report", bad]);
      expect(r.code, bad).toBe(2);
      expect(r.stderr).toContain("cannot write the report");
    }
  }, 60_000);

  it("creates missing parents", async () => {
    const r = await runCli(["solve", "examples/demo-survey/solve-input.csv", "--quiet", "--report", join(dir, "a", "b")]);
    expect(r.code).toBe(0);
    expect(readFileSync(join(dir, "a", "b", "index.html"), "utf8")).toContain("<html");
  }, 60_000);
});

describe("display text", () => {
  it("strips bidirectional controls from messages and report titles", async () => {
    expect(displayText("ab\u202Ecd\u2066e\u200Ff")).toBe("abcdef");
    const name = join(dir, "evil\u202Egpj.csv");
    writeFileSync(name, "teff [K],sigma(teff) [K]\nx,1\n");
    const r = await runCli(["solve", name, "--format", "csv", "--report", join(dir, "bidi")]);
    expect(r.stderr).not.toMatch(/[\u202a-\u202e\u2066-\u2069]/);
    expect(readFileSync(join(dir, "bidi", "index.html"), "utf8")).not.toMatch(/[\u202a-\u202e\u2066-\u2069]/);
  }, 60_000);
});

describe("fit output into solve", () => {
  it("refuses to solve derived columns together with the fitted T and θ (double counting), exit 2", async () => {
    const fit = await runCli(["fit", "examples/demo-survey/photometry.csv", "--bands", "demo", "--format", "csv", "--quiet"]);
    const r = await runCli(["solve", "-", "--format", "csv"], { stdin: fit.stdout });
    expect(r.code).toBe(2);
    expect(r.stderr).toContain("output of 'starlume fit'");
    expect(r.stderr).toContain("'luminosity'");
    expect(r.stderr).toContain("count the same photometry twice");
  }, 60_000);
});
