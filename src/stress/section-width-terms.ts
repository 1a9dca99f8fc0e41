// The width terms (see width-terms.ts) of a section from the section module, read from the
// section module's own boundary edges of each part: straight edges give linear terms, circular
// arcs (circles, sectors, fillets are exact there, not polygonised; the edge list already splits
// them at quarter turns, so each is monotone in y) give circular roots.
import { sinExact } from "../section/angles.js";
import { ARC, pushPartBoundary, STRIDE } from "../section/edges.js";
import type { Section, SectionPart } from "../section/index.js";
import type { WidthTerm } from "./width-terms.js";

const edges: number[] = [];

/**
 * Appends the width terms of one part: its counterclockwise boundary edges, each with direction
 * +1 going up and -1 going down, times `sign` (+1 solid, -1 hole); y from `cy`.
 */
function partTerms(out: WidthTerm[], part: SectionPart, cy: number, sign: number, ratio: number): void {
  edges.length = 0;
  pushPartBoundary(edges, part);
  for (let e = 0; e < edges.length; e += STRIDE) {
    const a = edges[e + 1] as number;
    const b = edges[e + 2] as number;
    const c = edges[e + 3] as number;
    const d = edges[e + 4] as number;
    if (edges[e] === ARC) {
      // centre (a, b), radius c, from angle d to angle edges[e + 5]
      const to = edges[e + 5] as number;
      const y0 = b + c * sinExact(d);
      const y1 = b + c * sinExact(to);
      if (y0 === y1) continue;
      const dir = y1 > y0 ? sign : -sign;
      const side = Math.cos((d + to) / 2) > 0 ? 1 : -1;
      out.push({ lo: Math.min(y0, y1) - cy, hi: Math.max(y0, y1) - cy, c0: dir * a, c1: 0, k: dir * side, centre: b - cy, radius: c, ratio });
    } else {
      // from (a, b) to (c, d)
      if (b === d) continue;
      const dir = d > b ? sign : -sign;
      const slope = (c - a) / (d - b);
      out.push({ lo: Math.min(b, d) - cy, hi: Math.max(b, d) - cy, c0: dir * (a + slope * (cy - b)), c1: dir * slope, k: 0, centre: 0, radius: 0, ratio });
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
    partTerms(out, part, centroidY, part.hole === true ? -1 : 1, ratios[i] ?? 1);
  });
  return out;
}
