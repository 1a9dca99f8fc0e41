import type { BeamInput } from "../beam/index.js";
import { attempt, fail, IssueCollector, type Result } from "../errors/index.js";
import { coincidenceTolerance, evaluatePiecewise, extremesOf, integralOf, type PiecewisePolynomial } from "../math/index.js";
import { makePiecewise } from "../math/piecewise.js";
import { influenceLine, prepared } from "./influence.js";
import { shiftedSum, type ShiftedTerm } from "./shifted-sum.js";
import { layOutTrain, type LaidOutTrain, type Train, type TrainOptions } from "./train.js";
import type { InfluenceQuantity, MemberInfluence } from "./types.js";

/** Where a train stands, and the value of a result with it there. */
export interface TrainPlacement {
  /** The value of the result (its units: force, force * length, radians or length). */
  readonly value: number;
  /** Where the first axle stands (length units from the left end; may be off the member when the train stands partly on it). */
  readonly firstAxleAt: number;
  /** False: the axles run left to right in the order given. True: the train is turned round (it runs the other way), the first axle nearest the right end. */
  readonly reversed: boolean;
  /** The index of the axle standing over the point of the result, when one does (a point result only). */
  readonly axleAtPoint?: number;
}

/** The worst placements of a train for one result. */
export interface WorstPlacements {
  /** The largest value and where the train stands for it. */
  readonly max: TrainPlacement;
  /** The smallest (most negative) value and where the train stands for it. */
  readonly min: TrainPlacement;
}

/** One orientation of a laid-out train: +1 as given, -1 reversed. */
export type Orientation = 1 | -1;

/** The positions of the first axle for which the train stands on the member (partly, or wholly), for one orientation. */
export function placementRange(laid: LaidOutTrain, o: Orientation, length: number, partlyOn: boolean): readonly [number, number] {
  // axle i stands at x = s + o t_i; the train covers [s + tMin, s + tMax] (o = 1) or [s - tMax, s - tMin] (o = -1)
  if (o === 1) return partlyOn ? [-laid.tMax, length - laid.tMin] : [-laid.tMin, length - laid.tMax];
  return partlyOn ? [laid.tMin, length + laid.tMax] : [laid.tMax, length + laid.tMin];
}

/** The train's effect on a result as a function of where its first axle stands: the shifted, weighted sum of the line (and its running integral for the uniform part). */
export function trainSum(line: PiecewisePolynomial, running: PiecewisePolynomial | undefined, laid: LaidOutTrain, o: Orientation, lo: number, hi: number): PiecewisePolynomial {
  const terms: ShiftedTerm[] = laid.axles.map((a) => ({ pp: line, shift: o * a.t, weight: a.load }));
  const u = laid.uniform;
  if (u !== undefined && running !== undefined) {
    // the uniform part covers x from s + o u0 to s + o u1 (in increasing x either way round)
    const [near, far] = o === 1 ? [u.u0, u.u1] : [-u.u1, -u.u0];
    terms.push({ pp: running, shift: far, weight: u.w, hold: true }, { pp: running, shift: near, weight: -u.w, hold: true });
  }
  if (!(hi > lo)) {
    // a train exactly as long as the member, wholly on it: one placement
    let v = 0;
    for (const t of terms) {
      const x = lo + t.shift;
      const b = t.pp.breaks;
      const last = b[b.length - 1] as number;
      if (x < (b[0] as number)) continue;
      v += t.weight * (x > last ? (t.hold === true ? evaluatePiecewise(t.pp, last) : 0) : evaluatePiecewise(t.pp, x));
    }
    return makePiecewise(Float64Array.of(lo, lo + Math.max(Math.abs(lo), 1) * 1e-12), Float64Array.of(v), 0);
  }
  return shiftedSum(terms, lo, hi);
}

