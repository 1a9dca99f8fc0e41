/**
 * The typed model that `parseModel` returns: the JSON model file checked, with defaults
 * filled in, every quantity converted to a plain number in the model's own units, and the
 * JSON `type` tags renamed to `kind` (a JSON `"moment"` load becomes a `"couple"`).
 */

import type { LoadCase, ModelCheckGroups, ModelCombinationEntry, ModelSelfWeight, PatternOptions } from "./combination-types.js";
import type { ModelSection } from "./section-types.js";

/** The model-file format version this release writes and reads. */
export const MODEL_FORMAT_VERSION = 1;

/**
 * The unit in which each kind of quantity of a model is given (plain numbers in the file) and
 * reported (every result of `analyzeModel`). Names are unit expressions that
 * `parseQuantity` understands, such as `"kN"`, `"kN*m"` or `"mm^4"`.
 */
export interface ModelUnits {
  /** Positions along the member and the member length (default `"m"`). */
  readonly length: string;
  /** Point loads, shear and reactions (default `"kN"`). */
  readonly force: string;
  /** Applied couples, bending moments and moment reactions (default force times length, `"kN*m"`). */
  readonly moment: string;
  /** Distributed-load intensities (default force per length, `"kN/m"`). */
  readonly forcePerLength: string;
  /** Deflections and support settlements (default `"mm"`). */
  readonly deflection: string;
  /** Slopes and support rotations (default `"rad"`). */
  readonly rotation: string;
  /** Bending and shear stresses, allowable stresses (default `"MPa"`). */
  readonly stress: string;
  /** Modulus of elasticity E (default: the stress unit). */
  readonly modulus: string;
  /** Cross-section dimensions and fibre positions y (default `"mm"`). */
  readonly sectionLength: string;
  /** Cross-section areas (default section length squared, `"mm^2"`). */
  readonly area: string;
  /** Second moments of area I (default section length to the fourth, `"mm^4"`). */
  readonly secondMoment: string;
  /** Elastic section moduli (default section length cubed, `"mm^3"`). */
  readonly sectionModulus: string;
  /** Translational spring stiffness of a support (default force per length, `"kN/m"`). */
  readonly translationalStiffness: string;
  /** Rotational spring stiffness of a support (default moment per radian, `"kN*m/rad"`). */
  readonly rotationalStiffness: string;
}

/** Which kind of quantity a field of a model holds; the keys of {@link ModelUnits}. */
export type ModelQuantityKind = keyof ModelUnits;

/**
 * A support of the member. `at` is in the model's length unit, measured from the left end.
 * `settlement` (deflection unit) is positive downward; `rotation` (rotation unit) is a
 * prescribed rotation, positive counterclockwise, for supports that restrain rotation.
 */
export interface ModelSupport {
  /**
   * `pin` and `roller` restrain deflection; `fixed` restrains deflection and rotation; `guided`
   * restrains rotation only; `spring` restrains deflection with `stiffness` and, optionally,
   * rotation with `rotationalStiffness`.
   */
  readonly kind: "pin" | "roller" | "fixed" | "guided" | "spring";
  /** Position from the left end, in the length unit. */
  readonly at: number;
  /** Translational spring stiffness (translational-stiffness unit); springs only. */
  readonly stiffness?: number;
  /** Rotational spring stiffness (rotational-stiffness unit); springs only. */
  readonly rotationalStiffness?: number;
  /** Prescribed settlement, positive downward, in the deflection unit. */
  readonly settlement?: number;
  /** Prescribed rotation, positive counterclockwise, in the rotation unit. */
  readonly rotation?: number;
}

/** A point force: `value` (force unit) positive downward, at `at` (length unit). */
export interface ModelPointLoad {
  /** Tag. */
  readonly kind: "point";
  /** Position from the left end, in the length unit. */
  readonly at: number;
  /** Force, positive downward, in the force unit. */
  readonly value: number;
  /** The load case it belongs to, if named. */
  readonly case?: string;
}

/** An applied couple (JSON `"moment"`): `value` (moment unit) positive counterclockwise. */
export interface ModelCoupleLoad {
  /** Tag. */
  readonly kind: "couple";
  /** Position from the left end, in the length unit. */
  readonly at: number;
  /** Couple, positive counterclockwise, in the moment unit. */
  readonly value: number;
  /** The load case it belongs to, if named. */
  readonly case?: string;
}

/**
 * A distributed load varying linearly from `start` at `from` to `end` at `to` (force per length,
 * positive downward).
 */
