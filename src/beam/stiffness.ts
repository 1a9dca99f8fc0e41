import { FlexuraError, issue } from "../errors/index.js";
import { factorBandedSymmetric, solveBandedSymmetric } from "../math/index.js";
import type { Support } from "../supports/index.js";
import { fixedEndActions } from "./fixed-end.js";
import { refuseShortPiece } from "./conditioning.js";
import { FLEXIBILITY_STRIDE } from "./flexibility.js";
import type { BeamModel } from "./model.js";
import type { Scratch } from "./scratch.js";

/** Half-bandwidth of the stiffness matrix with DOFs ordered (v0, theta0, v1, theta1, ...). */
const W = 3;
const S = W + 1;

/** A pivot below this fraction of its diagonal entry leaves fewer than about 6 of float64's 16 digits. */
const REFUSE_PIVOT = 1e-10;

/** Nodal displacements and element end forces. */
export interface StiffnessResult {
  /** Displacements: deflection (up) and rotation (ccw) of each structural node, interleaved (working storage: index it). */
  readonly displacements: Float64Array;
  /** Forces on each element from its nodes: [Q left (up), M left (ccw), Q right, M right] (working storage: index it). */
  readonly endForces: Float64Array;
  /** The size of the terms summed into each end force (fixed-end action plus |k d| per displacement): the scale of its rounding (working storage: index it). */
  readonly endSizes: Float64Array;
  /** Smallest pivot over original diagonal met in the factorisation (1 is perfect). */
  readonly pivotRatio: number;
}

// scratch element matrix (upper triangle of 4x4, row-major full) and clamp forces
const k = new Float64Array(16);
const f = new Float64Array(4);

/** Fills `k` and `f` for element e (its fixed-end actions from `fixed`; condensed when released). */
function elementMatrices(model: BeamModel, fixed: Float64Array, e: number): void {
  const h = (model.x[model.joint[e + 1] as number] as number) - (model.x[model.joint[e] as number] as number);
  if (model.uniform[e] === 1) prismatic(h, model.ei[model.joint[e] as number] as number);
  else stepped(h, model.flexibility, FLEXIBILITY_STRIDE * e);
  for (let i = 0; i < 4; i++) f[i] = fixed[4 * e + i] as number;
  if (model.released[e] === 1) {
    // static condensation of the right-end rotation: its end moment is zero
    const k33 = k[15] as number;
    const f3 = f[3] as number;
    for (let i = 0; i < 3; i++) {
      const ki3 = k[i * 4 + 3] as number;
      for (let j = 0; j < 3; j++) k[i * 4 + j] = (k[i * 4 + j] as number) - (ki3 * (k[j * 4 + 3] as number)) / k33;
      f[i] = (f[i] as number) - (ki3 * f3) / k33;
    }
    for (let i = 0; i < 4; i++) k[i * 4 + 3] = k[12 + i] = 0;
    f[3] = 0;
  }
}

/**
 * `k` for an element of one E I over its length `h`: the closed form of the prismatic
 * Euler-Bernoulli element (Weaver & Gere, Matrix Analysis of Framed Structures, 3rd ed., ch. 4).
 */
function prismatic(h: number, ei: number): void {
  const a = ei / (h * h * h);
  const k00 = 12 * a;
  const k01 = 6 * a * h;
  const k11 = 4 * a * h * h;
  const k13 = 2 * a * h * h;
  k[0] = k00; k[1] = k01; k[2] = -k00; k[3] = k01;
  k[5] = k11; k[6] = -k01; k[7] = k13;
  k[10] = k00; k[11] = -k01;
  k[15] = k11;
  k[4] = k01; k[8] = -k00; k[9] = -k01; k[12] = k01; k[13] = k13; k[14] = -k01;
}

/**
 * `k` for an element whose E I changes inside it, from its flexibility at `flex[o..o+4]`
 * ([sV, sM, dV, dM, det], see `elementFlexibility`): end displacements (y0, r0, yh, rh) deform
 * it by a right-end rotation r = rh - r0 and deflection y = yh - y0 - r0 h relative to its left
 * end, which take the left-end shear V0 = (dM r - sM y) / det and moment M0 = (sV y - dV r) / det;
 * the end forces are then [V0, -M0, -V0, M0 + V0 h] (equilibrium of the unloaded element).
 */
function stepped(h: number, flex: Float64Array, o: number): void {
  const sV = flex[o] as number;
  const sM = flex[o + 1] as number;
  const dV = flex[o + 2] as number;
  const dM = flex[o + 3] as number;
  const det = flex[o + 4] as number;
  for (let j = 0; j < 4; j++) {
    const r = j === 1 ? -1 : j === 3 ? 1 : 0;
    const y = j === 0 ? -1 : j === 1 ? -h : j === 2 ? 1 : 0;
    const v0 = (dM * r - sM * y) / det;
    const m0 = (sV * y - dV * r) / det;
    k[j] = v0;
    k[4 + j] = -m0;
    k[8 + j] = -v0;
    k[12 + j] = m0 + v0 * h;
  }
}

