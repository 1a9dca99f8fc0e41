// The typed cross-section of a model: what `parseModel` makes of a file's `section`.
import type { ModelMaterial } from "./model.js";

/** The names of the standard shapes given by named dimensions (see {@link ModelShapeSection}). */
export type ModelShapeName = "rectangle" | "circle" | "pipe" | "i-section" | "tee" | "channel" | "angle" | "rectangular-hollow";

/**
 * A standard shape given by its named dimensions, each in the section-length unit: `shape` names
 * the builder of the section module (`"rectangle"`, `"i-section"`, `"channel"`, ...);
 * `dimensions` holds its dimensions exactly as written in the file, converted to numbers.
 */
export interface ModelShapeSection {
  /** The shape's name as written in the model file, such as `"i-section"`. */
  readonly shape: ModelShapeName;
  /** The shape's dimensions by name, in the section-length unit. */
  readonly dimensions: Readonly<Record<string, number>>;
}

/** One plate of a plate girder's flange, in the section-length unit. */
export interface ModelPlate {
  /** Plate width across the member (section-length unit, > 0). */
  readonly width: number;
  /** Plate thickness (section-length unit, > 0). */
  readonly thickness: number;
}

/** A plate girder's web plate, in the section-length unit. */
export interface ModelWebPlate {
  /** Depth of the web between the flanges (section-length unit, > 0). */
  readonly depth: number;
  /** Web thickness (section-length unit, > 0). */
  readonly thickness: number;
}

/** A welded plate girder from its plates; the web is centred under the flanges. */
export interface ModelPlateGirderSection {
  /** Tag. */
  readonly shape: "plate-girder";
  /** The top flange plate. */
  readonly topFlange: ModelPlate;
  /** The web plate. */
  readonly web: ModelWebPlate;
  /** The bottom flange plate; the top flange's when absent. */
  readonly bottomFlange?: ModelPlate;
}

/** A point of the section plane, in the section-length unit: `y` up, `z` horizontal. */
export interface ModelSectionPoint {
  /** Height, positive up (section-length unit). */
  readonly y: number;
  /** Horizontal position (section-length unit). */
  readonly z: number;
}

/** What every part of a built-up section may carry besides its geometry. */
interface ModelPartCommon {
  /** True for a hole (taken away from the solid it lies in). */
  readonly hole: boolean;
  /** The part's own material (its E in the modulus unit), when it differs from the model's. */
  readonly material?: ModelMaterial;
  /** The part's modular ratio n = E_part / E of the model's material, when given instead of `material`. */
  readonly modularRatio?: number;
  /**
   * Allowable bending stress in this part (stress unit), checked against its own peak stress
   * n M y / I_z in a section of several materials; parts of the model's material default to
   * `limits.bendingStress`.
   */
  readonly bendingStress?: number;
  /**
   * Allowable shear stress in this part (stress unit), checked against its own peak shear stress
   * n |V| Q* / (I* b*) in a section of several materials; parts of the model's material default
   * to `limits.shearStress`.
   */
  readonly shearStress?: number;
}

/** A simple polygon, corners in order (either winding), in the section-length unit. */
export interface ModelPolygonPart extends ModelPartCommon {
  /** Tag. */
  readonly kind: "polygon";
  /** The corners, at least three, not repeated. */
  readonly points: readonly ModelSectionPoint[];
}

/** A full circle. */
export interface ModelCirclePart extends ModelPartCommon {
  /** Tag. */
  readonly kind: "circle";
  /** Its centre. */
  readonly centre: ModelSectionPoint;
  /** Its radius (section-length unit, > 0). */
  readonly radius: number;
}

/** A circular sector; angles in the rotation unit, counterclockwise from the +z axis towards +y. */
export interface ModelSectorPart extends ModelPartCommon {
  /** Tag. */
  readonly kind: "sector";
  /** Centre of the circle it is cut from. */
  readonly centre: ModelSectionPoint;
  /** Radius (section-length unit, > 0). */
  readonly radius: number;
  /** Angle of the first straight edge (rotation unit). */
  readonly startAngle: number;
  /** Angle swept counterclockwise (rotation unit, more than 0, at most a full turn). */
  readonly sweep: number;
}

/**
 * A fillet: the square of side `radius` with a corner at `corner`, legs along `orientation` and a
 * quarter turn further, less the quarter disc centred on the opposite corner (as in the section module).
 */
export interface ModelFilletPart extends ModelPartCommon {
  /** Tag. */
  readonly kind: "fillet";
  /** The corner it fills. */
  readonly corner: ModelSectionPoint;
  /** Its radius (section-length unit, > 0). */
  readonly radius: number;
  /** Direction of its first leg (rotation unit, counterclockwise from +z). */
  readonly orientation: number;
}

/** Any part of a built-up section, tagged by `kind` (JSON `type`). */
export type ModelSectionPart = ModelPolygonPart | ModelCirclePart | ModelSectorPart | ModelFilletPart;

/**
 * A section built from parts (polygons, circles, sectors, fillets; solids and holes), possibly
 * of several materials: a part with `material` or `modularRatio` differs from the model's
 * material, which every other solid part has and to which the section is transformed.
 */
export interface ModelBuiltUpSection {
  /** Tag. */
  readonly shape: "built-up";
  /** The parts, in the order given. */
  readonly parts: readonly ModelSectionPart[];
}

/**
 * A model's cross-section: a standard shape by its dimensions, a plate girder by its plates, or a
 * built-up section by its parts; every length in the section-length unit.
 */
export type ModelSection = ModelShapeSection | ModelPlateGirderSection | ModelBuiltUpSection;
