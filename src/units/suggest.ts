import { allSpellings, lookupUnit } from "./catalog.js";

/**
 * Up to three known units close to an unknown spelling: a different letter case (`KN` -> `kN`),
 * two symbols run together (`kNm` -> `kN*m`), or a known spelling that begins the unknown one
 * or is begun by it (`kipf` -> `kip`, `ps` -> `psi`), letter case aside.
 */
export function suggestUnits(spelling: string): readonly string[] {
  const out = new Set<string>();
  const lower = spelling.toLowerCase();
  const spellings = allSpellings();
  for (const s of spellings) if (s.toLowerCase() === lower) out.add(lookupUnit(s)?.symbol ?? s);
  for (let k = 1; k < spelling.length; k++) {
    const left = lookupUnit(spelling.slice(0, k));
    const right = lookupUnit(spelling.slice(k));
    if (left && right) out.add(`${left.symbol}*${right.symbol}`);
  }
  if (out.size === 0 && lower.length > 1) {
    for (const s of spellings) {
      const l = s.toLowerCase();
      if (l.length > 1 && (lower.startsWith(l) || l.startsWith(lower))) out.add(lookupUnit(s)?.symbol ?? s);
    }
  }
  return [...out].slice(0, 3);
}
