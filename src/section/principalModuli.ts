// Section moduli and radii of gyration about the principal axes: what bending about an inclined
// principal axis (an angle, a Z) needs. Extreme fibres come from the exact boundary (corners and arcs).
import { attempt, type Result } from "../errors/index.js";
import { ARC, STRIDE } from "./edges.js";
import { prepareSection } from "./prepare.js";
import { sectionProperties } from "./properties.js";
import type { SectionPropertiesOptions } from "./propertyTypes.js";
import type { Section } from "./types.js";

/**
 * A pair of values on the two sides of a principal axis.
 *
 * @example
 * ```ts
 * const s: PrincipalSides = principalAxisProperties(angle({ verticalLeg: 100, thickness: 10 })).major.sectionModulus;
 * ```
 */
export interface PrincipalSides {
  /** On the side the axis's normal points to (see {@link PrincipalAxisProperties}). */
  readonly positive: number;
  /** On the other side. */
  readonly negative: number;
}

/**
 * Bending about one principal axis.
 *
 * @example
 * ```ts
 * const major: PrincipalBending = principalAxisProperties(angle({ verticalLeg: 100, thickness: 10 })).major;
 * ```
 */
export interface PrincipalBending {
  /** The principal second moment about this axis (length^4). */
  readonly secondMoment: number;
  /** sqrt(I / A) (length). */
  readonly radiusOfGyration: number;
  /**
   * Distances from the axis to the farthest fibre on each side (length, both > 0): `positive` on
   * the side the axis's normal points to (see {@link PrincipalAxisProperties}), `negative` on the other.
   */
  readonly extremes: PrincipalSides;
  /** I over each extreme distance (length^3): the elastic section moduli for bending about this axis. */
  readonly sectionModulus: PrincipalSides;
}

/**
 * Radii of gyration and elastic section moduli about the principal axes.
 *
 * The major axis runs along (cos theta, sin theta) in (z, y) from the centroid, theta = `angle`;
 * its normal, the direction of the "positive" side, is (-sin theta, cos theta) (up, for theta = 0).
 * The minor axis runs along that normal; its "positive" side is towards (cos theta, sin theta).
 *
 * @example
 * ```ts
 * const p: PrincipalAxisProperties = principalAxisProperties(angle({ verticalLeg: 100, horizontalLeg: 75, thickness: 8 }));
 * ```
 */
export interface PrincipalAxisProperties {
  /** Angle theta from +z to the major principal axis (radians, counterclockwise, in (-pi/2, pi/2]), as `principal.angle` of `sectionProperties`. */
  readonly angle: number;
  /** Bending about the major axis (I_max). */
  readonly major: PrincipalBending;
  /** Bending about the minor axis (I_min): for an angle, r_z of steel tables, the least radius of gyration. */
  readonly minor: PrincipalBending;
}

/** Largest of d . (p - c) over the solid boundary, exact for corners and circular arcs. */
function farthest(edges: Float64Array, sign: Float64Array, edgeStart: Int32Array, count: number, dz: number, dy: number, cz: number, cy: number): number {
  let best = -Infinity;
  for (let i = 0; i < count; i++) {
    if (sign[i]! < 0) continue;
    for (let e = edgeStart[i]!; e < edgeStart[i + 1]!; e++) {
      const o = e * STRIDE;
      if (edges[o] === ARC) {
        const zc = edges[o + 1]! - cz, yc = edges[o + 2]! - cy, r = edges[o + 3]!;
        const a = Math.min(edges[o + 4]!, edges[o + 5]!);
        const b = Math.max(edges[o + 4]!, edges[o + 5]!);
        const centre = dz * zc + dy * yc;
        best = Math.max(best, centre + r * (dz * Math.cos(a) + dy * Math.sin(a)), centre + r * (dz * Math.cos(b) + dy * Math.sin(b)));
        const peak = Math.atan2(dy, dz);
        for (const phi of [peak - 2 * Math.PI, peak, peak + 2 * Math.PI]) if (phi >= a && phi <= b) best = Math.max(best, centre + r);
      } else {
        best = Math.max(best, dz * (edges[o + 1]! - cz) + dy * (edges[o + 2]! - cy), dz * (edges[o + 3]! - cz) + dy * (edges[o + 4]! - cy));
      }
    }
  }
  return best;
}

/**
 * The principal second moments with their radii of gyration sqrt(I / A) and elastic section
 * moduli I / c to the farthest fibre on each side of each principal axis, the fibres found
 * exactly on the boundary (corners, and the points of circular arcs farthest out). For a
 * multi-material section these are of the transformed section, as in {@link sectionProperties}.
 * Bending about an inclined principal axis (an angle, a Z) is what the minor radius of gyration
 * and these moduli describe; for a section symmetric about y they equal the z and y properties.
 *
 * @param section - The section.
 * @param options - Optional {@link SectionPropertiesOptions} (the reference modulus).
 * @throws FlexuraError any code of {@link sectionProperties}.
 * @example
 * ```ts
 * const p = principalAxisProperties(angle({ verticalLeg: 100, thickness: 10 }));
 * p.minor.radiusOfGyration; // the least radius of gyration, about the axis through the heel's diagonal
 * ```
 */
export function principalAxisProperties(section: Section, options?: SectionPropertiesOptions): PrincipalAxisProperties {
  const props = sectionProperties(section, options);
  const p = prepareSection(section);
  const cz = props.centroid.z - p.refZ;
  const cy = props.centroid.y - p.refY;
  const theta = props.principal.angle;
  const c = Math.cos(theta), s = Math.sin(theta);
  const far = (dz: number, dy: number): number => farthest(p.edges, p.sign, p.edgeStart, p.count, dz, dy, cz, cy);
  const bending = (moment: number, dz: number, dy: number): PrincipalBending => {
    const positive = far(dz, dy);
    const negative = far(-dz, -dy);
    return Object.freeze({
      secondMoment: moment,
      radiusOfGyration: Math.sqrt(moment / props.area),
      extremes: Object.freeze({ positive, negative }),
      sectionModulus: Object.freeze({ positive: moment / positive, negative: moment / negative }),
    });
  };
  return Object.freeze({ angle: theta, major: bending(props.principal.major, -s, c), minor: bending(props.principal.minor, c, s) });
}

/**
 * The non-throwing form of {@link principalAxisProperties}.
 *
 * @example
 * ```ts
 * const r = tryPrincipalAxisProperties({ parts: [] });
 * if (!r.ok) console.log(r.error.code); // "section-empty"
 * ```
 */
export function tryPrincipalAxisProperties(section: Section, options?: SectionPropertiesOptions): Result<PrincipalAxisProperties> {
  return attempt(() => principalAxisProperties(section, options));
}
