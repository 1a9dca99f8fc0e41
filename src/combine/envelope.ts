import { makePiecewise, type PiecewisePolynomial } from "../math/piecewise.js";
import { polynomialRootsIn } from "../math/polynomial.js";
import { DEGREES, type CaseSolutions, type DiagramName } from "./case-solutions.js";
import { taylorShift } from "./common-breaks.js";
import { bernsteinInto, envelopePiece, horner, type EnvelopeBuilder } from "./envelope-kernel.js";
import type { LoadArrangement } from "./patterns.js";
import { combineInto, diagramSize, weightsFor } from "./superpose.js";

/** A value, where it occurs and the arrangement that gives it. */
export interface GoverningValue {
  /** The value (units of the diagram). */
  readonly value: number;
  /** Where (length units). */
  readonly at: number;
  /** Index of the governing arrangement in the list the envelope was taken over. */
  readonly arrangement: number;
  /** Its name (combination and pattern), for example `"1.2D + 1.6L, L on spans 1 and 3"`. */
  readonly name: string;
}

/** One bound of an envelope: an exact piecewise polynomial, the arrangement governing each piece, and its peak. */
export interface EnvelopeBound {
  /**
   * The bound as a piecewise polynomial. Its breakpoints are the cases' own plus every point where
   * the governing arrangement changes (a crossing of two arrangements' curves, found as a root of
   * their difference).
   */
  readonly curve: PiecewisePolynomial;
  /** For each piece of `curve`, the index of the arrangement that governs it. */
  readonly governing: readonly number[];
  /** The largest value of the upper bound, or the smallest of the lower bound, with location and arrangement. */
  readonly peak: GoverningValue;
}

/** Upper and lower envelopes of one diagram. */
export interface DiagramEnvelope {
  /** Which diagram. */
  readonly diagram: DiagramName;
  /** The largest value at every x over the arrangements. */
  readonly upper: EnvelopeBound;
  /** The smallest value at every x over the arrangements. */
  readonly lower: EnvelopeBound;
}

/** The coefficients of one diagram of every arrangement on the shared breakpoints, arrangement-major. */
export function arrangementCoefficients(solved: CaseSolutions, diagram: DiagramName, arrangements: readonly LoadArrangement[]): Float64Array {
  const size = diagramSize(solved, diagram);
  const all = new Float64Array(size * arrangements.length);
  arrangements.forEach((a, k) => combineInto(solved, diagram, a.weights, all.subarray(k * size, (k + 1) * size)));
  return all;
}

/**
 * Upper and lower envelopes of one diagram over the arrangements: exact piecewise polynomials
 * whose pieces each follow one arrangement, broken wherever another rises above it (found by
 * root-finding on the difference of the two, not at stations). Candidates whose range on a piece
 * (from their Bernstein coefficients) lies wholly below another's are skipped without
 * root-finding. Arrangements within about 1e-12 of the diagram's scale count as equal, the first
 * one given keeping the piece.
 *
 * The patterns of a combination searched over all subsets are not enveloped one by one: between
 * the zeros of each span's part of a patterned case, the worst subset is known (the spans whose
 * part adds to the bound: for the upper bound those with factor times part above zero), so each
 * such combination brings one candidate to each stretch between those zeros.
 */
export function envelopeOfDiagram(solved: CaseSolutions, diagram: DiagramName, arrangements: readonly LoadArrangement[]): DiagramEnvelope {
  return envelopeWithGroups(solved, diagram, arrangements, patternGroups(solved, arrangements));
}

