import { IssueCollector, attempt, requireFinite, type Result } from "../errors/index.js";
import { connectedPieces, sectionProperties, type Section, type SectionPropertiesOptions } from "../section/index.js";
import { bendingStressPlane, type BiaxialMoments } from "./biaxial.js";
import { cornerStresses, type CornerStresses } from "./corners.js";
import { checkPointsPerBand, profilePoints } from "./shear-peak.js";
import { decorate, sectionCut, sectionPeak, sectionPointAt } from "./section-shear.js";
import type { ShearStressPoint, ShearStressProfile } from "./shear-profile.js";
import { onBoundary } from "./section-boundary.js";
import { candidatePoints } from "./section-points.js";
import { checkFibreInside } from "./validate.js";

/**
 * Records `section-not-connected` when the section is in more than one piece (see
 * `connectedPieces`): shear passes between separate pieces only through connectors the section
 * does not describe, so V Q / (I b) holds at no cut that the pieces share, and a gap between
 * them would read as zero stress.
 */
function checkConnected(found: IssueCollector, section: Section): void {
  if (section.parts.length < 2) return;
  const pieces = connectedPieces(section);
  if (pieces.length < 2) return;
  const list = pieces.map((p) => `[${p.join(", ")}]`).join(", ");
  found.add(
    "section-not-connected",
    ["parts"],
    `The section is in ${pieces.length} separate pieces (parts ${list}): shear passes between pieces only through connectors the section does not describe, so no shear stress is given. Make the parts meet along an edge, or find the shear stress in each piece as a section of its own.`,
    { pieces: pieces.map((p) => [...p]) },
  );
}

/** Options of the functions that take a section from the section module. */
export interface SectionStressOptions extends SectionPropertiesOptions {
  /** Points per band between consecutive level heights in a shear profile (>= 1), for plotting (the peak does not depend on them); 16 when omitted. */
  readonly pointsPerBand?: number;
}

/**
 * Shear stress tau = V Q / (I_z b) at a horizontal cut of a section from the section module,
 * with Q and b from its `firstMomentAbove` (the narrower side at a step) and I_z from its
 * `sectionProperties`. Source: Roark's Formulas for Stress and Strain, 8th ed., Sec. 8.1 (from
 * memory). For several materials, by the transformed section (Gere and Goodno, Mechanics of
 * Materials, Sec. 6.3, from memory): `stress` is V Q* / (I* b*), b* = sum of n_i b_i the
 * transformed width of the cut, the stress in the reference material; `materials` gives each
 * material's own, tau_i = n_i V Q* / (I* b*).
 *
 * @param shear - Shear force V (force).
 * @param section - The section.
 * @param y - Height of the cut, up from the section's (transformed) centroid (length).
 * @param options - Reference modulus for a multi-material section.
 * @returns The stress with Q and b.
 * @throws FlexuraError the section module's codes, `section-not-connected` (parts in separate pieces, see `connectedPieces`), `fibre-outside-section`, `not-a-number` / `not-finite`.
 * @example
 * ```ts
 * sectionShearStressAt(30e3, rectangle({ width: 100, depth: 200 }), 0).stress; // 2.25 = 1.5 V / A
 * ```
 */
export function sectionShearStressAt(shear: number, section: Section, y: number, options?: SectionStressOptions): ShearStressPoint {
  const props = sectionProperties(section, options);
  const found = new IssueCollector();
  checkConnected(found, section);
  requireFinite(found, shear, ["shear"], "shear force");
  if (requireFinite(found, y, ["y"], "cut height y")) checkFibreInside(found, y, props.extremes.top, props.extremes.bottom, ["y"]);
  found.throwIfAny();
  return sectionPointAt(shear, sectionCut(section, props, options), y);
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
 * @throws FlexuraError the section module's codes, `section-not-connected` (parts in separate pieces, see `connectedPieces`), `points-per-band-invalid`, `not-a-number` / `not-finite`.
 * @example
 * ```ts
 * sectionShearStressProfile(1e4, circle({ diameter: 60 })).peak.stress; // 4 V / (3 A)
 * ```
 */
export function sectionShearStressProfile(shear: number, section: Section, options?: SectionStressOptions): ShearStressProfile {
  const props = sectionProperties(section, options);
  const found = new IssueCollector();
  checkConnected(found, section);
  requireFinite(found, shear, ["shear"], "shear force");
  const perBand = checkPointsPerBand(found, options?.pointsPerBand);
  found.throwIfAny();
  const cut = sectionCut(section, props, options);
  const points = profilePoints(shear, cut.source, props.secondMomentZ, perBand).map((p, i, all) => decorate(cut, p, i > 0 && all[i - 1]!.y === p.y ? "above" : i + 1 < all.length && all[i + 1]!.y === p.y ? "below" : undefined));
  return { kind: "shear-stress-profile", points, peak: sectionPeak(shear, cut) };
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
 * {@link sectionShearStressProfile}. For several materials `stress` is the peak on the
 * transformed section (in the reference material) and `materials` each material's own peak,
 * tau_i = n_i V Q* / (I* b*), over the heights of its parts: check each against its own allowable.
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
  checkConnected(found, section);
  requireFinite(found, shear, ["shear"], "shear force");
  checkPointsPerBand(found, options?.pointsPerBand);
  found.throwIfAny();
  return sectionPeak(shear, sectionCut(section, props, options));
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
