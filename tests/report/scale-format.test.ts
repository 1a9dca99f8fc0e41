import { fc, test } from "@fast-check/vitest";
import { describe, expect } from "vitest";
import { formatReportNumber, formatReportQuantity, textTable } from "../../src/report/index.js";
import { wrapText } from "../../src/report/caution.js";
import { linearScale, niceTicks, valueExtent } from "../../src/report/scale.js";

describe("linearScale", () => {
  test("linearScale maps the ends of the domain to the ends of the range", () => {
    const s = linearScale([0, 6], [40, 640]);
    expect(s(0)).toBe(40);
    expect(s(6)).toBe(640);
    expect(s(3)).toBe(340);
  });
  test("linearScale of an empty domain maps to the middle of the range", () => {
    expect(linearScale([2, 2], [0, 10])(5)).toBe(5);
  });
  test.prop([fc.double({ min: -1e6, max: 1e6, noNaN: true }), fc.double({ min: 1e-3, max: 1e6, noNaN: true }), fc.double({ min: 0, max: 1, noNaN: true })])(
    "linearScale keeps the ratio of distances (it is affine)",
    (d0, span, t) => {
      const s = linearScale([d0, d0 + span], [0, 100]);
      expect(s(d0 + t * span)).toBeCloseTo(100 * t, 3);
    },
  );
});

describe("niceTicks", () => {
  test("niceTicks chooses steps of 1, 2 or 5 times a power of ten (common practice)", () => {
    expect(niceTicks(0, 9)).toEqual([0, 2, 4, 6, 8]);
    expect(niceTicks(-30, 30, 6)).toEqual([-30, -20, -10, 0, 10, 20, 30]);
    expect(niceTicks(0, 0.35, 4)).toEqual([0, 0.1, 0.2, 0.3]);
    expect(niceTicks(3, 3)).toEqual([3]);
    // A counterexample found by fast-check: the step must not round up past the interval.
    expect(niceTicks(5e-11, 0.04000000005, 2)).toEqual([0.02, 0.04]);
    expect(niceTicks(0.0051, 0.0093, 2)).toEqual([0.0051]);
  });
  test.prop([fc.double({ min: -1e5, max: 1e5, noNaN: true }), fc.double({ min: 1e-2, max: 1e5, noNaN: true }), fc.integer({ min: 2, max: 10 })])(
    "niceTicks lie inside the interval, in increasing order, and are not too many",
    (min, span, count) => {
      const ticks = niceTicks(min, min + span, count);
      expect(ticks.length).toBeGreaterThan(0);
      expect(ticks.length).toBeLessThanOrEqual(2 * count + 2);
      for (const t of ticks) {
        expect(t).toBeGreaterThanOrEqual(min - span * 1e-6);
        expect(t).toBeLessThanOrEqual(min + span + span * 1e-6);
      }
      for (let i = 1; i < ticks.length; i++) expect(ticks[i]!).toBeGreaterThan(ticks[i - 1]!);
    },
  );
  test("valueExtent always includes zero and is never empty", () => {
    expect(valueExtent([3, 12])).toEqual([0, 12]);
    expect(valueExtent([-3, Number.NaN, 12])).toEqual([-3, 12]);
    expect(valueExtent([0, 0])).toEqual([-1, 1]);
  });
});

describe("formatReportNumber", () => {
  test("formatReportNumber writes four significant figures without trailing zeros", () => {
    expect(formatReportNumber(123.456)).toBe("123.5");
    expect(formatReportNumber(45)).toBe("45");
    expect(formatReportNumber(0.1 + 0.2)).toBe("0.3");
    expect(formatReportNumber(-0)).toBe("0");
    expect(formatReportNumber(8.4375, 3)).toBe("8.44");
    expect(formatReportNumber(1234, 1)).toBe("1000");
  });
  test("formatReportNumber switches to exponent form for very large and very small magnitudes", () => {
    expect(formatReportNumber(225e6)).toBe("2.25e8");
    expect(formatReportNumber(0.0000123456)).toBe("1.235e-5");
    expect(formatReportNumber(-1.5e-4)).toBe("-1.5e-4");
  });
  test("formatReportNumber never lets a non-finite value pass as a number", () => {
    expect(formatReportNumber(Number.NaN)).toBe("not finite");
    expect(formatReportNumber(Number.POSITIVE_INFINITY)).toBe("not finite");
  });
  test.prop([fc.double({ noNaN: true, noDefaultInfinity: true, min: -1e12, max: 1e12 })])("formatReportNumber reads back within four significant figures", (v) => {
    const back = Number(formatReportNumber(v));
    expect(Math.abs(back - v)).toBeLessThanOrEqual(Math.abs(v) * 5e-4 + 1e-300);
  });
  test("formatReportQuantity puts a space between number and unit (NIST SP 811 (2008) section 7.2)", () => {
    expect(formatReportQuantity(12.5, "kN")).toBe("12.5 kN");
    expect(formatReportQuantity(12.5, "")).toBe("12.5");
  });
});

describe("text layout", () => {
  test("textTable pads text columns left and numeric columns right under a dashed rule", () => {
    expect(textTable([["name", "value"], ["a", "1.5"], ["long name", "-12"]])).toBe(
      ["name       value", "---------  -----", "a            1.5", "long name    -12"].join("\n"),
    );
    expect(textTable([])).toBe("");
  });
  test("wrapText breaks at spaces within the width and indents each line", () => {
    expect(wrapText("one two three four", 9, "> ")).toBe("> one two\n> three\n> four");
    expect(wrapText("", 10)).toBe("");
  });
});
