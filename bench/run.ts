/**
 * Runs every bench/*.bench.ts in one process. For each case:
 *
 * 1. calibration: each side is repeated until one sample lasts ≥ 20 ms
 *    (BENCH_MIN_MS), so timer resolution and call overhead do not matter;
 * 2. measurement: BENCH_PAIRS (default 9) interleaved pairs, alternating
 *    which side runs first, so machine noise hits both alike; each pair gives
 *    one ratio subject/baseline of the times per item;
 * 3. the table shows ns per item of each side (medians over the pairs) and
 *    the median of the per-pair ratios with their min and max;
 * 4. the two checksums must agree (relative 1e-12 unless the case declares a
 *    justified tolerance); a disagreement is flagged in the table, and the
 *    process exits with status 1 at the end.
 *
 * Ratios, not absolute times, are what to compare across machines.
 *
 * `npm run bench` bundles this file with esbuild (scripts/bench.mjs) and runs
 * the bundle with node.
 *
 *   npm run bench                          # everything
 *   npm run bench -- radiation             # files (or cases) whose name contains "radiation"
 *   BENCH_JSON=bench.json npm run bench    # also write the results as JSON
 */
import { writeFileSync } from "node:fs";
import type { BenchCase } from "./case";
import * as fit from "./fit.bench";
import * as io from "./io.bench";
import * as photometry from "./photometry.bench";
import * as quantity from "./quantity.bench";
import * as radiation from "./radiation.bench";
import * as spectra from "./spectra.bench";

// Static imports so that scripts/bench.mjs can bundle the whole run the way
// users' bundlers will see the library (running TypeScript sources through a
// loader adds call overhead that would distort the ratios).
const modules: Record<string, { cases: BenchCase[] }> = { quantity, radiation, photometry, spectra, fit, io };
const filter = (process.argv[2] ?? "").toLowerCase();
const pairs = Math.max(1, Number(process.env.BENCH_PAIRS ?? 9));
const minMs = Number(process.env.BENCH_MIN_MS ?? 20);
const jsonPath = process.env.BENCH_JSON;
const DEFAULT_TOLERANCE = 1e-12;

const now = (): number => Number(process.hrtime.bigint()) / 1e6;

function median(xs: readonly number[]): number {
  const s = [...xs].sort((a, b) => a - b);
  const m = s.length >> 1;
  return s.length % 2 ? (s[m] as number) : ((s[m - 1] as number) + (s[m] as number)) / 2;
}

/** Repetitions of `fn` that make one sample last at least `minMs`. */
function calibrate(fn: () => number): number {
  let reps = 1;
  for (;;) {
    const t0 = now();
    for (let r = 0; r < reps; r++) fn();
    const ms = now() - t0;
    if (ms >= minMs) return reps;
    reps = ms <= 0 ? reps * 10 : Math.max(reps + 1, Math.ceil((reps * minMs * 1.2) / ms));
  }
}

/** One sample: `reps` calls; returns ms per call and the last checksum. */
function sample(fn: () => number, reps: number): { ms: number; check: number } {
  let check = 0;
  const t0 = now();
  for (let r = 0; r < reps; r++) check = fn();
  return { ms: (now() - t0) / reps, check };
}

const ns = (x: number): string => (x >= 100 ? x.toFixed(0) : x >= 10 ? x.toFixed(1) : x >= 1 ? x.toFixed(2) : x.toFixed(3));
const r3 = (x: number): string => x.toFixed(x >= 10 ? 1 : 2);

interface Result {
  file: string;
  name: string;
  note?: string;
  items: number;
  repetitions: { baseline: number; subject: number };
  baselineNsPerItem: number;
  subjectNsPerItem: number;
  ratio: { median: number; min: number; max: number; perPair: number[] };
  checksum: { baseline: number; subject: number; relativeDifference: number; tolerance: number; toleranceWhy?: string; agree: boolean };
}

const files = Object.keys(modules);
const results: Result[] = [];
const rows: string[][] = [];
console.log(`starlume bench: node ${process.version}, ${pairs} interleaved pairs per case, samples ≥ ${minMs} ms`);
console.log("baseline = hand-written plain-number code; ratio = subject/baseline per pair: median [min–max]\n");
const header = ["case", "items", "baseline ns/item", "subject ns/item", "ratio median [min–max]", ""];

