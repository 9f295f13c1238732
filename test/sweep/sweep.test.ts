/**
 * Full-range sweep of the radiation and photometry exports (issue 16).
 * Seeded; SWEEP_POINTS (default 1500) points per function in CI, e.g.
 * `SWEEP_POINTS=200000 npx vitest run test/sweep` for the long run;
 * SWEEP_SEED changes the seed; SWEEP_REPORT=1 prints the per-function table.
 */
import { afterAll, describe, expect, it } from "vitest";
import { runSweep, type SweepStats } from "./harness";
import { sweepTable } from "./table";

const POINTS = Number(process.env.SWEEP_POINTS ?? 1500);
const SEED = Number(process.env.SWEEP_SEED ?? 20261202);
const stats = new Map<string, SweepStats>();

describe("full-range sweep", () => {
  sweepTable.forEach((entry, k) => {
    const run = entry.open ? it.skip : it;
    run(`${entry.name}${entry.open ? ` (open: ${entry.open})` : ""}`, () => {
      const st = runSweep(entry, POINTS, SEED + 7919 * k);
      stats.set(entry.name, st);
      expect(st.failures, `${entry.name}: ${st.failureCount} failures`).toEqual([]);
      expect(st.nonFinite).toBe(0);
    });
  });
  afterAll(() => {
    if (!process.env.SWEEP_REPORT) return;
    const rows = [...stats].map(([n, s]) => `${n.padEnd(46)} ${String(s.points).padStart(7)} ${String(s.valueChecks).padStart(7)} ${String(s.underflows).padStart(6)} ${String(s.overflows).padStart(6)} ${String(s.invalid).padStart(6)} ${s.worstRel.toExponential(2).padStart(9)} ${String(s.nonFinite).padStart(4)} ${String(s.failureCount).padStart(6)}`);
    console.log(["function".padEnd(46) + "  points  values  under   over  inval  worstRel  nonF  fails", ...rows].join("\n"));
  });
});
