// Holes must lie inside the solid parts, exactly: every hole edge is split where any solid's
// boundary crosses or touches it (straight edges and circular arcs intersected in closed form),
// and between two such points a piece of the hole's boundary is wholly inside a solid or wholly
// outside it, so one point of each piece decides. A hole whose boundary lies in the solids can
// still cover a gap between them (a hole over the middle of a frame of plates): every piece of a
// solid's boundary deep inside the hole must have solid just beyond it. Holes must not overlap
// one another either (their common area would be taken away twice).
import type { IssueCollector } from "../errors/index.js";
import { boundarySamples, boundaryDistance, containsPoint } from "./contain.js";
import { ARC, STRIDE } from "./edges.js";
import { overlapArea } from "./overlap.js";

/** What the hole checks need of a section being compiled (relative coordinates). */
export interface HoleInput {
  readonly count: number;
  readonly edges: Float64Array;
  readonly edgeStart: Int32Array;
  readonly sign: Float64Array;
  readonly partBox: Float64Array;
  readonly partMoments: Float64Array;
  readonly modulus: Float64Array;
  readonly yieldStrength: Float64Array;
}

/** The arc's angle of (z, y), in the edge list's range [-pi/2, 3pi/2). */
function angleOf(zc: number, yc: number, z: number, y: number): number {
  const t = Math.atan2(y - yc, z - zc);
  return t < -Math.PI / 2 ? t + 2 * Math.PI : t;
}

/** The point at fraction u along edge o. */
function pointOn(edges: Float64Array, o: number, u: number): [number, number] {
  if (edges[o] === ARC) {
    const t = edges[o + 4]! + u * (edges[o + 5]! - edges[o + 4]!);
    return [edges[o + 1]! + edges[o + 3]! * Math.cos(t), edges[o + 2]! + edges[o + 3]! * Math.sin(t)];
  }
  return [edges[o + 1]! + u * (edges[o + 3]! - edges[o + 1]!), edges[o + 2]! + u * (edges[o + 4]! - edges[o + 2]!)];
}

/** The fraction along edge o of a point on (or next to) it, or NaN when it lies off the edge's extent. */
function fractionOf(edges: Float64Array, o: number, z: number, y: number, slack: number): number {
  let u: number;
  if (edges[o] === ARC) {
    const t0 = edges[o + 4]!;
    const t1 = edges[o + 5]!;
    u = (angleOf(edges[o + 1]!, edges[o + 2]!, z, y) - t0) / (t1 - t0);
  } else {
    const dz = edges[o + 3]! - edges[o + 1]!;
    const dy = edges[o + 4]! - edges[o + 2]!;
    u = ((z - edges[o + 1]!) * dz + (y - edges[o + 2]!) * dy) / (dz * dz + dy * dy);
  }
  return u >= -slack && u <= 1 + slack ? Math.min(1, Math.max(0, u)) : Number.NaN;
}

/** Scratch for {@link meetings}: up to two points, [z, y, z, y]. */
const met = new Float64Array(4);

