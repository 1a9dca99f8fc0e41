import type { IssueCollector} from "../errors/index.js";
import { describeValue, requireFinite, unknownKeyHint, type IssuePath } from "../errors/index.js";
import { CASE_CATEGORIES, type CaseCategory, type Combination, type LoadCase } from "./types.js";

const PURPOSES = ["strength", "allowable-stress", "serviceability"];

/** True when `value` is a plain object (not null, not an array). */
export function isRecord(value: unknown): value is Readonly<Record<string, unknown>> {
  return typeof value === "object" && value !== null && !Array.isArray(value);
}

/** Records a category that is not one of {@link CASE_CATEGORIES}. */
export function checkCategory(found: IssueCollector, value: unknown, path: IssuePath): value is CaseCategory {
  if (typeof value === "string" && (CASE_CATEGORIES as readonly string[]).includes(value)) return true;
  found.add("category-unknown", path, `Unknown case category ${describeValue(value)}.${typeof value === "string" ? unknownKeyHint(value, CASE_CATEGORIES) : ` Known categories: ${CASE_CATEGORIES.join(", ")}.`}`, { value: describeValue(value) });
  return false;
}

/** Checks the load cases (names unique and non-empty, categories known, flags true or false) into `found`. */
export function checkCases(found: IssueCollector, cases: unknown, path: IssuePath): cases is readonly LoadCase[] {
  if (!Array.isArray(cases)) {
    found.add("not-an-array", path, `The load cases must be an array; got ${describeValue(cases)}.`);
    return false;
  }
  const before = found.issues.length;
  const seen = new Set<string>();
  cases.forEach((c: unknown, i) => {
    const at = [...path, i];
    if (!isRecord(c)) {
      found.add("case-invalid", at, `A load case is an object { name, category }; got ${describeValue(c)}.`);
      return;
    }
    const name = c["name"];
    if (typeof name !== "string" || name.length === 0) found.add("case-name-invalid", [...at, "name"], `A load case needs a non-empty name; got ${describeValue(name)}.`);
    else if (seen.has(name)) found.add("case-duplicate", [...at, "name"], `Two load cases are named "${name}"; names must be unique.`, { name });
    else seen.add(name);
    checkCategory(found, c["category"], [...at, "category"]);
    for (const flag of ["reversible", "patterned"]) {
      const v = c[flag];
      if (v !== undefined && typeof v !== "boolean") found.add("case-flag-invalid", [...at, flag], `"${flag}" is true or false; got ${describeValue(v)}.`);
    }
  });
  return found.issues.length === before;
}

/**
 * Checks combinations against the cases into `found`: a name, a known purpose, at least one
 * factor, every factor finite and every case named known.
 */
export function checkCombinations(found: IssueCollector, combinations: unknown, caseNames: readonly string[], path: IssuePath): combinations is readonly Combination[] {
  if (!Array.isArray(combinations)) {
    found.add("not-an-array", path, `The combinations must be an array; got ${describeValue(combinations)}.`);
    return false;
  }
  const before = found.issues.length;
  const known = new Set(caseNames);
  const names = new Set<string>();
  combinations.forEach((c: unknown, i) => {
    const at = [...path, i];
    if (!isRecord(c)) {
      found.add("combination-invalid", at, `A combination is an object { name, purpose, factors }; got ${describeValue(c)}.`);
      return;
    }
    const name = c["name"];
    if (typeof name !== "string" || name.length === 0) found.add("combination-name-invalid", [...at, "name"], `A combination needs a non-empty name; got ${describeValue(name)}.`);
    else if (names.has(name)) found.add("combination-duplicate", [...at, "name"], `Two combinations are named "${name}"; names must be unique.`, { name });
    else names.add(name);
    const purpose = c["purpose"];
    if (typeof purpose !== "string" || !PURPOSES.includes(purpose))
      found.add("purpose-unknown", [...at, "purpose"], `A combination's purpose is one of ${PURPOSES.join(", ")}; got ${describeValue(purpose)}.`, { value: describeValue(purpose) });
    const factors = c["factors"];
    if (!isRecord(factors)) {
      found.add("combination-no-factors", [...at, "factors"], `A combination needs its factors, an object { caseName: factor }; got ${describeValue(factors)}.`);
      return;
    }
    const keys = Object.keys(factors);
    if (keys.length === 0) found.add("combination-no-factors", [...at, "factors"], `The combination ${describeValue(name)} has no factors: name at least one case.`);
    for (const k of keys) {
      if (!known.has(k)) found.add("unknown-case", [...at, "factors", k], `The combination ${describeValue(name)} names the case "${k}", which is not among the load cases.${unknownKeyHint(k, caseNames)}`, { name: k });
      requireFinite(found, factors[k], [...at, "factors", k], `factor on case "${k}"`);
    }
  });
  return found.issues.length === before;
}
