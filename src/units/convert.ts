import { attempt, FlexuraError, issue, IssueCollector, requireFinite, type FlexuraIssue, type IssuePath, type Result } from "../errors/index.js";
import { describeDimension, sameDimension } from "./kinds.js";
import { optionsPath } from "./options.js";
import { rescale } from "./scale.js";
import { resolveUnit, type UnitFactor } from "./unit.js";

/**
 * Options for {@link convert} and {@link conversionFactor}.
 */
export interface ConvertOptions {
  /** Path put before `"value"`, `"fromUnit"` and `"toUnit"` on every issue reported (default `[]`). */
  readonly path?: IssuePath;
}

function resolvePair(fromUnit: unknown, toUnit: unknown, path: IssuePath, found: FlexuraIssue[]): readonly [UnitFactor, UnitFactor] | undefined {
  const from = resolveUnit(fromUnit, [...path, "fromUnit"]);
  const to = resolveUnit(toUnit, [...path, "toUnit"]);
  if (Array.isArray(from)) found.push(...from);
  if (Array.isArray(to)) found.push(...to);
  if (Array.isArray(from) || Array.isArray(to)) return undefined;
  if (!sameDimension(from.dimension, to.dimension)) {
    found.push(
      issue(
        "incompatible-units",
        [...path, "toUnit"],
        `Cannot convert ${from.unit} (${describeDimension(from.dimension)}) to ${to.unit} (${describeDimension(to.dimension)}): they measure different things.`,
        { fromUnit: from.unit, toUnit: to.unit, fromDimension: describeDimension(from.dimension), toDimension: describeDimension(to.dimension) },
      ),
    );
    return undefined;
  }
  return [from, to];
}

/**
 * Converts a number from one unit to another of the same dimension, exactly, rounding once:
 * `value` is taken as the shortest decimal that names it (so 0.29 is 0.29, not its binary
 * neighbour) and multiplied by the exact ratio of the two units' factors.
 *
 * @param value - A finite number, in `fromUnit`.
 * @param fromUnit - Such as `"kip/ft"`.
 * @param toUnit - Such as `"kN/m"`; must have the same dimension as `fromUnit` (the radian counts as 1).
 * @param options - See {@link ConvertOptions}.
 * @returns The number of `toUnit`s.
 * @throws FlexuraError `not-a-number`, `not-finite` (value); `unit-not-a-string`, `unit-empty`,
 *   `unit-syntax`, `unknown-unit`, `unit-out-of-range` (either unit); `incompatible-units`; `number-out-of-range`;
 *   `options-invalid` (options not an object, or a path that is not a list of names and indices).
 * @example
 * ```ts
 * convert(1, "in", "mm");       // 25.4
 * convert(0.29, "m", "cm");     // 29 (a plain 0.29 * 100 gives 28.999999999999996)
 * convert(1, "kip/ft", "kN/m"); // 14.593902937206364
 * ```
 */
export function convert(value: number, fromUnit: string, toUnit: string, options?: ConvertOptions): number {
  const path = optionsPath(options);
  const found: FlexuraIssue[] = [];
  const collector = new IssueCollector();
  const finite = requireFinite(collector, value, [...path, "value"], "value to convert");
  found.push(...collector.issues);
  const pair = resolvePair(fromUnit, toUnit, path, found);
  if (!finite || pair === undefined || found.length > 0) throw new FlexuraError(found);
  const [from, to] = pair;
  if (from.unit === to.unit) return value === 0 ? 0 : value;
  const out = rescale(value, from, to, [...path, "value"], () => `${value} ${from.unit}`);
  if (typeof out !== "number") throw new FlexuraError([out]);
  return out;
}

/**
 * The non-throwing form of {@link convert}.
 *
 * @example
 * ```ts
 * const r = tryConvert(3, "m", "kN");
 * if (!r.ok) console.log(r.error.code); // "incompatible-units"
 * ```
 */
export function tryConvert(value: number, fromUnit: string, toUnit: string, options?: ConvertOptions): Result<number> {
  return attempt(() => convert(value, fromUnit, toUnit, options));
}

/**
 * How many `toUnit`s make one `fromUnit`: the exact ratio rounded once to a JavaScript number.
 * For converting many values in a hot loop (each product then rounds once more); {@link convert}
 * is exact for a single value.
 *
 * @param fromUnit - Such as `"kip*ft"`.
 * @param toUnit - Such as `"kN*m"`, of the same dimension.
 * @param options - See {@link ConvertOptions}.
 * @returns The multiplier from `fromUnit` to `toUnit`.
 * @throws FlexuraError `unit-not-a-string`, `unit-empty`, `unit-syntax`, `unknown-unit`, `incompatible-units`,
 *   `unit-out-of-range`, `number-out-of-range` (a ratio beyond a JavaScript number, possible only with extreme powers), `options-invalid`.
 * @example
 * ```ts
 * const k = conversionFactor("kip*ft", "kN*m"); // 1.3558179483314003
 * const moments = [10, 20, 30].map((m) => m * k);
 * ```
 */
export function conversionFactor(fromUnit: string, toUnit: string, options?: ConvertOptions): number {
  const path = optionsPath(options);
  const found: FlexuraIssue[] = [];
  const pair = resolvePair(fromUnit, toUnit, path, found);
  if (pair === undefined) throw new FlexuraError(found);
  const [from, to] = pair;
  const ratio = rescale(1, from, to, path, () => `1 ${from.unit}`);
  if (typeof ratio !== "number") throw new FlexuraError([ratio]);
  return ratio;
}

/**
 * The non-throwing form of {@link conversionFactor}.
 *
 * @example
 * ```ts
 * const r = tryConversionFactor("psi", "MPa");
 * if (r.ok) console.log(r.value); // 0.006894757293168362
 * ```
 */
export function tryConversionFactor(fromUnit: string, toUnit: string, options?: ConvertOptions): Result<number> {
  return attempt(() => conversionFactor(fromUnit, toUnit, options));
}
