import { defineConfig } from "tsdown";

/** One build entry per public module; keep in step with the `exports` map in package.json. */
export const entries = {
  index: "src/index.ts",
  units: "src/units/index.ts",
  beam: "src/beam/entry.ts",
  section: "src/section/index.ts",
  model: "src/model/index.ts",
  report: "src/report/index.ts",
  stress: "src/stress/index.ts",
  check: "src/check/index.ts",
} as const;

export default defineConfig([
  {
    entry: entries,
    format: ["esm", "cjs"],
    dts: true,
    sourcemap: false,
    clean: true,
    platform: "neutral",
    target: "es2022",
    outDir: "dist",
    external: ["decimal.js"],
  },
]);
