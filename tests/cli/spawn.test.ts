// The command as a user runs it: real processes, real exit codes, stdout and stderr. Tests run
// before the build in `npm test`, so the TypeScript source is run through the TypeScript runner
// that the build toolchain installs (unrun).
import { spawnSync } from "node:child_process";
import { existsSync, mkdtempSync, readdirSync, readFileSync, rmSync, truncateSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import { join, resolve } from "node:path";
import { describe, expect, test } from "vitest";
import { packageVersion } from "../../src/cli/node-io.js";

const root = resolve(import.meta.dirname, "..", "..");
const runner = join(root, "node_modules", ".bin", "unrun");
const main = join(root, "src", "cli", "main.ts");

function flexura(...args: string[]): { code: number | null; stdout: string; stderr: string } {
  return flexuraWithInput("", ...args);
}

function flexuraWithInput(input: string, ...args: string[]): { code: number | null; stdout: string; stderr: string } {
  const r = spawnSync(process.execPath, [runner, main, ...args], { cwd: join(import.meta.dirname, "fixtures"), encoding: "utf8", timeout: 60_000, input });
  return { code: r.status, stdout: r.stdout, stderr: r.stderr };
}

describe("flexura command (spawned)", () => {
  test("flexura --help exits 0 and prints usage on stdout", () => {
    const r = flexura("--help");
    expect(r.code).toBe(0);
    expect(r.stdout).toContain("Usage:");
    expect(r.stderr).toBe("");
  });
  test("flexura --version prints the package version", () => {
    const r = flexura("--version");
    expect(r.code).toBe(0);
    expect(r.stdout.trim()).toBe(packageVersion(main));
  });
  test("flexura analyze on a missing file exits 3 with one plain line on stderr", () => {
    const r = flexura("analyze", "missing.json");
    expect(r.code).toBe(3);
    expect(r.stderr).toBe("flexura: cannot read missing.json: no such file\n");
    expect(r.stdout).toBe("");
  });
  test("flexura analyze on invalid JSON exits 4 with line and column", () => {
    const r = flexura("analyze", "bad-syntax.json");
    expect(r.code).toBe(4);
    expect(r.stderr).toMatch(/^flexura: bad-syntax\.json is not valid JSON: line 6, column 1: /);
  });
  test("flexura analyze on a model with three errors lists all three, without a stack trace", () => {
    const r = flexura("analyze", "three-errors.json");
    expect(r.code).toBe(4);
    expect(r.stderr.split("\n").filter((l) => l.startsWith("  "))).toHaveLength(3);
    expect(r.stderr).toContain("loads[2].at");
    expect(r.stderr).not.toMatch(/\n\s+at /);
  });
  test("flexura check exits 1 on a failing model and 0 on a passing one", () => {
    expect(flexura("check", "fails-check.json").code).toBe(1);
    const ok = flexura("check", "passes-check.json");
    expect(ok.code).toBe(0);
    expect(ok.stdout).toMatch(/^PASS passes-check\.json/);
  });
  test("flexura analyze --json --svg prints one JSON object and writes the diagrams", () => {
    const dir = mkdtempSync(join(tmpdir(), "flexura-svg-"));
    try {
      const out = join(dir, "deep", "er");
      const r = flexura("analyze", "passes-check.json", "--json", "--svg", out);
      expect(r.code).toBe(0);
      expect(JSON.parse(r.stdout)).toHaveProperty("reactions");
      expect(existsSync(out)).toBe(true);
      expect(readdirSync(out).sort()).toEqual(["passes-check-deflection.svg", "passes-check-figure.svg", "passes-check-member.svg", "passes-check-moment.svg", "passes-check-shear.svg"]);
    } finally {
      rmSync(dir, { recursive: true, force: true });
    }
  });
  test("flexura with no arguments exits 2 with its usage on stderr", () => {
    const r = flexura();
    expect(r.code).toBe(2);
    expect(r.stderr).toContain("Usage:");
    expect(r.stdout).toBe("");
  });
  test("flexura check - reads a model piped to standard input; an empty pipe is a plain error", () => {
    const model = readFileSync(join(import.meta.dirname, "fixtures", "passes-check.json"), "utf8");
    const r = flexuraWithInput(model, "check", "-", "--json");
    expect(r.code).toBe(0);
    expect(JSON.parse(r.stdout)).toMatchObject({ file: "-", ok: true, pass: true });
    const empty = flexuraWithInput("", "analyze", "-");
    expect(empty.code).toBe(4);
    expect(empty.stderr).toBe("flexura: standard input: it is empty; a model file holds one JSON object\n");
  });
  test("a 50 MB file, a binary file and diagrams into an existing file: plain messages, right exit codes", () => {
    const dir = mkdtempSync(join(tmpdir(), "flexura-bad-"));
    try {
      const big = join(dir, "big.json");
      writeFileSync(big, "");
      truncateSync(big, 50 * 1024 * 1024);
      const r = flexura("analyze", big, "--json");
      expect(r.code).toBe(3);
      expect(JSON.parse(r.stdout)).toMatchObject({ ok: false, problems: [{ code: "file-too-large" }] });
      const bin = join(dir, "model.bin");
      writeFileSync(bin, Buffer.from([0x89, 0x50, 0x4e, 0x47, 0, 0, 0, 13]));
      expect(flexura("analyze", bin).stderr).toContain("it is not a text file");
      const inTheWay = join(dir, "out");
      writeFileSync(inTheWay, "a file, not a folder");
      const w = flexura("analyze", "passes-check.json", "--svg", inTheWay);
      expect(w.code).toBe(3);
      expect(w.stderr).toMatch(/^flexura: cannot write passes-check-member\.svg in .*out: a file of that name is where a folder is needed/);
      expect(w.stderr).not.toMatch(/\n\s+at /);
    } finally {
      rmSync(dir, { recursive: true, force: true });
    }
  });
  test("packageVersion falls back to unknown outside a flexura package", () => {
    expect(packageVersion(join(tmpdir(), "a", "b.js"))).toBe("unknown");
  });
});
