import { mkdtempSync, readFileSync, rmSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { describe, expect, test } from "vitest";
import { nodeIo, packageVersion } from "../../src/cli/node-io.js";

describe("nodeIo", () => {
  test("nodeIo writes into a folder it creates, reads files back, and knows the package version", () => {
    const dir = mkdtempSync(join(tmpdir(), "flexura-io-"));
    try {
      const io = nodeIo();
      const file = io.writeText(join(dir, "a", "b"), "x.svg", "<svg/>");
      expect(file).toBe(join(dir, "a", "b", "x.svg"));
      expect(readFileSync(file, "utf8")).toBe("<svg/>");
      expect(io.readText(file)).toBe("<svg/>");
      expect(() => io.readText(join(dir, "missing.json"))).toThrow(expect.objectContaining({ code: "ENOENT" }) as Error);
      const pkg = JSON.parse(readFileSync(join(import.meta.dirname, "..", "..", "package.json"), "utf8")) as { version: string };
      expect(io.version).toBe(pkg.version);
      expect(packageVersion()).toBe(pkg.version);
    } finally {
      rmSync(dir, { recursive: true, force: true });
    }
  });
});
