import { IssueCollector, attempt, requireFinite, type Result } from "../errors/index.js";
import { firstMomentAbove, sectionProperties, type Section, type SectionProperties, type SectionPropertiesOptions } from "../section/index.js";
import { bendingStressPlane, type BiaxialMoments } from "./biaxial.js";
import { cornerStresses, type CornerStresses } from "./corners.js";
import { checkPointsPerBand, findPeak, pointAt, profilePoints, type CutSource } from "./shear-peak.js";
import type { ShearStressPoint, ShearStressProfile } from "./shear-profile.js";
import { onBoundary } from "./section-boundary.js";
import { candidatePoints, sectionLevels } from "./section-points.js";
import { sectionWidthTerms } from "./section-width-terms.js";
import { checkFibreInside } from "./validate.js";

/** Options of the functions that take a section from the section module. */
export interface SectionStressOptions extends SectionPropertiesOptions {
  /** Points per band between consecutive level heights in a shear profile (>= 1), for plotting (the peak does not depend on them); 16 when omitted. */
  readonly pointsPerBand?: number;
}

function cutSource(section: Section, props: SectionProperties, options: SectionStressOptions | undefined): CutSource {
  const cy = props.centroid.y;
  const opts = options?.referenceModulus === undefined ? undefined : { referenceModulus: options.referenceModulus };
  return {
    levels: sectionLevels(section, cy),
    firstMoment: (y) => firstMomentAbove(section, y + cy, opts).firstMoment,
    width: (y, side) => {
      const r = firstMomentAbove(section, y + cy, opts);
      return side === "above" ? r.widthAbove : r.widthBelow;
    },
    terms: () => sectionWidthTerms(section, cy, props.parts.map((p) => p.modularRatio)),
  };
}

/**
 * Shear stress tau = V Q / (I_z b) at a horizontal cut of a section from the section module,
 * with Q and b from its `firstMomentAbove` (transformed Q, actual width, the narrower side at a
 * step) and I_z from its `sectionProperties`. Source: Roark's Formulas for Stress and Strain,
 * 8th ed., Sec. 8.1 (from memory).
 *
 * @param shear - Shear force V (force).
 * @param section - The section.
 * @param y - Height of the cut, up from the section's (transformed) centroid (length).
 * @param options - Reference modulus for a multi-material section.
 * @returns The stress with Q and b.
 * @throws FlexuraError the section module's codes, `fibre-outside-section`, `not-a-number` / `not-finite`.
 * @example
 * ```ts
 * sectionShearStressAt(30e3, rectangle({ width: 100, depth: 200 }), 0).stress; // 2.25 = 1.5 V / A
 * ```
 */
export function sectionShearStressAt(shear: number, section: Section, y: number, options?: SectionStressOptions): ShearStressPoint {
  const props = sectionProperties(section, options);
  const found = new IssueCollector();
  requireFinite(found, shear, ["shear"], "shear force");
  if (requireFinite(found, y, ["y"], "cut height y")) checkFibreInside(found, y, props.extremes.top, props.extremes.bottom, ["y"]);
  found.throwIfAny();
  const source = cutSource(section, props, options);
  return pointAt(shear, source, props.secondMomentZ, y, Math.min(source.width(y, "above"), source.width(y, "below")));
}

/**
 * Non-throwing form of {@link sectionShearStressAt}.
 *
 * @example
 * ```ts
 * trySectionShearStressAt(1, rectangle({ width: 100, depth: 200 }), 500).ok; // false
 * ```
 */
export function trySectionShearStressAt(shear: number, section: Section, y: number, options?: SectionStressOptions): Result<ShearStressPoint> {
  return attempt(() => sectionShearStressAt(shear, section, y, options));
}

/**
 * The shear stress over the depth of a section from the section module, for plotting, with its
 * peak (see `peakShearStress`: at a height where the width changes form or at a root of the
 * numerator of d(Q/b)/dy between them; the root is exact for straight edges and isolated by
 * interval bounds and bisection where circles, sectors or fillets bound the band).
 *
 * @param shear - Shear force V (force).
 * @param section - The section.
 * @param options - Reference modulus; points per band.
 * @returns Points bottom to top (y from the centroid) and the peak.
 * @throws FlexuraError the section module's codes, `points-per-band-invalid`, `not-a-number` / `not-finite`.
 * @example
 * ```ts
 * sectionShearStressProfile(1e4, circle({ diameter: 60 })).peak.stress; // 4 V / (3 A)
 * ```
 */