/** {@link envelopeOfDiagram} with the pattern groups formed once for all diagrams. */
export function envelopeWithGroups(solved: CaseSolutions, diagram: DiagramName, arrangements: readonly LoadArrangement[], groups: PatternGroups): DiagramEnvelope {
  const d = DEGREES[diagram];
  const n = d + 1;
  const K = arrangements.length;
  const pieces = solved.breaks.length - 1;
  const stride = pieces * n;
  const c = arrangementCoefficients(solved, diagram, arrangements);
  let scale = 0;
  for (let i = 0; i < c.length; i += n) scale = Math.max(scale, Math.abs(c[i] as number));
  for (let k = 0; k < K; k++) scale = Math.max(scale, Math.abs(horner(c, k * stride + (pieces - 1) * n, d, (solved.breaks[pieces] as number) - (solved.breaks[pieces - 1] as number))));
  const tol = 1e-12 * scale;
  const patternedParts: number[] = [];
  solved.parts.forEach((p, i) => {
    if (p.span !== undefined) patternedParts.push(i);
  });
  const partCoefficients = solved.coefficients[diagram];
  const bern = new Float64Array(K * n);
  const cand = new Float64Array(K * n);
  const ids = new Int32Array(K);
  const diff = new Float64Array(n);
  const signs = new Int8Array(solved.parts.length);
  const cuts: number[] = [];
  const upper: EnvelopeBuilder = { breaks: [], coefficients: [], governing: [] };
  const lower: EnvelopeBuilder = { breaks: [], coefficients: [], governing: [] };
  for (let p = 0; p < pieces; p++) {
    const x0 = solved.breaks[p] as number;
    const h = (solved.breaks[p + 1] as number) - x0;
    // the stretches between the zeros of the patterned parts on this piece
    cuts.length = 0;
    cuts.push(0);
    if (groups.reduced.length > 0 && patternedParts.length > 0) {
      for (const i of patternedParts) polynomialRootsIn(partCoefficients, (i * pieces + p) * n, d, 0, h, cuts);
      cuts.push(h);
      cuts.sort((a, b) => a - b);
    } else cuts.push(h);
    let from = 0;
    for (let q = 1; q < cuts.length; q++) {
      const to = cuts[q] as number;
      if (!(to - from > 1e-12 * h) && q < cuts.length - 1) continue;
      if (!(to > from)) continue;
      const mid = 0.5 * (from + to);
      for (const i of patternedParts) signs[i] = Math.sign(horner(partCoefficients, (i * pieces + p) * n, d, mid));
      for (let side = 0; side < 2; side++) {
        const sign = side === 0 ? 1 : -1;
        const count = candidates(groups, signs, sign, ids);
        for (let k = 0; k < count; k++) {
          const a = ids[k] as number;
          for (let j = 0; j < n; j++) cand[k * n + j] = c[a * stride + p * n + j] as number;
          if (from !== 0) taylorShift(cand, k * n, d, from);
          bernsteinInto(cand, k * n, d, to - from, bern, k * n);
        }
        envelopePiece(cand, n, 0, d, count, bern, from === 0 ? x0 : x0 + from, to - from, sign, tol, sign === 1 ? upper : lower, diff, ids);
      }
      from = to;
    }
  }
  const end = solved.breaks[pieces] as number;
  return Object.freeze({ diagram, upper: bound(upper, end, d, 1, arrangements), lower: bound(lower, end, d, -1, arrangements) });
}

/** Arrangements grouped for the pattern reduction (see {@link envelopeOfDiagram}). */
export interface PatternGroups {
  /** Arrangements enveloped one by one (no pattern, or standard patterns). */
  readonly single: Int32Array;
  /** For each combination searched over all subsets: its patterned parts and factors on them. */
  readonly reduced: readonly { readonly parts: Int32Array; readonly factors: Float64Array; readonly bySubset: Int32Array; readonly members: Int32Array }[];
}

function hashOf(w: ArrayLike<number>): number {
  let key = 0;
  for (let i = 0; i < w.length; i++) key = key * 31.0001 + (w[i] as number);
  return key;
}

