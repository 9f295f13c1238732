/**
 * Runs every bench/*.bench.ts in one process and prints, for each case, the
 * median time of the hand-written baseline and of the subject, and their
 * ratio. Baseline and subject are interleaved (alternating order each round)
 * so that machine noise hits both alike. Ratios, not absolute times, are what
 * to compare across machines.
 *
 * `npm run bench` bundles this file with esbuild (scripts/bench.mjs) and runs
 * the bundle with node.
 *
 *   npm run bench                 # everything
 *   npm run bench -- radiation    # only files whose name contains "radiation"
 */
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
const filter = process.argv[2] ?? "";
const rounds = Number(process.env.BENCH_ROUNDS ?? 7);

function time(fn: () => number): { ms: number; check: number } {
  const t0 = process.hrtime.bigint();
  const check = fn();
  const t1 = process.hrtime.bigint();
  return { ms: Number(t1 - t0) / 1e6, check };
}

function median(xs: number[]): number {
  const s = [...xs].sort((a, b) => a - b);
  const m = s.length >> 1;
  return s.length % 2 ? (s[m] as number) : ((s[m - 1] as number) + (s[m] as number)) / 2;
}

const fmt = (ms: number) => (ms >= 100 ? ms.toFixed(0) : ms >= 1 ? ms.toFixed(2) : ms.toFixed(4));

const files = Object.keys(modules).filter((f) => f.includes(filter));
console.log(`starlume bench: node ${process.version}, ${rounds} rounds per case, median times`);
console.log("ratio = subject / baseline (hand-written plain-number loop, same process)\n");
for (const file of files) {
  const mod = modules[file] as { cases: BenchCase[] };
  console.log(`## ${file}`);
  for (const c of mod.cases) {
    c.setup?.();
    // warm-up: let the JIT compile both paths
    for (let i = 0; i < 10; i++) {
      c.baseline();
      c.subject();
    }
    const b: number[] = [];
    const s: number[] = [];
    let checkB = 0;
    let checkS = 0;
    for (let r = 0; r < rounds; r++) {
      if (r % 2 === 0) {
        const x = time(c.baseline);
        const y = time(c.subject);
        b.push(x.ms);
        s.push(y.ms);
        checkB = x.check;
        checkS = y.check;
      } else {
        const y = time(c.subject);
        const x = time(c.baseline);
        b.push(x.ms);
        s.push(y.ms);
        checkB = x.check;
        checkS = y.check;
      }
    }
    const mb = median(b);
    const ms = median(s);
    const rate = c.items !== undefined ? `  (${((c.items / ms) * 1e3).toExponential(2)} items/s)` : "";
    const same = Math.abs(checkB - checkS) <= 1e-9 * Math.max(Math.abs(checkB), Math.abs(checkS));
    const agree = c.sameWork === false ? "  (reference cost, different work)" : same ? "" : "  [checksums differ]";
    console.log(`  ${c.name}\n    baseline ${fmt(mb)} ms   subject ${fmt(ms)} ms   ratio ${(ms / mb).toFixed(3)}${rate}${agree}`);
  }
  console.log("");
}
