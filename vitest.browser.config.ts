import { defineConfig } from "vitest/config";

/** The browser proof: runs after `npm run build`, against dist/, in Debian's Chromium (tests/browser/harness.ts). */
export default defineConfig({
  test: {
    include: ["tests/browser/**/*.test.ts"],
    testTimeout: 60000,
    hookTimeout: 60000,
    fileParallelism: false,
  },
});
