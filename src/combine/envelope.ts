import { makePiecewise, type PiecewisePolynomial } from "../math/piecewise.js";
import { polynomialRootsIn } from "../math/index.js";
import { DEGREES, type CaseSolutions, type DiagramName } from "./case-solutions.js";
import { bernsteinInto, envelopePiece, horner, type EnvelopeBuilder } from "./envelope-kernel.js";
import type { LoadArrangement } from "./patterns.js";
import { combineInto, diagramSize } from "./superpose.js";

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
 */
export function envelopeOfDiagram(solved: CaseSolutions, diagram: DiagramName, arrangements: readonly LoadArrangement[]): DiagramEnvelope {
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
  const bern = new Float64Array(K * n);
  const diff = new Float64Array(n);
  const upper: EnvelopeBuilder = { breaks: [], coefficients: [], governing: [] };
  const lower: EnvelopeBuilder = { breaks: [], coefficients: [], governing: [] };
  for (let p = 0; p < pieces; p++) {
    const x0 = solved.breaks[p] as number;
    const h = (solved.breaks[p + 1] as number) - x0;
    for (let k = 0; k < K; k++) bernsteinInto(c, k * stride + p * n, d, h, bern, k * n);
    envelopePiece(c, stride, p * n, d, K, bern, x0, h, 1, tol, upper, diff);
    envelopePiece(c, stride, p * n, d, K, bern, x0, h, -1, tol, lower, diff);
  }
  const end = solved.breaks[pieces] as number;
  return Object.freeze({ diagram, upper: bound(upper, end, d, 1, arrangements), lower: bound(lower, end, d, -1, arrangements) });
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