/**
 * Assembles and solves the banded stiffness system of a member: elements, nodal loads,
 * springs, prescribed settlements and rotations; then the end forces of each element.
 *
 * @throws FlexuraError `mechanism` when a pivot vanishes (a member the rigid-body check passed
 *   but float64 cannot hold, such as one resting only on vanishingly soft springs).
 */
export function solveStiffness(model: BeamModel, supports: readonly Support[], hinges: readonly number[], scratch: Scratch): StiffnessResult {
  const n = model.joints;
  const N = 2 * n;
  const elements = n - 1;
  const fixed = scratch.fixedEnd;
  fixedEndActions(model, fixed);
  const band = scratch.band;
  const rhs = scratch.rhs;
  for (let i = 0; i < N * S; i++) band[i] = 0;
  for (let i = 0; i < N; i++) rhs[i] = 0;
  for (let e = 0; e < elements; e++) {
    elementMatrices(model, fixed, e);
    const base = 2 * e;
    for (let i = 0; i < 4; i++) {
      const row = (base + i) * S;
      for (let j = i; j < 4; j++) band[row + j - i] = (band[row + j - i] as number) + (k[i * 4 + j] as number);
      rhs[base + i] = (rhs[base + i] as number) - (f[i] as number);
    }
  }
  for (let i = 0; i < n; i++) {
    const at = model.joint[i] as number;
    rhs[2 * i] = (rhs[2 * i] as number) - (model.force[at] as number);
    rhs[2 * i + 1] = (rhs[2 * i + 1] as number) + (model.couple[at] as number);
  }
  // supports: springs on the diagonal, rigid restraints as prescribed values
  const prescribed = scratch.prescribed;
  const value = scratch.value;
  for (let i = 0; i < N; i++) {
    value[i] = 0;
    prescribed[i] = 0;
  }
  for (let s = 0; s < supports.length; s++) {
    const sup = supports[s] as Support;
    const node = model.supportNode[s] as number;
    const v = 2 * node;
    const settle = -(sup.settlement ?? 0);
    const turn = sup.rotation ?? 0;
    switch (sup.kind) {
      case "pin":
      case "roller":
        prescribed[v] = 1;
        value[v] = settle;
        break;
      case "fixed":
        prescribed[v] = 1;
        value[v] = settle;
        prescribed[v + 1] = 1;
        value[v + 1] = turn;
        break;
      case "guided":
        prescribed[v + 1] = 1;
        value[v + 1] = turn;
        break;
      case "spring":
        if (sup.stiffness !== undefined) {
          band[v * S] = (band[v * S] as number) + sup.stiffness;
          rhs[v] = (rhs[v] as number) + sup.stiffness * settle;
        }
        if (sup.rotationalStiffness !== undefined) {
          band[(v + 1) * S] = (band[(v + 1) * S] as number) + sup.rotationalStiffness;
          rhs[v + 1] = (rhs[v + 1] as number) + sup.rotationalStiffness * turn;
        }
        break;
      default:
        return sup.kind satisfies never;
    }
  }
  for (let i = 0; i < N; i++) {
    if (prescribed[i] !== 1) continue;
    const u = value[i] as number;
    if (u === 0) continue;
    for (let j = Math.max(0, i - W); j <= Math.min(N - 1, i + W); j++) {
      if (j === i || prescribed[j] === 1) continue;
      const kji = j < i ? (band[j * S + i - j] as number) : (band[i * S + j - i] as number);
      rhs[j] = (rhs[j] as number) - kji * u;
    }
  }
  for (let i = 0; i < N; i++) {
    if (prescribed[i] !== 1) continue;
    for (let j = Math.max(0, i - W); j < i; j++) band[j * S + i - j] = 0;
    for (let j = 1; j < S; j++) band[i * S + j] = 0;
    band[i * S] = 1;
    rhs[i] = value[i] as number;
  }
  const report = factorBandedSymmetric(band, N, W, 1e-14);
  // (nearly) every digit lost beside a short piece: the cause is two points too close, not a mechanism
  if (report.smallestPivotRatio < REFUSE_PIVOT) refuseShortPiece(model, supports, hinges, report.smallestPivotAt >> 1, report.smallestPivotRatio);
  if (report.singularAt >= 0) {
    const node = report.singularAt >> 1;
    const at = model.x[model.joint[node] as number] as number;
    throw new FlexuraError([
      issue("mechanism", ["supports"], `The member cannot be held near x = ${at}: its supports are too soft for float64 to resolve. Stiffen the springs or add a rigid support.`, {
        reason: "singular",
        at,
      }),
    ]);
  }
  const d = solveBandedSymmetric(band, N, W, rhs);
  const endForces = scratch.endForces;
  const endSizes = scratch.endSizes;
  for (let e = 0; e < elements; e++) {
    elementMatrices(model, fixed, e);
    const base = 2 * e;
    for (let i = 0; i < 4; i++) {
      let q = f[i] as number;
      let size = Math.abs(q);
      for (let j = 0; j < 4; j++) {
        const term = (k[i * 4 + j] as number) * (d[base + j] as number);
        q += term;
        size += Math.abs(term);
      }
      endForces[4 * e + i] = q;
      endSizes[4 * e + i] = size;
    }
  }
  return { displacements: d, endForces, endSizes, pivotRatio: report.smallestPivotRatio };
}
