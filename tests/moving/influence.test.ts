// Influence lines: laws checked on random members (spans, overhangs, hinges, springs, stepped E I,
// determinate or not) against direct solves of the member with one unit force at a, and Maxwell's
// reciprocal theorem (the deflection at p under a unit force at a equals the deflection at a under
// a unit force at p: Maxwell, Phil. Mag. 1864, from memory).
import { describe, expect } from "vitest";
import { fc, test } from "@fast-check/vitest";
import { solveBeam, trySolveBeam, type BeamInput, type BeamSolution } from "../../src/beam/index.js";
import { evaluatePiecewise, type PiecewisePolynomial } from "../../src/math/index.js";
import { restrainsDeflection, restrainsRotation } from "../../src/supports/index.js";
import { influenceLine, memberInfluence } from "../../src/moving/index.js";
import { arbMember, GRID, samplePoints } from "../beam/arbitraries.js";

const arbCase = arbMember({ maxLoads: 0 }).chain((beam) =>
  fc.record({
    beam: fc.constant(beam),
    // force and point off the 1/64 grid, so that no jump falls exactly on either
    a: fc.integer({ min: 0, max: 10 * GRID - 1 }).map((g) => ((g + 0.5) * beam.length) / (10 * GRID)),
    p: fc.integer({ min: 0, max: 10 * GRID - 1 }).map((g) => ((g + 0.31) * beam.length) / (10 * GRID)),
  }),
);

/** The direct solve with one unit downward force at a. */
const unitAt = (beam: BeamInput, a: number): BeamSolution => solveBeam({ ...beam, loads: [{ kind: "point", at: a, value: 1 }] });

/**
 * The rounding scale of the lines derived from reactions: each comes from a solve with one unit
 * settlement (or one radian of rotation), whose element end forces (12 E I / h^3 over the shortest
 * element h) cancel in the result, so the engine's rounding is relative to them: about L / h for a
 * dimensionless line (the rule of the combine module's superposition tests). Times L for a moment.
 */
function settleScale(beam: BeamInput): number {
  const L = beam.length;
  const nodes = [0, L, ...beam.supports.map((s) => s.at), ...(beam.hinges ?? []), ...(typeof beam.stiffness === "number" ? [] : beam.stiffness.map((s) => s.from))].sort((x, y) => x - y);
  const h = Math.min(L, ...nodes.slice(1).map((x, i) => x - nodes[i]!).filter((d) => d > 0));
  return L / h;
}

/**
 * How much a soft spring amplifies the rounding of a direct solve: the element's stiffness over the
 * spring's (E I / (k h^3), E I / (k_r h)), at least 1: the direct solve and the Maxwell solve for a
 * spring's line both carry it.
 */
function springScale(beam: BeamInput): number {
  const L = beam.length;
  const nodes = [0, L, ...beam.supports.map((s) => s.at), ...(beam.hinges ?? []), ...(typeof beam.stiffness === "number" ? [] : beam.stiffness.map((s) => s.from))].sort((x, y) => x - y);
  const h = Math.min(L, ...nodes.slice(1).map((x, i) => x - nodes[i]!).filter((d) => d > 0));
  const ei = typeof beam.stiffness === "number" ? beam.stiffness : Math.max(...beam.stiffness.map((s) => s.stiffness));
  let f = 1;
  for (const s of beam.supports) {
    if (s.stiffness !== undefined) f = Math.max(f, ei / (s.stiffness * h ** 3));
    if (s.rotationalStiffness !== undefined) f = Math.max(f, ei / (s.rotationalStiffness * h));
  }
  return f;
}

/** The largest magnitude of a diagram at sample points and its breakpoints. */
const size = (pp: PiecewisePolynomial, L: number): number => Math.max(...[...samplePoints(L), ...pp.breaks].map((x) => Math.abs(evaluatePiecewise(pp, x))));

/** |actual - expected| <= 1e-12 of the scale. */
function close(actual: number, expected: number, scale: number, what: string): void {
  const tol = 1e-12 * Math.max(scale, Math.abs(expected));
  if (!(Math.abs(actual - expected) <= tol)) expect.fail(`${what}: ${actual} differs from ${expected} by more than ${tol}`);
}

