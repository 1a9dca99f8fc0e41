// The lateral-torsional buckling modification factor C_b of AISC 360-16 F1-1, from flexura's exact moment diagram.
import { fail } from "../../errors/index.js";
import { evaluatePiecewise, extremesOf, type PiecewisePolynomial } from "../../math/index.js";

/** C_b of one unbraced segment and the moments it was computed from (force * length, absolute values). */
export interface MomentGradient {
  /** C_b = 12.5 M_max / (2.5 M_max + 3 M_A + 4 M_B + 3 M_C) (F1-1), dimensionless. */
  readonly factor: number;
  /** |M| largest in the segment, exact (from the roots of the shear). */
  readonly largest: number;
  /** Where it acts (length). */
  readonly largestAt: number;
  /** |M| at the quarter point. */
  readonly quarter: number;
  /** |M| at the centreline. */
  readonly centre: number;
  /** |M| at the three-quarter point. */
  readonly threeQuarter: number;
}

function absAt(moment: PiecewisePolynomial, x: number): number {
  // At a jump (an applied couple) the larger side is the one a buckling check must see.
  return Math.max(Math.abs(evaluatePiecewise(moment, x, "left")), Math.abs(evaluatePiecewise(moment, x, "right")));
}

/**
 * C_b of AISC 360-16 F1-1 over the unbraced segment [from, to] of a doubly symmetric member,
 * from its exact moment diagram: M_max is the largest |M| on the segment (found from the roots
 * of dM/dx, not from stations), M_A, M_B and M_C the |M| at its quarter, centre and
 * three-quarter points. A segment that carries no moment gets C_b = 1.
 *
 * @param moment - The member's bending moment M(x) (force * length), for example `solveBeam(...).moment`.
 * @param from - Start of the segment (length).
 * @param to - End of the segment (length), above `from`.
 * @example
 * ```ts
 * // simple span under uniform load, braced at mid-span: C_b = 200 / 154 = 1.30 on each half
 * momentGradient(solution.moment, 0, span / 2).factor;
 * ```
 */
export function momentGradient(moment: PiecewisePolynomial, from: number, to: number): MomentGradient {
  if (!(to > from)) fail("interval-reversed", ["to"], `The segment must run forward; got ${from} to ${to}.`, { from, to });
  const e = extremesOf(moment, from, to);
  const top = Math.abs(e.max.value) >= Math.abs(e.min.value) ? e.max : e.min;
  // The ends are read on both sides: an applied couple there makes the extremes' one side the smaller.
  const atFrom = absAt(moment, from);
  const atTo = absAt(moment, to);
  const largest = Math.max(Math.abs(top.value), atFrom, atTo);
  const largestAt = largest === Math.abs(top.value) ? top.at : atFrom >= atTo ? from : to;
  const span = to - from;
  const quarter = absAt(moment, from + span / 4);
  const centre = absAt(moment, from + span / 2);
  const threeQuarter = absAt(moment, from + (3 * span) / 4);
  const factor = largest === 0 ? 1 : (12.5 * largest) / (2.5 * largest + 3 * quarter + 4 * centre + 3 * threeQuarter);
  return Object.freeze({ factor, largest, largestAt, quarter, centre, threeQuarter });
}
