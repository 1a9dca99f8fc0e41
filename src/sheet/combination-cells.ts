import { CASE_CATEGORIES, PRESET_NAMES, combinationName, type CaseCategory, type Combination, type CombinationPurpose, type LoadCase, type PresetName, type PresetOptions } from "../combine/index.js";
import { cellQuantity, cellWord, isBlank, rangeRows, sheetError, shown, type CellValue, type SheetError } from "./cells.js";

/** The load cases, the combinations to form and the options, as read from a sheet's cells. */
export interface SheetCombinationInput {
  /** The load cases, in the order of the cases range's rows. */
  readonly cases: readonly LoadCase[];
  /** A preset to form the combinations from, with its options; or `undefined` when the combinations were given as factors. */
  readonly preset?: {
    /** The preset's name. */
    readonly name: PresetName;
    /** Its options, as read from the options range (checked by the preset). */
    readonly options: PresetOptions;
  };
  /** The combinations given as factors (a factors range); empty when a preset forms them. */
  readonly combinations: readonly Combination[];
  /** The sheet row (1-based, in the factors range) of each combination given as factors. */
  readonly rows: readonly number[];
  /** The case holding the supports' settlements, when one is named. */
  readonly settlementCase?: string;
  /** The pattern search's cap (spans searched over all subsets), when one is given. */
  readonly cap?: number;
}

const PURPOSES: readonly CombinationPurpose[] = ["strength", "allowable-stress", "serviceability"];

/** The options a sheet may give, by their names in the library (read in any case, spaces ignored). */
const OPTION_NAMES = ["loadsNotActing", "liveFactorException", "expression", "imposedCategory", "snowSite", "settlementCase", "cap", "purpose"] as const;

/** A cell read as a logical: TRUE/FALSE, 1/0, or the words true, false, yes, no; `undefined` for anything else. */
function cellLogical(value: unknown): boolean | undefined {
  if (typeof value === "boolean") return value;
  if (value === 1 || value === 0) return value === 1;
  const w = cellWord(value);
  return w === "true" || w === "yes" || w === "1" ? true : w === "false" || w === "no" || w === "0" ? false : undefined;
}

/**
 * The load cases from a range of rows `name | category | reversible | patterned`: category one of
 * dead, live, roof-live, snow, rain, wind, seismic, crane, user (any case); the two flags logicals
 * (TRUE/FALSE, yes/no, 1/0; blank: false).
 */
export function casesFromCells(cases: unknown): readonly LoadCase[] | SheetError {
  const rows = rangeRows(cases);
  if (rows === undefined || rows.length === 0) return sheetError("sheet-value-missing", "cases: give rows of name | category | reversible | patterned, such as D | dead.");
  const out: LoadCase[] = [];
  for (const [i, row] of rows.entries()) {
    if (row.every((c) => isBlank(c))) continue;
    const at = `cases row ${i + 1}`;
    if (isBlank(row[0])) return sheetError("sheet-value-missing", `${at}, name: give the case's name, as the loads' case column names it.`);
    const name = String(row[0]).trim();
    if (out.some((c) => c.name === name)) return sheetError("sheet-value-repeated", `${at}, name: "${name}" is given twice.`);
    const category = cellWord(row[1]);
    if (category === undefined || !(CASE_CATEGORIES as readonly string[]).includes(category)) {
      return sheetError("sheet-unknown-kind", `${at}, category: "${shown(row[1])}" is not a case category; use ${CASE_CATEGORIES.join(", ")}.`);
    }
    const flags: { reversible?: boolean; patterned?: boolean } = {};
    for (const [k, flag] of (["reversible", "patterned"] as const).entries()) {
      const cell = row[2 + k];
      if (isBlank(cell)) continue;
      const v = cellLogical(cell);
      if (v === undefined) return sheetError("sheet-not-a-logical", `${at}, ${flag}: "${shown(cell)}" is not TRUE or FALSE.`);
      if (v) flags[flag] = true;
    }
    out.push({ name, category: category as CaseCategory, ...flags });
  }
  if (out.length === 0) return sheetError("sheet-value-missing", "cases: give rows of name | category | reversible | patterned, such as D | dead.");
  return out;
}

