// Members at the edges of what float64 and the input can carry: each property searches a class
// of input that once gave a wrong answer, NaN, or a misleading error.
import { describe, expect, it } from "vitest";
import { fc, test } from "@fast-check/vitest";
import { solveBeam, trySolveBeam, type BeamInput, type BeamSolution } from "../../src/beam/index.js";
import { isFlexuraError } from "../../src/errors/index.js";
import type { Load } from "../../src/loads/index.js";
import type { Support } from "../../src/supports/index.js";
import { evaluatePiecewise } from "../../src/math/index.js";
import { actionScale, arbMember } from "./arbitraries.js";

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

/** The largest |reaction force| and |reaction moment| / length, to scale tolerances. */
function reactionScale(s: BeamSolution): number {
  return s.reactions.reduce((m, r) => Math.max(m, Math.abs(r.force), Math.abs(r.moment) / s.length), 1e-300);
}

describe("solveBeam on members with short, very stiff pieces", () => {
  // a stretch 1e-3 to 1e-2 of the span long, 1e2 to 1e8 times stiffer than the rest
  const arbStiffPiece = fc.record({
    start: fc.double({ min: 0.05, max: 0.9, noNaN: true }),
    width: fc.double({ min: 1e-3, max: 1e-2, noNaN: true }),
    ratio: fc.double({ min: 1e2, max: 1e8, noNaN: true }),
  });
  const stepped = (length: number, ei: number, p: { start: number; width: number; ratio: number }): BeamInput["stiffness"] => {
    const a = p.start * length;
    const b = (p.start + p.width) * length;
    return [
      { from: 0, to: a, stiffness: ei },
      { from: a, to: b, stiffness: ei * p.ratio },
      { from: b, to: length, stiffness: ei },
    ];
  };
  const arbLoads = (length: number) => fc.array(fc.record({ at: fc.double({ min: 0, max: 1, noNaN: true }), value: fc.double({ min: -50, max: 50, noNaN: true }) }), { minLength: 1, maxLength: 5 }).map((ls) => ls.map((l): Load => ({ kind: "point", at: l.at * length, value: l.value })));

  test.prop([arbStiffPiece, fc.constantFrom("simple", "cantilever", "overhang"), arbLoads(8)], RUNS)(
    "a determinate member: reactions are those of statics, whatever the stiffness",
    (piece, layout, loads) => {
      const supports: Support[] =
        layout === "simple" ? [{ kind: "pin", at: 0 }, { kind: "roller", at: 8 }] : layout === "cantilever" ? [{ kind: "fixed", at: 0 }] : [{ kind: "pin", at: 1 }, { kind: "roller", at: 6 }];
      const uniform = solveBeam({ length: 8, stiffness: 1000, supports, loads });
      const s = solveBeam({ length: 8, stiffness: stepped(8, 1000, piece), supports, loads });
      const scale = reactionScale(uniform);
      s.reactions.forEach((r, i) => {
        expect(Math.abs(r.force - (uniform.reactions[i]?.force ?? NaN))).toBeLessThanOrEqual(1e-12 * scale);
        expect(Math.abs(r.moment - (uniform.reactions[i]?.moment ?? NaN))).toBeLessThanOrEqual(1e-12 * scale * 8);
      });
      expect(s.warnings).toEqual([]);
    },
  );

  test.prop([arbStiffPiece, arbLoads(8)], RUNS)("an indeterminate member: the supports hold exactly and the results move smoothly towards the rigid limit", (piece, loads) => {
    const supports: Support[] = [{ kind: "fixed", at: 0 }, { kind: "roller", at: 4 }, { kind: "roller", at: 8 }];
    const s = solveBeam({ length: 8, stiffness: stepped(8, 1000, piece), supports, loads });
    const stiffer = solveBeam({ length: 8, stiffness: stepped(8, 1000, { ...piece, ratio: piece.ratio * 10 }), supports, loads });
    const scale = reactionScale(s);
    // a ten times stiffer piece changes the reactions by at most what the piece's own flexibility carried (~ width / ratio)
    s.reactions.forEach((r, i) => expect(Math.abs(r.force - (stiffer.reactions[i]?.force ?? NaN))).toBeLessThanOrEqual((10 * piece.width) / piece.ratio * scale + 1e-11 * scale));
    for (const sup of supports) expect(Math.abs(evaluatePiecewise(s.deflection, sup.at))).toBeLessThanOrEqual(1e-12 * (Math.abs(s.peaks.deflection.min.value) + Math.abs(s.peaks.deflection.max.value)) + 1e-300);
    expect(s.warnings).toEqual([]);
  });
});

