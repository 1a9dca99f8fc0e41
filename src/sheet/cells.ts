/**
 * What a spreadsheet hands a function: a number, a text, a logical, or a blank (`null`); a range is a
 * rectangle of them, rows of cells.
 */
export type CellValue = number | string | boolean | null;

/** A rectangular range: rows of cells, all rows of one length. */
export type CellRange = readonly (readonly CellValue[])[];

/** A cell's answer when something is wrong: a stable `code` and a message naming the argument and row. */
export interface SheetError {
  /** Tag: always `"sheet-error"`. */
  readonly kind: "sheet-error";
  /** The library's issue code (for example `load-outside-member`), or the sheet's own (`sheet-*`). */
  readonly code: string;
  /** The message the cell shows: the argument (and row) in plain words, then what is wrong. */
  readonly message: string;
}

/** What a sheet function returns: a number, a text, a table (rows of cells, for spilling), or an error. */
export type SheetValue = number | string | boolean | readonly (readonly CellValue[])[] | SheetError;

/** Makes a {@link SheetError}. */
export function sheetError(code: string, message: string): SheetError {
  return Object.freeze({ kind: "sheet-error", code, message });
}

/** Whether a sheet function's answer is an error. */
export function isSheetError(value: unknown): value is SheetError {
  return typeof value === "object" && value !== null && !Array.isArray(value) && (value as { kind?: unknown }).kind === "sheet-error";
}

/** Whether a cell is blank: empty, `null`, or only spaces. */
export function isBlank(value: unknown): boolean {
  return value === null || value === undefined || (typeof value === "string" && value.trim() === "");
}

/**
 * A cell read as the model reader takes it: a number; text that is a plain number (a number stored as text)
 * becomes that number; other text (`"12 ft"`, `"3.5 kN/m"`) is kept for the model reader to convert, and
 * a blank is `undefined`.
 */
export function cellQuantity(value: unknown): number | string | undefined {
  if (isBlank(value)) return undefined;
  if (typeof value === "number") return value;
  if (typeof value === "string") {
    const t = value.trim();
    const n = Number(t);
    return /^[+-]?(\d+\.?\d*|\.\d+)([eE][+-]?\d+)?$/.test(t) && Number.isFinite(n) ? n : t;
  }
  return String(value);
}

/** A cell read as a word (a kind, a name), trimmed and lower-cased; blank is `undefined`. */
export function cellWord(value: unknown): string | undefined {
  return isBlank(value) ? undefined : String(value).trim().toLowerCase();
}

/**
 * The rows of a range argument, with blank rows at the end dropped (a range drawn larger than its
 * data); a single cell counts as a range of one row. Anything else is `undefined`.
 */
export function rangeRows(value: unknown): readonly (readonly CellValue[])[] | undefined {
  if (!Array.isArray(value)) return isBlank(value) ? [] : [[value as CellValue]];
  const rows = value.map((r: unknown) => (Array.isArray(r) ? (r as CellValue[]) : [r as CellValue]));
  let end = rows.length;
  while (end > 0 && rows[end - 1]!.every((c) => isBlank(c))) end -= 1;
  return rows.slice(0, end);
}

/** A cell's content as a message quotes it: text and numbers as they are, a blank as empty, a range as "a range". */
export function shown(value: unknown): string {
  if (isBlank(value)) return "";
  if (typeof value === "string" || typeof value === "number" || typeof value === "boolean") return String(value);
  return Array.isArray(value) ? "a range" : "a value that is not a number or text";
}
