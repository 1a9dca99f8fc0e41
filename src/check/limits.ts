import { closestName, describeValue, type IssueCollector, type IssuePath, requireFinite } from "../errors/index.js";

/**
 * Span-to-deflection ratios n (limit = span / n) in common use for building members, as named
 * presets: common practice, in the spirit of the limits building codes tabulate (for example the
 * International Building Code, Table 1604.3, from memory). Which one applies is the engineer's
 * call under the governing code.
 *
 * - `floorLive` 360: floors under live load, and members supporting plaster or brittle finishes.
 * - `floorTotal` 240: floors under total load; roofs with a ceiling.
 * - `roofNoCeiling` 180: roofs without a ceiling.
 *
 * @example
 * ```ts
 * const limit: DeflectionLimit = { kind: "ratio", ratio: commonDeflectionRatios.floorLive };
 * ```
 */
export const commonDeflectionRatios = Object.freeze({
  /** span / 360 (common practice). */
  floorLive: 360,
  /** span / 240 (common practice). */
  floorTotal: 240,
  /** span / 180 (common practice). */
  roofNoCeiling: 180,
} as const);

/**
 * A deflection limit: `{ kind: "ratio", ratio: n }` for span / n on every span (and
 * cantileverFactor x length / n on every cantilever), or `{ kind: "absolute", limit }` for one
 * value everywhere.
 */
export type DeflectionLimit = RatioDeflectionLimit | AbsoluteDeflectionLimit;

/** Deflection limited to span / n. */
export interface RatioDeflectionLimit {
  /** Tag. */
  readonly kind: "ratio";
  /** n in span / n (> 0); see {@link commonDeflectionRatios}. */
  readonly ratio: number;
  /**
   * For a cantilever of length L the limit is cantileverFactor x L / n: 2 when omitted, the common
   * practice of treating a cantilever as half of a span of 2 L. Give 1 to use L / n.
   */
  readonly cantileverFactor?: number;
}

/** Deflection limited to one value (length). */
export interface AbsoluteDeflectionLimit {
  /** Tag. */
  readonly kind: "absolute";
  /** The largest deflection allowed (length, > 0). */
  readonly limit: number;
}

/** Separate allowable bending stresses for tension and compression. */
export interface TensionCompressionAllowables {
  /** Allowable tensile bending stress (force / length^2, > 0). */
  readonly tension: number;
  /** Allowable compressive bending stress, as a magnitude (force / length^2, > 0). */
  readonly compression: number;
}

/** An allowable bending stress: one value for tension and compression, or one each (force / length^2, > 0). */
export type AllowableBendingStress = number | TensionCompressionAllowables;

/** The limits a member is checked against; each is optional and a missing one is not checked. */
export interface MemberLimits {
  /** Allowable bending stress (force / length^2, > 0). */
  readonly bendingStress?: AllowableBendingStress;
  /**
   * Allowable bending stress in each part of a multi-material section, by part index (null or a
   * missing entry: that part is not checked); needs sections given with their `parts`.
   */
  readonly bendingStressByPart?: readonly (AllowableBendingStress | null)[];
  /**
   * Allowable shear stress (force / length^2, > 0). For a section of several materials it is
   * checked against the largest of the materials' own stresses; to check each material against
   * its own allowable, give `shearStressByPart`.
   */
  readonly shearStress?: number;
  /**
   * Allowable shear stress in each solid part of a multi-material section, by part index (null
   * or a missing entry: that part is not checked): each part's own peak n_i |V| Q* / (I* b*) over
   * its heights is checked against it. Needs sections from the section module (memberSection).
   */
  readonly shearStressByPart?: readonly (number | null)[];
  /** Deflection limits; each gives one check per span and cantilever. */
  readonly deflection?: DeflectionLimit | readonly DeflectionLimit[];
}

