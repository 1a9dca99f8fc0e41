import { polynomialRootsIn } from "../math/polynomial.js";
import { taylorShift } from "./common-breaks.js";

/** Binomial coefficients up to degree 8, row-major: BINOMIAL[n * 9 + k] = C(n, k). */
const BINOMIAL = (() => {
  const b = new Float64Array(81);
  for (let n = 0; n <= 8; n++) {
    b[n * 9] = 1;
    for (let k = 1; k <= n; k++) b[n * 9 + k] = (b[(n - 1) * 9 + k - 1] as number) + (k <= n - 1 ? (b[(n - 1) * 9 + k] as number) : 0);
  }
  return b;
})();

/** The power-to-Bernstein factors C(j, i) / C(d, i) for each degree d up to 8: TO_BERNSTEIN[d * 81 + j * 9 + i]. */
const TO_BERNSTEIN = (() => {
  const t = new Float64Array(9 * 81);
  for (let d = 0; d <= 8; d++) for (let j = 0; j <= d; j++) for (let i = 0; i <= j; i++) t[d * 81 + j * 9 + i] = (BINOMIAL[j * 9 + i] as number) / (BINOMIAL[d * 9 + i] as number);
  return t;
})();

const scaled = new Float64Array(9);

/**
 * Bernstein coefficients of the polynomial `c[o..o+d]` (local basis) on `[0, h]` into `out[oo..oo+d]`:
 * the polynomial lies between the smallest and the largest of them (the convex hull property).
 */
export function bernsteinInto(c: Float64Array, o: number, d: number, h: number, out: Float64Array, oo: number): void {
  let hp = 1;
  for (let i = 0; i <= d; i++) {
    scaled[i] = (c[o + i] as number) * hp;
    hp *= h;
  }
  const base = d * 81;
  for (let j = 0; j <= d; j++) {
    let v = 0;
    const row = base + j * 9;
    for (let i = 0; i <= j; i++) v += (TO_BERNSTEIN[row + i] as number) * (scaled[i] as number);
    out[oo + j] = v;
  }
}

/** Horner's rule on `c[o..o+d]` at t. */
export function horner(c: Float64Array, o: number, d: number, t: number): number {
  let v = c[o + d] as number;
  for (let k = d - 1; k >= 0; k--) v = v * t + (c[o + k] as number);
  return v;
}

/** The envelope of one bound, being built: breakpoints, coefficients and the governing function of each piece. */
export interface EnvelopeBuilder {
  readonly breaks: number[];
  readonly coefficients: number[];
  readonly governing: number[];
}

const roots: number[] = [];
const live: number[] = [];
const shifted = new Float64Array(9);
const rest = new Float64Array(9);
const restBern = new Float64Array(9);

/**
 * Appends to `env` the upper envelope (sign = 1) or lower envelope (sign = -1) on one piece
 * `[x0, x0 + h]` of K polynomials of degree d: `c[k * stride + offset ..]` in powers of `x - x0`,
 * with their Bernstein coefficients in `bern[k * (d + 1) ..]`; `ids[k]` names polynomial k in `env.governing`. `tol` is the rounding scale of the values:
 * functions within it of the envelope count as equal. Crossings are roots of the differences.
 */
