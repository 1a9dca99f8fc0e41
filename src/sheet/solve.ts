import { isFlexuraError } from "../errors/index.js";
import { analysisToJson, analyzeModel, parseModel, type ModelAnalysis } from "../model/index.js";
import { sheetError, type SheetError } from "./cells.js";
import { sheetPlace, type ModelJson } from "./member.js";

/**
 * How many analysed members the sheet functions keep (least recently used first out). The cells that ask
 * about one member (its reactions, peaks, a moment at a position) share one solve; 512 members cover a
 * sheet of a few hundred members with room to spare, at a few kilobytes each. Two maps of this size are kept:
 * one by the model read from the cells, one by the cells as the engine handed them (so that a warm
 * recalculation does not read the ranges again); both hold the same analyses.
 */
export const SHEET_CACHE_SIZE = 512;

const cache = new Map<string, ModelAnalysis | SheetError>();
const byCells = new Map<string, unknown>();
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
  byCells.clear();
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
 * A key for plain cell values exactly as the engine handed them (numbers, texts, logicals, blanks, rows of them),
 * telling apart everything the readers tell apart (6 from "6", NaN from a blank); `undefined` for anything else,
 * which is then not cached by its cells.
 */
export function cellsKey(value: unknown): string | undefined {
  switch (typeof value) {
    case "number":
      return Object.is(value, -0) ? "-0" : String(value);
    case "string":
      // Length-prefixed: unambiguous without escaping, since the length says where the text ends.
      return `'${value.length}:${value}`;
    case "boolean":
      return value ? "T" : "F";
    case "undefined":
      return "U";
    case "object": {
      if (value === null) return "N";
      if (!Array.isArray(value)) return undefined;
      let key = "[";
      for (let i = 0; i < value.length; i++) {
        const part = cellsKey(value[i]);
        if (part === undefined) return undefined;
        key += i === 0 ? part : `,${part}`;
      }
      return `${key}]`;
    }
    default:
      return undefined;
  }
}

/**
 * The result for a function's cells, read and analysed once while it stays in the cache: the cells' own key is
 * looked up first, so a warm recalculation neither re-reads the ranges into a model nor serialises it. `kind`
 * names what the cells are read as (a member, a section, a checked member), `read` builds the result on a miss.
 */
export function cachedByCells<T>(kind: string, cells: readonly unknown[], read: () => T): T {
  const k = cellsKey(cells);
  if (k === undefined) return read();
  const key = `${kind}:${k}`;
  const hit = lookUp(byCells, key) as T | undefined;
  if (hit !== undefined) return hit;
  const result = read();
  keep(byCells, key, result);
  return result;
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
