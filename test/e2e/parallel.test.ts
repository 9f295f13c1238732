/**
 * The filter contract with an existing engine: GNU parallel (Debian's
 * `parallel`) cuts a 10⁵-row demo-like table into blocks of whole rows,
 * repeats the header in each (`--header :`), runs one `starlume solve -`
 * per block with `--line-offset` from the block's sequence number, and
 * keeps the blocks in order (`-k`). The concatenated JSON Lines output must
 * equal the single-process output byte for byte.
 *
 * Needs the built tool (dist/cli.js, `npm run build`) and /usr/bin/parallel;
 * without either the test is skipped with a message. The wall times and the
 * speed-up are printed (indicative only, never asserted).
 */
import { execFileSync } from "node:child_process";
import { existsSync, mkdtempSync, readFileSync, rmSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { afterAll, describe, expect, it } from "vitest";
import { REPO_ROOT } from "../../src/cli/test-util";

const PARALLEL = "/usr/bin/parallel";
const CLI = join(REPO_ROOT, "dist", "cli.js");
const ROWS = 100_000;
const BLOCK = 25_000;
const missing = [!existsSync(PARALLEL) ? `${PARALLEL} (apt-get install parallel)` : "", !existsSync(CLI) ? "dist/cli.js (npm run build)" : ""].filter((m) => m !== "");
if (missing.length > 0) console.warn(`test/e2e/parallel.test.ts: skipped — missing ${missing.join(" and ")}`);

const dir = mkdtempSync(join(tmpdir(), "starlume-parallel-"));
afterAll(() => rmSync(dir, { recursive: true, force: true }));

describe.skipIf(missing.length > 0)("GNU parallel fan-out", () => {
  it(`solve: ${ROWS} rows in blocks of ${BLOCK} through parallel --pipe equal one process, row for row`, () => {
    const [header, ...data] = readFileSync(join(REPO_ROOT, "examples/demo-survey/solve-input.csv"), "utf8").trim().split("\n");
    const rows = [header as string];
    for (let i = 0; i < ROWS; i++) rows.push(data[i % data.length] as string);
    const input = join(dir, "stars.csv");
    writeFileSync(input, `${rows.join("\n")}\n`);

    let t = performance.now();
    const single = execFileSync(process.execPath, [CLI, "solve", input, "--format", "jsonl", "--quiet", "--jobs", "1"], { maxBuffer: 1 << 30, encoding: "utf8" });
    const tSingle = performance.now() - t;

    const job = `${JSON.stringify(process.execPath)} ${JSON.stringify(CLI)} solve - --format jsonl --quiet --jobs 1 --line-offset $(( ({#} - 1) * ${BLOCK} ))`;
    t = performance.now();
    const fanned = execFileSync(PARALLEL, ["--will-cite", "--pipe", "-N", String(BLOCK), "--block", "8M", "--header", ":", "-k", job], {
      input: readFileSync(input),
      maxBuffer: 1 << 30,
      encoding: "utf8",
      shell: false,
    });
    const tFanned = performance.now() - t;
    console.log(`parallel fan-out: one process ${(tSingle / 1000).toFixed(2)} s, GNU parallel ${(tFanned / 1000).toFixed(2)} s (speed-up ${(tSingle / tFanned).toFixed(2)}×; indicative only)`);

    expect(single.split("\n").length).toBe(ROWS + 1);
    expect(fanned).toBe(single);
  }, 300_000);
});
