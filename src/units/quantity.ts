import { attempt, describeValue, FlexuraError, issue, type FlexuraIssue, type IssuePath, type Result } from "../errors/index.js";
import { checkFits, checkKind } from "./check.js";
import { dimensionOfKind, fitsDimension, isQuantityKind, type QuantityKind } from "./kinds.js";
import { readLeadingNumber } from "./number.js";
import { optionsPath } from "./options.js";
import { rescale } from "./scale.js";
import { resolveUnit, type UnitFactor } from "./unit.js";
import { KIND_WORDS, kindExamples } from "./words.js";

/**
 * A quantity read from text such as `"1.5 kip/ft"`.
 */
export interface Quantity {
  /** The kind of quantity that was asked for. */
  readonly kind: QuantityKind;
  /**
   * The value in SI base units: m, N, N*m, N/m, Pa, m^2, m^4, m^3, N/m, N*m/rad, rad
   * (exact conversion, rounded once). The sign is kept as written.
   */
  readonly value: number;
  /** The number as written, in `unit`. */
  readonly amount: number;
  /** The unit as written, normalised (`"kip / ft"` gives `"kip/ft"`); `""` when none was given. */
  readonly unit: string;
}

/**
 * Options for {@link parseQuantity} and {@link convertQuantity}.
 */
export interface ParseQuantityOptions {
  /** Path put on every issue reported (default `[]`), such as `["loads", 2, "value"]`. */
  readonly path?: IssuePath;
}

interface Read {
  readonly quantity: Quantity;
  readonly digits: string;
  readonly unit: UnitFactor | undefined;
}

/** Reads text as a quantity of `kind`; collects every issue found. */
export function readQuantity(text: unknown, kind: unknown, path: IssuePath, found: FlexuraIssue[]): Read | undefined {
  const kindIssue = checkKind(kind, path);
  if (kindIssue) found.push(kindIssue);
  if (typeof text !== "string") {
    found.push(issue("quantity-not-a-string", path, `A quantity must be a string such as "12 kN" or "1.5 kip/ft"; got ${describeValue(text)}.`, { value: describeValue(text) }));
    return undefined;
  }
  if (text.trim() === "") {
    found.push(issue("quantity-empty", path, 'The quantity is empty; give a number and a unit, such as "12 kN".', { text }));
    return undefined;
  }
  const number = readLeadingNumber(text);
  if (number === undefined) {
    found.push(issue("number-missing", path, `${JSON.stringify(text)} does not start with a number; write the number first, as in "12 kN".`, { text }));
    return undefined;
  }
  const asNumber = Number(number.digits);
  if (!Number.isFinite(asNumber) || (asNumber === 0 && /[1-9]/.test(number.digits.split(/[eE]/)[0] ?? ""))) {
    found.push(issue("number-out-of-range", path, `The number ${number.digits} in ${JSON.stringify(text)} is outside what a JavaScript number can hold (about 5e-324 to 1.8e308).`, { text }));
    return undefined;
  }
  const unitText = number.rest.trim();
  let unit: UnitFactor | undefined;
  if (unitText === "") {
    if (isQuantityKind(kind) && !fitsDimension({ length: 0, force: 0, angle: 0 }, dimensionOfKind(kind))) {
      found.push(issue("unit-missing", path, `${JSON.stringify(text)} has no unit; ${KIND_WORDS[kind]} is due here, so add a unit such as ${kindExamples(kind)}.`, { text, expected: kind }));
      return undefined;
    }
  } else {
    const read = resolveUnit(unitText, path);
    if (Array.isArray(read)) {
      found.push(...read);
      return undefined;
    }
    unit = read;
    if (isQuantityKind(kind)) {
      const wrong = checkFits(unit, kind, path, () => JSON.stringify(text));
      if (wrong) {
        found.push(wrong);
        return undefined;
      }
    }
  }
  if (!isQuantityKind(kind)) return undefined;
  const value = rescale(number.digits, unit, undefined, path, () => JSON.stringify(text));
  if (typeof value !== "number") {
    found.push(value);
    return undefined;
  }
  const quantity: Quantity = Object.freeze({ kind, value, amount: asNumber === 0 ? 0 : asNumber, unit: unit?.unit ?? "" });
  return { quantity, digits: number.digits, unit };
}

