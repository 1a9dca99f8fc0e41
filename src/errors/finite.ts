import type { IssueCollector } from "./collector.js";
import type { IssuePath } from "./issue.js";

/**
 * Checks that `value` is a finite number; records `not-a-number` (wrong type) or
 * `not-finite` (NaN or an infinity) otherwise. Returns true when it is fine.
 *
 * @example
 * ```ts
 * const found = new IssueCollector();
 * requireFinite(found, Number.NaN, ["length"], "member length"); // false, one issue recorded
 * ```
 */
export function requireFinite(found: IssueCollector, value: unknown, path: IssuePath, what: string): value is number {
  if (typeof value !== "number") {
    found.add("not-a-number", path, `The ${what} must be a number; got ${describeValue(value)}.`, { value: describeValue(value) });
    return false;
  }
  if (!Number.isFinite(value)) {
    found.add("not-finite", path, `The ${what} must be a finite number; got ${String(value)}.`, { value: String(value) });
    return false;
  }
  return true;
}

/** A short, safe description of any value for use in messages. */
export function describeValue(value: unknown): string {
  if (value === null) return "null";
  if (Array.isArray(value)) return "an array";
  switch (typeof value) {
    case "string":
      return JSON.stringify(value.length > 40 ? `${value.slice(0, 40)}...` : value);
    case "number":
    case "boolean":
    case "bigint":
      return String(value);
    case "undefined":
      return "nothing";
    case "object":
      return "an object";
    case "function":
      return "a function";
    default:
      return "a symbol";
  }
}
