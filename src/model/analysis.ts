import type { BeamSolution } from "../beam/index.js";
import type { Section } from "../section/index.js";
import type { ModelCombinationResults } from "./combination-types.js";
import type { Model, ModelUnits } from "./model.js";

/**
 * The results of `analyzeModel`, every value in the model's own {@link ModelUnits}
 * (repeated in `units` so that a reader of the JSON form knows them).
 *
 * Sign conventions: x from the left end; reactions positive upward (force) and counterclockwise
 * (moment); bending moment positive when sagging; shear V = dM/dx; slope positive
 * counterclockwise; deflection positive upward; stress positive in tension.
 */

/** An extreme value and where it occurs. */
export interface ModelExtreme {
  /** The value, in the unit of the quantity. */
  readonly value: number;
  /** Where it occurs, in the length unit from the left end. */
  readonly at: number;
}

/** The largest and smallest values of a quantity along the member. */
export interface ModelPeaks {
  /** The largest (most positive) value and its position. */
  readonly max: ModelExtreme;
  /** The smallest (most negative) value and its position. */
  readonly min: ModelExtreme;
}

/** The reaction at one support. */
export interface ModelReaction {
  /** Index of the support in `model.supports`. */
  readonly support: number;
  /** The support's kind. */
  readonly kind: "pin" | "roller" | "fixed" | "guided" | "spring";
  /** Position, in the length unit. */
  readonly at: number;
  /** Force, positive upward, in the force unit (0 where deflection is free). */
  readonly force: number;
  /** Moment, positive counterclockwise, in the moment unit (0 where rotation is free). */
  readonly moment: number;
}

/**
 * One polynomial piece of a diagram: on `from <= x <= to` (length unit) the value is
 * `sum coefficients[k] * (x - from)^k`, in the quantity's unit.
 */
export interface ModelDiagramPiece {
  /** Start of the piece, in the length unit. */
  readonly from: number;
  /** End of the piece, in the length unit. */
  readonly to: number;
  /** Coefficients in powers of (x - from), lowest first; x in the length unit. */
  readonly coefficients: readonly number[];
}

/** A quantity along the member as exact polynomial pieces, in the model's units. */
export interface ModelDiagram {
  /** The unit of the values. */
  readonly unit: string;
  /** Contiguous pieces from 0 to the member length, in order. */
  readonly pieces: readonly ModelDiagramPiece[];
}

/** Shear, moment, slope and deflection along the member, for plotting. */
export interface ModelDiagrams {
  /** Shear force, in the force unit. */
  readonly shear: ModelDiagram;
  /** Bending moment, positive sagging, in the moment unit. */
  readonly moment: ModelDiagram;
  /** Slope, positive counterclockwise, in the rotation unit. */
  readonly slope: ModelDiagram;
  /** Deflection, positive upward, in the deflection unit. */
  readonly deflection: ModelDiagram;
}

/** Properties of the model's cross-section, in the section units. */
export interface ModelSectionResult {
  /** The shape name from the model file. */
  readonly shape: string;
  /** Area, in the area unit; for a built-up section of several materials, transformed to the model's material. */
  readonly area: number;
  /** Centroid, in the section-length unit, in the shape's own coordinates (y up, z horizontal). */
  readonly centroid: {
    /** Vertical position of the centroid. */
    readonly y: number;
    /** Horizontal position of the centroid. */
    readonly z: number;
  };
  /**
   * Second moment about the horizontal centroidal axis (bending axis), in the second-moment unit;
   * for several materials, of the section transformed to the model's material (the stiffness is E I_z).
   */
  readonly secondMomentZ: number;
  /** Second moment about the vertical centroidal axis, in the second-moment unit. */
  readonly secondMomentY: number;
  /** Product moment of area I_yz = integral of y z dA about the centroidal axes, in the second-moment unit (any sign). */
  readonly productMoment: number;
  /**
   * The extreme fibres as y measured up from the centroid, in the section-length unit: `top`
   * (>= 0) and `bottom` (<= 0), as `sectionProperties(...).extremes` of the typed API.
   */
  readonly extremes: {
    /** y of the top fibre, up from the centroid (>= 0). */
    readonly top: number;
    /** y of the bottom fibre, up from the centroid (<= 0). */
    readonly bottom: number;
  };
  /** Elastic section moduli (positive), in the section-modulus unit: `top` = I_z / top, `bottom` = I_z / |bottom|. */
  readonly sectionModulus: {
    /** I_z over the distance to the top fibre. */
    readonly top: number;
    /** I_z over the distance to the bottom fibre. */
    readonly bottom: number;
  };
  /** @deprecated Use `productMoment` (same value); not in the JSON form. */
  readonly productMomentYZ: number;
  /** @deprecated Use `sectionModulus.top` (same value); not in the JSON form. */
  readonly sectionModulusTop: number;
  /** @deprecated Use `sectionModulus.bottom` (same value); not in the JSON form. */
  readonly sectionModulusBottom: number;
  /** @deprecated Use `extremes.top` (same value); not in the JSON form. */
  readonly yTop: number;
  /** @deprecated Use `-extremes.bottom` (a positive distance); not in the JSON form. */
  readonly yBottom: number;
}

/** The extreme bending stress and where it occurs, along the member and across the section. */
export interface ModelStressExtreme {
  /** Stress, positive in tension, in the stress unit. */
  readonly value: number;
  /** Position along the member, in the length unit. */
  readonly at: number;
  /** Fibre height above the centroid (negative below), in the section-length unit. */
  readonly y: number;
  /**
   * For a section of several materials: the index of the part (in `section.parts`) where the
   * stress occurs, sigma = -n M y / I_z with n the part's modular ratio. Absent for one material.
   */
  readonly part?: number;
}

