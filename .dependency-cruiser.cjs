/**
 * The layer order of starlume's sources, checked in CI (`npm run lint:layers`).
 *
 * Bottom up: values (plain SI numbers) → quantity → constants (typed) →
 * internal → law (the typed-law toolkit) → radiation → photometry | spectra →
 * fit → plot → cli. A module imports only from its own layer or below; there
 * are no cycles; only the CLI may use Node built-ins. Tests, benches and
 * scripts are outside the library and may import anything.
 */
const layers = ["values", "quantity", "constants", "internal", "law", "radiation", "photometry|spectra", "fit", "plot", "cli"];

/** `^src/(a|b)/` for the layers above index i. */
function above(i) {
  const names = layers.slice(i + 1).flatMap((l) => l.split("|"));
  return `^src/(${names.join("|")})/`;
}

const layerRules = layers.map((layer, i) => ({
  name: `layer-${layer.replace("|", "-or-")}`,
  comment: `${layer} may import only from its own layer or below (${layers.slice(0, i).join(", ") || "nothing"})`,
  severity: "error",
  from: { path: `^src/(${layer})/`, pathNot: "\\.test(-d)?\\.ts$|\\.test-util\\.ts$" },
  to: { path: above(i) },
}));

module.exports = {
  forbidden: [
    {
      name: "no-circular",
      comment: "No import cycles anywhere in the library.",
      severity: "error",
      from: { path: "^src/" },
      to: { circular: true },
    },
    ...layerRules.filter((r) => r.to.path !== "^src/()/"),
    {
      name: "photometry-and-spectra-independent",
      comment: "photometry and spectra sit side by side: neither imports the other.",
      severity: "error",
      from: { path: "^src/photometry/", pathNot: "\\.test\\.ts$" },
      to: { path: "^src/spectra/" },
    },
    {
      name: "spectra-and-photometry-independent",
      comment: "photometry and spectra sit side by side: neither imports the other.",
      severity: "error",
      from: { path: "^src/spectra/", pathNot: "\\.test\\.ts$" },
      to: { path: "^src/photometry/" },
    },
    {
      name: "node-builtins-only-in-cli",
      comment: "The library runs in browsers, Deno and Bun: Node built-ins only under src/cli.",
      severity: "error",
      from: { path: "^src/", pathNot: "^src/cli/|\\.test\\.ts$|\\.test-util\\.ts$" },
      to: { dependencyTypes: ["core"] },
    },
    {
      name: "no-runtime-dependencies",
      comment: "The library has no runtime dependencies (the lint plugin under src/lint is an opt-in extra with optional peers).",
      severity: "error",
      from: { path: "^src/", pathNot: "^src/lint/|\\.test\\.ts$|\\.test-util\\.ts$" },
      to: { dependencyTypes: ["npm", "npm-no-pkg", "npm-unknown"] },
    },
  ],
  options: {
    doNotFollow: { path: "node_modules" },
    tsPreCompilationDeps: true,
    tsConfig: { fileName: "tsconfig.json" },
    exclude: { path: "^src/.*\\.test(-d)?\\.ts$" },
  },
};
