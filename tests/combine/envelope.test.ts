// Laws of the exact envelopes: the upper envelope is above every arrangement at every x and
// touches one of them there (the one its piece names); the lower likewise below; the envelope of
// one combination without patterns is that combination.
import { describe, expect, it } from "vitest";
import { fc, test } from "@fast-check/vitest";
import type { BeamInput } from "../../src/beam/index.js";
import { evaluatePiecewise, findPiece } from "../../src/math/index.js";
import { arrangementsOf, combineCases, envelopes, solveCases, tryEnvelopes, trySolveCases, type Combination, type LoadCase } from "../../src/combine/index.js";
import { arbMember, samplePoints } from "../beam/arbitraries.js";

const CASES: readonly LoadCase[] = [
  { name: "D", category: "dead" },
  { name: "L", category: "live", patterned: true },
  { name: "W", category: "wind", reversible: true },
];

function withCases(beam: BeamInput, picks: readonly number[]): BeamInput {
  const names = ["D", "L", "W"];
  const loads = (beam.loads ?? []).map((l, i) => ({ ...l, case: names[(picks[i] ?? 0) % 3] as string }));
  for (const n of names) if (!loads.some((l) => l.case === n)) loads.push({ kind: "distributed", from: 0, to: beam.length, start: 1, end: 2, case: n });
  return { ...beam, loads };
}

const arbFactor = fc.integer({ min: -20, max: 20 }).map((v) => v / 10);
const arbCombinations = fc.array(fc.tuple(arbFactor, arbFactor, arbFactor), { minLength: 1, maxLength: 5 }).map((rows) =>
  rows.map(([d, l, wind], i): Combination => ({ name: `C${i + 1}`, purpose: "strength", factors: { D: d, L: l, W: wind } })),
);
const DIAGRAMS = ["shear", "moment", "slope", "deflection"] as const;

describe("envelopes laws on random members", () => {
  test.prop([arbMember({ settlements: false }), fc.array(fc.nat(), { minLength: 12, maxLength: 12 }), arbCombinations, fc.integer({ min: 1, max: 8 })], { numRuns: 25 })(
    "each bound is beyond every arrangement at every x and equals the arrangement its piece names (all subsets or standard patterns)",
    (member, picks, combinations, cap) => {
      const solved = solveCases(withCases(member, picks), CASES);
      const e = envelopes(solved, combinations, { pattern: { cap } });
      const curves = e.arrangements.map((a) => combineCases(solved, combinations[a.combination]!.factors, a.pattern));
      const xs = [...samplePoints(member.length, 13), ...Array.from(solved.breaks)];
      for (const d of DIAGRAMS) {
        const env = e[d]!;
        let scale = 0;
        for (const c of curves) for (const x of xs) scale = Math.max(scale, Math.abs(evaluatePiecewise(c[d], x, "left")), Math.abs(evaluatePiecewise(c[d], x, "right")));
        const tol = 1e-10 * scale + 1e-300;
        for (const x of xs) {
          for (const side of ["left", "right"] as const) {
            const up = evaluatePiecewise(env.upper.curve, x, side);
            const lo = evaluatePiecewise(env.lower.curve, x, side);
            const values = curves.map((c) => evaluatePiecewise(c[d], x, side));
            for (const v of values) {
              expect(v).toBeLessThanOrEqual(up + tol);
              expect(v).toBeGreaterThanOrEqual(lo - tol);
            }
            // it touches the arrangement its piece names
            const ku = env.upper.governing[findPiece(env.upper.curve, x, side)]!;
            const kl = env.lower.governing[findPiece(env.lower.curve, x, side)]!;
            expect(Math.abs(values[ku]! - up)).toBeLessThanOrEqual(tol);
            expect(Math.abs(values[kl]! - lo)).toBeLessThanOrEqual(tol);
          }
        }
        // the peaks are the bounds' extremes, at their location, of the arrangement named
        expect(Math.max(...xs.map((x) => evaluatePiecewise(env.upper.curve, x)))).toBeLessThanOrEqual(env.upper.peak.value + tol);
        expect(Math.abs(evaluatePiecewise(curves[env.upper.peak.arrangement]![d], env.upper.peak.at, "left") - env.upper.peak.value) <= tol || Math.abs(evaluatePiecewise(curves[env.upper.peak.arrangement]![d], env.upper.peak.at, "right") - env.upper.peak.value) <= tol).toBe(true);
        expect(Math.min(...xs.map((x) => evaluatePiecewise(env.lower.curve, x)))).toBeGreaterThanOrEqual(env.lower.peak.value - tol);
      }
      // reaction envelopes: the extremes over the arrangements
      e.reactions.forEach((r, s) => {
        const forces = curves.map((c) => c.reactions[s]!.force);
        expect(r.force.max.value).toBe(Math.max(...forces));
        expect(r.force.min.value).toBe(Math.min(...forces));
        expect(forces[r.force.max.arrangement]).toBe(r.force.max.value);
      });
    },
  );

  test.prop([arbMember({ settlements: false }), fc.array(fc.nat(), { minLength: 12, maxLength: 12 }), arbFactor, arbFactor], { numRuns: 40 })("the envelope of one combination without patterns is that combination", (member, picks, fd, fw) => {
    const cases = CASES.map((c) => ({ ...c, patterned: false, reversible: false }));
    const solved = solveCases(withCases(member, picks), cases);
    const factors = { D: fd === 0 ? 1 : fd, L: 1, W: fw };
    const e = envelopes(solved, [{ name: "only", purpose: "strength", factors }]);
    const c = combineCases(solved, factors);
    expect(e.arrangements).toHaveLength(1);
    for (const d of DIAGRAMS) {
      for (const x of [...samplePoints(member.length, 29), ...Array.from(solved.breaks)]) {
        for (const side of ["left", "right"] as const) {
          expect(evaluatePiecewise(e[d]!.upper.curve, x, side)).toBe(evaluatePiecewise(c[d], x, side));
          expect(evaluatePiecewise(e[d]!.lower.curve, x, side)).toBe(evaluatePiecewise(c[d], x, side));
        }
      }
      expect(new Set(e[d]!.upper.governing)).toEqual(new Set([0]));
    }
  });
});

