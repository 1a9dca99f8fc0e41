/**
 * Fibre positions of the extreme fibres, as y coordinates measured up from the centroid
 * (length): `top` is zero or above (>= 0), `bottom` zero or below (<= 0). The section
 * module's `extremes` object fits this shape.
 */
export interface FibreExtremes {
  /** y of the topmost fibre above the centroid (length, >= 0). */
  readonly top: number;
  /** y of the bottommost fibre, measured up from the centroid (length, <= 0). */
  readonly bottom: number;
}

/**
 * What the flexure formula needs from a section bent about its horizontal centroidal axis z.
 * A section-properties object from the section module fits this shape.
 */
export interface BendingProperties {
  /** Second moment of area about the horizontal centroidal axis, I_z = integral of y^2 dA (length^4, > 0). */
  readonly secondMomentZ: number;
  /**
   * Extreme fibres, when known; a fibre outside them is reported as `fibre-outside-section`.
   * Required by the functions that look for the extreme stresses.
   */
  readonly extremes?: FibreExtremes;
}

/**
 * A section's properties with its extreme fibres, for the functions that return extreme stresses.
 */
export interface BendingPropertiesWithExtremes extends BendingProperties {
  /** Extreme fibres relative to the centroid (length). */
  readonly extremes: FibreExtremes;
}

/**
 * The second moments needed for bending about both axes of a section that may be unsymmetric.
 * A section-properties object from the section module fits this shape.
 */
export interface UnsymmetricBendingProperties {
  /** I_z = integral of y^2 dA about the centroid (length^4, > 0). */
  readonly secondMomentZ: number;
  /** I_y = integral of z^2 dA about the centroid (length^4, > 0). */
  readonly secondMomentY: number;
  /** Product of area I_yz = integral of y z dA about the centroid (length^4, any sign). */
  readonly productMoment: number;
}

/** A point of the section plane: y up and z horizontal, measured from the centroid (length). */
export interface FibrePoint {
  /** Vertical coordinate, up from the centroid (length). */
  readonly y: number;
  /** Horizontal coordinate from the centroid (length). */
  readonly z: number;
}

/** Which extreme fibre a result refers to. */
export type ExtremeFibre = "top" | "bottom";

/** The bending stress at one fibre. */
export interface FibreStress {
  /** Which extreme fibre. */
  readonly fibre: ExtremeFibre;
  /** y of the fibre, up from the centroid (length). */
  readonly y: number;
  /** Normal stress there (force / length^2), tension positive. */
  readonly stress: number;
}
