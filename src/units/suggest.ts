import { allSpellings, lookupUnit } from "./catalog.js";

function distance(a: string, b: string): number {
  // Optimal string alignment distance (edits and adjacent swaps); the strings are short.
  const rows = a.length + 1;
  const cols = b.length + 1;
  const d: number[] = new Array<number>(rows * cols).fill(0);
  const at = (i: number, j: number): number => d[i * cols + j] ?? 0;
  for (let i = 0; i < rows; i++) d[i * cols] = i;
  for (let j = 0; j < cols; j++) d[j] = j;
  for (let i = 1; i < rows; i++) {
    for (let j = 1; j < cols; j++) {
      const cost = a[i - 1] === b[j - 1] ? 0 : 1;
      let best = Math.min(at(i - 1, j) + 1, at(i, j - 1) + 1, at(i - 1, j - 1) + cost);
      if (i > 1 && j > 1 && a[i - 1] === b[j - 2] && a[i - 2] === b[j - 1]) best = Math.min(best, at(i - 2, j - 2) + 1);
      d[i * cols + j] = best;
    }
  }
  return at(rows - 1, cols - 1);
}

/**
 * Up to three known units close to an unknown spelling: a different letter case (`KN` -> `kN`),
 * two symbols run together (`kNm` -> `kN*m`), or the nearest spellings by edit distance with adjacent
 * swaps, at most 1 edit for 3 letters or fewer and 2 above (`kpi` -> `kip`, `kPa`, `ksi`).
 */
export function suggestUnits(spelling: string): readonly string[] {
  const out: string[] = [];
  const add = (s: string): void => {
    if (!out.includes(s)) out.push(s);
  };
  const lower = spelling.toLowerCase();
  const spellings = allSpellings();
  for (const s of spellings) if (s.toLowerCase() === lower) add(lookupUnit(s)?.symbol ?? s);
  for (let k = 1; k < spelling.length; k++) {
    const left = lookupUnit(spelling.slice(0, k));
    const right = lookupUnit(spelling.slice(k));
    if (left && right) add(`${left.symbol}*${right.symbol}`);
  }
  if (out.length > 0) return out.slice(0, 3);
  const limit = spelling.length <= 3 ? 1 : 2;
  // a spelling whose length differs by more than the limit cannot be that close (and a long one is no misspelling)
  if (lower.length > 24) return out;
  const near = spellings
    .filter((s) => Math.abs(s.length - lower.length) <= limit)
    .map((s) => ({ s, d: distance(lower, s.toLowerCase()) }))
    .filter((x) => x.d <= limit)
    .sort((x, y) => x.d - y.d);
  // the nearest only: "kipz" is one edit from kip and two from kPa
  for (const { s, d } of near) if (d === near[0]?.d) add(lookupUnit(s)?.symbol ?? s);
  return out.slice(0, 3);
}
