// Which solid parts of a section form one piece. Two solid parts are joined when their
// boundaries run along each other for a positive length: two straight edges on one line whose
// overlap is longer than the section's tolerance, or two arcs of one circle whose common sweep
// is. Parts that meet only at a corner, or where a straight edge touches an arc, are not joined.
// A solid part that fills a hole (a core inside a tube) is joined to the solid the hole is in
// when its boundary runs along the hole's.
import { attempt, type Result } from "../errors/index.js";
import { containsPoint } from "./contain.js";
import { ARC, STRIDE } from "./edges.js";
import { prepareSection, type PreparedSection } from "./prepare.js";
import type { Section } from "./types.js";

/** The common length of two straight edges on one line (0 when they are not on one line). */
function lineOverlap(e: Float64Array, a: number, b: number, tolerance: number): number {
  const az = e[a + 1]!, ay = e[a + 2]!;
  const dz = e[a + 3]! - az, dy = e[a + 4]! - ay;
  const len = Math.hypot(dz, dy);
  if (len === 0) return 0;
  const off = (z: number, y: number): number => Math.abs((z - az) * dy - (y - ay) * dz) / len;
  const bz0 = e[b + 1]!, by0 = e[b + 2]!, bz1 = e[b + 3]!, by1 = e[b + 4]!;
  if (off(bz0, by0) > tolerance || off(bz1, by1) > tolerance) return 0;
  const along = (z: number, y: number): number => ((z - az) * dz + (y - ay) * dy) / len;
  const s0 = along(bz0, by0), s1 = along(bz1, by1);
  return Math.min(len, Math.max(s0, s1)) - Math.max(0, Math.min(s0, s1));
}

/** The common length of two arcs of one circle (0 when their circles differ). */
function arcOverlap(e: Float64Array, a: number, b: number, tolerance: number): number {
  const r = e[a + 3]!;
  if (Math.hypot(e[a + 1]! - e[b + 1]!, e[a + 2]! - e[b + 2]!) > tolerance || Math.abs(r - e[b + 3]!) > tolerance) return 0;
  const lo = Math.max(Math.min(e[a + 4]!, e[a + 5]!), Math.min(e[b + 4]!, e[b + 5]!));
  const hi = Math.min(Math.max(e[a + 4]!, e[a + 5]!), Math.max(e[b + 4]!, e[b + 5]!));
  return (hi - lo) * r;
}

/** True when parts i and j share a piece of boundary longer than `tolerance`. */
function sharesEdge(p: PreparedSection, i: number, j: number, tolerance: number): boolean {
  const bi = i * 4, bj = j * 4, box = p.partBox;
  if (box[bi]! > box[bj + 1]! + tolerance || box[bj]! > box[bi + 1]! + tolerance || box[bi + 2]! > box[bj + 3]! + tolerance || box[bj + 2]! > box[bi + 3]! + tolerance) return false;
  const e = p.edges;
  for (let a = p.edgeStart[i]! * STRIDE; a < p.edgeStart[i + 1]! * STRIDE; a += STRIDE) {
    for (let b = p.edgeStart[j]! * STRIDE; b < p.edgeStart[j + 1]! * STRIDE; b += STRIDE) {
      const arcs = (e[a] === ARC ? 1 : 0) + (e[b] === ARC ? 1 : 0);
      if (arcs === 1) continue;
      if ((arcs === 0 ? lineOverlap(e, a, b, tolerance) : arcOverlap(e, a, b, tolerance)) > tolerance) return true;
    }
  }
  return false;
}

/** The solid parts a hole lies in: larger than it and containing its centroid (a core that fills the hole is not one). */
function hosts(p: PreparedSection, h: number, tolerance: number): number[] {
  const m = p.partMoments;
  const area = m[h * 6]!;
  const z = m[h * 6 + 2]! / area, y = m[h * 6 + 1]! / area;
  const out: number[] = [];
  for (let i = 0; i < p.count; i++) {
    if (p.sign[i] === 1 && m[i * 6]! > area * (1 + 1e-9) && containsPoint(p.edges, p.edgeStart[i]!, p.edgeStart[i + 1]!, z, y, tolerance)) out.push(i);
  }
  return out;
}

/** The pieces of a prepared section: lists of solid part indices, each in increasing order, ordered by their first part. */
export function piecesOf(p: PreparedSection): number[][] {
  const box = p.box;
  const tolerance = 1e-9 * Math.max(box[1]! - box[0]!, box[3]! - box[2]!);
  const parent = Array.from({ length: p.count }, (_, i) => i);
  const root = (i: number): number => {
    while (parent[i] !== i) i = parent[i] = parent[parent[i]!]!;
    return i;
  };
  const join = (i: number, j: number): void => {
    const a = root(i), b = root(j);
    if (a !== b) parent[Math.max(a, b)] = Math.min(a, b);
  };
  const solids: number[] = [];
  for (let i = 0; i < p.count; i++) if (p.sign[i] === 1) solids.push(i);
  if (solids.length < 2) return [solids];
  for (let x = 0; x < solids.length; x++) {
    for (let y = x + 1; y < solids.length; y++) {
      const i = solids[x]!, j = solids[y]!;
      if (root(i) !== root(j) && sharesEdge(p, i, j, tolerance)) join(i, j);
    }
  }
  for (let h = 0; h < p.count; h++) {
    if (p.sign[h] !== -1) continue;
    const around = hosts(p, h, tolerance);
    for (const j of solids) if (!around.includes(j) && sharesEdge(p, h, j, tolerance)) for (const i of around) join(i, j);
  }
  const byRoot = new Map<number, number[]>();
  for (const i of solids) {
    const r = root(i);
    const list = byRoot.get(r);
    if (list === undefined) byRoot.set(r, [i]);
    else list.push(i);
  }
  return [...byRoot.values()];
}

/**
 * The connected pieces of a section: its solid parts grouped so that two parts are in one piece
 * when a chain of parts joins them, each joined to the next along a piece of boundary of
 * positive length (two straight edges on one line, or two arcs of one circle, whose common
 * length exceeds 1e-9 of the section's size). Parts that meet only at a corner, or where a
 * straight edge is tangent to an arc, are not joined; a solid part that fills a hole is joined to
 * the solid the hole lies in. Holes are taken as lying inside their solids: a hole that cuts a
 * solid in two is not detected. A section of more than one piece acts as one only through
 * connectors the section does not describe, so the shear-stress functions refuse it
 * (`section-not-connected`); its bending properties assume the pieces bend together.
 *
 * @param section - The section.
 * @returns The pieces: lists of solid part indices (into `section.parts`), each in increasing
 *   order, ordered by their first part; one list for a connected section.
 * @throws FlexuraError the codes of `section`.
 * @example
 * ```ts
 * connectedPieces(builtUp([rectangle({ width: 10, depth: 10 }), translateSection(rectangle({ width: 10, depth: 10 }), { y: 10, z: 10 })])); // [[0], [1]]: corners only
 * ```
 */
export function connectedPieces(section: Section): readonly (readonly number[])[] {
  return Object.freeze(piecesOf(prepareSection(section)).map((x) => Object.freeze(x)));
}

/**
 * Non-throwing form of {@link connectedPieces}.
 *
 * @example
 * ```ts
 * tryConnectedPieces({ parts: [] }).ok; // false
 * ```
 */
export function tryConnectedPieces(section: Section): Result<readonly (readonly number[])[]> {
  return attempt(() => connectedPieces(section));
}
