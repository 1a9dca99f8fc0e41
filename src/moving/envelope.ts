import type { BeamInput } from "../beam/index.js";
import type { DiagramEnvelope, EnvelopeBound, GoverningValue } from "../combine/index.js";
import { attempt, describeValue, fail, type Result } from "../errors/index.js";
import { coincidenceTolerance, evaluatePiecewise, extremesOf, type PiecewisePolynomial } from "../math/index.js";
import { makePiecewise } from "../math/piecewise.js";
import { momentUnderAxle } from "./absolute.js";
import { influenceLine, prepared } from "./influence.js";
import { laidOutFor, orientations, placementRange, worstOnLine, type Orientation, type TrainPlacement } from "./placement.js";
import { shiftedSum, type ShiftedTerm } from "./shifted-sum.js";
import type { LaidOutTrain, Train, TrainOptions } from "./train.js";
import type { MemberInfluence } from "./types.js";
import { upperEnvelope } from "./upper-envelope.js";

/** The train standing still: every envelope piece that follows it is its own diagram. */
export interface StandingPlacement {
  /** Tag. */
  readonly kind: "fixed";
  /** Where the first axle stands (length units; may be off the member). */
  readonly firstAxleAt: number;
  /** True when the train is turned round (the first axle nearest the right end). */
  readonly reversed: boolean;
  /** A name a user reads. */
  readonly name: string;
}

/** One axle standing over the point where the envelope is read: the train moves with the point. */
export interface AxleAtPointPlacement {
  /** Tag. */
  readonly kind: "axle-at-point";
  /** Index of the axle over the point. */
  readonly axle: number;
  /** For the shear: the cut just left or just right of the axle's point (the axle just right or just left of the cut). */
  readonly side?: "left" | "right";
  /** True when the train is turned round. */
  readonly reversed: boolean;
  /** A name a user reads. */
  readonly name: string;
}

/** A family of train placements that an envelope piece follows. */
export type PlacementFamily = StandingPlacement | AxleAtPointPlacement;

/** Envelopes of shear and moment along the member under a moving train, in the shape of the combine module's envelopes. */
export interface MovingEnvelopes {
  /** The placements the envelopes' pieces follow; `governing` and `peak.arrangement` index this list. */
  readonly placements: readonly PlacementFamily[];
  /** Shear (force units): upper and lower bounds over every placement, at every x. */
  readonly shear: DiagramEnvelope;
  /** Moment (force * length, sagging positive): upper and lower bounds over every placement, at every x. */
  readonly moment: DiagramEnvelope;
}

/** The shear and moment diagrams of the train standing at one placement, by statics from the reaction lines. */
function standingDiagrams(m: MemberInfluence, laid: LaidOutTrain, s: number, o: Orientation): { shear: PiecewisePolynomial; moment: PiecewisePolynomial } {
  const L = m.length;
  const events = new Map<number, { dv: number; dm: number }>();
  const add = (x: number, dv: number, dm: number): void => {
    const e = events.get(x);
    if (e === undefined) events.set(x, { dv, dm });
    else {
      e.dv += dv;
      e.dm += dm;
    }
  };
  const on: { x: number; p: number }[] = [];
  for (const a of laid.axles) {
    const x = s + o * a.t;
    if (x >= 0 && x <= L) on.push({ x, p: a.load });
  }
  for (const r of m.reactions) {
    let f = 0;
    let c = 0;
    for (const a of on) {
      if (r.force !== undefined) f += a.p * evaluatePiecewise(r.force, a.x);
      if (r.moment !== undefined) c += a.p * evaluatePiecewise(r.moment, a.x);
    }
    add(r.at, f, -c);
  }
  for (const a of on) add(a.x, -a.p, 0);
  const xs = [...events.keys(), 0, L].sort((a, b) => a - b);
  const breaks: number[] = [];
  for (const x of xs) if (breaks.length === 0 || x > (breaks[breaks.length - 1] as number)) breaks.push(x);
  const vc: number[] = [];
  const mc: number[] = [];
  let v = 0;
  let mo = 0;
  for (let i = 0; i + 1 < breaks.length; i++) {
    const x = breaks[i] as number;
    const e = events.get(x);
    if (e !== undefined) {
      v += e.dv;
      mo += e.dm;
    }
    vc.push(v);
    mc.push(mo, v);
    mo += v * ((breaks[i + 1] as number) - x);
  }
  const b = Float64Array.from(breaks);
  return { shear: makePiecewise(b, Float64Array.from(vc), 0), moment: makePiecewise(b.slice(), Float64Array.from(mc), 1) };
}

