import { makePiecewise } from "../math/piecewise.js";
import type { PiecewisePolynomial } from "../math/index.js";
import { restrainsDeflection, restrainsRotation, type Support } from "../supports/index.js";
import type { BeamModel } from "./model.js";
import type { StiffnessResult } from "./stiffness.js";
import type { Reaction } from "./types.js";

/** Shear, moment, slope and deflection of every element as piecewise polynomials. */
export interface Diagrams {
  readonly shear: PiecewisePolynomial;
  readonly moment: PiecewisePolynomial;
  readonly slope: PiecewisePolynomial;
  readonly deflection: PiecewisePolynomial;
}

/**
 * Exact recovery on each element from its left-end state (deflection v1, rotation t1, end
 * force Q1 up and end moment M1 counterclockwise on the element) and its load
 * w(t) = a0 + a1 t (down), with t measured from the element's left end:
 *   V = Q1 - a0 t - a1 t^2 / 2,  M = -M1 + Q1 t - a0 t^2 / 2 - a1 t^3 / 6,
 *   slope = t1 + (1 / EI) int M,  deflection = v1 + int slope.
 */
export function recoverDiagrams(model: BeamModel, result: StiffnessResult): Diagrams {
  const elements = model.nodes - 1;
  // one allocation for all four (made by buildModel), after the breakpoints
  let at = model.nodes;
  const shear = model.output.subarray(at, (at += elements * 3));
  const moment = model.output.subarray(at, (at += elements * 4));
  const slope = model.output.subarray(at, (at += elements * 5));
  const deflection = model.output.subarray(at, at + elements * 6);
  const d = result.displacements;
  const q = result.endForces;
  for (let e = 0; e < elements; e++) {
    const h = (model.x[e + 1] as number) - (model.x[e] as number);
    const a0 = model.wLeft[e] as number;
    const a1 = ((model.wRight[e] as number) - a0) / h;
    const q1 = q[4 * e] as number;
    const m1 = q[4 * e + 1] as number;
    const v1 = d[2 * e] as number;
    const t1 = d[2 * e + 1] as number;
    const ei = model.ei[e] as number;
    let o = 3 * e;
    shear[o] = q1;
    shear[o + 1] = -a0;
    shear[o + 2] = -a1 / 2;
    o = 4 * e;
    moment[o] = -m1;
    moment[o + 1] = q1;
    moment[o + 2] = -a0 / 2;
    moment[o + 3] = -a1 / 6;
    o = 5 * e;
    slope[o] = t1;
    slope[o + 1] = -m1 / ei;
    slope[o + 2] = q1 / (2 * ei);
    slope[o + 3] = -a0 / (6 * ei);
    slope[o + 4] = -a1 / (24 * ei);
    o = 6 * e;
    deflection[o] = v1;
    deflection[o + 1] = t1;
    deflection[o + 2] = -m1 / (2 * ei);
    deflection[o + 3] = q1 / (6 * ei);
    deflection[o + 4] = -a0 / (24 * ei);
    deflection[o + 5] = -a1 / (120 * ei);
  }
  const x = model.x;
  return {
    shear: makePiecewise(x, shear, 2),
    moment: makePiecewise(x, moment, 3),
    slope: makePiecewise(x, slope, 4),
    deflection: makePiecewise(x, deflection, 5),
  };
}

/** Reactions from node equilibrium: the node's load plus the forces the elements take from it. */
export function recoverReactions(model: BeamModel, result: StiffnessResult, supports: readonly Support[]): Reaction[] {
  const q = result.endForces;
  const last = model.nodes - 1;
  const out: Reaction[] = [];
  for (let s = 0; s < supports.length; s++) {
    const sup = supports[s] as Support;
    const node = model.supportNode[s] as number;
    let force = 0;
    let moment = 0;
    if (restrainsDeflection(sup)) {
      force = model.force[node] as number;
      if (node > 0) force += q[4 * (node - 1) + 2] as number;
      if (node < last) force += q[4 * node] as number;
    }
    if (restrainsRotation(sup)) {
      moment = -(model.couple[node] as number);
      if (node > 0) moment += q[4 * (node - 1) + 3] as number;
      if (node < last) moment += q[4 * node + 1] as number;
    }
    out.push(Object.freeze({ support: s, at: sup.at, force, moment }));
  }
  return out;
}
