import { attempt, describeValue, IssueCollector, type Result } from "../errors/index.js";
import type { CaseSolutions, DiagramName } from "./case-solutions.js";
import { envelopeWithGroups, patternGroups, type DiagramEnvelope } from "./envelope.js";
import { arrangementsOf, type LoadArrangement, type PatternOptions } from "./patterns.js";
import type { Combination } from "./types.js";

/** The largest or smallest value of a reaction, and the arrangement that gives it. */
export interface GoverningReaction {
  /** The value: force up positive (force units), or moment counterclockwise positive (force * length). */
  readonly value: number;
  /** Index of the governing arrangement. */
  readonly arrangement: number;
  /** Its name. */
  readonly name: string;
}

/** The largest and smallest value of one reaction component over the arrangements. */
export interface ReactionRange {
  /** The largest value (for a force: the largest upward) and its arrangement. */
  readonly max: GoverningReaction;
  /** The smallest value (for a force: negative means the support is pulled, uplift) and its arrangement. */
  readonly min: GoverningReaction;
}

/** The envelope of one support's reaction. */
export interface ReactionEnvelope {
  /** Index of the support, in the member's order. */
  readonly support: number;
  /** Position (length units). */
  readonly at: number;
  /** Largest upward force (`max`) and largest downward force (`min`, negative when the support is pulled: uplift). */
  readonly force: ReactionRange;
  /** Largest and smallest moment (zero where the support lets the member turn). */
  readonly moment: ReactionRange;
}

/** Options for {@link envelopes}. */
export interface EnvelopeOptions {
  /** The pattern search (see {@link arrangementsOf}). */
  readonly pattern?: PatternOptions;
  /** Which diagrams to envelope; default all four. */
  readonly diagrams?: readonly DiagramName[];
}

/** Envelopes over combinations and patterns. */
export interface Envelopes {
  /** The arrangements enveloped: each combination with each pattern of its patterned cases. */
  readonly arrangements: readonly LoadArrangement[];
  /** Shear envelope (force units), when asked for. */
  readonly shear?: DiagramEnvelope;
  /** Moment envelope (force * length, sagging positive), when asked for. */
  readonly moment?: DiagramEnvelope;
  /** Slope envelope (radians), when asked for. */
  readonly slope?: DiagramEnvelope;
  /** Deflection envelope (length units, up positive), when asked for. */
  readonly deflection?: DiagramEnvelope;
  /** Reaction envelope of each support. */
  readonly reactions: readonly ReactionEnvelope[];
}

const ALL: readonly DiagramName[] = ["shear", "moment", "slope", "deflection"];

/**
 * The exact envelopes of a member over combinations and, for patterned cases, their span
 * patterns: upper and lower bounds of shear, moment, slope and deflection as piecewise
 * polynomials, each piece knowing the arrangement that governs it, each bound's peak with its
 * location and arrangement; and per support the largest upward and downward reaction with theirs.
 * No stations: crossings of two arrangements are roots of their difference.
 *
 * @throws FlexuraError the codes of {@link arrangementsOf}, and `diagram-unknown`.
 * @example
 * ```ts
 * const e = envelopes(cases, presetCombinations("asce7-16-strength", cases.cases).combinations);
 * e.moment?.lower.peak; // { value: -..., at: 6, arrangement: 7, name: "1.2D + 1.6L, L on spans 1 and 2" }
 * e.reactions[0]?.force.min; // the largest uplift (or least downward push) at the first support
 * ```
 */
export function envelopes(solved: CaseSolutions, combinations: readonly Combination[], options?: EnvelopeOptions): Envelopes {
  const diagrams = options?.diagrams ?? ALL;
  const found = new IssueCollector();
  if (!Array.isArray(diagrams)) found.add("diagram-unknown", ["options", "diagrams"], `The diagrams are a list of "shear", "moment", "slope", "deflection"; got ${describeValue(diagrams)}.`);
  else diagrams.forEach((d: unknown, i) => {
    if (typeof d !== "string" || !(ALL as readonly string[]).includes(d)) found.add("diagram-unknown", ["options", "diagrams", i], `Unknown diagram ${describeValue(d)}: one of "shear", "moment", "slope", "deflection".`);
  });
  found.throwIfAny();
  const arrangements = arrangementsOf(solved, combinations, options?.pattern);
  const out: { -readonly [K in keyof Envelopes]: Envelopes[K] } = { arrangements, reactions: reactionEnvelopes(solved, arrangements) };
  const groups = patternGroups(solved, arrangements);
  for (const d of new Set<DiagramName>(diagrams)) out[d] = envelopeWithGroups(solved, d, arrangements, groups);
  return Object.freeze(out);
}

/**
 * The non-throwing form of {@link envelopes}.
 *
 * @example
 * ```ts
 * tryEnvelopes(cases, []).ok; // true: no combinations, no arrangements
 * ```
 */
export function tryEnvelopes(solved: CaseSolutions, combinations: readonly Combination[], options?: EnvelopeOptions): Result<Envelopes> {
  return attempt(() => envelopes(solved, combinations, options));
}

/** Largest and smallest reaction of each support over the arrangements. */
function reactionEnvelopes(solved: CaseSolutions, arrangements: readonly LoadArrangement[]): ReactionEnvelope[] {
  const n = solved.supportsAt.length;
  const best = Array.from({ length: n }, () => ({ fmax: -Infinity, fmaxK: 0, fmin: Infinity, fminK: 0, mmax: -Infinity, mmaxK: 0, mmin: Infinity, mminK: 0 }));
  const forces = solved.reactionForces;
  const moments = solved.reactionMoments;
  arrangements.forEach((a, k) => {
    const w = a.weights;
    for (let s = 0; s < n; s++) {
      let force = 0;
      let moment = 0;
      for (let p = 0; p < w.length; p++) {
        const f = w[p] as number;
        if (f === 0) continue;
        force += f * (forces[p * n + s] as number);
        moment += f * (moments[p * n + s] as number);
      }
      const b = best[s];
      if (b === undefined) continue;
      if (force > b.fmax) [b.fmax, b.fmaxK] = [force, k];
      if (force < b.fmin) [b.fmin, b.fminK] = [force, k];
      if (moment > b.mmax) [b.mmax, b.mmaxK] = [moment, k];
      if (moment < b.mmin) [b.mmin, b.mminK] = [moment, k];
    }
  });
  const g = (value: number, k: number): GoverningReaction => Object.freeze({ value: Number.isFinite(value) ? value : 0, arrangement: k, name: arrangements[k]?.name ?? "" });
  return best.map((b, s) =>
    Object.freeze({
      support: s,
      at: solved.supportsAt[s] as number,
      force: Object.freeze({ max: g(b.fmax, b.fmaxK), min: g(b.fmin, b.fminK) }),
      moment: Object.freeze({ max: g(b.mmax, b.mmaxK), min: g(b.mmin, b.mminK) }),
    }),
  );
}
