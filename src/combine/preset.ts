import { attempt, describeValue, FlexuraError, IssueCollector, unknownKeyHint, type Result } from "../errors/index.js";
import { ASCE7_16_ALLOWABLE_STRESS, ASCE7_16_STRENGTH, categoriesOf, type PresetRow } from "./asce7.js";
import { EN1990_GAMMA, EN1990_PSI, type CombinationFactors, type ImposedCategory, type SnowSite } from "./en1990.js";
import { combinationName } from "./print.js";
import type { CaseCategory, Combination, CombinationPurpose, LoadCase } from "./types.js";
import { checkCases, checkCategory, isRecord } from "./validate.js";

/** The presets: standards' combinations held as data. */
export type PresetName = "asce7-16-strength" | "asce7-16-allowable-stress" | "en1990-strength" | "en1990-serviceability";

/** Every {@link PresetName}. */
export const PRESET_NAMES: readonly PresetName[] = Object.freeze(["asce7-16-strength", "asce7-16-allowable-stress", "en1990-strength", "en1990-serviceability"]);

/** Options for {@link presetCombinations}. */
export interface PresetOptions {
  /**
   * Cases whose own category the preset does not cover (a `user`, `crane` or `rain` case under
   * EN 1990, a `crane` or `user` case under ASCE 7), mapped to a category it does: `{ settle: "dead" }`.
   */
  readonly map?: Readonly<Record<string, CaseCategory>>;
  /**
   * Also form each combination with one or more of its variable (non-dead) cases left out (ASCE
   * 7-16 2.3.1 and 2.4.1: "effects of one or more loads not acting shall be investigated"; in EN
   * 1990 a variable action is taken only where unfavourable). Default true. Combinations that
   * come out equal are given once.
   */
  readonly loadsNotActing?: boolean;
  /** ASCE 7-16 2.3.1 Exception 1: factor 0.5 on L in rows 3, 4 and 6 (L0 <= 100 psf, not garages or places of public assembly). Default false. */
  readonly liveFactorException?: boolean;
  /** EN 1990 strength: expression 6.10 (default) or the pair 6.10a and 6.10b. */
  readonly expression?: "6.10" | "6.10a-b";
  /** EN 1990: the imposed-load category of the `live` cases (EN 1991-1-1 Table 6.1); required when there is a live case. */
  readonly imposedCategory?: ImposedCategory;
  /** EN 1990: the site, for the psi factors of snow (Table A1.1). Default `"up-to-1000m"`. */
  readonly snowSite?: SnowSite;
}

/** The combinations of a preset for a set of cases, and what was left out. */
export interface PresetCombinations {
  /** The preset's name. */
  readonly preset: PresetName;
  /** The combinations formed, in the order of the standard's rows, each with its clause. */
  readonly combinations: readonly Combination[];
  /** Categories the preset names that no case has: their terms were left out (their loads are zero). */
  readonly omitted: readonly CaseCategory[];
  /** Plain sentences on what was applied: options taken, rows left out, psi factors used. */
  readonly notes: readonly string[];
}

const OPTION_KEYS: Readonly<Record<PresetName, readonly string[]>> = Object.freeze({
  "asce7-16-strength": ["map", "loadsNotActing", "liveFactorException"],
  "asce7-16-allowable-stress": ["map", "loadsNotActing"],
  "en1990-strength": ["map", "loadsNotActing", "expression", "imposedCategory", "snowSite"],
  "en1990-serviceability": ["map", "loadsNotActing", "imposedCategory", "snowSite"],
});
const ASCE_STRENGTH_COVERS = categoriesOf(ASCE7_16_STRENGTH);
const ASCE_ALLOWABLE_COVERS = categoriesOf(ASCE7_16_ALLOWABLE_STRESS);
const EN_COVERS: ReadonlySet<CaseCategory> = new Set<CaseCategory>(["dead", "live", "roof-live", "snow", "wind", "seismic"]);
const EN_IMPOSED = ["A", "B", "C", "D", "E", "F", "G"];
const EN_SNOW = ["up-to-1000m", "above-1000m", "nordic"];