/** Where the circles or lines carrying edges a and b meet, into `met` as [z, y, z, y]; returns how many numbers (0, 2 or 4; tangencies skipped). */
function meetings(edges: Float64Array, a: number, b: number): number {
  const arcA = edges[a] === ARC;
  const arcB = edges[b] === ARC;
  if (arcA && arcB) {
    const z1 = edges[a + 1]!, y1 = edges[a + 2]!, r1 = edges[a + 3]!;
    const z2 = edges[b + 1]!, y2 = edges[b + 2]!, r2 = edges[b + 3]!;
    const dz = z2 - z1, dy = y2 - y1;
    const d = Math.hypot(dz, dy);
    if (d === 0 || d > r1 + r2 || d < Math.abs(r1 - r2)) return 0;
    const along = (r1 * r1 - r2 * r2 + d * d) / (2 * d);
    const h = Math.sqrt(Math.max(0, r1 * r1 - along * along));
    const mz = z1 + (along * dz) / d, my = y1 + (along * dy) / d;
    met[0] = mz - (h * dy) / d;
    met[1] = my + (h * dz) / d;
    met[2] = mz + (h * dy) / d;
    met[3] = my - (h * dz) / d;
    return 4;
  }
  if (arcA || arcB) {
    const arc = arcA ? a : b;
    const line = arcA ? b : a;
    const zc = edges[arc + 1]!, yc = edges[arc + 2]!, r = edges[arc + 3]!;
    const z0 = edges[line + 1]!, y0 = edges[line + 2]!;
    const dz = edges[line + 3]! - z0, dy = edges[line + 4]! - y0;
    const qa = dz * dz + dy * dy;
    const qb = 2 * (dz * (z0 - zc) + dy * (y0 - yc));
    const qc = (z0 - zc) ** 2 + (y0 - yc) ** 2 - r * r;
    const disc = qb * qb - 4 * qa * qc;
    if (!(disc > 0)) return 0;
    const root = Math.sqrt(disc);
    const t0 = (-qb - root) / (2 * qa), t1 = (-qb + root) / (2 * qa);
    met[0] = z0 + t0 * dz;
    met[1] = y0 + t0 * dy;
    met[2] = z0 + t1 * dz;
    met[3] = y0 + t1 * dy;
    return 4;
  }
  const az = edges[a + 1]!, ay = edges[a + 2]!, adz = edges[a + 3]! - az, ady = edges[a + 4]! - ay;
  const bz = edges[b + 1]!, by = edges[b + 2]!, bdz = edges[b + 3]! - bz, bdy = edges[b + 4]! - by;
  const den = adz * bdy - ady * bdz;
  if (den === 0) return 0;
  const t = ((bz - az) * bdy - (by - ay) * bdz) / den;
  met[0] = az + t * adz;
  met[1] = ay + t * ady;
  return 2;
}

const boxA = new Float64Array(4);
const boxB = new Float64Array(4);

/** The bounding box of edge o (an arc lies within one quadrant, so its ends bound it) into `out`. */
function edgeBox(edges: Float64Array, o: number, out: Float64Array): void {
  // no tuples here: this runs for every pair of edges the hole checks compare
  let z0: number, y0: number, z1: number, y1: number;
  if (edges[o] === ARC) {
    const zc = edges[o + 1]!, yc = edges[o + 2]!, r = edges[o + 3]!, t0 = edges[o + 4]!, t1 = edges[o + 5]!;
    z0 = zc + r * Math.cos(t0);
    y0 = yc + r * Math.sin(t0);
    z1 = zc + r * Math.cos(t1);
    y1 = yc + r * Math.sin(t1);
  } else {
    z0 = edges[o + 1]!;
    y0 = edges[o + 2]!;
    z1 = edges[o + 3]!;
    y1 = edges[o + 4]!;
  }
  out[0] = Math.min(z0, z1);
  out[1] = Math.max(z0, z1);
  out[2] = Math.min(y0, y1);
  out[3] = Math.max(y0, y1);
}

