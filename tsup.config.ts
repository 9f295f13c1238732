import { defineConfig } from "tsup";

export default defineConfig([
  {
    // the library: ESM + CJS with declarations, no Node APIs
    entry: { index: "src/index.ts" },
    format: ["esm", "cjs"],
    dts: true,
    sourcemap: true,
    clean: true,
    treeshake: true,
    target: "es2020",
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
