import { describeValue, fail, IssueCollector } from "../errors/index.js";
import { checkBreaks, checkCoefficients, checkNumber, checkPiecewise, checkPoints, checkSide, isNumberList, MAX_DEGREE, overflow, trusted } from "./checks.js";
import { evaluatePolynomial } from "./polynomial.js";
import { coincidenceTolerance } from "./tolerance.js";

/**
 * A piecewise polynomial on typed arrays: piece `i` covers `[breaks[i], breaks[i+1]]` and equals
 * `sum_k coefficients[i * (degree + 1) + k] * (x - breaks[i])^k` there (a local basis, which keeps
 * full precision far from x = 0).
 *
 * Treat it as immutable: flexura never changes one after building it, and the typed arrays
 * must not be written to by callers either. Each diagram of a solved member owns one ArrayBuffer
 * holding exactly its breakpoints and coefficients, shared with nothing else: it survives
 * `structuredClone` at its own size, and transferring it moves that diagram alone.
 *
 * @example
 * ```ts
 * // 2x on [0, 1], then 2 - (x - 1) on [1, 3]
 * const pp = piecewisePolynomial([0, 1, 3], [0, 2, 2, -1], 1);
 * evaluatePiecewise(pp, 2); // 1
 * ```
 */
export interface PiecewisePolynomial {
  /** Tag: always `"piecewise-polynomial"`. */
  readonly kind: "piecewise-polynomial";
  /** Highest power on every piece (some pieces may have zero leading coefficients). */
  readonly degree: number;
  /** Strictly increasing breakpoints, one more than the number of pieces (x units). */
  readonly breaks: Float64Array;
  /** Coefficients, `degree + 1` per piece, lowest power first, in powers of `x - breaks[i]`. */
  readonly coefficients: Float64Array;
}

/** Which one-sided limit to take at a breakpoint where the function may jump. */
export type PiecewiseSide = "left" | "right";

/**
 * Builds a piecewise polynomial from breakpoints and local-basis coefficients (copied).
 *
 * @param breaks - strictly increasing breakpoints (at least two).
 * @param coefficients - `degree + 1` coefficients per piece, lowest power first, in powers of `x - breaks[i]`.
 * @param degree - highest power, 0 to 8.
 * @throws FlexuraError `piecewise-invalid` when the breakpoints or coefficients are not arrays of numbers,
 *   the breakpoints are not strictly increasing and finite, the coefficients are not finite,
 *   the degree is not an integer from 0 to 8, or the number of coefficients does not match.
 * @example
 * ```ts
 * const line = piecewisePolynomial([0, 4], [1, 0.5], 1); // 1 + x / 2 on [0, 4]
 * ```
 */
export function piecewisePolynomial(breaks: ArrayLike<number>, coefficients: ArrayLike<number>, degree: number): PiecewisePolynomial {
  const found = new IssueCollector();
  if (!isNumberList(breaks)) found.add("piecewise-invalid", ["breaks"], `The breakpoints must be an array of numbers; got ${describeValue(breaks)}.`);
  if (!isNumberList(coefficients)) found.add("piecewise-invalid", ["coefficients"], `The coefficients must be an array of numbers; got ${describeValue(coefficients)}.`);
  found.throwIfAny();
  if (typeof degree !== "number" || !Number.isInteger(degree) || degree < 0 || degree > MAX_DEGREE)
    fail("piecewise-invalid", ["degree"], `The degree must be an integer from 0 to ${MAX_DEGREE}; got ${describeValue(degree)}.`);
  if (breaks.length < 2) fail("piecewise-invalid", ["breaks"], "A piecewise polynomial needs at least two breakpoints.");
  checkBreaks(breaks, ["breaks"]);
  const pieces = breaks.length - 1;
  if (coefficients.length !== pieces * (degree + 1))
    fail("piecewise-invalid", ["coefficients"], `Expected ${pieces * (degree + 1)} coefficients (${degree + 1} per piece); got ${coefficients.length}.`);
  checkCoefficients(coefficients, ["coefficients"]);
  return makePiecewise(Float64Array.from(breaks), Float64Array.from(coefficients), degree);
}

