import type { ModelAnalysis } from "../model/index.js";
import { cellWord, isBlank, isSheetError, rangeRows, sheetError, shown, cellQuantity, type CellValue, type SheetError, type SheetValue } from "./cells.js";
import { memberModelJson, type ModelJson } from "./member.js";
import { sectionJson } from "./section.js";
import { analyseCached, cachedByCells } from "./solve.js";

/** The limits a sheet may give, by their model names (read in any case, spaces ignored). */
const LIMIT_NAMES = ["deflection", "bendingStress", "shearStress"] as const;

/**
 * The model's `limits` from a range of `name | value` rows: `deflection | span/360` (or a length),
 * `bendingStress | 165 MPa`, `shearStress | 95` (stress unit).
 */
export function limitsJson(limits: unknown): ModelJson | SheetError {
  const rows = rangeRows(limits);
  if (rows === undefined) return sheetError("sheet-range-invalid", "limits: give rows of name | value, such as deflection | span/360.");
  const out: ModelJson = {};
  for (const [i, row] of rows.entries()) {
    if (row.every((c) => isBlank(c))) continue;
    const word = cellWord(row[0])?.replace(/\s+/g, "");
    const name = LIMIT_NAMES.find((n) => n.toLowerCase() === word);
    if (name === undefined) return sheetError("sheet-unknown-limit", `limits row ${i + 1}, name: "${shown(row[0])}" is not a limit; use ${LIMIT_NAMES.join(", ")}.`);
    if (Object.hasOwn(out, name)) return sheetError("sheet-value-repeated", `limits row ${i + 1}, name: ${name} is given twice.`);
    if (isBlank(row[1])) return sheetError("sheet-value-missing", `limits row ${i + 1}, value: give the ${name} limit.`);
    out[name] = cellQuantity(row[1]);
  }
  if (Object.keys(out).length === 0) return sheetError("sheet-value-missing", `limits: give at least one limit (${LIMIT_NAMES.join(", ")}).`);
  return out;
}

/** Warnings that mean a limit given was not checked: a result without them would claim more than was checked. */
const UNCHECKED = new Set(["stress-limit-without-section", "part-bending-stress-not-checked"]);

/** The member with its section (blank shape: none) and limits, analysed; an error when a limit could not be checked. */
function checked(limits: unknown, shape: unknown, dimensions: unknown, member: readonly unknown[]): ModelAnalysis | SheetError {
  return cachedByCells("checks", [limits, shape, dimensions, ...member], () => readChecked(limits, shape, dimensions, member));
}

function readChecked(limits: unknown, shape: unknown, dimensions: unknown, member: readonly unknown[]): ModelAnalysis | SheetError {
  const limitJson = limitsJson(limits);
  if (isSheetError(limitJson)) return limitJson;
  const json = memberModelJson(member[0], member[1], member[2], member[3], member[4], member[5]);
  if (isSheetError(json)) return json;
  let section: ModelJson | undefined;
  if (!isBlank(shape) || !(rangeRows(dimensions)?.length === 0)) {
    const s = sectionJson(shape, dimensions);
    if (isSheetError(s)) return s;
    section = s;
  }
  const a = analyseCached({ ...json, ...(section === undefined ? {} : { section }), limits: limitJson });
  if (isSheetError(a)) return a;
  const unchecked = a.warnings.find((w) => UNCHECKED.has(w.code));
  if (unchecked !== undefined) return sheetError(unchecked.code, `limits: ${unchecked.message}`);
  if (a.checks.length === 0) return sheetError("sheet-nothing-checked", "limits: no check could run on this member.");
  return a;
}

/**
 * The member's checks against the limits as a table with a header row: check kind, description, demand,
 * capacity, unit, utilisation (demand / capacity), pass, and where along the member; deflection checks (one per
 * span and cantilever) first, then bending tension, bending compression and shear stress. The section (a shape
 * and its dimensions, see {@link sheetSection}) is needed for stress limits and may give the stiffness (leave
 * `I` blank); with deflection limits only, shape and dimensions may be blank.
 *
 * @example `=FLEXURA.CHECKS(A1:B3, "i-section", D1:E4, 6, "200 GPa", "", G1:I2, K1:P2)`
 */
export function sheetChecks(limits: unknown, shape: unknown, dimensions: unknown, ...member: unknown[]): SheetValue {
  const a = checked(limits, shape, dimensions, member);
  if (isSheetError(a)) return a;
  return [
    ["check", "description", "demand", "capacity", "unit", "utilisation", "pass", `at (${a.units.length})`],
    ...a.checks.map((c): CellValue[] => [c.kind, c.description, c.demand, c.capacity, c.unit, c.utilisation, c.pass, c.at]),
  ];
}

/**
 * The governing utilisation of the member's checks against the limits: the largest demand / capacity (at most
 * 1 passes); same arguments as {@link sheetChecks}.
 *
 * @example `=FLEXURA.UTILISATION(A1:B3, "i-section", D1:E4, 6, "200 GPa", "", G1:I2, K1:P2)`
 */
export function sheetUtilisation(limits: unknown, shape: unknown, dimensions: unknown, ...member: unknown[]): SheetValue {
  const a = checked(limits, shape, dimensions, member);
  if (isSheetError(a)) return a;
  return Math.max(...a.checks.map((c) => c.utilisation));
}
