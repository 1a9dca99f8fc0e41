// The command driven by other programs: --json failures as one JSON object on stdout with the library's codes
// and paths and the same exit codes, one compact verdict line per file from check --json, models on stdin.
import { readFileSync } from "node:fs";
import { join } from "node:path";
import { describe, expect, test } from "vitest";
import { EXIT } from "../../src/cli/exit-codes.js";
import { MAX_MODEL_FILE_BYTES } from "../../src/cli/load.js";
import { runCli } from "../../src/cli/run.js";
import { analysisToJson, analyzeModel, parseModel } from "../../src/model/index.js";
import { memoryIo } from "./io.js";

const fixture = (name: string): string => join(import.meta.dirname, "fixtures", name);
const lines = (out: readonly string[]): unknown[] => out.join("").trimEnd().split("\n").map((l) => JSON.parse(l) as unknown);

describe("--json failures", () => {
  test("a missing file: one JSON object on stdout, exit 3, nothing on stderr", () => {
    const io = memoryIo();
    expect(runCli(["analyze", "nope.json", "--json"], io)).toBe(EXIT.file);
    expect(io.err).toEqual([]);
    expect(lines(io.out)).toEqual([{ ok: false, file: "nope.json", exitCode: 3, problems: [{ code: "file-not-found", path: "", message: "no such file" }] }]);
  });
  test("bad JSON: the syntax error with its line and column, exit 4", () => {
    const io = memoryIo();
    expect(runCli(["analyze", fixture("bad-syntax.json"), "--json"], io)).toBe(EXIT.invalidModel);
    const [only] = lines(io.out) as [{ problems: { code: string; line: number; column: number }[] }];
    expect(only.problems).toEqual([expect.objectContaining({ code: "json-syntax", path: "", line: 6, column: 1 })]);
  });
  test("an invalid model: every problem with the library's code and path, exit 4", () => {
    const io = memoryIo();
    expect(runCli(["analyze", fixture("three-errors.json"), "--json"], io)).toBe(EXIT.invalidModel);
    const [only] = lines(io.out) as [{ problems: { code: string; path: string }[] }];
    const text = readFileSync(fixture("three-errors.json"), "utf8");
    let libraryCodes: string[] = [];
    try {
      parseModel(JSON.parse(text));
    } catch (e) {
      libraryCodes = (e as { issues: { code: string }[] }).issues.map((i) => i.code);
    }
    expect(only.problems.map((p) => p.code)).toEqual(libraryCodes);
    expect(only.problems.map((p) => p.path)).toEqual(["supports[1].type", "loads[1].value", "loads[2].at"]);
  });
  test("a mechanism is a JSON failure with exit 4", () => {
    const model = { units: { length: "m", force: "kN" }, length: 4, E: 200e6, I: 1e-4, supports: [{ at: 0, type: "roller" }], loads: [{ type: "point", at: 2, value: 1 }] };
    const io = memoryIo({ "m.json": JSON.stringify(model) });
    expect(runCli(["analyze", "m.json", "--json"], io)).toBe(EXIT.invalidModel);
    const [only] = lines(io.out) as [{ ok: boolean; problems: { code: string }[] }];
    expect(only.ok).toBe(false);
    expect(only.problems.length).toBeGreaterThan(0);
  });
  test("a wrong command line with --json: a JSON usage failure, exit 2", () => {
    const io = memoryIo();
    expect(runCli(["analyze", "a.json", "b.json", "--json"], io)).toBe(EXIT.usage);
    expect(lines(io.out)).toEqual([{ ok: false, exitCode: 2, problems: [{ code: "usage", path: "", message: "analyze takes one model file; got 2. Use check for many." }] }]);
    expect(io.err).toEqual([]);
  });
  test("an internal error with --json is still one JSON object, exit 5", () => {
    const out: string[] = [];
    let calls = 0;
    const io = { ...memoryIo(), stdout: (t: string): void => { calls += 1; if (calls === 1) throw new Error("stream hiccup"); out.push(t); } };
    expect(runCli(["check", fixture("passes-check.json"), "--json"], io)).toBe(EXIT.internal);
    const [only] = lines(out) as [{ exitCode: number; problems: { code: string; message: string }[] }];
    expect(only.exitCode).toBe(5);
    expect(only.problems[0]?.code).toBe("internal-error");
    expect(only.problems[0]?.message).toContain("stream hiccup");
  });
  test("a file that cannot be read for another reason: file-unreadable with the system's words, exit 3", () => {
    const io = { ...memoryIo(), readText: (): string => { throw new Error("EIO: i/o error, read"); } };
    expect(runCli(["analyze", "x.json"], io)).toBe(EXIT.file);
  });
  test("analyze --json stays the complete analysis", () => {
    const io = memoryIo();
    expect(runCli(["analyze", fixture("passes-check.json"), "--json"], io)).toBe(EXIT.ok);
    const expected = analysisToJson(analyzeModel(parseModel(JSON.parse(readFileSync(fixture("passes-check.json"), "utf8")))));
    expect(JSON.parse(io.out.join(""))).toEqual(JSON.parse(JSON.stringify(expected)));
  });
});

