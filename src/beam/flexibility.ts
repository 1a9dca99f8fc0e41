import type { BeamModel } from "./model.js";

/** Numbers kept per element in {@link BeamModel.flexibility}. */
export const FLEXIBILITY_STRIDE = 5;

/**
 * The flexibility of every element whose E I changes inside it (a stepped member), written to
 * `model.flexibility` as [sV, sM, dV, dM, det] per element: with the left end clamped and no
 * load, a shear V0 and a sagging moment M0 at the left end turn the right end by
 * sV V0 + sM M0 and lift it by dV V0 + dM M0, and det = sV dM - sM dV.
 *
 * With u from the element's left end and h its length: sM = int 1 / E I, sV = int u / E I,
 * dM = int (h - u) / E I and dV = int (h - u) u / E I, each a sum of positive terms over the
 * pieces (Simpson's rule, exact for these quadratics), so no digits cancel however stiff or short
 * a piece is: a stiff piece adds a little flexibility, where a stiffness matrix would add a huge
 * stiffness to a normal one and lose the normal one's digits. det is computed as
 * sM int (u - c)^2 / E I about the flexibility's centroid c = sV / sM, a sum of positive terms
 * too (it equals sM * int u^2 / E I - sV^2). Elements of one E I keep the closed forms and are
 * skipped (`uniform` is 1 for them).
 */
export function elementFlexibility(model: BeamModel): void {
  const x = model.x;
  const ei = model.ei;
  const out = model.flexibility;
  for (let e = 0; e + 1 < model.joints; e++) {
    const first = model.joint[e] as number;
    const last = model.joint[e + 1] as number;
    let same = 1;
    for (let i = first + 1; i < last; i++) if (ei[i] !== ei[first]) same = 0;
    model.uniform[e] = same;
    if (same === 1) continue;
    const x0 = x[first] as number;
    const h = (x[last] as number) - x0;
    let sM = 0;
    let sV = 0;
    let dM = 0;
    let dV = 0;
    for (let i = first; i < last; i++) {
      const a = (x[i] as number) - x0;
      const b = (x[i + 1] as number) - x0;
      const w = (b - a) / (ei[i] as number);
      const m = 0.5 * (a + b);
      sM += w;
      sV += w * m;
      dM += w * (h - m);
      // Simpson: (b - a) / 6 * (f(a) + 4 f(m) + f(b)), f(u) = (h - u) u
      dV += (w / 6) * ((h - a) * a + 4 * (h - m) * m + (h - b) * b);
    }
    const c = sV / sM;
    let spread = 0;
    for (let i = first; i < last; i++) {
      const a = (x[i] as number) - x0 - c;
      const b = (x[i + 1] as number) - x0 - c;
      const m = 0.5 * (a + b);
      spread += ((b - a) / (6 * (ei[i] as number))) * (a * a + 4 * m * m + b * b);
    }
    const o = FLEXIBILITY_STRIDE * e;
    out[o] = sV;
    out[o + 1] = sM;
    out[o + 2] = dV;
    out[o + 3] = dM;
    out[o + 4] = sM * spread;
  }
}