/** Records `allowable-not-positive` unless `value` is a finite number above zero. */
export function checkPositive(found: IssueCollector, value: unknown, path: IssuePath, what: string): boolean {
  if (!requireFinite(found, value, path, what)) return false;
  if (value > 0) return true;
  found.add("allowable-not-positive", path, `The ${what} must be above zero; got ${value}.`, { value });
  return false;
}

const isObject = (value: unknown): value is Readonly<Record<string, unknown>> => typeof value === "object" && value !== null && !Array.isArray(value);

/** The value of `name` when it is `value`'s own property (never one inherited from a prototype). */
const own = (value: Readonly<Record<string, unknown>>, name: string): unknown => (Object.hasOwn(value, name) ? value[name] : undefined);

/** Validates one allowable bending stress; returns it (own properties only) when it is sound. */
function checkAllowable(found: IssueCollector, b: unknown, path: IssuePath): AllowableBendingStress | null | undefined {
  if (b === undefined || b === null) return b;
  if (isObject(b)) {
    const tension = own(b, "tension");
    const compression = own(b, "compression");
    const ok = checkPositive(found, tension, [...path, "tension"], "allowable tensile bending stress");
    return checkPositive(found, compression, [...path, "compression"], "allowable compressive bending stress") && ok
      ? { tension: tension as number, compression: compression as number }
      : undefined;
  }
  return checkPositive(found, b, path, "allowable bending stress") ? (b as number) : undefined;
}

/** Validates one deflection limit; returns a copy of it (own properties only) when it is sound. */
function checkDeflectionLimit(found: IssueCollector, d: unknown, p: IssuePath): DeflectionLimit | undefined {
  if (!isObject(d)) {
    found.add("deflection-limit-invalid", p, `A deflection limit is an object { kind: "ratio", ratio } or { kind: "absolute", limit }; got ${describeValue(d)}.`, { value: describeValue(d) });
    return undefined;
  }
  const kind = own(d, "kind");
  switch (kind) {
    case "ratio": {
      const ratio = own(d, "ratio");
      const factor = own(d, "cantileverFactor");
      const ok = checkPositive(found, ratio, [...p, "ratio"], "span-to-deflection ratio n");
      const factorOk = factor === undefined || checkPositive(found, factor, [...p, "cantileverFactor"], "cantilever factor");
      if (!ok || !factorOk) return undefined;
      return factor === undefined ? { kind, ratio: ratio as number } : { kind, ratio: ratio as number, cantileverFactor: factor as number };
    }
    case "absolute": {
      const limit = own(d, "limit");
      return checkPositive(found, limit, [...p, "limit"], "deflection limit") ? { kind, limit: limit as number } : undefined;
    }
    default:
      found.add("unknown-limit-kind", [...p, "kind"], `Unknown deflection limit kind ${describeValue(kind)}; use "ratio" or "absolute".`);
      return undefined;
  }
}

const LIMIT_FIELDS = ["bendingStress", "bendingStressByPart", "shearStress", "shearStressByPart", "deflection"] as const;

/**
 * Validates the limits, recording every issue, and returns a copy of them made of their own
 * properties only (an inherited or misspelt field is never read as a limit), or undefined when
 * they are not an object. Unknown fields are `unknown-field` (with a suggestion); limits that
 * would run no check at all are `limits-empty`: a verdict never passes by default.
 */
