// Checks per combination: stress groups on chosen combinations, deflection groups of cases against
// their own limits. The limits (165, span / 360, span / 240) are invented for the tests; the member
// coefficients are published ones, cited beside each check.
import { fc, test } from "@fast-check/vitest";
import { describe, expect, it } from "vitest";
import { checkLoadCombinations, checkMember, tryCheckLoadCombinations, type MemberSection } from "../../src/check/index.js";
import { arrangementsOf, combineCases, presetCombinations, solveCases, type LoadCase } from "../../src/combine/index.js";

const L = 6;
const EI = 20000;
const wD = 3;
const wL = 5;
const c = 0.2;
const I = 1e-3;
const section: MemberSection = { properties: { secondMomentZ: I, extremes: { top: c, bottom: -c } } };
const cases: LoadCase[] = [{ name: "D", category: "dead" }, { name: "L", category: "live", patterned: true }];
const beam = {
  length: 2 * L,
  stiffness: EI,
  supports: [{ kind: "pin" as const, at: 0 }, { kind: "roller" as const, at: L }, { kind: "roller" as const, at: 2 * L }],
  loads: [
    { kind: "distributed" as const, from: 0, to: 2 * L, start: wD, end: wD, case: "D" },
    { kind: "distributed" as const, from: 0, to: 2 * L, start: wL, end: wL, case: "L" },
  ],
};
const solved = solveCases(beam, cases);
const dl = { name: "D + L", purpose: "allowable-stress" as const, factors: { D: 1, L: 1 } };

describe("checkLoadCombinations(two equal spans, dead and patterned live)", () => {
  const table = checkLoadCombinations(solved, section, {
    stress: [{ name: "allowable stress", combinations: [dl], limits: { bendingStress: 165 } }],
    deflection: [
      { name: "live", factors: { L: 1 }, limit: { kind: "ratio", ratio: 360 } },
      { name: "dead + live", factors: { D: 1, L: 1 }, limit: { kind: "ratio", ratio: 240 } },
    ],
  });

  it("gives one row per combination of each group, in order", () => {
    expect(table.rows.map((r) => [r.group, r.groupKind, r.combination])).toEqual([
      ["allowable stress", "stress", "D + L"],
      ["live", "deflection", "1.0L"],
      ["dead + live", "deflection", "1.0D + 1.0L"],
    ]);
    // L on no span, span 1, span 2, all spans (EN 1992-1-1 5.1.3 and ACI 318-19 6.4.3: every subset under the cap)
    expect(table.rows.map((r) => r.arrangements)).toEqual([4, 4, 4]);
  });

  it("puts the bending check at the middle support with both spans loaded: M = -w L^2 / 8", () => {
    // Two equal spans, uniform load on both: M_B = -w L^2 / 8 (AISC Steel Construction Manual, Table 3-23, case 29)
    const row = table.rows[0]!;
    const tension = row.checks.find((g) => g.check.check === "bending-tension")!;
    expect(tension.check.demand).toBeCloseTo((((wD + wL) * L * L) / 8) * (c / I), 6);
    expect(tension.check.at.x).toBeCloseTo(L, 9);
    expect(tension.pattern).toBe("L on all spans");
    expect(tension.arrangement).toBe("D + L, L on all spans");
  });

  it("finds the live deflection with one span loaded: 0.0092 w L^4 / (E I)", () => {
    // Two equal spans, uniform load on one span: Delta_max = 0.0092 w L^4 / (E I) (AISC Manual, Table 3-23, case 30; four digits)
    const row = table.rows[1]!;
    const g = row.governing;
    expect(g.check.check).toBe("deflection");
    // the table's coefficient is rounded to 0.0092: ours must round to it
    expect(Math.abs((g.check.demand * EI) / (wL * L ** 4) - 0.0092)).toBeLessThanOrEqual(0.00005);
    expect(g.pattern === "L on span 1" || g.pattern === "L on span 2").toBe(true);
    expect(g.check.capacity).toBeCloseTo(L / 360, 12);
    // with both spans loaded it is w L^4 / (185 E I) (same table, case 29), less than one span's
    expect((wL * L ** 4) / (185 * EI)).toBeLessThan(g.check.demand);
  });

  it("names the governing row and check, and passes only when every row does", () => {
    const worst = Math.max(...table.rows.map((r) => r.utilisation));
    expect(table.governing.utilisation).toBe(worst);
    expect(table.pass).toBe(table.rows.every((r) => r.pass));
    for (const r of table.rows) expect(r.governing.check.utilisation).toBe(Math.max(...r.checks.map((g) => g.check.utilisation)));
  });

  it("agrees with checkMember on each arrangement: each check is its worst over the patterns", () => {
    const arrangements = arrangementsOf(solved, [dl]);
    const each = arrangements.map((a) => checkMember(combineCases(solved, a.factors, a.pattern), section, { bendingStress: 165 }).checks);
    table.rows[0]!.checks.forEach((g, i) => expect(g.check.utilisation).toBe(Math.max(...each.map((list) => list[i]!.utilisation))));
  });

  it("takes a preset's combinations and carries their clauses", () => {
    const asd = presetCombinations("asce7-16-allowable-stress", cases).combinations;
    const t = checkLoadCombinations(solved, section, { stress: [{ name: "ASD", combinations: asd, limits: { bendingStress: 165 } }] });
    expect(t.rows).toHaveLength(asd.length);
    expect(t.rows.every((r) => r.clause?.startsWith("ASCE 7-16 2.4"))).toBe(true);
    expect(t.governing.combination).toBe("1.0D + 1.0L");
  });

  it("checks a deflection group given as combinations", () => {
    const t = checkLoadCombinations(solved, undefined, { deflection: [{ name: "characteristic", combinations: [{ name: "D + L", purpose: "serviceability", factors: { D: 1, L: 1 } }], limit: [{ kind: "ratio", ratio: 240 }, { kind: "absolute", limit: 0.01 }] }] });
    expect(t.rows[0]!.checks).toHaveLength(4); // two limits, two spans
  });
});

