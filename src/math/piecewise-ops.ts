import { fail } from "../errors/index.js";
import { checkFinite, checkNoOverflow, checkPiecewise, overflow } from "./checks.js";
import { makePiecewise, type PiecewisePolynomial } from "./piecewise.js";

/**
 * Multiplies every value by `factor`.
 *
 * @throws FlexuraError `not-a-number` / `not-finite` when `factor` is not a finite number; `piecewise-invalid` (pp);
 *   `piecewise-overflow` when a product exceeds what a double can hold.
 * @example
 * ```ts
 * scalePiecewise(piecewisePolynomial([0, 1], [1, 1], 1), 2); // 2 + 2x on [0, 1]
 * ```
 */
export function scalePiecewise(pp: PiecewisePolynomial, factor: number): PiecewisePolynomial {
  pp = checkPiecewise(pp, "pp");
  checkFinite(factor, "factor", "factor");
  const c = new Float64Array(pp.coefficients.length);
  for (let i = 0; i < c.length; i++) c[i] = (pp.coefficients[i] as number) * factor;
  checkNoOverflow(c, [], "The scaled polynomial");
  return makePiecewise(pp.breaks.slice(), c, pp.degree);
}

/** Writes into out[oo..] the coefficients of p(t + s), p given at c[co..] with degree d (Taylor shift). */
function shiftInto(c: Float64Array, co: number, d: number, s: number, out: Float64Array, oo: number, outDegree: number): void {
  for (let k = 0; k <= outDegree; k++) out[oo + k] = k <= d ? (c[co + k] as number) : 0;
  if (s === 0) return;
  // repeated synthetic division by (t - (-s)) gives the shifted coefficients
  for (let i = 0; i < d; i++) {
    for (let k = d - 1; k >= i; k--) out[oo + k] = (out[oo + k] as number) + s * (out[oo + k + 1] as number);
  }
}

/**
 * The sum of two piecewise polynomials on the same domain. The result breaks wherever either
 * operand does, and its degree is the larger of the two.
 *
 * @throws FlexuraError `domain-mismatch` when the two do not share the same first and last breakpoint;
 *   `piecewise-invalid` (a or b); `piecewise-overflow` when a sum exceeds what a double can hold.
 * @example
 * ```ts
 * const a = piecewisePolynomial([0, 2], [1, 1], 1); // 1 + x
 * const b = piecewisePolynomial([0, 1, 2], [0, 1], 0); // 0 then 1
 * addPiecewise(a, b); // breaks [0, 1, 2]: 1 + x, then 3 + (x - 1)
 * ```
 */
export function addPiecewise(a: PiecewisePolynomial, b: PiecewisePolynomial): PiecewisePolynomial {
  a = checkPiecewise(a, "a");
  b = checkPiecewise(b, "b");
  const ab = a.breaks;
  const bb = b.breaks;
  if (ab[0] !== bb[0] || ab[ab.length - 1] !== bb[bb.length - 1])
    fail("domain-mismatch", [], `Cannot add piecewise polynomials on [${ab[0]}, ${ab[ab.length - 1]}] and [${bb[0]}, ${bb[bb.length - 1]}].`);
  const merged: number[] = [];
  let i = 0;
  let j = 0;
  while (i < ab.length || j < bb.length) {
    const x = i < ab.length ? (ab[i] as number) : Infinity;
    const y = j < bb.length ? (bb[j] as number) : Infinity;
    const v = Math.min(x, y);
    merged.push(v);
    const advanced = i + j;
    if (x === v) i++;
    if (y === v) j++;
    // breakpoints written to after the check (NaN) must not stall the merge
    if (i + j === advanced) fail("piecewise-invalid", [], "The breakpoints were changed after the piecewise polynomials were built.");
  }
  const d = Math.max(a.degree, b.degree);
  const stride = d + 1;
  const pieces = merged.length - 1;
  const out = new Float64Array(pieces * stride);
  const tmp = new Float64Array(stride);
  let ia = 0;
  let ib = 0;
  for (let p = 0; p < pieces; p++) {
    const x = merged[p] as number;
    while ((ab[ia + 1] as number) <= x && ia < ab.length - 2) ia++;
    while ((bb[ib + 1] as number) <= x && ib < bb.length - 2) ib++;
    shiftInto(a.coefficients, ia * (a.degree + 1), a.degree, x - (ab[ia] as number), out, p * stride, d);
    shiftInto(b.coefficients, ib * (b.degree + 1), b.degree, x - (bb[ib] as number), tmp, 0, d);
    for (let k = 0; k < stride; k++) out[p * stride + k] = (out[p * stride + k] as number) + (tmp[k] as number);
  }
  checkNoOverflow(out, [], "The sum");
  return makePiecewise(Float64Array.from(merged), out, d);
}

/**
 * The derivative, piece by piece (degree one lower; a constant's derivative is zero).
 *
 * @throws FlexuraError `piecewise-invalid` (pp); `piecewise-overflow` when a coefficient exceeds what a double can hold.
 * @example
 * ```ts
 * derivativeOf(piecewisePolynomial([0, 2], [0, 0, 1], 2)); // 2x on [0, 2]
 * ```
 */
export function derivativeOf(pp: PiecewisePolynomial): PiecewisePolynomial {
  pp = checkPiecewise(pp, "pp");
  const d = pp.degree;
  const nd = Math.max(d - 1, 0);
  const pieces = pp.breaks.length - 1;
  const out = new Float64Array(pieces * (nd + 1));
  for (let p = 0; p < pieces; p++) {
    for (let k = 1; k <= d; k++) out[p * (nd + 1) + k - 1] = k * (pp.coefficients[p * (d + 1) + k] as number);
  }
  checkNoOverflow(out, [], "The derivative");
  return makePiecewise(pp.breaks.slice(), out, nd);
}

/**
 * The integral from the first breakpoint: continuous across breakpoints and equal to
 * `constant` at the start (degree one higher).
 *
 * @throws FlexuraError `not-a-number` / `not-finite` when `constant` is not a finite number; `piecewise-invalid` (pp);
 *   `piecewise-overflow` when the integral exceeds what a double can hold.
 * @example
 * ```ts
 * integralOf(piecewisePolynomial([0, 1, 2], [1, 2], 0)); // x on [0, 1], then 1 + 2(x - 1)
 * ```
 */
export function integralOf(pp: PiecewisePolynomial, constant = 0): PiecewisePolynomial {
  pp = checkPiecewise(pp, "pp");
  checkFinite(constant, "constant", "constant");
  const d = pp.degree;
  const nd = d + 1;
  const pieces = pp.breaks.length - 1;
  const out = new Float64Array(pieces * (nd + 1));
  let value = constant;
  for (let p = 0; p < pieces; p++) {
    const o = p * (nd + 1);
    out[o] = value;
    for (let k = 0; k <= d; k++) out[o + k + 1] = (pp.coefficients[p * (d + 1) + k] as number) / (k + 1);
    const h = (pp.breaks[p + 1] as number) - (pp.breaks[p] as number);
    let v = out[o + nd] as number;
    for (let k = nd - 1; k >= 0; k--) v = v * h + (out[o + k] as number);
    value = v;
  }
  // the value at the end is the next piece's constant; the last one is checked here
  if (value - value !== 0) overflow([], "The integral");
  checkNoOverflow(out, [], "The integral");
  return makePiecewise(pp.breaks.slice(), out, nd);
}
