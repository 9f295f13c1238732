/**
 * The rule factory shared by starlume's lint rules (typed linting).
 *
 * @internal
 */
import { ESLintUtils } from "@typescript-eslint/utils";

/** Builds a rule whose docs URL points at the lint guide. @internal */
export const createRule = ESLintUtils.RuleCreator((name) => `https://github.com/starlume/starlume/blob/main/docs/guides/lint.md#${name}`);
