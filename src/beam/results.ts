import { restrainsDeflection, type Support } from "../supports/index.js";
import { SAME_POINT } from "./validate.js";
import { FLEXIBILITY_STRIDE } from "./flexibility.js";
import type { BeamModel } from "./model.js";
import type { Scratch } from "./scratch.js";
import type { StiffnessResult } from "./stiffness.js";
import type { BeamSpan, BeamWarning } from "./types.js";

/** The spans between supports that hold deflection, and the cantilevers beyond the outermost ones. */
export function spansOf(length: number, supports: readonly Support[]): BeamSpan[] {
  // positions of the supports that hold deflection, sorted (they usually come so: no sort then)
  const at: number[] = [];
  let sorted = true;
  for (const s of supports) {
    if (!restrainsDeflection(s)) continue;
    if (at.length > 0 && s.at < (at[at.length - 1] as number)) sorted = false;
    at.push(s.at);
  }
  if (!sorted) at.sort((a, b) => a - b);
  const out: BeamSpan[] = [];
  const first = at[0] as number;
  const last = at[at.length - 1] as number;
  const tiny = SAME_POINT * length;
  if (first > tiny) out.push(Object.freeze({ from: 0, to: first, kind: "cantilever" }));
  for (let i = 1; i < at.length; i++) out.push(Object.freeze({ from: at[i - 1] as number, to: at[i] as number, kind: "span" }));
  if (last < length - tiny) out.push(Object.freeze({ from: last, to: length, kind: "cantilever" }));
  return out;
}

/**
 * Warnings about numbers float64 may not resolve: springs far stiffer or softer than the member
 * around them, and small pivots in the factorisation.
 */
export function conditioningWarnings(model: BeamModel, supports: readonly Support[], pivotRatio: number): BeamWarning[] {
  const out: BeamWarning[] = [];
  const last = model.joints - 1;
  for (let s = 0; s < supports.length; s++) {
    const sup = supports[s] as Support;
    if (sup.kind !== "spring") continue;
    const node = model.supportNode[s] as number;
    let kv = 0;
    let kr = 0;
    for (const e of [node - 1, node]) {
      if (e < 0 || e >= last) continue;
      const h = (model.x[model.joint[e + 1] as number] as number) - (model.x[model.joint[e] as number] as number);
      if (model.uniform[e] === 1) {
        const ei = model.ei[model.joint[e] as number] as number;
        kv += (12 * ei) / (h * h * h);
        kr += (4 * ei) / h;
      } else {
        // the same diagonal terms from the element's flexibility [sV, sM, dV, dM, det]
        const o = FLEXIBILITY_STRIDE * e;
        const f = model.flexibility;
        kv += (f[o + 1] as number) / (f[o + 4] as number);
        kr += (h * (f[o] as number) - (f[o + 2] as number)) / (f[o + 4] as number);
      }
    }
    for (const [value, member, field] of [
      [sup.stiffness, kv, "stiffness"],
      [sup.rotationalStiffness, kr, "rotationalStiffness"],
    ] as const) {
      if (value === undefined) continue;
      const ratio = value / member;
      if (ratio > 1e11 || ratio < 1e-11)
        out.push(
          Object.freeze({
            code: "ill-conditioned",
            message: `The spring at x = ${sup.at} is ${ratio.toExponential(1)} times as stiff as the member there; float64 cannot resolve the two together, so results near it may be inaccurate. ${ratio > 1 ? "Use a rigid support instead." : "Check the spring stiffness."}`,
            support: s,
            field,
            ratio,
          }),
        );
    }
  }
  if (pivotRatio < 1e-8)
    out.push(
      Object.freeze({
        code: "ill-conditioned",
        message: `The stiffness system is badly conditioned: about ${Math.round(-Math.log10(pivotRatio))} of float64's 16 significant digits may be lost.`,
        pivotRatio,
      }),
    );
  return out;
}

/**
 * A posteriori check of the solve: the out-of-balance force and moment at every node (what the
 * solution leaves unresolved, springs included) relative to the size of the loading (every load,
 * reaction and spring force). A member that settlements move as a rigid body has a loading that
 * is only rounding (below 1e-9 of the largest sum of terms at a node: each element end force is a
 * fixed-end action plus stiffness times displacement, large and cancelling); there the scale is
 * 1e-4 of that sum, so rounding alone never warns. The imbalance is the relative error
 * of equilibrium; the error of other results (deflections) can be larger.
 */
