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
  sheet: "src/sheet/index.ts",
  design: "src/design/index.ts",
  combine: "src/combine/index.ts",
  moving: "src/moving/index.ts",
} as const;

/**
 * The command shares the package's own built entries instead of bundling a second copy of the library:
 * its imports of the model, report and errors modules become imports of `flexura/model`, `flexura/report`
 * and `flexura`, which Node resolves to this package's dist/ files (a package may import itself by name).
 */
const SHARED_WITH_CLI: Readonly<Record<string, string>> = {
  "../model/index.js": "flexura/model",
  "../report/index.js": "flexura/report",
  "../errors/index.js": "flexura",
};

const shareLibraryWithCli = {
  name: "flexura-share-library-with-cli",
  resolveId(source: string, importer: string | undefined) {
    if (importer === undefined || !/[\\/]src[\\/]cli[\\/]/.test(importer)) return null;
    const id = Object.hasOwn(SHARED_WITH_CLI, source) ? SHARED_WITH_CLI[source] : undefined;
    return id === undefined ? null : { id, external: true };
  },
};

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
  // The `flexura` command: its own ESM bundle for Node (the only code that uses node: modules).
  {
    entry: { cli: "src/cli/main.ts" },
    format: ["esm"],
    dts: false,
    sourcemap: false,
    clean: false,
    platform: "node",
    target: "node20",
    outDir: "dist",
    external: ["decimal.js", "flexura", "flexura/model", "flexura/report"],
    plugins: [shareLibraryWithCli],
  },
]);