/**
 * Reads a quantity written as a number and a unit, checks that the unit fits the kind asked for,
 * and converts the value exactly to SI base units (rounded once to a JavaScript number).
 *
 * The number may have a sign, a decimal point and an exponent (`"-1.5e3 N"`); the unit follows
 * the grammar of {@link unitFactor}. A `rotation` or `dimensionless` quantity may omit the unit.
 *
 * @param text - Such as `"1.5 kip/ft"`, `"29000 ksi"`, `"350 in^4"`, `"12 kN*m"`.
 * @param kind - The kind of quantity due; the unit must be of its dimension.
 * @param options - See {@link ParseQuantityOptions}.
 * @returns The quantity, `value` in SI base units.
 * @throws FlexuraError `quantity-not-a-string`, `quantity-empty`, `number-missing`, `number-out-of-range`,
 *   `unit-missing`, `unit-syntax`, `unknown-unit`, `unit-out-of-range`, `wrong-dimension`, `unknown-quantity-kind`, `options-invalid`.
 * @example
 * ```ts
 * parseQuantity("1.5 kip/ft", "forcePerLength").value; // 21890.854405809547 (N/m)
 * parseQuantity("200 GPa", "stress");                  // { kind: "stress", value: 2e11, amount: 200, unit: "GPa" }
 * parseQuantity("5 mm", "force");                       // throws: wrong-dimension
 * ```
 */
export function parseQuantity(text: string, kind: QuantityKind, options?: ParseQuantityOptions): Quantity {
  const found: FlexuraIssue[] = [];
  const read = readQuantity(text, kind, optionsPath(options), found);
  if (read === undefined || found.length > 0) throw new FlexuraError(found);
  return read.quantity;
}

/**
 * The non-throwing form of {@link parseQuantity}.
 *
 * @example
 * ```ts
 * const r = tryParseQuantity("12 kip/", "force");
 * if (!r.ok) console.log(r.error.code); // "unit-syntax"
 * ```
 */
export function tryParseQuantity(text: string, kind: QuantityKind, options?: ParseQuantityOptions): Result<Quantity> {
  return attempt(() => parseQuantity(text, kind, options));
}

/**
 * Reads a quantity (as {@link parseQuantity}) and expresses it in `toUnit`, converting exactly
 * from the number as written and rounding once.
 *
 * @param text - Such as `"29000 ksi"`.
 * @param kind - The kind of quantity due; both units must be of its dimension.
 * @param toUnit - The unit wanted, such as `"MPa"`.
 * @param options - See {@link ParseQuantityOptions}; issues about `toUnit` get the path plus `"toUnit"`.
 * @returns The number of `toUnit`s.
 * @throws FlexuraError the codes of {@link parseQuantity}, and for `toUnit`: `unit-not-a-string`,
 *   `unit-empty`, `unit-syntax`, `unknown-unit`, `unit-out-of-range`, `wrong-dimension`.
 * @example
 * ```ts
 * convertQuantity("29000 ksi", "stress", "MPa"); // 199947.961...
 * convertQuantity("12 kN*m", "moment", "kip*ft"); // 8.850...
 * ```
 */
export function convertQuantity(text: string, kind: QuantityKind, toUnit: string, options?: ParseQuantityOptions): number {
  const path = optionsPath(options);
  const found: FlexuraIssue[] = [];
  const read = readQuantity(text, kind, path, found);
  const to = resolveUnit(toUnit, [...path, "toUnit"]);
  if (Array.isArray(to)) found.push(...to);
  else if (isQuantityKind(kind)) {
    const wrong = checkFits(to, kind, [...path, "toUnit"], () => `The unit ${JSON.stringify(toUnit)}`);
    if (wrong) found.push(wrong);
  }
  if (read === undefined || Array.isArray(to) || found.length > 0) throw new FlexuraError(found);
  const value = rescale(read.digits, read.unit, to, path, () => JSON.stringify(text));
  if (typeof value !== "number") throw new FlexuraError([value]);
  return value;
}

/**
 * The non-throwing form of {@link convertQuantity}.
 *
 * @example
 * ```ts
 * const r = tryConvertQuantity("12 kN", "force", "mm");
 * if (!r.ok) console.log(r.error.code); // "wrong-dimension"
 * ```
 */
export function tryConvertQuantity(text: string, kind: QuantityKind, toUnit: string, options?: ParseQuantityOptions): Result<number> {
  return attempt(() => convertQuantity(text, kind, toUnit, options));
}
