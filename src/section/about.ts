import { IssueCollector, attempt, requireFinite, type Result } from "../errors/index.js";
import { sectionProperties } from "./properties.js";
import type { SectionPropertiesOptions } from "./propertyTypes.js";
import type { Section, SectionPoint } from "./types.js";

/**
 * Second moments of area about axes through a given point, parallel to z and y.
 *
 * @example
 * ```ts
 * const m: SecondMomentsAbout = secondMomentAbout(rectangle({ width: 100, depth: 200 }), { y: -100, z: 0 });
 * ```
 */
export interface SecondMomentsAbout {
  /** Integral of (y - point.y)^2 dA: about the horizontal axis through the point (length^4). */
  readonly secondMomentZ: number;
  /** Integral of (z - point.z)^2 dA: about the vertical axis through the point (length^4). */
  readonly secondMomentY: number;
  /** Integral of (y - point.y)(z - point.z) dA (length^4). */
  readonly productMoment: number;
}

/**
 * Second moments of area (transformed, for multi-material sections) about the horizontal and
 * vertical axes through `point`, by the parallel-axis theorem I = I_c + A d^2 (Gere and
 * Goodno, Mechanics of Materials, chapter 12: parallel-axis theorem).
 *
 * @param section - The section.
 * @param point - The point `{ y, z }` the axes pass through (absolute coordinates).
 * @param options - Optional {@link SectionPropertiesOptions}.
 * @throws FlexuraError any code of `section()`; `not-a-number` / `not-finite` for the point;
 *   `reference-modulus-not-positive`.
 * @example
 * ```ts
 * // a 100 x 200 rectangle about its base: b d^3 / 3
 * secondMomentAbout(rectangle({ width: 100, depth: 200 }), { y: -100, z: 0 }).secondMomentZ; // 266.7e6
 * ```
 */
export function secondMomentAbout(section: Section, point: SectionPoint, options?: SectionPropertiesOptions): SecondMomentsAbout {
  const found = new IssueCollector();
  requireFinite(found, point?.y, ["point", "y"], "point's y coordinate");
  requireFinite(found, point?.z, ["point", "z"], "point's z coordinate");
  found.throwIfAny();
  const p = sectionProperties(section, options);
  const dy = p.centroid.y - point.y;
  const dz = p.centroid.z - point.z;
  return {
    secondMomentZ: p.secondMomentZ + p.area * dy * dy,
    secondMomentY: p.secondMomentY + p.area * dz * dz,
    productMoment: p.productMoment + p.area * dy * dz,
  };
}

/**
 * The non-throwing form of {@link secondMomentAbout}.
 *
 * @example
 * ```ts
 * const r = trySecondMomentAbout(rectangle({ width: 1, depth: 1 }), { y: Number.NaN, z: 0 }); // ok: false
 * ```
 */
export function trySecondMomentAbout(section: Section, point: SectionPoint, options?: SectionPropertiesOptions): Result<SecondMomentsAbout> {
  return attempt(() => secondMomentAbout(section, point, options));
}
