// Size and start-up of the main entry: bundle dist/index.js with everything but decimal.js,
// minify, gzip, and fail when it is over the budget. Also prints how long importing the
// built main entry takes in a fresh Node process (a figure to quote, not a pass/fail: the
// machine is noisy).
import { execFileSync } from "node:child_process";
import { gzipSync } from "node:zlib";
import { resolve } from "node:path";
import { rolldown } from "rolldown";

const BUDGET_BYTES = 30 * 1024;
const root = resolve(import.meta.dirname, "..");
const bundle = await rolldown({ input: resolve(root, "dist/index.js"), external: ["decimal.js"], platform: "neutral", logLevel: "silent" });
const { output } = await bundle.generate({ format: "esm", minify: true });
const code = output.map((o) => (o.type === "chunk" ? o.code : "")).join("");
const gz = gzipSync(code, { level: 9 }).length;
console.log(`size-check: main entry ${(code.length / 1024).toFixed(1)} KiB minified, ${(gz / 1024).toFixed(1)} KiB gzipped (budget ${BUDGET_BYTES / 1024} KiB, decimal.js excluded)`);

const probe = `const t=performance.now();await import(${JSON.stringify(resolve(root, "dist/index.js"))});console.log((performance.now()-t).toFixed(1));`;
const times = [];
for (let i = 0; i < 5; i++) times.push(Number(execFileSync(process.execPath, ["--input-type=module", "-e", probe], { encoding: "utf8" })));
times.sort((a, b) => a - b);
console.log(`size-check: importing the main entry takes ${times[2]} ms (median of 5 fresh processes)`);
if (gz > BUDGET_BYTES) {
  console.error(`size-check: the main entry is ${gz} bytes gzipped, over the ${BUDGET_BYTES}-byte budget`);
  process.exit(1);
}
