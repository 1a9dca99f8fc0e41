import { evaluateDiagram, type ModelAnalysis } from "../model/index.js";
import { cellQuantity, isBlank, isSheetError, sheetError, shown, type CellValue, type SheetError, type SheetValue } from "./cells.js";
import { memberModelJson } from "./member.js";
import { analyseCached, analysisJson, cachedByCells } from "./solve.js";

/**
 * A member as a sheet gives it, the arguments every member function takes last: length (length unit), E
 * (modulus unit), I (second-moment unit), the supports range, the loads range (see `memberModelJson`), and an
 * optional unit-set name.
 */
export type SheetMemberArgs = readonly [length: unknown, E: unknown, I: unknown, supports: unknown, loads: unknown, units?: unknown];

/** The member of a function's cells, analysed (once while it stays in the cache), or the error naming what is wrong. */
export function analysed(args: SheetMemberArgs): ModelAnalysis | SheetError {
  return cachedByCells("member", args, () => {
    const json = memberModelJson(args[0], args[1], args[2], args[3], args[4], args[5]);
    return isSheetError(json) ? json : analyseCached(json);
  });
}

const isAnalysis = (v: ModelAnalysis | SheetError): v is ModelAnalysis => !isSheetError(v);

/**
 * The reactions of a member as a table with a header row: support number (from 1), position, force (up
 * positive) and moment (counterclockwise positive), in the sheet's units.
 *
 * @example `=FLEXURA.REACTIONS(6, "200 GPa", "80e6 mm^4", A2:C3, E2:J3)`
 */
export function sheetReactions(...args: SheetMemberArgs): SheetValue {
  const a = analysed(args);
  if (!isAnalysis(a)) return a;
  const u = a.units;
  return [["support", `at (${u.length})`, `force (${u.force})`, `moment (${u.moment})`], ...a.reactions.map((r): CellValue[] => [r.support + 1, r.at, r.force, r.moment])];
}

type Quantity = "shear" | "moment" | "slope" | "deflection";

function valueAt(quantity: Quantity, x: unknown, args: SheetMemberArgs): SheetValue {
  const a = analysed(args);
  if (!isAnalysis(a)) return a;
  const at = cellQuantity(x);
  if (typeof at !== "number" || !Number.isFinite(at)) return sheetError("sheet-not-a-number", `position: "${shown(x)}" is not a number in ${a.units.length}.`);
  const length = a.model.length;
  if (at < 0 || at > length) return sheetError("sheet-position-outside", `position: ${at} ${a.units.length} is outside the member, which runs from 0 to ${length} ${a.units.length}.`);
  return evaluateDiagram(a.diagrams[quantity], at);
}

/** Shear force V at a position (right-hand limit at a point load), in the sheet's force unit. `=FLEXURA.SHEAR(x, length, E, I, supports, loads, [units])` */
export const sheetShear = (x: unknown, ...args: SheetMemberArgs): SheetValue => valueAt("shear", x, args);
/** Bending moment at a position, positive sagging, in the sheet's moment unit. `=FLEXURA.MOMENT(x, length, E, I, supports, loads, [units])` */
export const sheetMoment = (x: unknown, ...args: SheetMemberArgs): SheetValue => valueAt("moment", x, args);
/** Slope at a position, positive counterclockwise, in the sheet's rotation unit. `=FLEXURA.SLOPE(x, ...)` */
export const sheetSlope = (x: unknown, ...args: SheetMemberArgs): SheetValue => valueAt("slope", x, args);
/** Deflection at a position, positive upward, in the sheet's deflection unit. `=FLEXURA.DEFLECTION(x, ...)` */
export const sheetDeflection = (x: unknown, ...args: SheetMemberArgs): SheetValue => valueAt("deflection", x, args);

