// Size budgets for the published library, measured with esbuild (minified)
// and zlib (gzip level 9). Fails when a bundle grows past its budget.
// Budgets are set a little above the sizes measured when they were last
// reviewed; raise them deliberately, in the same commit as the growth.
// The one-law budget rose from 13 KB to 23 KB with the law toolkit: dist/index.js is
// still one file, so module-level law tables of other areas stay in a one-law
// bundle; per-module output (open work) is the real fix.
import { build } from "esbuild";
import { gzipSync } from "node:zlib";

const cases = [
  { name: "whole library (import *)", contents: 'export * from "./dist/index.js";', budget: 56_000 },
  { name: "one law alone, tree-shaken (SI + units + Planck B_λ)", contents: 'import { SI, units, planckRadianceWavelength } from "./dist/index.js"; console.log(planckRadianceWavelength(SI, SI.of(500, units.nm), SI.of(5772, units.K)));', budget: 23_000 },
];

let failed = false;
for (const c of cases) {
  let result;
  try {
    result = await build({
      stdin: { contents: c.contents, resolveDir: process.cwd(), loader: "js" },
      bundle: true,
      minify: true,
      format: "esm",
      write: false,
      treeShaking: true,
      platform: "neutral",
      logLevel: "silent",
    });
  } catch (e) {
    console.log(`size: ${c.name}: could not bundle (${e.message.split("\n")[0]})`);
    failed = true;
    continue;
  }
  const bytes = result.outputFiles[0].contents;
  const gz = gzipSync(bytes, { level: 9 }).length;
  const ok = gz <= c.budget;
  if (!ok) failed = true;
  console.log(`size: ${c.name}: ${bytes.length} B minified, ${gz} B gzipped (budget ${c.budget} B) ${ok ? "ok" : "OVER BUDGET"}`);
}
process.exit(failed ? 1 : 0);
