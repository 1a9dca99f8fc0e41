// `flexura analyze --html FILE`: the calculation sheet written beside the report, tied to the input by its SHA-256.
import { createHash } from "node:crypto";
import { readFileSync } from "node:fs";
import { join } from "node:path";
import { describe, expect, test } from "vitest";
import { parseCommandLine } from "../../src/cli/args.js";
import { EXIT } from "../../src/cli/exit-codes.js";
import { runCli } from "../../src/cli/run.js";
import { memoryIo } from "./io.js";

const fixture = (name: string): string => join(import.meta.dirname, "fixtures", name);

describe("analyze --html", () => {
  test("reads the option and refuses an empty name or a folder", () => {
    expect(parseCommandLine(["analyze", "b.json", "--html", "out/sheet.html"])).toEqual({ kind: "analyze", file: "b.json", json: false, svg: undefined, html: "out/sheet.html" });
    expect(parseCommandLine(["analyze", "b.json", "--html="])).toMatchObject({ kind: "usage-error" });
    expect(parseCommandLine(["analyze", "b.json", "--html", "out/"])).toMatchObject({ kind: "usage-error", message: "--html needs a file name, such as sheet.html." });
  });

  test("writes the sheet with the input's name and SHA-256, and the text report names them too", () => {
    const io = memoryIo();
    const file = fixture("passes-check.json");
    expect(runCli(["analyze", file, "--html", "out/sheet.html"], io)).toBe(EXIT.ok);
    const sheet = io.written.get("out/sheet.html");
    expect(sheet).toBeDefined();
    const digest = createHash("sha256").update(readFileSync(file)).digest("hex");
    expect(sheet).toContain(digest);
    expect(sheet).toContain("passes-check.json");
    expect(sheet).toMatch(/^<!DOCTYPE html>/);
    expect(io.err.join("")).toContain("wrote the calculation sheet out/sheet.html");
    expect(io.out.join("")).toContain(`Input: passes-check.json (SHA-256 ${digest})`);
  });

  test("a sheet that cannot be written is a file failure (exit 3), as with --svg", () => {
    const io = memoryIo();
    const failing = { ...io, writeText: (): string => { throw Object.assign(new Error("denied"), { code: "EACCES" }); } };
    expect(runCli(["analyze", fixture("passes-check.json"), "--html", "/root/x/sheet.html"], failing)).toBe(EXIT.file);
  });
});
