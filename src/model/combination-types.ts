// The typed model's load cases, combinations and check groups, and what the analysis reports of
// them. The vocabulary is the typed API's (flexura/combine, flexura/check): a case is a LoadCase, a
// written-out combination is a Combination, the pattern options are PatternOptions.
import type { CaseCategory, Combination, CombinationPurpose, LoadCase, PatternOptions, PresetName, PresetOptions } from "../combine/index.js";
import type { ModelDiagram } from "./analysis.js";
import type { ModelDeflectionLimit } from "./model.js";

export type { CaseCategory, Combination, CombinationPurpose, LoadCase, PatternOptions, PresetName, PresetOptions };

/** A standard's preset in a model's `combinations`: its name and options (see `presetCombinations`). */
export interface ModelPresetCombinations {
  /** The preset, for example `"asce7-16-strength"`. */
  readonly preset: PresetName;
  /** Its options (the cases' own names in `map`). */
  readonly options?: PresetOptions;
}

/** One entry of a model's `combinations`: a preset, or one combination written out (factors dimensionless). */
export type ModelCombinationEntry = ModelPresetCombinations | Combination;

/** The member's own weight as a dead case: the section's area times `unitWeight`. */
export interface ModelSelfWeight {
  /** The name of the dead case (default `"self-weight"` in a model file). */
  readonly case: string;
  /** Weight per volume, in the model's force unit per length unit cubed (kN/m^3 by default). */
  readonly unitWeight: number;
}

/**
 * Which combinations a check group takes: every combination of one purpose (`"strength"`,
 * `"allowable-stress"`, `"serviceability"`), or a list of combination names.
 */
export type ModelCombinationSelection = CombinationPurpose | readonly string[];

/** Stress checks on chosen combinations, against allowable stresses in the model's stress unit. */
export interface ModelStressGroup {
  /** The group's name in the utilisation table. */
  readonly name: string;
  /** The combinations checked. */
  readonly combinations: ModelCombinationSelection;
  /** Allowable extreme-fibre bending stress magnitude, in the stress unit. */
  readonly bendingStress?: number;
  /** Allowable shear stress magnitude, in the stress unit. */
  readonly shearStress?: number;
}

/** Deflection checks of a group of cases against its own limit. Exactly one of `factors` and `combinations`. */
export interface ModelDeflectionGroup {
  /** The group's name in the utilisation table, for example `"live"`. */
  readonly name: string;
  /** The cases and their factors, for example `{ "L": 1 }`. */
  readonly factors?: Readonly<Record<string, number>>;
  /** Or: the combinations of the group. */
  readonly combinations?: ModelCombinationSelection;
  /** The limit (span / n, or a length in the deflection unit), or several. `span/N` applies to a cantilever as its own length / N. */
  readonly limit: ModelDeflectionLimit | readonly ModelDeflectionLimit[];
}

/** The check groups of a model. */
export interface ModelCheckGroups {
  /** Stress checks on chosen combinations. */
  readonly stress?: readonly ModelStressGroup[];
  /** Deflection checks per group of cases. */
  readonly deflection?: readonly ModelDeflectionGroup[];
}

/** A value of an envelope and the arrangement (combination and pattern) that gives it. */
export interface ModelGoverningExtreme {
  /** The value, in the quantity's unit. */
  readonly value: number;
  /** Where it occurs, in the length unit. */
  readonly at: number;
  /** The governing combination with its pattern, for example `"1.2D + 1.6L, L on span 1"`. */
  readonly combination: string;
}

/** One bound of an envelope as exact pieces, with the arrangement governing each piece. */
export interface ModelEnvelopeBound {
  /** The bound, exact polynomial pieces in the model's units. */
  readonly diagram: ModelDiagram;
  /** For each piece of `diagram`, the governing combination and pattern. */
  readonly governing: readonly string[];
  /** The largest value of the upper bound, or the smallest of the lower, with its governing combination. */
  readonly peak: ModelGoverningExtreme;
}

/** Upper and lower envelopes of one diagram. */
export interface ModelEnvelope {
  /** The largest value at every x over the combinations and patterns. */
  readonly upper: ModelEnvelopeBound;
  /** The smallest value at every x. */
  readonly lower: ModelEnvelopeBound;
}

