import { describe, expect, it } from "vitest";
import { fc, test } from "@fast-check/vitest";
import { Decimal } from "decimal.js";
import { conversionFactor, convert, parseQuantity, tryConversionFactor, tryUnitFactor, unitFactor } from "../../src/units/index.js";
import { exactRescale } from "../../src/units/scale.js";
import { smallRatioOf } from "../../src/units/unit.js";

const Big = Decimal.clone({ precision: 120 });

describe("exact conversion", () => {
  it("parseQuantity rounds ties to even, as IEEE 754 round-to-nearest does", () => {
    // IEEE 754-2019 4.3.1 roundTiesToEven: 2^53 + 1 lies halfway between 2^53 and 2^53 + 2.
    expect(parseQuantity("9007199254740993 m", "length").value).toBe(9007199254740992);
    expect(parseQuantity("9007199254740995 m", "length").value).toBe(9007199254740996);
    expect(parseQuantity("9007199254740993000 mm", "length").value).toBe(9007199254740992);
    // Just above the tie rounds up.
    expect(parseQuantity("9007199254740993.000000001 m", "length").value).toBe(9007199254740994);
  });

  it("subnormal and extreme results round once", () => {
    expect(parseQuantity("1e-310 m", "length").value).toBe(1e-310);
    expect(parseQuantity("1e-305 mm", "length").value).toBe(1e-308);
    expect(parseQuantity(`${"1".repeat(50)} mm`, "length").value).toBe(Number(`${"1".repeat(47)}.111`));
    expect(convert(1e-300, "km", "mm")).toBe(1e-294);
    expect(exactRescale("1e-500", undefined, undefined)).toBe(0);
  });

  it("the all-double path is taken only when every integer is below 2^53", () => {
    expect(smallRatioOf(unitFactor("in"))).toEqual({ num: 254, den: 10000 });
    expect(smallRatioOf(unitFactor("kip/ft"))).toEqual({ num: 44482216152605, den: 3048000000 });
    expect(smallRatioOf(unitFactor("lbf^2"))).toEqual({ num: Infinity, den: Infinity });
    expect(unitFactor("in").numerator.toString()).toBe("0.0254");
    expect(unitFactor("psi").denominator.toString()).toBe("0.00064516");
    // 29000 ksi: 29000 x 44482216152605 exceeds 2^53, so decimal.js takes it (same answer, one rounding).
    expect(parseQuantity("29000 ksi", "stress").value).toBe(new Big("29000").times("4448.2216152605").div("0.00064516").toNumber());
  });

  it("powers that multiply beyond 12 are refused, before any arithmetic", () => {
    const r = tryUnitFactor("((km^12)^12)^12");
    expect(r.ok ? "ok" : r.error.issues[0]).toMatchInlineSnapshot(`
      {
        "at": 0,
        "code": "unit-syntax",
        "message": "The unit "((km^12)^12)^12" cannot be read: its powers multiply to km^1728, beyond the limit of 12.",
        "path": [],
        "unit": "((km^12)^12)^12",
      }
    `);
    expect(tryConversionFactor("km^12*km^12*km^12*km^12*km^12*km^12*km^12*km^12*km^12", "mm^12*mm^12*mm^12*mm^12*mm^12*mm^12*mm^12*mm^12*mm^12")).toMatchObject({
      ok: false,
      // 1 km^108 = 1e324 m^108: beyond a double already, so the unit itself is refused
      error: { code: "unit-out-of-range" },
    });
  });

  const units = ["m", "mm", "in", "ft", "kN", "lbf", "kip", "psi", "ksi", "kip/ft", "kip*ft", "in^4", "MPa", "yd^3", "N*mm/rad"];
  const decimalText = fc
    .tuple(fc.bigInt({ min: -(10n ** 20n), max: 10n ** 20n }), fc.integer({ min: -30, max: 30 }))
    .map(([m, e]) => `${m}e${e}`);

  test.prop([decimalText, fc.constantFrom(...units), fc.constantFrom(...units)], { numRuns: 200 })(
    "both paths give the number decimal.js gives at 120 digits",
    (text, a, b) => {
      const from = unitFactor(a);
      const to = unitFactor(b);
      const got = exactRescale(text, from, to);
      const reference = new Big(text).times(from.numerator).times(to.denominator).div(new Big(from.denominator).times(to.numerator)).toNumber();
      expect(got === 0 ? 0 : got).toBe(reference === 0 ? 0 : reference);
    },
  );

  test.prop([fc.constantFrom(...units), fc.constantFrom(...units)], { numRuns: 100 })("scale is the factor rounded once; conversionFactor is the ratio rounded once", (a, b) => {
    const fa = unitFactor(a);
    const fb = unitFactor(b);
    expect(fa.scale).toBe(new Big(fa.numerator).div(fa.denominator).toNumber());
    if (fa.dimension.length === fb.dimension.length && fa.dimension.force === fb.dimension.force) {
      expect(conversionFactor(a, b)).toBe(new Big(fa.numerator).times(fb.denominator).div(new Big(fa.denominator).times(fb.numerator)).toNumber());
    }
  });
});
