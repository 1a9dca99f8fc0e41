import type { CaseCategory } from "./types.js";

/**
 * One term of a preset row: `factor` times the cases of one category, or of one of several
 * categories ("Lr or S or R": the row is formed once per category that the model has).
 */
export interface PresetTerm {
  /** The categories, one of which is taken at a time ("or"); a single category for a plain term. */
  readonly categories: readonly CaseCategory[];
  /** The load factor (dimensionless). */
  readonly factor: number;
  /** The factor this term takes under an option instead (the 0.5 L exception of ASCE 7-16 2.3.1). */
  readonly exceptionFactor?: number;
}

/** One row of a preset, as the standard prints it, with its clause. */
export interface PresetRow {
  /** The clause and the row's number in it, for example `"ASCE 7-16 2.3.1 (2)"`. */
  readonly clause: string;
  /** The terms; the categories of one term may be alternatives ("or"). */
  readonly terms: readonly PresetTerm[];
  /** The row applies only when the model has a case of this category (the seismic rows). */
  readonly requires?: CaseCategory;
}

const t = (factor: number, ...categories: CaseCategory[]): PresetTerm => Object.freeze({ categories: Object.freeze(categories), factor });
const tx = (factor: number, exceptionFactor: number, ...categories: CaseCategory[]): PresetTerm =>
  Object.freeze({ categories: Object.freeze(categories), factor, exceptionFactor });
const row = (clause: string, terms: PresetTerm[], requires?: CaseCategory): PresetRow =>
  Object.freeze(requires === undefined ? { clause, terms: Object.freeze(terms) } : { clause, terms: Object.freeze(terms), requires });
const LR_S_R: CaseCategory[] = ["roof-live", "snow", "rain"];

/**
 * ASCE 7-16 2.3.1, basic combinations for strength design (LRFD), and the seismic combinations
 * of 2.3.6 in the simplified form 1.0E (the horizontal and vertical seismic effects Eh and Ev
 * together in one seismic case). "L or 0.5W" in row (3) is two alternatives of one term set, held
 * here as two rows. `exceptionFactor` is the 0.5 on L of 2.3.1 Exception 1 (for occupancies with
 * L0 <= 100 psf other than garages and places of public assembly; 2.3.6 extends it to row 6).
 */
export const ASCE7_16_STRENGTH: readonly PresetRow[] = Object.freeze([
  row("ASCE 7-16 2.3.1 (1)", [t(1.4, "dead")]),
  row("ASCE 7-16 2.3.1 (2)", [t(1.2, "dead"), t(1.6, "live"), t(0.5, ...LR_S_R)]),
  row("ASCE 7-16 2.3.1 (3)", [t(1.2, "dead"), t(1.6, ...LR_S_R), tx(1.0, 0.5, "live")]),
  row("ASCE 7-16 2.3.1 (3)", [t(1.2, "dead"), t(1.6, ...LR_S_R), t(0.5, "wind")]),
  row("ASCE 7-16 2.3.1 (4)", [t(1.2, "dead"), t(1.0, "wind"), tx(1.0, 0.5, "live"), t(0.5, ...LR_S_R)]),
  row("ASCE 7-16 2.3.1 (5)", [t(0.9, "dead"), t(1.0, "wind")]),
  row("ASCE 7-16 2.3.6 (6)", [t(1.2, "dead"), t(1.0, "seismic"), tx(1.0, 0.5, "live"), t(0.2, "snow")], "seismic"),
  row("ASCE 7-16 2.3.6 (7)", [t(0.9, "dead"), t(1.0, "seismic")], "seismic"),
]);

/**
 * ASCE 7-16 2.4.1, basic combinations for allowable stress design, and the seismic combinations
 * of 2.4.5 with 0.7E (Eh and Ev in one seismic case; 0.75 x 0.7 = 0.525 in row 9).
 */
export const ASCE7_16_ALLOWABLE_STRESS: readonly PresetRow[] = Object.freeze([
  row("ASCE 7-16 2.4.1 (1)", [t(1.0, "dead")]),
  row("ASCE 7-16 2.4.1 (2)", [t(1.0, "dead"), t(1.0, "live")]),
  row("ASCE 7-16 2.4.1 (3)", [t(1.0, "dead"), t(1.0, ...LR_S_R)]),
  row("ASCE 7-16 2.4.1 (4)", [t(1.0, "dead"), t(0.75, "live"), t(0.75, ...LR_S_R)]),
  row("ASCE 7-16 2.4.1 (5)", [t(1.0, "dead"), t(0.6, "wind")]),
  row("ASCE 7-16 2.4.1 (6)", [t(1.0, "dead"), t(0.75, "live"), t(0.45, "wind"), t(0.75, ...LR_S_R)]),
  row("ASCE 7-16 2.4.1 (7)", [t(0.6, "dead"), t(0.6, "wind")]),
  row("ASCE 7-16 2.4.5 (8)", [t(1.0, "dead"), t(0.7, "seismic")], "seismic"),
  row("ASCE 7-16 2.4.5 (9)", [t(1.0, "dead"), t(0.525, "seismic"), t(0.75, "live"), t(0.75, "snow")], "seismic"),
  row("ASCE 7-16 2.4.5 (10)", [t(0.6, "dead"), t(0.7, "seismic")], "seismic"),
]);

/** The categories a row list names: a model case of any other category is not covered by it. */
export function categoriesOf(rows: readonly PresetRow[]): ReadonlySet<CaseCategory> {
  const out = new Set<CaseCategory>();
  for (const r of rows) for (const term of r.terms) for (const c of term.categories) out.add(c);
  return out;
}