/** The shear just left or right of x with axle k standing over x, as a piecewise polynomial of x. */
function shearUnderAxle(m: MemberInfluence, laid: LaidOutTrain, k: number, o: Orientation, side: "left" | "right", lo: number, hi: number): PiecewisePolynomial {
  const L = m.length;
  const tk = (laid.axles[k] as { t: number }).t;
  const one = makePiecewise(Float64Array.of(0, L), Float64Array.of(1), 0);
  const terms: ShiftedTerm[] = [];
  for (const a of laid.axles) {
    const c = o * (a.t - tk);
    for (const r of m.reactions) if (r.force !== undefined) terms.push({ pp: r.force, shift: c, weight: a.load, from: r.at });
    // the axle's own force, while it is left of the cut (axle k itself is left of a cut just right of x)
    if (c < 0 || (c === 0 && side === "right")) terms.push({ pp: one, shift: c, weight: -a.load });
  }
  return shiftedSum(terms, lo, hi);
}

const negate = (pp: PiecewisePolynomial): PiecewisePolynomial => makePiecewise(pp.breaks, pp.coefficients.map((c) => -c), pp.degree);

/** A curve defined on part of [0, L], extended by a very low constant elsewhere (it does not govern there). */
function onWholeMember(pp: PiecewisePolynomial, L: number, low: number): PiecewisePolynomial {
  const b = pp.breaks;
  const x0 = b[0] as number;
  const x1 = b[b.length - 1] as number;
  if (x0 <= 0 && x1 >= L) return pp;
  const d = pp.degree;
  const breaks: number[] = [];
  const coef: number[] = [];
  const pad = (): void => {
    coef.push(low);
    for (let k = 1; k <= d; k++) coef.push(0);
  };
  if (x0 > 0) {
    breaks.push(0);
    pad();
  }
  for (let i = 0; i + 1 < b.length; i++) {
    breaks.push(b[i] as number);
    for (let k = 0; k <= d; k++) coef.push(pp.coefficients[i * (d + 1) + k] as number);
  }
  breaks.push(x1);
  if (x1 < L) {
    pad();
    breaks.push(L);
  }
  return makePiecewise(Float64Array.from(breaks), Float64Array.from(coef), d);
}

function bound(curves: readonly PiecewisePolynomial[], names: readonly string[], L: number, upper: boolean, tie: number, low: number): EnvelopeBound {
  // a curve that covers only part of the member (an axle over the point only while it is on) is padded far below the others
  const env = upperEnvelope(curves.map((c) => onWholeMember(upper ? c : negate(c), L, low)), 0, L, tie);
  const curve = upper ? env.curve : negate(env.curve);
  const e = extremesOf(curve);
  const best = upper ? e.max : e.min;
  const piece = Math.min(Math.max(0, curve.breaks.findIndex((x, i) => x <= best.at && (curve.breaks[i + 1] ?? Infinity) >= best.at)), env.governing.length - 1);
  const arrangement = env.governing[piece] as number;
  const peak: GoverningValue = { value: best.value, at: best.at, arrangement, name: names[arrangement] as string };
  return { curve, governing: env.governing, peak };
}

/**
 * Envelopes of shear and moment along the member under a moving train of axles: at every x the
 * largest and smallest value over every placement of the train (either way round, partly on the
 * member unless `partlyOn` is false), as piecewise polynomials whose pieces each follow one family
 * of placements (named in `placements`), in the shape of the combine module's `DiagramEnvelope`.
 *
 * How: at a point x, the train's effect on the shear or moment there is a piecewise polynomial of
 * its position, whose extremes lie where an axle stands over a breakpoint of the influence line
 * (a support, hinge, change of E I or end: the train standing still; or the point x itself: the
 * train moving with the point) or where its derivative is zero. On a member whose influence lines
 * are straight (`member.determinate`: rigid supports, as many restraints as two plus one per hinge) the derivative is piecewise constant, so only the
 * first two count: each is a family of exact curves in x (the standing train's diagrams by statics;
 * an axle over x from the reaction lines), and the envelope of those curves is taken exactly
 * (crossings as roots of differences). The shear just beside an axle counts (the one-sided value as
 * an axle passes a point).
 *
 * Members with curved lines (indeterminate, or on springs) are refused: a train standing in between
 * can govern there and that envelope is not a polynomial; use {@link envelopeAt} at chosen points
 * and {@link absoluteMoments}, both exact on any member.
 *
 * @throws FlexuraError `envelope-uniform-not-covered` for a train with a uniform part,
 *   `envelope-curved-lines-not-covered` for a member whose influence lines are curved, and the codes
 *   of {@link worstPlacements} for the train and options.
 * @example
 * ```ts
 * const beam = { length: 10, stiffness: 1e4, supports: [{ kind: "pin", at: 0 }, { kind: "roller", at: 10 }] } as const;
 * const e = movingEnvelopes(beam, { loads: [10, 10], spacings: [2] });
 * e.moment.upper.peak.value; // 40.5 = (P / 2L)(L - a/2)^2
 * ```
 */
