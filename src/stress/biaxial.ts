import { IssueCollector, attempt, requireFinite, type Result } from "../errors/index.js";
import type { FibrePoint, UnsymmetricBendingProperties } from "./types.js";
import { checkSecondMoment } from "./validate.js";

/**
 * Bending moments about both centroidal axes of a section.
 *
 * Axes: x along the member (left to right), y up, z = x cross y (right-handed: z points toward
 * someone looking at the member's elevation with x running to the right). Moments are vectors
 * acting on the face whose outward normal is +x, positive by the right-hand rule.
 */
export interface BiaxialMoments {
  /**
   * M_z about the horizontal axis z (force x length); positive sagging (compression at the top),
   * the same sign as the beam results' bending moment.
   */
  readonly momentZ: number;
  /**
   * M_y about the vertical axis y (force x length); positive when it puts the +z side in tension
   * (for a section with I_yz = 0, sigma = +M_y z / I_y).
   */
  readonly momentY: number;
}

/** The linear stress field sigma = perY * y + perZ * z over a section (force / length^3 each). */
export interface StressPlane {
  /** d sigma / d y (force / length^3). */
  readonly perY: number;
  /** d sigma / d z (force / length^3). */
  readonly perZ: number;
}

function validate(moments: BiaxialMoments, section: UnsymmetricBendingProperties, found: IssueCollector): void {
  requireFinite(found, moments.momentZ, ["moments", "momentZ"], "moment about z");
  requireFinite(found, moments.momentY, ["moments", "momentY"], "moment about y");
  const iz = checkSecondMoment(found, section.secondMomentZ, ["section", "secondMomentZ"], "second moment of area about z");
  const iy = checkSecondMoment(found, section.secondMomentY, ["section", "secondMomentY"], "second moment of area about y");
  const iyz = requireFinite(found, section.productMoment, ["section", "productMoment"], "product of area I_yz");
  if (iz && iy && iyz) {
    const det = section.secondMomentY * section.secondMomentZ - section.productMoment * section.productMoment;
    if (!(det > 1e-12 * section.secondMomentY * section.secondMomentZ)) {
      found.add(
        "product-moment-too-large",
        ["section", "productMoment"],
        `I_y I_z - I_yz^2 must be above zero (got ${det}): check the section properties.`,
        { determinant: det },
      );
    }
  }
}

/**
 * The stress plane of unsymmetric (biaxial) bending:
 * sigma = -[(M_z I_y + M_y I_yz) y - (M_y I_z + M_z I_yz) z] / (I_y I_z - I_yz^2).
 *
 * Derived from sigma linear in y and z with zero axial force and the moment conditions
 * M_z = -integral y sigma dA and M_y = +integral z sigma dA in the axes of {@link BiaxialMoments}.
 * It is the generalised flexure formula for unsymmetrical bending, e.g. Boresi and Schmidt,
 * Advanced Mechanics of Materials, 6th ed., Sec. 7.2 (from memory), there with its own axis letters.
 *
 * @param moments - M_z (positive sagging) and M_y (force x length).
 * @param section - I_z, I_y (length^4, > 0) and I_yz (length^4) about the centroid.
 * @returns Stress gradients per unit y and per unit z (force / length^3).
 * @throws FlexuraError `second-moment-not-positive`, `product-moment-too-large`, `not-a-number` / `not-finite`.
 * @example
 * ```ts
 * bendingStressPlane({ momentZ: 1e6, momentY: 0 }, { secondMomentZ: 1e6, secondMomentY: 5e5, productMoment: 0 });
 * // { perY: -1, perZ: 0 }
 * ```
 */
export function bendingStressPlane(moments: BiaxialMoments, section: UnsymmetricBendingProperties): StressPlane {
  const found = new IssueCollector();
  validate(moments, section, found);
  found.throwIfAny();
  return plane(moments, section);
}

/**
 * Non-throwing form of {@link bendingStressPlane}.
 *
 * @example
 * ```ts
 * tryBendingStressPlane({ momentZ: 1, momentY: 0 }, { secondMomentZ: 1, secondMomentY: 0, productMoment: 0 }).ok; // false
 * ```
 */
export function tryBendingStressPlane(moments: BiaxialMoments, section: UnsymmetricBendingProperties): Result<StressPlane> {
  return attempt(() => bendingStressPlane(moments, section));
}

function plane(m: BiaxialMoments, s: UnsymmetricBendingProperties): StressPlane {
  const det = s.secondMomentY * s.secondMomentZ - s.productMoment * s.productMoment;
  const perY = -(m.momentZ * s.secondMomentY + m.momentY * s.productMoment) / det;
  const perZ = (m.momentY * s.secondMomentZ + m.momentZ * s.productMoment) / det;
  return { perY: perY === 0 ? 0 : perY, perZ: perZ === 0 ? 0 : perZ };
}

