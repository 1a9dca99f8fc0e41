import { modelSchema, type ModelAnalysis, type ModelSectionResult } from "../model/index.js";
import { bendingStress, sectionShearStressAt } from "../stress/index.js";
import { attempt } from "../errors/index.js";
import { tryParseQuantity, type QuantityKind } from "../units/index.js";
import { cellQuantity, cellWord, isBlank, isSheetError, rangeRows, sheetError, shown, type CellValue, type SheetError, type SheetValue } from "./cells.js";
import { SHEET_UNIT_SYSTEMS, type ModelJson } from "./member.js";
import { analyseCached, cachedByCells, cellMessage } from "./solve.js";

/** Every name a section field has in the model format (for reading a dimension's name in any case). */
let fieldNames: ReadonlyMap<string, string> | undefined;
function canonicalField(name: string): string {
  if (fieldNames === undefined) {
    const found = new Map<string, string>();
    const walk = (node: unknown): void => {
      if (typeof node !== "object" || node === null) return;
      const properties = (node as { properties?: unknown }).properties;
      if (typeof properties === "object" && properties !== null) for (const key of Object.keys(properties)) found.set(key.toLowerCase(), key);
      for (const child of Object.values(node)) walk(child);
    };
    const defs = (modelSchema as unknown as { $defs: Record<string, unknown> }).$defs;
    for (const key of ["section", "plateGirder", "plate", "webPlate"]) walk(defs[key]);
    fieldNames = found;
  }
  return fieldNames.get(name.toLowerCase()) ?? name;
}

/**
 * A standard section as the model format holds it, from a shape name (`rectangle`, `i-section`, ...) and a
 * range of `name | value` rows of dimensions (`depth | 310`; a plate girder's plates as `topFlange.width`),
 * names in any case, values in the section-length unit or text with a unit.
 */
export function sectionJson(shape: unknown, dimensions: unknown): ModelJson | SheetError {
  const name = cellWord(shape);
  if (name === undefined) return sheetError("sheet-value-missing", "shape: give a shape name such as rectangle, i-section or pipe.");
  const rows = rangeRows(dimensions);
  if (rows === undefined || rows.some((r) => r.length < 2 && !r.every((c) => isBlank(c)))) {
    return sheetError("sheet-range-invalid", "dimensions: give rows of name | value, such as depth | 310.");
  }
  const section: Record<string, unknown> = { shape: name };
  for (const [i, row] of rows.entries()) {
    if (row.every((c) => isBlank(c))) continue;
    if (isBlank(row[0]) || typeof row[0] !== "string") return sheetError("sheet-value-missing", `dimensions row ${i + 1}, name: "${shown(row[0])}" is not a dimension name such as depth or flangeWidth.`);
    const path = row[0].trim().split(".").map(canonicalField);
    let into = section;
    for (const key of path.slice(0, -1)) {
      const next = Object.hasOwn(into, key) ? into[key] : undefined;
      into = typeof next === "object" && next !== null ? (next as Record<string, unknown>) : (into[key] = {});
    }
    const last = path[path.length - 1]!;
    if (Object.hasOwn(into, last)) return sheetError("sheet-value-repeated", `dimensions row ${i + 1}, name: "${row[0].trim()}" is given twice.`);
    into[last] = cellQuantity(row[1]);
  }
  return section;
}

/** The section analysed on its own (a unit-length fixed stub carries it), so the model reader reads its units and checks it. */
function sectionAnalysis(shape: unknown, dimensions: unknown, units: unknown): ModelAnalysis | SheetError {
  return cachedByCells("section", [shape, dimensions, units], () => readSection(shape, dimensions, units));
}

function readSection(shape: unknown, dimensions: unknown, units: unknown): ModelAnalysis | SheetError {
  const system = isBlank(units) ? undefined : SHEET_UNIT_SYSTEMS.find((s) => s.toLowerCase() === String(units).trim().toLowerCase());
  if (!isBlank(units) && system === undefined) return sheetError("sheet-unknown-units", `units: "${shown(units)}" is not a unit set; use one of ${SHEET_UNIT_SYSTEMS.join(", ")}.`);
  const section = sectionJson(shape, dimensions);
  if (isSheetError(section)) return section;
  if (section["shape"] === "built-up") return sheetError("sheet-shape-not-in-cells", "shape: a built-up section cannot be given as dimensions; give it in a model's JSON text and use FLEXURA.MODEL.");
  const a = analyseCached({ ...(system === undefined ? {} : { units: { system } }), length: 1, E: 1, supports: [{ at: 0, type: "fixed" }], section });
  return isSheetError(a) || a.section === undefined ? (isSheetError(a) ? a : sheetError("sheet-internal-error", "section: no properties came back.")) : a;
}

/** The properties a table lists, by the name of the model's JSON results (`section.area`), with their unit kinds. */
const PROPERTIES: readonly { name: string; unit: keyof ModelAnalysis["units"]; value: (s: ModelSectionResult) => number }[] = [
  { name: "area", unit: "area", value: (s) => s.area },
  { name: "centroid.y", unit: "sectionLength", value: (s) => s.centroid.y },
  { name: "centroid.z", unit: "sectionLength", value: (s) => s.centroid.z },
  { name: "secondMomentZ", unit: "secondMoment", value: (s) => s.secondMomentZ },
  { name: "secondMomentY", unit: "secondMoment", value: (s) => s.secondMomentY },
  { name: "productMomentYZ", unit: "secondMoment", value: (s) => s.productMomentYZ },
  { name: "sectionModulusTop", unit: "sectionModulus", value: (s) => s.sectionModulusTop },
  { name: "sectionModulusBottom", unit: "sectionModulus", value: (s) => s.sectionModulusBottom },
  { name: "yTop", unit: "sectionLength", value: (s) => s.yTop },
  { name: "yBottom", unit: "sectionLength", value: (s) => s.yBottom },
];

