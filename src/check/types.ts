import { fail, type IssuePath } from "../errors/index.js";
import type { ExtremeFibre } from "../stress/index.js";

/** Which check a result is for. */
export type CheckKind = "bending-tension" | "bending-compression" | "shear-stress" | "deflection";

/** Where a check governs on the member. */
export interface CheckLocation {
  /** Position along the member (length), x from the left end. */
  readonly x: number;
  /** For bending checks: the fibre. */
  readonly fibre?: ExtremeFibre;
  /** For stress checks: height in the section, up from its centroid (length). */
  readonly y?: number;
  /** For deflection checks: the index of the span or cantilever in the solution's `spans`. */
  readonly span?: number;
  /** For stress checks: the index of the section stretch (0 for a uniform member). */
  readonly stretch?: number;
  /** For checks of one part of a multi-material section (`bendingStressByPart`, `shearStressByPart`): the part's index. */
  readonly part?: number;
}

/**
 * The outcome of one check: demand against capacity.
 *
 * utilisation = demand / capacity; `pass` when utilisation <= 1. Demand and capacity are
 * magnitudes (>= 0) in the check's units: stress (force / length^2) or deflection (length).
 */
export interface CheckResult {
  /** Tag. */
  readonly kind: "check";
  /** Which check. */
  readonly check: CheckKind;
  /** A short description, for example `"deflection, span 1 (x = 0 to 6)"`. */
  readonly label: string;
  /** What the member needs: the peak stress or deflection magnitude (>= 0). */
  readonly demand: number;
  /** What it may have: the allowable stress or the deflection limit (> 0). */
  readonly capacity: number;
  /** demand / capacity. */
  readonly utilisation: number;
  /** True when utilisation <= 1. */
  readonly pass: boolean;
  /** Where it governs. */
  readonly at: CheckLocation;
  /** The formula used, in plain text, for example `"sigma_t = M_max |y_bottom| / I_z"`. */
  readonly formula: string;
}

/**
 * Builds a check result from a demand and a capacity.
 *
 * @throws FlexuraError `result-not-finite` when demand / capacity, or either of them, is not a finite
 *   number above zero (a capacity so small, or a demand so large, that the ratio overflows; a
 *   capacity that overflows or underflows): such a check would
 *   otherwise pass or fail on an infinity.
 * @example
 * ```ts
 * checkResult("shear-stress", "shear stress", 60, 100, { x: 0 }, "tau = |V| Q / (I b)").utilisation; // 0.6
 * ```
 */
export function checkResult(check: CheckKind, label: string, demand: number, capacity: number, at: CheckLocation, formula: string): CheckResult {
  return checkResultAt([], check, label, demand, capacity, at, formula);
}

/** {@link checkResult}, reporting a ratio that is not finite at `path` (the limit it came from). */
export function checkResultAt(path: IssuePath, check: CheckKind, label: string, demand: number, capacity: number, at: CheckLocation, formula: string): CheckResult {
  const utilisation = demand / capacity;
  if (!Number.isFinite(utilisation) || !Number.isFinite(demand) || !(capacity > 0 && Number.isFinite(capacity))) {
    fail("result-not-finite", path, `The ${label} check cannot be computed in double precision: demand ${demand} / capacity ${capacity} is not a finite number. Check the units of the limit and of the member.`, {
      demand,
      capacity,
    });
  }
  return { kind: "check", check, label, demand, capacity, utilisation, pass: utilisation <= 1, at, formula };
}
