import { describe, expect, it } from "vitest";
import { fc, test } from "@fast-check/vitest";
import { Decimal } from "decimal.js";
import { parseQuantity, quantityKinds, tryParseQuantity, unitFactor, type QuantityKind } from "../../src/units/index.js";
import { UNITS_OF } from "./fixtures.js";

describe("parseQuantity", () => {
  it("parseQuantity reads the quantities engineers write and gives SI base values", () => {
    // Expected values: exact definitions (NIST SP 811 (2008) B.9: in = 0.0254 m, lbf = 4.4482216152605 N), worked by hand.
    expect(parseQuantity("1.5 kip/ft", "forcePerLength")).toEqual({ kind: "forcePerLength", value: 21890.854405809547, amount: 1.5, unit: "kip/ft" });
    expect(parseQuantity("29000 ksi", "stress").value).toBe(Number(new Decimal("29000").times("4448.2216152605").div("0.00064516")));
    expect(parseQuantity("350 in^4", "secondMoment").value).toBe(0.00014568099896); // 350 x 0.0254^4, exact decimal
    expect(parseQuantity("12 kN*m", "moment")).toEqual({ kind: "moment", value: 12000, amount: 12, unit: "kN*m" });
    expect(parseQuantity("200 GPa", "stress").value).toBe(2e11);
    expect(parseQuantity("120000000 mm^4", "secondMoment").value).toBe(1.2e-4);
    expect(parseQuantity("5000 kN/m", "translationalStiffness").value).toBe(5e6);
    expect(parseQuantity("5 mm", "length").value).toBe(0.005);
  });

  it("parseQuantity rounds once from the number as written (0.1 mm is exactly the double nearest 1e-4 m)", () => {
    expect(parseQuantity("0.1 mm", "length").value).toBe(1e-4);
    expect(parseQuantity("0.29 m", "length").value).toBe(0.29);
    expect(parseQuantity("1.1 kN", "force").value).toBe(1100); // 1.1 * 1000 in doubles is 1100.0000000000002
  });

  it("parseQuantity accepts signs, exponents and missing leading digits", () => {
    expect(parseQuantity("-1.5e3 N", "force").value).toBe(-1500);
    expect(parseQuantity("+2 kN", "force").value).toBe(2000);
    expect(parseQuantity(".5 m", "length").value).toBe(0.5);
    expect(parseQuantity("3. m", "length").value).toBe(3);
    expect(parseQuantity("2E-3 m", "length").value).toBe(0.002);
    expect(parseQuantity("-0 kN", "force").value).toBe(0);
    expect(Object.is(parseQuantity("-0 kN", "force").value, -0)).toBe(false);
  });

  it("parseQuantity normalises the unit text", () => {
    const unitOf = (text: string, kind: QuantityKind): string => parseQuantity(text, kind).unit;
    expect(unitOf("  1.5   kip / ft  ", "forcePerLength")).toBe("kip/ft");
    expect(unitOf("1.5kip/ft", "forcePerLength")).toBe("kip/ft");
    expect(unitOf("3 kip-ft", "moment")).toBe("kip*ft");
    expect(unitOf("3 kN·m", "moment")).toBe("kN*m");
    expect(unitOf("3 kN⋅m", "moment")).toBe("kN*m");
    expect(unitOf("3 kN×m", "moment")).toBe("kN*m");
    expect(unitOf("3 N/mm²", "stress")).toBe("N/mm^2");
    expect(unitOf("3 in4", "secondMoment")).toBe("in^4");
    expect(unitOf("3 in ^ 4", "secondMoment")).toBe("in^4");
    expect(unitOf("3 m^(2)", "area")).toBe("m^2");
    expect(unitOf("3 kips", "force")).toBe("kip");
    expect(unitOf("3 lb", "force")).toBe("lbf");
    expect(unitOf("3 kN/(m)", "forcePerLength")).toBe("kN/m");
    expect(unitOf("3 kN/(m*m)", "stress")).toBe("kN/(m*m)");
    expect(unitOf("3 kN*m^-2", "stress")).toBe("kN*m^-2");
    expect(unitOf("3 kN*m⁻²", "stress")).toBe("kN*m^-2");
    expect(unitOf("3 (kN*m)^2/(kN*m)", "moment")).toBe("(kN*m)^2/(kN*m)");
    expect(unitOf("3 kip*ft/rad", "rotationalStiffness")).toBe("kip*ft/rad");
    expect(unitOf("0.3", "dimensionless")).toBe("");
    expect(unitOf("0.01", "rotation")).toBe("");
  });

  it("parseQuantity agrees with the same unit written other ways", () => {
    // Common practice: N/mm^2 is MPa; kN/mm^2 is GPa; ksi is kip/in^2; plf is lbf/ft.
    const same = (a: string, b: string, kind: QuantityKind): void => expect(parseQuantity(`7 ${a}`, kind).value).toBe(parseQuantity(`7 ${b}`, kind).value);
    same("N/mm^2", "MPa", "stress");
    same("kN/mm^2", "GPa", "stress");
    same("ksi", "kip/in^2", "stress");
    same("psf", "lbf/ft^2", "stress");
    same("plf", "lbf/ft", "forcePerLength");
    same("klf", "kip/ft", "forcePerLength");
    same("kN/(m*m)", "kN/m^2", "stress");
    same("kN*m^-2", "kPa", "stress");
    same("(m^2)^2", "m^4", "secondMoment");
  });

  it("rotational stiffness may be written with or without /rad; a moment may not carry /rad", () => {
    // NIST SP 811 (2008) 4.2.1: the radian is a derived unit equal to 1 (m/m).
    expect(parseQuantity("5 kN*m", "rotationalStiffness").value).toBe(parseQuantity("5 kN*m/rad", "rotationalStiffness").value);
    expect(tryParseQuantity("5 kN*m/rad", "moment").ok).toBe(false);
    expect(tryParseQuantity("0.1 rad", "dimensionless").ok).toBe(false);
    expect(parseQuantity("0.1 rad", "rotation").value).toBe(0.1);
  });

  it("parseQuantity neither changes nor shares what it returns", () => {
    const a = parseQuantity("12 kN", "force");
    expect(Object.isFrozen(a)).toBe(true);
    const f = unitFactor("kN");
    expect(Object.isFrozen(f)).toBe(true);
    expect(Object.isFrozen(f.factor)).toBe(true);
    expect(() => (f.kinds as QuantityKind[]).push("length")).toThrow();
  });

  test.prop([fc.constantFrom(...quantityKinds.filter((k) => UNITS_OF[k].length > 0)), fc.nat(), fc.double({ min: -1e12, max: 1e12, noNaN: true }).filter((x) => x === 0 || Math.abs(x) > 1e-200)], { numRuns: 150 })(
    "parseQuantity(`${x} ${unit}`).value equals x times the exact factor, rounded once",
    (kind, pick, x) => {
      const units = UNITS_OF[kind];
      const unit = units[pick % units.length]!;
      const q = parseQuantity(`${x} ${unit}`, kind);
      const f = unitFactor(unit);
      expect(q.amount).toBe(x === 0 ? 0 : x);
      expect(q.value).toBe(new Decimal(String(x)).times(f.numerator).div(f.denominator).toNumber() || 0);
    },
  );
});
