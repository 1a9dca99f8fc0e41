// Writes dist/flexura-sheet.global.js: flexura's spreadsheet functions as one classic script for a sheet's
// script editor (no imports, no module system, no Node globals). It holds one IIFE (flexura/sheet with
// decimal.js inside it) assigned to the global `FlexuraSheet`, then one plain global function per sheet
// function with the JSDoc custom-function annotations (`@customfunction`, parameter and return types) that
// spreadsheet script environments read, generated from the registry `sheetFunctions` itself.
//
// Run by `npm run build` after tsdown; `node scripts/sheet-bundle.mjs [out-file]`. Tests call `sheetBundle()`.
import { mkdirSync, readFileSync, writeFileSync } from "node:fs";
import { dirname, join, resolve } from "node:path";
import { pathToFileURL } from "node:url";
import { runInNewContext } from "node:vm";
import { rolldown } from "rolldown";

const root = resolve(import.meta.dirname, "..");
const version = JSON.parse(readFileSync(join(root, "package.json"), "utf8")).version;

/** The global name of the library object inside the script. */
export const GLOBAL_NAME = "FlexuraSheet";

/** The global function name of a sheet function: `FLEXURA.MOMENT` is `FLEXURA_MOMENT`. */
export const globalName = (name) => name.replace(/\./g, "_");

/** The name a macro environment shows under the `FLEXURA` namespace: `FLEXURA.MOMENT` is `MOMENT`. */
export const customFunctionId = (name) => name.replace(/^FLEXURA\./, "").replace(/\./g, "_");

/** JSDoc text cannot hold the comment's end. */
const safe = (text) => text.replace(/\*\//g, "* /");

// The host glue: hands the function the cells as they are, turns a table's blanks into empty cells, and an
// error into the host's error value: a `CustomFunctions.Error` where the host has one (it shows as #VALUE!
// with our message), else a thrown Error, which is how a script environment without an error type shows an
// error value with its message in the cell (#ERROR!).
const HOST = `
function flexuraSheetCall(name, args) {
  var result = ${GLOBAL_NAME}.callSheetFunction(name, Array.prototype.slice.call(args));
  if (${GLOBAL_NAME}.isSheetError(result)) {
    if (typeof CustomFunctions !== "undefined" && CustomFunctions.Error && CustomFunctions.ErrorCode) {
      return new CustomFunctions.Error(CustomFunctions.ErrorCode.invalidValue, result.message);
    }
    throw new Error(result.message);
  }
  if (Array.isArray(result)) {
    return result.map(function (row) { return row.map(function (c) { return c === null ? "" : c; }); });
  }
  return result;
}
`;

function wrapper(f) {
  const params = f.parameters.map((p, i) => {
    const type = p.range ? "any[][]" : "any";
    const name = i >= f.required ? `[${p.name}]` : p.name;
    return ` * @param {${type}} ${name} ${safe(p.summary)}`;
  });
  const id = customFunctionId(f.name);
  return [
    "/**",
    ` * ${safe(f.summary)}`,
    ` * @customfunction ${id} ${id}`,
    ...params,
    ` * @returns {${f.returns === "table" ? "any[][]" : "any"}} ${f.returns === "table" ? "A table with a header row." : "One value."}`,
    " */",
    `function ${globalName(f.name)}(${f.parameters.map((p) => p.name).join(", ")}) {`,
    `  return flexuraSheetCall(${JSON.stringify(f.name)}, arguments);`,
    "}",
  ].join("\n");
}

/** Builds the script's text from src/sheet/ (rolldown, with decimal.js bundled in). */
export async function sheetBundle() {
  const bundle = await rolldown({
    input: join(root, "src", "sheet", "index.ts"),
    platform: "browser",
    logLevel: "warn",
    tsconfig: join(root, "tsconfig.json"),
  });
  const { output } = await bundle.generate({ format: "iife", name: GLOBAL_NAME, minify: false });
  await bundle.close();
  const library = output[0].code;
  // Read the registry from the built library itself, so the wrappers can never drift from it.
  const context = {};
  runInNewContext(`${library}\nthis.registry = ${GLOBAL_NAME}.sheetFunctions;`, context);
  const functions = context.registry;
  const names = functions.map((f) => globalName(f.name)).join(", ");
  const associate = functions.map((f) => `  CustomFunctions.associate(${JSON.stringify(customFunctionId(f.name))}, ${globalName(f.name)});`).join("\n");
  return [
    `// flexura ${version}: spreadsheet functions for a sheet's script editor (${names}).`,
    "// Paste this whole file into the script editor. docs/sheet.md in the flexura package tells how to use it.",
    "// Caution: elastic first-order analysis; you are responsible for the loads, code compliance and review by a",
    "// licensed engineer; local codes govern. flexura is MIT-licensed; decimal.js (MIT) is bundled inside.",
    library.trimEnd(),
    HOST,
    functions.map(wrapper).join("\n\n"),
    "",
    `if (typeof CustomFunctions !== "undefined" && typeof CustomFunctions.associate === "function") {`,
    associate,
    "}",
    "",
  ].join("\n");
}

if (import.meta.url === pathToFileURL(process.argv[1] ?? "").href) {
  const out = resolve(process.argv[2] ?? join(root, "dist", "flexura-sheet.global.js"));
  mkdirSync(dirname(out), { recursive: true });
  const text = await sheetBundle();
  writeFileSync(out, text);
  console.log(`sheet-bundle: ${out} (${(text.length / 1024).toFixed(1)} KiB)`);
}
