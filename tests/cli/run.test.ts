import { fc, test } from "@fast-check/vitest";
import { readdirSync, readFileSync } from "node:fs";
import { join } from "node:path";
import { describe, expect } from "vitest";
import { EXIT } from "../../src/cli/exit-codes.js";
import { HELP } from "../../src/cli/help.js";
import { runCli } from "../../src/cli/run.js";
import { analysisToJson, analyzeModel, modelSchema, parseModel } from "../../src/model/index.js";
import { memoryIo } from "./io.js";

const fixtures = join(import.meta.dirname, "fixtures");
const examples = join(import.meta.dirname, "..", "..", "examples", "models");
const fixture = (name: string): string => join(fixtures, name);

describe("runCli: help, version, usage", () => {
  test("runCli(--help) and COMMAND --help print help and exit 0", () => {
    for (const [argv, topic] of [[["--help"], "main"], [["analyze", "--help"], "analyze"], [["check", "--help"], "check"], [["schema", "-h"], "schema"]] as const) {
      const io = memoryIo();
      expect(runCli(argv, io)).toBe(EXIT.ok);
      expect(io.out.join("")).toBe(HELP[topic]);
      expect(io.err).toEqual([]);
    }
  });
  test("runCli(--version) prints the version", () => {
    const io = memoryIo();
    expect(runCli(["--version"], io)).toBe(EXIT.ok);
    expect(io.out.join("")).toBe("9.9.9-test\n");
  });
  test("runCli with a wrong command line exits 2 with the message and the help on stderr", () => {
    const io = memoryIo();
    expect(runCli(["analyze"], io)).toBe(EXIT.usage);
    expect(io.out).toEqual([]);
    expect(io.err.join("")).toContain("flexura: Give the model file to analyse");
    expect(io.err.join("")).toContain(HELP.analyze);
  });
  test("runCli(schema) prints the model JSON Schema", () => {
    const io = memoryIo();
    expect(runCli(["schema"], io)).toBe(EXIT.ok);
    expect(JSON.parse(io.out.join(""))).toEqual(JSON.parse(JSON.stringify(modelSchema)));
  });
});