export function movingEnvelopes(member: MemberInfluence | BeamInput, train: Train, options?: TrainOptions): MovingEnvelopes {
  const m = prepared(member);
  const laid = laidOutFor(train, options, m.length);
  if (laid.uniform !== undefined)
    fail("envelope-uniform-not-covered", ["train", "uniform"], "Envelopes under a train with a uniform part are not in this release: ask for the worst placements at chosen points instead (worstPlacements).");
  const L = m.length;
  const partlyOn = options?.partlyOn !== false;
  const placements: PlacementFamily[] = [];
  const shearCurves: PiecewisePolynomial[] = [];
  const momentCurves: PiecewisePolynomial[] = [];
  if (!m.determinate)
    fail("envelope-curved-lines-not-covered", [], "This member's influence lines are curved (it is indeterminate, or on springs): between the placements with an axle over a point, a support or a hinge, a train standing in between can govern, and that envelope is not a polynomial. This release gives it exactly at chosen points (envelopeAt) and the largest moments anywhere (absoluteMoments).");
  let scale = 0;
  const seen = new Set<string>();
  const stand = (s: number, o: Orientation): void => {
    const key = `${o}:${s}`;
    if (seen.has(key)) return;
    seen.add(key);
    const d = standingDiagrams(m, laid, s, o);
    placements.push({ kind: "fixed", firstAxleAt: s, reversed: o === -1, name: `train standing with its first axle at ${s}${o === -1 ? ", turned round" : ""}` });
    shearCurves.push(d.shear);
    momentCurves.push(d.moment);
  };
  const low = { value: -Infinity };
  const axleFamilies: { k: number; o: Orientation; lo: number; hi: number }[] = [];
  for (const o of orientations(options)) {
    const [sLo, sHi] = placementRange(laid, o, L, partlyOn);
    stand(sLo, o);
    if (sHi > sLo) stand(sHi, o);
    laid.axles.forEach((a, k) => {
      for (const n of m.nodes) {
        const s = n - o * a.t;
        if (s >= sLo && s <= sHi) stand(s, o);
      }
      const lo = Math.max(0, sLo + o * a.t);
      const hi = Math.min(L, sHi + o * a.t);
      if (hi > lo) axleFamilies.push({ k, o, lo, hi });
    });
  }
  for (const c of [...shearCurves, ...momentCurves]) for (const v of c.coefficients) scale = Math.max(scale, Math.abs(v));
  const P = laid.axles.reduce((x, a) => x + Math.abs(a.load), 0);
  scale = Math.max(scale, P * L);
  low.value = -1e3 * scale;
  const axleShear: PiecewisePolynomial[] = [];
  const axleMoment: PiecewisePolynomial[] = [];
  const axleNames: { v: PlacementFamily[]; m: PlacementFamily[] } = { v: [], m: [] };
  for (const f of axleFamilies) {
    const rev = f.o === -1;
    const tail = rev ? ", turned round" : "";
    axleMoment.push(momentUnderAxle(m, laid, f.k, f.o, f.lo, f.hi));
    axleNames.m.push({ kind: "axle-at-point", axle: f.k, reversed: rev, name: `axle ${f.k + 1} over the point${tail}` });
    for (const side of ["left", "right"] as const) {
      axleShear.push(shearUnderAxle(m, laid, f.k, f.o, side, f.lo, f.hi));
      axleNames.v.push({ kind: "axle-at-point", axle: f.k, side, reversed: rev, name: `axle ${f.k + 1} just ${side === "right" ? "left" : "right"} of the point${tail}` });
    }
  }
  const tie = 1e-12 * scale;
  const build = (): MovingEnvelopes => {
    const vNames = [...placements.map((p) => p.name), ...axleNames.v.map((p) => p.name)];
    const mNames = [...placements.map((p) => p.name), ...axleNames.m.map((p) => p.name)];
    const vCurves = [...shearCurves, ...axleShear];
    const mCurves = [...momentCurves, ...axleMoment];
    // the combined placement list: standing trains, then the shear families, then the moment families
    const list: PlacementFamily[] = [...placements, ...axleNames.v, ...axleNames.m];
    const offsetM = placements.length + axleNames.v.length;
    const remap = (b: EnvelopeBound, offset: number): EnvelopeBound => {
      const g = b.governing.map((i) => (i < placements.length ? i : i + offset));
      const a = b.peak.arrangement < placements.length ? b.peak.arrangement : b.peak.arrangement + offset;
      return { curve: b.curve, governing: g, peak: { ...b.peak, arrangement: a } };
    };
    const vu = remap(bound(vCurves, vNames, L, true, tie, low.value), 0);
    const vl = remap(bound(vCurves, vNames, L, false, tie, low.value), 0);
    const mu = remap(bound(mCurves, mNames, L, true, tie, low.value), offsetM - placements.length);
    const ml = remap(bound(mCurves, mNames, L, false, tie, low.value), offsetM - placements.length);
    return { placements: list, shear: { diagram: "shear", upper: vu, lower: vl }, moment: { diagram: "moment", upper: mu, lower: ml } };
  };
  return build();
}

