// Checks per combination with the check module as it is: a combination formed by superposition
// carries what checkMember reads (length, spans, shear, moment, deflection), so every arrangement
// can be checked and the governing one named. Allowable 165 MPa and span / 360 are invented limits
// for the test, in N and mm.
import { describe, expect, it } from "vitest";
import { checkMember, type MemberSection } from "../../src/check/index.js";
import { solveBeam } from "../../src/beam/index.js";
import { arrangementsOf, combineCases, presetCombinations, solveCases, type LoadCase } from "../../src/combine/index.js";

const b = 150;
const h = 450;
const section: MemberSection = {
  properties: { secondMomentZ: (b * h ** 3) / 12, extremes: { top: h / 2, bottom: -h / 2 } },
  shear: [{ kind: "trapezoid", yBottom: -h / 2, yTop: h / 2, widthBottom: b, widthTop: b }],
};
const cases: LoadCase[] = [{ name: "D", category: "dead" }, { name: "L", category: "live", patterned: true }];
const beam = {
  length: 12000,
  stiffness: 200_000 * section.properties.secondMomentZ,
  supports: [{ kind: "pin" as const, at: 0 }, { kind: "roller" as const, at: 5000 }, { kind: "roller" as const, at: 12000 }],
  loads: [
    { kind: "distributed" as const, from: 0, to: 12000, start: 6, end: 6, case: "D" },
    { kind: "distributed" as const, from: 0, to: 12000, start: 9, end: 9, case: "L" },
  ],
};
const limits = { bendingStress: 165, deflection: { kind: "ratio", ratio: 360 } } as const;

describe("checkMember on combinations by superposition", () => {
  const solved = solveCases(beam, cases);
  const { combinations } = presetCombinations("asce7-16-allowable-stress", cases);
  const arrangements = arrangementsOf(solved, combinations);
  const table = arrangements.map((a) => ({ name: a.name, check: checkMember(combineCases(solved, a.factors, a.pattern), section, limits) }));

  it("gives each arrangement the verdict of a direct solve of its loads", () => {
    const all = table.find((r) => r.name === "1.0D + 1.0L, L on all spans");
    const direct = checkMember(solveBeam(beam, { factors: { D: 1, L: 1 } }), section, limits);
    expect(all?.check.governing.utilisation).toBeCloseTo(direct.governing.utilisation, 10);
    expect(all?.check.checks.map((c) => c.kind)).toEqual(direct.checks.map((c) => c.kind));
  });

  it("names the governing arrangement: the largest utilisation over the table", () => {
    const governing = table.reduce((a, r) => (r.check.governing.utilisation > a.check.governing.utilisation ? r : a));
    expect(governing.name.startsWith("1.0D + 1.0L")).toBe(true);
    for (const r of table) expect(r.check.governing.utilisation).toBeLessThanOrEqual(governing.check.governing.utilisation);
  });
});
