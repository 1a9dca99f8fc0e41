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
  const n = model.nodes;
  const pieces = n - 1;
  // each diagram owns one ArrayBuffer, exactly its breakpoints then its coefficients: nothing is
  // shared with another diagram, another result or the solver, so a diagram survives
  // structuredClone at its own size and its buffer can be transferred without touching anything else
  const shearBreaks = ownBreaks(model.x, n, 3 * pieces);
  const momentBreaks = ownBreaks(model.x, n, 4 * pieces);
  const slopeBreaks = ownBreaks(model.x, n, 5 * pieces);
  const deflectionBreaks = ownBreaks(model.x, n, 6 * pieces);
  const shear = coefficientsAfter(shearBreaks, 3 * pieces);
  const moment = coefficientsAfter(momentBreaks, 4 * pieces);
  const slope = coefficientsAfter(slopeBreaks, 5 * pieces);
  const deflection = coefficientsAfter(deflectionBreaks, 6 * pieces);
  const d = result.displacements;
  const q = result.endForces;
  const x = model.x;
  for (let e = 0; e + 1 < model.joints; e++) {
    const first = model.joint[e] as number;
    const last = model.joint[e + 1] as number;
    state[0] = q[4 * e] as number;
    state[1] = -(q[4 * e + 1] as number);
    state[2] = d[2 * e + 1] as number;
    state[3] = d[2 * e] as number;
    for (let i = first; i < last; i++) {
      const ei = model.ei[i] as number;
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
    shear: makePiecewise(shearBreaks, shear, 2),
    moment: makePiecewise(momentBreaks, moment, 3),
    slope: makePiecewise(slopeBreaks, slope, 4),
    deflection: makePiecewise(deflectionBreaks, deflection, 5),
  };
}

/** A new buffer of `n + size` doubles holding a copy of the breakpoints `x[0 .. n - 1]`; returns the view of the breakpoints. */
function ownBreaks(x: Float64Array, n: number, size: number): Float64Array {
  const buffer = new ArrayBuffer(8 * (n + size));
  const breaks = new Float64Array(buffer, 0, n);
  for (let i = 0; i < n; i++) breaks[i] = x[i] as number;
  return breaks;
}

/** The `size` doubles of the buffer that follow `breaks`. */
function coefficientsAfter(breaks: Float64Array, size: number): Float64Array {
  return new Float64Array(breaks.buffer, breaks.byteLength, size);
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