/** Peaks of shear, moment, slope and deflection as a table: quantity, max, at, min, at (header row first). */
export function sheetPeaks(...args: SheetMemberArgs): SheetValue {
  const a = analysed(args);
  if (!isAnalysis(a)) return a;
  const u = a.units;
  const row = (name: string, unit: string, p: ModelAnalysis["moment"]): CellValue[] => [`${name} (${unit})`, p.max.value, p.max.at, p.min.value, p.min.at];
  return [
    ["quantity", "max", `at (${u.length})`, "min", `at (${u.length})`],
    row("shear", u.force, a.shear),
    row("moment", u.moment, a.moment),
    row("slope", u.rotation, a.slope),
    row("deflection", u.deflection, a.deflection),
  ];
}

/** Most stations a table may ask for. */
export const MAX_STATIONS = 10_000;

/**
 * A station table for the sheet's own chart: `n` + 1 evenly spaced positions from 0 to the length, with shear,
 * moment and deflection (header row first). The one place where sampled output is right; peaks come from
 * {@link sheetPeaks}.
 */
export function sheetStations(n: unknown, ...args: SheetMemberArgs): SheetValue {
  const a = analysed(args);
  if (!isAnalysis(a)) return a;
  const count = cellQuantity(n);
  if (typeof count !== "number" || !Number.isInteger(count) || count < 1 || count > MAX_STATIONS) {
    return sheetError("sheet-stations-invalid", `stations: give a whole number of intervals from 1 to ${MAX_STATIONS}; got "${shown(n)}".`);
  }
  const u = a.units;
  const rows: CellValue[][] = [[`x (${u.length})`, `shear (${u.force})`, `moment (${u.moment})`, `deflection (${u.deflection})`]];
  for (let i = 0; i <= count; i++) {
    const x = i === count ? a.model.length : (a.model.length * i) / count;
    rows.push([x, evaluateDiagram(a.diagrams.shear, x), evaluateDiagram(a.diagrams.moment, x), evaluateDiagram(a.diagrams.deflection, x)]);
  }
  return rows;
}

/** Splits `reactions[0].force` or `moment.max.value` into keys and indices. */
function pathParts(path: string): (string | number)[] | undefined {
  const parts: (string | number)[] = [];
  for (const piece of path.trim().split(".")) {
    const m = /^([A-Za-z_][A-Za-z0-9_]*)((\[\d+\])*)$/.exec(piece);
    if (m === null) return undefined;
    parts.push(m[1]!);
    for (const idx of m[2]!.matchAll(/\[(\d+)\]/g)) parts.push(Number(idx[1]));
  }
  return parts;
}

/**
 * Any result of a whole model given as JSON text in a cell, by a path into its JSON results (the form
 * `flexura analyze --json` prints): `moment.max.value`, `reactions[0].force`, `checks[1].utilisation`, `pass`.
 */
export function sheetModelResult(json: unknown, path: unknown): SheetValue {
  if (typeof json !== "string" || isBlank(json)) return sheetError("sheet-model-missing", "model: give the model file's JSON text.");
  const a = cachedByCells("model", [json], () => {
    let parsed: unknown;
    try {
      parsed = JSON.parse(json);
    } catch (e) {
      return sheetError("sheet-model-not-json", `model: not valid JSON (${e instanceof Error ? e.message : String(e)}).`);
    }
    if (typeof parsed !== "object" || parsed === null || Array.isArray(parsed)) return sheetError("sheet-model-not-json", "model: the JSON must be one object, a model file.");
    return analyseCached(parsed as Record<string, unknown>);
  });
  if (!isAnalysis(a)) return a;
  const parts = typeof path === "string" ? pathParts(path) : undefined;
  if (parts === undefined) return sheetError("sheet-path-invalid", `path: "${shown(path)}" is not a path such as moment.max.value or reactions[0].force.`);
  let value: unknown = analysisJson(a);
  for (const part of parts) {
    const next = typeof value === "object" && value !== null && Object.hasOwn(value, part) ? (value as Record<string | number, unknown>)[part] : undefined;
    if (next === undefined) return sheetError("sheet-path-not-found", `path: "${String(path)}" has no result at "${String(part)}".`);
    value = next;
  }
  if (typeof value === "number" || typeof value === "string" || typeof value === "boolean") return value;
  return sheetError("sheet-path-not-a-value", `path: "${String(path)}" names a group of results; name one number or text inside it.`);
}