/** One combination being formed: factors by case name, in the cases' order. */
type Draft = { readonly clause: string; readonly factors: Map<string, number> };

/**
 * The combinations a standard's preset gives for these load cases, each with its clause: ASCE
 * 7-16 2.3.1 and 2.3.6 (strength), 2.4.1 and 2.4.5 (allowable stress), EN 1990:2002 Annex A1
 * expressions 6.10 or 6.10a/6.10b with Table A1.2(B) (strength), 6.14b, 6.15b and 6.16b
 * (serviceability) with the psi factors of Table A1.1. Each "or" gives its own combination; a
 * reversible case gives one combination per sense; favourable and unfavourable permanent
 * factors give separate combinations; in EN 1990 each variable case leads in turn. All cases of
 * one category take the same factor.
 *
 * @throws FlexuraError `preset-unknown`, `preset-option-unknown`, `preset-option-invalid`,
 *   `preset-option-missing` (EN 1990 with a live case and no `imposedCategory`), `case-not-covered`
 *   (a case whose category the preset does not name, unless mapped), `unknown-case` (a mapped name
 *   that is not a case), and the case checks (`case-duplicate`, `category-unknown`, ...).
 * @example
 * ```ts
 * const p = presetCombinations("asce7-16-strength", [
 *   { name: "D", category: "dead" },
 *   { name: "L", category: "live" },
 * ]);
 * p.combinations.map((c) => c.name); // ["1.4D", "1.2D", "1.2D + 1.6L", "1.2D + 1.0L", ...]
 * p.omitted; // ["roof-live", "snow", "rain", "wind", "seismic"]
 * ```
 */
