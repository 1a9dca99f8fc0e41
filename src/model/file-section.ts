// The `section` of a model file as JSON: what `parseModel` reads and `modelToJson` writes.
import type { ModelQuantity } from "./file.js";
import type { ModelShapeName } from "./section-types.js";

/** A material as written in a model file. */
export interface ModelFileMaterial {
  /** A label. */
  readonly name?: string;
  /** Modulus of elasticity. */
  readonly E: ModelQuantity;
  /** Yield strength. */
  readonly yieldStrength?: ModelQuantity;
}

/** A standard shape as written in a model file: its name and its dimensions. */
export interface ModelFileShapeSection {
  /** The shape: `"rectangle"`, `"circle"`, `"pipe"`, `"i-section"`, `"tee"`, `"channel"`, `"angle"`, `"rectangular-hollow"`. */
  readonly shape: ModelShapeName;
  /** Its dimensions by name (see docs/model-format.md), in the section-length unit or with units. */
  readonly [dimension: string]: ModelQuantity;
}

/** A plate girder as written in a model file. */
export interface ModelFilePlateGirderSection {
  /** Tag. */
  readonly shape: "plate-girder";
  /** Top flange plate. */
  readonly topFlange: {
    /** Width across the member. */
    readonly width: ModelQuantity;
    /** Thickness. */
    readonly thickness: ModelQuantity;
  };
  /** Web plate. */
  readonly web: {
    /** Depth between the flanges. */
    readonly depth: ModelQuantity;
    /** Thickness. */
    readonly thickness: ModelQuantity;
  };
  /** Bottom flange plate (default the top one). */
  readonly bottomFlange?: {
    /** Width across the member. */
    readonly width: ModelQuantity;
    /** Thickness. */
    readonly thickness: ModelQuantity;
  };
}

/** A point `{ y, z }` of the section plane as written in a model file. */
export interface ModelFilePoint {
  /** Height, positive up. */
  readonly y: ModelQuantity;
  /** Horizontal position. */
  readonly z: ModelQuantity;
}

/** What every part of a built-up section may carry besides its geometry. */
export interface ModelFilePartCommon {
  /** True for a hole. */
  readonly hole?: boolean;
  /** The part's own material. */
  readonly material?: ModelFileMaterial;
  /** Its modular ratio to the model's material, instead of `material`. */
  readonly modularRatio?: number;
  /** Allowable bending stress in this part. */
  readonly bendingStress?: ModelQuantity;
  /** Allowable shear stress in this part. */
  readonly shearStress?: ModelQuantity;
}

/** A part of a built-up section as written in a model file (angles in the rotation unit or with units). */
export type ModelFileSectionPart = ModelFilePartCommon &
  (
    | {
        /** Tag. */
        readonly type: "polygon";
        /** Corners in order. */
        readonly points: readonly ModelFilePoint[];
      }
    | {
        /** Tag. */
        readonly type: "circle";
        /** Centre. */
        readonly centre: ModelFilePoint;
        /** Radius. */
        readonly radius: ModelQuantity;
      }
    | {
        /** Tag. */
        readonly type: "sector";
        /** Centre. */
        readonly centre: ModelFilePoint;
        /** Radius. */
        readonly radius: ModelQuantity;
        /** Angle of the first edge. */
        readonly startAngle: ModelQuantity;
        /** Angle swept counterclockwise. */
        readonly sweep: ModelQuantity;
      }
    | {
        /** Tag. */
        readonly type: "fillet";
        /** The corner it fills. */
        readonly corner: ModelFilePoint;
        /** Radius. */
        readonly radius: ModelQuantity;
        /** Direction of the first leg. */
        readonly orientation: ModelQuantity;
      }
  );

/** A built-up section as written in a model file. */
export interface ModelFileBuiltUpSection {
  /** Tag. */
  readonly shape: "built-up";
  /** Its parts. */
  readonly parts: readonly ModelFileSectionPart[];
}

/** A section as written in a model file: a standard shape, a plate girder or a built-up section. */
export type ModelFileSection = ModelFileShapeSection | ModelFilePlateGirderSection | ModelFileBuiltUpSection;
