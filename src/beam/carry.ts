import type { BeamModel } from "./model.js";

/**
 * Carries the state at the left end of piece `i` to its right end, exactly: `state` is
 * [shear V, moment M, slope, deflection] and is updated in place. On the piece the load is
 * w(t) = a0 + a1 t (down), so V drops by its integral, M gains the integral of V, the slope the
 * integral of M times `flex` (1 / E I; pass 1 to carry E I times the slope and deflection) and the
 * deflection the integral of the slope: the same sums as evaluating the four polynomials at the
 * piece's length. When the right end is inside the element (before breakpoint `last`), the point
 * force there (down) lowers the shear and the couple (counterclockwise) lowers the moment.
 */
export function carryAcrossPiece(state: Float64Array, model: BeamModel, i: number, flex: number, last: number): void {
  const h = (model.x[i + 1] as number) - (model.x[i] as number);
  const a0 = model.wLeft[i] as number;
  const dw = (model.wRight[i] as number) - a0; // a1 * h
  const v = state[0] as number;
  const m = state[1] as number;
  const r = state[2] as number;
  state[3] = (state[3] as number) + h * (r + h * (m / 2 + h * (v / 6 - h * (a0 / 24 + dw / 120))) * flex);
  state[2] = r + h * (m + h * (v / 2 - h * (a0 / 6 + dw / 24))) * flex;
  state[1] = m + h * (v - h * (a0 / 2 + dw / 6));
  state[0] = v - h * (a0 + dw / 2);
  if (i + 1 < last) {
    state[0] = (state[0]) - (model.force[i + 1] as number);
    state[1] = (state[1]) - (model.couple[i + 1] as number);
  }
}