export function envelopePiece(
  c: Float64Array,
  stride: number,
  offset: number,
  d: number,
  K: number,
  bern: Float64Array,
  x0: number,
  h: number,
  sign: number,
  tol: number,
  env: EnvelopeBuilder,
  diff: Float64Array,
  ids: ArrayLike<number>,
): void {
  const n = d + 1;
  // a function whose largest Bernstein coefficient is below the best smallest one never governs
  let floor = -Infinity;
  for (let k = 0; k < K; k++) {
    let lo = Infinity;
    for (let j = 0; j < n; j++) lo = Math.min(lo, sign * (bern[k * n + j] as number));
    floor = Math.max(floor, lo);
  }
  // champions: the best lower bound, the best start and the best end; a function that none of
  // them leaves below on the whole piece (Bernstein coefficients of the difference) never governs
  let byFloor = 0;
  let byStart = 0;
  let byEnd = 0;
  for (let k = 0; k < K; k++) {
    let lo = Infinity;
    for (let j = 0; j < n; j++) lo = Math.min(lo, sign * (bern[k * n + j] as number));
    if (lo === floor) byFloor = k;
    if (sign * (bern[k * n] as number) > sign * (bern[byStart * n] as number)) byStart = k;
    if (sign * (bern[k * n + d] as number) > sign * (bern[byEnd * n + d] as number)) byEnd = k;
  }
  live.length = 0;
  for (let k = 0; k < K; k++) {
    let hi = -Infinity;
    for (let j = 0; j < n; j++) hi = Math.max(hi, sign * (bern[k * n + j] as number));
    if (hi < floor - tol) continue;
    // the champions themselves stay (two equal ones must not remove each other)
    const champion = k === byFloor || k === byStart || k === byEnd;
    if (!champion && (below(bern, k, byFloor, n, sign, tol) || below(bern, k, byStart, n, sign, tol) || below(bern, k, byEnd, n, sign, tol))) continue;
    live.push(k);
  }
  // the governing function at the start: the largest value, ties broken by the derivatives
  let g = live[0] as number;
  for (let i = 1; i < live.length; i++) {
    const k = live[i] as number;
    let hp = 1;
    for (let j = 0; j < n; j++) {
      const a = sign * (c[k * stride + offset + j] as number) * hp;
      const b = sign * (c[g * stride + offset + j] as number) * hp;
      hp *= h;
      if (a > b + tol) {
        g = k;
        break;
      }
      if (a < b - tol) break;
    }
  }
  let t = 0;
  let start = 0;
  const minStep = 1e-12 * h;
  for (let guard = 0; guard < 4 * live.length * n + 8 && live.length > 1; guard++) {
    let best = Infinity;
    let next = -1;
    let bestGain = -Infinity;
    for (const k of live) {
      if (k === g) continue;
      // never above on the piece: skip without root-finding
      let hi = -Infinity;
      for (let j = 0; j < n; j++) hi = Math.max(hi, sign * ((bern[k * n + j] as number) - (bern[g * n + j] as number)));
      if (hi <= tol) continue;
      for (let j = 0; j < n; j++) diff[j] = sign * ((c[k * stride + offset + j] as number) - (c[g * stride + offset + j] as number));
      // nor above on what is left of it, [t, h]: the Bernstein coefficients of the difference there
      if (t > 0) {
        for (let j = 0; j < n; j++) rest[j] = diff[j] as number;
        taylorShift(rest, 0, d, t);
        bernsteinInto(rest, 0, d, h - t, restBern, 0);
        let top = -Infinity;
        for (let j = 0; j < n; j++) top = Math.max(top, restBern[j] as number);
        if (top <= tol) continue;
      }
      roots.length = 0;
      polynomialRootsIn(diff, 0, d, t, h, roots);
      // the first interval after t on which k rises above g
      let from = t;
      for (let r = 0; r <= roots.length; r++) {
        const to = r < roots.length ? (roots[r] as number) : h;
        if (to <= from) continue;
        if (from >= best) break;
        const gain = horner(diff, 0, d, 0.5 * (from + to));
        if (gain > tol) {
          if (from < best || (from === best && gain > bestGain)) {
            best = from;
            next = k;
            bestGain = gain;
          }
          break;
        }
        from = to;
      }
    }
    if (next < 0) break;
    if (best - start > minStep) {
      push(c, ids[g] as number, g * stride + offset, d, x0, start, env);
      start = best;
    }
    g = next;
    t = best;
  }
  push(c, ids[g] as number, g * stride + offset, d, x0, start, env);
}

/** True when function k lies at or below function m on the whole piece (by the Bernstein coefficients of k - m). */
function below(bern: Float64Array, k: number, m: number, n: number, sign: number, tol: number): boolean {
  for (let j = 0; j < n; j++) if (sign * ((bern[k * n + j] as number) - (bern[m * n + j] as number)) > tol) return false;
  return true;
}

function push(c: Float64Array, k: number, o: number, d: number, x0: number, t: number, env: EnvelopeBuilder): void {
  env.breaks.push(t === 0 ? x0 : x0 + t);
  for (let j = 0; j <= d; j++) shifted[j] = c[o + j] as number;
  if (t !== 0) taylorShift(shifted, 0, d, t);
  for (let j = 0; j <= d; j++) env.coefficients.push(shifted[j] as number);
  env.governing.push(k);
}
