import { solveBeam, type BeamInput, type BeamWarning } from "../beam/index.js";
import { attempt, describeValue, fail, FlexuraError, issue, type Result } from "../errors/index.js";
import { coincidenceTolerance, type PiecewisePolynomial } from "../math/index.js";
import { makePiecewise } from "../math/piecewise.js";
import type { Load } from "../loads/index.js";
import { restrainsDeflection, restrainsRotation, type Support } from "../supports/index.js";
import { shiftedSum, trimDegree, type ShiftedTerm } from "./shifted-sum.js";
import type { InfluenceQuantity, MemberInfluence, ReactionInfluence } from "./types.js";

/** The member without loads, settlements or prescribed rotations: what every reciprocal case starts from. */
function unloaded(beam: BeamInput): BeamInput {
  if (typeof beam !== "object" || beam === null) fail("beam-invalid", [], `The member must be an object; got ${describeValue(beam)}.`);
  const supports = Array.isArray(beam.supports)
    ? beam.supports.map((s: Support) => {
        if (typeof s !== "object" || s === null) return s;
        const { settlement: _s, rotation: _r, ...rest } = s;
        return rest;
      })
    : beam.supports;
  const out: BeamInput = { length: beam.length, stiffness: beam.stiffness, supports, loads: [] };
  return beam.hinges === undefined ? out : { ...out, hinges: beam.hinges };
}

/** The deflection of the member under one case, at the lowest degree that holds it (straight, degree 1, on a determinate member); the solve's warnings go to `warnings`. */
function deflectionUnder(beam: BeamInput, supports: readonly Support[], loads: readonly Load[], warnings: BeamWarning[], straight: boolean): PiecewisePolynomial {
  const s = solveBeam({ ...beam, supports, loads });
  for (const w of s.warnings) if (!warnings.some((k) => k.code === w.code)) warnings.push(w);
  return straight ? toStraight(s.deflection) : trimDegree(s.deflection);
}

/** A rigid-body displacement of a determinate member is straight on every piece: the curvature a solve leaves is rounding. */
function toStraight(pp: PiecewisePolynomial): PiecewisePolynomial {
  const d = pp.degree;
  const pieces = pp.breaks.length - 1;
  const out = new Float64Array(pieces * 2);
  for (let p = 0; p < pieces; p++) {
    out[2 * p] = pp.coefficients[p * (d + 1)] as number;
    out[2 * p + 1] = d >= 1 ? (pp.coefficients[p * (d + 1) + 1] as number) : 0;
  }
  return makePiecewise(pp.breaks.slice(), out, 1);
}

/** True when the member is statically determinate: rigid supports only, with as many restraints as two plus one per hinge (it is stable: the solve said so). */
function isDeterminate(beam: BeamInput): boolean {
  let restraints = 0;
  for (const s of beam.supports) {
    if (s.kind === "spring") return false;
    restraints += (restrainsDeflection(s) ? 1 : 0) + (restrainsRotation(s) ? 1 : 0);
  }
  return restraints === 2 + (beam.hinges ?? []).length;
}

function scaled(pp: PiecewisePolynomial, factor: number): PiecewisePolynomial {
  const c = new Float64Array(pp.coefficients.length);
  for (let i = 0; i < c.length; i++) c[i] = (pp.coefficients[i] as number) * factor;
  return makePiecewise(pp.breaks.slice(), c, pp.degree);
}

