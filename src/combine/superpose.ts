import type { BeamSpan, Reaction } from "../beam/index.js";
import { describeValue, fail, IssueCollector, requireFinite, unknownKeyHint } from "../errors/index.js";
import { makePiecewise, type PiecewisePolynomial } from "../math/piecewise.js";
import { DEGREES, type CasePart, type CaseSolutions, type DiagramName } from "./case-solutions.js";
import { isRecord } from "./validate.js";

/**
 * Which spans of each patterned case are loaded: span indices into `CaseSolutions.spans` by case
 * name. A patterned case not listed is loaded on every span.
 */
export type SpanPattern = Readonly<Record<string, readonly number[]>>;

/**
 * A combination formed by superposition: reactions and the four diagrams, exact piecewise
 * polynomials, with the member's length and spans: what the member checks of `flexura/check` read
 * (`checkMember(combined, sections, limits)` checks one combination).
 */
export interface CombinedResult {
  /** Member length (length units). */
  readonly length: number;
  /** The spans and cantilevers, left to right. */
  readonly spans: readonly BeamSpan[];
  /** One reaction per support, in the member's order: force up positive, moment counterclockwise positive. */
  readonly reactions: readonly Reaction[];
  /** Shear V(x) (force units), degree 2. */
  readonly shear: PiecewisePolynomial;
  /** Bending moment M(x), sagging positive (force * length), degree 3. */
  readonly moment: PiecewisePolynomial;
  /** Slope, counterclockwise positive (radians), degree 4. */
  readonly slope: PiecewisePolynomial;
  /** Deflection, up positive (length units), degree 5. */
  readonly deflection: PiecewisePolynomial;
}

/**
 * The weight of each solved part for these factors and pattern (checked): the case's factor, or 0
 * for a patterned case's span that the pattern leaves unloaded.
 */
export function partWeights(solved: CaseSolutions, factors: unknown, pattern?: unknown): Float64Array {
  const found = new IssueCollector();
  const names = solved.cases.map((c) => c.name);
  if (!isRecord(factors)) fail("combination-no-factors", ["factors"], `The factors are an object { caseName: factor }; got ${describeValue(factors)}.`);
  const keys = Object.keys(factors);
  if (keys.length === 0) found.add("combination-no-factors", ["factors"], "The combination has no factors: name at least one case.");
  for (const k of keys) {
    if (!names.includes(k)) found.add("unknown-case", ["factors", k], `The factors name the case "${k}", which is not among the load cases.${unknownKeyHint(k, names)}`, { name: k });
    requireFinite(found, factors[k], ["factors", k], `factor on case "${k}"`);
  }
  if (pattern !== undefined) {
    if (!isRecord(pattern)) found.add("pattern-invalid", ["pattern"], `A pattern is an object { caseName: [span indices] }; got ${describeValue(pattern)}.`);
    else
      for (const [k, spans] of Object.entries(pattern)) {
        const c = solved.cases.find((x) => x.name === k);
        if (c === undefined || c.patterned !== true) found.add("pattern-invalid", ["pattern", k], `The pattern names "${k}", which is not a patterned case.`, { name: k });
        else if (!Array.isArray(spans) || !spans.every((s) => Number.isInteger(s) && s >= 0 && s < solved.spans.length))
          found.add("pattern-invalid", ["pattern", k], `The loaded spans of "${k}" are indices from 0 to ${solved.spans.length - 1}.`, { name: k });
      }
  }
  found.throwIfAny();
  return weightsFor(solved, factors as Readonly<Record<string, number>>, pattern as SpanPattern | undefined);
}

/** {@link partWeights} without checks, for factors and a pattern already checked. */
export function weightsFor(solved: CaseSolutions, factors: Readonly<Record<string, number>>, pattern: SpanPattern | undefined): Float64Array {
  const parts = solved.parts;
  const out = new Float64Array(parts.length);
  for (let i = 0; i < parts.length; i++) {
    const part = parts[i] as CasePart;
    const factor = factors[part.case] ?? 0;
    if (part.span === undefined || pattern === undefined) out[i] = factor;
    else {
      const loaded = pattern[part.case];
      out[i] = loaded === undefined || loaded.includes(part.span) ? factor : 0;
    }
  }
  return out;
}

/** The coefficients of one diagram for these part weights, on the shared breakpoints, into `out`. */
export function combineInto(solved: CaseSolutions, diagram: DiagramName, weights: Float64Array, out: Float64Array): Float64Array {
  const src = solved.coefficients[diagram];
  const n = out.length;
  out.fill(0);
  for (let p = 0; p < weights.length; p++) {
    const w = weights[p] as number;
    if (w === 0) continue;
    const o = p * n;
    for (let k = 0; k < n; k++) out[k] = (out[k] as number) + w * (src[o + k] as number);
  }
  return out;
}

/** Number of coefficients of one diagram of one part. */
export function diagramSize(solved: CaseSolutions, diagram: DiagramName): number {
  return (solved.breaks.length - 1) * (DEGREES[diagram] + 1);
}

/** The reactions for these part weights. */
export function combineReactions(solved: CaseSolutions, weights: Float64Array): Reaction[] {
  const n = solved.supportsAt.length;
  const out: Reaction[] = [];
  for (let s = 0; s < n; s++) {
    let force = 0;
    let moment = 0;
    for (let p = 0; p < weights.length; p++) {
      const w = weights[p] as number;
      if (w === 0) continue;
      force += w * (solved.reactionForces[p * n + s] as number);
      moment += w * (solved.reactionMoments[p * n + s] as number);
    }
    out.push(Object.freeze({ support: s, at: solved.supportsAt[s] as number, force, moment }));
  }
  return out;
}

/**
 * A combination by superposition of the solved cases: each diagram is the sum of the cases'
 * piecewise polynomials times their factors, the reactions likewise; nothing is solved again
 * (exact for a linear elastic member). A patterned case is loaded on the spans `pattern` lists
 * (every span when it is not listed).
 *
 * @throws FlexuraError `combination-no-factors`, `unknown-case`, `not-a-number` / `not-finite`
 *   (a factor), `pattern-invalid`.
 * @example
 * ```ts
 * const c = combineCases(cases, { D: 1.2, L: 1.6 }, { L: [0] }); // live on the first span only
 * c.reactions[1].force; // the middle support's reaction, up positive
 * ```
 */
export function combineCases(solved: CaseSolutions, factors: Readonly<Record<string, number>>, pattern?: SpanPattern): CombinedResult {
  const weights = partWeights(solved, factors, pattern);
  const diagram = (name: DiagramName): PiecewisePolynomial => {
    const out = combineInto(solved, name, weights, new Float64Array(diagramSize(solved, name)));
    return makePiecewise(solved.breaks.slice(), out, DEGREES[name]);
  };
  return Object.freeze({
    length: solved.length,
    spans: solved.spans,
    reactions: Object.freeze(combineReactions(solved, weights)),
    shear: diagram("shear"),
    moment: diagram("moment"),
    slope: diagram("slope"),
    deflection: diagram("deflection"),
  });
}
