// Size budgets for consumer bundles of the published dist/, measured with
// esbuild (bundle, minify, tree-shake, honouring package.json "sideEffects")
// and zlib (gzip level 9). Each case imports through the package name, as a
// consumer would, so the package's "exports" and "sideEffects" are what count.
// Fails when a bundle grows past its budget. Budgets are set a little above
// the sizes measured when they were last reviewed; raise them deliberately,
// in the same commit as the growth.
//
//   node scripts/size-check.mjs            check against the budgets
//   node scripts/size-check.mjs --json     also print the figures as JSON
//   node scripts/size-check.mjs --explain  also list each bundle's modules by minified bytes
//
// Budgets raised in the same change as the growth (2026-12-02): the unit-text
// grammar of the open standards reaches every SI user through SI.parse (core
// 6.0 → 10.3 KB, Planck 11.0 → 15.4 KB), and the SED models, the Faddeeva
// function and the air-index models joined the library (52.8 → 65.5 KB).
// Moving parsing off the system object is the open fix.
import { build } from "esbuild";
import { mkdtempSync, mkdirSync, rmSync, symlinkSync } from "node:fs";
import { tmpdir } from "node:os";
import { join, resolve } from "node:path";
import { gzipSync } from "node:zlib";

// `before`: the same bundle, gzipped, from the single-file dist/index.js that
// preceded the per-module build (measured 2026-12-02 with this script).
const cases = [
  {
    name: "whole library (import *)",
    contents: 'import * as s from "starlume"; console.log(s);',
    budget: 67_000,
    before: 52_920,
  },
  {
    name: "Planck only (SI, units, planckRadianceWavelength)",
    contents:
      'import { SI, units, planckRadianceWavelength } from "starlume"; console.log(planckRadianceWavelength(SI, SI.of(500, units.nm), SI.of(5772, units.K)));',
    budget: 16_000,
    before: 21_950,
  },
  {
    name: "core (SI, units, add, mul)",
    contents:
      'import { SI, units, add, mul } from "starlume"; const a = SI.of(1, units.m); console.log(add(a, a), mul(a, a));',
    budget: 11_000,
    before: 21_950,
  },
  {
    name: "constants only",
    contents: 'import { constants } from "starlume"; console.log(constants.G.si, constants.sigma.cgs);',
    budget: 3_000,
    before: 21_920,
  },
];

// A throw-away node_modules/starlume pointing at this checkout, so the
// bundles resolve "starlume" through package.json exactly as a consumer does.
const root = resolve(import.meta.dirname, "..");
const tmp = mkdtempSync(join(tmpdir(), "starlume-size-"));
mkdirSync(join(tmp, "node_modules"));
symlinkSync(root, join(tmp, "node_modules", "starlume"), "dir");

const explain = process.argv.includes("--explain");
let failed = false;
const figures = [];
try {
  for (const c of cases) {
    let result;
    try {
      result = await build({
        stdin: { contents: c.contents, resolveDir: tmp, loader: "js" },
        bundle: true,
        minify: true,
        format: "esm",
        write: false,
        treeShaking: true,
        platform: "neutral",
        mainFields: ["module", "main"],
        preserveSymlinks: true,
        logLevel: "silent",
        metafile: explain,
      });
    } catch (e) {
      console.log(`size: ${c.name}: could not bundle (${String(e.message).split("\n")[0]})`);
      failed = true;
      continue;
    }
    const bytes = result.outputFiles[0].contents;
    const gz = gzipSync(bytes, { level: 9 }).length;
    const ok = gz <= c.budget;
    if (!ok) failed = true;
    figures.push({ name: c.name, minified: bytes.length, gzipped: gz, budget: c.budget, before: c.before });
    console.log(
      `size: ${c.name}: ${(bytes.length / 1000).toFixed(1)} KB minified, ${(gz / 1000).toFixed(2)} KB gzipped (budget ${(c.budget / 1000).toFixed(1)} KB; single-file dist before: ${(c.before / 1000).toFixed(2)} KB) ${ok ? "ok" : "OVER BUDGET"}`,
    );
    if (explain) {
      const inputs = Object.entries(Object.values(result.metafile.outputs)[0].inputs)
        .filter(([, v]) => v.bytesInOutput > 0)
        .sort((a, b) => b[1].bytesInOutput - a[1].bytesInOutput);
      for (const [path, v] of inputs) console.log(`  ${String(v.bytesInOutput).padStart(7)} B  ${path.replace(/^.*?node_modules\/starlume\//, "")}`);
    }
  }
} finally {
  rmSync(tmp, { recursive: true, force: true });
}
if (process.argv.includes("--json")) console.log(JSON.stringify(figures));
process.exit(failed ? 1 : 0);
