/**
 * starlume's lint rules, for ESLint with typed linting (typescript-eslint).
 * The compiler rejects mixed quantities in starlume's functions, but not
 * under JavaScript's operators (`a + b`, `a < b`), where a quantity is just a
 * `number`; these rules close that hole.
 *
 * ```js
 * // eslint.config.mjs
 * import tseslint from "typescript-eslint";
 * import starlume from "starlume/lint";
 * export default tseslint.config(
 *   { languageOptions: { parserOptions: { projectService: true } } },
 *   starlume.configs.recommended, // or starlume.configs.strict
 * );
 * ```
 *
 * Rules: `starlume/mixed-quantities` (error: different dimension or system
 * under an operator), `starlume/brand-drop` (warning: a quantity silently
 * becomes a plain number or text), `starlume/quantity-operators` (strict
 * preset: any operator on a quantity). Needs `eslint` and
 * `@typescript-eslint/utils` (optional peer dependencies of starlume).
 *
 * @module
 */
import { brandDrop } from "./rules/brand-drop";
import { mixedQuantities } from "./rules/mixed-quantities";
import { quantityOperators } from "./rules/quantity-operators";

const rules = {
  "mixed-quantities": mixedQuantities,
  "brand-drop": brandDrop,
  "quantity-operators": quantityOperators,
};

const plugin = {
  meta: { name: "starlume/lint", version: "0.1.0" },
  rules,
  configs: {} as Record<"recommended" | "strict", { plugins: Record<string, unknown>; rules: Record<string, string> }>,
};

plugin.configs.recommended = {
  plugins: { starlume: plugin },
  rules: { "starlume/mixed-quantities": "error", "starlume/brand-drop": "warn" },
};
plugin.configs.strict = {
  plugins: { starlume: plugin },
  rules: { "starlume/mixed-quantities": "error", "starlume/brand-drop": "error", "starlume/quantity-operators": "error" },
};

export default plugin;
export { rules };