export function balanceWarnings(model: BeamModel, result: StiffnessResult, supports: readonly Support[], scratch: Scratch): BeamWarning[] {
  const n = model.joints;
  const q = result.endForces;
  const d = result.displacements;
  const x = model.x;
  const length = (x[model.nodes - 1] as number) - (x[0] as number);
  const sizes = result.endSizes;
  // the size of the loading: every load, wherever it acts (reactions and springs added below),
  // and the largest sum of terms at a node
  let scale = 0;
  let terms = 0;
  for (let i = 0; i < model.nodes; i++) {
    scale += Math.abs(model.force[i] as number) + Math.abs(model.couple[i] as number) / length;
    if (i + 1 < model.nodes) scale += 0.5 * (Math.abs(model.wLeft[i] as number) + Math.abs(model.wRight[i] as number)) * ((x[i + 1] as number) - (x[i] as number));
  }
  const rigid = scratch.rigid;
  const springV = scratch.springV;
  const springR = scratch.springR;
  for (let s = 0; s < supports.length; s++) {
    const sup = supports[s] as Support;
    const node = model.supportNode[s] as number;
    switch (sup.kind) {
      case "pin":
      case "roller":
        rigid[2 * node] = 1;
        break;
      case "fixed":
        rigid[2 * node] = 1;
        rigid[2 * node + 1] = 1;
        break;
      case "guided":
        rigid[2 * node + 1] = 1;
        break;
      case "spring":
        if (sup.stiffness !== undefined) springV[node] = -sup.stiffness * ((d[2 * node] as number) + (sup.settlement ?? 0));
        if (sup.rotationalStiffness !== undefined) springR[node] = -sup.rotationalStiffness * ((d[2 * node + 1] as number) - (sup.rotation ?? 0));
        terms = Math.max(terms, (sup.stiffness ?? 0) * (Math.abs(d[2 * node] as number) + Math.abs(sup.settlement ?? 0)), ((sup.rotationalStiffness ?? 0) * (Math.abs(d[2 * node + 1] as number) + Math.abs(sup.rotation ?? 0))) / length);
        break;
      default:
        return sup.kind satisfies never;
    }
  }
  let worstForce = 0;
  let worstMoment = 0;
  for (let i = 0; i < n; i++) {
    const at = model.joint[i] as number;
    let f = model.force[at] as number;
    let m = -(model.couple[at] as number);
    let fSize = Math.abs(f);
    let mSize = Math.abs(m);
    if (i > 0) {
      f += q[4 * (i - 1) + 2] as number;
      m += q[4 * (i - 1) + 3] as number;
      fSize += sizes[4 * (i - 1) + 2] as number;
      mSize += sizes[4 * (i - 1) + 3] as number;
    }
    if (i < n - 1) {
      f += q[4 * i] as number;
      m += q[4 * i + 1] as number;
      fSize += sizes[4 * i] as number;
      mSize += sizes[4 * i + 1] as number;
    }
    terms = Math.max(terms, fSize, mSize / length);
    if (rigid[2 * i] === 1) scale += Math.abs(f);
    else worstForce = Math.max(worstForce, Math.abs(f - (springV[i] as number)));
    if (rigid[2 * i + 1] === 1) scale += Math.abs(m) / length;
    else worstMoment = Math.max(worstMoment, Math.abs(m - (springR[i] as number)));
    scale += Math.abs(springV[i] as number) + Math.abs(springR[i] as number) / length;
  }
  // nearly stress-free: the loading itself is rounding of the terms
  if (scale < 1e-9 * terms) scale = STRESS_FREE * terms;
  const worst = Math.max(worstForce, worstMoment / length);
  // forces of subnormal size are below anything rounding resolves
  if (!(worst > BALANCE_WARNING * scale) || scale < 1e-280) return [];
  const imbalance = worst / scale;
  return [
    Object.freeze({
      code: "ill-conditioned",
      message: `Float64 could not balance every node to rounding: up to ${imbalance.toExponential(1)} of the load is left out of balance, so the reactions and forces carry about that relative error, and deflections possibly more. Very soft springs, or short pieces between supports and hinges, cause this.`,
      imbalance,
    }),
  ];
}

/** The scale of a nearly stress-free member: this fraction of the largest sum of terms at a node (see {@link balanceWarnings}). */
const STRESS_FREE = 1e-4;
/** An imbalance above this fraction of the loading is more than rounding: warn. */
export const BALANCE_WARNING = 1e-10;
/** An imbalance above this fraction means the solve failed: refuse (`ill-conditioned` error). */
export const BALANCE_REFUSAL = 1e-6;
