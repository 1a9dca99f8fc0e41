// Area integrals over regions bounded by straight edges and circular arcs, by Green's theorem
// written with dy only: A = \oint z dy, \int y dA = \oint z y dy, \int z dA = \oint z^2/2 dy,
// \int y^2 dA = \oint z y^2 dy, \int z^2 dA = \oint z^3/3 dy, \int y z dA = \oint z^2 y/2 dy.
// Horizontal edges add nothing to any of these, so the part of a region above a horizontal cut
// is integrated by clipping each edge to the half-plane: the cut line itself needs no edge.
// Straight edges integrate in closed form; arcs through the antiderivatives of cos^m sin^n.
import { sinExact } from "./angles.js";
import { ARC, STRIDE } from "./edges.js";

/** Index of each moment in a moments accumulator. */
export const M_AREA = 0;
/** \int y dA. */
export const M_Y = 1;
/** \int z dA. */
export const M_Z = 2;
/** \int y^2 dA. */
export const M_YY = 3;
/** \int z^2 dA. */
export const M_ZZ = 4;
/** \int y z dA. */
export const M_YZ = 5;

// Antiderivatives at one angle, written into g: G[a,b] = \int cos^(a+1) sin^b.
// Order: g0 = G00, g1 = G10, g2 = G01, g3 = G11, g4 = G02, g5 = G20, g6 = G12, g7 = G30, g8 = G21.
function antiderivatives(g: Float64Array, offset: number, t: number): void {
  const s = Math.sin(t);
  const c = Math.cos(t);
  const sc = s * c;
  const c2s2 = c * c - s * s;
  g[offset] = s;
  g[offset + 1] = t / 2 + sc / 2;
  g[offset + 2] = (s * s) / 2;
  g[offset + 3] = (-c * c * c) / 3;
  g[offset + 4] = (s * s * s) / 3;
  g[offset + 5] = s - (s * s * s) / 3;
  g[offset + 6] = t / 8 - (sc * c2s2) / 8;
  g[offset + 7] = (3 * t) / 8 + sc / 2 + (sc * c2s2) / 8;
  g[offset + 8] = (-c * c * c * c) / 4;
}

const G = new Float64Array(18);

function addArc(out: Float64Array, at: number, w: number, zc: number, yc: number, r: number, t0: number, t1: number): void {
  if (t0 === t1) return;
  antiderivatives(G, 0, t0);
  antiderivatives(G, 9, t1);
  const r2 = r * r;
  const r3 = r2 * r;
  const r4 = r3 * r;
  const k00 = r * (G[9]! - G[0]!);
  const k10 = r2 * (G[10]! - G[1]!);
  const k01 = r2 * (G[11]! - G[2]!);
  const k11 = r3 * (G[12]! - G[3]!);
  const k02 = r3 * (G[13]! - G[4]!);
  const k20 = r3 * (G[14]! - G[5]!);
  const k12 = r4 * (G[15]! - G[6]!);
  const k30 = r4 * (G[16]! - G[7]!);
  const k21 = r4 * (G[17]! - G[8]!);
  const Z = zc;
  const Y = yc;
  const zPart = Z * Z * k00 + 2 * Z * k10 + k20;
  out[at + M_AREA]! += w * (Z * k00 + k10);
  out[at + M_Y]! += w * (Z * Y * k00 + Z * k01 + Y * k10 + k11);
  out[at + M_Z]! += (w * zPart) / 2;
  out[at + M_YY]! += w * (Z * (Y * Y * k00 + 2 * Y * k01 + k02) + (Y * Y * k10 + 2 * Y * k11 + k12));
  out[at + M_ZZ]! += (w * (Z * Z * Z * k00 + 3 * Z * Z * k10 + 3 * Z * k20 + k30)) / 3;
  out[at + M_YZ]! += (w * (Y * zPart + Z * Z * k01 + 2 * Z * k11 + k21)) / 2;
}

/** Adds `w` times the moments of the region bounded by edges [from, to) into `out` (six moments, from index `at`). */
export function addMoments(out: Float64Array, edges: Float64Array, from: number, to: number, w: number, at = 0): void {
  addMomentsAbove(out, edges, from, to, w, -Infinity, at);
}

/**
 * Adds `w` times the moments of the part of the region bounded by edges [from, to) that lies
 * at or above y = cut into `out` (six moments, from index `at`).
 */