describe("solveBeam with points very close together (the coincidence tolerance, docs/tolerances.md)", () => {
  const base: BeamInput = {
    length: 10,
    stiffness: [{ from: 0, to: 5, stiffness: 1e3 }, { from: 5, to: 10, stiffness: 2e3 }],
    supports: [{ kind: "fixed", at: 0 }, { kind: "roller", at: 5 }, { kind: "spring", at: 7.5, stiffness: 400 }, { kind: "roller", at: 10 }],
    hinges: [2.5],
    loads: [{ kind: "distributed", from: 0, to: 10, start: 1, end: 1 }, { kind: "point", at: 8, value: 3 }],
  };
  /** The base member with one of its points moved by `offset` (a step, the roller at 5, the spring, the hinge), and the point it is moved away from. */
  const moved = (which: number, offset: number): BeamInput => {
    switch (which) {
      case 0:
        return { ...base, stiffness: [{ from: 0, to: 5 + offset, stiffness: 1e3 }, { from: 5 + offset, to: 10, stiffness: 2e3 }] };
      case 1:
        return { ...base, hinges: [5 + offset] };
      case 2:
        return { ...base, supports: base.supports.map((s) => (s.kind === "spring" ? { ...s, at: 2.5 + offset } : s)) };
      default:
        return { ...base, stiffness: [{ from: 0, to: 7.5 + offset, stiffness: 1e3 }, { from: 7.5 + offset, to: 10, stiffness: 2e3 }], hinges: [7.5 - offset] };
    }
  };
  const merged = (which: number): BeamInput => moved(which, 0);

  test.prop([fc.integer({ min: 0, max: 3 }), fc.double({ min: 1e-12, max: 1e-5, noNaN: true }), fc.boolean()], { numRuns: 120 })(
    "a point a hair from another: merged with a note, or solved to within what the gap changes, or refused; never wrong",
    (which, relative, below) => {
      const offset = (below ? -1 : 1) * relative * base.length;
      const reference = solveBeam(merged(which));
      const r = trySolveBeam(moved(which, offset));
      if (!r.ok) {
        expect(r.error.issues.map((q) => q.code)).toContain("ill-conditioned");
        expect(r.error.issues.map((q) => q.code)).not.toContain("mechanism");
        return;
      }
      const scale = reactionScale(reference);
      r.value.reactions.forEach((q, i) => expect(Math.abs(q.force - (reference.reactions[i]?.force ?? NaN))).toBeLessThanOrEqual(100 * relative * scale + 1e-9 * scale));
      if (relative <= 1e-9) expect(r.value.notes.map((n) => n.code)).toContain("points-merged");
    },
  );

  it("a hinge 1e-8 of the span from a spring is refused as ill-conditioned, naming the piece, not as a mechanism", () => {
    const r = trySolveBeam({ length: 10, stiffness: 1e3, supports: [{ kind: "fixed", at: 0 }, { kind: "spring", at: 5, stiffness: 100 }, { kind: "roller", at: 10 }], hinges: [5 + 1e-7], loads: [{ kind: "point", at: 7, value: 1 }] });
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.error.issues[0]).toMatchObject({ code: "ill-conditioned", path: ["hinges", 0], from: 5, to: 5 + 1e-7 });
  });

  it("a hinge 1e-10 of the span from a spring is merged onto it, with a note", () => {
    const s = solveBeam({ length: 10, stiffness: 1e3, supports: [{ kind: "fixed", at: 0 }, { kind: "spring", at: 5, stiffness: 100 }, { kind: "roller", at: 10 }], hinges: [5 + 1e-9], loads: [{ kind: "point", at: 7, value: 1 }] });
    expect(s.notes).toHaveLength(1);
    expect(s.notes[0]).toMatchObject({ code: "points-merged", path: ["hinges", 0], at: 5 });
    expect(Object.isFrozen(s.notes[0])).toBe(true);
  });
});