export function sectionShearStressProfile(shear: number, section: Section, options?: SectionStressOptions): ShearStressProfile {
  const props = sectionProperties(section, options);
  const found = new IssueCollector();
  requireFinite(found, shear, ["shear"], "shear force");
  const perBand = checkPointsPerBand(found, options?.pointsPerBand);
  found.throwIfAny();
  const source = cutSource(section, props, options);
  const points = profilePoints(shear, source, props.secondMomentZ, perBand);
  return { kind: "shear-stress-profile", points, peak: findPeak(shear, source, props.secondMomentZ) };
}

/**
 * Non-throwing form of {@link sectionShearStressProfile}.
 *
 * @example
 * ```ts
 * trySectionShearStressProfile(1, { parts: [] }).ok; // false
 * ```
 */
export function trySectionShearStressProfile(shear: number, section: Section, options?: SectionStressOptions): Result<ShearStressProfile> {
  return attempt(() => sectionShearStressProfile(shear, section, options));
}

/**
 * The largest shear stress over the depth of a section from the section module; see
 * {@link sectionShearStressProfile}.
 *
 * @param shear - Shear force V (force).
 * @param section - The section.
 * @param options - Reference modulus.
 * @returns The peak point (y from the centroid; stress with the sign of V).
 * @throws FlexuraError as {@link sectionShearStressProfile}.
 * @example
 * ```ts
 * sectionPeakShearStress(30e3, rectangle({ width: 100, depth: 200 })).stress; // 2.25
 * ```
 */
export function sectionPeakShearStress(shear: number, section: Section, options?: SectionStressOptions): ShearStressPoint {
  const props = sectionProperties(section, options);
  const found = new IssueCollector();
  requireFinite(found, shear, ["shear"], "shear force");
  checkPointsPerBand(found, options?.pointsPerBand);
  found.throwIfAny();
  return findPeak(shear, cutSource(section, props, options), props.secondMomentZ);
}

/**
 * Non-throwing form of {@link sectionPeakShearStress}.
 *
 * @example
 * ```ts
 * trySectionPeakShearStress(Number.NaN, rectangle({ width: 1, depth: 1 })).ok; // false
 * ```
 */
export function trySectionPeakShearStress(shear: number, section: Section, options?: SectionStressOptions): Result<ShearStressPoint> {
  return attempt(() => sectionPeakShearStress(shear, section, options));
}

/**
 * The bending stresses at the points of a section from the section module where a linear
 * stress field can be extreme (polygon corners, the points of circles and arcs along the stress
 * gradient, sector centres, fillet corners) that lie on the boundary of its material (a corner
 * where parts meet inside the section, with material all round it, is left out), under moments about both axes, with the most
 * tensile and most compressive: the exact extremes over the section. The general formula of
 * `bendingStressPlane` (Boresi and Schmidt, Advanced Mechanics of Materials, 6th ed., Sec. 7.2,
 * from memory) on the section's I_z, I_y and I_yz. Points are relative to the centroid. For a
 * multi-material section the stresses are those of the transformed section: multiply by the
 * part's modular ratio (see {@link sectionPartStresses}).
 *
 * @param moments - M_z (positive sagging) and M_y (force x length).
 * @param section - The section.
 * @param options - Reference modulus.
 * @returns The stresses at the candidate points on the boundary (solid parts' points only).
 * @throws FlexuraError the section module's codes, `product-moment-too-large`, `not-a-number` / `not-finite`.
 * @example
 * ```ts
 * sectionCornerStresses({ momentZ: 8e6, momentY: 0 }, angleSection).tension; // the corner furthest below the tilted neutral axis
 * ```
 */
export function sectionCornerStresses(moments: BiaxialMoments, section: Section, options?: SectionStressOptions): CornerStresses {
  const props = sectionProperties(section, options);
  const plane = bendingStressPlane(moments, props);
  const candidates = section.parts.filter((p) => p.hole !== true).flatMap((p) => candidatePoints(p, plane.perY, plane.perZ));
  const points = onBoundary(section, candidates).map((p) => ({ y: p.y - props.centroid.y, z: p.z - props.centroid.z }));
  return cornerStresses(moments, props, points);
}

/**
 * Non-throwing form of {@link sectionCornerStresses}.
 *
 * @example
 * ```ts
 * trySectionCornerStresses({ momentZ: 1, momentY: 0 }, { parts: [] }).ok; // false
 * ```
 */
export function trySectionCornerStresses(moments: BiaxialMoments, section: Section, options?: SectionStressOptions): Result<CornerStresses> {
  return attempt(() => sectionCornerStresses(moments, section, options));
}
