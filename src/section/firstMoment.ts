import { IssueCollector, attempt, requireFinite, type Result } from "../errors/index.js";
import { addMomentsAbove, chordAt, M_AREA, M_Y } from "./integrals.js";
import { prepareSection } from "./prepare.js";
import type { SectionPropertiesOptions } from "./propertyTypes.js";
import type { Section } from "./types.js";
import { partWeights } from "./weights.js";

/**
 * The first moment of area above a horizontal cut and the width of the section at the cut:
 * what the shear stress tau = V Q / (I b) needs.
 *
 * @example
 * ```ts
 * const { firstMoment, width } = firstMomentAbove(rectangle({ width: 100, depth: 200 }), 0);
 * ```
 */
export interface FirstMomentAbove {
  /**
   * Q = integral of (y - y_c) dA over the part of the section above the cut, about the
   * centroidal z axis (length^3); transformed (each part's area times n_i) for multi-material
   * sections. Never negative: the area above any cut has its centroid above the section's.
   */
  readonly firstMoment: number;
  /**
   * Actual (not transformed) width of material on the cut line, holes taken away (length).
   * Where the width jumps at the cut (a flange meeting a web), the smaller of `widthAbove` and
   * `widthBelow`, which gives the larger shear stress.
   */
  readonly width: number;
  /** Width just above the cut (the limit from above). */
  readonly widthAbove: number;
  /** Width just below the cut (the limit from below). */
  readonly widthBelow: number;
  /** Area above the cut (transformed for multi-material sections; length^2). */
  readonly areaAbove: number;
  /**
   * Transformed width b* = sum of n_i b_i on the cut line (length): each part's width times its
   * modular ratio, holes taken away; the smaller of the two one-sided limits at a step. Equal to
   * `width` for a section of one material.
   */
  readonly transformedWidth: number;
  /** Transformed width just above the cut. */
  readonly transformedWidthAbove: number;
  /** Transformed width just below the cut. */
  readonly transformedWidthBelow: number;
  /** Each part's own (actual, unsigned) width on the cut line, the smaller one-sided limit, by part index (length). */
  readonly partWidths: readonly number[];
}

const above = new Float64Array(6);
const whole = new Float64Array(6);

/**
 * First moment Q of the area above the horizontal line y = `yCut` about the centroidal z axis,
 * and the section's width on that line, for the shear stress tau = V Q / (I_z b) (Gere and
 * Goodno, Mechanics of Materials, the shear formula in the chapter on stresses in beams).
 * For a multi-material section Q is transformed (as is I_z from {@link sectionProperties}); the
 * width is the actual width and `transformedWidth` b* = sum of n_i b_i: the shear stress in
 * material i is n_i V Q* / (I* b*) (the transformed-section method), not V Q* / (I* b).
 *
 * @param section - The section.
 * @param yCut - Absolute y of the cut (length); outside the section Q and the width are 0.
 * @param options - Optional {@link SectionPropertiesOptions} (the reference modulus).
 * @throws FlexuraError any code of `section()`; `not-a-number` / `not-finite` for `yCut`;
 *   `reference-modulus-not-positive`.
 * @example
 * ```ts
 * const r = firstMomentAbove(rectangle({ width: 100, depth: 200 }), 0); // at the neutral axis
 * r.firstMoment; // 100 * 100 * 50 = 500e3
 * r.width; // 100
 * ```
 */
export function firstMomentAbove(section: Section, yCut: number, options?: SectionPropertiesOptions): FirstMomentAbove {
  const p = prepareSection(section);
  const found = new IssueCollector();
  requireFinite(found, yCut, ["yCut"], "height of the cut");
  found.throwIfAny();
  const { weights } = partWeights(p, options?.referenceModulus);
  const cut = yCut - p.refY;
  above.fill(0);
  whole.fill(0);
  let widthAbove = 0;
  let widthBelow = 0;
  let tAbove = 0;
  let tBelow = 0;
  const partWidths: number[] = new Array<number>(p.count).fill(0);
  // heights within this of a corner count as the corner (see chordAt): far above rounding, far below any real dimension
  const near = 1e-12 * (p.box[3]! - p.box[2]!);
  for (let i = 0; i < p.count; i++) {
    const from = p.edgeStart[i]!;
    const to = p.edgeStart[i + 1]!;
    const w = weights[i]!;
    whole[M_AREA]! += w * p.partMoments[i * 6 + M_AREA]!;
    whole[M_Y]! += w * p.partMoments[i * 6 + M_Y]!;
    const yMin = p.partBox[i * 4 + 2]!;
    const yMax = p.partBox[i * 4 + 3]!;
    if (cut >= yMin - near && cut <= yMax + near) {
      const s = p.sign[i]!;
      const a = chordAt(p.edges, from, to, cut, true, near);
      const b = chordAt(p.edges, from, to, cut, false, near);
      widthAbove += s * a;
      widthBelow += s * b;
      tAbove += w * a;
      tBelow += w * b;
      partWidths[i] = Math.min(a, b);
    }
    if (cut < yMin) {
      above[M_AREA]! += w * p.partMoments[i * 6 + M_AREA]!;
      above[M_Y]! += w * p.partMoments[i * 6 + M_Y]!;
      continue;
    }
    if (cut > yMax) continue;
    if (cut < yMax) addMomentsAbove(above, p.edges, from, to, w, cut);
  }
  const yc = whole[M_Y]! / whole[M_AREA]!;
  const areaAbove = above[M_AREA]!;
  const firstMoment = above[M_Y]! - areaAbove * yc;
  const clean = (x: number): number => (Math.abs(x) < 1e-12 * (p.box[1]! - p.box[0]!) ? 0 : x);
  const wa = clean(widthAbove);
  const wb = clean(widthBelow);
  const ta = clean(tAbove);
  const tb = clean(tBelow);
  for (let i = 0; i < p.count; i++) partWidths[i] = clean(partWidths[i]!);
  return { firstMoment, width: Math.min(wa, wb), widthAbove: wa, widthBelow: wb, areaAbove, transformedWidth: Math.min(ta, tb), transformedWidthAbove: ta, transformedWidthBelow: tb, partWidths };
}

/**
 * The non-throwing form of {@link firstMomentAbove}.
 *
 * @example
 * ```ts
 * const r = tryFirstMomentAbove(rectangle({ width: 100, depth: 200 }), Number.NaN); // ok: false, "not-finite"
 * ```
 */
export function tryFirstMomentAbove(section: Section, yCut: number, options?: SectionPropertiesOptions): Result<FirstMomentAbove> {
  return attempt(() => firstMomentAbove(section, yCut, options));
}
