// starlume lints itself with its own rules (typed linting): no operator may
// mix quantities of different dimension or system, and no quantity may
// silently lose its unit. Only these rules run here; formatting and style are
// left to the compiler's strict settings.
import tseslint from "typescript-eslint";
import starlume from "./dist/lint.js";

export default tseslint.config(
  { ignores: ["dist/**", "docs/api/**", "node_modules/**", "test/lint/fixture/**", "**/*.generated.ts"] },
  {
    files: ["src/**/*.ts", "examples/**/*.ts", "test/types/**/*.ts"],
    languageOptions: { parser: tseslint.parser, parserOptions: { projectService: true, tsconfigRootDir: import.meta.dirname } },
    plugins: { starlume },
    rules: { "starlume/mixed-quantities": "error", "starlume/brand-drop": "warn" },
  },
);