describe("influenceLine laws", () => {
  test.prop([arbCase], { numRuns: 60 })("influenceLine(member, q) at a equals a direct solve with a unit force at a (1e-12 of the scale), for every result", ({ beam, a, p }) => {
    const member = memberInfluence(beam);
    const direct = unitAt(beam, a);
    // a force where the engine cannot balance the nodes to rounding is checked by the beam module's own tests
    if (direct.warnings.length > 0 || member.warnings.length > 0) return;
    const L = beam.length;
    const r1 = settleScale(beam) * springScale(beam);
    member.reactions.forEach((r, j) => {
      if (r.force) close(evaluatePiecewise(r.force, a), direct.reactions[j]!.force, r1, `reaction ${j} force`);
      if (r.moment) close(evaluatePiecewise(r.moment, a), direct.reactions[j]!.moment, r1 * L, `reaction ${j} moment`);
    });
    const m = influenceLine(member, { kind: "moment", at: p });
    close(evaluatePiecewise(m, a), evaluatePiecewise(direct.moment, p), Math.max(r1 * L, size(direct.moment, L)), "moment");
    for (const side of ["left", "right"] as const) {
      const v = influenceLine(member, { kind: "shear", at: p, side });
      close(evaluatePiecewise(v, a), evaluatePiecewise(direct.shear, p, side), Math.max(r1, size(direct.shear, L)), `shear ${side}`);
    }
    const d = influenceLine(member, { kind: "deflection", at: p });
    close(evaluatePiecewise(d, a), evaluatePiecewise(direct.deflection, p), Math.max(size(d, L), size(direct.deflection, L)), "deflection");
    const s = influenceLine(member, { kind: "slope", at: p });
    close(evaluatePiecewise(s, a), evaluatePiecewise(direct.slope, p), Math.max(size(s, L), size(direct.slope, L)), "slope");
  });

  test.prop([arbCase], { numRuns: 40 })("Maxwell's reciprocal theorem: the deflection line at p read at a equals the one at a read at p", ({ beam, a, p }) => {
    const member = memberInfluence(beam);
    const dp = influenceLine(member, { kind: "deflection", at: p });
    const da = influenceLine(member, { kind: "deflection", at: a });
    close(evaluatePiecewise(dp, a), evaluatePiecewise(da, p), Math.max(size(dp, beam.length), size(da, beam.length)), "reciprocity");
  });

  test.prop([arbCase], { numRuns: 60 })("the reaction force lines of a member on rigid supports sum to one everywhere", ({ beam, a }) => {
    const rigid = { ...beam, supports: beam.supports.map((s) => (s.kind === "spring" ? (restrainsDeflection(s) ? { kind: "roller" as const, at: s.at } : { kind: "guided" as const, at: s.at }) : s)) };
    if (!trySolveBeam(rigid).ok) return; // made a mechanism by taking a spring's other restraint away
    const member = memberInfluence(rigid);
    if (member.warnings.length > 0 || unitAt(rigid, a).warnings.length > 0) return;
    let sum = 0;
    for (const line of member.reactions) if (line.force) sum += evaluatePiecewise(line.force, a);
    close(sum, 1, settleScale(rigid), "sum of reactions");
  });

  test.prop([arbCase], { numRuns: 30 })("the reactions' lines hold the unit force in equilibrium, springs included", ({ beam, a }) => {
    const member = memberInfluence(beam);
    if (member.warnings.length > 0 || unitAt(beam, a).warnings.length > 0) return;
    let force = 0;
    let moment = 0;
    for (const r of member.reactions) {
      const f = r.force ? evaluatePiecewise(r.force, a) : 0;
      const c = r.moment ? evaluatePiecewise(r.moment, a) : 0;
      force += f;
      moment += f * r.at + c;
    }
    close(force, 1, settleScale(beam) * springScale(beam), "forces");
    close(moment, a, settleScale(beam) * springScale(beam) * beam.length, "moments about x = 0");
    expect(member.supports.every((s, j) => (member.reactions[j]!.moment !== undefined) === restrainsRotation(s))).toBe(true);
    expect(member.supports.every((s, j) => (member.reactions[j]!.force !== undefined) === restrainsDeflection(s))).toBe(true);
  });
});