/** Checks and lays out a train for a member; throws every problem at once. */
export function laidOutFor(train: Train, options: TrainOptions | undefined, length: number): LaidOutTrain {
  const found = new IssueCollector();
  const laid = layOutTrain(train, options, found);
  found.throwIfAny();
  const t = laid as LaidOutTrain;
  if (options?.partlyOn === false && t.tMax - t.tMin > length + coincidenceTolerance(length))
    fail("train-longer-than-member", ["train"], `The train is ${t.tMax - t.tMin} long and the member ${length}: it cannot stand wholly on the member. Allow it partly on ({ partlyOn: true }) or shorten it.`, { trainLength: t.tMax - t.tMin, length });
  return t;
}

/** The orientations the options ask for. */
export function orientations(options: TrainOptions | undefined): readonly Orientation[] {
  return options?.directions === "as-given" ? [1] : [1, -1];
}

/** The point of a point result, for naming the axle over it. */
function pointOf(q: InfluenceQuantity): number | undefined {
  return q.kind === "reaction" ? undefined : q.at;
}

/** The worst placements of a laid-out train on one influence line. */
export function worstOnLine(line: PiecewisePolynomial, laid: LaidOutTrain, options: TrainOptions | undefined, length: number, point: number | undefined): WorstPlacements {
  const running = laid.uniform === undefined ? undefined : integralOf(line);
  const partlyOn = options?.partlyOn !== false;
  let max: TrainPlacement | undefined;
  let min: TrainPlacement | undefined;
  const tol = coincidenceTolerance(length);
  const place = (value: number, s: number, o: Orientation): TrainPlacement => {
    const base = { value, firstAxleAt: s, reversed: o === -1 };
    if (point === undefined) return base;
    const k = laid.axles.findIndex((a) => Math.abs(s + o * a.t - point) <= tol);
    return k < 0 ? base : { ...base, axleAtPoint: k };
  };
  for (const o of orientations(options)) {
    const [lo, hi] = placementRange(laid, o, length, partlyOn);
    const f = trainSum(line, running, laid, o, lo, hi);
    const e = extremesOf(f);
    if (max === undefined || e.max.value > max.value) max = place(e.max.value, hi > lo ? e.max.at : lo, o);
    if (min === undefined || e.min.value < min.value) min = place(e.min.value, hi > lo ? e.min.at : lo, o);
  }
  return { max: max as TrainPlacement, min: min as TrainPlacement };
}

/**
 * The worst placements of a moving train for one result: where the train stands (the first
 * axle's position and which way round) for the largest and for the smallest value, and those
 * values, exact. The train's effect as a function of where it stands is a piecewise polynomial
 * (the influence line shifted to each axle and weighted by its load, plus the running integral of
 * the line for the uniform part); its extremes come from its breakpoints (an axle over a point where
 * the line breaks: the point itself, a support, a hinge, a change of E I, an end) and the roots of its
 * derivative, not from stepping. Where the result jumps as an axle passes (the shear at the point),
 * the value is the one-sided limit with the axle just beside the point.
 *
 * Units: the result's own (force, force * length, radians, length), for axle loads in force units
 * and a uniform part in force per length. Signs as in {@link influenceLine}.
 *
 * @throws FlexuraError `train-invalid`, `train-empty`, `train-spacings-count`, `spacing-negative`,
 *   `not-a-number` / `not-finite` (paths under `train` and `options`), `uniform-length-not-positive`,
 *   `dynamic-allowance-unknown`, `dynamic-allowance-negative`, `train-options-invalid`,
 *   `train-longer-than-member` (with `partlyOn: false`), and the codes of {@link influenceLine}.
 * @example
 * ```ts
 * // two 10 kN wheels 2 m apart on an 8 m simple span: the largest moment at midspan
 * const beam = { length: 8, stiffness: 1e4, supports: [{ kind: "pin", at: 0 }, { kind: "roller", at: 8 }] } as const;
 * worstPlacements(beam, { kind: "moment", at: 4 }, { loads: [10, 10], spacings: [2] }).max;
 * // { value: 30, firstAxleAt: 2, reversed: false, axleAtPoint: 1 }: the second wheel at midspan (10 * 2 + 10 * 1)
 * ```
 */
