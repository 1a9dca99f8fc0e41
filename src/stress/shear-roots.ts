// Where Q(y) / b(y) can peak inside one band of a section: the roots of the numerator of its
// derivative. With y from the centroid, dQ/dy = -b_t(y) y (b_t the transformed width), so
//   d(Q/b)/dy = N(y) / b^2,   N(y) = -b_t(y) b(y) y - Q(y) b'(y).
// On a band of straight edges b and b_t are linear, Q is a cubic and so is N: its roots come
// from the polynomial root finder. Where a circular arc bounds the band, N holds square roots
// (and Q an arcsine): its roots are isolated by bounds and refined by bisection (see arcRoots).
import { polynomialRootsIn } from "../math/polynomial.js";
import type { BandWidth } from "./width-terms.js";

/** First moment of the (transformed) area above y, about the centroid. */
export type FirstMomentAt = (y: number) => number;

const cubic = new Float64Array(4);

/**
 * Appends to `out` the roots in [a, b] of N for a band without arcs. With b = p0 + p1 y,
 * b_t = q0 + q1 y and Q(y) = Q(b) + q0 (b^2 - y^2) / 2 + q1 (b^3 - y^3) / 3:
 * N = -p1 Qc - q0 p0 y + (p1 q0 / 2 - q0 p1 - q1 p0) y^2 - (2/3) p1 q1 y^3,
 * Qc = Q(b) + q0 b^2 / 2 + q1 b^3 / 3.
 */
function cubicRoots(w: BandWidth, a: number, b: number, qTop: number, out: number[]): void {
  const { p0, p1, q0, q1 } = w;
  const qc = qTop + (q0 * b * b) / 2 + (q1 * b * b * b) / 3;
  cubic[0] = -p1 * qc;
  cubic[1] = -q0 * p0;
  cubic[2] = (p1 * q0) / 2 - q0 * p1 - q1 * p0;
  cubic[3] = (-2 / 3) * p1 * q1;
  polynomialRootsIn(cubic, 0, 3, a, b, out);
}

/**
 * N at one height with, per term of the width (the linear part, then each arc), the values of
 * b, b_t, b', b_t' and b'' that it contributes: five numbers a term.
 */
interface Pieces {
  readonly y: number;
  readonly q: number;
  readonly n: number;
  readonly terms: readonly number[];
}

function piecesAt(w: BandWidth, y: number, q: number): Pieces {
  const terms = [w.p0 + w.p1 * y, w.q0 + w.q1 * y, w.p1, w.q1, 0];
  for (const { centre, radius, k, kt } of w.arcs) {
    const d = y - centre;
    const u = Math.sqrt(Math.max(radius * radius - d * d, 0));
    // u' = -d / u, u'' = -r^2 / u^3
    terms.push(k * u, kt * u, (-k * d) / u, (-kt * d) / u, (-k * radius * radius) / (u * u * u));
  }
  const sum = (m: number): number => terms.reduce((acc, v, i) => (i % 5 === m ? acc + v : acc), 0);
  return { y, q, n: -sum(1) * sum(0) * y - q * sum(2), terms };
}

type Interval = readonly [number, number];

function times(a: Interval, b: Interval): Interval {
  const p = [a[0] * b[0], a[0] * b[1], a[1] * b[0], a[1] * b[1]];
  // an undefined product (0 times infinity) bounds nothing
  return p.some(Number.isNaN) ? [-Infinity, Infinity] : [Math.min(...p), Math.max(...p)];
}

/** -(a + b) */
function minusSum(a: Interval, b: Interval): Interval {
  return [-a[1] - b[1], -a[0] - b[0]];
}

/**
 * Bounds of N = -b_t b y - Q b' and of N' = -b (b_t' y + b_t) - Q b'' over [s, t]. Every piece
 * is monotone there (y, Q, each arc's u and u', and u'' as the circle's centre height is a band
 * end), so each piece's range is spanned by its end values, and interval arithmetic bounds the sums.
 */
function bounds(s: Pieces, t: Pieces): { n: Interval; dn: Interval } {
  const range = (m: number): Interval => {
    let lo = 0;
    let hi = 0;
    for (let i = m; i < s.terms.length; i += 5) {
      const x = s.terms[i]!;
      const y = t.terms[i]!;
      lo += Math.min(x, y);
      hi += Math.max(x, y);
    }
    return [lo, hi];
  };
  const y: Interval = [s.y, t.y];
  const q: Interval = [Math.min(s.q, t.q), Math.max(s.q, t.q)];
  const [b, bt, db, dbt, ddb] = [0, 1, 2, 3, 4].map(range) as [Interval, Interval, Interval, Interval, Interval];
  const slopeTerm = times(dbt, y);
  return {
    n: minusSum(times(times(bt, b), y), times(q, db)),
    dn: minusSum(times(b, [slopeTerm[0] + bt[0], slopeTerm[1] + bt[1]]), times(q, ddb)),
  };
}

