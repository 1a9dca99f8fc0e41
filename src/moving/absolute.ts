import type { BeamInput } from "../beam/index.js";
import { attempt, fail, type Result } from "../errors/index.js";
import { coincidenceTolerance, extremesOf, type PiecewisePolynomial } from "../math/index.js";
import { makePiecewise } from "../math/piecewise.js";
import { restrainsRotation } from "../supports/index.js";
import { influenceLine, prepared } from "./influence.js";
import { laidOutFor, orientations, placementRange, worstOnLine, type Orientation, type TrainPlacement } from "./placement.js";
import { shiftedSum, type ShiftedTerm } from "./shifted-sum.js";
import type { LaidOutTrain, Train, TrainOptions } from "./train.js";
import type { MemberInfluence } from "./types.js";

/** A moment anywhere on the member under a moving train: its value, where it acts and where the train stands. */
export interface MomentPlacement extends TrainPlacement {
  /** Where on the member the moment acts (length units). */
  readonly at: number;
}

/** The largest sagging and hogging moments anywhere on the member under a moving train. */
export interface AbsoluteMoments {
  /** The largest moment (sagging positive) anywhere, where it acts and where the train stands. */
  readonly max: MomentPlacement;
  /** The smallest (most hogging) moment anywhere. */
  readonly min: MomentPlacement;
}

/**
 * The moment under axle `k` when axle `k` stands at x, as a piecewise polynomial of x, for one
 * orientation: from the reaction lines by statics, `M(x) = sum over supports left of x of
 * [(x - x_j) R_j - C_j] - sum over axles left of x of P_i (x - a_i)`, every reaction line read at the
 * axles' positions x + o (t_i - t_k).
 */
export function momentUnderAxle(m: MemberInfluence, laid: LaidOutTrain, k: number, o: Orientation, lo: number, hi: number): PiecewisePolynomial {
  const L = m.length;
  const tk = (laid.axles[k] as { t: number }).t;
  const one = makePiecewise(Float64Array.of(0, L), Float64Array.of(1), 0);
  const terms: ShiftedTerm[] = [];
  for (const a of laid.axles) {
    const c = o * (a.t - tk);
    for (const r of m.reactions) {
      if (r.force !== undefined) terms.push({ pp: r.force, shift: c, weight: a.load, about: r.at, from: r.at });
      if (r.moment !== undefined) terms.push({ pp: r.moment, shift: c, weight: -a.load, from: r.at });
    }
    if (c < 0) terms.push({ pp: one, shift: c, weight: a.load * c }); // -P (x - a) = P c while the axle is on the member
  }
  return shiftedSum(terms, lo, hi);
}

/**
 * The largest sagging and the largest hogging moment anywhere on the member under a moving train
 * of axles, where each acts and where the train stands for it, exact. Under axles alone the moment
 * diagram is straight between axles and supports, so its extremes lie under an axle or at a support:
 * for each axle, the moment under it as it travels is a piecewise polynomial of its position
 * (from the reaction lines by statics), whose extremes come from breakpoints and derivative roots;
 * at each support (both sides where the moment jumps) and each end, the worst placements of the
 * moment line there.
 *
 * A train with a uniform part is refused (`absolute-moment-uniform-not-covered`): its largest moment
 * can lie between axles, which this release does not search. Use {@link worstPlacements} at chosen points.
 *
 * @throws FlexuraError `absolute-moment-uniform-not-covered`, the codes of {@link worstPlacements}
 *   for the train and options, and the member's own.
 * @example
 * ```ts
 * // two 10 kN wheels 2 m apart on a 10 m simple span: (P / 2L)(L - a/2)^2 = 40.5 kN m
 * const beam = { length: 10, stiffness: 1e4, supports: [{ kind: "pin", at: 0 }, { kind: "roller", at: 10 }] } as const;
 * absoluteMoments(beam, { loads: [10, 10], spacings: [2] }).max.value; // 40.5
 * ```
 */
export function absoluteMoments(member: MemberInfluence | BeamInput, train: Train, options?: TrainOptions): AbsoluteMoments {
  const m = prepared(member);
  const laid = laidOutFor(train, options, m.length);
  if (laid.uniform !== undefined)
    fail("absolute-moment-uniform-not-covered", ["train", "uniform"], "The largest moment anywhere under a train with a uniform part can lie between axles, which this release does not search: ask for the worst placements at chosen points instead (worstPlacements).");
  const L = m.length;
  const tol = coincidenceTolerance(L);
  const partlyOn = options?.partlyOn !== false;
  let max: MomentPlacement | undefined;
  let min: MomentPlacement | undefined;
  const offer = (p: MomentPlacement): void => {
    if (max === undefined || p.value > max.value) max = p;
    if (min === undefined || p.value < min.value) min = p;
  };
  for (const o of orientations(options)) {
    const [sLo, sHi] = placementRange(laid, o, L, partlyOn);
    laid.axles.forEach((a, k) => {
      // axle k stands at x = s + o t_k, on the member
      const lo = Math.max(0, sLo + o * a.t);
      const hi = Math.min(L, sHi + o * a.t);
      if (!(hi > lo)) return;
      const g = momentUnderAxle(m, laid, k, o, lo, hi);
      const e = extremesOf(g);
      offer({ value: e.max.value, at: e.max.at, firstAxleAt: e.max.at - o * a.t, reversed: o === -1, axleAtPoint: k });
      offer({ value: e.min.value, at: e.min.at, firstAxleAt: e.min.at - o * a.t, reversed: o === -1, axleAtPoint: k });
    });
  }
  // at the supports and the ends (both sides where a support holds rotation)
  const points = new Set<number>([0, L, ...m.supports.map((s) => s.at)]);
  for (const x of points) {
    const jumps = m.supports.some((s) => restrainsRotation(s) && Math.abs(s.at - x) <= tol) && x > tol && x < L - tol;
    for (const side of jumps ? (["left", "right"] as const) : ([undefined] as const)) {
      const line = influenceLine(m, side === undefined ? { kind: "moment", at: x } : { kind: "moment", at: x, side });
      const w = worstOnLine(line, laid, options, L, x);
      offer({ ...w.max, at: x });
      offer({ ...w.min, at: x });
    }
  }
  return { max: max as MomentPlacement, min: min as MomentPlacement };
}

/**
 * The non-throwing form of {@link absoluteMoments}.
 *
 * @example
 * ```ts
 * const r = tryAbsoluteMoments({ length: 10, stiffness: 1, supports: [] }, { loads: [1], spacings: [] });
 * if (!r.ok) console.log(r.error.issues[0]?.code); // "mechanism"
 * ```
 */
export function tryAbsoluteMoments(member: MemberInfluence | BeamInput, train: Train, options?: TrainOptions): Result<AbsoluteMoments> {
  return attempt(() => absoluteMoments(member, train, options));
}
