import { ROUNDING } from "./tolerance.js";
import { fail } from "../errors/index.js";
import { checkNumber, checkPiecewise, overflow } from "./checks.js";
import type { PiecewisePolynomial } from "./piecewise.js";
import { clearOfZero, evaluatePolynomial, rootsToScratch, scratchRoots, takeRootOverflow } from "./polynomial.js";

/** A value and where it occurs. */
export interface LocatedValue {
  /** The value (units of the function). */
  readonly value: number;
  /** Where it occurs (x units). At a jump, the location of the jump. */
  readonly at: number;
}

/** The largest and smallest value of a function over an interval, with locations. */
export interface Extremes {
  /** The largest value (the most positive) and its location. */
  readonly max: LocatedValue;
  /** The smallest value (the most negative) and its location. */
  readonly min: LocatedValue;
}

/** The interval `[lo, hi]` (each defaulting to the end of the domain), checked. */
function interval(pp: PiecewisePolynomial, lo: unknown, hi: unknown): readonly [number, number] {
  const b = pp.breaks;
  const x0 = b[0] as number;
  const x1 = b[b.length - 1] as number;
  const from = lo === undefined ? x0 : checkNumber(lo, "lo");
  const to = hi === undefined ? x1 : checkNumber(hi, "hi");
  checkInterval(pp, from, to);
  return [from, to];
}

function checkInterval(pp: PiecewisePolynomial, lo: number, hi: number): void {
  const b = pp.breaks;
  const x0 = b[0] as number;
  const x1 = b[b.length - 1] as number;
  if (hi < lo) fail("interval-reversed", ["hi"], `The interval [${lo}, ${hi}] ends before it starts.`, { lo, hi });
  if (!(lo >= x0 && hi <= x1 && lo <= hi)) fail("outside-domain", ["lo"], `The interval [${lo}, ${hi}] is not within [${x0}, ${x1}].`, { lo, hi });
}

const derivative = new Float64Array(16);

/**
 * The largest and smallest values on `[lo, hi]` (default: the whole domain), found exactly:
 * candidates are each piece's ends (so both one-sided limits at a jump count) and the real roots
 * of each piece's derivative. Ties keep the leftmost location. A value within rounding of zero
 * (1e-10 of the larger of the two magnitudes; docs/tolerances.md) is reported as 0.
 *
 * @throws FlexuraError `outside-domain` when the interval is not within the domain (or an end is NaN);
 *   `interval-reversed` when `hi < lo`; `not-a-number` (lo, hi); `piecewise-invalid` (pp);
 *   `piecewise-overflow` when the polynomial's values exceed what a double can hold.
 * @example
 * ```ts
 * const pp = piecewisePolynomial([0, 2], [0, 2, -1], 2); // 2x - x^2
 * extremesOf(pp); // { max: { value: 1, at: 1 }, min: { value: 0, at: 0 } }
 * ```
 */
export function extremesOf(pp: PiecewisePolynomial, lo?: number, hi?: number): Extremes {
  pp = checkPiecewise(pp, "pp");
  const b = pp.breaks;
  const [from, to] = interval(pp, lo, hi);
  takeRootOverflow();
  const d = pp.degree;
  const stride = d + 1;
  const c = pp.coefficients;
  let maxV = -Infinity;
  let maxX = from;
  let minV = Infinity;
  let minX = from;
  const pieces = b.length - 1;
  for (let i = 0; i < pieces; i++) {
    const x0 = b[i] as number;
    const x1 = b[i + 1] as number;
    if (x1 < from || x0 > to) continue;
    if (x1 === from && i + 1 < pieces && from !== to) continue;
    // piece ends are reported at the exact breakpoint (x0 + (x1 - x0) need not equal x1)
    const xa = Math.max(x0, from);
    const xe = Math.min(x1, to);
    const a = xa - x0;
    const e = xe - x0;
    const o = i * stride;
    let v = evaluatePolynomial(c, o, d, a);
    if (v > maxV) {
      maxV = v;
      maxX = xa;
    }
    if (v < minV) {
      minV = v;
      minX = xa;
    }
    if (e > a && d >= 2) {
      for (let k = 1; k <= d; k++) derivative[k - 1] = k * (c[o + k] as number);
      // a piece whose derivative keeps one sign is monotone: its ends are its extremes
      const count = clearOfZero(derivative, 0, d - 1, e) ? 0 : rootsToScratch(derivative, 0, d - 1, a, e);
      for (let r = 0; r < count; r++) {
        const t = scratchRoots[r] as number;
        v = evaluatePolynomial(c, o, d, t);
        if (v > maxV) {
      maxV = v;
      maxX = Math.min(t + x0, xe);
    }
        if (v < minV) {
      minV = v;
      minX = Math.min(t + x0, xe);
    }
      }
    }
    v = evaluatePolynomial(c, o, d, e);
    if (v > maxV) {
      maxV = v;
      maxX = xe;
    }
    if (v < minV) {
      minV = v;
      minX = xe;
    }
  }
  if (takeRootOverflow() || maxV - maxV !== 0 || minV - minV !== 0) overflow(["pp"], "A value of the polynomial");
  // a value within rounding of zero (ROUNDING of the largest magnitude) is zero: the tolerance policy of docs/tolerances.md
  const floor = ROUNDING * Math.max(Math.abs(maxV), Math.abs(minV));
  return { max: { value: Math.abs(maxV) <= floor ? 0 : maxV, at: maxX }, min: { value: Math.abs(minV) <= floor ? 0 : minV, at: minX } };
}

/**
 * The real roots (zeros) on `[lo, hi]` (default: the whole domain), in increasing order, each
 * piece's roots found exactly (closed forms to degree 2, bracketed iteration above). A piece that
 * is identically zero contributes no roots; a jump across zero at a breakpoint is not a root.
 * A root shared by two pieces at their common breakpoint is reported once.
 *
 * @throws FlexuraError `outside-domain` when the interval is not within the domain (or an end is NaN);
 *   `interval-reversed` when `hi < lo`; `not-a-number` (lo, hi); `piecewise-invalid` (pp);
 *   `piecewise-overflow` when the polynomial's values exceed what a double can hold.
 * @example
 * ```ts
 * rootsOf(piecewisePolynomial([0, 4], [-2, 0, 1], 2)); // [1.4142135623730951]
 * ```
 */
export function rootsOf(pp: PiecewisePolynomial, lo?: number, hi?: number): readonly number[] {
  pp = checkPiecewise(pp, "pp");
  const b = pp.breaks;
  const [from, to] = interval(pp, lo, hi);
  takeRootOverflow();
  const d = pp.degree;
  const stride = d + 1;
  const out: number[] = [];
  for (let i = 0; i + 1 < b.length; i++) {
    const x0 = b[i] as number;
    const x1 = b[i + 1] as number;
    if (x1 < from || x0 > to) continue;
    const xa = Math.max(x0, from);
    const xe = Math.min(x1, to);
    const a = xa - x0;
    const e = xe - x0;
    const count = rootsToScratch(pp.coefficients, i * stride, d, a, e);
    for (let r = 0; r < count; r++) {
      const t = scratchRoots[r] as number;
      const x = t === a ? xa : t === e ? xe : Math.min(t + x0, xe);
      const prev = out.length > 0 ? (out[out.length - 1] as number) : Number.NaN;
      if (!(Math.abs(x - prev) <= 1e-12 * (Math.abs(x) + (x1 - x0)))) out.push(x);
    }
  }
  if (takeRootOverflow()) overflow(["pp"], "A value of the polynomial");
  return out;
}
