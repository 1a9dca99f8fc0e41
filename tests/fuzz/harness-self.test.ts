import { describe, expect, it } from "vitest";
import { sameValue } from "./harness.js";

describe("sameValue (the fuzz harness's input-unchanged check)", () => {
  it("tells equal from changed data, also 20,000 levels deep", () => {
    let deep: unknown = 1;
    let other: unknown = 1;
    for (let i = 0; i < 20000; i++) {
      deep = [deep];
      other = [other];
    }
    expect(sameValue(deep, other)).toBe(true);
    expect(sameValue({ a: [1, { b: "x" }], c: null }, { a: [1, { b: "x" }], c: null })).toBe(true);
    expect(sameValue({ a: [1, { b: "x" }] }, { a: [1, { b: "y" }] })).toBe(false);
    expect(sameValue({ a: 1 }, { a: 1, b: undefined })).toBe(false);
    expect(sameValue([1, 2], { 0: 1, 1: 2 })).toBe(false);
    expect(sameValue(Number.NaN, Number.NaN)).toBe(true);
    let changed: unknown = 2;
    for (let i = 0; i < 20000; i++) changed = [changed];
    expect(sameValue(deep, changed)).toBe(false);
  });
});
