// Reading the plain-data inputs of the design rules (shapes, steels): an object of named
// numbers, each present, finite and positive, no unknown key; issues collected, never thrown raw.
import type { IssueCollector} from "../errors/index.js";
import { fail, requireFinite, unknownKeyHint, type IssuePath } from "../errors/index.js";

/** @internal The value as an object of named properties, or `not-an-object`. */
export function readRecord(value: unknown, path: IssuePath, what: string): Readonly<Record<string, unknown>> {
  if (typeof value !== "object" || value === null || Array.isArray(value)) fail("not-an-object", path, `The ${what} must be an object of named properties.`);
  return value as Readonly<Record<string, unknown>>;
}

/** @internal Records `unknown-field`, with a suggestion, for every own key not in `known`. */
export function refuseUnknownKeys(found: IssueCollector, obj: Readonly<Record<string, unknown>>, known: readonly string[], path: IssuePath, what: string): void {
  for (const key of Object.keys(obj))
    if (!known.includes(key)) found.add("unknown-field", [...path, key], `The ${what} has no property "${key}".${unknownKeyHint(key, known)}`, { field: key });
}

/**
 * @internal Reads the own property `key` as a finite number above 0 (at least 0 with `allowZero`);
 * records `missing-field`, `not-a-number`, `not-finite` or `value-not-positive` and returns NaN
 * (which the caller never uses: it throws the collected issues first) otherwise.
 */
export function readPositive(found: IssueCollector, obj: Readonly<Record<string, unknown>>, key: string, path: IssuePath, what: string, allowZero = false): number {
  const value = Object.hasOwn(obj, key) ? obj[key] : undefined;
  if (value === undefined) {
    found.add("missing-field", [...path, key], `The ${what} is missing; give it from the section table or the steel grade (flexura has no defaults for it).`, { field: key });
    return Number.NaN;
  }
  if (!requireFinite(found, value, [...path, key], what)) return Number.NaN;
  if (allowZero ? !(value >= 0) : !(value > 0)) found.add("value-not-positive", [...path, key], `The ${what} must be ${allowZero ? "zero or more" : "positive"}; got ${value}.`, { value });
  return value;
}