function evaluate(p: StressPlane, point: FibrePoint): number {
  const s = p.perY * point.y + p.perZ * point.z;
  return s === 0 ? 0 : s;
}

/**
 * Bending stress at a point of a section under moments about both axes, for any section
 * (the product of area I_yz need not be zero): the general formula of {@link bendingStressPlane}.
 * With I_yz = 0 and M_y = 0 it reduces to sigma = -M_z y / I_z.
 *
 * @param moments - M_z (positive sagging) and M_y (force x length).
 * @param point - Where, as { y, z } from the centroid (length).
 * @param section - I_z, I_y, I_yz about the centroid (length^4).
 * @returns Normal stress (force / length^2), tension positive.
 * @throws FlexuraError `second-moment-not-positive`, `product-moment-too-large`, `not-a-number` / `not-finite`.
 * @example
 * ```ts
 * biaxialBendingStress({ momentZ: 1e6, momentY: 2e5 }, { y: -50, z: 20 }, { secondMomentZ: 1e6, secondMomentY: 4e5, productMoment: 0 });
 * // 50 + 10 = 60
 * ```
 */
export function biaxialBendingStress(moments: BiaxialMoments, point: FibrePoint, section: UnsymmetricBendingProperties): number {
  const found = new IssueCollector();
  validate(moments, section, found);
  requireFinite(found, point.y, ["point", "y"], "point's y");
  requireFinite(found, point.z, ["point", "z"], "point's z");
  found.throwIfAny();
  return evaluate(plane(moments, section), point);
}

/**
 * Non-throwing form of {@link biaxialBendingStress}.
 *
 * @example
 * ```ts
 * tryBiaxialBendingStress({ momentZ: 1, momentY: 0 }, { y: 0, z: 0 }, { secondMomentZ: 1, secondMomentY: 1, productMoment: 1 }).ok; // false
 * ```
 */
export function tryBiaxialBendingStress(moments: BiaxialMoments, point: FibrePoint, section: UnsymmetricBendingProperties): Result<number> {
  return attempt(() => biaxialBendingStress(moments, point, section));
}

/** The neutral axis of a section in bending: the line through the centroid where sigma = 0. */
export interface NeutralAxis {
  /** Tag. */
  readonly kind: "neutral-axis";
  /**
   * Angle of the neutral axis measured from the +z axis toward the +y axis (radians), in
   * (-pi/2, pi/2]. Zero for a symmetric section under M_z alone.
   */
  readonly angle: number;
  /** Unit vector along the neutral axis, { y, z }, with z >= 0. */
  readonly direction: FibrePoint;
}

/**
 * The neutral axis under moments about both axes. Setting the general bending stress to zero,
 * the axis satisfies (M_z I_y + M_y I_yz) y = (M_y I_z + M_z I_yz) z, so under M_z alone
 * tan(angle) = I_yz / I_y: an unsymmetric section (an angle, a Z) bent by a vertical load has a
 * tilted neutral axis. Source: as {@link bendingStressPlane}.
 *
 * @param moments - M_z and M_y (force x length).
 * @param section - I_z, I_y, I_yz about the centroid (length^4).
 * @returns The neutral axis, or `null` when both moments are zero (no neutral axis).
 * @throws FlexuraError `second-moment-not-positive`, `product-moment-too-large`, `not-a-number` / `not-finite`.
 * @example
 * ```ts
 * neutralAxis({ momentZ: 1, momentY: 0 }, { secondMomentZ: 2, secondMomentY: 1, productMoment: 1 })?.angle; // pi/4
 * ```
 */
export function neutralAxis(moments: BiaxialMoments, section: UnsymmetricBendingProperties): NeutralAxis | null {
  const p = bendingStressPlane(moments, section);
  if (p.perY === 0 && p.perZ === 0) return null;
  // sigma = perY y + perZ z = 0 along direction (z, y) = (perY, -perZ)
  let dz = p.perY;
  let dy = -p.perZ;
  if (dz < 0 || (dz === 0 && dy < 0)) {
    dz = -dz;
    dy = -dy;
  }
  const length = Math.hypot(dz, dy);
  const angle = Math.atan2(dy, dz);
  return { kind: "neutral-axis", angle: angle === 0 ? 0 : angle, direction: { y: dy / length + 0, z: dz / length + 0 } };
}

/**
 * Non-throwing form of {@link neutralAxis}.
 *
 * @example
 * ```ts
 * tryNeutralAxis({ momentZ: 1, momentY: 0 }, { secondMomentZ: -1, secondMomentY: 1, productMoment: 0 }).ok; // false
 * ```
 */
export function tryNeutralAxis(moments: BiaxialMoments, section: UnsymmetricBendingProperties): Result<NeutralAxis | null> {
  return attempt(() => neutralAxis(moments, section));
}
