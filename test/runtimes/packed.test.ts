/**
 * Runtime smoke tests of the packed package, as a user gets it: `npm pack`,
 * install the tarball into a fresh directory, then under each runtime import
 * "starlume" (ESM; also require() under Node), compute Planck's B_λ in SI and
 * CGS, parse a unit text (and see a wrong kind rejected), and run the CLI's
 * `--version` and a small `solve`.
 *
 * Runtimes: the Node running this test, plus Node 18 and 22, Deno and Bun
 * from .runtimes/ (exact versions of npm packages, pinned in runtimes.json,
 * installed by `node scripts/install-runtimes.mjs`; .ci/run does that).
 * A runtime that is not installed is skipped with a test that says so, and
 * everything skips, saying why, when dist/ has not been built.
 */
import { execFileSync } from "node:child_process";
import { copyFileSync, existsSync, mkdirSync, mkdtempSync, readFileSync, rmSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import { join, resolve } from "node:path";
import { afterAll, beforeAll, describe, expect, test } from "vitest";
import { CGS, SI, constants, kinds, planckRadianceWavelength, units } from "../../src/index";

const root = resolve(import.meta.dirname, "../..");
const here = join(root, "test/runtimes");
const built = ["dist/index.js", "dist/index.cjs", "dist/cli.js"].every((f) => existsSync(join(root, f)));
const pkg = JSON.parse(readFileSync(join(root, "package.json"), "utf8")) as { version: string };
const pins = JSON.parse(readFileSync(join(here, "runtimes.json"), "utf8")) as Record<
  string,
  { package: string; version: string; bin: string }
>;

interface Runtime {
  name: string;
  bin: string | undefined;
  /** argv before the script (e.g. `run -A` for Deno) */
  pre: string[];
  cjs: boolean;
}
const pinned = (name: string): string | undefined => {
  const pin = pins[name];
  if (!pin) return undefined;
  const bin = join(root, ".runtimes", name, "node_modules", ".bin", pin.bin);
  return existsSync(bin) ? bin : undefined;
};
const runtimes: Runtime[] = [
  { name: `node ${process.version} (the test runner's)`, bin: process.execPath, pre: [], cjs: true },
  { name: `node ${pins.node18?.version}`, bin: pinned("node18"), pre: [], cjs: true },
  { name: `node ${pins.node22?.version}`, bin: pinned("node22"), pre: [], cjs: true },
  { name: `deno ${pins.deno?.version}`, bin: pinned("deno"), pre: ["run", "--allow-all", "--quiet"], cjs: false },
  { name: `bun ${pins.bun?.version}`, bin: pinned("bun"), pre: [], cjs: true },
];

// The same computation from the sources, in this process.
const T = SI.of(5772, units.K);
const expected = {
  planckSI: planckRadianceWavelength(SI, SI.of(500, units.nm), T) as number,
  planckCGS: planckRadianceWavelength(CGS, CGS.of(500, units.nm), T) as number,
  parsed: SI.valueIn(SI.parse("656.28 nm", kinds.length), units.angstrom),
  sigmaCGS: constants.sigma.cgs as number,
};

let work = "";
let app = "";
const env = { ...process.env, NO_COLOR: "1", DENO_NO_UPDATE_CHECK: "1", DENO_NO_PROMPT: "1" };

beforeAll(() => {
  if (!built) return;
  work = mkdtempSync(join(tmpdir(), "starlume-packed-"));
  const packed = JSON.parse(
    execFileSync("npm", ["pack", "--json", "--pack-destination", work], { cwd: root, encoding: "utf8", env }),
  ) as { filename: string }[];
  const tarball = join(work, (packed[0] as { filename: string }).filename);
  app = join(work, "app");
  mkdirSync(app);
  writeFileSync(join(app, "package.json"), `${JSON.stringify({ name: "smoke-app", private: true })}\n`);
  // starlume has no dependencies and its peers are optional: nothing is fetched
  execFileSync("npm", ["install", "--no-audit", "--no-fund", "--ignore-scripts", "--loglevel=error", tarball], {
    cwd: app,
    env,
    stdio: ["ignore", "ignore", "inherit"],
  });
  for (const f of ["smoke.mjs", "smoke.cjs", "stars.csv"]) copyFileSync(join(here, f), join(app, f));
}, 180_000);

afterAll(() => {
  if (work) rmSync(work, { recursive: true, force: true });
});

const run = (rt: Runtime, args: string[]): string =>
  execFileSync(rt.bin as string, [...rt.pre, ...args], {
    cwd: app,
    env: { ...env, DENO_DIR: join(work, "deno-cache") },
    encoding: "utf8",
    timeout: 120_000,
    stdio: ["ignore", "pipe", "pipe"],
  });

/** Engines may differ in the last bits of exp/pow: 1e-12 relative covers that, far below any physics. */
const close = (actual: number, want: number) => expect(Math.abs(actual - want) / Math.abs(want)).toBeLessThan(1e-12);

describe("the packed package", () => {
  test.runIf(!built)("is skipped: dist/ is not built (run npm run build first)", () => {
    expect(built).toBe(false);
  });

  test.runIf(built)("ships every file the CLI's help mentions", () => {
    const installed = join(app, "node_modules", "starlume");
    const cli = join(installed, "dist", "cli.js");
    const help = (args: string[]) =>
      execFileSync(process.execPath, [cli, ...args], { cwd: app, env, encoding: "utf8", timeout: 60_000 });
    const texts = [help(["--help"])];
    for (const c of ["solve", "fit", "planck", "convert", "lines", "demo"]) texts.push(help([c, "--help"]));
    const paths = new Set(texts.flatMap((t) => [...t.matchAll(/\b(?:docs|examples)\/[\w./-]*[\w/]/g)].map((m) => m[0])));
    expect(paths.size).toBeGreaterThan(0);
    for (const p of paths) expect(existsSync(join(installed, p)), `${p} is in the package`).toBe(true);
  }, 120_000);

  for (const rt of runtimes) {
    describe(rt.name, () => {
      test.runIf(built && rt.bin === undefined)(
        "is skipped: not installed (node scripts/install-runtimes.mjs installs it into .runtimes/)",
        () => {
          expect(rt.bin).toBeUndefined();
        },
      );
      const ready = built && rt.bin !== undefined;
      const formats = rt.cjs ? ["smoke.mjs", "smoke.cjs"] : ["smoke.mjs"];
      for (const script of formats) {
        test.runIf(ready)(`imports starlume (${script}), computes Planck in SI and CGS and parses units`, () => {
          const out = JSON.parse(run(rt, [script]).trim()) as Record<string, number | string>;
          close(out.planckSI as number, expected.planckSI);
          close(out.planckCGS as number, expected.planckCGS);
          // SI and CGS differ by exactly the unit factor 10 (W→erg/s ×1e7, m⁻²→cm⁻² ×1e-4, m⁻¹→cm⁻¹ ×1e-2)
          close((out.planckCGS as number) / (out.planckSI as number), 10);
          close(out.parsed as number, 6562.8);
          close(out.sigmaCGS as number, expected.sigmaCGS);
          // CODATA 2018 prints σ = 5.670 374 419… × 10⁻⁸ W m⁻² K⁻⁴ (10 digits, truncated): × 10³ in erg s⁻¹ cm⁻² K⁻⁴
          expect(Math.abs((out.sigmaCGS as number) / 5.670374419e-5 - 1)).toBeLessThan(1e-9);
          expect(out.rejected).toBe("ParseError");
        }, 120_000);
      }
      test.runIf(ready)("runs the CLI: --version and a small solve", () => {
        const cli = join("node_modules", "starlume", "dist", "cli.js");
        expect(run(rt, [cli, "--version"]).trim()).toBe(`starlume ${pkg.version}`);
        const csv = run(rt, [cli, "solve", "stars.csv", "--format", "csv"]).trim().split("\n");
        const header = (csv[0] as string).split(",");
        const rows = csv.slice(1).map((l) => l.split(","));
        expect(rows).toHaveLength(2);
        const col = (row: string[], name: string) => Number(row[header.indexOf(name)]);
        const sun = rows[0] as string[];
        expect(sun[header.indexOf("status")]).toBe("ok");
        // IAU 2015 B3: T = 5772 K and R = 1 R☉ᴺ give L ≈ 1 L☉ᴺ (the nominal values agree to ~1e-5)
        expect(Math.abs(col(sun, "luminosity [Lsun]") - 1)).toBeLessThan(1e-4);
        // d = 1/ϖ: 100 mas is 10 pc
        close(col(sun, "distance [pc]"), 10);
      }, 120_000);
    });
  }
});
