import { arrangementsOf, combinationName, combineCases, type CaseSolutions, type Combination, type CombinationPurpose, type LoadArrangement, type PatternOptions } from "../combine/index.js";
import { checkCombinations } from "../combine/validate.js";
import { attempt, describeValue, IssueCollector, type IssuePath, type Result } from "../errors/index.js";
import { spanDeflections } from "./deflection.js";
import { checkLimits, deflectionLimits, type DeflectionLimit, type MemberLimits } from "./limits.js";
import { checkMember } from "./member.js";
import { resolveSections, type MemberSections } from "./sections.js";
import { deflectionResult } from "./single.js";
import type { CheckResult } from "./types.js";

/** The stress limits of a {@link StressCheckGroup}: a member's limits without deflection (deflection is checked by {@link DeflectionCheckGroup}). */
export type StressLimits = Omit<MemberLimits, "deflection">;

/**
 * Stress checks on chosen combinations: every combination (with every pattern of its patterned
 * cases) is checked against the same allowable stresses, as {@link checkMember} checks one load set.
 *
 * @example
 * ```ts
 * const strength: StressCheckGroup = { name: "ASD", combinations: presetCombinations("asce7-16-allowable-stress", cases).combinations, limits: { bendingStress: 165 } };
 * ```
 */
export interface StressCheckGroup {
  /** A name for the group in the utilisation table, for example `"allowable stress"`. */
  readonly name: string;
  /** The combinations to check (strength or allowable-stress combinations, from a preset or written out). */
  readonly combinations: readonly Combination[];
  /** Allowable stresses (force / length^2), in the units of the member; at least one. */
  readonly limits: StressLimits;
}

/**
 * Deflection checks of a named group of cases against its own limit, for example the live load
 * alone against span / 360 and dead plus live against span / 240 (the limits building codes
 * tabulate for floor members, such as IBC 2018 Table 1604.3). The group is one set of case
 * factors (`factors`), or several combinations (`combinations`, for example the characteristic
 * combinations of EN 1990 6.14b): exactly one of the two. Patterned cases are searched over their
 * patterns, the worst one governing.
 *
 * @example
 * ```ts
 * const live: DeflectionCheckGroup = { name: "live", factors: { L: 1 }, limit: { kind: "ratio", ratio: 360 } };
 * const total: DeflectionCheckGroup = { name: "dead + live", factors: { D: 1, L: 1 }, limit: { kind: "ratio", ratio: 240 } };
 * ```
 */
export interface DeflectionCheckGroup {
  /** A name for the group in the utilisation table, for example `"live"`. */
  readonly name: string;
  /** The cases of the group and their factors (dimensionless), for example `{ L: 1 }`. */
  readonly factors?: Readonly<Record<string, number>>;
  /** Or: the combinations of the group, each checked. */
  readonly combinations?: readonly Combination[];
  /** The deflection limit (span / n, or absolute in length units), or several; each gives one check per span and cantilever. */
  readonly limit: DeflectionLimit | readonly DeflectionLimit[];
}

/** What {@link checkLoadCombinations} checks: stress groups and deflection groups; at least one check in all. */
export interface CombinationCheckGroups {
  /** Stress checks on chosen combinations. */
  readonly stress?: readonly StressCheckGroup[];
  /** Deflection checks per group of cases. */
  readonly deflection?: readonly DeflectionCheckGroup[];
}

/** Options for {@link checkLoadCombinations}. */
export interface CombinationCheckOptions {
  /** The pattern search of patterned cases (see `arrangementsOf`). */
  readonly pattern?: PatternOptions;
}

/** One check at its worst over the patterns of a combination, with the arrangement that gives it. */
export interface GoverningCheck {
  /** The check (demand, capacity, utilisation, where it governs, formula). */
  readonly check: CheckResult;
  /** The governing arrangement's name: the combination's name, then the pattern (`"1.2D + 1.6L, L on spans 1 and 3"`). */
  readonly arrangement: string;
  /** The pattern in words (`"L on spans 1 and 3"`); empty when the combination has no patterned case. */
  readonly pattern: string;
}

