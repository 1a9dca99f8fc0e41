import { issue, isFlexuraError, type FlexuraIssue, type IssuePath } from "../errors/index.js";
import { convertQuantity } from "../units/index.js";
import type { ModelScale } from "./analysis.js";
import type { ModelQuantityKind, ModelUnits } from "./model.js";
import { QUANTITY_KIND_OF } from "./units.js";

type Json = Readonly<Record<string, unknown>>;

/** What the semantic pass needs while it reads a model file: its units and the issues found. */
export interface Reader {
  /** The resolved units of the model. */
  readonly units: ModelUnits;
  /** SI scale of each unit that could be read. */
  readonly scale: Partial<ModelScale>;
  /** Issues found so far (structural issues are kept apart by the caller). */
  readonly found: FlexuraIssue[];
}

/** The object at `value`, or an empty one when it is not an object (a structural issue already). */
export function objectAt(value: unknown): Json {
  return typeof value === "object" && value !== null && !Array.isArray(value) ? (value as Json) : {};
}

/** The array at `value`, or an empty one when it is not an array (a structural issue already). */
export function arrayAt(value: unknown): readonly unknown[] {
  return Array.isArray(value) ? value : [];
}

/**
 * Reads a quantity in the model's `field` unit: a plain finite number as is, a string with a unit
 * converted exactly to the model's unit. Returns undefined (recording any problem with a string;
 * wrong types are structural issues reported elsewhere) when it cannot.
 */
export function readQuantity(reader: Reader, value: unknown, field: ModelQuantityKind, path: IssuePath): number | undefined {
  if (typeof value === "number") return Number.isFinite(value) ? value : undefined;
  if (typeof value !== "string") return undefined;
  if (reader.scale[field] === undefined) return undefined; // the unit itself is wrong: reported under units
  try {
    return convertQuantity(value, QUANTITY_KIND_OF[field], reader.units[field], { path });
  } catch (e) {
    if (!isFlexuraError(e)) throw e;
    reader.found.push(...e.issues.map((i) => ({ ...i, path })));
    return undefined;
  }
}

/** Records `code` when a value read is not strictly positive. */
export function requirePositive(reader: Reader, value: number | undefined, path: IssuePath, what: string): void {
  if (value !== undefined && !(value > 0)) {
    reader.found.push(issue("value-not-positive", path, `The ${what} must be greater than zero; got ${value}.`, { value }));
  }
}

/** Records `code` when a value read is negative. */
export function requireNotNegative(reader: Reader, value: number | undefined, path: IssuePath, what: string): void {
  if (value !== undefined && value < 0) {
    reader.found.push(issue("value-negative", path, `The ${what} must not be negative; got ${value}.`, { value }));
  }
}

/** Records `code` when a position read lies outside the member, 0 to `length`. */
export function requireOnMember(reader: Reader, at: number | undefined, length: number | undefined, path: IssuePath, code: string, what: string): void {
  if (at === undefined || length === undefined || !(length > 0)) return;
  if (at < 0 || at > length) {
    const unit = reader.units.length;
    reader.found.push(
      issue(code, path, `The ${what} at ${at} ${unit} is outside the member, which runs from 0 to ${length} ${unit}.`, { at, length }),
    );
  }
}
