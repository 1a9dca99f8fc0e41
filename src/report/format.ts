/**
 * Formats a number for a report: `digits` significant figures (default 4), trailing zeros
 * dropped, no `-0`; exponent notation for magnitudes of a million and above or below 0.001.
 * A value that is not finite is written as the words `not finite` so that it cannot pass
 * unnoticed.
 *
 * @param value - The number, in whatever unit the caller names beside it.
 * @param digits - Significant figures, 1 to 21.
 * @example
 * ```ts
 * formatReportNumber(123.456);    // "123.5"
 * formatReportNumber(0.0000123456); // "1.235e-5"
 * formatReportNumber(-0);          // "0"
 * ```
 */
export function formatReportNumber(value: number, digits = 4): string {
  if (!Number.isFinite(value)) return "not finite";
  if (value === 0) return "0";
  const p = Math.min(21, Math.max(1, Math.round(digits)));
  const magnitude = Math.abs(value);
  if (magnitude >= 1e6 || magnitude < 1e-3) {
    const [mantissa = "0", exponent = "0"] = value.toExponential(p - 1).split("e");
    return `${stripZeros(mantissa)}e${exponent.replace("+", "")}`;
  }
  const text = stripZeros(value.toPrecision(p));
  // toPrecision may itself choose exponent form for large values with few digits (1234 to 1 digit).
  if (text.includes("e")) return stripZeros(String(Number(text)));
  return text === "-0" ? "0" : text;
}

function stripZeros(text: string): string {
  if (!text.includes(".")) return text;
  return text.replace(/\.?0+$/, "");
}

/**
 * Formats a number followed by its unit, with a space between (SI practice, NIST SP 811 (2008)
 * section 7.2), or the number alone when `unit` is empty.
 *
 * @example
 * ```ts
 * formatReportQuantity(12.5, "kN"); // "12.5 kN"
 * ```
 */
export function formatReportQuantity(value: number, unit: string, digits = 4): string {
  const text = formatReportNumber(value, digits);
  return unit === "" ? text : `${text} ${unit}`;
}

/**
 * Lays out rows of cells as a plain-text table with columns padded to the widest cell: text
 * columns to the left, columns whose cells all look numeric to the right. The first row is the
 * header and is underlined with dashes.
 *
 * @example
 * ```ts
 * textTable([["at", "force"], ["0 m", "12 kN"]]);
 * ```
 */
export function textTable(rows: readonly (readonly string[])[]): string {
  const columns = Math.max(0, ...rows.map((r) => r.length));
  const widths: number[] = [];
  const numeric: boolean[] = [];
  for (let c = 0; c < columns; c++) {
    widths.push(Math.max(0, ...rows.map((r) => (r[c] ?? "").length)));
    numeric.push(rows.slice(1).every((r) => /^[-+]?[\d.]/.test(r[c] ?? "")) && rows.length > 1);
  }
  const line = (r: readonly string[]): string =>
    widths
      .map((w, c) => {
        const cell = r[c] ?? "";
        return numeric[c] ? cell.padStart(w) : cell.padEnd(w);
      })
      .join("  ")
      .trimEnd();
  const [header, ...body] = rows;
  if (header === undefined) return "";
  const rule = widths.map((w) => "-".repeat(w)).join("  ");
  return [line(header), rule, ...body.map(line)].join("\n");
}

/**
 * Rounds to zero a value that is round-off next to `reference` (at most 1e-9 of it), so that a
 * report shows `0` rather than `1.455e-14` for a moment at a pinned end. Other values are
 * returned unchanged.
 *
 * @param value - The value, in any unit.
 * @param reference - A magnitude of the same quantity, such as its largest absolute value.
 * @example
 * ```ts
 * snapToZero(1.455e-14, 9.76); // 0
 * snapToZero(0.2, 9.76);       // 0.2
 * ```
 */
export function snapToZero(value: number, reference: number): number {
  return Math.abs(value) <= 1e-9 * Math.abs(reference) ? 0 : value;
}

/**
 * A utilisation to three significant figures, trailing zeros kept (1.196 is "1.20", never "1.2").
 *
 * @param value - demand / capacity (finite, >= 0).
 * @example
 * ```ts
 * utilisationText(1.196); // "1.20"
 * ```
 */
export function utilisationText(value: number): string {
  if (!Number.isFinite(value)) return "not finite";
  if (value === 0) return "0.00";
  if (Math.abs(value) >= 1000) return value.toFixed(0);
  const t = value.toPrecision(3);
  return t.includes("e") ? Number(t).toString() : t;
}
