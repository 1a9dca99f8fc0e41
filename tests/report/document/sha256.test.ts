import { createHash } from "node:crypto";
import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { sha256Hex } from "../../../src/report/document/sha256.js";

describe("sha256Hex", () => {
  it("gives the FIPS 180-4 example digests (NIST, SHA-256 examples: \"abc\" and the 448-bit message)", () => {
    expect(sha256Hex("abc")).toBe("ba7816bf8f01cfea414140de5dae2223b00361a396177a9cb410ff61f20015ad");
    expect(sha256Hex("abcdbcdecdefdefgefghfghighijhijkijkljklmklmnlmnomnopnopq")).toBe(
      "248d6a61d20638b8e5c026930c3e6039a33ce45964ff2167f6ecedd419db06c1",
    );
    expect(sha256Hex("")).toBe("e3b0c44298fc1c149afbf4c8996fb92427ae41e4649b934ca495991b7852b855");
  });

  it("agrees with node:crypto (a general-purpose reference) on random bytes of every padding length", () => {
    fc.assert(
      fc.property(fc.uint8Array({ maxLength: 300 }), (bytes) => {
        expect(sha256Hex(bytes)).toBe(createHash("sha256").update(bytes).digest("hex"));
      }),
      { numRuns: 200, seed: 17 },
    );
  });

  it("hashes text as its UTF-8 bytes", () => {
    const text = "Träger · 6 m";
    expect(sha256Hex(text)).toBe(createHash("sha256").update(Buffer.from(text, "utf8")).digest("hex"));
  });
});
