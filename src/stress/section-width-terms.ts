// The width terms (see width-terms.ts) of a section from the section module, read from its parts:
// straight edges give linear terms, circular arcs (circles, sectors, fillets are exact there, not
// polygonised) give circular roots, one per quarter of the circle so each is monotone in y.
import { cosExact, sinExact } from "../section/angles.js";
import type { Section, SectionPart } from "../section/index.js";
import type { WidthTerm } from "./width-terms.js";

const QUARTER = Math.PI / 2;

/** sin and cos, exact at multiples of a quarter turn (as the section module places its parts). */
function unit(angle: number): { s: number; c: number } {
  return { s: sinExact(angle), c: cosExact(angle) };
}

/** Where one part's terms go; `sign` is +1 for a solid, -1 for a hole (times the winding). */
interface Sink {
  readonly out: WidthTerm[];
  readonly cy: number;
  readonly sign: number;
  readonly ratio: number;
}

/** A straight boundary edge from (z0, y0) to (z1, y1), absolute coordinates. */
function line(sink: Sink, z0: number, y0: number, z1: number, y1: number): void {
  if (y0 === y1) return;
  const dir = y1 > y0 ? sink.sign : -sink.sign;
  const slope = (z1 - z0) / (y1 - y0);
  const lo = Math.min(y0, y1) - sink.cy;
  const hi = Math.max(y0, y1) - sink.cy;
  sink.out.push({ lo, hi, c0: dir * (z0 + slope * (sink.cy - y0)), c1: dir * slope, k: 0, centre: 0, radius: 0, ratio: sink.ratio });
}

/** A boundary arc about (zc, yc) from angle `from` to `to` (either direction), split at quarter turns. */
function arc(sink: Sink, zc: number, yc: number, r: number, from: number, to: number): void {
  const step = to > from ? 1 : -1;
  let a = from;
  for (let guard = 0; guard < 12 && a !== to; guard++) {
    const k = step > 0 ? Math.floor(a / QUARTER + 1e-12) + 1 : Math.ceil(a / QUARTER - 1e-12) - 1;
    const next = step > 0 ? Math.min(k * QUARTER, to) : Math.max(k * QUARTER, to);
    const y0 = yc + r * unit(a).s;
    const y1 = yc + r * unit(next).s;
    if (y0 !== y1) {
      const dir = y1 > y0 ? sink.sign : -sink.sign;
      const side = Math.cos((a + next) / 2) > 0 ? 1 : -1;
      const lo = Math.min(y0, y1) - sink.cy;
      const hi = Math.max(y0, y1) - sink.cy;
      sink.out.push({ lo, hi, c0: dir * zc, c1: 0, k: dir * side, centre: yc - sink.cy, radius: r, ratio: sink.ratio });
    }
    a = next;
  }
}

function polygonTerms(sink: Sink, points: readonly { readonly y: number; readonly z: number }[]): void {
  let twice = 0;
  const n = points.length;
  for (let i = 0, j = n - 1; i < n; j = i++) twice += (points[j] as { z: number }).z * (points[i] as { y: number }).y - (points[i] as { z: number }).z * (points[j] as { y: number }).y;
  const wound: Sink = { ...sink, sign: twice < 0 ? -sink.sign : sink.sign };
  for (let i = 0, j = n - 1; i < n; j = i++) {
    const p = points[j] as { y: number; z: number };
    const q = points[i] as { y: number; z: number };
    line(wound, p.z, p.y, q.z, q.y);
  }
}

function partTerms(sink: Sink, part: SectionPart): void {
  switch (part.kind) {
    case "polygon":
      polygonTerms(sink, part.points);
      return;
    case "circle":
      arc(sink, part.centre.z, part.centre.y, part.radius, -QUARTER, 3 * QUARTER);
      return;
    case "sector": {
      const { z, y } = part.centre;
      const r = part.radius;
      const a0 = part.startAngle;
      const a1 = a0 + part.sweep;
      if (part.sweep >= 2 * Math.PI) {
        arc(sink, z, y, r, a0, a1);
        return;
      }
      const u0 = unit(a0);
      const u1 = unit(a1);
      line(sink, z, y, z + r * u0.c, y + r * u0.s);
      arc(sink, z, y, r, a0, a1);
      line(sink, z + r * u1.c, y + r * u1.s, z, y);
      return;
    }
    case "fillet": {
      const { z, y } = part.corner;
      const r = part.radius;
      const t = part.orientation;
      const { c, s } = unit(t);
      line(sink, z, y, z + r * c, y + r * s);
      arc(sink, z + r * (c - s), y + r * (s + c), r, t + 3 * QUARTER, t + 2 * QUARTER);
      line(sink, z - r * s, y + r * c, z, y);
      return;
    }
    default: {
      const never: never = part;
      return never;
    }
  }
}

/**
 * The width terms of every part of a (valid) section, y up from `centroidY`; `ratios[i]` is the
 * modular ratio of part i.
 */
export function sectionWidthTerms(section: Section, centroidY: number, ratios: readonly number[]): WidthTerm[] {
  const out: WidthTerm[] = [];
  section.parts.forEach((part, i) => {
    partTerms({ out, cy: centroidY, sign: part.hole === true ? -1 : 1, ratio: ratios[i] ?? 1 }, part);
  });
  return out;
}
