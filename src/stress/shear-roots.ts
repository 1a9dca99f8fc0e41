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

/** Values at one height of the pieces N and N' are made of, and N itself. */
interface Pieces {
  readonly y: number;
  readonly q: number;
  /** Per arc: u, u' and u''. */
  readonly u: Float64Array;
  /** N there. */
  readonly n: number;
}

function piecesAt(w: BandWidth, y: number, q: number): Pieces {
  const p = rootsAt(w, y);
  return { y, q, u: p, n: numerator(w, y, q, p) };
}

function rootsAt(w: BandWidth, y: number): Float64Array {
  const n = w.arcs.length;
  const u = new Float64Array(3 * n);
  for (let i = 0; i < n; i++) {
    const arc = w.arcs[i]!;
    const d = y - arc.centre;
    const r2 = arc.radius * arc.radius;
    const root = Math.sqrt(Math.max(r2 - d * d, 0));
    u[3 * i] = root;
    u[3 * i + 1] = -d / root;
    u[3 * i + 2] = -r2 / (root * root * root);
  }
  return u;
}

/** N at height y with Q = q and the roots u (NaN where a root's slope is infinite and Q is zero). */
function numerator(w: BandWidth, y: number, q: number, u: Float64Array): number {
  let b = w.p0 + w.p1 * y;
  let bt = w.q0 + w.q1 * y;
  let db = w.p1;
  w.arcs.forEach((arc, i) => {
    b += arc.k * u[3 * i]!;
    bt += arc.kt * u[3 * i]!;
    if (arc.k !== 0) db += arc.k * u[3 * i + 1]!;
  });
  return -bt * b * y - q * db;
}

// Interval arithmetic on [lo, hi] pairs held in plain numbers (this runs per interval examined).
// (a typed array rather than module-level variables, which would box every double written)
const acc = new Float64Array(2);
/** acc = [aLo, aHi] * [bLo, bHi]; an undefined product (0 * infinity) gives the whole line. */
function mul(aLo: number, aHi: number, bLo: number, bHi: number): void {
  const p1 = aLo * bLo;
  const p2 = aLo * bHi;
  const p3 = aHi * bLo;
  const p4 = aHi * bHi;
  if (Number.isNaN(p1 + p2 + p3 + p4)) {
    acc[0] = -Infinity;
    acc[1] = Infinity;
    return;
  }
  acc[0] = Math.min(p1, p2, p3, p4);
  acc[1] = Math.max(p1, p2, p3, p4);
}
/** Adds k times the range of the values x, y (the ends of a monotone piece) to acc. */
function addScaled(k: number, x: number, y: number): void {
  if (k === 0) return;
  const a = k * x;
  const b = k * y;
  acc[0]! += a < b ? a : b;
  acc[1]! += a < b ? b : a;
}

/** Bounds of N and N' on an interval: [nLo, nHi], [dnLo, dnHi]. */
const bound = new Float64Array(4);

/**
 * Bounds of N and of N' = -b (b_t' y + b_t) - Q b'' over [s, t] into {@link bound}. Every piece
 * is monotone there (y, Q and each root u; u' always, u'' away from the circle's centre height,
 * which is a band end), so each piece's range is spanned by its end values and interval
 * arithmetic bounds the sums.
 */
function bounds(w: BandWidth, s: Pieces, t: Pieces): void {
  const yLo = Math.min(s.y, t.y);
  const yHi = Math.max(s.y, t.y);
  const qLo = Math.min(s.q, t.q);
  const qHi = Math.max(s.q, t.q);
  // b, b_t (roots u), b', b_t' (slopes u'), b'' (curvatures u'')
  let bLo = w.p0;
  let bHi = w.p0;
  let btLo = w.q0;
  let btHi = w.q0;
  let dbLo = w.p1;
  let dbHi = w.p1;
  let dbtLo = w.q1;
  let dbtHi = w.q1;
  let ddbLo = 0;
  let ddbHi = 0;
  acc[0] = 0;
  acc[1] = 0;
  addScaled(w.p1, yLo, yHi);
  bLo += acc[0];
  bHi += acc[1];
  acc[0] = 0;
  acc[1] = 0;
  addScaled(w.q1, yLo, yHi);
  btLo += acc[0];
  btHi += acc[1];
  for (let i = 0; i < w.arcs.length; i++) {
    const arc = w.arcs[i]!;
    for (let piece = 0; piece < 3; piece++) {
      const x = s.u[3 * i + piece]!;
      const y = t.u[3 * i + piece]!;
      acc[0] = 0;
      acc[1] = 0;
      addScaled(arc.k, x, y);
      if (piece === 0) {
        bLo += acc[0];
        bHi += acc[1];
      } else if (piece === 1) {
        dbLo += acc[0];
        dbHi += acc[1];
      } else {
        ddbLo += acc[0];
        ddbHi += acc[1];
      }
      if (piece === 2) continue;
      acc[0] = 0;
      acc[1] = 0;
      addScaled(arc.kt, x, y);
      if (piece === 0) {
        btLo += acc[0];
        btHi += acc[1];
      } else {
        dbtLo += acc[0];
        dbtHi += acc[1];
      }
    }
  }
  // N = -(b_t b) y - Q b'
  mul(btLo, btHi, bLo, bHi);
  mul(acc[0], acc[1], yLo, yHi);
  const aLo = -acc[1];
  const aHi = -acc[0];
  mul(qLo, qHi, dbLo, dbHi);
  bound[0] = aLo - acc[1];
  bound[1] = aHi - acc[0];
  // N' = -b (b_t' y + b_t) - Q b''
  mul(dbtLo, dbtHi, yLo, yHi);
  mul(bLo, bHi, acc[0] + btLo, acc[1] + btHi);
  const cLo = -acc[1];
  const cHi = -acc[0];
  mul(qLo, qHi, ddbLo, ddbHi);
  bound[2] = cLo - acc[1];
  bound[3] = cHi - acc[0];
}

/** True when [lo, hi] may hold zero (or is undefined). */
function holdsZero(lo: number, hi: number): boolean {
  return !(lo > 0 || hi < 0);
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
    bounds(w, s, t);
    if (!holdsZero(bound[0]!, bound[1]!)) continue;
    const ns = s.n;
    const nt = t.n;
    if (!holdsZero(bound[2]!, bound[3]!) && !Number.isNaN(ns) && !Number.isNaN(nt)) {
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
