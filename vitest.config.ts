import { defineConfig } from "vitest/config";

export default defineConfig({
  test: {
    include: ["src/**/*.test.ts", "test/**/*.test.ts"],
    environment: "node",
    setupFiles: ["test/support/fast-check-seed.ts"],
    typecheck: {
      enabled: true,
      include: ["test/types/**/*.test-d.ts"],
      tsconfig: "./tsconfig.json",
    },
  },
});
