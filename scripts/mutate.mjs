// npm run mutate -- MODULE [stryker options]: mutation testing of src/MODULE by tests/MODULE, with
// StrykerJS (stryker.config.mjs), keeping one incremental file per module so later runs re-test only
// what changed. Without MODULE, every module in turn. Scores go to docs/mutation.md by hand.
import { spawnSync } from "node:child_process";
import { existsSync } from "node:fs";

const MODULES = ["math", "units", "beam", "section", "stress", "check"];
const [first, ...rest] = process.argv.slice(2);
const modules = first === undefined || first.startsWith("-") ? MODULES : [first];
const extra = first === undefined || first.startsWith("-") ? process.argv.slice(2) : rest;
let status = 0;
for (const module of modules) {
  if (!existsSync(`src/${module}`) || !existsSync(`tests/${module}`)) {
    console.error(`mutate: no src/${module} or tests/${module}; modules are ${MODULES.join(", ")}`);
    process.exit(2);
  }
  const run = spawnSync(
    "npx",
    ["stryker", "run", "--mutate", `src/${module}/**/*.ts,!src/${module}/**/index.ts`, "--incrementalFile", `reports/stryker-${module}.json`, ...extra],
    { stdio: "inherit", env: { ...process.env, FLEXURA_MUTATE_MODULE: module } },
  );
  status = Math.max(status, run.status ?? 1);
}
process.exit(status);
