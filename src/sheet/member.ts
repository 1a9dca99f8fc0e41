import { cellQuantity, cellWord, isBlank, isSheetError, rangeRows, sheetError, shown, type SheetError } from "./cells.js";

/** Plain JSON of a model file (docs/model-format.md), as built from cells. */
export type ModelJson = Record<string, unknown>;

const SUPPORT_KINDS = ["pin", "roller", "fixed", "guided", "spring"] as const;
const LOAD_KINDS = ["point", "moment", "distributed"] as const;

/** Unit-system presets a sheet may name (the model format's `units.system`). */
export const SHEET_UNIT_SYSTEMS = ["siNewtonMetre", "siKilonewtonMetre", "siNewtonMillimetre", "usKipFoot", "usKipInch"] as const;

/**
 * Builds a model file's JSON from a member given cell by cell:
 * - `length`, `E` (modulus unit) and `I` (second-moment unit): cells, numbers in the sheet's units or text with units;
 *   `I` may instead be a range of rows `start | end | I | E` for a stepped member (E blank: the `E` argument's),
 *   or blank when a section gives the stiffness; a blank `E` is left out (a segment or material gives it);
 * - `supports`: rows of `position | kind | value`, kind `pin`, `roller`, `fixed`, `guided` or `spring`; value is the
 *   spring's stiffness for `spring`, else an optional settlement (positive downward);
 * - `loads`: rows of `kind | position | end position | value | end value | case`: `point` and `moment` use
 *   position and value; `distributed` runs from position to end position (blank: the whole member) with value at
 *   its start and end value at its end (blank: uniform); forces positive downward, couples counterclockwise;
 * - `units`: a preset name (blank: the model format's defaults, m, kN, mm, MPa).
 * Returns the model JSON, or an error naming the argument and row.
 */
export function memberModelJson(length: unknown, E: unknown, I: unknown, supports: unknown, loads: unknown, units: unknown): ModelJson | SheetError {
  const system = isBlank(units) ? undefined : SHEET_UNIT_SYSTEMS.find((s) => s.toLowerCase() === String(units).trim().toLowerCase());
  if (!isBlank(units) && system === undefined) {
    return sheetError("sheet-unknown-units", `units: "${shown(units)}" is not a unit set; use one of ${SHEET_UNIT_SYSTEMS.join(", ")}.`);
  }
  const supportRows = rangeRows(supports);
  const loadRows = rangeRows(loads);
  if (supportRows === undefined) return sheetError("sheet-range-invalid", "supports: give a range of rows: position | kind | value.");
  if (loadRows === undefined) return sheetError("sheet-range-invalid", "loads: give a range of rows: kind | position | end position | value | end value | case.");
  const stiffness = stiffnessJson(I);
  if (isSheetError(stiffness)) return stiffness;
  const model: ModelJson = {
    ...(system === undefined ? {} : { units: { system } }),
    length: cellQuantity(length),
    ...(isBlank(E) ? {} : { E: cellQuantity(E) }),
    ...stiffness,
    supports: [] as unknown[],
    loads: [] as unknown[],
  };
  for (const [i, row] of supportRows.entries()) {
    if (row.every((c) => isBlank(c))) continue;
    const kind = cellWord(row[1]);
    if (kind === undefined || !(SUPPORT_KINDS as readonly string[]).includes(kind)) {
      return sheetError("sheet-unknown-kind", `supports row ${i + 1}, kind: "${shown(row[1])}" is not a support kind; use ${SUPPORT_KINDS.join(", ")}.`);
    }
    const value = cellQuantity(row[2]);
    const extra = value === undefined ? {} : kind === "spring" ? { stiffness: value } : { settlement: value };
    (model["supports"] as unknown[]).push({ at: cellQuantity(row[0]), type: kind, ...extra });
  }
  for (const [i, row] of loadRows.entries()) {
    if (row.every((c) => isBlank(c))) continue;
    const kind = cellWord(row[0]);
    if (kind === undefined || !(LOAD_KINDS as readonly string[]).includes(kind)) {
      return sheetError("sheet-unknown-kind", `loads row ${i + 1}, kind: "${shown(row[0])}" is not a load kind; use ${LOAD_KINDS.join(", ")}.`);
    }
    const at = cellQuantity(row[1]);
    const to = cellQuantity(row[2]);
    const value = cellQuantity(row[3]);
    const end = cellQuantity(row[4]);
    const lcase = isBlank(row[5]) ? {} : { case: String(row[5]).trim() };
    const load =
      kind === "distributed"
        ? { type: kind, ...(at === undefined ? {} : { from: at }), ...(to === undefined ? {} : { to }), start: value, ...(end === undefined ? {} : { end }), ...lcase }
        : { type: kind, at, value, ...lcase };
    (model["loads"] as unknown[]).push(load);
  }
  return model;
}

