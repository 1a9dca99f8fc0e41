// The script bundle for spreadsheet macro environments (dist/flexura-sheet.global.js), built afresh by
// scripts/sheet-bundle.mjs and loaded as a classic script into a bare node:vm context (no require, process,
// module or any Node global), every function called as a script environment calls it; its JSDoc
// custom-function annotations read by the npm package custom-functions-metadata, as the hosts read them.
import { execFileSync } from "node:child_process";
import { mkdtempSync, readFileSync, rmSync } from "node:fs";
import { tmpdir } from "node:os";
import { join, resolve } from "node:path";
import { createContext, runInContext, type Context } from "node:vm";
import { generateCustomFunctionsMetadata, parseTree } from "custom-functions-metadata";
import { afterAll, beforeAll, describe, expect, test } from "vitest";
import { callSheetFunction, isSheetError, sheetFunctions } from "../../src/sheet/index.js";

const root = resolve(import.meta.dirname, "../..");
const dir = mkdtempSync(join(tmpdir(), "flexura-sheet-bundle-"));
const file = join(dir, "flexura-sheet.global.js");
let text = "";

beforeAll(() => {
  execFileSync("node", [join(root, "scripts", "sheet-bundle.mjs"), file], { cwd: root, encoding: "utf8" });
  text = readFileSync(file, "utf8");
});
afterAll(() => rmSync(dir, { recursive: true, force: true }));

const globalName = (name: string): string => name.replace(/\./g, "_");
const id = (name: string): string => name.replace(/^FLEXURA\./, "");

/** A fresh bare context with the script run in it, and optionally a host's `CustomFunctions`. */
function load(host: Record<string, unknown> = {}): Context {
  const context = createContext({ ...host });
  runInContext(text, context, { filename: "flexura-sheet.global.js" });
  return context;
}
/** Calls a global of the context with arguments made inside it (as the host hands them), result as plain JSON. */
function call(context: Context, name: string, args: unknown[]): unknown {
  context["__args"] = JSON.parse(JSON.stringify(args)) as unknown;
  return JSON.parse(JSON.stringify(runInContext(`${name}.apply(null, JSON.parse(JSON.stringify(__args)))`, context))) as unknown;
}

// An invented floor beam: 6 m, E 200 GPa, I 80e6 mm^4, pin and roller, 12 kN/m and 20 kN at 2 m.
// A host hands blank cells as empty text.
const member = [6, "200 GPa", "80e6 mm^4", [[0, "pin", ""], [6, "roller", ""], ["", "", ""]], [["distributed", "", "", 12, "", ""], ["point", 2, "", 20, "", ""]], ""];
const rect = [["width", 100], ["depth", 200]];
const limits = [["deflection", "span/360"], ["bendingStress", "165 MPa"]];
// Two spans, dead and live load, the live load patterned span by span.
const cases = [["D", "dead", "", ""], ["L", "live", "", true]];
const combined = [cases, "asce7-16-strength", "", 11, "200 GPa", "80e6 mm^4", [[0, "pin", ""], [5, "roller", ""], [11, "roller", ""]], [["distributed", "", "", 2, "", "D"], ["distributed", "", "", 10, "", "L"]], ""];
const ARGS: Readonly<Record<string, unknown[]>> = {
  "FLEXURA.COMBINATIONS": [cases, [["combination", "D", "L"], ["", 1.2, 1.6], ["service", 1, 1]], ""],
  "FLEXURA.ENVELOPE": ["moment", "min", 5, ...combined],
  "FLEXURA.GOVERNING": ["moment", "max", 2, ...combined],
  "FLEXURA.ENVELOPEPEAKS": combined,
  "FLEXURA.REACTIONENVELOPE": combined,
  "FLEXURA.MODEL": [JSON.stringify({ length: 6, E: "200 GPa", I: "80e6 mm^4", supports: [{ at: 0, type: "pin" }, { at: 6, type: "roller" }], loads: [{ type: "distributed", start: 12 }] }), "moment.max.value"],
  "FLEXURA.REACTIONS": member,
  "FLEXURA.PEAKS": member,
  "FLEXURA.STATIONS": [12, ...member],
  "FLEXURA.SECTION": ["rectangle", rect, ""],
  "FLEXURA.SECTIONPROPERTY": ["secondMomentZ", "rectangle", rect, ""],
  "FLEXURA.BENDINGSTRESS": [10, 100, "rectangle", rect, ""],
  "FLEXURA.SHEARSTRESS": [30, 0, "rectangle", rect, ""],
  "FLEXURA.CHECKS": [limits, "rectangle", rect, 6, "200 GPa", "", ...member.slice(3)],
  "FLEXURA.UTILISATION": [limits, "rectangle", rect, 6, "200 GPa", "", ...member.slice(3)],
};
const argsFor = (name: string): unknown[] => ARGS[name] ?? [2.5, ...member];
const blankAsEmpty = (v: unknown): unknown => (Array.isArray(v) ? v.map((row: unknown[]) => row.map((c) => (c === null ? "" : c))) : v);

