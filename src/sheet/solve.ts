import { isFlexuraError } from "../errors/index.js";
import { analysisToJson, analyzeModel, parseModel, type ModelAnalysis } from "../model/index.js";
import { sheetError, type SheetError } from "./cells.js";
import { sheetPlace, type ModelJson } from "./member.js";

/**
 * How many analysed members the sheet functions keep (least recently used first out). The cells that ask
 * about one member (its reactions, peaks, a moment at a position) share one solve; 512 members cover a
 * sheet of a few hundred members with room to spare, at a few kilobytes each.
 */
export const SHEET_CACHE_SIZE = 512;

const cache = new Map<string, ModelAnalysis | SheetError>();
let solves = 0;

/** Number of members solved since the module loaded (cache misses); for tests and benchmarks. */
export function sheetSolveCount(): number {
  return solves;
}

/** Empties the cache of analysed members. */
export function clearSheetCache(): void {
  cache.clear();
}

/** The library's error as the cell shows it: every issue, in the sheet's words. */
export function cellMessage(error: unknown): SheetError {
  if (!isFlexuraError(error)) return sheetError("sheet-internal-error", `flexura failed unexpectedly: ${String(error)}. Please report it with the sheet.`);
  const first = error.issues[0];
  const text = error.issues.map((i) => `${sheetPlace(i.path)}: ${i.message}`).join(" ");
  return sheetError(first?.code ?? "sheet-internal-error", text);
}

/** Analyses a model (JSON as a model file holds it), once per distinct model while it stays in the cache. */
export function analyseCached(model: ModelJson): ModelAnalysis | SheetError {
  const key = JSON.stringify(model);
  const hit = cache.get(key);
  if (hit !== undefined) {
    cache.delete(key);
    cache.set(key, hit);
    return hit;
  }
  solves += 1;
  let result: ModelAnalysis | SheetError;
  try {
    result = analyzeModel(parseModel(model));
  } catch (e) {
    result = cellMessage(e);
  }
  cache.set(key, result);
  if (cache.size > SHEET_CACHE_SIZE) cache.delete(cache.keys().next().value as string);
  return result;
}

/** The plain JSON of an analysis (`analysisToJson`), for reading any result by a path. */
export function analysisJson(analysis: ModelAnalysis): unknown {
  return analysisToJson(analysis);
}
