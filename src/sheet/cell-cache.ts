/**
 * A bounded cache keyed by plain cell values exactly as an engine hands them (numbers, texts, logicals, blanks,
 * rows of them): a 32-bit hash finds the entry and a comparison cell by cell confirms it, so a lookup builds no
 * key string (building and hashing a string key per call was most of a warm recalculation's own time).
 */

/** One cached result: what it was read as, a copy of the cells it was read from, and the next entry of the same hash. */
interface Entry {
  readonly kind: string;
  readonly cells: unknown;
  readonly value: unknown;
  next: Entry | undefined;
}

/** A cache of results by their cells, least recently used out beyond `limit` entries. */
export interface CellCache {
  /** Entries by hash, in order of use (least recent first); entries of one hash are chained. */
  readonly byHash: Map<number, Entry>;
  /** The most entries kept. */
  readonly limit: number;
  /** Entries held (chains counted in full). */
  size: number;
  /** The entry found or kept last: the cells that ask about one member usually come one after another. */
  last: Entry | undefined;
}

/** An empty cache of at most `limit` entries. */
export function cellCache(limit: number): CellCache {
  return { byHash: new Map(), limit, size: 0, last: undefined };
}

const float = new Float64Array(1);
const words = new Int32Array(float.buffer);

/** One step of the hash: `h` with the 32-bit word `k` folded in (FNV-1a's step on a word, with a shift so high bits reach low ones). */
function mix(h: number, k: number): number {
  h = Math.imul(h ^ k, 0x01000193);
  return h ^ (h >>> 15);
}

/**
 * A 32-bit hash of plain cells, from `h`: each value tagged by its type (so 6 and "6" differ), numbers by
 * their bits (so -0, 0 and NaN differ as the readers tell them apart), texts by their characters and length,
 * rows by their length. `undefined` for anything that is not a plain cell or rows of them (not cached).
 */
export function cellsHash(value: unknown, h: number): number | undefined {
  switch (typeof value) {
    case "number":
      float[0] = value;
      return mix(mix(mix(h, 1), words[0]!), words[1]!);
    case "string": {
      let s = mix(h, 2);
      for (let i = 0; i < value.length; i++) s = Math.imul(s ^ value.charCodeAt(i), 0x01000193);
      return mix(s, value.length);
    }
    case "boolean":
      return mix(h, value ? 3 : 4);
    case "undefined":
      return mix(h, 5);
    case "object": {
      if (value === null) return mix(h, 6);
      if (!Array.isArray(value)) return undefined;
      let s: number | undefined = mix(h, 7);
      for (let i = 0; i < value.length; i++) {
        s = cellsHash(value[i], s);
        if (s === undefined) return undefined;
      }
      return mix(s, 8 + value.length);
    }
    default:
      return undefined;
  }
}

/** Whether two plain cell values are the same cells: rows compared cell by cell, values by `Object.is` (NaN is NaN, -0 is not 0). */
export function sameCells(a: unknown, b: unknown): boolean {
  // 0 and -0 are equal under ===, told apart by their reciprocals; NaN is the one value unequal to itself.
  if (a === b) return a !== 0 || 1 / (a as number) === 1 / (b as number);
  if (typeof a === "number") return a !== a && b !== b;
  if (!Array.isArray(a) || !Array.isArray(b) || a.length !== b.length) return false;
  for (let i = 0; i < a.length; i++) if (!sameCells(a[i], b[i])) return false;
  return true;
}

/** A copy of plain cells that no later change to the engine's arrays can reach (kept by the cache alone, so not frozen: frozen arrays read slower). */
function copyCells(value: unknown): unknown {
  return Array.isArray(value) ? value.map(copyCells) : value;
}

function hashOf(kind: string, cells: readonly unknown[]): number | undefined {
  let h = 0x811c9dc5;
  for (let i = 0; i < kind.length; i++) h = mix(h, kind.charCodeAt(i));
  return cellsHash(cells, h);
}

/**
 * The result for `kind` read from `cells`, from the cache when the same cells were read as `kind` before (marking
 * it used), else `read()`'s, kept (the least recently used entries go beyond the limit). Cells that are not plain
 * are read each time.
 */
export function cachedIn<T>(cache: CellCache, kind: string, cells: readonly unknown[], read: () => T): T {
  const last = cache.last;
  if (last !== undefined && last.kind === kind && sameCells(last.cells, cells)) return last.value as T;
  const h = hashOf(kind, cells);
  if (h === undefined) return read();
  const first = cache.byHash.get(h);
  for (let e = first; e !== undefined; e = e.next) {
    if (e.kind === kind && sameCells(e.cells, cells)) {
      cache.byHash.delete(h);
      cache.byHash.set(h, first!);
      cache.last = e;
      return e.value as T;
    }
  }
  const value = read();
  // read() may have cached other results (a member under its envelopes): take the chain as it is now.
  const head = cache.byHash.get(h);
  cache.byHash.delete(h);
  const entry: Entry = { kind, cells: copyCells(cells), value, next: head };
  cache.byHash.set(h, entry);
  cache.last = entry;
  cache.size += 1;
  while (cache.size > cache.limit) {
    const [oldest, chain] = cache.byHash.entries().next().value as [number, Entry];
    cache.byHash.delete(oldest);
    for (let e: Entry | undefined = chain; e !== undefined; e = e.next) cache.size -= 1;
  }
  return value;
}

/** Empties the cache. */
export function clearCellCache(cache: CellCache): void {
  cache.byHash.clear();
  cache.size = 0;
  cache.last = undefined;
}