/**
 * A section's properties as a two-column table, `property (unit) | value`, with a header row: area, centroid,
 * second moments I_z (bending axis, horizontal) and I_y, product moment, section moduli to the top and bottom
 * fibres, and the distances from the centroid to them, in the unit set's section units.
 *
 * @example `=FLEXURA.SECTION("rectangle", A2:B3)` with `width | 100` and `depth | 200` gives secondMomentZ (mm^4) 66,666,667 (b h^3 / 12).
 */
export function sheetSection(shape: unknown, dimensions: unknown, units?: unknown): SheetValue {
  const a = sectionAnalysis(shape, dimensions, units);
  if (isSheetError(a)) return a;
  const s = a.section!;
  return [["property", "value"], ...PROPERTIES.map((p): CellValue[] => [`${p.name} (${a.units[p.unit]})`, p.value(s)])];
}

/**
 * One property of a section by name (`area`, `secondMomentZ`, `sectionModulusTop`, `centroid.y`, ...; any case;
 * a table label such as `area (mm^2)` also works), in the unit set's section units.
 *
 * @example `=FLEXURA.SECTIONPROPERTY("secondMomentZ", "rectangle", A2:B3)`
 */
export function sheetSectionProperty(property: unknown, shape: unknown, dimensions: unknown, units?: unknown): SheetValue {
  const wanted = cellWord(property)?.replace(/\s*\(.*\)\s*$/, "");
  const p = PROPERTIES.find((q) => q.name.toLowerCase() === wanted);
  if (p === undefined) return sheetError("sheet-unknown-property", `property: "${shown(property)}" is not a section property; use one of ${PROPERTIES.map((q) => q.name).join(", ")}.`);
  const a = sectionAnalysis(shape, dimensions, units);
  return isSheetError(a) ? a : p.value(a.section!);
}

/**
 * A cell that must hold a quantity, in SI: a number (or a number stored as text) in the unit set's unit for it,
 * or text with its own unit ("10 kN*m"); anything else is an error naming the argument.
 */
function quantityArg(value: unknown, argument: string, a: ModelAnalysis, field: "moment" | "force" | "sectionLength", kind: QuantityKind): number | SheetError {
  const n = cellQuantity(value);
  if (typeof n === "number" && Number.isFinite(n)) return n * a.scale[field];
  if (typeof n === "string") {
    const q = tryParseQuantity(n, kind);
    if (q.ok) return q.value.value;
    return sheetError(q.error.issues[0]?.code ?? "sheet-not-a-number", `${argument}: "${shown(value)}" is not a number in ${a.units[field]} or a ${kind} with its unit (${q.error.issues[0]?.message ?? ""}).`);
  }
  return sheetError(isBlank(value) ? "sheet-value-missing" : "sheet-not-a-number", `${argument}: "${shown(value)}" is not a number in ${a.units[field]}.`);
}

/**
 * Bending stress at a fibre of a section, sigma = -M y / I_z (tension positive; y up from the centroid), from a
 * bending moment (positive sagging, moment unit) and the fibre's height (section-length unit), in the stress unit.
 *
 * @example `=FLEXURA.BENDINGSTRESS(10, 100, "rectangle", A2:B3)` on a 100 x 200 mm rectangle: -15 MPa (compression at the top).
 */
export function sheetBendingStress(moment: unknown, y: unknown, shape: unknown, dimensions: unknown, units?: unknown): SheetValue {
  const a = sectionAnalysis(shape, dimensions, units);
  if (isSheetError(a)) return a;
  const M = quantityArg(moment, "moment", a, "moment", "moment");
  const at = quantityArg(y, "y", a, "sectionLength", "length");
  if (isSheetError(M)) return M;
  if (isSheetError(at)) return at;
  const s = a.section!;
  const k = a.scale.sectionLength;
  const r = attempt(() => bendingStress(M, at, { secondMomentZ: s.secondMomentZ * a.scale.secondMoment, extremes: { top: s.yTop * k, bottom: -s.yBottom * k } }));
  return r.ok ? r.value / a.scale.stress : stressError(r.error, a);
}

/**
 * Shear stress at a horizontal cut of a section, tau = V Q / (I_z b) (with the sign of V), from a shear force
 * (force unit) and the cut's height above the centroid (section-length unit), in the stress unit.
 *
 * @example `=FLEXURA.SHEARSTRESS(30, 0, "rectangle", A2:B3)` on a 100 x 200 mm rectangle: 2.25 MPa (1.5 V / A).
 */
export function sheetShearStress(shear: unknown, y: unknown, shape: unknown, dimensions: unknown, units?: unknown): SheetValue {
  const a = sectionAnalysis(shape, dimensions, units);
  if (isSheetError(a)) return a;
  const V = quantityArg(shear, "shear", a, "force", "force");
  const at = quantityArg(y, "y", a, "sectionLength", "length");
  if (isSheetError(V)) return V;
  if (isSheetError(at)) return at;
  const r = attempt(() => sectionShearStressAt(V, a.sectionGeometry!, at));
  return r.ok ? r.value.stress / a.scale.stress : stressError(r.error, a);
}

/** The stress module's refusal in the sheet's words (its lengths are in m: say it in the sheet's units). */
function stressError(error: unknown, a: ModelAnalysis): SheetError {
  const e = cellMessage(error);
  if (e.code === "fibre-outside-section") {
    const s = a.section!;
    return sheetError(e.code, `y: the fibre is outside the section, which runs from ${s.yBottom} ${a.units.sectionLength} below the centroid to ${s.yTop} ${a.units.sectionLength} above it.`);
  }
  return e;
}
