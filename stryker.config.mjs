// Mutation testing: npm run mutate -- MODULE (scripts/mutate.mjs), judged by that module's own tests.
/** @type {import("@stryker-mutator/api/core").PartialStrykerOptions} */
export default {
  testRunner: "vitest",
  vitest: { configFile: "vitest.mutate.config.ts" },
  coverageAnalysis: "perTest",
  mutate: ["src/**/*.ts", "!src/**/index.ts", "!src/cli/main.ts"],
  ignorePatterns: ["dist", "docs", "coverage", "reports", ".tmp", "out", "examples/web"],
  incremental: true,
  incrementalFile: "reports/stryker-incremental.json",
  reporters: ["clear-text", "progress", "html"],
  htmlReporter: { fileName: `reports/mutation/${process.env["FLEXURA_MUTATE_MODULE"] || "index"}.html` },
  concurrency: 1,
  timeoutMS: 10000,
  thresholds: { high: 90, low: 85, break: null },
};
