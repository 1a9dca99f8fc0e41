import { describe, expect, it } from "vitest";
import { Decimal } from "decimal.js";
import {
  conversionFactor,
  convert,
  dimensionOfKind,
  kindOfRole,
  parseQuantity,
  tryConversionFactor,
  tryConvert,
  tryConvertQuantity,
  tryFormatQuantity,
  tryParseQuantity,
  tryUnitFactor,
  unitCatalog,
  unitFactor,
  unitSystems,
  type QuantityKind,
} from "../../src/units/index.js";
import { isFlexuraError, type Result } from "../../src/errors/index.js";

const codes = <T>(r: Result<T>): string[] => (r.ok ? ["ok"] : r.error.issues.map((i) => `${i.code} ${i.path.join(".")}`));
const thrown = (f: () => unknown): string[] => {
  try {
    f();
    return ["ok"];
  } catch (e) {
    return isFlexuraError(e) ? e.issues.map((i) => `${i.code} ${i.path.join(".")}`) : [`raw ${String(e)}`];
  }
};
const any = (v: unknown) => v as never;

describe("a unit whose SI value a double cannot hold is refused", () => {
  it('"GPa^12*GPa^12*GPa^12" (1e324 Pa^36) and its reciprocal are unit-out-of-range, never a scale of Infinity or 0', () => {
    expect(codes(tryUnitFactor("GPa^12*GPa^12*GPa^12"))).toEqual(["unit-out-of-range "]);
    expect(codes(tryUnitFactor("GPa^-12*GPa^-12*GPa^-12"))).toEqual(["unit-out-of-range "]);
    expect(codes(tryConvert(1, "GPa^12*GPa^12*GPa^12", "GPa^12*GPa^12*GPa^12"))).toEqual(["unit-out-of-range fromUnit", "unit-out-of-range toUnit"]);
    expect(codes(tryConversionFactor("m", "GPa^12*GPa^12*GPa^12", { path: ["u"] }))).toEqual(["unit-out-of-range u.toUnit"]);
    expect(codes(tryFormatQuantity(1, "GPa^12*GPa^12*GPa^12"))).toEqual(["unit-out-of-range unit"]);
    // 1 GPa^12 = 1e108 Pa^12 and 1 mm^-12 ... are within range and still read (1 GPa = 1e9 Pa exactly, SI)
    expect(unitFactor("GPa^12").scale).toBe(1e108);
    expect(unitFactor("GPa^12*GPa^12").scale).toBe(1e216);
  });
});

describe("own-property lookups for kinds and roles", () => {
  it('dimensionOfKind("constructor") is a typed error, not Object', () => {
    for (const k of ["constructor", "toString", "__proto__", "hasOwnProperty", "", 5, null])
      expect(thrown(() => dimensionOfKind(any(k)))).toEqual(["unknown-quantity-kind kind"]);
    expect(dimensionOfKind("moment")).toEqual({ length: 1, force: 1, angle: 0 });
  });

  it('kindOfRole("constructor") is a typed error, not "constructor"', () => {
    for (const k of ["constructor", "valueOf", "deflections", 5]) expect(thrown(() => kindOfRole(any(k)))).toEqual(["unknown-display-role role"]);
    expect(kindOfRole("modulus")).toBe("stress");
    expect(kindOfRole("force")).toBe("force");
  });
});

describe("malformed options are refused by the try forms, never thrown raw", () => {
  it("a path that is not a list of names and indices", () => {
    for (const path of [5, "loads", null, [{}], [Number.NaN]]) {
      expect(codes(tryConvert(1, "m", "mm", { path: any(path) }))).toEqual(["options-invalid options.path"]);
      expect(codes(tryConversionFactor("m", "mm", { path: any(path) }))).toEqual(["options-invalid options.path"]);
      expect(codes(tryUnitFactor("m", { path: any(path) }))).toEqual(["options-invalid options.path"]);
      expect(codes(tryParseQuantity("1 m", "length", { path: any(path) }))).toEqual(["options-invalid options.path"]);
      expect(codes(tryConvertQuantity("1 m", "length", "mm", { path: any(path) }))).toEqual(["options-invalid options.path"]);
    }
  });

  it("options that are not an object, and a format style that does not exist", () => {
    expect(codes(tryConvert(1, "m", "mm", any(5)))).toEqual(["options-invalid options"]);
    expect(codes(tryParseQuantity("1 m", "length", any("path")))).toEqual(["options-invalid options"]);
    expect(codes(tryFormatQuantity(1, "m", any(5)))).toEqual(["options-invalid options"]);
    expect(codes(tryFormatQuantity(1, "m", any({ style: "fancy" })))).toEqual(["options-invalid options.style"]);
    // null and undefined mean no options
    expect(tryConvert(1, "m", "mm", any(null))).toEqual({ ok: true, value: 1000 });
    expect(codes(tryConvert(1, "m", "kN", { path: ["loads", 2] }))).toEqual(["incompatible-units loads.2.toUnit"]);
  });
});