/** One row of the utilisation table: one combination of one group, at its worst over its patterns. */
export interface CombinationCheckRow {
  /** The group's name. */
  readonly group: string;
  /** Which kind of group. */
  readonly groupKind: "stress" | "deflection";
  /** The combination's name, for example `"1.2D + 1.6L + 0.5S"`. */
  readonly combination: string;
  /** What the combination is for. */
  readonly purpose: CombinationPurpose;
  /** The clause the combination comes from, for a preset's combination. */
  readonly clause?: string;
  /** Each check at its worst over the patterns, in the order {@link checkMember} lists them. */
  readonly checks: readonly GoverningCheck[];
  /** The check with the highest utilisation (the first on ties). */
  readonly governing: GoverningCheck;
  /** The governing utilisation (dimensionless). */
  readonly utilisation: number;
  /** True when every check passes under every pattern. */
  readonly pass: boolean;
  /** How many arrangements (patterns) of the combination were checked. */
  readonly arrangements: number;
}

/** The utilisation table over combinations, and the governing row. */
export interface LoadCombinationChecks {
  /** Tag. */
  readonly kind: "combination-checks";
  /** One row per combination of each group, in the order given. */
  readonly rows: readonly CombinationCheckRow[];
  /** The row with the highest utilisation (the first on ties). */
  readonly governing: CombinationCheckRow;
  /** True when every row passes. */
  readonly pass: boolean;
}

/** The stress limits checked, and the groups' combinations, all issues collected. */
function checkGroups(found: IssueCollector, solved: CaseSolutions, groups: unknown): { stress: StressCheckGroup[]; deflection: { group: DeflectionCheckGroup; index: number; combinations: Combination[]; limits: readonly DeflectionLimit[] }[] } {
  const out: ReturnType<typeof checkGroups> = { stress: [], deflection: [] };
  if (typeof groups !== "object" || groups === null || Array.isArray(groups)) {
    found.add("checks-not-an-object", ["checks"], `The checks are an object { stress: [...], deflection: [...] }; got ${describeValue(groups)}.`);
    return out;
  }
  const g = groups as Readonly<Record<string, unknown>>;
  for (const k of Object.keys(g)) if (k !== "stress" && k !== "deflection" && g[k] !== undefined) found.add("unknown-field", ["checks", k], `Unknown check group "${k}": the checks are "stress" and "deflection".`, { field: k });
  const names = solved.cases.map((c) => c.name);
  const list = (key: "stress" | "deflection"): readonly unknown[] => {
    const v = Object.hasOwn(g, key) ? g[key] : undefined;
    if (v === undefined) return [];
    if (!Array.isArray(v)) {
      found.add("not-an-array", ["checks", key], `checks.${key} is a list of groups; got ${describeValue(v)}.`);
      return [];
    }
    return v;
  };
  const groupName = (x: Readonly<Record<string, unknown>>, path: IssuePath): string => {
    const name = x["name"];
    if (typeof name === "string" && name.length > 0) return name;
    found.add("group-name-invalid", [...path, "name"], `A check group needs a non-empty name; got ${describeValue(name)}.`);
    return "";
  };
  list("stress").forEach((x, i) => {
    const path = ["checks", "stress", i];
    if (typeof x !== "object" || x === null) return found.add("group-invalid", path, `A stress group is { name, combinations, limits }; got ${describeValue(x)}.`);
    const r = x as Readonly<Record<string, unknown>>;
    const name = groupName(r, path);
    const combinations = r["combinations"];
    const before = found.issues.length;
    if (checkCombinations(found, combinations, names, [...path, "combinations"]) && combinations.length === 0)
      found.add("group-no-combinations", [...path, "combinations"], `The stress group "${name}" has no combinations.`);
    const limits = r["limits"];
    if (typeof limits === "object" && limits !== null && Object.hasOwn(limits, "deflection"))
      found.add("deflection-in-stress-group", [...path, "limits", "deflection"], "Deflection is checked per group of cases: give it in checks.deflection, with the cases the limit applies to.");
    const sound = checkLimits(found, limits, [...path, "limits"]);
    if (found.issues.length === before && sound !== undefined) out.stress.push({ name, combinations: combinations as Combination[], limits: sound });
  });
  list("deflection").forEach((x, i) => {
    const path = ["checks", "deflection", i];
    if (typeof x !== "object" || x === null) return found.add("group-invalid", path, `A deflection group is { name, factors, limit }; got ${describeValue(x)}.`);
    const r = x as Readonly<Record<string, unknown>>;
    const name = groupName(r, path);
    const before = found.issues.length;
    const hasFactors = r["factors"] !== undefined;
    const hasCombinations = r["combinations"] !== undefined;
    let combinations: Combination[] = [];
    if (hasFactors === hasCombinations) found.add("group-cases-invalid", path, `The deflection group "${name}" needs exactly one of factors (the cases and their factors, { L: 1 }) or combinations.`);
    else if (hasFactors) {
      const c = { name: name.length > 0 ? name : "group", purpose: "serviceability", factors: r["factors"] };
      const one = new IssueCollector();
      checkCombinations(one, [c], names, []);
      // the issues of the one combination, at the group's own path
      for (const issue of one.issues) found.add(issue.code, [...path, ...issue.path.slice(1)], issue.message, detailsOf(issue));
      if (one.empty) combinations = [{ name: combinationName(r["factors"] as Record<string, number>), purpose: "serviceability", factors: r["factors"] as Record<string, number> }];
    } else if (checkCombinations(found, r["combinations"], names, [...path, "combinations"])) {
      combinations = [...(r["combinations"] as Combination[])];
      if (combinations.length === 0) found.add("group-no-combinations", [...path, "combinations"], `The deflection group "${name}" has no combinations.`);
    }
    const limit = r["limit"];
    if (limit === undefined) found.add("deflection-limit-invalid", [...path, "limit"], `The deflection group "${name}" needs its limit, { kind: "ratio", ratio: 360 } for span / 360.`);
    const limitIssues = new IssueCollector();
    const sound = limit === undefined ? undefined : checkLimits(limitIssues, { deflection: limit }, []);
    for (const issue of limitIssues.issues) found.add(issue.code, [...path, "limit", ...issue.path.slice(1)], issue.message, detailsOf(issue));
    if (found.issues.length === before && sound !== undefined) out.deflection.push({ group: r as unknown as DeflectionCheckGroup, index: i, combinations, limits: deflectionLimits(sound) });
  });
  return out;
}

