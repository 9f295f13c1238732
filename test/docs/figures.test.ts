/**
 * The figures in docs/figures/ are drawn by the library itself
 * (scripts/doc-figures.ts); they must match what the current code draws.
 * Regenerate with `npx tsx scripts/doc-figures.ts`.
 */
import { readFileSync } from "node:fs";
import { describe, expect, test } from "vitest";
import { figures } from "../../scripts/doc-figures";

describe("documentation figures are up to date", () => {
  for (const [name, draw] of Object.entries(figures)) {
    test(name, () => {
      const committed = readFileSync(new URL(`../../docs/figures/${name}`, import.meta.url), "utf8");
      expect(draw() === committed, `docs/figures/${name} is stale: run npx tsx scripts/doc-figures.ts`).toBe(true);
    });
  }
});