describe("check --json: one compact line per file, valid or not", () => {
  test("three files, one failing its checks and one missing: three lines, worst exit code", () => {
    const io = memoryIo();
    const code = runCli(["check", fixture("passes-check.json"), fixture("fails-check.json"), "missing.json", "--json"], io);
    expect(code).toBe(EXIT.file);
    const [pass, fail, missing] = lines(io.out) as Record<string, unknown>[];
    expect(pass).toMatchObject({ ok: true, pass: true, exitCode: 0, problems: [], failed: [] });
    expect(typeof pass?.utilisation).toBe("number");
    expect(typeof pass?.governing).toBe("string");
    expect(fail).toMatchObject({ ok: true, pass: false, exitCode: 1 });
    expect((fail?.failed as string[]).length).toBeGreaterThan(0);
    expect(missing).toEqual({ file: "missing.json", ok: false, pass: false, exitCode: 3, checks: 0, governing: null, utilisation: null, failed: [], problems: [{ code: "file-not-found", path: "", message: "no such file" }] });
    for (const l of io.out.join("").trimEnd().split("\n")) expect(l.length).toBeLessThan(600);
  });
  test("the governing line is the check with the highest utilisation", () => {
    const io = memoryIo();
    runCli(["check", fixture("fails-check.json"), "--json"], io);
    const [v] = lines(io.out) as [{ utilisation: number; governing: string }];
    const analysis = analyzeModel(parseModel(JSON.parse(readFileSync(fixture("fails-check.json"), "utf8"))));
    expect(v.utilisation).toBe(Math.max(...analysis.checks.map((c) => c.utilisation)));
  });
});

describe("check on a model with no limits: nothing checked, no pass claimed", () => {
  // A verdict must never pass by default (common practice for any checking tool: an empty check list is not a pass).
  const noLimits = (): string => {
    const m = JSON.parse(readFileSync(fixture("passes-check.json"), "utf8")) as Record<string, unknown>;
    delete m.limits;
    return JSON.stringify(m);
  };
  test("text: NOT CHECKED and exit 6", () => {
    const io = memoryIo({}, noLimits());
    expect(runCli(["check", "-"], io)).toBe(EXIT.notChecked);
    expect(io.out.join("")).toMatch(/^NOT CHECKED standard input: the model gives no limits/);
  });
  test("--json: pass false with no checks, exit 6; a failing file elsewhere still outranks it", () => {
    const io = memoryIo({}, noLimits());
    expect(runCli(["check", "-", "--json"], io)).toBe(EXIT.notChecked);
    expect(lines(io.out)).toEqual([{ file: "-", ok: true, pass: false, exitCode: 6, checks: 0, governing: null, utilisation: null, failed: [], problems: [] }]);
    const both = memoryIo({}, noLimits());
    expect(runCli(["check", "-", fixture("fails-check.json"), "--json"], both)).toBe(EXIT.checkFailed);
    const passing = memoryIo({}, noLimits());
    expect(runCli(["check", fixture("passes-check.json"), "-"], passing)).toBe(EXIT.notChecked);
  });
});

describe("standard input and bad files", () => {
  const model = readFileSync(fixture("passes-check.json"), "utf8");
  test("`-` reads the model from standard input", () => {
    const io = memoryIo({}, model);
    expect(runCli(["check", "-"], io)).toBe(EXIT.ok);
    expect(io.out.join("")).toMatch(/^PASS standard input: /);
  });
  test("an empty standard input: a plain message and exit 4", () => {
    const io = memoryIo({}, "  \n");
    expect(runCli(["analyze", "-"], io)).toBe(EXIT.invalidModel);
    expect(io.err.join("")).toBe("flexura: standard input: it is empty; a model file holds one JSON object\n");
  });
  test("a binary file: a plain message and exit 4", () => {
    const io = memoryIo({ "b.bin": "\u0000\u0001PNG\u0000" });
    expect(runCli(["analyze", "b.bin", "--json"], io)).toBe(EXIT.invalidModel);
    expect((lines(io.out)[0] as { problems: { code: string }[] }).problems[0]?.code).toBe("file-not-text");
  });
  test("a file over the size limit is refused before it is parsed, exit 3", () => {
    const io = memoryIo({}, " ".repeat(MAX_MODEL_FILE_BYTES + 1));
    expect(runCli(["analyze", "-"], io)).toBe(EXIT.file);
    expect(io.err.join("")).toBe("flexura: cannot read standard input: it is larger than a model file may be\n");
  });
  test("a folder with --json: file-is-folder, exit 3", () => {
    const io = memoryIo();
    expect(runCli(["check", join(import.meta.dirname, "fixtures"), "--json"], io)).toBe(EXIT.file);
    expect((lines(io.out)[0] as { problems: { code: string }[] }).problems[0]?.code).toBe("file-is-folder");
  });
  test("diagrams into a path that is a file: a plain message, exit 3, and no report printed", () => {
    const base = memoryIo();
    const io = { ...base, writeText: (): string => { throw Object.assign(new Error("EEXIST: file already exists, mkdir 'out'"), { code: "EEXIST" }); } };
    expect(runCli(["analyze", fixture("passes-check.json"), "--svg", "out"], io)).toBe(EXIT.file);
    expect(base.out).toEqual([]);
    expect(base.err.join("")).toMatch(/^flexura: cannot write passes-check-member\.svg in out: a file of that name is where a folder is needed/);
  });
  test("no arguments: exit 2 with the usage on stderr", () => {
    const io = memoryIo();
    expect(runCli([], io)).toBe(EXIT.usage);
    expect(io.err.join("")).toContain("Usage:");
  });
});