describe("checkLoadCombinations refuses bad groups, every issue at once", () => {
  it("reports unknown cases, missing factors, non-finite factors, misplaced deflection and missing sections", () => {
    const r = tryCheckLoadCombinations(solved, undefined, {
      stress: [{ name: "s", combinations: [{ name: "x", purpose: "strength", factors: { Q: 1 } }, { name: "y", purpose: "strength", factors: {} }], limits: { bendingStress: 165, deflection: { kind: "ratio", ratio: 360 } } as never }],
      deflection: [{ name: "d", factors: { L: Number.NaN }, limit: { kind: "ratio", ratio: 360 } }, { name: "e", factors: { L: 1 }, combinations: [], limit: { kind: "ratio", ratio: -1 } }],
    });
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.error.issues.map((i) => [i.code, i.path.join(".")])).toMatchInlineSnapshot(`
      [
        [
          "unknown-case",
          "checks.stress.0.combinations.0.factors.Q",
        ],
        [
          "combination-no-factors",
          "checks.stress.0.combinations.1.factors",
        ],
        [
          "deflection-in-stress-group",
          "checks.stress.0.limits.deflection",
        ],
        [
          "not-finite",
          "checks.deflection.0.factors.L",
        ],
        [
          "group-cases-invalid",
          "checks.deflection.1",
        ],
        [
          "allowable-not-positive",
          "checks.deflection.1.limit.ratio",
        ],
      ]
    `);
  });

  it("refuses no groups at all: a verdict never passes by default", () => {
    const r = tryCheckLoadCombinations(solved, section, {});
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.error.issues.map((i) => i.code)).toEqual(["checks-empty"]);
    const s = tryCheckLoadCombinations(solved, section, { stress: [{ name: "x", combinations: [dl], limits: { bendingStress: 165 } }] });
    expect(s.ok).toBe(true);
    const t = tryCheckLoadCombinations(solved, undefined, { stress: [{ name: "x", combinations: [dl], limits: { bendingStress: 165 } }] });
    if (!t.ok) expect(t.error.issues.map((i) => i.code)).toEqual(["sections-missing"]);
    expect(t.ok).toBe(false);
    const u = tryCheckLoadCombinations({} as never, section, {});
    if (!u.ok) expect(u.error.issues.map((i) => i.code)).toEqual(["cases-not-solved"]);
  });
});

describe("checkLoadCombinations laws", () => {
  test.prop([fc.double({ min: 0.1, max: 3, noNaN: true }), fc.double({ min: -2, max: 3, noNaN: true }), fc.integer({ min: 180, max: 600 })], { numRuns: 15, seed: 13 })(
    "each row's deflection check is the worst over the patterns of that combination checked alone",
    (fD, fL, ratio) => {
      const factors = fL === 0 ? { D: fD } : { D: fD, L: fL };
      const t = checkLoadCombinations(solved, undefined, { deflection: [{ name: "g", factors, limit: { kind: "ratio", ratio } }] });
      const each = arrangementsOf(solved, [{ name: "g", purpose: "serviceability", factors }]).map((a) => {
        const r = combineCases(solved, a.factors, a.pattern);
        return checkMember(r, section, { deflection: { kind: "ratio", ratio } }).checks;
      });
      t.rows[0]!.checks.forEach((g, i) => expect(g.check.utilisation).toBeCloseTo(Math.max(...each.map((list) => list[i]!.utilisation)), 12));
    },
  );
});