export function presetCombinations(preset: PresetName, cases: readonly LoadCase[], options?: PresetOptions): PresetCombinations {
  const found = new IssueCollector();
  if (typeof preset !== "string" || !(PRESET_NAMES as readonly string[]).includes(preset)) {
    found.add("preset-unknown", ["preset"], `Unknown preset ${describeValue(preset)}.${typeof preset === "string" ? unknownKeyHint(preset, PRESET_NAMES) : ""}`, { value: describeValue(preset) });
    found.throwIfAny();
  }
  const casesOk = checkCases(found, cases, ["cases"]);
  const opts = checkOptions(found, preset, options, casesOk ? cases : []);
  found.throwIfAny();
  const categoryOf = (c: LoadCase): CaseCategory => opts.map?.[c.name] ?? c.category;
  const covered: ReadonlySet<CaseCategory> = preset === "asce7-16-strength" ? ASCE_STRENGTH_COVERS : preset === "asce7-16-allowable-stress" ? ASCE_ALLOWABLE_COVERS : EN_COVERS;
  cases.forEach((c, i) => {
    const category = categoryOf(c);
    if (!covered.has(category))
      found.add("case-not-covered", ["cases", i], `The case "${c.name}" (${category}) is not covered by the preset ${preset}: map it to a category the preset names, with options.map = { "${c.name}": "dead" } for example.`, { name: c.name, category });
  });
  if (preset.startsWith("en1990") && opts.imposedCategory === undefined && cases.some((c) => categoryOf(c) === "live"))
    found.add("preset-option-missing", ["options", "imposedCategory"], `The psi factors of a live case depend on its category of use: give options.imposedCategory ("A" domestic, "B" office, "C" congregation, "D" shopping, "E" storage, "F" or "G" traffic).`);
  found.throwIfAny();
  const byCategory = new Map<CaseCategory, string[]>();
  for (const c of cases) byCategory.set(categoryOf(c), [...(byCategory.get(categoryOf(c)) ?? []), c.name]);
  const notes: string[] = [];
  let drafts: Draft[];
  let purpose: CombinationPurpose;
  let named: ReadonlySet<CaseCategory>;
  if (preset === "asce7-16-strength" || preset === "asce7-16-allowable-stress") {
    const rows = preset === "asce7-16-strength" ? ASCE7_16_STRENGTH : ASCE7_16_ALLOWABLE_STRESS;
    purpose = preset === "asce7-16-strength" ? "strength" : "allowable-stress";
    named = covered;
    drafts = asceDrafts(rows, byCategory, opts.liveFactorException === true, notes);
  } else {
    const psiOf = (category: CaseCategory): CombinationFactors => psiFor(category, opts.imposedCategory ?? "A", opts.snowSite ?? "up-to-1000m");
    const variables = cases.filter((c) => categoryOf(c) !== "dead" && categoryOf(c) !== "seismic").map((c) => ({ name: c.name, psi: psiOf(categoryOf(c)) }));
    named = EN_COVERS;
    if (preset === "en1990-strength") {
      purpose = "strength";
      drafts = enStrengthDrafts(byCategory, variables, opts.expression ?? "6.10");
    } else {
      purpose = "serviceability";
      drafts = enServiceabilityDrafts(byCategory, variables);
    }
    for (const v of variables) notes.push(`psi factors of "${v.name}" (EN 1990 Table A1.1): psi0 = ${v.psi.psi0}, psi1 = ${v.psi.psi1}, psi2 = ${v.psi.psi2}.`);
  }
  const omitted = [...named].filter((c) => !byCategory.has(c));
  if (omitted.length > 0) notes.push(`No case of ${omitted.join(", ")}: their terms are left out.`);
  if (opts.loadsNotActing !== false) drafts = withLoadsNotActing(drafts, new Set(cases.filter((c) => categoryOf(c) !== "dead").map((c) => c.name)));
  drafts = withSenses(drafts, new Set(cases.filter((c) => c.reversible === true).map((c) => c.name)));
  const order = cases.map((c) => c.name);
  const seen = new Set<string>();
  const combinations: Combination[] = [];
  for (const d of drafts) {
    const factors: Record<string, number> = {};
    for (const name of order) {
      const f = d.factors.get(name);
      if (f !== undefined && f !== 0) factors[name] = f;
    }
    if (Object.keys(factors).length === 0) continue;
    const name = combinationName(factors);
    if (seen.has(name)) continue;
    seen.add(name);
    combinations.push(Object.freeze({ name, purpose, factors: Object.freeze(factors), clause: d.clause }));
  }
  return Object.freeze({ preset, combinations: Object.freeze(combinations), omitted: Object.freeze(omitted), notes: Object.freeze(notes) });
}

/**
 * The non-throwing form of {@link presetCombinations}.
 *
 * @example
 * ```ts
 * tryPresetCombinations("asce7-16-strength", [{ name: "C", category: "crane" }]).ok; // false: case-not-covered
 * ```
 */
export function tryPresetCombinations(preset: PresetName, cases: readonly LoadCase[], options?: PresetOptions): Result<PresetCombinations> {
  return attempt(() => presetCombinations(preset, cases, options));
}

function checkOptions(found: IssueCollector, preset: PresetName, options: unknown, cases: readonly LoadCase[]): PresetOptions {
  if (options === undefined) return {};
  if (!isRecord(options)) {
    found.add("preset-option-invalid", ["options"], `The preset options are an object; got ${describeValue(options)}.`);
    return {};
  }
  const keys = OPTION_KEYS[preset];
  for (const k of Object.keys(options)) {
    if (!keys.includes(k)) found.add("preset-option-unknown", ["options", k], `The preset ${preset} has no option "${k}".${unknownKeyHint(k, keys)}`, { option: k });
  }
  const bool = (k: string): void => {
    const v = options[k];
    if (v !== undefined && typeof v !== "boolean") found.add("preset-option-invalid", ["options", k], `options.${k} is true or false; got ${describeValue(v)}.`);
  };
  bool("loadsNotActing");
  bool("liveFactorException");
  const oneOf = (k: string, allowed: readonly string[]): void => {
    const v = options[k];
    if (v !== undefined && !(typeof v === "string" && allowed.includes(v))) found.add("preset-option-invalid", ["options", k], `options.${k} is one of ${allowed.map((a) => `"${a}"`).join(", ")}; got ${describeValue(v)}.`);
  };
  oneOf("expression", ["6.10", "6.10a-b"]);
  oneOf("imposedCategory", EN_IMPOSED);
  oneOf("snowSite", EN_SNOW);
  const map = options["map"];
  if (map !== undefined) {
    if (!isRecord(map)) found.add("preset-option-invalid", ["options", "map"], `options.map is an object { caseName: category }; got ${describeValue(map)}.`);
    else {
      const names = cases.map((c) => c.name);
      for (const [k, v] of Object.entries(map)) {
        if (!names.includes(k)) found.add("unknown-case", ["options", "map", k], `options.map names the case "${k}", which is not among the load cases.${unknownKeyHint(k, names)}`, { name: k });
        checkCategory(found, v, ["options", "map", k]);
      }
    }
  }
  return options;
}