/** The fractions along edge o where the boundary [from, to) meets it (or comes within `tolerance`), appended to `out`. */
function splits(edges: Float64Array, o: number, from: number, to: number, tolerance: number, out: number[] = [0, 1]): number[] {
  edgeBox(edges, o, boxA);
  const slack = 2 * tolerance;
  for (let e = from; e < to; e++) {
    const q = e * STRIDE;
    edgeBox(edges, q, boxB);
    if (boxB[0]! > boxA[1]! + slack || boxA[0]! > boxB[1]! + slack || boxB[2]! > boxA[3]! + slack || boxA[2]! > boxB[3]! + slack) continue;
    const count = meetings(edges, o, q);
    for (let k = 0; k < count; k += 2) {
      const z = met[k]!, y = met[k + 1]!;
      // on both edges (within their extents, a rounding allowed)
      const u = fractionOf(edges, o, z, y, 1e-12);
      if (!Number.isNaN(u) && !Number.isNaN(fractionOf(edges, q, z, y, 1e-12))) out.push(u);
    }
    // the other boundary's corners on this edge: where it touches, or runs along it
    const z = edges[q] === ARC ? edges[q + 1]! + edges[q + 3]! * Math.cos(edges[q + 4]!) : edges[q + 1]!;
    const y = edges[q] === ARC ? edges[q + 2]! + edges[q + 3]! * Math.sin(edges[q + 4]!) : edges[q + 2]!;
    const u = fractionOf(edges, o, z, y, 0);
    if (!Number.isNaN(u)) {
      const [pz, py] = pointOn(edges, o, u);
      if (Math.hypot(pz - z, py - y) <= tolerance) out.push(u);
    }
  }
  return out.sort((x, y) => x - y);
}

function boxesMeet(box: Float64Array, i: number, j: number, tolerance: number): boolean {
  return (
    box[i * 4]! <= box[j * 4 + 1]! + tolerance &&
    box[j * 4]! <= box[i * 4 + 1]! + tolerance &&
    box[i * 4 + 2]! <= box[j * 4 + 3]! + tolerance &&
    box[j * 4 + 2]! <= box[i * 4 + 3]! + tolerance
  );
}

/** True when (z, y) is in some solid part (or within `tolerance` of one). */
function inSolid(p: HoleInput, z: number, y: number, tolerance: number): boolean {
  const { count, sign, partBox: box, edges, edgeStart } = p;
  for (let j = 0; j < count; j++) {
    if (sign[j] !== 1) continue;
    if (z < box[j * 4]! - tolerance || z > box[j * 4 + 1]! + tolerance || y < box[j * 4 + 2]! - tolerance || y > box[j * 4 + 3]! + tolerance) continue;
    if (containsPoint(edges, edgeStart[j]!, edgeStart[j + 1]!, z, y, tolerance)) return true;
  }
  return false;
}

/** A point of hole h's boundary outside every solid part, or undefined when there is none. */
function boundaryOutside(p: HoleInput, h: number, tolerance: number): [number, number] | undefined {
  const { count, sign, partBox: box, edges, edgeStart } = p;
  for (let e = edgeStart[h]!; e < edgeStart[h + 1]!; e++) {
    const o = e * STRIDE;
    const cuts = [0, 1];
    for (let j = 0; j < count; j++) {
      if (sign[j] === 1 && boxesMeet(box, h, j, tolerance)) splits(edges, o, edgeStart[j]!, edgeStart[j + 1]!, tolerance, cuts);
    }
    cuts.sort((x, y) => x - y);
    for (let k = 1; k < cuts.length; k++) {
      if (!(cuts[k]! > cuts[k - 1]!)) continue;
      const [z, y] = pointOn(edges, o, (cuts[k - 1]! + cuts[k]!) / 2);
      if (!inSolid(p, z, y, tolerance)) return [z, y];
    }
  }
  return undefined;
}

/** The outward normal (solid boundaries run counterclockwise) of edge o at fraction u. */
function outward(edges: Float64Array, o: number, u: number): [number, number] {
  if (edges[o] === ARC) {
    const t0 = edges[o + 4]!, t1 = edges[o + 5]!;
    const t = t0 + u * (t1 - t0);
    const s = t1 > t0 ? 1 : -1;
    return [s * Math.cos(t), s * Math.sin(t)];
  }
  const dz = edges[o + 3]! - edges[o + 1]!, dy = edges[o + 4]! - edges[o + 2]!;
  const len = Math.hypot(dz, dy);
  return [dy / len, -dz / len];
}