export function addMomentsAbove(out: Float64Array, edges: Float64Array, from: number, to: number, w: number, cut: number, at = 0): void {
  for (let o = from * STRIDE, end = to * STRIDE; o < end; o += STRIDE) {
    if (edges[o] === ARC) {
      const zc = edges[o + 1]!;
      const yc = edges[o + 2]!;
      const r = edges[o + 3]!;
      const t0 = edges[o + 4]!;
      const t1 = edges[o + 5]!;
      const h = (cut - yc) / r;
      if (h <= -1) {
        addArc(out, at, w, zc, yc, r, t0, t1);
        continue;
      }
      if (h >= 1) continue;
      const lo = t0 < t1 ? t0 : t1;
      const hi = t0 < t1 ? t1 : t0;
      let p = lo;
      let q = hi;
      // midpoint below pi/2: y rises with the angle
      if (lo + hi < Math.PI) p = Math.max(lo, Math.asin(h));
      else q = Math.min(hi, Math.PI - Math.asin(h));
      if (p >= q) continue;
      if (t0 < t1) addArc(out, at, w, zc, yc, r, p, q);
      else addArc(out, at, w, zc, yc, r, q, p);
      continue;
    }
    let z0 = edges[o + 1]!;
    let y0 = edges[o + 2]!;
    let z1 = edges[o + 3]!;
    let y1 = edges[o + 4]!;
    if (y0 < cut) {
      if (y1 < cut) continue;
      z0 = z0 + ((cut - y0) * (z1 - z0)) / (y1 - y0);
      y0 = cut;
    } else if (y1 < cut) {
      z1 = z1 + ((cut - y1) * (z0 - z1)) / (y0 - y1);
      y1 = cut;
    }
    const d = (y1 - y0) * w;
    if (d === 0) continue;
    const z00 = z0 * z0;
    const z01 = z0 * z1;
    const z11 = z1 * z1;
    const y00 = y0 * y0;
    const y01 = y0 * y1;
    const y11 = y1 * y1;
    out[at + M_AREA]! += (d * (z0 + z1)) / 2;
    out[at + M_Y]! += (d * (2 * z0 * y0 + z0 * y1 + z1 * y0 + 2 * z1 * y1)) / 6;
    out[at + M_Z]! += (d * (z00 + z01 + z11)) / 6;
    out[at + M_YY]! += (d * (z0 * (3 * y00 + 2 * y01 + y11) + z1 * (y00 + 2 * y01 + 3 * y11))) / 12;
    out[at + M_ZZ]! += (d * (z0 + z1) * (z00 + z11)) / 12;
    out[at + M_YZ]! += (d * (y0 * (3 * z00 + 2 * z01 + z11) + y1 * (z00 + 2 * z01 + 3 * z11))) / 24;
  }
}

/**
 * Signed chord length of the region bounded by edges [from, to) along the line y = cut, in
 * the limit from above (`fromAbove` true: the line y = cut + epsilon) or from below. Each
 * crossing adds z where the boundary goes up and subtracts z where it goes down. The edges
 * crossed are those that span the height `near` above (or below) the cut: a corner where a
 * straight edge meets an arc is computed twice (once from the arc's angles), and the two can
 * differ by a rounding; with `near` well above that rounding, a cut through such a corner
 * still meets one edge on each side of it, never both or neither.
 */
export function chordAt(edges: Float64Array, from: number, to: number, cut: number, fromAbove: boolean, near = 0): number {
  const probe = fromAbove ? cut + near : cut - near;
  let sum = 0;
  for (let e = from; e < to; e++) {
    const o = e * STRIDE;
    let ya: number;
    let yb: number;
    if (edges[o] === ARC) {
      const yc = edges[o + 2]!;
      const r = edges[o + 3]!;
      ya = yc + r * sinExact(edges[o + 4]!);
      yb = yc + r * sinExact(edges[o + 5]!);
    } else {
      ya = edges[o + 2]!;
      yb = edges[o + 4]!;
    }
    const lo = ya < yb ? ya : yb;
    const hi = ya < yb ? yb : ya;
    const inside = fromAbove ? lo <= probe && probe < hi : lo < probe && probe <= hi;
    if (!inside) continue;
    let z: number;
    if (edges[o] === ARC) {
      const zc = edges[o + 1]!;
      const yc = edges[o + 2]!;
      const r = edges[o + 3]!;
      const h = (cut - yc) / r;
      const half = r * Math.sqrt(Math.max(0, 1 - h * h));
      z = edges[o + 4]! + edges[o + 5]! < Math.PI ? zc + half : zc - half;
    } else {
      const z0 = edges[o + 1]!;
      z = z0 + ((cut - ya) * (edges[o + 3]! - z0)) / (yb - ya);
    }
    sum += yb > ya ? z : -z;
  }
  return sum;
}
