/** Edit distance (insertions, deletions, substitutions) between two short strings. */
function distance(a: string, b: string): number {
  let previous = Array.from({ length: b.length + 1 }, (_, j) => j);
  for (let i = 1; i <= a.length; i++) {
    const current = [i];
    for (let j = 1; j <= b.length; j++) {
      const cost = a[i - 1] === b[j - 1] ? 0 : 1;
      current.push(Math.min((previous[j] ?? 0) + 1, (current[j - 1] ?? 0) + 1, (previous[j - 1] ?? 0) + cost));
    }
    previous = current;
  }
  return previous[b.length] ?? 0;
}

/**
 * The candidate closest to `name` (letter case aside) by edit distance, when it is close enough to
 * be a likely misspelling (at most a third of the name's letters differ, and at least one may);
 * otherwise undefined.
 *
 * @example
 * ```ts
 * closestName("rootradius", ["depth", "rootRadius"]); // "rootRadius"
 * closestName("colour", ["depth", "width"]); // undefined
 * ```
 */
export function closestName(name: string, candidates: readonly string[]): string | undefined {
  let best: string | undefined;
  let bestDistance = Infinity;
  const lower = name.slice(0, 64).toLowerCase();
  for (const candidate of candidates) {
    const d = distance(lower, candidate.toLowerCase());
    if (d < bestDistance) {
      best = candidate;
      bestDistance = d;
    }
  }
  return bestDistance <= Math.max(1, Math.floor(name.length / 3)) ? best : undefined;
}

/**
 * The message tail for an unknown key: ` Did you mean "x"?` when one of the known names is close,
 * else a list of the known names.
 *
 * @example
 * ```ts
 * unknownKeyHint("rootradius", ["depth", "rootRadius"]); // ' Did you mean "rootRadius"?'
 * ```
 */
export function unknownKeyHint(name: string, known: readonly string[]): string {
  const near = closestName(name, known);
  if (near !== undefined) return ` Did you mean "${near}"?`;
  return ` Known names: ${known.map((k) => `"${k}"`).join(", ")}.`;
}
