import { describeValue, FlexuraError, IssueCollector, type FlexuraIssue } from "../errors/index.js";
import type { CaseSolutions } from "./case-solutions.js";
import { weightsFor, type SpanPattern } from "./superpose.js";
import type { Combination } from "./types.js";
import { checkCombinations } from "./validate.js";

/** Options for the pattern search of {@link arrangementsOf}. */
export interface PatternOptions {
  /**
   * All subsets of the spans a patterned case loads are searched when they are at most this many
   * (default 8: 256 patterns); beyond it, the standard patterns (see {@link arrangementsOf}).
   * A whole number from 1 to {@link MAX_PATTERN_CAP}.
   */
  readonly cap?: number;
}

/** The largest pattern cap accepted: 2^16 = 65,536 patterns of one case. */
export const MAX_PATTERN_CAP = 16;

/** The largest number of arrangements (combinations times patterns) formed for one member. */
export const MAX_ARRANGEMENTS = 100_000;

/** One combination with one placement of its patterned cases: what an envelope is taken over. */
export interface LoadArrangement {
  /** Index of the combination in the list given. */
  readonly combination: number;
  /** The combination's name. */
  readonly combinationName: string;
  /** The spans loaded, by patterned case in the combination (indices into `CaseSolutions.spans`); empty for a combination with none. */
  readonly pattern: SpanPattern;
  /** The pattern in words, for example `"L on spans 1 and 3"`; empty when there is no pattern. */
  readonly description: string;
  /** The name a user reads: the combination's, then the pattern's (`"1.2D + 1.6L, L on spans 1 and 3"`). */
  readonly name: string;
  /** The combination's factors by case. */
  readonly factors: Readonly<Record<string, number>>;
  /** True when every patterned case of the combination was searched over all subsets of its spans (not the standard patterns). */
  readonly allSubsets: boolean;
  /** The weight of each solved part (see `CaseSolutions.parts`). */
  readonly weights: Float64Array;
}

/** The span sets of one patterned case: all subsets up to the cap, else the standard ones. */
function spanSets(spans: readonly number[], cap: number): number[][] {
  const n = spans.length;
  if (n <= cap) {
    const out: number[][] = [];
    for (let mask = 0; mask < 1 << n; mask++) out.push(spans.filter((_, i) => (mask >> i) & 1));
    return out;
  }
  // ACI 318-19 6.4.3.2 and EN 1992-1-1 5.1.3(1): for the largest sagging moment, a span and the
  // spans alternate to it; for the largest hogging moment at a support, the two spans beside it;
  // and all spans and none (for shear, reactions and the unloaded case)
  const out: number[][] = [[], [...spans], spans.filter((s) => s % 2 === 0), spans.filter((s) => s % 2 === 1)];
  for (let i = 0; i + 1 < n; i++) if ((spans[i + 1] as number) === (spans[i] as number) + 1) out.push([spans[i] as number, spans[i + 1] as number]);
  return out;
}

/** "span 1", "spans 1 and 3", "span 2 and the right cantilever". */
export function spansInWords(solved: CaseSolutions, loaded: readonly number[], all: readonly number[]): string {
  if (loaded.length === 0) return "no span";
  if (loaded.length === all.length && all.length > 1) return "all spans";
  const numbers: string[] = [];
  const others: string[] = [];
  for (const s of loaded) {
    const name = solved.spanNames[s] ?? `span ${s + 1}`;
    if (name.startsWith("span ")) numbers.push(name.slice(5));
    else others.push(`the ${name}`);
  }
  const list = (xs: readonly string[]): string => (xs.length <= 1 ? (xs[0] ?? "") : `${xs.slice(0, -1).join(", ")} and ${xs[xs.length - 1] as string}`);
  const parts = numbers.length === 0 ? [] : [numbers.length === 1 ? `span ${numbers[0] as string}` : `spans ${list(numbers)}`];
  return list([...parts, ...others]);
}

