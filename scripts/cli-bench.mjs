#!/usr/bin/env node
/**
 * Whole-process benchmark of the command-line tool against a hand-written
 * plain Node script doing the same arithmetic (scripts/cli-bench-plain.mjs):
 *
 *   node dist/cli.js solve IN.csv --format csv --output OUT.csv --quiet
 *   node scripts/cli-bench-plain.mjs IN.csv OUT.csv
 *
 * IN.csv is the demo survey's solve input (examples/demo-survey/solve-input.csv:
 * nine rows with four inputs, solved by weighted least squares with a χ²,
 * three exactly determined) repeated to ≥ 10⁵ rows (CLI_BENCH_ROWS) in a
 * temporary directory. Both commands run as separate processes, timed by
 * wall clock including start-up, over CLI_BENCH_RUNS (default 3, at least 3)
 * interleaved runs alternating which goes first. Both outputs are then read
 * back and compared on a sample of rows: text columns equal, numbers within
 * 1e-9 relative (values and σ: both are double-precision solutions of the
 * same 3×3 normal equations, which agree to ~1e-13; χ², p and tension
 * within 1e-8 relative or 1e-12 absolute, as they are differences of logs).
 *
 * Prints rows/s of each side and the ratio CLI time / plain time (median of
 * the per-run ratios, with min and max). BENCH_JSON=path writes the figures.
 * Builds dist/ first (npm run build) when dist/cli.js is missing.
 * Not run in CI: timings depend on the machine (indicative only).
 *
 * Run: node scripts/cli-bench.mjs
 */
