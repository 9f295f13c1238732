import { existsSync, statSync } from "node:fs";
import { resolve } from "node:path";
import { defineConfig, type Options } from "tsup";

/**
 * Keeps each source module its own output file: every relative import of a
 * `src/` TypeScript module stays an import, rewritten to the output file's
 * name (`./units` → `./units.js`, `../law` → `../law/index.js`), instead of
 * being bundled in. With one entry per module this is a per-module build:
 * a consumer's bundler sees the module graph and, the package being
 * `"sideEffects": false`, drops every module the consumer does not reach.
 */
function perModule(ext: ".js" | ".cjs"): NonNullable<Options["esbuildPlugins"]>[number] {
  return {
    name: "starlume-per-module",
    setup(build) {
      build.onResolve({ filter: /^\.\.?(\/|$)/ }, (args) => {
        if (args.kind === "entry-point") return undefined;
        const base = resolve(args.resolveDir, args.path);
        const isFile = (p: string) => existsSync(p) && statSync(p).isFile();
        let target: string | undefined;
        if (isFile(`${base}.ts`)) target = args.path;
        else if (isFile(resolve(base, "index.ts"))) target = `${args.path.replace(/\/$/, "")}/index`;
        if (target === undefined) return undefined; // not a TypeScript module: let esbuild bundle it
        const spec = target.startsWith(".") ? target : `./${target}`;
        return { path: `${spec}${ext}`, external: true };
      });
    },
  };
}

/** Every library module under src/ (no tests, no CLI, no lint rules). */
const libraryModules = [
  "src/**/*.ts",
  "!src/**/*.test.ts",
  "!src/**/*.test-d.ts",
  "!src/**/*.test-util.ts",
  "!src/cli/**",
  "!src/lint/**",
];

export default defineConfig([
  {
    // the library, ESM: one output file per source module (dist/index.js,
    // dist/quantity/units.js, …) so unused modules drop from a consumer's bundle
    entry: libraryModules,
    format: ["esm"],
    outDir: "dist",
    bundle: true,
    esbuildPlugins: [perModule(".js")],
    dts: false,
    sourcemap: true,
    clean: false,
    splitting: false,
    treeshake: false,
    target: "es2020",
    // keep class fields as written (every engine that runs ES2020 modules in
    // practice has them) rather than a lowering helper repeated in each module
    esbuildOptions(options) {
      options.supported = { ...options.supported, "class-field": true, "class-static-field": true };
    },
  },
  {
    // the library, CommonJS: one file (require() users do not tree-shake)
    entry: { index: "src/index.ts" },
    format: ["cjs"],
    dts: false,
    sourcemap: true,
    clean: false,
    target: "es2020",
  },
  {
    // the library's declarations, rolled into one file per format
    // (dist/index.d.ts for import, dist/index.d.cts for require)
    entry: { index: "src/index.ts" },
    format: ["esm", "cjs"],
    dts: { only: true },
    clean: false,
  },
  {
    // the lint rules (an opt-in extra: eslint and @typescript-eslint/utils are optional peers)
    entry: { lint: "src/lint/index.ts" },
    format: ["esm", "cjs"],
    dts: true,
    sourcemap: true,
    clean: false,
    target: "node18",
    platform: "node",
    external: ["@typescript-eslint/utils", "typescript", "eslint"],
  },
  {
    // the command-line tool: ESM only (top-level await), Node built-ins only
    entry: { cli: "src/cli/bin.ts" },
    format: ["esm"],
    dts: false,
    sourcemap: true,
    clean: false,
    target: "node18",
    platform: "node",
  },
]);