export function checkLimits(found: IssueCollector, limits: unknown, path: IssuePath): MemberLimits | undefined {
  if (!isObject(limits)) {
    found.add("limits-not-an-object", path, `The limits must be an object such as { bendingStress: 165 }; got ${describeValue(limits)}.`, { value: describeValue(limits) });
    return undefined;
  }
  for (const name of Object.keys(limits)) {
    if ((LIMIT_FIELDS as readonly string[]).includes(name) || limits[name] === undefined) continue;
    const near = closestName(name, LIMIT_FIELDS);
    found.add("unknown-field", [...path, name], `Unknown limit "${name}".${near === undefined ? "" : ` Did you mean "${near}"?`} The limits are ${LIMIT_FIELDS.join(", ")}.`, { field: name });
  }
  const bendingStress = checkAllowable(found, own(limits, "bendingStress"), [...path, "bendingStress"]);
  const byPartGiven = own(limits, "bendingStressByPart");
  let bendingStressByPart: (AllowableBendingStress | null)[] | undefined;
  if (Array.isArray(byPartGiven)) {
    bendingStressByPart = byPartGiven.map((b: unknown, i) => checkAllowable(found, b, [...path, "bendingStressByPart", i]) ?? null);
  } else if (byPartGiven !== undefined) {
    found.add("not-a-list", [...path, "bendingStressByPart"], `bendingStressByPart must be a list with one allowable (or null) per part; got ${describeValue(byPartGiven)}.`);
  }
  const shearGiven = own(limits, "shearStress");
  const shearStress = shearGiven === undefined ? undefined : checkPositive(found, shearGiven, [...path, "shearStress"], "allowable shear stress") ? (shearGiven as number) : undefined;
  const shearByPartGiven = own(limits, "shearStressByPart");
  let shearStressByPart: (number | null)[] | undefined;
  if (Array.isArray(shearByPartGiven)) {
    shearStressByPart = shearByPartGiven.map((b: unknown, i) =>
      b === null || b === undefined ? null : checkPositive(found, b, [...path, "shearStressByPart", i], "allowable shear stress") ? (b as number) : null,
    );
  } else if (shearByPartGiven !== undefined) {
    found.add("not-a-list", [...path, "shearStressByPart"], `shearStressByPart must be a list with one allowable (or null) per part; got ${describeValue(shearByPartGiven)}.`);
  }
  const deflectionGiven = own(limits, "deflection");
  let deflection: DeflectionLimit[] | undefined;
  if (Array.isArray(deflectionGiven)) {
    deflection = [];
    deflectionGiven.forEach((d: unknown, i) => {
      const read = checkDeflectionLimit(found, d, [...path, "deflection", i]);
      if (read !== undefined) deflection?.push(read);
    });
  } else if (deflectionGiven !== undefined) {
    const read = checkDeflectionLimit(found, deflectionGiven, [...path, "deflection"]);
    deflection = read === undefined ? undefined : [read];
  }
  const requested =
    own(limits, "bendingStress") !== undefined ||
    (Array.isArray(byPartGiven) ? byPartGiven.some((b) => b !== null && b !== undefined) : byPartGiven !== undefined) ||
    shearGiven !== undefined ||
    (Array.isArray(shearByPartGiven) ? shearByPartGiven.some((b) => b !== null && b !== undefined) : shearByPartGiven !== undefined) ||
    (Array.isArray(deflectionGiven) ? deflectionGiven.length > 0 : deflectionGiven !== undefined);
  if (!requested) {
    found.add("limits-empty", path, "Give at least one limit (bendingStress, bendingStressByPart, shearStress, shearStressByPart or deflection): with none, nothing would be checked and nothing could pass.");
  }
  return {
    ...(bendingStress === undefined || bendingStress === null ? {} : { bendingStress }),
    ...(bendingStressByPart === undefined ? {} : { bendingStressByPart }),
    ...(shearStress === undefined ? {} : { shearStress }),
    ...(shearStressByPart === undefined ? {} : { shearStressByPart }),
    ...(deflection === undefined ? {} : { deflection }),
  };
}

/** The deflection limits as a list. */
export function deflectionLimits(limits: MemberLimits): readonly DeflectionLimit[] {
  const d = limits.deflection;
  if (d === undefined) return [];
  return Array.isArray(d) ? (d as readonly DeflectionLimit[]) : [d as DeflectionLimit];
}

/** The allowable tensile and compressive bending stresses, or null when not checked. */
export function bendingAllowables(b: AllowableBendingStress | null | undefined): { tension: number; compression: number } | null {
  if (b === undefined || b === null) return null;
  return typeof b === "number" ? { tension: b, compression: b } : b;
}
