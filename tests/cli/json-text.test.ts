import { fc, test } from "@fast-check/vitest";
import { describe, expect } from "vitest";
import { readJsonText } from "../../src/cli/json-text.js";

// The JSON grammar is RFC 8259 (The JavaScript Object Notation Data Interchange Format), sections 2 to 7.
describe("readJsonText", () => {
  test("readJsonText parses valid JSON and ignores a byte order mark", () => {
    expect(readJsonText('\uFEFF{"length": 6, "loads": [1, -2.5e3, true, null, "a\\u00e9"]}')).toEqual({
      ok: true,
      value: { length: 6, loads: [1, -2500, true, null, "aé"] },
    });
  });
  test.each([
    ['{\n  "length": 6,\n}', 3, 1, 'expected a property name in double quotes; found "}"'],
    ['{"a": }', 1, 7, "expected a value (object, array, string, number, true, false or null)"],
    ['{"a" 1}', 1, 6, 'expected ":" after the property name'],
    ['{"a": 1', 1, 8, 'expected "," or "}" after a property value, but the text ended'],
    ["[1 2]", 1, 4, 'expected "," or "]" after an array element'],
    ["", 1, 1, "expected a value (object, array, string, number, true, false or null), but the text ended"],
    ['{"a": tru}', 1, 10, 'expected "true"'],
    ['{"a": 01}', 1, 8, 'expected "," or "}"'],
    ['{"a": 1.}', 1, 9, "expected a digit after the decimal point"],
    ['{"a": 1e}', 1, 9, "expected a digit in the exponent"],
    ['{"a": -}', 1, 8, "expected a digit"],
    ['{"a": "x', 1, 9, "unterminated string"],
    ['{"a": "\\q"}', 1, 9, "invalid escape in string"],
    ['{"a": "\\u12G4"}', 1, 12, "expected four hexadecimal digits after \\u"],
    ['{"a": "\u0001"}', 1, 8, "control character in string (escape it)"],
    ["{} {}", 1, 4, "unexpected text after the end of the JSON value"],
    ["[]x", 1, 3, "unexpected text"],
    ["[\n\n  1,\n  ]", 4, 3, "expected a value"],
  ])("readJsonText(%j) reports line %i, column %i", (text, line, column, message) => {
    const r = readJsonText(text);
    expect(r.ok).toBe(false);
    if (r.ok) return;
    expect([r.problem.line, r.problem.column]).toEqual([line, column]);
    expect(r.problem.message).toContain(message);
  });
  test.prop([fc.jsonValue()], { numRuns: 150 })("readJsonText agrees with JSON.parse on every valid JSON text", (value) => {
    const text = JSON.stringify(value, null, 1);
    expect(readJsonText(text)).toEqual({ ok: true, value: JSON.parse(text) as unknown });
  });
  test.prop([fc.string(), fc.nat()], { numRuns: 200 })("readJsonText never throws and places any error inside the text", (s, cut) => {
    const text = `{"a": [1, "${s}"`.slice(0, cut + 1) + s;
    const r = readJsonText(text);
    if (!r.ok) {
      expect(r.problem.line).toBeGreaterThanOrEqual(1);
      expect(r.problem.column).toBeGreaterThanOrEqual(1);
    }
  });
});