describe("solveBeam keeps distributed loads too narrow to resolve", () => {
  test.prop([arbMember(), fc.double({ min: 1e-14, max: 1e-9, noNaN: true }), fc.double({ min: 0, max: 1, noNaN: true }), fc.double({ min: 1, max: 1e12, noNaN: true })], RUNS)(
    "a load narrower than the tolerance acts as its resultant: equilibrium holds and a note says so",
    (member, width, where, intensity) => {
      const from = where * member.length * (1 - width);
      const to = from + width * member.length;
      fc.pre(to > from && to <= member.length);
      const narrow: Load = { kind: "distributed", from, to, start: intensity, end: intensity / 2 };
      const s = solveBeam({ ...member, loads: [...(member.loads ?? []), narrow] });
      const without = solveBeam(member);
      const resultant = 0.75 * intensity * (to - from);
      const up = s.reactions.reduce((t, r) => t + r.force, 0) - without.reactions.reduce((t, r) => t + r.force, 0);
      expect(Math.abs(up - resultant)).toBeLessThanOrEqual(1e-9 * (resultant + reactionScale(without)));
      expect(s.notes.map((n) => n.code)).toContain("load-as-point");
    },
  );
});

describe("solveBeam under settlements alone", () => {
  test.prop([arbMember({ settlements: true })], RUNS)("no false imbalance warning, and the residual is zero to rounding of the forces the settlements cause", (member) => {
    const settled = { ...member, loads: [] };
    const r = trySolveBeam(settled);
    fc.pre(r.ok);
    if (!r.ok) return;
    expect(r.value.warnings.filter((w) => w.code === "ill-conditioned" && "imbalance" in w)).toEqual([]);
    const scale = actionScale(settled, r.value.reactions);
    expect(Math.abs(r.value.residual.force)).toBeLessThanOrEqual(1e-10 * scale.force + 1e-300);
    expect(Math.abs(r.value.residual.moment)).toBeLessThanOrEqual(1e-10 * scale.moment + 1e-300);
  });
});

describe("reading a solution at its ends and its peaks", () => {
  test.prop([arbMember({ settlements: true })], RUNS)("the limit from outside the member is 0, so the jump at a supported end is its reaction", (member) => {
    const s = solveBeam(member);
    for (const d of [s.shear, s.moment, s.slope, s.deflection]) {
      expect(evaluatePiecewise(d, 0, "left")).toBe(0);
      expect(evaluatePiecewise(d, member.length, "right")).toBe(0);
    }
    member.supports.forEach((sup, i) => {
      if (sup.at !== 0) return;
      const jump = evaluatePiecewise(s.shear, 0, "right") - evaluatePiecewise(s.shear, 0, "left");
      const load = (member.loads ?? []).reduce((t, l) => t + (l.kind === "point" && l.at === 0 ? l.value : 0), 0);
      expect(Math.abs(jump - ((s.reactions[i]?.force ?? NaN) - load))).toBeLessThanOrEqual(1e-9 * reactionScale(s));
    });
  });

  test.prop([arbMember(), fc.double({ min: 0, max: 1e-9, noNaN: true })], RUNS)("a position a rounding error past an end reads the end", (member, over) => {
    const s = solveBeam(member);
    const L = member.length;
    expect(evaluatePiecewise(s.moment, L + over * L)).toBe(evaluatePiecewise(s.moment, L));
    expect(evaluatePiecewise(s.deflection, -over * L)).toBe(evaluatePiecewise(s.deflection, 0));
  });

  it("x = 0.1 + 0.2 on a 0.3 long member is at its end", () => {
    const s = solveBeam({ length: 0.3, stiffness: 1, supports: [{ kind: "fixed", at: 0 }], loads: [{ kind: "point", at: 0.3, value: 1 }] });
    expect(evaluatePiecewise(s.deflection, 0.1 + 0.2)).toBe(evaluatePiecewise(s.deflection, 0.3));
  });

  test.prop([fc.double({ min: 1, max: 20, noNaN: true }), fc.array(fc.record({ at: fc.double({ min: 0, max: 1, noNaN: true }), value: fc.double({ min: 0.1, max: 100, noNaN: true }) }), { maxLength: 4 }), fc.double({ min: 0.1, max: 50, noNaN: true })], RUNS)(
    "a simple span under downward loads never reports a negative moment or a positive deflection",
    (L, points, w) => {
      const loads: Load[] = [{ kind: "distributed", from: 0, to: L, start: w, end: w }, ...points.map((p): Load => ({ kind: "point", at: p.at * L, value: p.value }))];
      const s = solveBeam({ length: L, stiffness: 1e4, supports: [{ kind: "pin", at: 0 }, { kind: "roller", at: L }], loads });
      expect(s.peaks.moment.min.value).toBeGreaterThanOrEqual(0);
      expect(s.peaks.deflection.max.value).toBeLessThanOrEqual(0);
    },
  );
});