/**
 * Prepares a member for influence lines: derives the influence line of every support reaction
 * once, by the reciprocal theorem (Maxwell-Betti) on the solved member.
 *
 * Method, for a unit downward force at `a` (docs/moving.md): the force of a rigid support is
 * minus the deflection at `a` of the member whose support alone settles by one unit (Mueller-Breslau);
 * the moment of a support that holds rotation is the deflection at `a` when that support alone turns
 * by one radian counterclockwise; a spring's force is `-k` times the deflection at `a` under a unit
 * downward force at the spring (Maxwell), its moment `k_r` times the deflection at `a` under a unit
 * counterclockwise couple there. One solve per restraint, each the banded stiffness solve of
 * `solveBeam`; the lines are exact piecewise polynomials (linear on determinate members, cubic on
 * indeterminate ones). The member's own loads, settlements and prescribed rotations play no part.
 *
 * @throws FlexuraError with every problem of the member (as {@link solveBeam} reports them:
 *   `length-not-positive`, `mechanism`, ...), or `beam-invalid` when it is not an object.
 * @example
 * ```ts
 * const member = memberInfluence({ length: 10, stiffness: 1e4, supports: [{ kind: "pin", at: 0 }, { kind: "roller", at: 10 }] });
 * evaluatePiecewise(member.reactions[0].force!, 2.5); // 0.75
 * ```
 */
export function memberInfluence(beam: BeamInput): MemberInfluence {
  const plain = unloaded(beam);
  const base = solveBeam(plain); // every problem of the member itself, reported once
  const warnings: BeamWarning[] = [...base.warnings];
  const supports = plain.supports;
  const determinate = isDeterminate(plain);
  const reactions: ReactionInfluence[] = supports.map((s, j) => {
    const entry: { support: number; at: number; force?: PiecewisePolynomial; moment?: PiecewisePolynomial } = { support: j, at: s.at };
    const with_ = (change: Partial<Support>): Support[] => supports.map((t, i) => (i === j ? { ...t, ...change } : t));
    if (restrainsDeflection(s)) {
      entry.force =
        s.kind === "spring"
          ? scaled(deflectionUnder(plain, supports, [{ kind: "point", at: s.at, value: 1 }], warnings, false), -(s.stiffness as number))
          : scaled(deflectionUnder(plain, with_({ settlement: 1 }), [], warnings, determinate), -1);
    }
    if (restrainsRotation(s)) {
      entry.moment =
        s.kind === "spring"
          ? scaled(deflectionUnder(plain, supports, [{ kind: "couple", at: s.at, value: 1 }], warnings, false), s.rotationalStiffness as number)
          : deflectionUnder(plain, with_({ rotation: 1 }), [], warnings, determinate);
    }
    return Object.freeze(entry);
  });
  const nodes = new Set<number>([0, plain.length, ...supports.map((s) => s.at), ...(plain.hinges ?? [])]);
  if (typeof plain.stiffness !== "number") for (const seg of plain.stiffness) nodes.add(seg.from);
  return Object.freeze({
    kind: "member-influence",
    length: plain.length,
    beam: plain,
    supports: Object.freeze(supports.slice()),
    reactions: Object.freeze(reactions),
    nodes: Float64Array.from([...nodes].sort((a, b) => a - b)),
    spans: base.spans,
    determinate,
    warnings: Object.freeze(warnings),
  });
}

/**
 * The non-throwing form of {@link memberInfluence}.
 *
 * @example
 * ```ts
 * const r = tryMemberInfluence({ length: -1, stiffness: 1, supports: [] });
 * if (!r.ok) console.log(r.error.issues[0]?.code); // "length-not-positive"
 * ```
 */
export function tryMemberInfluence(beam: BeamInput): Result<MemberInfluence> {
  return attempt(() => memberInfluence(beam));
}

function isMember(value: unknown): value is MemberInfluence {
  return typeof value === "object" && value !== null && (value as { kind?: unknown }).kind === "member-influence";
}

/** A member prepared once, from either form. */
export function prepared(member: MemberInfluence | BeamInput): MemberInfluence {
  return isMember(member) ? member : memberInfluence(member);
}

/** Checks a point `at` of a quantity: a finite number within the member (to the coincidence tolerance); returns it clamped to the ends. */
function pointOf(q: { readonly at: unknown }, length: number): number {
  const at = q.at;
  if (typeof at !== "number") fail("not-a-number", ["at"], `The point must be a number (length units); got ${describeValue(at)}.`, { value: describeValue(at) });
  if (!Number.isFinite(at)) fail("not-finite", ["at"], `The point must be a finite number; got ${String(at)}.`, { value: String(at) });
  const slack = coincidenceTolerance(length);
  if (at < -slack || at > length + slack)
    fail("influence-point-outside-member", ["at"], `The point ${at} lies outside the member [0, ${length}]: ask for a point within it.`, { at, length });
  return Math.min(Math.max(at, 0), length);
}

