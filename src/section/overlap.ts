// Overlap of two solid parts. The area common to two regions A and B is, by Green's theorem,
// the integral of z dy around its boundary, which is made of the pieces of A's boundary inside
// B and the pieces of B's boundary inside A. Each edge is split where the other boundary meets
// it; a piece lying along the other boundary counts once when both run the same way (the parts
// are on the same side of it) and not at all when they run opposite ways (parts that only
// touch). Straight edges are exact; a circular arc is replaced by its chords (ARC_CHORDS per
// arc), which is exact for polygons and close for curved parts.
import type { IssueCollector } from "../errors/index.js";
import { cosExact, sinExact } from "./angles.js";
import { boundarySamples, containsPoint } from "./contain.js";
import { ARC, STRIDE } from "./edges.js";
import type { PreparedSection } from "./prepare.js";

const ARC_CHORDS = 8;

/** The corners of the boundary edges [from, to) as a flat [z, y, z, y, ...] list, arcs as chords. */
function corners(edges: Float64Array, from: number, to: number): number[] {
  const out: number[] = [];
  for (let o = from * STRIDE; o < to * STRIDE; o += STRIDE) {
    if (edges[o] !== ARC) {
      out.push(edges[o + 1]!, edges[o + 2]!);
      continue;
    }
    const zc = edges[o + 1]!, yc = edges[o + 2]!, r = edges[o + 3]!, t0 = edges[o + 4]!, t1 = edges[o + 5]!;
    out.push(zc + r * cosExact(t0), yc + r * sinExact(t0));
    for (let k = 1; k < ARC_CHORDS; k++) {
      const t = t0 + ((t1 - t0) * k) / ARC_CHORDS;
      out.push(zc + r * Math.cos(t), yc + r * Math.sin(t));
    }
  }
  return out;
}

/** Distance from (z, y) to the segment from (az, ay) to (bz, by). */
function segmentDistance(z: number, y: number, az: number, ay: number, bz: number, by: number): number {
  const dz = bz - az;
  const dy = by - ay;
  const len2 = dz * dz + dy * dy;
  const t = len2 === 0 ? 0 : Math.max(0, Math.min(1, ((z - az) * dz + (y - ay) * dy) / len2));
  return Math.hypot(z - az - t * dz, y - ay - t * dy);
}

/**
 * Where (z, y) lies against polygon q running from (dz, dy): 1 inside, 0 outside; on the
 * boundary, 2 when the boundary there runs the same way as (dz, dy) and 0 otherwise.
 */
function locate(q: readonly number[], z: number, y: number, dz: number, dy: number, tolerance: number): number {
  const n = q.length;
  let winding = 0;
  for (let i = 0; i < n; i += 2) {
    const j = i + 2 === n ? 0 : i + 2;
    const az = q[i]!, ay = q[i + 1]!, bz = q[j]!, by = q[j + 1]!;
    if (segmentDistance(z, y, az, ay, bz, by) <= tolerance) return dz * (bz - az) + dy * (by - ay) > 0 ? 2 : 0;
    if ((ay <= y) === (by <= y)) continue;
    if (az + ((y - ay) * (bz - az)) / (by - ay) > z) winding += by > ay ? 1 : -1;
  }
  return winding !== 0 ? 1 : 0;
}

/** The integral of z dy along the pieces of p's boundary inside q (and along q's boundary the same way when `shared`). */
function inside(p: readonly number[], q: readonly number[], tolerance: number, shared: boolean): number {
  let sum = 0;
  const n = p.length;
  const m = q.length;
  const cuts: number[] = [];
  for (let i = 0; i < n; i += 2) {
    const j = i + 2 === n ? 0 : i + 2;
    const az = p[i]!, ay = p[i + 1]!;
    const dz = p[j]! - az, dy = p[j + 1]! - ay;
    const len2 = dz * dz + dy * dy;
    cuts.length = 0;
    cuts.push(0, 1);
    for (let k = 0; k < m; k += 2) {
      const l = k + 2 === m ? 0 : k + 2;
      const cz = q[k]!, cy = q[k + 1]!;
      const ez = q[l]! - cz, ey = q[l + 1]! - cy;
      const den = dz * ey - dy * ez;
      // q's corner on p's edge (this also covers edges that run along each other)
      if (segmentDistance(cz, cy, az, ay, az + dz, ay + dy) <= tolerance) cuts.push(((cz - az) * dz + (cy - ay) * dy) / len2);
      if (den === 0) continue;
      const t = ((cz - az) * ey - (cy - ay) * ez) / den;
      const u = ((cz - az) * dy - (cy - ay) * dz) / den;
      if (t > 0 && t < 1 && u >= 0 && u <= 1) cuts.push(t);
    }
    cuts.sort((a, b) => a - b);
    for (let c = 1; c < cuts.length; c++) {
      const t0 = Math.max(0, cuts[c - 1]!);
      const t1 = Math.min(1, cuts[c]!);
      if (!(t1 > t0)) continue;
      const tm = (t0 + t1) / 2;
      const where = locate(q, az + tm * dz, ay + tm * dy, dz, dy, tolerance);
      if (where === 1 || (where === 2 && shared)) sum += (az + ((t0 + t1) / 2) * dz) * (t1 - t0) * dy;
    }
  }
  return sum;
}

