import type { LoadCase, ModelCombinationEntry, ModelCombinationSelection, PatternOptions } from "./combination-types.js";
import type { ModelFileMaterial, ModelFileSection } from "./file-section.js";

/**
 * A quantity in a model file: a plain number in the model's unit for that kind of quantity, or a
 * string with its own unit such as `"3.5 m"`, `"29000 ksi"` or `"5000 kN/m"`.
 */
export type ModelQuantity = number | string;

/** The `units` block of a model file; every field is optional (see `ModelUnits` for defaults). */
export interface ModelFileUnits {
  /** A preset for every field not given: `"siKilonewtonMetre"`, `"usKipFoot"`, ... */
  readonly system?: "siNewtonMetre" | "siKilonewtonMetre" | "siNewtonMillimetre" | "usKipFoot" | "usKipInch";
  /** Positions and member length (default `"m"`). */
  readonly length?: string;
  /** Point loads, reactions, shear (default `"kN"`). */
  readonly force?: string;
  /** Applied moments, bending moments (default force*length). */
  readonly moment?: string;
  /** Distributed loads (default force/length). */
  readonly forcePerLength?: string;
  /** Deflections, settlements (default `"mm"`). */
  readonly deflection?: string;
  /** Slopes, prescribed rotations (default `"rad"`). */
  readonly rotation?: string;
  /** Stresses (default `"MPa"`). */
  readonly stress?: string;
  /** Modulus of elasticity (default the stress unit). */
  readonly modulus?: string;
  /** Section dimensions (default `"mm"`). */
  readonly sectionLength?: string;
  /** Section areas (default sectionLength^2). */
  readonly area?: string;
  /** Second moments of area (default sectionLength^4). */
  readonly secondMoment?: string;
  /** Section moduli (default sectionLength^3). */
  readonly sectionModulus?: string;
  /** Spring stiffness (default force/length). */
  readonly translationalStiffness?: string;
  /** Rotational spring stiffness (default moment/rad). */
  readonly rotationalStiffness?: string;
}

/** A support as written in a model file (`type` rather than `kind`). */
export interface ModelFileSupport {
  /** Position from the left end. */
  readonly at: ModelQuantity;
  /** `pin`, `roller`, `fixed`, `guided` or `spring`. */
  readonly type: "pin" | "roller" | "fixed" | "guided" | "spring";
  /** Spring stiffness against deflection (springs only). */
  readonly stiffness?: ModelQuantity;
  /** Spring stiffness against rotation (springs only). */
  readonly rotationalStiffness?: ModelQuantity;
  /** Prescribed settlement, positive downward. */
  readonly settlement?: ModelQuantity;
  /** Prescribed rotation, positive counterclockwise (fixed and guided only). */
  readonly rotation?: ModelQuantity;
}

/** A load as written in a model file: `"moment"` is an applied couple, positive counterclockwise. */
export type ModelFileLoad =
  | {
      /** Tag. */
      readonly type: "point" | "moment";
      /** Position from the left end. */
      readonly at: ModelQuantity;
      /** Force (positive downward) or couple (positive counterclockwise). */
      readonly value: ModelQuantity;
      /** Load case name. */
      readonly case?: string;
    }
  | {
      /** Tag. */
      readonly type: "distributed";
      /** Where it starts (default 0). */
      readonly from?: ModelQuantity;
      /** Where it ends (default the member length). */
      readonly to?: ModelQuantity;
      /** Intensity at `from`, positive downward. */
      readonly start: ModelQuantity;
      /** Intensity at `to` (default `start`). */
      readonly end?: ModelQuantity;
      /** Load case name. */
      readonly case?: string;
    };

/**
 * A model file as JSON, the input of `parseModel` (see docs/model-format.md and the schema
 * `flexura/schema.json`).
 */
export interface ModelFile {
  /** The schema, for editors. */
  readonly $schema?: string;
  /** Format version (default 1). */
  readonly format?: number;
  /** A label. */
  readonly name?: string;
  /** A longer description. */
  readonly description?: string;
  /** Units of plain numbers. */
  readonly units?: ModelFileUnits;
  /** Member length. */
  readonly length: ModelQuantity;
  /** Modulus of elasticity. */
  readonly E?: ModelQuantity;
  /** Second moment of area. */
  readonly I?: ModelQuantity;
  /** Stretches of constant stiffness. */
  readonly segments?: readonly {
    /** Start. */
    readonly from: ModelQuantity;
    /** End. */
    readonly to: ModelQuantity;
    /** Modulus of elasticity (default the model's). */
    readonly E?: ModelQuantity;
    /** Second moment of area. */
    readonly I: ModelQuantity;
  }[];
  /** A standard shape and its dimensions, such as `{ "shape": "rectangle", "width": 90, "depth": 240 }`. */
  readonly section?: ModelFileSection;
  /** The section's material. */
  readonly material?: ModelFileMaterial;
  /** Supports. */
  readonly supports: readonly ModelFileSupport[];
  /** Internal hinge positions. */
  readonly hinges?: readonly ModelQuantity[];
  /** Loads. */
  readonly loads?: readonly ModelFileLoad[];
  /** Limits: deflection `"span/360"` or a length; allowable stresses. */
  readonly limits?: {
    /** `"span/360"` or a length. */
    readonly deflection?: ModelQuantity;
    /** Allowable bending stress. */
    readonly bendingStress?: ModelQuantity;
    /** Allowable shear stress. */
    readonly shearStress?: ModelQuantity;
  };
  /** The load cases; each load names its case in `case`. */
  readonly cases?: readonly LoadCase[];
  /** The case holding the supports' settlements and prescribed rotations. */
  readonly settlementCase?: string;
  /** The member's own weight as a dead case (needs a section). */
  readonly selfWeight?: {
    /** The case's name (default `"self-weight"`). */
    readonly case?: string;
    /** Weight per volume, such as `"77 kN/m^3"` (a plain number: force unit per length unit cubed). */
    readonly unitWeight: ModelQuantity;
  };
  /** Presets `{ preset, options }` and combinations `{ name, purpose, factors }`. */
  readonly combinations?: readonly ModelCombinationEntry[];
  /** The pattern search: `{ cap }`. */
  readonly patterns?: PatternOptions;
  /** Checks per combination. */
  readonly checkGroups?: {
    /** Stress groups. */
    readonly stress?: readonly {
      /** The group's name. */
      readonly name: string;
      /** A purpose, or a list of combination names. */
      readonly combinations: ModelCombinationSelection;
      /** Allowable bending stress. */
      readonly bendingStress?: ModelQuantity;
      /** Allowable shear stress. */
      readonly shearStress?: ModelQuantity;
    }[];
    /** Deflection groups. */
    readonly deflection?: readonly {
      /** The group's name. */
      readonly name: string;
      /** The cases and their factors. */
      readonly factors?: Readonly<Record<string, number>>;
      /** Or a purpose, or a list of combination names. */
      readonly combinations?: ModelCombinationSelection;
      /** `"span/360"`, a length, or a list of them. */
      readonly limit: ModelQuantity | readonly ModelQuantity[];
    }[];
  };
}