function sideOf(q: { readonly side?: unknown }, required: boolean): "left" | "right" | undefined {
  const side = q.side;
  if (side === undefined && !required) return undefined;
  if (side !== "left" && side !== "right")
    fail("influence-side-invalid", ["side"], `The side must be "left" or "right"; got ${describeValue(side)}.`, { side: describeValue(side) });
  return side;
}

/** The unit force's own part of the shear or moment at `p` (left free body), on [0, L]. */
function ownPart(kind: "shear" | "moment", p: number, length: number): PiecewisePolynomial {
  // shear: -1 while the force is left of the cut; moment: -(p - a) while a < p
  if (p <= 0) return makePiecewise(Float64Array.of(0, length), new Float64Array(2), 1);
  if (p >= length) return makePiecewise(Float64Array.of(0, length), kind === "shear" ? Float64Array.of(-1, 0) : Float64Array.of(-length, 1), 1);
  return makePiecewise(Float64Array.of(0, p, length), kind === "shear" ? Float64Array.of(-1, 0, 0, 0) : Float64Array.of(-p, 1, 0, 0), 1);
}

/**
 * The exact influence line of a result: its value, as a piecewise polynomial of the position `a`
 * (length units, from the left end) of one unit downward force on the member, for `a` in
 * `[0, length]`. Units: a reaction force or a shear per unit force (dimensionless); a moment per
 * unit force (length units); a slope per unit force (1 / force); a deflection per unit force
 * (length / force). Signs as everywhere in flexura: reactions up and counterclockwise, moment
 * sagging, slope counterclockwise, deflection up.
 *
 * How: reactions from {@link memberInfluence}; the shear and moment at a point by statics of the
 * part left of it (the reactions left of the point and the unit force when it is there); the
 * deflection at a point by Maxwell's reciprocal theorem (the deflection curve under a unit downward
 * force at the point); the slope at a point by Betti's theorem (minus the deflection curve under a
 * unit counterclockwise couple at the point). Where the line jumps (the shear line at `a = at`), the
 * one-sided limits are the values with the force just left and just right of the point.
 *
 * @throws FlexuraError `influence-quantity-invalid` (not an object, or an unknown `kind`),
 *   `influence-point-outside-member` (path `["at"]`), `not-a-number` / `not-finite` (at),
 *   `influence-side-invalid`, `influence-side-required` (a moment at a support that holds rotation,
 *   where it jumps), `influence-support-unknown` (no support with that index),
 *   `influence-undefined` (a result with no meaning there: shear left of the left end or right of the
 *   right end, a slope at a hinge, a reaction component the support does not provide); and the
 *   member's own problems when it is given as a `BeamInput`.
 * @example
 * ```ts
 * const beam = { length: 10, stiffness: 1e4, supports: [{ kind: "pin", at: 0 }, { kind: "roller", at: 10 }] } as const;
 * const m = influenceLine(beam, { kind: "moment", at: 4 });
 * evaluatePiecewise(m, 4); // 2.4 = 4 * 6 / 10, the peak of the triangle
 * ```
 */