function detailsOf(issue: { readonly code: string; readonly path: unknown; readonly message: string }): Record<string, unknown> {
  const { code: _c, path: _p, message: _m, ...rest } = issue as Record<string, unknown>;
  return rest;
}

/** The worst of each check over the arrangements of one combination. */
function worstOver(arrangements: readonly LoadArrangement[], run: (a: LoadArrangement) => readonly CheckResult[]): GoverningCheck[] {
  const worst: GoverningCheck[] = [];
  for (const a of arrangements) {
    const checks = run(a);
    checks.forEach((c, i) => {
      const w = worst[i];
      if (w === undefined || c.utilisation > w.check.utilisation) worst[i] = Object.freeze({ check: c, arrangement: a.name, pattern: a.description });
    });
  }
  return worst;
}

function row(group: string, groupKind: "stress" | "deflection", c: Combination, checks: GoverningCheck[], arrangements: number): CombinationCheckRow {
  let governing = checks[0] as GoverningCheck;
  for (const g of checks) if (g.check.utilisation > governing.check.utilisation) governing = g;
  const clause = c.clause === undefined ? {} : { clause: c.clause };
  return Object.freeze({ group, groupKind, combination: c.name, purpose: c.purpose, ...clause, checks: Object.freeze(checks), governing, utilisation: governing.check.utilisation, pass: checks.every((g) => g.check.pass), arrangements });
}

/**
 * Checks a member under load combinations: stress checks (bending tension and compression,
 * shear; as {@link checkMember}) on the strength or allowable-stress combinations chosen, and
 * deflection checks per named group of cases against each group's own limit (live alone against
 * span / 360, dead plus live against span / 240). Each combination is formed by superposition of
 * the solved cases (nothing is solved again); a combination with patterned cases is checked
 * under every pattern searched (see `arrangementsOf`), and each check reports its worst pattern.
 * The result is a utilisation table, one row per combination of each group, naming the governing
 * check and pattern, and the governing row of all.
 *
 * Deflection is measured from the supports, as `spanDeflections` does; `sections` are needed
 * only for stress groups (pass `undefined` when there are none).
 *
 * @param solved - The member's cases, solved once (`solveCases`).
 * @param sections - The section, or stretches of constant section, in the member's units.
 * @param checks - The stress groups and deflection groups; at least one check in all.
 * @param options - The pattern search.
 * @throws FlexuraError `checks-not-an-object`, `checks-empty` (no group: a verdict never passes by
 *   default), `group-invalid`, `group-name-invalid`, `group-no-combinations`, `group-cases-invalid`
 *   (a deflection group with both or neither of `factors` and `combinations`),
 *   `deflection-in-stress-group`, `sections-missing` (stress groups and no sections), the
 *   combination checks (`unknown-case`, `combination-no-factors`, `not-finite`, ...), the limit
 *   checks of {@link checkMember} with paths under `checks`, and the pattern codes of `arrangementsOf`.
 * @example
 * ```ts
 * const cases = solveCases(beam, [{ name: "D", category: "dead" }, { name: "L", category: "live", patterned: true }]);
 * const table = checkLoadCombinations(cases, section, {
 *   stress: [{ name: "allowable stress", combinations: presetCombinations("asce7-16-allowable-stress", cases.cases).combinations, limits: { bendingStress: 165 } }],
 *   deflection: [
 *     { name: "live", factors: { L: 1 }, limit: { kind: "ratio", ratio: 360 } },
 *     { name: "dead + live", factors: { D: 1, L: 1 }, limit: { kind: "ratio", ratio: 240 } },
 *   ],
 * });
 * table.governing.combination; table.governing.governing.pattern; // "D + L", "L on spans 1 and 3"
 * ```
 */
