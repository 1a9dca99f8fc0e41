// Shear on a section from the section module, by the transformed section: at a cut the shear
// flow V Q* / I* is shared among the materials in proportion to n_i b_i, so the stress in
// material i is tau_i = n_i V Q* / (I* b*), b* = sum of n_j b_j the transformed width. For one
// material this is V Q / (I b).
import { firstMomentAbove, type Section, type SectionProperties, type SectionPropertiesOptions } from "../section/index.js";
import { findPeak, pointAt, type CutSource } from "./shear-peak.js";
import type { MaterialShearStress, PartShearStress, ShearStressPoint } from "./shear-profile.js";
import { sectionLevels } from "./section-points.js";
import { sectionWidthTerms } from "./section-width-terms.js";

/** Solid parts of one modulus, and the holes that take it. */
interface Group {
  readonly n: number;
  readonly parts: readonly number[];
  readonly holes: readonly number[];
}

/** A section seen through horizontal cuts, with its materials. */
export interface SectionCut {
  readonly section: Section;
  readonly props: SectionProperties;
  readonly options: SectionPropertiesOptions | undefined;
  /** Widths are transformed widths b*, so V Q* / (I* b*) is the stress in the reference material. */
  readonly source: CutSource;
  /** The materials, when there are two or more moduli; null for one. */
  readonly groups: readonly Group[] | null;
}

function groupsOf(props: SectionProperties): Group[] | null {
  const byRatio = new Map<number, { parts: number[]; holes: number[] }>();
  props.parts.forEach((p, i) => {
    const g = byRatio.get(p.modularRatio) ?? { parts: [], holes: [] };
    (p.hole ? g.holes : g.parts).push(i);
    byRatio.set(p.modularRatio, g);
  });
  const out = [...byRatio].filter(([, g]) => g.parts.length > 0).map(([n, g]) => ({ n, ...g }));
  return out.length > 1 ? out : null;
}

/** The cut source of a (valid) section, y from its transformed centroid. */
export function sectionCut(section: Section, props: SectionProperties, options: SectionPropertiesOptions | undefined): SectionCut {
  const cy = props.centroid.y;
  const opts = options?.referenceModulus === undefined ? undefined : { referenceModulus: options.referenceModulus };
  const source: CutSource = {
    levels: sectionLevels(section, cy),
    firstMoment: (y) => firstMomentAbove(section, y + cy, opts).firstMoment,
    width: (y, side) => {
      const r = firstMomentAbove(section, y + cy, opts);
      return side === "above" ? r.transformedWidthAbove : r.transformedWidthBelow;
    },
    // the transformed width in place of the actual one: n times each term, as a term of ratio 1
    terms: () => sectionWidthTerms(section, cy, props.parts.map((p) => p.modularRatio)).map((t) => ({ ...t, c0: t.ratio * t.c0, c1: t.ratio * t.c1, k: t.ratio * t.k, ratio: 1 })),
  };
  return { section, props, options: opts, source, groups: groupsOf(props) };
}

function materialsAt(cut: SectionCut, y: number, stress: number, groups: readonly Group[]): MaterialShearStress[] {
  const widths = firstMomentAbove(cut.section, y + cut.props.centroid.y, cut.options).partWidths;
  const out: MaterialShearStress[] = [];
  for (const g of groups) {
    const width = g.parts.reduce((s, i) => s + widths[i]!, 0) - g.holes.reduce((s, i) => s + widths[i]!, 0);
    if (width > 0) out.push({ modularRatio: g.n, parts: g.parts, y, width, stress: g.n * stress + 0 });
  }
  return out;
}

/** The point with the actual width, the transformed width and, for several materials, each one's stress. */
export function decorate(cut: SectionCut, point: ShearStressPoint, side?: "above" | "below"): ShearStressPoint {
  const r = firstMomentAbove(cut.section, point.y + cut.props.centroid.y, cut.options);
  const width = side === undefined ? r.width : side === "above" ? r.widthAbove : r.widthBelow;
  const base = { ...point, width, transformedWidth: point.width };
  return cut.groups === null ? base : { ...base, materials: materialsAt(cut, point.y, point.stress, cut.groups) };
}

/** The stress at a cut (the narrower transformed side at a step). */
export function sectionPointAt(shear: number, cut: SectionCut, y: number): ShearStressPoint {
  const { source, props } = cut;
  const point = pointAt(shear, source, props.secondMomentZ, y, Math.min(source.width(y, "above"), source.width(y, "below")));
  return decorate(cut, point);
}

/**
 * The peak of |V Q* / (I* b*)| over the depth and, for several materials, each material's own
 * peak of |n_i V Q* / (I* b*)| over the heights of its parts.
 */
export function sectionPeak(shear: number, cut: SectionCut): ShearStressPoint {
  const { source, props, groups } = cut;
  const peak = decorate(cut, findPeak(shear, source, props.secondMomentZ));
  if (groups === null) return peak;
  const materials: MaterialShearStress[] = [];
  for (const g of groups) {
    let best: MaterialShearStress | undefined;
    const byPart: PartShearStress[] = [];
    for (const i of g.parts) {
      const e = props.parts[i]!.extremes;
      const p = findPeak(shear, source, props.secondMomentZ, [e.bottom, e.top]);
      const stress = g.n * p.stress + 0;
      byPart.push({ part: i, y: p.y, stress });
      if (best === undefined || Math.abs(stress) > Math.abs(best.stress)) {
        const own = materialsAt(cut, p.y, p.stress, [g])[0];
        best = { modularRatio: g.n, parts: g.parts, y: p.y, width: own?.width ?? 0, stress };
      }
    }
    if (best !== undefined) materials.push({ ...best, byPart });
  }
  return { ...peak, materials };
}
