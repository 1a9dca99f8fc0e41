import { IssueCollector, attempt, requireFinite, type Result } from "../errors/index.js";
import { bendingStressPlane, type BiaxialMoments } from "./biaxial.js";
import type { FibrePoint, UnsymmetricBendingProperties } from "./types.js";

/** The stress at one candidate point (a corner) of a section. */
export interface PointStress {
  /** Index of the point in the list given. */
  readonly index: number;
  /** The point, { y, z } from the centroid (length). */
  readonly point: FibrePoint;
  /** Normal stress there (force / length^2), tension positive. */
  readonly stress: number;
}

/** Bending stresses at a section's corners, with the most tensile and most compressive. */
export interface CornerStresses {
  /** Tag. */
  readonly kind: "corner-stresses";
  /** The stress at every point given, in order. */
  readonly points: readonly PointStress[];
  /** The point with the greatest stress (the first such, on ties). */
  readonly tension: PointStress;
  /** The point with the least stress (the first such, on ties). */
  readonly compression: PointStress;
}

/**
 * Bending stresses at the corners of a section under moments about both axes. The stress is
 * linear over the section, so on a polygonal section its extremes lie at corners: give every
 * vertex of the section's outline (relative to the centroid) and the result names the most
 * tensile and most compressive. The stress comes from the general formula of
 * {@link bendingStressPlane} (Boresi and Schmidt, Advanced Mechanics of Materials, 6th ed.,
 * Sec. 7.2, from memory).
 *
 * @param moments - M_z (positive sagging) and M_y (force x length).
 * @param section - I_z, I_y, I_yz about the centroid (length^4).
 * @param corners - At least one point { y, z } from the centroid (length).
 * @returns Stresses at every point (force / length^2), tension positive.
 * @throws FlexuraError `no-corners`, `second-moment-not-positive`, `product-moment-too-large`,
 *   `not-a-number` / `not-finite`.
 * @example
 * ```ts
 * const r = cornerStresses({ momentZ: 1e6, momentY: 0 }, { secondMomentZ: 1e6, secondMomentY: 1e6, productMoment: 0 },
 *   [{ y: 10, z: 0 }, { y: -20, z: 5 }]);
 * r.tension.index; // 1 (stress 20)
 * ```
 */
export function cornerStresses(moments: BiaxialMoments, section: UnsymmetricBendingProperties, corners: readonly FibrePoint[]): CornerStresses {
  const found = new IssueCollector();
  if (corners.length === 0) found.add("no-corners", ["corners"], "Give at least one point of the section at which to find the stress.");
  corners.forEach((c, i) => {
    requireFinite(found, c.y, ["corners", i, "y"], "corner's y");
    requireFinite(found, c.z, ["corners", i, "z"], "corner's z");
  });
  found.throwIfAny();
  const p = bendingStressPlane(moments, section);
  const points = corners.map((point, index): PointStress => {
    const s = p.perY * point.y + p.perZ * point.z;
    return { index, point: { y: point.y, z: point.z }, stress: s === 0 ? 0 : s };
  });
  let tension = points[0] as PointStress;
  let compression = tension;
  for (const q of points) {
    if (q.stress > tension.stress) tension = q;
    if (q.stress < compression.stress) compression = q;
  }
  return { kind: "corner-stresses", points, tension, compression };
}

/**
 * Non-throwing form of {@link cornerStresses}.
 *
 * @example
 * ```ts
 * tryCornerStresses({ momentZ: 1, momentY: 0 }, { secondMomentZ: 1, secondMomentY: 1, productMoment: 0 }, []).ok; // false
 * ```
 */
export function tryCornerStresses(moments: BiaxialMoments, section: UnsymmetricBendingProperties, corners: readonly FibrePoint[]): Result<CornerStresses> {
  return attempt(() => cornerStresses(moments, section, corners));
}
