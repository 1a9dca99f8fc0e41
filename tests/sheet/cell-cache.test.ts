// The cache keyed by cells: a hash finds, a cell-by-cell comparison confirms. Laws: the same cells always hash
// alike and compare equal; what the readers tell apart (6 and "6", NaN and a blank, 0 and -0) never compares
// equal; a cache answers exactly what a plain map keyed by the cells would, within its bound.
import { fc, test } from "@fast-check/vitest";
import { describe, expect } from "vitest";
import { cachedIn, cellCache, cellsHash, clearCellCache, sameCells } from "../../src/sheet/cell-cache.js";

const cell = fc.oneof(fc.double(), fc.integer({ min: -3, max: 3 }), fc.constantFrom(0, -0, Number.NaN, Infinity, -Infinity), fc.string({ maxLength: 4 }), fc.constantFrom("6", " 6", "", "a,b"), fc.boolean(), fc.constant(null), fc.constant(undefined));
const cells = fc.array(fc.oneof(cell, fc.array(fc.array(cell, { maxLength: 3 }), { maxLength: 3 })), { maxLength: 5 });
/** A reference key: what the readers tell apart, spelled out (type, and -0 apart from 0). */
const reference = (v: unknown): string => JSON.stringify(v, (_, x: unknown) => (typeof x === "number" ? `n${Object.is(x, -0) ? "-0" : String(x)}` : x === undefined ? "u" : typeof x === "string" ? `s${x}` : x));
const copy = (v: unknown): unknown => (Array.isArray(v) ? v.map(copy) : v);

describe("cell cache", () => {
  test("what the readers tell apart never compares equal", () => {
    const values = [6, "6", " 6", null, undefined, Number.NaN, Infinity, -Infinity, 0, -0, true, "true", [], [null], [[6]], ["a,b"], ["a", "b"]];
    for (const [i, a] of values.entries()) for (const [j, b] of values.entries()) expect(sameCells(a, b), `${i} ${j}`).toBe(i === j);
    expect(cellsHash([{}], 0)).toBeUndefined();
    expect(cellsHash([Symbol.iterator], 0)).toBeUndefined();
  });
  test.prop([cells])("the same cells hash alike and compare equal; different ones compare unequal", (a) => {
    const b = copy(a);
    expect(sameCells(a, b)).toBe(true);
    expect(cellsHash(a, 1)).toBe(cellsHash(b, 1));
  });
  test.prop([cells, cells])("sameCells agrees with a reference key", (a, b) => {
    expect(sameCells(a, b)).toBe(reference(a) === reference(b));
  });
  test.prop([fc.array(fc.tuple(fc.constantFrom("member", "section"), cells), { minLength: 1, maxLength: 60 }), fc.integer({ min: 1, max: 8 })])(
    "a bounded cache answers what a plain map would, reading again only what it let go",
    (calls, limit) => {
      const cache = cellCache(limit);
      let reads = 0;
      for (const [kind, c] of calls) {
        const got = cachedIn(cache, kind, c, () => {
          reads += 1;
          return `${kind}:${reference(c)}`;
        });
        expect(got).toBe(`${kind}:${reference(c)}`);
        expect(cache.size).toBeLessThanOrEqual(limit);
      }
      const distinct = new Set(calls.map(([k, c]) => `${k}:${reference(c)}`)).size;
      expect(reads).toBeGreaterThanOrEqual(distinct);
      clearCellCache(cache);
      expect(cache.size).toBe(0);
    },
  );
  test("a cache large enough reads each distinct cells once", () => {
    const cache = cellCache(100);
    let reads = 0;
    for (let round = 0; round < 3; round++) for (let i = 0; i < 50; i++) cachedIn(cache, "member", [i, [[i, "pin"]], `${i}`], () => (reads += 1));
    expect(reads).toBe(50);
  });
});
