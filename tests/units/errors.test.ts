import { describe, expect, it } from "vitest";
import {
  convert,
  convertQuantity,
  parseQuantity,
  tryConvert,
  tryConvertQuantity,
  tryParseQuantity,
  tryUnitFactor,
  unitFactor,
  type QuantityKind,
} from "../../src/units/index.js";
import { isFlexuraError, type Result } from "../../src/errors/index.js";

/** The issues of a failed result, as plain data for snapshots. */
function issues<T>(r: Result<T>): unknown {
  if (r.ok) return "ok";
  expect(isFlexuraError(r.error)).toBe(true);
  return r.error.issues.map((i) => ({ ...i }));
}

const bad = (text: unknown, kind: unknown = "force"): unknown => issues(tryParseQuantity(text as string, kind as QuantityKind));

describe("bad input gives typed errors", () => {
  it("parseQuantity: empty, missing or non-string input", () => {
    expect(bad("")).toMatchInlineSnapshot(`
      [
        {
          "code": "quantity-empty",
          "message": "The quantity is empty; give a number and a unit, such as "12 kN".",
          "path": [],
          "text": "",
        },
      ]
    `);
    expect(bad("   ")).toMatchInlineSnapshot(`
      [
        {
          "code": "quantity-empty",
          "message": "The quantity is empty; give a number and a unit, such as "12 kN".",
          "path": [],
          "text": "   ",
        },
      ]
    `);
    expect(bad(Number.NaN)).toMatchInlineSnapshot(`
      [
        {
          "code": "quantity-not-a-string",
          "message": "A quantity must be a string such as "12 kN" or "1.5 kip/ft"; got NaN.",
          "path": [],
          "value": "NaN",
        },
      ]
    `);
    expect(bad({ value: 12, unit: "kN" })).toMatchInlineSnapshot(`
      [
        {
          "code": "quantity-not-a-string",
          "message": "A quantity must be a string such as "12 kN" or "1.5 kip/ft"; got an object.",
          "path": [],
          "value": "an object",
        },
      ]
    `);
    expect(bad(null)).toMatchInlineSnapshot(`
      [
        {
          "code": "quantity-not-a-string",
          "message": "A quantity must be a string such as "12 kN" or "1.5 kip/ft"; got null.",
          "path": [],
          "value": "null",
        },
      ]
    `);
    expect(bad(undefined)).toMatchInlineSnapshot(`
      [
        {
          "code": "quantity-not-a-string",
          "message": "A quantity must be a string such as "12 kN" or "1.5 kip/ft"; got nothing.",
          "path": [],
          "value": "nothing",
        },
      ]
    `);
    expect(bad("kip")).toMatchInlineSnapshot(`
      [
        {
          "code": "number-missing",
          "message": ""kip" does not start with a number; write the number first, as in "12 kN".",
          "path": [],
          "text": "kip",
        },
      ]
    `);
    expect(bad("NaN kN")).toMatchInlineSnapshot(`
      [
        {
          "code": "number-missing",
          "message": ""NaN kN" does not start with a number; write the number first, as in "12 kN".",
          "path": [],
          "text": "NaN kN",
        },
      ]
    `);
    expect(bad("Infinity kN")).toMatchInlineSnapshot(`
      [
        {
          "code": "number-missing",
          "message": ""Infinity kN" does not start with a number; write the number first, as in "12 kN".",
          "path": [],
          "text": "Infinity kN",
        },
      ]
    `);
    expect(bad("12")).toMatchInlineSnapshot(`
      [
        {
          "code": "unit-missing",
          "expected": "force",
          "message": ""12" has no unit; a force is due here, so add a unit such as N, kN, lbf or kip.",
          "path": [],
          "text": "12",
        },
      ]
    `);
  });

  it("parseQuantity: numbers a JavaScript number cannot hold", () => {
    expect(bad("1e400 psi", "stress")).toMatchInlineSnapshot(`
      [
        {
          "code": "number-out-of-range",
          "message": "The number 1e400 in "1e400 psi" is outside what a JavaScript number can hold (about 5e-324 to 1.8e308).",
          "path": [],
          "text": "1e400 psi",
        },
      ]
    `);
    expect(bad("1e-400 m", "length")).toMatchInlineSnapshot(`
      [
        {
          "code": "number-out-of-range",
          "message": "The number 1e-400 in "1e-400 m" is outside what a JavaScript number can hold (about 5e-324 to 1.8e308).",
          "path": [],
          "text": "1e-400 m",
        },
      ]
    `);
    expect(bad("1e300 GPa", "stress")).toMatchInlineSnapshot(`
      [
        {
          "code": "number-out-of-range",
          "message": ""1e300 GPa" is too large to hold as a JavaScript number in SI base units (magnitudes from about 5e-324 to 1.8e308).",
          "path": [],
          "size": "too large",
        },
      ]
    `);
    expect(bad("0e-400 m", "length")).toBe("ok");
  });

  it("parseQuantity: unit syntax", () => {
    expect(bad("12 kip/")).toMatchInlineSnapshot(`
      [
        {
          "at": 4,
          "code": "unit-syntax",
          "message": "The unit "kip/" cannot be read: the unit ends with an operator; a unit must follow it (at character 5).",
          "path": [],
          "unit": "kip/",
        },
      ]
    `);
    expect(bad("12 kip*", "force")).toMatchInlineSnapshot(`
      [
        {
          "at": 4,
          "code": "unit-syntax",
          "message": "The unit "kip*" cannot be read: the unit ends with an operator; a unit must follow it (at character 5).",
          "path": [],
          "unit": "kip*",
        },
      ]
    `);
    expect(bad("12 /ft", "forcePerLength")).toMatchInlineSnapshot(`
      [
        {
          "at": 0,
          "code": "unit-syntax",
          "message": "The unit "/ft" cannot be read: expected a unit before "/" (at character 1).",
          "path": [],
          "unit": "/ft",
        },
      ]
    `);
    expect(bad("12 kN m", "moment")).toMatchInlineSnapshot(`
      [
        {
          "at": 3,
          "code": "unit-syntax",
          "message": "The unit "kN m" cannot be read: two units stand side by side; join them with * or /, as in kN*m (at character 4).",
          "path": [],
          "unit": "kN m",
        },
      ]
    `);
    expect(bad("12 kN/m*m", "stress")).toMatchInlineSnapshot(`
      [
        {
          "at": 4,
          "code": "unit-syntax",
          "message": "The unit "kN/m*m" cannot be read: "*" after a division is ambiguous; group the divisor in parentheses, as in kN/(m*m), or divide once, as in kN*m/rad (at character 5).",
          "path": [],
          "unit": "kN/m*m",
        },
      ]
    `);
    expect(bad("12 kN/m/m", "stress")).toMatchInlineSnapshot(`
      [
        {
          "at": 4,
          "code": "unit-syntax",
          "message": "The unit "kN/m/m" cannot be read: "/" after a division is ambiguous; group the divisor in parentheses, as in kN/(m*m), or divide once, as in kN*m/rad (at character 5).",
          "path": [],
          "unit": "kN/m/m",
        },
      ]
    `);
    expect(bad("1,000 kN")).toMatchInlineSnapshot(`
      [
        {
          "at": 0,
          "code": "unit-syntax",
          "message": "The unit ",000 kN" cannot be read: a comma is not part of a number or a unit (write 1000 kN, not 1,000 kN) (at character 1).",
          "path": [],
          "unit": ",000 kN",
        },
      ]
    `);
    expect(bad("12 (kN", "force")).toMatchInlineSnapshot(`
      [
        {
          "at": 0,
          "code": "unit-syntax",
          "message": "The unit "(kN" cannot be read: a ( has no matching ) (at character 1).",
          "path": [],
          "unit": "(kN",
        },
      ]
    `);
    expect(bad("12 kN)", "force")).toMatchInlineSnapshot(`
      [
        {
          "at": 2,
          "code": "unit-syntax",
          "message": "The unit "kN)" cannot be read: a ) has no matching ( (at character 3).",
          "path": [],
          "unit": "kN)",
        },
      ]
    `);
    expect(bad("12 m^", "length")).toMatchInlineSnapshot(`
      [
        {
          "at": 2,
          "code": "unit-syntax",
          "message": "The unit "m^" cannot be read: a power needs an integer after ^, as in m^2 or m^-1 (at character 3).",
          "path": [],
          "unit": "m^",
        },
      ]
    `);
    expect(bad("12 m^x", "length")).toMatchInlineSnapshot(`
      [
        {
          "at": 2,
          "code": "unit-syntax",
          "message": "The unit "m^x" cannot be read: a power needs an integer after ^, as in m^2 or m^-1 (at character 3).",
          "path": [],
          "unit": "m^x",
        },
      ]
    `);
    expect(bad("12 m^(2", "area")).toMatchInlineSnapshot(`
      [
        {
          "at": 4,
          "code": "unit-syntax",
          "message": "The unit "m^(2" cannot be read: a power in parentheses needs its closing ) (at character 5).",
          "path": [],
          "unit": "m^(2",
        },
      ]
    `);
    expect(bad("12 m^13", "length")).toMatchInlineSnapshot(`
      [
        {
          "at": 1,
          "code": "unit-syntax",
          "message": "The unit "m^13" cannot be read: a power must lie between -12 and 12 (at character 2).",
          "path": [],
          "unit": "m^13",
        },
      ]
    `);
    expect(bad("12 m⁻", "length")).toMatchInlineSnapshot(`
      [
        {
          "at": 2,
          "code": "unit-syntax",
          "message": "The unit "m⁻" cannot be read: a superscript minus needs superscript digits after it, as in m⁻¹ (at character 3).",
          "path": [],
          "unit": "m⁻",
        },
      ]
    `);
    expect(bad("12 kN#", "force")).toMatchInlineSnapshot(`
      [
        {
          "at": 2,
          "code": "unit-syntax",
          "message": "The unit "kN#" cannot be read: unexpected "#" (at character 3).",
          "path": [],
          "unit": "kN#",
        },
      ]
    `);
    expect(bad("12 $", "force")).toMatchInlineSnapshot(`
      [
        {
          "at": 0,
          "code": "unit-syntax",
          "message": "The unit "$" cannot be read: unexpected "$"; a unit symbol such as m, kN or psi was expected (at character 1).",
          "path": [],
          "unit": "$",
        },
      ]
    `);
    expect(bad(`12 ${"(".repeat(9)}m${")".repeat(9)}`, "length")).toMatchInlineSnapshot(`
      [
        {
          "at": 8,
          "code": "unit-syntax",
          "message": "The unit "(((((((((m)))))))))" cannot be read: parentheses nest deeper than 8 (at character 9).",
          "path": [],
          "unit": "(((((((((m)))))))))",
        },
      ]
    `);
    expect(bad(`12 ${"m*".repeat(70)}m`, "length")).toMatchInlineSnapshot(`
      [
        {
          "at": 120,
          "code": "unit-syntax",
          "message": "The unit "m*m*m*m*m*m*m*m*m*m*m*m*m*m*m*m*m*m*m*m*m*m*m*m*m*m*m*m*m*m*m*m*m*m*m*m*m*m*m*m*m*m*m*m*m*m*m*m*m*m*m*m*m*m*m*m*m*m*m*m*m*m*m*m*m*m*m*m*m*m*m" cannot be read: the unit is longer than 120 characters (at character 121).",
          "path": [],
          "unit": "m*m*m*m*m*m*m*m*m*m*m*m*m*m*m*m*m*m*m*m*m*m*m*m*m*m*m*m*m*m*m*m*m*m*m*m*m*m*m*m*m*m*m*m*m*m*m*m*m*m*m*m*m*m*m*m*m*m*m*m*m*m*m*m*m*m*m*m*m*m*m",
        },
      ]
    `);
  });

  it("parseQuantity: unknown units, each reported, with suggestions", () => {
    expect(bad("12 KN")).toMatchInlineSnapshot(`
      [
        {
          "code": "unknown-unit",
          "message": "Unknown unit "KN". Did you mean "kN"?",
          "path": [],
          "suggestions": [
            "kN",
          ],
          "token": "KN",
          "unit": "KN",
        },
      ]
    `);
    expect(bad("12 kNm", "moment")).toMatchInlineSnapshot(`
      [
        {
          "code": "unknown-unit",
          "message": "Unknown unit "kNm". Did you mean "kN*m"?",
          "path": [],
          "suggestions": [
            "kN*m",
          ],
          "token": "kNm",
          "unit": "kNm",
        },
      ]
    `);
    // near spellings by edit distance with adjacent swaps, nearest first
    expect((bad("12 kpi") as { suggestions?: unknown }[])[0]?.suggestions).toEqual(["kip", "kPa", "ksi"]);
    expect(bad("12 kipf")).toMatchInlineSnapshot(`
      [
        {
          "code": "unknown-unit",
          "message": "Unknown unit "kipf". Did you mean "kip"?",
          "path": [],
          "suggestions": [
            "kip",
          ],
          "token": "kipf",
          "unit": "kipf",
        },
      ]
    `);
    expect(bad("12 furlong*fortnight", "length")).toMatchInlineSnapshot(`
      [
        {
          "code": "unknown-unit",
          "message": "Unknown unit "furlong" in "furlong*fortnight". docs/units.md lists the units flexura knows.",
          "path": [],
          "suggestions": [],
          "token": "furlong",
          "unit": "furlong*fortnight",
        },
        {
          "code": "unknown-unit",
          "message": "Unknown unit "fortnight" in "furlong*fortnight". docs/units.md lists the units flexura knows.",
          "path": [],
          "suggestions": [],
          "token": "fortnight",
          "unit": "furlong*fortnight",
        },
      ]
    `);
  });

  it("parseQuantity: wrong dimension names both kinds", () => {
    expect(bad("5 mm", "force")).toMatchInlineSnapshot(`
      [
        {
          "code": "wrong-dimension",
          "dimension": "length",
          "expected": "force",
          "found": [
            "length",
          ],
          "message": ""5 mm" is a length, but a force is due here; use a unit such as N, kN, lbf or kip.",
          "path": [],
          "unit": "mm",
        },
      ]
    `);
    expect(bad("5 kN*m/rad", "moment")).toMatchInlineSnapshot(`
      [
        {
          "code": "wrong-dimension",
          "dimension": "force*length*rad^-1",
          "expected": "moment",
          "found": [
            "rotationalStiffness",
          ],
          "message": ""5 kN*m/rad" is a rotational stiffness, but a moment is due here; use a unit such as kN*m, N*mm, kip*ft or kip*in.",
          "path": [],
          "unit": "kN*m/rad",
        },
      ]
    `);
    expect(bad("5 m^7", "length")).toMatchInlineSnapshot(`
      [
        {
          "code": "wrong-dimension",
          "dimension": "length^7",
          "expected": "length",
          "found": [],
          "message": ""5 m^7" has dimension length^7, but a length is due here; use a unit such as m, mm, in or ft.",
          "path": [],
          "unit": "m^7",
        },
      ]
    `);
    expect(bad("5 rad", "dimensionless")).toMatchInlineSnapshot(`
      [
        {
          "code": "wrong-dimension",
          "dimension": "rad",
          "expected": "dimensionless",
          "found": [
            "rotation",
          ],
          "message": ""5 rad" is a rotation, but a plain number is due here; give the number alone.",
          "path": [],
          "unit": "rad",
        },
      ]
    `);
  });

  it("parseQuantity: an unknown kind is reported with the other problems, at the path given", () => {
    expect(issues(tryParseQuantity(42 as unknown as string, "torque" as QuantityKind, { path: ["loads", 0, "value"] }))).toMatchInlineSnapshot(`
      [
        {
          "code": "unknown-quantity-kind",
          "message": ""torque" is not a kind of quantity; use one of length, force, moment, forcePerLength, stress, area, secondMoment, sectionModulus, translationalStiffness, rotationalStiffness, rotation, dimensionless.",
          "path": [
            "loads",
            0,
            "value",
            "kind",
          ],
          "value": ""torque"",
        },
        {
          "code": "quantity-not-a-string",
          "message": "A quantity must be a string such as "12 kN" or "1.5 kip/ft"; got 42.",
          "path": [
            "loads",
            0,
            "value",
          ],
          "value": "42",
        },
      ]
    `);
    expect(issues(tryParseQuantity("5 kN", "torque" as QuantityKind))).toMatchInlineSnapshot(`
      [
        {
          "code": "unknown-quantity-kind",
          "message": ""torque" is not a kind of quantity; use one of length, force, moment, forcePerLength, stress, area, secondMoment, sectionModulus, translationalStiffness, rotationalStiffness, rotation, dimensionless.",
          "path": [
            "kind",
          ],
          "value": ""torque"",
        },
      ]
    `);
  });

  it("convert: every problem at once, each at its own path", () => {
    expect(issues(tryConvert(Number.NaN, "furlong", 7 as unknown as string))).toMatchInlineSnapshot(`
      [
        {
          "code": "not-finite",
          "message": "The value to convert must be a finite number; got NaN.",
          "path": [
            "value",
          ],
          "value": "NaN",
        },
        {
          "code": "unknown-unit",
          "message": "Unknown unit "furlong". docs/units.md lists the units flexura knows.",
          "path": [
            "fromUnit",
          ],
          "suggestions": [],
          "token": "furlong",
          "unit": "furlong",
        },
        {
          "code": "unit-not-a-string",
          "message": "A unit must be a string such as "kN" or "kip/ft"; got 7.",
          "path": [
            "toUnit",
          ],
          "value": "7",
        },
      ]
    `);
    expect(issues(tryConvert("3" as unknown as number, "", "m"))).toMatchInlineSnapshot(`
      [
        {
          "code": "not-a-number",
          "message": "The value to convert must be a number; got "3".",
          "path": [
            "value",
          ],
          "value": ""3"",
        },
        {
          "code": "unit-empty",
          "message": "The unit is empty; give one such as "kN", "mm" or "kip/ft".",
          "path": [
            "fromUnit",
          ],
          "unit": "",
        },
      ]
    `);
    expect(issues(tryConvert(Infinity, "m", "kN", { path: ["span"] }))).toMatchInlineSnapshot(`
      [
        {
          "code": "not-finite",
          "message": "The value to convert must be a finite number; got Infinity.",
          "path": [
            "span",
            "value",
          ],
          "value": "Infinity",
        },
        {
          "code": "incompatible-units",
          "fromDimension": "length",
          "fromUnit": "m",
          "message": "Cannot convert m (length) to kN (force): they measure different things.",
          "path": [
            "span",
            "toUnit",
          ],
          "toDimension": "force",
          "toUnit": "kN",
        },
      ]
    `);
  });

  it("convertQuantity: problems with the text and with the target unit together", () => {
    expect(issues(tryConvertQuantity("12 kip/", "force", "mm"))).toMatchInlineSnapshot(`
      [
        {
          "at": 4,
          "code": "unit-syntax",
          "message": "The unit "kip/" cannot be read: the unit ends with an operator; a unit must follow it (at character 5).",
          "path": [],
          "unit": "kip/",
        },
        {
          "code": "wrong-dimension",
          "dimension": "length",
          "expected": "force",
          "found": [
            "length",
          ],
          "message": "The unit "mm" is a length, but a force is due here; use a unit such as N, kN, lbf or kip.",
          "path": [
            "toUnit",
          ],
          "unit": "mm",
        },
      ]
    `);
    expect(issues(tryConvertQuantity("12 kip", "force", "mm"))).toMatchInlineSnapshot(`
      [
        {
          "code": "wrong-dimension",
          "dimension": "length",
          "expected": "force",
          "found": [
            "length",
          ],
          "message": "The unit "mm" is a length, but a force is due here; use a unit such as N, kN, lbf or kip.",
          "path": [
            "toUnit",
          ],
          "unit": "mm",
        },
      ]
    `);
    expect(issues(tryConvertQuantity("1e303 km", "length", "mm"))).toMatchInlineSnapshot(`
      [
        {
          "code": "number-out-of-range",
          "message": ""1e303 km" is too large to hold as a JavaScript number in mm (magnitudes from about 5e-324 to 1.8e308).",
          "path": [],
          "size": "too large",
        },
      ]
    `);
  });

  it("unitFactor: type, emptiness and unknown symbols", () => {
    expect(issues(tryUnitFactor(null as unknown as string))).toMatchInlineSnapshot(`
      [
        {
          "code": "unit-not-a-string",
          "message": "A unit must be a string such as "kN" or "kip/ft"; got null.",
          "path": [],
          "value": "null",
        },
      ]
    `);
    expect(issues(tryUnitFactor(" "))).toMatchInlineSnapshot(`
      [
        {
          "code": "unit-empty",
          "message": "The unit is empty; give one such as "kN", "mm" or "kip/ft".",
          "path": [],
          "unit": " ",
        },
      ]
    `);
    expect(issues(tryUnitFactor("Kip", { path: ["unit"] }))).toMatchInlineSnapshot(`
      [
        {
          "code": "unknown-unit",
          "message": "Unknown unit "Kip". Did you mean "kip"?",
          "path": [
            "unit",
          ],
          "suggestions": [
            "kip",
          ],
          "token": "Kip",
          "unit": "Kip",
        },
      ]
    `);
  });

  it("the throwing forms throw FlexuraError, never anything else", () => {
    for (const call of [
      () => parseQuantity("12 kip/", "force"),
      () => convertQuantity("x", "force", "kN"),
      () => convert(Number.NaN, "m", "mm"),
      () => unitFactor("m^^2"),
    ]) {
      let thrown: unknown;
      try {
        call();
      } catch (e) {
        thrown = e;
      }
      expect(isFlexuraError(thrown)).toBe(true);
    }
  });
});
