// Shared checks and builders for the parametric shapes.
import { IssueCollector, describeValue, requireFinite, unknownKeyHint } from "../../errors/index.js";
import { LENGTH_LIMIT } from "../limits.js";
import type { Material, PolygonPart, SectionPart, SectionPoint } from "../types.js";

/** Options common to every shape function. */
export interface ShapeOptions {
  /** Material given to every part of the shape (omit for a section of one unnamed material). */
  readonly material?: Material;
}

/**
 * Records `unknown-field` for each own key of `value` that is not in `known` (a misspelt name
 * would otherwise be ignored and its default used), with the closest known name suggested.
 * Returns true when every key is known.
 */
export function checkKnownKeys(found: IssueCollector, value: Readonly<Record<string, unknown>>, known: readonly string[], path: readonly (string | number)[], what: string): boolean {
  let ok = true;
  for (const key of Object.keys(value)) {
    if (known.includes(key)) continue;
    found.add("unknown-field", [...path, key], `Unknown ${what} "${key}".${unknownKeyHint(key, known)}`, { field: key });
    ok = false;
  }
  return ok;
}

/** Records a problem with a shape's options: not an object, or a key other than `material`. */
export function checkShapeOptions(found: IssueCollector, options: unknown): void {
  if (options === undefined) return;
  if (typeof options !== "object" || options === null || Array.isArray(options)) {
    found.add("options-invalid", ["options"], `The options must be an object { material }; got ${describeValue(options)}.`);
    return;
  }
  checkKnownKeys(found, options as Record<string, unknown>, ["material"], ["options"], "option");
}

function checkBound(found: IssueCollector, name: string, v: number): boolean {
  if (v <= LENGTH_LIMIT) return true;
  found.add("dimension-out-of-range", [name], `${name} is ${v}; section lengths must lie within ${LENGTH_LIMIT} (second moments grow as a length to the fourth power): use a larger unit of length.`, { value: v, limit: LENGTH_LIMIT });
  return false;
}

/**
 * Checks that each named field of `dims` is a finite number > 0 (required), absent or >= 0
 * (`optional`), or absent or > 0 (`positiveIfGiven`), and that no other key is given (`unknown-field`, with the closest name
 * suggested). Returns the collector for further checks.
 */
export function checkDimensions(
  dims: unknown,
  required: readonly string[],
  optional: readonly string[] = [],
  positiveIfGiven: readonly string[] = [],
): { found: IssueCollector; ok: boolean } {
  const found = new IssueCollector();
  if (typeof dims !== "object" || dims === null) {
    found.add("dimensions-invalid", [], `The dimensions must be an object; got ${describeValue(dims)}.`);
    return { found, ok: false };
  }
  const d = dims as Record<string, unknown>;
  let ok = checkKnownKeys(found, d, [...required, ...optional, ...positiveIfGiven], [], "dimension");
  for (const name of [...required, ...positiveIfGiven]) {
    const v = d[name];
    if (v === undefined && !required.includes(name)) continue;
    if (!requireFinite(found, v, [name], name)) ok = false;
    else if (!(v > 0)) {
      found.add("dimension-not-positive", [name], `${name} must be greater than zero; got ${v}.`, { value: v });
      ok = false;
    } else if (!checkBound(found, name, v)) ok = false;
  }
  for (const name of optional) {
    const v = d[name];
    if (v === undefined) continue;
    if (!requireFinite(found, v, [name], name)) ok = false;
    else if (v < 0) {
      found.add("dimension-negative", [name], `${name} must not be negative; got ${v}.`, { value: v });
      ok = false;
    } else if (!checkBound(found, name, v)) ok = false;
  }
  return { found, ok };
}

/** An axis-aligned rectangle part between z0..z1 and y0..y1 (counterclockwise). */
export function box(z0: number, z1: number, y0: number, y1: number, material: Material | undefined, hole = false): PolygonPart {
  const points: SectionPoint[] = [
    { y: y0, z: z0 },
    { y: y0, z: z1 },
    { y: y1, z: z1 },
    { y: y1, z: z0 },
  ];
  return withExtras({ kind: "polygon", points }, material, hole);
}

/** Adds `material` and `hole` to a part when they are set. */
export function withExtras<P extends SectionPart>(part: P, material: Material | undefined, hole = false): P {
  return { ...part, ...(hole ? { hole: true } : {}), ...(material ? { material } : {}) };
}
