import { attempt, describeValue, fail, FlexuraError, issue, IssueCollector, requireFinite, type FlexuraIssue, type Result } from "../errors/index.js";
import { describeDimension, sameDimension } from "./kinds.js";
import { readOptions } from "./options.js";
import { rescale } from "./scale.js";
import { resolveUnit } from "./unit.js";

/**
 * Options for {@link formatQuantity}.
 */
export interface FormatQuantityOptions {
  /** The unit `value` is in; default: the SI base unit of `unit`'s dimension (m, N, N*m, Pa...). */
  readonly from?: string;
  /** Significant digits shown, 1 to 17 (default 4). Ignored when `decimals` is given. */
  readonly significantDigits?: number;
  /** Fixed number of digits after the decimal point, 0 to 12. */
  readonly decimals?: number;
  /** `"plain"` (default) prints `kN*m` and `mm^4`; `"pretty"` prints `kN·m` and `mm⁴`. */
  readonly style?: "plain" | "pretty";
}

const SUPERSCRIPT = "⁰¹²³⁴⁵⁶⁷⁸⁹";

function pretty(unit: string): string {
  return unit.replace(/\*/g, "·").replace(/\^(-?)(\d+)/g, (_m, sign: string, digits: string) =>
    (sign === "-" ? "⁻" : "") + [...digits].map((d) => SUPERSCRIPT[Number(d)] ?? d).join(""),
  );
}

function number(value: number, options: FormatQuantityOptions | undefined): string {
  if (options?.decimals !== undefined) return value.toFixed(options.decimals);
  const rounded = Number(value.toPrecision(options?.significantDigits ?? 4));
  if (rounded === 0) return "0";
  const size = Math.abs(rounded);
  if (size >= 1e-4 && size < 1e15) return String(rounded);
  return rounded.toExponential().replace("e+", "e");
}

function checkDigits(found: FlexuraIssue[], value: number | undefined, name: string, low: number, high: number): void {
  if (value === undefined || (Number.isInteger(value) && value >= low && value <= high)) return;
  found.push(issue("format-digits-out-of-range", ["options", name], `${name} must be a whole number from ${low} to ${high}; got ${String(value)}.`, { value }));
}

/**
 * Formats a value for display in a chosen unit: `"12.35 kN*m"`. The value is converted exactly
 * (rounded once) and then rounded for display.
 *
 * @param value - The value, in SI base units unless `options.from` names its unit.
 * @param unit - The unit to show it in, such as `unitSystems.usKipFoot.moment`; `""` shows a plain number.
 * @param options - See {@link FormatQuantityOptions}.
 * @returns The number, a space and the unit (just the number when `unit` is `""`).
 * @throws FlexuraError `not-a-number`, `not-finite` (value); `unit-not-a-string`, `unit-syntax`,
 *   `unknown-unit`, `unit-out-of-range` (`unit` or `from`); `incompatible-units`; `format-digits-out-of-range`; `number-out-of-range`;
 *   `options-invalid` (options not an object, or an unknown `style`).
 * @example
 * ```ts
 * formatQuantity(12345, "kN*m");                      // "12.35 kN*m" (12345 N*m)
 * formatQuantity(1.2e-4, "mm^4", { style: "pretty" }); // "120000000 mm⁴"
 * formatQuantity(3, "in", { from: "ft", decimals: 1 }); // "36.0 in"
 * ```
 */
export function formatQuantity(value: number, unit: string, options?: FormatQuantityOptions): string {
  const style = readOptions(options)?.["style"];
  if (style !== undefined && style !== "plain" && style !== "pretty")
    fail("options-invalid", ["options", "style"], `The style must be "plain" or "pretty"; got ${describeValue(style)}.`);
  const found: FlexuraIssue[] = [];
  const collector = new IssueCollector();
  const finite = requireFinite(collector, value, ["value"], "value to format");
  found.push(...collector.issues);
  checkDigits(found, options?.significantDigits, "significantDigits", 1, 17);
  checkDigits(found, options?.decimals, "decimals", 0, 12);
  const to = unit === "" ? undefined : resolveUnit(unit, ["unit"]);
  const from = options?.from === undefined || options.from === "" ? undefined : resolveUnit(options.from, ["options", "from"]);
  if (Array.isArray(to)) found.push(...to);
  if (Array.isArray(from)) found.push(...from);
  if (from !== undefined && !Array.isArray(from) && !Array.isArray(to)) {
    const toDimension = to?.dimension ?? { length: 0, force: 0, angle: 0 };
    if (!sameDimension(from.dimension, toDimension)) {
      found.push(
        issue("incompatible-units", ["unit"], `Cannot show a value in ${from.unit} (${describeDimension(from.dimension)}) as ${to?.unit ?? "a plain number"} (${describeDimension(toDimension)}).`, {
          fromUnit: from.unit,
          toUnit: to?.unit ?? "",
        }),
      );
    }
  }
  if (!finite || Array.isArray(to) || Array.isArray(from) || found.length > 0) throw new FlexuraError(found);
  const shown = rescale(value, from, to, ["value"], () => String(value));
  if (typeof shown !== "number") throw new FlexuraError([shown]);
  const text = number(shown, options);
  if (to === undefined) return text;
  return `${text} ${options?.style === "pretty" ? pretty(to.unit) : to.unit}`;
}

/**
 * The non-throwing form of {@link formatQuantity}.
 *
 * @example
 * ```ts
 * const r = tryFormatQuantity(1, "furlong");
 * if (!r.ok) console.log(r.error.code); // "unknown-unit"
 * ```
 */
export function tryFormatQuantity(value: number, unit: string, options?: FormatQuantityOptions): Result<string> {
  return attempt(() => formatQuantity(value, unit, options));
}
