import type { Combination } from "./types.js";

/** A factor as the standards print it: at least one decimal, at most three (1.0, 1.2, 0.525). */
function factorText(f: number): string {
  const a = Math.abs(f);
  const text = Number.isInteger(a * 10) ? a.toFixed(1) : Number.isInteger(a * 1000) ? String(Number(a.toFixed(3))) : String(a);
  return text;
}

/**
 * The name of a combination from its factors, as the standards write it: `"1.2D + 1.6L - 1.0W"`
 * (case names of more than three characters are set apart by a space: `"1.2 dead + 1.6 live"`).
 *
 * @example
 * ```ts
 * combinationName({ D: 1.2, L: 1.6, W: -0.5 }); // "1.2D + 1.6L - 0.5W"
 * ```
 */
export function combinationName(factors: Readonly<Record<string, number>>): string {
  let out = "";
  for (const [name, f] of Object.entries(factors)) {
    if (f === 0) continue;
    const term = `${factorText(f)}${name.length > 3 ? " " : ""}${name}`;
    out += out.length === 0 ? (f < 0 ? `-${term}` : term) : f < 0 ? ` - ${term}` : ` + ${term}`;
  }
  return out.length === 0 ? "0" : out;
}

/**
 * The combinations as a plain-text table a user can read to see exactly what is applied: one
 * line per combination with its purpose, its factors and its clause.
 *
 * @example
 * ```ts
 * formatCombinations([{ name: "1.4D", purpose: "strength", factors: { D: 1.4 }, clause: "ASCE 7-16 2.3.1 (1)" }]);
 * // "  1  1.4D  (strength; ASCE 7-16 2.3.1 (1))"
 * ```
 */
export function formatCombinations(combinations: readonly Combination[]): string {
  const width = Math.max(0, ...combinations.map((c) => c.name.length));
  const digits = String(combinations.length).length;
  return combinations
    .map((c, i) => {
      const name = combinationName(c.factors);
      const factors = name === c.name ? "" : ` = ${name}`;
      const clause = c.clause === undefined ? "" : `; ${c.clause}`;
      return `${String(i + 1).padStart(digits + 2)}  ${c.name.padEnd(width)}${factors}  (${c.purpose}${clause})`;
    })
    .join("\n");
}