/** A point inside hole h with no solid part under it (a gap between solids), or undefined. */
function gapInside(p: HoleInput, h: number, tolerance: number, step: number): [number, number] | undefined {
  const { count, sign, partBox: box, edges, edgeStart } = p;
  const from = edgeStart[h]!, to = edgeStart[h + 1]!;
  for (let j = 0; j < count; j++) {
    if (sign[j] !== 1 || !boxesMeet(box, h, j, tolerance)) continue;
    for (let e = edgeStart[j]!; e < edgeStart[j + 1]!; e++) {
      const o = e * STRIDE;
      // an edge outside the hole's box has no piece inside the hole
      edgeBox(edges, o, boxB);
      if (boxB[0]! > box[h * 4 + 1]! || boxB[1]! < box[h * 4]! || boxB[2]! > box[h * 4 + 3]! || boxB[3]! < box[h * 4 + 2]!) continue;
      const cuts = splits(edges, o, from, to, tolerance);
      for (let k = 1; k < cuts.length; k++) {
        if (!(cuts[k]! > cuts[k - 1]!)) continue;
        const u = (cuts[k - 1]! + cuts[k]!) / 2;
        const [z, y] = pointOn(edges, o, u);
        if (!containsPoint(edges, from, to, z, y, 0) || boundaryDistance(edges, from, to, z, y) <= 2 * step) continue;
        const [nz, ny] = outward(edges, o, u);
        if (!inSolid(p, z + step * nz, y + step * ny, tolerance)) return [z + step * nz, y + step * ny];
      }
    }
  }
  return undefined;
}

/**
 * Records `hole-outside-solid` for each hole not inside the solid parts and `holes-overlap` for
 * holes covering common area; a hole without a material takes that of the solid it lies in (the
 * one holding most of its boundary samples). `size` is the section's larger side.
 */
export function checkHoles(found: IssueCollector, p: HoleInput, tolerance: number, size: number, ref: { y: number; z: number }): void {
  const { count, sign, edges, edgeStart, modulus, yieldStrength, partBox, partMoments } = p;
  const step = 1e-6 * size;
  for (let i = 0; i < count; i++) {
    if (sign[i] === 1) continue;
    const outside = boundaryOutside(p, i, tolerance) ?? gapInside(p, i, tolerance, step);
    if (outside) {
      const at = { y: outside[1] + ref.y, z: outside[0] + ref.z };
      found.add("hole-outside-solid", ["parts", i], `This hole reaches outside every solid part (for example at y = ${at.y}, z = ${at.z}); a hole must lie within the solid parts it is cut from.`, { at });
      continue;
    }
    for (let j = 0; j < i; j++) {
      if (sign[j] === 1 || !boxesMeet(partBox, i, j, -tolerance)) continue;
      const area = overlapArea(edges, edgeStart[i]!, edgeStart[i + 1]!, edgeStart[j]!, edgeStart[j + 1]!, tolerance);
      if (area > 1e-9 * Math.min(partMoments[i * 6]!, partMoments[j * 6]!)) {
        found.add("holes-overlap", ["parts", i], `Holes ${j} and ${i} overlap (common area ${Number(area.toPrecision(6))}), so that area would be taken away twice; trim one of them, or make them one hole.`, { parts: [j, i], area });
        break;
      }
    }
    if (!Number.isNaN(modulus[i]!)) continue;
    const samples = boundarySamples(edges, edgeStart[i]!, edgeStart[i + 1]!);
    let host = -1;
    let best = -1;
    for (let j = 0; j < count; j++) {
      if (sign[j] !== 1 || !boxesMeet(partBox, i, j, tolerance)) continue;
      let hits = 0;
      for (let s = 0; s < samples.length; s += 2) if (containsPoint(edges, edgeStart[j]!, edgeStart[j + 1]!, samples[s]!, samples[s + 1]!, tolerance)) hits++;
      if (hits > best) {
        best = hits;
        host = j;
      }
    }
    if (host >= 0) {
      modulus[i] = modulus[host]!;
      yieldStrength[i] = yieldStrength[host]!;
    }
  }
}
