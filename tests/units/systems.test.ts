import { describe, expect, it } from "vitest";
import { fc, test } from "@fast-check/vitest";
import {
  formatQuantity,
  kindOfRole,
  parseQuantity,
  quantityKinds,
  tryFormatQuantity,
  unitCatalog,
  unitFactor,
  unitSystems,
  type DisplayRole,
  type UnitSystem,
} from "../../src/units/index.js";

const ROLES: readonly DisplayRole[] = [...quantityKinds, "deflection", "modulus", "sectionLength"];

describe("unitSystems", () => {
  it.each(Object.values(unitSystems))("every unit of preset $name is of its role's kind", (system: UnitSystem) => {
    for (const role of ROLES) {
      const unit = system[role];
      if (unit === "") {
        expect(role).toBe("dimensionless");
        continue;
      }
      expect(unitFactor(unit).kinds, `${system.name}.${role} = ${unit}`).toContain(kindOfRole(role));
      expect(unitFactor(unit).unit, `${unit} is printed as written`).toBe(unit);
    }
  });

  it("presets are frozen and named by their key", () => {
    for (const [key, system] of Object.entries(unitSystems)) {
      expect(system.name).toBe(key);
      expect(Object.isFrozen(system)).toBe(true);
    }
    expect(Object.isFrozen(unitSystems)).toBe(true);
  });

  it("kindOfRole maps the display roles", () => {
    expect(kindOfRole("deflection")).toBe("length");
    expect(kindOfRole("modulus")).toBe("stress");
    expect(kindOfRole("sectionLength")).toBe("length");
    expect(kindOfRole("moment")).toBe("moment");
  });

  it("the catalogue is documented and frozen", () => {
    for (const u of unitCatalog) {
      expect(Object.isFrozen(u)).toBe(true);
      expect(u.name.length).toBeGreaterThan(0);
      expect(unitFactor(u.symbol).unit).toBe(u.symbol);
      for (const a of u.aliases) expect(unitFactor(a).unit).toBe(u.symbol);
    }
  });
});

describe("formatQuantity", () => {
  it("formatQuantity converts from SI base units and rounds for display", () => {
    expect(formatQuantity(12345, "kN*m")).toBe("12.35 kN*m");
    expect(formatQuantity(1.2e-4, "mm^4", { style: "pretty" })).toBe("120000000 mm⁴");
    expect(formatQuantity(3, "in", { from: "ft", decimals: 1 })).toBe("36.0 in"); // 1 ft = 12 in (NIST SP 811 B.8)
    expect(formatQuantity(0.3, "")).toBe("0.3");
    expect(formatQuantity(-1e-9, "m")).toBe("-1e-9 m");
    expect(formatQuantity(2.5e20, "N")).toBe("2.5e20 N");
    expect(formatQuantity(-0, "m")).toBe("0 m");
    expect(formatQuantity(1e-30, "m")).toBe("1e-30 m");
    expect(formatQuantity(5000, "kN*m/rad", { style: "pretty" })).toBe("5 kN·m/rad");
    expect(formatQuantity(1, "m^-1", { style: "pretty" })).toBe("1 m⁻¹");
    expect(formatQuantity(1 / 3, "m", { significantDigits: 2 })).toBe("0.33 m");
    expect(formatQuantity(2, "rad", { from: "" })).toBe("2 rad");
  });

  it("formatQuantity shows a quantity in each preset", () => {
    const m = parseQuantity("12 kip*ft", "moment").value;
    // NIST SP 811 B.9: lbf*ft = 1.355 818 E+00 N*m, so 12 kip*ft = 16.27 kN*m.
    expect(formatQuantity(m, unitSystems.siKilonewtonMetre.moment)).toBe("16.27 kN*m");
    expect(formatQuantity(m, unitSystems.usKipInch.moment)).toBe("144 kip*in");
    expect(formatQuantity(m, unitSystems.usKipFoot.moment)).toBe("12 kip*ft");
  });

  it("formatQuantity reports every problem", () => {
    const r = tryFormatQuantity(Number.NaN, "furlong", { from: "N", significantDigits: 0, decimals: 1.5 });
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.error.issues.map((i) => i.code)).toEqual(["not-finite", "format-digits-out-of-range", "format-digits-out-of-range", "unknown-unit"]);
    const s = tryFormatQuantity(1, "m", { from: "kN" });
    expect(s.ok ? "ok" : s.error.issues[0]).toMatchInlineSnapshot(`
      {
        "code": "incompatible-units",
        "fromUnit": "kN",
        "message": "Cannot show a value in kN (force) as m (length).",
        "path": [
          "unit",
        ],
        "toUnit": "m",
      }
    `);
    const t = tryFormatQuantity(1, "", { from: "kN" });
    expect(t.ok ? "ok" : t.error.code).toBe("incompatible-units");
    const u = tryFormatQuantity(1, "m", { from: "$" });
    expect(u.ok ? "ok" : u.error.issues[0]?.path).toEqual(["options", "from"]);
    expect(tryFormatQuantity(1e303, "mm", { from: "km" })).toMatchObject({ ok: false, error: { code: "number-out-of-range" } });
  });

  test.prop([fc.double({ min: -1e12, max: 1e12, noNaN: true }).filter((x) => x === 0 || Math.abs(x) > 1e-12), fc.integer({ min: 1, max: 17 })], { numRuns: 100 })(
    "formatQuantity(x, unit) reads back with parseQuantity to within its significant digits",
    (x, digits) => {
      const text = formatQuantity(x, "kN", { significantDigits: digits });
      const back = parseQuantity(text, "force").value;
      expect(Math.abs(back - x)).toBeLessThanOrEqual(Math.abs(x) * (0.5 * 10 ** (1 - digits) + 4 * Number.EPSILON));
    },
  );
});