/** The peak shear stress and where it occurs. */
export interface ModelShearStressExtreme {
  /** Shear stress magnitude, tau = |V| Q / (I_z b), in the stress unit (>= 0). */
  readonly value: number;
  /** Position along the member (where |V| is largest), in the length unit. */
  readonly at: number;
  /** Height of the cut where it acts, above the centroid (negative below), in the section-length unit. */
  readonly y: number;
}

/** The peak shear stress in one solid part of a section of several materials, over the part's own heights. */
export interface ModelPartShearStress extends ModelShearStressExtreme {
  /** The part's index in `section.parts`. */
  readonly part: number;
}

/** The largest tensile and compressive bending stress on the member. */
export interface ModelStress {
  /** Largest tension (a value >= 0). */
  readonly tension: ModelStressExtreme;
  /** Largest compression (a value <= 0). */
  readonly compression: ModelStressExtreme;
  /**
   * Largest shear stress magnitude and where it acts; absent when the shear force is zero
   * everywhere. For a section of several materials, the largest of the materials' own stresses
   * n |V| Q* / (I* b*) (transformed section), not the transformed section's.
   */
  readonly shear?: ModelShearStressExtreme;
  /** For a section of several materials: each solid part's own peak shear stress, by part index. */
  readonly shearByPart?: readonly ModelPartShearStress[];
}

/**
 * One check of the member against a limit of the model, as decided by the member-check module
 * (`checkMember` of `flexura/check`), re-expressed in the model's units.
 */
export interface ModelCheck {
  /**
   * What is checked: the deflection of one span or cantilever; the peak tensile or compressive
   * bending stress (each against the allowable bending stress); the peak shear stress.
   */
  readonly kind: "deflection" | "bending-tension" | "bending-compression" | "shear-stress";
  /** The demand (a magnitude), in `unit`. */
  readonly demand: number;
  /** The limit (a magnitude), in `unit`. */
  readonly capacity: number;
  /** demand / capacity; at most 1 to pass. */
  readonly utilisation: number;
  /** True when the demand does not exceed the capacity. */
  readonly pass: boolean;
  /** Where the demand occurs, in the length unit. */
  readonly at: number;
  /** The unit of `demand` and `capacity`. */
  readonly unit: string;
  /** A short plain description, such as "deflection of span 1 (0 to 4 m) against its length/360". */
  readonly description: string;
  /** Deflection checks: the index of the span or cantilever, left to right from 0. */
  readonly span?: number;
  /** Bending checks: the fibre where the stress occurs. */
  readonly fibre?: "top" | "bottom";
  /** Stress checks: the fibre or cut height above the centroid (negative below), in the section-length unit. */
  readonly y?: number;
  /** Checks of one part of a section of several materials: the part's index in `section.parts`. */
  readonly part?: number;
}

/** A caution about the model or its results that does not stop the analysis. */
export interface ModelWarning {
  /** Stable kebab-case code. */
  readonly code: string;
  /** Plain description. */
  readonly message: string;
}

/**
 * For each kind of quantity, how many SI base units one model unit holds:
 * `valueSI = valueInModelUnits * scale[kind]` (for example 1000 for a force in kN).
 */
export type ModelScale = { readonly [K in keyof ModelUnits]: number };

/**
 * The results an analysis and its JSON form share, value for value, in the model's units.
 */
export interface ModelResults {
  /** The units of every value below. */
  readonly units: ModelUnits;
  /** Reactions, in the order of `model.supports`. */
  readonly reactions: readonly ModelReaction[];
  /** Shear force peaks, in the force unit. */
  readonly shear: ModelPeaks;
  /** Bending moment peaks (positive sagging), in the moment unit. */
  readonly moment: ModelPeaks;
  /** Slope peaks (positive counterclockwise), in the rotation unit. */
  readonly slope: ModelPeaks;
  /** Deflection peaks (positive upward), in the deflection unit. */
  readonly deflection: ModelPeaks;
  /** Section properties, when the model has a section. */
  readonly section?: ModelSectionResult;
  /** Extreme bending stresses, when the model has a section. */
  readonly stress?: ModelStress;
  /** Checks against the model's limits (those that could be evaluated). */
  readonly checks: readonly ModelCheck[];
  /**
   * True when at least one check ran and every check passes, the checks per combination
   * (`combinations.checks`) included. False when a check fails, and when no limit and no check
   * group was given: with nothing checked there is no pass to claim.
   */
  readonly pass: boolean;
  /** Cases, combinations, envelopes and the checks per combination, when the model has `cases`. */
  readonly combinations?: ModelCombinationResults;
  /** Shear, moment, slope and deflection along the member, for plotting. */
  readonly diagrams: ModelDiagrams;
  /** Cautions about the model or its results. */
  readonly warnings: readonly ModelWarning[];
}

/** Everything `analyzeModel` found, in the model's units. */
export interface ModelAnalysis extends ModelResults {
  /** The model that was analysed. */
  readonly model: Model;
  /** SI base units per model unit, for each kind of quantity. */
  readonly scale: ModelScale;
  /**
   * The solver's own result, in SI base units (m, N, N*m, rad): `value / scale[kind]` gives model
   * units. Not part of the JSON form. Always set by `analyzeModel`; optional so that an analysis
   * built by hand (say, to test a report) need not carry one.
   */
  readonly solution?: BeamSolution;
  /**
   * The cross-section as built, in metres (y up, z horizontal), for drawing; present when the
   * model has a section. Divide coordinates by `scale.sectionLength` for the model's units. Not
   * part of the JSON form.
   */
  readonly sectionGeometry?: Section;
}
