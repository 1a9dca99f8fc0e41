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
 * The candidate closest to `name` (ignoring case) by edit distance, when it is close enough to be
 * a likely typo (at most a third of the name's letters, and at least one, differ); for "Did you
 * mean" hints on unknown fields and options.
 *
 * @param name - What was written.
 * @param candidates - The names allowed there.
 * @returns The likely intended name, or undefined when none is close.
 * @example
 * ```ts
 * closestName("bendingstress", ["bendingStress", "shearStress"]); // "bendingStress"
 * ```
 */
export function closestName(name: string, candidates: readonly string[]): string | undefined {
  let best: string | undefined;
  let bestDistance = Infinity;
  for (const candidate of candidates) {
    const d = distance(name.toLowerCase(), candidate.toLowerCase());
    if (d < bestDistance) {
      best = candidate;
      bestDistance = d;
    }
  }
  return bestDistance <= Math.max(1, Math.floor(name.length / 3)) ? best : undefined;
}
