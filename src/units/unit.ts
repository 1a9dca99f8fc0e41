import type { Decimal } from "decimal.js";
import { attempt, describeValue, FlexuraError, issue, type FlexuraIssue, type IssuePath, type Result } from "../errors/index.js";
import { ExactDecimal, handOut, ONE } from "./decimal.js";
import { MAX_POWER, parseUnitExpression, printUnitExpression, symbolsOf, type UnitExpression, type UnitTerm } from "./grammar.js";
import { describeDimension, kindsOfDimension, type Dimension, type QuantityKind } from "./kinds.js";
import { optionsPath } from "./options.js";
import { suggestUnits } from "./suggest.js";

/**
 * What a unit is worth in SI base units (metre, newton, radian), exactly.
 * One unit equals `numerator / denominator` base units: two exact decimals composed from the
 * catalogue's exact definitions (products and powers of terminating decimals, exact within 64
 * significant digits); the one division is done last.
 */
export interface UnitFactor {
  /** Tag: always `"unit-factor"`. */
  readonly kind: "unit-factor";
  /** The unit as flexura prints it: canonical symbols, `*`, `/`, `^` (`"kip*ft"`, `"N/mm^2"`). */
  readonly unit: string;
  /** Exponents of length, force and angle. */
  readonly dimension: Dimension;
  /** The kinds of quantity this unit can express (empty for a dimension flexura has no kind for). */
  readonly kinds: readonly QuantityKind[];
  /** Numerator of the exact value of one unit in SI base units (`0.0254` for `in`). */
  readonly numerator: Decimal;
  /** Denominator of the exact value of one unit in SI base units (`1` for `in`, `0.00064516` for `psi`). */
  readonly denominator: Decimal;
  /** `numerator / denominator` to 64 significant digits (exact when it terminates within them). */
  readonly factor: Decimal;
  /** `factor` rounded once to a JavaScript number, for hot loops. */
  readonly scale: number;
}

/**
 * Options for {@link unitFactor}.
 */
export interface UnitFactorOptions {
  /** Path put on every issue reported (default `[]`), such as `["loads", 2, "unit"]`. */
  readonly path?: IssuePath;
}

const CACHE_LIMIT = 256;
/** The smallest positive normal double (2^-1022). */
const MIN_NORMAL = 2 ** -1022;
const cache = new Map<string, UnitFactor>();

interface Accumulated {
  numerator: Decimal;
  denominator: Decimal;
  /** The first symbol whose powers multiply beyond the limit, as `m^16`. */
  tooHigh: string | undefined;
  length: number;
  force: number;
  angle: number;
}

function accumulate(expression: UnitExpression, power: number, into: Accumulated): void {
  const term = (t: UnitTerm, p: number): void => {
    if (t.kind === "group") {
      accumulate(t.body, p * t.power, into);
      return;
    }
    const u = t.unit;
    if (u === undefined) return; // reported by the caller
    const e = p * t.power;
    if (Math.abs(e) > MAX_POWER) {
      into.tooHigh ??= `${u.symbol}^${e}`;
      return;
    }
    const [up, down] = e >= 0 ? [u.numerator, u.denominator] : [u.denominator, u.numerator];
    const n = Math.abs(e);
    into.numerator = into.numerator.times(up.pow(n));
    into.denominator = into.denominator.times(down.pow(n));
    into.length += e * u.dimension.length;
    into.force += e * u.dimension.force;
    into.angle += e * u.dimension.angle;
  };
  for (const t of expression.numerator) term(t, power);
  if (expression.denominator) term(expression.denominator, -power);
}

/** Numerator and denominator scaled to integers by one power of ten, as doubles when both are below 2^53 (else Infinity). */
export interface SmallRatio {
  readonly num: number;
  readonly den: number;
}

const SMALL = new WeakMap<UnitFactor, SmallRatio>();
/** The exact numerator and denominator flexura computes with, per factor (the handed-out ones are copies). */
const OWN_PARTS = new WeakMap<UnitFactor, readonly [Decimal, Decimal]>();

/** The numerator and denominator of `unit` to compute with: flexura's own when it made `unit`. */
export function exactPartsOf(unit: UnitFactor): readonly [Decimal, Decimal] {
  return OWN_PARTS.get(unit) ?? [unit.numerator, unit.denominator];
}

function smallRatio(numerator: Decimal, denominator: Decimal): SmallRatio {
  const scale = Math.max(numerator.decimalPlaces(), denominator.decimalPlaces());
  // receivers made with flexura's own constructor, whatever made the arguments
  const num = new ExactDecimal(numerator).times(10 ** scale).toNumber();
  const den = new ExactDecimal(denominator).times(10 ** scale).toNumber();
  return num < 2 ** 53 && den < 2 ** 53 && scale <= 22 ? { num, den } : { num: Infinity, den: Infinity };
}

/** The unit's value as a ratio of two integers below 2^53, when it is one (internal fast path). */
export function smallRatioOf(unit: UnitFactor): SmallRatio {
  return SMALL.get(unit) ?? smallRatio(unit.numerator, unit.denominator);
}

/**
 * Reads a unit and returns the issues found (syntax, or every unknown symbol) or its factor.
 * Does not touch the cache.
 */
