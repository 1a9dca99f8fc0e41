// The meaning of a model's cases, combinations and check groups, checked once for a model read
// from a file and for one built in code: every problem at once, with paths into the model. The
// checks are the combine module's own (checkCases, checkCombinations, presetCombinations), their
// paths moved to where the model holds the value.
import { MAX_PATTERN_CAP, tryPresetCombinations, type Combination, type LoadCase } from "../combine/index.js";
import { checkCases, checkCombinations } from "../combine/validate.js";
import { describeValue, issue, IssueCollector, unknownKeyHint, type FlexuraIssue, type IssuePath } from "../errors/index.js";
import { DEFAULT_LOAD_CASE } from "../loads/index.js";
import type { ModelCombinationEntry, ModelCombinationSelection } from "./combination-types.js";
import type { Model } from "./model.js";
import { isMultiMaterial } from "./model-section.js";

/** The combinations of a model, resolved: its cases (self-weight included), every combination, the presets' notes. */
export interface ResolvedCombinations {
  /** Every case, the self-weight case last. */
  readonly cases: readonly LoadCase[];
  /** Every combination, presets expanded, in order. */
  readonly combinations: readonly Combination[];
  /** The presets' notes. */
  readonly notes: readonly string[];
}

const isPreset = (e: ModelCombinationEntry): e is Extract<ModelCombinationEntry, { preset: unknown }> => typeof e === "object" && e !== null && Object.hasOwn(e, "preset");

/** Issues with their paths moved: `from` prefix replaced by `to`. */
function moved(issues: readonly FlexuraIssue[], from: number, to: IssuePath): FlexuraIssue[] {
  return issues.map((i) => ({ ...i, path: [...to, ...i.path.slice(from)] }));
}

/** The combinations a selection names (undefined, with an issue, when it names one that does not exist or none at all). */
export function selectCombinations(all: readonly Combination[], selection: ModelCombinationSelection, path: IssuePath, found: FlexuraIssue[]): Combination[] | undefined {
  if (typeof selection === "string") {
    const chosen = all.filter((c) => c.purpose === selection);
    if (chosen.length > 0) return chosen;
    found.push(issue("group-no-combinations", path, `No combination has the purpose "${selection}": give the group's combinations by name, or add combinations of that purpose.`, { purpose: selection }));
    return undefined;
  }
  if (!Array.isArray(selection) || selection.length === 0) {
    found.push(issue("group-no-combinations", path, `Give the group's combinations: a purpose ("strength", "allowable-stress", "serviceability") or a list of combination names; got ${describeValue(selection)}.`));
    return undefined;
  }
  const names = all.map((c) => c.name);
  const out: Combination[] = [];
  selection.forEach((n: unknown, j) => {
    const c = all.find((x) => x.name === n);
    if (c === undefined) found.push(issue("unknown-combination", [...path, j], `No combination is named ${describeValue(n)}.${typeof n === "string" ? unknownKeyHint(n, names) : ""}`, { name: describeValue(n) }));
    else out.push(c);
  });
  return out.length === selection.length ? out : undefined;
}