import { spawnSync } from "node:child_process";
import { existsSync, mkdtempSync, readFileSync, rmSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import { dirname, join } from "node:path";
import { fileURLToPath } from "node:url";

const root = join(dirname(fileURLToPath(import.meta.url)), "..");
const minRows = Number(process.env.CLI_BENCH_ROWS ?? 100_000);
const runs = Math.max(3, Number(process.env.CLI_BENCH_RUNS ?? 3));
const jsonPath = process.env.BENCH_JSON;
const cli = join(root, "dist", "cli.js");
const plain = join(root, "scripts", "cli-bench-plain.mjs");

if (!existsSync(cli)) {
  console.log("dist/cli.js missing: npm run build");
  const b = spawnSync("npm", ["run", "build"], { cwd: root, stdio: "inherit" });
  if (b.status !== 0) process.exit(b.status ?? 1);
}

// ---- input table ---------------------------------------------------------------------------
const dir = mkdtempSync(join(tmpdir(), "starlume-cli-bench-"));
const input = join(dir, "stars.csv");
const outCli = join(dir, "out-cli.csv");
const outPlain = join(dir, "out-plain.csv");
const demo = readFileSync(join(root, "examples", "demo-survey", "solve-input.csv"), "utf8").trimEnd().split("\n");
const header = demo[0];
const body = demo.slice(1);
const parts = [header];
for (let k = 0; parts.length - 1 < minRows; k++) {
  for (const row of body) {
    const comma = row.indexOf(",");
    parts.push(`${row.slice(0, comma)}-${k}${row.slice(comma)}`);
  }
}
const rows = parts.length - 1;
writeFileSync(input, parts.join("\n") + "\n");

// ---- timing ----------------------------------------------------------------------------------
function run(label, args) {
  const t0 = performance.now();
  const r = spawnSync(process.execPath, args, { cwd: root, encoding: "utf8" });
  const ms = performance.now() - t0;
  if (r.status !== 0) {
    console.error(`${label} failed (exit ${r.status}):\n${r.stderr}`);
    rmSync(dir, { recursive: true, force: true });
    process.exit(1);
  }
  return ms;
}
const runCli = () => run("cli", [cli, "solve", input, "--format", "csv", "--output", outCli, "--quiet"]);
const runPlain = () => run("plain script", [plain, input, outPlain]);

console.log(`starlume CLI vs plain script: solve ${rows} rows, node ${process.version}, ${runs} interleaved runs (wall clock, process start-up included)`);
const tCli = [];
const tPlain = [];
const ratios = [];
for (let i = 0; i < runs; i++) {
  let a;
  let b;
  if (i % 2 === 0) {
    a = runCli();
    b = runPlain();
  } else {
    b = runPlain();
    a = runCli();
  }
  tCli.push(a);
  tPlain.push(b);
  ratios.push(a / b);
  console.log(`  run ${i + 1}: cli ${a.toFixed(0)} ms, plain ${b.toFixed(0)} ms, ratio ${(a / b).toFixed(2)}`);
}

// ---- agreement ---------------------------------------------------------------------------------
function readCsv(path) {
  const lines = readFileSync(path, "utf8").trimEnd().split("\n");
  return { head: lines[0].split(","), rows: lines.slice(1).map((l) => l.split(",")) };
}
const a = readCsv(outCli);
const b = readCsv(outPlain);
const problems = [];
if (a.head.join(",") !== b.head.join(",")) problems.push(`headers differ:\n  cli   ${a.head.join(",")}\n  plain ${b.head.join(",")}`);
if (a.rows.length !== rows || b.rows.length !== rows) problems.push(`row counts: cli ${a.rows.length}, plain ${b.rows.length}, input ${rows}`);
const TEXT = new Set(["line", "name", "status", "inputs", "worst_pull", "reason"]);
const LOOSE = new Set(["chi2", "p_value", "tension_sigma"]);
const step = Math.max(1, Math.floor(rows / 1000));
const sample = [];
for (let i = 0; i < rows; i += step) sample.push(i);
if (sample[sample.length - 1] !== rows - 1) sample.push(rows - 1);
let compared = 0;
let worstRel = 0;
for (const i of sample) {
  if (i >= a.rows.length || i >= b.rows.length || problems.length >= 10) break;
  const ra = a.rows[i];
  const rb = b.rows[i];
  compared++;
  a.head.forEach((h, j) => {
    const x = ra[j] ?? "";
    const y = rb[j] ?? "";
    if (TEXT.has(h)) {
      if (x !== y) problems.push(`row ${i + 1} ${h}: cli "${x}", plain "${y}"`);
      return;
    }
    const u = Number(x);
    const v = Number(y);
    const diff = Math.abs(u - v);
    const rel = diff === 0 ? 0 : diff / Math.max(Math.abs(u), Math.abs(v));
    const ok = LOOSE.has(h) ? rel <= 1e-8 || diff <= 1e-12 : rel <= 1e-9;
    if (!LOOSE.has(h)) worstRel = Math.max(worstRel, rel);
    if (!ok || !Number.isFinite(u) || !Number.isFinite(v)) problems.push(`row ${i + 1} ${h}: cli ${x}, plain ${y} (rel. ${rel.toExponential(1)})`);
  });
}
rmSync(dir, { recursive: true, force: true });

const median = (xs) => {
  const s = [...xs].sort((p, q) => p - q);
  const m = s.length >> 1;
  return s.length % 2 ? s[m] : (s[m - 1] + s[m]) / 2;
};
const mCli = median(tCli);
const mPlain = median(tPlain);
const r = median(ratios);
console.log("");
console.log(`side          median ms   rows/s`);
console.log(`starlume CLI  ${mCli.toFixed(0).padStart(9)}   ${((rows / mCli) * 1e3).toExponential(2)}`);
console.log(`plain script  ${mPlain.toFixed(0).padStart(9)}   ${((rows / mPlain) * 1e3).toExponential(2)}`);
console.log(`ratio cli/plain: ${r.toFixed(2)} [${Math.min(...ratios).toFixed(2)}–${Math.max(...ratios).toFixed(2)}]`);
if (problems.length === 0) {
  console.log(`outputs agree on ${compared} sampled rows (values and σ: worst relative difference ${worstRel.toExponential(1)})`);
} else {
  console.log(`!! OUTPUTS DISAGREE (${compared} rows sampled):\n  ${problems.join("\n  ")}`);
  process.exitCode = 1;
}
if (jsonPath) {
  writeFileSync(
    jsonPath,
    JSON.stringify(
      {
        node: process.version,
        date: new Date().toISOString(),
        rows,
        runs,
        cliMs: tCli,
        plainMs: tPlain,
        cliRowsPerSecond: (rows / mCli) * 1e3,
        plainRowsPerSecond: (rows / mPlain) * 1e3,
        ratio: { median: r, min: Math.min(...ratios), max: Math.max(...ratios), perRun: ratios },
        agreement: { sampledRows: compared, worstRelativeDifference: worstRel, problems },
      },
      null,
      2,
    ) + "\n",
  );
  console.log(`wrote ${jsonPath}`);
}