describe("envelopes finds crossings by root-finding", () => {
  it("breaks where two combinations' moments cross, and each side follows the larger", () => {
    // a simple span: a uniform load (parabola) against a point load at mid-span (two lines): they
    // cross where w x (L - x) / 2 = P x / 2, x = L - P / w, for x < L / 2
    const solved = solveCases(
      { length: 10, stiffness: 1000, supports: [{ kind: "pin", at: 0 }, { kind: "roller", at: 10 }], loads: [{ kind: "distributed", from: 0, to: 10, start: 2, end: 2, case: "A" }, { kind: "point", at: 5, value: 11, case: "B" }] },
      [{ name: "A", category: "dead" }, { name: "B", category: "live" }],
    );
    const e = envelopes(solved, [{ name: "A", purpose: "strength", factors: { A: 1 } }, { name: "B", purpose: "strength", factors: { B: 1 } }], { diagrams: ["moment"] });
    const b = Array.from(e.moment!.upper.curve.breaks);
    expect(b[1]).toBeCloseTo(10 - 11 / 2, 12);
    expect(b[b.length - 2]).toBeCloseTo(11 / 2, 12);
    expect(e.moment!.upper.governing.map((k) => e.arrangements[k]?.name)).toEqual(["A", "B", "B", "A"]);
    expect(e.moment!.upper.peak).toMatchObject({ value: 27.5, at: 5, name: "B" });
    expect(e.shear).toBeUndefined();
  });
});

describe("bad input", () => {
  const beam: BeamInput = { length: 12, stiffness: 1000, supports: [{ kind: "pin", at: 0 }, { kind: "roller", at: 6 }, { kind: "roller", at: 12 }], loads: [{ kind: "distributed", from: 0, to: 12, start: 1, end: 1, case: "D" }, { kind: "point", at: 3, value: 2, case: "Lx" }] };
  it("solveCases collects unknown cases, cases without loads and case problems", () => {
    const r = trySolveCases(beam, [{ name: "D", category: "dead" }, { name: "L", category: "live" }, { name: "D", category: "deadish" as never }]);
    expect(r.ok ? [] : r.error.issues.map((i) => `${i.code} ${i.path.join(".")}`)).toMatchInlineSnapshot(`
      [
        "case-duplicate cases.2.name",
        "category-unknown cases.2.category",
      ]
    `);
    const s = trySolveCases(beam, [{ name: "D", category: "dead" }, { name: "Lx", category: "live" }]);
    expect(s.ok).toBe(true);
  });
  it("solveCases refuses a settlement with no case for it, and reports the member's own problems under beam", () => {
    const moved = { ...beam, supports: [{ kind: "pin" as const, at: 0, settlement: 0.01 }, ...beam.supports.slice(1)] };
    const r = trySolveCases(moved, [{ name: "D", category: "dead" }, { name: "Lx", category: "live" }]);
    expect(r.ok ? [] : r.error.issues.map((i) => i.code)).toEqual(["settlement-case-missing"]);
    const bad = trySolveCases({ ...beam, length: -1 }, [{ name: "D", category: "dead" }, { name: "Lx", category: "live" }]);
    expect(bad.ok ? [] : bad.error.issues.map((i) => i.path[0])).toContain("beam");
  });
  it("warns of a patterned case on a member of one span", () => {
    const s = solveCases({ ...beam, supports: [beam.supports[0]!, beam.supports[2]!] }, [{ name: "D", category: "dead" }, { name: "Lx", category: "live", patterned: true }]);
    expect(s.warnings.map((w) => [w.code, w.path])).toEqual([["pattern-single-span", ["cases", 1, "patterned"]]]);
  });
  it("envelopes collects combination problems: unknown case, no factors, non-finite factor", () => {
    const solved = solveCases(beam, [{ name: "D", category: "dead" }, { name: "Lx", category: "live", patterned: true }]);
    const r = tryEnvelopes(solved, [
      { name: "a", purpose: "strength", factors: { D: 1, L: 1.6 } },
      { name: "b", purpose: "strength", factors: {} },
      { name: "c", purpose: "strength", factors: { D: Number.NaN } },
      { name: "c", purpose: "strenght" as never, factors: { D: 1 } },
    ]);
    expect(r.ok ? [] : r.error.issues.map((i) => `${i.code} ${i.path.join(".")}`)).toMatchInlineSnapshot(`
      [
        "unknown-case combinations.0.factors.L",
        "combination-no-factors combinations.1.factors",
        "not-finite combinations.2.factors.D",
        "combination-duplicate combinations.3.name",
        "purpose-unknown combinations.3.purpose",
      ]
    `);
  });
  it("refuses a pattern cap beyond what is tractable, with the count", () => {
    const solved = solveCases(beam, [{ name: "D", category: "dead" }, { name: "Lx", category: "live", patterned: true }]);
    expect(() => arrangementsOf(solved, [], { cap: 30 })).toThrow(/1073741824 patterns/);
    const r = tryEnvelopes(solved, [], { pattern: { cap: 2.5 } });
    expect(r.ok ? "" : r.error.code).toBe("pattern-cap-invalid");
    expect(tryEnvelopes(solved, [], { diagrams: ["torque" as never] }).ok).toBe(false);
  });
});