/**
 * The options from a range of `name | value` rows: `loadsNotActing`, `liveFactorException` (logicals),
 * `expression` (6.10 or 6.10a-b), `imposedCategory` (A to G), `snowSite`, `map.<case>` (a category for a case
 * the preset does not cover), `settlementCase` (the case that holds the supports' settlements), `cap` (spans
 * searched over all subsets in pattern loading), `purpose` (of combinations given as factors).
 */
function optionsFromCells(options: unknown): { preset: Record<string, unknown>; settlementCase?: string; cap?: number; purpose?: CombinationPurpose } | SheetError {
  const rows = rangeRows(options);
  if (rows === undefined) return sheetError("sheet-range-invalid", "options: give rows of name | value, such as imposedCategory | B.");
  const preset: Record<string, unknown> = {};
  const out: { preset: Record<string, unknown>; settlementCase?: string; cap?: number; purpose?: CombinationPurpose } = { preset };
  const seen = new Set<string>();
  for (const [i, row] of rows.entries()) {
    if (row.every((c) => isBlank(c))) continue;
    const at = `options row ${i + 1}`;
    const raw = isBlank(row[0]) ? "" : String(row[0]).trim();
    const word = raw.replace(/\s+/g, "").toLowerCase();
    const mapped = /^map\.(.+)$/i.exec(raw);
    const name = mapped === null ? OPTION_NAMES.find((n) => n.toLowerCase() === word) : `map.${mapped[1]!.trim()}`;
    if (name === undefined) return sheetError("sheet-unknown-option", `${at}, name: "${shown(row[0])}" is not an option; use ${OPTION_NAMES.join(", ")} or map.<case>.`);
    if (seen.has(name)) return sheetError("sheet-value-repeated", `${at}, name: ${name} is given twice.`);
    seen.add(name);
    const cell = row[1];
    if (isBlank(cell)) return sheetError("sheet-value-missing", `${at}, value: give the value of ${name}.`);
    if (mapped !== null) {
      const map = (preset["map"] ??= {}) as Record<string, unknown>;
      map[mapped[1]!.trim()] = cellWord(cell);
    } else if (name === "loadsNotActing" || name === "liveFactorException") {
      const v = cellLogical(cell);
      if (v === undefined) return sheetError("sheet-not-a-logical", `${at}, value: ${name} is TRUE or FALSE; got "${shown(cell)}".`);
      preset[name] = v;
    } else if (name === "expression") {
      // 6.10 typed into a cell is the number 6.1.
      preset[name] = cell === 6.1 ? "6.10" : String(cell).trim().toLowerCase();
    } else if (name === "imposedCategory") preset[name] = String(cell).trim().toUpperCase();
    else if (name === "snowSite") preset[name] = String(cell).trim().toLowerCase();
    else if (name === "settlementCase") out.settlementCase = String(cell).trim();
    else if (name === "cap") {
      const n = cellQuantity(cell);
      if (typeof n !== "number") return sheetError("sheet-not-a-number", `${at}, value: the pattern cap is a whole number of spans; got "${shown(cell)}".`);
      out.cap = n;
    } else {
      const p = PURPOSES.find((q) => q === cellWord(cell));
      if (p === undefined) return sheetError("sheet-unknown-kind", `${at}, value: "${shown(cell)}" is not a purpose; use ${PURPOSES.join(", ")}.`);
      out.purpose = p;
    }
  }
  return out;
}

/**
 * Combinations given as a factors range: a header row naming the cases over their columns (its first cell is
 * the combination-name column's heading, and a column headed `purpose` may give each row's purpose), then one
 * row per combination: its name (blank: written from its factors, `1.2D + 1.6L`), then a factor under each
 * case (blank: 0, the case not in the combination).
 */
