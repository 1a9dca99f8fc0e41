import { carryAcrossPiece } from "./carry.js";
import { FLEXIBILITY_STRIDE } from "./flexibility.js";
import type { BeamModel } from "./model.js";

const state = new Float64Array(4);

/**
 * The fixed-end actions of every element: the forces its two clamped ends take from all the
 * loads inside it (distributed loads on its pieces, point forces and couples at its interior
 * breakpoints), exactly, whatever their number and placement. Written to `out` as
 * [Q left (up), M left (ccw), Q right (up), M right (ccw)] per element.
 *
 * Method: run the element as a cantilever from its clamped left end with no end forces, piece
 * by piece (V, M, slope and deflection are polynomials, integrated exactly; times E I on an
 * element of one E I, where it cancels), then choose the left-end force and moment that bring
 * the right end's deflection and slope back to zero through the element's flexibility
 * (compatibility, as in the flexibility method: Weaver & Gere, Matrix Analysis of Framed
 * Structures, 3rd ed., ch. 1; the results for single loads agree with the fixed-end action
 * tables of its appendix B).
 */
export function fixedEndActions(model: BeamModel, out: Float64Array): void {
  const x = model.x;
  const joint = model.joint;
  for (let e = 0; e + 1 < model.joints; e++) {
    const first = joint[e] as number;
    const last = joint[e + 1] as number;
    // state at the running point: shear, moment, E I times slope, E I times deflection
    state.fill(0);
    const uniform = model.uniform[e] === 1;
    for (let i = first; i < last; i++) carryAcrossPiece(state, model, i, uniform ? 1 : 1 / (model.ei[i] as number), last);
    const v = state[0] as number;
    const m = state[1] as number;
    const t = state[2] as number;
    const d = state[3] as number;
    const h = (x[last] as number) - (x[first] as number);
    let q: number;
    let c: number;
    if (uniform) {
      // Q h^3/6 - M h^2/2 = -d and Q h^2/2 - M h = -t (E I cancels)
      q = (12 * d) / (h * h * h) - (6 * t) / (h * h);
      c = (6 * d) / (h * h) - (2 * t) / h;
    } else {
      // the left-end shear V0 = q and moment M0 = -c that undo the right end's rotation t and deflection d
      const o = FLEXIBILITY_STRIDE * e;
      const sV = model.flexibility[o] as number;
      const sM = model.flexibility[o + 1] as number;
      const dV = model.flexibility[o + 2] as number;
      const dM = model.flexibility[o + 3] as number;
      const det = model.flexibility[o + 4] as number;
      q = -(dM * t - sM * d) / det;
      c = (sV * d - dV * t) / det;
    }
    const o = 4 * e;
    out[o] = q;
    out[o + 1] = c;
    out[o + 2] = -(q + v);
    out[o + 3] = -c + q * h + m;
  }
}