function asceDrafts(rows: readonly PresetRow[], byCategory: ReadonlyMap<CaseCategory, readonly string[]>, exception: boolean, notes: string[]): Draft[] {
  const out: Draft[] = [];
  for (const r of rows) {
    if (r.requires !== undefined && !byCategory.has(r.requires)) continue;
    // each "or" term branches into one draft per category the model has
    let partial: Map<string, number>[] = [new Map<string, number>()];
    for (const term of r.terms) {
      const present = term.categories.filter((c) => byCategory.has(c));
      if (present.length === 0) continue;
      const factor = exception && term.exceptionFactor !== undefined ? term.exceptionFactor : term.factor;
      const next: Map<string, number>[] = [];
      for (const p of partial) {
        for (const category of present) {
          const m = new Map(p);
          for (const name of byCategory.get(category) ?? []) m.set(name, factor);
          next.push(m);
        }
      }
      partial = next;
    }
    for (const factors of partial) out.push({ clause: r.clause, factors });
  }
  if (exception) notes.push("ASCE 7-16 2.3.1 Exception 1 applied: factor 0.5 on L in rows 3, 4 and 6.");
  if (!byCategory.has("seismic")) notes.push("No seismic case: the seismic rows are left out.");
  return out;
}

function psiFor(category: CaseCategory, imposed: ImposedCategory, snow: SnowSite): CombinationFactors {
  switch (category) {
    case "live":
      return EN1990_PSI.imposed[imposed];
    case "roof-live":
      return EN1990_PSI.roof;
    case "snow":
      return EN1990_PSI.snow[snow];
    case "wind":
      return EN1990_PSI.wind;
    default:
      return { psi0: 0, psi1: 0, psi2: 0 };
  }
}

/** A product of two tabulated factors, rounded to 12 digits so that 1.5 x 0.7 reads 1.05 (as the tables give it). */
function product(a: number, b: number): number {
  return Number((a * b).toPrecision(12));
}

type Variable = { readonly name: string; readonly psi: CombinationFactors };

function permanent(byCategory: ReadonlyMap<CaseCategory, readonly string[]>, factor: number): Map<string, number> {
  const m = new Map<string, number>();
  for (const name of byCategory.get("dead") ?? []) m.set(name, factor);
  return m;
}

