// Mutation testing (npm run mutate). One module: npm run mutate -- --mutate 'src/math/**/*.ts'
/** @type {import("@stryker-mutator/api/core").PartialStrykerOptions} */
export default {
  testRunner: "vitest",
  vitest: { configFile: "vitest.config.ts" },
  coverageAnalysis: "perTest",
  mutate: ["src/**/*.ts", "!src/**/index.ts", "!src/cli/main.ts"],
  ignorePatterns: ["dist", "docs", "coverage", "reports", ".tmp", "out", "examples/web"],
  incremental: true,
  incrementalFile: "reports/stryker-incremental.json",
  reporters: ["clear-text", "progress", "html"],
  htmlReporter: { fileName: "reports/mutation/index.html" },
  concurrency: 1,
  timeoutMS: 10000,
  thresholds: { high: 90, low: 85, break: null },
};
