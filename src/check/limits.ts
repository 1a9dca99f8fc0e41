import { type IssueCollector, type IssuePath, requireFinite } from "../errors/index.js";

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
  /** Allowable shear stress (force / length^2, > 0). */
  readonly shearStress?: number;
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

/** Validates the limits, recording every issue. */
export function checkLimits(found: IssueCollector, limits: MemberLimits, path: IssuePath): void {
  const b = limits.bendingStress;
  if (typeof b === "object" && b !== null) {
    checkPositive(found, b.tension, [...path, "bendingStress", "tension"], "allowable tensile bending stress");
    checkPositive(found, b.compression, [...path, "bendingStress", "compression"], "allowable compressive bending stress");
  } else if (b !== undefined) {
    checkPositive(found, b, [...path, "bendingStress"], "allowable bending stress");
  }
  if (limits.shearStress !== undefined) checkPositive(found, limits.shearStress, [...path, "shearStress"], "allowable shear stress");
  deflectionLimits(limits).forEach((d, i) => {
    const p = Array.isArray(limits.deflection) ? [...path, "deflection", i] : [...path, "deflection"];
    switch (d.kind) {
      case "ratio":
        checkPositive(found, d.ratio, [...p, "ratio"], "span-to-deflection ratio n");
        if (d.cantileverFactor !== undefined) checkPositive(found, d.cantileverFactor, [...p, "cantileverFactor"], "cantilever factor");
        break;
      case "absolute":
        checkPositive(found, d.limit, [...p, "limit"], "deflection limit");
        break;
      default: {
        const never: never = d;
        found.add("unknown-limit-kind", [...p, "kind"], `Unknown deflection limit kind ${JSON.stringify((never as { kind: unknown }).kind)}; use "ratio" or "absolute".`);
      }
    }
  });
}

/** The deflection limits as a list. */
export function deflectionLimits(limits: MemberLimits): readonly DeflectionLimit[] {
  const d = limits.deflection;
  if (d === undefined) return [];
  return Array.isArray(d) ? (d as readonly DeflectionLimit[]) : [d as DeflectionLimit];
}

/** The allowable tensile and compressive bending stresses, or null when not checked. */
export function bendingAllowables(limits: MemberLimits): { tension: number; compression: number } | null {
  const b = limits.bendingStress;
  if (b === undefined) return null;
  return typeof b === "number" ? { tension: b, compression: b } : b;
}
