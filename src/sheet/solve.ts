import { isFlexuraError } from "../errors/index.js";
import { analysisToJson, analyzeModel, parseModel, type ModelAnalysis } from "../model/index.js";
import { cachedIn, cellCache, clearCellCache } from "./cell-cache.js";
import { sheetError, type SheetError } from "./cells.js";
import { sheetPlace, type ModelJson } from "./member.js";

/**
 * How many results the sheet functions keep (least recently used first out). The cells that ask about one
 * member (its reactions, peaks, a moment at a position) share one solve. Two caches of this size are kept: one
 * by the cells as the engine handed them, per kind of reading (a member, a section, a member with its checks,
 * envelopes, a case-by-case solve), so that a warm recalculation does not read the ranges again; and one by the
 * model read from the cells, so that two spellings of one member share a solve. 2,048 covers a sheet of 500
 * members asked for their results, their section and their checks (1,500 entries) with room to spare; an analysed member takes about 11 KB, so the cache holds at most about 22 MB.
 */
export const SHEET_CACHE_SIZE = 2048;

const cache = new Map<string, ModelAnalysis | SheetError>();
const byCells = cellCache(SHEET_CACHE_SIZE);
let solves = 0;

/**
 * Number of solves since the module loaded (cache misses): each member analysed, and each member solved case
 * by case for a combination function; for tests and benchmarks.
 */
export function sheetSolveCount(): number {
  return solves;
}

/** Counts one solve (a member solved case by case for the combination functions). */
export function countSolve(): void {
  solves += 1;
}

/** Empties the cache of analysed members. */
export function clearSheetCache(): void {
  cache.clear();
  clearCellCache(byCells);
}

/** Looks a key up in a least-recently-used map, marking it used. */
function lookUp<T>(map: Map<string, T>, key: string): T | undefined {
  const hit = map.get(key);
  if (hit !== undefined) {
    map.delete(key);
    map.set(key, hit);
  }
  return hit;
}

/** Keeps a value in a least-recently-used map of at most {@link SHEET_CACHE_SIZE} entries. */
function keep<T>(map: Map<string, T>, key: string, value: T): void {
  map.set(key, value);
  if (map.size > SHEET_CACHE_SIZE) map.delete(map.keys().next().value as string);
}

/**
 * The result for a function's cells, read and analysed once while it stays in the cache: the cells as the
 * engine handed them are looked up first (by a hash, confirmed cell by cell), so a warm recalculation neither
 * re-reads the ranges into a model nor serialises it. `kind` names what the cells are read as (a member, a
 * section, a checked member, envelopes), `read` builds the result on a miss.
 */
export function cachedByCells<T>(kind: string, cells: readonly unknown[], read: () => T): T {
  return cachedIn(byCells, kind, cells, read);
}

/** The library's error as the cell shows it: every issue, in the sheet's words (`place` says where a path is). */
export function cellMessage(error: unknown, place: (path: readonly (string | number)[]) => string = sheetPlace): SheetError {
  if (!isFlexuraError(error)) return sheetError("sheet-internal-error", `flexura failed unexpectedly: ${String(error)}. Please report it with the sheet.`);
  const first = error.issues[0];
  const text = error.issues.map((i) => `${place(i.path)}: ${i.message}`).join(" ");
  return sheetError(first?.code ?? "sheet-internal-error", text);
}

/** Analyses a model (JSON as a model file holds it), once per distinct model while it stays in the cache. */
export function analyseCached(model: ModelJson): ModelAnalysis | SheetError {
  const key = JSON.stringify(model);
  const hit = lookUp(cache, key);
  if (hit !== undefined) return hit;
  solves += 1;
  let result: ModelAnalysis | SheetError;
  try {
    result = analyzeModel(parseModel(model));
  } catch (e) {
    result = cellMessage(e);
  }
  keep(cache, key, result);
  return result;
}

/** The plain JSON of an analysis (`analysisToJson`), for reading any result by a path. */
export function analysisJson(analysis: ModelAnalysis): unknown {
  return analysisToJson(analysis);
}