/**
 * The arrangements to envelope: each combination once per pattern of its patterned cases. A
 * patterned case that loads `n` spans is searched over all `2^n` subsets of them when `n` is at
 * most the cap, else over the standard patterns: none, all, alternate spans (the span and every
 * second one from it, for sagging moment) and each two spans beside a support (for hogging
 * moment), as in ACI 318-19 6.4.3.2 and EN 1992-1-1 5.1.3(1). Arrangements with equal weights on
 * every part are given once (the first is kept).
 *
 * @throws FlexuraError `pattern-cap-invalid`, `pattern-cap-too-large` (a cap above
 *   {@link MAX_PATTERN_CAP}, with the count of patterns it could ask for), `pattern-count-too-large`
 *   (more than {@link MAX_ARRANGEMENTS} arrangements, with the count), and the combination checks
 *   (`combination-no-factors`, `unknown-case`, `not-finite`, ...), with paths under `combinations`.
 * @example
 * ```ts
 * const a = arrangementsOf(cases, [{ name: "1.2D + 1.6L", purpose: "strength", factors: { D: 1.2, L: 1.6 } }]);
 * a.map((x) => x.description); // ["L on no span", "L on span 1", "L on span 2", "L on all spans"]
 * ```
 */
export function arrangementsOf(solved: CaseSolutions, combinations: readonly Combination[], options?: PatternOptions): readonly LoadArrangement[] {
  const found = new IssueCollector();
  const names = solved.cases.map((c) => c.name);
  checkCombinations(found, combinations, names, ["combinations"]);
  const cap = options?.cap ?? 8;
  if (options !== undefined && (typeof options !== "object" || options === null)) found.add("pattern-options-invalid", ["options"], `The pattern options are an object { cap }; got ${describeValue(options)}.`);
  else if (typeof cap !== "number" || !Number.isInteger(cap) || cap < 1) found.add("pattern-cap-invalid", ["options", "cap"], `The pattern cap is a whole number of spans from 1 to ${MAX_PATTERN_CAP}; got ${describeValue(cap)}.`, { value: describeValue(cap) });
  else if (cap > MAX_PATTERN_CAP)
    found.add("pattern-cap-too-large", ["options", "cap"], `A pattern cap of ${cap} spans could ask for ${2 ** cap} patterns of one case; the most that is searched is ${MAX_PATTERN_CAP} (${2 ** MAX_PATTERN_CAP} patterns). Beyond the cap the standard patterns are used.`, { cap, count: 2 ** cap });
  found.throwIfAny();
  const out: LoadArrangement[] = [];
  // equal weights are found by a hash of the weights, then compared exactly
  const seen = new Map<number, Float64Array[]>();
  let count = 0;
  // the span sets of each patterned case and their words, formed once
  const searches = new Map<string, { sets: number[][]; words: string[]; all: boolean }>();
  combinations.forEach((c, ci) => {
    const patterned = solved.cases.filter((k) => k.patterned === true && (c.factors[k.name] ?? 0) !== 0);
    let patterns: { pattern: Record<string, number[]>; words: string[] }[] = [{ pattern: {}, words: [] }];
    let allSubsets = true;
    for (const k of patterned) {
      let search = searches.get(k.name);
      if (search === undefined) {
        const spans = solved.parts.filter((p) => p.case === k.name && p.span !== undefined).map((p) => p.span as number);
        const sets = spans.length < 2 ? [] : spanSets(spans, cap);
        search = { sets, words: sets.map((s) => `${k.name} on ${spansInWords(solved, s, spans)}`), all: spans.length <= cap };
        searches.set(k.name, search);
      }
      if (search.sets.length === 0) continue;
      if (!search.all) allSubsets = false;
      const { sets, words } = search;
      patterns = patterns.flatMap((p) => sets.map((s, i) => ({ pattern: { ...p.pattern, [k.name]: s }, words: [...p.words, words[i] as string] })));
    }
    count += patterns.length;
    if (count > MAX_ARRANGEMENTS) {
      const issue: FlexuraIssue = { code: "pattern-count-too-large", path: ["combinations", ci], message: `The combinations and their patterns come to more than ${MAX_ARRANGEMENTS} arrangements (at least ${count}): lower the pattern cap or mark fewer cases patterned.`, count };
      throw new FlexuraError([issue]);
    }
    for (const p of patterns) {
      const weights = weightsFor(solved, c.factors, p.pattern);
      let key = 0;
      for (let i = 0; i < weights.length; i++) key = key * 31.0001 + (weights[i] as number);
      const same = seen.get(key);
      if (same !== undefined && same.some((w) => w.every((v, i) => v === weights[i]))) continue;
      if (same === undefined) seen.set(key, [weights]);
      else same.push(weights);
      const description = p.words.join(", ");
      out.push(Object.freeze({ combination: ci, combinationName: c.name, pattern: Object.freeze(p.pattern), description, name: description.length === 0 ? c.name : `${c.name}, ${description}`, factors: c.factors, allSubsets, weights }));
    }
  });
  return Object.freeze(out);
}
