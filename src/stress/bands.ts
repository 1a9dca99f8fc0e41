import { IssueCollector, attempt, requireFinite, type IssuePath, type Result } from "../errors/index.js";
import { checkModularRatio, checkOrder } from "./validate.js";

/**
 * A horizontal band of a section whose width varies linearly with height: a rectangle, a
 * trapezoid or a triangle (one width zero). Any polygonal section is a stack of such bands cut
 * at its vertices' heights. y is measured up from the (transformed) centroid (length).
 */
export interface TrapezoidBand {
  /** Tag. */
  readonly kind: "trapezoid";
  /** y of the band's bottom (length). */
  readonly yBottom: number;
  /** y of the band's top (length, >= yBottom). */
  readonly yTop: number;
  /** Width at the bottom (length, >= 0). */
  readonly widthBottom: number;
  /** Width at the top (length, >= 0). */
  readonly widthTop: number;
  /** n = E of the band's material / E of the reference (> 0); 1 when omitted. */
  readonly modularRatio?: number;
  /** True when the band is a hole (its area is taken away). */
  readonly hole?: boolean;
}

/** A whole circle (a round bar, or with `hole` the bore of a tube); its horizontal position does not matter for widths and first moments about z. */
export interface CircleBand {
  /** Tag. */
  readonly kind: "circle";
  /** y of the circle's centre, up from the (transformed) centroid (length). */
  readonly centreY: number;
  /** Radius (length, > 0). */
  readonly radius: number;
  /** n = E of the material / E of the reference (> 0); 1 when omitted. */
  readonly modularRatio?: number;
  /** True when the circle is a hole. */
  readonly hole?: boolean;
}

/**
 * One piece of a section described by how its width varies over the depth: what the shear-stress
 * formula needs (the width at a cut and the first moment of the area beyond it).
 */
export type DepthBand = TrapezoidBand | CircleBand;

/** First moment and width of a section at a horizontal cut. */
export interface BandCut {
  /**
   * First moment, about the centroidal z axis, of the (transformed) area above the cut:
   * Q = sum of n times integral of y dA over y > cut (length^3).
   */
  readonly firstMoment: number;
  /** Actual (untransformed) width of material at the cut (length); the narrower side at a step in width. */
  readonly width: number;
}

/** Records issues in a band list. */
export function checkBands(found: IssueCollector, bands: readonly DepthBand[], path: IssuePath): boolean {
  const before = found.issues.length;
  if (bands.length === 0) found.add("no-bands", path, "Describe the section by at least one band.");
  bands.forEach((band, i) => {
    const p = [...path, i];
    if (band.modularRatio !== undefined) checkModularRatio(found, band.modularRatio, [...p, "modularRatio"]);
    switch (band.kind) {
      case "trapezoid": {
        const b = requireFinite(found, band.yBottom, [...p, "yBottom"], "band's bottom y");
        const t = requireFinite(found, band.yTop, [...p, "yTop"], "band's top y");
        if (b && t) checkOrder(found, band.yBottom, band.yTop, p);
        for (const key of ["widthBottom", "widthTop"] as const) {
          if (requireFinite(found, band[key], [...p, key], "band width") && band[key] < 0) {
            found.add("width-negative", [...p, key], `A band's width cannot be negative; got ${band[key]}. Mark a hole with hole: true.`, { value: band[key] });
          }
        }
        break;
      }
      case "circle":
        requireFinite(found, band.centreY, [...p, "centreY"], "circle's centre y");
        if (requireFinite(found, band.radius, [...p, "radius"], "circle's radius") && !(band.radius > 0)) {
          found.add("radius-not-positive", [...p, "radius"], `The circle's radius must be above zero; got ${band.radius}.`, { value: band.radius });
        }
        break;
      default: {
        const never: never = band;
        found.add("unknown-band-kind", [...p, "kind"], `Unknown band kind ${JSON.stringify((never as { kind: unknown }).kind)}; use "trapezoid" or "circle".`);
      }
    }
  });
  return found.issues.length === before;
}

function weight(band: DepthBand): number {
  return (band.modularRatio ?? 1) * (band.hole === true ? -1 : 1);
}

