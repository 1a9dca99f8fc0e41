import { describe, expect, it } from "vitest";
import { fc, test } from "@fast-check/vitest";
import { Decimal } from "decimal.js";
import { conversionFactor, convert, convertQuantity, quantityKinds, tryConversionFactor, tryConvert } from "../../src/units/index.js";
import { UNITS_OF } from "./fixtures.js";

// Independent exact definitions, written here rather than taken from the module:
// NIST SP 811 (2008) Appendix B.8/B.9: inch = 0.0254 m, foot = 0.3048 m, yard = 0.9144 m (exact);
// pound (avoirdupois) = 0.453 592 37 kg (exact); standard acceleration of gravity 9.806 65 m/s^2 (exact),
// so pound-force = 0.45359237 x 9.80665 N; kip = 1000 lbf (B.8).
const LBF = new Decimal("0.45359237").times("9.80665");
const SI: Readonly<Record<string, Decimal>> = {
  m: new Decimal(1),
  mm: new Decimal("0.001"),
  in: new Decimal("0.0254"),
  ft: new Decimal("0.3048"),
  yd: new Decimal("0.9144"),
  N: new Decimal(1),
  kN: new Decimal(1000),
  lbf: LBF,
  kip: LBF.times(1000),
  "kip/ft": LBF.times(1000).div("0.3048"),
  "kN/m": new Decimal(1000),
  "lbf/in": LBF.div("0.0254"),
  "N/mm": new Decimal(1000),
  psi: LBF.div(new Decimal("0.0254").pow(2)),
  ksi: LBF.times(1000).div(new Decimal("0.0254").pow(2)),
  MPa: new Decimal(1e6),
  GPa: new Decimal(1e9),
  "kip*ft": LBF.times(1000).times("0.3048"),
  "kN*m": new Decimal(1000),
  "in^4": new Decimal("0.0254").pow(4),
  "mm^4": new Decimal("1e-12"),
};
const GROUPS: readonly (readonly string[])[] = [
  ["m", "mm", "in", "ft", "yd"],
  ["N", "kN", "lbf", "kip"],
  ["kip/ft", "kN/m", "lbf/in", "N/mm"],
  ["psi", "ksi", "MPa", "GPa"],
  ["kip*ft", "kN*m"],
  ["in^4", "mm^4"],
];
const Big = Decimal.clone({ precision: 80 });

describe("convert", () => {
  it("convert gives the published exact values", () => {
    expect(convert(1, "in", "mm")).toBe(25.4); // NIST SP 811 B.9: inch = 2.54 E-02 m (exact)
    expect(convert(1, "ft", "in")).toBe(12); // NIST SP 811 B.8: foot = 12 in (exact)
    expect(convert(1, "yd", "ft")).toBe(3); // NIST SP 811 B.8: yard = 3 ft (exact)
    expect(convert(1, "kip", "lbf")).toBe(1000); // NIST SP 811 B.8: kip = 1000 lbf
    expect(convert(1, "lbf", "N")).toBe(4.4482216152605); // NIST SP 811 B.8 note: lbf = 4.448 221 615 260 5 N (exact)
    expect(convert(1, "MPa", "N/mm^2")).toBe(1); // NIST SP 811 (2008) 4.1 and Table 5: MPa = 10^6 Pa, mm^2 = 10^-6 m^2
    expect(convert(1, "ksi", "psi")).toBe(1000);
  });

  it("convert takes the number as the decimal that names it and rounds once", () => {
    expect(convert(0.29, "m", "cm")).toBe(29); // 0.29 * 100 in doubles is 28.999999999999996
    expect(convert(1.1, "kN", "N")).toBe(1100);
    expect(convert(0.1, "m", "mm")).toBe(100);
  });

  it("convert agrees with the kinds that share a dimension", () => {
    // Common practice: a spring stiffness in kN/m and a distributed load in kN/m share the unit.
    expect(convertQuantity("5000 kN/m", "translationalStiffness", "N/mm")).toBe(5000);
    expect(convert(3, "kN*m/rad", "kN*m")).toBe(3);
    expect(convert(3, "kN*m", "kip*ft/rad")).toBe(convert(3, "kN*m", "kip*ft"));
  });

  test.prop([fc.nat(), fc.nat(), fc.nat(), fc.double({ min: -1e15, max: 1e15, noNaN: true }).filter((x) => x === 0 || Math.abs(x) > 1e-200)], { numRuns: 200 })(
    "convert(x, a, b) equals x * factor(a) / factor(b) computed independently from the exact definitions",
    (g, i, j, x) => {
      const group = GROUPS[g % GROUPS.length]!;
      const a = group[i % group.length]!;
      const b = group[j % group.length]!;
      const expected = new Big(String(x)).times(SI[a]!).div(SI[b]!).toNumber() || 0;
      expect(convert(x, a, b)).toBe(expected);
    },
  );

  const compatible = fc
    .constantFrom(...quantityKinds.filter((k) => UNITS_OF[k].length > 0))
    .chain((k) => fc.tuple(fc.constantFrom(...UNITS_OF[k]), fc.constantFrom(...UNITS_OF[k]), fc.constantFrom(...UNITS_OF[k])));
  const value = fc.double({ min: -1e100, max: 1e100, noNaN: true }).filter((x) => x === 0 || Math.abs(x) > 1e-100);
  const close = (got: number, want: number, ulps: number): void => {
    expect(Math.abs(got - want)).toBeLessThanOrEqual(ulps * Number.EPSILON * Math.abs(want));
  };

  test.prop([compatible, value], { numRuns: 200 })("convert(convert(x, a, b), b, a) returns x to within two roundings", ([a, b], x) => {
    close(convert(convert(x, a, b), b, a), x, 2);
  });

  test.prop([compatible, value], { numRuns: 150 })("convert(convert(x, a, b), b, c) equals convert(x, a, c) to within three roundings", ([a, b, c], x) => {
    close(convert(convert(x, a, b), b, c), convert(x, a, c), 3);
  });

  test.prop([compatible, value], { numRuns: 100 })("convert(x, a, a) is x", ([a], x) => {
    expect(convert(x, a, a)).toBe(x === 0 ? 0 : x);
  });

  test.prop([compatible], { numRuns: 100 })("conversionFactor(a, b) is convert(1, a, b) and conversionFactor(b, a) is its reciprocal", ([a, b]) => {
    expect(conversionFactor(a, b)).toBe(convert(1, a, b));
    close(conversionFactor(a, b) * conversionFactor(b, a), 1, 2);
  });

  it("convert refuses values that overflow or underflow in the target unit", () => {
    expect(tryConvert(1e306, "km", "mm")).toMatchObject({ ok: false, error: { code: "number-out-of-range" } });
    expect(tryConvert(1e-320, "mm", "km")).toMatchObject({ ok: false, error: { code: "number-out-of-range" } });
    expect(tryConversionFactor("m", "kN")).toMatchObject({ ok: false, error: { code: "incompatible-units" } });
    expect(tryConversionFactor("m", "mm")).toEqual({ ok: true, value: 1000 });
  });
});
