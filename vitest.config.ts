import { defineConfig } from "vitest/config";

export default defineConfig({
  test: {
    include: ["src/**/*.test.ts", "test/**/*.test.ts"],
    environment: "node",
    // property tests and the typed-lint program are heavy on a loaded 2-core machine
    testTimeout: 60_000,
    setupFiles: ["test/support/fast-check-seed.ts"],
    typecheck: {
      enabled: true,
      include: ["test/types/**/*.test-d.ts"],
      tsconfig: "./tsconfig.json",
    },
  },
});
