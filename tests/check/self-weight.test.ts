import { fc, test } from "@fast-check/vitest";
import { describe, expect, it } from "vitest";
import { selfWeight, trySelfWeight } from "../../src/check/index.js";
import { solveCases } from "../../src/combine/index.js";

describe("selfWeight", () => {
  it("selfWeight(W12x26 area, steel at 490 lb/ft^3) is its nominal 26 lb/ft", () => {
    // W12x26: A = 7.65 in^2, nominal weight 26 lb/ft (AISC Steel Construction Manual 15th ed., Table 1-1);
    // steel 490 lb/ft^3 (same Manual, Table 17-12; from memory). In lb and ft.
    const sw = selfWeight(20, 7.65 / 144, 490);
    expect(sw.case).toEqual({ name: "self-weight", category: "dead" });
    expect(sw.loads).toHaveLength(1);
    expect(sw.loads[0]!.start).toBeCloseTo(26, 0);
    expect(sw.loads[0]).toMatchObject({ kind: "distributed", from: 0, to: 20, case: "self-weight" });
  });

  it("gives one load per stretch of a stepped member, and solves as a dead case: M = w L^2 / 8", () => {
    const sw = selfWeight(6, [{ from: 0, to: 2, area: 0.02 }, { from: 2, to: 6, area: 0.01 }], 25, { case: "G" });
    expect(sw.loads.map((l) => [l.from, l.to, l.start])).toEqual([[0, 2, 0.5], [2, 6, 0.25]]);
    const uniform = selfWeight(6, 0.02, 25, { case: "G" });
    const solved = solveCases({ length: 6, stiffness: 1000, supports: [{ kind: "pin", at: 0 }, { kind: "roller", at: 6 }], loads: uniform.loads }, [uniform.case]);
    // simple span, uniform load: M_max = w L^2 / 8 (AISC Manual, Table 3-23, case 1)
    expect(solved.solutions[0]!.peaks.moment.max.value).toBeCloseTo((0.5 * 36) / 8, 12);
  });

  it("refuses what it cannot weigh, every issue at once", () => {
    const r = trySelfWeight(6, [{ from: 0, to: 2, area: -1 }, { from: 3, to: 6, area: 1 }], Number.NaN, { case: "" });
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.error.issues.map((i) => [i.code, i.path.join(".")])).toMatchInlineSnapshot(`
      [
        [
          "not-finite",
          "unitWeight",
        ],
        [
          "case-name-invalid",
          "options.case",
        ],
        [
          "self-weight-not-positive",
          "area.0.area",
        ],
        [
          "self-weight-stretches-invalid",
          "area.1",
        ],
      ]
    `);
    const e = trySelfWeight(6, [], 1);
    if (!e.ok) expect(e.error.issues.map((i) => i.code)).toEqual(["self-weight-stretches-invalid"]);
    const s = trySelfWeight(6, [{ from: 0, to: 5, area: 1 }], 1);
    if (!s.ok) expect(s.error.issues.map((i) => i.code)).toEqual(["self-weight-stretches-invalid"]);
    expect(s.ok).toBe(false);
    const o = trySelfWeight(6, 1e200, 1e200);
    if (!o.ok) expect(o.error.issues.map((i) => i.code)).toEqual(["result-not-finite"]);
    expect(o.ok).toBe(false);
    expect(trySelfWeight(0, 1, 1).ok).toBe(false);
  });

  test.prop([fc.double({ min: 0.1, max: 100, noNaN: true }), fc.double({ min: 1e-4, max: 1, noNaN: true }), fc.double({ min: 1, max: 100, noNaN: true })], { numRuns: 50, seed: 13 })(
    "selfWeight's total load is area x unit weight x length",
    (length, area, gamma) => {
      const sw = selfWeight(length, [{ from: 0, to: length / 3, area }, { from: length / 3, to: length, area: 2 * area }], gamma);
      const total = sw.loads.reduce((t, l) => t + l.start * (l.to - l.from), 0);
      expect(total / (area * gamma * length * (1 / 3 + 4 / 3))).toBeCloseTo(1, 12);
    },
  );
});
