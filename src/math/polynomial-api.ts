import { describeValue, fail } from "../errors/index.js";
import { checkFinite, isNumberList, MAX_DEGREE, overflow } from "./checks.js";
import { evaluatePolynomial as horner, polynomialRootsIn as roots, takeRootOverflow } from "./polynomial.js";

/** Checks a coefficient run `c[offset..offset+degree]`: a list, whole-number offset and degree within it, finite values. */
function checkRun(coefficients: unknown, offset: unknown, degree: unknown, maxDegree: number): asserts coefficients is ArrayLike<number> {
  if (!isNumberList(coefficients)) fail("polynomial-invalid", ["coefficients"], `The coefficients must be an array of numbers; got ${describeValue(coefficients)}.`);
  if (typeof offset !== "number" || !Number.isInteger(offset) || offset < 0)
    fail("polynomial-invalid", ["offset"], `The offset must be a whole number from 0; got ${describeValue(offset)}.`);
  if (typeof degree !== "number" || !Number.isInteger(degree) || degree < 0 || degree > maxDegree || offset + degree >= coefficients.length)
    fail("polynomial-invalid", ["degree"], `The degree must be a whole number from 0 to ${Math.min(maxDegree, coefficients.length - 1 - offset)} (the coefficients there); got ${describeValue(degree)}.`);
  for (let k = offset; k <= offset + degree; k++) {
    const c = coefficients[k];
    if (typeof c !== "number" || !Number.isFinite(c)) fail("polynomial-invalid", ["coefficients", k], `Coefficients must be finite numbers; got ${describeValue(c)}.`);
  }
}

/**
 * Evaluates the polynomial `c[off] + c[off+1] t + ... + c[off+degree] t^degree` at `t` by
 * Horner's rule.
 *
 * @param coefficients - coefficient storage; lowest power first.
 * @param offset - index of the constant term.
 * @param degree - highest power (0 for a constant); `offset + degree` must lie within the storage.
 * @param t - the argument.
 * @returns the value of the polynomial.
 * @throws FlexuraError `polynomial-invalid` (coefficients, offset, degree), `not-a-number` / `not-finite` (t),
 *   `piecewise-overflow` when the value exceeds what a double can hold.
 * @example
 * ```ts
 * evaluatePolynomial(new Float64Array([1, 0, 2]), 0, 2, 3); // 1 + 2 * 9 = 19
 * ```
 */
export function evaluatePolynomial(coefficients: ArrayLike<number>, offset: number, degree: number, t: number): number {
  checkRun(coefficients, offset, degree, Number.MAX_SAFE_INTEGER);
  checkFinite(t, "t", "argument");
  const v = horner(coefficients, offset, degree, t);
  if (v - v !== 0) overflow(["t"], `The value at t = ${t}`);
  return v;
}

/**
 * Finds the real roots of a polynomial in the closed interval `[lo, hi]`, in increasing order.
 *
 * Degree 1 and 2 use closed forms (the quadratic in its cancellation-free form, scaled by a power
 * of two when its coefficients are very large or very small); higher degrees isolate each root
 * between consecutive roots of the derivative (found recursively), where the polynomial is
 * monotone, and then converge by Newton's method kept inside the bracket with a bisection
 * safeguard, which always converges. A root where the polynomial only touches zero (even
 * multiplicity) is reported when the value at the derivative's root is zero to rounding. A
 * polynomial that is identically zero has no isolated roots and returns none.
 *
 * @param coefficients - coefficient storage; lowest power first.
 * @param offset - index of the constant term.
 * @param degree - highest power; at most 8.
 * @param lo - start of the interval.
 * @param hi - end of the interval (`hi >= lo`).
 * @param out - receives the roots (appended).
 * @returns the number of roots appended.
 * @throws FlexuraError `polynomial-invalid` (coefficients, offset, degree), `not-a-number` / `not-finite` (lo, hi),
 *   `interval-reversed` (hi < lo), `output-invalid` (out not an array),
 *   `piecewise-overflow` when the polynomial's values on the interval exceed what a double can hold.
 * @example
 * ```ts
 * const roots: number[] = [];
 * polynomialRootsIn(new Float64Array([-2, 0, 1]), 0, 2, 0, 5, roots); // roots = [1.4142135623730951]
 * ```
 */
export function polynomialRootsIn(coefficients: ArrayLike<number>, offset: number, degree: number, lo: number, hi: number, out: number[]): number {
  checkRun(coefficients, offset, degree, MAX_DEGREE);
  checkFinite(lo, "lo", "start of the interval");
  checkFinite(hi, "hi", "end of the interval");
  if (hi < lo) fail("interval-reversed", ["hi"], `The interval [${lo}, ${hi}] ends before it starts.`, { lo, hi });
  if (!Array.isArray(out)) fail("output-invalid", ["out"], `The roots go into an array; got ${describeValue(out)}.`);
  takeRootOverflow();
  const n = roots(coefficients, offset, degree, lo, hi, out);
  if (takeRootOverflow()) overflow([], "A value of the polynomial on the interval");
  return n;
}
