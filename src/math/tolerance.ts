/**
 * flexura's one tolerance policy for coincidence and rounding (docs/tolerances.md). Every check
 * of "the same point" or "zero to rounding" in the beam engine, its loads and supports, and the
 * piecewise polynomials reads its tolerance from here.
 */

/**
 * Two positions along a member closer than this fraction of its length are one point: supports
 * that close are duplicates, a hinge or stiffness step that close to another point is moved onto
 * it (with a note in the result), a distributed load narrower than this acts as its resultant, and
 * a position within this of an end is at the end (x = 0.1 + 0.2 on a 0.3 long member is at 0.3).
 * About 1e-9 of the length: 6 nanometres on a 6 m member.
 */
export const COINCIDENCE = 1e-9;

/**
 * A value of a diagram smaller than this fraction of the diagram's largest magnitude is zero to
 * rounding: peaks report it as 0, and a point of contraflexure needs the moment to pass beyond it.
 */
export const ROUNDING = 1e-10;

/**
 * The coincidence tolerance of a member or domain `length` long, in its length units.
 *
 * @example
 * ```ts
 * coincidenceTolerance(6); // 6e-9
 * ```
 */
export function coincidenceTolerance(length: number): number {
  return COINCIDENCE * length;
}