function factorsFromCells(range: readonly (readonly CellValue[])[], purpose: CombinationPurpose): { combinations: Combination[]; rows: number[] } | SheetError {
  const header = range[0]!;
  const columns: { col: number; name: string }[] = [];
  let purposeColumn: number | undefined;
  for (let c = 1; c < header.length; c++) {
    if (isBlank(header[c])) continue;
    const name = String(header[c]).trim();
    if (name.toLowerCase() === "purpose") purposeColumn = c;
    else if (columns.some((k) => k.name === name)) return sheetError("sheet-value-repeated", `combinations row 1, column ${c + 1}: the case "${name}" heads two columns.`);
    else columns.push({ col: c, name });
  }
  if (columns.length === 0) return sheetError("sheet-range-invalid", "combinations row 1: name the cases over the factor columns (a header row such as combination | D | L).");
  const combinations: Combination[] = [];
  const rows: number[] = [];
  for (let r = 1; r < range.length; r++) {
    const row = range[r]!;
    if (row.every((c) => isBlank(c))) continue;
    const factors: Record<string, number> = {};
    for (const { col, name } of columns) {
      const cell = row[col];
      if (isBlank(cell)) continue;
      const f = cellQuantity(cell);
      if (typeof f !== "number" || !Number.isFinite(f)) return sheetError("sheet-not-a-number", `combinations row ${r + 1}, ${name}: "${shown(cell)}" is not a load factor (a number).`);
      if (f !== 0) factors[name] = f;
    }
    if (Object.keys(factors).length === 0) return sheetError("combination-no-factors", `combinations row ${r + 1}: give at least one factor that is not zero.`);
    let p = purpose;
    if (purposeColumn !== undefined && !isBlank(row[purposeColumn])) {
      const q = PURPOSES.find((k) => k === cellWord(row[purposeColumn]));
      if (q === undefined) return sheetError("sheet-unknown-kind", `combinations row ${r + 1}, purpose: "${shown(row[purposeColumn])}" is not a purpose; use ${PURPOSES.join(", ")}.`);
      p = q;
    }
    const name = isBlank(row[0]) ? combinationName(factors) : String(row[0]).trim();
    if (combinations.some((c) => c.name === name)) return sheetError("sheet-value-repeated", `combinations row ${r + 1}, name: "${name}" is given twice.`);
    combinations.push({ name, purpose: p, factors });
    rows.push(r + 1);
  }
  if (combinations.length === 0) return sheetError("sheet-value-missing", "combinations: give a row of factors under the header row.");
  return { combinations, rows };
}

/**
 * The cases, combinations and options of a combination function from its cells: the cases range (see
 * {@link casesFromCells}); the combinations as a preset's name in one cell (`asce7-16-strength`,
 * `asce7-16-allowable-stress`, `en1990-strength`, `en1990-serviceability`) or a factors range with a header
 * row of case names; the options range of `name | value` rows (may be blank).
 */
export function combinationInput(cases: unknown, combinations: unknown, options: unknown): SheetCombinationInput | SheetError {
  const list = casesFromCells(cases);
  if (!Array.isArray(list)) return list as SheetError;
  const opts = optionsFromCells(options);
  if ("kind" in opts) return opts;
  const common = { cases: list as readonly LoadCase[], ...(opts.settlementCase === undefined ? {} : { settlementCase: opts.settlementCase }), ...(opts.cap === undefined ? {} : { cap: opts.cap }) };
  const rows = rangeRows(combinations);
  if (rows === undefined || rows.length === 0) return sheetError("sheet-value-missing", `combinations: give a preset name (${PRESET_NAMES.join(", ")}) or a range of factors with a header row of case names.`);
  if (rows.length === 1 && rows[0]!.filter((c) => !isBlank(c)).length === 1) {
    const word = cellWord(rows[0]!.find((c) => !isBlank(c)));
    const name = PRESET_NAMES.find((p) => p === word);
    if (name === undefined) return sheetError("preset-unknown", `combinations: "${shown(rows[0]!.find((c) => !isBlank(c)))}" is not a preset; use ${PRESET_NAMES.join(", ")}, or give a range of factors with a header row of case names.`);
    if (opts.purpose !== undefined) return sheetError("preset-option-unknown", "options: purpose is for combinations given as factors; a preset gives each combination its purpose.");
    return { ...common, preset: { name, options: opts.preset }, combinations: [], rows: [] };
  }
  if (Object.keys(opts.preset).length > 0) return sheetError("preset-option-unknown", `options: ${Object.keys(opts.preset).join(", ")} ${Object.keys(opts.preset).length === 1 ? "is an option" : "are options"} of a preset; combinations given as factors take only settlementCase, cap and purpose.`);
  const factors = factorsFromCells(rows, opts.purpose ?? "strength");
  if ("kind" in factors) return factors;
  return { ...common, combinations: factors.combinations, rows: factors.rows };
}