/** Builds without checks or copies; for flexura's own kernels, which guarantee the invariants. */
export function makePiecewise(breaks: Float64Array, coefficients: Float64Array, degree: number): PiecewisePolynomial {
  return trusted({ kind: "piecewise-polynomial", degree, breaks, coefficients });
}

/**
 * The number of pieces.
 *
 * @example
 * ```ts
 * pieceCount(piecewisePolynomial([0, 1, 3], [0, 2, 2, -1], 1)); // 2
 * ```
 */
export function pieceCount(pp: PiecewisePolynomial): number {
  return checkPiecewise(pp, "pp").breaks.length - 1;
}

/**
 * Index of the piece that holds `x`; at a breakpoint, `side` picks the piece to its left or right.
 * Assumes `x` lies in the domain (clamps otherwise).
 *
 * @throws FlexuraError `piecewise-invalid` (pp), `not-a-number` (x), `unknown-side` (side).
 * @example
 * ```ts
 * findPiece(piecewisePolynomial([0, 1, 3], [0, 2, 2, -1], 1), 1, "left"); // 0
 * ```
 */
export function findPiece(pp: PiecewisePolynomial, x: number, side: PiecewiseSide = "right"): number {
  return locate(checkPiecewise(pp, "pp").breaks, checkNumber(x, "x"), checkSide(side));
}

/** {@link findPiece} without checks, on the breakpoints. */
function locate(b: Float64Array, x: number, side: PiecewiseSide): number {
  let lo = 0;
  let hi = b.length - 2;
  if (side === "right") {
    // last piece whose start is <= x
    while (lo < hi) {
      const mid = (lo + hi + 1) >> 1;
      if ((b[mid] as number) <= x) lo = mid;
      else hi = mid - 1;
    }
  } else {
    // first piece whose end is >= x
    while (lo < hi) {
      const mid = (lo + hi) >> 1;
      if ((b[mid + 1] as number) >= x) hi = mid;
      else lo = mid + 1;
    }
  }
  return lo;
}

/**
 * Value at `x`. At a breakpoint where the function jumps, `side` chooses the limit from the
 * left or from the right. Without a side, the right limit is taken, except at the last
 * breakpoint, where the value is the left limit (the value on the domain at each end).
 *
 * At the ends, a side that points off the domain (`"left"` at the first breakpoint, `"right"`
 * at the last) gives 0: a diagram is zero off its member, so the jump at an end is the end's
 * reaction. A position within the coincidence tolerance (1e-9 of the domain's width, see
 * docs/tolerances.md) of an end is at that end: x = 0.1 + 0.2 on [0, 0.3] reads x = 0.3.
 *
 * @throws FlexuraError `outside-domain` when `x` is NaN or outside `[breaks[0], breaks[last]]` by more than the tolerance;
 *   `not-a-number` (x), `unknown-side` (side), `piecewise-invalid` (pp);
 *   `piecewise-overflow` when the value exceeds what a double can hold.
 * @example
 * ```ts
 * const step = piecewisePolynomial([0, 1, 2], [1, 3], 0);
 * evaluatePiecewise(step, 1, "left"); // 1
 * evaluatePiecewise(step, 1); // 3
 * ```
 */
