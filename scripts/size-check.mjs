// Size that users pay: for each way the README imports flexura, bundle a one-line app from the
// built package (dist/), tree-shaken by rolldown, minified, gzipped (level 9), and fail when it is
// over its budget. decimal.js is counted where the path pulls it in (the user ships it too); the
// figure without it is printed beside. Also prints how long importing the built main entry takes
// in a fresh Node process (a figure to quote, not a pass/fail: the machine is noisy).
// docs/performance.md ("Size that users pay") quotes the figures; update them with the budgets.
// Usage: node scripts/size-check.mjs (after npm run build)
import { execFileSync } from "node:child_process";
import { mkdtempSync, writeFileSync, rmSync, existsSync } from "node:fs";
import { tmpdir } from "node:os";
import { gzipSync } from "node:zlib";
import { join, resolve } from "node:path";
import { pathToFileURL } from "node:url";
import { rolldown } from "rolldown";

const root = resolve(import.meta.dirname, "..");
const dist = (file) => JSON.stringify(pathToFileURL(resolve(root, "dist", file)).href);
const KiB = 1024;

// Budgets: the gzipped figure with decimal.js, plus about 15-20 % headroom over the figures of
// 2 December 2026 (docs/performance.md) for validation and messages still being added. Raise a
// budget deliberately, with the new figure in docs/performance.md, never by habit.
const paths = [
  { name: "solveBeam (README's first example)", code: `export { solveBeam } from ${dist("index.js")};`, budget: 15 * KiB },
  { name: "sections alone (flexura/section)", code: `export * from ${dist("section.js")};`, budget: 23 * KiB },
  { name: "checkMember (flexura/check)", code: `export { checkMember } from ${dist("check.js")};`, budget: 25 * KiB },
  { name: "flexura/combine (cases, presets, envelopes)", code: `export * from ${dist("combine.js")};`, budget: 24 * KiB },
  { name: "flexura/moving (influence lines, moving loads)", code: `export * from ${dist("moving.js")};`, budget: 27 * KiB },
  { name: "flexura/model (parse, analyze, to JSON)", code: `export * from ${dist("model.js")};`, budget: 95 * KiB },
];

if (!existsSync(resolve(root, "dist/index.js"))) {
  console.error("size-check: dist/ is missing; run `npm run build` first");
  process.exit(2);
}
const dir = mkdtempSync(join(tmpdir(), "flexura-size-"));
async function measure(code, external) {
  const input = join(dir, "entry.mjs");
  writeFileSync(input, code);
  const bundle = await rolldown({ input, external, platform: "browser", logLevel: "silent", cwd: root });
  const { output } = await bundle.generate({ format: "esm", minify: true });
  await bundle.close();
  const text = output.map((o) => (o.type === "chunk" ? o.code : "")).join("");
  return { min: Buffer.byteLength(text), gz: gzipSync(text, { level: 9 }).length };
}
const kib = (n) => `${(n / KiB).toFixed(1)} KiB`;
let failed = false;
try {
  for (const p of paths) {
    const all = await measure(p.code, []);
    const own = await measure(p.code, ["decimal.js"]);
    const over = all.gz > p.budget;
    failed ||= over;
    console.log(
      `size-check: ${p.name}: ${kib(all.min)} minified, ${kib(all.gz)} gzipped (budget ${kib(p.budget)}${over ? ", OVER" : ""}); without decimal.js ${kib(own.gz)} gzipped`,
    );
  }
} finally {
  rmSync(dir, { recursive: true, force: true });
}

const probe = `const t=performance.now();await import(${dist("index.js")});console.log((performance.now()-t).toFixed(1));`;
const times = [];
for (let i = 0; i < 5; i++) times.push(Number(execFileSync(process.execPath, ["--input-type=module", "-e", probe], { encoding: "utf8" })));
times.sort((a, b) => a - b);
console.log(`size-check: importing the main entry takes ${times[2]} ms (median of 5 fresh processes)`);
if (failed) {
  console.error("size-check: a path is over its budget (see above); make it smaller, or raise the budget with the figures in docs/performance.md");
  process.exit(1);
}