export function readUnit(text: string, path: IssuePath): FlexuraIssue[] | UnitFactor {
  const parsed = parseUnitExpression(text);
  if (!parsed.ok) {
    const { message, at } = parsed.problem;
    return [issue("unit-syntax", path, `The unit ${JSON.stringify(text)} cannot be read: ${message} (at character ${at + 1}).`, { unit: text, at })];
  }
  const unknown = symbolsOf(parsed.expression).filter((s) => s.unit === undefined);
  if (unknown.length > 0) {
    return unknown.map((s) => {
      const suggestions = suggestUnits(s.spelling);
      const hint = suggestions.length > 0 ? ` Did you mean ${suggestions.map((x) => JSON.stringify(x)).join(" or ")}?` : " docs/units.md lists the units flexura knows.";
      return issue("unknown-unit", path, `Unknown unit ${JSON.stringify(s.spelling)}${s.spelling === text.trim() ? "" : ` in ${JSON.stringify(text)}`}.${hint}`, {
        unit: text,
        token: s.spelling,
        suggestions,
      });
    });
  }
  const acc: Accumulated = { numerator: ONE, denominator: ONE, tooHigh: undefined, length: 0, force: 0, angle: 0 };
  accumulate(parsed.expression, 1, acc);
  if (acc.tooHigh !== undefined) {
    const message = `The unit ${JSON.stringify(text)} cannot be read: its powers multiply to ${acc.tooHigh}, beyond the limit of ${MAX_POWER}.`;
    return [issue("unit-syntax", path, message, { unit: text, at: 0 })];
  }
  const dimension: Dimension = Object.freeze({ length: acc.length, force: acc.force, angle: acc.angle });
  const factor = acc.numerator.div(acc.denominator);
  const scale = factor.toNumber();
  const unit = printUnitExpression(parsed.expression);
  // a factor a double cannot hold (or holds only as a subnormal, with lost digits) would give Infinity or 0
  if (!(scale < Infinity && scale >= MIN_NORMAL)) {
    const message = `The unit ${JSON.stringify(text)} is worth ${factor.toExponential(3)} ${describeDimension(dimension)} in SI base units, ${scale >= 1 ? "more" : "less"} than a JavaScript number can hold (about 2.2e-308 to 1.8e308); use a unit of smaller powers.`;
    return [issue("unit-out-of-range", path, message, { unit: text })];
  }
  const result: UnitFactor = Object.freeze({
    kind: "unit-factor",
    unit,
    dimension,
    kinds: kindsOfDimension(dimension),
    numerator: handOut(acc.numerator),
    denominator: handOut(acc.denominator),
    factor: handOut(factor),
    scale,
  });
  SMALL.set(result, smallRatio(acc.numerator, acc.denominator));
  OWN_PARTS.set(result, [acc.numerator, acc.denominator]);
  return result;
}

/**
 * Checks the type and emptiness of a unit argument, then reads it (through a bounded cache,
 * which holds only frozen values and so cannot be changed by callers).
 * Returns the issues found, or the factor.
 */
export function resolveUnit(unit: unknown, path: IssuePath): FlexuraIssue[] | UnitFactor {
  if (typeof unit !== "string") {
    return [issue("unit-not-a-string", path, `A unit must be a string such as "kN" or "kip/ft"; got ${describeValue(unit)}.`, { value: describeValue(unit) })];
  }
  const hit = cache.get(unit);
  if (hit !== undefined) return hit;
  if (unit.trim() === "") return [issue("unit-empty", path, "The unit is empty; give one such as \"kN\", \"mm\" or \"kip/ft\".", { unit })];
  const read = readUnit(unit, path);
  if (!Array.isArray(read)) {
    if (cache.size >= CACHE_LIMIT) {
      const oldest = cache.keys().next();
      if (oldest.done !== true) cache.delete(oldest.value);
    }
    cache.set(unit, read);
  }
  return read;
}

/**
 * The exact value of a unit in SI base units (metre, newton, radian), with its dimension and
 * the kinds of quantity it can express. Repeated calls with the same text are served from a
 * small cache.
 *
 * Grammar: symbols joined by `*` (or `·`, `-`), at most one `/` per level (group with
 * parentheses for more), integer powers as `^2`, `^-1`, `²`, or digits right after a symbol
 * (`mm4`). See docs/units.md.
 *
 * @param unit - The unit text, such as `"kip*ft"`, `"N/mm^2"` or `"in^4"`.
 * @param options - See {@link UnitFactorOptions}.
 * @returns The factor; `factor` and `scale` are the SI value of one `unit`.
 * @throws FlexuraError `unit-not-a-string`, `unit-empty`, `unit-syntax`, `unknown-unit` (one issue per unknown symbol, with suggestions),
 *   `unit-out-of-range` (a value in SI base units beyond what a double holds, such as `GPa^12*GPa^12*GPa^12`), `options-invalid`.
 * @example
 * ```ts
 * unitFactor("kip*ft").factor.toString(); // "1355.8179483314004" (N*m, exact)
 * unitFactor("in^4").scale;              // 4.162314256e-7 (m^4)
 * unitFactor("kN/m").kinds;              // ["forcePerLength", "translationalStiffness"]
 * ```
 */
export function unitFactor(unit: string, options?: UnitFactorOptions): UnitFactor {
  const read = resolveUnit(unit, optionsPath(options));
  if (Array.isArray(read)) throw new FlexuraError(read);
  return read;
}

/**
 * The non-throwing form of {@link unitFactor}.
 *
 * @example
 * ```ts
 * const r = tryUnitFactor("furlong");
 * if (!r.ok) console.log(r.error.code); // "unknown-unit"
 * ```
 */
export function tryUnitFactor(unit: string, options?: UnitFactorOptions): Result<UnitFactor> {
  return attempt(() => unitFactor(unit, options));
}
