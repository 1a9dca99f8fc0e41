import type { PiecewisePolynomial } from "../math/index.js";

/**
 * The union of the breakpoints of many piecewise polynomials on one domain, sorted; breakpoints
 * closer than `tolerance` are one.
 */
export function unionOfBreaks(all: readonly PiecewisePolynomial[], tolerance: number): Float64Array {
  const xs: number[] = [];
  for (const pp of all) for (const x of pp.breaks) xs.push(x);
  xs.sort((a, b) => a - b);
  const out: number[] = [];
  for (const x of xs) if (out.length === 0 || x - (out[out.length - 1] as number) > tolerance) out.push(x);
  // the domain's last point is kept exactly
  if (xs.length > 0) out[out.length - 1] = xs[xs.length - 1] as number;
  return Float64Array.from(out);
}

/**
 * Writes the coefficients of `pp` re-expressed on `breaks` (which hold all of its own) into
 * `out` from `offset`, at `degree` (at least its own): on each piece, the polynomial of the
 * source piece that covers it, Taylor-shifted to the piece's start.
 */
export function writeOnBreaks(pp: PiecewisePolynomial, breaks: Float64Array, degree: number, out: Float64Array, offset: number): void {
  const b = pp.breaks;
  const d = pp.degree;
  const c = pp.coefficients;
  const stride = degree + 1;
  let i = 0;
  const last = b.length - 2;
  for (let p = 0; p + 1 < breaks.length; p++) {
    const x = breaks[p] as number;
    const mid = 0.5 * (x + (breaks[p + 1] as number));
    while (i < last && mid >= (b[i + 1] as number)) i++;
    const o = offset + p * stride;
    for (let k = 0; k <= degree; k++) out[o + k] = k <= d ? (c[i * (d + 1) + k] as number) : 0;
    taylorShift(out, o, d, x - (b[i] as number));
  }
}

/** Replaces the coefficients at `c[o..o+d]` of p(t) with those of p(t + s), in place. */
export function taylorShift(c: Float64Array, o: number, d: number, s: number): void {
  if (s === 0) return;
  for (let i = 0; i < d; i++) {
    for (let k = d - 1; k >= i; k--) c[o + k] = (c[o + k] as number) + s * (c[o + k + 1] as number);
  }
}