/** The exact envelope values of one diagram at chosen points. */
export interface EnvelopeValues {
  /** The points (length units). */
  readonly at: readonly number[];
  /** At each point, the largest value and where the train stands for it. */
  readonly max: readonly TrainPlacement[];
  /** At each point, the smallest value and where the train stands for it. */
  readonly min: readonly TrainPlacement[];
}

/**
 * The envelope of shear (just right of each point) or moment at chosen points under a moving train,
 * on any member: at each point, the worst placements of the train on the point's influence line
 * (exact, as {@link worstPlacements}). For members whose influence lines are curved, where
 * {@link movingEnvelopes} does not give the whole curve; the points are the user's choice.
 *
 * @throws FlexuraError `influence-point-outside-member` (path under `at`), and the codes of {@link worstPlacements}.
 * @example
 * ```ts
 * const girder = { length: 12, stiffness: 42000, supports: [{ kind: "pin", at: 0 }, { kind: "roller", at: 6 }, { kind: "roller", at: 12 }] } as const;
 * envelopeAt(girder, { loads: [48, 48], spacings: [3.2] }, "moment", [2.4, 6]).min[1].value; // -48.81 kN m, the largest hogging moment over the middle support
 * ```
 */
export function envelopeAt(member: MemberInfluence | BeamInput, train: Train, diagram: "shear" | "moment", at: readonly number[], options?: TrainOptions): EnvelopeValues {
  const m = prepared(member);
  const laid = laidOutFor(train, options, m.length);
  if (diagram !== "shear" && diagram !== "moment") fail("diagram-unknown", ["diagram"], `The envelope is of "shear" or "moment"; got ${describeValue(diagram)}.`);
  if (!Array.isArray(at)) fail("influence-point-outside-member", ["at"], "Give the points as an array of positions on the member.");
  const slack = coincidenceTolerance(m.length);
  at.forEach((x: unknown, i) => {
    if (typeof x !== "number" || !Number.isFinite(x) || x < -slack || x > m.length + slack)
      fail("influence-point-outside-member", ["at", i], `Point ${i} (${describeValue(x)}) is not a position on the member [0, ${m.length}].`, { at: describeValue(x), length: m.length });
  });
  const max: TrainPlacement[] = [];
  const min: TrainPlacement[] = [];
  const L = m.length;
  for (const given of at as readonly number[]) {
    const x = Math.min(Math.max(given, 0), L);
    const side = x >= L - slack ? "left" : "right";
    const line = influenceLine(m, diagram === "moment" ? { kind: "moment", at: x, side } : { kind: "shear", at: x, side });
    const w = worstOnLine(line, laid, options, L, x);
    max.push(w.max);
    min.push(w.min);
  }
  return { at: at.slice(), max, min };
}

/**
 * The non-throwing form of {@link movingEnvelopes}.
 *
 * @example
 * ```ts
 * const r = tryMovingEnvelopes({ length: 10, stiffness: 1, supports: [{ kind: "fixed", at: 0 }] }, { loads: [1], spacings: [], uniform: { intensity: 1, start: 0, length: 2 } });
 * if (!r.ok) console.log(r.error.issues[0]?.code); // "envelope-uniform-not-covered"
 * ```
 */
export function tryMovingEnvelopes(member: MemberInfluence | BeamInput, train: Train, options?: TrainOptions): Result<MovingEnvelopes> {
  return attempt(() => movingEnvelopes(member, train, options));
}
