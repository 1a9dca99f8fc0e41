// Boundaries as flat edge lists: the compiled form every property is integrated over.
// Each edge is six numbers: [kind, a, b, c, d, e].
//   kind 0, a straight edge: z0, y0, z1, y1 (from, to).
//   kind 1, a circular arc no longer than a quarter turn and lying within one quadrant of its
//   circle (so it is monotone in y and in z): zc, yc, r, from angle, to angle (radians from +z,
//   counterclockwise; "to" may be less than "from" for a clockwise arc). Both angles lie in
//   [-pi/2, 3pi/2], so an arc with angles below pi/2 is on the right half of its circle.
// Solid boundaries run counterclockwise.
import { cosExact, sinExact } from "./angles.js";
import type { SectionPart } from "./types.js";

/** Numbers per edge in an edge list. */
export const STRIDE = 6;
/** Edge kind: straight. */
export const LINE = 0;
/** Edge kind: circular arc within one quadrant. */
export const ARC = 1;

const QUARTER = Math.PI / 2;

/** Appends edges to a growable number list. */
export type EdgeSink = number[];

function pushLine(out: EdgeSink, z0: number, y0: number, z1: number, y1: number): void {
  if (z0 === z1 && y0 === y1) return;
  out.push(LINE, z0, y0, z1, y1, 0);
}

/** Appends an arc from angle `from` to `to` (either direction), split at quadrant boundaries. */
export function pushArc(out: EdgeSink, zc: number, yc: number, r: number, from: number, to: number): void {
  if (from === to) return;
  const dir = to > from ? 1 : -1;
  let a = from;
  for (let guard = 0; guard < 12; guard++) {
    // next quadrant boundary strictly beyond a in the direction of travel
    const k = dir > 0 ? Math.floor(a / QUARTER + 1e-12) + 1 : Math.ceil(a / QUARTER - 1e-12) - 1;
    let b = k * QUARTER;
    if (dir > 0 ? b >= to : b <= to) b = to;
    const mid = (a + b) / 2;
    // shift so that the midpoint lies in [-pi/2, 3pi/2)
    const shift = Math.floor((mid + QUARTER) / (2 * Math.PI)) * 2 * Math.PI;
    out.push(ARC, zc, yc, r, a - shift, b - shift);
    if (b === to) return;
    a = b;
  }
}

/** Signed area of a closed polygon given as flat z, y arrays (counterclockwise positive). */
export function polygonArea(zs: readonly number[], ys: readonly number[]): number {
  let twice = 0;
  const n = zs.length;
  for (let i = 0, j = n - 1; i < n; j = i++) twice += (zs[j] ?? 0) * (ys[i] ?? 0) - (zs[i] ?? 0) * (ys[j] ?? 0);
  return twice / 2;
}

/**
 * The polygon's points with consecutive repeats and a repeated closing point removed, as
 * flat arrays, counterclockwise.
 */
export function normalisedPolygon(points: readonly { readonly y: number; readonly z: number }[]): { zs: number[]; ys: number[] } {
  const zs: number[] = [];
  const ys: number[] = [];
  for (const p of points) {
    const n = zs.length;
    if (n > 0 && zs[n - 1] === p.z && ys[n - 1] === p.y) continue;
    zs.push(p.z);
    ys.push(p.y);
  }
  while (zs.length > 1 && zs[0] === zs[zs.length - 1] && ys[0] === ys[ys.length - 1]) {
    zs.pop();
    ys.pop();
  }
  if (polygonArea(zs, ys) < 0) {
    zs.reverse();
    ys.reverse();
  }
  return { zs, ys };
}

/** Appends the counterclockwise boundary of a (valid) part to `out`. */
export function pushPartBoundary(out: EdgeSink, part: SectionPart): void {
  switch (part.kind) {
    case "polygon": {
      const { zs, ys } = normalisedPolygon(part.points);
      const n = zs.length;
      for (let i = 0; i < n; i++) {
        const j = i + 1 === n ? 0 : i + 1;
        pushLine(out, zs[i] ?? 0, ys[i] ?? 0, zs[j] ?? 0, ys[j] ?? 0);
      }
      return;
    }
    case "circle":
      pushArc(out, part.centre.z, part.centre.y, part.radius, -QUARTER, 3 * QUARTER);
      return;
    case "sector": {
      const { z, y } = part.centre;
      const r = part.radius;
      const a0 = part.startAngle;
      const a1 = a0 + part.sweep;
      if (part.sweep >= 2 * Math.PI) {
        pushArc(out, z, y, r, a0, a1);
        return;
      }
      pushLine(out, z, y, z + r * cosExact(a0), y + r * sinExact(a0));
      pushArc(out, z, y, r, a0, a1);
      pushLine(out, z + r * cosExact(a1), y + r * sinExact(a1), z, y);
      return;
    }
    case "fillet": {
      const { z, y } = part.corner;
      const r = part.radius;
      const t = part.orientation;
      const c1 = cosExact(t);
      const s1 = sinExact(t);
      // e1 = (c1, s1), e2 = (-s1, c1); arc centre = corner + r (e1 + e2)
      const zc = z + r * (c1 - s1);
      const yc = y + r * (s1 + c1);
      pushLine(out, z, y, z + r * c1, y + r * s1);
      pushArc(out, zc, yc, r, t + 3 * QUARTER, t + 2 * QUARTER);
      pushLine(out, z - r * s1, y + r * c1, z, y);
      return;
    }
    default: {
      const never: never = part;
      return never;
    }
  }
}