export function evaluatePiecewise(pp: PiecewisePolynomial, x: number, side?: PiecewiseSide): number {
  const q = checkPiecewise(pp, "pp");
  if (side !== undefined && side !== "right" && side !== "left") checkSide(side);
  if (typeof x !== "number") checkNumber(x, "x");
  const b = q.breaks;
  const x0 = b[0] as number;
  const x1 = b[b.length - 1] as number;
  const slack = coincidenceTolerance(x1 - x0);
  if (!(x >= x0 - slack && x <= x1 + slack)) fail("outside-domain", ["x"], `x = ${x} lies outside [${x0}, ${x1}].`, { x });
  if (x <= x0) {
    if (side === "left") return 0;
    x = x0;
  } else if (x >= x1) {
    if (side === "right") return 0;
    x = x1;
  }
  const i = locate(b, x, side ?? "right");
  const d = q.degree;
  const v = evaluatePolynomial(q.coefficients, i * (d + 1), d, x - (b[i] as number));
  if (v - v !== 0) overflow(["x"], `The value at x = ${x}`);
  return v;
}

/**
 * Values at many points into `out` (allocated when not given). Points may come in any order,
 * but sorted points are fastest: the piece search then walks forward. At a breakpoint the
 * right-hand limit is taken (the left-hand one at the last breakpoint); a point within the
 * coincidence tolerance (1e-9 of the domain's width) of an end is at that end.
 *
 * @throws FlexuraError `outside-domain` when a point lies outside the domain or is NaN;
 *   `not-an-array` / `not-a-number` (xs), `output-invalid` (out not a Float64Array as long as xs),
 *   `piecewise-invalid` (pp), `piecewise-overflow` when a value exceeds what a double can hold.
 * @example
 * ```ts
 * const pp = piecewisePolynomial([0, 2], [0, 0, 1], 2); // x^2
 * evaluatePiecewiseMany(pp, Float64Array.of(0, 1, 2)); // Float64Array [0, 1, 4]
 * ```
 */
export function evaluatePiecewiseMany(pp: PiecewisePolynomial, xs: ArrayLike<number>, out?: Float64Array): Float64Array {
  const q = checkPiecewise(pp, "pp");
  checkPoints(xs);
  const n = xs.length;
  if (out !== undefined && !(out instanceof Float64Array && out.length >= n))
    fail("output-invalid", ["out"], `The output must be a Float64Array of at least ${n} values (one per point); got ${describeValue(out)}.`);
  const result = out ?? new Float64Array(n);
  const b = q.breaks;
  const c = q.coefficients;
  const d = q.degree;
  const stride = d + 1;
  const last = b.length - 2;
  const x0 = b[0] as number;
  const x1 = b[last + 1] as number;
  const slack = coincidenceTolerance(x1 - x0);
  let i = 0;
  for (let j = 0; j < n; ) {
    // place the cursor on the piece of xs[j]: forward by steps for sorted points, by binary search when a point goes back
    const first = xs[j] as number;
    if (!(first >= x0 && first <= x1)) {
      // within the coincidence tolerance of an end: at the end
      if (!(first >= x0 - slack && first <= x1 + slack)) fail("outside-domain", ["xs", j], `x = ${first} lies outside [${x0}, ${x1}].`, { x: first });
      result[j] = evaluatePolynomial(c, first < x0 ? 0 : last * stride, d, first < x0 ? 0 : x1 - (b[last] as number));
      j++;
      continue;
    }
    if (first < (b[i] as number)) i = locate(b, first, "right");
    while (i < last && first >= (b[i + 1] as number)) i++;
    // then evaluate the run of points that stay on this piece, its coefficients held in locals
    // (Horner's rule: the same operations in the same order as evaluatePolynomial)
    const next = evaluateRun(c, i * stride, d, b[i] as number, b[i + 1] as number, i === last, xs, j, result);
    // breakpoints written to after the check (NaN, out of order) must not stall the walk
    if (next === j) fail("piecewise-invalid", ["pp", "breaks"], "The breakpoints were changed after the piecewise polynomial was built.");
    j = next;
  }
  for (let k = 0; k < n; k++) {
    const v = result[k] as number;
    if (v - v !== 0) overflow(["xs", k], `The value at x = ${xs[k]}`);
  }
  return result;
}

/**
 * Evaluates the piece at `c[o..o+d]` (starting at `lo`, ending at `end`, the end included when
 * `closed`) at xs[j], xs[j+1], ... while they lie on it; returns the index of the first point off it.
 */
