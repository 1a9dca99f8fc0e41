// Consumer smoke test: install the packed tarball (made by pack-check) into a fresh project
// and use it from plain ESM, from CommonJS, and from a type-checked TypeScript file.
import { execFileSync, spawnSync } from "node:child_process";
import { copyFileSync, mkdtempSync, readdirSync, readFileSync, writeFileSync, rmSync } from "node:fs";
import { tmpdir } from "node:os";
import { join, resolve } from "node:path";
import { compileConsumers } from "./consumers.mjs";

const root = resolve(import.meta.dirname, "..");
const packDir = join(root, ".tmp", "pack");
const tgz = readdirSync(packDir).find((f) => f.endsWith(".tgz"));
if (!tgz) throw new Error("smoke: no tarball in .tmp/pack; run scripts/pack-check.mjs first");
const dir = mkdtempSync(join(tmpdir(), "flexura-smoke-"));
/** The examples a user copies, run against the installed tarball (they import "flexura" by name). */
function runExamples(where) {
  const unrun = join(root, "node_modules", ".bin", "unrun");
  const example = (name, ...args) => {
    copyFileSync(join(root, "examples", name), join(where, name));
    return spawnSync("node", [unrun, join(where, name), ...args], { cwd: where, encoding: "utf8" });
  };
  const typed = example("typed-api.ts");
  if (typed.status !== 0 || !typed.stdout.includes("Caution")) throw new Error(`smoke: typed-api.ts failed:\n${typed.stdout}${typed.stderr}`);
  // Simple span under a uniform load: M = w L^2 / 8 = 10 * 6^2 / 8 = 45 (common practice).
  const flat = example("flat-functions.ts");
  if (flat.status !== 0 || !/= 45\n/.test(flat.stdout)) throw new Error(`smoke: flat-functions.ts failed:\n${flat.stdout}${flat.stderr}`);
  // The lifting rail fails its deflection check on purpose, so the table's script exits 1.
  const table = example("utilisation-table.ts", join(root, "examples", "models"));
  if (table.status !== 1 || !table.stdout.includes("3 pass, 1 fail, 0 invalid")) throw new Error(`smoke: utilisation-table.ts failed:\n${table.stdout}${table.stderr}`);
  console.log("smoke examples ok: typed-api, flat-functions, utilisation-table against the installed package");
}

const run = (cmd, args) => execFileSync(cmd, args, { cwd: dir, stdio: "inherit" });
try {
  writeFileSync(join(dir, "package.json"), JSON.stringify({ name: "smoke", private: true, type: "module" }));
  run("npm", ["install", "--no-audit", "--no-fund", "--prefer-offline", "--loglevel=error", join(packDir, tgz)]);
  writeFileSync(
    join(dir, "esm.mjs"),
    `import * as f from "flexura";
if (typeof f.isFlexuraError !== "function") throw new Error("esm: isFlexuraError missing");
import { convert } from "flexura/units";
if (convert(1, "in", "mm") !== 25.4) throw new Error("esm: flexura/units convert wrong");
console.log("smoke esm ok:", Object.keys(f).length, "exports");
`,
  );
  writeFileSync(
    join(dir, "cjs.cjs"),
    `const f = require("flexura");
if (typeof f.isFlexuraError !== "function") throw new Error("cjs: isFlexuraError missing");
if (require("flexura/units").convert(1, "ft", "in") !== 12) throw new Error("cjs: flexura/units convert wrong");
console.log("smoke cjs ok");
`,
  );
  writeFileSync(
    join(dir, "check.ts"),
    `import { attempt, isFlexuraError, type Result } from "flexura";
const r: Result<number> = attempt(() => 1);
const ok: boolean = r.ok && !isFlexuraError(r.value);
import { parseQuantity, type Quantity } from "flexura/units";
const q: Quantity = parseQuantity("12 kN", "force");
export { ok, q };
`,
  );
  writeFileSync(
    join(dir, "tsconfig.json"),
    JSON.stringify({ compilerOptions: { strict: true, module: "NodeNext", moduleResolution: "NodeNext", target: "ES2022", noEmit: true, skipLibCheck: false, types: [] }, files: ["check.ts"] }),
  );
  run("node", ["esm.mjs"]);
  run("node", ["cjs.cjs"]);
  // The installed `flexura` bin runs and answers.
  const version = execFileSync(join(dir, "node_modules", ".bin", "flexura"), ["--version"], { cwd: dir, encoding: "utf8" }).trim();
  if (version === "" || version === "unknown") throw new Error(`smoke: flexura --version printed ${JSON.stringify(version)}`);
  console.log(`smoke bin ok: flexura ${version}`);
  // The installed bin shares the package's own dist/ entries (flexura/model, flexura/report): a real check, piped in.
  const model = readFileSync(join(root, "examples", "models", "mezzanine-beam.json"), "utf8");
  const verdict = JSON.parse(execFileSync(join(dir, "node_modules", ".bin", "flexura"), ["check", "-", "--json"], { cwd: dir, encoding: "utf8", input: model }));
  if (verdict.ok !== true || typeof verdict.utilisation !== "number") throw new Error(`smoke: flexura check - --json gave ${JSON.stringify(verdict)}`);
  console.log(`smoke bin check ok: governing utilisation ${verdict.utilisation.toFixed(3)}`);
  run("node", [join(root, "node_modules", "typescript", "bin", "tsc"), "-p", "tsconfig.json"]);
  console.log("smoke typescript ok");
  compileConsumers(dir, join(root, "node_modules", "typescript", "bin", "tsc"));
  runExamples(dir);
} finally {
  rmSync(dir, { recursive: true, force: true });
}