/** True when the bound may hold zero (or is undefined). */
function holdsZero(a: Interval): boolean {
  return !(a[0] > 0 || a[1] < 0);
}

/** Bisects [s, t], where N changes sign, down to adjacent floating-point numbers. */
function bisect(w: BandWidth, qAt: FirstMomentAt, s: number, t: number, ns: number): number {
  let lo = s;
  let hi = t;
  let nlo = ns;
  for (let i = 0; i < 1100; i++) {
    const m = lo + (hi - lo) / 2;
    if (m <= lo || m >= hi) break;
    const nm = piecesAt(w, m, qAt(m)).n;
    if (nm === 0) return m;
    if (nm > 0 === nlo > 0) {
      lo = m;
      nlo = nm;
    } else {
      hi = m;
    }
  }
  return lo + (hi - lo) / 2;
}

/** Work limit per band: intervals examined (a band needs a few dozen). */
const BUDGET = 2000;

/**
 * Appends the roots of N in (a, b) for a band bounded by arcs. Root isolation by bounds: an
 * interval on which the bound of N excludes zero holds no root; one on which the bound of N'
 * excludes zero holds at most one, found by bisection when N changes sign between its ends;
 * any other interval is halved. An interval narrower than 1e-12 of the band that is still
 * undecided (a double root, or the infinite slope of a root at a circle's top or bottom)
 * contributes its midpoint as a candidate, as does any interval left when the work limit is
 * reached: Q/b is continuous, so the peak is then found to within that width.
 */
function arcRoots(w: BandWidth, a: number, b: number, qAt: FirstMomentAt, out: number[]): void {
  const narrow = 1e-12 * (b - a);
  const stack: [Pieces, Pieces][] = [[piecesAt(w, a, qAt(a)), piecesAt(w, b, qAt(b))]];
  let work = 0;
  while (stack.length > 0) {
    const [s, t] = stack.pop()!;
    const { n, dn } = bounds(s, t);
    if (!holdsZero(n)) continue;
    const ns = s.n;
    const nt = t.n;
    if (!holdsZero(dn) && !Number.isNaN(ns) && !Number.isNaN(nt)) {
      if (ns === 0) out.push(s.y);
      else if (nt === 0) out.push(t.y);
      else if (ns > 0 !== nt > 0) out.push(bisect(w, qAt, s.y, t.y, ns));
      continue;
    }
    if (t.y - s.y <= narrow || ++work > BUDGET) {
      out.push(s.y + (t.y - s.y) / 2);
      continue;
    }
    const m = s.y + (t.y - s.y) / 2;
    const mid = piecesAt(w, m, qAt(m));
    stack.push([mid, t], [s, mid]);
  }
}

/**
 * F(s) with dF/ds = b_t(s) s on a band, so that Q(y) = Q(top) + F(top) - F(y). For a root
 * u = sqrt(r^2 - (s - c)^2): integral of u s ds = -u^3 / 3 + c ((s - c) u + r^2 asin((s - c) / r)) / 2
 * (elementary integrals).
 */
function moment(w: BandWidth, s: number): number {
  let f = (w.q0 * s * s) / 2 + (w.q1 * s * s * s) / 3;
  for (const arc of w.arcs) {
    if (arc.kt === 0) continue;
    const d = s - arc.centre;
    const r = arc.radius;
    const u = Math.sqrt(Math.max(r * r - d * d, 0));
    const x = Math.min(Math.max(d / r, -1), 1);
    f += arc.kt * (-(u * u * u) / 3 + (arc.centre * (d * u + r * r * Math.asin(x))) / 2);
  }
  return f;
}

/**
 * Heights in [a, b] where Q/b may have an interior extreme: the real roots of N there, with
 * Q(b) from `qAt` (exact) and Q below it integrated in closed form over the band. The band's
 * ends are candidates of their own and may or may not be included.
 */
export function criticalHeights(w: BandWidth, a: number, b: number, qAt: FirstMomentAt, out: number[]): void {
  const qTop = qAt(b);
  if (w.arcs.length === 0) {
    cubicRoots(w, a, b, qTop, out);
    return;
  }
  const fTop = moment(w, b);
  arcRoots(w, a, b, (y) => qTop + fTop - moment(w, y), out);
}