/** A reaction's largest or smallest value and its governing combination. */
export interface ModelGoverningReaction {
  /** The value, in the force or moment unit. */
  readonly value: number;
  /** The governing combination with its pattern. */
  readonly combination: string;
}

/** The largest and smallest value of one reaction component, each with its governing combination. */
export interface ModelReactionRange {
  /** The largest value. */
  readonly max: ModelGoverningReaction;
  /** The smallest value (for a force, negative is uplift). */
  readonly min: ModelGoverningReaction;
}

/** The envelopes of the four diagrams. */
export interface ModelEnvelopes {
  /** Shear force, in the force unit. */
  readonly shear: ModelEnvelope;
  /** Bending moment (sagging positive), in the moment unit. */
  readonly moment: ModelEnvelope;
  /** Slope (counterclockwise positive), in the rotation unit. */
  readonly slope: ModelEnvelope;
  /** Deflection (upward positive), in the deflection unit. */
  readonly deflection: ModelEnvelope;
}

/** The envelope of one support's reaction. */
export interface ModelReactionEnvelope {
  /** Index of the support in `model.supports`. */
  readonly support: number;
  /** Position, in the length unit. */
  readonly at: number;
  /** Largest upward force (`max`) and largest downward (`min`; negative is uplift), in the force unit. */
  readonly force: ModelReactionRange;
  /** Largest and smallest moment, in the moment unit. */
  readonly moment: ModelReactionRange;
}

/** One check of a row of the utilisation table, at its worst over the patterns, in the model's units. */
export interface ModelCombinationCheck {
  /** What is checked. */
  readonly kind: "deflection" | "bending-tension" | "bending-compression" | "shear-stress";
  /** A short description, for example `"deflection, span 1 (x = 0 to 6)"` (positions in the length unit). */
  readonly description: string;
  /** The demand (a magnitude), in `unit`. */
  readonly demand: number;
  /** The limit (a magnitude), in `unit`. */
  readonly capacity: number;
  /** The unit of `demand` and `capacity`. */
  readonly unit: string;
  /** demand / capacity. */
  readonly utilisation: number;
  /** True when demand <= capacity. */
  readonly pass: boolean;
  /** Where the demand occurs, in the length unit. */
  readonly at: number;
  /** The governing pattern in words (`"L on span 1"`); empty without a patterned case. */
  readonly pattern: string;
}

/** One row of the utilisation table: one combination of one check group. */
export interface ModelCombinationCheckRow {
  /** The group's name. */
  readonly group: string;
  /** The kind of group. */
  readonly groupKind: "stress" | "deflection";
  /** The combination's name. */
  readonly combination: string;
  /** The combination's clause, for a preset's. */
  readonly clause?: string;
  /** Each check at its worst over the patterns. */
  readonly checks: readonly ModelCombinationCheck[];
  /** The index in `checks` of the governing check. */
  readonly governing: number;
  /** The governing utilisation. */
  readonly utilisation: number;
  /** True when every check passes. */
  readonly pass: boolean;
}

/** What the analysis found over the model's combinations, in the model's units. */
export interface ModelCombinationResults {
  /** The load cases (the self-weight case included). */
  readonly cases: readonly LoadCase[];
  /** Every combination applied, in order, with its purpose, clause and factors: what the report prints. */
  readonly combinations: readonly Combination[];
  /** Plain sentences from the presets: options taken, categories left out, psi factors used. */
  readonly notes: readonly string[];
  /** How many arrangements (combinations times patterns) the envelopes cover. */
  readonly arrangements: number;
  /** Envelopes of shear, moment, slope and deflection over every combination and pattern; absent when the model has no combinations (check groups of cases alone). */
  readonly envelopes?: ModelEnvelopes;
  /** Reaction envelopes, in the order of `model.supports`; absent when the model has no combinations. */
  readonly reactions?: readonly ModelReactionEnvelope[];
  /** The utilisation table of the check groups (empty without `checkGroups`). */
  readonly checks: readonly ModelCombinationCheckRow[];
  /** The index in `checks` of the governing row; absent when there are no rows. */
  readonly governing?: number;
  /** True when every row passes; absent when there are no rows. */
  readonly pass?: boolean;
}
