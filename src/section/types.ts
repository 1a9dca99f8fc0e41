/**
 * A point in the section plane, as an object with named coordinates: `y` is up, `z` is
 * horizontal (to the right when the section is viewed as drawn). Length units are whatever
 * consistent unit the caller uses (for example mm or in).
 *
 * @example
 * ```ts
 * const topRight: SectionPoint = { y: 150, z: 50 };
 * ```
 */
export interface SectionPoint {
  /** Vertical coordinate, positive up (length). */
  readonly y: number;
  /** Horizontal coordinate, positive to the right (length). */
  readonly z: number;
}

/**
 * The material of a part: what a multi-material (transformed) section needs.
 *
 * @example
 * ```ts
 * const steel: Material = { name: "steel", elasticModulus: 200_000, yieldStrength: 350 }; // MPa
 * ```
 */
export interface Material {
  /** A label for reports; not used in any calculation. */
  readonly name?: string;
  /** Modulus of elasticity E (force per area), > 0. */
  readonly elasticModulus: number;
  /** Yield strength (force per area), > 0 when given. */
  readonly yieldStrength?: number;
}

/**
 * A simple polygon given by its corner points in order, either winding (it is normalised to
 * counterclockwise). Do not repeat the first point at the end (a repeated closing point is
 * dropped). Self-intersecting polygons are refused.
 *
 * @example
 * ```ts
 * const plate: PolygonPart = {
 *   kind: "polygon",
 *   points: [{ y: 0, z: 0 }, { y: 0, z: 200 }, { y: 20, z: 200 }, { y: 20, z: 0 }],
 * };
 * ```
 */
export interface PolygonPart {
  /** Tag. */
  readonly kind: "polygon";
  /** Corner points `{ y, z }` in order around the boundary (at least three, not repeated). */
  readonly points: readonly SectionPoint[];
  /** True for a hole: its area is taken away from the solid part it lies in. */
  readonly hole?: boolean;
  /** The part's material; omit on every part for a section of one material. */
  readonly material?: Material;
}

/**
 * A full circle (a solid bar, or with `hole: true` a round hole), exact.
 *
 * @example
 * ```ts
 * const bolt: CirclePart = { kind: "circle", centre: { y: 0, z: 0 }, radius: 10, hole: true };
 * ```
 */
export interface CirclePart {
  /** Tag. */
  readonly kind: "circle";
  /** Centre `{ y, z }`. */
  readonly centre: SectionPoint;
  /** Radius (length), > 0. */
  readonly radius: number;
  /** True for a hole. */
  readonly hole?: boolean;
  /** The part's material. */
  readonly material?: Material;
}

/**
 * A circular sector (a pie slice; with a sweep of pi, a semicircle), exact. Angles are in
 * radians, measured counterclockwise from the +z axis towards the +y axis.
 *
 * @example
 * ```ts
 * // upper half of a 50 mm radius disc
 * const half: SectorPart = { kind: "sector", centre: { y: 0, z: 0 }, radius: 50, startAngle: 0, sweep: Math.PI };
 * ```
 */
export interface SectorPart {
  /** Tag. */
  readonly kind: "sector";
  /** Centre of the circle the sector is cut from. */
  readonly centre: SectionPoint;
  /** Radius (length), > 0. */
  readonly radius: number;
  /** Angle of the first straight edge (radians, counterclockwise from +z). */
  readonly startAngle: number;
  /** Angle swept counterclockwise from `startAngle` (radians), in (0, 2 pi]. */
  readonly sweep: number;
  /** True for a hole. */
  readonly hole?: boolean;
  /** The part's material. */
  readonly material?: Material;
}

/**
 * A fillet (spandrel), exact: the square of side `radius` with one corner at `corner` and
 * sides along the directions `orientation` and `orientation + pi/2`, less the quarter disc of
 * that radius centred on the square's opposite corner. It is the material a root fillet adds
 * in the re-entrant corner between a web and a flange; as a hole it rounds a convex corner.
 * `orientation` is in radians, counterclockwise from +z: 0 puts the fillet up and to the
 * right of `corner`.
 *
 * @example
 * ```ts
 * // root fillet of radius 12 where a web face (z = 5) meets the underside of a flange (y = 90)
 * const root: FilletPart = { kind: "fillet", corner: { y: 90, z: 5 }, radius: 12, orientation: -Math.PI / 2 };
 * ```
 */
export interface FilletPart {
  /** Tag. */
  readonly kind: "fillet";
  /** The corner the fillet fills. */
  readonly corner: SectionPoint;
  /** Fillet radius (length), > 0. */
  readonly radius: number;
  /** Direction of the first leg from `corner` (radians, counterclockwise from +z); the second leg is a quarter turn further. */
  readonly orientation: number;
  /** True for a hole (rounds off a convex corner of a solid). */
  readonly hole?: boolean;
  /** The part's material. */
  readonly material?: Material;
}

/** Any part of a section, tagged by `kind`. */
export type SectionPart = PolygonPart | CirclePart | SectorPart | FilletPart;

/**
 * A cross-section: readonly data, a list of parts. Solid parts must not overlap one another;
 * holes must lie inside solid parts and not overlap one another. Build one with
 * {@link section} (which checks it) or any shape function.
 *
 * @example
 * ```ts
 * const s: Section = section([{ kind: "circle", centre: { y: 0, z: 0 }, radius: 25 }]);
 * ```
 */
export interface Section {
  /** The parts, in the order given. */
  readonly parts: readonly SectionPart[];
}

/**
 * An axis-aligned box in absolute section coordinates (length).
 *
 * @example
 * ```ts
 * const box: BoundingBox = { zMin: -50, zMax: 50, yMin: -100, yMax: 100 };
 * ```
 */
export interface BoundingBox {
  /** Leftmost z. */
  readonly zMin: number;
  /** Rightmost z. */
  readonly zMax: number;
  /** Lowest y. */
  readonly yMin: number;
  /** Highest y. */
  readonly yMax: number;
}
