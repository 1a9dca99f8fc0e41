import type { IssueCollector } from "../errors/index.js";
import { criticalHeights } from "./shear-roots.js";
import type { ShearStressPoint } from "./shear-profile.js";
import { bandWidth, termBreaks, type WidthTerm } from "./width-terms.js";

/**
 * A section seen through horizontal cuts: what the shear-stress profile needs. Internal: the
 * depth bands and the section module's sections both provide one.
 */
export interface CutSource {
  /** Sorted heights (from the centroid) where the width may change abruptly, bottom and top included. */
  readonly levels: readonly number[];
  /** First moment about the centroidal axis of the (transformed) area above y. */
  firstMoment(y: number): number;
  /** Width of material at y, the one-sided limit from `side`. */
  width(y: number, side: "above" | "below"): number;
  /** The width in closed form, term by term (y from the centroid); built on demand. */
  terms(): readonly WidthTerm[];
}

/** The stress point at a cut of the given width. */
export function pointAt(shear: number, source: CutSource, inertia: number, y: number, width: number): ShearStressPoint {
  const q = source.firstMoment(y) + 0;
  const stress = width > 0 ? (shear * (q / width)) / inertia + 0 : 0;
  return { y, stress, firstMoment: q, width };
}

/** Points of the profile: band-interval ends on both sides of each level plus interior points. */
export function profilePoints(shear: number, source: CutSource, inertia: number, perBand: number): ShearStressPoint[] {
  const levels = source.levels;
  const out: ShearStressPoint[] = [];
  for (let i = 0; i < levels.length; i++) {
    const y = levels[i] as number;
    const below = source.width(y, "below");
    const above = source.width(y, "above");
    if (i > 0) out.push(pointAt(shear, source, inertia, y, below));
    if (i === 0 || (i < levels.length - 1 && above !== below)) out.push(pointAt(shear, source, inertia, y, above));
    const next = levels[i + 1];
    if (next === undefined) break;
    for (let k = 1; k < perBand; k++) {
      const yk = y + ((next - y) * k) / perBand;
      out.push(pointAt(shear, source, inertia, yk, source.width(yk, "above")));
    }
  }
  return out;
}

/** Heights that split the depth into bands on which every width term keeps one form. */
function peakBreaks(source: CutSource, terms: readonly WidthTerm[]): number[] {
  const levels = source.levels;
  const bottom = levels[0] ?? 0;
  const top = levels[levels.length - 1] ?? 0;
  const near = 1e-12 * (top - bottom);
  const out = [...levels];
  for (const y of termBreaks(terms)) {
    if (y > bottom && y < top && out.every((v) => Math.abs(v - y) > near)) out.push(y);
  }
  return out.sort((a, b) => a - b);
}

/**
 * The point of largest |tau| over the depth. tau = V Q / (I b) is smooth between the heights
 * where the width changes form, so its extremes lie at those heights (on either side of a step
 * in width) or where d(Q/b)/dy = 0 inside a band: the roots found by {@link criticalHeights}.
 * Ties go to the lowest such point. With `range`, only the heights within it count.
 */
export function findPeak(shear: number, source: CutSource, inertia: number, range?: readonly [number, number]): ShearStressPoint {
  const terms = source.terms();
  let breaks = peakBreaks(source, terms);
  if (range !== undefined) {
    // only the heights from range[0] to range[1] (a part's own heights): its ends become breaks
    const [lo, hi] = range;
    breaks = [lo, ...breaks.filter((y) => y > lo && y < hi), hi];
  }
  let best: ShearStressPoint | undefined;
  const consider = (y: number, width: number): void => {
    const p = pointAt(shear, source, inertia, y + 0, width);
    if (best === undefined || Math.abs(p.stress) > Math.abs(best.stress)) best = p;
  };
  const roots: number[] = [];
  for (let i = 0; i < breaks.length; i++) {
    const y = breaks[i] as number;
    if (i > 0) consider(y, source.width(y, "below"));
    if (i < breaks.length - 1) consider(y, source.width(y, "above"));
    const next = breaks[i + 1];
    if (next === undefined) break;
    const band = bandWidth(terms, y + (next - y) / 2);
    if (!(band.p0 !== 0 || band.p1 !== 0 || band.arcs.length > 0)) continue;
    roots.length = 0;
    criticalHeights(band, y, next, (h) => source.firstMoment(h), roots);
    // a root within 1e-9 of the band of its end is the end (already considered): that also keeps
    // out the rounding-made root next to a tip of zero width, where Q and b are both noise
    const margin = 1e-9 * (next - y);
    for (const r of roots) if (r > y + margin && r < next - margin) consider(r, source.width(r, "above"));
  }
  return best as ShearStressPoint;
}

/** Validates `pointsPerBand` (16 when omitted) and returns it. */
export function checkPointsPerBand(found: IssueCollector, value: number | undefined): number {
  const perBand = value ?? 16;
  if (!Number.isInteger(perBand) || perBand < 1 || perBand > 1e5) {
    found.add("points-per-band-invalid", ["options", "pointsPerBand"], `pointsPerBand must be a whole number from 1 to 100000; got ${String(perBand)}.`);
  }
  return perBand;
}