export interface ModelDistributedLoad {
  /** Tag. */
  readonly kind: "distributed";
  /** Where it starts, in the length unit (default 0). */
  readonly from: number;
  /** Where it ends, in the length unit (default the member length). */
  readonly to: number;
  /** Intensity at `from`, positive downward, in the force-per-length unit. */
  readonly start: number;
  /** Intensity at `to`, positive downward, in the force-per-length unit (default `start`). */
  readonly end: number;
  /** The load case it belongs to, if named. */
  readonly case?: string;
}

/** Any load of a model. */
export type ModelLoad = ModelPointLoad | ModelCoupleLoad | ModelDistributedLoad;

/** A stretch of constant stiffness of a stepped member, positions in the length unit. */
export interface ModelSegment {
  /** Where it starts, in the length unit. */
  readonly from: number;
  /** Where it ends, in the length unit. */
  readonly to: number;
  /** Modulus of elasticity, in the modulus unit. */
  readonly E: number;
  /** Second moment of area, in the second-moment unit. */
  readonly I: number;
}

/**
 * The deflection limit: a fraction of the span (`"span/360"` is `{ kind: "ratio", ratio: 360 }`)
 * or a fixed length in the deflection unit.
 */
export type ModelDeflectionLimit =
  | {
      /** Tag: the limit is span / ratio. */
      readonly kind: "ratio";
      /** The divisor, such as 360 for span/360. */
      readonly ratio: number;
    }
  | {
      /** Tag: the limit is a fixed length. */
      readonly kind: "length";
      /** The limit, in the deflection unit. */
      readonly value: number;
    };

/** Limits the member is checked against; each is optional. */
export interface ModelLimits {
  /** Largest allowed deflection magnitude. */
  readonly deflection?: ModelDeflectionLimit;
  /** Allowable extreme-fibre bending stress magnitude, in the stress unit. */
  readonly bendingStress?: number;
  /** Allowable shear stress magnitude, in the stress unit. */
  readonly shearStress?: number;
}

/** The material of a section: modulus of elasticity and, optionally, a name and yield strength. */
export interface ModelMaterial {
  /** A label for reports. */
  readonly name?: string;
  /** Modulus of elasticity, in the modulus unit. */
  readonly E: number;
  /** Yield strength, in the stress unit. */
  readonly yieldStrength?: number;
}

/**
 * A checked model with every quantity a plain number in its own {@link ModelUnits}.
 * Stiffness comes from exactly one of: `I` (with `E` or `material.E`), `segments`, or `section`
 * (its I_z, with `E` or `material.E`).
 */
export interface Model {
  /** The format version (always {@link MODEL_FORMAT_VERSION} after parsing). */
  readonly format: number;
  /** A label for reports. */
  readonly name?: string;
  /** A longer description for reports. */
  readonly description?: string;
  /** The units of every plain number, with defaults filled in. */
  readonly units: ModelUnits;
  /** Member length, in the length unit. */
  readonly length: number;
  /** Modulus of elasticity of the whole member, in the modulus unit. */
  readonly E?: number;
  /** Second moment of area of the whole member, in the second-moment unit. */
  readonly I?: number;
  /** Stretches of constant stiffness for a stepped member. */
  readonly segments?: readonly ModelSegment[];
  /** The cross-section, for properties, stresses and (when `I` is absent) stiffness. */
  readonly section?: ModelSection;
  /** The material of the section. */
  readonly material?: ModelMaterial;
  /** The supports, in the order given. */
  readonly supports: readonly ModelSupport[];
  /** Positions of internal hinges, in the length unit. */
  readonly hinges: readonly number[];
  /** The loads, in the order given; all act together with factor 1 in the main results, and by case in the combinations. */
  readonly loads: readonly ModelLoad[];
  /** Limits to check against (the loads all acting with factor 1). */
  readonly limits: ModelLimits;
  /** The load cases; each load names its case (`case`). Needed for `combinations` and `checkGroups`. */
  readonly cases?: readonly LoadCase[];
  /** The case that holds the supports' settlements and prescribed rotations. */
  readonly settlementCase?: string;
  /** The member's own weight as a dead case (needs a `section`). */
  readonly selfWeight?: ModelSelfWeight;
  /** Presets and combinations written out; the analysis envelopes them all. */
  readonly combinations?: readonly ModelCombinationEntry[];
  /** The pattern search of patterned cases. */
  readonly patterns?: PatternOptions;
  /** Checks per combination: stress groups and deflection groups. */
  readonly checkGroups?: ModelCheckGroups;
}
