import { describe, expect, it } from "vitest";
import {
  convertQuantity,
  describeDimension,
  dimensionOfKind,
  fitsDimension,
  isQuantityKind,
  kindsOfDimension,
  quantityKinds,
  sameDimension,
  tryConvert,
  tryConvertQuantity,
  tryParseQuantity,
  unitFactor,
} from "../../src/units/index.js";
import { UNITS_OF } from "./fixtures.js";

// Dimensions of the quantities: common practice (moment F*L, stress F/L^2, I L^4, S L^3 ...).
describe("dimensions", () => {
  it("dimensionOfKind gives each kind's exponents", () => {
    expect(describeDimension(dimensionOfKind("stress"))).toBe("force*length^-2");
    expect(describeDimension(dimensionOfKind("secondMoment"))).toBe("length^4");
    expect(describeDimension(dimensionOfKind("rotationalStiffness"))).toBe("force*length*rad^-1");
    expect(describeDimension(dimensionOfKind("dimensionless"))).toBe("1");
    expect(kindsOfDimension(dimensionOfKind("forcePerLength"))).toEqual(["forcePerLength", "translationalStiffness"]);
    expect(kindsOfDimension({ length: 7, force: 0, angle: 0 })).toEqual([]);
    expect(isQuantityKind("moment")).toBe(true);
    expect(isQuantityKind("toString")).toBe(false);
    expect(isQuantityKind(3)).toBe(false);
    expect(sameDimension(dimensionOfKind("moment"), dimensionOfKind("rotationalStiffness"))).toBe(true);
    expect(fitsDimension(dimensionOfKind("rotationalStiffness"), dimensionOfKind("moment"))).toBe(false);
  });

  it("every unit in the fixtures is of its kind", () => {
    for (const kind of quantityKinds) {
      for (const unit of UNITS_OF[kind]) expect(unitFactor(unit).kinds, `${unit}`).toContain(kind);
    }
  });

  // Every wrong pairing: a unit of kind `given` where kind `due` is expected.
  const pairs = quantityKinds.flatMap((due) =>
    quantityKinds.filter((given) => !fitsDimension(dimensionOfKind(given), dimensionOfKind(due))).map((given) => [due, given] as const),
  );

  it.each(pairs)("parseQuantity refuses, where %s is due, every unit of a %s", (due, given) => {
    const units = UNITS_OF[given];
    if (units.length === 0) {
      // A plain number where a dimensioned quantity is due.
      const r = tryParseQuantity("12", due);
      expect(r.ok).toBe(false);
      if (!r.ok) expect(r.error.code).toBe("unit-missing");
      return;
    }
    for (const unit of units) {
      const r = tryParseQuantity(`12 ${unit}`, due);
      expect(r.ok, unit).toBe(false);
      if (!r.ok) {
        expect(r.error.code).toBe("wrong-dimension");
        expect(r.error.issues[0]).toMatchObject({ expected: due });
      }
      // The same pairing as a target unit.
      const dueUnit = UNITS_OF[due][0];
      if (dueUnit !== undefined) {
        const c = tryConvertQuantity(`12 ${dueUnit}`, due, unit);
        expect(c.ok).toBe(false);
        if (!c.ok) expect(c.error.issues[0]).toMatchObject({ code: "wrong-dimension", path: ["toUnit"] });
        if (!sameDimension(unitFactor(unit).dimension, unitFactor(dueUnit).dimension)) {
          const v = tryConvert(12, dueUnit, unit);
          expect(v.ok).toBe(false);
          if (!v.ok) expect(v.error.code).toBe("incompatible-units");
        }
      }
    }
  });

  it("the table covers every wrong pairing of kinds", () => {
    // 12 kinds; a kind fits itself, and forcePerLength/translationalStiffness and
    // moment/rotationalStiffness (as target) and rotation/dimensionless share dimensions.
    expect(pairs.length).toBeGreaterThan(100);
    expect(pairs).toContainEqual(["force", "length"]);
    expect(pairs).toContainEqual(["moment", "rotationalStiffness"]);
    expect(pairs).not.toContainEqual(["rotationalStiffness", "moment"]);
    expect(pairs).not.toContainEqual(["forcePerLength", "translationalStiffness"]);
  });

  it("convertQuantity converts between kinds' units in both systems", () => {
    // NIST SP 811 B.9: ksi = 6.894 757 E+06 Pa, so 29 000 ksi = 199 948 MPa to 6 digits.
    expect(convertQuantity("29000 ksi", "stress", "MPa").toPrecision(6)).toBe("199948");
    // NIST SP 811 B.9: lbf*ft = 1.355 818 E+00 N*m, so 12 kN*m = 8.850 75 kip*ft.
    expect(convertQuantity("12 kN*m", "moment", "kip*ft").toPrecision(6)).toBe("8.85075");
  });
});