function enStrengthDrafts(byCategory: ReadonlyMap<CaseCategory, readonly string[]>, variables: readonly Variable[], expression: "6.10" | "6.10a-b"): Draft[] {
  const g = EN1990_GAMMA;
  const out: Draft[] = [];
  const leading = (clause: string, gammaG: number, lead: Variable | undefined): void => {
    const m = permanent(byCategory, gammaG);
    for (const v of variables) m.set(v.name, v === lead ? g.variable : product(g.variable, v.psi.psi0));
    out.push({ clause: lead === undefined ? clause : `${clause}, ${lead.name} leading`, factors: m });
  };
  for (const gammaG of [g.permanentUnfavourable, g.permanentFavourable]) {
    const side = gammaG === g.permanentUnfavourable ? "G unfavourable" : "G favourable";
    if (expression === "6.10") {
      out.push({ clause: `EN 1990 A1.3.1 (6.10), ${side}, no variable action`, factors: permanent(byCategory, gammaG) });
      for (const v of variables) leading(`EN 1990 A1.3.1 (6.10), ${side}`, gammaG, v);
    } else {
      leading(`EN 1990 A1.3.1 (6.10a), ${side}`, gammaG, undefined);
      const gb = gammaG === g.permanentUnfavourable ? product(g.xi, g.permanentUnfavourable) : gammaG;
      out.push({ clause: `EN 1990 A1.3.1 (6.10b), ${side}, no variable action`, factors: permanent(byCategory, gb) });
      for (const v of variables) leading(`EN 1990 A1.3.1 (6.10b), ${side}`, gb, v);
    }
  }
  for (const e of byCategory.get("seismic") ?? []) {
    const m = permanent(byCategory, 1);
    m.set(e, 1);
    for (const v of variables) m.set(v.name, v.psi.psi2);
    out.push({ clause: "EN 1990 6.4.3.4 (6.12b), seismic", factors: m });
  }
  return out;
}

function enServiceabilityDrafts(byCategory: ReadonlyMap<CaseCategory, readonly string[]>, variables: readonly Variable[]): Draft[] {
  const out: Draft[] = [];
  const form = (clause: string, leadFactor: (v: Variable) => number, otherFactor: (v: Variable) => number): void => {
    out.push({ clause: `${clause}, no variable action`, factors: permanent(byCategory, 1) });
    for (const lead of variables) {
      const m = permanent(byCategory, 1);
      for (const v of variables) m.set(v.name, v === lead ? leadFactor(v) : otherFactor(v));
      out.push({ clause: `${clause}, ${lead.name} leading`, factors: m });
    }
  };
  form("EN 1990 A1.4.1 (6.14b) characteristic", () => 1, (v) => v.psi.psi0);
  form("EN 1990 A1.4.1 (6.15b) frequent", (v) => v.psi.psi1, (v) => v.psi.psi2);
  const m = permanent(byCategory, 1);
  for (const v of variables) m.set(v.name, v.psi.psi2);
  out.push({ clause: "EN 1990 A1.4.1 (6.16b) quasi-permanent", factors: m });
  return out;
}

/** Each draft, then the same with every non-empty subset of its variable cases removed. */
function withLoadsNotActing(drafts: readonly Draft[], variable: ReadonlySet<string>): Draft[] {
  const out: Draft[] = [];
  for (const d of drafts) {
    const present = [...d.factors].filter(([name, f]) => variable.has(name) && f !== 0).map(([name]) => name);
    if (present.length > 12) throw new FlexuraError([{ code: "preset-too-many-cases", path: ["cases"], message: `A combination with ${present.length} variable cases would give ${2 ** present.length} combinations with loads not acting: set options.loadsNotActing to false.`, count: present.length }]);
    for (let mask = 0; mask < 1 << present.length; mask++) {
      const m = new Map(d.factors);
      present.forEach((name, i) => {
        if ((mask >> i) & 1) m.delete(name);
      });
      out.push({ clause: mask === 0 ? d.clause : `${d.clause}, without ${present.filter((_, i) => (mask >> i) & 1).join(", ")}`, factors: m });
    }
  }
  return out;
}

/** Each draft once per sense of each reversible case in it. */
function withSenses(drafts: readonly Draft[], reversible: ReadonlySet<string>): Draft[] {
  const out: Draft[] = [];
  for (const d of drafts) {
    let partial: Map<string, number>[] = [d.factors];
    for (const [name, f] of d.factors) {
      if (!reversible.has(name) || f === 0) continue;
      partial = partial.flatMap((p) => [p, new Map(p).set(name, -f)]);
    }
    for (const factors of partial) out.push({ clause: d.clause, factors });
  }
  return out;
}