export function checkLoadCombinations(solved: CaseSolutions, sections: MemberSections | undefined, checks: CombinationCheckGroups, options?: CombinationCheckOptions): LoadCombinationChecks {
  const found = new IssueCollector();
  if (typeof solved !== "object" || solved === null || (solved as { kind?: unknown }).kind !== "case-solutions") {
    found.add("cases-not-solved", ["solved"], `Give the member's cases solved by solveCases; got ${describeValue(solved)}.`);
    found.throwIfAny();
  }
  const groups = checkGroups(found, solved, checks);
  if (found.empty && groups.stress.length === 0 && groups.deflection.length === 0)
    found.add("checks-empty", ["checks"], "No check group was given, so there is no verdict: give checks.stress, checks.deflection or both.");
  if (groups.stress.length > 0) {
    if (sections === undefined) found.add("sections-missing", ["sections"], "Stress groups need the member's section: give it (memberSection(section) for a section of the section module).");
    else {
      const needShear = groups.stress.some((g) => g.limits.shearStress !== undefined || (g.limits.shearStressByPart ?? []).some((b) => b !== null));
      resolveSections(found, sections, solved.length, ["sections"], needShear);
    }
  }
  found.throwIfAny();
  const rows: CombinationCheckRow[] = [];
  for (const g of groups.stress) {
    for (const c of g.combinations) {
      // each combination's own patterns (arrangementsOf over the whole list would give an arrangement equal to an earlier combination's only once)
      const list = arrangementsOf(solved, [c], options?.pattern);
      const worst = worstOver(list, (a) => checkMember(combineCases(solved, a.factors, a.pattern), sections as MemberSections, g.limits).checks);
      rows.push(row(g.name, "stress", c, worst, list.length));
    }
  }
  for (const { group, index, combinations, limits } of groups.deflection) {
    for (const c of combinations) {
      const list = arrangementsOf(solved, [c], options?.pattern);
      const worst = worstOver(list, (a) => {
        const deflections = spanDeflections(combineCases(solved, a.factors, a.pattern));
        const out: CheckResult[] = [];
        limits.forEach((limit, i) => {
          for (const d of deflections) {
            const label = `deflection, ${d.spanKind} ${d.span + 1} (x = ${d.from} to ${d.to})${limits.length > 1 ? `, limit ${i + 1}` : ""}`;
            out.push(deflectionResult(limit, Math.abs(d.deflection), d.to - d.from, d.spanKind === "cantilever", { x: d.at, span: d.span }, label, ["checks", "deflection", index, "limit"]));
          }
        });
        return out;
      });
      rows.push(row(group.name, "deflection", c, worst, list.length));
    }
  }
  let governing = rows[0] as CombinationCheckRow;
  for (const r of rows) if (r.utilisation > governing.utilisation) governing = r;
  return Object.freeze({ kind: "combination-checks", rows: Object.freeze(rows), governing, pass: rows.every((r) => r.pass) });
}

/**
 * The non-throwing form of {@link checkLoadCombinations}.
 *
 * @example
 * ```ts
 * tryCheckLoadCombinations(cases, undefined, {}).ok; // false: checks-empty
 * ```
 */
export function tryCheckLoadCombinations(solved: CaseSolutions, sections: MemberSections | undefined, checks: CombinationCheckGroups, options?: CombinationCheckOptions): Result<LoadCombinationChecks> {
  return attempt(() => checkLoadCombinations(solved, sections, checks, options));
}