/** Groups the arrangements: those enveloped one by one, and per combination searched over all subsets a table from subset to arrangement. */
export function patternGroups(solved: CaseSolutions, arrangements: readonly LoadArrangement[]): PatternGroups {
  const single: number[] = [];
  const members = new Map<number, number[]>();
  const byWeights = new Map<number, number[]>();
  arrangements.forEach((a, k) => {
    const key = hashOf(a.weights);
    const list = byWeights.get(key);
    if (list === undefined) byWeights.set(key, [k]);
    else list.push(k);
    if (Object.keys(a.pattern).length === 0 || !a.allSubsets) single.push(k);
    else {
      const m = members.get(a.combination);
      if (m === undefined) members.set(a.combination, [k]);
      else m.push(k);
    }
  });
  const reduced = [...members.values()].map((list) => {
    const first = arrangements[list[0] as number] as LoadArrangement;
    const full = weightsFor(solved, first.factors, undefined);
    const parts = Int32Array.from(solved.parts.map((_, i) => i).filter((i) => solved.parts[i]?.span !== undefined && full[i] !== 0));
    const factors = Float64Array.from(parts, (i) => full[i] as number);
    const bySubset = new Int32Array(1 << parts.length).fill(-1);
    const w = new Float64Array(full.length);
    for (let mask = 0; mask < bySubset.length; mask++) {
      w.set(full);
      parts.forEach((i, j) => {
        if (!((mask >> j) & 1)) w[i] = 0;
      });
      // the arrangement with these weights (perhaps given under another combination, when equal)
      const found = (byWeights.get(hashOf(w)) ?? []).find((k) => arrangements[k]?.weights.every((v, i) => v === w[i]));
      if (found !== undefined) bySubset[mask] = found;
    }
    return { parts, factors, bySubset, members: Int32Array.from(list) };
  });
  return { single: Int32Array.from(single), reduced };
}

/** The candidates on one stretch into `ids`: the single arrangements, and per reduced combination its worst subset there. */
function candidates(groups: PatternGroups, signs: Int8Array, sign: number, ids: Int32Array): number {
  let count = 0;
  const single = groups.single;
  for (let i = 0; i < single.length; i++) ids[count++] = single[i] as number;
  for (const g of groups.reduced) {
    let mask = 0;
    for (let j = 0; j < g.parts.length; j++) {
      const s = signs[g.parts[j] as number] as number;
      // a span's part is loaded when it adds to this bound here
      if (s === 0 || (g.factors[j] as number) * s * sign > 0) mask |= 1 << j;
    }
    const k = g.bySubset[mask] as number;
    if (k >= 0) ids[count++] = k;
    else for (let i = 0; i < g.members.length; i++) ids[count++] = g.members[i] as number;
  }
  return count;
}

const derivativeRoots: number[] = [];

function bound(b: EnvelopeBuilder, end: number, d: number, sign: number, arrangements: readonly LoadArrangement[]): EnvelopeBound {
  // adjacent pieces of one arrangement that meet at a cases' breakpoint stay separate: the cases may jump there
  const breaks = Float64Array.from([...b.breaks, end]);
  const coefficients = Float64Array.from(b.coefficients);
  const curve = makePiecewise(breaks, coefficients, d);
  const n = d + 1;
  let best = -Infinity;
  let at = breaks[0] as number;
  let who = 0;
  const deriv = new Float64Array(Math.max(d, 1));
  for (let i = 0; i + 1 < breaks.length; i++) {
    const x0 = breaks[i] as number;
    const h = (breaks[i + 1] as number) - x0;
    const consider = (t: number, x: number): void => {
      const v = sign * horner(coefficients, i * n, d, t);
      if (v > best) {
        best = v;
        at = x;
        who = b.governing[i] as number;
      }
    };
    consider(0, x0);
    if (d >= 2) {
      for (let k = 1; k <= d; k++) deriv[k - 1] = k * (coefficients[i * n + k] as number);
      derivativeRoots.length = 0;
      polynomialRootsIn(deriv, 0, d - 1, 0, h, derivativeRoots);
      for (const r of derivativeRoots) consider(r, Math.min(x0 + r, breaks[i + 1] as number));
    }
    consider(h, breaks[i + 1] as number);
  }
  const arrangement = arrangements[who];
  return Object.freeze({
    curve,
    governing: Object.freeze(b.governing.slice()),
    peak: Object.freeze({ value: sign * best, at, arrangement: who, name: arrangement?.name ?? "" }),
  });
}
