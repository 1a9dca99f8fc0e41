import type { Load } from "../loads/index.js";
import type { Extremes, PiecewisePolynomial } from "../math/index.js";
import type { Support } from "../supports/index.js";

/** One stretch of constant bending stiffness in a stepped member. */
export interface StiffnessSegment {
  /** Start of the stretch (length units). */
  readonly from: number;
  /** End of the stretch (length units). */
  readonly to: number;
  /** Bending stiffness E I over the stretch (force * length^2), positive. */
  readonly stiffness: number;
}

/**
 * A straight member: its length, bending stiffness, supports, internal hinges and loads, all in
 * one consistent set of units (for example N and m, or kip and in).
 *
 * @example
 * ```ts
 * const beam: BeamInput = {
 *   length: 6,
 *   stiffness: 2.1e11 * 8.36e-5, // E I in N*m^2
 *   supports: [{ kind: "pin", at: 0 }, { kind: "roller", at: 6 }],
 *   loads: [{ kind: "distributed", from: 0, to: 6, start: 5000, end: 5000 }],
 * };
 * ```
 */
export interface BeamInput {
  /** Member length (length units), positive. x runs from 0 at the left end to `length`. */
  readonly length: number;
  /**
   * Bending stiffness E I (force * length^2), positive: one value for the whole member, or a
   * list of stretches that tile `[0, length]` in order without gaps or overlaps.
   */
  readonly stiffness: number | readonly StiffnessSegment[];
  /** The supports, at distinct points. A free end is an end without a support. */
  readonly supports: readonly Support[];
  /**
   * Internal hinges (moment releases) at these positions, strictly inside the member. A pin,
   * roller or translational spring at a hinge holds the deflection of both sides; a support that
   * holds rotation, or a couple, exactly at a hinge is ambiguous and rejected.
   */
  readonly hinges?: readonly number[];
  /** The loads; none is valid and gives zero results. */
  readonly loads?: readonly Load[];
}

/** Options for {@link solveBeam}. */
export interface SolveOptions {
  /**
   * Load-case factors for a combination: each load is multiplied by the factor of its case
   * (`"default"` for a load without one). When given, a case not named here gets factor 0, so a
   * combination lists exactly the cases it includes. When absent, every load acts with factor 1.
   */
  readonly factors?: Readonly<Record<string, number>>;
}

/** The reaction of one support on the member. */
export interface Reaction {
  /** Index of the support in `BeamInput.supports`. */
  readonly support: number;
  /** Position of the support (length units). */
  readonly at: number;
  /** Force on the member, positive upward (force units). */
  readonly force: number;
  /** Moment on the member, positive counterclockwise (force * length); 0 where rotation is free. */
  readonly moment: number;
}

/** Equilibrium residual of a solution: what is left when loads and reactions are summed. */
export interface BeamResidual {
  /** Sum of vertical forces, loads and reactions, up positive (force units). */
  readonly force: number;
  /** Sum of moments about x = 0, counterclockwise positive (force * length). */
  readonly moment: number;
}

/** Peak positive and peak negative values of the four results, with their locations. */
export interface BeamPeaks {
  /** Shear V (force units). */
  readonly shear: Extremes;
  /** Bending moment M, positive sagging (force * length). */
  readonly moment: Extremes;
  /** Slope, positive counterclockwise (radians). */
  readonly slope: Extremes;
  /** Deflection, positive upward (length units); a sagging member's largest deflection is `min`. */
  readonly deflection: Extremes;
}

/** A part of the member for deflection-limit checks. */
export interface BeamSpan {
  /** Start (length units). */
  readonly from: number;
  /** End (length units). */
  readonly to: number;
  /** `"span"` between two supports that hold deflection; `"cantilever"` beyond the outermost one. */
  readonly kind: "span" | "cantilever";
}

/** Something the solver noticed that does not stop it: the numbers may be less accurate. */
export interface BeamWarning {
  /** Stable kebab-case code, for example `"ill-conditioned"`. */
  readonly code: string;
  /** A plain-English sentence. */
  readonly message: string;
  /** The values involved, by name. */
  readonly [detail: string]: unknown;
}

/**
 * Something the solver did to the input under the tolerance policy (docs/tolerances.md), so
 * that the result says what was solved: points closer than the coincidence tolerance merged,
 * a distributed load too narrow to resolve applied as its resultant.
 */
export interface BeamNote {
  /** Stable kebab-case code: `"points-merged"` or `"load-as-point"`. */
  readonly code: string;
  /** A plain-English sentence. */
  readonly message: string;
  /** Where it happened (length units). */
  readonly at: number;
  /** The input involved, as a path (`["hinges", 0]`, `["loads", 3]`). */
  readonly path: readonly (string | number)[];
}

/**
 * The solved member: reactions, and shear, moment, slope and deflection as exact piecewise
 * polynomials of x, with their peaks.
 *
 * Conventions: reactions up and counterclockwise positive; moment positive sagging; shear
 * V = dM/dx (so a simple span under downward load starts with positive shear); slope
 * counterclockwise positive; deflection positive upward.
 */
export interface BeamSolution {
  /** Member length (length units). */
  readonly length: number;
  /** One reaction per support, in the order of `BeamInput.supports`. */
  readonly reactions: readonly Reaction[];
  /** Shear V(x) (force units), degree 2; jumps at point loads and supports. */
  readonly shear: PiecewisePolynomial;
  /** Bending moment M(x) (force * length), positive sagging, degree 3; jumps at applied couples. */
  readonly moment: PiecewisePolynomial;
  /** Slope (radians), counterclockwise positive, degree 4; jumps at hinges. */
  readonly slope: PiecewisePolynomial;
  /** Deflection (length units), positive upward, degree 5; continuous. */
  readonly deflection: PiecewisePolynomial;
  /** Peak positive and negative values with locations. */
  readonly peaks: BeamPeaks;
  /** Points where the moment changes sign (contraflexure), excluding the ends. */
  readonly contraflexure: readonly number[];
  /**
   * Equilibrium residual: loads plus reactions, force (up positive) and moment about x = 0
   * (counterclockwise positive). Zero to rounding for a correct solution.
   */
  readonly residual: BeamResidual;
  /** Numerical warnings, for example `ill-conditioned`. Empty when all is well. */
  readonly warnings: readonly BeamWarning[];
  /** What the tolerance policy changed in the input (merged points, narrow loads as points); empty when nothing. Frozen plain data. */
  readonly notes: readonly BeamNote[];
  /** The spans and cantilevers between supports that hold deflection, left to right. */
  readonly spans: readonly BeamSpan[];
}
