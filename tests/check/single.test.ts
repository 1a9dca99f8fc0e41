import { describe, expect, it } from "vitest";
import { fc, test } from "@fast-check/vitest";
import {
  checkBendingStress,
  checkDeflection,
  checkResult,
  checkShearStress,
  commonDeflectionRatios,
  tryCheckBendingStress,
  tryCheckDeflection,
  tryCheckShearStress,
} from "../../src/check/index.js";

describe("single checks", () => {
  it("checkBendingStress names tension or compression by the stress's sign", () => {
    const c = checkBendingStress(-120, 160, { at: { x: 2, fibre: "top" } });
    expect(c).toEqual({
      kind: "check",
      check: "bending-compression",
      label: "bending stress, compression",
      demand: 120,
      capacity: 160,
      utilisation: 0.75,
      pass: true,
      at: { x: 2, fibre: "top" },
      formula: "|sigma| <= allowable",
    });
    expect(checkBendingStress(200, 160).pass).toBe(false);
    expect(checkBendingStress(200, 160).check).toBe("bending-tension");
  });

  it("checkShearStress compares |tau| with the allowable", () => {
    expect(checkShearStress(-45, 90).utilisation).toBe(0.5);
  });

  it("checkDeflection: span / n, cantilever 2 L / n (common practice) or its own factor, and absolute limits", () => {
    // span / 360 for floors under live load: common practice
    expect(checkDeflection(-15, 6000, { kind: "ratio", ratio: commonDeflectionRatios.floorLive }).capacity).toBeCloseTo(6000 / 360, 12);
    expect(checkDeflection(-15, 1500, { kind: "ratio", ratio: 180 }, { cantilever: true }).capacity).toBeCloseTo(3000 / 180, 12);
    expect(checkDeflection(-15, 1500, { kind: "ratio", ratio: 180, cantileverFactor: 1 }, { cantilever: true }).capacity).toBeCloseTo(1500 / 180, 12);
    const abs = checkDeflection(12, 6000, { kind: "absolute", limit: 10 });
    expect([abs.utilisation, abs.pass, abs.formula]).toEqual([1.2, false, "|delta| <= 10"]);
    expect(checkResult("deflection", "x", 1, 1, { x: 0 }, "f").pass).toBe(true); // utilisation exactly 1 passes
  });

  it("bad allowables and limits are typed errors", () => {
    const codes = (r: { ok: boolean; error?: { issues: readonly { code: string }[] } }): string[] => (r.ok ? [] : r.error!.issues.map((i) => i.code));
    expect(codes(tryCheckBendingStress(1, 0))).toEqual(["allowable-not-positive"]);
    expect(codes(tryCheckShearStress(Number.NaN, -1))).toEqual(["not-finite", "allowable-not-positive"]);
    expect(codes(tryCheckDeflection(1, 0, { kind: "ratio", ratio: 360 }))).toEqual(["allowable-not-positive"]);
    expect(codes(tryCheckDeflection(1, 1, { kind: "metres" } as never))).toEqual(["unknown-limit-kind"]);
  });
});

describe("single-check laws", () => {
  test.prop([fc.double({ min: -1e4, max: 1e4, noNaN: true }), fc.double({ min: 1, max: 1e3, noNaN: true }), fc.double({ min: 0.01, max: 100, noNaN: true })], { numRuns: 100 })(
    "utilisation scales linearly with the demand",
    (stress, allowable, k) => {
      const u = checkBendingStress(stress, allowable).utilisation;
      expect(checkBendingStress(k * stress, allowable).utilisation).toBeCloseTo(k * u, 9);
    },
  );
});