describe("the unit catalogue cannot be changed by a user's code", () => {
  it("its decimals are frozen all the way down", () => {
    const inch = unitCatalog.find((u) => u.symbol === "in")!;
    expect(Object.isFrozen(inch.numerator)).toBe(true);
    expect(Object.isFrozen((inch.numerator as unknown as { d: number[] }).d)).toBe(true);
    expect(() => {
      (inch.numerator as unknown as { d: number[] }).d[0] = 5;
    }).toThrow(TypeError);
    expect(inch.numerator.toString()).toBe("0.0254"); // inch = 0.0254 m exactly (NIST SP 811 (2008) B.9)
    expect(convert(1, "in", "mm")).toBe(25.4);
    const f = unitFactor("kip*ft");
    expect(Object.isFrozen((f.factor as unknown as { d: number[] }).d)).toBe(true);
    expect(Object.isFrozen((f.numerator as unknown as { d: number[] }).d)).toBe(true);
  });

  it("changing the settings of a handed-out decimal's constructor changes nothing flexura computes", () => {
    const before = [convert(29000, "ksi", "MPa"), convert(12345.678901234567, "kip*ft", "kN*m"), unitFactor("lbf^3/in^5").scale, parseQuantity("29000 ksi", "stress").value];
    const ctor = unitCatalog[0]!.numerator.constructor as typeof Decimal;
    const ctor2 = unitFactor("psi").factor.constructor as typeof Decimal;
    const saved = { precision: ctor.precision, rounding: ctor.rounding };
    try {
      ctor.set({ precision: 2, rounding: Decimal.ROUND_DOWN });
      ctor2.set({ precision: 2, rounding: Decimal.ROUND_DOWN });
      const after = [convert(29000, "ksi", "MPa"), convert(12345.678901234567, "kip*ft", "kN*m"), unitFactor("lbf^3/in^5").scale, parseQuantity("29000 ksi", "stress").value];
      expect(after).toEqual(before);
      // a unit read for the first time after the change is exact too: 1 ksi = 4448.2216152605 / 0.00064516 Pa (NIST SP 811 (2008) B.9)
      const D = Decimal.clone({ precision: 64 });
      expect(unitFactor("ksi^2*in").factor.toString()).toBe(new D("4448.2216152605").pow(2).times("0.0254").div(new D("0.00064516").pow(2)).toString());
    } finally {
      ctor.set(saved);
      ctor2.set(saved);
    }
  });

  it("handed-out decimals still do arithmetic (decimal.js copies digits before changing them)", () => {
    const f = unitFactor("kip*ft").factor;
    const inch = unitCatalog.find((u) => u.symbol === "in")!.numerator;
    // 1 kip*ft = 4448.2216152605 N x 0.3048 m = 1355.8179483314004 N*m exactly (NIST SP 811 (2008) B.9)
    expect(f.toString()).toBe("1355.8179483314004");
    expect(f.plus(inch).toString()).toBe("1355.8433483314004");
    expect(inch.times(inch).toString()).toBe("0.00064516");
    expect(f.div(inch).toNumber()).toBeCloseTo(53378.65938312600, 9);
    expect(inch.pow(2).sqrt().toString()).toBe("0.0254");
    expect(f.toFixed(2)).toBe("1355.82");
    expect(f.ln().toNumber()).toBeCloseTo(Math.log(1355.8179483314004), 12);
    expect(f.toString()).toBe("1355.8179483314004");
  });

  it("the presets are frozen", () => {
    expect(Object.isFrozen(unitSystems)).toBe(true);
    expect(Object.isFrozen(unitSystems.usKipFoot)).toBe(true);
    expect(conversionFactor(unitSystems.usKipFoot.force, "kN")).toBe(4.4482216152605);
    expect(() => ((unitSystems as { usKipFoot: unknown }).usKipFoot = unitSystems.siNewtonMetre)).toThrow(TypeError);
  });
});

// helps the type checker see QuantityKind is used
export type _Kinds = QuantityKind;
