import { describe, expect, it } from "vitest";
import { fc, test } from "@fast-check/vitest";
import {
  FlexuraError,
  IssueCollector,
  attempt,
  describeValue,
  fail,
  formatPath,
  isFlexuraError,
  requireFinite,
} from "../../src/errors/index.js";

describe("formatPath", () => {
  it("formatPath(['loads', 2, 'at']) reads as loads[2].at", () => {
    expect(formatPath(["loads", 2, "at"])).toBe("loads[2].at");
    expect(formatPath([])).toBe("(input)");
    expect(formatPath([0, "x"])).toBe("[0].x");
  });
});

describe("FlexuraError", () => {
  it("carries every issue and summarises them in the message", () => {
    const e = new FlexuraError([
      { code: "a-code", path: ["x"], message: "A is wrong." },
      { code: "b-code", path: ["loads", 1], message: "B is wrong.", at: 3 },
    ]);
    expect(e.code).toBe("a-code");
    expect(e.issues).toHaveLength(2);
    expect(e.issues[1]?.["at"]).toBe(3);
    expect(e.message).toMatchInlineSnapshot(`
      "2 problems:
        x: A is wrong. [a-code]
        loads[1]: B is wrong. [b-code]"
    `);
    expect(Object.isFrozen(e.issues)).toBe(true);
  });

  it("an empty issue list still gives a usable error", () => {
    const e = new FlexuraError([]);
    expect(e.code).toBe("unknown");
    expect(e.issues).toHaveLength(1);
  });

  it("isFlexuraError recognises errors by brand, not by class identity", () => {
    expect(isFlexuraError(new FlexuraError([{ code: "c", path: [], message: "m" }]))).toBe(true);
    expect(isFlexuraError(new Error("x"))).toBe(false);
    expect(isFlexuraError(null)).toBe(false);
    expect(isFlexuraError({ issues: [] })).toBe(false);
    const foreign = Object.assign(new Error("x"), { [Symbol.for("flexura.error")]: true });
    expect(isFlexuraError(foreign)).toBe(true);
  });

  it("fail throws a FlexuraError with the details attached", () => {
    expect(() => fail("unknown-unit", ["unit"], "Unknown unit.", { unit: "furlong" })).toThrowError(FlexuraError);
    try {
      fail("unknown-unit", ["unit"], "Unknown unit.", { unit: "furlong" });
    } catch (e) {
      expect(isFlexuraError(e) && e.issues[0]).toEqual({ code: "unknown-unit", path: ["unit"], message: "Unknown unit.", unit: "furlong" });
    }
  });
});

describe("attempt", () => {
  it("returns ok for a value and the error for a FlexuraError", () => {
    expect(attempt(() => 2)).toEqual({ ok: true, value: 2 });
    const r = attempt(() => fail("x-code", [], "X."));
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.error.code).toBe("x-code");
  });
  it("rethrows anything that is not a FlexuraError (a bug, not an input problem)", () => {
    expect(() =>
      attempt(() => {
        throw new RangeError("bug");
      }),
    ).toThrowError(RangeError);
  });
});

describe("IssueCollector", () => {
  it("collects every issue before failing, with prefixes", () => {
    const found = new IssueCollector();
    expect(found.empty).toBe(true);
    found.throwIfAny();
    found.add("one", ["a"], "One.");
    found.addAll([{ code: "two", path: [0], message: "Two." }], ["loads"]);
    expect(found.empty).toBe(false);
    expect(found.issues.map((i) => [i.code, formatPath(i.path)])).toEqual([
      ["one", "a"],
      ["two", "loads[0]"],
    ]);
    expect(() => found.throwIfAny()).toThrowError(/2 problems/);
  });
});

describe("requireFinite", () => {
  it("accepts finite numbers and names the problem otherwise", () => {
    const found = new IssueCollector();
    expect(requireFinite(found, 1.5, ["x"], "x")).toBe(true);
    expect(requireFinite(found, Number.NaN, ["y"], "y")).toBe(false);
    expect(requireFinite(found, "3", ["z"], "z")).toBe(false);
    expect(found.issues.map((i) => i.code)).toEqual(["not-finite", "not-a-number"]);
  });

  test.prop([fc.anything()])("never throws and describes any value as a string", (value) => {
    const found = new IssueCollector();
    requireFinite(found, value, [], "value");
    expect(typeof describeValue(value)).toBe("string");
  });

  it("describes each kind of value plainly", () => {
    expect(["x".repeat(50), 1, true, 1n, undefined, {}, [], () => 0, Symbol("s"), null].map(describeValue)).toEqual([
      `"${"x".repeat(40)}..."`,
      "1",
      "true",
      "1",
      "nothing",
      "an object",
      "an array",
      "a function",
      "a symbol",
      "null",
    ]);
  });
});
