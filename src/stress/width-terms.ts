// The width of a section as a function of height, in closed form: what the shear-stress peak
// needs to write d(Q/b)/dy exactly. Internal to the stress module.
import type { DepthBand } from "./bands.js";

/**
 * One contribution to the width of material at height y (from the centroid), valid for
 * `lo < y < hi`: `c0 + c1 y + k sqrt(radius^2 - (y - centre)^2)` (length). A straight edge gives
 * the linear part, a circular arc the root (its `k` carries the side of the circle, the direction
 * the boundary runs and the hole sign). The transformed width is `ratio` times the same terms.
 */
export interface WidthTerm {
  /** Lowest y of the term (length). */
  readonly lo: number;
  /** Highest y of the term (length). */
  readonly hi: number;
  /** Constant part (length). */
  readonly c0: number;
  /** Slope of the linear part (dimensionless). */
  readonly c1: number;
  /** Multiplier of the circular root; 0 for a straight edge. */
  readonly k: number;
  /** Height of the circle's centre (length). */
  readonly centre: number;
  /** The circle's radius (length; 0 for a straight edge). */
  readonly radius: number;
  /** Modular ratio n of the part (> 0). */
  readonly ratio: number;
}

/** One arc's root as it appears in a band: k in the actual width, n k in the transformed. */
export interface BandArc {
  /** Height of the circle's centre (length). */
  readonly centre: number;
  /** Radius (length). */
  readonly radius: number;
  /** Multiplier in the actual width. */
  readonly k: number;
  /** Multiplier in the transformed width. */
  readonly kt: number;
}

/**
 * The width on one band between consecutive breakpoints:
 * b(y) = p0 + p1 y + sum k_i u_i(y), b_t(y) = q0 + q1 y + sum kt_i u_i(y),
 * u_i(y) = sqrt(r_i^2 - (y - c_i)^2).
 */
export interface BandWidth {
  /** Constant part of the actual width. */
  p0: number;
  /** Slope of the actual width. */
  p1: number;
  /** Constant part of the transformed width. */
  q0: number;
  /** Slope of the transformed width. */
  q1: number;
  /** Circular roots, one per arc. */
  readonly arcs: BandArc[];
}

/** Sums the terms live at `mid` (a point inside the band) into one band's width. */
export function bandWidth(terms: readonly WidthTerm[], mid: number): BandWidth {
  const out: BandWidth = { p0: 0, p1: 0, q0: 0, q1: 0, arcs: [] };
  for (const t of terms) {
    if (!(t.lo < mid && mid < t.hi)) continue;
    out.p0 += t.c0;
    out.p1 += t.c1;
    out.q0 += t.ratio * t.c0;
    out.q1 += t.ratio * t.c1;
    if (t.k !== 0) out.arcs.push({ centre: t.centre, radius: t.radius, k: t.k, kt: t.ratio * t.k });
  }
  return out;
}

/** The width terms of depth bands (y already from the centroid). */
export function depthBandTerms(bands: readonly DepthBand[]): WidthTerm[] {
  const terms: WidthTerm[] = [];
  for (const band of bands) {
    const sign = band.hole === true ? -1 : 1;
    const ratio = band.modularRatio ?? 1;
    switch (band.kind) {
      case "trapezoid": {
        const { yBottom: yb, yTop: yt } = band;
        if (!(yt > yb)) break;
        const slope = (band.widthTop - band.widthBottom) / (yt - yb);
        terms.push({ lo: yb, hi: yt, c0: sign * (band.widthBottom - slope * yb), c1: sign * slope, k: 0, centre: 0, radius: 0, ratio });
        break;
      }
      case "circle": {
        const c = band.centreY;
        const r = band.radius;
        terms.push({ lo: c - r, hi: c + r, c0: 0, c1: 0, k: 2 * sign, centre: c, radius: r, ratio });
        break;
      }
      default: {
        const never: never = band;
        return never;
      }
    }
  }
  return terms;
}

/** Heights inside which a term's form changes: ends, circle centres (where a root turns), and y = 0. */
export function termBreaks(terms: readonly WidthTerm[]): number[] {
  const out: number[] = [0];
  for (const t of terms) {
    out.push(t.lo, t.hi);
    if (t.k !== 0) out.push(t.centre);
  }
  return out;
}
