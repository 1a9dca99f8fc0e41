import type { BeamInput, BeamSpan, BeamWarning } from "../beam/index.js";
import type { PiecewisePolynomial } from "../math/index.js";
import type { Support } from "../supports/index.js";

/** The reaction of one support: its force (up positive) or its moment (counterclockwise positive). */
export interface ReactionQuantity {
  /** Tag. */
  readonly kind: "reaction";
  /** Index of the support in `BeamInput.supports`. */
  readonly support: number;
  /** `"force"` (the default) or `"moment"`. */
  readonly component?: "force" | "moment";
}

/** The shear V = dM/dx just left or just right of a point. */
export interface ShearQuantity {
  /** Tag. */
  readonly kind: "shear";
  /** The point (length units from the left end). */
  readonly at: number;
  /** Just left or just right of the point. */
  readonly side: "left" | "right";
}

/** The bending moment at a point, sagging positive. */
export interface MomentQuantity {
  /** Tag. */
  readonly kind: "moment";
  /** The point (length units from the left end). */
  readonly at: number;
  /** Needed only where the moment jumps: at a support inside the member that holds rotation. */
  readonly side?: "left" | "right";
}

/** The slope at a point, counterclockwise positive (not defined at a hinge). */
export interface SlopeQuantity {
  /** Tag. */
  readonly kind: "slope";
  /** The point (length units from the left end). */
  readonly at: number;
}

/** The deflection at a point, up positive. */
export interface DeflectionQuantity {
  /** Tag. */
  readonly kind: "deflection";
  /** The point (length units from the left end). */
  readonly at: number;
}

/**
 * A result whose influence line is asked for: how it varies with the position `a` of one unit
 * downward force travelling along the member.
 *
 * @example
 * ```ts
 * const q: InfluenceQuantity = { kind: "moment", at: 3 };
 * const r: InfluenceQuantity = { kind: "reaction", support: 1 };
 * const v: InfluenceQuantity = { kind: "shear", at: 3, side: "right" };
 * ```
 */
export type InfluenceQuantity = ReactionQuantity | ShearQuantity | MomentQuantity | SlopeQuantity | DeflectionQuantity;

/** The influence lines of one support's reaction, per unit downward force at `a`. */
export interface ReactionInfluence {
  /** Index of the support in `BeamInput.supports`. */
  readonly support: number;
  /** Its position (length units). */
  readonly at: number;
  /** Force on the member, up positive, per unit downward force at `a` (dimensionless); absent when the support does not hold deflection. */
  readonly force?: PiecewisePolynomial;
  /** Moment on the member, counterclockwise positive, per unit downward force at `a` (length units); absent when the support does not hold rotation. */
  readonly moment?: PiecewisePolynomial;
}

/**
 * A member prepared for influence lines and moving loads by {@link memberInfluence}: the influence
 * line of every reaction, derived once, from which the shear and moment at any point follow by
 * statics without solving again. Frozen plain data.
 */
export interface MemberInfluence {
  /** Tag: always `"member-influence"`. */
  readonly kind: "member-influence";
  /** Member length (length units). */
  readonly length: number;
  /** The member as prepared: the given one without its loads, settlements and prescribed rotations. */
  readonly beam: BeamInput;
  /** The supports, in the given order (without settlements). */
  readonly supports: readonly Support[];
  /** One entry per support, in the given order. */
  readonly reactions: readonly ReactionInfluence[];
  /** Fixed breakpoints of every influence line: the ends, supports, hinges and changes of E I, sorted (length units). */
  readonly nodes: Float64Array;
  /** True when the member is statically determinate (rigid supports, as many restraints as two plus one per hinge): its influence lines of reactions, shear and moment are straight between breakpoints. */
  readonly determinate: boolean;
  /** The spans and cantilevers between supports that hold deflection, left to right (as `BeamSolution.spans`). */
  readonly spans: readonly BeamSpan[];
  /** What the solver noticed in the reciprocal solves (for example `ill-conditioned` or an imbalance): the lines may be less accurate. Empty when all is well. */
  readonly warnings: readonly BeamWarning[];
}
