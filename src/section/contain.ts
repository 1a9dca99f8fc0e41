// Point-in-region tests on compiled boundaries, used to check that holes lie inside solids.
import { sinExact, cosExact } from "./angles.js";
import { ARC, STRIDE } from "./edges.js";

function distanceToEdge(edges: Float64Array, o: number, z: number, y: number): number {
  if (edges[o] === ARC) {
    const zc = edges[o + 1]!;
    const yc = edges[o + 2]!;
    const r = edges[o + 3]!;
    const t0 = edges[o + 4]!;
    const t1 = edges[o + 5]!;
    const lo = Math.min(t0, t1);
    const hi = Math.max(t0, t1);
    let t = Math.atan2(y - yc, z - zc);
    if (t < -Math.PI / 2) t += 2 * Math.PI;
    if (t >= lo && t <= hi) return Math.abs(Math.hypot(z - zc, y - yc) - r);
    const d0 = Math.hypot(z - zc - r * cosExact(lo), y - yc - r * sinExact(lo));
    const d1 = Math.hypot(z - zc - r * cosExact(hi), y - yc - r * sinExact(hi));
    return Math.min(d0, d1);
  }
  const z0 = edges[o + 1]!;
  const y0 = edges[o + 2]!;
  const dz = edges[o + 3]! - z0;
  const dy = edges[o + 4]! - y0;
  const len2 = dz * dz + dy * dy;
  const t = len2 === 0 ? 0 : Math.max(0, Math.min(1, ((z - z0) * dz + (y - y0) * dy) / len2));
  return Math.hypot(z - z0 - t * dz, y - y0 - t * dy);
}

/**
 * True when (z, y) lies inside the region bounded by edges [from, to), or within `tolerance`
 * of its boundary.
 */
export function containsPoint(edges: Float64Array, from: number, to: number, z: number, y: number, tolerance: number): boolean {
  let winding = 0;
  for (let e = from; e < to; e++) {
    const o = e * STRIDE;
    let ya: number;
    let yb: number;
    let zAt: number;
    if (edges[o] === ARC) {
      const zc = edges[o + 1]!;
      const yc = edges[o + 2]!;
      const r = edges[o + 3]!;
      ya = yc + r * sinExact(edges[o + 4]!);
      yb = yc + r * sinExact(edges[o + 5]!);
      if (!(Math.min(ya, yb) <= y && y < Math.max(ya, yb))) continue;
      const h = (y - yc) / r;
      const half = r * Math.sqrt(Math.max(0, 1 - h * h));
      zAt = edges[o + 4]! + edges[o + 5]! < Math.PI ? zc + half : zc - half;
    } else {
      ya = edges[o + 2]!;
      yb = edges[o + 4]!;
      if (!(Math.min(ya, yb) <= y && y < Math.max(ya, yb))) continue;
      const z0 = edges[o + 1]!;
      zAt = z0 + ((y - ya) * (edges[o + 3]! - z0)) / (yb - ya);
    }
    if (zAt > z) winding += yb > ya ? 1 : -1;
  }
  if (winding !== 0) return true;
  // outside: on the boundary after all?
  for (let o = from * STRIDE, end = to * STRIDE; o < end; o += STRIDE) if (distanceToEdge(edges, o, z, y) <= tolerance) return true;
  return false;
}

/** The distance from (z, y) to the boundary made of edges [from, to). */
export function boundaryDistance(edges: Float64Array, from: number, to: number, z: number, y: number): number {
  let d = Infinity;
  for (let o = from * STRIDE, end = to * STRIDE; o < end; o += STRIDE) d = Math.min(d, distanceToEdge(edges, o, z, y));
  return d;
}

/** Points on the boundary of edges [from, to): every edge's start and middle, as flat [z, y, z, y, ...]. */
export function boundarySamples(edges: Float64Array, from: number, to: number): number[] {
  const out: number[] = [];
  for (let e = from; e < to; e++) {
    const o = e * STRIDE;
    if (edges[o] === ARC) {
      const zc = edges[o + 1]!;
      const yc = edges[o + 2]!;
      const r = edges[o + 3]!;
      const t0 = edges[o + 4]!;
      const tm = (t0 + edges[o + 5]!) / 2;
      out.push(zc + r * cosExact(t0), yc + r * sinExact(t0), zc + r * Math.cos(tm), yc + r * Math.sin(tm));
    } else {
      const z0 = edges[o + 1]!;
      const y0 = edges[o + 2]!;
      out.push(z0, y0, (z0 + edges[o + 3]!) / 2, (y0 + edges[o + 4]!) / 2);
    }
  }
  return out;
}