/**
 * The area common to the regions bounded by edges [fromA, toA) and [fromB, toB) (zero for
 * regions that only touch), with `tolerance` the distance within which points count as on a
 * boundary.
 */
export function overlapArea(edges: Float64Array, fromA: number, toA: number, fromB: number, toB: number, tolerance: number): number {
  const a = corners(edges, fromA, toA);
  const b = corners(edges, fromB, toB);
  return inside(a, b, tolerance, true) + inside(b, a, tolerance, false);
}

type Parts = Pick<PreparedSection, "count" | "edges" | "edgeStart" | "sign" | "partBox" | "partMoments">;

/** True when solid part i lies inside hole h (every corner and edge midpoint in it or on its boundary). */
function inHole(p: Parts, i: number, h: number, tolerance: number): boolean {
  const b = p.partBox;
  if (b[i * 4]! < b[h * 4]! - tolerance || b[i * 4 + 1]! > b[h * 4 + 1]! + tolerance) return false;
  if (b[i * 4 + 2]! < b[h * 4 + 2]! - tolerance || b[i * 4 + 3]! > b[h * 4 + 3]! + tolerance) return false;
  const s = boundarySamples(p.edges, p.edgeStart[i]!, p.edgeStart[i + 1]!);
  for (let k = 0; k < s.length; k += 2) if (!containsPoint(p.edges, p.edgeStart[h]!, p.edgeStart[h + 1]!, s[k]!, s[k + 1]!, tolerance)) return false;
  return true;
}

/**
 * Records `parts-overlap` for each solid part that overlaps an earlier one: parts whose boxes
 * overlap are candidates, and their exact common area decides. A solid part inside a hole (one
 * that gives back part of the hole, as the inside corners of a rounded hollow section do) may
 * overlap the solid around the hole, but not another part inside a hole.
 */
export function checkOverlaps(found: IssueCollector, p: Parts, tolerance: number): void {
  const { count, sign, partBox: b, partMoments: m } = p;
  const filler: number[] = [];
  const isFiller = (i: number): boolean => {
    if (filler[i] === undefined) {
      filler[i] = 0;
      for (let h = 0; h < count; h++) if (sign[h] === -1 && inHole(p, i, h, tolerance)) filler[i] = 1;
    }
    return filler[i] === 1;
  };
  for (let j = 1; j < count; j++) {
    if (sign[j] !== 1) continue;
    for (let i = 0; i < j; i++) {
      if (sign[i] !== 1) continue;
      if (Math.min(b[i * 4 + 1]!, b[j * 4 + 1]!) - Math.max(b[i * 4]!, b[j * 4]!) <= tolerance) continue;
      if (Math.min(b[i * 4 + 3]!, b[j * 4 + 3]!) - Math.max(b[i * 4 + 2]!, b[j * 4 + 2]!) <= tolerance) continue;
      if (isFiller(i) !== isFiller(j)) continue;
      const area = overlapArea(p.edges, p.edgeStart[i]!, p.edgeStart[i + 1]!, p.edgeStart[j]!, p.edgeStart[j + 1]!, tolerance);
      if (area > 1e-9 * Math.min(m[i * 6]!, m[j * 6]!)) {
        found.add(
          "parts-overlap",
          ["parts", j],
          `Solid parts ${i} and ${j} overlap (common area ${Number(area.toPrecision(6))}), so that area would count twice; trim one of them, or make the common area one part.`,
          { parts: [i, j], area },
        );
        break;
      }
    }
  }
}
