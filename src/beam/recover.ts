import { makePiecewise } from "../math/piecewise.js";
import type { PiecewisePolynomial } from "../math/index.js";
import { restrainsDeflection, restrainsRotation, type Support } from "../supports/index.js";
import { carryAcrossPiece } from "./carry.js";
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

/** The running state [shear, moment, slope, deflection] carried along an element. */
const state = new Float64Array(4);

/**
 * Exact recovery on each piece, carried across each element from its left-end state (deflection
 * v, rotation r, end force Q up and end moment M1 counterclockwise on the element, so shear
 * V = Q and moment M = -M1 there). On a piece with load w(t) = a0 + a1 t (down), t from its
 * left end:
 *   V = V0 - a0 t - a1 t^2 / 2,  M = M0 + V0 t - a0 t^2 / 2 - a1 t^3 / 6,
 *   slope = r0 + (1 / EI) int M,  deflection = v0 + int slope;
 * at a breakpoint inside the element, a point force P (down) lowers the shear by P and a
 * couple C (counterclockwise) lowers the moment by C.
 */
export function recoverDiagrams(model: BeamModel, result: StiffnessResult): Diagrams {
  const pieces = model.nodes - 1;
  // one allocation for all four (made by buildModel), after the breakpoints
  let at = model.nodes;
  const shear = model.output.subarray(at, (at += pieces * 3));
  const moment = model.output.subarray(at, (at += pieces * 4));
  const slope = model.output.subarray(at, (at += pieces * 5));
  const deflection = model.output.subarray(at, at + pieces * 6);
  const d = result.displacements;
  const q = result.endForces;
  const x = model.x;
  for (let e = 0; e + 1 < model.joints; e++) {
    const first = model.joint[e] as number;
    const last = model.joint[e + 1] as number;
    const ei = model.ei[e] as number;
    state[0] = q[4 * e] as number;
    state[1] = -(q[4 * e + 1] as number);
    state[2] = d[2 * e + 1] as number;
    state[3] = d[2 * e] as number;
    for (let i = first; i < last; i++) {
      const v = state[0];
      const m = state[1];
      const r = state[2];
      const y = state[3];
      const h = (x[i + 1] as number) - (x[i] as number);
      const a0 = model.wLeft[i] as number;
      const a1 = ((model.wRight[i] as number) - a0) / h;
      let o = 3 * i;
      shear[o] = v;
      shear[o + 1] = -a0;
      shear[o + 2] = -a1 / 2;
      o = 4 * i;
      moment[o] = m;
      moment[o + 1] = v;
      moment[o + 2] = -a0 / 2;
      moment[o + 3] = -a1 / 6;
      o = 5 * i;
      slope[o] = r;
      slope[o + 1] = m / ei;
      slope[o + 2] = v / (2 * ei);
      slope[o + 3] = -a0 / (6 * ei);
      slope[o + 4] = -a1 / (24 * ei);
      o = 6 * i;
      deflection[o] = y;
      deflection[o + 1] = r;
      deflection[o + 2] = m / (2 * ei);
      deflection[o + 3] = v / (6 * ei);
      deflection[o + 4] = -a0 / (24 * ei);
      deflection[o + 5] = -a1 / (120 * ei);
      if (i + 1 < last) carryAcrossPiece(state, model, i, 1 / ei, last);
    }
  }
  return {
    shear: makePiecewise(x, shear, 2),
    moment: makePiecewise(x, moment, 3),
    slope: makePiecewise(x, slope, 4),
    deflection: makePiecewise(x, deflection, 5),
  };
}

/** Reactions from equilibrium of each support's structural node: its load plus the forces the elements take from it. */
export function recoverReactions(model: BeamModel, result: StiffnessResult, supports: readonly Support[]): Reaction[] {
  const q = result.endForces;
  const last = model.joints - 1;
  const out: Reaction[] = [];
  for (let s = 0; s < supports.length; s++) {
    const sup = supports[s] as Support;
    const node = model.supportNode[s] as number;
    const at = model.joint[node] as number;
    let force = 0;
    let moment = 0;
    if (restrainsDeflection(sup)) {
      force = model.force[at] as number;
      if (node > 0) force += q[4 * (node - 1) + 2] as number;
      if (node < last) force += q[4 * node] as number;
    }
    if (restrainsRotation(sup)) {
      moment = -(model.couple[at] as number);
      if (node > 0) moment += q[4 * (node - 1) + 3] as number;
      if (node < last) moment += q[4 * node + 1] as number;
    }
    out.push(Object.freeze({ support: s, at: sup.at, force, moment }));
  }
  return out;
}