function evaluateRun(c: Float64Array, o: number, d: number, lo: number, end: number, closed: boolean, xs: ArrayLike<number>, j: number, out: Float64Array): number {
  const n = xs.length;
  const c0 = c[o] as number;
  const c1 = d >= 1 ? (c[o + 1] as number) : 0;
  const c2 = d >= 2 ? (c[o + 2] as number) : 0;
  const c3 = d >= 3 ? (c[o + 3] as number) : 0;
  const c4 = d >= 4 ? (c[o + 4] as number) : 0;
  const c5 = d >= 5 ? (c[o + 5] as number) : 0;
  // one loop per degree, so that the loop body holds no branch but the test for the piece's end
  switch (d) {
    case 0:
      for (; j < n; j++) {
        const x = xs[j] as number;
        if (!(x >= lo && (x < end || (closed && x === end)))) break;
        out[j] = c0;
      }
      return j;
    case 1:
      for (; j < n; j++) {
        const x = xs[j] as number;
        if (!(x >= lo && (x < end || (closed && x === end)))) break;
        const t = x - lo;
        out[j] = c1 * t + c0;
      }
      return j;
    case 2:
      for (; j < n; j++) {
        const x = xs[j] as number;
        if (!(x >= lo && (x < end || (closed && x === end)))) break;
        const t = x - lo;
        out[j] = (c2 * t + c1) * t + c0;
      }
      return j;
    case 3:
      for (; j < n; j++) {
        const x = xs[j] as number;
        if (!(x >= lo && (x < end || (closed && x === end)))) break;
        const t = x - lo;
        out[j] = ((c3 * t + c2) * t + c1) * t + c0;
      }
      return j;
    case 4:
      for (; j < n; j++) {
        const x = xs[j] as number;
        if (!(x >= lo && (x < end || (closed && x === end)))) break;
        const t = x - lo;
        out[j] = (((c4 * t + c3) * t + c2) * t + c1) * t + c0;
      }
      return j;
    case 5:
      for (; j < n; j++) {
        const x = xs[j] as number;
        if (!(x >= lo && (x < end || (closed && x === end)))) break;
        const t = x - lo;
        out[j] = ((((c5 * t + c4) * t + c3) * t + c2) * t + c1) * t + c0;
      }
      return j;
    default:
      for (; j < n; j++) {
        const x = xs[j] as number;
        if (!(x >= lo && (x < end || (closed && x === end)))) break;
        out[j] = evaluatePolynomial(c, o, d, x - lo);
      }
      return j;
  }
}

/** One piece, for plotting or export: the polynomial in powers of `x - from`. */
export interface PolynomialPiece {
  /** Start of the piece (x units). */
  readonly from: number;
  /** End of the piece (x units). */
  readonly to: number;
  /** Coefficients in powers of `x - from`, lowest first (a copy). */
  readonly coefficients: readonly number[];
}

/**
 * The pieces as plain objects (copies), for plotting or export.
 *
 * @example
 * ```ts
 * piecesOf(piecewisePolynomial([0, 1, 3], [0, 2, 2, -1], 1));
 * // [{ from: 0, to: 1, coefficients: [0, 2] }, { from: 1, to: 3, coefficients: [2, -1] }]
 * ```
 */
export function piecesOf(pp: PiecewisePolynomial): readonly PolynomialPiece[] {
  pp = checkPiecewise(pp, "pp");
  const stride = pp.degree + 1;
  const out: PolynomialPiece[] = [];
  for (let i = 0; i + 1 < pp.breaks.length; i++) {
    out.push(
      Object.freeze({
        from: pp.breaks[i] as number,
        to: pp.breaks[i + 1] as number,
        coefficients: Object.freeze(Array.from(pp.coefficients.subarray(i * stride, (i + 1) * stride))),
      }),
    );
  }
  return Object.freeze(out);
}