export function influenceLine(member: MemberInfluence | BeamInput, quantity: InfluenceQuantity): PiecewisePolynomial {
  const m = prepared(member);
  const q = quantity as unknown;
  if (typeof q !== "object" || q === null) fail("influence-quantity-invalid", [], `The result must be an object such as { kind: "moment", at: 3 }; got ${describeValue(q)}.`);
  const kind = (q as { kind?: unknown }).kind;
  const L = m.length;
  const tol = coincidenceTolerance(L);
  switch (kind) {
    case "reaction": {
      const r = q as { support?: unknown; component?: unknown };
      const j = r.support;
      if (typeof j !== "number" || !Number.isInteger(j) || j < 0 || j >= m.reactions.length)
        fail("influence-support-unknown", ["support"], `There is no support ${describeValue(j)}: the member has ${m.reactions.length} (indices 0 to ${m.reactions.length - 1}).`, { support: describeValue(j), supports: m.reactions.length });
      const component = r.component ?? "force";
      if (component !== "force" && component !== "moment")
        fail("influence-quantity-invalid", ["component"], `The component must be "force" or "moment"; got ${describeValue(component)}.`);
      const line = (m.reactions[j] as ReactionInfluence)[component];
      if (line === undefined)
        fail("influence-undefined", ["component"], `Support ${j} (${(m.supports[j] as Support).kind} at ${(m.supports[j] as Support).at}) does not hold ${component === "force" ? "deflection" : "rotation"}, so it has no reaction ${component}.`, { support: j, component });
      return line;
    }
    case "shear":
    case "moment": {
      const p = pointOf(q as { at: unknown }, L);
      let side = sideOf(q, kind === "shear");
      if (kind === "shear" && ((side === "left" && p <= tol) || (side === "right" && p >= L - tol)))
        fail("influence-undefined", ["side"], `There is no member ${side} of ${p}: ask for the shear ${side === "left" ? "right" : "left"} of the end.`, { at: p, side });
      if (kind === "moment" && side === undefined) {
        const jump = m.supports.some((s) => restrainsRotation(s) && Math.abs(s.at - p) <= tol && p > tol && p < L - tol);
        if (jump) fail("influence-side-required", ["side"], `The moment jumps at ${p}, where a support holds rotation: ask for the moment just "left" or "right" of it.`, { at: p });
        side = "left";
      }
      const s = side as "left" | "right";
      const terms: ShiftedTerm[] = [{ pp: ownPart(kind, p, L), shift: 0, weight: 1 }];
      m.reactions.forEach((r) => {
        const left = s === "left" ? r.at < p - tol : r.at <= p + tol;
        if (!left) return;
        if (kind === "shear") {
          if (r.force !== undefined) terms.push({ pp: r.force, shift: 0, weight: 1 });
        } else {
          if (r.force !== undefined && p - r.at !== 0) terms.push({ pp: r.force, shift: 0, weight: p - r.at });
          if (r.moment !== undefined) terms.push({ pp: r.moment, shift: 0, weight: -1 });
        }
      });
      return shiftedSum(terms, 0, L);
    }
    case "slope":
    case "deflection": {
      const p = pointOf(q as { at: unknown }, L);
      if (kind === "slope" && (m.beam.hinges ?? []).some((h) => Math.abs(h - p) <= tol))
        fail("influence-undefined", ["at"], `The slope jumps at the hinge at ${p}: ask for the slope a little to one side of it.`, { at: p });
      const load: Load = kind === "slope" ? { kind: "couple", at: p, value: 1 } : { kind: "point", at: p, value: 1 };
      const line = trimDegree(solveBeam({ ...m.beam, loads: [load] }).deflection);
      return kind === "slope" ? scaled(line, -1) : line;
    }
    default:
      throw new FlexuraError([issue("influence-quantity-invalid", ["kind"], `Unknown result ${describeValue(kind)}: use "reaction", "shear", "moment", "slope" or "deflection".`, { kind: describeValue(kind) })]);
  }
}

/**
 * The non-throwing form of {@link influenceLine}.
 *
 * @example
 * ```ts
 * const r = tryInfluenceLine({ length: 4, stiffness: 1, supports: [{ kind: "fixed", at: 0 }] }, { kind: "deflection", at: 5 });
 * if (!r.ok) console.log(r.error.issues[0]?.code); // "influence-point-outside-member"
 * ```
 */
export function tryInfluenceLine(member: MemberInfluence | BeamInput, quantity: InfluenceQuantity): Result<PiecewisePolynomial> {
  return attempt(() => influenceLine(member, quantity));
}
