import { describe, expect, it } from "vitest";
import { restrainsAxis, restrainsDeflection, restrainsRotation, type Support } from "../../src/supports/index.js";

describe("supports", () => {
  it("what each kind holds", () => {
    const kinds: Support[] = [
      { kind: "pin", at: 0 },
      { kind: "roller", at: 0 },
      { kind: "fixed", at: 0 },
      { kind: "guided", at: 0 },
      { kind: "spring", at: 0, stiffness: 1 },
      { kind: "spring", at: 0, rotationalStiffness: 1 },
    ];
    expect(kinds.map((s) => [restrainsDeflection(s), restrainsRotation(s), restrainsAxis(s)])).toEqual([
      [true, false, true],
      [true, false, false],
      [true, true, true],
      [false, true, true],
      [true, false, false],
      [false, true, false],
    ]);
  });
});