/** First moment about y = 0 of the (transformed) area of `band` above `cut`. */
function bandFirstMoment(band: DepthBand, cut: number): number {
  switch (band.kind) {
    case "trapezoid": {
      const { yBottom: yb, yTop: yt } = band;
      const lo = Math.max(cut, yb);
      if (lo >= yt) return 0;
      const k = (band.widthTop - band.widthBottom) / (yt - yb);
      const a = band.widthBottom - k * yb;
      return weight(band) * ((a * (yt * yt - lo * lo)) / 2 + (k * (yt * yt * yt - lo * lo * lo)) / 3);
    }
    case "circle": {
      const r = band.radius;
      const s = Math.min(Math.max(cut - band.centreY, -r), r);
      const h = Math.sqrt(Math.max(r * r - s * s, 0));
      const area = r * r * Math.acos(s / r) - s * h;
      return weight(band) * (band.centreY * area + (2 / 3) * h * h * h);
    }
    default: {
      const never: never = band;
      return never;
    }
  }
}

/** Width of `band` at `y`, taking the band's one-sided limit from `side` at its ends. */
function bandWidth(band: DepthBand, y: number, side: "above" | "below"): number {
  const sign = band.hole === true ? -1 : 1;
  switch (band.kind) {
    case "trapezoid": {
      const { yBottom: yb, yTop: yt } = band;
      const inside = side === "above" ? yb <= y && y < yt : yb < y && y <= yt;
      if (!inside) return 0;
      return sign * (band.widthBottom + ((band.widthTop - band.widthBottom) * (y - yb)) / (yt - yb));
    }
    case "circle": {
      const s = y - band.centreY;
      const r = band.radius;
      return Math.abs(s) < r ? sign * 2 * Math.sqrt(r * r - s * s) : 0;
    }
    default: {
      const never: never = band;
      return never;
    }
  }
}

/** Sum of the bands' first moments above `cut` (no validation). */
export function firstMomentAbove(bands: readonly DepthBand[], cut: number): number {
  let q = 0;
  for (const band of bands) q += bandFirstMoment(band, cut);
  return q;
}

/** Net width at `y` from one side (no validation). */
export function widthAt(bands: readonly DepthBand[], y: number, side: "above" | "below"): number {
  let w = 0;
  for (const band of bands) w += bandWidth(band, y, side);
  return Math.max(w, 0);
}

/** Heights where the width may change abruptly, sorted and without repeats. */
export function bandLevels(bands: readonly DepthBand[]): number[] {
  const levels: number[] = [];
  for (const band of bands) {
    if (band.kind === "trapezoid") levels.push(band.yBottom, band.yTop);
    else levels.push(band.centreY - band.radius, band.centreY + band.radius);
  }
  levels.sort((a, b) => a - b);
  return levels.filter((v, i) => i === 0 || v !== levels[i - 1]);
}

/**
 * First moment Q of the (transformed) area above a horizontal cut, about the centroidal z axis,
 * and the width of material at the cut: the two cut quantities of the shear-stress formula.
 * Exact for the band shapes (polynomial integrals; the circular segment in closed form,
 * Q = (2/3)(r^2 - s^2)^(3/2) about the circle's centre, Roark's Formulas for Stress and Strain,
 * 8th ed., Table A.1, from memory).
 *
 * @param bands - The section as bands, y up from its (transformed) centroid (length).
 * @param y - Height of the cut (length).
 * @returns Q (length^3) and the width (length); at a step in width, the narrower side.
 * @throws FlexuraError `no-bands`, `layer-upside-down`, `width-negative`, `radius-not-positive`,
 *   `modular-ratio-not-positive`, `not-a-number` / `not-finite`.
 * @example
 * ```ts
 * // 100 wide x 200 deep rectangle, cut at the centroid: Q = 100 * 100 * 50
 * cutAt([{ kind: "trapezoid", yBottom: -100, yTop: 100, widthBottom: 100, widthTop: 100 }], 0);
 * // { firstMoment: 500000, width: 100 }
 * ```
 */
export function cutAt(bands: readonly DepthBand[], y: number): BandCut {
  const found = new IssueCollector();
  checkBands(found, bands, ["bands"]);
  requireFinite(found, y, ["y"], "cut height y");
  found.throwIfAny();
  return { firstMoment: firstMomentAbove(bands, y) + 0, width: Math.min(widthAt(bands, y, "above"), widthAt(bands, y, "below")) };
}

/**
 * Non-throwing form of {@link cutAt}.
 *
 * @example
 * ```ts
 * tryCutAt([], 0).ok; // false (no-bands)
 * ```
 */
export function tryCutAt(bands: readonly DepthBand[], y: number): Result<BandCut> {
  return attempt(() => cutAt(bands, y));
}
