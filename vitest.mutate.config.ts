// Vitest settings for mutation testing (npm run mutate MODULE): each module's mutants are judged by
// that module's own tests only (tests/MODULE/**), so the score says how well a module's tests pin
// its own behaviour, and a mutant costs seconds rather than a whole-suite run. No coverage here.
import { defineConfig } from "vitest/config";

const only = process.env["FLEXURA_MUTATE_MODULE"];

export default defineConfig({
  test: {
    include: only === undefined || only === "" ? ["tests/**/*.test.ts"] : [`tests/${only}/**/*.test.ts`],
    exclude: ["tests/browser/**", "tests/fuzz/**", "node_modules/**"],
    setupFiles: ["tests/setup.ts"],
    testTimeout: 60000,
  },
});