for (const file of files) {
  const mod = modules[file] as { cases: BenchCase[] };
  const fileMatch = file.includes(filter);
  const cases = mod.cases.filter((c) => fileMatch || c.name.toLowerCase().includes(filter));
  if (cases.length === 0) continue;
  rows.push([`## ${file}`]);
  for (const c of cases) {
    c.setup?.();
    // warm-up (and JIT) of both paths, then calibration
    for (let i = 0; i < 3; i++) {
      c.baseline();
      c.subject();
    }
    const repsB = calibrate(c.baseline);
    const repsS = calibrate(c.subject);
    const tb: number[] = [];
    const ts: number[] = [];
    const ratios: number[] = [];
    let checkB = NaN;
    let checkS = NaN;
    for (let p = 0; p < pairs; p++) {
      let b: { ms: number; check: number };
      let s: { ms: number; check: number };
      if (p % 2 === 0) {
        b = sample(c.baseline, repsB);
        s = sample(c.subject, repsS);
      } else {
        s = sample(c.subject, repsS);
        b = sample(c.baseline, repsB);
      }
      tb.push(b.ms);
      ts.push(s.ms);
      ratios.push(s.ms / b.ms);
      checkB = b.check;
      checkS = s.check;
    }
    const tol = c.tolerance?.rel ?? DEFAULT_TOLERANCE;
    const diff = Math.abs(checkB - checkS) / Math.max(Math.abs(checkB), Math.abs(checkS));
    const agree = Number.isFinite(checkB) && Number.isFinite(checkS) && (checkB === checkS || diff <= tol);
    const bNs = (median(tb) * 1e6) / c.items;
    const sNs = (median(ts) * 1e6) / c.items;
    const rm = median(ratios);
    const flag = agree
      ? tol !== DEFAULT_TOLERANCE
        ? `(checksums agree within ${tol})`
        : ""
      : `!! CHECKSUMS DISAGREE: baseline ${checkB}, subject ${checkS} (rel. ${diff.toExponential(1)} > ${tol}) !!`;
    const row = [c.name, c.items.toExponential(0).replace("e+", "e"), ns(bNs), ns(sNs), `${r3(rm)} [${r3(Math.min(...ratios))}–${r3(Math.max(...ratios))}]`, flag];
    rows.push(row);
    console.log(`  ${row.slice(0, 5).join(" | ")}${flag ? ` ${flag}` : ""}`);
    results.push({
      file,
      name: c.name,
      ...(c.note !== undefined ? { note: c.note } : {}),
      items: c.items,
      repetitions: { baseline: repsB, subject: repsS },
      baselineNsPerItem: bNs,
      subjectNsPerItem: sNs,
      ratio: { median: rm, min: Math.min(...ratios), max: Math.max(...ratios), perPair: ratios },
      checksum: {
        baseline: checkB,
        subject: checkS,
        relativeDifference: diff,
        tolerance: tol,
        ...(c.tolerance !== undefined ? { toleranceWhy: c.tolerance.why } : {}),
        agree,
      },
    });
  }
}

// The table, aligned
const widths = header.map((h, i) => Math.max(h.length, ...rows.filter((r) => r.length > 1).map((r) => (r[i] ?? "").length)));
const line = (r: string[]): string =>
  r
    .map((x, i) => (i === 0 || i === r.length - 1 ? x.padEnd(widths[i] as number) : x.padStart(widths[i] as number)))
    .join("  ")
    .trimEnd();
console.log("");
console.log(line(header));
console.log(widths.map((w) => "-".repeat(w)).join("  ").trimEnd());
for (const r of rows) console.log(r.length === 1 ? r[0] : line(r));

const bad = results.filter((r) => !r.checksum.agree);
if (jsonPath) {
  writeFileSync(
    jsonPath,
    JSON.stringify({ node: process.version, date: new Date().toISOString(), pairs, minSampleMs: minMs, filter, results }, null, 2) + "\n",
  );
  console.log(`\nwrote ${jsonPath}`);
}
if (bad.length > 0) {
  console.log(`\n${bad.length} case(s) with disagreeing checksums: ${bad.map((r) => r.name).join("; ")}`);
  process.exitCode = 1;
}
