/**
 * `--jobs N`, `--shard K/N` and `--line-offset M`: the output of a run on
 * worker threads, and of shards merged by their line column, is identical
 * byte for byte to the single-thread run (the rows are independent, and the
 * writer keeps input order). The tables are the demo survey's rows repeated
 * past several chunks (BATCH_ROWS), with a few unreadable rows mixed in so
 * that rejected rows travel through the same paths.
 */
import { mkdtempSync, readdirSync, readFileSync, rmSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { afterAll, describe, expect, it } from "vitest";
import { parseArgs } from "./args";
import { argvOf, BATCH_ROWS, shardOption, TABLE_OPTIONS } from "./run-table";
import { csvRecords, csvRows, REPO_ROOT, runCli } from "./test-util";

const dir = mkdtempSync(join(tmpdir(), "starlume-jobs-"));
afterAll(() => rmSync(dir, { recursive: true, force: true }));

/** The demo file's data rows repeated to `n` rows, every 997th row replaced by an unreadable one. */
function repeated(file: string, n: number): string {
  const [header, ...data] = readFileSync(join(REPO_ROOT, "examples/demo-survey", file), "utf8").trim().split("\n");
  const out = [header as string];
  for (let i = 0; i < n; i++) out.push(i % 997 === 500 ? "broken,row" : (data[i % data.length] as string));
  const path = join(dir, `${file}-${n}.csv`);
  writeFileSync(path, `${out.join("\n")}\n`);
  return path;
}

describe("--jobs", () => {
  it("solve on 2 worker threads writes exactly the single-thread output (3 chunks, rejected rows included)", async () => {
    const input = repeated("solve-input.csv", 2 * BATCH_ROWS + 123);
    const one = await runCli(["solve", input, "--format", "csv", "--jobs", "1"]);
    const two = await runCli(["solve", input, "--format", "csv", "--jobs", "2"]);
    expect(one.code).toBe(1); // the broken rows are rejected
    expect(two.code).toBe(one.code);
    expect(csvRows(one.stdout).length).toBe(2 * BATCH_ROWS + 123 + 1);
    expect(two.stdout).toBe(one.stdout);
    expect(two.stderr).toBe(one.stderr);
  }, 120_000);

  it("fit on 2 worker threads writes exactly the single-thread output", async () => {
    const input = repeated("photometry.csv", BATCH_ROWS + 40);
    const one = await runCli(["fit", input, "--bands", "demo", "--format", "jsonl", "--jobs", "1", "--quiet"]);
    const two = await runCli(["fit", input, "--bands", "demo", "--format", "jsonl", "--jobs", "2", "--quiet"]);
    expect(one.stdout.split("\n").length).toBe(BATCH_ROWS + 40 + 1);
    expect(two.code).toBe(one.code);
    expect(two.stdout).toBe(one.stdout);
  }, 120_000);

  it("out-of-range values are usage errors (exit 2)", async () => {
    for (const bad of ["0", "-1", "1.5", "x", "100000"]) {
      const r = await runCli(["solve", "examples/demo-survey/solve-input.csv", "--jobs", bad]);
      expect(r.code, bad).toBe(2);
      expect(r.stderr).toContain("--jobs");
    }
  }, 60_000);
});

describe("--shard and --line-offset", () => {
  it("shards K/N merged by line number equal the whole run", async () => {
    const input = repeated("solve-input.csv", 3000);
    const whole = csvRows((await runCli(["solve", input, "--format", "csv", "--quiet"])).stdout);
    const merged: string[][] = [];
    let header: string[] | undefined;
    for (let k = 1; k <= 3; k++) {
      const [h, ...rows] = csvRows((await runCli(["solve", input, "--format", "csv", "--quiet", "--shard", `${k}/3`])).stdout);
      header ??= h;
      expect(h).toEqual(header);
      // Shard k takes input rows k, k+3, …
      expect(rows.length).toBe(Math.floor((3000 - k) / 3) + 1);
      merged.push(...rows);
    }
    merged.sort((a, b) => Number(a[0]) - Number(b[0]));
    expect([header, ...merged]).toEqual(whole);
  }, 120_000);

  it("--line-offset shifts line numbers in output and messages (chunks of a larger file)", async () => {
    const text = readFileSync(repeated("solve-input.csv", 20), "utf8");
    const lines = text.trim().split("\n");
    const whole = await runCli(["solve", "-", "--format", "jsonl"], { stdin: text });
    // The second half as its own chunk with the header repeated: rows 11–20 are file lines 12–21.
    const chunk = `${lines[0]}\n${lines.slice(11).join("\n")}\n`;
    const part = await runCli(["solve", "-", "--format", "jsonl", "--line-offset", "10"], { stdin: chunk });
    const wholeLines = whole.stdout.trim().split("\n");
    expect(part.stdout.trim().split("\n")).toEqual(wholeLines.slice(10));
  }, 60_000);

  it("rejects malformed shard specifications (exit 2)", () => {
    const parse = (v: string) => shardOption(parseArgs(["--shard", v], TABLE_OPTIONS, "solve"));
    expect(parse("2/5")).toEqual({ index: 2, count: 5 });
    for (const bad of ["0/3", "4/3", "1/0", "a/b", "1", "-1/3", "1.5/3"]) expect(() => parse(bad), bad).toThrow(/--shard must be K\/N/);
  });

  it("argvOf round-trips parsed options", () => {
    const specs = [...TABLE_OPTIONS, { name: "unit", kind: "list", help: "" } as const];
    const a = parseArgs(["x.csv", "-q", "--unit", "radius=km", "--unit", "distance=ly", "-j", "3", "--id=a b"], specs, "solve");
    const b = parseArgs(argvOf(a), specs, "solve");
    expect([...b.options]).toEqual([...a.options]);
    expect(b.positionals).toEqual(a.positionals);
  });
});

describe("pipes, full disks and interrupted runs", () => {
  it("a full disk gives exit 4 and one line, no stack trace; no output file is left half-written", async () => {
    const r = await runCli(["solve", "examples/demo-survey/solve-input.csv", "--output", "/dev/full", "--quiet"]);
    expect(r.code).toBe(4);
    expect(r.stderr.trim().split("\n")).toHaveLength(1);
    expect(r.stderr).toContain("ENOSPC");
    expect(r.stderr).not.toMatch(/\n\s+at /);
  });

  it("--output is written to a temporary file and renamed: the file appears whole, nothing else is left", async () => {
    const out = join(dir, "whole.csv");
    const r = await runCli(["solve", "examples/demo-survey/solve-input.csv", "--output", out, "--quiet"]);
    expect(r.code).toBe(0);
    expect(readFileSync(out, "utf8").split("\n")[0]).toMatch(/^line,name,status/);
    expect(readdirSync(dir).filter((f) => f.endsWith(".tmp"))).toEqual([]);
  });

  it("the summary counts ok, flagged and rejected rows, which add up to the rows read", async () => {
    const r = await runCli(["fit", "examples/demo-survey/photometry.csv", "--bands", "demo", "--format", "csv"]);
    const m = /fit: (\d+) rows, (\d+) ok, (\d+) flagged, (\d+) rejected/.exec(r.stderr);
    expect(m).not.toBeNull();
    const [rows, ok, flagged, rejected] = (m as RegExpExecArray).slice(1).map(Number) as [number, number, number, number];
    expect(ok + flagged + rejected).toBe(rows);
    const statuses = csvRecords(r.stdout).map((x) => x.status);
    expect(statuses.length).toBe(rows);
    expect(statuses.filter((s) => s === "flagged").length).toBe(flagged);
    expect(statuses.filter((s) => s === "ok").length).toBe(ok);
  }, 60_000);
});
