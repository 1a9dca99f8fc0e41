import type { BoundingBox, SectionPoint } from "./types.js";

/**
 * Options of {@link sectionProperties} and the other property functions.
 *
 * @example
 * ```ts
 * const opts: SectionPropertiesOptions = { referenceModulus: 200_000 };
 * ```
 */
export interface SectionPropertiesOptions {
  /**
   * Elastic modulus E_ref of the material the transformed section is expressed in (force per
   * area), > 0. Default: the modulus of the first solid part that has a material. Ignored for
   * the modular ratios when no part has a material (every part is then of the reference
   * material, n = 1).
   */
  readonly referenceModulus?: number;
}

/**
 * Principal second moments of area about the centroid.
 *
 * @example
 * ```ts
 * const { major, minor, angle: tilt } = sectionProperties(angle({ verticalLeg: 100, horizontalLeg: 75, thickness: 8 })).principal;
 * ```
 */
export interface PrincipalAxes {
  /** Greatest second moment about any centroidal axis (length^4). */
  readonly major: number;
  /** Least second moment about any centroidal axis (length^4). */
  readonly minor: number;
  /**
   * Angle from the +z axis to the major principal axis, in radians, counterclockwise positive
   * (from +z towards +y), in (-pi/2, pi/2]. Zero when the z axis is the major axis (an I-beam
   * in its usual orientation) and when every axis is principal (a circle).
   */
  readonly angle: number;
}

/**
 * Distances from the centroid to the extreme fibres, as signed coordinates relative to the
 * centroid (length): `top` > 0, `bottom` < 0, `right` > 0, `left` < 0.
 *
 * @example
 * ```ts
 * const c = sectionProperties(rectangle({ width: 100, depth: 200 })).extremes; // top 100, bottom -100
 * ```
 */
export interface ExtremeFibres {
  /** y of the highest fibre minus the centroid's y (> 0). */
  readonly top: number;
  /** y of the lowest fibre minus the centroid's y (< 0). */
  readonly bottom: number;
  /** z of the leftmost fibre minus the centroid's z (< 0). */
  readonly left: number;
  /** z of the rightmost fibre minus the centroid's z (> 0). */
  readonly right: number;
}

/**
 * Elastic section moduli, positive numbers (length^3): `top` = I_z / top, `bottom` = I_z / |bottom|
 * (bending about z), `left` = I_y / |left|, `right` = I_y / right (bending about y).
 *
 * @example
 * ```ts
 * const s = sectionProperties(rectangle({ width: 100, depth: 200 })).sectionModulus; // top = b d^2 / 6
 * ```
 */
export interface SectionModuli {
  /** I_z over the distance to the top fibre. */
  readonly top: number;
  /** I_z over the distance to the bottom fibre. */
  readonly bottom: number;
  /** I_y over the distance to the left fibre. */
  readonly left: number;
  /** I_y over the distance to the right fibre. */
  readonly right: number;
}

/**
 * What one part contributes, in the order of `section.parts`.
 *
 * @example
 * ```ts
 * const plate = translateSection(rectangle({ width: 10, depth: 20 }, { material: { elasticModulus: 200e3 } }), { y: 0, z: 30 });
 * const timber = rectangle({ width: 50, depth: 20 }, { material: { elasticModulus: 10e3 } });
 * sectionProperties(builtUp([timber, plate])).parts[1]?.modularRatio; // 20
 * ```
 */
export interface PartProperties {
  /** The part's own geometric area (positive, also for a hole; length^2). */
  readonly area: number;
  /**
   * n_i = E_i / E_ref: multiply the stress found on the transformed section by this to get the
   * stress in this part. 1 when no part has a material.
   */
  readonly modularRatio: number;
  /** True for a hole. */
  readonly hole: boolean;
  /** The part's extreme fibres relative to the section's centroid (as {@link ExtremeFibres}). */
  readonly extremes: ExtremeFibres;
}

/**
 * Radii of gyration (length).
 *
 * @example
 * ```ts
 * const r = sectionProperties(circle({ diameter: 40 })).radiusOfGyration; // y = z = 10
 * ```
 */
export interface RadiiOfGyration {
  /** sqrt(I_y / A), about the vertical centroidal axis. */
  readonly y: number;
  /** sqrt(I_z / A), about the horizontal centroidal axis. */
  readonly z: number;
}

/**
 * Transformed-section information for multi-material sections.
 *
 * @example
 * ```ts
 * const t = sectionProperties(rectangle({ width: 50, depth: 200 }, { material: { elasticModulus: 11_000 } }), { referenceModulus: 200_000 }).transformed;
 * ```
 */
export interface TransformedInfo {
  /** E_ref (force per area), or null when no part has a material and none was given. */
  readonly referenceModulus: number | null;
  /** n_i = E_i / E_ref for each part, in the order of `section.parts` (holes take their host's). */
  readonly modularRatios: readonly number[];
}

/**
 * Elastic properties of a section about its centroidal axes (z horizontal, y up). For a
 * multi-material section these are transformed-section properties in reference-material units.
 *
 * @example
 * ```ts
 * const p: SectionProperties = sectionProperties(iSection({ depth: 300, flangeWidth: 150, flangeThickness: 10, webThickness: 7 }));
 * ```
 */
export interface SectionProperties {
  /** Area A (length^2); transformed for multi-material sections. */
  readonly area: number;
  /** Centroid in absolute coordinates `{ y, z }` (length). */
  readonly centroid: SectionPoint;
  /** I_z = integral of y^2 dA about the centroidal z axis (horizontal): the strong axis of a beam as usually drawn (length^4). */
  readonly secondMomentZ: number;
  /** I_y = integral of z^2 dA about the centroidal y axis (vertical) (length^4). */
  readonly secondMomentY: number;
  /** I_yz = integral of y z dA about the centroid (length^4); zero when either axis is an axis of symmetry. */
  readonly productMoment: number;
  /** Principal second moments and the major axis angle. */
  readonly principal: PrincipalAxes;
  /** Extreme fibres relative to the centroid. */
  readonly extremes: ExtremeFibres;
  /** Elastic section moduli (positive). */
  readonly sectionModulus: SectionModuli;
  /** Radii of gyration about the centroidal axes. */
  readonly radiusOfGyration: RadiiOfGyration;
  /** Bounding box of the solid parts, absolute coordinates. */
  readonly boundingBox: BoundingBox;
  /** Reference modulus and modular ratios. */
  readonly transformed: TransformedInfo;
  /** Per-part area, modular ratio and extreme fibres. */
  readonly parts: readonly PartProperties[];
}
