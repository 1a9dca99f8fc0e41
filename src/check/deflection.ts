import { addPiecewise, evaluatePiecewise, extremesOf, piecewisePolynomial, type PiecewisePolynomial } from "../math/index.js";
import type { CheckedSolution } from "./solution.js";

/** The peak deflection of one span or cantilever, measured from its supports. */
export interface SpanDeflection {
  /** Index in the solution's `spans`. */
  readonly span: number;
  /** `"span"` between two supports, `"cantilever"` beyond the outermost one. */
  readonly spanKind: "span" | "cantilever";
  /** Start (length). */
  readonly from: number;
  /** End (length). */
  readonly to: number;
  /**
   * The peak deflection relative to the supports (length, positive up): for a span, from the
   * straight line joining its two ends (so support settlement is not counted); for a
   * cantilever, from the deflection at its supported end.
   */
  readonly deflection: number;
  /** Where it occurs (length). */
  readonly at: number;
}

/** The supported end of a cantilever: the end that is not a member end, or for a whole-member cantilever the end that moves less. */
function supportedEnd(solution: CheckedSolution, from: number, to: number): number {
  const length = solution.length;
  if (from > 0) return from;
  if (to < length) return to;
  const a = Math.abs(evaluatePiecewise(solution.deflection, from));
  const b = Math.abs(evaluatePiecewise(solution.deflection, to));
  return b < a ? to : from;
}

/** pp minus the straight line through (x0, v0) and (x1, v1), on pp's whole domain. */
function minusLine(pp: PiecewisePolynomial, x0: number, v0: number, x1: number, v1: number): PiecewisePolynomial {
  const b0 = pp.breaks[0] as number;
  const bn = pp.breaks[pp.breaks.length - 1] as number;
  const slope = x1 > x0 ? (v1 - v0) / (x1 - x0) : 0;
  const line = piecewisePolynomial([b0, bn], [-(v0 + slope * (b0 - x0)), -slope], 1);
  return addPiecewise(pp, line);
}

/**
 * The peak deflection of every span and cantilever of a solved member, measured from its
 * supports, with where it occurs: the extremes are exact (roots of the slope, or of slope minus
 * the chord's slope, on each piece of the deflection polynomial).
 *
 * @param solution - A solved member (`solveBeam`'s result).
 * @returns One entry per span and cantilever, left to right.
 * @example
 * ```ts
 * spanDeflections(solution)[0]?.deflection; // -5 w L^4 / (384 E I) for a simple span under uniform load
 * ```
 */
export function spanDeflections(solution: CheckedSolution): readonly SpanDeflection[] {
  const d = solution.deflection;
  return solution.spans.map((s, span): SpanDeflection => {
    let rel: PiecewisePolynomial = d;
    if (s.kind === "span") {
      const v0 = evaluatePiecewise(d, s.from);
      const v1 = evaluatePiecewise(d, s.to);
      if (v0 !== 0 || v1 !== 0) rel = minusLine(d, s.from, v0, s.to, v1);
    } else {
      const x = supportedEnd(solution, s.from, s.to);
      const v = evaluatePiecewise(d, x);
      if (v !== 0) rel = minusLine(d, x, v, x, v);
    }
    const e = extremesOf(rel, s.from, s.to);
    const big = Math.abs(e.min.value) >= Math.abs(e.max.value) ? e.min : e.max;
    return { span, spanKind: s.kind, from: s.from, to: s.to, deflection: big.value + 0, at: big.at };
  });
}