describe("runCli: bad input", () => {
  test("runCli on a missing file exits 3 and says so plainly", () => {
    const io = memoryIo();
    expect(runCli(["analyze", fixture("no-such-model.json")], io)).toBe(EXIT.file);
    expect(io.err.join("")).toBe(`flexura: cannot read ${fixture("no-such-model.json")}: no such file\n`);
    expect(io.out).toEqual([]);
  });
  test("runCli on a folder exits 3", () => {
    const io = memoryIo();
    expect(runCli(["check", fixtures], io)).toBe(EXIT.file);
    expect(io.err.join("")).toContain("it is a folder, not a file");
  });
  test("runCli on invalid JSON exits 4 with the line and column", () => {
    const io = memoryIo();
    expect(runCli(["analyze", fixture("bad-syntax.json")], io)).toBe(EXIT.invalidModel);
    expect(io.err.join("")).toBe(`flexura: ${fixture("bad-syntax.json")} is not valid JSON: line 6, column 1: expected a property name in double quotes; found "}"\n`);
  });
  test("runCli on a model with three errors reports all three at once, each with its path", () => {
    const io = memoryIo();
    expect(runCli(["analyze", fixture("three-errors.json")], io)).toBe(EXIT.invalidModel);
    const err = io.err.join("");
    expect(err).toContain("has 3 problems:");
    expect(err).toMatch(/^ {2}supports\[1\]\.type: /m);
    expect(err).toMatch(/^ {2}loads\[1\]\.value: /m);
    expect(err).toMatch(/^ {2}loads\[2\]\.at: /m);
    expect(err).not.toMatch(/\n\s+at /);
    expect(io.out).toEqual([]);
  });
  test("runCli turns an unexpected exception into exit 5 with a plain message", () => {
    const io = { ...memoryIo(), stdout: (): void => { throw new Error("stream closed"); } };
    const errors: string[] = [];
    expect(runCli(["--help"], { ...io, stderr: (t) => void errors.push(t) })).toBe(EXIT.internal);
    expect(errors.join("")).toContain("flexura: internal error: stream closed");
  });
  test.prop(
    [
      fc.record(
        {
          length: fc.oneof(fc.double(), fc.string(), fc.constant(null)),
          supports: fc.array(fc.record({ at: fc.oneof(fc.double(), fc.string()), type: fc.oneof(fc.constantFrom("pin", "roller", "fixed", "guided", "spring"), fc.string()) }, { requiredKeys: [] }), { maxLength: 3 }),
          loads: fc.array(fc.dictionary(fc.constantFrom("type", "at", "value", "from", "to", "start", "end"), fc.jsonValue()), { maxLength: 3 }),
          units: fc.dictionary(fc.constantFrom("length", "force", "stress", "deflection"), fc.oneof(fc.string(), fc.constantFrom("m", "kN", "ft", "kip"))),
          limits: fc.dictionary(fc.constantFrom("deflection", "bendingStress"), fc.jsonValue()),
          extra: fc.jsonValue(),
        },
        { requiredKeys: [] },
      ),
    ],
    { numRuns: 150 },
  )("runCli on random invalid models never crashes and never prints a stack trace", (model) => {
    const io = memoryIo({ "random.json": JSON.stringify(model) });
    const code = runCli(["analyze", "random.json"], io);
    expect([EXIT.ok, EXIT.invalidModel]).toContain(code);
    const err = io.err.join("");
    expect(err).not.toMatch(/\n\s+at \S+ \(/);
    expect(err).not.toContain("internal error");
    if (code === EXIT.invalidModel) expect(err).toMatch(/^flexura: random\.json has (a problem|\d+ problems):\n {2}\S/);
  });
});

describe("runCli: analyze and check", () => {
  test("runCli(check) exits 1 when a check fails and 0 when all pass", () => {
    const failing = memoryIo();
    expect(runCli(["check", fixture("fails-check.json")], failing)).toBe(EXIT.checkFailed);
    expect(failing.out.join("")).toMatch(/^FAIL .*fails-check\.json: 1 of 1 checks fail/);
    const passing = memoryIo();
    expect(runCli(["check", fixture("passes-check.json")], passing)).toBe(EXIT.ok);
    expect(passing.out.join("")).toMatch(/^PASS .*passes-check\.json: 1 checks, governing utilisation/);
    const both = memoryIo();
    expect(runCli(["check", fixture("passes-check.json"), fixture("fails-check.json"), fixture("bad-syntax.json")], both)).toBe(EXIT.invalidModel);
    const json = memoryIo();
    expect(runCli(["check", "--json", fixture("fails-check.json")], json)).toBe(EXIT.checkFailed);
    expect(JSON.parse(json.out.join(""))).toHaveProperty("checks");
  });
  test("runCli(analyze) prints the report with the caution, and writes diagrams with --svg", () => {
    const io = memoryIo();
    expect(runCli(["analyze", fixture("passes-check.json"), "--svg", "diagrams"], io)).toBe(EXIT.ok);
    const report = io.out.join("");
    expect(report).toContain("flexura report: Stiff test beam");
    expect(report).toContain("Local codes govern.");
    expect([...io.written.keys()]).toEqual(["member", "shear", "moment", "deflection", "figure"].map((n) => `diagrams/passes-check-${n}.svg`));
    expect(io.written.get("diagrams/passes-check-figure.svg")).toMatch(/^<\?xml[^]*<svg[^]*Shear force V/);
    expect(io.err.join("")).toContain("wrote 5 diagrams");
  });
  test("runCli(analyze --svg) reports a folder it cannot write to with exit 3", () => {
    const io = { ...memoryIo(), writeText: (): string => { throw Object.assign(new Error("EACCES"), { code: "EACCES" }); } };
    const errors: string[] = [];
    expect(runCli(["analyze", fixture("passes-check.json"), "--svg", "/root/x"], { ...io, stderr: (t) => void errors.push(t) })).toBe(EXIT.file);
    expect(errors.join("")).toContain("permission denied");
  });
  const models = readdirSync(examples).filter((f) => f.endsWith(".json"));
  test.each(models)("round trip: example %s parses, solves, and its --json output equals the typed API's results", (name) => {
    const file = join(examples, name);
    const io = memoryIo();
    expect(runCli(["analyze", "--json", file], io)).toBe(EXIT.ok);
    const expected = analysisToJson(analyzeModel(parseModel(JSON.parse(readFileSync(file, "utf8")))));
    expect(JSON.parse(io.out.join(""))).toEqual(JSON.parse(JSON.stringify(expected)));
  });
});
