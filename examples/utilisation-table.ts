// A Node script that checks every model file in a folder and prints a table of utilisations,
// the way an engineer checks a schedule of members. Exits 1 when any member fails, 4 when a file
// is not a valid model, so it can gate a CI job.
// Run (after `npm run build`; the examples import the package by name, as your code will): node node_modules/.bin/unrun examples/utilisation-table.ts examples/models
import { readdirSync, readFileSync } from "node:fs";
import { join } from "node:path";
import { formatPath } from "flexura";
import { analyzeModel, tryParseModel } from "flexura/model";
import { textTable } from "flexura/report";

const folder = process.argv[2] ?? join(import.meta.dirname, "models");
const files = readdirSync(folder)
  .filter((f) => f.endsWith(".json"))
  .sort();

const rows: string[][] = [["model", "checks", "governing check", "utilisation", "result"]];
let failed = 0;
let invalid = 0;
for (const file of files) {
  let json: unknown;
  try {
    json = JSON.parse(readFileSync(join(folder, file), "utf8"));
  } catch (e) {
    invalid++;
    rows.push([file, "-", `not valid JSON: ${e instanceof Error ? e.message : String(e)}`, "-", "INVALID"]);
    continue;
  }
  const parsed = tryParseModel(json);
  if (!parsed.ok) {
    invalid++;
    const first = parsed.error.issues[0];
    const more = parsed.error.issues.length > 1 ? ` (+${parsed.error.issues.length - 1} more)` : "";
    rows.push([file, "-", first === undefined ? "invalid" : `${formatPath(first.path)}: ${first.message}${more}`, "-", "INVALID"]);
    continue;
  }
  const analysis = analyzeModel(parsed.value);
  let governing = analysis.checks[0];
  for (const c of analysis.checks) if (governing === undefined || c.utilisation > governing.utilisation) governing = c;
  if (!analysis.pass && analysis.checks.length > 0) failed++;
  rows.push([
    file,
    String(analysis.checks.length),
    governing?.description ?? "no limits given",
    governing === undefined ? "-" : governing.utilisation.toFixed(3),
    analysis.checks.length === 0 ? "NOT CHECKED" : analysis.pass ? "PASS" : "FAIL",
  ]);
}

console.log(textTable(rows));
console.log(`\n${files.length} models: ${files.length - failed - invalid} pass, ${failed} fail, ${invalid} invalid`);
process.exitCode = invalid > 0 ? 4 : failed > 0 ? 1 : 0;
