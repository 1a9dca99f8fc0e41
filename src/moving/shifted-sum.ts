import { makePiecewise, type PiecewisePolynomial } from "../math/piecewise.js";

/**
 * One term of a {@link shiftedSum}: `weight * pp(s + shift)`, with `pp` zero before its domain and,
 * after it, zero or (with `hold`) its last value (the running integral of a line that ends); with
 * `about`, times `(s - about)`; with `from` / `to`, zero outside `[from, to]`.
 */
export interface ShiftedTerm {
  readonly pp: PiecewisePolynomial;
  readonly shift: number;
  readonly weight: number;
  readonly hold?: boolean;
  readonly about?: number;
  readonly from?: number;
  readonly to?: number;
}

/** Replaces `c[o..o+d]`, the coefficients of p(t), with those of p(t + h). */
export function taylorShift(c: Float64Array, o: number, d: number, h: number): void {
  if (h === 0) return;
  for (let i = 0; i < d; i++) for (let k = d - 1; k >= i; k--) c[o + k] = (c[o + k] as number) + h * (c[o + k + 1] as number);
}

/** Value of piece `i` of `pp` at `x` (local basis), by Horner's rule. */
export function pieceValue(pp: PiecewisePolynomial, i: number, x: number): number {
  const d = pp.degree;
  const o = i * (d + 1);
  const t = x - (pp.breaks[i] as number);
  let v = pp.coefficients[o + d] as number;
  for (let k = d - 1; k >= 0; k--) v = v * t + (pp.coefficients[o + k] as number);
  return v;
}

/** Index of the piece of `breaks` holding `x` (the last piece whose start is at or before it). */
export function pieceAt(breaks: Float64Array, x: number): number {
  let lo = 0;
  let hi = breaks.length - 2;
  while (lo < hi) {
    const mid = (lo + hi + 1) >> 1;
    if ((breaks[mid] as number) <= x) lo = mid;
    else hi = mid - 1;
  }
  return lo;
}

/**
 * The sum of shifted, weighted piecewise polynomials on `[lo, hi]`, exact: its breakpoints are
 * `lo`, `hi` and every breakpoint of every term moved by its shift, and on each piece each term's
 * own polynomial is Taylor-shifted to the piece's start. Breakpoints closer than about 1e-14 of the
 * domain's scale are one.
 */
export function shiftedSum(terms: readonly ShiftedTerm[], lo: number, hi: number): PiecewisePolynomial {
  const xs: number[] = [lo, hi];
  let degree = 0;
  for (const t of terms) {
    degree = Math.max(degree, t.pp.degree + (t.about === undefined ? 0 : 1));
    for (const b of t.pp.breaks) {
      const s = b - t.shift;
      if (s > lo && s < hi) xs.push(s);
    }
    if (t.from !== undefined && t.from > lo && t.from < hi) xs.push(t.from);
    if (t.to !== undefined && t.to > lo && t.to < hi) xs.push(t.to);
  }
  xs.sort((a, b) => a - b);
  const gap = 1e-14 * (Math.abs(lo) + Math.abs(hi) + (hi - lo));
  const breaks: number[] = [lo];
  for (const x of xs) if (x - (breaks[breaks.length - 1] as number) > gap) breaks.push(x);
  if ((breaks[breaks.length - 1] as number) !== hi) {
    if (breaks.length > 1 && hi - (breaks[breaks.length - 1] as number) <= gap) breaks[breaks.length - 1] = hi;
    else breaks.push(hi);
  }
  const n = degree + 1;
  const pieces = breaks.length - 1;
  const out = new Float64Array(pieces * n);
  const tmp = new Float64Array(n + 1);
  for (let p = 0; p < pieces; p++) {
    const s0 = breaks[p] as number;
    const mid = 0.5 * (s0 + (breaks[p + 1] as number));
    const o = p * n;
    for (const t of terms) {
      if ((t.from !== undefined && mid < t.from) || (t.to !== undefined && mid > t.to)) continue;
      const b = t.pp.breaks;
      const x = mid + t.shift;
      const first = b[0] as number;
      const last = b[b.length - 1] as number;
      if (x < first) continue;
      let d = t.pp.degree;
      tmp.fill(0);
      if (x > last) {
        if (t.hold !== true) continue;
        tmp[0] = pieceValue(t.pp, b.length - 2, last);
        d = 0;
      } else {
        const i = pieceAt(b, x);
        for (let k = 0; k <= d; k++) tmp[k] = t.pp.coefficients[i * (d + 1) + k] as number;
        taylorShift(tmp, 0, d, s0 + t.shift - (b[i] as number));
      }
      if (t.about === undefined) {
        for (let k = 0; k <= d; k++) out[o + k] = (out[o + k] as number) + t.weight * (tmp[k] as number);
      } else {
        // times (s - about) = (u + s0 - about), u the local coordinate
        const h = s0 - t.about;
        for (let k = 0; k <= d + 1; k++) out[o + k] = (out[o + k] as number) + t.weight * (h * (k <= d ? (tmp[k] as number) : 0) + (k > 0 ? (tmp[k - 1] as number) : 0));
      }
    }
  }
  return makePiecewise(Float64Array.from(breaks), out, degree);
}

/**
 * The same piecewise polynomial at the lowest degree that holds it: trailing powers whose part is
 * below `1e-13` of the line's scale on every piece (rounding, as the curvature a solve leaves on the
 * straight lines of a determinate member) are dropped. The scale is the largest sum over a piece of
 * `|c_k| h^k` (h the piece's width).
 */
export function trimDegree(pp: PiecewisePolynomial): PiecewisePolynomial {
  const d = pp.degree;
  const n = d + 1;
  const pieces = pp.breaks.length - 1;
  const c = pp.coefficients;
  let scale = 0;
  for (let p = 0; p < pieces; p++) {
    const h = (pp.breaks[p + 1] as number) - (pp.breaks[p] as number);
    let sum = 0;
    for (let k = 0, hk = 1; k <= d; k++, hk *= h) sum += Math.abs(c[p * n + k] as number) * hk;
    scale = Math.max(scale, sum);
  }
  const floor = 1e-13 * scale;
  let keep = 0;
  for (let p = 0; p < pieces; p++) {
    const h = (pp.breaks[p + 1] as number) - (pp.breaks[p] as number);
    for (let k = d; k > keep; k--) if (Math.abs(c[p * n + k] as number) * h ** k > floor) keep = k;
  }
  if (keep === d) return pp;
  const out = new Float64Array(pieces * (keep + 1));
  for (let p = 0; p < pieces; p++) for (let k = 0; k <= keep; k++) out[p * (keep + 1) + k] = c[p * n + k] as number;
  return makePiecewise(pp.breaks.slice(), out, keep);
}