/** For a model built in code: the containers are of their types (their contents are checked below). */
function shapesSound(model: Model, found: FlexuraIssue[]): boolean {
  const before = found.length;
  const wrong = (path: IssuePath, what: string, value: unknown): void => void found.push(issue("wrong-type", path, `Expected ${what}; got ${describeValue(value)}.`, { value: describeValue(value) }));
  const isObject = (v: unknown): boolean => typeof v === "object" && v !== null && !Array.isArray(v);
  if (model.combinations !== undefined && !Array.isArray(model.combinations)) wrong(["combinations"], "a list", model.combinations);
  else model.combinations?.forEach((c, i) => { if (!isObject(c)) wrong(["combinations", i], "an object", c); });
  if (model.selfWeight !== undefined && !(isObject(model.selfWeight) && typeof model.selfWeight.case === "string" && model.selfWeight.case.length > 0 && typeof model.selfWeight.unitWeight === "number" && Number.isFinite(model.selfWeight.unitWeight)))
    wrong(["selfWeight"], "{ case, unitWeight } with a case name and a finite number", model.selfWeight);
  if (model.patterns !== undefined && !(isObject(model.patterns) && (model.patterns.cap === undefined || typeof model.patterns.cap === "number"))) wrong(["patterns"], "{ cap }", model.patterns);
  if (model.settlementCase !== undefined && typeof model.settlementCase !== "string") wrong(["settlementCase"], "a case name", model.settlementCase);
  const g = model.checkGroups;
  if (g !== undefined && !isObject(g)) wrong(["checkGroups"], "an object { stress, deflection }", g);
  else
    for (const k of ["stress", "deflection"] as const) {
      const list: unknown = g?.[k];
      if (list === undefined) continue;
      if (!Array.isArray(list)) wrong(["checkGroups", k], "a list", list);
      else
        list.forEach((x: unknown, i) => {
          if (!isObject(x)) return wrong(["checkGroups", k, i], "an object", x);
          const o = x as Readonly<Record<string, unknown>>;
          if (typeof o["name"] !== "string" || o["name"].length === 0) wrong(["checkGroups", k, i, "name"], "a non-empty name", o["name"]);
          for (const q of ["bendingStress", "shearStress"]) if (o[q] !== undefined && !(typeof o[q] === "number" && Number.isFinite(o[q]) && o[q] > 0)) wrong(["checkGroups", k, i, q], "a finite number above zero", o[q]);
          if (k === "deflection") {
            const limits: unknown[] = Array.isArray(o["limit"]) ? (o["limit"] as unknown[]) : [o["limit"]];
            if (limits.length === 0 || !limits.every((l) => isObject(l) && (((l as { kind?: unknown }).kind === "ratio" && Number((l as { ratio?: unknown }).ratio) > 0 && Number.isFinite((l as { ratio?: unknown }).ratio)) || ((l as { kind?: unknown }).kind === "length" && Number((l as { value?: unknown }).value) > 0 && Number.isFinite((l as { value?: unknown }).value)))))
              wrong(["checkGroups", k, i, "limit"], '{ kind: "ratio", ratio } or { kind: "length", value } with a finite value above zero, or a list of them', o["limit"]);
            if (o["factors"] !== undefined && !isObject(o["factors"])) wrong(["checkGroups", k, i, "factors"], "an object { case: factor }", o["factors"]);
          }
        });
    }
  return found.length === before;
}

/**
 * Checks the model's cases, combinations, patterns, self-weight and check groups, and resolves
 * them (undefined when the model has no cases). Issues are pushed to `found`.
 */
