import { makePiecewise, type PiecewisePolynomial } from "../math/piecewise.js";
import { rootsToScratch, scratchRoots } from "../math/polynomial.js";
import { pieceAt, taylorShift } from "./shifted-sum.js";

/** The upper envelope of many curves: the curve, and for each of its pieces the index of the curve that governs it. */
export interface UpperEnvelope {
  readonly curve: PiecewisePolynomial;
  readonly governing: readonly number[];
}

function horner(c: Float64Array, o: number, d: number, t: number): number {
  let v = c[o + d] as number;
  for (let k = d - 1; k >= 0; k--) v = v * t + (c[o + k] as number);
  return v;
}

/** Binomial coefficients C(n, k) for n up to 8. */
const BINOMIAL: number[][] = Array.from({ length: 9 }, (_, n) => Array.from({ length: n + 1 }, (_, k) => (k === 0 ? 1 : 0)));
for (let n = 1; n <= 8; n++) for (let k = 1; k <= n; k++) (BINOMIAL[n] as number[])[k] = ((BINOMIAL[n - 1] as number[])[k - 1] as number) + (k <= n - 1 ? ((BINOMIAL[n - 1] as number[])[k] as number) : 0);

/** Lower and upper bounds of the polynomial on [0, h] from its Bernstein coefficients. */
function bounds(c: Float64Array, o: number, d: number, h: number, out: Float64Array, at: number): void {
  let lo = Infinity;
  let hi = -Infinity;
  const row = BINOMIAL[d] as number[];
  for (let i = 0; i <= d; i++) {
    let b = 0;
    let hk = 1;
    const ri = BINOMIAL[i] as number[];
    for (let k = 0; k <= i; k++) {
      b += (((ri[k] as number) / (row[k] as number)) * (c[o + k] as number)) * hk;
      hk *= h;
    }
    if (b < lo) lo = b;
    if (b > hi) hi = b;
  }
  out[at] = lo;
  out[at + 1] = hi;
}

/**
 * The upper envelope on `[lo, hi]` of piecewise polynomials that each cover it, exact: on every
 * piece of the merged breakpoints, curves whose Bernstein bound lies wholly below another's are set
 * aside; the others are followed from the left, switching at the first root of a difference after
 * which another curve rises above the one governing. Curves within `tie` of each other count as equal
 * (the first keeps the piece).
 */
export function upperEnvelope(curves: readonly PiecewisePolynomial[], lo: number, hi: number, tie: number): UpperEnvelope {
  const K = curves.length;
  let D = 0;
  const all: number[] = [lo, hi];
  for (const c of curves) {
    D = Math.max(D, c.degree);
    for (const b of c.breaks) if (b > lo && b < hi) all.push(b);
  }
  all.sort((a, b) => a - b);
  const gap = 1e-14 * (Math.abs(lo) + Math.abs(hi) + (hi - lo));
  const breaks: number[] = [lo];
  for (const x of all) if (x - (breaks[breaks.length - 1] as number) > gap) breaks.push(x);
  if ((breaks[breaks.length - 1] as number) !== hi) {
    if (breaks.length > 1 && hi - (breaks[breaks.length - 1] as number) <= gap) breaks[breaks.length - 1] = hi;
    else breaks.push(hi);
  }
  const n = D + 1;
  const pieces = breaks.length - 1;
  const coef = new Float64Array(K * n);
  const bnd = new Float64Array(2 * K);
  const diff = new Float64Array(n);
  const alive: number[] = [];
  const outBreaks: number[] = [lo];
  const outCoef: number[] = [];
  const governing: number[] = [];
  const emit = (k: number, from: number, x0: number): void => {
    // the governing curve's coefficients re-expressed from `from` (x0 the merged piece's start)
    const seg = coef.slice(k * n, k * n + n);
    taylorShift(seg, 0, D, from - x0);
    for (let j = 0; j < n; j++) outCoef.push(seg[j] as number);
    governing.push(k);
  };
  for (let p = 0; p < pieces; p++) {
    const x0 = breaks[p] as number;
    const x1 = breaks[p + 1] as number;
    const h = x1 - x0;
    const mid = 0.5 * (x0 + x1);
    for (let k = 0; k < K; k++) {
      const c = curves[k] as PiecewisePolynomial;
      const i = pieceAt(c.breaks, mid);
      const d = c.degree;
      const o = k * n;
      for (let j = 0; j < n; j++) coef[o + j] = j <= d ? (c.coefficients[i * (d + 1) + j] as number) : 0;
      taylorShift(coef, o, D, x0 - (c.breaks[i] as number));
      bounds(coef, o, D, h, bnd, 2 * k);
    }
    let floor = -Infinity;
    for (let k = 0; k < K; k++) floor = Math.max(floor, bnd[2 * k] as number);
    alive.length = 0;
    for (let k = 0; k < K; k++) if ((bnd[2 * k + 1] as number) >= floor - tie) alive.push(k);
    // the curve governing at the piece's start: the largest there, ties broken a little to the right
    const probe = h * 1e-7;
    let cur = alive[0] as number;
    for (const k of alive) {
      const v = horner(coef, k * n, D, 0);
      const w = horner(coef, cur * n, D, 0);
      if (v > w + tie || (v > w - tie && horner(coef, k * n, D, probe) > horner(coef, cur * n, D, probe) + tie)) cur = k;
    }
    let t = 0;
    for (let guard = 0; guard < 4 * K + 8; guard++) {
      let next = h;
      let who = -1;
      for (const k of alive) {
        if (k === cur) continue;
        for (let j = 0; j < n; j++) diff[j] = (coef[k * n + j] as number) - (coef[cur * n + j] as number);
        const count = rootsToScratch(diff, 0, D, t, h);
        for (let r = 0; r < count; r++) {
          const x = scratchRoots[r] as number;
          if (!(x > t) || x >= next) continue;
          // does curve k rise above the governing one after this root (before the next root or the end)?
          const after = r + 1 < count ? Math.min(scratchRoots[r + 1] as number, next) : next;
          const v = horner(diff, 0, D, 0.5 * (x + after));
          if (v > tie) {
            next = x;
            who = k;
            break;
          }
        }
      }
      if (who < 0 || next >= h || x0 + next >= x1 || x0 + next <= (outBreaks[outBreaks.length - 1] as number)) break;
      emit(cur, x0 + t, x0);
      outBreaks.push(x0 + next);
      cur = who;
      t = next;
    }
    emit(cur, x0 + t, x0);
    outBreaks.push(x1);
  }
  return { curve: makePiecewise(Float64Array.from(outBreaks), Float64Array.from(outCoef), D), governing };
}