/**
 * The member's stiffness from the `I` argument: one cell is the second moment of the whole member; a range of
 * rows `start | end | I | E` is a stepped member (the model's `segments`), each row a stretch of constant
 * stiffness, E blank for the `E` argument's; a blank `I` leaves the stiffness to a section.
 */
function stiffnessJson(I: unknown): Readonly<Record<string, unknown>> | SheetError {
  const rows = rangeRows(I);
  if (rows === undefined) return sheetError("sheet-range-invalid", "I: give one cell, or rows of start | end | I | E.");
  const single = rows.length <= 1 && (rows[0] ?? []).filter((c) => !isBlank(c)).length <= 1;
  if (single) {
    const value = (rows[0] ?? []).find((c) => !isBlank(c));
    return value === undefined ? {} : { I: cellQuantity(value) };
  }
  const segments: unknown[] = [];
  for (const [i, row] of rows.entries()) {
    if (row.every((c) => isBlank(c))) {
      return sheetError("sheet-range-invalid", `I row ${i + 1}: a blank row between segments; the segments must cover the member from 0 to its length, in order.`);
    }
    const E = cellQuantity(row[3]);
    segments.push({ from: cellQuantity(row[0]), to: cellQuantity(row[1]), I: cellQuantity(row[2]), ...(E === undefined ? {} : { E }) });
  }
  return { segments };
}

/** The words a sheet user sees for a model path's fields, by range. */
const COLUMN_WORDS: Readonly<Record<string, Readonly<Record<string, string>>>> = {
  supports: { at: "position", type: "kind", stiffness: "value (spring stiffness)", settlement: "value (settlement)" },
  loads: { type: "kind", at: "position", from: "position", to: "end position", value: "value", start: "value", end: "end value", case: "case" },
  segments: { from: "start", to: "end", I: "I", E: "E" },
  cases: { name: "name", category: "category", reversible: "reversible", patterned: "patterned" },
};

/** The argument a model path's range belongs to. */
const RANGE_ARGUMENT: Readonly<Record<string, string>> = { supports: "supports", loads: "loads", segments: "I", cases: "cases" };

/** A model path (`["loads", 2, "at"]`) in the sheet's words: `loads row 3, position`. */
export function sheetPlace(path: readonly (string | number)[]): string {
  const [first, index, field] = path;
  // The combination functions' member is the solver's input (`beam`), whose loads and supports are the rows'.
  if (first === "beam" && path.length > 1) return sheetPlace(path.slice(1));
  if (first === "options") return path.length === 1 ? "options" : `options, ${path.slice(1).map(String).join(".")}`;
  if (typeof first === "string" && Object.hasOwn(RANGE_ARGUMENT, first) && typeof index === "number") {
    const words = COLUMN_WORDS[first]!;
    const column = typeof field === "string" && Object.hasOwn(words, field) ? `, ${words[field]}` : "";
    return `${RANGE_ARGUMENT[first]} row ${index + 1}${column}`;
  }
  if (first === "segments") return "I";
  if (first === "section") return path.length === 1 ? "section" : path[1] === "shape" ? "shape" : `dimensions, ${path.slice(1).map(String).join(".")}`;
  if (first === "limits") return path.length === 1 ? "limits" : `limits, ${path.slice(1).map(String).join(".")}`;
  if (path.length === 0) return "member";
  return path.map(String).join(".");
}
