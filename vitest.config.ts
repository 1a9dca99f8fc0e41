import { defineConfig } from "vitest/config";

export default defineConfig({
  test: {
    include: ["tests/**/*.test.ts"],
    exclude: ["tests/browser/**", "node_modules/**"],
    setupFiles: ["tests/setup.ts"],
    // Generous: the property suites are sized for a quiet 2-core machine; a busy one must not turn them red.
    testTimeout: 60000,
    coverage: {
      provider: "v8",
      include: ["src/**/*.ts"],
      exclude: ["src/**/index.ts", "src/cli/main.ts"],
      thresholds: { lines: 90, branches: 85 },
      reporter: ["text-summary"],
    },
  },
});
