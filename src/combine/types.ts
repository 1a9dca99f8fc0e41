/**
 * What a load case is, for the standards' combinations: `dead` (permanent), `live` (imposed
 * floor load), `roof-live`, `snow`, `rain`, `wind`, `seismic`, `crane`, or `user` (a case of the
 * user's own, which a preset covers only when the user maps it to one of the others).
 */
export type CaseCategory = "dead" | "live" | "roof-live" | "snow" | "rain" | "wind" | "seismic" | "crane" | "user";

/** Every {@link CaseCategory}, in a fixed order. */
export const CASE_CATEGORIES: readonly CaseCategory[] = Object.freeze(["dead", "live", "roof-live", "snow", "rain", "wind", "seismic", "crane", "user"]);

/**
 * A named load case. The loads of a member name their case in `Load.case`; a support settlement
 * or prescribed rotation belongs to the case named by `CaseSetInput.settlementCase`.
 *
 * @example
 * ```ts
 * const wind: LoadCase = { name: "W", category: "wind", reversible: true };
 * const live: LoadCase = { name: "L", category: "live", patterned: true };
 * ```
 */
export interface LoadCase {
  /** The name the loads carry in `case` (a load without one is in case `"default"`). */
  readonly name: string;
  /** What the case is, for presets. */
  readonly category: CaseCategory;
  /** Acts in both senses (wind, seismic): every combination that includes it is formed with `+` and `-` factors. */
  readonly reversible?: boolean;
  /** Applied span by span on members of more than one span (imposed floor load): each span's part is loaded or not in the patterns searched. */
  readonly patterned?: boolean;
}

/** What a combination is checked for. */
export type CombinationPurpose = "strength" | "allowable-stress" | "serviceability";

/**
 * One load combination: a factor per case (cases not named have factor 0).
 *
 * @example
 * ```ts
 * const c: Combination = { name: "1.2D + 1.6L", purpose: "strength", factors: { D: 1.2, L: 1.6 } };
 * ```
 */
export interface Combination {
  /** A name a user reads, for example `"1.2D + 1.6L + 0.5S"`. */
  readonly name: string;
  /** What the combination is checked for. */
  readonly purpose: CombinationPurpose;
  /** Load factor per case name (dimensionless, finite). A case not listed is not in the combination. */
  readonly factors: Readonly<Record<string, number>>;
  /** The clause of the standard the combination comes from, for a preset's rows (for example `"ASCE 7-16 2.3.1 (2)"`). */
  readonly clause?: string;
}