export function worstPlacements(member: MemberInfluence | BeamInput, quantity: InfluenceQuantity, train: Train, options?: TrainOptions): WorstPlacements {
  const m = prepared(member);
  const laid = laidOutFor(train, options, m.length);
  const line = influenceLine(m, quantity);
  return worstOnLine(line, laid, options, m.length, pointOf(quantity));
}

/**
 * The non-throwing form of {@link worstPlacements}.
 *
 * @example
 * ```ts
 * const r = tryWorstPlacements({ length: 8, stiffness: 1, supports: [{ kind: "fixed", at: 0 }] }, { kind: "moment", at: 0 }, { loads: [], spacings: [] });
 * if (!r.ok) console.log(r.error.issues[0]?.code); // "train-empty"
 * ```
 */
export function tryWorstPlacements(member: MemberInfluence | BeamInput, quantity: InfluenceQuantity, train: Train, options?: TrainOptions): Result<WorstPlacements> {
  return attempt(() => worstPlacements(member, quantity, train, options));
}

/**
 * A train's effect on one result as a function of where its first axle stands: a piecewise
 * polynomial over the positions for which the train stands on the member (partly, unless
 * `partlyOn` is false), for the train as given (`reversed` false) or turned round. For plotting, and
 * for reading the value at a placement.
 *
 * @throws FlexuraError the codes of {@link worstPlacements}.
 * @example
 * ```ts
 * const beam = { length: 8, stiffness: 1e4, supports: [{ kind: "pin", at: 0 }, { kind: "roller", at: 8 }] } as const;
 * const f = trainEffect(beam, { kind: "reaction", support: 0 }, { loads: [10], spacings: [] });
 * evaluatePiecewise(f, 2); // 7.5: one 10 kN wheel at 2 m
 * ```
 */
export function trainEffect(member: MemberInfluence | BeamInput, quantity: InfluenceQuantity, train: Train, options?: TrainOptions & { readonly reversed?: boolean }): PiecewisePolynomial {
  const m = prepared(member);
  const laid = laidOutFor(train, options, m.length);
  const line = influenceLine(m, quantity);
  const o: Orientation = options?.reversed === true ? -1 : 1;
  const [lo, hi] = placementRange(laid, o, m.length, options?.partlyOn !== false);
  return trainSum(line, laid.uniform === undefined ? undefined : integralOf(line), laid, o, lo, hi);
}

/** The largest and smallest reaction of one support under a moving train. */
export interface ReactionPlacements {
  /** Index of the support. */
  readonly support: number;
  /** Its position (length units). */
  readonly at: number;
  /** The force (up positive), when the support holds deflection: largest (`max`) and smallest (`min`: negative is uplift). */
  readonly force?: WorstPlacements;
  /** The moment (counterclockwise positive), when the support holds rotation. */
  readonly moment?: WorstPlacements;
}

/**
 * The largest and smallest reaction at every support under a moving train, with where the train
 * stands for each (for bearings, columns and brackets). Exact, as {@link worstPlacements}.
 *
 * @throws FlexuraError the codes of {@link worstPlacements} for the train and options, and the member's own.
 * @example
 * ```ts
 * const beam = { length: 6, stiffness: 1e4, supports: [{ kind: "pin", at: 0 }, { kind: "roller", at: 6 }] } as const;
 * reactionPlacements(beam, { loads: [10, 10], spacings: [2] })[0].force?.max.value; // 10 * (1 + 4 / 6) = 16.67
 * ```
 */
export function reactionPlacements(member: MemberInfluence | BeamInput, train: Train, options?: TrainOptions): readonly ReactionPlacements[] {
  const m = prepared(member);
  const laid = laidOutFor(train, options, m.length);
  return m.reactions.map((r) => {
    const out: { support: number; at: number; force?: WorstPlacements; moment?: WorstPlacements } = { support: r.support, at: r.at };
    if (r.force !== undefined) out.force = worstOnLine(r.force, laid, options, m.length, undefined);
    if (r.moment !== undefined) out.moment = worstOnLine(r.moment, laid, options, m.length, undefined);
    return out;
  });
}
