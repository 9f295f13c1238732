// Bundles bench/run.ts (and the library sources it imports) with esbuild into
// one ES module, as an application bundler would, and runs it with node.
// Arguments are passed through: `npm run bench -- radiation`; BENCH_JSON=path,
// BENCH_PAIRS and BENCH_MIN_MS are read by bench/run.ts. The exit status is
// the runner's (1 when a case's checksums disagree).
import { build } from "esbuild";
import { spawnSync } from "node:child_process";
import { mkdirSync } from "node:fs";

const outdir = "node_modules/.cache/starlume-bench";
mkdirSync(outdir, { recursive: true });
await build({
  entryPoints: ["bench/run.ts"],
  bundle: true,
  platform: "node",
  format: "esm",
  target: "node18",
  outfile: `${outdir}/run.mjs`,
  logLevel: "warning",
});
const r = spawnSync(process.execPath, [`${outdir}/run.mjs`, ...process.argv.slice(2)], { stdio: "inherit" });
process.exit(r.status ?? 1);