export function resolveCombinations(model: Model, found: FlexuraIssue[]): ResolvedCombinations | undefined {
  if (!shapesSound(model, found)) return undefined;
  const given = model.cases !== undefined;
  for (const field of ["combinations", "checkGroups", "settlementCase", "selfWeight", "patterns"] as const) {
    if (!given && model[field] !== undefined) found.push(issue("cases-missing", [field], `"${field}" needs the load cases: list them in "cases", and name each load's case.`));
  }
  if (!given) return undefined;
  const collector = new IssueCollector();
  if (!checkCases(collector, model.cases, ["cases"])) {
    found.push(...collector.issues);
    return undefined;
  }
  const cases: LoadCase[] = [...(model.cases ?? [])];
  const names = cases.map((c) => c.name);
  const sw = model.selfWeight;
  if (sw !== undefined) {
    if (model.section === undefined) found.push(issue("self-weight-without-section", ["selfWeight"], 'The self-weight is the section\'s area times the unit weight: give the member a "section" (or give the weight as a distributed load of a dead case).'));
    else if (isMultiMaterial(model.section))
      found.push(issue("self-weight-multi-material", ["selfWeight"], "A section of several materials has no one unit weight: give its self-weight as a distributed load of a dead case."));
    if (names.includes(sw.case)) found.push(issue("case-duplicate", ["selfWeight", "case"], `The self-weight case "${sw.case}" is also listed in "cases": give it another name, or leave it out of "cases".`, { name: sw.case }));
    if (!(sw.unitWeight > 0)) found.push(issue("value-not-positive", ["selfWeight", "unitWeight"], `The unit weight must be greater than zero; got ${sw.unitWeight}.`, { value: sw.unitWeight }));
    cases.push({ name: sw.case, category: "dead" });
  }
  const all = cases.map((c) => c.name);
  // every load names a listed case, every case carries a load
  const counts = new Map<string, number>(all.map((n) => [n, 0]));
  model.loads.forEach((l, i) => {
    const name = l.case ?? DEFAULT_LOAD_CASE;
    const n = counts.get(name);
    if (n === undefined || name === sw?.case) found.push(issue("unknown-case", ["loads", i, "case"], `The load's case "${name}" is not among the cases.${l.case === undefined ? ' Give the load its "case".' : unknownKeyHint(name, names)}`, { name }));
    else counts.set(name, n + 1);
  });
  const moves = model.supports.some((s) => (s.settlement ?? 0) !== 0 || (s.rotation ?? 0) !== 0);
  const settlement = model.settlementCase;
  if (settlement !== undefined && !names.includes(settlement)) found.push(issue("unknown-case", ["settlementCase"], `The settlement case "${settlement}" is not among the cases.${unknownKeyHint(settlement, names)}`, { name: settlement }));
  if (moves && settlement === undefined) found.push(issue("settlement-case-missing", ["settlementCase"], 'A support has a settlement or a prescribed rotation: name the case that holds it in "settlementCase" (a settlement does not scale with a load factor, so it is a case of its own).'));
  (model.cases ?? []).forEach((c, i) => {
    if ((counts.get(c.name) ?? 0) === 0 && !(c.name === settlement && moves)) found.push(issue("case-no-loads", ["cases", i], `The case "${c.name}" has no loads: give a load with "case": "${c.name}", or leave the case out.`, { name: c.name }));
  });
  const cap = model.patterns?.cap;
  if (cap !== undefined && !(Number.isInteger(cap) && cap >= 1)) found.push(issue("pattern-cap-invalid", ["patterns", "cap"], `The pattern cap is a whole number of spans from 1 to ${MAX_PATTERN_CAP}; got ${cap}.`, { value: cap }));
  else if (cap !== undefined && cap > MAX_PATTERN_CAP)
    found.push(issue("pattern-cap-too-large", ["patterns", "cap"], `A pattern cap of ${cap} spans could ask for ${2 ** cap} patterns of one case; the most that is searched is ${MAX_PATTERN_CAP} (${2 ** MAX_PATTERN_CAP} patterns). Beyond the cap the standard patterns are used.`, { cap, count: 2 ** cap }));
  const combinations: Combination[] = [];
  const notes: string[] = [];
  const seen = new Set<string>();
  const add = (c: Combination, path: IssuePath): void => {
    if (seen.has(c.name)) found.push(issue("combination-duplicate", path, `Two combinations are named "${c.name}"; names must be unique.`, { name: c.name }));
    seen.add(c.name);
    combinations.push(c);
  };
  (model.combinations ?? []).forEach((e, i) => {
    if (isPreset(e)) {
      const r = tryPresetCombinations(e.preset, cases, e.options);
      if (!r.ok) {
        for (const x of r.error.issues) {
          const head = x.path[0];
          found.push(head === "preset" || head === "options" ? { ...x, path: ["combinations", i, ...x.path] } : head === "cases" && sw !== undefined && x.path[1] === cases.length - 1 ? { ...x, path: ["selfWeight"] } : x);
        }
        return;
      }
      // a preset's combination named like an earlier one of another purpose (EN 1990's 1.0G is both a strength and a serviceability combination) takes its purpose in its name
      r.value.combinations.forEach((c) => add(seen.has(c.name) && !combinations.some((x) => x.name === c.name && x.purpose === c.purpose) ? { ...c, name: `${c.name} (${c.purpose})` } : c, ["combinations", i]));
      notes.push(...r.value.notes.map((n) => `${e.preset}: ${n}`));
    } else {
      const one = new IssueCollector();
      if (checkCombinations(one, [e], all, ["x"])) add(e, ["combinations", i, "name"]);
      found.push(...moved(one.issues, 2, ["combinations", i]));
    }
  });
  const groups = model.checkGroups;
  groups?.stress?.forEach((g, i) => {
    selectCombinations(combinations, g.combinations, ["checkGroups", "stress", i, "combinations"], found);
    if (g.bendingStress === undefined && g.shearStress === undefined) found.push(issue("limits-empty", ["checkGroups", "stress", i], `The stress group "${g.name}" has no allowable stress: give "bendingStress", "shearStress" or both.`));
    if (model.section === undefined) found.push(issue("stress-group-without-section", ["checkGroups", "stress", i], 'Stress checks need the member\'s "section".'));
  });
  groups?.deflection?.forEach((g, i) => {
    const path = ["checkGroups", "deflection", i];
    if ((g.factors === undefined) === (g.combinations === undefined)) found.push(issue("group-cases-invalid", path, `The deflection group "${g.name}" needs exactly one of "factors" (the cases and their factors, { "L": 1 }) or "combinations".`));
    else if (g.factors !== undefined) {
      const one = new IssueCollector();
      checkCombinations(one, [{ name: g.name, purpose: "serviceability", factors: g.factors }], all, ["x"]);
      found.push(...moved(one.issues, 2, path));
    } else if (g.combinations !== undefined) selectCombinations(combinations, g.combinations, [...path, "combinations"], found);
  });
  return { cases, combinations, notes };
}
