import { describe, expect, it } from "vitest";
import { fc, test } from "@fast-check/vitest";
import { Decimal } from "decimal.js";
import { conversionFactor, convert, parseQuantity, tryConversionFactor, tryUnitFactor, unitFactor } from "../../src/units/index.js";
import { decimalRescale, exactRescale } from "../../src/units/scale.js";
import { nearestNumber, rational, rationalOf, scaledInteger } from "../../src/units/rational.js";

const Big = Decimal.clone({ precision: 120 });

describe("exact conversion", () => {
  it("nearestNumber rounds ties to even, as IEEE 754 round-to-nearest does", () => {
    // IEEE 754-2019 4.3.1 roundTiesToEven: 2^53 + 1 lies halfway between 2^53 and 2^53 + 2.
    expect(parseQuantity("9007199254740993 m", "length").value).toBe(9007199254740992);
    expect(parseQuantity("9007199254740995 m", "length").value).toBe(9007199254740996);
    expect(parseQuantity("9007199254740993000 mm", "length").value).toBe(9007199254740992);
    // Just above the tie rounds up.
    expect(parseQuantity("9007199254740993.000000001 m", "length").value).toBe(9007199254740994);
    expect(nearestNumber(-3n, 2n)).toBe(-1.5);
    expect(nearestNumber(0n, 7n)).toBe(0);
    expect(nearestNumber(1n, 3n)).toBe(1 / 3);
  });

  it("subnormal and extreme results take the decimal path and still round once", () => {
    expect(nearestNumber(1n, 10n ** 310n)).toBeUndefined();
    expect(parseQuantity("1e-310 m", "length").value).toBe(1e-310);
    expect(parseQuantity("1e-305 mm", "length").value).toBe(1e-308);
    expect(parseQuantity(`${"1".repeat(50)} mm`, "length").value).toBe(Number(`${"1".repeat(47)}.111`));
    expect(convert(1e-300, "km", "mm")).toBe(1e-294);
    expect(exactRescale("1e-500", undefined, undefined)).toBeUndefined();
  });

  it("rational helpers read decimals exactly", () => {
    expect(rationalOf("0.0254")).toEqual({ num: 127n, den: 5000n });
    expect(rationalOf("4448.2216152605")).toEqual(rational(44482216152605n, 10n ** 10n));
    expect(rational(6n, -4n)).toEqual({ num: -3n, den: 2n });
    expect(scaledInteger("-1.5e3")).toEqual({ mantissa: -15n, exponent: 2 });
    expect(scaledInteger("+.5")).toEqual({ mantissa: 5n, exponent: -1 });
    expect(scaledInteger("e5")).toBeUndefined();
    expect(scaledInteger("x")).toBeUndefined();
    expect(() => rationalOf("x")).toThrow();
    expect(unitFactor("in").numerator.toString()).toBe("127");
    expect(unitFactor("in").denominator.toString()).toBe("5000");
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
      error: { code: "number-out-of-range" },
    });
  });

  const units = ["m", "mm", "in", "ft", "kN", "lbf", "kip", "psi", "ksi", "kip/ft", "kip*ft", "in^4", "MPa", "yd^3", "N*mm/rad"];
  const decimalText = fc
    .tuple(fc.bigInt({ min: -(10n ** 20n), max: 10n ** 20n }), fc.integer({ min: -30, max: 30 }))
    .map(([m, e]) => `${m}e${e}`);

  test.prop([decimalText, fc.constantFrom(...units), fc.constantFrom(...units)], { numRuns: 200 })(
    "the BigInt path and the decimal.js path give the same number",
    (text, a, b) => {
      const from = unitFactor(a);
      const to = unitFactor(b);
      const fast = exactRescale(text, from, to);
      const slow = decimalRescale(text, from, to, [], () => text);
      const reference = new Big(text).times(from.numerator).times(to.denominator).div(new Big(from.denominator).times(to.numerator)).toNumber();
      if (fast !== undefined) expect(fast === 0 ? 0 : fast).toBe(reference === 0 ? 0 : reference);
      expect(slow).toBe(reference === 0 ? 0 : reference);
    },
  );

  test.prop([fc.constantFrom(...units), fc.constantFrom(...units)], { numRuns: 100 })("scale is the factor rounded once; conversionFactor is the ratio rounded once", (a, b) => {
    const fa = unitFactor(a);
    expect(fa.scale).toBe(fa.factor.toNumber());
    if (fa.dimension.length === unitFactor(b).dimension.length && fa.dimension.force === unitFactor(b).dimension.force) {
      const fb = unitFactor(b);
      expect(conversionFactor(a, b)).toBe(new Big(fa.numerator).times(fb.denominator).div(new Big(fa.denominator).times(fb.numerator)).toNumber());
    }
  });
});
