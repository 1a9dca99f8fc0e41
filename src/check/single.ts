import { IssueCollector, attempt, requireFinite, type IssuePath, type Result } from "../errors/index.js";
import { checkLimits, checkPositive, type DeflectionLimit } from "./limits.js";
import { checkResultAt, type CheckLocation, type CheckResult } from "./types.js";

/** Options of the single checks: where the demand acts, to carry into the result. */
export interface SingleCheckOptions {
  /** Where the demand acts; `{ x: 0 }` when omitted. */
  readonly at?: CheckLocation;
}

/**
 * Checks one bending stress against an allowable value: demand = |sigma|, capacity = the
 * allowable, utilisation = demand / capacity. A positive stress is a tension check, a negative
 * one a compression check.
 *
 * @param stress - The bending stress (force / length^2), tension positive.
 * @param allowable - The allowable bending stress (force / length^2, > 0), supplied by the user.
 * @param options - Where the stress acts.
 * @returns The check.
 * @throws FlexuraError `allowable-not-positive`, `not-a-number` / `not-finite`.
 * @example
 * ```ts
 * checkBendingStress(-120, 165).utilisation; // 0.727..., check "bending-compression"
 * ```
 */
export function checkBendingStress(stress: number, allowable: number, options?: SingleCheckOptions): CheckResult {
  const found = new IssueCollector();
  requireFinite(found, stress, ["stress"], "bending stress");
  checkPositive(found, allowable, ["allowable"], "allowable bending stress");
  found.throwIfAny();
  const kind = stress >= 0 ? "bending-tension" : "bending-compression";
  return checkResultAt(["allowable"], kind, `bending stress, ${stress >= 0 ? "tension" : "compression"}`, Math.abs(stress), allowable, options?.at ?? { x: 0 }, "|sigma| <= allowable");
}

/**
 * Non-throwing form of {@link checkBendingStress}.
 *
 * @example
 * ```ts
 * tryCheckBendingStress(100, 0).ok; // false
 * ```
 */
export function tryCheckBendingStress(stress: number, allowable: number, options?: SingleCheckOptions): Result<CheckResult> {
  return attempt(() => checkBendingStress(stress, allowable, options));
}

/**
 * Checks one shear stress against an allowable value: demand = |tau|.
 *
 * @param stress - The shear stress (force / length^2), either sign.
 * @param allowable - The allowable shear stress (force / length^2, > 0), supplied by the user.
 * @param options - Where the stress acts.
 * @returns The check.
 * @throws FlexuraError `allowable-not-positive`, `not-a-number` / `not-finite`.
 * @example
 * ```ts
 * checkShearStress(45, 100).pass; // true
 * ```
 */
export function checkShearStress(stress: number, allowable: number, options?: SingleCheckOptions): CheckResult {
  const found = new IssueCollector();
  requireFinite(found, stress, ["stress"], "shear stress");
  checkPositive(found, allowable, ["allowable"], "allowable shear stress");
  found.throwIfAny();
  return checkResultAt(["allowable"], "shear-stress", "shear stress", Math.abs(stress), allowable, options?.at ?? { x: 0 }, "|tau| <= allowable");
}

/**
 * Non-throwing form of {@link checkShearStress}.
 *
 * @example
 * ```ts
 * tryCheckShearStress(1, Number.NaN).ok; // false
 * ```
 */
export function tryCheckShearStress(stress: number, allowable: number, options?: SingleCheckOptions): Result<CheckResult> {
  return attempt(() => checkShearStress(stress, allowable, options));
}

/** Options of {@link checkDeflection}. */
export interface DeflectionCheckOptions extends SingleCheckOptions {
  /** True for a cantilever: a ratio limit then allows cantileverFactor x L / n (2 L / n unless the limit says otherwise). */
  readonly cantilever?: boolean;
}

/**
 * Checks one deflection against a limit: span / n (a ratio; cantileverFactor x L / n for a
 * cantilever, 2 L / n by default, common practice) or an absolute value. demand = |delta|.
 *
 * @param deflection - The deflection (length), either sign.
 * @param length - The span or cantilever length L (length, > 0).
 * @param limit - `{ kind: "ratio", ratio }` or `{ kind: "absolute", limit }`.
 * @param options - Cantilever or span, and where.
 * @returns The check.
 * @throws FlexuraError `allowable-not-positive` (ratio, limit, factor or length), `unknown-limit-kind`, `not-a-number` / `not-finite`.
 * @example
 * ```ts
 * checkDeflection(-14, 6000, { kind: "ratio", ratio: 360 }).utilisation; // 14 / 16.67 = 0.84
 * ```
 */
export function checkDeflection(deflection: number, length: number, limit: DeflectionLimit, options?: DeflectionCheckOptions): CheckResult {
  const found = new IssueCollector();
  requireFinite(found, deflection, ["deflection"], "deflection");
  checkPositive(found, length, ["length"], "span length");
  const checked = checkLimits(found, { deflection: limit }, []);
  found.throwIfAny();
  const sound = (checked?.deflection as readonly DeflectionLimit[] | undefined)?.[0] ?? limit;
  const cantilever = options?.cantilever === true;
  return deflectionResult(sound, Math.abs(deflection), length, cantilever, options?.at ?? { x: 0 }, cantilever ? "deflection, cantilever" : "deflection, span");
}

/** The deflection check for validated input (shared with the member check). */
export function deflectionResult(limit: DeflectionLimit, demand: number, length: number, cantilever: boolean, at: CheckLocation, label: string, path: IssuePath = ["limit"]): CheckResult {
  if (limit.kind === "absolute") return checkResultAt(path, "deflection", label, demand, limit.limit, at, `|delta| <= ${limit.limit}`);
  const factor = cantilever ? (limit.cantileverFactor ?? 2) : 1;
  const formula = `|delta| <= ${factor === 1 ? "" : `${factor} `}L / ${limit.ratio}${cantilever ? " (cantilever)" : ""}`;
  return checkResultAt(path, "deflection", label, demand, (factor * length) / limit.ratio, at, formula);
}

/**
 * Non-throwing form of {@link checkDeflection}.
 *
 * @example
 * ```ts
 * tryCheckDeflection(1, 1000, { kind: "ratio", ratio: 0 }).ok; // false
 * ```
 */
export function tryCheckDeflection(deflection: number, length: number, limit: DeflectionLimit, options?: DeflectionCheckOptions): Result<CheckResult> {
  return attempt(() => checkDeflection(deflection, length, limit, options));
}
