import { describe, expect, test } from "vitest";
import { parseCommandLine } from "../../src/cli/args.js";

describe("parseCommandLine", () => {
  test("parseCommandLine reads the three commands and their options", () => {
    expect(parseCommandLine(["analyze", "b.json"])).toEqual({ kind: "analyze", file: "b.json", json: false, svg: undefined });
    expect(parseCommandLine(["analyze", "--json", "b.json", "--svg", "out"])).toEqual({ kind: "analyze", file: "b.json", json: true, svg: "out" });
    expect(parseCommandLine(["analyze", "b.json", "--svg=out"])).toEqual({ kind: "analyze", file: "b.json", json: false, svg: "out" });
    expect(parseCommandLine(["check", "a.json", "b.json"])).toEqual({ kind: "check", files: ["a.json", "b.json"], json: false });
    expect(parseCommandLine(["check", "a.json", "--json"])).toEqual({ kind: "check", files: ["a.json"], json: true });
    expect(parseCommandLine(["schema"])).toEqual({ kind: "schema" });
  });
  test("parseCommandLine gives usage for no arguments, help for --help, -h and help, per command too", () => {
    expect(parseCommandLine([])).toEqual({ kind: "usage-error", message: "Give a command: analyze, check or schema.", topic: "main" });
    expect(parseCommandLine(["--help"])).toEqual({ kind: "help", topic: "main" });
    expect(parseCommandLine(["help"])).toEqual({ kind: "help", topic: "main" });
    expect(parseCommandLine(["analyze", "--help"])).toEqual({ kind: "help", topic: "analyze" });
    expect(parseCommandLine(["check", "-h"])).toEqual({ kind: "help", topic: "check" });
    expect(parseCommandLine(["schema", "--help"])).toEqual({ kind: "help", topic: "schema" });
    expect(parseCommandLine(["--version"])).toEqual({ kind: "version" });
    expect(parseCommandLine(["-v"])).toEqual({ kind: "version" });
  });
  test("parseCommandLine turns every wrong command line into a usage error with a plain message", () => {
    expect(parseCommandLine(["analyse", "b.json"])).toMatchInlineSnapshot(`
      {
        "kind": "usage-error",
        "message": "Unknown command "analyse". Did you mean "analyze"? The commands are: analyze, check, schema.",
        "topic": "main",
      }
    `);
    expect(parseCommandLine(["chek", "b.json"])).toMatchObject({ message: 'Unknown command "chek". Did you mean "check"? The commands are: analyze, check, schema.' });
    expect(parseCommandLine(["report", "b.json"])).toMatchObject({ message: 'Unknown command "report". The commands are: analyze, check, schema.' });
    expect(parseCommandLine(["check", "-", "--json"])).toEqual({ kind: "check", files: ["-"], json: true });
    expect(parseCommandLine(["analyze", "-"])).toEqual({ kind: "analyze", file: "-", json: false, svg: undefined });
    expect(parseCommandLine(["--frobnicate"])).toMatchObject({ kind: "usage-error", message: 'Unknown option "--frobnicate". The commands are: analyze, check, schema.' });
    expect(parseCommandLine(["--version", "x"])).toMatchObject({ kind: "usage-error", topic: "main" });
    expect(parseCommandLine(["analyze"])).toMatchObject({ kind: "usage-error", topic: "analyze" });
    expect(parseCommandLine(["analyze", "a.json", "b.json"])).toMatchObject({ kind: "usage-error", message: "analyze takes one model file; got 2. Use check for many." });
    expect(parseCommandLine(["analyze", "a.json", "--svg="])).toMatchObject({ kind: "usage-error", message: "--svg needs a folder name." });
    expect(parseCommandLine(["analyze", "a.json", "--svg"])).toMatchObject({ kind: "usage-error", topic: "analyze" });
    expect(parseCommandLine(["analyze", "a.json", "--colour"])).toMatchObject({ kind: "usage-error", message: "Unknown option '--colour'" });
    expect(parseCommandLine(["check"])).toMatchObject({ kind: "usage-error", topic: "check" });
    expect(parseCommandLine(["check", "a.json", "--svg", "x"])).toMatchObject({ kind: "usage-error", topic: "check" });
    expect(parseCommandLine(["schema", "x.json"])).toMatchObject({ kind: "usage-error", message: "schema takes no file names." });
    expect(parseCommandLine(["schema", "--json"])).toMatchObject({ kind: "usage-error", topic: "schema" });
  });
});

describe("help and exit codes", () => {
  test("HELP documents every command and every exit code of EXIT", async () => {
    const { HELP } = await import("../../src/cli/help.js");
    const { EXIT } = await import("../../src/cli/exit-codes.js");
    for (const command of ["analyze", "check", "schema"]) expect(HELP.main).toContain(`flexura ${command}`);
    for (const code of Object.values(EXIT)) expect(HELP.main).toMatch(new RegExp(`^ {2}${code} {2}\\S`, "m"));
    expect(new Set(Object.values(EXIT)).size).toBe(Object.values(EXIT).length);
  });
});
