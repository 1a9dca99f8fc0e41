// `npm run demo`: analyse every invented example model with the flexura command, print the
// reports and write the SVG diagrams into out/ (git-ignored). Then show the check verdicts.
import { readdirSync } from "node:fs";
import { join, relative } from "node:path";
import { nodeIo } from "../src/cli/node-io.js";
import { runCli } from "../src/cli/run.js";

const root = join(import.meta.dirname, "..");
const models = join(import.meta.dirname, "models");
const files = readdirSync(models)
  .filter((f) => f.endsWith(".json"))
  .sort()
  .map((f) => relative(process.cwd(), join(models, f)));
const out = relative(process.cwd(), join(root, "out")) || "out";
const io = nodeIo();
let worst = 0;
for (const file of files) {
  console.log(`\n$ flexura analyze ${file} --svg ${out}\n`);
  worst = Math.max(worst, runCli(["analyze", file, "--svg", out], io));
}
console.log(`\n$ flexura check ${files.join(" ")}\n`);
const verdict = runCli(["check", ...files], io);
console.log(`\n(flexura check exited with ${verdict}: 0 when every check passes, 1 when one fails; one example fails on purpose.)`);
console.log(`Diagrams are in ${out}/; open them in a browser.`);
process.exitCode = worst;