describe("the script bundle", () => {
  test("is one classic script: it runs in a context with no require, process, module or exports", () => {
    expect(text).not.toMatch(/^\s*(import|export)\s/m);
    const context = load();
    for (const g of ["require", "process", "module", "exports", "globalThis.process"]) {
      expect(runInContext(`typeof ${g}`, context)).toBe("undefined");
    }
    expect(runInContext("typeof FlexuraSheet.sheetFunctions", context)).toBe("object");
  });
  test("every sheet function is a global that gives what flexura/sheet gives", () => {
    const context = load();
    for (const f of sheetFunctions) {
      expect(runInContext(`typeof ${globalName(f.name)}`, context), f.name).toBe("function");
      expect(isSheetError(callSheetFunction(f.name, argsFor(f.name))), f.name).toBe(false);
      const got = call(context, globalName(f.name), argsFor(f.name));
      expect(got, f.name).toEqual(blankAsEmpty(JSON.parse(JSON.stringify(callSheetFunction(f.name, argsFor(f.name))))));
    }
    // Simple span (common practice): w L^2 / 8 = 12 * 36 / 8 = 54 kN*m from the model's JSON text.
    expect(call(context, "FLEXURA_MODEL", argsFor("FLEXURA.MODEL"))).toBeCloseTo(54, 10);
    // R_left = w L / 2 + P b / L = 36 + 20 * 4 / 6 (common practice).
    expect((call(context, "FLEXURA_REACTIONS", member) as unknown[][])[1]![2]).toBeCloseTo(36 + 80 / 6, 10);
  });
  test("an error is the host's error value with our message, where the host has one", () => {
    class HostError {
      constructor(
        readonly code: string,
        readonly message: string,
      ) {}
    }
    const associated: string[] = [];
    const context = load({ CustomFunctions: { Error: HostError, ErrorCode: { invalidValue: "#VALUE!" }, associate: (name: string) => associated.push(name) } });
    expect(associated).toEqual(sheetFunctions.map((f) => id(f.name)));
    const bad = [[0, "pinned", ""]];
    const r = call(context, "FLEXURA_MOMENT", [2, 6, "200 GPa", "80e6 mm^4", bad, member[4], ""]) as { code: string; message: string };
    expect(r.code).toBe("#VALUE!");
    expect(r.message).toMatch(/^supports row 1, kind: "pinned" is not a support kind/);
  });
  test("without a host error type, the error is thrown with our message (the script environment's error value)", () => {
    const context = load();
    expect(() => {
      runInContext(`FLEXURA_MOMENT(9, 6, "200 GPa", "80e6 mm^4", [[0, "pin"], [6, "roller"]], [["point", 2, "", 20]])`, context);
    }).toThrow(
      /^position: 9 m is outside the member/,
    );
    expect(() => {
      runInContext("FLEXURA_SHEAR()", context);
    }).toThrow(/^FLEXURA\.SHEAR takes 6 to 7 arguments/);
  });
  test("its annotations give the custom-function metadata of every function, without errors", async () => {
    const parsed = parseTree(text, "flexura-sheet.global.js");
    expect(parsed.extras.flatMap((e) => e.errors)).toEqual([]);
    expect(parsed.functions.map((f) => f.id)).toEqual(sheetFunctions.map((f) => id(f.name)));
    for (const [i, f] of sheetFunctions.entries()) {
      const meta = parsed.functions[i]!;
      expect(meta.description).toBe(f.summary);
      expect(meta.parameters.map((p) => p.name)).toEqual(f.parameters.map((p) => p.name));
      expect(meta.parameters.map((p) => p.optional === true)).toEqual(f.parameters.map((_, j) => j >= f.required));
      expect(meta.parameters.map((p) => p.dimensionality === "matrix")).toEqual(f.parameters.map((p) => p.range));
      expect(meta.result?.dimensionality === "matrix").toBe(f.returns === "table");
      expect(parsed.extras[i]!.javascriptFunctionName).toBe(globalName(f.name));
    }
    const generated = await generateCustomFunctionsMetadata(file);
    expect(generated.errors).toEqual([]);
    expect((JSON.parse(generated.metadataJson) as { functions: unknown[] }).functions).toHaveLength(sheetFunctions.length);
  });
});
