// Members at the edges of what float64 and the input can carry: each property searches a class
// of input that once gave a wrong answer, NaN, or a misleading error.
import { describe, expect, it } from "vitest";
import { fc, test } from "@fast-check/vitest";
import { solveBeam, trySolveBeam, type BeamInput, type BeamSolution } from "../../src/beam/index.js";
import { isFlexuraError } from "../../src/errors/index.js";
import type { Load } from "../../src/loads/index.js";
import type { Support } from "../../src/supports/index.js";
import { arbMember } from "./arbitraries.js";

const RUNS = { numRuns: 60 };

/** Every number a solution carries: reactions, residual, coefficients, peaks, contraflexure. */
function numbersOf(s: BeamSolution): number[] {
  const out: number[] = [];
  for (const r of s.reactions) out.push(r.force, r.moment);
  out.push(s.residual.force, s.residual.moment, ...s.contraflexure);
  for (const d of [s.shear, s.moment, s.slope, s.deflection]) out.push(...d.coefficients, ...d.breaks);
  for (const e of [s.peaks.shear, s.peaks.moment, s.peaks.slope, s.peaks.deflection]) out.push(e.max.value, e.max.at, e.min.value, e.min.at);
  return out;
}

describe("solveBeam near the top of double precision", () => {
  const huge = fc.double({ min: 1e290, max: 1.7e308, noNaN: true });

  test.prop([arbMember({ settlements: true }), huge, fc.nat()], RUNS)("a load near 1e308: finite results or result-not-finite, never NaN", (member, scale, pick) => {
    const loads = [...(member.loads ?? []), { kind: "point", at: member.length / 3, value: 1 } as Load];
    const i = pick % loads.length;
    const l = loads[i] as Load;
    // the value itself set to the huge one (a product could overflow before the solver sees it)
    loads[i] = l.kind === "distributed" ? { ...l, start: Math.sign(l.start) * scale, end: scale } : { ...l, value: scale };
    const r = trySolveBeam({ ...member, loads });
    if (r.ok) for (const v of numbersOf(r.value)) expect(Number.isFinite(v)).toBe(true);
    else expect(r.error.issues.map((q) => q.code)).toContain("result-not-finite");
  });

  test.prop([arbMember(), huge], RUNS)("a combination factor near 1e308: finite results or result-not-finite pointing at the factor or a load", (member, factor) => {
    const r = trySolveBeam({ ...member, loads: [...(member.loads ?? []), { kind: "point", at: 0, value: 2 }] }, { factors: { default: factor } });
    if (r.ok) for (const v of numbersOf(r.value)) expect(Number.isFinite(v)).toBe(true);
    else {
      const found = r.error.issues.find((q) => q.code === "result-not-finite");
      expect(found).toBeDefined();
      expect(["factors", "loads"]).toContain(found?.path[0]);
    }
  });

  it("a 1e308 point load on a simple span is refused with result-not-finite at the load", () => {
    const r = trySolveBeam({ length: 6, stiffness: 1e4, supports: [{ kind: "pin", at: 0 }, { kind: "roller", at: 6 }], loads: [{ kind: "point", at: 3, value: 1e308 }] });
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.error.issues[0]).toMatchObject({ code: "result-not-finite", path: ["loads", 0, "value"] });
  });
});

describe("solveBeam reads load-case factors as own properties only", () => {
  // names Object.prototype carries: none of them is a factor unless the caller gives it
  const inherited = fc.constantFrom("constructor", "toString", "valueOf", "hasOwnProperty", "__proto__", "isPrototypeOf", "propertyIsEnumerable", "toLocaleString");

  test.prop([arbMember({ hinges: false }), inherited], RUNS)("a case named like a prototype property: factor given acts, factor missing is 0", (member, name) => {
    const loads = (member.loads ?? []).map((l) => ({ ...l, case: name }));
    const plain = solveBeam({ ...member, loads: member.loads ?? [] });
    const factors = Object.defineProperty({}, name, { value: 1, enumerable: true });
    const given = solveBeam({ ...member, loads }, { factors });
    given.reactions.forEach((r, i) => {
      expect(r.force).toBeCloseTo(plain.reactions[i]?.force ?? NaN, 9);
      expect(r.moment).toBeCloseTo(plain.reactions[i]?.moment ?? NaN, 9);
    });
    const missing = solveBeam({ ...member, loads }, { factors: { other: 1 } });
    for (const r of missing.reactions) {
      expect(Number.isFinite(r.force)).toBe(true);
      expect(r.force === 0 || Math.abs(r.force) < 1e-300 || member.supports.some((s) => s.settlement !== undefined)).toBe(true);
    }
  });
});

describe("solveBeam on members held only by rollers and springs", () => {
  /** The member with every pin made a roller (fixed and guided supports still hold the axis). */
  const onRollers = (m: BeamInput): BeamInput => ({ ...m, supports: m.supports.map((s): Support => (s.kind === "pin" ? { ...s, kind: "roller" } : s)) });

  test.prop([arbMember({ settlements: true })], RUNS)("pins made rollers: the same bending results, and a no-horizontal-restraint warning when nothing holds the axis", (member) => {
    const before = solveBeam(member);
    const moved = onRollers(member);
    const after = solveBeam(moved);
    after.reactions.forEach((r, i) => {
      expect(r.force).toBe(before.reactions[i]?.force);
      expect(r.moment).toBe(before.reactions[i]?.moment);
    });
    const axisHeld = moved.supports.some((s) => s.kind === "fixed" || s.kind === "guided");
    expect(after.warnings.some((w) => w.code === "no-horizontal-restraint")).toBe(!axisHeld);
  });

  it("a mechanism on rollers is reported by its real cause", () => {
    const r = trySolveBeam({ length: 4, stiffness: 1, hinges: [1, 3], supports: [{ kind: "roller", at: 0 }, { kind: "spring", at: 2, stiffness: 5 }, { kind: "roller", at: 4 }] });
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.error.issues[0]).toMatchObject({ code: "mechanism", reason: "hinge" });
    expect(isFlexuraError(r.ok ? undefined : r.error)).toBe(true);
  });
});
